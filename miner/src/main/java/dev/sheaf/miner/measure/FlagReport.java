package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * What {@link Flags#evaluate} found.
 *
 * @param flagged    attributes with at least one flag, by attribute id
 * @param evaluated  attributes looked at (flagged or not)
 * @param thresholds the edges used
 * @param notes      flag kinds not evaluated for want of input, and similar remarks
 */
public record FlagReport(List<FlaggedAttribute> flagged, int evaluated, FlagThresholds thresholds, List<String> notes) {
    public FlagReport {
        flagged = List.copyOf(flagged);
        notes = List.copyOf(notes);
        Objects.requireNonNull(thresholds, "thresholds");
        if (evaluated < flagged.size()) {
            throw new IllegalArgumentException("evaluated (" + evaluated + ") must be at least the " + flagged.size() + " flagged");
        }
    }

    /** The flags on one attribute, if it has any. */
    public Optional<FlaggedAttribute> flags(String attribute) {
        return flagged.stream().filter(a -> a.attribute().equals(attribute)).findFirst();
    }

    /** True when the attribute carries a flag of this kind. */
    public boolean has(String attribute, FlagKind kind) {
        return flags(attribute).map(a -> a.has(kind)).orElse(false);
    }

    /** Attributes carrying a flag of this kind. */
    public long count(FlagKind kind) {
        return flagged.stream().filter(a -> a.has(kind)).count();
    }
}
