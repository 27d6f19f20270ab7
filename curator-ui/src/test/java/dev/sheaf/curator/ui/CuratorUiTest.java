package dev.sheaf.curator.ui;

import dev.sheaf.curator.app.Screenshots;

import dev.sheaf.curator.session.Caution;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.DemoWorkspace;
import dev.sheaf.curator.app.CuratorApp;
import dev.sheaf.curator.app.MainView;
import dev.sheaf.curator.app.MainViewModel;
import dev.sheaf.curator.details.DetailsViewModel;
import dev.sheaf.curator.harvest.CandidateRow;
import dev.sheaf.curator.harvest.DecisionState;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.curator.session.RecentWorkspaces;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.VocabularyStore;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import javafx.scene.control.ListView;
import javafx.scene.control.TableView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The main flows on the real window, headless (Monocle): open the demo, keep and drop with keys,
 * undo and redo, save, reopen and find everything as left. Screenshots of each state go to
 * {@code target/screenshots/}.
 */
class CuratorUiTest extends WindowTestBase {
    @Start
    void start(Stage stage) throws Exception {
        showWindow(stage);
    }

    @Test
    void keepDropUndoRedoSaveAndReopen(FxRobot robot) throws Exception {
        Path ws = DemoWorkspace.mined(tmp.resolve("flow"));
        openAndWait(robot, ws);
        CuratorSession s = vm.session();
        TableView<CandidateRow> table = table(robot);
        assertTrue(table.getItems().size() > 50, "the table shows the candidates to decide");
        robot.interact(() -> {
            table.requestFocus();
            table.getSelectionModel().select(0);
            table.getFocusModel().focus(0);
        });
        shot(robot, "01-opened");

        CandidateRow first = table.getItems().get(0);
        robot.type(KeyCode.K);
        WaitForAsyncUtils.waitForFxEvents();
        Decision kept = s.vocabulary().decision(first.term()).orElseThrow(() -> new AssertionError("K did not keep " + first.term()));
        assertEquals(Decision.Outcome.KEPT, kept.outcome());
        assertTrue(s.vocabulary().contains(kept.concept()));
        CandidateRow second = table.getSelectionModel().getSelectedItem();
        assertNotNull(second, "the selection moved on to the next candidate");
        robot.type(KeyCode.D);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(s.vocabulary().isDropped(second.term()), "D dropped " + second.term());
        assertFalse(table.getItems().contains(second), "a dropped term leaves the to-decide list");

        robot.push(KeyCode.CONTROL, KeyCode.Z);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(s.vocabulary().decision(second.term()).isEmpty(), "Ctrl+Z undid the drop");
        assertEquals(DecisionState.UNDECIDED, second.state());
        robot.push(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.Z);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(s.vocabulary().isDropped(second.term()), "Ctrl+Shift+Z redid it");

        // several rows at once: select three and park them with one key
        robot.interact(() -> {
            table.requestFocus();
            table.getSelectionModel().clearSelection();
            table.getSelectionModel().selectRange(0, 3);
        });
        var three = java.util.List.copyOf(table.getSelectionModel().getSelectedItems());
        robot.type(KeyCode.P);
        WaitForAsyncUtils.waitForFxEvents();
        for (CandidateRow r : three) {
            assertEquals(DecisionState.PARKED, r.state(), r.term());
        }
        shot(robot, "02-after-keep-drop-park");

        robot.push(KeyCode.CONTROL, KeyCode.S);
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(vm.hasUnsavedEdits(), "Ctrl+S saved");
        Vocabulary onDisk = VocabularyStore.read(s.vocabularyFile());
        assertEquals(Decision.Outcome.KEPT, onDisk.decision(first.term()).orElseThrow().outcome());
        assertTrue(onDisk.isDropped(second.term()));

        robot.interact(() -> vm.closeSession());
        openAndWait(robot, ws);
        CuratorSession again = vm.session();
        assertEquals(kept.concept(), again.vocabulary().decision(first.term()).orElseThrow().concept(), "found as left after reopening");
        assertTrue(again.vocabulary().isDropped(second.term()));
        assertTrue(three.stream().allMatch(r -> again.vocabulary().decision(r.term()).map(d -> d.outcome() == Decision.Outcome.PARKED)
                .orElse(false)));
        assertFalse(vm.hasUnsavedEdits());
        robot.interact(() -> vm.harvest().stateProperty().set(dev.sheaf.curator.harvest.StateFilter.ALL));
        shot(robot, "03-reopened-all-candidates");
        robot.interact(() -> vm.closeSession());
    }

