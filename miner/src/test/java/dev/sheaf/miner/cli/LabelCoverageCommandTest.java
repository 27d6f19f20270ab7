package dev.sheaf.miner.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.label.LabelFixtures;
import dev.sheaf.vocab.store.VocabularyStore;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code sheaf label} and {@code sheaf coverage} on a small Fernhollow-style catalog and vocabulary file, through the command line. */
class LabelCoverageCommandTest {
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

    private Path catalog() throws IOException {
        Path cat = dir.resolve("ws/catalog");
        Files.createDirectories(cat.resolve("feeds"));
        Files.writeString(cat.resolve("feeds/jackets.jsonl"), String.join("\n",
                "{\"id\":\"FH-1001\",\"category\":\"jackets\",\"title\":\"Ridgeline Shell\",\"description\":\"Ripstop nylon, "
                        + "waterproof and windproof. No hood.\",\"specs\":{\"Weight\":\"2 lb 10 oz\"}}",
                "{\"id\":\"FH-1002\",\"category\":\"jackets\",\"title\":\"Fjell Anorak\",\"description\":\"Merino wool lining, "
                        + "hooded, not waterproof.\",\"bullets\":[\"Packs into its own pocket\"]}",
                "{\"id\":\"FH-1003\",\"category\":\"jackets\",\"title\":\"Tarn Vest\",\"description\":\"Light and simple.\"}",
                "{\"id\":\"FH-1004\",\"category\":\"jackets\",\"title\":\"Cirque Parka\",\"description\":\"Insulated parka with "
                        + "a removable hood and non-slip cuffs.\",\"specs\":{\"Weight\":\"1.4 kg\"}}"), StandardCharsets.UTF_8);
        Files.writeString(cat.resolve("packs.csv"), "sku,name,category,description,Capacity\n"
                + "FH-2001,Scree 30,packs,\"Water resistant ripstop nylon pack, PFC-free DWR\",30 L\n"
                + "FH-2002,Scree 45,packs,\"Water resistant merino wool hip belt\",45 L\n", StandardCharsets.UTF_8);
        VocabularyStore.write(dir.resolve("ws/fernhollow.vocab.json"), LabelFixtures.vocabulary());
        return cat;
    }

