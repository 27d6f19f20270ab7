package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

class JudgmentsCsvTest {
    static Path fixture(String name) {
        try {
            return Path.of(JudgmentsCsvTest.class.getResource("/judgments/" + name).toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    private static Judgments read(String name) throws IOException {
        return JudgmentsCsv.read(fixture(name), JudgmentColumns.DEFAULT, name);
    }

    private static List<String> kindsAndRows(Judgments j) {
        return j.problems().stream().map(p -> p.kind() + "@" + p.row()).toList();
    }

    @Test
    void theFixtureFolderIsNotEmpty() throws IOException {
        try (Stream<Path> files = Files.list(fixture("README.md").getParent())) {
            assertTrue(files.filter(p -> p.toString().endsWith(".csv")).count() >= 6);
        }
    }

    @Test
    void readsEveryRowOfACleanFileWithSpreadsheetRowNumbers() throws IOException {
        Judgments j = read("good.csv");
        assertEquals(6, j.list().size());
        assertEquals(List.of(), j.problems());
        Judgment first = j.list().get(0);
        assertEquals(new Judgment("FH-1001", "ines", "insulated", "yes", 2), first);
        assertEquals(7, j.list().get(5).row());
        assertEquals("good.csv", j.source());
    }

    @Test
    void skipsTheByteOrderMarkAndMatchesHeaderNamesIgnoringCaseAndSpaces() throws IOException {
        Judgments j = read("bom-and-case.csv");
        assertEquals(List.of(new Judgment("FH-1", "ines", "closure", "zip", 2)), j.list());
    }

    @Test
    void matchesHeaderNamesIgnoringCaseUnderATurkishLocale() throws IOException {
        Locale before = Locale.getDefault();
        Locale.setDefault(Locale.forLanguageTag("tr-TR"));
        try {
            Judgments j = JudgmentsCsv.read(new StringReader("ITEM,ANNOTATOR,ATTRIBUTE,VALUE\nFH-1,ines,fit,slim\n"),
                    JudgmentColumns.DEFAULT, "upper");
            assertEquals(1, j.list().size(), j.problems().toString());
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void readsNamedColumnsAndIgnoresOthers() throws IOException {
        Judgments j = JudgmentsCsv.read(fixture("custom-columns.csv"),
                new JudgmentColumns("sku", "rater", "concept", "grade"));
        assertEquals(List.of(new Judgment("FH-1", "ines", "warmth", "2", 2), new Judgment("FH-2", "tomas", "warmth", "3", 3)),
                j.list());
    }

    @Test
    void recordsBadRowsWithTheirRowNumbersAndKeepsReading() throws IOException {
        Judgments j = read("bad-rows.csv");
        assertEquals(List.of("missing-column@3", "empty-field@4", "empty-value@5", "encoding@8"), kindsAndRows(j));
        assertEquals(List.of("FH-1", "FH-4", "FH-6"), j.list().stream().map(Judgment::item).toList());
        assertEquals(List.of(2L, 7L, 9L), j.list().stream().map(Judgment::row).toList());
        JudgmentProblem empty = j.problems().get(2);
        assertTrue(empty.reason().contains("FH-3") && empty.reason().contains("expected a value"), empty.reason());
        assertEquals("bad-rows.csv", empty.source());
    }

    @Test
    void problemReasonsNeverNameTheAnnotator() throws IOException {
        for (JudgmentProblem p : read("bad-rows.csv").problems()) {
            assertTrue(!p.reason().contains("ines") && !p.reason().contains("tomas"), p.reason());
        }
    }

    @Test
    void stopsAtBrokenQuotingAndSaysWhere() throws IOException {
        Judgments j = read("unterminated-quote.csv");
        assertEquals(List.of("FH-1"), j.list().stream().map(Judgment::item).toList());
        assertEquals(List.of("parse@3"), kindsAndRows(j));
        assertTrue(j.problems().get(0).reason().contains("double quote"));
    }

    @Test
    void aMissingHeaderColumnIsOneProblemNamingWhatWasFound() throws IOException {
        Judgments j = read("missing-header-column.csv");
        assertEquals(List.of(), j.list());
        assertEquals(List.of("header@1"), kindsAndRows(j));
        String reason = j.problems().get(0).reason();
        assertTrue(reason.contains("[annotator]") && reason.contains("rater"), reason);
    }

    @Test
    void anEmptyFileIsAProblemNotAnError() throws IOException {
        Judgments j = read("empty.csv");
        assertEquals(List.of("header@0"), kindsAndRows(j));
    }

    @Test
    void aMissingFileIsAnIoError() {
        assertThrows(NoSuchFileException.class, () -> JudgmentsCsv.read(Path.of("no/such/judgments.csv"), JudgmentColumns.DEFAULT));
    }

    @Test
    void columnNamesMustDiffer() {
        assertThrows(IllegalArgumentException.class, () -> new JudgmentColumns("item", "Item", "attribute", "value"));
    }
}
