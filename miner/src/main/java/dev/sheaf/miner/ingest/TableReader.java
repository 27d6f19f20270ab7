package dev.sheaf.miner.ingest;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * One listing per data row of a CSV or TSV file, read with Commons CSV. The delimiter is sniffed
 * among {@code , ; TAB |} from the first lines (quote-aware; the one with the same non-zero count
 * on every line wins). The first row is the header; columns map to fields by the source's
 * {@link ColumnMapping} or by {@link ColumnMapping#detect detection}, every unmapped column
 * becoming a spec. A row with the wrong number of cells, a duplicate header name, a missing
 * mapped column and an unbalanced quote each become a problem at {@code "row N"} (the header is
 * row 1); the other rows are still read. After a quoting error the file is re-opened and reading
 * resumes on the line after the one where the broken row began.
 */
final class TableReader implements ListingReader {
    private static final char[] DELIMITERS = {',', ';', '\t', '|'};
    private static final int SNIFF_CHARS = 1 << 15;
    /** Give up on a file after this many quoting errors: it is not CSV. */
    private static final int MAX_RESTARTS = 100;

    @Override
    public boolean streams() {
        return true;
    }

    @Override
    public String name() {
        return "CSV/TSV";
    }

    @Override
    public void read(SourceFile file) throws IOException {
        State st = new State();
        long skipLines = 0;
        long rowBase = 0;
        for (int pass = 0; pass <= MAX_RESTARTS; pass++) {
            DecodingReader r = file.openText(null);
            if (r == null) {
                return;
            }
            try (BufferedReader in = new BufferedReader(r, 1 << 16)) {
                for (long i = 0; i < skipLines; i++) {
                    if (in.readLine() == null) {
                        break;
                    }
                }
                if (st.format == null) {
                    in.mark(SNIFF_CHARS + 1);
                    char[] buf = new char[SNIFF_CHARS];
                    int n = in.read(buf, 0, buf.length);
                    in.reset();
                    char d = sniff(n <= 0 ? "" : new String(buf, 0, n), file.extension());
                    CSVFormat.Builder b = CSVFormat.RFC4180.builder().setDelimiter(d).setIgnoreEmptyLines(true);
                    if (d == '\t' && !file.extension().equals("csv")) {
                        b.setQuote(null);
                    }
                    st.format = b.get();
                }
                Result res = parse(file, in, st, rowBase);
                if (!st.encodingReported && r.malformed() > 0) {
                    file.reportEncoding(r);
                    st.encodingReported = true;
                }
                if (res == null) {
                    return;
                }
                file.problem("row " + res.row, "parse", "the row has an unbalanced or misplaced quote (" + res.message
                        + "); it was skipped and reading went on with the next line. Quote cells as \"...\" and double quotes inside them");
                skipLines = skipLines + res.lineOfRowStart + 1;
                rowBase = res.row;
            }
        }
        file.problem("", "parse", "more than " + MAX_RESTARTS + " quoting errors; the rest of the file was skipped. Check the delimiter and quoting");
    }

    /** Where a quoting error stopped a pass: the row it was in and the line (relative to the pass start) where that row began. */
    private record Result(long row, long lineOfRowStart, String message) {
    }

    private static final class State {
        CSVFormat format;
        List<String> header;
        ColumnMapping mapping;
        Map<String, Integer> index;
        boolean encodingReported;
    }

    /** Reads rows until the end (returns null) or a quoting error (returns where). */
    private Result parse(SourceFile file, BufferedReader in, State st, long rowBase) throws IOException {
        CSVParser parser = CSVParser.builder().setReader(in).setFormat(st.format).get();
        Iterator<CSVRecord> it = parser.iterator();
        long row = rowBase;
        long lineBefore = parser.getCurrentLineNumber();
        while (true) {
            CSVRecord rec;
            try {
                lineBefore = parser.getCurrentLineNumber();
                if (!it.hasNext()) {
                    return null;
                }
                rec = it.next();
            } catch (UncheckedIOException | IllegalStateException e) {
                String m = e.getCause() != null && e.getCause().getMessage() != null ? e.getCause().getMessage() : e.getMessage();
                return new Result(row + 1, lineBefore, m);
            }
            row++;
            if (st.header == null) {
                header(file, st, rec);
                continue;
            }
            if (rec.size() == 1 && rec.get(0).isBlank()) {
                continue;
            }
            if (rec.size() != st.header.size()) {
                boolean multiLine = false;
                for (String v : rec) {
                    multiLine |= v.indexOf('\n') >= 0;
                }
                file.problem("row " + row, "parse", "expected " + st.header.size() + " cells (as in the header), found " + rec.size()
                        + (multiLine ? " and a cell spanning lines (an unbalanced quote?)" : "")
                        + "; the row was skipped. Check for a missing or extra delimiter");
                if (multiLine) {
                    // the quote swallowed the following lines: resume after the line where this row began
                    return new Result(row, lineBefore, "a quoted cell runs across lines");
                }
                continue;
            }
            file.emit(listing(file, st, rec, row));
        }
    }

    private static void header(SourceFile file, State st, CSVRecord rec) {
        List<String> names = new ArrayList<>();
        Map<String, Integer> index = new HashMap<>();
        for (int i = 0; i < rec.size(); i++) {
            String n = rec.get(i).strip();
            if (i == 0 && n.startsWith("\uFEFF")) {
                n = n.substring(1).strip();
            }
            if (n.isEmpty()) {
                n = "column " + (i + 1);
            }
            if (index.containsKey(n)) {
                String renamed = n;
                for (int k = 2; index.containsKey(renamed); k++) {
                    renamed = n + " (" + k + ")";
                }
                file.problem("row 1", "parse", "the header names '" + n + "' twice (columns " + (index.get(n) + 1) + " and " + (i + 1)
                        + "); the second is read as '" + renamed + "'. Give every column its own name");
                n = renamed;
            }
            index.put(n, i);
            names.add(n);
        }
        st.header = names;
        st.index = index;
        ColumnMapping m = file.mapping() != null ? file.mapping() : ColumnMapping.detect(names, true);
        for (String col : m.mappedNames()) {
            if (!index.containsKey(col)) {
                file.problem("row 1", "parse", "the column mapping names '" + col + "' but the header has " + names
                        + "; that field is left empty. Fix the mapping or the header");
            }
        }
        st.mapping = m;
    }

    private static Listing listing(SourceFile file, State st, CSVRecord rec, long row) {
        ColumnMapping m = st.mapping;
        List<Field> fields = new ArrayList<>();
        String title = cell(st, rec, m.title());
        if (!title.isEmpty()) {
            fields.add(Field.of(FieldKind.TITLE, SpecValues.plain(title)));
        }
        String desc = cell(st, rec, m.description());
        if (!desc.isEmpty()) {
            fields.add(Field.of(FieldKind.DESCRIPTION, SpecValues.plain(desc)));
        }
        for (String col : m.bullets()) {
            String v = cell(st, rec, col);
            if (v.isEmpty()) {
                continue;
            }
            boolean listColumn = ColumnMapping.norm(col).matches("bullets|features|highlights");
            for (String b : listColumn ? SpecValues.items(v) : List.of(v)) {
                fields.add(Field.of(FieldKind.BULLET, SpecValues.plain(b)));
            }
        }
        if (m.specsFromAllOthers()) {
            java.util.Set<String> mapped = m.mappedNames();
            for (int i = 0; i < st.header.size(); i++) {
                String col = st.header.get(i);
                if (!mapped.contains(col)) {
                    SpecValues.addSpecs(col, rec.get(i), ColumnMapping.isSpecContainerName(col), fields);
                }
            }
        } else {
            for (String col : m.specs()) {
                SpecValues.addSpecs(col, cell(st, rec, col), true, fields);
            }
        }
        for (String col : m.text()) {
            String v = cell(st, rec, col);
            if (!v.isEmpty()) {
                fields.add(Field.of(FieldKind.TEXT, SpecValues.plain(v)));
            }
        }
        String id = cell(st, rec, m.id());
        return new Listing(id.isEmpty() ? file.stem() + "-" + row : id, cell(st, rec, m.category()), file.display(), "row " + row, fields);
    }

    private static String cell(State st, CSVRecord rec, String col) {
        if (col == null) {
            return "";
        }
        Integer i = st.index.get(col);
        return i == null ? "" : rec.get(i).strip();
    }

    /** The delimiter whose count is the same (and non-zero) on every sampled line, highest count first. */
    static char sniff(String sample, String extension) {
        List<String> lines = new ArrayList<>();
        for (String l : sample.split("\\R", 12)) {
            if (!l.isBlank()) {
                lines.add(l);
            }
        }
        if (lines.size() > 10) {
            lines = lines.subList(0, 10); // the last piece may be cut short
        }
        char best = 0;
        int bestCount = 0;
        for (char d : DELIMITERS) {
            int first = -1;
            boolean consistent = true;
            for (String l : lines) {
                int c = count(l, d);
                if (first < 0) {
                    first = c;
                } else if (c != first) {
                    consistent = false;
                }
            }
            if (consistent && first > bestCount) {
                best = d;
                bestCount = first;
            }
        }
        if (best != 0) {
            return best;
        }
        if (extension.equals("tsv") || extension.equals("tab")) {
            return '\t';
        }
        char onHeader = ',';
        int most = 0;
        if (!lines.isEmpty()) {
            for (char d : DELIMITERS) {
                int c = count(lines.get(0), d);
                if (c > most) {
                    most = c;
                    onHeader = d;
                }
            }
        }
        return onHeader;
    }

    private static int count(String line, char d) {
        int n = 0;
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c == '"') {
                quoted = !quoted;
            } else if (c == d && !quoted) {
                n++;
            }
        }
        return n;
    }
}
