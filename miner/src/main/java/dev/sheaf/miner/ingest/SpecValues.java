package dev.sheaf.miner.ingest;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import org.jsoup.Jsoup;

/** Helpers shared by the table and JSON readers for cell values. */
final class SpecValues {
    private static final Pattern PAIR_SEPARATOR = Pattern.compile("\\s*(?:;|\\||\\R)\\s*");
    private static final Pattern LIST_SEPARATOR = Pattern.compile("\\s*(?:\\||;|\\R)\\s*");

    private SpecValues() {
    }

    /**
     * The key/value pairs a text cell states ({@code "Weight: 1.2 kg; Colour: moss"}, separated by
     * {@code ;}, {@code |} or line breaks), or null unless every part is such a pair.
     */
    static List<Field> pairs(String value) {
        if (value.indexOf(':') < 0) {
            return null;
        }
        List<Field> out = new ArrayList<>();
        for (String part : PAIR_SEPARATOR.split(value.strip())) {
            if (part.isEmpty()) {
                continue;
            }
            Field f = SpecLines.spec(part);
            if (f == null) {
                return null;
            }
            out.add(f);
        }
        return out.isEmpty() ? null : out;
    }

    /** Adds the specs a cell holds: its pairs, or one spec keyed by the column name. */
    static void addSpecs(String column, String value, boolean container, List<Field> out) {
        String v = value.strip();
        if (v.isEmpty()) {
            return;
        }
        List<Field> p = pairs(v);
        if (p != null && (container || p.size() > 1)) {
            out.addAll(p);
        } else {
            out.add(Field.spec(column, v));
        }
    }

    /** A list cell split on {@code |}, {@code ;} or line breaks. */
    static List<String> items(String value) {
        List<String> out = new ArrayList<>();
        for (String s : LIST_SEPARATOR.split(value.strip())) {
            if (!s.isEmpty()) {
                out.add(s);
            }
        }
        return out;
    }

    /** Cell text with HTML markup removed when the cell holds markup (exports often do). */
    static String plain(String value) {
        String v = value.strip();
        if (v.indexOf('<') >= 0 && (v.contains("</") || v.contains("<br") || v.contains("/>"))) {
            return Jsoup.parse(v).text().strip();
        }
        return v;
    }
}
