package dev.sheaf.miner.suggest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestOptions;
import dev.sheaf.miner.mine.Harvester;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** The suggester on a small invented catalog: each kind, the decided filter, the hierarchy kinds, the options. */
class SuggesterTest {
    static List<Listing> listings;
    static Harvest harvest;
    static Suggester suggester;

    @BeforeAll
    static void mine() {
        listings = new ArrayList<>();
        // every phrase in fewer than half the listings (the harvest drops terms above its maximum df share)
        for (int i = 0; i < 60; i++) {
            List<Field> f = new ArrayList<>();
            f.add(Field.of(FieldKind.TITLE, "Trail jacket " + i));
            if (i % 3 == 0) {
                f.add(Field.of(FieldKind.DESCRIPTION, "Shell with a durable water repellent (DWR) finish."));
            } else if (i % 12 == 1) {
                f.add(Field.of(FieldKind.DESCRIPTION, "Shell with a DWR finish that sheds rain."));
            }
            if (i % 4 < 2) {
                f.add(Field.of(FieldKind.BULLET, "Choose your " + (i % 4 == 0 ? "colour" : "color") + " online"));
                f.add(Field.spec(i % 4 == 0 ? "Colour" : "Color", i % 8 < 4 ? "Storm grey" : "Storm gray"));
            } else {
                f.add(Field.of(FieldKind.BULLET, "Front pocket with " + (i % 4 == 2 ? "grey" : "gray") + " lining"));
            }
            if (i % 5 == 0) {
                f.add(Field.of(FieldKind.BULLET, "Two-way zipper on the front"));
            } else if (i % 5 == 1) {
                f.add(Field.of(FieldKind.BULLET, "Zipper garage at the chin, zipper on the front"));
            }
            if (i % 2 == 0) {
                f.add(Field.of(FieldKind.BULLET, "Lightweight fabric for travel"));
            } else if (i % 10 == 1) {
                f.add(Field.of(FieldKind.BULLET, "Lightwieght fabric for travel"));
            }
            f.add(Field.spec("Closure", i % 3 == 0 ? "Snaps" : i % 3 == 1 ? "Toggle" : "Buttons"));
            listings.add(new Listing("L-" + i, "rain-shells", "test.jsonl", "line " + (i + 1), f));
        }
        harvest = Harvester.builder().profile(AnalysisProfile.defaults()).options(HarvestOptions.defaults()).threads(1).build()
                .harvest(listings);
        suggester = Suggester.builder(harvest).listings(listings).build();
    }

    static Optional<Suggestion> pair(Suggester s, String a, String b) {
        return s.suggestions().stream().filter(x -> x.terms().contains(a) && x.terms().contains(b)).findFirst();
    }

    @Test
    void proposesUsUkSpellingsWithTheRuleAsReason() {
        Suggestion s = pair(suggester, "colour", "color").orElseThrow();
        assertTrue(s.supportedBy(Suggestion.Kind.SPELLING_VARIANT), s.toString());
        assertTrue(s.reason().contains("-our/-or"), s.reason());
        assertTrue(pair(suggester, "grey lining", "gray lining").orElseThrow().reason().contains("grey/gray"));
        assertTrue(s.score() >= 0.9 && s.score() <= 1);
    }

    @Test
    void proposesARareMisspellingOfACommonWord() {
        Suggestion s = pair(suggester, "lightweight", "lightwieght").orElseThrow();
        assertTrue(s.supportedBy(Suggestion.Kind.SPELLING_VARIANT));
        assertTrue(s.reason().contains("misspelling"), s.reason());
        assertEquals(1.0, s.support().get(0).figures().get("edit distance"), "a swap of two letters is one edit");
        // most frequent member first
        assertEquals("lightweight", s.members().get(0).term());
    }

    @Test
    void findsAnAbbreviationSpelledOutInTheText() {
        Suggestion s = pair(suggester, "dwr", "durable water repellent").orElseThrow();
        assertTrue(s.supportedBy(Suggestion.Kind.ABBREVIATION));
        assertFalse(s.evidence().isEmpty());
        assertTrue(s.evidence().get(0).match().contains("(DWR)"), s.evidence().get(0).toString());
    }

    @Test
    void spellingOfSpecValuesIsCorroboratedByTheirSharedKey() {
        Suggestion s = pair(suggester, "storm grey", "storm gray").orElseThrow();
        assertTrue(s.supportedBy(Suggestion.Kind.SAME_SPEC_KEY), s.toString());
    }

    @Test
    void decidedSuggestionsNeverComeBack() {
        Vocabulary v = Vocabulary.empty(SchemeInfo.of("test", "Test"));
        // merged: both are labels of one concept
        v = v.apply(Edit.addConcept(Concept.builder("colour").prefLabel("colour").altLabel("color").build()));
        // kept apart: two concepts, related
        v = v.apply(Edit.addConcept(Concept.builder("grey").prefLabel("grey lining").build()));
        v = v.apply(Edit.addConcept(Concept.builder("gray").prefLabel("gray lining").build()));
        v = v.apply(Edit.relate("grey", "gray"));
        // dropped
        v = v.apply(Edit.recordDecision(Decision.dropped("lightwieght", "typo, fix at source")));
        Suggester after = suggester.withVocabulary(v);
        assertTrue(pair(suggester, "colour", "color").isPresent());
        assertFalse(pair(after, "colour", "color").isPresent(), "merged");
        assertFalse(pair(after, "grey lining", "gray lining").isPresent(), "kept apart");
        assertFalse(pair(after, "lightweight", "lightwieght").isPresent(), "dropped");
        assertTrue(pair(after, "dwr", "durable water repellent").isPresent(), "undecided ones stay");
        // a concept can ask for its own suggestions, and unrelating brings the pair back
        assertTrue(after.forConcept("grey").isEmpty());
        Suggester again = after.withVocabulary(v.apply(Edit.unrelate("grey", "gray")));
        Suggestion s = pair(again, "grey lining", "gray lining").orElseThrow();
        assertEquals(List.of("gray", "grey"), s.conceptIds().stream().sorted().toList());
        assertTrue(Suggester.keepApart(s).isPresent(), "two concepts can be kept apart with one edit");
        assertTrue(Suggester.keepApart(pair(again, "dwr", "durable water repellent").orElseThrow()).isEmpty(), "terms must become concepts first");
        assertFalse(again.forConcept("grey").isEmpty());
    }

