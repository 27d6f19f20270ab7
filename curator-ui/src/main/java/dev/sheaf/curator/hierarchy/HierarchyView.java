package dev.sheaf.curator.hierarchy;

import dev.sheaf.curator.session.Caution;
import dev.sheaf.curator.hierarchy.HierarchyViewModel.Placed;
import dev.sheaf.curator.hierarchy.HierarchyViewModel.Prompt;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import javafx.collections.ObservableList;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ContextMenu;
import javafx.scene.control.Label;
import javafx.scene.control.MenuItem;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.TextField;
import javafx.scene.control.ToolBar;
import javafx.scene.control.Tooltip;
import javafx.scene.control.TreeCell;
import javafx.scene.control.TreeItem;
import javafx.scene.control.TreeView;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The hierarchy panel: a tree of facets and concepts built one level at a time as the curator
 * opens it, updated row by row after each edit. Binds to a {@link HierarchyViewModel}; every
 * gesture calls one of its intents.
 *
 * <p>Keys (also in the context menu and the hint line): Alt+Right puts the concept under the one
 * above it, Alt+Left takes it one level up, Ctrl+X then Ctrl+V moves it (Ctrl+Shift+V puts it
 * also under the target, keeping its other parents), F2 renames, Ctrl+N adds a concept under the
 * selection, Ctrl+Shift+N adds a facet. Dragging a row onto another moves it there; holding Ctrl
 * while dropping puts it also under the target.
 */
public final class HierarchyView extends BorderPane {
    /** The stylesheet of the structure panels (hierarchy, suggestions, checks, figures). */
    public static final String STYLESHEET = "/dev/sheaf/curator/curator-structure.css";
    static final String KEYS = "Drag a row onto another to move it (hold Ctrl: also under) · Alt+→ / Alt+← indent / outdent"
            + " · right-click for every move and its key";

    private final HierarchyViewModel vm;
    private final TreeView<TreeNode> tree = new TreeView<>();
    private final TreeItem<TreeNode> top = new Row(new TreeNode(HierarchyViewModel.TOP, "", false, null, List.of(), 1, false, false));
    /** Every built row of a concept: several with polyhierarchy. */
    private final Map<String, List<Row>> rows = new HashMap<>();
    private final TextField name = new TextField();
    private Placed dragging;
    private boolean revealing;
    private long lastUpdateNanos = -1;

