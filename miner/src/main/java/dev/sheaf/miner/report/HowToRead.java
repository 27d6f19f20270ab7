package dev.sheaf.miner.report;

import java.util.List;
import java.util.Objects;

/**
 * The sentence under every figure: what it measures, the method it comes from (with its source),
 * and the thresholds drawn or applied. A figure cannot be added without one.
 *
 * @param measures   what the figure shows, as a clause ("the share of listings that carry ...")
 * @param method     how it is computed and where the method comes from
 * @param thresholds each threshold with its value and source ("reliable: α ≥ 0.800 (Krippendorff 2004)");
 *                   empty when none applies, which the page then says
 */
public record HowToRead(String measures, String method, List<String> thresholds) {
    public HowToRead {
        Objects.requireNonNull(measures, "measures");
        Objects.requireNonNull(method, "method");
        thresholds = List.copyOf(thresholds);
        if (measures.isBlank() || method.isBlank()) {
            throw new IllegalArgumentException("a how-to-read note must say what the figure measures and cite its method");
        }
        for (String t : thresholds) {
            if (t.isBlank()) {
                throw new IllegalArgumentException("a threshold must be described, got a blank entry in " + thresholds);
            }
        }
    }

    /** For {@link Charts#fillRateHeatMap}; {@code thinBelow} is the thin-flag edge, NaN when none is applied. */
    public static HowToRead fillRate(double thinBelow) {
        return new HowToRead("the fill rate of each facet in each category: of the listings in the category the facet "
                + "applies to, the share that carry a valid value of it; n/a where it applies to none",
                "fill rate(a, S) = listings in S where a applies and has a valid value \u00f7 listings in S where a applies; "
                        + "listings it does not apply to are left out of the denominator (common practice)",
                Double.isNaN(thinBelow) ? List.of()
                        : List.of("thin: fill rate below " + Numbers.percent(thinBelow) + " in the listings it applies to"));
    }

    /** For {@link Charts#coverageCurve}; {@code markShare} as passed to the chart, NaN for none. */
    public static HowToRead coverageCurve(long totalListings, double markShare) {
        return new HowToRead("the share of all " + Numbers.count(totalListings) + " listings that carry at least one of "
                + "the top k concepts" + (Double.isNaN(markShare) ? "" : "; the dashed line marks where "
                + Numbers.percent(markShare) + " of listings are reached, as a reading aid"),
                "concepts ranked by the number of listings they label; at each k, the listings labelled by any of the "
                        + "first k concepts are counted once (a cumulative union, not a sum)",
                List.of());
    }

    /** For {@link Charts#alpha}: method, interval and thresholds as the report ran them. */
    public static HowToRead alpha(dev.sheaf.miner.measure.AgreementReport report) {
        var t = report.thresholds();
        String rel = Numbers.coefficient(t.alphaReliable());
        String ten = Numbers.coefficient(t.alphaTentative());
        String interval = report.replicates() == 0 ? "no interval was computed"
                : "bars are the " + Numbers.percent(report.confidence()) + " " + dev.sheaf.miner.measure.BootstrapInterval.METHOD
                + ", " + Numbers.count(report.replicates()) + " replicates, seed " + report.seed();
        return new HowToRead("how consistently annotators applied each attribute: Krippendorff's alpha, where 1 is "
                + "perfect agreement and 0 is no more agreement than chance",
                "Krippendorff's alpha from the coincidence matrix (Krippendorff 2011, \u201cComputing Krippendorff's "
                        + "Alpha-Reliability\u201d), with the difference metric that fits each attribute's values; " + interval,
                List.of("reliable: \u03b1 \u2265 " + rel, "tentative: " + ten + " \u2264 \u03b1 < " + rel,
                        "contested: \u03b1 < " + ten + " (edges after Krippendorff 2004, Content Analysis)"));
    }

    /** For {@link Charts#directionAgreement}. */
    public static HowToRead directionAgreement() {
        return new HowToRead("for each attribute, the share of feedback mentions with a direction (more or less of it, "
                + "has it or lacks it) that agree with the labels of the listings compared",
                "mentions found in feedback sentences are compared with the labels of the reference and target listings; "
                        + "mentions whose direction cannot be checked are left out and not counted",
                List.of());
    }

    /** For {@link Charts#flags}; {@code thresholds} describe each flag's edge as applied. */
    public static HowToRead flags(List<String> thresholds) {
        return new HowToRead("how many attributes carry each kind of flag, stacked by facet; one attribute can carry "
                + "several kinds",
                "a flag is raised when its figure crosses its threshold; each attribute's card shows the figure and "
                        + "the threshold that raised it",
                thresholds);
    }

    /** The sentence as printed (plain text, not yet escaped). */
    public String sentence() {
        StringBuilder b = new StringBuilder();
        b.append(capitalise(stripStop(measures))).append(". Method: ").append(stripStop(method)).append(". ");
        if (thresholds.isEmpty()) {
            b.append("No threshold applies.");
        } else {
            b.append(thresholds.size() == 1 ? "Threshold: " : "Thresholds: ").append(String.join("; ", thresholds)).append('.');
        }
        return b.toString();
    }

    private static String stripStop(String s) {
        String t = s.strip();
        return t.endsWith(".") ? t.substring(0, t.length() - 1) : t;
    }

    private static String capitalise(String s) {
        return s.isEmpty() ? s : s.substring(0, 1).toUpperCase(java.util.Locale.ROOT) + s.substring(1);
    }
}
