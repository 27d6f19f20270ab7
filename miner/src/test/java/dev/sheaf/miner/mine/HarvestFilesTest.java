package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.EvidenceLine;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HarvestFilesTest {
    @TempDir
    Path tmp;

    private static Harvest sample() {
        EvidenceLine e = new EvidenceLine("FH-1", "feed.jsonl", "line 1", "description", "", "a light", "ripstop nylon",
                "shell", 8, 21);
        Harvest.Candidate c = new Harvest.Candidate(1, "ripstop nylon", 2, 12, 9, 0.09, 20.5,
                new Harvest.Scores(7.5, 0.8, 120.25, 3.3, 900.0, 12.0, 20.5),
                List.of(new Harvest.CategoryScore("=HYPERLINK(\"x\")", 7, 4.567)), null, List.of(e));
        Harvest.Candidate u = new Harvest.Candidate(2, "-waterproof", 1, 10, 10, 0.1, 10.0,
                new Harvest.Scores(null, null, null, null, null, null, 10.0), List.of(), "waterproof", List.of());
        Harvest.SpecFacet f = new Harvest.SpecFacet("Weight", 3, List.of(new Harvest.SpecKeyCount("Weight", 3)), 2,
                List.of(new Harvest.SpecValueCount("1.2 kg", 2, null, null)), null);
        Harvest.CorpusStats stats = new Harvest.CorpusStats(100, 400, 900, 5000, 700, 1,
                List.of(new Harvest.CategoryCount("tents", 100)), List.of(new Harvest.NgramLevel(1, 700, 90)), 2, 2);
        Harvest.Parameters p = new Harvest.Parameters(AnalysisProfile.defaults().toJsonTree(new ObjectMapper()),
                HarvestOptions.defaults(), List.of("feed.jsonl"), Integrations.COMPONENTS);
        return new Harvest(Harvest.FORMAT, Harvest.FORMAT_VERSION, p, stats, List.of(c, u), List.of(f));
    }

    @Test
    void jsonRoundTripsAndIsStable() throws IOException {
        Harvest h = sample();
        HarvestFiles.write(h, tmp);
        Harvest back = HarvestFiles.readJson(tmp.resolve(HarvestFiles.JSON));
        assertEquals(h, back);
        assertEquals(HarvestFiles.toJson(h), Files.readString(tmp.resolve(HarvestFiles.JSON), StandardCharsets.UTF_8));
        assertTrue(!Files.readString(tmp.resolve(HarvestFiles.JSON)).contains("\r"), "LF line ends on every platform");
    }

    @Test
    void csvCellsAreSpreadsheetSafe() throws IOException {
        HarvestFiles.write(sample(), tmp);
        String csv = Files.readString(tmp.resolve(HarvestFiles.CSV), StandardCharsets.UTF_8);
        assertTrue(csv.contains("\"'-waterproof\""), csv);
        assertTrue(csv.contains("\"'=HYPERLINK(\"\"x\"\") (df 7, z 4.57)\""), csv);
        assertTrue(csv.contains("a light [ripstop nylon] shell — feed.jsonl line 1"), csv);
    }

    @Test
    void aFileThatIsNoHarvestIsRejectedWithWhatToDo() throws IOException {
        Path f = tmp.resolve("x.json");
        Files.writeString(f, HarvestFiles.toJson(sample()).replace("\"sheaf-harvest\"", "\"something-else\""));
        IOException e = assertThrows(IOException.class, () -> HarvestFiles.readJson(f));
        assertTrue(e.getMessage().contains("not a harvest"), e.getMessage());
    }

    @Test
    void twoDecimalsMatchTheFormatter() {
        Random r = new Random(5);
        for (int i = 0; i < 10_000; i++) {
            double v = (r.nextDouble() - 0.3) * Math.pow(10, r.nextInt(6));
            StringBuilder b = new StringBuilder();
            HarvestFiles.fixed2(b, v);
            String want = String.format(Locale.ROOT, "%.2f", v);
            assertEquals(want, b.toString(), "value " + v);
        }
    }
}
