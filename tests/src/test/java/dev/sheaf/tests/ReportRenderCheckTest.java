package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.measure.AgreementAnalysis;
import dev.sheaf.miner.measure.AgreementAnnotatorOverview;
import dev.sheaf.miner.measure.AgreementAttribute;
import dev.sheaf.miner.measure.AgreementOptions;
import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.AgreementThresholds;
import dev.sheaf.miner.measure.AgreementVerdict;
import dev.sheaf.miner.measure.Judgment;
import dev.sheaf.miner.measure.Judgments;
import dev.sheaf.miner.measure.Pseudonyms;
import dev.sheaf.miner.report.AttributeCard;
import dev.sheaf.miner.report.Charts;
import dev.sheaf.miner.report.Comparison;
import dev.sheaf.miner.report.CoveragePoint;
import dev.sheaf.miner.report.DirectionAgreement;
import dev.sheaf.miner.report.Figure;
import dev.sheaf.miner.report.FillRateCell;
import dev.sheaf.miner.report.FlagCount;
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
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.Base64;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import javax.imageio.ImageIO;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Renders a sample audit report (invented Fernhollow Outfitters data, and real
 * {@link AgreementAnalysis} output on a small judgments set) in headless Chromium and checks what a
 * reader's browser would do with it: the page loads, its one script runs under the page's
 * Content-Security-Policy, nothing is printed to the console, nothing is fetched from the network,
 * and a screenshot is written to {@code tests/target/screenshots/report.png}.
 *
 * <p>Needs Debian's {@code chromium} ({@code /usr/bin/chromium}, or the path in {@code SHEAF_CHROMIUM});
 * skips without it unless {@code SHEAF_REQUIRE_REFERENCES=1}, where it fails.
 */
class ReportRenderCheckTest {
    static final Path SCREENSHOT = Path.of("target", "screenshots", "report.png");

    @TempDir
    static Path tmp;

    private static Path html;
    private static Chromium.Run loaded;

    @BeforeAll
    static void renderTheSampleReport() throws IOException, InterruptedException {
        html = tmp.resolve("out").resolve("audit.html");
        sampleReport().write(html);
        if (Chromium.find() == null) {
            return;
        }
        loaded = Chromium.dumpDom(html, tmp.resolve("profile-load"), true);
    }

    @Test
    void pageLoadsAndItsScriptRunsUnderThePolicy() {
        Chromium.require();
        Document dom = Jsoup.parse(loaded.stdout());
        assertEquals("yes", dom.selectFirst("html").attr("data-sort-ready"),
                "the sort script did not run; is its hash in the Content-Security-Policy right?\n" + loaded.consoleLines());
        for (Element table : dom.select("table.sortable")) {
            assertEquals("yes", table.attr("data-sortable-ready"), "table " + table.id() + " was not made sortable");
        }
        assertTrue(dom.select("table.sortable").size() >= 4, "the sample has at least four tables");
        assertEquals(5, dom.select("figure .chart svg").size(), "the sample has five charts");
    }

    @Test
    void consolePrintsNothing() {
        Chromium.require();
        assertEquals(List.of(), loaded.consoleLines(), "the page printed to the console (errors, CSP violations)");
    }

    @Test
    void pageFetchesNothingFromTheNetwork() throws IOException {
        Chromium.require();
        assertEquals(List.of(), Chromium.pageRequests(loaded.netLog()), "the page made network requests");
        assertEquals(List.of(), externalReferences(Jsoup.parse(loaded.stdout())), "the live DOM refers to outside URLs");
    }

    @Test
    void screenshotIsWrittenAndShowsThePage() throws IOException, InterruptedException {
        Chromium.require();
        Files.createDirectories(SCREENSHOT.getParent());
        Files.deleteIfExists(SCREENSHOT);
        Chromium.screenshot(html, SCREENSHOT, 1280, 2400, tmp.resolve("profile-shot"));
        assertTrue(Files.size(SCREENSHOT) > 30_000, "the screenshot is suspiciously small: " + Files.size(SCREENSHOT));
        BufferedImage image = ImageIO.read(SCREENSHOT.toFile());
        assertEquals(1280, image.getWidth());
        assertEquals(2400, image.getHeight());
        Set<Integer> colours = new HashSet<>();
        long ink = 0;
        for (int y = 0; y < image.getHeight(); y += 3) {
            for (int x = 0; x < image.getWidth(); x += 3) {
                int rgb = image.getRGB(x, y) & 0xffffff;
                colours.add(rgb);
                int r = rgb >> 16;
                int g = (rgb >> 8) & 0xff;
                int b = rgb & 0xff;
                if (r + g + b < 3 * 160) {
                    ink++;
                }
            }
        }
        assertTrue(colours.size() > 200, "the screenshot has only " + colours.size() + " colours; did the page render?");
        assertTrue(ink > 2_000, "the screenshot has almost no dark pixels (" + ink + "); is it blank?");
    }

