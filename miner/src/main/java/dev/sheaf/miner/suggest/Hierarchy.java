package dev.sheaf.miner.suggest;

import dev.sheaf.miner.ingest.EvidenceIndex;
import dev.sheaf.miner.mine.Harvest;
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
    static final double MAX_DISTINCT_SHARE = 0.5;
    /** Spec rows a facet needs before it is proposed. */
    static final int MIN_FACET_ROWS = 10;

    private Hierarchy() {
    }

    static List<HierarchySuggestion> run(Catalog c, Corpus.Result corpus, SuggestOptions o,
                                         Map<HierarchySuggestion.Kind, Integer> found, List<String> notes, EvidenceIndex index) {
        List<HierarchySuggestion> out = new ArrayList<>();
        Kinds.Timer time = new Kinds.Timer();
        if (o.hierarchyKinds().contains(HierarchySuggestion.Kind.FACET_VALUE)) {
            found.put(HierarchySuggestion.Kind.FACET_VALUE, facets(c, out, o, index));
        }
        time.lap("facets");
        if (o.hierarchyKinds().contains(HierarchySuggestion.Kind.HEAD_MODIFIER)) {
            found.put(HierarchySuggestion.Kind.HEAD_MODIFIER, headModifier(c, out, o, index));
        }
        time.lap("head-modifier");
        if (o.hierarchyKinds().contains(HierarchySuggestion.Kind.SUBSUMPTION)) {
            if (corpus == null) {
                notes.add("subsumption: not run, it needs the listings (co-occurrence is counted per listing)");
            } else {
                found.put(HierarchySuggestion.Kind.SUBSUMPTION, subsumption(c, corpus, out, o, index));
            }
        }
        time.lap("subsumption");
        notes.add("time: " + time);
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
                if (form == null || form.equals(f.name()) || mostlyNumbers(form)) {
                    continue; // "183 cm x 51 cm": a measurement, not a concept
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
                // a child seen in many listings is a kind worth a concept; a number in the modifier is more often a value than a kind
                double score = 0.55 + 0.35 * Math.min(1, Math.log1p(c.df[i]) / Math.log1p(50)) - (mostlyNumbers(modifier) ? 0.15 : 0);
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
        boolean[] child = new boolean[m];
        boolean[] parent = new boolean[m];
        for (int i = 0; i < m; i++) {
            child[i] = df[i] >= o.minHierarchyDf() && !mostlyNumbers(c.terms[i]);
            parent[i] = child[i] && (double) df[i] / listings <= o.maxParentDfShare();
        }
        double t = o.subsumption();
        int count = 0;
        // for each child, count its co-occurring parents over its own listings: an array counter, no pair table
        int[][] postings = ContextVectors.postings(m, corpus);
        int[] both = new int[m];
        int[] touched = new int[m];
        for (int y = 0; y < m; y++) {
            if (!child[y]) {
                continue;
            }
            int nt = 0;
            for (int doc : postings[y]) {
                for (int x : corpus.docs().get(doc)) {
                    if (x != y && parent[x]) {
                        if (both[x]++ == 0) {
                            touched[nt++] = x;
                        }
                    }
                }
            }
            Arrays.sort(touched, 0, nt);
            List<double[]> best = new ArrayList<>();
            for (int k = 0; k < nt; k++) {
                int x = touched[k];
                double score = score(c, x, y, both[x], df, t);
                if (score > 0) {
                    best.add(new double[] {score, x, both[x]});
                }
                both[x] = 0;
            }
            best.sort((p, q) -> p[0] != q[0] ? Double.compare(q[0], p[0]) : Double.compare(p[1], q[1]));
            for (int k = 0; k < Math.min(PARENTS_PER_CHILD, best.size()); k++) {
                int x = (int) best.get(k)[1];
                int n = (int) best.get(k)[2];
                double pxy = (double) n / df[y];
                double pyx = (double) n / df[x];
                String why = String.format(Locale.ROOT, "subsumption: %d of the %d listings with \"%s\" also have \"%s\" (P = %.2f ≥ %.2f), "
                        + "but only %d of its %d do (P = %.2f)", n, df[y], c.terms[y], c.terms[x], pxy, t, n, df[x], pyx);
                out.add(new HierarchySuggestion(HierarchySuggestion.Kind.SUBSUMPTION, node(c, x), node(c, y), best.get(k)[0], why,
                        new HierarchySuggestion.Counts(df[x], df[y], n),
                        Suggester.evidence(c, List.of(c.terms[y]), List.of(), Math.min(1, o.evidenceLines()), index)));
                count++;
            }
        }
        return count;
    }

    /** Whether half or more of the words hold a digit. */
    static boolean mostlyNumbers(String term) {
        String[] t = term.split(" ");
        int d = 0;
        for (String w : t) {
            for (int k = 0; k < w.length(); k++) {
                if (Character.isDigit(w.charAt(k))) {
                    d++;
                    break;
                }
            }
        }
        return d * 2 >= t.length;
    }

    /** The score of parent x over child y with n listings together, or 0 when x does not subsume y. */
    private static double score(Catalog c, int x, int y, int n, long[] df, double t) {
        double pxy = (double) n / df[y];
        double pyx = (double) n / df[x];
        if (pxy < t || pyx >= 1 || ContextVectors.related(c, x, y)) {
            return 0;
        }
        // surer the closer P(parent|child) is to 1 and the less the parent needs the child
        return Kinds.clamp(0.5 + 0.4 * Math.min(1, (pxy - t) / Math.max(1e-9, 1 - t) * 0.5 + 0.5) * (1 - pyx));
    }
}
