package dev.sheaf.curator.hierarchy;

import dev.sheaf.vocab.ValueKind;
import java.util.Objects;
import javafx.collections.FXCollections;
import javafx.geometry.Insets;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.CheckBox;
import javafx.scene.control.ListView;
import javafx.scene.input.KeyCode;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.control.ChoiceBox;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;

/** The facet properties form beside the tree, with the regulated-claim notice. Binds to a {@link FacetFormViewModel}. */
public final class FacetFormView extends VBox {

    public FacetFormView(FacetFormViewModel vm) {
        Objects.requireNonNull(vm);
        getStyleClass().add("facet-form");
        getStylesheets().add(Objects.requireNonNull(FacetFormView.class.getResource(HierarchyView.STYLESHEET)).toExternalForm());
        setSpacing(8);
        setPadding(new Insets(8));

        Label title = new Label();
        title.getStyleClass().add("panel-title");
        title.textProperty().bind(vm.titleProperty());

        Label caution = new Label();
        caution.setId("claim-caution");
        caution.getStyleClass().add("caution");
        caution.setWrapText(true);
        caution.setMinHeight(javafx.scene.layout.Region.USE_PREF_SIZE);
        caution.textProperty().bind(vm.cautionProperty());
        caution.visibleProperty().bind(vm.cautionProperty().isNotEmpty());
        caution.managedProperty().bind(caution.visibleProperty());

        ChoiceBox<ValueKind> kind = new ChoiceBox<>(FXCollections.observableArrayList(vm.valueKinds()));
        kind.setId("facet-kind");
        kind.setConverter(new StringConverter<>() {
            @Override
            public String toString(ValueKind k) {
                return k == null ? "" : switch (k) {
                    case TERM -> "terms (one of its concepts)";
                    case NUMBER -> "numbers with a unit";
                    case YES_NO -> "yes or no";
                };
            }

            @Override
            public ValueKind fromString(String s) {
                return null;
            }
        });
        kind.valueProperty().bindBidirectional(vm.valueKindProperty());

        CheckBox multi = new CheckBox("A listing may carry several values");
        multi.setId("facet-multi");
        multi.selectedProperty().bindBidirectional(vm.multiValuedProperty());

        TextField cats = new TextField();
        cats.setId("facet-categories");
        cats.setPromptText("every category");
        cats.textProperty().bindBidirectional(vm.categoriesProperty());
        cats.setOnAction(e -> vm.applyText());
        cats.focusedProperty().addListener((o, a, b) -> {
            if (!b) {
                vm.applyText();
            }
        });

        TextField unit = new TextField();
        unit.setId("facet-unit");
        unit.setPromptText("e.g. L, kg, mm");
        unit.textProperty().bindBidirectional(vm.unitProperty());
        unit.setOnAction(e -> vm.applyText());
        unit.focusedProperty().addListener((o, a, b) -> {
            if (!b) {
                vm.applyText();
            }
        });
        Label unitLabel = new Label("Unit");
        kind.setTooltip(new javafx.scene.control.Tooltip("What kind of value the facet takes"));
        unit.visibleProperty().bind(vm.valueKindProperty().isEqualTo(ValueKind.NUMBER));
        unitLabel.visibleProperty().bind(unit.visibleProperty());

        CheckBox claim = new CheckBox("Regulated or safety claim");
        claim.setTooltip(new javafx.scene.control.Tooltip("Values such as waterproof ratings, flame resistance, UV protection, "
                + "child safety or fibre content: they need human and compliance review before they ship"));
        claim.setId("facet-regulated");
        claim.setWrapText(true);
        claim.selectedProperty().bindBidirectional(vm.regulatedProperty());

        GridPane grid = new GridPane();
        grid.setHgap(8);
        grid.setVgap(6);
        Label kindLabel = new Label("Values");
        Label catsLabel = new Label("Categories");
        for (Label l : new Label[] {kindLabel, catsLabel, unitLabel}) {
            l.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        }
        kind.setMaxWidth(Double.MAX_VALUE);
        javafx.scene.layout.GridPane.setHgrow(kind, javafx.scene.layout.Priority.ALWAYS);
        javafx.scene.layout.GridPane.setHgrow(cats, javafx.scene.layout.Priority.ALWAYS);
        grid.addRow(0, kindLabel, kind);
        grid.add(multi, 0, 1, 2, 1);
        grid.addRow(2, catsLabel, cats);
        grid.addRow(3, unitLabel, unit);
        grid.add(claim, 0, 4, 2, 1);
        unitLabel.managedProperty().bind(unit.visibleProperty());
        unit.managedProperty().bind(unit.visibleProperty());
        grid.disableProperty().bind(vm.availableProperty().not());

        VBox ranges = rangesBox(vm);

        Label hint = new Label("Categories: comma-separated; empty means every category; Enter applies.");
        hint.getStyleClass().add("key-hint");
        hint.setWrapText(true);

        Label message = new Label();
        message.getStyleClass().add("status-message");
        message.setWrapText(true);
        message.textProperty().bind(vm.messageProperty());

        getChildren().addAll(title, caution, grid, ranges, hint, message);
    }

    /** The named ranges of a number facet: the list, Delete takes the selected one out; name, from, to and Enter add one. */
    private static VBox rangesBox(FacetFormViewModel vm) {
        Label head = new Label("Ranges (from inclusive, to exclusive; leave a side empty for open)");
        head.setWrapText(true);
        head.getStyleClass().add("form-subtitle");
        ListView<String> list = new ListView<>(vm.ranges());
        list.setId("facet-ranges");
        list.setPrefHeight(120);
        list.setPlaceholder(new Label("No ranges yet: add one below"));
        list.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.DELETE || e.getCode() == KeyCode.BACK_SPACE) {
                vm.removeRange(list.getSelectionModel().getSelectedIndex());
                e.consume();
            }
        });
        TextField name = field("facet-range-name", "name, e.g. light", vm.rangeNameProperty());
        TextField from = field("facet-range-from", "from", vm.rangeFromProperty());
        TextField to = field("facet-range-to", "to", vm.rangeToProperty());
        from.setPrefColumnCount(5);
        to.setPrefColumnCount(5);
        HBox.setHgrow(name, Priority.ALWAYS);
        Button add = new Button("Add range");
        add.setId("facet-range-add");
        add.setOnAction(e -> vm.addRange());
        for (TextField f : new TextField[] {name, from, to}) {
            f.setOnAction(e -> {
                if (vm.addRange()) {
                    name.requestFocus();
                }
            });
        }
        Button remove = new Button("Remove");
        remove.setOnAction(e -> vm.removeRange(list.getSelectionModel().getSelectedIndex()));
        remove.disableProperty().bind(list.getSelectionModel().selectedItemProperty().isNull());
        HBox row = new HBox(6, name, from, to, add);
        row.setAlignment(Pos.CENTER_LEFT);
        HBox under = new HBox(6, remove, new Label("(or Delete in the list)"));
        under.setAlignment(Pos.CENTER_LEFT);
        VBox box = new VBox(6, head, list, row, under);
        box.setId("facet-ranges-box");
        box.visibleProperty().bind(vm.valueKindProperty().isEqualTo(ValueKind.NUMBER).and(vm.availableProperty()));
        box.managedProperty().bind(box.visibleProperty());
        return box;
    }

    private static TextField field(String id, String prompt, javafx.beans.property.StringProperty p) {
        TextField f = new TextField();
        f.setId(id);
        f.setPromptText(prompt);
        f.textProperty().bindBidirectional(p);
        return f;
    }
}
