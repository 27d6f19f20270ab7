package dev.sheaf.curator.figures;

import dev.sheaf.curator.session.Caution;
import dev.sheaf.curator.hierarchy.HierarchyView;
import java.util.Locale;
import java.util.Objects;
import javafx.geometry.Insets;
import javafx.scene.control.Label;
import javafx.scene.control.ProgressIndicator;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.VBox;

/** The live figures of the selected concept. Binds to a {@link FiguresViewModel}. */
public final class FiguresView extends VBox {
    private final Label title = new Label();
    private final Label covered = new Label();
    private final Label perLabel = new Label();
    private final Label fill = new Label();
    private final Label byCategory = new Label();
    private final Label flags = new Label();
    private final Label caution = new Label(Caution.REGULATED_CLAIM);

    public FiguresView(FiguresViewModel vm) {
        Objects.requireNonNull(vm);
        getStyleClass().add("figures-view");
        getStylesheets().add(Objects.requireNonNull(FiguresView.class.getResource(HierarchyView.STYLESHEET)).toExternalForm());
        setSpacing(6);
        setPadding(new Insets(8));
        title.getStyleClass().add("panel-title");
        covered.setId("figure-covered");
        fill.setId("figure-fill");
        flags.setId("figure-flags");
        for (Label l : new Label[] {covered, perLabel, fill, byCategory, flags}) {
            l.setWrapText(true);
        }
        perLabel.getStyleClass().add("key-hint");
        byCategory.getStyleClass().add("key-hint");
        caution.getStyleClass().add("caution");
        caution.setWrapText(true);

        ProgressIndicator busy = new ProgressIndicator();
        busy.setPrefSize(16, 16);
        busy.visibleProperty().bind(vm.runningProperty());
        Label status = new Label();
        status.getStyleClass().add("status-message");
        status.textProperty().bind(vm.statusProperty());
        status.setWrapText(true);

        GridPane grid = new GridPane();
        grid.setHgap(8);
        grid.setVgap(4);
        grid.addRow(0, name("Listings covered"), covered);
        grid.add(perLabel, 1, 1);
        grid.addRow(2, name("Facet fill rate"), fill);
        grid.add(byCategory, 1, 3);
        grid.addRow(4, name("Flags"), flags);

        getChildren().addAll(new HBox(6, title, busy), caution, grid, status);
        vm.figuresProperty().addListener((o, a, f) -> show(f));
        show(vm.figuresProperty().get());
    }

    private static Label name(String text) {
        Label l = new Label(text);
        l.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        l.setAlignment(javafx.geometry.Pos.TOP_LEFT);
        javafx.scene.layout.GridPane.setValignment(l, javafx.geometry.VPos.TOP);
        return l;
    }

    private void show(ConceptFigures f) {
        boolean any = f != null;
        title.setText(any ? "Figures: " + f.label() : "Figures");
        caution.setVisible(any && f.regulated());
        caution.setManaged(caution.isVisible());
        if (!any) {
            covered.setText("");
            perLabel.setText("");
            fill.setText("");
            byCategory.setText("");
            flags.setText("");
            return;
        }
        covered.setText(FiguresViewModel.coveredText(f));
        StringBuilder pl = new StringBuilder();
        for (ConceptFigures.LabelCount c : f.perLabel()) {
            pl.append(pl.length() == 0 ? "" : " · ").append('"').append(c.label()).append("\" ")
                    .append(String.format(Locale.ROOT, "%,d", c.listings()));
        }
        perLabel.setText(pl.toString());
        fill.setText(FiguresViewModel.fillText(f) + (f.facetLabel().isEmpty() ? "" : " — facet " + f.facetLabel()));
        StringBuilder bc = new StringBuilder();
        for (ConceptFigures.CategoryFill c : f.byCategory()) {
            bc.append(bc.length() == 0 ? "" : " · ").append(c.category().isEmpty() ? "(no category)" : c.category())
                    .append(String.format(Locale.ROOT, " %.0f%%", 100 * c.share()));
        }
        byCategory.setText(bc.toString());
        if (f.flagsSource().isEmpty()) {
            flags.setText("no audit output yet (run sheaf audit to see flags)");
        } else {
            flags.setText(f.flags().isEmpty() ? "none in the last audit" : String.join("\n", f.flags()));
        }
    }
}
