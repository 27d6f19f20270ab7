package dev.sheaf.miner.mine;

/**
 * Termhood of nested multi-word terms.
 *
 * <p>C-value (Frantzi, Ananiadou &amp; Mima 2000, Int. J. Digital Libraries 3(2)): for a candidate a of
 * |a| ≥ 2 words with frequency f(a), and T_a the set of longer candidates that contain a,
 * C-value(a) = log2|a| · f(a) when a is not nested, else log2|a| · (f(a) − (1/|T_a|) Σ_{b∈T_a} f(b)).
 * A term that mostly occurs inside one longer term ("800 fill" inside "800 fill down") is discounted.
 *
 * <p>Termhood, Sheaf's ranking default, keeps C-value's idea (discount the occurrences a longer
 * term explains, weight by length) in a form that also ranks single words:
 * termhood(a) = log2(|a| + 1) · (f(a) − max f(b)) over the n-grams b that extend a by one word at
 * either end. A word or phrase that only ever occurs inside one longer phrase ("ripstop" inside
 * "ripstop nylon", "two way" inside "two way zipper") scores 0 and makes way for the phrase;
 * one used on its own keeps the occurrences no single extension explains. The weight is 1 for a
 * word, 1.58 for a pair, 2 for three words. See docs/decisions/045-default-ranking.md.
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

    /**
     * log2(length + 1) · (f − f of the most frequent one-word extension); defined for every length ≥ 1.
     *
     * @param maxExtension frequency of the most frequent n-gram that extends the term by one word, 0 if none
     */
    public static double termhood(int length, long frequency, long maxExtension) {
        if (length < 1) {
            throw new IllegalArgumentException("termhood needs length >= 1, got " + length);
        }
        if (maxExtension < 0 || maxExtension > frequency) {
            throw new IllegalArgumentException("an extension occurs at most as often as the term: f=" + frequency
                    + ", extension f=" + maxExtension);
        }
        return StrictMath.log(length + 1) / LN2 * (double) (frequency - maxExtension);
    }

    private static double adjusted(long frequency, long nestedSum, int nestedCount) {
        if (frequency < 0 || nestedSum < 0 || nestedCount < 0) {
            throw new IllegalArgumentException("counts must be >= 0, got f=" + frequency + " sum=" + nestedSum + " count=" + nestedCount);
        }
        return nestedCount == 0 ? (double) frequency : (double) frequency - (double) nestedSum / (double) nestedCount;
    }
}