    public HierarchyView(HierarchyViewModel vm) {
        this.vm = Objects.requireNonNull(vm);
        getStyleClass().add("hierarchy-view");
        getStylesheets().add(Objects.requireNonNull(HierarchyView.class.getResource(STYLESHEET)).toExternalForm());

        tree.setId("hierarchy-tree");
        tree.setRoot(top);
        tree.setShowRoot(false);
        top.setExpanded(true);
        tree.setCellFactory(t -> new NodeCell());
        tree.setContextMenu(menu());
        tree.addEventFilter(KeyEvent.KEY_PRESSED, this::key);
        tree.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (!revealing && b != null && b.getValue() != null) {
                vm.select(b.getValue().id());
            }
        });
        tree.setOnMouseReleased(e -> dragging = null);
        vm.addTreeListener(this::update);
        vm.selectedIdProperty().addListener((o, a, b) -> reveal(b));

        setTop(new VBox(toolbar(), promptBar()));
        setCenter(tree);
        Label hint = new Label(KEYS);
        hint.getStyleClass().add("key-hint");
        hint.setWrapText(true);
        Label message = new Label();
        message.setId("hierarchy-message");
        message.getStyleClass().add("status-message");
        message.textProperty().bind(vm.messageProperty());
        message.setWrapText(true);
        VBox bottom = new VBox(4, message, hint);
        bottom.setPadding(new Insets(4, 6, 4, 6));
        setBottom(bottom);
    }

    /** The tree control (for tests and focus). */
    public TreeView<TreeNode> tree() {
        return tree;
    }

    private ToolBar toolbar() {
        Button facet = button("+ Facet", "Make a new facet (Ctrl+Shift+N)", vm::beginNewFacet);
        facet.setId("new-facet");
        Button concept = button("+ Concept", "Add a concept under the selected row (Ctrl+N)", () -> vm.beginNewConcept(selected()));
        Button rename = button("Rename", "Rename the selected row; the old name stays as an alternative label (F2)",
                () -> vm.beginRename(selected()));
        Button indent = button("→ In", "Put the selected concept under the row above it (Alt+→)", () -> vm.indent(selectedOrNone()));
        Button outdent = button("← Out", "Take the selected concept one level up (Alt+←)", () -> vm.outdent(selectedOrNone()));
        ToolBar bar = new ToolBar(facet, concept, rename, indent, outdent);
        bar.getStyleClass().add("hierarchy-toolbar");
        return bar;
    }

    private static Button button(String text, String tip, Runnable r) {
        Button b = new Button(text);
        b.setTooltip(new Tooltip(tip));
        b.setOnAction(e -> r.run());
        b.setFocusTraversable(false);
        return b;
    }

    private HBox promptBar() {
        Label what = new Label();
        what.textProperty().bind(vm.promptProperty().map(p -> p.title() + ":"));
        name.setId("hierarchy-name");
        name.textProperty().bindBidirectional(vm.promptTextProperty());
        name.setPromptText("name, then Enter (Esc cancels)");
        HBox.setHgrow(name, Priority.ALWAYS);
        name.setOnAction(e -> {
            if (vm.commitPrompt()) {
                tree.requestFocus();
            }
        });
        name.addEventFilter(KeyEvent.KEY_PRESSED, e -> {
            if (e.getCode() == KeyCode.ESCAPE) {
                vm.cancelPrompt();
                tree.requestFocus();
                e.consume();
            }
        });
        HBox bar = new HBox(6, what, name);
        bar.setAlignment(Pos.CENTER_LEFT);
        bar.setPadding(new Insets(4, 6, 4, 6));
        bar.getStyleClass().add("name-prompt");
        bar.visibleProperty().bind(vm.promptProperty().isNotEqualTo(Prompt.NONE));
        bar.managedProperty().bind(bar.visibleProperty());
        vm.promptProperty().addListener((o, a, b) -> {
            if (b != Prompt.NONE) {
                name.requestFocus();
                name.selectAll();
            }
        });
        return bar;
    }

    private ContextMenu menu() {
        ContextMenu m = new ContextMenu(
                item("New concept under this  (Ctrl+N)", () -> vm.beginNewConcept(selected())),
                item("New facet  (Ctrl+Shift+N)", vm::beginNewFacet),
                item("Rename  (F2)", () -> vm.beginRename(selected())),
                new SeparatorMenuItem(),
                item("Cut  (Ctrl+X)", () -> cut()),
                item("Move the cut concept under this  (Ctrl+V)", () -> paste(false)),
                item("Put the cut concept also under this  (Ctrl+Shift+V)", () -> paste(true)),
                new SeparatorMenuItem(),
                item("Under the one above  (Alt+→)", () -> vm.indent(selectedOrNone())),
                item("One level up  (Alt+←)", () -> vm.outdent(selectedOrNone())),
                item("Take out from under this parent", () -> vm.notUnder(selectedOrNone())));
        return m;
    }

    private static MenuItem item(String text, Runnable r) {
        MenuItem i = new MenuItem(text);
        i.setOnAction(e -> r.run());
        return i;
    }

    private void key(KeyEvent e) {
        boolean done = true;
        KeyCode k = e.getCode();
        if (e.isAltDown() && k == KeyCode.RIGHT) {
            vm.indent(selectedOrNone());
        } else if (e.isAltDown() && k == KeyCode.LEFT) {
            vm.outdent(selectedOrNone());
        } else if (e.isShortcutDown() && k == KeyCode.X) {
            cut();
        } else if (e.isShortcutDown() && k == KeyCode.V) {
            paste(e.isShiftDown());
        } else if (e.isShortcutDown() && e.isShiftDown() && k == KeyCode.N) {
            vm.beginNewFacet();
        } else if (e.isShortcutDown() && k == KeyCode.N) {
            vm.beginNewConcept(selected());
        } else if (k == KeyCode.F2) {
            vm.beginRename(selected());
        } else {
            done = false;
        }
        if (done) {
            e.consume();
        }
    }

    private void cut() {
        Placed p = selected();
        if (p != null) {
            vm.cut(p);
        }
    }

    private void paste(boolean also) {
        Placed target = selected();
        if (target == null) {
            return;
        }
        if (also) {
            Placed c = vm.cutProperty().get();
            if (c != null) {
                vm.alsoUnder(c.id(), target.id());
            }
        } else {
            vm.paste(target.id());
        }
    }

    private Placed selected() {
        TreeItem<TreeNode> i = tree.getSelectionModel().getSelectedItem();
        return i == null || i.getValue() == null ? null : new Placed(i.getValue().id(), i.getValue().parent());
    }

    private Placed selectedOrNone() {
        Placed p = selected();
        return p == null ? new Placed("-", null) : p;
    }

    // ------------------------------------------------------------------ building and updating rows

    /** A row that asks the view-model for its children the first time they are needed. */
    private final class Row extends TreeItem<TreeNode> {
        private boolean loaded;

        Row(TreeNode n) {
            super(n);
        }

        @Override
        public boolean isLeaf() {
            return getValue().isLeaf();
        }

        @Override
        public ObservableList<TreeItem<TreeNode>> getChildren() {
            if (!loaded) {
                loaded = true;
                List<TreeItem<TreeNode>> kids = new ArrayList<>();
                for (TreeNode n : vm.children(getValue().id())) {
                    kids.add(track(new Row(n)));
                }
                super.getChildren().setAll(kids);
            }
            return super.getChildren();
        }

        boolean loaded() {
            return loaded;
        }

        ObservableList<TreeItem<TreeNode>> built() {
            return super.getChildren();
        }
    }

    private Row track(Row r) {
        rows.computeIfAbsent(r.getValue().id(), k -> new ArrayList<>(1)).add(r);
        return r;
    }

    private void forget(TreeItem<TreeNode> item) {
        Row r = (Row) item;
        List<Row> l = rows.get(r.getValue().id());
        if (l != null) {
            l.remove(r);
            if (l.isEmpty()) {
                rows.remove(r.getValue().id());
            }
        }
        if (r.loaded()) {
            for (TreeItem<TreeNode> c : r.built()) {
                forget(c);
            }
        }
    }

    /**
     * Applies one change: refresh changed rows, then reconcile the child lists of changed parents.
     * While rows come and go the tree's own selection may jump to a neighbour; that is not the
     * curator's choice, so it is not passed on, and the selected concept is shown again after.
     */
    private void update(TreeChange change) {
        long t0 = System.nanoTime();
        String sel = vm.selected();
        revealing = true;
        try {
            for (String id : change.rows()) {
                for (Row r : List.copyOf(rows.getOrDefault(id, List.of()))) {
                    vm.node(id, r.getValue().parent()).ifPresent(r::setValue);
                }
            }
            for (String p : change.parents()) {
                if (p.equals(HierarchyViewModel.TOP)) {
                    reconcile((Row) top);
                } else {
                    for (Row r : List.copyOf(rows.getOrDefault(p, List.of()))) {
                        reconcile(r);
                    }
                }
            }
        } finally {
            revealing = false;
        }
        if (sel != null && vm.node(sel, null).isEmpty()) {
            // the selected concept is gone (an undone "new facet", a merge): select what the tree shows now
            TreeItem<TreeNode> cur = tree.getSelectionModel().getSelectedItem();
            vm.select(cur == null || cur.getValue() == null ? null : cur.getValue().id());
        } else {
            reveal(sel);
        }
        lastUpdateNanos = System.nanoTime() - t0;
    }

    /** How long the last change took to apply to the rows, in milliseconds (-1 before the first); printed by the UI test. */
    public double lastUpdateMillis() {
        return lastUpdateNanos < 0 ? -1 : lastUpdateNanos / 1e6;
    }

    /** Makes a loaded row's children match the view-model again, keeping the rows (and their open state) that stay. */
    private void reconcile(Row parent) {
        if (!parent.loaded()) {
            return;
        }
        List<TreeNode> want = vm.children(parent.getValue().id());
        Map<String, Row> have = new HashMap<>();
        for (TreeItem<TreeNode> c : parent.built()) {
            have.put(c.getValue().id(), (Row) c);
        }
        List<TreeItem<TreeNode>> next = new ArrayList<>(want.size());
        Set<String> kept = new HashSet<>();
        for (TreeNode n : want) {
            Row r = have.get(n.id());
            if (r != null) {
                r.setValue(n);
                kept.add(n.id());
            } else {
                r = track(new Row(n));
            }
            next.add(r);
        }
        for (Map.Entry<String, Row> e : have.entrySet()) {
            if (!kept.contains(e.getKey())) {
                forget(e.getValue());
            }
        }
        if (!sameOrder(parent.built(), next)) {
            parent.built().setAll(next);
        }
    }

    private static boolean sameOrder(List<TreeItem<TreeNode>> a, List<TreeItem<TreeNode>> b) {
        if (a.size() != b.size()) {
            return false;
        }
        for (int i = 0; i < a.size(); i++) {
            if (a.get(i) != b.get(i)) {
                return false;
            }
        }
        return true;
    }

    /** Opens the rows down to {@code id} and selects it (when another panel selected it, or after a move). */
    void reveal(String id) {
        if (id == null) {
            return;
        }
        TreeItem<TreeNode> cur = tree.getSelectionModel().getSelectedItem();
        if (cur != null && cur.getValue() != null && cur.getValue().id().equals(id) && cur.getParent() != null) {
            return;
        }
        TreeItem<TreeNode> at = top;
        for (String step : vm.pathTo(id)) {
            TreeItem<TreeNode> next = null;
            for (TreeItem<TreeNode> c : at.getChildren()) {
                if (c.getValue().id().equals(step)) {
                    next = c;
                    break;
                }
            }
            if (next == null) {
                return;
            }
            if (at != top) {
                at.setExpanded(true);
            }
            at = next;
        }
        if (at == top) {
            return;
        }
        revealing = true;
        try {
            tree.getSelectionModel().select(at);
        } finally {
            revealing = false;
        }
        int row = tree.getRow(at);
        if (row >= 0) {
            tree.scrollTo(Math.max(0, row - 3));
        }
    }

    /** A row: the label, a note for a second parent, and small tags (facet, regulated claim, under no facet). */
    private final class NodeCell extends TreeCell<TreeNode> {
        private final Label label = new Label();
        private final Label note = new Label();
        private final Label tag = new Label();
        private final Label claim = new Label("claim");
        private final HBox box = new HBox(6, label, note, tag, claim);

        NodeCell() {
            box.setAlignment(Pos.CENTER_LEFT);
            note.getStyleClass().add("also-under");
            tag.getStyleClass().add("tag");
            claim.getStyleClass().addAll("tag", "claim-tag");
            claim.setTooltip(new Tooltip(Caution.REGULATED_CLAIM));
            label.setMinWidth(Region.USE_PREF_SIZE);
            setOnDragDetected(e -> {
                TreeNode n = getItem();
                if (n != null && !n.facet() && e.getButton() == MouseButton.PRIMARY) {
                    dragging = new Placed(n.id(), n.parent());
                    startFullDrag();
                }
            });
            setOnMouseDragEntered(e -> {
                TreeNode n = getItem();
                if (dragging != null && n != null && vm.canMoveUnder(dragging, n.id())) {
                    getStyleClass().add("drop-target");
                }
            });
            setOnMouseDragExited(e -> getStyleClass().removeAll("drop-target"));
            setOnMouseDragReleased(e -> {
                getStyleClass().removeAll("drop-target");
                TreeNode n = getItem();
                Placed d = dragging;
                dragging = null;
                if (d == null || n == null) {
                    return;
                }
                if (e.isShortcutDown()) {
                    vm.alsoUnder(d.id(), n.id());
                } else {
                    vm.moveUnder(d, n.id());
                }
                e.consume();
            });
        }

        @Override
        protected void updateItem(TreeNode n, boolean empty) {
            super.updateItem(n, empty);
            getStyleClass().removeAll("facet-row", "concept-row", "regulated-row", "drop-target");
            if (empty || n == null) {
                setText(null);
                setGraphic(null);
                setTooltip(null);
                return;
            }
            setText(null);
            label.setText(n.label());
            note.setText(n.alsoUnderNote());
            note.setVisible(!n.alsoUnder().isEmpty());
            note.setManaged(note.isVisible());
            tag.setText(n.facet() ? "facet" : n.unfiled() ? "under no facet" : "");
            tag.setVisible(n.facet() || n.unfiled());
            tag.setManaged(tag.isVisible());
            claim.setVisible(n.regulated() && n.facet());
            claim.setManaged(claim.isVisible());
            getStyleClass().add(n.facet() ? "facet-row" : "concept-row");
            if (n.regulated()) {
                getStyleClass().add("regulated-row");
            }
            setGraphic(box);
        }
    }
}
