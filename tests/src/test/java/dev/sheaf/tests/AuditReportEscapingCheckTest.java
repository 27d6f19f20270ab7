package dev.sheaf.tests;

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
import org.jsoup.nodes.Document;
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
        withoutPolicy = ReportEscapingCheckTest.withoutPolicy(report);
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
        assertTheHostileTextIsText(ReportEscapingCheckTest.loadChecked(report, tmp.resolve("p1"), true));
    }

    @Test
    void escapingHoldsWithoutThePolicyToo() throws IOException, InterruptedException {
        assertTheHostileTextIsText(ReportEscapingCheckTest.loadChecked(withoutPolicy, tmp.resolve("p2"), false));
    }

    private static void assertTheHostileTextIsText(Document dom) {
        assertTrue(dom.title().contains(PAYLOADS.get(0)), "the workspace name, as text: " + dom.title());
        String text = dom.body().text();
        long sentences = PAYLOADS.stream().filter(p -> text.contains("more water-resistant " + p)).count();
        assertTrue(sentences >= 1, "feedback sentences reach the page as text, payload and all");
        assertTrue(PAYLOADS.stream().anyMatch(p -> text.contains("FH-9" + PAYLOADS.indexOf(p) + p)), "listing ids as text");
    }
}
