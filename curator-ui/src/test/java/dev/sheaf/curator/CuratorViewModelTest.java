package dev.sheaf.curator;

import dev.sheaf.curator.session.Caution;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.details.DetailsViewModel;
import dev.sheaf.curator.harvest.CandidateRow;
import dev.sheaf.curator.harvest.DecisionState;
import dev.sheaf.curator.harvest.HarvestViewModel;
import dev.sheaf.curator.harvest.StateFilter;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.curator.session.Notice;
import dev.sheaf.curator.session.RecentWorkspaces;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.VocabularyStore;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Every intent of the view-models, without a display: jobs run at once on the test thread. */
class CuratorViewModelTest {

    private static Harness opened(Path tmp) throws Exception {
        Path ws = DemoWorkspace.mined(tmp.resolve("ws"));
        Harness h = new Harness(tmp.resolve("config"));
        h.vm.open(ws);
        assertNotNull(h.vm.session(), () -> "the demo did not open: " + h.notices);
        return h;
    }

    @Test
    void opensTheDemoWithItsHarvestVocabularyAndEvidence(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        CuratorSession s = h.vm.session();
        assertTrue(s.harvest().candidates().size() > 100, "the demo harvest has candidates");
        assertEquals(h.vm.harvest().rows().size(), s.harvest().candidates().size());
        assertTrue(s.vocabulary().size() > 100, "the demo vocabulary is loaded");
        assertTrue(s.hasEvidenceIndex());
        assertTrue(h.vm.harvest().rows().stream().anyMatch(r -> r.state() == DecisionState.IN_VOCABULARY),
                "terms the demo vocabulary already has show as in the vocabulary");
        assertEquals(List.of(tmp.resolve("ws").toAbsolutePath().normalize()), h.vm.recentWorkspaces());
        assertEquals(h.vm.recentWorkspaces(), new RecentWorkspaces(tmp.resolve("config").resolve(RecentWorkspaces.FILE_NAME)).list(),
                "remembered on disk");
        h.vm.closeSession();
    }

    @Test
    void minesInTheBackgroundWhenThereIsNoHarvestAndStartsAVocabularyWhenThereIsNone(@TempDir Path tmp) throws Exception {
        Path ws = DemoWorkspace.fresh(tmp.resolve("ws"));
        Files.delete(ws.resolve("fernhollow.vocab.json"));
        Harness h = new Harness(tmp.resolve("config"));
        h.vm.open(ws);
        CuratorSession s = h.vm.session();
        assertTrue(s.createdVocabulary());
        assertEquals(0, s.vocabulary().size());
        assertNotNull(s.harvest(), "mined on open");
        assertTrue(Files.isRegularFile(ws.resolve("out/harvest.json")));
        assertTrue(s.hasEvidenceIndex());
        assertTrue(h.vm.harvest().rows().stream().allMatch(r -> r.state() == DecisionState.UNDECIDED));
        h.vm.closeSession();
    }

    @Test
    void keepMakesAConceptAndRecordsTheDecisionAsOneUndoableStep(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        CuratorSession s = h.vm.session();
        CandidateRow r = h.undecided(0);
        int before = s.vocabulary().size();
        assertTrue(h.vm.harvest().keep(List.of(r)));
        Vocabulary v = s.vocabulary();
        assertEquals(before + 1, v.size());
        Decision d = v.decision(r.term()).orElseThrow();
        assertEquals(Decision.Outcome.KEPT, d.outcome());
        Concept c = v.concept(d.concept()).orElseThrow();
        assertEquals(r.term(), c.displayLabel("en"));
        assertEquals(r.term(), c.provenance().harvestTerm());
        assertEquals(DecisionState.KEPT, r.state());
        assertTrue(s.isDirty());
        h.vm.undo();
        assertEquals(before, s.vocabulary().size(), "concept and decision undone together");
        assertTrue(s.vocabulary().decision(r.term()).isEmpty());
        assertEquals(DecisionState.UNDECIDED, r.state());
        h.vm.redo();
        assertEquals(DecisionState.KEPT, r.state());
        h.vm.closeSession();
    }

