package dev.sheaf.miner.ingest;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.Charset;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.apache.tika.metadata.Metadata;
import org.apache.tika.parser.html.HtmlEncodingDetector;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.nodes.Node;
import org.jsoup.nodes.Range;
import org.jsoup.nodes.TextNode;
import org.jsoup.parser.Parser;
import org.jsoup.select.Elements;

/**
 * One listing per HTML page, read with jsoup. Title: {@code og:title}, else the first
 * {@code <h1>}, else {@code <title>}. Description: {@code <meta name=description>} (else
 * {@code og:description}). Specs from {@code <table>} rows (th/td or td/td, or a header row over
 * one value row), {@code <dl>} dt/dd pairs and "Key: value" lines in paragraphs and list items;
 * other list items are bullets, other headings headings, other paragraphs text. Id from a meta tag
 * (product-id, sku, product:retailer_item_id), an {@code itemprop=sku} or {@code data-sku} /
 * {@code data-product-id} attribute, else a visible identifier line among the page's first
 * {@link SpecLines#ID_LINES} fields ("SKU FH-000104 · Supplier: ...", "Item no.: ..."), else the
 * file name. Category from a meta tag, the breadcrumb, else a visible category pair. Identifier
 * pairs (SKU, supplier, model number ...) are never specs. Scripts, styles, templates, navigation, headers' menus and footers are ignored.
 *
 * <p>At most {@link SourceFile#writeLimit()} characters of text are kept per page (keys and values
 * of specs count); the field that reaches the limit is cut and the rest of the page is not read,
 * with a "too-large" problem at the line of the block where it stopped. Element positions cost
 * memory, so they are tracked only for a page longer than the limit, or on a second reading when
 * markup that repeats text (nested definition lists) went past it on the first.
 */
final class HtmlReader implements ListingReader {
    private static final String IGNORED = "script, style, noscript, template, iframe, svg, canvas, nav, footer, "
            + "form, button, select, [role=navigation], [hidden], [aria-hidden=true]";
    private static final String BREADCRUMB = "[aria-label~=(?i)breadcrumb], .breadcrumb, .breadcrumbs, "
            + "[itemtype*=BreadcrumbList], #breadcrumb, #breadcrumbs";

    @Override
    public String name() {
        return "HTML";
    }

    @Override
    public void read(SourceFile file) throws IOException {
        String html = file.readText(HtmlReader::declaredCharset);
        if (html == null) {
            return;
        }
        if (!read(file, html, html.length() > file.writeLimit())) {
            read(file, html, true);
        }
    }

    /** False when the text went past the limit without positions tracked (nothing emitted then). */
    private static boolean read(SourceFile file, String html, boolean track) {
        Document doc = track ? Jsoup.parse(html, "", Parser.htmlParser().setTrackPosition(true)) : Jsoup.parse(html);
        String id = firstNonBlank(meta(doc, "product-id"), meta(doc, "sku"), meta(doc, "product:retailer_item_id"),
                attr(doc, "[itemprop=sku]", "content"), text(doc, "[itemprop=sku]"), attr(doc, "[data-sku]", "data-sku"),
                attr(doc, "[data-product-id]", "data-product-id"), null);
        String category = firstNonBlank(meta(doc, "category"), meta(doc, "product-category"), meta(doc, "product:category"),
                breadcrumbCategory(doc), null);
        doc.select(IGNORED).remove();
        doc.select(BREADCRUMB).remove();

        List<Field> fields = new ArrayList<>();
        String h1 = text(doc.body(), "h1");
        String title = firstNonBlank(meta(doc, "og:title"), h1, doc.title(), null);
        String description = firstNonBlank(meta(doc, "description"), meta(doc, "og:description"), null);
        Walk walk = new Walk(fields, title, description, file.writeLimit(), track);
        walk.at = doc.head();
        try {
            if (title != null) {
                walk.keep(Field.of(FieldKind.TITLE, title));
            }
            if (description != null) {
                walk.keep(Field.of(FieldKind.DESCRIPTION, description));
            }
            walk.element(doc.body());
        } catch (Walk.Full full) {
            if (!track) {
                return false;
            }
            file.problem(full.position, "too-large", "only the first " + file.writeLimit() + " characters of text were read "
                    + "(the limit for one listing); the rest of the page was left out. Split the page or raise the text limit");
        }
        if (fields.isEmpty()) {
            file.problem("", "empty", "the page has no title, headings, text or specs; expected a product page");
            return true;
        }
        file.emit(new Listing(firstNonBlank(id, walk.ids.id(), file.stem()), firstNonBlank(category, walk.ids.category(), ""),
                file.display(), "", fields));
        return true;
    }

    /** The charset a page declares in a meta tag, found by Tika's HTML detector. */
    private static Charset declaredCharset(byte[] head) {
        try {
            return new HtmlEncodingDetector().detect(new ByteArrayInputStream(head), new Metadata());
        } catch (IOException e) {
            return null;
        }
    }

