package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * How often a facet has a valid value in a set S of listings (all listings, or one category).
 *
 * <p>fill rate(a, S) = |listings in S where a applies and has a valid value| / |listings in S where
 * a applies| — the "applies" denominator of CHECKS.md "Coverage" [practice], in {@link #rate()}.
 * {@link #rateAll()} is the other reading, with listings where a does not apply counted in the
 * denominator: filled / |S|. A valid value is a stated concept of the facet, a yes or no for a
 * yes/no facet, or a number read in the facet's dimension; a negated term value or an unreadable
 * number is no value.
 *
 * @param facetId    the facet
 * @param category   the category, or {@code "*"} for all listings
 * @param listings   |S|
 * @param applicable listings in S where the facet applies
 * @param filled     listings in S where it applies and has a valid value
 * @param invalid    listings in S where it applies and has only unreadable values
 * @param conflicts  listings in S where a single-valued facet got two or more different values
 * @param rate       filled / applicable, NaN when applicable is 0
 * @param rateAll    filled / listings, NaN when listings is 0
 */
public record FillRate(String facetId, String category, long listings, long applicable, long filled, long invalid,
                       long conflicts, double rate, double rateAll) {
    /** The category value meaning "all listings". */
    public static final String ALL = "*";

    public FillRate {
        Objects.requireNonNull(facetId, "facetId");
        Objects.requireNonNull(category, "category");
        if (applicable > listings || filled > applicable || invalid + filled > applicable || conflicts > filled) {
            throw new IllegalArgumentException("fill counts of " + facetId + " in " + category + " are inconsistent: listings "
                    + listings + ", applicable " + applicable + ", filled " + filled + ", invalid " + invalid + ", conflicts " + conflicts);
        }
    }

    /** The rates from the counts. */
    public static FillRate of(String facetId, String category, long listings, long applicable, long filled, long invalid,
                              long conflicts) {
        return new FillRate(facetId, category, listings, applicable, filled, invalid, conflicts,
                applicable == 0 ? Double.NaN : (double) filled / applicable, listings == 0 ? Double.NaN : (double) filled / listings);
    }
}
