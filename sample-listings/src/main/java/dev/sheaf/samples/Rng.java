package dev.sheaf.samples;

import java.util.List;

/**
 * The generator's only source of randomness: SplitMix64 (Steele, Lea and Flood 2014), written out
 * here rather than taken from {@code java.util} so that the same seed gives the same bytes on every
 * JDK; the bounded and floating-point helpers below are ours too, and use only exact integer
 * arithmetic or {@link StrictMath}. Every listing gets its own stream ({@link #of}), so listing
 * {@code i} is the same whether 10 or 10 million listings are written, and in any order.
 */
final class Rng {
    private static final long GOLDEN = 0x9E3779B97F4A7C15L;

    private long state;

    Rng(long seed) {
        this.state = seed;
    }

    /** An independent stream for one purpose ({@code stream}) and one item ({@code index}). */
    static Rng of(long seed, String stream, long index) {
        long h = mix(seed ^ 0x5DEECE66DL);
        for (int i = 0; i < stream.length(); i++) {
            h = mix(h + stream.charAt(i));
        }
        return new Rng(mix(h + index * GOLDEN));
    }

    private static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    long nextLong() {
        state += GOLDEN;
        return mix(state);
    }

    /** Uniform in [0, bound); bound must be positive. */
    int nextInt(int bound) {
        if (bound <= 0) {
            throw new IllegalArgumentException("bound must be positive, got " + bound);
        }
        return (int) (((nextLong() >>> 32) * bound) >>> 32);
    }

    /** Uniform integer in [lo, hi], both inclusive. */
    int between(int lo, int hi) {
        return lo + nextInt(hi - lo + 1);
    }

    /** Uniform in [0, 1). */
    double nextDouble() {
        return (nextLong() >>> 11) * 0x1.0p-53;
    }

    double between(double lo, double hi) {
        return lo + (hi - lo) * nextDouble();
    }

    boolean chance(double p) {
        return nextDouble() < p;
    }

    /** Standard normal (Box–Muller with StrictMath, so the value is the same on every platform). */
    double gaussian() {
        double u = 1.0 - nextDouble();
        double v = nextDouble();
        return StrictMath.sqrt(-2.0 * StrictMath.log(u)) * StrictMath.cos(2.0 * StrictMath.PI * v);
    }

    <T> T pick(List<T> items) {
        return items.get(nextInt(items.size()));
    }

    @SafeVarargs
    final <T> T pick(T... items) {
        return items[nextInt(items.length)];
    }

    /**
     * A pick skewed towards the front of the list (index = n·u^power), giving a long tail: with
     * power 3 the first tenth of the list gets about 46% of the picks.
     */
    <T> T pickSkewed(List<T> items, double power) {
        double u = nextDouble();
        // exact shortcuts for the common powers (sqrt is correctly rounded, so still platform-independent)
        double x = power == 2 ? u * u : power == 1.5 ? u * StrictMath.sqrt(u) : power == 3 ? u * u * u : StrictMath.pow(u, power);
        int i = (int) (items.size() * x);
        return items.get(Math.min(i, items.size() - 1));
    }

    /** Picks index i with probability weights[i] / sum(weights). */
    int weighted(double... weights) {
        double sum = 0;
        for (double w : weights) {
            sum += w;
        }
        double x = nextDouble() * sum;
        for (int i = 0; i < weights.length; i++) {
            x -= weights[i];
            if (x < 0) {
                return i;
            }
        }
        return weights.length - 1;
    }

    /** Fisher–Yates shuffle in place. */
    <T> void shuffle(List<T> items) {
        for (int i = items.size() - 1; i > 0; i--) {
            int j = nextInt(i + 1);
            T t = items.get(i);
            items.set(i, items.get(j));
            items.set(j, t);
        }
    }
}
