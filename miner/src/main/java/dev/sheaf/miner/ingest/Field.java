package dev.sheaf.miner.ingest;

import java.util.Objects;

/**
 * One text field of a listing. Offsets into {@link #text()} are 0-based UTF-16 char offsets,
 * end exclusive, everywhere in Sheaf.
 *
 * @param kind what part of the listing this is
 * @param key  the spec key for {@link FieldKind#SPEC} fields ("Weight", "Wt."), otherwise the empty string
 * @param text the field's text (for a spec, its value)
 */
public record Field(FieldKind kind, String key, String text) {
    public Field {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(text, "text");
        if (kind != FieldKind.SPEC && !key.isEmpty()) {
            throw new IllegalArgumentException("only SPEC fields carry a key, got " + kind + " with key '" + key + "'");
        }
    }

    public static Field of(FieldKind kind, String text) {
        return new Field(kind, "", text);
    }

    public static Field spec(String key, String value) {
        return new Field(FieldKind.SPEC, key, value);
    }
}
