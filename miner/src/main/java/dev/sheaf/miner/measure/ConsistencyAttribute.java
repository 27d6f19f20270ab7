package dev.sheaf.miner.measure;

import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * How feedback sentences use one attribute.
 *
 * @param attribute          the concept id, or the number facet of a scale (docs/decisions/111)
 * @param label              the label to show
 * @param kind               {@code concept} (a vocabulary concept), {@code scale} (a number facet reached through a
 *                           scale) or {@code unknown} (an id the vocabulary does not hold)
 * @param mentions           mentions
 * @param sentences          sentences with at least one mention
 * @param share              sentences / all sentences read
 * @param directions         mentions per direction, every direction present (zeros included)
 * @param hedged             hedged mentions
 * @param comparative        comparative (relative) mentions
 * @param negated            negated mentions
 * @param excessive          "too X" mentions
 * @param ambiguous          mentions whose span resolves to several concepts
 * @param surfaceForms       the words used, with their entropy
 * @param unusedLabels       labels of the concept nobody used (as written in the vocabulary); empty for scales
 * @param agreement          direction agreement between people
 * @param grounding          catalog checks
 * @param contradictions     pairs with contradictions, by pair id
 */
public record ConsistencyAttribute(String attribute, String label, String kind, int mentions, int sentences, double share,
                                   Map<Direction, Integer> directions, int hedged, int comparative, int negated,
                                   int excessive, int ambiguous, SurfaceForms surfaceForms, List<String> unusedLabels,
                                   ConsistencyAgreement agreement, GroundingSummary grounding,
                                   List<ConsistencyContradiction> contradictions) {
    public static final String KIND_CONCEPT = "concept";
    public static final String KIND_SCALE = "scale";
    public static final String KIND_UNKNOWN = "unknown";

    public ConsistencyAttribute {
        Objects.requireNonNull(attribute, "attribute");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(surfaceForms, "surfaceForms");
        Objects.requireNonNull(agreement, "agreement");
        Objects.requireNonNull(grounding, "grounding");
        if (!KIND_CONCEPT.equals(kind) && !KIND_SCALE.equals(kind) && !KIND_UNKNOWN.equals(kind)) {
            throw new IllegalArgumentException("kind must be concept, scale or unknown, got " + kind);
        }
        EnumMap<Direction, Integer> d = new EnumMap<>(Direction.class);
        for (Direction x : Direction.values()) {
            d.put(x, directions.getOrDefault(x, 0));
        }
        directions = Collections.unmodifiableMap(d);
        unusedLabels = List.copyOf(unusedLabels);
        contradictions = List.copyOf(contradictions);
        int sum = 0;
        for (int n : directions.values()) {
            sum += n;
        }
        if (sum != mentions || surfaceForms.total() != mentions || grounding.mentions() != mentions) {
            throw new IllegalArgumentException("attribute " + attribute + ": directions (" + sum + "), surface forms ("
                    + surfaceForms.total() + ") and grounding (" + grounding.mentions() + ") must each count all "
                    + mentions + " mentions");
        }
        for (int n : new int[] {hedged, comparative, negated, excessive, ambiguous}) {
            if (n < 0 || n > mentions) {
                throw new IllegalArgumentException("attribute " + attribute + ": a mention count is outside [0, " + mentions + "]");
            }
        }
        if (sentences > mentions || sentences < 0 || !(share >= 0 && share <= 1)) {
            throw new IllegalArgumentException("attribute " + attribute + ": need 0 <= sentences <= mentions and share in [0, 1]");
        }
    }

    /** Hedged mentions / mentions; NaN for none. */
    public double hedgeRate() {
        return mentions == 0 ? Double.NaN : (double) hedged / mentions;
    }

    /** Comparative mentions / mentions: how much the attribute is used only relatively; NaN for none. */
    public double comparativeShare() {
        return mentions == 0 ? Double.NaN : (double) comparative / mentions;
    }

    /** Ambiguous mentions / mentions; NaN for none. */
    public double ambiguousShare() {
        return mentions == 0 ? Double.NaN : (double) ambiguous / mentions;
    }
}
