package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * How a feedback sentence speaks of one matched term.
 *
 * @param start       the span's start (0-based UTF-16 offset, as given)
 * @param end         the span's end (exclusive, as given)
 * @param text        the sentence's text at {@code [start, end)}
 * @param direction   more, less, present or absent (see {@link MentionCues} for the rules)
 * @param comparative true when the statement is relative: a comparative or superlative form
 *                    ("lighter", "the lightest", "with a bigger hood"), "more/less X", "as X as",
 *                    "not as X", or "than"
 * @param hedged      true when a hedge softens it ("a bit", "kind of", "-ish", "I think")
 * @param excessive   true for "too X": read as {@link Direction#MORE}, with a note
 * @param negated     true when an odd number of negation or absence cues scope over the term
 *                    (so "not without a hood" is not negated)
 * @param cues        the cue words that decided the above, in sentence order
 * @param notes       plain-English remarks on readings a reviewer may want to check
 */
public record Mention(int start, int end, String text, Direction direction, boolean comparative,
                      boolean hedged, boolean excessive, boolean negated, List<Cue> cues, List<String> notes) {

    public Mention {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(direction, "direction");
        cues = List.copyOf(cues);
        notes = List.copyOf(notes);
        if (start < 0 || end <= start || text.length() != end - start) {
            throw new IllegalArgumentException("mention offsets [" + start + ", " + end
                    + ") do not fit its text '" + text + "'");
        }
        if (excessive && direction != Direction.MORE) {
            throw new IllegalArgumentException("an excessive mention reads as MORE; got " + direction);
        }
    }

    /** The cues of one kind, in sentence order. */
    public List<Cue> cues(CueKind kind) {
        return cues.stream().filter(c -> c.kind() == kind).toList();
    }
}
