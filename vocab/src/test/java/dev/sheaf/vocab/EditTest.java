package dev.sheaf.vocab;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/** Every edit: its effect, undo back to the exact previous snapshot, redo to the exact result, and refusals. */
class EditTest {
    private final Vocabulary start = Fixtures.fernhollow();

    /** Applies an edit through a history, checks the effect, then undo and redo. */
    private Vocabulary roundTrip(Edit e, Consumer<Vocabulary> effect) {
        EditHistory h = new EditHistory(start);
        Vocabulary after = h.apply(e);
        effect.accept(after);
        assertTrue(h.canUndo());
        assertEquals(start, h.undo(), "undo restores the previous snapshot exactly");
        assertEquals(after, h.redo(), "redo gives the same result again");
        assertEquals(start, h.undo());
        return after;
    }

    private static void assertRefused(Vocabulary v, Edit e, String expectedPart) {
        EditRefusedException x = assertThrows(EditRefusedException.class, () -> v.apply(e));
        assertTrue(x.getMessage().contains(expectedPart), x.getMessage());
        assertFalse(e.problems(v).isEmpty());
    }

    private Concept c(Vocabulary v, String id) {
        return v.concept(id).orElseThrow();
    }

    @Test
    void addsAConceptAndLinksRelatedBothWays() {
        Concept mesh = Concept.builder("mesh").prefLabel("mesh").broader("material").related("polyester").build();
        roundTrip(Edit.addConcept(mesh), v -> {
            assertEquals("material", v.facetOf("mesh").orElseThrow().id());
            assertTrue(c(v, "polyester").related().contains("mesh"));
        });
    }

    @Test
    void addsAFacet() {
        Concept fit = Concept.builder("fit").prefLabel("Fit").facet(FacetProperties.terms()).build();
        roundTrip(Edit.addConcept(fit), v -> assertTrue(v.facets().contains(fit)));
    }

    @Test
    void refusesToAddAConceptWithATakenOrRetiredIdOrAnAmbiguousLabel() {
        assertRefused(start, Edit.addConcept(Concept.builder("nylon").prefLabel("nylon 6").broader("material").build()),
                "already used");
        assertRefused(start, Edit.addConcept(Concept.builder("rip-stop").prefLabel("rip stop").broader("material").build()),
                "retired");
        assertRefused(start, Edit.addConcept(Concept.builder("zip").prefLabel("zip").broader("closure").build()),
                "ambiguous-label");
        assertRefused(start, Edit.addConcept(Concept.builder("x").prefLabel("x").broader("no-such").build()),
                "not a concept");
    }

    @Test
    void renamesKeepingTheIdAndOptionallyTheOldLabel() {
        roundTrip(Edit.rename("zipper", Label.of("zip fastener")), v -> {
            assertEquals("zip fastener", c(v, "zipper").prefLabels().get("en"));
            assertFalse(c(v, "zipper").altLabels().contains(Label.of("zipper")));
        });
        roundTrip(Edit.rename("zipper", Label.of("zip fastener"), true),
                v -> assertTrue(c(v, "zipper").altLabels().contains(Label.of("zipper"))));
    }

    @Test
    void renamingToASynonymPromotesIt() {
        roundTrip(Edit.rename("merino-wool", Label.of("merino")), v -> {
            assertEquals("merino", c(v, "merino-wool").prefLabels().get("en"));
            assertTrue(c(v, "merino-wool").altLabels().isEmpty(), "no S13 clash left behind");
        });
    }

    @Test
    void refusesARenameThatMakesALabelAmbiguous() {
        assertRefused(start, Edit.rename("toggle", Label.of("zip")), "ambiguous-label");
        assertRefused(start, Edit.rename("toggle", Label.of("toggle")), "already called");
    }

