package dev.sheaf.miner.measure;

import java.util.List;

/**
 * Krippendorff's alpha by the coincidence-matrix method of Krippendorff (2011), "Computing
 * Krippendorff's Alpha-Reliability", U. Penn ASC paper 43:
 * <ol>
 *   <li>drop units with fewer than two pairable values;</li>
 *   <li>coincidences o_ck = Σ_u (number of c–k pairs of values in u) / (m_u − 1), pairs ordered,
 *       so o is symmetric and Σ_k o_ck = n_c, Σ_c n_c = n;</li>
 *   <li>α = 1 − (n − 1) · Σ_c Σ_k o_ck δ²_ck / Σ_c Σ_k n_c n_k δ²_ck.</li>
 * </ol>
 * The ordinal δ² depends on the marginals n_g, so it is recomputed for every matrix (also for each
 * bootstrap replicate). Alpha is undefined when no unit is pairable or when the expected
 * disagreement is 0 (every pairable value the same: the data hold no information about reliability).
 *
 * <p>Units keep their coincidence contributions as sparse (c, k, weight) lists so that a bootstrap
 * replicate only adds up weighted contributions.
 */
final class KrippendorffAlpha {
    private final AgreementMetric metric;
    private final double[] numbers;
    private final int categories;
    /** Per pairable unit: flattened (c, k) pairs and their weights. */
    private final int[][] pairCats;
    private final double[][] pairWeights;
    private final int pairableValues;

    /**
     * @param units      each unit's values as category indices (any length; units with fewer than two are dropped)
     * @param categories number of categories
     * @param numbers    each category's number (ignored by the nominal metric; rank order is the index order)
     */
    KrippendorffAlpha(List<int[]> units, int categories, double[] numbers, AgreementMetric metric) {
        this.metric = metric;
        this.numbers = numbers.clone();
        this.categories = categories;
        int pairable = 0;
        for (int[] u : units) {
            if (u.length >= 2) {
                pairable++;
            }
        }
        pairCats = new int[pairable][];
        pairWeights = new double[pairable][];
        int values = 0;
        int p = 0;
        int[] count = new int[categories];
        int[] present = new int[categories];
        for (int[] u : units) {
            if (u.length < 2) {
                continue;
            }
            values += u.length;
            int distinct = 0;
            for (int c : u) {
                if (count[c]++ == 0) {
                    present[distinct++] = c;
                }
            }
            java.util.Arrays.sort(present, 0, distinct);
            int[] cats = new int[2 * distinct * distinct];
            double[] w = new double[distinct * distinct];
            int j = 0;
            double mMinus1 = u.length - 1;
            for (int a = 0; a < distinct; a++) {
                int c = present[a];
                for (int b = 0; b < distinct; b++) {
                    int k = present[b];
                    cats[2 * j] = c;
                    cats[2 * j + 1] = k;
                    w[j] = (c == k ? (double) count[c] * (count[c] - 1) : (double) count[c] * count[k]) / mMinus1;
                    j++;
                }
            }
            for (int a = 0; a < distinct; a++) {
                count[present[a]] = 0;
            }
            pairCats[p] = cats;
            pairWeights[p] = w;
            p++;
        }
        pairableValues = values;
    }

    int pairableUnits() {
        return pairCats.length;
    }

    /** Alpha over all pairable units. */
    KrippendorffResult result() {
        return fromCoincidences(coincidences(null), pairCats.length, pairableValues);
    }

    /** Alpha of a bootstrap replicate: unit i taken {@code draws[i]} times; NaN when undefined. */
    double alphaOfDraws(int[] draws) {
        return fromCoincidences(coincidences(draws), 0, 0).alpha();
    }

    /** The observed coincidence matrix (for tests and the observed agreement). */
    double[][] coincidences(int[] draws) {
        double[][] o = new double[categories][categories];
        for (int u = 0; u < pairCats.length; u++) {
            int times = draws == null ? 1 : draws[u];
            if (times == 0) {
                continue;
            }
            int[] cats = pairCats[u];
            double[] w = pairWeights[u];
            for (int j = 0; j < w.length; j++) {
                o[cats[2 * j]][cats[2 * j + 1]] += times * w[j];
            }
        }
        return o;
    }

    /** Σ_c o_cc / n: the share of pairable value pairs that match exactly; NaN when none. */
    double observedAgreement() {
        double[][] o = coincidences(null);
        double same = 0;
        double n = 0;
        for (int c = 0; c < categories; c++) {
            same += o[c][c];
            for (int k = 0; k < categories; k++) {
                n += o[c][k];
            }
        }
        return n == 0 ? Double.NaN : same / n;
    }

    private KrippendorffResult fromCoincidences(double[][] o, int units, int values) {
        double[] nc = new double[categories];
        double n = 0;
        for (int c = 0; c < categories; c++) {
            for (int k = 0; k < categories; k++) {
                nc[c] += o[c][k];
            }
            n += nc[c];
        }
        if (n == 0) {
            return new KrippendorffResult(Double.NaN, metric, Double.NaN, Double.NaN, units, values,
                    "no item has two or more judgments");
        }
        double[][] d2 = deltaSquared(nc);
        double observed = 0;
        double expected = 0;
        for (int c = 0; c < categories; c++) {
            for (int k = 0; k < categories; k++) {
                if (c != k && d2[c][k] != 0) {
                    observed += o[c][k] * d2[c][k];
                    expected += nc[c] * nc[k] * d2[c][k];
                }
            }
        }
        double dObserved = observed / n;
        double dExpected = expected / (n * (n - 1));
        if (expected == 0) {
            return new KrippendorffResult(Double.NaN, metric, dObserved, dExpected, units, values,
                    "no variation: every pairable judgment has the same value");
        }
        double alpha = 1 - (n - 1) * observed / expected;
        return new KrippendorffResult(alpha, metric, dObserved, dExpected, units, values, "");
    }

    /** δ²_ck for the metric; the ordinal one uses the marginals {@code nc}. */
    private double[][] deltaSquared(double[] nc) {
        double[][] d = new double[categories][categories];
        switch (metric) {
            case NOMINAL -> {
                for (int c = 0; c < categories; c++) {
                    for (int k = 0; k < categories; k++) {
                        d[c][k] = c == k ? 0 : 1;
                    }
                }
            }
            case ORDINAL -> {
                // Σ_{g=c..k} n_g − (n_c + n_k)/2, with prefix sums over the rank order.
                double[] prefix = new double[categories + 1];
                for (int g = 0; g < categories; g++) {
                    prefix[g + 1] = prefix[g] + nc[g];
                }
                for (int c = 0; c < categories; c++) {
                    for (int k = c + 1; k < categories; k++) {
                        double s = prefix[k + 1] - prefix[c] - (nc[c] + nc[k]) / 2;
                        d[c][k] = s * s;
                        d[k][c] = s * s;
                    }
                }
            }
            case INTERVAL -> {
                for (int c = 0; c < categories; c++) {
                    for (int k = 0; k < categories; k++) {
                        double diff = numbers[c] - numbers[k];
                        d[c][k] = diff * diff;
                    }
                }
            }
            case RATIO -> {
                for (int c = 0; c < categories; c++) {
                    for (int k = 0; k < categories; k++) {
                        double sum = numbers[c] + numbers[k];
                        double q = sum == 0 ? 0 : (numbers[c] - numbers[k]) / sum;
                        d[c][k] = q * q;
                    }
                }
            }
            default -> throw new AssertionError(metric);
        }
        return d;
    }
}
