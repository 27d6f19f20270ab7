package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * A common term of the listings with no attribute at all: a hint of what the vocabulary misses.
 *
 * @param n           1 for a word, 2 for a two-word term
 * @param term        the analysed term
 * @param listings    unlabeled listings holding it
 * @param occurrences its occurrences in them
 */
public record CoverageGapTerm(int n, String term, long listings, long occurrences) {
    public CoverageGapTerm {
        Objects.requireNonNull(term, "term");
        if (n < 1 || listings < 1 || occurrences < listings) {
            throw new IllegalArgumentException("gap term \"" + term + "\" needs n >= 1 and occurrences >= listings >= 1");
        }
    }
}
