package dev.sheaf.miner.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ReportTablesTest {
    @TempDir
    Path tmp;

    static ReportTable table() {
        return ReportTable.builder("fill-rates", "Fill rate", ReportTable.Column.text("facet"),
                        ReportTable.Column.count("listings"), ReportTable.Column.share("fill rate"),
                        ReportTable.Column.coefficient("alpha"))
                .row("closure, type", 120, 0.9083333333333333, -0.125)
                .row("=1+2\";=1+2", 0, Double.NaN, Double.NaN)
                .row("fibre \"content\"", 140L, 0.12, 0.5)
                .note("Pairs without listings are left out.")
                .build();
    }

    @Test
    void csvHasTheHeaderRawNumbersAndSpreadsheetSafeText() throws IOException {
        ReportTables.write(tmp, table());
        String csv = Files.readString(tmp.resolve("fill-rates.csv"), StandardCharsets.UTF_8);
        // OWASP "CSV Injection" example: =1+2";=1+2 -> "'=1+2"";=1+2" [pub]
        assertEquals("facet,listings,fill rate,alpha\r\n"
                + "\"closure, type\",120,0.9083333333333333,-0.125\r\n"
                + "\"'=1+2\"\";=1+2\",0,,\r\n"
                + "\"fibre \"\"content\"\"\",140,0.12,0.5\r\n", csv);
    }

    @Test
    void jsonHoldsColumnsAndRowsWithNullForNotAvailable() throws IOException {
        ReportTables.write(tmp, table());
        JsonNode json = new ObjectMapper().readTree(tmp.resolve("fill-rates.json").toFile());
        assertEquals("sheaf-report-table", json.get("format").asText());
        assertEquals(1, json.get("formatVersion").asInt());
        assertEquals("share", json.get("columns").get(2).get("kind").asText());
        assertEquals(0.9083333333333333, json.get("rows").get(0).get("fill rate").asDouble());
        assertEquals(-0.125, json.get("rows").get(0).get("alpha").asDouble());
        assertTrue(json.get("rows").get(1).get("fill rate").isNull());
        assertEquals("=1+2\";=1+2", json.get("rows").get(1).get("facet").asText(), "JSON keeps text as is");
        assertEquals(140, json.get("rows").get(2).get("listings").asLong());
        assertTrue(json.get("rows").get(2).get("listings").isIntegralNumber());
    }

    @Test
    void sameTableGivesTheSameBytesWithUnixLineEnds() throws IOException {
        String a = ReportTables.json(table());
        assertEquals(a, ReportTables.json(table()));
        assertTrue(!a.contains("\r") && a.endsWith("}\n"), a);
    }

    @Test
    void writeAllWritesCsvThenJsonPerTable() throws IOException {
        ReportTable other = ReportTable.builder("other", "Other", ReportTable.Column.count("n")).row(1).build();
        List<Path> files = ReportTables.writeAll(tmp.resolve("t"), List.of(table(), other));
        assertEquals(List.of("fill-rates.csv", "fill-rates.json", "other.csv", "other.json"),
                files.stream().map(p -> p.getFileName().toString()).toList());
        for (Path p : files) {
            assertTrue(Files.size(p) > 0, p.toString());
        }
    }

    @Test
    void rowsMustMatchTheirColumns() {
        assertThrows(IllegalArgumentException.class, () -> ReportTable.builder("t", "T", ReportTable.Column.count("n"))
                .row("text in a count column").build());
        assertThrows(IllegalArgumentException.class, () -> ReportTable.builder("t", "T", ReportTable.Column.text("a"))
                .row("x", "one cell too many").build());
        assertThrows(IllegalArgumentException.class, () -> ReportTable.builder("t", "T", ReportTable.Column.text("a"))
                .row((Object) null).build());
        assertThrows(IllegalArgumentException.class, () -> ReportTable.builder("t", "T", ReportTable.Column.text("a"),
                ReportTable.Column.count("a")).build());
        assertThrows(IllegalArgumentException.class, () -> ReportTable.builder("../escape", "T",
                ReportTable.Column.text("a")).build());
    }
}
