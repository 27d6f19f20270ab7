package dev.sheaf.miner.label;

import dev.sheaf.miner.mine.SpecKeyCluster;
import dev.sheaf.miner.mine.SpecKeys;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Which number facet a spec key belongs to: the facet one of whose labels the key equals in
 * {@link SpecKeys#normalise} form, or else the facet one of whose labels the key clusters with
 * under {@link SpecKeys#cluster} (neutral modifiers, plurals, spellings and synonyms: "Item weight",
 * "Weights", "Mass" meet "weight"; "Packed weight" does not). Distinct keys are few in a catalog, so
 * each is worked out once and remembered (up to {@value #CACHE_LIMIT} keys). Thread-safe.
 */
final class SpecKeyMatcher {
    static final int CACHE_LIMIT = 100_000;

    private final Map<String, Integer> exact = new LinkedHashMap<>();
    private final List<String> labels = new ArrayList<>();
    private final List<Integer> facetOfLabel = new ArrayList<>();
    private final Map<String, Integer> cache = new ConcurrentHashMap<>();

    /** Adds a label of facet {@code facet}; returns the facet that already had this key form, or -1. */
    int add(String label, int facet) {
        String key = SpecKeys.normalise(label);
        if (key.isEmpty()) {
            return -1;
        }
        labels.add(label);
        facetOfLabel.add(facet);
        Integer prev = exact.putIfAbsent(key, facet);
        return prev == null || prev == facet ? -1 : prev;
    }

    boolean isEmpty() {
        return labels.isEmpty();
    }

    /** The facet index of a raw spec key, or -1. */
    int facetOf(String rawKey) {
        Integer hit = cache.get(rawKey);
        if (hit != null) {
            return hit;
        }
        int f = compute(rawKey);
        if (cache.size() < CACHE_LIMIT) {
            cache.put(rawKey, f);
        }
        return f;
    }

    private int compute(String rawKey) {
        String key = SpecKeys.normalise(rawKey);
        if (key.isEmpty()) {
            return -1;
        }
        Integer f = exact.get(key);
        if (f != null) {
            return f;
        }
        for (int i = 0; i < labels.size(); i++) {
            if (SpecKeys.normalise(labels.get(i)).equals(key)) {
                continue;
            }
            Map<String, Long> pair = new LinkedHashMap<>();
            pair.put(rawKey, 1L);
            pair.put(labels.get(i), 1L);
            List<SpecKeyCluster> clusters = SpecKeys.cluster(pair);
            if (clusters.size() == 1 && clusters.get(0).members().size() == 2) {
                return facetOfLabel.get(i);
            }
        }
        return -1;
    }
}
