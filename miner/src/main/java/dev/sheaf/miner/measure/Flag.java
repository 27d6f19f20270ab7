package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * One flag on one attribute, with the figure that raised it.
 *
 * @param kind        what is wrong
 * @param attribute   the attribute (concept or facet id, or a judged attribute's key)
 * @param criterion   which figure was tested, e.g. {@code alpha}, {@code hedge-rate}, {@code fill-rate}
 * @param figure      the attribute's value of it (1 for yes/no criteria such as a regulated claim)
 * @param threshold   the edge it was compared with (NaN for yes/no criteria)
 * @param comparison  how: {@code <} (flagged below the edge), {@code >} (flagged above it) or {@code is}
 *                    (a property, no edge)
 * @param thresholdKey the {@link FlagThresholds} key of the edge, or the empty string for yes/no criteria
 * @param explanation plain English: the figure, the edge, its source and what to do
 * @param evidence    sentences, listings, labels or concepts behind it (at most {@code evidence.limit})
 */
public record Flag(FlagKind kind, String attribute, String criterion, double figure, double threshold, String comparison,
                   String thresholdKey, String explanation, List<FlagEvidence> evidence) {
    private static final Set<String> COMPARISONS = Set.of("<", ">", "is");

    public Flag {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(attribute, "attribute");
        Objects.requireNonNull(criterion, "criterion");
        Objects.requireNonNull(thresholdKey, "thresholdKey");
        Objects.requireNonNull(explanation, "explanation");
        evidence = List.copyOf(evidence);
        if (!COMPARISONS.contains(comparison)) {
            throw new IllegalArgumentException("comparison must be one of " + COMPARISONS + ", got " + comparison);
        }
        if (Double.isNaN(figure)) {
            throw new IllegalArgumentException("a flag needs the figure that raised it; got NaN for " + criterion);
        }
        if (!comparison.equals("is")) {
            if (Double.isNaN(threshold)) {
                throw new IllegalArgumentException("a '" + comparison + "' flag needs its threshold");
            }
            boolean raised = comparison.equals("<") ? figure < threshold : figure > threshold;
            if (!raised) {
                throw new IllegalArgumentException("figure " + figure + " is not " + comparison + " " + threshold
                        + "; such a figure raises no flag");
            }
        }
    }
}
