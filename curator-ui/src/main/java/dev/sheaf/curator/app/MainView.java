package dev.sheaf.curator.app;

import dev.sheaf.curator.concepts.ConceptListView;
import dev.sheaf.curator.details.DetailsView;
import dev.sheaf.curator.evidence.EvidenceView;
import dev.sheaf.curator.harvest.HarvestView;
import dev.sheaf.curator.session.Background;
import dev.sheaf.curator.session.Notice;
import java.io.File;
import java.nio.file.Path;
import java.util.Objects;
import javafx.beans.binding.Bindings;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.scene.Node;
import javafx.scene.control.Alert;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonBar;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Label;
import javafx.scene.control.Menu;
import javafx.scene.control.MenuBar;
import javafx.scene.control.MenuItem;
import javafx.scene.control.ProgressBar;
import javafx.scene.control.SeparatorMenuItem;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tab;
import javafx.scene.control.TabPane;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyCodeCombination;
import javafx.scene.input.KeyCombination;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.StackPane;
import javafx.scene.layout.VBox;
import javafx.stage.DirectoryChooser;
import javafx.stage.FileChooser;
import javafx.stage.Window;

/**
 * The main window: menus, the harvest on the left, the vocabulary in the centre, details above
 * the side panels (evidence, and whatever else is added) on the right, the status bar below.
 * Binds to a {@link MainViewModel}; holds no state of its own.
 *
 * <p>Slots for other panels: {@link #setHierarchyView(Node)} replaces the centre (by default a
 * plain concept list), {@link #addSidePanel(String, Node)} adds a tab beside the evidence.
 */
public final class MainView {
    /** Style sheet of the curator's look. */
    public static final String STYLESHEET = Objects.requireNonNull(MainView.class.getResource("curator.css")).toExternalForm();

    private final MainViewModel vm;
    private final BorderPane root = new BorderPane();
    private final StackPane centre = new StackPane();
    private final TabPane side = new TabPane();
    private final HarvestView harvestView;
    private final EvidenceView evidenceView;
    private final Menu recentMenu = new Menu("Open recent");

    public MainView(MainViewModel vm) {
        this.vm = vm;
        root.getStyleClass().add("curator");
        root.getStylesheets().add(STYLESHEET);
        harvestView = new HarvestView(vm.harvest());
        evidenceView = new EvidenceView(vm.evidence());
        DetailsView details = new DetailsView(vm.details());
        centre.getStyleClass().add("centre-slot");
        setHierarchyView(new ConceptListView(vm.sessionProperty()).node());
        side.setTabClosingPolicy(TabPane.TabClosingPolicy.UNAVAILABLE);
        side.getStyleClass().add("side-panels");
        addSidePanel("Evidence", evidenceView.node());
        SplitPane right = new SplitPane(details.node(), side);
        right.setOrientation(Orientation.VERTICAL);
        right.setDividerPositions(0.36);
        SplitPane main = new SplitPane(harvestView.node(), centre, right);
        main.setDividerPositions(0.41, 0.69);
        main.getStyleClass().add("main-split");
        root.setTop(menus());
        root.setCenter(new StackPane(main, startScreen()));
        root.setBottom(statusBar(vm.background()));
        vm.addNoticeListener(this::show);
    }

    /** The window's content. */
    public Region node() {
        return root;
    }

    public HarvestView harvestView() {
        return harvestView;
    }

    public EvidenceView evidenceView() {
        return evidenceView;
    }

    /** Puts a view in the centre of the window (the vocabulary tree). */
    public void setHierarchyView(Node view) {
        centre.getChildren().setAll(view);
    }

    /** Adds a panel as a tab on the right, below the details (evidence is the first). */
    public Tab addSidePanel(String title, Node view) {
        Tab t = new Tab(title, view);
        t.setId("side-" + title.toLowerCase(java.util.Locale.ROOT).replace(' ', '-'));
        side.getTabs().add(t);
        return t;
    }

    /** Brings the side panel with this title to the front. */
    public void showSidePanel(String title) {
        side.getTabs().stream().filter(t -> t.getText().equals(title)).findFirst().ifPresent(t -> side.getSelectionModel().select(t));
    }

