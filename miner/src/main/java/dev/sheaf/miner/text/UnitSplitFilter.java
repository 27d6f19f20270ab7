package dev.sheaf.miner.text;

import java.io.IOException;
import org.apache.lucene.analysis.CharArraySet;
import org.apache.lucene.analysis.TokenFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;

/**
 * Splits a number glued to a unit ({@code 1.2kg}, {@code 10,000mm}, {@code 20l}) into a number token
 * (type {@code <NUM>}) and a unit token (type {@link Analysis#TYPE_UNIT}), each with its own offsets,
 * exactly as if the text had a space between them; and types a unit word that directly follows a
 * number token as {@link Analysis#TYPE_UNIT} so the stop filter keeps it ({@code 10 in}).
 *
 * <p>Only tokens whose letters are all one known unit are split, so {@code 2nd}, {@code 4x4} and
 * {@code 3d} stay whole unless listed as units. A token is split only when its term length equals
 * its offset span (no earlier filter changed its length), so the offsets stay exact. Expects
 * lower-cased input.
 */
final class UnitSplitFilter extends TokenFilter {
    private final CharTermAttribute term = addAttribute(CharTermAttribute.class);
    private final OffsetAttribute offset = addAttribute(OffsetAttribute.class);
    private final TypeAttribute type = addAttribute(TypeAttribute.class);
    private final PositionIncrementAttribute posInc = addAttribute(PositionIncrementAttribute.class);
    private final CharArraySet units;

    private State pending;
    private int pendingSplit;
    private boolean previousWasNumber;

    UnitSplitFilter(TokenStream in, CharArraySet units) {
        super(in);
        this.units = units;
    }

    @Override
    public boolean incrementToken() throws IOException {
        if (pending != null) {
            restoreState(pending);
            pending = null;
            char[] b = term.buffer();
            int len = term.length();
            System.arraycopy(b, pendingSplit, b, 0, len - pendingSplit);
            term.setLength(len - pendingSplit);
            offset.setOffset(offset.startOffset() + pendingSplit, offset.endOffset());
            type.setType(Analysis.TYPE_UNIT);
            posInc.setPositionIncrement(1);
            previousWasNumber = false;
            return true;
        }
        if (!input.incrementToken()) {
            return false;
        }
        char[] b = term.buffer();
        int len = term.length();
        boolean adjacentToNumber = previousWasNumber && posInc.getPositionIncrement() == 1;
        int split = numberPrefix(b, len);
        if (split > 0 && split < len && len == offset.endOffset() - offset.startOffset()
                && units.contains(b, split, len - split)) {
            pending = captureState();
            pendingSplit = split;
            term.setLength(split);
            offset.setOffset(offset.startOffset(), offset.startOffset() + split);
            type.setType(Analysis.TYPE_NUMBER);
            previousWasNumber = true;
            return true;
        }
        if (split == len) {
            previousWasNumber = true;
            return true;
        }
        if (adjacentToNumber && units.contains(b, 0, len)) {
            type.setType(Analysis.TYPE_UNIT);
        }
        previousWasNumber = false;
        return true;
    }

    /**
     * Length of the leading number ({@code 12}, {@code 1.2}, {@code 10,000}): digits, with single
     * {@code .} or {@code ,} between digits; 0 when the token does not start with a digit.
     */
    static int numberPrefix(char[] b, int len) {
        if (len == 0 || b[0] < '0' || b[0] > '9') {
            return 0;
        }
        int i = 0;
        while (i < len) {
            char c = b[i];
            if (c >= '0' && c <= '9') {
                i++;
            } else if ((c == '.' || c == ',') && i > 0 && i + 1 < len && b[i + 1] >= '0' && b[i + 1] <= '9') {
                i++;
            } else {
                break;
            }
        }
        if (i == len) {
            return len;
        }
        // the rest must be letters only for a unit split
        for (int j = i; j < len; j++) {
            if (!Character.isLetter(b[j])) {
                return 0;
            }
        }
        return i;
    }

    @Override
    public void reset() throws IOException {
        super.reset();
        pending = null;
        previousWasNumber = false;
    }
}
