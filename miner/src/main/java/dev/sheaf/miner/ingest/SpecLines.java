package dev.sheaf.miner.ingest;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Turns plain lines into listing fields: {@code "Key: value"} (or {@code "Key<TAB>value"}, as
 * extracted tables come out) becomes a spec, {@code "- x"} / {@code "* x"} / {@code "• x"} a
 * bullet, a Markdown {@code #} line a heading, other lines are joined into paragraphs.
 *
 * <p>Identifier pairs ({@code SKU}, {@code Item no.}, {@code Category}, {@code Supplier},
 * {@code Model no.} ...) name the listing or where it came from, not a property of the product:
 * they give the listing id and category and never become specs (see {@link Identifier}). A line of
 * several pairs joined by {@code ·}, {@code |}, {@code •} or a wide gap ("SKU FH-000104 · Supplier:
 * Northwind") is split into its pairs, never read as one key. See docs/decisions/107.
 *
 * <p>In Markdown, a pipe table (a header row, a delimiter row such as {@code |---|---|}, then rows)
 * is a spec table: each row's first cell is the key and its other cells the value
 * ({@code | Weight | 1.2 kg |}), or, with one row under a header of three or more cells, the header
 * cells are the keys of that row's values (a table laid out sideways), as in HTML tables. See
 * docs/decisions/108.
 */
final class SpecLines {
    /**
     * A spec line: a key of 1 to 40 characters and at most 5 words that starts with a letter,
     * then {@code :} (or a full-width colon), then a value of at most 200 characters. URLs
     * ("https://...") and clock times never match.
     */
    private static final Pattern COLON = Pattern.compile("^\\s*(\\p{L}[^:：\\t]{0,39}?)\\s*[:：]\\s*(\\S.{0,199})$");
    private static final Pattern TAB = Pattern.compile("^\\s*(\\p{L}[^\\t]{0,39}?)\\s*\\t+\\s*([^\\t]{1,200})$");
    private static final Pattern BULLET = Pattern.compile("^\\s*(?:[-*+•‣▪◦–]|\\d{1,2}[.)])\\s+(.*\\S)\\s*$");
    private static final Pattern HEADING = Pattern.compile("^\\s{0,3}(#{1,6})\\s+(.*?)\\s*#*\\s*$");
    private static final Pattern MD_LINK = Pattern.compile("\\[([^\\]]*)]\\([^)]*\\)");
    private static final Pattern MD_EMPHASIS = Pattern.compile("(\\*\\*|__|`)");
    /** Between pairs on one line: a middle dot, bar or bullet, or a gap of two or more spaces. */
    private static final Pattern PAIR_SEPARATOR = Pattern.compile("\\s*[·|•]\\s*| {2,}");
    /** A key never holds these: a key that does was glued from several pairs. */
    private static final Pattern GLUE = Pattern.compile("[·|•]");
    /** An identifier value: one code-like token with a digit ("FH-000104", "A12/3"). */
    private static final Pattern CODE = Pattern.compile("[\\p{L}\\p{N}][\\p{L}\\p{N}._/#-]*");
    /** A sentence end inside a key ("...you need. Fiber content"): prose, not a key. */
    private static final Pattern SENTENCE_IN_KEY = Pattern.compile("\\p{Ll}{4,}[.!?]\\s+\\p{Lu}");
    /**
     * The identifier and category lines a listing may start with are looked for in its first
     * this many non-empty lines (documents) or fields (pages); further down, a quoted SKU is
     * usually another product's (a spare part, a bundle).
     */
    static final int ID_LINES = 10;

    private SpecLines() {
    }

    /** What an identifier key names; {@link #of} is null for a key that names a property of the product. */
    enum Identifier {
        /** The listing's own id: SKU, item / article / product number. */
        LISTING_ID,
        /** The listing's category. */
        CATEGORY,
        /** Supplier, vendor, model or part number, barcode: bookkeeping, not a facet. */
        OTHER;

        private static final Set<String> IDS = Set.of("id", "sku", "skuno", "productid", "productno", "productnumber", "productcode",
                "itemno", "itemnumber", "itemid", "articleno", "articlenumber", "artno", "artnr", "articlenr");
        private static final Set<String> CATEGORIES = Set.of("category", "cat", "productcategory");
        private static final Set<String> OTHERS = Set.of("supplier", "vendor", "suppliercode", "supplierref", "suppliersku",
                "vendorsku", "modelno", "modelnumber", "styleno", "stylenumber", "partno", "partnumber", "mpn", "ean", "gtin", "upc",
                "barcode");

        /** The kind of identifier a key names, or null when it names a property. */
        static Identifier of(String key) {
            String k = ColumnMapping.norm(key);
            if (IDS.contains(k)) {
                return LISTING_ID;
            }
            if (CATEGORIES.contains(k)) {
                return CATEGORY;
            }
            return OTHERS.contains(k) ? OTHER : null;
        }
    }

    /**
     * The listing id and category that identifier pairs name, first of each; every identifier
     * pair is taken here, so that none becomes a spec. Not thread-safe: one per listing.
     */
    static final class Identifiers {
        private String id;
        private String category;

        /**
         * Takes an identifier pair: true when {@code pair} names the listing or its source (then it is
         * not a spec), false for a property of the product. An id counts only when {@code early}
         * (within {@link #ID_LINES}).
         */
        boolean take(Field pair, boolean early) {
            Identifier kind = Identifier.of(pair.key());
            if (kind == null) {
                return false;
            }
            if (kind == Identifier.LISTING_ID && id == null && early) {
                id = pair.text();
            } else if (kind == Identifier.CATEGORY && category == null) {
                category = pair.text();
            }
            return true;
        }

        String id() {
            return id;
        }

        String category() {
            return category;
        }
    }

    /**
     * The pairs a line states: one "Key: value" spec, or several when pairs are joined by
     * {@code ·}, {@code |}, {@code •} or a gap of two or more spaces and every part is a pair; an
     * identifier part may go without a colon ("SKU FH-000104", "ITEM NO. FH-1", and beside it
     * "CAT. Tents"). Empty when the line is not pairs.
     */
    static List<Field> pairs(String line) {
        List<Field> out = new ArrayList<>();
        boolean listingId = false;
        boolean bareOther = false;
        for (String part : PAIR_SEPARATOR.split(line.strip())) {
            if (part.isBlank()) {
                continue;
            }
            Field f = spec(part);
            boolean bare = f == null;
            if (bare) {
                f = bareIdentifier(part);
                if (f == null) {
                    out.clear();
                    break;
                }
            }
            Identifier kind = Identifier.of(f.key());
            listingId |= kind == Identifier.LISTING_ID;
            bareOther |= bare && kind != Identifier.LISTING_ID;
            out.add(f);
        }
        // a bare "CAT. Tents" or "Supplier Northwind" counts only beside a listing id
        if (!out.isEmpty() && (listingId || !bareOther)) {
            return out;
        }
        Field whole = spec(line);
        return whole == null ? List.of() : List.of(whole);
    }

    /**
     * An identifier named without a colon: a known identifier key of one to three words, then
     * the value. A listing id must look like a code ("SKU FH-000104"); "Item no longer sold" is
     * not one.
     */
    private static Field bareIdentifier(String part) {
        String[] words = part.strip().split("\\s+");
        for (int n = 1; n <= Math.min(3, words.length - 1); n++) {
            String key = String.join(" ", Arrays.copyOfRange(words, 0, n));
            Identifier kind = Identifier.of(key);
            if (kind == null) {
                continue;
            }
            String value = String.join(" ", Arrays.copyOfRange(words, n, words.length));
            if (kind == Identifier.LISTING_ID && !(n == words.length - 1 && CODE.matcher(value).matches()
                    && value.chars().anyMatch(Character::isDigit))) {
                return null;
            }
            return Field.spec(stripDot(key), value);
        }
        return null;
    }

    private static String stripDot(String key) {
        return key.endsWith(".") ? key.substring(0, key.length() - 1) : key;
    }

    /** The spec a line states, or null. */
    static Field spec(String line) {
        Matcher m = COLON.matcher(line);
        if (!m.matches()) {
            m = TAB.matcher(line);
            if (!m.matches()) {
                return null;
            }
        }
        String key = m.group(1).strip();
        String value = m.group(2).strip();
        if (value.startsWith("//") || key.split("\\s+").length > 5 || value.isEmpty() || GLUE.matcher(key).find()
                || SENTENCE_IN_KEY.matcher(key).find() || clockTime(key, value)) {
            return null;
        }
        return Field.spec(key, value);
    }

    /** "Boils 1 L in 4:09 min", "a 1:1 ratio": a colon between digits is a time or ratio, not a key's end. */
    private static boolean clockTime(String key, String value) {
        return Character.isDigit(key.charAt(key.length() - 1)) && Character.isDigit(value.charAt(0));
    }

    /**
     * Listing id and category named by spec lines ("SKU: FH-1", "Category: tents"), then the other
     * fields, and what could not be read as written (malformed Markdown tables), by line.
     */
    record Parsed(String id, String category, List<Field> fields, List<LineProblem> problems) {
    }

    /** Something on line {@code line} (1-based) that was read otherwise than it was written, and why. */
    record LineProblem(int line, String reason) {
    }

    /**
     * Reads plain or Markdown text. The title is the first {@code #} heading (Markdown) or else the
     * first non-empty line; an identifier pair ({@code SKU: FH-1}, {@code Item no. FH-1 · Category:
     * Tents}, see {@link Identifier}) in the first {@link #ID_LINES} non-empty lines gives the
     * listing id, a {@code category} pair the category; no identifier pair is kept as a spec.
     */
    static Parsed parse(String text, boolean markdown) {
        String[] lines = text.split("\\r\\n|\\r|\\n", -1);
        List<Field> fields = new ArrayList<>();
        Identifiers ids = new Identifiers();
        int nonEmpty = 0;
        String title = null;
        int titleLine = -1;
        if (markdown) {
            for (int i = 0; i < lines.length; i++) {
                Matcher h = HEADING.matcher(lines[i]);
                if (h.matches() && h.group(1).length() == 1 && !h.group(2).isBlank()) {
                    title = clean(h.group(2), true);
                    titleLine = i;
                    break;
                }
            }
        }
        if (title == null) {
            for (int i = 0; i < lines.length; i++) {
                if (!lines[i].isBlank()) {
                    Matcher h = HEADING.matcher(lines[i]);
                    title = clean(markdown && h.matches() ? h.group(2) : lines[i], markdown);
                    titleLine = i;
                    break;
                }
            }
        }
        if (title != null && !title.isEmpty()) {
            fields.add(Field.of(FieldKind.TITLE, title));
        }
        StringBuilder para = new StringBuilder();
        List<LineProblem> problems = new ArrayList<>();
        for (int i = 0; i < lines.length; i++) {
            if (i == titleLine) {
                continue;
            }
            String line = lines[i];
            if (line.isBlank()) {
                flush(para, fields);
                continue;
            }
            boolean early = ++nonEmpty <= ID_LINES;
            if (line.startsWith("\t")) {
                // Extracted tables (Tika) put each cell on its own tab-indented line, rows apart
                List<String> cells = new ArrayList<>();
                int j = i;
                while (j < lines.length && lines[j].startsWith("\t") && !lines[j].isBlank()) {
                    cells.add(lines[j].strip());
                    j++;
                }
                Field spec = cells.size() == 2 ? spec(cells.get(0) + "\t" + cells.get(1)) : null;
                if (spec != null) {
                    flush(para, fields);
                    if (!ids.take(spec, early)) {
                        fields.add(spec);
                    }
                    i = j - 1;
                    continue;
                }
            }
            if (markdown && i + 1 < lines.length && tableRow(line) && delimiterRow(lines[i + 1])) {
                int end = table(lines, i, fields, ids, nonEmpty, problems);
                if (end > i) {
                    flush(para, fields);
                    nonEmpty += end - i - 1;
                    i = end - 1;
                    continue;
                }
            }
            if (markdown) {
                Matcher h = HEADING.matcher(line);
                if (h.matches()) {
                    flush(para, fields);
                    String t = clean(h.group(2), true);
                    if (!t.isEmpty()) {
                        fields.add(Field.of(FieldKind.HEADING, t));
                    }
                    continue;
                }
                if (line.strip().matches("[-*_=|: ]{3,}")) {
                    flush(para, fields);
                    continue;
                }
            }
            Matcher b = BULLET.matcher(line);
            String content = clean(b.matches() ? b.group(1) : line, markdown);
            List<Field> pairs = pairs(content);
            if (!pairs.isEmpty()) {
                flush(para, fields);
                for (Field pair : pairs) {
                    if (!ids.take(pair, early)) {
                        fields.add(pair);
                    }
                }
            } else if (b.matches()) {
                flush(para, fields);
                fields.add(Field.of(FieldKind.BULLET, content));
            } else {
                if (para.length() > 0) {
                    para.append(' ');
                }
                para.append(content.strip());
            }
        }
        flush(para, fields);
        return new Parsed(ids.id(), ids.category(), fields, problems);
    }

    /** A delimiter row of a pipe table: cells of dashes, perhaps with colons, between pipes. */
    private static final Pattern DELIMITER_ROW = Pattern.compile("^\\s{0,3}\\|?\\s*:?-+:?\\s*(\\|\\s*:?-+:?\\s*)*\\|?\\s*$");

    /** A delimiter row holds a pipe: a line of dashes alone is a rule (or makes the line above a heading). */
    private static boolean delimiterRow(String line) {
        return line.indexOf('|') >= 0 && DELIMITER_ROW.matcher(line).matches();
    }

    /** A line with an unescaped {@code |}: a row of a table once its header and delimiter rows are seen. */
    private static boolean tableRow(String line) {
        for (int k = 0; k < line.length(); k++) {
            char c = line.charAt(k);
            if (c == '\\') {
                k++;
            } else if (c == '|') {
                return true;
            }
        }
        return false;
    }

    /**
     * The cells of a table row: the text between unescaped pipes, a leading and a trailing pipe
     * dropped, {@code \\|} read as {@code |}, each cell stripped and cleaned of Markdown emphasis.
     */
    static List<String> cells(String line) {
        String t = line.strip();
        List<String> out = new ArrayList<>();
        StringBuilder cell = new StringBuilder();
        int from = t.startsWith("|") ? 1 : 0;
        boolean open = false;
        for (int k = from; k < t.length(); k++) {
            char c = t.charAt(k);
            if (c == '\\' && k + 1 < t.length() && t.charAt(k + 1) == '|') {
                cell.append('|');
                k++;
                open = true;
            } else if (c == '|') {
                out.add(clean(cell.toString(), true).replace('\t', ' '));
                cell.setLength(0);
                open = false;
            } else {
                cell.append(c);
                open |= !Character.isWhitespace(c);
            }
        }
        if (open || from == 0 && out.isEmpty()) {
            out.add(clean(cell.toString(), true).replace('\t', ' '));
        }
        return out;
    }

    /**
     * Reads the pipe table whose header row is {@code lines[from]} (its delimiter row follows) into
     * fields. The table ends at a blank line or a line without a pipe. A delimiter row with another
     * number of cells than the header makes no table (Markdown's rule): the lines are read as text
     * and a problem says why; {@code from} is returned. A row with another number of cells than the
     * header is read as it stands, with a problem.
     *
     * @return the line after the table
     */
    private static int table(String[] lines, int from, List<Field> fields, Identifiers ids, int nonEmpty,
                             List<LineProblem> problems) {
        List<String> head = cells(lines[from]);
        int width = cells(lines[from + 1]).size();
        if (width != head.size()) {
            problems.add(new LineProblem(from + 2, "a Markdown table's delimiter row has " + width + " cells but its header row "
                    + head.size() + ", so it is no table; its lines are read as text (give both rows the same cells)"));
            return from;
        }
        int end = from + 2;
        while (end < lines.length && !lines[end].isBlank() && tableRow(lines[end])) {
            end++;
        }
        List<List<String>> rows = new ArrayList<>();
        for (int k = from + 2; k < end; k++) {
            List<String> row = cells(lines[k]);
            if (row.size() != width) {
                problems.add(new LineProblem(k + 1, "a Markdown table row has " + row.size() + " cells under a header of " + width
                        + "; read as it stands (first cell the key, the others its value)"));
            }
            rows.add(row);
        }
        int line = nonEmpty + 1; // the delimiter row's place among the non-empty lines (the header's is nonEmpty)
        if (rows.size() == 1 && width > 2 && rows.get(0).size() == width) {
            // a header of keys over one row of values: a spec table laid out sideways
            for (int c = 0; c < width; c++) {
                String key = head.get(c);
                String value = rows.get(0).get(c);
                if (!value.isEmpty()) {
                    if (key.isEmpty()) {
                        fields.add(Field.of(FieldKind.TEXT, value));
                    } else {
                        tablePair(key, value, fields, ids, line + 1 <= ID_LINES);
                    }
                }
            }
            return end;
        }
        // cells joined by a pipe, a break character, so that no term is mined across two column titles
        String title = String.join(" | ", head.stream().filter(x -> !x.isEmpty()).toList());
        if (!title.isEmpty()) {
            fields.add(Field.of(FieldKind.HEADING, title));
        }
        for (List<String> row : rows) {
            line++;
            String key = row.isEmpty() ? "" : row.get(0);
            List<String> values = new ArrayList<>();
            for (int c = 1; c < row.size(); c++) {
                if (!row.get(c).isEmpty()) {
                    values.add(row.get(c));
                }
            }
            String value = String.join(", ", values);
            if (key.isEmpty() && value.isEmpty()) {
                continue;
            }
            if (value.isEmpty()) {
                fields.add(Field.of(FieldKind.HEADING, key)); // "| **Packing** | |": a section of the table
            } else if (key.isEmpty()) {
                fields.add(Field.of(FieldKind.TEXT, value));
            } else {
                tablePair(key, value, fields, ids, line <= ID_LINES);
            }
        }
        return end;
    }

    /** A key cell and its value (neither empty): a spec when the key is one ({@link #spec}), else the row's text. */
    private static void tablePair(String key, String value, List<Field> fields, Identifiers ids, boolean early) {
        Field spec = spec(key + "\t" + value);
        if (spec == null) {
            fields.add(Field.of(FieldKind.TEXT, key + " | " + value));
        } else if (!ids.take(spec, early)) {
            fields.add(spec);
        }
    }

    private static void flush(StringBuilder para, List<Field> fields) {
        if (para.length() > 0) {
            fields.add(Field.of(FieldKind.TEXT, para.toString()));
            para.setLength(0);
        }
    }

    private static String clean(String s, boolean markdown) {
        String t = s;
        if (markdown) {
            t = MD_LINK.matcher(t).replaceAll("$1");
            t = MD_EMPHASIS.matcher(t).replaceAll("");
        }
        return t.strip();
    }
}
