package dev.sheaf.tests;

import dev.sheaf.miner.ingest.Ingest;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.Problem;
import dev.sheaf.miner.ingest.ProblemLog;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.label.LabelRun;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import dev.sheaf.miner.report.AuditRun;
import dev.sheaf.miner.report.HtmlReport;
import dev.sheaf.miner.report.Section;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.io.OutputSet;
import dev.sheaf.vocab.store.VocabularyFiles;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Writer;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;

/**
 * The child of {@link KillDuringWriteTest}: writes two versions of every kind of output into one
 * folder, alternately and without pause, printing {@code ready} once and {@code done N} after each
 * complete round, until it is killed (or after one round, with {@code --once}). A round writes what
 * the commands write, through the same code: the harvest files, problems.csv and an HTML report as
 * one {@link OutputSet} (as {@code sheaf mine} does), the label exports into {@code labels/} (as
 * {@code sheaf label}), and a whole audit into {@code audit/} (labels, coverage, agreement,
 * consistency and the report, as {@code sheaf audit}).
 */
public final class WriteLoopMain {
    private WriteLoopMain() {
    }

    /** Version {@code v} (0 or 1) of the outputs. */
    record Outputs(Harvest harvest, List<Problem> problems, HtmlReport report, Workspace ws, LabelRun labels,
                   List<Listing> listings) {
        void write(Path dir) throws IOException {
            OutputSet.writeAll(dir, set -> {
                HarvestFiles.write(harvest, dir);
                ProblemLog.write(dir.resolve("problems.csv"), problems);
                report.write(dir.resolve("report.html"));
            });
            labels.run(listings, problems.subList(0, 10), dir.resolve("labels"));
            AuditRun.run(ws, dir.resolve("audit"), new PrintWriter(Writer.nullWriter()), listings, List.of());
        }
    }

    /**
     * Version {@code v} of the outputs: the harvest in {@code harvestJson}, 1,000 problems and a long
     * page, and the labels and audit of the workspace {@code ws} over half its listings (version 0)
     * or all of them (version 1).
     */
    static Outputs outputs(Path harvestJson, int v, Path ws) throws IOException {
        List<Problem> problems = new ArrayList<>();
        Section.Builder s = Section.builder("findings", "Findings, version " + v);
        for (int i = 0; i < 1000; i++) {
            problems.add(new Problem("catalog/file-" + i + ".html", "line " + (i + v), "parse", "=version " + v + " problem " + i));
            s.text("Paragraph " + i + " of version " + v + ": <script>alert(" + i + ")</script> & more text to make the page long.");
        }
        HtmlReport report = HtmlReport.builder("Kill test report " + v).section(s.build()).build();
        Workspace w = Workspace.load(ws);
        List<Listing> all = Collections.synchronizedList(new ArrayList<>());
        Ingest.builder().sources(w.sources()).workspaceRoot(w.dir()).threads(1).build().run(all::add);
        List<Listing> sorted = new ArrayList<>(all);
        sorted.sort(Comparator.comparing(Listing::source).thenComparing(Listing::locator).thenComparing(Listing::id));
        List<Listing> listings = v == 0 ? sorted.subList(0, sorted.size() / 2) : sorted;
        Labeler labeler = Labeler.of(VocabularyFiles.read(w.vocabulary()).vocabulary(), Analysis.of(AnalysisProfile.resolve("default")));
        LabelRun labels = LabelRun.builder(labeler).threads(1).build();
        return new Outputs(HarvestFiles.readJson(harvestJson), problems, report, w, labels, List.copyOf(listings));
    }

    public static void main(String[] args) throws IOException {
        Path ws = Path.of(args[2]);
        Outputs[] o = {outputs(Path.of(args[0]), 0, ws), outputs(Path.of(args[1]), 1, ws)};
        Path dir = Path.of(args[3]);
        boolean once = args.length > 4 && args[4].equals("--once");
        System.out.println("ready");
        System.out.flush();
        for (int n = 0; ; n++) {
            o[n % 2].write(dir);
            System.out.println("done " + n);
            System.out.flush();
            if (once) {
                return;
            }
        }
    }
}
