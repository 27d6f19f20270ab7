package dev.sheaf.curator.concepts;

import dev.sheaf.curator.session.CuratorSession;
import javafx.beans.value.ObservableValue;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.TextField;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The searchable concept list: a filter box over the concepts; selecting one selects it for the
 * whole window. Keys in the box: Down goes to the matches, Enter picks the first match, Esc
 * clears. As a finder above the tree ({@link #finder}) the matches show only while something is
 * typed, so the tree keeps the room.
 */
public final class ConceptListView {
    private final BorderPane root = new BorderPane();
    private final ConceptListViewModel vm = new ConceptListViewModel();
    private Runnable onChosen = () -> { };

    /** The full list (the centre of the window when no tree is installed). */
    public ConceptListView(ObservableValue<CuratorSession> session) {
        this(session, false);
    }

    /** A finder: the matches show only while the box has text, at most {@code 220} pixels high. */
    public static ConceptListView finder(ObservableValue<CuratorSession> session) {
        return new ConceptListView(session, true);
    }

    /** What to do after Enter picked a concept (the window moves the focus to the tree). */
    public void setOnChosen(Runnable r) {
        onChosen = r == null ? () -> { } : r;
    }

    private ConceptListView(ObservableValue<CuratorSession> session, boolean finder) {
        session.addListener((o, a, b) -> vm.setSession(b));
        vm.setSession(session.getValue());
        Label title = new Label("Vocabulary");
        title.getStyleClass().add("pane-title");
        TextField filter = new TextField();
        filter.setId("concept-filter");
        filter.setPromptText("Find a concept");
        filter.textProperty().bindBidirectional(vm.filterProperty());
        VBox top = new VBox(6, title, filter);
        top.getStyleClass().add("filter-bar");
        root.setTop(top);
        ListView<ConceptListViewModel.Item> list = new ListView<>(vm.items());
        list.setId("concept-list");
        list.setFixedCellSize(44);
        list.setCellFactory(l -> new ListCell<>() {
            @Override
            protected void updateItem(ConceptListViewModel.Item i, boolean empty) {
                super.updateItem(i, empty);
                getStyleClass().remove("facet-item");
                if (empty || i == null) {
                    setText(null);
                    setGraphic(null);
                    return;
                }
                Label name = new Label(i.label());
                name.getStyleClass().add(i.facet() ? "concept-facet" : "concept-name");
                Label ctx = new Label(i.context());
                ctx.getStyleClass().add("muted");
                VBox b = new VBox(0, name, ctx);
                setText(null);
                setGraphic(b);
            }
        });
        list.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> vm.select(b));
        filter.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.DOWN && !list.getItems().isEmpty()) {
                list.requestFocus();
                list.getSelectionModel().select(0);
                e.consume();
            } else if (e.getCode() == KeyCode.ENTER && !list.getItems().isEmpty()) {
                list.getSelectionModel().select(0);
                vm.select(list.getItems().get(0));
                onChosen.run();
                e.consume();
            } else if (e.getCode() == KeyCode.ESCAPE) {
                filter.clear();
                e.consume();
            }
        });
        list.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER && list.getSelectionModel().getSelectedItem() != null) {
                vm.select(list.getSelectionModel().getSelectedItem());
                onChosen.run();
                e.consume();
            } else if (e.getCode() == KeyCode.ESCAPE) {
                filter.clear();
                filter.requestFocus();
                e.consume();
            }
        });
        Label empty = new Label("No concepts yet: keep terms from the harvest (K).");
        empty.getStyleClass().add("muted");
        empty.setWrapText(true);
        list.setPlaceholder(empty);
        root.setCenter(list);
        Label summary = new Label();
        summary.textProperty().bind(vm.summaryProperty());
        summary.getStyleClass().add("summary");
        summary.setPadding(new Insets(4, 10, 4, 10));
        root.setBottom(summary);
        if (finder) {
            filter.setPromptText("Find a concept (Ctrl+G): type, then Enter");
            var searching = filter.textProperty().isNotEmpty();
            list.visibleProperty().bind(searching);
            list.managedProperty().bind(searching);
            summary.visibleProperty().bind(searching);
            summary.managedProperty().bind(searching);
            list.setMaxHeight(220);
            list.setPrefHeight(220);
        }
        root.getStyleClass().add("concept-pane");
    }

    /** Puts the focus in the filter box. */
    public void focusFilter() {
        root.lookup("#concept-filter").requestFocus();
    }

    public Region node() {
        return root;
    }
}
