package dev.sheaf.miner.report;

import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.io.AtomicFiles;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Base64;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * The front door of the audit report: one self-contained HTML page (inline CSS, inline SVG charts,
 * one small inline script that sorts tables; no fonts, images or scripts from anywhere else) with a
 * one-screen summary, sections, figures, tables and attribute cards.
 *
 * <pre>{@code
 * HtmlReport report = HtmlReport.builder("Fernhollow Outfitters: vocabulary audit")
 *         .keyFigure(KeyFigure.count("Listings", 1240, "from 6 sources"))
 *         .section(Section.builder("agreement", "Agreement").add(figure).add(table).build())
 *         .build();
 * report.write(Path.of("out/audit.html"));   // the page, and its tables as CSV and JSON
 * }</pre>
 *
 * <p>Every piece of text handed to the builder or held in the records (titles, labels, evidence
 * lines, sentences) is escaped by one function before it reaches the page, so catalog or feedback
 * text can never become markup. A Content-Security-Policy in the page allows only its own inline
 * styles, the one script by its SHA-256 hash, and data: images; it forbids every fetch, so even a
 * bug cannot make the page load anything. The same report gives the same bytes.
 */
public final class HtmlReport {
    /** Cautions every report carries, in this order, before any the caller adds. */
    public static final List<String> STANDARD_CAUTIONS = List.of(
            "Labels in this report were mined from listing text. They are not verified product claims: a label says "
                    + "the listing's own text supports it, not that the product has the property.",
            "Regulated and safety claims (waterproof ratings, flame resistance, UV protection, child safety and fibre "
                    + "content) need human and compliance review before they are used. The labelling rules that apply "
                    + "where the products are sold take precedence over anything in this report.",
            "Annotators are shown by pseudonym only (such as ann-3f9c1e). Their ids are personal data and are not in "
                    + "this report.",
            "Each figure states its method and thresholds. Read intervals and counts with it: a figure from a few "
                    + "items can move a lot with one more judgment.");

    /** Tables with more rows than this scroll inside a box on screen (they print in full). */
    static final int LONG_TABLE_ROWS = 12;

    /** Entries in the attention list when it is drawn from the cards. */
    public static final int DEFAULT_ATTENTION_LIMIT = 5;

    static final String SCRIPT = resource("report.js");
    static final String STYLE = resource("report.css");
    static final String SCRIPT_HASH = "sha256-" + sha256Base64(SCRIPT);
    static final String CSP = "default-src 'none'; style-src 'unsafe-inline'; img-src data:; script-src '" + SCRIPT_HASH
            + "'; base-uri 'none'; form-action 'none'";

    private static final Set<String> RESERVED_IDS = Set.of("summary", "attention", "cautions", "contents");

    private final String title;
    private final String subtitle;
    private final String meta;
    private final List<KeyFigure> keyFigures;
    private final List<AttentionItem> attention;
    private final boolean attentionFromCards;
    private final List<String> cautions;
    private final List<Section> sections;
    private final Map<String, String> cardAnchors;

    private HtmlReport(Builder b, List<AttentionItem> attention, Map<String, String> cardAnchors) {
        this.title = b.title;
        this.subtitle = b.subtitle;
        this.meta = b.meta;
        this.keyFigures = List.copyOf(b.keyFigures);
        this.attention = List.copyOf(attention);
        this.attentionFromCards = b.attention.isEmpty();
        List<String> all = new ArrayList<>(STANDARD_CAUTIONS);
        all.addAll(b.cautions);
        this.cautions = List.copyOf(all);
        this.sections = List.copyOf(b.sections);
        this.cardAnchors = Map.copyOf(cardAnchors);
    }

    /** A builder for a report with this title. */
    public static Builder builder(String title) {
        return new Builder(title);
    }

    /** The page's title. */
    public String title() {
        return title;
    }

    /** The attention list as shown: the one given, or the one drawn from the cards. */
    public List<AttentionItem> attention() {
        return attention;
    }