    private MenuBar menus() {
        MenuItem open = item("Open workspace…", new KeyCodeCombination(KeyCode.O, KeyCombination.SHORTCUT_DOWN), this::chooseWorkspace);
        MenuItem save = item("Save", new KeyCodeCombination(KeyCode.S, KeyCombination.SHORTCUT_DOWN), vm::save);
        MenuItem saveAs = item("Save as…", new KeyCodeCombination(KeyCode.S, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN),
                this::chooseSaveAs);
        MenuItem mine = item("Mine the listings again", null, vm::mine);
        MenuItem close = item("Close workspace", new KeyCodeCombination(KeyCode.W, KeyCombination.SHORTCUT_DOWN), () -> {
            if (confirmClose()) {
                vm.closeSession();
            }
        });
        MenuItem quit = item("Quit", new KeyCodeCombination(KeyCode.Q, KeyCombination.SHORTCUT_DOWN), () -> {
            Window w = root.getScene() == null ? null : root.getScene().getWindow();
            if (w != null && confirmClose()) {
                vm.closeSession();
                ((javafx.stage.Stage) w).close();
            }
        });
        var noSession = Bindings.isNull(vm.sessionProperty());
        save.disableProperty().bind(noSession);
        saveAs.disableProperty().bind(noSession);
        mine.disableProperty().bind(noSession.or(vm.background().runningProperty()));
        close.disableProperty().bind(noSession);
        updateRecent();
        vm.recentWorkspaces().addListener((javafx.collections.ListChangeListener<Path>) c -> updateRecent());
        Menu file = new Menu("File", null, open, recentMenu, new SeparatorMenuItem(), save, saveAs, new SeparatorMenuItem(), mine,
                new SeparatorMenuItem(), close, quit);

        MenuItem undo = item("Undo", new KeyCodeCombination(KeyCode.Z, KeyCombination.SHORTCUT_DOWN), vm::undo);
        MenuItem redo = item("Redo", new KeyCodeCombination(KeyCode.Z, KeyCombination.SHORTCUT_DOWN, KeyCombination.SHIFT_DOWN), vm::redo);
        MenuItem redo2 = item("Redo (alternative key)", new KeyCodeCombination(KeyCode.Y, KeyCombination.SHORTCUT_DOWN), vm::redo);
        vm.sessionProperty().addListener((o, a, s) -> {
            undo.disableProperty().unbind();
            redo.disableProperty().unbind();
            undo.textProperty().unbind();
            redo.textProperty().unbind();
            if (s == null) {
                undo.setDisable(true);
                redo.setDisable(true);
                undo.setText("Undo");
                redo.setText("Redo");
            } else {
                undo.disableProperty().bind(s.canUndoProperty().not());
                redo.disableProperty().bind(s.canRedoProperty().not());
                undo.textProperty().bind(Bindings.when(s.canUndoProperty()).then(Bindings.concat("Undo: ", s.undoTextProperty()))
                        .otherwise("Undo"));
                redo.textProperty().bind(Bindings.when(s.canRedoProperty()).then(Bindings.concat("Redo: ", s.redoTextProperty()))
                        .otherwise("Redo"));
            }
        });
        undo.setDisable(true);
        redo.setDisable(true);
        redo2.disableProperty().bind(redo.disableProperty());
        MenuItem find = item("Filter the harvest", new KeyCodeCombination(KeyCode.F, KeyCombination.SHORTCUT_DOWN), harvestView::focusFilter);
        MenuItem table = item("Go to the candidate table", new KeyCodeCombination(KeyCode.L, KeyCombination.SHORTCUT_DOWN),
                harvestView::focusTable);
        MenuItem findConcept = item("Find a concept", new KeyCodeCombination(KeyCode.G, KeyCombination.SHORTCUT_DOWN), () -> {
            Node f = root.lookup("#concept-filter");
            if (f != null) {
                f.requestFocus();
            }
        });
        MenuItem goTree = item("Go to the vocabulary tree", new KeyCodeCombination(KeyCode.T, KeyCombination.SHORTCUT_DOWN),
                () -> focus("#hierarchy-tree", null));
        MenuItem goMerges = item("Go to the merge suggestions", new KeyCodeCombination(KeyCode.M, KeyCombination.SHORTCUT_DOWN),
                () -> focus("#suggestions-list", "Suggestions"));
        MenuItem goParents = item("Go to the parent suggestions", new KeyCodeCombination(KeyCode.P, KeyCombination.SHORTCUT_DOWN),
                () -> focus("#parents-list", "Suggestions"));
        for (MenuItem i : new MenuItem[] {findConcept, goTree, goMerges, goParents}) {
            i.disableProperty().bind(noSession);
        }
        Menu edit = new Menu("Edit", null, undo, redo, redo2, new SeparatorMenuItem(), find, table, findConcept, goTree, goMerges,
                goParents);

        // Single-letter keys act in the candidate table only (so typing in a filter box never decides a term).
        Menu triage = new Menu("Triage", null,
                item("Keep as a new concept (K)", null, harvestView::keep),
                item("Keep as a label of the selected concept (Shift+K)", null, harvestView::keepAsLabel),
                item("Drop (D)", null, harvestView::drop),
                item("Park (decide later) (P)", null, harvestView::park),
                item("Forget the decision (U)", null, harvestView::forget),
                new SeparatorMenuItem(),
                item("Show the evidence (E)", null, () -> showSidePanel("Evidence")));
        triage.getItems().forEach(i -> i.disableProperty().bind(noSession));
        MenuItem keys = item("Keys", new KeyCodeCombination(KeyCode.F1), this::showKeys);
        Menu help = new Menu("Help", null, keys);
        MenuBar bar = new MenuBar(file, edit, triage, help);
        bar.setUseSystemMenuBar(true);
        return bar;
    }

