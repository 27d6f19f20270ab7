package dev.sheaf.miner.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.measure.AgreementAnalysis;
import dev.sheaf.miner.measure.AgreementOptions;
import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.AgreementThresholds;
import dev.sheaf.miner.measure.Judgment;
import dev.sheaf.miner.measure.Judgments;
import dev.sheaf.miner.measure.Pseudonyms;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.Supplier;
import java.util.stream.Collectors;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.parser.Parser;
import org.junit.jupiter.api.Test;

class ChartsTest {
    private static final Pseudonyms KEY = Pseudonyms.withKey("charts-test-key-fernhollow".getBytes(StandardCharsets.US_ASCII));

    static List<FillRateCell> cells(String facet, String category) {
        return List.of(new FillRateCell(facet, "tents", 120, 109), new FillRateCell(facet, category, 96, 40),
                new FillRateCell("weight", "tents", 120, 120), new FillRateCell("weight", category, 0, 0));
    }

    static List<CoveragePoint> points() {
        return List.of(new CoveragePoint(1, "down", 400), new CoveragePoint(2, "zip", 700), new CoveragePoint(3, "merino", 820),
                new CoveragePoint(4, "buckle", 900), new CoveragePoint(5, "mesh", 905));
    }

    /** Judgments on three attributes: one agreed, one split, one judged by nobody twice (alpha undefined). */
    static AgreementReport agreement(String hostileAttribute, AgreementThresholds thresholds) {
        List<Judgment> j = new ArrayList<>();
        Random r = new Random(3);
        long row = 2;
        for (int item = 0; item < 10; item++) {
            for (String who : new String[] {"ann.a", "ann.b", "ann.c"}) {
                j.add(new Judgment("L" + item, who, "closure type", item % 2 == 0 ? "zip" : "buckle", row++));
                j.add(new Judgment("L" + item, who, hostileAttribute, r.nextBoolean() ? "yes" : "no", row++));
            }
        }
        j.add(new Judgment("L0", "ann.a", "lonely", "yes", row));
        AgreementOptions o = AgreementOptions.builder().seed(5).replicates(200).thresholds(thresholds).pseudonyms(KEY).build();
        return AgreementAnalysis.run(Judgments.of("judgments.csv", j), o);
    }

    static Document parse(String svg) {
        return Parser.xmlParser().parseInput(svg, "");
    }

    static List<String> texts(String svg) {
        return parse(svg).select("text").stream().map(Element::wholeText).collect(Collectors.toList());
    }

    private static void assertDeterministicAndScoped(String id, Supplier<String> chart) {
        String first = chart.get();
        String second = chart.get();
        assertEquals(first, second, id + ": the same input must give the same bytes");
        assertEquals(id, SvgCheck.check(first));
        for (Element e : parse(first).select("[id]")) {
            assertTrue(e.id().equals(id) || e.id().startsWith(id + "-"), "id " + e.id() + " is not scoped to " + id);
        }
        assertTrue(first.contains("viewBox=\"0 0 880 ") || first.contains("viewBox='0 0 880 "), "880 units wide");
        assertFalse(first.matches("(?s).*(?:[xy][12]?|width|height|d|stroke-width:)='?[-0-9.,MLQCZ ]*\\d\\.\\d{3,}.*"),
                "geometry is rounded to two decimals");
    }

    @Test
    void everyChartGivesTheSameBytesForTheSameInputAndScopesItsIds() {
        AgreementReport report = agreement("fit", AgreementThresholds.DEFAULTS);
        assertDeterministicAndScoped("heat", () -> Charts.fillRateHeatMap("heat", cells("fit", "jackets")));
        assertDeterministicAndScoped("cov", () -> Charts.coverageCurve("cov", points(), 1000, 0.8));
        assertDeterministicAndScoped("alpha", () -> Charts.alpha("alpha", report, Map.of()));
        assertDeterministicAndScoped("dir", () -> Charts.directionAgreement("dir",
                List.of(new DirectionAgreement("warmth", 10, 7), new DirectionAgreement("fit", 0, 0))));
        assertDeterministicAndScoped("flags", () -> Charts.flags("flags", List.of(new FlagCount(FlagKind.THIN, "fit", 2))));
    }

