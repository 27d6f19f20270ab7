package dev.sheaf.curator.concepts;

import dev.sheaf.curator.session.CuratorSession;
import javafx.beans.value.ObservableValue;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.TextField;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/** The searchable concept list: a filter box over the concepts; selecting one selects it for the whole window. */
public final class ConceptListView {
    private final BorderPane root = new BorderPane();
    private final ConceptListViewModel vm = new ConceptListViewModel();

    public ConceptListView(ObservableValue<CuratorSession> session) {
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
        root.getStyleClass().add("concept-pane");
    }

    public Region node() {
        return root;
    }
}
