package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * How one annotator's judgments of one attribute agree with the others', so that an auditor can see
 * a rater who reads the attribute differently. The annotator appears only as a pseudonym.
 *
 * @param attribute          the attribute key
 * @param annotator          pseudonym
 * @param judgments          this annotator's judgments of the attribute
 * @param partners           other annotators sharing at least one item
 * @param comparisons        (item, partner) pairs compared: items this annotator shares with each partner, summed
 * @param agreements         those comparisons with equal values
 * @param pairwiseAgreement  agreements / comparisons; NaN when there are no comparisons
 * @param meanCohenKappa     mean of the defined Cohen's kappas with each partner; NaN when none
 * @param meanCohenBand      Landis–Koch band of that mean
 * @param alphaAll           alpha with everyone (as in {@link AgreementAttribute#alpha()})
 * @param alphaWithout       alpha with this annotator's judgments left out
 * @param alphaChange        alphaWithout − alphaAll: positive when leaving this annotator out raises agreement
 */
public record AgreementAnnotator(String attribute, String annotator, int judgments, int partners, int comparisons, int agreements,
                                 double pairwiseAgreement, double meanCohenKappa, KappaBand meanCohenBand,
                                 double alphaAll, double alphaWithout, double alphaChange) {
    public AgreementAnnotator {
        Objects.requireNonNull(attribute, "attribute");
        Objects.requireNonNull(annotator, "annotator");
        Objects.requireNonNull(meanCohenBand, "meanCohenBand");
        if (judgments < 0 || partners < 0 || comparisons < 0 || agreements < 0 || agreements > comparisons) {
            throw new IllegalArgumentException("counts must be >= 0");
        }
    }
}
