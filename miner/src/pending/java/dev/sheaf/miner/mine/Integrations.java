package dev.sheaf.miner.mine;

import dev.sheaf.miner.text.Quantities;
import dev.sheaf.miner.text.Quantity;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The three calls into the quantities helper's components: variant keys, spec-key clustering and
 * quantity parsing (CONTRACTS.md). Replaces the build's fallback of the same name.
 */
final class Integrations {
    static final Harvest.Components COMPONENTS = new Harvest.Components(true, true, true);

    private Integrations() {
    }

    static String groupKey(String term) {
        return VariantKey.of(term);
    }

    static List<KeyGroup> clusterKeys(Map<String, Long> rawKeyCounts) {
        List<KeyGroup> out = new ArrayList<>();
        for (SpecKeyCluster c : SpecKeys.cluster(rawKeyCounts)) {
            // CONTRACT? SpecKeyCluster: "canonical name, members with counts" — name() and members() as a
            // Map<String, Long> (raw key → count) are assumed here
            out.add(new KeyGroup(c.name(), new ArrayList<>(c.members().keySet())));
        }
        return out;
    }

    static Optional<QuantityValue> quantity(String value) {
        Optional<Quantity> q = Quantities.parse(value);
        return q.map(x -> new QuantityValue(x.dimension().name().toLowerCase(Locale.ROOT), x.dimension().baseUnit(), x.si()));
    }

    record KeyGroup(String name, List<String> members) {
    }

    record QuantityValue(String dimension, String baseUnit, double si) {
    }
}
