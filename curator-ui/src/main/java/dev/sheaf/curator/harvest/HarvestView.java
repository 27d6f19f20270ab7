package dev.sheaf.curator.harvest;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import java.util.function.Predicate;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.value.ObservableValue;
import javafx.collections.FXCollections;
import javafx.geometry.Pos;
import javafx.scene.control.Button;
import javafx.scene.control.ComboBox;
import javafx.scene.control.Label;
import javafx.scene.control.SelectionMode;
import javafx.scene.control.TableCell;
import javafx.scene.control.TableColumn;
import javafx.scene.control.TableView;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.input.KeyCode;
import javafx.scene.input.KeyEvent;
import javafx.scene.layout.BorderPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.Region;
import javafx.scene.layout.VBox;
import javafx.util.StringConverter;

/**
 * The harvest pane: filters on top, the candidate table (virtualised; several rows may be
 * selected), counts and the keys below. K, Shift+K, D, P and U act on the selected rows while the
 * table has the focus. Binds to a {@link HarvestViewModel}.
 */
public final class HarvestView {
    private final HarvestViewModel vm;
    private final BorderPane root = new BorderPane();
    private final TableView<CandidateRow> table = new TableView<>();
    private final TextField text = new TextField();

    public HarvestView(HarvestViewModel vm) {
        this.vm = vm;
        root.getStyleClass().add("harvest-pane");
        root.setTop(filters());
        root.setCenter(buildTable());
        root.setBottom(footer());
    }

    public Region node() {
        return root;
    }

    public TableView<CandidateRow> table() {
        return table;
    }

    public void focusFilter() {
        text.requestFocus();
        text.selectAll();
    }

    public void focusTable() {
        table.requestFocus();
        if (table.getSelectionModel().getSelectedItem() == null && !table.getItems().isEmpty()) {
            table.getSelectionModel().select(0);
            table.getFocusModel().focus(0);
        }
    }

    private VBox filters() {
        Label title = new Label("Harvest");
        title.getStyleClass().add("pane-title");
        text.setId("harvest-filter");
        text.setPromptText("Filter terms (Ctrl+F)");
        text.textProperty().bindBidirectional(vm.textProperty());
        HBox.setHgrow(text, Priority.ALWAYS);
        text.setOnKeyPressed(e -> {
            if (e.getCode() == KeyCode.DOWN || e.getCode() == KeyCode.ENTER) {
                focusTable();
                e.consume();
            } else if (e.getCode() == KeyCode.ESCAPE) {
                text.clear();
                e.consume();
            }
        });
        ComboBox<StateFilter> state = new ComboBox<>(FXCollections.observableArrayList(StateFilter.values()));
        state.setId("harvest-state");
        state.valueProperty().bindBidirectional(vm.stateProperty());
        state.setTooltip(new Tooltip("Which decisions to show"));
        HBox row1 = new HBox(8, title, text, state);
        row1.setAlignment(Pos.CENTER_LEFT);

        ComboBox<Integer> words = new ComboBox<>(FXCollections.observableArrayList(0, 1, 2, 3, 4, 5));
        words.setId("harvest-words");
        words.setConverter(new StringConverter<>() {
            @Override
            public String toString(Integer n) {
                return n == null || n == 0 ? "Any length" : n == 1 ? "1 word" : n + " words";
            }

            @Override
            public Integer fromString(String s) {
                return 0;
            }
        });
        words.setValue(vm.wordsProperty().get());
        words.valueProperty().addListener((o, a, b) -> vm.wordsProperty().set(b == null ? 0 : b));
        vm.wordsProperty().addListener((o, a, b) -> words.setValue(b.intValue()));
        ComboBox<String> category = new ComboBox<>(vm.categories());
        category.setId("harvest-category");
        category.setConverter(new StringConverter<>() {
            @Override
            public String toString(String c) {
                return c == null || c.isEmpty() ? "Any category" : c;
            }

            @Override
            public String fromString(String s) {
                return s;
            }
        });
        category.valueProperty().bindBidirectional(vm.categoryProperty());
        category.setPrefWidth(130);
        TextField minScore = number("min score", vm.minScoreProperty().get());
        minScore.setId("harvest-min-score");
        minScore.textProperty().bindBidirectional(vm.minScoreProperty());
        TextField minCount = number("min count", vm.minFrequencyProperty().get());
        minCount.setId("harvest-min-count");
        minCount.textProperty().bindBidirectional(vm.minFrequencyProperty());
        Button clear = new Button("Clear");
        clear.setTooltip(new Tooltip("Clear the filters (the decision filter stays)"));
        clear.setOnAction(e -> vm.clearFilters());
        clear.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        HBox row2 = new HBox(8, words, category, minScore, minCount, clear);
        row2.setAlignment(Pos.CENTER_LEFT);
        VBox box = new VBox(6, row1, row2);
        box.getStyleClass().add("filter-bar");
        return box;
    }

