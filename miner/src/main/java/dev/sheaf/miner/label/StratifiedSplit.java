package dev.sheaf.miner.label;

import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;
import java.util.Random;

/**
 * Multi-label stratified splitting by iterative stratification: Sechidis, Tsoumakas &amp; Vlahavas
 * (2011), "On the stratification of multi-label data", ECML PKDD 2011, LNCS 6913, Algorithm 1.
 *
 * <p>The algorithm, as implemented here step by step:
 * <ol>
 *   <li>Desired size of subset j: c<sub>j</sub> = |D|·r<sub>j</sub>; desired examples of label i in
 *       subset j: c<sub>ij</sub> = |D<sub>i</sub>|·r<sub>j</sub> (real numbers, never rounded).</li>
 *   <li>While examples remain: take the label with the fewest (but at least one) remaining examples,
 *       ties broken at random; for each of its remaining examples, pick the subset with the largest
 *       c<sub>ij</sub> for that label, ties broken by the largest c<sub>j</sub>, further ties at random;
 *       put the example there and decrement c<sub>j</sub> and c<sub>λj</sub> for every label λ of the
 *       example.</li>
 *   <li>Examples with no label at all are then given, one by one, to the subset with the largest
 *       remaining c<sub>j</sub> (ties at random), which brings every subset to its desired size.</li>
 * </ol>
 * "At random" is a {@link Random} seeded by the caller, so a split is reproducible: the same
 * examples in the same order with the same seed give the same split. Within one label the examples
 * are taken in their given order (the paper leaves this order open). See docs/decisions/104.
 */
public final class StratifiedSplit {
    private static final double TIE = 1e-9;

    private StratifiedSplit() {
    }

    /** A split's result: the subset of each example and the per-label counts per subset. */
    public record Result(int[] subsetOf, int[] sizes, int[][] labelCounts, double[] proportions) {
        public Result {
            subsetOf = subsetOf.clone();
            sizes = sizes.clone();
            labelCounts = Arrays.stream(labelCounts).map(int[]::clone).toArray(int[][]::new);
            proportions = proportions.clone();
        }

        /** How many examples went to subset j. */
        public int size(int j) {
            return sizes[j];
        }

        /** How many positives of label i went to subset j. */
        public int count(int label, int j) {
            return labelCounts[label][j];
        }

        @Override
        public int[] subsetOf() {
            return subsetOf.clone();
        }
    }

    /**
     * Parses "80/10/10" (or "0.8/0.1/0.1", "70/30") into proportions summing to 1.
     *
     * @throws IllegalArgumentException naming the rule when the text is not two or more positive numbers separated by '/'
     */
    public static double[] parseProportions(String spec) {
        Objects.requireNonNull(spec, "spec");
        String[] parts = spec.split("/");
        if (parts.length < 2) {
            throw new IllegalArgumentException("a split is two or more parts separated by '/', such as 80/10/10; found \"" + spec + "\"");
        }
        double[] r = new double[parts.length];
        double sum = 0;
        for (int i = 0; i < parts.length; i++) {
            try {
                r[i] = Double.parseDouble(parts[i].strip());
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("split part \"" + parts[i] + "\" of \"" + spec + "\" is not a number; "
                        + "write the parts as numbers such as 80/10/10", e);
            }
            if (!(r[i] > 0) || !Double.isFinite(r[i])) {
                throw new IllegalArgumentException("every split part must be above 0, found \"" + parts[i] + "\" in \"" + spec + "\"");
            }
            sum += r[i];
        }
        for (int i = 0; i < r.length; i++) {
            r[i] /= sum;
        }
        return r;
    }

    /** The names of k subsets: train/test, train/validation/test, else fold-1 … fold-k. */
    public static List<String> subsetNames(int k) {
        if (k == 2) {
            return List.of("train", "test");
        }
        if (k == 3) {
            return List.of("train", "validation", "test");
        }
        String[] n = new String[k];
        for (int i = 0; i < k; i++) {
            n[i] = "fold-" + (i + 1);
        }
        return List.of(n);
    }

