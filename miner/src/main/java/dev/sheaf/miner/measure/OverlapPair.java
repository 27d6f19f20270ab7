package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * Two concepts whose listing sets nearly coincide.
 *
 * @param a          one concept (the smaller id)
 * @param b          the other
 * @param labelA     a's preferred label
 * @param labelB     b's preferred label
 * @param listingsA  |A|, listings where a is stated
 * @param listingsB  |B|
 * @param both       |A ∩ B|
 * @param jaccard    |A ∩ B| / |A ∪ B|
 * @param lift       |A ∩ B|·N / (|A|·|B|): how many times more often they meet than independent concepts would
 * @param relation   {@code same-facet}, {@code hierarchy} (one is under the other) or {@code other-facet}
 * @param suggestion what to look at: {@code merge?} for same-facet pairs, {@code expected} for hierarchy,
 *                   {@code redundant?} across facets
 */
public record OverlapPair(String a, String b, String labelA, String labelB, long listingsA, long listingsB, long both,
                          double jaccard, double lift, String relation, String suggestion) {
    public OverlapPair {
        Objects.requireNonNull(a, "a");
        Objects.requireNonNull(b, "b");
        if (both > Math.min(listingsA, listingsB)) {
            throw new IllegalArgumentException("|A ∩ B| = " + both + " exceeds |A| = " + listingsA + " or |B| = " + listingsB);
        }
    }

    /** Jaccard similarity of two sets from their sizes and intersection. */
    public static double jaccardOf(long a, long b, long both) {
        long union = a + b - both;
        return union == 0 ? Double.NaN : (double) both / union;
    }

    /** Lift of two sets among n: P(A∩B) / (P(A)·P(B)). */
    public static double liftOf(long a, long b, long both, long n) {
        return a == 0 || b == 0 ? Double.NaN : (double) both * n / ((double) a * b);
    }
}
