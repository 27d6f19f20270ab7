package dev.sheaf.miner.mine;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The three calls into components another part of Sheaf provides (variant keys, spec-key
 * clustering, quantity parsing), in one place. This build does not have them yet, so it groups
 * nothing, clusters nothing and parses no quantities, and says so in every harvest
 * ({@link Harvest.Components}); {@code miner/src/pending/.../Integrations.java} is the same class
 * wired to {@code VariantKey.of}, {@code SpecKeys.cluster} and {@code Quantities.parse}.
 */
final class Integrations {
    static final Harvest.Components COMPONENTS = new Harvest.Components(false, false, false);

    private Integrations() {
    }

    /** The variant group key of a candidate term, or null without variant keys. */
    static String groupKey(String term) {
        return null;
    }

    /** Raw spec keys with their row counts → clusters; without clustering, one cluster per raw key. */
    static List<KeyGroup> clusterKeys(Map<String, Long> rawKeyCounts) {
        List<KeyGroup> out = new ArrayList<>();
        for (String k : rawKeyCounts.keySet()) {
            out.add(new KeyGroup(k, List.of(k)));
        }
        return out;
    }

    /** A whole spec value as a quantity in its dimension's base unit, when it is one. */
    static Optional<QuantityValue> quantity(String value) {
        return Optional.empty();
    }

    /** A facet candidate: canonical name and its raw member keys. */
    record KeyGroup(String name, List<String> members) {
    }

    /** A parsed quantity: dimension name, base unit, value in the base unit. */
    record QuantityValue(String dimension, String baseUnit, double si) {
    }
}