    @Test
    void keepingATermThatIsAlreadyALabelRecordsThatConcept(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        CandidateRow r = h.vm.harvest().rows().stream().filter(x -> x.state() == DecisionState.IN_VOCABULARY).findFirst().orElseThrow();
        int before = h.vm.session().vocabulary().size();
        String cid = r.conceptId();
        assertTrue(h.vm.harvest().keep(List.of(r)));
        assertEquals(before, h.vm.session().vocabulary().size(), "no duplicate concept");
        assertEquals(cid, h.vm.session().vocabulary().decision(r.term()).orElseThrow().concept());
        h.vm.closeSession();
    }

    @Test
    void keepAsLabelAddsTheTermToTheSelectedConcept(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        CuratorSession s = h.vm.session();
        CandidateRow r = h.undecided(0);
        assertFalse(h.vm.harvest().keepAsLabel(List.of(r)), "refused without a selected concept");
        assertEquals(Notice.Kind.WARNING, h.notices.get(h.notices.size() - 1).kind());
        String target = s.vocabulary().concepts().get(0).id();
        s.selection().selectConcept(target);
        assertTrue(h.vm.harvest().keepAsLabel(List.of(r)));
        Concept c = s.vocabulary().concept(target).orElseThrow();
        assertTrue(c.altLabels().contains(Label.of(r.term(), "en")), "an alternative label of " + target);
        assertEquals(target, s.vocabulary().decision(r.term()).orElseThrow().concept());
        h.vm.closeSession();
    }

    @Test
    void dropAndParkOnManyRowsAreOneStepEachAndForgetClearsThem(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        CuratorSession s = h.vm.session();
        HarvestViewModel hv = h.vm.harvest();
        List<CandidateRow> three = List.of(h.undecided(0), h.undecided(1), h.undecided(2));
        assertTrue(hv.drop(three));
        for (CandidateRow r : three) {
            assertEquals(DecisionState.DROPPED, r.state());
            assertTrue(s.vocabulary().isDropped(r.term()));
            assertEquals(HarvestViewModel.DROP_REASON, s.vocabulary().decision(r.term()).orElseThrow().reason());
        }
        assertEquals("Drop 3 terms", s.undoTextProperty().get());
        assertTrue(hv.park(List.of(three.get(0))));
        assertEquals(DecisionState.PARKED, three.get(0).state());
        assertTrue(hv.forget(three));
        assertTrue(three.stream().allMatch(r -> r.state() == DecisionState.UNDECIDED));
        h.vm.undo();
        assertEquals(DecisionState.PARKED, three.get(0).state());
        assertEquals(DecisionState.DROPPED, three.get(1).state());
        h.vm.undo();
        h.vm.undo();
        assertTrue(three.stream().allMatch(r -> r.state() == DecisionState.UNDECIDED));
        h.vm.closeSession();
    }

    @Test
    void filtersByTextLengthCategoryScoreCountAndDecision(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        HarvestViewModel hv = h.vm.harvest();
        hv.stateProperty().set(StateFilter.ALL);
        int all = hv.shown().size();
        assertEquals(hv.rows().size(), all);
        hv.textProperty().set("WOOL");
        assertFalse(hv.shown().isEmpty());
        assertTrue(hv.shown().stream().allMatch(r -> r.term().toLowerCase(java.util.Locale.ROOT).contains("wool")), "case-insensitive");
        hv.textProperty().set("");
        hv.wordsProperty().set(2);
        assertTrue(hv.shown().stream().allMatch(r -> r.words() == 2) && !hv.shown().isEmpty());
        hv.wordsProperty().set(0);
        String cat = hv.categories().get(1);
        hv.categoryProperty().set(cat);
        assertTrue(!hv.shown().isEmpty() && hv.shown().stream().allMatch(r -> r.candidate().topCategories().stream()
                .anyMatch(c -> c.category().equals(cat))));
        hv.categoryProperty().set("");
        hv.minFrequencyProperty().set("50");
        assertTrue(!hv.shown().isEmpty() && hv.shown().size() < all && hv.shown().stream().allMatch(r -> r.frequency() >= 50));
        hv.minFrequencyProperty().set("");
        hv.minScoreProperty().set("0.5");
        assertTrue(hv.shown().stream().allMatch(r -> r.score() >= 0.5) && hv.shown().size() < all);
        hv.minScoreProperty().set("not a number");
        assertEquals(all, hv.shown().size(), "an unreadable number is no filter");
        hv.stateProperty().set(StateFilter.TO_DECIDE);
        CandidateRow r = hv.shown().get(0);
        hv.drop(List.of(r));
        assertFalse(hv.shown().contains(r), "a decided term leaves the to-decide list");
        hv.stateProperty().set(StateFilter.DROPPED);
        assertEquals(List.of(r), List.copyOf(hv.shown()));
        assertTrue(hv.summaryProperty().get().contains("dropped 1 "), hv.summaryProperty().get());
        h.vm.closeSession();
    }

