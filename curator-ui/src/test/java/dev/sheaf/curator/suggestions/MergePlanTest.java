package dev.sheaf.curator.suggestions;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.suggest.Suggestion;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

/** What accepting, keeping apart and dismissing a suggestion does to a vocabulary. */
class MergePlanTest {
    static Vocabulary vocab() {
        Vocabulary v = Vocabulary.empty(SchemeInfo.of("t", "T"));
        v = v.apply(Edit.addConcept(Concept.builder("material").prefLabel("material").facet(FacetProperties.terms()).build()));
        v = v.apply(Edit.addConcept(Concept.builder("ripstop").prefLabel("ripstop nylon").broader("material").build()));
        return v.apply(Edit.addConcept(Concept.builder("rip-stop").prefLabel("rip-stop").broader("material").build()));
    }

    static Suggestion suggestion(Suggestion.Member... members) {
        return new Suggestion(Suggestion.Kind.SPELLING_VARIANT, List.of(members), 0.9, "spelling variants",
                List.of(new Suggestion.Support(Suggestion.Kind.SPELLING_VARIANT, 0.9, "one hyphen apart", Map.of())), List.of());
    }

    static Suggestion.Member concept(String term, String id) {
        return new Suggestion.Member(term, term, id, 10, 5);
    }

    static Suggestion.Member term(String term, String shown) {
        return new Suggestion.Member(term, shown, null, 4, 3);
    }

    @Test
    void acceptingMergesTheOtherConceptIntoThePreferredOne() {
        Vocabulary v = vocab();
        Suggestion s = suggestion(concept("ripstop nylon", "ripstop"), concept("rip stop", "rip-stop"));
        assertEquals(List.of("ripstop nylon", "rip-stop"), MergePlan.preferredChoices(v, s));
        assertEquals("ripstop nylon", MergePlan.defaultPreferred(v, s));
        Vocabulary after = v.apply(MergePlan.accept(v, s, "ripstop nylon"));
        assertFalse(after.contains("rip-stop"));
        assertEquals("ripstop", after.resolve("rip-stop").orElseThrow().id(), "the merged id is retired, replaced by the survivor");
        assertTrue(after.concept("ripstop").orElseThrow().altLabels().contains(Label.of("rip-stop")));
    }

    @Test
    void pickingTheOtherLabelKeepsItsConceptAndName() {
        Vocabulary v = vocab();
        Suggestion s = suggestion(concept("ripstop nylon", "ripstop"), concept("rip stop", "rip-stop"));
        Vocabulary after = v.apply(MergePlan.accept(v, s, "rip-stop"));
        assertFalse(after.contains("ripstop"));
        assertEquals("rip-stop", after.displayLabel("rip-stop"));
        assertTrue(after.concept("rip-stop").orElseThrow().altLabels().contains(Label.of("ripstop nylon")));
    }

    @Test
    void aPlainTermBecomesAnAlternativeLabelAndIsKept() {
        Vocabulary v = vocab();
        Suggestion s = suggestion(concept("ripstop nylon", "ripstop"), term("ripstop nylon fabric", "Ripstop Nylon Fabric"));
        Vocabulary after = v.apply(MergePlan.accept(v, s, "ripstop nylon"));
        assertTrue(after.concept("ripstop").orElseThrow().altLabels().contains(Label.of("Ripstop Nylon Fabric")));
        Decision d = after.decision("ripstop nylon fabric").orElseThrow();
        assertEquals(Decision.Outcome.KEPT, d.outcome());
        assertEquals("ripstop", d.concept());
    }

    @Test
    void aPlainTermPickedAsPreferredRenamesTheConcept() {
        Vocabulary v = vocab();
        Suggestion s = suggestion(concept("ripstop nylon", "ripstop"), term("ripstop", "ripstop"));
        Vocabulary after = v.apply(MergePlan.accept(v, s, "ripstop"));
        Concept c = after.concept("ripstop").orElseThrow();
        assertEquals("ripstop", c.displayLabel("en"));
        assertTrue(c.altLabels().contains(Label.of("ripstop nylon")), "the old name stays as an alternative");
    }

    @Test
    void termsOnlyMakeANewConceptUnderNoFacet() {
        Vocabulary v = vocab();
        Suggestion s = suggestion(term("gore tex", "Gore-Tex"), term("goretex", "GoreTex"));
        Vocabulary after = v.apply(MergePlan.accept(v, s, "Gore-Tex"));
        Concept c = after.concept("gore-tex").orElseThrow();
        assertEquals(Set.of(), c.broader());
        assertEquals(Set.of(Label.of("GoreTex")), c.altLabels());
        assertEquals("gore-tex", after.decision("goretex").orElseThrow().concept());
    }

    @Test
    void keepApartRelatesTwoConceptsAndRefusesPlainTerms() {
        Vocabulary v = vocab();
        Suggestion two = suggestion(concept("ripstop nylon", "ripstop"), concept("rip stop", "rip-stop"));
        Vocabulary after = v.apply(MergePlan.keepApart(two).orElseThrow());
        assertTrue(after.concept("ripstop").orElseThrow().related().contains("rip-stop"));
        assertTrue(MergePlan.keepApart(suggestion(concept("ripstop nylon", "ripstop"), term("rs", "RS"))).isEmpty());
    }

    @Test
    void dismissDropsTheUndecidedTermsWithAReason() {
        Vocabulary v = vocab();
        Suggestion s = suggestion(concept("ripstop nylon", "ripstop"), term("ripstob", "ripstob"));
        Vocabulary after = v.apply(MergePlan.dismiss(v, s).orElseThrow());
        assertTrue(after.isDropped("ripstob"));
        assertTrue(after.decision("ripstob").orElseThrow().reason().contains("ripstop nylon"));
        assertTrue(after.contains("ripstop"), "the concept is untouched");
        Suggestion both = suggestion(concept("ripstop nylon", "ripstop"), concept("rip stop", "rip-stop"));
        assertTrue(v.apply(MergePlan.dismiss(v, both).orElseThrow()).concept("ripstop").orElseThrow().related().contains("rip-stop"),
                "two concepts: dismissing keeps them apart");
    }
}
