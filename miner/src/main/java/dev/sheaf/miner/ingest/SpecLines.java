package dev.sheaf.miner.ingest;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Turns plain lines into listing fields: {@code "Key: value"} (or {@code "Key<TAB>value"}, as
 * extracted tables come out) becomes a spec, {@code "- x"} / {@code "* x"} / {@code "• x"} a
 * bullet, a Markdown {@code #} line a heading, other lines are joined into paragraphs.
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

    private SpecLines() {
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
        if (value.startsWith("//") || key.split("\\s+").length > 5 || value.isEmpty()) {
            return null;
        }
        return Field.spec(key, value);
    }

    /** Listing id and category named by spec lines ("SKU: FH-1", "Category: tents"), then the other fields. */
    record Parsed(String id, String category, List<Field> fields) {
    }

    /**
     * Reads plain or Markdown text. The title is the first {@code #} heading (Markdown) or else the
     * first non-empty line; an {@code id}/{@code sku}/{@code product id} spec gives the listing id, a
     * {@code category} spec the category (neither is kept as a spec).
     */
    static Parsed parse(String text, boolean markdown) {
        String[] lines = text.split("\\r\\n|\\r|\\n", -1);
        List<Field> fields = new ArrayList<>();
        String id = null;
        String category = null;
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
        for (int i = 0; i < lines.length; i++) {
            if (i == titleLine) {
                continue;
            }
            String line = lines[i];
            if (line.isBlank()) {
                flush(para, fields);
                continue;
            }
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
                    fields.add(spec);
                    i = j - 1;
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
            Field spec = spec(content);
            if (spec != null) {
                flush(para, fields);
                String k = ColumnMapping.norm(spec.key());
                if (id == null && (k.equals("id") || k.equals("sku") || k.equals("productid") || k.equals("itemno"))) {
                    id = spec.text();
                } else if (category == null && k.equals("category")) {
                    category = spec.text();
                } else {
                    fields.add(spec);
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
        return new Parsed(id, category, fields);
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