    @Test
    void decisionsSurviveSaveAndReopenAndDroppedTermsStayDroppedAfterMiningAgain(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        CandidateRow keep = h.undecided(0);
        CandidateRow drop = h.undecided(1);
        h.vm.harvest().keep(List.of(keep));
        h.vm.harvest().drop(List.of(drop));
        assertTrue(h.vm.save());
        assertFalse(h.vm.session().isDirty());
        Path file = h.vm.session().vocabularyFile();
        h.vm.closeSession();
        Vocabulary onDisk = VocabularyStore.read(file);
        assertTrue(onDisk.isDropped(drop.term()));
        h.vm.open(tmp.resolve("ws"));
        assertEquals(DecisionState.KEPT, h.row(keep.term()).state());
        assertEquals(DecisionState.DROPPED, h.row(drop.term()).state());
        h.vm.mine();
        assertEquals(DecisionState.DROPPED, h.row(drop.term()).state(), "a re-mine does not bring a dropped term back");
        h.vm.closeSession();
    }

    @Test
    void unsavedEditsComeBackFromTheJournal(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        CandidateRow r = h.undecided(0);
        h.vm.harvest().park(List.of(r));
        assertTrue(h.vm.hasUnsavedEdits());
        h.vm.closeSession();
        h.vm.open(tmp.resolve("ws"));
        assertEquals(DecisionState.PARKED, h.row(r.term()).state());
        assertTrue(h.notices.stream().anyMatch(n -> n.title().equals("Unsaved edits recovered")), h.notices::toString);
        h.vm.closeSession();
    }

    @Test
    void saveRefusesWhenTheFileChangedOnDisk(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        h.vm.harvest().park(List.of(h.undecided(0)));
        Path file = h.vm.session().vocabularyFile();
        String text = Files.readString(file, StandardCharsets.UTF_8);
        Files.writeString(file, text.replace("\"formatVersion\"", " \"formatVersion\""), StandardCharsets.UTF_8);
        assertFalse(h.vm.save());
        Notice n = h.notices.get(h.notices.size() - 1);
        assertEquals("The file changed on disk", n.title());
        assertTrue(n.text().contains("not overwritten"), n.text());
        assertTrue(h.vm.hasUnsavedEdits());
        Path other = tmp.resolve("ws/copy.vocab.json");
        assertTrue(h.vm.saveAs(other));
        assertTrue(VocabularyStore.read(other).decisions().size() == 1);
        h.vm.closeSession();
    }

    @Test
    void saveAsWritesTheNewFileAndEditingContinuesThere(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        Path original = h.vm.session().vocabularyFile();
        String before = Files.readString(original, StandardCharsets.UTF_8);
        CandidateRow first = h.undecided(0);
        h.vm.harvest().park(List.of(first));
        assertTrue(h.vm.titleProperty().get().startsWith("• "), "unsaved edits show in the title");
        Path copy = tmp.resolve("ws/copy.vocab.json");
        assertTrue(h.vm.saveAs(copy));
        assertEquals(copy.toAbsolutePath().normalize(), h.vm.session().vocabularyFile().toAbsolutePath().normalize());
        assertFalse(h.vm.hasUnsavedEdits());
        assertTrue(h.vm.titleProperty().get().contains("copy.vocab.json") && !h.vm.titleProperty().get().startsWith("• "),
                h.vm.titleProperty().get());
        assertTrue(h.vm.statusProperty().get().startsWith("Saved as "), h.vm.statusProperty().get());
        assertTrue(VocabularyStore.read(copy).decision(first.term()).isPresent(), "the copy has the edit");
        assertEquals(before, Files.readString(original, StandardCharsets.UTF_8), "the original file is untouched");

        // the next edit and Save go to the copy, not the original
        CandidateRow second = h.undecided(0);
        h.vm.harvest().drop(List.of(second));
        assertTrue(h.vm.save());
        assertTrue(VocabularyStore.read(copy).isDropped(second.term()));
        assertEquals(before, Files.readString(original, StandardCharsets.UTF_8));
        h.vm.closeSession();
    }

