package dev.sheaf.miner.label;

import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.text.SegmentPart;
import dev.sheaf.vocab.LabelKind;
import java.util.Objects;

/**
 * One occurrence that supports an assignment: where in the listing, what text, through which kind
 * of label, and with which polarity.
 *
 * <p>Offsets are 0-based UTF-16 char offsets, end exclusive, into the field's text ({@code part}
 * {@link SegmentPart#TEXT} or {@link SegmentPart#SPEC_VALUE}) or into the spec key
 * ({@link SegmentPart#SPEC_KEY}); {@code text} is exactly that substring.
 *
 * @param field     index of the field in {@code Listing.fields()}
 * @param fieldKind the kind of that field
 * @param key       the spec key for spec fields, else the empty string
 * @param part      which text of the field the offsets point into
 * @param start     first char
 * @param end       char after the last
 * @param text      the listing's text at [start, end)
 * @param labelKind the kind of label that matched; null for a number read from a quantity
 * @param polarity  what this occurrence says
 * @param cue       for a negated occurrence, the words that negate it ("without", "-free", a spec
 *                  value "No"); otherwise null
 */
public record Evidence(int field, FieldKind fieldKind, String key, SegmentPart part, int start, int end, String text,
                       LabelKind labelKind, Polarity polarity, String cue) {
    public Evidence {
        if (field < 0) {
            throw new IllegalArgumentException("field index must be >= 0, got " + field);
        }
        Objects.requireNonNull(fieldKind, "fieldKind");
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(part, "part");
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(polarity, "polarity");
        if (start < 0 || end < start) {
            throw new IllegalArgumentException("evidence span must satisfy 0 <= start <= end, got " + start + ".." + end);
        }
        if (text.length() != end - start) {
            throw new IllegalArgumentException("evidence text \"" + text + "\" has " + text.length()
                    + " chars but its span " + start + ".." + end + " has " + (end - start));
        }
        if (part != SegmentPart.TEXT && fieldKind != FieldKind.SPEC) {
            throw new IllegalArgumentException("part " + part + " belongs to spec fields, got a " + fieldKind.label() + " field");
        }
        if (polarity == Polarity.STATED && cue != null) {
            throw new IllegalArgumentException("a stated occurrence has no negation cue, got \"" + cue + "\"");
        }
    }
}
