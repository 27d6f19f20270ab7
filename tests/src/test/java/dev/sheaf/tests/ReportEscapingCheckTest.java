package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.report.AttributeCard;
import dev.sheaf.miner.report.Charts;
import dev.sheaf.miner.report.Comparison;
import dev.sheaf.miner.report.Figure;
import dev.sheaf.miner.report.FillRateCell;
import dev.sheaf.miner.report.FlagKind;
import dev.sheaf.miner.report.HowToRead;
import dev.sheaf.miner.report.HtmlReport;
import dev.sheaf.miner.report.KeyFigure;
import dev.sheaf.miner.report.Measure;
import dev.sheaf.miner.report.ReportFlag;
import dev.sheaf.miner.report.ReportTable;
import dev.sheaf.miner.report.ReportTable.Column;
import dev.sheaf.miner.report.Section;
import dev.sheaf.miner.report.ValueKind;
import dev.sheaf.miner.text.EvidenceLine;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Puts hostile text where catalog and feedback text lands in a report (listing titles, evidence
 * lines and their sources, feedback sentences, labels, chart labels) and loads the page in headless
 * Chromium with {@code --dump-dom}. The live DOM must hold no element or attribute the text tried to
 * inject, no payload may have run, nothing may be fetched, and the hostile text must be there as
 * text. The page is checked twice: as written, and with its Content-Security-Policy removed, so the
 * escaping is shown to hold on its own and not only behind the policy.
 *
 * <p>Skips without Chromium unless {@code SHEAF_REQUIRE_REFERENCES=1}, where it fails.
 */
class ReportEscapingCheckTest {
    private static final String MARK = "document.documentElement.setAttribute('data-pwned',";

    /** Each payload, if it ever ran, would mark the page; a few would fetch from a host that does not exist. */
    static final List<String> PAYLOADS = List.of(
            "<script>" + MARK + "'script')</script>",
            "<img src=x onerror=\"" + MARK + "'img')\">",
            "\" onmouseover=\"" + MARK + "'attribute')\" data-x=\"",
            "' autofocus onfocus='" + MARK.replace('\'', '`') + "`focus`)' data-y='",
            "<svg onload=\"" + MARK + "'svg')\"><circle r=\"9\"/></svg>",
            "<a href=\"javascript:" + MARK + "'link')\">click me</a>",
            "<details open ontoggle=\"" + MARK + "'toggle')\">x</details>",
            "<math><mtext><img src=y onerror=\"" + MARK + "'math')\"></mtext></math>",
            "</style><style>body{background:url(http://evil.invalid/bg.png)}</style>",
            "</title></textarea></script><iframe src=\"http://evil.invalid/frame\"></iframe>",
            "<object data=\"http://evil.invalid/o\"></object><base href=\"http://evil.invalid/\">");

    @TempDir
    static Path tmp;

    private static Path withPolicy;
    private static Path withoutPolicy;

    @BeforeAll
    static void writeTheHostileReport() throws IOException {
        withPolicy = tmp.resolve("hostile.html");
        hostileReport().writeHtml(withPolicy);
        withoutPolicy = withoutPolicy(withPolicy);
    }

    /** A copy of {@code page} beside it with its Content-Security-Policy removed. */
    static Path withoutPolicy(Path page) throws IOException {
        String html = Files.readString(page, StandardCharsets.UTF_8);
        String stripped = html.replaceFirst("<meta http-equiv=\"Content-Security-Policy\"[^>]*>\n", "");
        assertFalse(stripped.contains("Content-Security-Policy"), "the policy was removed for the second run");
        Path copy = page.resolveSibling(page.getFileName().toString().replace(".html", "-no-policy.html"));
        Files.writeString(copy, stripped, StandardCharsets.UTF_8);
        return copy;
    }

    @Test
    void hostileTextStaysTextInTheLiveDom() throws IOException, InterruptedException {
        assertNothingInjected(loadChecked(withPolicy, tmp.resolve("p1"), true));
    }

    @Test
    void escapingHoldsWithoutThePolicyToo() throws IOException, InterruptedException {
        assertNothingInjected(loadChecked(withoutPolicy, tmp.resolve("p2"), false));
    }

