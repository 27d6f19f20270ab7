package dev.sheaf.miner.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import dev.sheaf.miner.mine.HarvestOptions;
import dev.sheaf.miner.mine.Harvester;
import dev.sheaf.miner.suggest.SuggestionFiles;
import dev.sheaf.miner.text.AnalysisProfile;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code sheaf suggest} through the command line: files written, table on stdout, usage errors. */
class SuggestCommandTest {
    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    private Path harvest() throws Exception {
        List<Listing> ls = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            ls.add(new Listing("L" + i, "tents", "t.jsonl", "line " + i, List.of(
                    Field.of(FieldKind.BULLET, (i % 3 == 0 ? "Colour" : i % 3 == 1 ? "Color" : "Shade") + " range for " + i),
                    Field.of(FieldKind.BULLET, i % 4 == 0 ? "Fibre poles" : i % 4 == 1 ? "Fiber poles" : "Steel pegs"))));
        }
        Harvest h = Harvester.builder().profile(AnalysisProfile.defaults()).options(HarvestOptions.defaults()).threads(1).build().harvest(ls);
        HarvestFiles.write(h, dir);
        return dir.resolve(HarvestFiles.JSON);
    }

    @Test
    void writesJsonAndCsvAndPrintsARankedTable() throws Exception {
        Path h = harvest();
        Path out = dir.resolve("s");
        Run r = run("suggest", "--harvest", h.toString(), "--out", out.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("merge suggestions"), r.out());
        assertTrue(r.out().contains("spelling-variant"), r.out());
        String json = Files.readString(out.resolve(SuggestionFiles.JSON), StandardCharsets.UTF_8);
        assertTrue(json.contains("\"format\" : \"sheaf-suggestions\""), json);
        List<String> csv = Files.readAllLines(out.resolve(SuggestionFiles.CSV), StandardCharsets.UTF_8);
        assertEquals(String.join(",", SuggestionFiles.CSV_HEADER), csv.get(0));
        assertTrue(csv.size() > 1);
        assertTrue(r.err().contains("distributional: not run"), "without listings it says which kinds did not run: " + r.err());
    }

    @Test
    void kindFilterAndMinScoreApply() throws Exception {
        Path h = harvest();
        Run r = run("suggest", "--harvest", h.toString(), "--out", dir.resolve("k").toString(), "--kind", "same-group-key", "--min-score", "0.99");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains("merge suggestions (0;"), r.out());
    }

    @Test
    void usageErrorsNameTheProblem() throws Exception {
        assertEquals(ExitCodes.USAGE, run("suggest").code());
        Run r = run("suggest", "--harvest", harvest().toString(), "--kind", "loud");
        assertEquals(ExitCodes.USAGE, r.code());
        assertTrue(r.err().contains("--kind loud is not a kind"), r.err());
        Run m = run("suggest", "--harvest", dir.resolve("none.json").toString());
        assertEquals(ExitCodes.FAILURE, m.code());
        assertTrue(m.err().contains("does not exist"), m.err());
        assertTrue(run("suggest", "--help").out().contains("Examples:"));
    }
}
