package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;

class AgreementAnalysisTest {
    private static final Pseudonyms KEYED = Pseudonyms.withKey("agreement-analysis-test-key-0001".getBytes(StandardCharsets.US_ASCII));
    private static final AgreementOptions OPTIONS = AgreementOptions.builder().pseudonyms(KEYED).replicates(200).build();
    private static final String[] OBSERVERS = {"alder", "birch", "cedar", "dogwood"};

    /** The 4-observer, 12-unit example of Krippendorff 2011 as judgment rows. */
    static List<Judgment> krippendorffExample(String attribute) {
        List<Judgment> out = new ArrayList<>();
        for (int o = 0; o < 4; o++) {
            String[] cells = KrippendorffAlphaTest.EXAMPLE[o].split(" ");
            for (int u = 0; u < cells.length; u++) {
                if (!cells[u].equals(".")) {
                    out.add(new Judgment("FH-" + (100 + u), OBSERVERS[o], attribute, cells[u], 0));
                }
            }
        }
        return out;
    }

    private static AgreementReport run(List<Judgment> judgments, AgreementOptions options) {
        return AgreementAnalysis.run(Judgments.of("test", judgments), options);
    }

    @Test
    void gradesGetTheOrdinalMetricAndThePublishedAlpha() {
        AgreementAttribute a = run(krippendorffExample("warmth"), OPTIONS).attribute("warmth").orElseThrow();
        assertEquals(AgreementMetric.ORDINAL, a.metric());
        assertFalse(a.metricFromOptions());
        // Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]: ordinal 0.815
        assertEquals(0.815, a.alpha().alpha(), 0.0005);
        assertEquals(12, a.items());
        assertEquals(41, a.judgments());
        assertEquals(4, a.annotators());
        assertEquals(AgreementVerdict.RELIABLE, a.verdict());
    }

    @Test
    void aMetricSetByOptionReplacesTheAutomaticChoice() {
        AgreementOptions nominal = OPTIONS.toBuilder().metric("warmth", AgreementMetric.NOMINAL)
                .metric("waarmth", AgreementMetric.INTERVAL).build();
        AgreementReport r = run(krippendorffExample("warmth"), nominal);
        AgreementAttribute a = r.attribute("warmth").orElseThrow();
        // Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]+[comp]: nominal 0.743
        assertEquals(0.743, a.alpha().alpha(), 0.0005);
        assertTrue(a.metricFromOptions());
        assertEquals(AgreementVerdict.TENTATIVE, a.verdict());
        assertEquals(1, r.notes().size());
        assertTrue(r.notes().get(0).contains("'waarmth'"), r.notes().get(0));
    }

    @Test
    void saysWhenItemsWithOneJudgmentAreLeftOutOfAlphaAndFleiss() {
        AgreementAttribute a = run(krippendorffExample("warmth"), OPTIONS).attribute("warmth").orElseThrow();
        assertTrue(a.notes().stream().anyMatch(n -> n.startsWith("1 item has a single judgment")), a.notes().toString());
        // 8 items have 4 judgments, 2 have 3, 1 has 2, 1 has 1: Fleiss uses the 8.
        assertEquals(8, a.fleiss().items());
        assertEquals(4, a.fleiss().judgmentsPerItem());
        assertEquals(4, a.fleiss().itemsLeftOut());
        assertTrue(a.notes().stream().anyMatch(n -> n.contains("unequal numbers of judgments")));
    }

    @Test
    void cohenKappaOfThePublishedExampleThroughTheFrontDoor() {
        // Wikipedia "Cohen's kappa" example [pub]; Cohen 1960, Educ. Psychol. Meas. 20(1): yes/yes 20, yes/no 5, no/yes 10, no/no 15 -> 0.40
        List<Judgment> j = new ArrayList<>();
        int item = 0;
        int[][] cells = {{20, 1, 1}, {5, 1, 0}, {10, 0, 1}, {15, 0, 0}};
        for (int[] cell : cells) {
            for (int n = 0; n < cell[0]; n++, item++) {
                j.add(new Judgment("FH-" + item, "reader-a", "waterproof", cell[1] == 1 ? "yes" : "no", 0));
                j.add(new Judgment("FH-" + item, "reader-b", "waterproof", cell[2] == 1 ? "yes" : "no", 0));
            }
        }
        AgreementAttribute a = run(j, OPTIONS).attribute("waterproof").orElseThrow();
        assertEquals(1, a.pairs().size());
        CohenPair p = a.pairs().get(0);
        assertEquals(0.40, p.kappa(), 1e-12);
        assertEquals(KappaBand.FAIR, p.band());
        assertEquals(50, p.items());
        assertEquals(0.70, p.agreement(), 1e-12);
        assertEquals(0.70, a.observedAgreement(), 1e-12);
        assertEquals("present/absent", a.scale());
        assertEquals(Map.of("absent", 45, "present", 55), a.values());
    }

    @Test
    void perfectAgreementGivesOneEverywhere() {
        List<Judgment> j = new ArrayList<>();
        String[] values = {"zip", "toggle", "buckle", "zip", "hook and loop"};
        for (int i = 0; i < values.length; i++) {
            for (String who : OBSERVERS) {
                j.add(new Judgment("FH-" + i, who, "closure", values[i], 0));
            }
        }
        AgreementReport r = run(j, OPTIONS);
        AgreementAttribute a = r.attribute("closure").orElseThrow();
        assertEquals(1.0, a.alpha().alpha(), 1e-12);
        assertEquals(1.0, a.fleiss().kappa(), 1e-12);
        assertEquals(1.0, a.observedAgreement(), 1e-12);
        assertEquals(1.0, a.meanCohenKappa(), 1e-12);
        assertEquals(KappaBand.ALMOST_PERFECT, a.fleiss().band());
        assertEquals(6, a.pairs().size());
        assertTrue(a.pairs().stream().allMatch(p -> p.kappa() == 1.0));
    }

