package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.sheaf.miner.cli.Main;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code sheaf demo} on the committed Fernhollow workspace, end to end. */
class DemoEndToEndTest {
    private static final Path WORKSPACE = Path.of("..", "sample-listings");

    @TempDir
    Path out;

    @Test
    void demoWritesHarvestLabelsAndAReportWithSaneNumbers() throws IOException {
        assumeTrue(Files.isDirectory(WORKSPACE.resolve("catalog")),
                "skipped: sample-listings/catalog is absent; re-create it with './sheaf generate demo --out sample-listings'");
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = Main.commandLine(new PrintWriter(o, true), new PrintWriter(e, true))
                .execute("demo", "--workspace", WORKSPACE.toString(), "--out", out.toString());
        String stdout = o.toString();
        assertTrue(code == 0 || code == 3, "exit " + code + "\n" + e);
        assertEquals(11, stdout.lines().count(), "a title line and ten summary lines:\n" + stdout);
        assertTrue(number(stdout, "listings\\s+([\\d,]+)") >= 1000, stdout);
        assertTrue(number(stdout, "vocabulary (\\d+) concepts") > 0, stdout);
        assertTrue(Files.isRegularFile(out.resolve("harvest/harvest.json")));
        assertTrue(Files.isRegularFile(out.resolve("harvest/harvest.csv")));
        assertTrue(Files.isRegularFile(out.resolve("audit/labels/assignments.jsonl")));
        assertTrue(Files.isRegularFile(out.resolve("audit/coverage/coverage.csv")));
        Path report = out.resolve("audit/report.html");
        assertTrue(Files.isRegularFile(report));
        Document d = Jsoup.parse(report.toFile(), "UTF-8");
        for (Element el : d.select("[src], link[href], script[src], img, iframe, object, embed")) {
            String url = el.hasAttr("src") ? el.attr("src") : el.attr("href");
            assertTrue(url.isEmpty() || url.startsWith("#") || url.startsWith("data:"), "external resource " + el);
        }
        for (Element a : d.select("a[href]")) {
            assertTrue(a.attr("href").startsWith("#") || a.attr("href").endsWith(".csv") || a.attr("href").endsWith(".json"),
                    "link out of the report " + a);
        }
        assertTrue(d.text().contains("not verified product claims"));
    }

    private static long number(String text, String regex) {
        Matcher m = Pattern.compile(regex).matcher(text);
        assertTrue(m.find(), "expected " + regex + " in\n" + text);
        return Long.parseLong(m.group(1).replace(",", ""));
    }
}
