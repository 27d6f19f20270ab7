package dev.sheaf.miner.mine;

import it.unimi.dsi.fastutil.objects.Object2LongMap;
import it.unimi.dsi.fastutil.objects.Object2LongOpenHashMap;
import java.util.HashMap;
import java.util.Map;

/**
 * Raw spec keys and values as written (trimmed), with row counts; one per worker, merged at the
 * end. Exact: every distinct value is kept.
 */
final class SpecTally {
    static final class KeyTally {
        long rows;
        final Object2LongOpenHashMap<String> values = new Object2LongOpenHashMap<>();
    }

    final Map<String, KeyTally> keys = new HashMap<>();

    void add(String rawKey, String rawValue) {
        String key = rawKey.strip();
        if (key.isEmpty()) {
            return;
        }
        KeyTally t = keys.computeIfAbsent(key, k -> new KeyTally());
        t.rows++;
        String value = rawValue.strip();
        if (!value.isEmpty()) {
            t.values.addTo(value, 1);
        }
    }

    void addAll(SpecTally other) {
        for (Map.Entry<String, KeyTally> e : other.keys.entrySet()) {
            KeyTally mine = keys.computeIfAbsent(e.getKey(), k -> new KeyTally());
            mine.rows += e.getValue().rows;
            for (Object2LongMap.Entry<String> v : e.getValue().values.object2LongEntrySet()) {
                mine.values.addTo(v.getKey(), v.getLongValue());
            }
        }
    }
}