    private static TextField number(String prompt, String value) {
        TextField f = new TextField(value);
        f.setPromptText(prompt);
        f.setPrefColumnCount(6);
        f.getStyleClass().add("number-field");
        return f;
    }

    private TableView<CandidateRow> buildTable() {
        table.setId("harvest-table");
        table.getSelectionModel().setSelectionMode(SelectionMode.MULTIPLE);
        // A fixed row height lets the virtual flow skip measuring rows when the filter changes the
        // item count: with 20,000 candidates that measuring, not the filter, was most of a keystroke.
        table.setFixedCellSize(24);
        table.setColumnResizePolicy(TableView.CONSTRAINED_RESIZE_POLICY_FLEX_LAST_COLUMN);
        // the n-gram length is a filter (Any length), not a column: the term, its counts and the decision need the width
        table.getColumns().add(column("#", 46, r -> r.rank(), Integer.class, false));
        TableColumn<CandidateRow, String> term = new TableColumn<>("Term");
        term.setCellValueFactory(c -> new ReadOnlyObjectWrapper<>(c.getValue().term()));
        term.setPrefWidth(170);
        term.setMinWidth(110);
        table.getColumns().add(term);
        table.getColumns().add(column("Count", 56, CandidateRow::frequency, Long.class, true));
        table.getColumns().add(column("Listings", 64, CandidateRow::df, Long.class, true));
        TableColumn<CandidateRow, Double> score = column("Score", 54, CandidateRow::score, Double.class, true);
        score.setCellFactory(c -> new TableCell<>() {
            @Override
            protected void updateItem(Double d, boolean empty) {
                super.updateItem(d, empty);
                setText(empty || d == null ? null : d.isNaN() ? "—" : d >= 100 ? String.format(Locale.ROOT, "%.0f", d) : String.format(Locale.ROOT, "%.2f", d));
            }
        });
        score.getStyleClass().add("numeric");
        table.getColumns().add(score);
        TableColumn<CandidateRow, String> cat = new TableColumn<>("Category");
        cat.setCellValueFactory(c -> new ReadOnlyObjectWrapper<>(c.getValue().topCategory()));
        cat.setPrefWidth(100);
        cat.setMinWidth(80);
        table.getColumns().add(cat);
        TableColumn<CandidateRow, CandidateRow> decision = new TableColumn<>("Decision");
        decision.setCellValueFactory(c -> new ReadOnlyObjectWrapper<>(c.getValue()));
        decision.setComparator((a, b) -> a.state().compareTo(b.state()));
        decision.setPrefWidth(90);
        decision.setCellFactory(c -> new DecisionCell());
        table.getColumns().add(decision);
        vm.shown().comparatorProperty().bind(table.comparatorProperty());
        table.setItems(vm.shown());
        Label placeholder = new Label();
        placeholder.textProperty().bind(vm.placeholderProperty());
        table.setPlaceholder(placeholder);
        table.getSelectionModel().selectedItemProperty().addListener((o, a, b) -> {
            if (b != null) {
                vm.select(b);
            }
        });
        table.addEventFilter(KeyEvent.KEY_PRESSED, this::key);
        return table;
    }

