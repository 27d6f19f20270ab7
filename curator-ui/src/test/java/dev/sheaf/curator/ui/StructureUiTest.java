package dev.sheaf.curator.ui;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.curator.DemoWorkspace;
import dev.sheaf.curator.app.CuratorApp;
import dev.sheaf.curator.app.MainView;
import dev.sheaf.curator.app.MainViewModel;
import dev.sheaf.curator.checks.ChecksViewModel;
import dev.sheaf.curator.session.Caution;
import dev.sheaf.curator.hierarchy.TreeNode;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.curator.session.RecentWorkspaces;
import dev.sheaf.curator.suggestions.SuggestionsViewModel;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.VocabularyStore;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.TimeUnit;
import javafx.scene.Node;
import javafx.scene.control.ListView;
import javafx.scene.control.TableView;
import javafx.scene.control.TreeCell;
import javafx.scene.control.TreeItem;
import javafx.scene.control.TreeView;
import javafx.scene.input.KeyCode;
import javafx.stage.Stage;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.junit.jupiter.api.io.TempDir;
import org.testfx.api.FxRobot;
import org.testfx.framework.junit5.ApplicationExtension;
import org.testfx.framework.junit5.Start;
import org.testfx.util.WaitForAsyncUtils;

/**
 * The structure flows on the real window, headless (Monocle): drag a concept under a facet, move
 * one with the keyboard, make a new facet, undo and redo, merge two concepts from a suggestion,
 * the regulated-claim caution, the checks jumping to a concept, and the tree with 5,000 concepts.
 * Screenshots go to {@code target/screenshots/} (names starting with "s").
 */
class StructureUiTest extends WindowTestBase {
    @Start
    void start(Stage stage) throws Exception {
        showWindow(stage);
    }

    /** The visible cell showing {@code id} (under {@code parent} when not null). */
    @SuppressWarnings("unchecked")
    private Node cell(FxRobot robot, String id, String parent) {
        for (Node n : robot.lookup(".tree-cell").queryAll()) {
            TreeNode t = ((TreeCell<TreeNode>) n).getItem();
            if (t != null && t.id().equals(id) && (parent == null || parent.equals(t.parent())) && n.isVisible()) {
                return n;
            }
        }
        throw new AssertionError("no visible row for " + id + " under " + parent);
    }

    private void select(FxRobot robot, String id) {
        robot.interact(() -> vm.session().selection().selectConcept(id));
        WaitForAsyncUtils.waitForFxEvents();
    }

    private void expand(FxRobot robot, String id) {
        TreeView<TreeNode> t = tree(robot);
        robot.interact(() -> {
            for (TreeItem<TreeNode> i : t.getRoot().getChildren()) {
                if (i.getValue().id().equals(id)) {
                    i.setExpanded(true);
                    t.scrollTo(t.getRow(i));
                }
            }
        });
        WaitForAsyncUtils.waitForFxEvents();
    }

    private Set<String> broader(String id) {
        return vm.session().vocabulary().concept(id).orElseThrow().broader();
    }