    /** Walks the body in reading order, handling each block once. */
    private static final class Walk {
        private final List<Field> fields;
        private final String title;
        private final String description;
        private boolean titleSkipped;
        private final Set<String> seenSpecs = new LinkedHashSet<>();
        final SpecLines.Identifiers ids = new SpecLines.Identifiers();
        private final int limit;
        private final boolean tracked;
        private long used;
        /** The block being read, for the position of a cut. */
        Element at;

        /** The text limit was reached; thrown to stop the walk. */
        static final class Full extends RuntimeException {
            final String position;

            Full(String position) {
                super(null, null, false, false);
                this.position = position;
            }
        }

        Walk(List<Field> fields, String title, String description, int limit, boolean tracked) {
            this.fields = fields;
            this.title = title;
            this.description = description;
            this.limit = limit;
            this.tracked = tracked;
        }

        /** Adds a field within the text limit; the one that reaches it is cut (a spec is left out) and the walk stops. */
        void keep(Field f) {
            long n = (long) f.key().length() + f.text().length();
            if (used + n <= limit) {
                used += n;
                fields.add(f);
                return;
            }
            if (tracked) {
                int room = (int) (limit - used);
                if (f.kind() != FieldKind.SPEC && room > 0) {
                    int end = Character.isHighSurrogate(f.text().charAt(room - 1)) ? room - 1 : room;
                    if (end > 0) {
                        fields.add(Field.of(f.kind(), f.text().substring(0, end)));
                    }
                }
            }
            used = limit;
            Range r = at == null ? null : at.sourceRange();
            throw new Full(r != null && r.isTracked() ? "line " + r.start().lineNumber() : "");
        }

        void element(Element e) {
            if (e == null) {
                return;
            }
            at = e;
            switch (e.normalName()) {
                case "h1", "h2", "h3", "h4", "h5", "h6" -> heading(e.text().strip());
                case "table" -> table(e);
                case "dl" -> definitions(e);
                case "ul", "ol" -> list(e);
                case "p", "blockquote", "pre" -> paragraph(e);
                default -> {
                    StringBuilder own = new StringBuilder();
                    for (Node n : e.childNodes()) {
                        if (n instanceof TextNode t) {
                            own.append(t.getWholeText());
                        } else if (n instanceof Element c) {
                            if (isInline(c)) {
                                own.append(c.wholeText());
                            } else {
                                lines(own.toString(), FieldKind.TEXT);
                                own.setLength(0);
                                element(c);
                            }
                        }
                    }
                    lines(own.toString(), FieldKind.TEXT);
                }
            }
        }

        private static boolean isInline(Element c) {
            return switch (c.normalName()) {
                case "a", "span", "b", "strong", "i", "em", "small", "sup", "sub", "abbr", "code", "mark", "u", "s",
                     "q", "cite", "time", "data", "label", "bdi", "bdo", "wbr", "img" -> true;
                case "br" -> true;
                default -> false;
            };
        }

        private void heading(String t) {
            if (t.isEmpty()) {
                return;
            }
            if (!titleSkipped && t.equals(title)) {
                titleSkipped = true;
                return;
            }
            keep(Field.of(FieldKind.HEADING, t));
        }

        private void paragraph(Element p) {
            lines(textWithBreaks(p), FieldKind.TEXT);
        }

        /** Each line of a block: a spec when it reads "Key: value", otherwise text of the given kind. */
        private void lines(String text, FieldKind otherwise) {
            StringBuilder para = new StringBuilder();
            for (String line : text.split("\\R")) {
                String l = line.strip().replaceAll("\\s+", " ");
                if (l.isEmpty()) {
                    continue;
                }
                List<Field> pairs = SpecLines.pairs(l);
                if (!pairs.isEmpty()) {
                    add(para, otherwise);
                    for (Field pair : pairs) {
                        spec(pair.key(), pair.text());
                    }
                } else {
                    if (para.length() > 0) {
                        para.append(' ');
                    }
                    para.append(l);
                }
            }
            add(para, otherwise);
        }

        private void add(StringBuilder para, FieldKind kind) {
            if (para.length() > 0) {
                String t = para.toString();
                if (!t.equals(description) && !(t.equals(title) && kind == FieldKind.TEXT && !titleSkipped)) {
                    keep(Field.of(kind, t));
                }
                para.setLength(0);
            }
        }

