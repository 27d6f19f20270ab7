package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.report.AuditRun;
import dev.sheaf.miner.report.AuditSummary;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;
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
 * The audit report as {@code sheaf audit} writes it (the one kind of HTML Sheaf writes: every page
 * goes through {@code HtmlReport}, and {@link ReportEscapingCheckTest} covers each of its blocks) over
 * a workspace whose every piece of text is hostile: the workspace's name, listing ids, titles,
 * descriptions and categories (a CSV feed beside the demo's text listings), feedback sentences,
 * annotators and pair ids, and judgment items and annotators. Loaded in headless Chromium, as written
 * and with its Content-Security-Policy removed: no payload runs, no element or attribute the text
 * tried to inject is in the live DOM, nothing is fetched, and the text is there as text.
 *
 * <p>Skips without Chromium unless {@code SHEAF_REQUIRE_REFERENCES=1}, where it fails.
 */
class AuditReportEscapingCheckTest {
    private static final List<String> PAYLOADS = ReportEscapingCheckTest.PAYLOADS;

    @TempDir
    static Path tmp;

    private static Path report;
    private static Path withoutPolicy;

    @BeforeAll
    static void auditAHostileWorkspace() throws IOException {
        Path ws = KillDuringWriteTest.smallWorkspace(tmp.resolve("ws"));
        ObjectMapper json = new ObjectMapper();
        ObjectNode w = (ObjectNode) json.readTree(ws.resolve("workspace.json").toFile());
        w.put("name", "Fernhollow " + PAYLOADS.get(0));
        json.writeValue(ws.resolve("workspace.json").toFile(), w);

        List<String> ids = new ArrayList<>();
        StringBuilder feed = new StringBuilder("id,title,category,description\n");
        for (int i = 0; i < PAYLOADS.size(); i++) {
            String p = PAYLOADS.get(i);
            String id = "FH-9" + i + p;
            ids.add(id);
            feed.append(csv(id, "Ridgeline tent with adjustable hood " + p, "tents " + p,
                    "A water-resistant shell " + p + " with an insulated hood and a stowable hood."));
        }
        Files.writeString(ws.resolve("catalog/hostile-feed.csv"), feed, StandardCharsets.UTF_8);

        StringBuilder fb = new StringBuilder("pair_id,reference_id,target_id,annotator,sentence\n");
        StringBuilder jd = new StringBuilder(Files.readString(ws.resolve("judgments.csv")));
        for (int i = 0; i < PAYLOADS.size(); i++) {
            String p = PAYLOADS.get(i);
            String ref = ids.get(i);
            String target = ids.get((i + 1) % ids.size());
            fb.append(csv("P-" + p, ref, target, "shopper " + p, "The hood is warmer and more water-resistant " + p));
            jd.append(csv(ref, "rater " + p, "hood", "present"));
        }
        fb.append(Files.readString(ws.resolve("feedback.csv")).lines().skip(1).map(l -> l + "\n").reduce("", String::concat));
        Files.writeString(ws.resolve("feedback.csv"), fb, StandardCharsets.UTF_8);
        Files.writeString(ws.resolve("judgments.csv"), jd, StandardCharsets.UTF_8);

        AuditSummary s = AuditRun.run(Workspace.load(ws), tmp.resolve("audit"), new PrintWriter(Writer.nullWriter()));
        report = s.report();
        String page = Files.readString(report, StandardCharsets.UTF_8);
        String stripped = page.replaceFirst("<meta http-equiv=\"Content-Security-Policy\"[^>]*>\n", "");
        assertFalse(stripped.contains("Content-Security-Policy"), "the policy was removed for the second run");
        withoutPolicy = report.resolveSibling("report-no-policy.html");
        Files.writeString(withoutPolicy, stripped, StandardCharsets.UTF_8);
    }

    /** One CSV record, quoted by hand the RFC 4180 way (the payloads are meant to reach the readers as they are). */
    private static String csv(String... cells) {
        List<String> q = new ArrayList<>();
        for (String c : cells) {
            q.add("\"" + c.replace("\"", "\"\"") + "\"");
        }
        return String.join(",", q) + "\n";
    }

    @Test
    void theHostileAuditStaysTextInTheLiveDom() throws IOException, InterruptedException {
        ReportRenderCheckTest.Chromium.require();
        ReportRenderCheckTest.Chromium.Run run = ReportRenderCheckTest.Chromium.dumpDom(report, tmp.resolve("p1"), true);
        assertNothingInjected(run);
        assertEquals(List.of(), run.consoleLines(), "with the policy, a blocked injection would show as a console error");
    }

    @Test
    void escapingHoldsWithoutThePolicyToo() throws IOException, InterruptedException {
        ReportRenderCheckTest.Chromium.require();
        ReportRenderCheckTest.Chromium.Run run = ReportRenderCheckTest.Chromium.dumpDom(withoutPolicy, tmp.resolve("p2"), true);
        assertNothingInjected(run);
    }

    private static void assertNothingInjected(ReportRenderCheckTest.Chromium.Run run) throws IOException {
        Document dom = Jsoup.parse(run.stdout());
        Element html = dom.selectFirst("html");
        assertEquals("", html.attr("data-pwned"), "a payload ran: " + html.attr("data-pwned"));
        assertEquals("yes", html.attr("data-sort-ready"), "the report's own script ran");
        assertEquals(1, dom.select("script").size(), "only the report's own script");
        assertEquals(1, dom.select("style").size(), "only the report's own style sheet");
        assertEquals(0, dom.select("img, iframe, object, embed, base, details, math, link").size());
        assertEquals(0, dom.select("a[href]").stream().filter(a -> !a.attr("href").startsWith("#")
                && !a.attr("href").startsWith("report-tables/")).count(), "no link other than in-page anchors and table files");
        for (Element e : dom.getAllElements()) {
            for (Attribute a : e.attributes()) {
                String key = a.getKey().toLowerCase(Locale.ROOT);
                assertFalse(key.startsWith("on") || key.equals("autofocus") || key.startsWith("data-x")
                        || key.startsWith("data-y"), e.tagName() + " carries " + a);
            }
        }
        List<String> external = ReportRenderCheckTest.externalReferences(dom).stream()
                .filter(r -> !r.startsWith("a href=report-tables/")).toList();
        assertEquals(List.of(), external);
        assertEquals(List.of(), ReportRenderCheckTest.Chromium.pageRequests(run.netLog()), "the page fetched something");

        assertTrue(dom.title().contains(PAYLOADS.get(0)), "the workspace name, as text: " + dom.title());
        String text = dom.body().text();
        long sentences = PAYLOADS.stream().filter(p -> text.contains("more water-resistant " + p)).count();
        assertTrue(sentences >= 1, "feedback sentences reach the page as text, payload and all");
        assertTrue(PAYLOADS.stream().anyMatch(p -> text.contains("FH-9" + PAYLOADS.indexOf(p) + p)), "listing ids as text");
    }
}