    @Test
    void saveAsWhereNoFileCanBeWrittenSaysSoAndKeepsTheEdits(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        h.vm.harvest().park(List.of(h.undecided(0)));
        Path nowhere = tmp.resolve("ws/workspace.json/x.vocab.json"); // under a file: no folder can be made there
        assertFalse(h.vm.saveAs(nowhere));
        Notice n = h.notices.get(h.notices.size() - 1);
        assertEquals(Notice.Kind.ERROR, n.kind());
        assertTrue(h.vm.hasUnsavedEdits(), "still unsaved: " + n.text());
        assertFalse(Files.exists(nowhere));
        h.vm.closeSession();
    }

    @Test
    void refusesToOpenAVocabularyAnotherProgramHolds(@TempDir Path tmp) throws Exception {
        Path ws = DemoWorkspace.mined(tmp.resolve("ws"));
        try (VocabularyStore other = VocabularyStore.open(ws.resolve("fernhollow.vocab.json"))) {
            Harness h = new Harness(tmp.resolve("config"));
            h.vm.open(ws);
            assertNull(h.vm.session());
            Notice n = h.notices.get(0);
            assertEquals(Notice.Kind.ERROR, n.kind());
            assertEquals("The vocabulary is open elsewhere", n.title());
        }
    }

    @Test
    void evidenceForATermAndForAConceptAndTheListingBehindALine(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        CuratorSession s = h.vm.session();
        CandidateRow r = h.vm.harvest().rows().get(0);
        h.vm.harvest().select(r);
        List<EvidenceLine> lines = h.vm.evidence().lines();
        assertFalse(lines.isEmpty(), "evidence for " + r.term());
        EvidenceLine e = lines.get(0);
        assertTrue(e.match().equalsIgnoreCase(r.term()) || e.match().toLowerCase(java.util.Locale.ROOT).contains(r.term().split(" ")[0]),
                e.toString());
        assertFalse(e.source().isEmpty());
        assertTrue(h.vm.evidence().headingProperty().get().contains(r.term()));
        h.vm.evidence().openListing(e);
        var listing = h.vm.evidence().shownListingProperty().get();
        assertNotNull(listing);
        assertEquals(e.listingId(), listing.id());
        assertTrue(listing.fields().stream().anyMatch(f -> f.text().contains(e.match())), "the line comes from one of its fields");
        String concept = h.row(r.term()).conceptId() != null ? h.row(r.term()).conceptId() : s.vocabulary().concepts().get(0).id();
        s.selection().selectConcept(concept);
        assertTrue(h.vm.evidence().headingProperty().get().contains(s.vocabulary().displayLabel(concept)));
        h.vm.closeSession();
    }

    @Test
    void detailsShowTheCautionForRegulatedClaimFacets(@TempDir Path tmp) throws Exception {
        Harness h = opened(tmp);
        CuratorSession s = h.vm.session();
        Concept regulated = s.vocabulary().concepts().stream().filter(c -> DetailsViewModel.regulated(s.vocabulary(), c.id()))
                .findFirst().orElseThrow();
        s.selection().selectConcept(regulated.id());
        assertEquals(Caution.REGULATED_CLAIM, h.vm.details().cautionProperty().get());
        Concept plain = s.vocabulary().concepts().stream().filter(c -> !DetailsViewModel.regulated(s.vocabulary(), c.id()))
                .findFirst().orElseThrow();
        s.selection().selectConcept(plain.id());
        assertEquals("", h.vm.details().cautionProperty().get());
        assertEquals(plain.displayLabel("en"), h.vm.details().headingProperty().get());
        h.vm.harvest().select(h.vm.harvest().rows().get(0));
        assertEquals("Candidate term", h.vm.details().kindProperty().get());
        assertTrue(h.vm.details().facts().stream().anyMatch(f -> f.name().equals("Occurrences")));
        h.vm.closeSession();
    }
}
