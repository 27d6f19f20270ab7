package dev.sheaf.curator.ui;

import dev.sheaf.curator.app.Screenshots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.DemoWorkspace;
import dev.sheaf.curator.harvest.CandidateRow;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.store.VocabularyStore;
import java.nio.file.Path;
import java.util.List;
import javafx.scene.control.Button;
import javafx.scene.control.DialogPane;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import javafx.stage.Window;
import org.junit.jupiter.api.Test;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The question before closing with unsaved edits (Ctrl+W): Esc keeps the workspace open, "Close
 * without saving" closes and leaves the edits in the journal (they come back on reopening), Enter
 * saves and closes. Screenshot: {@code target/screenshots/d01-unsaved-edits.png}.
 */
class CloseDialogUiTest extends WindowTestBase {
    @Start
    void start(Stage stage) throws Exception {
        showWindow(stage);
    }

    private Window dialog(FxRobot robot) throws Exception {
        waitUntil(() -> robot.listTargetWindows().stream().anyMatch(w -> w != stage && w.isShowing()));
        return robot.listTargetWindows().stream().filter(w -> w != stage && w.isShowing()).findFirst().orElseThrow();
    }

    private static DialogPane pane(Window w) {
        return (DialogPane) w.getScene().getRoot();
    }

    /** Parks the first candidate in the table; returns its term. */
    private String parkOne(FxRobot robot) {
        robot.interact(() -> view.harvestView().focusTable());
        CandidateRow r = table(robot).getSelectionModel().getSelectedItem();
        robot.type(KeyCode.P);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(vm.hasUnsavedEdits());
        return r.term();
    }

    private boolean parkedOnDisk(Path file, String term) throws Exception {
        return VocabularyStore.read(file).decision(term).map(d -> d.outcome() == Decision.Outcome.PARKED).orElse(false);
    }

    @Test
    void escKeepsItOpenCloseWithoutSavingKeepsTheJournalEnterSaves(FxRobot robot) throws Exception {
        Path ws = DemoWorkspace.mined(tmp.resolve("close"));
        openAndWait(robot, ws);
        Path file = vm.session().vocabularyFile();
        String first = parkOne(robot);

        // Ctrl+W asks; Esc answers Cancel: nothing closes
        robot.push(KeyCode.CONTROL, KeyCode.W);
        Window d = dialog(robot);
        assertEquals("Save the vocabulary before closing?", pane(d).getHeaderText());
        assertTrue(pane(d).getContentText().contains("edit journal"), "it says where unsaved edits go");
        robot.interact(() -> {
            try {
                Screenshots.save(d.getScene(), "d01-unsaved-edits");
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
        robot.push(KeyCode.ESCAPE);
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(d.isShowing());
        assertNotNull(vm.session(), "Esc: the workspace stays open");
        assertTrue(vm.hasUnsavedEdits());

        // "Close without saving": closed, file untouched, the edit comes back from the journal
        robot.push(KeyCode.CONTROL, KeyCode.W);
        Window d2 = dialog(robot);
        Button later = (Button) pane(d2).lookupButton(pane(d2).getButtonTypes().stream()
                .filter(b -> b.getText().equals("Close without saving")).findFirst().orElseThrow());
        robot.clickOn(later);
        WaitForAsyncUtils.waitForFxEvents();
        assertNull(vm.session(), "closed");
        assertFalse(parkedOnDisk(file, first), "not saved");
        openAndWait(robot, ws);
        assertTrue(vm.session().vocabulary().decision(first).isPresent(), "the journal brought the edit back");
        assertTrue(vm.hasUnsavedEdits(), "still to be saved");
        // the recovery is said in a message; close it
        for (Window w : List.copyOf(robot.listTargetWindows())) {
            if (w != stage && w.isShowing()) {
                robot.interact(w::hide);
            }
        }

        // Enter answers Save: saved, then closed
        robot.push(KeyCode.CONTROL, KeyCode.W);
        Window d3 = dialog(robot);
        assertTrue(d3.isShowing());
        robot.push(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertNull(vm.session(), "saved and closed");
        assertTrue(parkedOnDisk(file, first), "Enter saved the edit");
        openAndWait(robot, ws);
        assertFalse(vm.hasUnsavedEdits(), "reopened: nothing left in the journal to recover");
        assertTrue(vm.session().vocabulary().decision(first).isPresent());
        robot.interact(() -> vm.closeSession());
    }
}