    @Test
    void addsAndRemovesAlternativeAndHiddenLabels() {
        roundTrip(Edit.addLabel("zipper", LabelKind.HIDDEN, Label.of("ziper")),
                v -> assertTrue(c(v, "zipper").hiddenLabels().contains(Label.of("ziper"))));
        roundTrip(Edit.addLabel("zipper", LabelKind.ALTERNATIVE, Label.of("Reißverschluss", "de")),
                v -> assertEquals(1, c(v, "zipper").labels("de").size()));
        roundTrip(Edit.removeLabel("zipper", LabelKind.ALTERNATIVE, Label.of("zip")),
                v -> assertTrue(c(v, "zipper").altLabels().isEmpty()));
        roundTrip(Edit.removeLabel("nylon", LabelKind.PREFERRED, Label.of("Nylon", "de")),
                v -> assertFalse(c(v, "nylon").prefLabels().containsKey("de")));
    }

    @Test
    void refusesLabelEditsThatBreakS13OrTheDefaultPreferredLabel() {
        // W3C SKOS Reference (2009) S13: pref/alt/hidden pairwise disjoint [mem, corroborated]
        assertRefused(start, Edit.addLabel("zipper", LabelKind.ALTERNATIVE, Label.of("zipper")), "label-kinds-overlap");
        assertRefused(start, Edit.addLabel("zipper", LabelKind.PREFERRED, Label.of("zip")), "renaming");
        assertRefused(start, Edit.removeLabel("zipper", LabelKind.PREFERRED, Label.of("zipper")), "rename");
        assertRefused(start, Edit.removeLabel("zipper", LabelKind.HIDDEN, Label.of("zip")), "has no hidden label");
    }

    @Test
    void movesALabelToAnotherConceptOrKind() {
        roundTrip(Edit.moveLabel("zipper", Label.of("zip"), "two-way-zipper", LabelKind.ALTERNATIVE), v -> {
            assertFalse(c(v, "zipper").altLabels().contains(Label.of("zip")));
            assertTrue(c(v, "two-way-zipper").altLabels().contains(Label.of("zip")));
        });
        roundTrip(Edit.moveLabel("zipper", Label.of("zip"), "zipper", LabelKind.HIDDEN), v -> {
            assertTrue(c(v, "zipper").hiddenLabels().contains(Label.of("zip")));
            assertTrue(c(v, "zipper").altLabels().isEmpty());
        });
        assertRefused(start, Edit.moveLabel("zipper", Label.of("zipper"), "toggle", LabelKind.ALTERNATIVE), "preferred label");
    }

    @Test
    void mergeMovesLabelsRewiresReferencesAndKeepsTheOldIdAsReplacedBy() {
        // a narrower concept under nylon, a related link, and a kept decision all pointing at nylon
        Vocabulary v0 = start.apply(Edit.batch("setup", List.of(
                Edit.relate("nylon", "down"),
                Edit.recordDecision(Decision.kept("polyamide", "nylon")))));
        EditHistory h = new EditHistory(v0);
        Vocabulary v = h.apply(Edit.merge("nylon", "polyester"));
        Concept p = c(v, "polyester");
        assertTrue(p.altLabels().containsAll(List.of(Label.of("nylon"), Label.of("polyamide"))), p.toString());
        assertTrue(p.altLabels().contains(Label.of("Nylon", "de")), "labels in every language become alternatives");
        assertEquals(Set.of("polyester"), c(v, "ripstop-nylon").broader(), "narrower concepts are rewired");
        assertTrue(c(v, "down").related().contains("polyester"));
        assertFalse(c(v, "down").related().contains("nylon"));
        assertTrue(p.related().contains("down"));
        assertTrue(p.mappings().contains(new Mapping(MatchKind.EXACT, "https://example.org/materials/nylon")));
        assertEquals("polyester", v.decision("polyamide").orElseThrow().concept());
        assertFalse(v.contains("nylon"));
        assertEquals(new Retired("nylon", "polyester", "nylon"), v.retired("nylon").orElseThrow());
        assertEquals("polyester", v.resolve("nylon").orElseThrow().id());
        assertFalse(VocabularyChecker.check(v).hasErrors());
        assertEquals(v0, h.undo());
        assertEquals(v, h.redo());
    }

    @Test
    void resolveFollowsAChainOfMerges() {
        Vocabulary v = start.apply(Edit.merge("ripstop-nylon", "nylon")).apply(Edit.merge("nylon", "polyester"));
        assertEquals("polyester", v.resolve("rip-stop").orElseThrow().id(), "rip-stop → ripstop-nylon → nylon → polyester");
    }

