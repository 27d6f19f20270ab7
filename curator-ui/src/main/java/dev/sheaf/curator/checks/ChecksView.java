package dev.sheaf.curator.checks;

import dev.sheaf.curator.checks.ChecksViewModel.CheckRow;
import java.util.Objects;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableRow;
import javafx.scene.control.TableView;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.BorderPane;

/** The checks list: Enter or a double click on a row shows its concept in the tree. Binds to a {@link ChecksViewModel}. */
public final class ChecksView extends BorderPane {
    private final TableView<CheckRow> table = new TableView<>();

    public ChecksView(ChecksViewModel vm) {
        Objects.requireNonNull(vm);
        getStyleClass().add("checks-view");
        getStylesheets().add(Objects.requireNonNull(ChecksView.class.getResource("/dev/sheaf/curator/curator-structure.css")).toExternalForm());
        table.setId("checks-table");
        table.setItems(vm.rows());
        table.setPlaceholder(new Label("No findings"));
        TableColumn<CheckRow, String> sev = column("Severity", 66, CheckRow::severityWord);
        sev.setCellFactory(c -> new TableCell<>() {
            @Override
            protected void updateItem(String s, boolean empty) {
                super.updateItem(s, empty);
                getStyleClass().removeAll("sev-error", "sev-warning", "sev-note");
                setText(empty ? null : s);
                if (!empty && s != null) {
                    getStyleClass().add("sev-" + s);
                }
            }
        });
        TableColumn<CheckRow, String> rule = column("Rule", 130, CheckRow::rule);
        TableColumn<CheckRow, String> msg = column("Message", 420, CheckRow::message);
        // messages name concepts by label and id: wrap them rather than cut them off
        msg.setCellFactory(c -> new TableCell<>() {
            private final javafx.scene.text.Text text = new javafx.scene.text.Text();

            {
                text.wrappingWidthProperty().bind(msg.widthProperty().subtract(12));
                text.getStyleClass().add("check-message");
            }

            @Override
            protected void updateItem(String s, boolean empty) {
                super.updateItem(s, empty);
                setText(null);
                text.setText(empty || s == null ? "" : s);
                setGraphic(empty ? null : text);
            }
        });
        sev.setMinWidth(62);
        rule.setMinWidth(120);
        msg.setMinWidth(160);
        table.getColumns().add(sev);
        table.getColumns().add(rule);
        table.getColumns().add(msg);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        table.setRowFactory(t -> {
            TableRow<CheckRow> r = new TableRow<>() {
                @Override
                protected void updateItem(CheckRow item, boolean empty) {
                    super.updateItem(item, empty);
                    setTooltip(empty || item == null ? null
                            : new Tooltip(item.message() + (item.hint().isEmpty() ? "" : "\nHow to fix: " + item.hint())));
                }
            };
            r.setOnMouseClicked(e -> {
                if (e.getClickCount() == 2 && !r.isEmpty()) {
                    vm.jumpTo(r.getItem());
                }
            });
            return r;
        });
        table.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER) {
                vm.jumpTo(table.getSelectionModel().getSelectedItem());
                e.consume();
            }
        });
        Label summary = new Label();
        summary.setId("checks-summary");
        summary.getStyleClass().add("panel-title");
        summary.textProperty().bind(vm.summaryProperty());
        Label hint = new Label("Enter or double-click: show the concept in the tree");
        hint.getStyleClass().add("key-hint");
        javafx.scene.layout.VBox head = new javafx.scene.layout.VBox(2, summary, hint);
        head.setPadding(new Insets(4, 6, 4, 6));
        setTop(head);
        setCenter(table);
    }

    public TableView<CheckRow> table() {
        return table;
    }

    private static TableColumn<CheckRow, String> column(String title, double width, java.util.function.Function<CheckRow, String> f) {
        TableColumn<CheckRow, String> c = new TableColumn<>(title);
        c.setPrefWidth(width);
        c.setCellValueFactory(d -> new ReadOnlyStringWrapper(f.apply(d.getValue())));
        return c;
    }
}
