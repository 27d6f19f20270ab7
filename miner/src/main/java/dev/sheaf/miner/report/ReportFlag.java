package dev.sheaf.miner.report;

import java.util.Objects;

/**
 * A flag on an attribute with the figure and the threshold that raised it, e.g. contested:
 * Krippendorff's alpha 0.412 &lt; 0.667. The constructor checks that the figure really is on the
 * flagged side of the threshold, so a report cannot show a flag its own numbers contradict.
 *
 * @param kind       which flag
 * @param measure    the figure's name ("Krippendorff's alpha", "fill rate")
 * @param value      the figure
 * @param scale      how the figure and threshold are shown (not {@link ValueKind#TEXT})
 * @param comparison how the figure relates to the threshold
 * @param threshold  the edge that raised the flag
 * @param thresholdName what the edge is called ("tentative edge"), or empty
 * @param detail     anything else a reader needs ("overlaps 'zip closure' on 83% of listings"), or empty
 */
public record ReportFlag(FlagKind kind, String measure, double value, ValueKind scale, Comparison comparison,
                         double threshold, String thresholdName, String detail) {
    public ReportFlag {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(measure, "measure");
        Objects.requireNonNull(scale, "scale");
        Objects.requireNonNull(comparison, "comparison");
        Objects.requireNonNull(thresholdName, "thresholdName");
        Objects.requireNonNull(detail, "detail");
        if (measure.isBlank()) {
            throw new IllegalArgumentException("a flag must name the figure that raised it");
        }
        if (scale == ValueKind.TEXT) {
            throw new IllegalArgumentException("a flag's figure is a number; use COUNT, SHARE or COEFFICIENT");
        }
        if (!comparison.holds(value, threshold)) {
            throw new IllegalArgumentException(kind.label() + " flag on " + measure + " " + value + " says it is "
                    + comparison.words() + " " + threshold + ", which is false; pass the figure and threshold that raised it");
        }
    }

    /**
     * The contested flag an attribute's alpha raises under {@code thresholds}, if it does: alpha below
     * the tentative edge.
     */
    public static java.util.Optional<ReportFlag> contested(dev.sheaf.miner.measure.AgreementAttribute a,
                                                           dev.sheaf.miner.measure.AgreementThresholds thresholds) {
        double alpha = a.alpha().alpha();
        if (!a.alpha().defined() || !(alpha < thresholds.alphaTentative())) {
            return java.util.Optional.empty();
        }
        return java.util.Optional.of(new ReportFlag(FlagKind.CONTESTED, "Krippendorff's alpha", alpha, ValueKind.COEFFICIENT,
                Comparison.BELOW, thresholds.alphaTentative(), "tentative edge", ""));
    }

    /** "Krippendorff's alpha 0.412 < 0.667 (tentative edge)". */
    public String statement() {
        String t = Numbers.format(threshold, scale);
        return measure + " " + Numbers.format(value, scale) + " " + comparison.symbol() + " " + t
                + (thresholdName.isEmpty() ? "" : " (" + thresholdName + ")");
    }
}
