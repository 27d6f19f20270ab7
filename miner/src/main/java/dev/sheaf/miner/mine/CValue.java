package dev.sheaf.miner.mine;

/**
 * Termhood of nested multi-word terms.
 *
 * <p>C-value (Frantzi, Ananiadou &amp; Mima 2000, Int. J. Digital Libraries 3(2)): for a candidate a of
 * |a| ≥ 2 words with frequency f(a), and T_a the set of longer candidates that contain a,
 * C-value(a) = log2|a| · f(a) when a is not nested, else log2|a| · (f(a) − (1/|T_a|) Σ_{b∈T_a} f(b)).
 * A term that mostly occurs inside one longer term ("800 fill" inside "800 fill down") is discounted.
 *
 * <p>Termhood, Sheaf's ranking default, is the same nested discount with the length weight
 * log2(|a| + 1), so that single words (weight 1) rank on the same scale as phrases instead of all
 * scoring 0; see docs/decisions/045-default-ranking.md.
 */
public final class CValue {
    private static final double LN2 = StrictMath.log(2.0);

    private CValue() {
    }

    /**
     * @param length      words in the candidate, at least 2
     * @param frequency   f(a)
     * @param nestedSum   Σ f(b) over the longer candidates b containing a
     * @param nestedCount |T_a|, 0 when a is not nested
     */
    public static double cValue(int length, long frequency, long nestedSum, int nestedCount) {
        if (length < 2) {
            throw new IllegalArgumentException("C-value is defined for multi-word terms (length >= 2), got length " + length);
        }
        return StrictMath.log(length) / LN2 * adjusted(frequency, nestedSum, nestedCount);
    }

    /** log2(length + 1) · (f − mean nested f); defined for every length ≥ 1. */
    public static double termhood(int length, long frequency, long nestedSum, int nestedCount) {
        if (length < 1) {
            throw new IllegalArgumentException("termhood needs length >= 1, got " + length);
        }
        return StrictMath.log(length + 1) / LN2 * adjusted(frequency, nestedSum, nestedCount);
    }

    private static double adjusted(long frequency, long nestedSum, int nestedCount) {
        if (frequency < 0 || nestedSum < 0 || nestedCount < 0) {
            throw new IllegalArgumentException("counts must be >= 0, got f=" + frequency + " sum=" + nestedSum + " count=" + nestedCount);
        }
        return nestedCount == 0 ? (double) frequency : (double) frequency - (double) nestedSum / (double) nestedCount;
    }
}
