package dev.sheaf.curator.suggestions;

import dev.sheaf.curator.hierarchy.HierarchyView;
import dev.sheaf.curator.suggestions.SuggestionsViewModel.ParentRow;
import dev.sheaf.curator.suggestions.SuggestionsViewModel.Row;
import java.util.Objects;
import javafx.geometry.Insets;
import javafx.geometry.Orientation;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.SplitPane;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The merge suggestions panel. Keys in the list: Enter or M merges, A keeps apart, D dismisses,
 * 1–9 picks the preferred label. Binds to a {@link SuggestionsViewModel}.
 */
public final class SuggestionsView extends BorderPane {
    static final String KEYS = "Enter or M merge · 1–9 pick the preferred label · A keep apart · D dismiss";
    private final ListView<Row> list = new ListView<>();
    private final ListView<ParentRow> parents = new ListView<>();

    public SuggestionsView(SuggestionsViewModel vm) {
        Objects.requireNonNull(vm);
        getStyleClass().add("suggestions-view");
        getStylesheets().add(Objects.requireNonNull(SuggestionsView.class.getResource(HierarchyView.STYLESHEET)).toExternalForm());

        Label scope = new Label();
        scope.setId("suggestions-scope");
        scope.getStyleClass().add("panel-title");
        scope.textProperty().bind(vm.scopeProperty());
        scope.setWrapText(true);
        BorderPane head = new BorderPane(scope);
        BorderPane.setAlignment(scope, Pos.CENTER_LEFT);
        head.setPadding(new Insets(4, 6, 4, 6));

        follow(list, "suggestions-list", vm.rows(), vm.selectedProperty(), "No merge suggestions here",
                r -> new String[] {r.members(), "score " + r.score() + " · " + r.kinds(), r.reason()});
        list.setOnKeyPressed(e -> {
            KeyCode k = e.getCode();
            if (e.isShortcutDown() || e.isAltDown()) {
                return;
            }
            boolean done = true;
            if (k == KeyCode.ENTER || k == KeyCode.M) {
                vm.accept();
            } else if (k == KeyCode.A) {
                vm.keepApart();
            } else if (k == KeyCode.D) {
                vm.dismiss();
            } else if (k.isDigitKey() && k != KeyCode.DIGIT0 && k != KeyCode.NUMPAD0) {
                vm.pick(Integer.parseInt(k.getChar().isEmpty() ? "0" : k.getChar().substring(k.getChar().length() - 1)) - 1);
            } else {
                done = false;
            }
            if (done) {
                e.consume();
            }
        });

        ChoiceBox<String> pref = new ChoiceBox<>(vm.preferredChoices());
        pref.setId("suggestions-preferred");
        pref.valueProperty().bindBidirectional(vm.preferredProperty());
        pref.setTooltip(new Tooltip("The label the merged concept is called by; the others become alternative labels (1–9)"));
        Button merge = new Button("Merge");
        merge.setId("suggestions-merge");
        merge.setTooltip(new Tooltip("Merge the members into one concept (Enter or M)"));
        merge.setOnAction(e -> vm.accept());
        Button apart = new Button("Keep apart");
        apart.setTooltip(new Tooltip("They are different things: link the two concepts as related so this does not come back (A)"));
        apart.setOnAction(e -> vm.keepApart());
        Button dismiss = new Button("Dismiss");
        dismiss.setTooltip(new Tooltip("Not a synonym and not worth keeping: the members that are not concepts are dropped, "
                + "with the reason (D). Undo brings them back."));
        dismiss.setOnAction(e -> vm.dismiss());
        for (Button b : new Button[] {merge, apart, dismiss}) {
            b.disableProperty().bind(vm.selectedProperty().isNull());
            b.setFocusTraversable(false);
        }
        Label prefLabel = new Label("Preferred label");
        HBox prefRow = new HBox(6, prefLabel, pref);
        prefRow.setAlignment(Pos.CENTER_LEFT);
        HBox.setHgrow(pref, Priority.ALWAYS);
        FlowPane buttons = new FlowPane(6, 4, merge, apart, dismiss);
        Label message = new Label();
        message.setId("suggestions-message");
        message.getStyleClass().add("status-message");
        message.setWrapText(true);
        message.textProperty().bind(vm.messageProperty());
        Label hint = new Label(KEYS);
        hint.getStyleClass().add("key-hint");
        hint.setWrapText(true);
        VBox answers = new VBox(6, prefRow, buttons, hint);
        answers.setPadding(new Insets(6));
        BorderPane merges = new BorderPane(list, head, null, answers, null);
        VBox bottom = new VBox(4, message);
        bottom.setPadding(new Insets(6));
        SplitPane split = new SplitPane(merges, parentsPane(vm));
        split.setOrientation(Orientation.VERTICAL);
        split.setDividerPositions(0.5);
        setTop(null);
        setCenter(split);
        setBottom(bottom);
    }

