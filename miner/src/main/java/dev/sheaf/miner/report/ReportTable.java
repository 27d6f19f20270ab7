package dev.sheaf.miner.report;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * A table of the report. On the page its rows sort when a header is clicked; beside the page it is
 * written as {@code <id>.csv} and {@code <id>.json} by {@link ReportTables}, with raw numbers.
 *
 * <p>A cell of a {@link ValueKind#TEXT} column is a {@link String}; a cell of a numeric column is a
 * {@link Number}, where a double NaN means "not available". Nulls are not allowed.
 *
 * @param id      the table id: an element id and the file stem of its CSV and JSON
 * @param caption what the table lists
 * @param columns the columns, with distinct names
 * @param rows    the rows, each with one cell per column
 * @param note    a line under the table (e.g. how to read it), or empty
 */
public record ReportTable(String id, String caption, List<Column> columns, List<List<Object>> rows, String note)
        implements Block {

    /**
     * A column.
     *
     * @param name the header as shown, and the key in CSV and JSON
     * @param kind what the cells hold
     */
    public record Column(String name, ValueKind kind) {
        public Column {
            Objects.requireNonNull(name, "name");
            Objects.requireNonNull(kind, "kind");
            if (name.isBlank()) {
                throw new IllegalArgumentException("a column needs a name");
            }
        }

        public static Column text(String name) {
            return new Column(name, ValueKind.TEXT);
        }

        public static Column count(String name) {
            return new Column(name, ValueKind.COUNT);
        }

        public static Column share(String name) {
            return new Column(name, ValueKind.SHARE);
        }

        public static Column coefficient(String name) {
            return new Column(name, ValueKind.COEFFICIENT);
        }
    }

    public ReportTable {
        Ids.require(id, "table");
        Objects.requireNonNull(caption, "caption");
        Objects.requireNonNull(note, "note");
        columns = List.copyOf(columns);
        if (columns.isEmpty()) {
            throw new IllegalArgumentException("table '" + id + "' needs at least one column");
        }
        Set<String> names = new HashSet<>();
        for (Column c : columns) {
            if (!names.add(c.name())) {
                throw new IllegalArgumentException("table '" + id + "' has two columns named '" + c.name() + "'");
            }
        }
        List<List<Object>> copy = new ArrayList<>(rows.size());
        for (int r = 0; r < rows.size(); r++) {
            List<Object> row = rows.get(r);
            if (row.size() != columns.size()) {
                throw new IllegalArgumentException("table '" + id + "' row " + (r + 1) + " has " + row.size()
                        + " cells; expected " + columns.size() + " (one per column)");
            }
            for (int c = 0; c < row.size(); c++) {
                Object cell = row.get(c);
                Column col = columns.get(c);
                boolean ok = col.kind() == ValueKind.TEXT ? cell instanceof String : cell instanceof Number;
                if (!ok) {
                    throw new IllegalArgumentException("table '" + id + "' row " + (r + 1) + ", column '" + col.name()
                            + "' expects " + (col.kind() == ValueKind.TEXT ? "a String" : "a Number (NaN for n/a)")
                            + ", got " + (cell == null ? "null" : cell.getClass().getSimpleName() + " '" + cell + "'"));
                }
            }
            copy.add(Collections.unmodifiableList(new ArrayList<>(row)));
        }
        rows = Collections.unmodifiableList(copy);
    }

    /** A builder for a table with these columns. */
    public static Builder builder(String id, String caption, Column... columns) {
        return new Builder(id, caption, List.of(columns));
    }

    /** Collects rows; {@link #build()} validates. */
    public static final class Builder {
        private final String id;
        private final String caption;
        private final List<Column> columns;
        private final List<List<Object>> rows = new ArrayList<>();
        private String note = "";

        private Builder(String id, String caption, List<Column> columns) {
            this.id = id;
            this.caption = caption;
            this.columns = columns;
        }

        public Builder row(Object... cells) {
            rows.add(java.util.Arrays.asList(cells));
            return this;
        }

        public Builder note(String note) {
            this.note = note;
            return this;
        }

        public ReportTable build() {
            return new ReportTable(id, caption, columns, rows, note);
        }
    }
}
