package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AgreementFilesTest {
    private static final AgreementOptions OPTIONS = AgreementOptions.builder()
            .pseudonyms(Pseudonyms.withKey("agreement-files-test-key-0000001".getBytes(StandardCharsets.US_ASCII)))
            .replicates(100).build();

    private static AgreementReport report() {
        List<Judgment> j = new ArrayList<>(AgreementAnalysisTest.krippendorffExample("warmth"));
        j.add(new Judgment("FH-1", "alder", "=HYPERLINK(\"x\")", "yes", 0));
        j.add(new Judgment("FH-1", "birch", "=HYPERLINK(\"x\")", "yes", 0));
        return AgreementAnalysis.run(Judgments.of("judgments.csv", j,
                List.of(new JudgmentProblem("judgments.csv", 7, "empty-value", "expected a value"))), OPTIONS);
    }

    @Test
    void writesTheFourFiles(@TempDir Path dir) throws IOException {
        List<Path> written = AgreementFiles.write(report(), dir.resolve("out"));
        assertEquals(4, written.size());
        for (Path p : written) {
            assertTrue(Files.size(p) > 0, p.toString());
        }
        List<String> attributes = Files.readAllLines(dir.resolve("out/agreement.csv"), StandardCharsets.UTF_8);
        assertEquals(3, attributes.size());
        assertTrue(attributes.get(0).startsWith("attribute,scale,metric,"));
        List<String> problems = Files.readAllLines(dir.resolve("out/problems.csv"), StandardCharsets.UTF_8);
        assertEquals(List.of("source,row,kind,reason", "judgments.csv,7,empty-value,expected a value"), problems);
        assertEquals(1 + 2 + 4, Files.readAllLines(dir.resolve("out/annotators.csv")).size());
    }

    @Test
    void formulaLikeCellsAreNeutralisedAndUndefinedFiguresAreEmpty(@TempDir Path dir) throws IOException {
        AgreementFiles.write(report(), dir);
        String csv = Files.readString(dir.resolve("agreement.csv"), StandardCharsets.UTF_8);
        // OWASP "CSV Injection" [pub]: a leading '=' gets a quote mark and the cell is quoted.
        assertTrue(csv.contains("\"'=HYPERLINK(\"\"x\"\")\",present/absent,nominal,auto,1,2,2,1,2,,,"), csv);
    }

    @Test
    void jsonHoldsNullForUndefinedFiguresAndTheBootstrapMethod(@TempDir Path dir) throws IOException {
        AgreementFiles.write(report(), dir);
        JsonNode root = new ObjectMapper().readTree(dir.resolve("agreement.json").toFile());
        assertEquals("sheaf-agreement", root.get("format").asText());
        JsonNode first = root.get("attributes").get(0);
        assertTrue(first.get("alpha").get("value").isNull());
        assertTrue(first.get("alpha").get("undefinedReason").asText().contains("no variation"));
        JsonNode warmth = root.get("attributes").get(1);
        assertEquals("ordinal", warmth.get("metric").asText());
        assertEquals(0.815, warmth.get("alpha").get("value").asDouble(), 0.0005);
        assertEquals(6, warmth.get("pairs").size());
        assertTrue(root.get("bootstrap").get("method").asText().contains("units"));
        assertEquals(1, root.get("problemRows").size());
    }

    @Test
    void noFileHoldsARawAnnotatorId(@TempDir Path dir) throws IOException {
        for (Path p : AgreementFiles.write(report(), dir)) {
            String text = Files.readString(p, StandardCharsets.UTF_8);
            for (String raw : List.of("alder", "birch", "cedar", "dogwood")) {
                assertFalse(text.contains(raw), raw + " in " + p.getFileName());
            }
        }
    }

    @Test
    void rewritingLeavesNoTemporaryFiles(@TempDir Path dir) throws IOException {
        AgreementFiles.write(report(), dir);
        AgreementFiles.write(report(), dir);
        try (var files = Files.list(dir)) {
            assertEquals(4, files.count());
        }
    }
}