    @Test
    void aRepeatedRowIsCountedOnceAndAConflictLeavesEveryRowOut() {
        List<Judgment> j = new ArrayList<>(List.of(
                new Judgment("FH-1", "alder", "insulated", "yes", 2),
                new Judgment("FH-1", "birch", "insulated", "yes", 3),
                new Judgment("FH-1", "alder", "insulated", "True", 4),
                new Judgment("FH-2", "alder", "insulated", "no", 5),
                new Judgment("FH-2", "birch", "insulated", "no", 6),
                new Judgment("FH-2", "birch", "insulated", "yes", 7),
                new Judgment("FH-3", "alder", "insulated", "no", 8),
                new Judgment("FH-3", "birch", "insulated", "yes", 9)));
        AgreementReport r = run(j, OPTIONS);
        assertEquals(List.of("repeated@4", "conflict@6", "conflict@7"),
                r.problems().stream().map(p -> p.kind() + "@" + p.row()).toList());
        assertTrue(r.problems().get(1).reason().contains("'no' (row 6), 'yes' (row 7)"), r.problems().get(1).reason());
        AgreementAttribute a = r.attribute("insulated").orElseThrow();
        assertEquals(5, a.judgments());
        assertEquals(8, r.judgmentsRead());
        assertEquals(5, r.judgmentsUsed());
        assertTrue(r.hasProblems());
    }

    @Test
    void theAttributeResolverGroupsLabelsAndUnknownAttributesBecomeProblems() {
        Map<String, String> vocabulary = Map.of("Insulated", "c-insulated", "insulation", "c-insulated");
        AgreementOptions resolving = OPTIONS.toBuilder().attributeResolver(vocabulary::get).build();
        AgreementReport r = run(List.of(
                new Judgment("FH-1", "alder", "Insulated", "yes", 2),
                new Judgment("FH-1", "birch", "insulation", "yes", 3),
                new Judgment("FH-1", "cedar", "sparkly", "yes", 4)), resolving);
        assertEquals(List.of("c-insulated"), r.attributes().stream().map(AgreementAttribute::attribute).toList());
        assertEquals(2, r.attributes().get(0).judgments());
        assertEquals("unknown-attribute", r.problems().get(0).kind());
        assertEquals(4, r.problems().get(0).row());
    }

    @Test
    void outputsShowPseudonymsNeverRawIds() {
        AgreementReport r = run(krippendorffExample("warmth"), OPTIONS);
        String everything = r.toString() + AgreementFiles.toJson(r);
        for (String raw : OBSERVERS) {
            assertFalse(everything.contains(raw), raw + " leaked");
        }
        assertEquals(KEYED.of("alder"), r.overview().stream().map(AgreementAnnotatorOverview::annotator)
                .filter(KEYED.of("alder")::equals).findFirst().orElseThrow());
    }

    @Test
    void aRaterWhoReadsTheAttributeDifferentlyStandsOut() {
        // Three annotators copy the true grade; "maverick" gives a random grade. Leaving the maverick out
        // must raise alpha the most, and the maverick's agreement with the others must be the lowest.
        Random random = new Random(99);
        List<Judgment> j = new ArrayList<>();
        for (int i = 0; i < 60; i++) {
            int truth = 1 + random.nextInt(5);
            for (String who : new String[] {"alder", "birch", "cedar"}) {
                j.add(new Judgment("FH-" + i, who, "warmth", Integer.toString(truth), 0));
            }
            j.add(new Judgment("FH-" + i, "maverick", "warmth", Integer.toString(1 + random.nextInt(5)), 0));
        }
        AgreementReport r = run(j, OPTIONS);
        String maverick = KEYED.of("maverick");
        AgreementAnnotator most = r.annotators().stream().max(Comparator.comparingDouble(AgreementAnnotator::alphaChange)).orElseThrow();
        assertEquals(maverick, most.annotator());
        assertTrue(most.alphaChange() > 0.2, "alpha change " + most.alphaChange());
        assertEquals(1.0, most.alphaWithout(), 1e-12);
        AgreementAnnotator lowest = r.annotators().stream().min(Comparator.comparingDouble(AgreementAnnotator::meanCohenKappa)).orElseThrow();
        assertEquals(maverick, lowest.annotator());
        AgreementAnnotatorOverview o = r.overview().stream().filter(x -> x.annotator().equals(maverick)).findFirst().orElseThrow();
        assertEquals("warmth", o.largestRiseAttribute());
        assertEquals(60, o.judgments());
        assertEquals(180, o.comparisons());
    }

    @Test
    void theSameSeedGivesTheSameReport() {
        AgreementReport a = run(krippendorffExample("warmth"), OPTIONS);
        AgreementReport b = run(krippendorffExample("warmth"), OPTIONS);
        assertEquals(a, b);
        assertTrue(a.attribute("warmth").orElseThrow().alphaInterval().defined());
    }

    @Test
    void anAttributeWithoutVariationHasNoAlphaAndSaysWhy() {
        AgreementReport r = run(List.of(new Judgment("FH-1", "alder", "vented", "yes", 0),
                new Judgment("FH-1", "birch", "vented", "yes", 0)), OPTIONS);
        AgreementAttribute a = r.attribute("vented").orElseThrow();
        assertEquals(AgreementVerdict.UNDEFINED, a.verdict());
        assertEquals(1.0, a.observedAgreement(), 0);
        assertFalse(a.alphaInterval().defined());
        assertTrue(a.allNotes().get(0).contains("no variation"));
    }
}
