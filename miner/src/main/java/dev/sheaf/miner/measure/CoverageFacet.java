package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * A facet's coverage: its fill rate overall and per category, conflicts, and how its values are
 * spread.
 *
 * @param facetId          the facet
 * @param label            its preferred label
 * @param valueKind        term, number or yes-no
 * @param multiValued      whether a listing may carry several values
 * @param overall          the fill rate over all listings
 * @param byCategory       the fill rate per category, by category
 * @param conflictExamples ids of some listings where a single-valued facet got two values
 * @param values           the value distribution, most frequent first
 * @param entropyBits      Shannon entropy of the value distribution in bits (0 with one value or none)
 */
public record CoverageFacet(String facetId, String label, String valueKind, boolean multiValued, FillRate overall,
                            List<FillRate> byCategory, List<String> conflictExamples, List<CoverageValue> values,
                            double entropyBits) {
    public CoverageFacet {
        Objects.requireNonNull(facetId, "facetId");
        Objects.requireNonNull(overall, "overall");
        byCategory = List.copyOf(byCategory);
        conflictExamples = List.copyOf(conflictExamples);
        values = List.copyOf(values);
    }

    /** Shannon entropy H = −Σ p·log2 p of counts, in bits; 0 for no or one value. */
    public static double entropy(long[] counts) {
        long total = 0;
        for (long c : counts) {
            if (c < 0) {
                throw new IllegalArgumentException("counts must be >= 0, got " + c);
            }
            total += c;
        }
        if (total == 0) {
            return 0;
        }
        double h = 0;
        for (long c : counts) {
            if (c > 0) {
                double p = (double) c / total;
                h -= p * (Math.log(p) / Math.log(2));
            }
        }
        return h == 0 ? 0 : h; // no negative zero
    }
}