    @Test
    void forTermAcceptsAnyWrittenForm() {
        assertFalse(suggester.forTerm("Durable Water-Repellent").isEmpty());
        assertEquals(suggester.forTerm("dwr"), suggester.forTerm("DWR"));
    }

    @Test
    void putsTwoWayZipperUnderZipper() {
        HierarchySuggestion h = suggester.hierarchy(HierarchySuggestion.Kind.HEAD_MODIFIER).stream()
                .filter(x -> x.child().term().equals("two way zipper")).findFirst().orElseThrow();
        assertEquals("zipper", h.parent().term());
        assertEquals(12, h.counts().childListings());
        assertFalse(suggester.hierarchyForTerm("Two-Way Zipper").isEmpty());
    }

    @Test
    void specKeysBecomeFacetsWithTheirValues() {
        assertTrue(suggester.hierarchy(HierarchySuggestion.Kind.FACET_VALUE).stream()
                .anyMatch(h -> h.parent().facet() && h.child().term().equals("snaps")), suggester.hierarchy().toString());
    }

    @Test
    void subsumptionFollowsTheThreshold() {
        // tighter thresholds keep fewer
        Suggester strict = Suggester.builder(harvest).options(SuggestOptions.builder().subsumption(1.0).build()).listings(listings).build();
        Suggester loose = Suggester.builder(harvest).options(SuggestOptions.builder().subsumption(0.6).build()).listings(listings).build();
        int s = strict.hierarchy(HierarchySuggestion.Kind.SUBSUMPTION).size();
        int l = loose.hierarchy(HierarchySuggestion.Kind.SUBSUMPTION).size();
        assertTrue(s <= l, s + " vs " + l);
        for (HierarchySuggestion h : strict.hierarchy(HierarchySuggestion.Kind.SUBSUMPTION)) {
            assertEquals(h.counts().childListings(), h.counts().bothListings(), "P(parent|child) = 1 at threshold 1: " + h);
            assertTrue(h.counts().bothListings() < h.counts().parentListings(), "P(child|parent) < 1: " + h);
        }
    }

    @Test
    void withoutListingsTheCorpusKindsSaySoInsteadOfRunning() {
        Suggester s = Suggester.builder(harvest).build();
        assertTrue(s.summary().notes().stream().anyMatch(n -> n.startsWith("distributional: not run")), s.summary().notes().toString());
        assertTrue(s.hierarchy(HierarchySuggestion.Kind.SUBSUMPTION).isEmpty());
        assertTrue(pair(s, "colour", "color").isPresent());
    }

    @Test
    void rankingIsDeterministic() {
        Suggester again = Suggester.builder(harvest).listings(listings).build();
        assertEquals(suggester.suggestions(), again.suggestions());
        assertEquals(suggester.hierarchy(), again.hierarchy());
    }

    @Test
    void optionsSayWhichValueIsWrong() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SuggestOptions.builder().subsumption(0.3).build());
        assertTrue(e.getMessage().contains("subsumption"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> SuggestOptions.builder().minScore(1.5).build());
        assertThrows(IllegalArgumentException.class, () -> SuggestOptions.preset("loud"));
        assertEquals(0.7, SuggestOptions.precise().minScore());
        assertEquals(Suggestion.Kind.SPELLING_VARIANT, Suggestion.Kind.ofWord("Spelling-Variant"));
    }

    @Test
    void spellingRulesAndEditDistance() {
        assertEquals(Spelling.skeleton("colour"), Spelling.skeleton("color"));
        assertEquals(Spelling.skeleton("fibres"), Spelling.skeleton("fibers"));
        assertEquals(Spelling.skeleton("aluminium"), Spelling.skeleton("aluminum"));
        assertEquals(Spelling.skeleton("travelled"), Spelling.skeleton("traveled"));
        assertFalse(Spelling.skeleton("xxl").equals(Spelling.skeleton("xl")), "sizes are not doubled consonants");
        // optimal string alignment distances [practice]: a swap is one edit, "ca" -> "abc" is 3 under OSA
        assertEquals(1, Spelling.distance("lightweight", "lightwieght"));
        assertEquals(3, Spelling.distance("ca", "abc"));
        assertEquals(3, Spelling.distance("kitten", "sitting"));
    }

    @Test
    void schwartzHearstLongForms() {
        // examples in the style of Schwartz & Hearst 2003 [mem]
        assertEquals("heat shock transcription factor", Abbreviations.bestLongForm("HSF", "with a heat shock transcription factor"));
        List<String> found = new ArrayList<>();
        Abbreviations.scan("Treated with a durable water repellent (DWR) finish; HH (hydrostatic head) 10,000 mm.",
                (s, l, a, b) -> found.add(s + "=" + l));
        assertEquals(List.of("DWR=durable water repellent", "HH=hydrostatic head"), found);
    }
}
