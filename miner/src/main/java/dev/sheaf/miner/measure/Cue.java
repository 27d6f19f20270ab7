package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * A cue word found in a sentence.
 *
 * @param kind   what the cue does
 * @param start  0-based UTF-16 offset of its first char in the sentence
 * @param end    offset one past its last char (exclusive)
 * @param text   the sentence's own text at {@code [start, end)}
 * @param normal the cue in canonical form: lower-case words separated by one space ("a bit",
 *               "doesn't"); for {@link CueKind#DEGREE_FORM} the base word ("lighter" → "light")
 */
public record Cue(CueKind kind, int start, int end, String text, String normal) {

    public Cue {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(normal, "normal");
        if (start < 0 || end <= start) {
            throw new IllegalArgumentException("cue offsets must satisfy 0 <= start < end; got ["
                    + start + ", " + end + ") for '" + text + "'");
        }
        if (text.length() != end - start) {
            throw new IllegalArgumentException("cue text '" + text + "' has " + text.length()
                    + " chars but its offsets [" + start + ", " + end + ") span " + (end - start));
        }
    }
}
