package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The flags on one attribute.
 *
 * @param attribute the attribute
 * @param label     the label to show
 * @param flags     its flags, by kind then criterion
 */
public record FlaggedAttribute(String attribute, String label, List<Flag> flags) {
    public FlaggedAttribute {
        Objects.requireNonNull(attribute, "attribute");
        Objects.requireNonNull(label, "label");
        flags = List.copyOf(flags);
        if (flags.isEmpty()) {
            throw new IllegalArgumentException("a flagged attribute needs at least one flag: " + attribute);
        }
    }

    /** The distinct kinds, in kind order. */
    public List<FlagKind> kinds() {
        List<FlagKind> out = new ArrayList<>();
        for (FlagKind k : FlagKind.values()) {
            if (flags.stream().anyMatch(f -> f.kind() == k)) {
                out.add(k);
            }
        }
        return out;
    }

    public boolean has(FlagKind kind) {
        return flags.stream().anyMatch(f -> f.kind() == kind);
    }
}
