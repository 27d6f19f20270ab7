package dev.sheaf.miner.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** sheaf mine through Main.commandLine, fed by a test feed until the ingest stage is merged. */
class MineCommandTest {
    private static final Path FEED = Path.of("src/test/resources/mine/feed");
    private static final Path BAD = Path.of("src/test/resources/mine/bad.jsonl");

    @TempDir
    Path tmp;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    @BeforeEach
    void useTestFeed() {
        assertTrue(Files.isDirectory(FEED), "fixture folder missing: " + FEED.toAbsolutePath());
        MineCommand.feed = new JsonlFeed();
    }

    @AfterEach
    void restoreFeed() {
        MineCommand.feed = ListingFeeds.DEFAULT;
    }

    private int run(String... args) {
        return Main.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
    }

    @Test
    void helpNamesTheOptionsExamplesAndExitCodes() {
        assertEquals(ExitCodes.OK, run("mine", "--help"));
        String help = out.toString();
        for (String s : List.of("--out", "--workspace", "--profile", "--ngram-max", "--min-frequency", "--min-df",
                "--max-df-share", "--rank-by", "--evidence", "--threads", "--mapping", "--include", "--exclude",
                "Examples:", "Exit codes:", "3  problems")) {
            assertTrue(help.contains(s), "help lacks " + s + ":\n" + help);
        }
    }

    @Test
    void minesSourcesIntoHarvestFilesAndSummarises() throws IOException {
        Path dir = tmp.resolve("h");
        assertEquals(ExitCodes.OK, run("mine", FEED.toString(), "--out", dir.toString(), "--min-frequency", "3",
                "--min-df", "2", "--threads", "2"), err.toString());
        for (String f : List.of("harvest.json", "harvest.csv", "harvest-specs.csv", "problems.csv")) {
            assertTrue(Files.isRegularFile(dir.resolve(f)), f);
        }
        Harvest h = HarvestFiles.readJson(dir.resolve("harvest.json"));
        assertEquals(120, h.corpus().listings());
        assertFalse(h.candidates().isEmpty());
        assertEquals(3, h.parameters().options().minFrequency());
        String summary = out.toString();
        assertTrue(summary.contains("listings     120"), summary);
        assertTrue(summary.contains("top candidates:"), summary);
        List<String> csv = Files.readAllLines(dir.resolve("harvest.csv"), StandardCharsets.UTF_8);
        assertEquals(String.join(",", HarvestFiles.CSV_HEADER), csv.get(0));
        assertEquals(h.candidates().size() + 1, csv.size());
    }

    @Test
    void theSameInputGivesByteIdenticalFilesWhateverTheThreads() throws IOException {
        Path a = tmp.resolve("a");
        Path b = tmp.resolve("b");
        assertEquals(ExitCodes.OK, run("mine", FEED.toString(), "--out", a.toString(), "--threads", "1"));
        assertEquals(ExitCodes.OK, run("mine", FEED.toString(), "--out", b.toString(), "--threads", "3"));
        for (String f : List.of("harvest.json", "harvest.csv", "harvest-specs.csv")) {
            assertArrayEquals(Files.readAllBytes(a.resolve(f)), Files.readAllBytes(b.resolve(f)), f);
        }
    }

    @Test
    void anUnreadableInputIsRecordedAndTheExitCodeSaysSo() throws IOException {
        Path dir = tmp.resolve("p");
        assertEquals(ExitCodes.PROBLEMS, run("mine", FEED.toString(), BAD.toString(), "--out", dir.toString()));
        List<String> problems = Files.readAllLines(dir.resolve("problems.csv"), StandardCharsets.UTF_8);
        assertEquals(2, problems.size(), problems.toString());
        assertTrue(problems.get(1).startsWith("bad.jsonl,line 1,parse,"), problems.get(1));
        assertTrue(err.toString().contains("1 input problem"), err.toString());
        assertEquals(120, HarvestFiles.readJson(dir.resolve("harvest.json")).corpus().listings());
    }

    @Test
    void wrongCommandLinesAreUsageErrorsWithTheFix() {
        assertEquals(ExitCodes.USAGE, run("mine", FEED.toString()));
        assertTrue(err.toString().contains("--out DIR is required"), err.toString());
        assertEquals(ExitCodes.USAGE, run("mine", FEED.toString(), "--out", tmp.toString(), "--rank-by", "magic"));
        assertTrue(err.toString().contains("unknown score 'magic'"), err.toString());
        assertEquals(ExitCodes.USAGE, run("mine", FEED.toString(), "--out", tmp.toString(), "--ngram-max", "9"));
        assertTrue(err.toString().contains("n-gram max must be from 1 to 5"), err.toString());
        assertEquals(ExitCodes.USAGE, run("mine", FEED.toString(), "--out", tmp.toString(), "--profile", "nonesuch"));
        assertTrue(err.toString().contains("neither a preset"), err.toString());
        assertEquals(ExitCodes.USAGE, run("mine", "no/such/folder", "--out", tmp.toString()));
        assertTrue(err.toString().contains("does not exist"), err.toString());
    }

    @Test
    void aWorkspaceGivesSourcesProfileAndOutput() throws IOException {
        Path ws = tmp.resolve("ws");
        Files.createDirectories(ws.resolve("catalog"));
        Files.copy(FEED.resolve("outdoor.jsonl"), ws.resolve("catalog/outdoor.jsonl"));
        Files.writeString(ws.resolve("workspace.json"), "{\"format\":\"sheaf-workspace\",\"formatVersion\":1,\"name\":\"t\","
                + "\"sources\":[{\"path\":\"catalog\"}],\"profile\":\"plain\",\"output\":\"results\"}");
        assertEquals(ExitCodes.OK, run("mine", "--workspace", ws.toString(), "--min-frequency", "2"), err.toString());
        Harvest h = HarvestFiles.readJson(ws.resolve("results/harvest.json"));
        assertEquals("plain", h.parameters().profile().get("name").asText());
        assertEquals(80, h.corpus().listings());
    }

    @Test
    void theProgressBarGoesToStderrAndTheDataToStdout() {
        assertEquals(ExitCodes.OK, run("mine", FEED.toString(), "--out", tmp.resolve("g").toString(), "--progress"));
        String e = err.toString();
        assertTrue(e.contains("sheaf mine") && e.contains("listings") && e.contains("problems"), e);
        assertTrue(e.contains("counting 2-grams"), e);
        assertFalse(out.toString().contains("counting 2-grams"), out.toString());
    }

    @Test
    void theDefaultFeedReadsListingFilesThroughIngest() {
        MineCommand.feed = ListingFeeds.DEFAULT;
        assertEquals(ExitCodes.OK, run("mine", FEED.toString(), "--out", tmp.toString()), err.toString());
        assertTrue(java.nio.file.Files.exists(tmp.resolve("harvest.json")));
    }
}
