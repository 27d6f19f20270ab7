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

    private static final int[] NONE = new int[0];

    private final Map<String, int[]> exact = new LinkedHashMap<>();
    private final List<String> labels = new ArrayList<>();
    private final List<Integer> facetOfLabel = new ArrayList<>();
    private final Map<String, int[]> cache = new ConcurrentHashMap<>();

    /**
     * Adds a label of facet {@code facet}. Several facets may share a key form ("Capacity" of a
     * pack's volume and of a tent's persons); the labeler then picks by the value's dimension.
     */
    void add(String label, int facet) {
        String key = SpecKeys.normalise(label);
        if (key.isEmpty()) {
            return;
        }
        labels.add(label);
        facetOfLabel.add(facet);
        int[] prev = exact.get(key);
        if (prev == null) {
            exact.put(key, new int[] {facet});
        } else if (java.util.Arrays.stream(prev).noneMatch(x -> x == facet)) {
            int[] next = java.util.Arrays.copyOf(prev, prev.length + 1);
            next[prev.length] = facet;
            exact.put(key, next);
        }
    }

    boolean isEmpty() {
        return labels.isEmpty();
    }

    /** The facet indices a raw spec key may belong to, in label order; empty for none. */
    int[] facetsOf(String rawKey) {
        int[] hit = cache.get(rawKey);
        if (hit != null) {
            return hit;
        }
        int[] f = compute(rawKey);
        if (cache.size() < CACHE_LIMIT) {
            cache.put(rawKey, f);
        }
        return f;
    }

    private int[] compute(String rawKey) {
        String key = SpecKeys.normalise(rawKey);
        if (key.isEmpty()) {
            return NONE;
        }
        int[] f = exact.get(key);
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
                return new int[] {facetOfLabel.get(i)};
            }
        }
        return NONE;
    }
}