    @Test
    void labelWritesEveryExportAndPrintsASummary() throws IOException {
        Path cat = catalog();
        Path out = dir.resolve("out");
        Run r = run("label", cat.toString(), "--vocab", dir.resolve("ws/fernhollow.vocab.json").toString(), "--out", out.toString(),
                "--split", "50/50", "--seed", "3");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("listings            6"), r.out());
        assertTrue(r.out().contains("split               train 3, test 3"), r.out());
        for (String f : List.of("assignments.jsonl", "labels.csv", "facet-values.csv", "label-summary.csv", "label-summary.json",
                "category-errors.csv", "problems.csv", "gap-terms.csv", "split.csv", "split-summary.csv")) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f);
        }
        assertEquals(6, Files.readAllLines(out.resolve("assignments.jsonl")).size());
        assertTrue(r.err().contains("sheaf label: 6 listings from 2 files"), r.err());
    }

    @Test
    void coverageReadsTheLabelOutputAndPrintsATable() throws IOException {
        Path cat = catalog();
        Path labels = dir.resolve("labels");
        String vocab = dir.resolve("ws/fernhollow.vocab.json").toString();
        assertEquals(ExitCodes.OK, run("label", cat.toString(), "--vocab", vocab, "--out", labels.toString()).code());
        Path cov = dir.resolve("coverage");
        Run r = run("coverage", labels.toString(), "--vocab", vocab, "--out", cov.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("Listings 6: 1 without a stated label, 1 with no attribute at all"), r.out());
        assertTrue(r.out().contains("Facets (fill rate"), r.out());
        assertTrue(r.out().contains("weight"), r.out());
        for (String f : List.of("coverage.csv", "coverage-by-category.csv", "coverage-by-source.csv", "facet-fill.csv",
                "facet-distribution.csv", "overlap.csv", "concentration.csv", "coverage-curve.csv", "coverage-gaps.csv", "coverage.json")) {
            assertTrue(Files.isRegularFile(cov.resolve(f)), f);
        }
        String fill = Files.readString(cov.resolve("facet-fill.csv"));
        // hood applies to jackets only: 4 applicable, filled by FH-1002 (hooded) and FH-1004 (removable hood)
        assertTrue(fill.contains("hood,hood,term,no,*,6,4,2,0,0,0.5,"), fill);
    }

    @Test
    void aWorkspaceGivesSourcesVocabularyAndOutput() throws IOException {
        catalog();
        Path ws = dir.resolve("ws");
        Files.writeString(ws.resolve("workspace.json"), "{\"format\":\"sheaf-workspace\",\"formatVersion\":1,\"name\":\"t\","
                + "\"sources\":[{\"path\":\"catalog\"}],\"profile\":\"default\",\"vocabulary\":\"fernhollow.vocab.json\","
                + "\"output\":\"out\"}", StandardCharsets.UTF_8);
        assertEquals(ExitCodes.OK, run("label", "--workspace", ws.toString()).code());
        assertTrue(Files.isRegularFile(ws.resolve("out/labels/labels.csv")));
        String jsonl = Files.readString(ws.resolve("out/labels/assignments.jsonl"));
        assertTrue(jsonl.contains("\"source\":\"catalog/feeds/jackets.jsonl\""), "sources are relative to the workspace");
        Run c = run("coverage", "--workspace", ws.toString());
        assertEquals(ExitCodes.OK, c.code(), c.err());
        assertTrue(Files.isRegularFile(ws.resolve("out/coverage/coverage.json")));
    }

    @Test
    void unreadableInputsGiveExitCodeThreeAndAProblemsFile() throws IOException {
        Path cat = catalog();
        Files.write(cat.resolve("broken.pdf"), "%PDF-1.7 not really".getBytes(StandardCharsets.US_ASCII));
        Path out = dir.resolve("out");
        Run r = run("label", cat.toString(), "--vocab", dir.resolve("ws/fernhollow.vocab.json").toString(), "--out", out.toString());
        assertEquals(ExitCodes.PROBLEMS, r.code(), r.err());
        assertTrue(Files.readString(out.resolve("problems.csv")).contains("broken.pdf"));
    }

    @Test
    void wrongCommandLinesAreUsageErrorsThatSayWhatToDo() throws IOException {
        Path cat = catalog();
        String vocab = dir.resolve("ws/fernhollow.vocab.json").toString();
        Run none = run("label", "--vocab", vocab);
        assertEquals(ExitCodes.USAGE, none.code());
        assertTrue(none.err().contains("expected SOURCE"), none.err());
        Run split = run("label", cat.toString(), "--vocab", vocab, "--split", "80");
        assertEquals(ExitCodes.USAGE, split.code());
        assertTrue(split.err().contains("80/10/10"), split.err());
        Run key = run("label", cat.toString(), "--vocab", vocab, "--set", "negationWindw=4");
        assertEquals(ExitCodes.USAGE, key.code());
        assertTrue(key.err().contains("\"negationWindw\" is not a label option"), key.err());
        Run cov = run("coverage", dir.resolve("nowhere").toString(), "--vocab", vocab);
        assertEquals(ExitCodes.USAGE, cov.code());
        assertTrue(cov.err().contains("run 'sheaf label' first"), cov.err());
    }

    @Test
    void aMissingVocabularyFileIsAFailureNamingTheFile() throws IOException {
        Path cat = catalog();
        Run r = run("label", cat.toString(), "--vocab", dir.resolve("missing.vocab.json").toString(), "--out", dir.resolve("o").toString());
        assertEquals(ExitCodes.FAILURE, r.code());
        assertTrue(r.err().contains("missing.vocab.json does not exist"), r.err());
    }

    @Test
    void aFileThatIsNotAVocabularyIsAFailureSayingWhereItBreaks() throws IOException {
        Path cat = catalog();
        Path bad = dir.resolve("bad.vocab.json");
        Files.writeString(bad, "{\"format\": \"something-else\"}", StandardCharsets.UTF_8);
        Run r = run("label", cat.toString(), "--vocab", bad.toString(), "--out", dir.resolve("o").toString());
        assertEquals(ExitCodes.FAILURE, r.code());
        assertTrue(r.err().contains("cannot read the vocabulary"), r.err());
    }

    @Test
    void helpShowsExamplesAndExitCodes() {
        for (String cmd : List.of("label", "coverage")) {
            Run r = run(cmd, "--help");
            assertEquals(0, r.code());
            assertTrue(r.out().contains("Examples:"), r.out());
            assertTrue(r.out().contains("3  problems"), r.out());
        }
    }
}
