package dev.sheaf.miner.mine;

import it.unimi.dsi.fastutil.objects.Object2LongMap;
import it.unimi.dsi.fastutil.objects.Object2LongOpenHashMap;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/** Spec-table rows → facet candidates: raw keys clustered, values merged and counted, quantities summarised. */
final class SpecFacets {
    private SpecFacets() {
    }

    static List<Harvest.SpecFacet> build(SpecTally tally, int valuesPerFacet) {
        Map<String, Long> rawCounts = new TreeMap<>();
        tally.keys.forEach((k, t) -> rawCounts.put(k, t.rows));
        // groups are independent (each parses its own distinct values as quantities): built on all cores
        List<Integrations.KeyGroup> groups = Integrations.clusterKeys(rawCounts);
        Harvest.SpecFacet[] built = new Harvest.SpecFacet[groups.size()];
        java.util.stream.IntStream.range(0, built.length).parallel()
                .forEach(i -> built[i] = facet(groups.get(i), tally, valuesPerFacet));
        List<Harvest.SpecFacet> out = new ArrayList<>();
        for (Harvest.SpecFacet f : built) {
            if (f != null) {
                out.add(f);
            }
        }
        out.sort(Comparator.comparingLong(Harvest.SpecFacet::rows).reversed().thenComparing(Harvest.SpecFacet::name));
        return out;
    }

    /** The facet of one key group, or null when none of its keys occurred. */
    private static Harvest.SpecFacet facet(Integrations.KeyGroup g, SpecTally tally, int valuesPerFacet) {
        long rows = 0;
        List<Harvest.SpecKeyCount> keys = new ArrayList<>();
        Object2LongOpenHashMap<String> values = new Object2LongOpenHashMap<>();
        for (String member : g.members()) {
            SpecTally.KeyTally t = tally.keys.get(member);
            if (t == null) {
                continue;
            }
            rows += t.rows;
            keys.add(new Harvest.SpecKeyCount(member, t.rows));
            for (Object2LongMap.Entry<String> e : t.values.object2LongEntrySet()) {
                values.addTo(e.getKey(), e.getLongValue());
            }
        }
        if (keys.isEmpty()) {
            return null;
        }
        keys.sort(Comparator.comparingLong(Harvest.SpecKeyCount::rows).reversed().thenComparing(Harvest.SpecKeyCount::key));
        List<Object2LongMap.Entry<String>> entries = new ArrayList<>(values.object2LongEntrySet());
        entries.sort(Comparator.<Object2LongMap.Entry<String>>comparingLong(Object2LongMap.Entry::getLongValue).reversed()
                .thenComparing(Object2LongMap.Entry::getKey));
        List<Harvest.SpecValueCount> top = new ArrayList<>();
        Map<String, long[]> dimensionRows = new TreeMap<>();
        Map<String, double[]> ranges = new HashMap<>();
        Map<String, String> baseUnits = new HashMap<>();
        for (int i = 0; i < entries.size(); i++) {
            Object2LongMap.Entry<String> e = entries.get(i);
            Optional<Integrations.QuantityValue> q = Integrations.quantity(e.getKey());
            if (q.isPresent()) {
                Integrations.QuantityValue v = q.get();
                dimensionRows.computeIfAbsent(v.dimension(), d -> new long[1])[0] += e.getLongValue();
                double[] r = ranges.computeIfAbsent(v.dimension(), d -> new double[] {Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY});
                r[0] = Math.min(r[0], v.si());
                r[1] = Math.max(r[1], v.si());
                baseUnits.put(v.dimension(), v.baseUnit());
            }
            if (i < valuesPerFacet) {
                top.add(new Harvest.SpecValueCount(e.getKey(), e.getLongValue(),
                        q.map(Integrations.QuantityValue::si).orElse(null),
                        q.map(Integrations.QuantityValue::baseUnit).orElse(null)));
            }
        }
        Harvest.NumericSummary numeric = null;
        String best = null;
        for (Map.Entry<String, long[]> d : dimensionRows.entrySet()) {
            if (best == null || d.getValue()[0] > dimensionRows.get(best)[0]) {
                best = d.getKey();
            }
        }
        if (best != null) {
            double[] r = ranges.get(best);
            numeric = new Harvest.NumericSummary(best, baseUnits.get(best), dimensionRows.get(best)[0], r[0], r[1]);
        }
        return new Harvest.SpecFacet(g.name(), rows, keys, values.size(), top, numeric);
    }
}