    /** Every table of every section, in page order. */
    public List<ReportTable> tables() {
        List<ReportTable> out = new ArrayList<>();
        for (Section s : sections) {
            for (Block b : s.blocks()) {
                if (b instanceof ReportTable t) {
                    out.add(t);
                }
            }
        }
        return out;
    }

    /** The page, without notes about table files. */
    public String render() {
        return render(null);
    }

    /** Writes the page alone, atomically (UTF-8). */
    public void writeHtml(Path file) throws IOException {
        AtomicFiles.writeString(file, render());
    }

    /**
     * Writes the page and, in the folder {@code <name>-tables} beside it, every table as
     * {@code <table id>.csv} and {@code <table id>.json}; each table on the page names its files.
     * Every file is written atomically.
     *
     * @return the files written, the page first
     */
    public List<Path> write(Path file) throws IOException {
        Path abs = file.toAbsolutePath();
        String name = abs.getFileName().toString();
        String stem = name.contains(".") ? name.substring(0, name.lastIndexOf('.')) : name;
        String folder = stem + "-tables";
        List<Path> written = new ArrayList<>();
        AtomicFiles.writeString(abs, render(folder));
        written.add(abs);
        written.addAll(ReportTables.writeAll(abs.resolveSibling(folder), tables()));
        return written;
    }

    // ------------------------------------------------------------------------------------ rendering

    private String render(String tablesFolder) {
        StringBuilder h = new StringBuilder(64 * 1024);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        // our own constant, written as is so it reads plainly in the page source (it holds no " < > or &)
        h.append("<meta http-equiv=\"Content-Security-Policy\" content=\"").append(CSP).append("\">\n");
        h.append("<meta name=\"referrer\" content=\"no-referrer\">\n");
        h.append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        h.append("<meta name=\"color-scheme\" content=\"light\">\n");
        h.append("<meta name=\"generator\" content=\"Sheaf\">\n");
        h.append("<title>").append(Html.escape(title)).append("</title>\n");
        h.append("<style>\n").append(STYLE).append("</style>\n</head>\n<body>\n<div class=\"page\">\n");

        h.append("<header class=\"masthead\">\n<p class=\"kicker\">Sheaf audit report</p>\n");
        h.append("<h1>").append(Html.escape(title)).append("</h1>\n");
        if (!subtitle.isEmpty()) {
            h.append("<p class=\"subtitle\">").append(Html.escape(subtitle)).append("</p>\n");
        }
        if (!meta.isEmpty()) {
            h.append("<p class=\"meta\">").append(Html.escape(meta)).append("</p>\n");
        }
        if (!sections.isEmpty()) {
            h.append("<nav class=\"toc\" id=\"contents\" aria-label=\"Contents\">\n<ol>\n");
            h.append("<li><a href=\"#summary\">Summary</a></li>\n");
            for (Section s : sections) {
                h.append("<li><a").append(Html.attr("href", "#" + s.id())).append('>').append(Html.escape(s.title()))
                        .append("</a></li>\n");
            }
            h.append("</ol>\n</nav>\n");
        }
        h.append("</header>\n");

        summary(h);
        h.append("<main>\n");
        for (Section s : sections) {
            h.append("<section").append(Html.attr("id", s.id())).append(Html.attr("aria-labelledby", s.id() + "-h"))
                    .append(">\n<h2").append(Html.attr("id", s.id() + "-h")).append('>').append(Html.escape(s.title()))
                    .append("</h2>\n");
            for (Block b : s.blocks()) {
                if (b instanceof Paragraph p) {
                    h.append("<p>").append(Html.escape(p.text())).append("</p>\n");
                } else if (b instanceof Figure f) {
                    figure(h, f);
                } else if (b instanceof ReportTable t) {
                    table(h, t, tablesFolder);
                } else if (b instanceof AttributeCard c) {
                    card(h, c);
                }
            }
            h.append("</section>\n");
        }
        h.append("</main>\n");
        h.append("<footer>\n<p>Made with Sheaf. This page is self-contained and loads nothing: its charts are inline "
                + "SVG, and its one script only sorts the tables when a column header is clicked.</p>\n</footer>\n");
        h.append("</div>\n<script>").append(SCRIPT).append("</script>\n</body>\n</html>\n");
        return h.toString();
    }