    @Test
    void refusesToMergeAFacetIntoAValueOrAConceptIntoItself() {
        assertRefused(start, Edit.merge("closure", "zipper"), "facet into a value");
        assertRefused(start, Edit.merge("zipper", "zipper"), "itself");
        assertRefused(start, Edit.merge("rip-stop", "nylon"), "merged into");
    }

    @Test
    void splitMovesChosenLabelsToANewConceptUnderTheSameBroader() {
        roundTrip(Edit.split("zipper", List.of(Label.of("zip")), Label.of("zip")), v -> {
            Concept n = c(v, "zip");
            assertEquals("zip", n.prefLabels().get("en"));
            assertEquals(Set.of("closure"), n.broader());
            assertEquals("zipper", n.splitFrom());
            assertTrue(c(v, "zipper").altLabels().isEmpty());
        });
        roundTrip(Edit.split("ripstop-nylon", List.of(Label.of("ripstop nylong")), Label.of("ripstop polyamide"), "rsp"), v -> {
            assertTrue(c(v, "rsp").hiddenLabels().contains(Label.of("ripstop nylong")), "hidden stays hidden");
            assertEquals(Set.of("nylon"), c(v, "rsp").broader());
        });
        assertRefused(start, Edit.split("zipper", List.of(Label.of("zipper")), Label.of("zip")), "preferred label");
        assertRefused(start, Edit.split("closure", List.of(), Label.of("x")), "facet");
    }

    @Test
    void movesUnderAnotherBroaderAndSupportsPolyhierarchy() {
        roundTrip(Edit.moveUnder("ripstop-nylon", "material"), v -> assertEquals(Set.of("material"), c(v, "ripstop-nylon").broader()));
        roundTrip(Edit.addBroader("ripstop-nylon", "polyester"),
                v -> assertEquals(Set.of("nylon", "polyester"), c(v, "ripstop-nylon").broader()));
        Vocabulary poly = start.apply(Edit.addBroader("ripstop-nylon", "polyester"));
        assertEquals(Set.of("polyester"), poly.apply(Edit.removeBroader("ripstop-nylon", "nylon")).concept("ripstop-nylon")
                .orElseThrow().broader());
    }

    @Test
    void refusesAMoveThatMakesALoopOrPutsAFacetUnderSomething() {
        // Z39.19 / ISO 25964-1: no circular hierarchy [mem]
        assertRefused(start, Edit.moveUnder("nylon", "ripstop-nylon"), "loop");
        assertRefused(start, Edit.moveUnder("material", "closure"), "facet");
        assertRefused(start, Edit.moveUnder("nylon", "nylon"), "its own broader");
    }

    @Test
    void refusesAMoveThatPutsAConceptBelowARelatedOne() {
        // W3C SKOS Reference (2009) S27: related disjoint with broaderTransitive [mem, corroborated]
        assertRefused(start, Edit.moveUnder("drawcord", "zipper"), "related-to-ancestor");
    }

    @Test
    void relatesAndUnrelatesBothWays() {
        roundTrip(Edit.relate("down", "merino-wool"), v -> {
            assertTrue(c(v, "down").related().contains("merino-wool"));
            assertTrue(c(v, "merino-wool").related().contains("down"));
        });
        roundTrip(Edit.unrelate("zipper", "drawcord"), v -> {
            assertTrue(c(v, "zipper").related().isEmpty());
            assertTrue(c(v, "drawcord").related().isEmpty());
        });
        assertRefused(start, Edit.relate("zipper", "drawcord"), "already related");
        assertRefused(start, Edit.relate("two-way-zipper", "zipper"), "related-to-ancestor");
    }

