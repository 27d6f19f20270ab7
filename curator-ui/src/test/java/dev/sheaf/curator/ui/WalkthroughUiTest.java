package dev.sheaf.curator.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.DemoWorkspace;
import dev.sheaf.curator.concepts.ConceptListViewModel;
import dev.sheaf.curator.harvest.CandidateRow;
import dev.sheaf.curator.hierarchy.TreeNode;
import dev.sheaf.curator.suggestions.SuggestionsViewModel;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.Terms;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.VocabularyStore;
import java.nio.file.Path;
import java.util.Set;
import javafx.scene.Node;
import javafx.scene.control.ListView;
import javafx.scene.control.TableView;
import javafx.scene.control.TreeView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * What a new user does first, on the demo, with the keyboard: the start screen, the demo workspace
 * opened, a term kept, its variant merged into it from a suggestion, the new concept moved under a
 * facet, a new facet made, saved, closed, reopened from the start screen's recent list, and
 * everything found as left. A screenshot of each state goes to {@code target/screenshots/w*.png}.
 */
class WalkthroughUiTest extends WindowTestBase {
    static final String KEPT = "ripstop";
    static final String VARIANT = "rip stop";

    @Start
    void start(Stage stage) throws Exception {
        showWindow(stage);
    }

    private void keys(FxRobot robot, KeyCode... combo) {
        robot.push(combo);
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void write(FxRobot robot, String text) {
        robot.write(text);
        WaitForAsyncUtils.waitForFxEvents();
    }

    /** Whether {@code c} has {@code term} (as written in any case or hyphenation the merge chose) as a label; {@code alt}: an alternative one. */
    private static boolean isLabel(Concept c, String term, boolean alt) {
        return c.labels().stream().anyMatch(l -> Terms.normalise(l.text().replace('-', ' ')).equals(Terms.normalise(term))
                && (!alt || l.kind() == LabelKind.ALTERNATIVE));
    }

    private static boolean focused(Node n) {
        return n.isFocused();
    }

    /** Ctrl+F, the term, Down to the table, then Down until the row of {@code term} is selected. */
    private void findCandidate(FxRobot robot, String term) {
        keys(robot, KeyCode.CONTROL, KeyCode.F);
        write(robot, term);
        keys(robot, KeyCode.DOWN);
        TableView<CandidateRow> t = table(robot);
        assertTrue(focused(t), "Down from the filter goes to the table");
        for (int i = 0; i < 20 && !term.equals(t.getSelectionModel().getSelectedItem().term()); i++) {
            keys(robot, KeyCode.DOWN);
        }
        assertEquals(term, t.getSelectionModel().getSelectedItem().term(), "the candidate is among the matches");
    }

    /** Ctrl+G, the label, then Down to the concept in the matches and Enter: the tree shows it. */
    @SuppressWarnings("unchecked")
    private void findConcept(FxRobot robot, String label, String id) {
        keys(robot, KeyCode.CONTROL, KeyCode.G);
        assertTrue(focused(robot.lookup("#concept-filter").query()), "Ctrl+G goes to the concept finder");
        write(robot, label);
        ListView<ConceptListViewModel.Item> matches = robot.lookup("#concept-list").queryAs(ListView.class);
        assertTrue(matches.isVisible(), "typing opens the matches");
        int at = -1;
        for (int i = 0; i < matches.getItems().size(); i++) {
            if (matches.getItems().get(i).id().equals(id)) {
                at = i;
            }
        }
        assertTrue(at >= 0, label + " is among the matches " + matches.getItems());
        keys(robot, KeyCode.DOWN);
        for (int i = 0; i < at; i++) {
            keys(robot, KeyCode.DOWN);
        }
        keys(robot, KeyCode.ENTER);
        TreeView<TreeNode> t = tree(robot);
        assertTrue(focused(t), "Enter goes to the tree");
        assertEquals(id, t.getSelectionModel().getSelectedItem().getValue().id(), "the tree shows " + id);
        // the finder is cleared for the next search by the curator: Esc in it
        robot.interact(() -> ((javafx.scene.control.TextField) robot.lookup("#concept-filter").query()).clear());
        WaitForAsyncUtils.waitForFxEvents();
    }

    @Test
    void aNewUserBuildsAndSavesAVocabularyMostlyByKeyboard(FxRobot robot) throws Exception {
        // 0: no workspace given: the start screen says what to do
        Node startScreen = robot.lookup("#start-screen").query();
        assertTrue(startScreen.isVisible(), "the start screen shows while no workspace is open");
        shot(robot, "w00-start");

        // 1: ./sheaf curate sample-listings (the app opens the folder named on the command line)
        Path ws = DemoWorkspace.mined(tmp.resolve("walk"));
        openAndWait(robot, ws);
        assertFalse(startScreen.isVisible());
        waitUntil(() -> !robot.lookup("#suggestions-scope").queryLabeled().getText().startsWith("Looking"));
        robot.interact(() -> view.harvestView().focusTable());
        shot(robot, "w01-opened");

        // 2: keep a term as a new concept: Ctrl+F, type, Down, K
        findCandidate(robot, KEPT);
        shot(robot, "w02-found-candidate");
        keys(robot, KeyCode.K);
        Vocabulary v = vm.session().vocabulary();
        String id = v.decision(KEPT).map(Decision::concept).orElseThrow(() -> new AssertionError("K did not keep " + KEPT));
        assertTrue(v.contains(id));

        // 3: its variant: find it, Ctrl+M to the merge suggestions for it, Down to the pair, Enter merges
        findCandidate(robot, VARIANT);
        keys(robot, KeyCode.CONTROL, KeyCode.M);
        @SuppressWarnings("unchecked")
        ListView<SuggestionsViewModel.Row> merges = robot.lookup("#suggestions-list").queryAs(ListView.class);
        assertTrue(focused(merges), "Ctrl+M goes to the merge suggestions");
        assertTrue(robot.lookup("#suggestions-scope").queryLabeled().getText().endsWith("for the term \"" + VARIANT + "\""),
                robot.lookup("#suggestions-scope").queryLabeled().getText());
        for (int i = 0; i < 10 && !merges.getSelectionModel().getSelectedItem().suggestion().conceptIds().contains(id); i++) {
            keys(robot, KeyCode.DOWN);
        }
        SuggestionsViewModel.Row pair = merges.getSelectionModel().getSelectedItem();
        assertTrue(pair.suggestion().conceptIds().contains(id), "the engine proposes " + VARIANT + " as a variant of " + KEPT
                + "; rows: " + merges.getItems().stream().map(SuggestionsViewModel.Row::members).toList());
        shot(robot, "w03-merge-suggestion");
        keys(robot, KeyCode.ENTER);
        v = vm.session().vocabulary();
        assertEquals(id, v.decision(VARIANT).map(Decision::concept).orElse(null), "the variant is kept for the concept");
        assertTrue(isLabel(v.concept(id).orElseThrow(), VARIANT, false), "as one of its labels: " + v.concept(id).orElseThrow().labels());
        shot(robot, "w04-merged");

        // 4: move the new concept under the Material facet: Ctrl+G to it, Ctrl+X, Ctrl+G to Material, Ctrl+V
        findConcept(robot, KEPT, id);
        keys(robot, KeyCode.CONTROL, KeyCode.X);
        findConcept(robot, "Material", "material");
        shot(robot, "w05-cut-and-found-the-facet");
        keys(robot, KeyCode.CONTROL, KeyCode.V);
        assertEquals(Set.of("material"), vm.session().vocabulary().concept(id).orElseThrow().broader(), "moved under Material");
        TreeView<TreeNode> t = tree(robot);
        assertEquals(id, t.getSelectionModel().getSelectedItem().getValue().id(), "the moved concept stays selected");
        shot(robot, "w06-moved-under-a-facet");

        // 5: a new facet: Ctrl+Shift+N in the tree, its name, Enter
        keys(robot, KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.N);
        write(robot, "Pocket style");
        shot(robot, "w07-new-facet-name");
        keys(robot, KeyCode.ENTER);
        assertTrue(vm.session().vocabulary().concept("pocket-style").map(Concept::isFacet).orElse(false), "the facet was made");
        robot.interact(() -> view.showSidePanel("Facet"));
        shot(robot, "w08-new-facet");

        // 6: the parent suggestions for the selection are there too (Ctrl+P)
        findConcept(robot, KEPT, id);
        keys(robot, KeyCode.CONTROL, KeyCode.P);
        assertTrue(focused(robot.lookup("#parents-list").query()), "Ctrl+P goes to the parent suggestions");
        shot(robot, "w09-parent-suggestions");

        // 7: save, close, reopen from the start screen's recent list with Enter
        keys(robot, KeyCode.CONTROL, KeyCode.S);
        assertFalse(vm.hasUnsavedEdits(), "Ctrl+S saved");
        Path file = vm.session().vocabularyFile();
        Vocabulary onDisk = VocabularyStore.read(file);
        assertEquals(Set.of("material"), onDisk.concept(id).orElseThrow().broader());
        robot.interact(() -> vm.closeSession());
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(startScreen.isVisible(), "closing shows the start screen again");
        @SuppressWarnings("unchecked")
        ListView<Path> recent = robot.lookup("#start-recent").queryAs(ListView.class);
        assertEquals(ws.toAbsolutePath().normalize(), recent.getItems().get(0).toAbsolutePath().normalize(), "the workspace is the first recent one");
        shot(robot, "w10-closed-start-with-recent");
        waitUntil(() -> recent.isFocused());
        keys(robot, KeyCode.ENTER);
        waitUntil(() -> vm.session() != null && !vm.background().runningProperty().get());

        Vocabulary again = vm.session().vocabulary();
        Concept kept = again.concept(id).orElseThrow(() -> new AssertionError("the kept concept is back"));
        assertEquals(KEPT, kept.displayLabel(again.defaultLanguage()));
        assertTrue(isLabel(kept, VARIANT, true), "the merged variant is its alternative label: " + kept.labels());
        assertEquals(Set.of("material"), kept.broader(), "under Material, as left");
        assertEquals(id, again.decision(VARIANT).map(Decision::concept).orElse(null));
        assertTrue(again.concept("pocket-style").map(Concept::isFacet).orElse(false), "the new facet is there");
        assertFalse(vm.hasUnsavedEdits());
        robot.interact(() -> vm.session().selection().selectConcept(id));
        WaitForAsyncUtils.waitForFxEvents();
        shot(robot, "w11-reopened");
        robot.interact(() -> vm.closeSession());
    }
}
