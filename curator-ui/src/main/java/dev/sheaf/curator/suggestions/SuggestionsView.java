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

        list.setId("suggestions-list");
        list.setItems(vm.rows());
        list.setPlaceholder(new Label("No merge suggestions here"));
        list.setCellFactory(l -> new SuggestionCell());
        list.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null && b != vm.selectedProperty().get()) {
                vm.selectedProperty().set(b);
            }
        });
        vm.selectedProperty().addListener((o, a, b) -> {
            if (b != null && list.getSelectionModel().getSelectedItem() != b) {
                list.getSelectionModel().select(b);
            }
        });
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
        parents.setId("parents-list");
        parents.setItems(vm.parents());
        parents.setPlaceholder(new Label("No parent suggestions here"));
        parents.setCellFactory(l -> new ParentCell());
        parents.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null && b != vm.selectedParentProperty().get()) {
                vm.selectedParentProperty().set(b);
            }
        });
        vm.selectedParentProperty().addListener((o, a, b) -> {
            if (b != null && parents.getSelectionModel().getSelectedItem() != b) {
                parents.getSelectionModel().select(b);
            }
        });
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

    /** Parent ⊃ child in bold, then the score, kind and state, then the reason. */
    private static final class ParentCell extends ListCell<ParentRow> {
        private final Label text = new Label();
        private final Label meta = new Label();
        private final Label reason = new Label();
        private final VBox box = new VBox(2, text, meta, reason);

        ParentCell() {
            text.setStyle("-fx-font-weight: bold;");
            meta.getStyleClass().add("score");
            meta.setWrapText(true);
            reason.getStyleClass().add("reason");
            reason.setWrapText(true);
            box.setMinWidth(0);
            setPrefWidth(0);
        }

        @Override
        protected void updateItem(ParentRow r, boolean empty) {
            super.updateItem(r, empty);
            if (empty || r == null) {
                setGraphic(null);
                setText(null);
                return;
            }
            text.setText(r.text());
            meta.setText(r.meta());
            reason.setText(r.reason());
            reason.maxWidthProperty().bind(widthProperty().subtract(24));
            setText(null);
            setGraphic(box);
        }
    }

    public ListView<Row> list() {
        return list;
    }

    /** Members in bold, then the score and kinds, then the reason. */
    private static final class SuggestionCell extends ListCell<Row> {
        private final Label members = new Label();
        private final Label meta = new Label();
        private final Label reason = new Label();
        private final VBox box = new VBox(2, members, meta, reason);

        SuggestionCell() {
            members.setStyle("-fx-font-weight: bold;");
            meta.getStyleClass().add("score");
            reason.getStyleClass().add("reason");
            reason.setWrapText(true);
            box.setMinWidth(0);
            reason.setMaxWidth(Region.USE_PREF_SIZE);
            setPrefWidth(0);
        }

        @Override
        protected void updateItem(Row r, boolean empty) {
            super.updateItem(r, empty);
            if (empty || r == null) {
                setGraphic(null);
                setText(null);
                return;
            }
            members.setText(r.members());
            meta.setText("score " + r.score() + " · " + r.kinds());
            reason.setText(r.reason());
            reason.maxWidthProperty().bind(widthProperty().subtract(24));
            meta.maxWidthProperty().bind(widthProperty().subtract(24));
            setText(null);
            setGraphic(box);
        }
    }
}
