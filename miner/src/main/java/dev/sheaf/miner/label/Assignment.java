package dev.sheaf.miner.label;

import java.util.List;
import java.util.Objects;

/**
 * A concept attached to a listing, with every occurrence that supports it.
 *
 * <p>For a term or yes/no concept, {@code value}, {@code valueMax}, {@code unit} and
 * {@code bucket} are null. For a number facet, {@code conceptId} is the facet's id and the number
 * is given in the facet's unit (a range "20–25 L" has {@code valueMax} above {@code value});
 * {@code bucket} names the facet's bucket the value (a range: its midpoint) falls in, or null.
 *
 * <p>Polarity: {@link Polarity#STATED} when at least one occurrence states the concept, otherwise
 * {@link Polarity#NEGATED} (every occurrence is negated); numbers are always stated. Each
 * occurrence keeps its own polarity in its evidence (docs/decisions/101).
 *
 * @param conceptId the live concept (or, for numbers, the facet)
 * @param facetId   the facet the concept is under, or null for a concept under no facet
 * @param polarity  see above
 * @param evidence  occurrences in text order (field, then offset); never empty
 * @param value     the number in the facet's unit, or null
 * @param valueMax  the upper end of a range, equal to value for a single number, or null
 * @param unit      the facet's unit (or the quantity's when the facet names none), or null
 * @param bucket    the bucket label, or null
 * @param applies   false when the concept's facet does not apply to the listing's category: a likely error
 * @param review    true when the facet is a regulated or safety claim that needs human review
 */
public record Assignment(String conceptId, String facetId, Polarity polarity, List<Evidence> evidence, Double value,
                         Double valueMax, String unit, String bucket, boolean applies, boolean review) {
    public Assignment {
        Objects.requireNonNull(conceptId, "conceptId");
        Objects.requireNonNull(polarity, "polarity");
        evidence = List.copyOf(evidence);
        if (evidence.isEmpty()) {
            throw new IllegalArgumentException("assignment of " + conceptId + " has no evidence; every assignment needs one");
        }
        if ((value == null) != (valueMax == null)) {
            throw new IllegalArgumentException("value and valueMax of " + conceptId + " must both be set or both be null");
        }
        if (value != null) {
            if (!Double.isFinite(value) || !Double.isFinite(valueMax) || valueMax < value) {
                throw new IllegalArgumentException("number of " + conceptId + " must be finite with value <= valueMax, got "
                        + value + ".." + valueMax);
            }
            if (polarity != Polarity.STATED) {
                throw new IllegalArgumentException("a number of " + conceptId + " cannot be negated");
            }
        } else if (unit != null || bucket != null) {
            throw new IllegalArgumentException("unit and bucket of " + conceptId + " belong to numbers only");
        }
    }

    /** A term or yes/no concept. */
    static Assignment term(String conceptId, String facetId, Polarity polarity, List<Evidence> evidence, boolean applies,
                           boolean review) {
        return new Assignment(conceptId, facetId, polarity, evidence, null, null, null, null, applies, review);
    }

    /** Whether this is a number. */
    public boolean isNumber() {
        return value != null;
    }

    public boolean isStated() {
        return polarity == Polarity.STATED;
    }
}
