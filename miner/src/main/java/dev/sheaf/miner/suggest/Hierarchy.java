package dev.sheaf.miner.suggest;

import dev.sheaf.miner.ingest.EvidenceIndex;
import dev.sheaf.miner.mine.Harvest;
import it.unimi.dsi.fastutil.longs.Long2IntOpenHashMap;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/** The hierarchy kinds: facet proposals from spec keys, head–modifier parents, and co-occurrence subsumption. */
final class Hierarchy {
    /** Parents kept per child from subsumption, best first. */
    static final int PARENTS_PER_CHILD = 3;
    /** A spec facet with at least this share of distinct values per row is free text or ids, not a facet. */
    static final double MAX_DISTINCT_SHARE = 0.8;
    /** Spec rows a facet needs before it is proposed. */
    static final int MIN_FACET_ROWS = 10;

    private Hierarchy() {
    }

    static List<HierarchySuggestion> run(Catalog c, Corpus.Result corpus, SuggestOptions o,
                                         Map<HierarchySuggestion.Kind, Integer> found, List<String> notes, EvidenceIndex index) {
        List<HierarchySuggestion> out = new ArrayList<>();
        if (o.hierarchyKinds().contains(HierarchySuggestion.Kind.FACET_VALUE)) {
            found.put(HierarchySuggestion.Kind.FACET_VALUE, facets(c, out, o, index));
        }
        if (o.hierarchyKinds().contains(HierarchySuggestion.Kind.HEAD_MODIFIER)) {
            found.put(HierarchySuggestion.Kind.HEAD_MODIFIER, headModifier(c, out, o, index));
        }
        if (o.hierarchyKinds().contains(HierarchySuggestion.Kind.SUBSUMPTION)) {
            if (corpus == null) {
                notes.add("subsumption: not run, it needs the listings (co-occurrence is counted per listing)");
            } else {
                found.put(HierarchySuggestion.Kind.SUBSUMPTION, subsumption(c, corpus, out, o, index));
            }
        }
        return out;
    }

    private static HierarchySuggestion.Node node(Catalog c, int i) {
        return new HierarchySuggestion.Node(c.terms[i], c.shown[i], null, false);
    }

    /** Each spec facet with repeated, non-numeric values: the facet, with each value under it. */
    private static int facets(Catalog c, List<HierarchySuggestion> out, SuggestOptions o, EvidenceIndex index) {
        int n = 0;
        for (Harvest.SpecFacet f : c.harvest.specFacets()) {
            if (f.rows() < MIN_FACET_ROWS || f.values().size() < 2 || f.distinctValues() > MAX_DISTINCT_SHARE * f.rows()) {
                continue;
            }
            if (f.numeric() != null && f.numeric().rows() * 2 >= f.rows()) {
                continue; // a numeric facet: its values are quantities, not concepts
            }
            StringBuilder keys = new StringBuilder();
            for (int k = 0; k < Math.min(3, f.keys().size()); k++) {
                keys.append(k == 0 ? "" : " / ").append(f.keys().get(k).key());
            }
            HierarchySuggestion.Node parent = new HierarchySuggestion.Node(f.name(), keys.toString(), null, true);
            long top = f.values().get(0).rows();
            for (Harvest.SpecValueCount v : f.values()) {
                if (v.si() != null || v.rows() < 2) {
                    continue;
                }
                String form = c.formOf(v.value());
                if (form == null || form.equals(f.name())) {
                    continue;
                }
                double size = Math.min(1, f.rows() / (0.1 * c.listings));
                double score = 0.5 + 0.25 * size + 0.2 * ((double) v.rows() / top);
                int i = c.indexOf(form);
                String why = String.format(Locale.ROOT, "spec key '%s' (%d rows, %d distinct values) as a facet; \"%s\" is written under it in %d rows",
                        keys, f.rows(), f.distinctValues(), v.value(), v.rows());
                out.add(new HierarchySuggestion(HierarchySuggestion.Kind.FACET_VALUE, parent,
                        new HierarchySuggestion.Node(form, v.value(), null, false), Kinds.clamp(score), why,
                        new HierarchySuggestion.Counts(f.rows(), i >= 0 ? c.df[i] : v.rows(), v.rows()),
                        i < 0 ? List.of() : Suggester.evidence(c, List.of(form), List.of(), Math.min(1, o.evidenceLines()), index)));
                n++;
            }
        }
        return n;
    }

