package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * How well one concept covers the catalog.
 *
 * @param conceptId        the concept
 * @param facetId          its facet, or null when it is under none
 * @param label            its preferred label
 * @param listings         listings where it is stated
 * @param negated          listings where it is only negated
 * @param applicable       listings whose category its facet applies to
 * @param share            listings / applicable, NaN when nothing applies
 * @param topSource        the source file with most of its listings, or null when it has none
 * @param topSourceShare   that file's share of its listings, NaN when it has none
 * @param topCategory      the category with most of its listings, or null
 * @param topCategoryShare that category's share, NaN when it has none
 */
public record CoverageConcept(String conceptId, String facetId, String label, long listings, long negated, long applicable,
                              double share, String topSource, double topSourceShare, String topCategory,
                              double topCategoryShare) {
    public CoverageConcept {
        Objects.requireNonNull(conceptId, "conceptId");
        Objects.requireNonNull(label, "label");
        if (listings < 0 || negated < 0 || applicable < 0) {
            throw new IllegalArgumentException("counts of " + conceptId + " must be >= 0");
        }
    }
}