        private void list(Element list) {
            for (Element li : list.children()) {
                if (!li.normalName().equals("li")) {
                    element(li);
                    continue;
                }
                Element copy = li.clone();
                copy.select("ul, ol, dl, table").remove();
                String t = textWithBreaks(copy).strip();
                if (!t.isEmpty()) {
                    List<Field> pairs = t.contains("\n") ? List.of() : SpecLines.pairs(t.replaceAll("\\s+", " "));
                    if (!pairs.isEmpty()) {
                        for (Field pair : pairs) {
                            spec(pair.key(), pair.text());
                        }
                    } else {
                        keep(Field.of(FieldKind.BULLET, t.replaceAll("\\s+", " ")));
                    }
                }
                for (Element nested : li.select("> ul, > ol, > dl, > table")) {
                    element(nested);
                }
            }
        }

        private void definitions(Element dl) {
            String key = null;
            for (Element c : dl.select("dt, dd")) {
                if (c.normalName().equals("dt")) {
                    key = stripColon(c.text());
                } else if (key != null && !key.isEmpty()) {
                    spec(key, c.text().strip());
                }
            }
        }

        private void table(Element table) {
            Elements rows = table.select("tr");
            List<Element> ownRows = new ArrayList<>();
            for (Element r : rows) {
                if (r.closest("table") == table) {
                    ownRows.add(r);
                }
            }
            // A header row of keys over exactly one row of values: a spec table laid out sideways.
            if (ownRows.size() == 2) {
                Elements head = ownRows.get(0).select("> th, > td");
                Elements vals = ownRows.get(1).select("> td, > th");
                if (head.size() > 2 && head.size() == vals.size() && ownRows.get(0).select("> td").isEmpty()) {
                    for (int i = 0; i < head.size(); i++) {
                        spec(stripColon(head.get(i).text()), vals.get(i).text().strip());
                    }
                    return;
                }
            }
            for (Element r : ownRows) {
                Elements cells = r.select("> th, > td");
                if (cells.size() == 2) {
                    spec(stripColon(cells.get(0).text()), cells.get(1).text().strip());
                } else if (cells.size() == 1) {
                    lines(cells.get(0).text(), FieldKind.TEXT);
                } else if (cells.size() > 2 && cells.get(0).normalName().equals("th") && r.select("> th").size() == 1) {
                    // a key cell followed by several values: one spec, values joined
                    List<String> v = new ArrayList<>();
                    for (int i = 1; i < cells.size(); i++) {
                        if (!cells.get(i).text().isBlank()) {
                            v.add(cells.get(i).text().strip());
                        }
                    }
                    spec(stripColon(cells.get(0).text()), String.join(", ", v));
                }
            }
        }

        private void spec(String key, String value) {
            if (key.isEmpty() || value.isEmpty()) {
                return;
            }
            if (ids.take(Field.spec(key, value), fields.size() < SpecLines.ID_LINES)) {
                return;
            }
            if (seenSpecs.add(key + "\u0000" + value)) {
                keep(Field.spec(key, value));
            }
        }

        private static String stripColon(String k) {
            String s = k.strip();
            while (s.endsWith(":") || s.endsWith("：")) {
                s = s.substring(0, s.length() - 1).strip();
            }
            return s;
        }
    }

    /** Text of an element with {@code <br>} as line breaks and whitespace otherwise collapsed. */
    private static String textWithBreaks(Element e) {
        StringBuilder b = new StringBuilder();
        for (Node n : e.childNodes()) {
            if (n instanceof TextNode t) {
                b.append(t.text());
            } else if (n instanceof Element c) {
                if (c.normalName().equals("br")) {
                    b.append('\n');
                } else {
                    b.append(textWithBreaks(c));
                    if (c.isBlock()) {
                        b.append('\n');
                    }
                }
            }
        }
        return b.toString();
    }

    private static String breadcrumbCategory(Document doc) {
        Element crumb = doc.selectFirst(BREADCRUMB);
        if (crumb == null) {
            return null;
        }
        Elements links = crumb.select("a");
        String last = null;
        for (Element a : links) {
            String t = a.text().strip();
            if (!t.isEmpty() && !t.equalsIgnoreCase("home")) {
                last = t;
            }
        }
        return last;
    }

    private static String meta(Document doc, String name) {
        Element m = doc.selectFirst("meta[name=\"" + name + "\"], meta[property=\"" + name + "\"]");
        if (m == null) {
            return null;
        }
        String c = m.attr("content").strip();
        return c.isEmpty() ? null : c;
    }

    private static String attr(Document doc, String query, String attr) {
        Element e = doc.selectFirst(query);
        if (e == null) {
            return null;
        }
        String v = e.attr(attr).strip();
        return v.isEmpty() ? null : v;
    }

    private static String text(Element root, String query) {
        if (root == null) {
            return null;
        }
        Element e = root.selectFirst(query);
        if (e == null) {
            return null;
        }
        String t = e.text().strip();
        return t.isEmpty() ? null : t;
    }

    private static String firstNonBlank(String... s) {
        for (String x : s) {
            if (x != null && !x.isBlank()) {
                return x.strip();
            }
        }
        return s[s.length - 1];
    }
}
