package dev.sheaf.miner.measure;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PushbackReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads a judgments CSV: UTF-8 (a byte-order mark is skipped), RFC 4180 quoting, a header row
 * naming at least the four {@link JudgmentColumns}. Other columns are ignored.
 *
 * <p>A bad row is recorded as a {@link JudgmentProblem} with its spreadsheet row number (the header
 * is row 1; a quoted cell with line breaks still counts as one row) and skipped; reading never stops
 * for a bad row. Only broken CSV syntax (an unterminated quote) stops reading, because nothing after
 * it can be split into rows reliably; that is recorded too. Wholly blank rows are skipped silently.
 */
public final class JudgmentsCsv {
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setIgnoreEmptyLines(false).get();

    private JudgmentsCsv() {
    }

    /** Reads {@code file}; problems name the file as given. */
    public static Judgments read(Path file, JudgmentColumns columns) throws IOException {
        return read(file, columns, file.toString());
    }

    /**
     * Reads {@code file}; problems name it {@code displayName} (e.g. a path relative to the workspace).
     *
     * @throws IOException when the file cannot be opened at all (missing, a folder, no permission)
     */
    public static Judgments read(Path file, JudgmentColumns columns, String displayName) throws IOException {
        var decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPLACE)
                .onUnmappableCharacter(CodingErrorAction.REPLACE);
        try (Reader in = new BufferedReader(new InputStreamReader(Files.newInputStream(file), decoder), 1 << 16)) {
            return read(in, columns, displayName);
        }
    }

    /** Reads judgments from text already decoded. */
    public static Judgments read(Reader text, JudgmentColumns columns, String displayName) throws IOException {
        List<Judgment> judgments = new ArrayList<>();
        List<JudgmentProblem> problems = new ArrayList<>();
        try (CSVParser parser = CSVParser.parse(skipBom(text), FORMAT)) {
            Iterator<CSVRecord> it = parser.iterator();
            long lastRow = 0;
            try {
                if (!it.hasNext()) {
                    problems.add(new JudgmentProblem(displayName, 0, "header",
                            "the file is empty; expected a header row naming the columns " + columns.names()));
                    return Judgments.of(displayName, judgments, problems);
                }
                CSVRecord header = it.next();
                lastRow = header.getRecordNumber();
                int[] index = headerIndex(header, columns, displayName, problems);
                if (index == null) {
                    return Judgments.of(displayName, judgments, problems);
                }
                int needed = 0;
                for (int i : index) {
                    needed = Math.max(needed, i + 1);
                }
                while (it.hasNext()) {
                    CSVRecord r = it.next();
                    lastRow = r.getRecordNumber();
                    readRow(r, index, needed, columns, displayName, judgments, problems);
                }
            } catch (UncheckedIOException e) {
                problems.add(new JudgmentProblem(displayName, lastRow + 1, "parse",
                        "the CSV syntax breaks at or after this row (" + e.getCause().getMessage()
                                + "); the rest of the file was not read. Check for an unclosed double quote"));
            }
        }
        return Judgments.of(displayName, judgments, problems);
    }

    private static int[] headerIndex(CSVRecord header, JudgmentColumns columns, String source,
                                     List<JudgmentProblem> problems) {
        Map<String, Integer> byName = new HashMap<>();
        for (int i = header.size() - 1; i >= 0; i--) {
            byName.put(JudgmentColumns.key(header.get(i)), i); // the first of two equal names wins
        }
        List<String> names = columns.names();
        int[] index = new int[names.size()];
        List<String> missing = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            Integer at = byName.get(JudgmentColumns.key(names.get(i)));
            if (at == null) {
                missing.add(names.get(i));
            } else {
                index[i] = at;
            }
        }
        if (!missing.isEmpty()) {
            List<String> found = new ArrayList<>();
            header.forEach(found::add);
            problems.add(new JudgmentProblem(source, header.getRecordNumber(), "header",
                    "expected header columns " + names + " but " + missing + " " + (missing.size() == 1 ? "is" : "are")
                            + " missing; found " + found + ". Rename the columns or name them with the column options"));
            return null;
        }
        return index;
    }

    private static void readRow(CSVRecord r, int[] index, int needed, JudgmentColumns columns, String source,
                                List<Judgment> judgments, List<JudgmentProblem> problems) {
        long row = r.getRecordNumber();
        if (r.size() == 1 && r.get(0).isBlank()) {
            return;
        }
        if (r.size() < needed) {
            problems.add(new JudgmentProblem(source, row, "missing-column",
                    "expected at least " + needed + " columns as in the header, found " + r.size() + "; row skipped"));
            return;
        }
        String[] cell = new String[4];
        for (int i = 0; i < 4; i++) {
            cell[i] = r.get(index[i]).strip();
            if (cell[i].indexOf('\uFFFD') >= 0) {
                problems.add(new JudgmentProblem(source, row, "encoding",
                        "column '" + columns.names().get(i) + "' holds bytes that are not UTF-8; save the file as UTF-8. Row skipped"));
                return;
            }
        }
        List<String> empty = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            if (cell[i].isEmpty()) {
                empty.add(columns.names().get(i));
            }
        }
        if (!empty.isEmpty()) {
            problems.add(new JudgmentProblem(source, row, "empty-field",
                    "expected a non-empty " + String.join(", ", empty) + "; found an empty cell. Row skipped"));
            return;
        }
        if (cell[3].isEmpty()) {
            problems.add(new JudgmentProblem(source, row, "empty-value",
                    "expected a value for item '" + cell[0] + "', attribute '" + cell[2]
                            + "'; found an empty cell. Leave the row out when the item was not judged. Row skipped"));
            return;
        }
        judgments.add(new Judgment(cell[0], cell[1], cell[2], cell[3], row));
    }

    private static Reader skipBom(Reader in) throws IOException {
        PushbackReader p = new PushbackReader(in, 1);
        int c = p.read();
        if (c != -1 && c != '\uFEFF') {
            p.unread(c);
        }
        return p;
    }
}
