package dev.sheaf.miner.suggest;

import it.unimi.dsi.fastutil.ints.Int2IntOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.longs.Long2IntMap;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Distributional similarity (docs/decisions/134-context-vectors.md): each candidate seen at least
 * {@code contextMinFrequency} times gets a sparse vector of the tokens up to {@code contextWindow}
 * positions to its left and right inside the segments it occurs in (left and right kept apart),
 * weighted by positive PMI with context-distribution smoothing (α = 0.75; Levy, Goldberg &amp; Dagan
 * 2015, TACL 3). Cosines are computed through an inverted index of the features, so only pairs that
 * share a feature are ever scored; features held by more than {@value #MAX_FEATURE_SPREAD} vectors
 * are left out of both the dot products and the norms (the cosine is exact over the kept features).
 * A pair is proposed when each is among the other's {@value #NEIGHBOURS} nearest and the cosine
 * reaches {@code minCosine}; terms that contain one another are left to the hierarchy.
 */
final class ContextVectors {
    static final double ALPHA = 0.75;
    static final int MAX_FEATURE_SPREAD = 2000;
    static final int NEIGHBOURS = 3;
    /** Occurrences with a context a candidate needs before its vector means anything. */
    static final int MIN_CONTEXTS = 5;
    /** Context tokens counted at which a cosine is trusted fully. */
    static final int FULL_CONTEXTS = 40;

    private ContextVectors() {
    }

    /** Sparse PPMI vectors: for each candidate with one, its features (sorted) and weights; null rows have none. */
    record Vectors(int[][] features, double[][] weights, double[] norms, double[] contexts) {
    }

    static Vectors vectors(int candidates, Corpus.Result corpus) {
        double[] rowSum = new double[candidates];
        Int2IntOpenHashMap colSum = new Int2IntOpenHashMap();
        double total = 0;
        for (Long2IntMap.Entry e : corpus.contexts().long2IntEntrySet()) {
            int c = (int) (e.getLongKey() >>> 32);
            int f = (int) e.getLongKey();
            rowSum[c] += e.getIntValue();
            colSum.addTo(f, e.getIntValue());
            total += e.getIntValue();
        }
        double smoothed = 0;
        for (int v : colSum.values()) {
            smoothed += Math.pow(v, ALPHA);
        }
        Int2IntOpenHashMap spread = new Int2IntOpenHashMap();
        IntArrayList[] fs = new IntArrayList[candidates];
        List<List<Double>> ws = new ArrayList<>(candidates);
        for (int i = 0; i < candidates; i++) {
            ws.add(null);
        }
        // sort keys so the arithmetic order, and so every bit of the result, never depends on hash order
        long[] keys = corpus.contexts().keySet().toLongArray();
        Arrays.sort(keys);
        for (long k : keys) {
            int c = (int) (k >>> 32);
            int f = (int) k;
            if (rowSum[c] < MIN_CONTEXTS) {
                continue;
            }
            double n = corpus.contexts().get(k);
            double pmi = Math.log((n / total) / ((rowSum[c] / total) * (Math.pow(colSum.get(f), ALPHA) / smoothed)));
            if (pmi <= 0) {
                continue;
            }
            if (fs[c] == null) {
                fs[c] = new IntArrayList();
                ws.set(c, new ArrayList<>());
            }
            fs[c].add(f);
            ws.get(c).add(pmi);
            spread.addTo(f, 1);
        }
        int[][] features = new int[candidates][];
        double[][] weights = new double[candidates][];
        double[] norms = new double[candidates];
        for (int c = 0; c < candidates; c++) {
            if (fs[c] == null) {
                continue;
            }
            IntArrayList keep = new IntArrayList();
            List<Double> keepW = new ArrayList<>();
            for (int k = 0; k < fs[c].size(); k++) {
                if (spread.get(fs[c].getInt(k)) <= MAX_FEATURE_SPREAD) {
                    keep.add(fs[c].getInt(k));
                    keepW.add(ws.get(c).get(k));
                }
            }
            if (keep.isEmpty()) {
                continue;
            }
            features[c] = keep.toIntArray();
            weights[c] = new double[keepW.size()];
            double s = 0;
            for (int k = 0; k < keepW.size(); k++) {
                weights[c][k] = keepW.get(k);
                s += keepW.get(k) * keepW.get(k);
            }
            norms[c] = Math.sqrt(s);
        }
        return new Vectors(features, weights, norms, rowSum);
    }

    /** Cosine of every pair of vectors that share a feature, as neighbour lists (best first). */
    static List<int[]> pairs(Vectors v, double minCosine) {
        int n = v.features().length;
        Map<Integer, IntArrayList> postings = new java.util.TreeMap<>();
        for (int c = 0; c < n; c++) {
            if (v.features()[c] == null) {
                continue;
            }
            for (int f : v.features()[c]) {
                postings.computeIfAbsent(f, k -> new IntArrayList()).add(c);
            }
        }
        List<int[]> out = new ArrayList<>();
        double[] dot = new double[n];
        IntArrayList touched = new IntArrayList();
        for (int a = 0; a < n; a++) {
            int[] fa = v.features()[a];
            if (fa == null) {
                continue;
            }
            touched.clear();
            for (int k = 0; k < fa.length; k++) {
                IntArrayList post = postings.get(fa[k]);
                for (int q = 0; q < post.size(); q++) {
                    int b = post.getInt(q);
                    if (b <= a) {
                        continue;
                    }
                    if (dot[b] == 0) {
                        touched.add(b);
                    }
                    dot[b] += v.weights()[a][k] * weightOf(v, b, fa[k]);
                }
            }
            for (int q = 0; q < touched.size(); q++) {
                int b = touched.getInt(q);
                double cos = dot[b] / (v.norms()[a] * v.norms()[b]);
                dot[b] = 0;
                if (cos >= minCosine) {
                    out.add(new int[] {a, b, (int) Math.round(cos * 1_000_000)});
                }
            }
        }
        return out;
    }

    /** Cosine of two candidates' vectors; 0 when either has none. */
    static double cosine(Vectors v, int a, int b) {
        int[] fa = v.features()[a];
        int[] fb = v.features()[b];
        if (fa == null || fb == null) {
            return 0;
        }
        double dot = 0;
        int i = 0;
        int j = 0;
        while (i < fa.length && j < fb.length) {
            if (fa[i] < fb[j]) {
                i++;
            } else if (fa[i] > fb[j]) {
                j++;
            } else {
                dot += v.weights()[a][i++] * v.weights()[b][j++];
            }
        }
        return dot / (v.norms()[a] * v.norms()[b]);
    }

    private static double weightOf(Vectors v, int c, int feature) {
        int k = Arrays.binarySearch(v.features()[c], feature);
        return k < 0 ? 0 : v.weights()[c][k];
    }

    static int run(Catalog c, Corpus.Result corpus, Vectors v, SuggestOptions o, Proposals p) {
        for (int i = 0; i < c.size(); i++) {
            if (v.features()[i] != null) {
                int[] f = v.features()[i];
                // features are added in sorted key order per candidate, so already sorted; keep the invariant explicit
                for (int k = 1; k < f.length; k++) {
                    if (f[k - 1] > f[k]) {
                        throw new IllegalStateException("context features out of order");
                    }
                }
            }
        }
        List<int[]> pairs = pairs(v, o.minCosine());
        // mutual nearest neighbours
        List<List<int[]>> nb = new ArrayList<>(c.size());
        for (int i = 0; i < c.size(); i++) {
            nb.add(new ArrayList<>());
        }
        for (int[] pr : pairs) {
            if (related(c, pr[0], pr[1]) || siblings(c, pr[0], pr[1])) {
                continue;
            }
            nb.get(pr[0]).add(pr);
            nb.get(pr[1]).add(pr);
        }
        java.util.Set<Long> top = new java.util.HashSet<>();
        for (int i = 0; i < c.size(); i++) {
            List<int[]> l = nb.get(i);
            l.sort((x, y) -> x[2] != y[2] ? Integer.compare(y[2], x[2]) : Integer.compare(x[0] + x[1], y[0] + y[1]));
            for (int k = 0; k < Math.min(NEIGHBOURS, l.size()); k++) {
                int[] pr = l.get(k);
                top.add(((long) pr[0] << 32) | pr[1]);
            }
        }
        int[][] docs = postings(c.size(), corpus);
        int n = 0;
        for (int[] pr : pairs) {
            long key = ((long) pr[0] << 32) | pr[1];
            if (related(c, pr[0], pr[1]) || siblings(c, pr[0], pr[1]) || !top.contains(key) || !mutual(nb, pr)) {
                continue;
            }
            double cos = pr[2] / 1e6;
            // a cosine over a handful of contexts says little: trust it in proportion to the thinner vector, up to FULL_CONTEXTS
            double trust = Math.min(1, Math.min(v.contexts()[pr[0]], v.contexts()[pr[1]]) / (double) FULL_CONTEXTS);
            long together = intersect(docs[pr[0]], docs[pr[1]]);
            Map<String, Double> fig = new LinkedHashMap<>();
            fig.put("cosine", cos);
            fig.put("listings together", (double) together);
            String why = String.format(Locale.ROOT, "used in the same contexts (PPMI cosine %.2f over %d and %d context tokens); in %d listing%s together",
                    cos, v.features()[pr[0]].length, v.features()[pr[1]].length, together, together == 1 ? "" : "s");
            p.addPair(Kinds.term(c, pr[0]), Kinds.term(c, pr[1]), new Suggestion.Support(Suggestion.Kind.DISTRIBUTIONAL,
                    Kinds.clamp(0.75 * cos * trust), why, fig), null);
            n++;
        }
        return n;
    }

    private static boolean mutual(List<List<int[]>> nb, int[] pr) {
        return rankOf(nb.get(pr[0]), pr) < NEIGHBOURS && rankOf(nb.get(pr[1]), pr) < NEIGHBOURS;
    }

    private static int rankOf(List<int[]> l, int[] pr) {
        for (int k = 0; k < l.size() && k < NEIGHBOURS; k++) {
            if (l.get(k) == pr) {
                return k;
            }
        }
        return Integer.MAX_VALUE;
    }

    /** Same group key, or one term's words inside the other's (a narrower term, not a synonym). */
    /**
     * Pairs the distributional kind leaves out: terms with digits (sizes, ratings: "8,500 btu" and
     * "10,600 btu" share every context and are different values).
     */
    static boolean siblings(Catalog c, int a, int b) {
        return hasDigit(c.terms[a]) || hasDigit(c.terms[b]);
    }

    private static boolean hasDigit(String s) {
        for (int i = 0; i < s.length(); i++) {
            if (Character.isDigit(s.charAt(i))) {
                return true;
            }
        }
        return false;
    }

    static boolean related(Catalog c, int a, int b) {
        if (c.groupKeys[a] != null && c.groupKeys[a].equals(c.groupKeys[b])) {
            return true;
        }
        String ta = " " + c.terms[a] + " ";
        String tb = " " + c.terms[b] + " ";
        return ta.contains(tb) || tb.contains(ta);
    }

    /** Listing numbers per candidate, ascending. */
    static int[][] postings(int candidates, Corpus.Result corpus) {
        int[] counts = new int[candidates];
        for (int[] d : corpus.docs()) {
            for (int x : d) {
                counts[x]++;
            }
        }
        int[][] out = new int[candidates][];
        for (int i = 0; i < candidates; i++) {
            out[i] = new int[counts[i]];
        }
        int[] fill = new int[candidates];
        for (int k = 0; k < corpus.docs().size(); k++) {
            for (int x : corpus.docs().get(k)) {
                out[x][fill[x]++] = k;
            }
        }
        return out;
    }

    static long intersect(int[] a, int[] b) {
        int i = 0;
        int j = 0;
        long n = 0;
        while (i < a.length && j < b.length) {
            if (a[i] < b[j]) {
                i++;
            } else if (a[i] > b[j]) {
                j++;
            } else {
                n++;
                i++;
                j++;
            }
        }
        return n;
    }
}
