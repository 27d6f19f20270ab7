package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * How well one concept or facet is filled where it applies: the plain input the thin flag needs
 * (coverage figures supply it). fill rate = filled / applicable [practice]; listings where the facet
 * does not apply are not in the denominator.
 *
 * @param attribute       the concept or facet id
 * @param applicable      listings where it applies
 * @param filled          of those, listings that carry a valid value
 * @param unfilledSample  some listing ids where it applies but no value is carried (evidence), may be empty
 */
public record FlagFill(String attribute, long applicable, long filled, List<String> unfilledSample) {
    public FlagFill {
        Objects.requireNonNull(attribute, "attribute");
        unfilledSample = List.copyOf(unfilledSample);
        if (applicable < 0 || filled < 0 || filled > applicable) {
            throw new IllegalArgumentException("need 0 <= filled <= applicable for " + attribute + ", got " + filled + " of "
                    + applicable);
        }
    }

    /** filled / applicable; NaN when the facet applies nowhere. */
    public double rate() {
        return applicable == 0 ? Double.NaN : (double) filled / applicable;
    }
}