    @Test
    void filterEvidenceListingAndCaution(FxRobot robot) throws Exception {
        Path ws = DemoWorkspace.mined(tmp.resolve("evidence"));
        openAndWait(robot, ws);
        CuratorSession s = vm.session();
        robot.clickOn("#harvest-filter").write("wool");
        WaitForAsyncUtils.waitForFxEvents();
        TableView<CandidateRow> table = table(robot);
        assertFalse(table.getItems().isEmpty());
        assertTrue(table.getItems().stream().allMatch(r -> r.term().contains("wool")));
        robot.type(KeyCode.DOWN);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(table.isFocused(), "Down from the filter goes to the table");
        robot.interact(() -> table.getSelectionModel().select(0));
        waitUntil(() -> !vm.evidence().searchingProperty().get() && !vm.evidence().lines().isEmpty());
        shot(robot, "04-filtered-with-evidence");

        @SuppressWarnings("unchecked")
        ListView<Object> lines = robot.lookup("#evidence-list").queryAs(ListView.class);
        robot.interact(() -> {
            lines.requestFocus();
            lines.getSelectionModel().select(0);
        });
        robot.type(KeyCode.ENTER);
        waitUntil(() -> vm.evidence().shownListingProperty().get() != null);
        Window dialog = robot.listTargetWindows().stream().filter(w -> w != stage && w.isShowing()).findFirst().orElseThrow();
        robot.interact(() -> {
            try {
                Screenshots.save(dialog.getScene(), "05-listing");
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
        robot.interact(dialog::hide);

        Concept regulated = s.vocabulary().concepts().stream().filter(c -> DetailsViewModel.regulated(s.vocabulary(), c.id()))
                .findFirst().orElseThrow();
        robot.clickOn("#concept-filter").write(regulated.displayLabel("en"));
        @SuppressWarnings("unchecked")
        ListView<Object> concepts = robot.lookup("#concept-list").queryAs(ListView.class);
        robot.interact(() -> concepts.getSelectionModel().select(0));
        waitUntil(() -> !vm.evidence().searchingProperty().get());
        assertTrue(robot.lookup("#details-caution").queryLabeled().isVisible(), "the regulated-claim caution shows");
        assertEquals(Caution.REGULATED_CLAIM, robot.lookup("#details-caution").queryLabeled().getText());
        shot(robot, "06-regulated-concept");
        robot.interact(() -> vm.closeSession());
    }

    @Test
    void minesAFreshWorkspaceInTheBackgroundWithProgressAndCancel(FxRobot robot) throws Exception {
        Path ws = DemoWorkspace.fresh(tmp.resolve("fresh"));
        robot.interact(() -> vm.open(ws));
        waitUntil(() -> vm.session() != null && "Mining the harvest".equals(vm.background().titleProperty().get())
                && !vm.background().detailProperty().get().isEmpty());
        assertTrue(robot.lookup(".working").query().isVisible(), "the status bar shows the work with its progress");
        shot(robot, "00-mining-in-the-background");
        robot.clickOn("Cancel");
        waitUntil(() -> !vm.background().runningProperty().get());
        assertTrue(vm.statusProperty().get().contains("cancelled"), vm.statusProperty().get());
        assertFalse(Files.exists(ws.resolve("out/harvest.json")), "a cancelled mine writes no harvest");
        assertTrue(vm.session().harvest() == null);
        robot.interact(() -> vm.closeSession());
    }
}
