package dev.sheaf.miner.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AgreementCommandTest {
    /** Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]+[comp]: 4 observers x 12 units. */
    private static final String[] EXAMPLE = {
        "1 2 3 3 2 1 4 1 2 . . .",
        "1 2 3 3 2 2 4 1 2 5 . 3",
        ". 3 3 3 2 3 4 2 2 5 1 .",
        "1 2 3 3 2 4 4 1 2 5 1 ."};
    private static final String[] OBSERVERS = {"alder.fenn", "birch.oyelaran", "cedar.quist", "dogwood.m"};

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

    private Path judgments(String name, String header, List<String> extra) throws IOException {
        List<String> lines = new ArrayList<>();
        lines.add(header);
        for (int o = 0; o < 4; o++) {
            String[] cells = EXAMPLE[o].split(" ");
            for (int u = 0; u < cells.length; u++) {
                if (!cells[u].equals(".")) {
                    lines.add("FH-" + (100 + u) + "," + OBSERVERS[o] + ",warmth," + cells[u]);
                }
            }
        }
        lines.addAll(extra);
        Path file = dir.resolve(name);
        Files.write(file, lines, StandardCharsets.UTF_8);
        return file;
    }

    private Path judgments() throws IOException {
        return judgments("judgments.csv", "item,annotator,attribute,value", List.of());
    }

    @Test
    void helpShowsAnExampleAndTheExitCodes() {
        Run r = run("agreement", "--help");
        assertEquals(0, r.code());
        assertTrue(r.out().contains("sheaf agreement sample-listings/judgments.csv"), r.out());
        assertTrue(r.out().contains("3  problems"), r.out());
        assertTrue(r.out().contains("--metric=ATTR=METRIC"), r.out());
    }

    @Test
    void printsTheTableAndWritesTheFilesAtomically() throws IOException {
        Path out = dir.resolve("results");
        Run r = run("agreement", judgments().toString(), "--out", out.toString(), "--replicates", "300");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        String[] lines = r.out().split("\\R");
        assertTrue(lines[0].startsWith("attribute") && lines[0].contains("alpha [95% CI]") && lines[0].contains("verdict"), lines[0]);
        // Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]: ordinal 0.815
        assertTrue(lines[1].matches("warmth\\s+12\\s+41\\s+0\\.815 \\[\\d\\.\\d{3}, \\d\\.\\d{3}]\\s+ordinal\\s+.*reliable"), lines[1]);
        for (String f : List.of("agreement.csv", "agreement.json", "annotators.csv", "problems.csv")) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f);
        }
        try (var files = Files.list(out)) {
            assertEquals(4, files.count(), "no temporary files left");
        }
        assertTrue(r.err().contains("41 judgments read, 41 used"), r.err());
    }

    @Test
    void rawAnnotatorIdsNeverAppearAndTheKeyIsKeptBesideTheInput() throws IOException {
        Path out = dir.resolve("results");
        Run r = run("agreement", judgments().toString(), "--out", out.toString(), "--replicates", "50");
        StringBuilder everything = new StringBuilder(r.out()).append(r.err());
        try (var files = Files.list(out)) {
            for (Path p : files.toList()) {
                everything.append(Files.readString(p, StandardCharsets.UTF_8));
            }
        }
        for (String raw : OBSERVERS) {
            assertFalse(everything.toString().contains(raw), raw + " leaked");
        }
        assertTrue(r.out().contains("ann-"), r.out());
        assertTrue(Files.isRegularFile(dir.resolve(".sheaf/pseudonym.key")));
        Run again = run("agreement", judgments().toString(), "--out", out.toString(), "--replicates", "50");
        assertEquals(r.out(), again.out(), "same key and seed: same pseudonyms and figures");
    }

    @Test
    void skippedRowsGiveTheProblemsExitCode() throws IOException {
        Path file = judgments("judgments.csv", "item,annotator,attribute,value", List.of("FH-999,alder.fenn,warmth,", "FH-998"));
        Run r = run("agreement", file.toString(), "--out", dir.resolve("o").toString(), "--replicates", "0");
        assertEquals(ExitCodes.PROBLEMS, r.code(), r.err());
        assertTrue(r.err().contains("2 rows left out") && r.err().contains("problems.csv"), r.err());
        List<String> problems = Files.readAllLines(dir.resolve("o/problems.csv"), StandardCharsets.UTF_8);
        assertEquals(3, problems.size());
        assertTrue(problems.get(1).contains(",43,empty-value,"), problems.get(1));
    }

    @Test
    void aMetricOptionChangesTheMetric() throws IOException {
        Run r = run("agreement", judgments().toString(), "--out", dir.resolve("o").toString(), "--replicates", "0",
                "--metric", "warmth=INTERVAL");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        // Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]+[comp]: interval 0.849
        assertTrue(r.out().contains("0.849") && r.out().contains("interval"), r.out());
    }

    @Test
    void theSeedDecidesTheInterval() throws IOException {
        String file = judgments().toString();
        String o = dir.resolve("o").toString();
        Run one = run("agreement", file, "--out", o, "--seed", "1", "--replicates", "200");
        Run same = run("agreement", file, "--out", o, "--seed", "1", "--replicates", "200");
        Run other = run("agreement", file, "--out", o, "--seed", "2", "--replicates", "200");
        assertEquals(one.out(), same.out());
        assertNotEquals(one.out(), other.out());
    }

    @Test
    void columnOptionsNameOtherHeaders() throws IOException {
        Path file = judgments("graded.csv", "sku,rater,concept,grade", List.of());
        Run r = run("agreement", file.toString(), "--out", dir.resolve("o").toString(), "--replicates", "0",
                "--item-column", "sku", "--annotator-column", "rater", "--attribute-column", "concept", "--value-column", "grade");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("warmth"), r.out());
    }

    @Test
    void readsTheJudgmentsAndOutputFolderFromTheWorkspace() throws IOException {
        judgments();
        Files.writeString(dir.resolve("workspace.json"),
                "{\"format\": \"sheaf-workspace\", \"judgments\": \"judgments.csv\", \"output\": \"results\"}");
        Run r = run("agreement", "--workspace", dir.toString(), "--replicates", "0");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(Files.isRegularFile(dir.resolve("results/agreement/agreement.json")));
        assertTrue(Files.isRegularFile(dir.resolve(".sheaf/pseudonym.key")));
        assertTrue(Files.readString(dir.resolve("results/agreement/agreement.json")).contains("\"source\" : \"judgments.csv\""));
    }

    @Test
    void aWorkspaceWithoutJudgmentsIsAUsageError() throws IOException {
        Files.writeString(dir.resolve("workspace.json"), "{\"format\": \"sheaf-workspace\"}");
        Run r = run("agreement", "--workspace", dir.toString());
        assertEquals(ExitCodes.USAGE, r.code());
        assertTrue(r.err().contains("names no judgments file"), r.err());
    }

    @Test
    void aBrokenWorkspaceFileIsAFailureThatSaysWhy() throws IOException {
        Files.writeString(dir.resolve("workspace.json"), "{\"judgments\": ");
        Run r = run("agreement", "--workspace", dir.toString());
        assertEquals(ExitCodes.FAILURE, r.code());
        assertTrue(r.err().contains("not valid JSON"), r.err());
    }

    @Test
    void aMissingJudgmentsFileIsAFailure() {
        Run r = run("agreement", dir.resolve("nope.csv").toString(), "--out", dir.resolve("o").toString());
        assertEquals(ExitCodes.FAILURE, r.code());
        assertTrue(r.err().contains("no such file"), r.err());
    }

    @Test
    void badOptionValuesAreUsageErrors() throws IOException {
        String file = judgments().toString();
        Run threshold = run("agreement", file, "--threshold", "alpha.good=0.9");
        assertEquals(ExitCodes.USAGE, threshold.code());
        assertTrue(threshold.err().contains("alpha.good"), threshold.err());
        assertEquals(ExitCodes.USAGE, run("agreement", file, "--replicates", "-1").code());
        assertEquals(ExitCodes.USAGE, run("agreement", file, "--metric", "warmth=fuzzy").code());
        assertEquals(ExitCodes.USAGE, run("agreement").code());
    }
}
