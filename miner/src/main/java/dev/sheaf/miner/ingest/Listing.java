package dev.sheaf.miner.ingest;

import java.util.List;
import java.util.Objects;

/**
 * One product record, from whatever file it was read.
 *
 * @param id       the listing id as the source gives it (never used as a file name)
 * @param category the shop's category, or the empty string when the source has none
 * @param source   where it came from: a path relative to the workspace (or as given on the
 *                 command line), using {@code /} as separator
 * @param locator  where inside the source: {@code "line 12"}, {@code "row 40"}, {@code "page 2"},
 *                 or the empty string for a whole-file listing
 * @param fields   the text fields in reading order; never null, may be empty
 */
public record Listing(String id, String category, String source, String locator, List<Field> fields) {
    public Listing {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(category, "category");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(locator, "locator");
        fields = List.copyOf(fields);
    }

    /** The first field of the given kind, or null. */
    public Field first(FieldKind kind) {
        for (Field f : fields) {
            if (f.kind() == kind) {
                return f;
            }
        }
        return null;
    }

    /** The title text, or the empty string. */
    public String title() {
        Field f = first(FieldKind.TITLE);
        return f == null ? "" : f.text();
    }
}
