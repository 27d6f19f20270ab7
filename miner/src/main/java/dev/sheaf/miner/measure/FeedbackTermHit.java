package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * A vocabulary term found in a feedback sentence.
 *
 * @param conceptId the concept the term stands for
 * @param start     0-based UTF-16 offset of the term's first char in the sentence
 * @param end       offset one past its last char (exclusive)
 * @param surface   the sentence's own text at {@code [start, end)}
 * @param label     the vocabulary label that matched, or null when the matcher does not say
 */
public record FeedbackTermHit(String conceptId, int start, int end, String surface, String label) {
    public FeedbackTermHit {
        Objects.requireNonNull(conceptId, "conceptId");
        Objects.requireNonNull(surface, "surface");
        if (conceptId.isBlank()) {
            throw new IllegalArgumentException("a term hit needs a concept id; got a blank one");
        }
        if (start < 0 || end <= start || surface.length() != end - start) {
            throw new IllegalArgumentException("term hit offsets [" + start + ", " + end + ") do not fit its surface '"
                    + surface + "'; pass 0-based offsets, end exclusive, and the text between them");
        }
    }
}
