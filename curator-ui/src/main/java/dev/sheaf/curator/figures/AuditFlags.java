package dev.sheaf.curator.figures;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import dev.sheaf.vocab.io.SafeCsv;
import org.apache.commons.csv.CSVRecord;

/**
 * The flags of the last audit ({@code OUTPUT/audit/tables/flags-table.csv}, as {@code sheaf audit}
 * writes it), by attribute label: one line per flag, "thin: fill rate 0.12 below 0.30".
 *
 * @param source the file read
 * @param byAttribute flag lines by attribute label (compared case-insensitively)
 */
public record AuditFlags(Path source, Map<String, List<String>> byAttribute) {
    /** The audit table file, relative to the workspace's output folder. */
    public static final String TABLE = "audit/tables/flags-table.csv";

    public AuditFlags {
        byAttribute = Map.copyOf(byAttribute);
    }

    /** Reads the table under {@code output}, or empty when no audit has been run. */
    public static Optional<AuditFlags> read(Path output) throws IOException {
        Path f = output.resolve(TABLE);
        if (!Files.isRegularFile(f)) {
            return Optional.empty();
        }
        Map<String, List<String>> m = new TreeMap<>();
        try (Reader r = Files.newBufferedReader(f, StandardCharsets.UTF_8)) {
            for (CSVRecord rec : SafeCsv.readFormat().parse(r)) {
                if (!rec.isMapped("attribute") || !rec.isMapped("flag")) {
                    throw new IOException(f + " line " + rec.getRecordNumber()
                            + ": expected the columns attribute and flag (as sheaf audit writes them); re-run sheaf audit");
                }
                String attr = unquote(rec.get("attribute")).toLowerCase(Locale.ROOT);
                StringBuilder line = new StringBuilder(unquote(rec.get("flag")));
                if (rec.isMapped("criterion") && !rec.get("criterion").isBlank()) {
                    line.append(": ").append(unquote(rec.get("criterion")));
                }
                if (rec.isMapped("figure") && !rec.get("figure").isBlank()) {
                    line.append(" ").append(rec.get("figure"));
                    if (rec.isMapped("comparison") && rec.isMapped("threshold") && !rec.get("threshold").isBlank()) {
                        line.append(" ").append(unquote(rec.get("comparison"))).append(" ").append(rec.get("threshold"));
                    }
                }
                m.computeIfAbsent(attr, k -> new ArrayList<>()).add(line.toString());
            }
        }
        return Optional.of(new AuditFlags(f, m));
    }

    /** The flag lines on an attribute label, empty when it has none. */
    public List<String> flagsOf(String label) {
        return label == null ? List.of() : byAttribute.getOrDefault(label.toLowerCase(Locale.ROOT), List.of());
    }


    private static String unquote(String s) {
        return SafeCsv.restore(s);
    }
}
