package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * A pair in which people who mention an attribute contradict each other: someone says more and
 * someone less, or someone present and someone absent. Every mentioner of the pair is listed, so
 * both camps can be read.
 *
 * @param attribute   the attribute
 * @param pairId      the comparison
 * @param referenceId the listing compared against
 * @param targetId    the listing spoken of
 * @param kind        {@code more-vs-less} or {@code present-vs-absent} (both: {@code more-vs-less+present-vs-absent})
 * @param sides       one entry per mentioner, by pseudonym
 */
public record ConsistencyContradiction(String attribute, String pairId, String referenceId, String targetId, String kind,
                                       List<Side> sides) {

    /** What one person said: their pseudonym, direction, and the sentence. */
    public record Side(String annotator, Direction direction, long row, String sentence, String surface) {
        public Side {
            Objects.requireNonNull(annotator, "annotator");
            Objects.requireNonNull(direction, "direction");
            Objects.requireNonNull(sentence, "sentence");
            Objects.requireNonNull(surface, "surface");
        }
    }

    public ConsistencyContradiction {
        Objects.requireNonNull(attribute, "attribute");
        Objects.requireNonNull(pairId, "pairId");
        Objects.requireNonNull(referenceId, "referenceId");
        Objects.requireNonNull(targetId, "targetId");
        Objects.requireNonNull(kind, "kind");
        sides = List.copyOf(sides);
        if (sides.size() < 2) {
            throw new IllegalArgumentException("a contradiction needs at least two people; got " + sides.size());
        }
    }
}
