package dev.sheaf.miner.measure;

import static dev.sheaf.miner.measure.ConsistencyFixtures.run;
import static dev.sheaf.miner.measure.ConsistencyFixtures.s;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** Every figure on small constructed examples; expected values are worked out by hand in the comments. */
class ConsistencyAnalysisTest {

    /** Constructed: three people on pair P1, two on P2, one on P3. */
    private static final List<FeedbackSentence> SIX = List.of(
            s("P1", "R1", "T1", "alder.fenn", "Lighter than this one and it has a hood.", 2),
            s("P1", "R1", "T1", "birch.oyelaran", "A bit heavier, but it has a hood.", 3),
            s("P1", "R1", "T1", "cedar.quist", "Much lighter, no hood though.", 4),
            s("P2", "R2", "T2", "alder.fenn", "Roomier, with a hood.", 5),
            s("P2", "R2", "T2", "birch.oyelaran", "It is roomier and has a hood.", 6),
            s("P3", "R1", "T2", "dogwood.m", "Kind of roomy.", 7));

    @Test
    void countsMentionsSentencesAndShareOfSentences() {
        ConsistencyReport r = run(SIX, null);
        ConsistencyAttribute hood = r.attribute("hood").orElseThrow();
        assertEquals(5, hood.mentions());
        assertEquals(5, hood.sentences());
        assertEquals(5.0 / 6, hood.share(), 1e-12);
        assertEquals(6, r.sentences());
        assertEquals(6, r.sentencesWithMentions());
        assertEquals(3, r.pairs());
        assertEquals(4, r.annotators());
    }

    @Test
    void readsDirectionsAboutTheAttribute() {
        ConsistencyReport r = run(SIX, null);
        ConsistencyAttribute hood = r.attribute("hood").orElseThrow();
        assertEquals(4, hood.directions().get(Direction.PRESENT));
        assertEquals(1, hood.directions().get(Direction.ABSENT));
        assertEquals(0, hood.directions().get(Direction.MORE));
        // "lighter" is more light = less weight; "heavier" is more weight
        ConsistencyAttribute weight = r.attribute("weight").orElseThrow();
        assertEquals(2, weight.directions().get(Direction.LESS));
        assertEquals(1, weight.directions().get(Direction.MORE));
        assertEquals(ConsistencyAttribute.KIND_CONCEPT, weight.kind());
    }

    @Test
    void hedgeRateAndComparativeShareCountMentions() {
        ConsistencyAttribute roomy = run(SIX, null).attribute("roomy").orElseThrow();
        // roomier (comparative), roomier (comparative), "kind of roomy" (hedged, absolute)
        assertEquals(3, roomy.mentions());
        assertEquals(1.0 / 3, roomy.hedgeRate(), 1e-12);
        assertEquals(2.0 / 3, roomy.comparativeShare(), 1e-12);
    }

    @Test
    void findsDegreeFormsOfLabelsThroughMorphology() {
        ConsistencyReport r = run(SIX, null);
        List<FeedbackMention> roomier = r.mentions().stream().filter(m -> m.form().equals("roomier")).toList();
        assertEquals(2, roomier.size());
        for (FeedbackMention m : roomier) {
            assertEquals("roomy", m.conceptId());
            assertEquals("roomy", m.label());
            assertEquals(FeedbackMention.VIA_DEGREE_FORM, m.via());
            assertEquals(Direction.MORE, m.direction());
            assertTrue(m.comparative());
        }
    }

    @Test
    void scaleWordsCountUnderTheirFacetWithTurnedDirection() {
        ConsistencyReport r = run(SIX, null);
        FeedbackMention lighter = r.mentions().stream().filter(m -> m.form().equals("lighter")).findFirst().orElseThrow();
        assertEquals("weight", lighter.attribute());
        assertEquals(FeedbackMention.VIA_SCALE_WORD, lighter.via());
        assertEquals(Direction.MORE, lighter.read());
        assertEquals(Direction.LESS, lighter.direction());
        assertEquals("light", lighter.label());
    }

    @Test
    void surfaceFormsAndTheirEntropy() {
        ConsistencyAttribute roomy = run(SIX, null).attribute("roomy").orElseThrow();
        assertEquals(List.of(new SurfaceForms.Form("roomier", 2), new SurfaceForms.Form("roomy", 1)), roomy.surfaceForms().forms());
        // H(2/3, 1/3) = log2(3) - 2/3 [comp]
        assertEquals(Math.log(3) / Math.log(2) - 2.0 / 3, roomy.surfaceForms().entropyBits(), 1e-12);
    }

    @Test
    void listsLabelsNobodyUses() {
        ConsistencyReport r = run(SIX, null);
        assertEquals(List.of("spacious"), r.attribute("roomy").orElseThrow().unusedLabels());
        assertEquals(List.of("hooded"), r.attribute("hood").orElseThrow().unusedLabels());
        assertTrue(r.unmentioned().containsAll(List.of("pit-zips", "down", "down-jacket", "waterproof")));
        assertFalse(r.unmentioned().contains("roomy"));
    }

