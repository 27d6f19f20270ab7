package dev.sheaf.tests;

import dev.sheaf.miner.ingest.Problem;
import dev.sheaf.miner.ingest.ProblemLog;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import dev.sheaf.miner.report.HtmlReport;
import dev.sheaf.miner.report.Section;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The child of {@link KillDuringWriteTest}: writes two versions of the harvest files, problems.csv
 * and an HTML report into one folder, alternately and without pause, printing {@code ready} once
 * and {@code done N} after each complete round, until it is killed.
 */
public final class WriteLoopMain {
    private WriteLoopMain() {
    }

    /** Version {@code v} (0 or 1) of the outputs. */
    record Outputs(Harvest harvest, List<Problem> problems, HtmlReport report) {
        void write(Path dir) throws IOException {
            HarvestFiles.write(harvest, dir);
            ProblemLog.write(dir.resolve("problems.csv"), problems);
            report.write(dir.resolve("report.html"));
        }
    }

    static Outputs outputs(Path harvestJson, int v) throws IOException {
        List<Problem> problems = new ArrayList<>();
        Section.Builder s = Section.builder("findings", "Findings, version " + v);
        for (int i = 0; i < 1000; i++) {
            problems.add(new Problem("catalog/file-" + i + ".html", "line " + (i + v), "parse", "=version " + v + " problem " + i));
            s.text("Paragraph " + i + " of version " + v + ": <script>alert(" + i + ")</script> & more text to make the page long.");
        }
        HtmlReport report = HtmlReport.builder("Kill test report " + v).section(s.build()).build();
        return new Outputs(HarvestFiles.readJson(harvestJson), problems, report);
    }

    public static void main(String[] args) throws IOException {
        Outputs[] o = {outputs(Path.of(args[0]), 0), outputs(Path.of(args[1]), 1)};
        Path dir = Path.of(args[2]);
        System.out.println("ready");
        System.out.flush();
        for (int n = 0; ; n++) {
            o[n % 2].write(dir);
            System.out.println("done " + n);
            System.out.flush();
        }
    }
}
