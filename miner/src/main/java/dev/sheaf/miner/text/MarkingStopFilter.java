package dev.sheaf.miner.text;

import org.apache.lucene.analysis.CharArraySet;
import org.apache.lucene.analysis.FilteringTokenFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;

/**
 * Removes stop words (leaving a position gap, as Lucene's StopFilter does, so a phrase never
 * matches across one) except unit tokens, and keeps negation words with type
 * {@link Analysis#TYPE_NEGATION} even when the stop list holds them. Expects lower-cased input.
 */
final class MarkingStopFilter extends FilteringTokenFilter {
    private final CharTermAttribute term = addAttribute(CharTermAttribute.class);
    private final TypeAttribute type = addAttribute(TypeAttribute.class);
    private final CharArraySet stops;
    private final CharArraySet negations;

    MarkingStopFilter(TokenStream in, CharArraySet stops, CharArraySet negations) {
        super(in);
        this.stops = stops;
        this.negations = negations;
    }

    @Override
    protected boolean accept() {
        char[] b = term.buffer();
        int len = term.length();
        if (negations.contains(b, 0, len)) {
            type.setType(Analysis.TYPE_NEGATION);
            return true;
        }
        if (Analysis.TYPE_UNIT.equals(type.type())) {
            return true;
        }
        return !stops.contains(b, 0, len);
    }
}