    /**
     * Hand-computed: hood stances in P1 are present, present, absent → 1 agreeing pair of 3 = 1/3;
     * in P2 present, present → 1; P3 has no hood mention. Mean (1/3 + 1) / 2 = 2/3; one of the two
     * judged pairs holds a contradiction → 1/2.
     */
    @Test
    void directionAgreementBetweenPeopleHandComputed() {
        ConsistencyAgreement a = run(SIX, null).attribute("hood").orElseThrow().agreement();
        assertEquals(2, a.pairsMentioned());
        assertEquals(2, a.pairsJudged());
        assertEquals(2.0 / 3, a.meanAgreement(), 1e-12);
        assertEquals(1, a.contradictoryPairs());
        assertEquals(0.5, a.contradictionShare(), 1e-12);
        // roomy: P2 more, more → 1; P3 has one mentioner and is not judged
        ConsistencyAgreement roomy = run(SIX, null).attribute("roomy").orElseThrow().agreement();
        assertEquals(1, roomy.pairsJudged());
        assertEquals(1.0, roomy.meanAgreement(), 1e-12);
        assertEquals(0, roomy.contradictoryPairs());
    }

    @Test
    void directionAlphaIsNominalAlphaOverPairs() {
        // Constructed: units P1 {present, present, absent}, P2 {present, present}. Coincidences: o(p,p) = 2/2 + 2/1 = 3,
        // o(p,a) = o(a,p) = 2/2 = 1, n = 5, n_p = 4, n_a = 1. alpha = 1 - (n-1) * 2 / (2 * n_p * n_a) = 1 - 4*2/8 = 0 [comp]
        KrippendorffResult alpha = run(SIX, null).attribute("hood").orElseThrow().agreement().alpha();
        assertEquals(0.0, alpha.alpha(), 1e-12);
    }

    @Test
    void listsContradictionsWithTheirSentencesUnderPseudonyms() {
        ConsistencyReport r = run(SIX, null);
        List<ConsistencyContradiction> weight = r.contradictions().stream().filter(c -> c.attribute().equals("weight")).toList();
        assertEquals(1, weight.size());
        ConsistencyContradiction c = weight.get(0);
        assertEquals("P1", c.pairId());
        assertEquals("more-vs-less", c.kind());
        assertEquals(3, c.sides().size());
        assertTrue(c.sides().stream().anyMatch(sd -> sd.sentence().equals("A bit heavier, but it has a hood.")
                && sd.direction() == Direction.MORE));
        for (ConsistencyContradiction.Side sd : c.sides()) {
            assertTrue(sd.annotator().startsWith(Pseudonyms.PREFIX), sd.annotator());
        }
        ConsistencyContradiction hood = r.contradictions().stream().filter(x -> x.attribute().equals("hood")).findFirst().orElseThrow();
        assertEquals("present-vs-absent", hood.kind());
    }

    @Test
    void reportHoldsPseudonymsOnlyNeverTheIdsFromTheFile() {
        ConsistencyReport r = run(SIX, null);
        String all = r.toString();
        for (String raw : List.of("alder.fenn", "birch.oyelaran", "cedar.quist", "dogwood.m")) {
            assertFalse(all.contains(raw), raw + " leaked into the report");
        }
        assertEquals(4, r.mentions().stream().map(FeedbackMention::annotator).collect(Collectors.toSet()).size());
        assertEquals(ConsistencyFixtures.PSEUDONYMS.assign(List.of("alder.fenn")).get("alder.fenn"),
                r.mentions().get(0).annotator());
    }

    @Test
    void aSharedLabelGivesOneAmbiguousMentionPerConcept() {
        ConsistencyReport r = run(List.of(s("P9", "R1", "T1", "alder.fenn", "More down in this one.", 2)), null);
        ConsistencyAttribute down = r.attribute("down").orElseThrow();
        ConsistencyAttribute jacket = r.attribute("down-jacket").orElseThrow();
        assertEquals(1, down.ambiguous());
        assertEquals(1, jacket.ambiguous());
        assertEquals(1.0, down.ambiguousShare(), 0);
        FeedbackMention m = r.mentions().stream().filter(x -> x.conceptId().equals("down")).findFirst().orElseThrow();
        assertEquals(List.of("down-jacket"), m.alsoConcepts());
    }

    @Test
    void multiWordLabelsMatchWholeAcrossHyphensButNotAcrossPunctuation() {
        ConsistencyReport r = run(List.of(
                s("P1", "R1", "T1", "alder.fenn", "It has Pit-Zips and a hood", 2),
                s("P1", "R1", "T1", "birch.oyelaran", "The pit, zips are stiff", 3)), null);
        ConsistencyAttribute pit = r.attribute("pit-zips").orElseThrow();
        assertEquals(1, pit.mentions());
        assertEquals(List.of("armpit zips"), pit.unusedLabels());
    }

    @Test
    void emptyFeedbackGivesAnEmptyReport() {
        ConsistencyReport r = run(List.of(), null);
        assertEquals(0, r.sentences());
        assertTrue(r.attributes().isEmpty());
        assertTrue(r.gaps().isEmpty());
    }
}