    @Test
    void hostileLabelsReachTheSvgOnlyAsEscapedText() {
        String h = Hostile.ALL;
        AgreementReport report = agreement(h, AgreementThresholds.DEFAULTS);
        List<String> svgs = List.of(
                Charts.fillRateHeatMap("heat", cells(h, h + " category")),
                Charts.alpha("alpha", report, Map.of("closure type", h + " label")),
                Charts.directionAgreement("dir", List.of(new DirectionAgreement(h, 4, 3))),
                Charts.flags("flags", List.of(new FlagCount(FlagKind.VAGUE, h, 1))));
        for (String svg : svgs) {
            SvgCheck.check(svg); // throws on any element or attribute beyond drawing
            Document doc = parse(svg);
            assertTrue(doc.select("script, a, image, foreignObject, style, iframe, img, math").isEmpty(), svg);
            for (Element e : doc.getAllElements()) {
                e.attributes().forEach(a -> assertFalse(a.getKey().toLowerCase().startsWith("on"), a.getKey()));
            }
            boolean shown = texts(svg).stream().anyMatch(t -> t.contains("<script>alert('x')</script>"));
            assertTrue(shown, "the hostile label is shown as text: " + texts(svg));
        }
    }

    @Test
    void heatMapLabelsEachCellAndSaysNotApplicable() {
        List<String> t = texts(Charts.fillRateHeatMap("heat", cells("fit", "jackets")));
        assertTrue(t.containsAll(List.of("91%", "42%", "100%", "n/a", "fit", "weight", "tents", "jackets")), t.toString());
    }

    @Test
    void heatMapRefusesAPairGivenTwice() {
        List<FillRateCell> twice = List.of(new FillRateCell("fit", "tents", 1, 1), new FillRateCell("fit", "tents", 2, 1));
        assertThrows(IllegalArgumentException.class, () -> Charts.fillRateHeatMap("heat", twice));
    }

    @Test
    void heatMapTurnsLongCategoryNamesUpright() {
        List<FillRateCell> many = new ArrayList<>();
        for (int c = 0; c < 12; c++) {
            many.add(new FillRateCell("fit", "category with a long name " + c, 10, c % 10));
        }
        String svg = Charts.fillRateHeatMap("heat", many);
        assertTrue(svg.contains("rotate(") || svg.contains("matrix("), "vertical tick labels are rotated");
    }

    @Test
    void coverageCurveMarksWhereTheShareIsReachedAndOnlyThen() {
        assertTrue(texts(Charts.coverageCurve("cov", points(), 1000, 0.8)).contains("80% of listings at k = 3"));
        assertTrue(texts(Charts.coverageCurve("cov", points(), 1000, 0.95)).stream().noneMatch(s -> s.contains("of listings at k")));
    }

    @Test
    void coverageCurveRefusesGapsAndFallingCoverage() {
        assertThrows(IllegalArgumentException.class, () -> Charts.coverageCurve("cov",
                List.of(new CoveragePoint(1, "a", 5), new CoveragePoint(3, "b", 6)), 10, 0.8));
        assertThrows(IllegalArgumentException.class, () -> Charts.coverageCurve("cov",
                List.of(new CoveragePoint(1, "a", 5), new CoveragePoint(2, "b", 4)), 10, 0.8));
        assertThrows(IllegalArgumentException.class, () -> Charts.coverageCurve("cov",
                List.of(new CoveragePoint(1, "a", 11)), 10, 0.8));
    }

    @Test
    void alphaChartDrawsTheReportsOwnEdgesAndSaysWhenAlphaIsUndefined() {
        List<String> t = texts(Charts.alpha("alpha", agreement("fit", AgreementThresholds.DEFAULTS), Map.of()));
        assertTrue(t.contains("tentative 0.667") && t.contains("reliable 0.800"), t.toString());
        assertTrue(t.contains("lonely \u00b7 \u03b1 n/a"), t.toString());
        assertTrue(t.contains("closure type \u00b7 \u03b1 1.000"), t.toString());
        AgreementThresholds strict = AgreementThresholds.DEFAULTS.with("alpha.tentative", 0.7).with("alpha.reliable", 0.9);
        List<String> s = texts(Charts.alpha("alpha", agreement("fit", strict), Map.of()));
        assertTrue(s.contains("tentative 0.700") && s.contains("reliable 0.900"), s.toString());
    }