    @Test
    void dragKeyboardNewFacetUndoRedoAndCaution(FxRobot robot) throws Exception {
        Path ws = DemoWorkspace.mined(tmp.resolve("structure"));
        openAndWait(robot, ws);
        CuratorSession s = vm.session();
        TreeView<TreeNode> tree = tree(robot);
        assertEquals(s.vocabulary().facets().size(), tree.getRoot().getChildren().stream().filter(i -> i.getValue().facet()).count());

        // drag "black" from Colour onto the Closure facet (shown above it)
        robot.interact(() -> tree.getRoot().getChildren().forEach(i -> i.setExpanded(false)));
        expand(robot, "colour");
        select(robot, "black");
        shot(robot, "s01-tree");
        robot.drag(cell(robot, "black", "colour")).dropTo(cell(robot, "closure", null));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(Set.of("closure"), broader("black"), "dropped under the facet");
        shot(robot, "s02-dragged-under-facet");

        // keyboard: Alt+Right puts the selected concept under the row above
        select(robot, "blue");
        robot.interact(tree::requestFocus);
        String above = s.vocabulary().narrower("colour").stream().map(Concept::id)
                .filter(x -> !x.equals("blue")).sorted((a, b) -> s.vocabulary().displayLabel(a).compareToIgnoreCase(s.vocabulary().displayLabel(b)))
                .filter(x -> s.vocabulary().displayLabel(x).compareToIgnoreCase("blue") < 0).reduce((a, b) -> b).orElse(null);
        robot.push(KeyCode.ALT, KeyCode.RIGHT);
        WaitForAsyncUtils.waitForFxEvents();
        if (above == null) {
            assertEquals(Set.of("colour"), broader("blue"), "first among its siblings: stays");
        } else {
            assertEquals(Set.of(above), broader("blue"), "Alt+Right: under " + above);
            robot.push(KeyCode.ALT, KeyCode.LEFT);
            WaitForAsyncUtils.waitForFxEvents();
            assertEquals(Set.of("colour"), broader("blue"), "Alt+Left: back up");
        }

        // a new facet with the keyboard
        robot.interact(tree::requestFocus);
        robot.push(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.N);
        WaitForAsyncUtils.waitForFxEvents();
        robot.write("Strap width");
        shot(robot, "s03-new-facet-prompt");
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(s.vocabulary().concept("strap-width").map(Concept::isFacet).orElse(false), "the facet was made");
        assertEquals("strap-width", s.selection().concept(), "and selected");
        assertEquals("strap-width", tree.getSelectionModel().getSelectedItem().getValue().id());
        shot(robot, "s04-new-facet");

        // undo the facet, then the drag; redo both
        robot.interact(tree::requestFocus);
        robot.push(KeyCode.CONTROL, KeyCode.Z);
        WaitForAsyncUtils.waitForFxEvents();
        assertFalse(s.vocabulary().contains("strap-width"), "Ctrl+Z took the facet back");
        assertTrue(tree.getRoot().getChildren().stream().noneMatch(i -> i.getValue().id().equals("strap-width")), "and its row");
        if (above != null) {
            robot.push(KeyCode.CONTROL, KeyCode.Z);
            robot.push(KeyCode.CONTROL, KeyCode.Z);
            WaitForAsyncUtils.waitForFxEvents();
        }
        robot.push(KeyCode.CONTROL, KeyCode.Z);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(Set.of("colour"), broader("black"), "the drag is undone");
        robot.push(KeyCode.CONTROL, KeyCode.SHIFT, KeyCode.Z);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(Set.of("closure"), broader("black"), "and redone");
        shot(robot, "s05-undo-redo");

        // the caution on a regulated-claim facet
        select(robot, "fibre-content");
        robot.interact(() -> view.showSidePanel("Facet"));
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(Caution.REGULATED_CLAIM, robot.lookup("#details-caution").queryLabeled().getText(), "the details of the selection show the caution");
        assertTrue(robot.lookup("#claim-caution").queryLabeled().isVisible(), "the caution shows for fibre content");
        assertEquals(Caution.REGULATED_CLAIM, robot.lookup("#claim-caution").queryLabeled().getText());
        shot(robot, "s06-regulated-caution");
        select(robot, "colour");
        assertFalse(robot.lookup("#claim-caution").queryLabeled().isVisible());
        assertFalse(robot.lookup("#details-caution").queryLabeled().isVisible());

        // the checks jump to the concept
        robot.interact(() -> view.showSidePanel("Checks"));
        @SuppressWarnings("unchecked")
        TableView<ChecksViewModel.CheckRow> checks = robot.lookup("#checks-table").queryAs(TableView.class);
        waitUntil(() -> !checks.getItems().isEmpty() || robot.lookup("#checks-summary").queryLabeled().getText().startsWith("No findings"));
        if (!checks.getItems().isEmpty()) {
            ChecksViewModel.CheckRow row = checks.getItems().stream().filter(r -> !r.concepts().isEmpty()).findFirst().orElse(null);
            if (row != null) {
                robot.interact(() -> {
                    checks.requestFocus();
                    checks.getSelectionModel().select(row);
                });
                robot.type(KeyCode.ENTER);
                WaitForAsyncUtils.waitForFxEvents();
                assertTrue(row.concepts().contains(s.selection().concept()), "Enter on a finding selects its concept");
                assertEquals(s.selection().concept(), tree.getSelectionModel().getSelectedItem().getValue().id(), "and the tree shows it");
            }
        }
        shot(robot, "s07-checks");

        // figures for a concept
        select(robot, "aluminium");
        robot.interact(() -> view.showSidePanel("Figures"));
        waitUntil(() -> robot.lookup("#figure-covered").queryLabeled().getText().contains("listings"));
        shot(robot, "s08-figures");
        robot.interact(() -> vm.closeSession());
    }

