package dev.sheaf.miner.measure;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * How consistently annotators applied one attribute.
 *
 * @param attribute         the attribute key (after resolution)
 * @param scale             what the values looked like: present/absent, integer grades, numbers or categories
 * @param metricFromOptions true when the metric was set by option, false when chosen from the values
 * @param values            judgments per value, in scale order (ascending for numbers)
 * @param items             items with at least one judgment
 * @param judgments         judgments used (after repeated and conflicting rows were set aside)
 * @param annotators        annotators who judged the attribute
 * @param alpha             Krippendorff's alpha with the metric that fits the scale
 * @param alphaInterval     bootstrap interval of alpha
 * @param verdict           what alpha says, per {@link AgreementThresholds}
 * @param observedAgreement share of pairable judgment pairs (within an item) with exactly equal values; NaN when none
 * @param fleiss            Fleiss' kappa (nominal)
 * @param pairs             Cohen's kappa for every pair of annotators with a shared item, by pseudonym
 * @param meanCohenKappa    mean of the defined pairwise kappas; NaN when none
 * @param meanCohenBand     Landis–Koch band of that mean
 * @param notes             anything a reader must know to read the figures (metric changed, subsets)
 */
public record AgreementAttribute(String attribute, String scale, boolean metricFromOptions, Map<String, Integer> values,
                                 int items, int judgments, int annotators, KrippendorffResult alpha,
                                 BootstrapInterval alphaInterval, AgreementVerdict verdict, double observedAgreement,
                                 FleissResult fleiss, List<CohenPair> pairs, double meanCohenKappa,
                                 KappaBand meanCohenBand, List<String> notes) {
    public AgreementAttribute {
        Objects.requireNonNull(attribute, "attribute");
        Objects.requireNonNull(scale, "scale");
        values = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(values));
        Objects.requireNonNull(alpha, "alpha");
        Objects.requireNonNull(alphaInterval, "alphaInterval");
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(fleiss, "fleiss");
        Objects.requireNonNull(meanCohenBand, "meanCohenBand");
        pairs = List.copyOf(pairs);
        notes = List.copyOf(notes);
        if (items < 0 || judgments < 0 || annotators < 0) {
            throw new IllegalArgumentException("counts must be >= 0");
        }
    }

    /** The notes, led by why alpha is undefined when it is. */
    public List<String> allNotes() {
        if (alpha.defined()) {
            return notes;
        }
        List<String> all = new java.util.ArrayList<>();
        all.add("alpha n/a: " + alpha.undefinedReason());
        all.addAll(notes);
        return List.copyOf(all);
    }

    /** The metric alpha used. */
    public AgreementMetric metric() {
        return alpha.metric();
    }
}