    @Test
    void deleteIsRefusedWhileReferencedUnlessForced() {
        assertRefused(start, Edit.delete("nylon"), "still referenced");
        assertRefused(start, Edit.delete("ripstop-nylon"), "kept candidate term");
        roundTrip(Edit.delete("toggle"), v -> {
            assertFalse(v.contains("toggle"));
            assertTrue(v.isKnownId("toggle"), "a deleted id is never reused");
            assertTrue(v.resolve("toggle").isEmpty());
        });
        roundTrip(Edit.deleteForced("ripstop-nylon"), v -> {
            assertEquals(Decision.Outcome.PARKED, v.decision("rip stop").orElseThrow().outcome());
            assertTrue(v.resolve("rip-stop").isEmpty(), "the merge chain now ends at a deleted id");
        });
        roundTrip(Edit.deleteForced("zipper"), v -> {
            assertTrue(c(v, "two-way-zipper").broader().isEmpty(), "narrower lose the deleted broader");
            assertTrue(c(v, "drawcord").related().isEmpty());
        });
    }

    @Test
    void setsNotesAndFacetProperties() {
        roundTrip(Edit.setScopeNote("zipper", "en", "Any toothed slide fastener."),
                v -> assertEquals("Any toothed slide fastener.", c(v, "zipper").scopeNotes().get("en")));
        roundTrip(Edit.setDefinition("ripstop-nylon", "en", null), v -> assertTrue(c(v, "ripstop-nylon").definitions().isEmpty()));
        FacetProperties multi = FacetProperties.terms().withMultiValued(true);
        roundTrip(Edit.setFacetProperties("closure", multi), v -> assertTrue(c(v, "closure").facet().multiValued()));
        assertRefused(start, Edit.setFacetProperties("zipper", multi), "not a facet");
    }

    @Test
    void addsAndRemovesMappings() {
        Mapping m = new Mapping(MatchKind.CLOSE, "https://example.org/closures/zip");
        roundTrip(Edit.addMapping("zipper", m), v -> assertTrue(c(v, "zipper").mappings().contains(m)));
        // W3C SKOS Reference (2009) S46: exactMatch disjoint with broadMatch [mem, corroborated]
        assertRefused(start, Edit.addMapping("nylon", new Mapping(MatchKind.BROAD, "https://example.org/materials/nylon")),
                "exact-match-conflict");
        roundTrip(Edit.removeMapping("nylon", new Mapping(MatchKind.EXACT, "https://example.org/materials/nylon")),
                v -> assertTrue(c(v, "nylon").mappings().isEmpty()));
    }

    @Test
    void recordsAndClearsCandidateDecisions() {
        roundTrip(Edit.recordDecision(Decision.dropped("Trail-Ready", "marketing phrase")), v -> {
            assertTrue(v.isDropped("trail ready"));
            assertEquals(3, v.decisions().size(), "replaces the parked decision on the same term");
        });
        roundTrip(Edit.clearDecision("free shipping"), v -> assertFalse(v.isDropped("free shipping")));
        assertRefused(start, Edit.recordDecision(Decision.kept("taffeta", "no-such")), "not a concept");
    }

    @Test
    void changesSchemeDetails() {
        roundTrip(Edit.setScheme(start.scheme().withTitle("fr", "Attributs Fernhollow")),
                v -> assertEquals("Attributs Fernhollow", v.scheme().titles().get("fr")));
        // changing the default language would leave concepts without a preferred label in it
        assertRefused(start, Edit.setScheme(new SchemeInfo("fernhollow", start.scheme().titles(), start.scheme().baseIri(), "de")),
                "no-preferred-label");
    }

    @Test
    void aBatchIsOneUndoStepAndIsRefusedWhole() {
        Concept fit = Concept.builder("fit").prefLabel("Fit").facet(FacetProperties.terms()).build();
        Edit b = Edit.batch("Add the fit facet", List.of(Edit.addConcept(fit),
                Edit.addConcept(Concept.builder("slim").prefLabel("slim").broader("fit").build()),
                Edit.addConcept(Concept.builder("relaxed").prefLabel("relaxed").broader("fit").build())));
        roundTrip(b, v -> assertEquals(2, v.valuesOf("fit").size()));
        Edit bad = Edit.batch("bad", List.of(Edit.addConcept(fit), Edit.addConcept(fit)));
        assertRefused(start, bad, "step 2");
    }

