package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * Each flag kind on constructed figures: one attribute exactly at the edge (no flag) and one just
 * past it (flag), with the defaults of {@link FlagThresholds}.
 */
class FlagsTest {
    private static final FlagThresholds T = FlagThresholds.DEFAULTS;

    // ---- constructed figures ----

    private static ConsistencyAgreement agreement(int judged, double mean, int contradictory) {
        KrippendorffResult none = new KrippendorffResult(Double.NaN, AgreementMetric.NOMINAL, Double.NaN, Double.NaN, 0, 0,
                "constructed");
        return new ConsistencyAgreement(judged, judged, judged == 0 ? Double.NaN : mean, contradictory,
                judged == 0 ? Double.NaN : (double) contradictory / judged, 0, none);
    }

    private static ConsistencyAttribute attr(String id, String kind, int mentions, int hedged, int comparative, int ambiguous,
                                             ConsistencyAgreement agreement, GroundingSummary grounding) {
        return new ConsistencyAttribute(id, id, kind, mentions, mentions, 0.5, Map.of(Direction.PRESENT, mentions), hedged,
                comparative, 0, 0, ambiguous, SurfaceForms.of(Map.of(id, mentions)), List.of(), agreement,
                grounding == null ? new GroundingSummary(0, 0, 0, 0, 0, 0, mentions, mentions) : grounding, List.of());
    }

    private static ConsistencyAttribute plain(String id, int mentions) {
        return attr(id, ConsistencyAttribute.KIND_CONCEPT, mentions, 0, 0, 0, agreement(0, 0, 0), null);
    }

    private static ConsistencyReport report(boolean catalog, ConsistencyAttribute... attributes) {
        return new ConsistencyReport("constructed", 100, 100, 50, 10, 80, List.of(attributes), List.of(), List.of(), List.of(),
                List.of(), List.of(), "none", catalog, List.of());
    }

    private static FlagReport feedback(boolean catalog, ConsistencyAttribute... attributes) {
        return Flags.evaluate(FlagInputs.builder().consistency(report(catalog, attributes)).build(), T);
    }

    private static AgreementAttribute judged(String id, double alpha) {
        KrippendorffResult k = new KrippendorffResult(alpha, AgreementMetric.NOMINAL, 0.1, 0.3, 12, 48, "");
        return new AgreementAttribute(id, "present/absent", false, Map.of("present", 24, "absent", 24), 12, 48, 4, k,
                BootstrapInterval.none(0.95, 0, 1), T.agreement().verdict(alpha), 0.8,
                new FleissResult(0.21, KappaBand.FAIR, 12, 4, 0, ""), List.of(), 0.2, KappaBand.SLIGHT, List.of());
    }

    private static AgreementReport agreementReport(AgreementAttribute... a) {
        return new AgreementReport("judgments.csv", List.of(a), List.of(), List.of(), List.of(), 96, 96, 1, 0, 0.95,
                T.agreement(), List.of());
    }

    private static Flag only(FlagReport r, String id, FlagKind kind) {
        List<Flag> f = r.flags(id).orElseThrow(() -> new AssertionError(id + " has no flag")).flags().stream()
                .filter(x -> x.kind() == kind).toList();
        assertEquals(1, f.size(), f.toString());
        return f.get(0);
    }

    // ---- contested ----

    @Test
    void contestedWhenAlphaIsBelowTheTentativeEdge() {
        FlagReport r = Flags.evaluate(FlagInputs.builder()
                .agreement(agreementReport(judged("at-edge", 0.667), judged("below", 0.666))).build(), T);
        assertFalse(r.flags("at-edge").isPresent(), "alpha = .667 is tentative, not contested");
        Flag f = only(r, "below", FlagKind.CONTESTED);
        assertEquals("alpha", f.criterion());
        assertEquals(0.666, f.figure());
        assertEquals(0.667, f.threshold());
        assertEquals("<", f.comparison());
        assertEquals("alpha.tentative", f.thresholdKey());
        assertTrue(f.explanation().contains("Krippendorff 2004"), f.explanation());
        assertTrue(f.explanation().contains("fair, Landis & Koch 1977"), "the kappa band is shown beside kappa");
        assertEquals(FlagEvidence.JUDGMENTS, f.evidence().get(0).kind());
    }