    /** Brings the side panel {@code tab} (when not null) to the front and puts the focus on the node {@code selector}, selecting its first row. */
    private void focus(String selector, String tab) {
        if (tab != null) {
            showSidePanel(tab);
        }
        Node n = root.lookup(selector);
        if (n != null) {
            n.requestFocus();
            if (n instanceof javafx.scene.control.ListView<?> l && l.getSelectionModel().getSelectedIndex() < 0 && !l.getItems().isEmpty()) {
                l.getSelectionModel().select(0);
            }
        }
    }

    private static MenuItem item(String text, KeyCombination key, Runnable action) {
        MenuItem i = new MenuItem(text);
        if (key != null) {
            i.setAccelerator(key);
        }
        i.setOnAction(e -> action.run());
        return i;
    }

    private void updateRecent() {
        recentMenu.getItems().clear();
        for (Path p : vm.recentWorkspaces()) {
            recentMenu.getItems().add(item(p.toString(), null, () -> openChecked(p)));
        }
        recentMenu.setDisable(recentMenu.getItems().isEmpty());
    }

    private Node statusBar(Background bg) {
        Label status = new Label();
        status.textProperty().bind(vm.statusProperty());
        status.getStyleClass().add("status-text");
        status.setMaxWidth(Double.MAX_VALUE);
        HBox.setHgrow(status, Priority.ALWAYS);
        Label saved = new Label();
        saved.textProperty().bind(vm.saveStateProperty());
        saved.getStyleClass().add("save-state");
        vm.saveStateProperty().addListener((o, a, b) -> {
            saved.getStyleClass().remove("unsaved");
            if (b != null && b.startsWith("Unsaved")) {
                saved.getStyleClass().add("unsaved");
            }
        });
        Label work = new Label();
        work.textProperty().bind(Bindings.concat(bg.titleProperty(), Bindings.when(bg.detailProperty().isEmpty()).then("")
                .otherwise(Bindings.concat(": ", bg.detailProperty()))));
        work.getStyleClass().add("work-text");
        ProgressBar bar = new ProgressBar();
        bar.progressProperty().bind(bg.progressProperty());
        bar.setPrefWidth(160);
        Button cancel = new Button("Cancel");
        cancel.setOnAction(e -> vm.cancelWork());
        cancel.setCancelButton(false);
        HBox working = new HBox(8, work, bar, cancel);
        working.getStyleClass().add("working");
        working.visibleProperty().bind(bg.runningProperty());
        working.managedProperty().bind(bg.runningProperty());
        HBox box = new HBox(12, status, working, saved);
        box.getStyleClass().add("status-bar");
        box.setPadding(new Insets(4, 10, 4, 10));
        return box;
    }