    @Test
    void clickingAHeaderSortsTheRowsByThatColumn() throws IOException, InterruptedException {
        Chromium.require();
        // A test-only second script clicks the alpha header twice; the policy is widened by its hash only.
        String click = "document.querySelector('#alpha-table thead th:nth-child(5) button').click();"
                + "document.querySelector('#alpha-table thead th:nth-child(5) button').click();";
        String page = Files.readString(html, StandardCharsets.UTF_8);
        String widened = page.replace("script-src '", "script-src 'sha256-" + sha256(click) + "' '")
                .replace("</body>", "<script>" + click + "</script>\n</body>");
        assertTrue(widened.contains(sha256(click)) && widened.contains(click + "</script>"), "the test script was not added");
        Path clicked = tmp.resolve("clicked.html");
        Files.writeString(clicked, widened, StandardCharsets.UTF_8);
        Chromium.Run run = Chromium.dumpDom(clicked, tmp.resolve("profile-click"), true);
        Document dom = Jsoup.parse(run.stdout());
        Element header = dom.selectFirst("#alpha-table thead th:nth-child(5)");
        assertEquals("descending", header.attr("aria-sort"), run.consoleLines().toString());
        List<Double> alphas = new ArrayList<>();
        for (Element td : dom.select("#alpha-table tbody td:nth-child(5)")) {
            String key = td.attr("data-sort");
            alphas.add(key.isEmpty() ? Double.NaN : Double.parseDouble(key));
        }
        assertTrue(alphas.size() >= 3, "rows: " + alphas);
        for (int i = 1; i < alphas.size(); i++) {
            double a = alphas.get(i - 1);
            double b = alphas.get(i);
            assertTrue(Double.isNaN(b) || (!Double.isNaN(a) && a >= b), "not sorted descending, n/a last: " + alphas);
        }
    }

    @Test
    void checksCatchAPageThatBreaksThePolicyOrFetches() throws IOException, InterruptedException {
        Chromium.require();
        // Controls: the checks above must be able to fail. A script whose hash is not in the policy is
        // blocked and reported on the console; an image from the network shows up in the net log.
        String page = Files.readString(html, StandardCharsets.UTF_8);
        Path tampered = tmp.resolve("tampered.html");
        Files.writeString(tampered, page.replace("'use strict';", "'use strict'; "), StandardCharsets.UTF_8);
        Chromium.Run blocked = Chromium.dumpDom(tampered, tmp.resolve("profile-tampered"), true);
        assertFalse(blocked.consoleLines().isEmpty(), "a script outside the policy must be reported");
        assertEquals("", Jsoup.parse(blocked.stdout()).selectFirst("html").attr("data-sort-ready"));

        Path fetching = tmp.resolve("fetching.html");
        Files.writeString(fetching, "<!DOCTYPE html><html><body><img src=\"http://fernhollow.invalid/a.png\"></body></html>",
                StandardCharsets.UTF_8);
        Chromium.Run fetched = Chromium.dumpDom(fetching, tmp.resolve("profile-fetching"), true);
        assertEquals(List.of("http://fernhollow.invalid/a.png"), Chromium.pageRequests(fetched.netLog()));
        assertEquals(1, externalReferences(Jsoup.parse(fetched.stdout())).size());
    }

    @Test
    void tablesAreWrittenBesideThePage() throws IOException {
        Path folder = html.resolveSibling("audit-tables");
        for (String id : List.of("fill-rates", "alpha-table", "annotators", "direction")) {
            assertTrue(Files.isRegularFile(folder.resolve(id + ".csv")), id + ".csv");
            JsonNode json = new ObjectMapper().readTree(folder.resolve(id + ".json").toFile());
            assertEquals("sheaf-report-table", json.get("format").asText());
            assertTrue(json.get("rows").size() > 0, id + " has rows");
        }
    }

