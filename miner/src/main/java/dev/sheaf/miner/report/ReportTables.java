package dev.sheaf.miner.report;

import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Writes the tables behind the report for spreadsheets and programs: {@code <id>.csv} through
 * {@link SafeCsv} (a header row with the column names, then the rows; numbers unrounded, a share as a
 * fraction in [0, 1], "not available" as an empty cell) and {@code <id>.json} through Jackson:
 *
 * <pre>{@code
 * {"format": "sheaf-report-table", "formatVersion": 1, "id": "...", "caption": "...", "note": "...",
 *  "columns": [{"name": "attribute", "kind": "text"}, ...],
 *  "rows": [{"attribute": "fit", "alpha": 0.41, ...}, ...]}
 * }</pre>
 * with null for "not available". Both files are UTF-8, written atomically, the same bytes for the same table.
 */
public final class ReportTables {
    /** The {@code format} member of every table file. */
    public static final String FORMAT = "sheaf-report-table";
    public static final int FORMAT_VERSION = 1;

    private static final ObjectMapper JSON = new ObjectMapper();
    private static final DefaultPrettyPrinter PRETTY = new DefaultPrettyPrinter()
            .withObjectIndenter(new DefaultIndenter("  ", "\n"))
            .withArrayIndenter(new DefaultIndenter("  ", "\n"));

    private ReportTables() {
    }

    /** Writes every table into {@code folder} (created when missing); returns the files, CSV then JSON per table. */
    public static List<Path> writeAll(Path folder, List<ReportTable> tables) throws IOException {
        List<Path> out = new ArrayList<>();
        for (ReportTable t : tables) {
            out.addAll(write(folder, t));
        }
        return out;
    }

    /** Writes {@code folder/<id>.csv} and {@code folder/<id>.json}; returns both paths. */
    public static List<Path> write(Path folder, ReportTable table) throws IOException {
        Path csv = folder.resolve(table.id() + ".csv");
        Path json = folder.resolve(table.id() + ".json");
        AtomicFiles.writeText(csv, w -> {
            SafeCsv out = new SafeCsv(w);
            out.row(table.columns().stream().map(ReportTable.Column::name).toList());
            for (List<Object> row : table.rows()) {
                List<Object> cells = new ArrayList<>(row.size());
                for (Object c : row) {
                    cells.add(c instanceof Double d && d.isNaN() || c instanceof Float f && f.isNaN() ? null : c);
                }
                out.row(cells);
            }
            out.flush();
        });
        AtomicFiles.writeString(json, json(table));
        return List.of(csv, json);
    }

    static ObjectNode toJson(ReportTable table) {
        ObjectNode root = JSON.createObjectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", FORMAT_VERSION);
        root.put("id", table.id());
        root.put("caption", table.caption());
        root.put("note", table.note());
        ArrayNode columns = root.putArray("columns");
        for (ReportTable.Column c : table.columns()) {
            columns.addObject().put("name", c.name()).put("kind", c.kind().name().toLowerCase(Locale.ROOT));
        }
        ArrayNode rows = root.putArray("rows");
        for (List<Object> row : table.rows()) {
            ObjectNode r = rows.addObject();
            for (int i = 0; i < row.size(); i++) {
                String key = table.columns().get(i).name();
                Object cell = row.get(i);
                if (cell instanceof String s) {
                    r.put(key, s);
                } else if (cell instanceof Double || cell instanceof Float) {
                    double d = ((Number) cell).doubleValue();
                    if (Double.isNaN(d) || Double.isInfinite(d)) {
                        r.putNull(key);
                    } else {
                        r.put(key, d);
                    }
                } else if (cell instanceof java.math.BigDecimal b) {
                    r.put(key, b);
                } else if (cell instanceof java.math.BigInteger b) {
                    r.put(key, b);
                } else {
                    r.put(key, ((Number) cell).longValue());
                }
            }
        }
        return root;
    }

    /** Text of the JSON file. */
    static String json(ReportTable table) throws IOException {
        java.io.ByteArrayOutputStream o = new java.io.ByteArrayOutputStream();
        try (JsonGenerator g = JSON.getFactory().createGenerator(o)) {
            g.setPrettyPrinter(PRETTY);
            JSON.writeTree(g, toJson(table));
        }
        return o.toString(StandardCharsets.UTF_8) + "\n";
    }
}
