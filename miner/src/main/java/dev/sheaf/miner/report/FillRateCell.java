package dev.sheaf.miner.report;

import java.util.Objects;

/**
 * The fill rate of one facet in one category: of the listings in the category the facet applies to,
 * how many carry a valid value of it. Listings it does not apply to are outside the denominator
 * (CHECKS.md, coverage [practice]).
 *
 * @param facet      the facet as shown
 * @param category   the category as shown
 * @param applicable listings in the category the facet applies to; 0 shows the cell as "n/a"
 * @param filled     of those, listings with a valid value
 */
public record FillRateCell(String facet, String category, int applicable, int filled) {
    public FillRateCell {
        Objects.requireNonNull(facet, "facet");
        Objects.requireNonNull(category, "category");
        if (applicable < 0 || filled < 0 || filled > applicable) {
            throw new IllegalArgumentException("fill rate of '" + facet + "' in '" + category
                    + "' needs 0 <= filled <= applicable, got " + filled + " of " + applicable);
        }
    }

    /** filled / applicable; NaN when the facet applies to no listing of the category. */
    public double rate() {
        return applicable == 0 ? Double.NaN : (double) filled / applicable;
    }
}