    private static <T> TableColumn<CandidateRow, T> column(String name, double width, Function<CandidateRow, T> value, Class<T> type,
                                                           boolean numeric) {
        TableColumn<CandidateRow, T> c = new TableColumn<>(name);
        c.setCellValueFactory(f -> new ReadOnlyObjectWrapper<>(value.apply(f.getValue())));
        c.setPrefWidth(width);
        c.setMinWidth(width);
        c.getStyleClass().add("numeric");
        return c;
    }

    /** Shows the state word with its colour, and the concept a kept term went to. */
    private static final class DecisionCell extends TableCell<CandidateRow, CandidateRow> {
        private ObservableValue<?> watched;
        private final javafx.beans.InvalidationListener redraw = o -> draw();

        @Override
        protected void updateItem(CandidateRow r, boolean empty) {
            super.updateItem(r, empty);
            if (watched != null) {
                watched.removeListener(redraw);
                watched = null;
            }
            if (!empty && r != null) {
                watched = r.conceptLabelProperty();
                watched.addListener(redraw);
            }
            draw();
        }

        private void draw() {
            CandidateRow r = getItem();
            getStyleClass().removeIf(s -> s.startsWith("state-"));
            if (isEmpty() || r == null) {
                setText(null);
                return;
            }
            DecisionState s = r.state();
            getStyleClass().add("state-" + s.name().toLowerCase(Locale.ROOT).replace('_', '-'));
            String c = r.conceptLabelProperty().get();
            setText(s == DecisionState.UNDECIDED ? "·" : (s == DecisionState.KEPT || s == DecisionState.IN_VOCABULARY) && !c.isEmpty()
                    && !c.equalsIgnoreCase(r.term()) ? s.word() + " → " + c : s.word());
        }
    }

    private VBox footer() {
        Label summary = new Label();
        summary.setId("harvest-summary");
        summary.textProperty().bind(vm.summaryProperty());
        summary.getStyleClass().add("summary");
        summary.setWrapText(true);
        Label keys = new Label("Keys: K keep · Shift+K as a label of the selected concept · D drop · P park · U forget");
        keys.getStyleClass().add("keys-hint");
        VBox box = new VBox(2, summary, keys);
        box.getStyleClass().add("pane-footer");
        return box;
    }

    private void key(KeyEvent e) {
        if (e.isShortcutDown() || e.isAltDown()) {
            return;
        }
        KeyCode k = e.getCode();
        boolean done = true;
        if (k == KeyCode.K && e.isShiftDown()) {
            keepAsLabel();
        } else if (k == KeyCode.K) {
            keep();
        } else if (k == KeyCode.D) {
            drop();
        } else if (k == KeyCode.P) {
            park();
        } else if (k == KeyCode.U || k == KeyCode.BACK_SPACE) {
            forget();
        } else {
            done = false;
        }
        if (done) {
            e.consume();
        }
    }

    public void keep() {
        act(vm::keep);
    }

    public void keepAsLabel() {
        act(vm::keepAsLabel);
    }

    public void drop() {
        act(vm::drop);
    }

    public void park() {
        act(vm::park);
    }

    public void forget() {
        act(vm::forget);
    }

    /**
     * Runs a decision on the selected rows, then moves on: to the row after the last one decided
     * when they are still shown, else to the row that took the first one's place.
     */
    private void act(Predicate<List<CandidateRow>> decision) {
        List<CandidateRow> picked = new ArrayList<>(table.getSelectionModel().getSelectedItems());
        if (picked.isEmpty()) {
            return;
        }
        List<Integer> at = new ArrayList<>(table.getSelectionModel().getSelectedIndices());
        int first = at.stream().min(Integer::compare).orElse(0);
        int last = at.stream().max(Integer::compare).orElse(0);
        CandidateRow lastRow = table.getItems().get(last);
        if (!decision.test(picked)) {
            return;
        }
        int stillAt = table.getItems().indexOf(lastRow);
        int next = stillAt >= 0 ? stillAt + 1 : first;
        next = Math.min(next, table.getItems().size() - 1);
        table.getSelectionModel().clearSelection();
        if (next >= 0) {
            table.getSelectionModel().select(next);
            table.getFocusModel().focus(next);
            table.scrollTo(Math.max(0, next - 5));
        }
    }
}
