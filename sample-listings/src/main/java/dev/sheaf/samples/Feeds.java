package dev.sheaf.samples;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.io.SerializedString;
import java.io.IOException;
import java.io.OutputStream;
import java.io.Writer;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * The two feeds: the JSONL partner feed (one listing per line, CONTRACTS.md) and the shop's CSV
 * catalog export (RFC 4180 with CRLF, as spreadsheet-safe exports write it).
 */
final class Feeds {
    private Feeds() {
    }

    private static final JsonFactory JSON = JsonFactory.builder().build();

    /** Writes JSON lines to a stream it does not close. */
    static final class JsonlWriter implements AutoCloseable {
        private final JsonGenerator g;
        private final OutputStream out;
        private long written;

        JsonlWriter(OutputStream out) throws IOException {
            this.out = out;
            this.g = JSON.createGenerator(out, JsonEncoding.UTF8);
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            g.disable(JsonGenerator.Feature.FLUSH_PASSED_TO_STREAM);
            // one object per line: the separator goes between root values, the last newline at close
            g.setRootValueSeparator(new SerializedString("\n"));
        }

        void write(Product p) throws IOException {
            g.writeStartObject();
            g.writeStringField("id", p.id());
            g.writeStringField("category", p.category().id);
            g.writeStringField("title", p.title());
            g.writeStringField("description", p.description());
            g.writeArrayFieldStart("bullets");
            for (String b : p.bullets()) {
                g.writeString(b);
            }
            g.writeEndArray();
            g.writeObjectFieldStart("specs");
            for (Spec s : p.specs()) {
                g.writeStringField(s.key(), s.value());
            }
            g.writeEndObject();
            g.writeEndObject();
            written++;
        }

        @Override
        public void close() throws IOException {
            if (written > 0) {
                g.writeRaw('\n');
            }
            g.close();
            out.flush();
        }
    }

    /** The export's fixed leading columns; spec columns follow in {@link SpecKey} order. */
    static final List<String> CSV_LEADING = List.of("sku", "name", "category", "description", "feature_1", "feature_2", "feature_3");

    static List<SpecKey> specColumns(List<Product> products) {
        Set<SpecKey> used = EnumSet.noneOf(SpecKey.class);
        for (Product p : products) {
            for (Spec s : p.specs()) {
                used.add(s.kind());
            }
        }
        return new ArrayList<>(used);
    }

    /**
     * Writes the catalog export. Multi-line descriptions (every tenth row, as when staff paste copy
     * with a blank line) exercise RFC 4180 quoting. A value beginning with "-" and a digit is written
     * with the Unicode minus sign (U+2212), as spreadsheet-safe exports do; any other cell that a
     * spreadsheet would read as a formula is a generator bug and fails the run.
     */
    static void writeCsv(Writer w, List<Product> products) throws IOException {
        List<SpecKey> cols = specColumns(products);
        CSVFormat format = CSVFormat.RFC4180;
        // not closed here: the caller owns the writer
        CSVPrinter csv = new CSVPrinter(w, format);
        {
            List<String> header = new ArrayList<>(CSV_LEADING);
            for (SpecKey k : cols) {
                header.add(k.csv);
            }
            csv.printRecord(header);
            int row = 0;
            for (Product p : products) {
                List<String> cells = new ArrayList<>(header.size());
                cells.add(p.id());
                cells.add(spreadsheetSafe(p.title(), p.id()));
                cells.add(p.category().id);
                String desc = p.description();
                if (row++ % 10 == 7) {
                    int dot = desc.indexOf(". ");
                    if (dot > 0) {
                        desc = desc.substring(0, dot + 1) + "\n\n" + desc.substring(dot + 2);
                    }
                }
                cells.add(spreadsheetSafe(desc, p.id()));
                for (int i = 0; i < 3; i++) {
                    cells.add(i < p.bullets().size() ? spreadsheetSafe(p.bullets().get(i), p.id()) : "");
                }
                for (SpecKey k : cols) {
                    String v = "";
                    for (Spec s : p.specs()) {
                        if (s.kind() == k) {
                            v = s.value();
                        }
                    }
                    cells.add(spreadsheetSafe(v, p.id()));
                }
                csv.printRecord(cells);
            }
            csv.flush();
        }
    }

    static String spreadsheetSafe(String cell, String where) {
        if (cell.isEmpty()) {
            return cell;
        }
        char c = cell.charAt(0);
        if (c == '-' && cell.length() > 1 && Character.isDigit(cell.charAt(1))) {
            return '\u2212' + cell.substring(1);
        }
        if (c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r' || c == '\n' || c == '\0') {
            throw new IllegalStateException("generator bug: cell '" + cell + "' of " + where + " would be read as a spreadsheet formula");
        }
        return cell;
    }
}