    @Test
    void alphaChartDrawsOneIntervalBarWithCapsPerDefinedAlpha() {
        AgreementReport report = agreement("fit", AgreementThresholds.DEFAULTS);
        long defined = report.attributes().stream().filter(a -> a.alpha().defined()).count();
        assertEquals(2, defined, "closure type and fit; 'lonely' has one judgment");
        String svg = Charts.alpha("alpha", report, Map.of());
        long errorLines = parse(svg).select("line").stream().filter(l -> l.attr("style").contains("stroke-width:2.5;")).count();
        assertEquals(3 * defined, errorLines, "a bar and two caps per defined alpha");
    }

    @Test
    void longLabelsAreCutWithAnEllipsisAndKeptDistinct() {
        String a = "a facet name that goes on and on beyond any axis, version one";
        String b = "a facet name that goes on and on beyond any axis, version two";
        List<String> s = Charts.shorten(List.of(a, b, "short"));
        assertEquals(Charts.MAX_LABEL, s.get(0).length());
        assertTrue(s.get(0).endsWith("\u2026"));
        assertEquals(s.get(0) + " (2)", s.get(1));
        assertEquals("short", s.get(2));
        List<String> t = texts(Charts.directionAgreement("dir", List.of(new DirectionAgreement(a, 2, 1),
                new DirectionAgreement(b, 2, 2))));
        assertTrue(t.contains(s.get(0) + " \u00b7 50% of 2") && t.contains(s.get(1) + " \u00b7 100% of 2"), t.toString());
    }

    @Test
    void directionChartLabelsShareAndCounts() {
        List<String> t = texts(Charts.directionAgreement("dir",
                List.of(new DirectionAgreement("warmth", 64, 51), new DirectionAgreement("fit", 0, 0))));
        assertTrue(t.contains("warmth \u00b7 80% of 64") && t.contains("fit \u00b7 no checked mentions"), t.toString());
        assertThrows(IllegalArgumentException.class, () -> Charts.directionAgreement("dir",
                List.of(new DirectionAgreement("fit", 1, 1), new DirectionAgreement("fit", 2, 1))));
    }

    @Test
    void flagsChartShowsEveryKindWithItsTotalAndFoldsManyFacets() {
        List<FlagCount> counts = new ArrayList<>();
        for (int f = 0; f < 10; f++) {
            counts.add(new FlagCount(FlagKind.THIN, "facet " + f, 10 - f));
        }
        counts.add(new FlagCount(FlagKind.VAGUE, "facet 0", 2));
        List<String> t = texts(Charts.flags("flags", counts));
        assertTrue(t.containsAll(List.of("vague (2)", "contested (0)", "thin (55)", "overlapping (0)", "ambiguous (0)")),
                t.toString());
        assertTrue(t.contains("the other 3 facets") && t.contains("facet 6") && !t.contains("facet 7"), t.toString());
    }

    @Test
    void chartIdsMustBePlain() {
        assertThrows(IllegalArgumentException.class, () -> Charts.flags("Bad Id", List.of()));
        assertThrows(IllegalArgumentException.class, () -> Charts.flags("x'><script>", List.of()));
    }

    @Test
    void chartsGrowWithTheirRows() {
        String small = Charts.fillRateHeatMap("heat", List.of(new FillRateCell("a", "t", 1, 1)));
        List<FillRateCell> tall = new ArrayList<>();
        for (int f = 0; f < 12; f++) {
            tall.add(new FillRateCell("facet " + f, "t", 1, 1));
        }
        int h1 = Integer.parseInt(parse(small).selectFirst("svg").attr("viewBox").split(" ")[3].split("\\.")[0]);
        int h2 = Integer.parseInt(parse(Charts.fillRateHeatMap("heat", tall)).selectFirst("svg").attr("viewBox").split(" ")[3]
                .split("\\.")[0]);
        assertTrue(h2 > h1 + 300, h1 + " vs " + h2);
    }
}