    /**
     * What the window shows while no workspace is open: what to do first, the button to open one,
     * and the recent workspaces (Enter or double-click opens).
     */
    private Node startScreen() {
        Label title = new Label("Sheaf curator");
        title.getStyleClass().add("start-title");
        Label what = new Label("Turn a harvest of terms mined from your listings into a vocabulary: keep, drop or park"
                + " candidates, merge synonyms, build facets and their values, and save.");
        what.setWrapText(true);
        what.getStyleClass().add("start-text");
        Label how = new Label("Open a workspace: a folder with a workspace.json (the demo shop is the folder sample-listings)."
                + " When it has no harvest yet, its listings are mined first, in the background.");
        how.setWrapText(true);
        how.getStyleClass().add("muted");
        Button open = new Button("Open a workspace…  (Ctrl+O)");
        open.setId("start-open");
        open.setDefaultButton(true);
        open.setOnAction(e -> chooseWorkspace());
        Label recentTitle = new Label("Recent workspaces");
        recentTitle.getStyleClass().add("pane-title");
        javafx.scene.control.ListView<Path> recent = new javafx.scene.control.ListView<>(vm.recentWorkspaces());
        recent.setId("start-recent");
        recent.setPrefHeight(180);
        Label none = new Label("None yet: the workspaces you open are listed here.");
        none.getStyleClass().add("muted");
        recent.setPlaceholder(none);
        recent.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER && recent.getSelectionModel().getSelectedItem() != null) {
                openChecked(recent.getSelectionModel().getSelectedItem());
                e.consume();
            }
        });
        recent.setOnMouseClicked(e -> {
            if (e.getClickCount() == 2 && recent.getSelectionModel().getSelectedItem() != null) {
                openChecked(recent.getSelectionModel().getSelectedItem());
            }
        });
        Label keys = new Label("F1 lists every key.");
        keys.getStyleClass().add("key-hint");
        VBox card = new VBox(12, title, what, how, open, recentTitle, recent, keys);
        card.getStyleClass().add("start-card");
        card.setMaxWidth(640);
        card.setMaxHeight(Region.USE_PREF_SIZE);
        card.setPadding(new Insets(28));
        StackPane screen = new StackPane(card);
        screen.setId("start-screen");
        screen.getStyleClass().add("start-screen");
        var showing = vm.sessionProperty().isNull().and(vm.background().runningProperty().not());
        screen.visibleProperty().bind(showing);
        // the first recent workspace is picked and focused whenever the screen shows (Enter opens it), else the open button
        Runnable focusStart = () -> {
            if (recent.getItems().isEmpty()) {
                open.requestFocus();
            } else {
                recent.requestFocus();
                recent.getSelectionModel().select(0);
            }
        };
        showing.addListener((o, a, b) -> {
            if (b) {
                javafx.application.Platform.runLater(focusStart);
            }
        });
        screen.sceneProperty().addListener((o, a, b) -> {
            if (b != null && showing.get()) {
                javafx.application.Platform.runLater(focusStart);
            }
        });
        return screen;
    }

    // ------------------------------------------------------------------ dialogs

    private void show(Notice n) {
        if (n.kind() == Notice.Kind.INFO && !n.title().startsWith("Unsaved edits recovered")) {
            return;
        }
        Alert a = new Alert(n.kind() == Notice.Kind.ERROR ? Alert.AlertType.ERROR
                : n.kind() == Notice.Kind.WARNING ? Alert.AlertType.WARNING : Alert.AlertType.INFORMATION);
        a.setTitle(n.title());
        a.setHeaderText(n.title());
        a.setContentText(n.text());
        a.getDialogPane().getStylesheets().add(STYLESHEET);
        a.getDialogPane().setMinWidth(520);
        if (root.getScene() != null) {
            a.initOwner(root.getScene().getWindow());
        }
        a.show();
    }

    private void chooseWorkspace() {
        DirectoryChooser c = new DirectoryChooser();
        c.setTitle("Open a workspace (a folder with workspace.json)");
        File f = c.showDialog(root.getScene().getWindow());
        if (f != null) {
            openChecked(f.toPath());
        }
    }

    private void openChecked(Path dir) {
        if (confirmClose()) {
            vm.open(dir);
        }
    }

    private void chooseSaveAs() {
        FileChooser c = new FileChooser();
        c.setTitle("Save the vocabulary as");
        c.getExtensionFilters().add(new FileChooser.ExtensionFilter("Sheaf vocabulary", "*.vocab.json"));
        if (vm.session() != null) {
            c.setInitialDirectory(vm.session().vocabularyFile().getParent().toFile());
            c.setInitialFileName(vm.session().vocabularyFile().getFileName().toString());
        }
        File f = c.showSaveDialog(root.getScene().getWindow());
        if (f != null) {
            vm.saveAs(f.toPath());
        }
    }

    /**
     * Asks what to do with unsaved edits before closing; true when closing may go on. Edits not
     * saved stay in the edit journal and come back when the workspace is opened again.
     */
    public boolean confirmClose() {
        if (!vm.hasUnsavedEdits()) {
            return true;
        }
        ButtonType save = new ButtonType("Save", ButtonBar.ButtonData.YES);
        ButtonType later = new ButtonType("Close without saving", ButtonBar.ButtonData.NO);
        ButtonType cancel = new ButtonType("Cancel", ButtonBar.ButtonData.CANCEL_CLOSE);
        Alert a = new Alert(Alert.AlertType.CONFIRMATION, "", save, later, cancel);
        a.setTitle("Unsaved edits");
        a.setHeaderText("Save the vocabulary before closing?");
        a.setContentText("Edits you do not save now are kept in the edit journal beside the vocabulary file and come back"
                + " the next time you open this workspace.");
        a.getDialogPane().getStylesheets().add(STYLESHEET);
        if (root.getScene() != null) {
            a.initOwner(root.getScene().getWindow());
        }
        ButtonType r = a.showAndWait().orElse(cancel);
        if (r == save) {
            return vm.save();
        }
        return r == later;
    }

    private void showKeys() {
        Alert a = new Alert(Alert.AlertType.INFORMATION);
        a.setTitle("Keys");
        a.setHeaderText("Keys of the curator");
        a.setContentText(KEYS);
        a.getDialogPane().getStylesheets().add(STYLESHEET);
        a.show();
    }

    /** The keys, as the help shows them. */
    public static final String KEYS = String.join("\n",
            "In the candidate table (select several rows with Shift or Ctrl):",
            "  K  keep as a new concept          Shift+K  keep as a label of the selected concept",
            "  D  drop (remembered on re-mine)   P  park (decide later)     U  forget the decision",
            "  E  show the evidence              Enter in the evidence list: open the listing",
            "Anywhere:",
            "  Ctrl+F  filter the harvest        Ctrl+L  back to the table",
            "  Ctrl+G  find a concept (Enter goes to it in the tree)    Ctrl+T  the tree",
            "  Ctrl+M  the merge suggestions (Enter merges)    Ctrl+P  the parent suggestions (Enter puts under)",
            "In the tree: Ctrl+X then Ctrl+V move · Alt+→ / Alt+← indent / outdent · Ctrl+Shift+N new facet · F2 rename",
            "  Ctrl+Z  undo    Ctrl+Shift+Z or Ctrl+Y  redo",
            "  Ctrl+S  save    Ctrl+Shift+S  save as    Ctrl+O  open a workspace    Ctrl+Q  quit",
            "Unsaved edits are written to the edit journal at once, so nothing is lost if the program stops.");
}
