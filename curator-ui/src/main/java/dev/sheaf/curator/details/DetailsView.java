package dev.sheaf.curator.details;

import javafx.collections.ListChangeListener;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;

/** The details of the selection: heading, kind, the regulated-claim caution when it applies, and the facts. */
public final class DetailsView {
    private final ScrollPane root;

    public DetailsView(DetailsViewModel vm) {
        Label heading = new Label();
        heading.setId("details-heading");
        heading.textProperty().bind(vm.headingProperty());
        heading.getStyleClass().add("details-heading");
        heading.setWrapText(true);
        Label kind = new Label();
        kind.textProperty().bind(vm.kindProperty());
        kind.getStyleClass().add("muted");
        kind.setWrapText(true);
        Label caution = new Label();
        caution.setId("details-caution");
        caution.textProperty().bind(vm.cautionProperty());
        caution.getStyleClass().add("caution");
        caution.setWrapText(true);
        caution.visibleProperty().bind(vm.cautionProperty().isNotEmpty());
        caution.managedProperty().bind(caution.visibleProperty());
        GridPane facts = new GridPane();
        facts.setHgap(12);
        facts.setVgap(4);
        facts.getStyleClass().add("facts");
        vm.facts().addListener((ListChangeListener<DetailsViewModel.Fact>) c -> fill(facts, vm));
        fill(facts, vm);
        VBox box = new VBox(6, heading, kind, caution, facts);
        box.setPadding(new Insets(10));
        box.getStyleClass().add("details-pane");
        root = new ScrollPane(box);
        root.setFitToWidth(true);
        root.getStyleClass().add("details-scroll");
    }

    private static void fill(GridPane g, DetailsViewModel vm) {
        g.getChildren().clear();
        int row = 0;
        for (DetailsViewModel.Fact f : vm.facts()) {
            Label n = new Label(f.name());
            n.getStyleClass().add("field-name");
            n.setMinWidth(100);
            Label v = new Label(f.value());
            v.setWrapText(true);
            g.addRow(row++, n, v);
        }
    }

    public Region node() {
        return root;
    }
}
