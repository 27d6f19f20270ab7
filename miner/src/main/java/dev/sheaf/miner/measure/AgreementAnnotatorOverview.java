package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * One annotator across every attribute they judged.
 *
 * @param annotator          pseudonym
 * @param attributes         attributes judged
 * @param judgments          judgments used
 * @param comparisons        (item, partner) comparisons over all attributes
 * @param pairwiseAgreement  share of those comparisons with equal values; NaN when none
 * @param meanCohenKappa     mean of the defined pairwise Cohen's kappas over all attributes and partners; NaN when none
 * @param meanCohenBand      Landis–Koch band of that mean
 * @param largestAlphaRise   the largest {@link AgreementAnnotator#alphaChange()} over the attributes; NaN when none is defined
 * @param largestRiseAttribute the attribute where it occurs, or empty
 */
public record AgreementAnnotatorOverview(String annotator, int attributes, int judgments, int comparisons,
                                         double pairwiseAgreement, double meanCohenKappa, KappaBand meanCohenBand,
                                         double largestAlphaRise, String largestRiseAttribute) {
    public AgreementAnnotatorOverview {
        Objects.requireNonNull(annotator, "annotator");
        Objects.requireNonNull(meanCohenBand, "meanCohenBand");
        Objects.requireNonNull(largestRiseAttribute, "largestRiseAttribute");
    }
}