    @Test
    void undefinedAlphaRaisesNoFlag() {
        KrippendorffResult k = new KrippendorffResult(Double.NaN, AgreementMetric.NOMINAL, 0, 0, 0, 0, "no variation");
        AgreementAttribute a = new AgreementAttribute("flat", "present/absent", false, Map.of("present", 8), 4, 8, 2, k,
                BootstrapInterval.none(0.95, 0, 1), AgreementVerdict.UNDEFINED, 1.0,
                new FleissResult(Double.NaN, KappaBand.UNDEFINED, 4, 2, 0, ""), List.of(), Double.NaN, KappaBand.UNDEFINED, List.of());
        assertTrue(Flags.evaluate(FlagInputs.builder().agreement(agreementReport(a)).build(), T).flagged().isEmpty());
    }

    @Test
    void contestedWhenDirectionAgreementIsBelowItsEdge() {
        FlagReport r = feedback(false,
                attr("at-edge", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(5, 0.80, 1), null),
                attr("below", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(5, 0.79, 1), null),
                attr("too-few-pairs", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(2, 0.10, 0), null));
        assertFalse(r.flags("at-edge").isPresent());
        assertFalse(r.flags("too-few-pairs").isPresent(), "fewer than direction.minPairs judged pairs");
        Flag f = only(r, "below", FlagKind.CONTESTED);
        assertEquals("direction-agreement", f.criterion());
        assertEquals(0.79, f.figure());
    }

    @Test
    void contestedWhenTheContradictionShareIsAboveItsEdge() {
        // 1 of 5 pairs = .20 (at the edge); 2 of 5 = .40
        FlagReport r = feedback(false,
                attr("at-edge", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(5, 0.9, 1), null),
                attr("above", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(5, 0.9, 2), null));
        assertFalse(r.flags("at-edge").isPresent());
        assertEquals("contradictions", only(r, "above", FlagKind.CONTESTED).criterion());
    }

    // ---- vague ----

    @Test
    void vagueWhenTheHedgeRateIsAboveItsEdge() {
        FlagReport r = feedback(false,
                attr("at-edge", ConsistencyAttribute.KIND_CONCEPT, 10, 3, 0, 0, agreement(0, 0, 0), null),
                attr("above", ConsistencyAttribute.KIND_CONCEPT, 10, 4, 0, 0, agreement(0, 0, 0), null),
                attr("few-mentions", ConsistencyAttribute.KIND_CONCEPT, 4, 4, 0, 0, agreement(0, 0, 0), null));
        assertFalse(r.flags("at-edge").isPresent());
        assertFalse(r.flags("few-mentions").isPresent(), "fewer than mentions.min mentions");
        Flag f = only(r, "above", FlagKind.VAGUE);
        assertEquals("hedge-rate", f.criterion());
        assertEquals(0.4, f.figure(), 0);
        assertEquals(">", f.comparison());
    }

    @Test
    void vagueWhenMostlyComparativeButNotForANumberFacet() {
        FlagReport r = feedback(false,
                attr("at-edge", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 8, 0, agreement(0, 0, 0), null),
                attr("above", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 9, 0, agreement(0, 0, 0), null),
                attr("weight", ConsistencyAttribute.KIND_SCALE, 10, 0, 10, 0, agreement(0, 0, 0), null));
        assertFalse(r.flags("at-edge").isPresent());
        assertFalse(r.flags("weight").isPresent(), "a number facet is compared by nature");
        assertEquals("comparative-share", only(r, "above", FlagKind.VAGUE).criterion());
    }

    @Test
    void vagueWhenTheCatalogCanCheckTooFewMentions() {
        // checked 5 of 10 = .50 (at the edge, all grounded); 4 of 10 = .40
        FlagReport r = feedback(true,
                attr("at-edge", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(0, 0, 0),
                        new GroundingSummary(5, 5, 0, 0, 0, 0, 5, 10)),
                attr("below", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(0, 0, 0),
                        new GroundingSummary(4, 4, 0, 0, 0, 0, 6, 10)));
        assertFalse(r.flags("at-edge").isPresent());
        assertEquals("grounding-checkable", only(r, "below", FlagKind.VAGUE).criterion());
        assertFalse(feedback(false, attr("below", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(0, 0, 0),
                new GroundingSummary(4, 4, 0, 0, 0, 0, 6, 10))).flags("below").isPresent(), "no catalog: not evaluated");
    }

