package dev.sheaf.miner.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code sheaf consistency} on the constructed fixtures in src/test/resources/consistency. */
class ConsistencyCommandTest {
    private static final List<String> PEOPLE = List.of("alder.fenn", "birch.oyelaran", "cedar.quist", "dogwood.m");

    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    private Path copy(String name) throws IOException {
        try {
            Path from = Path.of(ConsistencyCommandTest.class.getResource("/consistency/" + name).toURI());
            return Files.copy(from, dir.resolve(name), StandardCopyOption.REPLACE_EXISTING);
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    private Run full(Path outDir) throws IOException {
        return run("consistency", copy("feedback.csv").toString(), "--vocab", copy("tiny.vocab.json").toString(),
                "--assignments", copy("assignments.jsonl").toString(), "--scales", copy("scales.json").toString(),
                "--out", outDir.toString(), "--key", dir.resolve("key").toString());
    }

    @Test
    void writesEveryFileAndPrintsTheTable() throws IOException {
        Path outDir = dir.resolve("out");
        Run r = full(outDir);
        assertEquals(ExitCodes.PROBLEMS, r.code(), "one bad feedback row and one broken assignments line: " + r.err());
        for (String f : List.of("consistency.csv", "consistency.json", "contradictions.csv", "vocabulary-gaps.csv",
                "mentions.csv", "problems.csv")) {
            assertTrue(Files.isRegularFile(outDir.resolve(f)), f);
        }
        assertTrue(r.out().startsWith("attribute"), r.out());
        assertTrue(r.out().contains("weight"));
        assertTrue(r.out().contains("Words the vocabulary lacks: comfier (4)"), r.out());
        assertTrue(r.err().contains("assignments.jsonl line 5"), r.err());
        assertTrue(r.err().contains("1 feedback row left out"), r.err());
    }

    @Test
    void theFiguresInTheJsonMatchTheFixture() throws IOException {
        Path outDir = dir.resolve("out");
        full(outDir);
        JsonNode root = new ObjectMapper().readTree(outDir.resolve("consistency.json").toFile());
        assertEquals("sheaf-consistency", root.get("format").asText());
        assertEquals(8, root.get("sentences").asInt());
        JsonNode weight = attribute(root, "weight").get("feedback");
        assertEquals(3, weight.get("mentions").asInt());
        // lighter, lighter grounded (900 g < 1000 g); heavier not
        assertEquals(2.0 / 3, weight.get("grounding").get("precision").asDouble(), 1e-12);
        JsonNode temp = attribute(root, "temperature-rating").get("feedback");
        // warmer, warmer grounded (-5 °C < 0 °C); "not as warm" claims a higher rating: not grounded
        assertEquals(2, temp.get("grounding").get("comparisonGrounded").asInt());
        assertEquals(3, temp.get("grounding").get("comparisonChecked").asInt());
        JsonNode waterproof = attribute(root, "waterproof");
        assertEquals("claim", waterproof.get("flags").get(0).get("kind").asText());
        assertEquals("ambiguous", attribute(root, "down").get("flags").get(0).get("kind").asText());
        assertTrue(root.get("thresholds").get("alpha.tentative").get("source").asText().contains("Krippendorff 2004"));
        assertEquals("comfier", root.get("vocabularyGaps").get(0).get("term").asText());
    }

    private static JsonNode attribute(JsonNode root, String id) {
        for (JsonNode a : root.get("attributes")) {
            if (a.get("attribute").asText().equals(id)) {
                return a;
            }
        }
        throw new AssertionError("no attribute " + id);
    }

    @Test
    void everyOutputShowsPseudonymsNeverTheIdsFromTheFile() throws IOException {
        Path outDir = dir.resolve("out");
        Run r = full(outDir);
        StringBuilder all = new StringBuilder(r.out()).append(r.err());
        try (Stream<Path> files = Files.list(outDir)) {
            for (Path f : files.toList()) {
                all.append(Files.readString(f, StandardCharsets.UTF_8));
            }
        }
        for (String p : PEOPLE) {
            assertFalse(all.toString().contains(p), p + " appears in an output");
        }
        String contradictions = Files.readString(outDir.resolve("contradictions.csv"), StandardCharsets.UTF_8);
        assertTrue(contradictions.contains(",ann-"), contradictions);
    }

    @Test
    void aSentenceThatLooksLikeAFormulaIsNeutralised() throws IOException {
        Path outDir = dir.resolve("out");
        full(outDir);
        String contradictions = Files.readString(outDir.resolve("contradictions.csv"), StandardCharsets.UTF_8);
        assertTrue(contradictions.contains("\"'=HYPERLINK(\"\"x\"\") comfier, no hood\""), contradictions);
    }

    @Test
    void aWorkspaceNamesTheFilesAndTheOutputFolder() throws IOException {
        copy("feedback.csv");
        copy("tiny.vocab.json");
        copy("scales.json");
        Files.createDirectories(dir.resolve("catalog"));
        Files.writeString(dir.resolve("workspace.json"), "{\"format\":\"sheaf-workspace\",\"formatVersion\":1,"
                + "\"sources\":[{\"path\":\"catalog\"}],\"vocabulary\":\"tiny.vocab.json\",\"feedback\":\"feedback.csv\","
                + "\"output\":\"results\"}", StandardCharsets.UTF_8);
        Run r = run("consistency", "--workspace", dir.toString());
        assertEquals(ExitCodes.PROBLEMS, r.code(), r.err());
        assertTrue(Files.isRegularFile(dir.resolve("results/consistency/consistency.csv")));
        assertTrue(Files.isRegularFile(dir.resolve(".sheaf/pseudonym.key")), "the key is kept in the workspace");
        assertTrue(r.err().contains("scales: " + dir.resolve("scales.json")), r.err());
        String problems = Files.readString(dir.resolve("results/consistency/problems.csv"), StandardCharsets.UTF_8);
        assertTrue(problems.contains("feedback.csv,10,empty-field"), problems);
    }

    @Test
    void theSameKeyGivesTheSamePseudonymsInTheNextRun() throws IOException {
        full(dir.resolve("a"));
        full(dir.resolve("b"));
        assertEquals(Files.readString(dir.resolve("a/contradictions.csv")), Files.readString(dir.resolve("b/contradictions.csv")));
    }

    @Test
    void aThresholdOverrideChangesTheFlags() throws IOException {
        Path outDir = dir.resolve("out");
        run("consistency", copy("feedback.csv").toString(), "--vocab", copy("tiny.vocab.json").toString(),
                "--out", outDir.toString(), "--key", dir.resolve("key").toString(), "--threshold", "ambiguous.mentions=1");
        String csv = Files.readString(outDir.resolve("consistency.csv"));
        assertTrue(csv.lines().anyMatch(l -> l.startsWith("down,") && l.contains("ambiguous")), "the shared label still flags");
    }

    @Test
    void wrongCommandLinesAreUsageErrors() throws IOException {
        Run noVocab = run("consistency", copy("feedback.csv").toString(), "--out", dir.resolve("o").toString());
        assertEquals(ExitCodes.USAGE, noVocab.code());
        assertTrue(noVocab.err().contains("--vocab"), noVocab.err());
        Run unknown = run("consistency", copy("feedback.csv").toString(), "--vocab", copy("tiny.vocab.json").toString(),
                "--threshold", "hedge.rates=0.4", "--out", dir.resolve("o").toString(), "--key", dir.resolve("k").toString());
        assertEquals(ExitCodes.USAGE, unknown.code());
        assertTrue(unknown.err().contains("unknown flag threshold 'hedge.rates'"), unknown.err());
        Run missing = run("consistency", dir.resolve("nope.csv").toString(), "--vocab", copy("tiny.vocab.json").toString(),
                "--key", dir.resolve("k").toString());
        assertEquals(ExitCodes.FAILURE, missing.code());
        assertTrue(missing.err().contains("no such file"), missing.err());
    }

    @Test
    void helpShowsAnExampleAndTheExitCodes() {
        Run r = run("consistency", "--help");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("sheaf consistency sample-listings/feedback.csv --vocab"), r.out());
        assertTrue(r.out().contains("3  problems"), r.out());
        assertTrue(r.out().contains("Krippendorff 2004"));
    }
}