    @Test
    void mergeTwoConceptsFromASuggestion(FxRobot robot) throws Exception {
        Path ws = DemoWorkspace.mined(tmp.resolve("merge"));
        openAndWait(robot, ws);
        CuratorSession s = vm.session();
        robot.interact(() -> view.showSidePanel("Suggestions"));
        @SuppressWarnings("unchecked")
        ListView<SuggestionsViewModel.Row> list = robot.lookup("#suggestions-list").queryAs(ListView.class);
        robot.interact(() -> s.selection().selectConcept(null));
        waitUntil(() -> !list.getItems().isEmpty());
        // the curator kept both forms of a variant pair as concepts (K in the harvest); now the engine proposes merging them
        SuggestionsViewModel.Row plain = list.getItems().stream()
                .filter(r -> r.suggestion().conceptIds().isEmpty() && r.suggestion().members().size() == 2).findFirst()
                .orElseThrow(() -> new AssertionError("no variant pair of plain terms among the suggestions"));
        String pairKey = plain.suggestion().key();
        robot.interact(() -> {
            Vocabulary v = s.vocabulary();
            List<dev.sheaf.vocab.Edit> keep = new ArrayList<>();
            List<String> made = new ArrayList<>();
            for (var m : plain.suggestion().members()) {
                String id = v.newId(m.shown());
                if (made.contains(id)) {
                    id = id + "-2";
                }
                made.add(id);
                keep.add(dev.sheaf.vocab.Edit.addConcept(Concept.builder(id).prefLabel(m.shown()).broader("features").build()));
                keep.add(dev.sheaf.vocab.Edit.recordDecision(dev.sheaf.vocab.Decision.kept(m.term(), id)));
            }
            s.apply(dev.sheaf.vocab.Edit.batch("Keep both forms", keep));
        });
        WaitForAsyncUtils.waitForFxEvents();
        SuggestionsViewModel.Row two = list.getItems().stream().filter(r -> r.suggestion().key().equals(pairKey)).findFirst()
                .orElseThrow(() -> new AssertionError("the pair is still proposed once both are concepts"));
        assertEquals(2, two.suggestion().conceptIds().size(), "both members are concepts now");
        robot.interact(() -> {
            list.requestFocus();
            list.getSelectionModel().select(two);
            list.scrollTo(two);
        });
        WaitForAsyncUtils.waitForFxEvents();
        shot(robot, "s09-suggestions");
        String key = two.suggestion().key();
        List<String> concepts = new ArrayList<>(two.suggestion().conceptIds());
        int before = s.vocabulary().size();
        robot.type(KeyCode.ENTER);
        WaitForAsyncUtils.waitForFxEvents();
        assertTrue(list.getItems().stream().noneMatch(r -> r.suggestion().key().equals(key)), "merged: the suggestion is answered");
        assertEquals(before - 1, s.vocabulary().size(), "two concepts became one");
        assertEquals(1, concepts.stream().filter(s.vocabulary()::contains).count(), "one survives, the other is retired into it");
        assertNotNull(robot.lookup("#suggestions-message").queryLabeled().getText());
        shot(robot, "s10-merged");
        robot.push(KeyCode.CONTROL, KeyCode.Z);
        WaitForAsyncUtils.waitForFxEvents();
        assertEquals(before, s.vocabulary().size(), "Ctrl+Z undid the merge");
        robot.interact(() -> vm.closeSession());
    }

    /** The tree with 5,000 concepts: every facet open, then one keyboard move; prints the figures. */
    @Test
    void fiveThousandConceptsStayResponsive(FxRobot robot) throws Exception {
        Path ws = DemoWorkspace.fresh(tmp.resolve("big"));
        List<Concept> cs = new ArrayList<>();
        for (int f = 0; f < 50; f++) {
            cs.add(Concept.builder("f-" + f).prefLabel(String.format(Locale.ROOT, "facet %02d", f)).facet(FacetProperties.terms()).build());
            for (int c = 0; c < 100; c++) {
                cs.add(Concept.builder("c-" + f + "-" + c).prefLabel(String.format(Locale.ROOT, "value %02d %03d", f, c)).broader("f-" + f).build());
            }
        }
        VocabularyStore.write(ws.resolve("fernhollow.vocab.json"), Vocabulary.of(SchemeInfo.of("big", "Big"), cs, List.of(), List.of()));
        openAndWait(robot, ws);
        TreeView<TreeNode> tree = tree(robot);
        long t0 = System.nanoTime();
        robot.interact(() -> tree.getRoot().getChildren().forEach(i -> i.setExpanded(true)));
        WaitForAsyncUtils.waitForFxEvents();
        long t1 = System.nanoTime();
        assertEquals(5050, tree.getExpandedItemCount());
        select(robot, "c-7-5");
        robot.interact(tree::requestFocus);
        long t2 = System.nanoTime();
        robot.push(KeyCode.ALT, KeyCode.RIGHT);
        WaitForAsyncUtils.waitForFxEvents();
        long t3 = System.nanoTime();
        assertEquals(Set.of("c-7-4"), broader("c-7-5"));
        dev.sheaf.curator.hierarchy.HierarchyView hv = robot.lookup(".hierarchy-view").queryAs(dev.sheaf.curator.hierarchy.HierarchyView.class);
        double rowsMs = hv.lastUpdateMillis();
        long[] onFx = new long[2];
        robot.interact(() -> {
            long a = System.nanoTime();
            vm.session().apply(dev.sheaf.vocab.Edit.moveUnder("c-9-5", "c-9-4"));
            onFx[0] = System.nanoTime() - a;
        });
        double rowsMs2 = hv.lastUpdateMillis();
        assertEquals(Set.of("c-9-4"), broader("c-9-5"));
        TreeNode shown = tree.getSelectionModel().getSelectedItem().getValue();
        assertEquals("c-7-5", shown.id(), "the moved concept stays selected");
        assertEquals("c-7-4", shown.parent(), "in its new place");
        System.out.printf(Locale.ROOT, "tree, 5,050 rows: open every facet %.0f ms; Alt+Right move, key to repaint %.0f ms"
                + " (tree rows %.1f ms); a move on the FX thread, edit and every panel's listener %.0f ms (tree rows %.1f ms); load %.1f%n",
                (t1 - t0) / 1e6, (t3 - t2) / 1e6, rowsMs, onFx[0] / 1e6, rowsMs2,
                java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        shot(robot, "s11-five-thousand");
        robot.interact(() -> vm.closeSession());
    }
}