    private void summary(StringBuilder h) {
        h.append("<section class=\"summary\" id=\"summary\" aria-labelledby=\"summary-h\">\n");
        h.append("<h2 id=\"summary-h\">Summary</h2>\n");
        if (!keyFigures.isEmpty()) {
            h.append("<div class=\"tiles\">\n");
            for (KeyFigure k : keyFigures) {
                h.append("<div class=\"tile\"><span class=\"label\">").append(Html.escape(k.label()))
                        .append("</span><span class=\"value\">").append(Html.escape(k.value())).append("</span>");
                if (!k.note().isEmpty()) {
                    h.append("<span class=\"note\">").append(Html.escape(k.note())).append("</span>");
                }
                h.append("</div>\n");
            }
            h.append("</div>\n");
        }
        h.append("<div class=\"summary-grid\">\n<div class=\"attention\" id=\"attention\">\n");
        h.append("<h3>Most in need of attention</h3>\n");
        if (attention.isEmpty()) {
            h.append("<p>No attribute is flagged or marked for review.</p>\n");
        } else {
            h.append("<ol>\n");
            for (AttentionItem a : attention) {
                h.append("<li>");
                String anchor = a.cardId().isEmpty() ? null : cardAnchors.get(a.cardId());
                if (anchor != null) {
                    h.append("<a class=\"name\"").append(Html.attr("href", "#" + anchor)).append('>')
                            .append(Html.escape(a.label())).append("</a>");
                } else {
                    h.append("<span class=\"name\">").append(Html.escape(a.label())).append("</span>");
                }
                h.append("<ul class=\"reasons\">");
                for (String reason : a.reasons()) {
                    h.append("<li>").append(Html.escape(reason)).append("</li>");
                }
                h.append("</ul></li>\n");
            }
            h.append("</ol>\n");
            if (attentionFromCards) {
                h.append("<p class=\"rule\">Ranked by the number of flags and review notes on each attribute; ties keep "
                        + "the order of the attribute cards.</p>\n");
            }
        }
        h.append("</div>\n<aside class=\"cautions\" id=\"cautions\" role=\"note\" aria-labelledby=\"cautions-h\">\n");
        h.append("<h3 id=\"cautions-h\">Before you act on this report</h3>\n<ul>\n");
        for (String c : cautions) {
            h.append("<li>").append(Html.escape(c)).append("</li>\n");
        }
        h.append("</ul>\n</aside>\n</div>\n</section>\n");
    }

    private static void figure(StringBuilder h, Figure f) {
        h.append("<figure").append(Html.attr("id", f.id() + "-figure")).append(Html.attr("aria-labelledby", f.id() + "-caption"))
                .append(">\n<figcaption class=\"caption\"").append(Html.attr("id", f.id() + "-caption")).append('>')
                .append(Html.escape(f.title())).append("</figcaption>\n");
        h.append("<div class=\"chart\" role=\"img\"").append(Html.attr("aria-label", f.title())).append(">\n")
                .append(f.svg()).append("\n</div>\n");
        h.append("<p class=\"how\"><strong>How to read this.</strong> ").append(Html.escape(f.howToRead().sentence()))
                .append("</p>\n</figure>\n");
    }

