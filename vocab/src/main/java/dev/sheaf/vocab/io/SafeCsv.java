package dev.sheaf.vocab.io;

import java.io.IOException;
import java.io.Writer;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.QuoteMode;

/**
 * CSV that is safe to open in a spreadsheet. Every CSV Sheaf writes goes through here.
 *
 * <p>A cell that starts with {@code =}, {@code +}, {@code -}, {@code @}, tab, CR, LF or NUL would be
 * taken as a formula by spreadsheet programs; such a cell gets a leading {@code '} and is quoted
 * (OWASP "CSV Injection"; OWASP ASVS 5.0 requirement 1.2.10). Quoting follows RFC 4180 §2.6–2.7:
 * fields holding a comma, quote or line break are quoted, and quotes are doubled. Cells passed as
 * Java numbers are never neutralised, so a negative score stays a number; doubles are written in
 * shortest round-trip form ({@link Double#toString}), integral values without a fraction.
 */
public final class SafeCsv implements AutoCloseable {
    /** RFC 4180 with CRLF record separators, minimal quoting. */
    public static final CSVFormat FORMAT = CSVFormat.RFC4180.builder().setQuoteMode(QuoteMode.MINIMAL).get();

    /** The same, quoting every field: used for neutralised cells so they are always quoted. */
    private static final CSVFormat QUOTED = FORMAT.builder().setQuoteMode(QuoteMode.ALL).get();

    private final Writer out;
    private final StringBuilder numberTail = new StringBuilder();

    public SafeCsv(Writer out) {
        this.out = out;
    }

    /** Writes one record; {@link Number} cells pass through, everything else is neutralised. */
    public void row(Object... cells) throws IOException {
        cells(cells);
        out.write(FORMAT.getRecordSeparator());
    }

    /**
     * Writes one record: the {@code cells} as {@link #row(Object...)} writes them, then every int of
     * {@code numbers}. An integer never needs quoting or neutralising, so a wide numeric table (a
     * multi-hot label matrix: millions of 0/1/-1 cells) is written straight to the output.
     */
    public void row(Object[] cells, int[] numbers) throws IOException {
        cells(cells);
        StringBuilder tail = numberTail;
        tail.setLength(0);
        String delimiter = FORMAT.getDelimiterString();
        for (int i = 0; i < numbers.length; i++) {
            if (i > 0 || cells.length > 0) {
                tail.append(delimiter);
            }
            tail.append(numbers[i]);
        }
        tail.append(FORMAT.getRecordSeparator());
        out.append(tail); // one write a record, not one a cell
    }

    private void cells(Object[] cells) throws IOException {
        boolean first = true;
        for (Object c : cells) {
            boolean neutralised = !(c instanceof Number) && c != null && needsPrefix(c.toString());
            (neutralised ? QUOTED : FORMAT).print(cell(c), out, first);
            first = false;
        }
    }

    /** Writes one record from a list. */
    public void row(List<?> cells) throws IOException {
        row(cells.toArray());
    }

    public void flush() throws IOException {
        out.flush();
    }

    @Override
    public void close() throws IOException {
        out.close();
    }

    static String cell(Object c) {
        if (c == null) {
            return "";
        }
        if (c instanceof Double || c instanceof Float) {
            return formatDouble(((Number) c).doubleValue());
        }
        if (c instanceof Number) {
            return c.toString();
        }
        return neutralise(c.toString());
    }

    /**
     * The cell text a spreadsheet will not evaluate: a leading {@code '} before a dangerous first
     * character. The CSV printer then quotes it because the result may hold quotes or commas.
     */
    public static String neutralise(String s) {
        if (s.isEmpty()) {
            return s;
        }
        return needsPrefix(s) ? "'" + s : s;
    }

    /**
     * Undoes {@link #neutralise} on a cell read back: a leading {@code '} is removed when what
     * follows is dangerous or itself starts with {@code '}. Because {@code neutralise} also
     * prefixes text that already starts with {@code '} followed by such a character, every
     * string survives neutralise → restore unchanged ("'=x" is written "''=x" and read back "'=x";
     * "'90s" is left alone both ways).
     */
    public static String restore(String cell) {
        if (cell.length() > 1 && cell.charAt(0) == '\'' && (isDangerous(cell.substring(1)) || cell.charAt(1) == '\'')) {
            return cell.substring(1);
        }
        return cell;
    }

    /** The format to read Sheaf's CSV back with (RFC 4180, first record is the header); restore each cell with {@link #restore}. */
    public static CSVFormat readFormat() {
        return FORMAT.builder().setHeader().setSkipHeaderRecord(true).get();
    }

    private static boolean needsPrefix(String s) {
        return isDangerous(s) || s.length() > 1 && s.charAt(0) == '\'' && (isDangerous(s.substring(1)) || s.charAt(1) == '\'');
    }

    private static boolean isDangerous(String s) {
        if (s.isEmpty()) {
            return false;
        }
        char c = s.charAt(0);
        return c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r' || c == '\n' || c == '\0';
    }

    /** Shortest round-trip form; integral values without ".0"; NaN as an empty cell. */
    public static String formatDouble(double v) {
        if (Double.isNaN(v)) {
            return "";
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
