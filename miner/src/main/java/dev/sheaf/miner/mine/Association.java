package dev.sheaf.miner.mine;

/**
 * Association measures of a pair (w1, w2) from counts: {@code c12} adjacent occurrences of the pair
 * inside one segment, {@code c1} and {@code c2} the counts of each part, {@code n} the total token
 * count. The 2×2 table is k11 = c12, k12 = c1 − c12, k21 = c2 − c12, k22 = n − c1 − c2 + c12
 * (Manning &amp; Schütze 1999, ch. 5; the conventions of NLTK's {@code BigramAssocMeasures}).
 *
 * <p>Every function is a pure function of its four integer arguments, evaluated in one fixed order
 * with {@link StrictMath}, so equal counts give bit-identical scores on every machine. The common
 * factor {@code c12·n − c1·c2} (the table's {@code k11·k22 − k12·k21}) is computed exactly in integer
 * arithmetic and logarithms of ratios close to 1 go through {@code log1p}, so scores stay accurate
 * near independence, where the textbook form loses digits to cancellation.
 *
 * <p>For self-overlapping pairs ("a a" in "a a a") the unigram marginals can make k22 negative; that
 * cell is then taken as empty. Counts must satisfy 0 ≤ c12 ≤ min(c1, c2) and max(c1, c2) ≤ n,
 * n ≥ 1; anything else is a programming error ({@link IllegalArgumentException}).
 */
public final class Association {
    private static final double LN2 = StrictMath.log(2.0);

    private Association() {
    }

    /** Pointwise mutual information in bits: log2(c12·n) − log2(c1·c2); −∞ when c12 = 0. */
    public static double pmi(long c12, long c1, long c2, long n) {
        check(c12, c1, c2, n);
        if (c12 == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        return lnRatio(c12, n, c1, c2) / LN2;
    }

    /**
     * Normalised PMI (Bouma 2009): pmi / −log2(c12/n), clamped to [−1, 1] because rounding can put an
     * always-together pair just above 1. −1 when the pair never occurs, 1 when it is every token.
     */
    public static double npmi(long c12, long c1, long c2, long n) {
        check(c12, c1, c2, n);
        if (c12 == 0) {
            return -1.0;
        }
        if (c12 == n) {
            return 1.0;
        }
        double h = StrictMath.log((double) n / (double) c12) / LN2;
        double v = pmi(c12, c1, c2, n) / h;
        return v > 1.0 ? 1.0 : (v < -1.0 ? -1.0 : v);
    }

    /** NPMI from a PMI already computed for the same counts (same value as {@link #npmi}). */
    static double npmiFromPmi(double pmi, long c12, long n) {
        if (c12 == n) {
            return 1.0;
        }
        double h = StrictMath.log((double) n / (double) c12) / LN2;
        double v = pmi / h;
        return v > 1.0 ? 1.0 : (v < -1.0 ? -1.0 : v);
    }

    /**
     * Dunning's log-likelihood ratio G² = −2 log λ = 2 Σ k·ln(k/E) over the four cells, natural log,
     * with E the cell's expected count under independence (row sum × column sum / n); empty cells
     * add 0.
     */
    public static double logLikelihood(long c12, long c1, long c2, long n) {
        check(c12, c1, c2, n);
        long k11 = c12;
        long k12 = c1 - c12;
        long k21 = c2 - c12;
        long k22 = n - c1 - c2 + c12;
        double s = cell(k11, n, c1, c2)
                + cell(k12, n, c1, n - c2)
                + cell(k21, n, n - c1, c2)
                + cell(k22, n, n - c1, n - c2);
        return 2.0 * s;
    }

    /**
     * Student's t as in Manning &amp; Schütze §5.3.1 and NLTK: (c12 − c1·c2/n) / √c12, the observed
     * pair rate against the independence rate with the sample variance approximated by the mean.
     * Requires c12 ≥ 1.
     */
    public static double tScore(long c12, long c1, long c2, long n) {
        check(c12, c1, c2, n);
        if (c12 == 0) {
            throw new IllegalArgumentException("the t-score needs c12 >= 1 (its variance estimate is c12), got 0");
        }
        return exactDiff(c12, n, c1, c2) / (double) n / StrictMath.sqrt((double) c12);
    }

    /**
     * Pearson's χ² of the 2×2 table (M&amp;S §5.3.3): n·(k11·k22 − k12·k21)² / (c1·(n−c1)·c2·(n−c2));
     * 0 when a margin is empty (nothing to compare).
     */
    public static double chiSquare(long c12, long c1, long c2, long n) {
        check(c12, c1, c2, n);
        if (c1 == n || c2 == n) {
            return 0.0;
        }
        double d = exactDiff(c12, n, c1, c2);
        return d * d * (double) n / ((double) c1 * (double) (n - c1)) / ((double) c2 * (double) (n - c2));
    }

    /** k·ln(k·n / (r·s)) with k ≤ 0 contributing 0. */
    private static double cell(long k, long n, long r, long s) {
        if (k <= 0) {
            return 0.0;
        }
        return (double) k * lnRatio(k, n, r, s);
    }

    /** ln(a·b / (c·d)) for positive counts, accurate when the ratio is near 1. */
    static double lnRatio(long a, long b, long c, long d) {
        long p = a * b;
        long q = c * d;
        if (Math.multiplyHigh(a, b) == 0 && p >= 0 && Math.multiplyHigh(c, d) == 0 && q >= 0) {
            return StrictMath.log1p((double) (p - q) / (double) q);
        }
        return StrictMath.log((double) a) + StrictMath.log((double) b) - StrictMath.log((double) c) - StrictMath.log((double) d);
    }

    /** a·b − c·d, exact when both products fit in a long (always, below about 3·10⁹ tokens). */
    static double exactDiff(long a, long b, long c, long d) {
        long p = a * b;
        long q = c * d;
        if (Math.multiplyHigh(a, b) == 0 && p >= 0 && Math.multiplyHigh(c, d) == 0 && q >= 0) {
            return (double) (p - q);
        }
        return java.math.BigInteger.valueOf(a).multiply(java.math.BigInteger.valueOf(b))
                .subtract(java.math.BigInteger.valueOf(c).multiply(java.math.BigInteger.valueOf(d))).doubleValue();
    }

    private static void check(long c12, long c1, long c2, long n) {
        if (n < 1 || c12 < 0 || c12 > c1 || c12 > c2 || c1 > n || c2 > n) {
            throw new IllegalArgumentException("association counts must satisfy 0 <= c12 <= min(c1, c2) and max(c1, c2) <= n, n >= 1; got c12="
                    + c12 + " c1=" + c1 + " c2=" + c2 + " n=" + n);
        }
    }
}