    /**
     * Loads a page that holds {@link #PAYLOADS} in Chromium and returns its live DOM, checked for what
     * every Sheaf page must show: no payload ran, only the page's own script and style sheet ran or
     * applied, no element or attribute a payload carries, no link out of the page but to its table
     * files ({@code <name>-tables/}), nothing fetched, and (with the policy) nothing on the console.
     */
    static Document loadChecked(Path page, Path profile, boolean withPolicy) throws IOException, InterruptedException {
        ReportRenderCheckTest.Chromium.require();
        ReportRenderCheckTest.Chromium.Run run = ReportRenderCheckTest.Chromium.dumpDom(page, profile, true);
        Document dom = Jsoup.parse(run.stdout());
        Element html = dom.selectFirst("html");
        assertEquals("", html.attr("data-pwned"), "a payload ran: " + html.attr("data-pwned"));
        assertEquals("yes", html.attr("data-sort-ready"), "the report's own script ran");
        assertEquals(1, dom.select("script").size(), "only the report's own script");
        assertEquals(1, dom.select("style").size(), "only the report's own style sheet");
        assertEquals(0, dom.select("img, iframe, object, embed, base, details, math, link").size());
        for (Element e : dom.getAllElements()) {
            for (Attribute a : e.attributes()) {
                String key = a.getKey().toLowerCase(Locale.ROOT);
                assertFalse(key.startsWith("on") || key.equals("autofocus") || key.startsWith("data-x")
                        || key.startsWith("data-y"), e.tagName() + " carries " + a);
            }
        }
        String tables = page.getFileName().toString().replace("-no-policy", "").replace(".html", "-tables/");
        assertEquals(List.of(), ReportRenderCheckTest.externalReferences(dom).stream()
                .filter(r -> !r.startsWith("a href=" + tables)).toList(), "no link out of the page but to its tables");
        assertEquals(List.of(), ReportRenderCheckTest.Chromium.pageRequests(run.netLog()), "the page fetched something");
        if (withPolicy) {
            assertEquals(List.of(), run.consoleLines(), "with the policy, a blocked injection would show as a console error");
        }
        return dom;
    }

    private static void assertNothingInjected(Document dom) {
        assertEquals(1, dom.select("svg").size(), "only the one chart");
        assertEquals(0, dom.select("a[href]").stream().filter(a -> !a.attr("href").startsWith("#")).count(),
                "no link other than in-page anchors");
        String text = dom.body().text();
        for (String p : PAYLOADS) {
            assertTrue(text.contains(p), "visible as text: " + p);
        }
        assertTrue(dom.title().contains(PAYLOADS.get(0)), dom.title());
        List<String> chartText = dom.select("svg text").eachText();
        assertTrue(chartText.stream().anyMatch(t -> t.startsWith("<script>")), "chart labels show the text: " + chartText);
    }

    // ------------------------------------------------------------------------------ the report

    static HtmlReport hostileReport() {
        String all = String.join(" ", PAYLOADS);
        ReportTable.Builder listings = ReportTable.builder("listings", "Listings " + PAYLOADS.get(1),
                Column.text("id"), Column.text("title"), Column.count("labels"));
        ReportTable.Builder sentences = ReportTable.builder("sentences", "Feedback sentences",
                Column.text("pair"), Column.text("annotator"), Column.text("sentence"));
        List<EvidenceLine> lines = new ArrayList<>();
        for (int i = 0; i < PAYLOADS.size(); i++) {
            String p = PAYLOADS.get(i);
            String id = String.format(Locale.ROOT, "FH-%06d", 500 + i);
            listings.row(id, "Ridgeline tent " + p, i);
            sentences.row("pair-" + i, "ann-" + (100000 + i), "Warmer than the other one " + p);
            lines.add(new EvidenceLine(id, "catalog/html/" + p + ".html", "line " + p, "title", p,
                    "Trail shell " + p + " ", "waterproof " + p, " to 10,000 mm " + p, 12, 23));
        }
        List<FillRateCell> cells = new ArrayList<>();
        for (int i = 0; i < PAYLOADS.size(); i++) {
            cells.add(new FillRateCell(PAYLOADS.get(i), "tents " + PAYLOADS.get(i), 10, i % 10));
        }
        AttributeCard card = new AttributeCard("c-" + all, "waterproof " + PAYLOADS.get(4), "weather " + PAYLOADS.get(5),
                PAYLOADS, List.of(new Measure("fill rate " + PAYLOADS.get(2), 0.4, ValueKind.SHARE, "basis " + PAYLOADS.get(3))),
                List.of(new ReportFlag(FlagKind.VAGUE, "hedged " + PAYLOADS.get(6), 0.3, ValueKind.SHARE,
                        Comparison.AT_OR_ABOVE, 0.25, PAYLOADS.get(7), "seen in: " + PAYLOADS.get(8))),
                "A regulated claim " + PAYLOADS.get(9), lines, lines.size());
        Section s = Section.builder("hostile", "Catalog text " + PAYLOADS.get(10))
                .text("Feedback said: " + all)
                .add(new Figure("fill-rate", "Fill rate " + PAYLOADS.get(0), Charts.fillRateHeatMap("fill-rate", cells),
                        HowToRead.fillRate(0.3)))
                .add(listings.build())
                .add(sentences.build())
                .add(card)
                .build();
        return HtmlReport.builder("Audit " + PAYLOADS.get(0))
                .subtitle(PAYLOADS.get(1))
                .meta(PAYLOADS.get(2))
                .keyFigure(new KeyFigure("Listings " + PAYLOADS.get(3), "11", PAYLOADS.get(4)))
                .caution("Catalog note: " + all)
                .section(s)
                .build();
    }
}
