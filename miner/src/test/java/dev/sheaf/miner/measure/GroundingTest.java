package dev.sheaf.miner.measure;

import static dev.sheaf.miner.measure.ConsistencyFixtures.listing;
import static dev.sheaf.miner.measure.ConsistencyFixtures.run;
import static dev.sheaf.miner.measure.ConsistencyFixtures.s;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** Grounding of absolute and comparative mentions in constructed catalogs. */
class GroundingTest {

    /** Constructed: T1 has a hood and weighs 900 g; R1 has none and weighs 1000 g; T2 is silent about hoods. */
    private static final GroundingCatalog CATALOG = GroundingCatalog.of(List.of(
            listing("T1", Set.of("hood"), Set.of(), Map.of("weight", 900.0, "temperature-rating", -5.0)),
            listing("R1", Set.of(), Set.of("hood"), Map.of("weight", 1000.0, "temperature-rating", 0.0)),
            listing("T2", Set.of(), Set.of(), Map.of("weight", 1000.0)),
            listing("R2", Set.of("hood"), Set.of(), Map.of())));

    private static FeedbackMention only(ConsistencyReport r, String form) {
        List<FeedbackMention> m = r.mentions().stream().filter(x -> x.form().equals(form)).toList();
        assertEquals(1, m.size(), "mentions of '" + form + "': " + m);
        return m.get(0);
    }

    @Test
    void absoluteMentionIsGroundedWhenTheTargetCarriesTheConcept() {
        ConsistencyReport r = run(List.of(s("P1", "R1", "T1", "a", "It has a hood", 2)), CATALOG);
        GroundingCheck g = only(r, "hood").grounding();
        assertEquals(GroundingOutcome.GROUNDED, g.outcome());
        assertEquals(GroundingCheck.PRESENCE, g.kind());
        assertEquals(Boolean.TRUE, g.contrast(), "the reference lacks a hood");
    }

    @Test
    void absoluteMentionIsNotGroundedWhenTheTargetDoesNotCarryIt() {
        ConsistencyReport r = run(List.of(s("P1", "R2", "T2", "a", "Comes with a hood", 2)), CATALOG);
        assertEquals(GroundingOutcome.NOT_GROUNDED, only(r, "hood").grounding().outcome());
    }

    @Test
    void absentMentionIsGroundedWhenTheTargetLacksItAndContrastsWhenTheReferenceHasIt() {
        ConsistencyReport r = run(List.of(s("P1", "R2", "T2", "a", "No hood on this one", 2)), CATALOG);
        GroundingCheck g = only(r, "hood").grounding();
        assertEquals(GroundingOutcome.GROUNDED, g.outcome());
        assertEquals(Boolean.TRUE, g.contrast());
        ConsistencyReport wrong = run(List.of(s("P1", "R1", "T1", "a", "It has no hood", 2)), CATALOG);
        assertEquals(GroundingOutcome.NOT_GROUNDED, only(wrong, "hood").grounding().outcome());
    }

    @Test
    void groundedPresenceWithTheSameReferenceIsNoContrast() {
        ConsistencyReport r = run(List.of(s("P1", "R2", "T1", "a", "It has a hood", 2)), CATALOG);
        assertEquals(Boolean.FALSE, only(r, "hood").grounding().contrast());
    }

    @Test
    void precisionIsGroundedOverCheckedAbsoluteMentions() {
        ConsistencyReport r = run(List.of(
                s("P1", "R1", "T1", "a", "It has a hood", 2),
                s("P1", "R1", "T1", "b", "Has a hood", 3),
                s("P1", "R1", "T1", "c", "No hood", 4),
                s("P2", "R1", "T9", "d", "With a hood", 5)), CATALOG);
        GroundingSummary g = r.attribute("hood").orElseThrow().grounding();
        assertEquals(3, g.presenceChecked(), "T9 is not in the catalog");
        assertEquals(2, g.presenceGrounded());
        assertEquals(2.0 / 3, g.presencePrecision(), 1e-12);
        assertEquals(1.0, g.contrastRate(), 0);
        assertEquals(1, g.unchecked());
        assertEquals(0.5, g.groundedShare(), 1e-12);
    }

