package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Locale;
import java.util.Objects;

/**
 * One attribute mention in one feedback sentence, read and checked.
 *
 * @param row           the sentence's spreadsheet row (0 when not from a file)
 * @param pairId        the comparison it belongs to
 * @param referenceId   the listing compared against
 * @param targetId      the listing spoken of
 * @param annotator     the writer's <b>pseudonym</b> (never the id from the file)
 * @param sentence      the sentence
 * @param start         0-based UTF-16 offset of the mention in the sentence
 * @param end           end offset (exclusive)
 * @param surface       the sentence's text at {@code [start, end)}
 * @param form          the surface in normal form (lower case, folded), as counted among surface forms
 * @param attribute     what the mention counts under: the concept found, or the number facet of a scale
 *                      (docs/decisions/111-attributes-and-scales.md)
 * @param conceptId     the concept the matcher found, or null when only a scale word matched
 * @param alsoConcepts  other concepts the same span resolves to (an ambiguous mention), in id order
 * @param label         the label that matched (the base form for a degree form), or null when unknown
 * @param via           how the mention was found: {@link #VIA_LABEL}, {@link #VIA_DEGREE_FORM} or {@link #VIA_SCALE_WORD}
 * @param read          the direction {@link MentionCues} read about the word itself ("lighter": more light)
 * @param direction     the direction about {@code attribute} ("lighter": less weight)
 * @param comparative   the statement is relative (comparative or superlative form, more/less, as … as, than)
 * @param hedged        a hedge softens it
 * @param negated       a negation scopes over it
 * @param excessive     "too X"
 * @param scaleFacet    the number facet of the scale used, or null
 * @param grounding     the catalog check
 * @param notes         remarks from reading the cues
 */
public record FeedbackMention(long row, String pairId, String referenceId, String targetId, String annotator,
                              String sentence, int start, int end, String surface, String form, String attribute,
                              String conceptId, List<String> alsoConcepts, String label, String via, Direction read,
                              Direction direction, boolean comparative, boolean hedged, boolean negated,
                              boolean excessive, String scaleFacet, GroundingCheck grounding, List<String> notes) {
    /** Found by a vocabulary label. */
    public static final String VIA_LABEL = "label";
    /** Found by a label after undoing a comparative or superlative ending ("roomier" → "roomy"). */
    public static final String VIA_DEGREE_FORM = "degree-form";
    /** Found only as a word of a scale ("heavier" on the weight scale). */
    public static final String VIA_SCALE_WORD = "scale-word";

    public FeedbackMention {
        Objects.requireNonNull(pairId, "pairId");
        Objects.requireNonNull(referenceId, "referenceId");
        Objects.requireNonNull(targetId, "targetId");
        Objects.requireNonNull(annotator, "annotator");
        Objects.requireNonNull(sentence, "sentence");
        Objects.requireNonNull(surface, "surface");
        Objects.requireNonNull(form, "form");
        Objects.requireNonNull(attribute, "attribute");
        Objects.requireNonNull(read, "read");
        Objects.requireNonNull(direction, "direction");
        Objects.requireNonNull(grounding, "grounding");
        alsoConcepts = List.copyOf(alsoConcepts);
        notes = List.copyOf(notes);
        if (!VIA_LABEL.equals(via) && !VIA_DEGREE_FORM.equals(via) && !VIA_SCALE_WORD.equals(via)) {
            throw new IllegalArgumentException("via must be label, degree-form or scale-word, got " + via);
        }
        if (start < 0 || end <= start || end > sentence.length() || !sentence.substring(start, end).equals(surface)) {
            throw new IllegalArgumentException("mention offsets [" + start + ", " + end + ") do not point at '" + surface
                    + "' in its sentence");
        }
        if (conceptId == null && !VIA_SCALE_WORD.equals(via)) {
            throw new IllegalArgumentException("a mention found by a label needs its concept id");
        }
    }

    /** True when the span resolves to more than one concept. */
    public boolean ambiguous() {
        return !alsoConcepts.isEmpty();
    }

    /** The direction as a lower-case word (more, less, present, absent). */
    public String directionWord() {
        return direction.name().toLowerCase(Locale.ROOT);
    }
}