    private static void table(StringBuilder h, ReportTable t, String tablesFolder) {
        boolean longTable = t.rows().size() > LONG_TABLE_ROWS;
        h.append("<div class=\"table-wrap").append(longTable ? " long" : "").append("\">\n");
        if (longTable) {
            h.append("<div class=\"scroll\"").append(Html.attr("aria-label", t.caption())).append(" tabindex=\"0\">\n");
        }
        h.append("<table class=\"sortable\"").append(Html.attr("id", t.id())).append(">\n");
        h.append("<caption>").append(Html.escape(t.caption())).append("<span class=\"count\">")
                .append(Html.escape(Numbers.count(t.rows().size()) + (t.rows().size() == 1 ? " row" : " rows")
                        + (longTable ? ", scroll for more" : "")))
                .append("</span></caption>\n<thead>\n<tr>");
        for (ReportTable.Column c : t.columns()) {
            boolean num = c.kind() != ValueKind.TEXT;
            h.append("<th scope=\"col\"").append(num ? " class=\"num\"" : "")
                    .append(Html.attr("data-kind", c.kind().name().toLowerCase(java.util.Locale.ROOT)))
                    .append(" aria-sort=\"none\"><button type=\"button\">").append(Html.escape(c.name()))
                    .append("</button></th>");
        }
        h.append("</tr>\n</thead>\n<tbody>\n");
        for (List<Object> row : t.rows()) {
            h.append("<tr>");
            for (int i = 0; i < row.size(); i++) {
                ValueKind kind = t.columns().get(i).kind();
                Object cell = row.get(i);
                if (kind == ValueKind.TEXT) {
                    h.append("<td>").append(Html.escape((String) cell)).append("</td>");
                } else {
                    double v = ((Number) cell).doubleValue();
                    h.append("<td class=\"num").append(Double.isNaN(v) ? " na" : "").append('"')
                            .append(Html.attr("data-sort", Numbers.sortKey(v))).append('>')
                            .append(Html.escape(Numbers.format(v, kind))).append("</td>");
                }
            }
            h.append("</tr>\n");
        }
        h.append("</tbody>\n</table>\n");
        if (longTable) {
            h.append("</div>\n");
        }
        StringBuilder note = new StringBuilder(t.note());
        if (tablesFolder != null) {
            note.append(note.length() == 0 ? "" : " ").append("The same table, with unrounded numbers, is in ")
                    .append(tablesFolder).append('/').append(t.id()).append(".csv and ").append(t.id())
                    .append(".json beside this page.");
        }
        if (note.length() > 0) {
            h.append("<p class=\"table-note\">").append(Html.escape(note.toString())).append("</p>\n");
        }
        h.append("</div>\n");
    }

    private void card(StringBuilder h, AttributeCard c) {
        String anchor = cardAnchors.get(c.id());
        h.append("<article class=\"card").append(c.flags().isEmpty() ? "" : " flagged").append('"')
                .append(Html.attr("id", anchor)).append(Html.attr("aria-labelledby", anchor + "-h")).append(">\n<header>");
        h.append("<h3").append(Html.attr("id", anchor + "-h")).append('>').append(Html.escape(c.label())).append("</h3>");
        if (!c.facet().isEmpty()) {
            h.append("<span class=\"chip\">").append(Html.escape(c.facet())).append("</span>");
        }
        h.append("<span class=\"cid\">").append(Html.escape(c.id())).append("</span></header>\n");
        if (!c.otherLabels().isEmpty()) {
            h.append("<p class=\"labels\">Also written as: ").append(Html.escape(String.join(", ", c.otherLabels())))
                    .append("</p>\n");
        }
        if (c.needsReview()) {
            h.append("<p class=\"review\"><strong>Needs human and compliance review.</strong> ")
                    .append(Html.escape(c.review())).append("</p>\n");
        }
        h.append("<div class=\"card-body\">\n<div>\n");
        if (!c.measures().isEmpty()) {
            h.append("<h4>Figures</h4>\n<dl class=\"measures\">\n");
            for (Measure m : c.measures()) {
                h.append("<dt>").append(Html.escape(m.name())).append("</dt><dd>").append(Html.escape(m.shown()));
                if (!m.basis().isEmpty()) {
                    h.append("<span class=\"basis\">").append(Html.escape(m.basis())).append("</span>");
                }
                h.append("</dd>\n");
            }
            h.append("</dl>\n");
        }
        h.append("<h4>Flags</h4>\n");
        if (c.flags().isEmpty()) {
            h.append("<p class=\"noflags\">No flag raised.</p>\n");
        } else {
            h.append("<ul class=\"flags\">\n");
            for (ReportFlag f : c.flags()) {
                h.append("<li><span class=\"flag-kind\"").append(Html.attr("title", f.kind().meaning())).append('>')
                        .append(Html.escape(f.kind().label())).append("</span>").append(Html.escape(f.statement()));
                if (!f.detail().isEmpty()) {
                    h.append("<span class=\"flag-detail\">").append(Html.escape(f.detail())).append("</span>");
                }
                h.append("</li>\n");
            }
            h.append("</ul>\n");
        }
        h.append("</div>\n<div>\n<h4>Evidence</h4>\n");
        if (c.evidence().isEmpty()) {
            h.append("<p class=\"more\">No evidence line found.</p>\n");
        } else {
            h.append("<ol class=\"evidence\">\n");
            for (EvidenceLine e : c.evidence()) {
                h.append("<li><span class=\"kwic\"><span class=\"left\">").append(Html.escape(e.left()))
                        .append("</span><span class=\"match\">").append(Html.escape(e.match()))
                        .append("</span><span class=\"right\">").append(Html.escape(e.right())).append("</span></span>")
                        .append("<span class=\"where\">").append(Html.escape(where(e))).append("</span></li>\n");
            }
            h.append("</ol>\n");
            if (c.evidenceTotal() > c.evidence().size()) {
                h.append("<p class=\"more\">").append(Html.escape(Numbers.count(c.evidence().size()) + " of "
                        + Numbers.count(c.evidenceTotal()) + " evidence lines shown.")).append("</p>\n");
            }
        }
        h.append("</div>\n</div>\n</article>\n");
    }

