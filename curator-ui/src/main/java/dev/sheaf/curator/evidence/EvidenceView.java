package dev.sheaf.curator.evidence;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.EvidenceLine;
import javafx.geometry.Insets;
import javafx.scene.control.Button;
import javafx.scene.control.ButtonType;
import javafx.scene.control.Dialog;
import javafx.scene.control.Label;
import javafx.scene.control.ListCell;
import javafx.scene.control.ListView;
import javafx.scene.control.ScrollPane;
import javafx.scene.input.KeyCode;
import javafx.scene.input.MouseButton;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/**
 * The evidence panel: keyword-in-context lines (the term stands out between its left and right
 * context; listing, source and field below), and the listing behind a line in a dialog (Enter,
 * double-click or the button). Binds to an {@link EvidenceViewModel}.
 */
public final class EvidenceView {
    private final EvidenceViewModel vm;
    private final BorderPane root = new BorderPane();
    private final ListView<EvidenceLine> list = new ListView<>();

    public EvidenceView(EvidenceViewModel vm) {
        this.vm = vm;
        root.getStyleClass().add("evidence-pane");
        Label heading = new Label();
        heading.textProperty().bind(vm.headingProperty());
        heading.getStyleClass().add("pane-title");
        heading.setWrapText(true);
        Label note = new Label();
        note.textProperty().bind(vm.noteProperty());
        note.getStyleClass().add("muted");
        note.setWrapText(true);
        VBox top = new VBox(2, heading, note);
        top.setPadding(new Insets(8, 10, 6, 10));
        root.setTop(top);
        list.setId("evidence-list");
        list.setItems(vm.lines());
        list.setCellFactory(l -> new LineCell());
        Label empty = new Label("No evidence lines.");
        empty.getStyleClass().add("muted");
        list.setPlaceholder(empty);
        list.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.ENTER) {
                vm.openListing(list.getSelectionModel().getSelectedItem());
                e.consume();
            }
        });
        list.setOnMouseClicked(e -> {
            if (e.getButton() == MouseButton.PRIMARY && e.getClickCount() == 2) {
                vm.openListing(list.getSelectionModel().getSelectedItem());
            }
        });
        root.setCenter(list);
        Button open = new Button("Open the listing");
        open.setId("open-listing");
        open.disableProperty().bind(list.getSelectionModel().selectedItemProperty().isNull());
        open.setOnAction(e -> vm.openListing(list.getSelectionModel().getSelectedItem()));
        Region gap = new Region();
        HBox.setHgrow(gap, Priority.ALWAYS);
        Label hint = new Label("Enter or double-click opens it");
        hint.getStyleClass().add("keys-hint");
        HBox bottom = new HBox(8, hint, gap, open);
        bottom.getStyleClass().add("pane-footer");
        root.setBottom(bottom);
        vm.shownListingProperty().addListener((o, a, b) -> {
            if (b != null) {
                showListing(b);
            }
        });
    }

    public Region node() {
        return root;
    }

    public ListView<EvidenceLine> list() {
        return list;
    }

    /**
     * One line in keyword-in-context layout: the left context right-aligned and cut at its start,
     * the match in a column of its own, the right context cut at its end, so matches line up and
     * the eye runs down one column; where it was found below.
     */
    private static final class LineCell extends ListCell<EvidenceLine> {
        private final Label left = new Label();
        private final Label match = new Label();
        private final Label right = new Label();
        private final Label where = new Label();
        private final VBox box;

        LineCell() {
            setPrefWidth(0);
            left.getStyleClass().add("kwic-context");
            left.setTextOverrun(javafx.scene.control.OverrunStyle.LEADING_ELLIPSIS);
            left.setAlignment(javafx.geometry.Pos.CENTER_RIGHT);
            match.getStyleClass().add("kwic-match");
            match.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
            right.getStyleClass().add("kwic-context");
            right.setMinWidth(0);
            HBox line = new HBox(5, left, match, right);
            line.setAlignment(javafx.geometry.Pos.CENTER_LEFT);
            left.prefWidthProperty().bind(widthProperty().multiply(0.36));
            left.maxWidthProperty().bind(left.prefWidthProperty());
            left.minWidthProperty().bind(left.prefWidthProperty());
            right.setMaxWidth(Double.MAX_VALUE);
            HBox.setHgrow(right, Priority.ALWAYS);
            where.getStyleClass().add("kwic-source");
            where.setMinWidth(0);
            box = new VBox(1, line, where);
        }

        @Override
        protected void updateItem(EvidenceLine e, boolean empty) {
            super.updateItem(e, empty);
            setText(null);
            if (empty || e == null) {
                setGraphic(null);
                return;
            }
            left.setText(e.left());
            match.setText(e.match());
            right.setText(e.right());
            where.setText(e.listingId() + " · " + e.field() + (e.key().isEmpty() ? "" : " \"" + e.key() + "\"") + " · "
                    + e.source() + (e.locator().isEmpty() ? "" : ", " + e.locator()));
            setGraphic(box);
        }
    }

    private void showListing(Listing l) {
        Dialog<Void> d = new Dialog<>();
        d.setTitle("Listing " + l.id());
        d.setHeaderText(l.title().isEmpty() ? l.id() : l.title());
        GridPane g = new GridPane();
        g.setHgap(12);
        g.setVgap(6);
        g.getStyleClass().add("listing-fields");
        int row = 0;
        g.addRow(row++, name("Listing"), value(l.id()));
        g.addRow(row++, name("Category"), value(l.category().isEmpty() ? "—" : l.category()));
        g.addRow(row++, name("Source"), value(l.source() + (l.locator().isEmpty() ? "" : ", " + l.locator())));
        for (Field f : l.fields()) {
            g.addRow(row++, name(f.key().isEmpty() ? f.kind().label() : f.kind().label() + " · " + f.key()), value(f.text()));
        }
        ScrollPane sp = new ScrollPane(g);
        sp.setFitToWidth(true);
        sp.setPrefSize(640, 420);
        d.getDialogPane().setContent(sp);
        d.getDialogPane().getButtonTypes().add(ButtonType.CLOSE);
        d.getDialogPane().getStylesheets().addAll(root.getStylesheets());
        if (root.getScene() != null) {
            d.initOwner(root.getScene().getWindow());
            d.getDialogPane().getStylesheets().addAll(root.getScene().getRoot().getStylesheets());
        }
        d.setOnHidden(e -> vm.shownListingProperty().set(null));
        d.show();
    }

    private static Label name(String s) {
        Label l = new Label(s);
        l.getStyleClass().add("field-name");
        l.setMinWidth(110);
        return l;
    }

    private static Label value(String s) {
        Label l = new Label(s);
        l.setWrapText(true);
        l.setMaxWidth(480);
        return l;
    }
}