    @Test
    void comparativeOnANumberFacetIsGroundedWhenTheValuesAgree() {
        // lighter = less weight: target 900 g < reference 1000 g
        ConsistencyReport r = run(List.of(s("P1", "R1", "T1", "a", "Lighter than this one", 2)), CATALOG);
        GroundingCheck g = only(r, "lighter").grounding();
        assertEquals(GroundingOutcome.GROUNDED, g.outcome());
        assertEquals(GroundingCheck.COMPARISON, g.kind());
        assertEquals("weight", g.facet());
        assertEquals(900.0, g.targetValue());
        assertEquals(1000.0, g.referenceValue());
        assertNull(g.contrast());
        ConsistencyReport heavier = run(List.of(s("P1", "R1", "T1", "a", "Heavier than this one", 2)), CATALOG);
        assertEquals(GroundingOutcome.NOT_GROUNDED, only(heavier, "heavier").grounding().outcome());
    }

    @Test
    void warmerMeansALowerComfortTemperature() {
        // target rated -5 °C, reference 0 °C: the target is the warmer bag
        ConsistencyReport warmer = run(List.of(s("P1", "R1", "T1", "a", "Warmer than this one", 2)), CATALOG);
        FeedbackMention m = only(warmer, "warmer");
        assertEquals("temperature-rating", m.attribute());
        assertEquals(Direction.LESS, m.direction());
        assertEquals(GroundingOutcome.GROUNDED, m.grounding().outcome());
        ConsistencyReport colder = run(List.of(s("P1", "R1", "T1", "a", "Colder than this one", 2)), CATALOG);
        assertEquals(GroundingOutcome.NOT_GROUNDED, only(colder, "colder").grounding().outcome());
        ConsistencyReport notAsWarm = run(List.of(s("P1", "R1", "T1", "a", "Not as warm as this one", 2)), CATALOG);
        FeedbackMention n = only(notAsWarm, "warm");
        assertEquals(Direction.MORE, n.direction(), "not as warm = a higher rating");
        assertEquals(GroundingOutcome.NOT_GROUNDED, n.grounding().outcome());
    }

    @Test
    void equalValuesDoNotGroundAClaimedDifference() {
        ConsistencyReport r = run(List.of(s("P1", "R1", "T2", "a", "Lighter", 2)), CATALOG);
        GroundingCheck g = only(r, "lighter").grounding();
        assertEquals(GroundingOutcome.NOT_GROUNDED, g.outcome());
        assertTrue(g.reason().contains("equal"), g.reason());
    }

    @Test
    void whatTheCatalogCannotSayIsUncheckedWithItsReason() {
        ConsistencyReport noValue = run(List.of(s("P1", "R2", "T1", "a", "Lighter", 2)), CATALOG);
        GroundingCheck g = only(noValue, "lighter").grounding();
        assertEquals(GroundingOutcome.UNCHECKED, g.outcome());
        assertTrue(g.reason().contains("reference R2 has no weight"), g.reason());
        ConsistencyReport noScale = run(List.of(s("P1", "R1", "T1", "a", "Roomier than this one", 2)), CATALOG);
        assertTrue(only(noScale, "roomier").grounding().reason().contains("no scale"));
        ConsistencyReport noCatalog = run(List.of(s("P1", "R1", "T1", "a", "It has a hood", 2)), null);
        assertEquals(GroundingOutcome.UNCHECKED, only(noCatalog, "hood").grounding().outcome());
    }

    @Test
    void aScaleByConceptTurnsItsComparativeMentions() {
        FeedbackVocabulary v = ConsistencyFixtures.vocabulary();
        GroundingScales scales = GroundingScales.of("test", List.of(
                new GroundingScale("pack-volume", Direction.MORE, List.of(), List.of("roomy"), "")));
        GroundingCatalog catalog = GroundingCatalog.of(List.of(
                listing("T", Set.of(), Set.of(), Map.of("pack-volume", 30.0)),
                listing("R", Set.of(), Set.of(), Map.of("pack-volume", 25.0))));
        ConsistencyOptions o = ConsistencyOptions.builder(FeedbackTermFinder.exactLabels(v)).vocabulary(v).scales(scales)
                .catalog(catalog).pseudonyms(ConsistencyFixtures.PSEUDONYMS).build();
        ConsistencyReport r = ConsistencyAnalysis.run(FeedbackSentences.of("t", List.of(
                s("P", "R", "T", "a", "Roomier", 2), s("P", "R", "T", "b", "Roomy", 3))), o);
        FeedbackMention comparative = only(r, "roomier");
        assertEquals("pack-volume", comparative.attribute());
        assertEquals(GroundingOutcome.GROUNDED, comparative.grounding().outcome());
        // an absolute mention of the concept stays with the concept
        assertEquals("roomy", only(r, "roomy").attribute());
    }
}