    /** "catalog/html/tents.html · line 12 · description · FH-000123", or "spec Weight" for spec fields. */
    private static String where(EvidenceLine e) {
        List<String> parts = new ArrayList<>();
        parts.add(e.source());
        if (!e.locator().isEmpty()) {
            parts.add(e.locator());
        }
        parts.add(e.key().isEmpty() ? e.field() : e.field() + " \u201c" + e.key() + "\u201d");
        parts.add(e.listingId());
        return String.join(" \u00b7 ", parts);
    }

    // ------------------------------------------------------------------------------------- building

    /** Collects the report's parts; {@link #build()} checks that ids are unique and links resolve. */
    public static final class Builder {
        private final String title;
        private String subtitle = "";
        private String meta = "";
        private final List<KeyFigure> keyFigures = new ArrayList<>();
        private final List<AttentionItem> attention = new ArrayList<>();
        private int attentionLimit = DEFAULT_ATTENTION_LIMIT;
        private final List<String> cautions = new ArrayList<>();
        private final List<Section> sections = new ArrayList<>();

        private Builder(String title) {
            this.title = Objects.requireNonNull(title, "title");
            if (title.isBlank()) {
                throw new IllegalArgumentException("a report needs a title");
            }
        }

        /** One line under the title (what was audited). */
        public Builder subtitle(String subtitle) {
            this.subtitle = Objects.requireNonNull(subtitle, "subtitle");
            return this;
        }

        /** A small line with provenance (workspace, sources, date); pass a fixed date for reproducible bytes. */
        public Builder meta(String meta) {
            this.meta = Objects.requireNonNull(meta, "meta");
            return this;
        }

        /** A tile of the summary. */
        public Builder keyFigure(KeyFigure figure) {
            keyFigures.add(Objects.requireNonNull(figure, "figure"));
            return this;
        }

        /**
         * An entry of "most in need of attention". When none is given, the list is drawn from the
         * attribute cards: those with flags or a review note, most first, at most {@link #attentionLimit}.
         */
        public Builder attention(AttentionItem item) {
            attention.add(Objects.requireNonNull(item, "item"));
            return this;
        }

        /** Most entries drawn from the cards; default {@value HtmlReport#DEFAULT_ATTENTION_LIMIT}. */
        public Builder attentionLimit(int limit) {
            if (limit < 1) {
                throw new IllegalArgumentException("the attention limit must be at least 1, got " + limit);
            }
            this.attentionLimit = limit;
            return this;
        }