    @Test
    void errorsAlreadyInTheFileDoNotBlockUnrelatedEdits() {
        Concept dup = start.concept("two-way-zipper").orElseThrow().toBuilder().altLabel("zip").build();
        List<Concept> all = new ArrayList<>(start.allConcepts());
        all.removeIf(x -> x.id().equals("two-way-zipper"));
        all.add(dup);
        Vocabulary broken = Vocabulary.of(start.scheme(), all, start.retired(), start.decisions());
        assertTrue(VocabularyChecker.check(broken).hasErrors());
        Vocabulary after = broken.apply(Edit.setScopeNote("toggle", "en", "A bar-shaped fastener."));
        assertEquals("A bar-shaped fastener.", after.concept("toggle").orElseThrow().scopeNotes().get("en"));
    }

    @Test
    void historyOffersUnlimitedUndoAndRedoAndTellsListeners() {
        EditHistory h = new EditHistory(start);
        List<String> heard = new ArrayList<>();
        h.addListener((step, before, after) -> heard.add(step.action() + " " + step.description()));
        List<Vocabulary> states = new ArrayList<>();
        states.add(h.current());
        for (int i = 0; i < 200; i++) {
            states.add(h.apply(Edit.addConcept(Concept.builder("v" + i).prefLabel("value " + i).broader("material").build())));
        }
        for (int i = 200; i > 0; i--) {
            assertEquals(states.get(i - 1), h.undo());
        }
        assertFalse(h.canUndo());
        assertThrows(IllegalStateException.class, h::undo);
        for (int i = 1; i <= 200; i++) {
            assertEquals(states.get(i), h.redo());
        }
        assertFalse(h.canRedo());
        assertEquals(600, heard.size());
        assertEquals("DO Add concept \"value 0\"", heard.get(0));
        assertEquals("UNDO Add concept \"value 199\"", heard.get(200));
        h.undo();
        assertTrue(h.canRedo());
        h.apply(Edit.relate("down", "polyester"));
        assertFalse(h.canRedo(), "a new edit clears the redo stack");
        assertEquals("Relate \"down\" (down) and \"polyester\" (polyester)", h.undoDescription().orElseThrow());
    }

    @Test
    void aRefusedEditLeavesHistoryAndListenersUntouched() {
        EditHistory h = new EditHistory(start);
        List<String> heard = new ArrayList<>();
        h.addListener((step, before, after) -> heard.add(step.description()));
        assertThrows(EditRefusedException.class, () -> h.apply(Edit.merge("zipper", "zipper")));
        assertSame(start, h.current());
        assertFalse(h.canUndo());
        assertTrue(heard.isEmpty());
        assertFalse(h.validate(Edit.merge("zipper", "zipper")).isEmpty());
    }

    @Test
    void anEditTheRecorderCannotWriteIsNotApplied() {
        EditHistory h = new EditHistory(start);
        h.setRecorder(step -> {
            throw new java.io.IOException("disk full");
        });
        java.io.UncheckedIOException x = assertThrows(java.io.UncheckedIOException.class, () -> h.apply(Edit.relate("down", "polyester")));
        assertTrue(x.getMessage().contains("was not applied"));
        assertSame(start, h.current());
        assertFalse(h.canUndo());
    }

    @Test
    void replayRebuildsStateAndStacksFromRecordedSteps() {
        EditHistory h = new EditHistory(start);
        List<EditHistory.Step> steps = new ArrayList<>();
        h.setRecorder(steps::add);
        h.apply(Edit.relate("down", "polyester"));
        h.apply(Edit.rename("toggle", Label.of("toggle fastener")));
        h.undo();
        h.apply(Edit.delete("toggle"));
        h.undo();
        h.redo();
        EditHistory r = new EditHistory(start);
        steps.forEach(r::replay);
        assertEquals(h.current(), r.current());
        assertEquals(h.undoDescriptions(), r.undoDescriptions());
        assertEquals(h.undo(), r.undo());
        assertEquals(h.undo(), r.undo());
        assertEquals(start, r.current());
        assertEquals(h.redo(), r.redo());
    }
}
