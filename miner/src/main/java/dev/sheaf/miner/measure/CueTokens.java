package dev.sheaf.miner.measure;

import java.io.IOException;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.lucene.analysis.standard.StandardTokenizer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;

/**
 * The raw sentence as words with offsets (Lucene's {@link StandardTokenizer}, Unicode UAX #29 word
 * boundaries), lower-cased with {@link Locale#ROOT}, plus the punctuation breaks between words.
 * Never stop-worded: the cue words (not, no, more, too, a bit) are stop words.
 */
final class CueTokens {

    /** One word. {@code norm}: lower-case, typographic apostrophes folded to {@code '}. */
    record Token(String norm, int start, int end) {
    }

    /** Characters that end a clause when they stand between two words. */
    private static final String CLAUSE_PUNCTUATION = ".,;:!?()[]{}\"\u2026\u2013\u2014\u201C\u201D";
    /** Characters that end a sentence segment (for epistemic hedges). */
    private static final String SEGMENT_PUNCTUATION = ".;!?\u2026";

    final String text;
    final List<Token> tokens;
    /** {@code clauseBreak[i]}: punctuation stands between token i-1 and token i. */
    final boolean[] clauseBreak;
    /** {@code segmentBreak[i]}: sentence-ending punctuation stands between token i-1 and token i. */
    final boolean[] segmentBreak;

    private CueTokens(String text, List<Token> tokens) {
        this.text = text;
        this.tokens = tokens;
        int n = tokens.size();
        clauseBreak = new boolean[n + 1];
        segmentBreak = new boolean[n + 1];
        for (int i = 0; i <= n; i++) {
            int from = i == 0 ? 0 : tokens.get(i - 1).end();
            int to = i == n ? text.length() : tokens.get(i).start();
            String gap = text.substring(from, Math.max(from, to));
            clauseBreak[i] = any(gap, CLAUSE_PUNCTUATION) || gap.indexOf('\n') >= 0 || spacedDash(gap);
            segmentBreak[i] = any(gap, SEGMENT_PUNCTUATION) || gap.indexOf('\n') >= 0;
        }
    }

    static CueTokens of(String text) {
        List<Token> out = new ArrayList<>();
        try (StandardTokenizer tokenizer = new StandardTokenizer()) {
            CharTermAttribute term = tokenizer.addAttribute(CharTermAttribute.class);
            OffsetAttribute offset = tokenizer.addAttribute(OffsetAttribute.class);
            tokenizer.setReader(new StringReader(text));
            tokenizer.reset();
            while (tokenizer.incrementToken()) {
                out.add(new Token(ComparativeMorphology.normalise(term.toString()),
                        offset.startOffset(), offset.endOffset()));
            }
            tokenizer.end();
        } catch (IOException e) {
            throw new UncheckedIOException("reading a string cannot fail", e);
        }
        return new CueTokens(text, List.copyOf(out));
    }

    int size() {
        return tokens.size();
    }

    Token get(int i) {
        return tokens.get(i);
    }

    String norm(int i) {
        return tokens.get(i).norm();
    }

    private static boolean any(String gap, String chars) {
        for (int i = 0; i < gap.length(); i++) {
            if (chars.indexOf(gap.charAt(i)) >= 0) {
                return true;
            }
        }
        return false;
    }

    /** " - " between words is a dash; "PFC-free" (no spaces) is one compound. */
    private static boolean spacedDash(String gap) {
        return gap.indexOf('-') >= 0 && !gap.strip().equals(gap);
    }
}