    /** The parent suggestions: "zipper ⊃ two way zipper"; Enter moves the child under the parent, Shift+Enter puts it also there. */
    private Region parentsPane(SuggestionsViewModel vm) {
        Label scope = new Label();
        scope.setId("parents-scope");
        scope.getStyleClass().add("panel-title");
        scope.textProperty().bind(vm.parentScopeProperty());
        scope.setWrapText(true);
        follow(parents, "parents-list", vm.parents(), vm.selectedParentProperty(), "No parent suggestions here",
                r -> new String[] {r.text(), r.meta(), r.reason()});
        parents.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER && !e.isShortcutDown() && !e.isAltDown()) {
                vm.putUnder(e.isShiftDown());
                e.consume();
            }
        });
        Button under = new Button("Put under");
        under.setId("parents-put-under");
        under.setTooltip(new Tooltip("Move the child under the parent (Enter)"));
        under.setOnAction(e -> vm.putUnder(false));
        Button also = new Button("Also under");
        also.setTooltip(new Tooltip("Keep the child where it is and put it under the parent as well (Shift+Enter)"));
        also.setOnAction(e -> vm.putUnder(true));
        for (Button b : new Button[] {under, also}) {
            b.disableProperty().bind(vm.selectedParentProperty().isNull());
            b.setFocusTraversable(false);
        }
        Label keys = new Label("Enter put under · Shift+Enter also under");
        keys.getStyleClass().add("key-hint");
        keys.setWrapText(true);
        under.setMinWidth(Region.USE_PREF_SIZE);
        also.setMinWidth(Region.USE_PREF_SIZE);
        HBox buttons = new HBox(6, under, also);
        VBox row = new VBox(6, buttons, keys);
        row.setPadding(new Insets(6));
        BorderPane head = new BorderPane(scope);
        BorderPane.setAlignment(scope, Pos.CENTER_LEFT);
        head.setPadding(new Insets(4, 6, 4, 6));
        return new BorderPane(parents, head, null, row, null);
    }

    public ListView<ParentRow> parentList() {
        return parents;
    }

    /** Fills {@code l} from {@code rows} and keeps its selection and the view-model's {@code selected} the same, both ways. */
    private static <T> void follow(ListView<T> l, String id, javafx.collections.ObservableList<T> rows,
                                   javafx.beans.property.ObjectProperty<T> selected, String none,
                                   java.util.function.Function<T, String[]> lines) {
        l.setId(id);
        l.setItems(rows);
        l.setPlaceholder(new Label(none));
        l.setCellFactory(x -> new ThreeLineCell<>(lines));
        l.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null && b != selected.get()) {
                selected.set(b);
            }
        });
        selected.addListener((o, a, b) -> {
            if (b != null && l.getSelectionModel().getSelectedItem() != b) {
                l.getSelectionModel().select(b);
            }
        });
    }

    /** A suggestion as three lines: what (bold), the score line, the reason (both wrapped to the cell). */
    private static final class ThreeLineCell<T> extends ListCell<T> {
        private final java.util.function.Function<T, String[]> lines;
        private final Label what = new Label();
        private final Label meta = new Label();
        private final Label reason = new Label();
        private final VBox box = new VBox(2, what, meta, reason);

        ThreeLineCell(java.util.function.Function<T, String[]> lines) {
            this.lines = lines;
            what.setStyle("-fx-font-weight: bold;");
            meta.getStyleClass().add("score");
            meta.setWrapText(true);
            reason.getStyleClass().add("reason");
            reason.setWrapText(true);
            box.setMinWidth(0);
            meta.maxWidthProperty().bind(widthProperty().subtract(24));
            reason.maxWidthProperty().bind(widthProperty().subtract(24));
            setPrefWidth(0);
        }

        @Override
        protected void updateItem(T r, boolean empty) {
            super.updateItem(r, empty);
            setText(null);
            if (empty || r == null) {
                setGraphic(null);
                return;
            }
            String[] l = lines.apply(r);
            what.setText(l[0]);
            meta.setText(l[1]);
            reason.setText(l[2]);
            setGraphic(box);
        }
    }
}