    /**
     * A multiword term under the longest shorter term it ends with ("two way zipper" under "zipper",
     * "800 fill down" under "down"), skipping an ending that is only ever a fragment of longer terms
     * ("way zipper", seen almost only inside "two way zipper" and "2 way zipper").
     */
    private static int headModifier(Catalog c, List<HierarchySuggestion> out, SuggestOptions o, EvidenceIndex index) {
        // how many listings hold an ending inside a longer candidate: sum of df of candidates one word longer that end with it
        long[] inside = new long[c.size()];
        for (int i = 0; i < c.size(); i++) {
            String[] t = c.tokens[i];
            if (t.length < 2) {
                continue;
            }
            int j = c.indexOf(String.join(" ", Arrays.copyOfRange(t, 1, t.length)));
            if (j >= 0) {
                inside[j] += c.df[i];
            }
        }
        int n = 0;
        for (int i = 0; i < c.size(); i++) {
            String[] t = c.tokens[i];
            if (t.length < 2) {
                continue;
            }
            for (int k = 1; k < t.length; k++) {
                int j = c.indexOf(String.join(" ", Arrays.copyOfRange(t, k, t.length)));
                if (j < 0 || c.df[j] < c.df[i] || inside[j] >= 0.8 * c.df[j] && k < t.length - 1) {
                    continue;
                }
                String modifier = String.join(" ", Arrays.copyOfRange(t, 0, k));
                double share = (double) c.df[i] / c.df[j];
                double score = 0.6 + 0.3 * (1 - share);
                String why = String.format(Locale.ROOT, "\"%s\" is \"%s\" with the modifier \"%s\" (same head word); %d of the %d listings with \"%s\" say \"%s\"",
                        c.shown[i], c.shown[j], modifier, c.df[i], c.df[j], c.terms[j], c.terms[i]);
                out.add(new HierarchySuggestion(HierarchySuggestion.Kind.HEAD_MODIFIER, node(c, j), node(c, i), Kinds.clamp(score), why,
                        new HierarchySuggestion.Counts(c.df[j], c.df[i], c.df[i]),
                        Suggester.evidence(c, List.of(c.terms[i]), List.of(), Math.min(1, o.evidenceLines()), index)));
                n++;
                break;
            }
        }
        return n;
    }

    /**
     * Sanderson &amp; Croft 1999 ("Deriving concept hierarchies from text", SIGIR): x subsumes y when
     * P(x|y) ≥ t and P(y|x) &lt; 1, over listings. Children need {@code minHierarchyDf} listings;
     * parents in more than {@code maxParentDfShare} of the listings are too general. Terms that hold
     * one another or share a group key are left to the other kinds.
     */
    private static int subsumption(Catalog c, Corpus.Result corpus, List<HierarchySuggestion> out, SuggestOptions o, EvidenceIndex index) {
        int m = c.size();
        long listings = Math.max(1, corpus.listings());
        long[] df = new long[m];
        for (int[] d : corpus.docs()) {
            for (int x : d) {
                df[x]++;
            }
        }
        boolean[] ok = new boolean[m];
        for (int i = 0; i < m; i++) {
            ok[i] = df[i] >= o.minHierarchyDf();
        }
        Long2IntOpenHashMap both = new Long2IntOpenHashMap();
        int[] buf = new int[64];
        for (int[] d : corpus.docs()) {
            int k = 0;
            for (int x : d) {
                if (ok[x]) {
                    if (k == buf.length) {
                        buf = Arrays.copyOf(buf, k * 2);
                    }
                    buf[k++] = x;
                }
            }
            for (int a = 0; a < k; a++) {
                for (int b = a + 1; b < k; b++) {
                    both.addTo(((long) buf[a] << 32) | buf[b], 1);
                }
            }
        }
        double t = o.subsumption();
        List<List<HierarchySuggestion>> perChild = new ArrayList<>(m);
        for (int i = 0; i < m; i++) {
            perChild.add(null);
        }
        long[] keys = both.keySet().toLongArray();
        Arrays.sort(keys);
        for (long key : keys) {
            int a = (int) (key >>> 32);
            int b = (int) key;
            int n = both.get(key);
            consider(c, a, b, n, df, listings, t, o, perChild);
            consider(c, b, a, n, df, listings, t, o, perChild);
        }
        int count = 0;
        for (int y = 0; y < m; y++) {
            List<HierarchySuggestion> l = perChild.get(y);
            if (l == null) {
                continue;
            }
            l.sort((p, q) -> p.score() != q.score() ? Double.compare(q.score(), p.score()) : p.key().compareTo(q.key()));
            for (int k = 0; k < Math.min(PARENTS_PER_CHILD, l.size()); k++) {
                HierarchySuggestion h = l.get(k);
                out.add(new HierarchySuggestion(h.kind(), h.parent(), h.child(), h.score(), h.reason(), h.counts(),
                        Suggester.evidence(c, List.of(h.child().term()), List.of(), Math.min(1, o.evidenceLines()), index)));
                count++;
            }
        }
        return count;
    }

    /** Whether parent x subsumes child y, given n listings with both. */
    private static void consider(Catalog c, int x, int y, int n, long[] df, long listings, double t, SuggestOptions o,
                                 List<List<HierarchySuggestion>> perChild) {
        double pxy = (double) n / df[y];
        double pyx = (double) n / df[x];
        if (pxy < t || pyx >= 1 || (double) df[x] / listings > o.maxParentDfShare() || ContextVectors.related(c, x, y)) {
            return;
        }
        double score = 0.5 + 0.4 * Math.min(1, (pxy - t) / Math.max(1e-9, 1 - t) * 0.5 + 0.5) * (1 - pyx);
        String why = String.format(Locale.ROOT, "subsumption: %d of the %d listings with \"%s\" also have \"%s\" (P = %.2f ≥ %.2f), "
                + "but only %d of its %d do (P = %.2f)", n, df[y], c.terms[y], c.terms[x], pxy, t, n, df[x], pyx);
        if (perChild.get(y) == null) {
            perChild.set(y, new ArrayList<>());
        }
        perChild.get(y).add(new HierarchySuggestion(HierarchySuggestion.Kind.SUBSUMPTION, node(c, x), node(c, y), Kinds.clamp(score), why,
                new HierarchySuggestion.Counts(df[x], df[y], n), List.of()));
    }
}