    /**
     * Splits examples into subsets with the given proportions.
     *
     * @param labels      per example, the labels it carries (indices in [0, labelCount); order and duplicates do not matter)
     * @param labelCount  number of labels
     * @param proportions subset proportions, positive, summing to 1 (see {@link #parseProportions})
     * @param seed        seed of the tie-breaking random generator
     */
    public static Result split(int[][] labels, int labelCount, double[] proportions, long seed) {
        Objects.requireNonNull(labels, "labels");
        int k = proportions.length;
        if (k < 2) {
            throw new IllegalArgumentException("a split needs at least two subsets, got " + k);
        }
        double total = 0;
        for (double p : proportions) {
            if (!(p > 0)) {
                throw new IllegalArgumentException("proportions must be above 0, got " + Arrays.toString(proportions));
            }
            total += p;
        }
        if (Math.abs(total - 1) > 1e-9) {
            throw new IllegalArgumentException("proportions must sum to 1, got " + Arrays.toString(proportions));
        }
        int n = labels.length;
        int[][] ys = new int[n][];
        IntArrayList[] examplesOf = new IntArrayList[labelCount];
        for (int i = 0; i < labelCount; i++) {
            examplesOf[i] = new IntArrayList();
        }
        for (int x = 0; x < n; x++) {
            int[] y = Arrays.stream(labels[x]).distinct().sorted().toArray();
            for (int l : y) {
                if (l < 0 || l >= labelCount) {
                    throw new IllegalArgumentException("example " + x + " has label " + l + ", outside [0, " + labelCount + ")");
                }
                examplesOf[l].add(x);
            }
            ys[x] = y;
        }
        // step 1: desired counts
        double[] c = new double[k];
        for (int j = 0; j < k; j++) {
            c[j] = n * proportions[j];
        }
        double[][] cl = new double[labelCount][k];
        int[] remaining = new int[labelCount];
        for (int i = 0; i < labelCount; i++) {
            remaining[i] = examplesOf[i].size();
            for (int j = 0; j < k; j++) {
                cl[i][j] = remaining[i] * proportions[j];
            }
        }
        Random rng = new Random(seed);
        int[] subset = new int[n];
        Arrays.fill(subset, -1);
        IntArrayList ties = new IntArrayList();
        IntArrayList subsetTies = new IntArrayList();
        // step 2: labelled examples, rarest label first
        while (true) {
            ties.clear();
            int min = Integer.MAX_VALUE;
            for (int i = 0; i < labelCount; i++) {
                int r = remaining[i];
                if (r > 0 && r <= min) {
                    if (r < min) {
                        ties.clear();
                        min = r;
                    }
                    ties.add(i);
                }
            }
            if (ties.isEmpty()) {
                break;
            }
            int l = ties.size() == 1 ? ties.getInt(0) : ties.getInt(rng.nextInt(ties.size()));
            IntArrayList dl = examplesOf[l];
            for (int q = 0; q < dl.size(); q++) {
                int x = dl.getInt(q);
                if (subset[x] >= 0) {
                    continue;
                }
                int m = pick(cl[l], c, rng, subsetTies);
                subset[x] = m;
                for (int lambda : ys[x]) {
                    cl[lambda][m] -= 1;
                    remaining[lambda]--;
                }
                c[m] -= 1;
            }
        }
        // step 3: examples without labels fill the subsets to their desired sizes
        for (int x = 0; x < n; x++) {
            if (subset[x] < 0) {
                int m = pick(c, null, rng, subsetTies);
                subset[x] = m;
                c[m] -= 1;
            }
        }
        int[] sizes = new int[k];
        int[][] counts = new int[labelCount][k];
        for (int x = 0; x < n; x++) {
            sizes[subset[x]]++;
            for (int l : ys[x]) {
                counts[l][subset[x]]++;
            }
        }
        return new Result(subset, sizes, counts, proportions);
    }

    /** argmax of {@code primary}, ties by argmax of {@code secondary} (when given), further ties at random. */
    private static int pick(double[] primary, double[] secondary, Random rng, IntArrayList ties) {
        ties.clear();
        double best = Double.NEGATIVE_INFINITY;
        for (int j = 0; j < primary.length; j++) {
            double v = primary[j];
            if (v > best + TIE) {
                best = v;
                ties.clear();
                ties.add(j);
            } else if (Math.abs(v - best) <= TIE) {
                ties.add(j);
            }
        }
        if (ties.size() > 1 && secondary != null) {
            double b2 = Double.NEGATIVE_INFINITY;
            IntArrayList keep = new IntArrayList(ties.size());
            for (int q = 0; q < ties.size(); q++) {
                double v = secondary[ties.getInt(q)];
                if (v > b2 + TIE) {
                    b2 = v;
                    keep.clear();
                    keep.add(ties.getInt(q));
                } else if (Math.abs(v - b2) <= TIE) {
                    keep.add(ties.getInt(q));
                }
            }
            ties.clear();
            ties.addAll(keep);
        }
        return ties.size() == 1 ? ties.getInt(0) : ties.getInt(rng.nextInt(ties.size()));
    }
}
