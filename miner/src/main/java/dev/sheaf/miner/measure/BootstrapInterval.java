package dev.sheaf.miner.measure;

/**
 * A bootstrap confidence interval for alpha: the percentile interval over replicates that resample
 * whole units (items) with replacement, each with all of its pairable values. See
 * docs/decisions/070-alpha-bootstrap.md for the variant and its sources.
 *
 * @param low        lower end; NaN when no interval could be formed
 * @param high       upper end; NaN when no interval could be formed
 * @param level      the confidence level, e.g. 0.95
 * @param replicates replicates drawn (0: the interval was not asked for)
 * @param usable     replicates whose alpha was defined (a resample with no variation has none); the
 *                   percentiles are taken over these
 * @param seed       the seed the replicates were drawn with (after mixing in the attribute)
 */
public record BootstrapInterval(double low, double high, double level, int replicates, int usable, long seed) {
    /** How the interval is made, for files and reports. */
    public static final String METHOD = "percentile bootstrap over units (items resampled with replacement with "
            + "their pairable values; Efron & Tibshirani 1993)";

    public BootstrapInterval {
        if (!(level > 0 && level < 1)) {
            throw new IllegalArgumentException("level must lie in (0, 1), got " + level);
        }
        if (replicates < 0 || usable < 0 || usable > replicates) {
            throw new IllegalArgumentException("need 0 <= usable <= replicates, got " + usable + " of " + replicates);
        }
        if (Double.isNaN(low) != Double.isNaN(high) || (!Double.isNaN(low) && low > high)) {
            throw new IllegalArgumentException("interval ends must both be NaN or satisfy low <= high, got " + low + ", " + high);
        }
    }

    /** No interval (none asked for, or nothing to resample). */
    static BootstrapInterval none(double level, int replicates, long seed) {
        return new BootstrapInterval(Double.NaN, Double.NaN, level, replicates, 0, seed);
    }

    /** True when both ends are numbers. */
    public boolean defined() {
        return !Double.isNaN(low);
    }

    /** True when {@code value} lies within [low, high]. */
    public boolean contains(double value) {
        return defined() && value >= low && value <= high;
    }
}