    @Test
    void vagueWhenGroundingPrecisionIsBelowItsEdge() {
        // 7 of 10 checked mentions grounded = .70 (at the edge); 6 of 10 = .60
        FlagReport r = feedback(true,
                attr("at-edge", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(0, 0, 0),
                        new GroundingSummary(5, 4, 0, 0, 5, 3, 0, 10)),
                attr("below", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(0, 0, 0),
                        new GroundingSummary(5, 3, 0, 0, 5, 3, 0, 10)));
        assertFalse(r.flags("at-edge").isPresent());
        Flag f = only(r, "below", FlagKind.VAGUE);
        assertEquals("grounding-precision", f.criterion());
        assertEquals(0.6, f.figure(), 1e-12);
    }

    // ---- thin, overlapping ----

    @Test
    void thinWhenTheFillRateIsBelowItsEdge() {
        FlagReport r = Flags.evaluate(FlagInputs.builder().fill(List.of(
                new FlagFill("at-edge", 10, 5, List.of()),
                new FlagFill("below", 10, 4, List.of("FH-1", "FH-2")),
                new FlagFill("nowhere", 0, 0, List.of()))).build(), T);
        assertFalse(r.flags("at-edge").isPresent());
        assertFalse(r.flags("nowhere").isPresent(), "a facet that applies nowhere has no fill rate");
        Flag f = only(r, "below", FlagKind.THIN);
        assertEquals(0.4, f.figure(), 0);
        assertEquals(List.of("FH-1", "FH-2"), f.evidence().stream().map(FlagEvidence::text).toList());
    }

    @Test
    void overlappingWhenJaccardIsAboveItsEdgeOnBothConcepts() {
        FlagReport r = Flags.evaluate(FlagInputs.builder().overlaps(List.of(
                new FlagOverlap("a", "b", 0.80, 80, List.of()),
                new FlagOverlap("c", "d", 0.81, 81, List.of("FH-9")))).build(), T);
        assertFalse(r.flags("a").isPresent());
        assertFalse(r.flags("b").isPresent());
        Flag c = only(r, "c", FlagKind.OVERLAPPING);
        assertEquals("d", c.evidence().get(0).text());
        assertEquals("FH-9", c.evidence().get(1).text());
        assertEquals("c", only(r, "d", FlagKind.OVERLAPPING).evidence().get(0).text());
    }

    // ---- ambiguous, claim ----

    @Test
    void ambiguousWhenTwoConceptsShareALabel() {
        FeedbackVocabulary v = ConsistencyFixtures.vocabulary();
        FlagReport r = Flags.evaluate(FlagInputs.builder().vocabulary(v).build(), T);
        Flag f = only(r, "down", FlagKind.AMBIGUOUS);
        assertEquals("shared-label:down", f.criterion());
        assertEquals(2, f.figure());
        assertTrue(r.has("down-jacket", FlagKind.AMBIGUOUS));
        assertFalse(r.has("hood", FlagKind.AMBIGUOUS), "hood's labels are its own");
    }

    @Test
    void ambiguousWhenMentionsResolveToSeveralConcepts() {
        FlagReport r = feedback(false,
                attr("clear", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 0, agreement(0, 0, 0), null),
                attr("mixed", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 1, agreement(0, 0, 0), null));
        assertFalse(r.flags("clear").isPresent(), "no ambiguous mention: share 0 is at the edge");
        assertEquals(0.1, only(r, "mixed", FlagKind.AMBIGUOUS).figure(), 0);
        FlagReport tolerant = Flags.evaluate(FlagInputs.builder().consistency(report(false,
                attr("mixed", ConsistencyAttribute.KIND_CONCEPT, 10, 0, 0, 1, agreement(0, 0, 0), null))).build(),
                T.with("ambiguous.mentions", 0.1));
        assertFalse(tolerant.flags("mixed").isPresent());
    }

