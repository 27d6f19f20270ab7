package dev.sheaf.miner.measure;

import java.util.Arrays;
import java.util.Random;

/**
 * Bootstrap of Krippendorff's alpha over units. Each replicate draws as many units as there are
 * pairable units, uniformly with replacement, keeps each drawn unit with all its values, rebuilds
 * the coincidence matrix (so n, the marginals, the ordinal distances and D_e are those of the
 * replicate) and computes alpha. The interval is the percentile interval of the defined replicate
 * alphas, with quantiles by linear interpolation between order statistics (Hyndman &amp; Fan 1996,
 * definition 7). Replicates come from {@link java.util.Random}, whose sequence the Java
 * specification fixes, so a seed gives the same interval on every platform and Java version.
 */
final class BootstrapAlpha {
    private BootstrapAlpha() {
    }

    /** The seed for one attribute: the run's seed XOR the attribute's {@link String#hashCode()}. */
    static long seedFor(long seed, String attribute) {
        return seed ^ attribute.hashCode();
    }

    static BootstrapInterval interval(KrippendorffAlpha alpha, int replicates, double level, long seed) {
        int units = alpha.pairableUnits();
        if (replicates == 0 || units == 0) {
            return BootstrapInterval.none(level, replicates, seed);
        }
        Random random = new Random(seed);
        double[] values = new double[replicates];
        int usable = 0;
        int[] draws = new int[units];
        for (int r = 0; r < replicates; r++) {
            Arrays.fill(draws, 0);
            for (int i = 0; i < units; i++) {
                draws[random.nextInt(units)]++;
            }
            double a = alpha.alphaOfDraws(draws);
            if (!Double.isNaN(a)) {
                values[usable++] = a;
            }
        }
        if (usable == 0) {
            return new BootstrapInterval(Double.NaN, Double.NaN, level, replicates, 0, seed);
        }
        double[] sorted = Arrays.copyOf(values, usable);
        Arrays.sort(sorted);
        double tail = (1 - level) / 2;
        return new BootstrapInterval(quantile(sorted, tail), quantile(sorted, 1 - tail), level, replicates, usable, seed);
    }

    /** Hyndman &amp; Fan definition 7 (as R's and NumPy's default): x[h] interpolated at h = (N − 1) p. */
    static double quantile(double[] sorted, double p) {
        double h = (sorted.length - 1) * p;
        int lo = (int) Math.floor(h);
        int hi = Math.min(lo + 1, sorted.length - 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
    }
}
