package dev.sheaf.miner.measure;

/**
 * How well people who mention an attribute in the same pair agree on its direction.
 *
 * <p>Per pair, each mentioner holds one stance (the direction most of their mentions in the pair
 * take; on a tie, the first). For a pair with m ≥ 2 mentioners, agreement is the share of the
 * m(m−1)/2 pairs of mentioners with the same stance; {@code meanAgreement} averages it over those
 * pairs. A pair is contradictory when one mentioner says more and another less, or one present and
 * another absent. {@code alpha} is Krippendorff's nominal alpha over the same stances (pairs as
 * units), which corrects for the agreement expected by chance.
 *
 * @param pairsMentioned     pairs with at least one mentioner
 * @param pairsJudged        pairs with at least two mentioners (the ones averaged)
 * @param meanAgreement      mean pairwise agreement; NaN when no pair has two mentioners
 * @param contradictoryPairs judged pairs with a contradiction
 * @param contradictionShare contradictoryPairs / pairsJudged; NaN when none judged
 * @param selfContradictions mentioners who took more than one direction within one pair
 * @param alpha              nominal alpha of the stances
 */
public record ConsistencyAgreement(int pairsMentioned, int pairsJudged, double meanAgreement, int contradictoryPairs,
                                   double contradictionShare, int selfContradictions, KrippendorffResult alpha) {
    public ConsistencyAgreement {
        java.util.Objects.requireNonNull(alpha, "alpha");
        if (pairsJudged > pairsMentioned || contradictoryPairs > pairsJudged || pairsJudged < 0 || contradictoryPairs < 0
                || selfContradictions < 0) {
            throw new IllegalArgumentException("need 0 <= contradictoryPairs <= pairsJudged <= pairsMentioned; got "
                    + contradictoryPairs + ", " + pairsJudged + ", " + pairsMentioned);
        }
        if (pairsJudged == 0 ? !Double.isNaN(meanAgreement) : !(meanAgreement >= 0 && meanAgreement <= 1)) {
            throw new IllegalArgumentException("meanAgreement must be in [0, 1] when pairs were judged, NaN otherwise; got "
                    + meanAgreement);
        }
    }
}
