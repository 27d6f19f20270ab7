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
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads a feedback CSV: UTF-8 (a byte-order mark is skipped), RFC 4180 quoting, a header row naming
 * at least the five {@link FeedbackColumns}. Other columns are ignored.
 *
 * <p>A bad row is a {@link FeedbackProblem} with its spreadsheet row number (the header is row 1;
 * a quoted cell with line breaks still counts as one row) and is skipped; reading never stops for a
 * bad row. Only broken CSV syntax (an unterminated quote) stops reading, because nothing after it
 * can be split into rows reliably; that is recorded too. Wholly blank rows are skipped silently.
 * A pair id keeps the reference and target of its first row: a later row of the same pair naming
 * other listings is a {@code pair-conflict}.
 */
public final class FeedbackCsv {
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setIgnoreEmptyLines(false).get();

    private FeedbackCsv() {
    }

    /** Reads {@code file}; problems name it as given. */
    public static FeedbackSentences read(Path file, FeedbackColumns columns) throws IOException {
        return read(file, columns, file.toString());
    }

    /**
     * Reads {@code file}; problems name it {@code displayName} (e.g. a path relative to the workspace).
     *
     * @throws IOException when the file cannot be opened at all (missing, a folder, no permission)
     */
    public static FeedbackSentences read(Path file, FeedbackColumns columns, String displayName) throws IOException {
        var decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPLACE)
                .onUnmappableCharacter(CodingErrorAction.REPLACE);
        try (Reader in = new BufferedReader(new InputStreamReader(Files.newInputStream(file), decoder), 1 << 16)) {
            return read(in, columns, displayName);
        }
    }

    /** Reads sentences from text already decoded. */
    public static FeedbackSentences read(Reader text, FeedbackColumns columns, String displayName) throws IOException {
        State s = new State(displayName, columns);
        try (CSVParser parser = CSVParser.parse(skipBom(text), FORMAT)) {
            Iterator<CSVRecord> it = parser.iterator();
            long lastRow = 0;
            try {
                if (!it.hasNext()) {
                    s.problem(0, "header", "the file is empty; expected a header row naming the columns " + columns.names());
                    return s.result();
                }
                CSVRecord header = it.next();
                lastRow = header.getRecordNumber();
                int[] index = headerIndex(header, s);
                if (index == null) {
                    return s.result();
                }
                int needed = 0;
                for (int i : index) {
                    needed = Math.max(needed, i + 1);
                }
                while (it.hasNext()) {
                    CSVRecord r = it.next();
                    lastRow = r.getRecordNumber();
                    s.row(r, index, needed);
                }
            } catch (UncheckedIOException e) {
                s.problem(lastRow + 1, "parse", "the CSV syntax breaks at or after this row (" + e.getCause().getMessage()
                        + "); the rest of the file was not read. Check for an unclosed double quote");
            }
        }
        return s.result();
    }

    private static int[] headerIndex(CSVRecord header, State s) {
        Map<String, Integer> byName = new HashMap<>();
        for (int i = header.size() - 1; i >= 0; i--) {
            byName.put(FeedbackColumns.key(header.get(i)), i); // the first of two equal names wins
        }
        List<String> names = s.columns.names();
        int[] index = new int[names.size()];
        List<String> missing = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            Integer at = byName.get(FeedbackColumns.key(names.get(i)));
            if (at == null) {
                missing.add(names.get(i));
            } else {
                index[i] = at;
            }
        }
        if (!missing.isEmpty()) {
            List<String> found = new ArrayList<>();
            header.forEach(found::add);
            s.problem(header.getRecordNumber(), "header", "expected header columns " + names + " but " + missing + " "
                    + (missing.size() == 1 ? "is" : "are") + " missing; found " + found
                    + ". Rename the columns or name them with the column options");
            return null;
        }
        return index;
    }

    private static Reader skipBom(Reader in) throws IOException {
        PushbackReader p = new PushbackReader(in, 1);
        int c = p.read();
        if (c != -1 && c != '\uFEFF') {
            p.unread(c);
        }
        return p;
    }

    /** What one read has seen so far. */
    private static final class State {
        final String source;
        final FeedbackColumns columns;
        final List<FeedbackSentence> sentences = new ArrayList<>();
        final List<FeedbackProblem> problems = new ArrayList<>();
        /** pair id → {reference, target, first row}. */
        final Map<String, String[]> pairs = new HashMap<>();
        final Set<List<String>> seen = new HashSet<>();
        int rows;

        State(String source, FeedbackColumns columns) {
            this.source = source;
            this.columns = columns;
        }

        void problem(long row, String kind, String reason) {
            problems.add(new FeedbackProblem(source, row, kind, reason));
        }

        void row(CSVRecord r, int[] index, int needed) {
            long row = r.getRecordNumber();
            if (r.size() == 1 && r.get(0).isBlank()) {
                return;
            }
            rows++;
            if (r.size() < needed) {
                problem(row, "missing-column", "expected at least " + needed + " columns as in the header, found " + r.size()
                        + "; row skipped");
                return;
            }
            String[] cell = new String[5];
            List<String> empty = new ArrayList<>();
            for (int i = 0; i < 5; i++) {
                cell[i] = r.get(index[i]).strip();
                if (cell[i].indexOf('\uFFFD') >= 0) {
                    problem(row, "encoding", "column '" + columns.names().get(i)
                            + "' holds bytes that are not UTF-8; save the file as UTF-8. Row skipped");
                    return;
                }
                if (cell[i].isEmpty()) {
                    empty.add(columns.names().get(i));
                }
            }
            if (!empty.isEmpty()) {
                problem(row, "empty-field", "expected a non-empty " + String.join(", ", empty)
                        + "; found an empty cell. Row skipped");
                return;
            }
            if (cell[1].equals(cell[2])) {
                problem(row, "same-listing", "reference and target are both '" + cell[1]
                        + "', so the sentence compares nothing; name two different listings. Row skipped");
                return;
            }
            String[] pair = pairs.putIfAbsent(cell[0], new String[] {cell[1], cell[2], Long.toString(row)});
            if (pair != null && (!pair[0].equals(cell[1]) || !pair[1].equals(cell[2]))) {
                problem(row, "pair-conflict", "pair '" + cell[0] + "' compares '" + pair[1] + "' with '" + pair[0]
                        + "' in row " + pair[2] + ", but this row names target '" + cell[2] + "' and reference '" + cell[1]
                        + "'; give each comparison its own pair id. Row skipped");
                return;
            }
            if (!seen.add(List.of(cell[0], cell[3], cell[4]))) {
                problem(row, "repeated", "the same person wrote the same sentence about pair '" + cell[0]
                        + "' in an earlier row; counted once. Row skipped");
                return;
            }
            sentences.add(new FeedbackSentence(cell[0], cell[1], cell[2], cell[3], cell[4], row));
        }

        FeedbackSentences result() {
            return new FeedbackSentences(source, sentences, problems, rows);
        }
    }
}
