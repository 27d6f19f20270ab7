package dev.sheaf.miner.report;

import java.util.Objects;

/**
 * How many attributes of one facet carry one kind of flag.
 *
 * @param kind  the flag kind
 * @param facet the facet as shown
 * @param count attributes of the facet with that flag
 */
public record FlagCount(FlagKind kind, String facet, int count) {
    public FlagCount {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(facet, "facet");
        if (count < 0) {
            throw new IllegalArgumentException("a flag count must be >= 0, got " + count + " for " + kind.label()
                    + " in '" + facet + "'");
        }
    }
}
