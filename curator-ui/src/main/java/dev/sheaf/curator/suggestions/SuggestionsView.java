package dev.sheaf.curator.suggestions;

import dev.sheaf.curator.hierarchy.HierarchyView;
import dev.sheaf.curator.suggestions.SuggestionsViewModel.Row;
import java.util.Objects;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
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
        setTop(head);

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
        setCenter(list);

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
        VBox bottom = new VBox(6, prefRow, buttons, message, hint);
        bottom.setPadding(new Insets(6));
        setBottom(bottom);
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
            setText(null);
            setGraphic(box);
        }
    }
}