    @Test
    void claimForEveryConceptUnderARegulatedFacet() {
        FlagReport r = Flags.evaluate(FlagInputs.builder().vocabulary(ConsistencyFixtures.vocabulary()).build(), T);
        Flag f = only(r, "waterproof", FlagKind.CLAIM);
        assertEquals("is", f.comparison());
        assertTrue(f.explanation().contains("compliance review"));
        assertFalse(r.has("hood", FlagKind.CLAIM));
    }

    // ---- whole runs ----

    @Test
    void realFeedbackRunRaisesContestedAndAmbiguousWithSentencesAsEvidence() {
        List<FeedbackSentence> s = new ArrayList<>();
        // constructed: four pairs, two people each; in three of them one says "has a hood", the other "no hood"
        for (int p = 1; p <= 4; p++) {
            s.add(ConsistencyFixtures.s("P" + p, "R", "T" + p, "alder", "It has a hood", 2 * p));
            s.add(ConsistencyFixtures.s("P" + p, "R", "T" + p, "birch", p == 4 ? "With a hood" : "No hood at all", 2 * p + 1));
        }
        s.add(ConsistencyFixtures.s("P9", "R", "T9", "cedar", "Lots of down", 20));
        ConsistencyReport c = ConsistencyFixtures.run(s, null);
        FlagReport r = Flags.evaluate(FlagInputs.builder().consistency(c).vocabulary(ConsistencyFixtures.vocabulary()).build(), T);
        List<Flag> hood = r.flags("hood").orElseThrow().flags();
        assertEquals(List.of("contradictions", "direction-agreement"), hood.stream().map(Flag::criterion).toList());
        Flag f = hood.get(1);
        assertEquals(0.25, f.figure(), 1e-12, "three pairs at 0, one at 1");
        assertEquals(FlagEvidence.SENTENCE, f.evidence().get(0).kind());
        assertTrue(f.evidence().get(0).where().contains(Pseudonyms.PREFIX));
        assertFalse(f.evidence().toString().contains("alder"));
        assertTrue(r.has("down", FlagKind.AMBIGUOUS));
        assertEquals(2, r.flags("down").orElseThrow().flags().size(), "a shared label and an ambiguous mention");
    }

    @Test
    void realAgreementRunIsContestedOnlyUnderAStricterEdge() {
        // Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]+[comp]:
        // nominal alpha 0.743 for the 4 observers x 12 units example.
        String[] rows = {"1 2 3 3 2 1 4 1 2 . . .", "1 2 3 3 2 2 4 1 2 5 . 3", ". 3 3 3 2 3 4 2 2 5 1 .", "1 2 3 3 2 4 4 1 2 5 1 ."};
        List<Judgment> j = new ArrayList<>();
        for (int o = 0; o < rows.length; o++) {
            String[] v = rows[o].split(" ");
            for (int u = 0; u < v.length; u++) {
                if (!v[u].equals(".")) {
                    j.add(new Judgment("u" + u, "observer" + o, "colour", "c" + v[u], 0));
                }
            }
        }
        AgreementReport a = AgreementAnalysis.run(Judgments.of("k2011", j), AgreementOptions.builder().replicates(0)
                .pseudonyms(ConsistencyFixtures.PSEUDONYMS).build());
        assertEquals(0.743, a.attribute("colour").orElseThrow().alpha().alpha(), 5e-4);
        FlagInputs in = FlagInputs.builder().agreement(a).build();
        assertFalse(Flags.evaluate(in, T).flags("colour").isPresent());
        assertTrue(Flags.evaluate(in, FlagThresholds.fromMap(Map.of("alpha.tentative", 0.75, "alpha.reliable", 0.8)))
                .has("colour", FlagKind.CONTESTED));
    }

    @Test
    void missingInputsAreNotedNotGuessed() {
        FlagReport r = Flags.evaluate(FlagInputs.builder().build(), T);
        assertEquals(0, r.evaluated());
        assertEquals(5, r.notes().size(), r.notes().toString());
    }
}
