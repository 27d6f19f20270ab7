package dev.sheaf.miner.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.AgreementThresholds;
import dev.sheaf.miner.text.EvidenceLine;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HtmlReportTest {
    @TempDir
    Path tmp;

    static EvidenceLine line(String text, String match) {
        int at = text.indexOf(match);
        return EvidenceLine.cut("FH-000118", "catalog/html/tents/ridgeline-2.html", "line 14", "description", "", text, at,
                at + match.length(), 40);
    }

    static AttributeCard card(String id, String label, int flags, String review) {
        List<ReportFlag> list = new ArrayList<>();
        for (int i = 0; i < flags; i++) {
            list.add(new ReportFlag(FlagKind.THIN, "fill rate", 0.1, ValueKind.SHARE, Comparison.BELOW, 0.3, "thin edge", ""));
        }
        return new AttributeCard(id, label, "weather resistance", List.of(), List.of(), list, review,
                List.of(line("Fully taped fly, waterproof to 3,000 mm.", "waterproof")), 1);
    }

    /** A report that uses every kind of block. */
    static HtmlReport sample(String text) {
        AgreementReport agreement = ChartsTest.agreement("fit", AgreementThresholds.DEFAULTS);
        ReportTable table = ReportTable.builder("alpha-table", "Agreement " + text, ReportTable.Column.text("attribute " + text),
                        ReportTable.Column.coefficient("alpha"), ReportTable.Column.count("items"))
                .row("fit " + text, 0.41, 14).row("closure", Double.NaN, 3).note("note " + text).build();
        AttributeCard c = new AttributeCard("c-" + text, "waterproof " + text, "facet " + text, List.of("alt " + text),
                List.of(new Measure("fill rate " + text, 0.41, ValueKind.SHARE, "basis " + text)),
                List.of(new ReportFlag(FlagKind.VAGUE, "hedged " + text, 0.31, ValueKind.SHARE, Comparison.AT_OR_ABOVE, 0.25,
                        "edge " + text, "detail " + text)),
                "review " + text,
                List.of(new EvidenceLine("FH-" + text, "src " + text, "loc " + text, "field " + text, "key " + text,
                        "left " + text + " ", "waterproof", " right " + text, 10, 20)), 3);
        Section s = Section.builder("agreement", "Agreement " + text)
                .text("paragraph " + text)
                .add(new Figure("alpha", "Alpha " + text, Charts.alpha("alpha", agreement, Map.of("fit", "fit " + text)),
                        new HowToRead("measures " + text, "method " + text, List.of("threshold " + text))))
                .add(table)
                .add(c)
                .build();
        return HtmlReport.builder("Audit " + text).subtitle("subtitle " + text).meta("meta " + text)
                .keyFigure(new KeyFigure("label " + text, "value " + text, "note " + text))
                .caution("caution " + text)
                .section(s)
                .build();
    }

    static List<String> externalReferences(Document dom) {
        List<String> found = new ArrayList<>();
        for (Element e : dom.getAllElements()) {
            for (Attribute a : e.attributes()) {
                String key = a.getKey().toLowerCase(Locale.ROOT);
                String v = a.getValue().strip().toLowerCase(Locale.ROOT);
                if (Set.of("src", "href", "xlink:href", "srcset", "action", "formaction", "poster", "data").contains(key)
                        && !v.startsWith("#")) {
                    found.add(e.tagName() + " " + key + "=" + a.getValue());
                }
                if (key.equals("style") && v.contains("url(") && !v.matches("(?s)[^(]*(url\\(#[^)]*\\)[^(]*)+")) {
                    found.add(e.tagName() + " " + key + "=" + a.getValue());
                }
            }
        }
        return found;
    }

    static String sha256(String s) throws Exception {
        return Base64.getEncoder().encodeToString(MessageDigest.getInstance("SHA-256").digest(s.getBytes(StandardCharsets.UTF_8)));
    }

    @Test
    void hostileTextEverywhereStaysTextAndAddsNoMarkup() throws Exception {
        String html = sample(Hostile.ALL).render();
        Document dom = Jsoup.parse(html);
        assertEquals(1, dom.select("script").size(), "only the report's own script");
        assertEquals(HtmlReport.SCRIPT, dom.selectFirst("script").data());
        assertEquals(1, dom.select("style").size(), "only the report's own style sheet");
        assertEquals(1, dom.select("svg").size(), "only the chart's svg");
        assertTrue(dom.select("img, iframe, math, object, embed, link, base, form, textarea, a[href^=javascript]").isEmpty());
        for (Element e : dom.getAllElements()) {
            for (Attribute a : e.attributes()) {
                assertFalse(a.getKey().toLowerCase(Locale.ROOT).startsWith("on"), e.tagName() + " has " + a);
                assertFalse(a.getKey().equals("autofocus"), e.tagName() + " has " + a);
            }
        }
        assertEquals(List.of(), externalReferences(dom));
        assertEquals("Audit " + Hostile.ALL, dom.title());
        String text = dom.body().text();
        for (String piece : List.of("paragraph ", "subtitle ", "meta ", "label ", "value ", "note ", "caution ", "Measures ",
                "method ", "threshold ", "Agreement ", "attribute ", "fit ", "note ", "waterproof ", "facet ", "alt ",
                "fill rate ", "basis ", "hedged ", "edge ", "detail ", "review ", "left ", "right ", "src ", "loc ",
                "field ", "key ", "FH-")) {
            assertTrue(text.contains(piece + Hostile.ALL) || text.contains(piece + Hostile.ALL.strip()),
                    "'" + piece + "…' is visible as text");
        }
    }

    @Test
    void policyAllowsExactlyTheOneScriptByItsHashAndForbidsEveryFetch() throws Exception {
        Document dom = Jsoup.parse(sample("plain").render());
        Element meta = dom.selectFirst("meta[http-equiv=Content-Security-Policy]");
        String csp = meta.attr("content");
        assertTrue(csp.startsWith("default-src 'none';"), csp);
        assertTrue(csp.contains("script-src 'sha256-" + sha256(dom.selectFirst("script").data()) + "'"), csp);
        assertTrue(csp.contains("style-src 'unsafe-inline'") && csp.contains("img-src data:"), csp);
        assertFalse(csp.contains("unsafe-eval") || csp.contains("http") || csp.contains("*"), csp);
        assertEquals("meta", dom.head().child(1).tagName(), "the policy comes right after the charset, before anything loads");
        assertEquals(0, dom.select("script[src], link, img, iframe").size());
    }

    @Test
    void sameReportGivesTheSameBytes() {
        assertEquals(sample("x").render(), sample("x").render());
    }

    @Test
    void everyFigureCarriesItsHowToReadSentence() {
        Document dom = Jsoup.parse(sample("x").render());
        for (Element figure : dom.select("figure")) {
            Element how = figure.selectFirst("p.how");
            assertTrue(how != null && how.text().startsWith("How to read this."), figure.id());
            assertTrue(how.text().contains("Method: method x") && how.text().contains("Threshold: threshold x"), how.text());
        }
    }

    @Test
    void cautionsNameEveryRegulatedClaimAndPseudonyms() {
        Element box = Jsoup.parse(sample("x").render()).getElementById("cautions");
        String text = box.text();
        for (String must : List.of("not verified product claims", "waterproof ratings", "flame resistance", "UV protection",
                "child safety", "fibre content", "compliance review", "labelling rules", "pseudonym", "caution x")) {
            assertTrue(text.contains(must), must);
        }
    }

    @Test
    void tableCellsCarrySortKeysAndSayNotAvailable() {
        Document dom = Jsoup.parse(sample("x").render());
        List<Element> alpha = dom.select("#alpha-table tbody td:nth-child(2)");
        assertEquals("0.41", alpha.get(0).attr("data-sort"));
        assertEquals("0.410", alpha.get(0).text());
        assertEquals("", alpha.get(1).attr("data-sort"));
        assertEquals("n/a", alpha.get(1).text());
        assertEquals(List.of("text", "coefficient", "count"),
                dom.select("#alpha-table thead th").eachAttr("data-kind"));
        assertEquals(3, dom.select("#alpha-table thead th button[type=button]").size());
    }

    @Test
    void longTablesScrollOnScreenOnly() {
        ReportTable.Builder b = ReportTable.builder("long", "Long", ReportTable.Column.count("n"));
        for (int i = 0; i <= HtmlReport.LONG_TABLE_ROWS; i++) {
            b.row(i);
        }
        ReportTable shortTable = ReportTable.builder("short", "Short", ReportTable.Column.count("n")).row(1).build();
        Document dom = Jsoup.parse(HtmlReport.builder("t").section(Section.builder("s", "S").add(b.build()).add(shortTable)
                .build()).build().render());
        assertTrue(dom.getElementById("long").parent().parent().hasClass("long"));
        assertFalse(dom.getElementById("short").parent().hasClass("long"));
    }

    @Test
    void attentionListIsDrawnFromTheCardsMostFlagsFirst() {
        HtmlReport r = HtmlReport.builder("t").section(Section.builder("cards", "Cards")
                .add(card("a", "one flag", 1, ""))
                .add(card("b", "clean", 0, ""))
                .add(card("c", "two flags", 2, ""))
                .add(card("d", "review only", 0, "fibre content claim"))
                .add(card("e", "one flag and review", 1, "waterproof rating")).build()).build();
        assertEquals(List.of("two flags (weather resistance)", "one flag and review (weather resistance)",
                "one flag (weather resistance)", "review only (weather resistance)"),
                r.attention().stream().map(AttentionItem::label).collect(Collectors.toList()));
        assertTrue(r.attention().get(0).reasons().get(0).startsWith("thin: fill rate 10% < 30% (thin edge)"));
        Document dom = Jsoup.parse(r.render());
        assertEquals("#attr-3", dom.selectFirst("#attention li a").attr("href"));
        assertEquals("two flags", dom.getElementById("attr-3").selectFirst("h3").text());
        HtmlReport limited = HtmlReport.builder("t").attentionLimit(1)
                .section(Section.builder("cards", "Cards").add(card("a", "x", 1, "")).add(card("b", "y", 2, "")).build()).build();
        assertEquals(1, limited.attention().size());
    }

    @Test
    void givenAttentionItemsReplaceTheDrawnOnesAndMustPointAtRealCards() {
        Section cards = Section.builder("cards", "Cards").add(card("a", "x", 1, "")).build();
        HtmlReport r = HtmlReport.builder("t").attention(new AttentionItem("Look here", "a", List.of("because")))
                .section(cards).build();
        assertEquals(List.of("Look here"), r.attention().stream().map(AttentionItem::label).toList());
        assertThrows(IllegalArgumentException.class, () -> HtmlReport.builder("t")
                .attention(new AttentionItem("Nowhere", "missing", List.of("because"))).section(cards).build());
    }

    @Test
    void idsMustBeUniqueAcrossThePage() {
        ReportTable t = ReportTable.builder("x", "X", ReportTable.Column.count("n")).build();
        ReportTable t2 = ReportTable.builder("summary", "S", ReportTable.Column.count("n")).build();
        assertThrows(IllegalArgumentException.class, () -> HtmlReport.builder("t")
                .section(Section.builder("x", "X").add(t).build()).build());
        assertThrows(IllegalArgumentException.class, () -> HtmlReport.builder("t")
                .section(Section.builder("s", "S").add(t2).build()).build());
        assertThrows(IllegalArgumentException.class, () -> HtmlReport.builder("t")
                .section(Section.builder("s", "S").add(card("a", "x", 0, "")).add(card("a", "y", 0, "")).build()).build());
    }

    @Test
    void figureRefusesForeignOrMismatchedSvg() {
        HowToRead how = new HowToRead("m", "k", List.of());
        String ok = Charts.flags("flags", List.of());
        assertThrows(IllegalArgumentException.class, () -> new Figure("other", "T", ok, how));
        assertThrows(IllegalArgumentException.class, () -> new Figure("flags", "T",
                ok.replaceFirst("<g", "<script>alert(1)</script><g"), how));
        assertThrows(IllegalArgumentException.class, () -> new HowToRead("", "method", List.of()));
        assertThrows(IllegalArgumentException.class, () -> new HowToRead("measures", " ", List.of()));
    }

    @Test
    void flagsMustAgreeWithTheirOwnThreshold() {
        assertThrows(IllegalArgumentException.class, () -> new ReportFlag(FlagKind.CONTESTED, "Krippendorff's alpha", 0.7,
                ValueKind.COEFFICIENT, Comparison.BELOW, 0.667, "", ""));
        assertThrows(IllegalArgumentException.class, () -> new ReportFlag(FlagKind.VAGUE, "hedged", 0.25,
                ValueKind.SHARE, Comparison.ABOVE, 0.25, "", ""));
        assertEquals("hedged 25% \u2265 25% (vague edge)", new ReportFlag(FlagKind.VAGUE, "hedged", 0.25, ValueKind.SHARE,
                Comparison.AT_OR_ABOVE, 0.25, "vague edge", "").statement());
    }

    @Test
    void contestedFlagAndAlphaMeasureComeStraightFromTheAgreementResult() {
        AgreementReport report = ChartsTest.agreement("fit", AgreementThresholds.DEFAULTS);
        var closure = report.attribute("closure type").orElseThrow();
        assertTrue(ReportFlag.contested(closure, report.thresholds()).isEmpty(), "alpha 1 is not contested");
        var lonely = report.attribute("lonely").orElseThrow();
        assertTrue(ReportFlag.contested(lonely, report.thresholds()).isEmpty(), "an undefined alpha raises no flag");
        assertEquals("n/a", Measure.alpha(lonely).shown());
        var fit = report.attribute("fit").orElseThrow();
        Measure m = Measure.alpha(fit);
        assertEquals(Numbers.coefficient(fit.alpha().alpha()), m.shown());
        assertTrue(m.basis().contains("95% interval") && m.basis().contains("10 items"), m.basis());
        if (fit.alpha().alpha() < 0.667) {
            assertEquals(0.667, ReportFlag.contested(fit, report.thresholds()).orElseThrow().threshold());
        }
    }

    @Test
    void writeProducesThePageAndItsTablesAtomically() throws IOException {
        Path page = tmp.resolve("out").resolve("audit.html");
        List<Path> written = sample("x").write(page);
        assertEquals(List.of(page.toAbsolutePath(), tmp.resolve("out/audit-tables/alpha-table.csv").toAbsolutePath(),
                tmp.resolve("out/audit-tables/alpha-table.json").toAbsolutePath()), written);
        String html = Files.readString(page, StandardCharsets.UTF_8);
        assertTrue(html.contains("audit-tables/alpha-table.csv and alpha-table.json beside this page"));
        try (Stream<Path> files = Files.walk(tmp)) {
            assertEquals(List.of(), files.filter(p -> p.getFileName().toString().contains(".tmp")).toList(), "no temp files left");
        }
        assertFalse(sample("x").render().contains("audit-tables"), "render() alone names no files");
    }
}
