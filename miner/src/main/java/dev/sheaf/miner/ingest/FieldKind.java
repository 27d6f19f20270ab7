package dev.sheaf.miner.ingest;

import java.util.Locale;

/** The parts of a listing that Sheaf reads. */
public enum FieldKind {
    /** The product name. */
    TITLE,
    /** A heading inside a product page or sheet. */
    HEADING,
    /** Marketing or descriptive prose. */
    DESCRIPTION,
    /** One bullet point ("feature" line). */
    BULLET,
    /** One key/value row of a spec table; the key is in {@link Field#key()}. */
    SPEC,
    /** Any other running text (a PDF or DOCX body, a plain-text file). */
    TEXT;

    /** Lower-case name as used in files: {@code title}, {@code spec} ... */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static FieldKind fromLabel(String s) {
        return valueOf(s.trim().toUpperCase(Locale.ROOT));
    }
}