    /** src, href, xlink:href, srcset, action, poster, data and style url(...) pointing outside the page. */
    static List<String> externalReferences(Document dom) {
        List<String> found = new ArrayList<>();
        for (Element e : dom.getAllElements()) {
            for (org.jsoup.nodes.Attribute a : e.attributes()) {
                String key = a.getKey().toLowerCase(Locale.ROOT);
                String v = a.getValue().strip().toLowerCase(Locale.ROOT);
                boolean link = Set.of("src", "href", "xlink:href", "srcset", "action", "formaction", "poster", "data",
                        "background", "ping").contains(key);
                if (link && !v.startsWith("#") && !v.startsWith("data:") && !v.isEmpty()) {
                    found.add(e.tagName() + " " + key + "=" + a.getValue());
                }
                if (key.equals("style") && v.matches("(?s).*url\\(\\s*['\"]?(?!#).*")) {
                    found.add(e.tagName() + " style=" + a.getValue());
                }
            }
        }
        return found;
    }

    static String sha256(String text) {
        try {
            return Base64.getEncoder().encodeToString(MessageDigest.getInstance("SHA-256")
                    .digest(text.getBytes(StandardCharsets.UTF_8)));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    // ------------------------------------------------------------------------------ sample report

    /** The judgments: four attributes, 14 listings, four annotators, agreeing more on some attributes than others. */
    static AgreementReport sampleAgreement() {
        String[] annotators = {"maria.k@fernhollow.example", "tom.b@fernhollow.example", "li.w@fernhollow.example",
            "sam.o@fernhollow.example"};
        Map<String, String[]> values = new LinkedHashMap<>();
        values.put("closure type", new String[] {"zip", "buckle", "drawcord", "toggle"});
        values.put("fit", new String[] {"true to size", "runs small", "runs large"});
        values.put("warmth", new String[] {"1", "2", "3", "4", "5"});
        values.put("weather resistance", new String[] {"none", "water-resistant", "waterproof"});
        Map<String, Double> care = Map.of("closure type", 0.95, "fit", 0.55, "warmth", 0.8, "weather resistance", 0.45);
        Random random = new Random(20240611L);
        List<Judgment> judgments = new ArrayList<>();
        long row = 2;
        for (Map.Entry<String, String[]> attribute : values.entrySet()) {
            String[] v = attribute.getValue();
            for (int item = 1; item <= 14; item++) {
                int truth = random.nextInt(v.length);
                for (String who : annotators) {
                    if (random.nextDouble() < 0.12) {
                        continue; // not every annotator judged every listing
                    }
                    int said = random.nextDouble() < care.get(attribute.getKey()) ? truth : random.nextInt(v.length);
                    judgments.add(new Judgment(String.format(Locale.ROOT, "FH-%06d", 100 + item), who, attribute.getKey(),
                            v[said], row++));
                }
            }
        }
        AgreementOptions options = AgreementOptions.builder().seed(11).replicates(1000)
                .pseudonyms(Pseudonyms.withKey("render-check-key-fernhollow-2024".getBytes(StandardCharsets.US_ASCII)))
                .build();
        return AgreementAnalysis.run(Judgments.of("judgments.csv", judgments), options);
    }

    static HtmlReport sampleReport() {
        AgreementReport agreement = sampleAgreement();
        String[] facets = {"closure type", "fit", "warmth", "weather resistance", "capacity", "fibre content", "weight"};
        String[] categories = {"tents", "sleeping bags", "jackets", "backpacks", "footwear", "cookware"};
        int[][] applicable = {
            {120, 96, 210, 180, 140, 0}, {0, 96, 210, 0, 140, 0}, {0, 96, 210, 0, 140, 0}, {120, 96, 210, 180, 140, 0},
            {120, 96, 0, 180, 0, 72}, {120, 96, 210, 180, 140, 0}, {120, 96, 210, 180, 140, 72}};
        double[][] rate = {
            {0.91, 0.88, 0.83, 0.95, 0.74, 0}, {0, 0.42, 0.61, 0, 0.57, 0}, {0, 0.97, 0.52, 0, 0.18, 0},
            {0.86, 0.33, 0.79, 0.41, 0.66, 0}, {0.98, 0.62, 0, 0.99, 0, 0.94}, {0.55, 0.71, 0.38, 0.22, 0.12, 0},
            {0.99, 1.0, 0.64, 0.87, 0.58, 0.9}};
        List<FillRateCell> cells = new ArrayList<>();
        List<List<Object>> fillRows = new ArrayList<>();
        for (int f = 0; f < facets.length; f++) {
            for (int c = 0; c < categories.length; c++) {
                int filled = (int) Math.round(applicable[f][c] * rate[f][c]);
                FillRateCell cell = new FillRateCell(facets[f], categories[c], applicable[f][c], filled);
                cells.add(cell);
                if (applicable[f][c] > 0) {
                    fillRows.add(List.of(facets[f], categories[c], applicable[f][c], filled, cell.rate()));
                }
            }
        }
        ReportTable fillTable = new ReportTable("fill-rates", "Fill rate by facet and category",
                List.of(Column.text("facet"), Column.text("category"), Column.count("listings it applies to"),
                        Column.count("listings with a value"), Column.share("fill rate")), fillRows,
                "Pairs where the facet applies to no listing are left out.");

        List<CoveragePoint> points = new ArrayList<>();
        long covered = 0;
        for (int k = 1; k <= 40; k++) {
            covered = Math.min(1240, covered + Math.round(430 / Math.pow(k, 1.15)));
            points.add(new CoveragePoint(k, "concept " + k, covered));
        }

        List<List<Object>> alphaRows = new ArrayList<>();
        int contested = 0;
        for (AgreementAttribute a : agreement.attributes()) {
            contested += a.verdict() == AgreementVerdict.CONTESTED ? 1 : 0;
            alphaRows.add(List.of(a.attribute(), a.scale(), a.items(), a.judgments(), a.alpha().alpha(),
                    a.alphaInterval().low(), a.alphaInterval().high(), a.verdict().label(), a.fleiss().kappa()));
        }
        ReportTable alphaTable = new ReportTable("alpha-table", "Agreement per attribute",
                List.of(Column.text("attribute"), Column.text("values"), Column.count("items"), Column.count("judgments"),
                        Column.coefficient("alpha"), Column.coefficient("interval low"), Column.coefficient("interval high"),
                        Column.text("verdict"), Column.coefficient("Fleiss kappa")), alphaRows, "");
        List<List<Object>> annotatorRows = new ArrayList<>();
        for (AgreementAnnotatorOverview o : agreement.overview()) {
            annotatorRows.add(List.of(o.annotator(), o.attributes(), o.judgments(), o.pairwiseAgreement(),
                    o.meanCohenKappa(), o.meanCohenBand().label()));
        }
        ReportTable annotatorTable = new ReportTable("annotators", "Annotators (pseudonyms)",
                List.of(Column.text("annotator"), Column.count("attributes"), Column.count("judgments"),
                        Column.share("pairwise agreement"), Column.coefficient("mean Cohen kappa"), Column.text("band")),
                annotatorRows, "Mean Cohen kappa over every partner and attribute; bands after Landis & Koch 1977.");

        List<DirectionAgreement> directions = List.of(new DirectionAgreement("warmth", 64, 51),
                new DirectionAgreement("weight", 41, 38), new DirectionAgreement("fit", 37, 19),
                new DirectionAgreement("weather resistance", 22, 12), new DirectionAgreement("packability", 9, 8),
                new DirectionAgreement("closure type", 0, 0));
        ReportTable.Builder directionTable = ReportTable.builder("direction", "Mention direction agreement",
                Column.text("attribute"), Column.count("checked mentions"), Column.count("agreeing"), Column.share("share"));
        for (DirectionAgreement d : directions) {
            directionTable.row(d.attribute(), d.mentions(), d.agreeing(), d.share());
        }

        List<FlagCount> flagCounts = List.of(new FlagCount(FlagKind.VAGUE, "warmth", 3),
                new FlagCount(FlagKind.VAGUE, "fit", 1), new FlagCount(FlagKind.CONTESTED, "fit", 2),
                new FlagCount(FlagKind.CONTESTED, "weather resistance", 1), new FlagCount(FlagKind.THIN, "fibre content", 3),
                new FlagCount(FlagKind.THIN, "capacity", 1), new FlagCount(FlagKind.OVERLAPPING, "packability", 2),
                new FlagCount(FlagKind.AMBIGUOUS, "warmth", 1));

        List<String> flagThresholds = List.of("vague: hedged in 25% or more of its mentions",
                "contested: Krippendorff's \u03b1 below 0.667", "thin: fill rate below 30%",
                "overlapping: Jaccard overlap with another attribute of 0.70 or more",
                "ambiguous: two or more senses found among its mentions");

        Section coverage = Section.builder("coverage", "Coverage")
                .text("How much of the catalog the vocabulary reaches, facet by facet and category by category.")
                .add(new Figure("fill-rate", "Fill rate by facet and category", Charts.fillRateHeatMap("fill-rate", cells),
                        HowToRead.fillRate(0.30)))
                .add(fillTable)
                .add(new Figure("coverage-curve", "Listings covered by the top k concepts",
                        Charts.coverageCurve("coverage-curve", points, 1240, 0.8), HowToRead.coverageCurve(1240, 0.8)))
                .build();
        Section agreementSection = Section.builder("agreement", "Annotator agreement")
                .text("Four annotators judged " + agreement.judgmentsUsed() + " attribute values on 14 listings.")
                .add(new Figure("alpha", "Krippendorff's alpha per attribute", Charts.alpha("alpha", agreement, Map.of()),
                        HowToRead.alpha(agreement)))
                .add(alphaTable)
                .add(annotatorTable)
                .build();
        Section feedback = Section.builder("feedback", "Feedback consistency")
                .add(new Figure("direction-chart", "Mention direction agreement per attribute",
                        Charts.directionAgreement("direction-chart", directions), HowToRead.directionAgreement()))
                .add(directionTable.build())
                .build();
        Section flags = Section.builder("flags", "Flags")
                .add(new Figure("flags-chart", "Flags over the vocabulary", Charts.flags("flags-chart", flagCounts),
                        HowToRead.flags(flagThresholds)))
                .build();
        Section.Builder cards = Section.builder("attributes", "Attributes");
        for (AttributeCard c : sampleCards(agreement)) {
            cards.add(c);
        }
        return HtmlReport.builder("Fernhollow Outfitters: vocabulary audit")
                .subtitle("1,240 listings in 6 categories, checked against a vocabulary of 14 facets and 86 concepts")
                .meta("Workspace: Fernhollow Outfitters demo (invented data) \u00b7 profile default \u00b7 report of 2024-06-11")
                .keyFigure(KeyFigure.count("Listings", 1240, "read from 6 sources, 3 files skipped"))
                .keyFigure(KeyFigure.count("Concepts", 86, "in 14 facets"))
                .keyFigure(KeyFigure.share("Listings labelled", 0.934, "carry at least one concept"))
                .keyFigure(KeyFigure.ofTotal("Contested", contested, agreement.attributes().size(),
                        "attributes with \u03b1 below 0.667"))
                .keyFigure(KeyFigure.count("Flags", 14, "on 9 attributes"))
                .keyFigure(KeyFigure.count("Judgments", agreement.judgmentsUsed(), "by 4 annotators"))
                .section(coverage)
                .section(agreementSection)
                .section(feedback)
                .section(flags)
                .section(cards.build())
                .build();
    }

    static List<AttributeCard> sampleCards(AgreementReport agreement) {
        AgreementAttribute weather = agreement.attribute("weather resistance").orElseThrow();
        AgreementAttribute fit = agreement.attribute("fit").orElseThrow();
        List<AttributeCard> cards = new ArrayList<>();
        cards.add(new AttributeCard("c-waterproof", "waterproof", "weather resistance",
                List.of("water proof", "waterprof"),
                List.of(new Measure("fill rate", 0.41, ValueKind.SHARE, "74 of 180 backpacks"),
                        alphaMeasure(weather),
                        new Measure("hedged mentions", 0.31, ValueKind.SHARE, "11 of 35 feedback mentions")),
                alphaFlags(weather, new ReportFlag(FlagKind.VAGUE, "hedged mentions", 0.31, ValueKind.SHARE,
                        Comparison.AT_OR_ABOVE, 0.25, "vague edge", "\u201cfairly waterproof\u201d, \u201cmostly waterproof\u201d")),
                "A waterproof rating is a regulated claim. Check each listing against its test report (hydrostatic head "
                        + "in mm) before the label is used in filters.",
                List.of(evidence("FH-000118", "catalog/html/tents/ridgeline-2.html", "line 14", "description", "",
                                "Ridgeline 2 has a fully taped fly that is waterproof to 3,000 mm and two vestibules.", "waterproof"),
                        evidence("FH-000342", "catalog/feeds/catalog-export.csv", "row 343", "bullet", "",
                                "Waterproof, breathable shell with pit zips", "Waterproof"),
                        evidence("FH-000377", "catalog/pdf/fernhollow-spring.pdf", "page 7", "spec", "Fabric",
                                "70D nylon, waterproof PU coating", "waterproof")),
                28));
        cards.add(new AttributeCard("c-runs-small", "runs small", "fit", List.of("sizes small", "size up"),
                List.of(alphaMeasure(fit), new Measure("fill rate", 0.42, ValueKind.SHARE, "40 of 96 sleeping bags"),
                        new Measure("direction agreement", 19.0 / 37, ValueKind.SHARE, "19 of 37 checked mentions")),
                alphaFlags(fit),
                "",
                List.of(evidence("FH-000211", "catalog/text/trail-runners.md", "line 5", "description", "",
                        "Customers say the Scree Runner runs small, so order half a size up.", "runs small")),
                6));
        cards.add(new AttributeCard("c-merino", "merino wool", "fibre content", List.of("merino"),
                List.of(new Measure("fill rate", 0.12, ValueKind.SHARE, "17 of 140 footwear listings"),
                        new Measure("listings", 146, ValueKind.COUNT, "across 4 categories")),
                List.of(new ReportFlag(FlagKind.THIN, "fill rate", 0.12, ValueKind.SHARE, Comparison.BELOW, 0.30,
                        "thin edge", "lowest in footwear")),
                "Fibre content is a regulated claim: percentages must match the sewn-in label.",
                List.of(evidence("FH-000455", "catalog/docx/base-layers.docx", "paragraph 3", "description", "",
                                "A midweight crew in 85% merino wool, 15% nylon for a soft hand.", "merino wool"),
                        evidence("FH-000460", "catalog/feeds/catalog.jsonl", "line 460", "spec", "Material",
                                "Merino wool blend", "Merino wool")),
                17));
        cards.add(new AttributeCard("c-two-way-zip", "two-way zipper", "closure type",
                List.of("2-way zip", "two way zipper"),
                List.of(new Measure("fill rate", 0.88, ValueKind.SHARE, "84 of 96 sleeping bags"),
                        alphaMeasure(agreement.attribute("closure type").orElseThrow())),
                List.of(), "",
                List.of(evidence("FH-000130", "catalog/html/bags/lowland-20.html", "line 22", "bullet", "",
                        "Full-length two-way zipper with an anti-snag guard", "two-way zipper")),
                84));
        return cards;
    }

    private static Measure alphaMeasure(AgreementAttribute a) {
        return Measure.alpha(a);
    }

    private static List<ReportFlag> alphaFlags(AgreementAttribute a, ReportFlag... more) {
        List<ReportFlag> flags = new ArrayList<>();
        ReportFlag.contested(a, AgreementThresholds.DEFAULTS).ifPresent(flags::add);
        flags.addAll(List.of(more));
        return flags;
    }

    static EvidenceLine evidence(String id, String source, String locator, String field, String key, String text,
                                 String match) {
        int start = text.indexOf(match);
        if (start < 0) {
            throw new IllegalArgumentException("'" + match + "' is not in '" + text + "'");
        }
        return EvidenceLine.cut(id, source, locator, field, key, text, start, start + match.length(), 40);
    }

    // ------------------------------------------------------------------------------------ Chromium

    /** Headless Chromium, run as a command with every background service turned off. */
    static final class Chromium {
        private static final List<String> FLAGS = List.of("--headless", "--no-sandbox", "--disable-gpu", "--disable-quic",
                "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync",
                "--host-resolver-rules=MAP * ~NOTFOUND");

        /** Output of one run. */
        record Run(String stdout, String stderr, Path netLog) {
            /** Lines the page printed to its console (Chromium logs them as CONSOLE with --enable-logging --v=1). */
            List<String> consoleLines() {
                List<String> lines = new ArrayList<>();
                for (String line : stderr.split("\n")) {
                    if (line.contains(":CONSOLE")) {
                        lines.add(line);
                    }
                }
                return lines;
            }
        }

        static Path find() {
            String configured = System.getenv("SHEAF_CHROMIUM");
            Path p = Path.of(configured == null || configured.isBlank() ? "/usr/bin/chromium" : configured);
            return Files.isExecutable(p) ? p : null;
        }

        static void require() {
            if (find() != null) {
                return;
            }
            String why = "Chromium not found at /usr/bin/chromium (install the Debian package chromium, or set SHEAF_CHROMIUM)";
            if ("1".equals(System.getenv("SHEAF_REQUIRE_REFERENCES"))) {
                fail("SHEAF_REQUIRE_REFERENCES=1 but " + why);
            }
            Assumptions.abort(why);
        }

        /** Loads the page, runs its scripts, and returns the live DOM on stdout; with logging, the console and a net log. */
        static Run dumpDom(Path page, Path profile, boolean log) throws IOException, InterruptedException {
            List<String> cmd = new ArrayList<>();
            cmd.add(find().toString());
            cmd.addAll(FLAGS);
            cmd.add("--user-data-dir=" + profile.toAbsolutePath());
            Path netLog = profile.resolveSibling(profile.getFileName() + "-net.json");
            if (log) {
                cmd.add("--enable-logging=stderr");
                cmd.add("--v=1");
                cmd.add("--log-net-log=" + netLog.toAbsolutePath());
            }
            cmd.add("--dump-dom");
            cmd.add(page.toAbsolutePath().toUri().toString());
            return run(cmd, profile, log ? netLog : null);
        }

        static void screenshot(Path page, Path png, int width, int height, Path profile) throws IOException, InterruptedException {
            List<String> cmd = new ArrayList<>();
            cmd.add(find().toString());
            cmd.addAll(FLAGS);
            cmd.add("--user-data-dir=" + profile.toAbsolutePath());
            cmd.add("--hide-scrollbars");
            cmd.add("--screenshot=" + png.toAbsolutePath());
            cmd.add("--window-size=" + width + "," + height);
            cmd.add(page.toAbsolutePath().toUri().toString());
            run(cmd, profile, null);
            if (!Files.isRegularFile(png)) {
                fail("Chromium wrote no screenshot to " + png);
            }
        }

        private static Run run(List<String> cmd, Path profile, Path netLog) throws IOException, InterruptedException {
            Files.createDirectories(profile);
            Path out = profile.resolveSibling(profile.getFileName() + ".out");
            Path err = profile.resolveSibling(profile.getFileName() + ".err");
            Process p = new ProcessBuilder(cmd).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
            if (!p.waitFor(120, TimeUnit.SECONDS)) {
                p.destroyForcibly();
                fail("Chromium did not finish within 120 s: " + cmd);
            }
            return new Run(Files.readString(out, StandardCharsets.UTF_8), Files.readString(err, StandardCharsets.UTF_8), netLog);
        }

        /**
         * URLs the page itself asked the network for. Chromium's own background services (which the flags
         * mostly silence, and the host rules make fail) start their requests with no origin; a page's
         * requests carry the page's origin, "null" for a file.
         */
        static List<String> pageRequests(Path netLog) throws IOException {
            JsonNode log = new ObjectMapper().readTree(netLog.toFile());
            Map<Integer, String> types = new HashMap<>();
            log.get("constants").get("logEventTypes").fields().forEachRemaining(e -> types.put(e.getValue().asInt(), e.getKey()));
            List<String> urls = new ArrayList<>();
            for (JsonNode event : log.get("events")) {
                if (!"URL_REQUEST_START_JOB".equals(types.get(event.get("type").asInt()))) {
                    continue;
                }
                JsonNode params = event.get("params");
                if (params == null || params.get("url") == null) {
                    continue;
                }
                String url = params.get("url").asText();
                String initiator = params.has("initiator") ? params.get("initiator").asText() : "";
                boolean local = url.startsWith("file:") || url.startsWith("data:");
                if (!local && !initiator.equals("not an origin")) {
                    urls.add(url);
                }
            }
            return urls;
        }
    }
}
