package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * A word or phrase of the feedback that no vocabulary label covers: a candidate the vocabulary may lack.
 *
 * @param term      the words in normal form, one space apart
 * @param words     how many words
 * @param frequency occurrences over all sentences
 * @param sentences sentences holding it at least once (document frequency)
 * @param example   the first sentence it occurs in
 * @param exampleRow that sentence's row (0 when not from a file)
 */
public record GapTerm(String term, int words, int frequency, int sentences, String example, long exampleRow) {
    public GapTerm {
        Objects.requireNonNull(term, "term");
        Objects.requireNonNull(example, "example");
        if (term.isBlank() || words < 1 || sentences < 1 || frequency < sentences) {
            throw new IllegalArgumentException("a gap term needs words >= 1 and frequency >= sentences >= 1; got '" + term
                    + "', " + words + ", " + frequency + ", " + sentences);
        }
    }
}
