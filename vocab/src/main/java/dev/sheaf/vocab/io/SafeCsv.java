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

    public SafeCsv(Writer out) {
        this.out = out;
    }

    /** Writes one record; {@link Number} cells pass through, everything else is neutralised. */
    public void row(Object... cells) throws IOException {
        boolean first = true;
        for (Object c : cells) {
            boolean neutralised = !(c instanceof Number) && c != null && isDangerous(c.toString());
            (neutralised ? QUOTED : FORMAT).print(cell(c), out, first);
            first = false;
        }
        out.write(FORMAT.getRecordSeparator());
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
        return isDangerous(s) ? "'" + s : s;
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