        /** A caution added after {@link HtmlReport#STANDARD_CAUTIONS}. */
        public Builder caution(String caution) {
            Objects.requireNonNull(caution, "caution");
            if (caution.isBlank()) {
                throw new IllegalArgumentException("a caution needs text");
            }
            cautions.add(caution);
            return this;
        }

        public Builder section(Section section) {
            sections.add(Objects.requireNonNull(section, "section"));
            return this;
        }

        public HtmlReport build() {
            Set<String> ids = new HashSet<>(RESERVED_IDS);
            Map<String, String> anchors = new LinkedHashMap<>();
            List<AttributeCard> cards = new ArrayList<>();
            for (Section s : sections) {
                unique(ids, s.id(), "section");
                unique(ids, s.id() + "-h", "section heading");
                for (Block b : s.blocks()) {
                    if (b instanceof Figure f) {
                        unique(ids, f.id(), "figure");
                        unique(ids, f.id() + "-figure", "figure");
                        unique(ids, f.id() + "-caption", "figure caption");
                    } else if (b instanceof ReportTable t) {
                        unique(ids, t.id(), "table");
                    } else if (b instanceof AttributeCard c) {
                        if (anchors.containsKey(c.id())) {
                            throw new IllegalArgumentException("two attribute cards have the id '" + c.id()
                                    + "'; give each attribute one card");
                        }
                        String anchor = "attr-" + (anchors.size() + 1);
                        unique(ids, anchor, "attribute card");
                        anchors.put(c.id(), anchor);
                        cards.add(c);
                    }
                }
            }
            for (AttentionItem a : attention) {
                if (!a.cardId().isEmpty() && !anchors.containsKey(a.cardId())) {
                    throw new IllegalArgumentException("attention item '" + a.label() + "' points to card '" + a.cardId()
                            + "', which is not in the report; add the card or leave cardId empty");
                }
            }
            List<AttentionItem> list = attention.isEmpty() ? fromCards(cards, attentionLimit) : attention;
            return new HtmlReport(this, list, anchors);
        }

        private static void unique(Set<String> ids, String id, String what) {
            if (!ids.add(id)) {
                throw new IllegalArgumentException("the " + what + " id '" + id + "' is used twice in the report (or is "
                        + "reserved: " + RESERVED_IDS + "); ids become element ids and must be unique");
            }
        }
    }

    /** Cards with flags or a review note, by how many, ties in card order. */
    static List<AttentionItem> fromCards(List<AttributeCard> cards, int limit) {
        Map<AttributeCard, Integer> order = new HashMap<>();
        List<AttributeCard> candidates = new ArrayList<>();
        for (AttributeCard c : cards) {
            if (!c.flags().isEmpty() || c.needsReview()) {
                order.put(c, candidates.size());
                candidates.add(c);
            }
        }
        candidates.sort(Comparator.comparingInt((AttributeCard c) -> -(c.flags().size() + (c.needsReview() ? 1 : 0)))
                .thenComparingInt(order::get));
        List<AttentionItem> out = new ArrayList<>();
        for (AttributeCard c : candidates.subList(0, Math.min(limit, candidates.size()))) {
            List<String> reasons = new ArrayList<>();
            for (ReportFlag f : c.flags()) {
                reasons.add(f.kind().label() + ": " + f.statement());
            }
            if (c.needsReview()) {
                reasons.add("needs human and compliance review");
            }
            String label = c.facet().isEmpty() ? c.label() : c.label() + " (" + c.facet() + ")";
            out.add(new AttentionItem(label, c.id(), reasons));
        }
        return out;
    }

    // ------------------------------------------------------------------------------------- resources

    private static String resource(String name) {
        try (InputStream in = HtmlReport.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("the report resource " + name + " is missing from the class path");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the report resource " + name, e);
        }
    }

    static String sha256Base64(String text) {
        try {
            return Base64.getEncoder().encodeToString(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }
}
