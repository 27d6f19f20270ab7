package dev.sheaf.curator.figures;

import java.util.List;
import java.util.Objects;

/**
 * The live figures of one concept.
 *
 * @param conceptId the concept
 * @param label its preferred label
 * @param covered listings carrying any of its labels (distinct), or -1 when there is no evidence index
 * @param listings listings in the catalog, or -1 when unknown
 * @param perLabel listings per label, in the concept's label order
 * @param facetLabel the facet it is in, or "" when it is under no facet
 * @param facetCategories the categories the facet applies to; empty means every category
 * @param filled listings in those categories that carry any value of the facet, or -1 when unknown
 * @param eligible listings in those categories, or -1 when unknown (no harvest to count them)
 * @param byCategory fill per category where the facet applies, by category
 * @param flags the audit's flags on the concept or its facet ("thin: fill rate 0.12 below 0.30"), empty when none
 * @param flagsSource where the flags came from, or "" when no audit output exists
 * @param regulated whether the facet is a regulated claim
 */
public record ConceptFigures(String conceptId, String label, long covered, long listings, List<LabelCount> perLabel,
                             String facetLabel, List<String> facetCategories, long filled, long eligible,
                             List<CategoryFill> byCategory, List<String> flags, String flagsSource, boolean regulated) {
    public ConceptFigures {
        Objects.requireNonNull(conceptId);
        Objects.requireNonNull(label);
        perLabel = List.copyOf(perLabel);
        facetCategories = List.copyOf(facetCategories);
        byCategory = List.copyOf(byCategory);
        flags = List.copyOf(flags);
        facetLabel = facetLabel == null ? "" : facetLabel;
        flagsSource = flagsSource == null ? "" : flagsSource;
    }

    /** Listings carrying one label. */
    public record LabelCount(String label, long listings) {
    }

    /**
     * Fill of the facet in one category.
     *
     * @param category the category ("" for listings without one)
     * @param filled listings of the category carrying any value of the facet
     * @param listings listings of the category
     */
    public record CategoryFill(String category, long filled, long listings) {
        public double share() {
            return listings == 0 ? 0 : (double) filled / listings;
        }
    }

    /** filled / eligible, or NaN when unknown. */
    public double fillRate() {
        return filled < 0 || eligible <= 0 ? Double.NaN : (double) filled / eligible;
    }
}
