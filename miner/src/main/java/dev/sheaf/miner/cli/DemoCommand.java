package dev.sheaf.miner.cli;

import dev.sheaf.miner.ingest.Ingest;
import dev.sheaf.miner.ingest.IngestSummary;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.Problem;
import dev.sheaf.miner.ingest.ProblemLog;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import dev.sheaf.miner.mine.Harvester;
import dev.sheaf.miner.report.AuditRun;
import dev.sheaf.miner.report.AuditSummary;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.CheckReport;
import dev.sheaf.vocab.Severity;
import dev.sheaf.vocab.VocabularyChecker;
import dev.sheaf.vocab.VocabularyFormatException;
import dev.sheaf.vocab.io.OutputSet;
import dev.sheaf.vocab.store.VocabularyFiles;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code sheaf demo}: the whole job on the bundled Fernhollow workspace: mine, check the vocabulary,
 * label, measure, and write the audit report.
 */
@Command(name = "demo", description = {
        "Run the whole job on the bundled demo catalog (sample-listings/): mine candidate terms, check the demo "
                + "vocabulary, label the catalog, measure coverage, consistency and agreement, and write the audit report.",
        "The workspace is found through SHEAF_HOME (set by the ./sheaf launcher), else in the current folder."},
        mixinStandardHelpOptions = true, sortOptions = false, footerHeading = "%n",
        footer = {"Examples:", "  ./sheaf demo", "  ./sheaf demo --out /tmp/demo", "", ExitCodes.HELP_LIST})
final class DemoCommand implements Callable<Integer> {
    static final String WORKSPACE = "sample-listings";

    @Spec
    CommandSpec spec;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "out/demo",
            description = "Output folder, relative to the current folder (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--workspace", paramLabel = "DIR", hidden = true, description = "Use another demo workspace (tests).")
    Path workspace;

    @Override
    public Integer call() {
        PrintWriter o = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        long t0 = System.nanoTime();
        Path dir = workspace != null ? workspace : find();
        if (dir == null) {
            err.println("sheaf demo: cannot find the demo workspace: expected " + WORKSPACE + "/workspace.json under $SHEAF_HOME "
                    + "(set by the ./sheaf launcher) or the current folder; run ./sheaf demo from the Sheaf folder, or "
                    + "re-create it with './sheaf generate demo --out " + WORKSPACE + "'.");
            return ExitCodes.FAILURE;
        }
        Workspace ws;
        try {
            ws = Workspace.load(dir);
        } catch (IOException | RuntimeException e) {
            err.println("sheaf demo: cannot read the demo workspace " + dir + ": " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        boolean problems = false;
        // 1. mine
        Path harvestDir = out.resolve("harvest");
        Harvest harvest;
        IngestSummary read;
        List<Listing> listings = new ArrayList<>();
        err.println("sheaf demo: mining " + dir + " ...");
        err.flush();
        try {
            int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
            Harvester h = Harvester.builder().profile(AnalysisProfile.resolve(ws.profile() == null ? "default" : ws.profile()))
                    .threads(threads).sources(ws.sources().stream().map(s -> ws.dir().relativize(s.path()).toString()).toList())
                    .build();
            try (Harvester.Run run = h.start()) {
                List<Listing> kept = listings;
                read = Ingest.builder().sources(ws.sources()).workspaceRoot(ws.dir()).threads(threads).build().run(l -> {
                    synchronized (run) {
                        run.accept(l);
                        kept.add(l);
                    }
                });
                harvest = run.finish();
            }
            Harvest mined = harvest;
            List<Problem> readProblems = read.problems();
            OutputSet.writeAll(harvestDir, set -> {
                HarvestFiles.write(mined, harvestDir);
                ProblemLog.write(harvestDir.resolve("problems.csv"), readProblems);
            });
        } catch (IOException | RuntimeException e) {
            err.println("sheaf demo: mining failed: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        problems |= !read.problems().isEmpty();
        // 2. check the vocabulary
        CheckReport check;
        try {
            VocabularyFiles.Loaded l = VocabularyFiles.read(ws.vocabulary());
            check = VocabularyChecker.check(l.vocabulary(), l.findings());
        } catch (VocabularyFormatException e) {
            check = VocabularyChecker.unreadable(e);
        } catch (IOException e) {
            err.println("sheaf demo: cannot read the demo vocabulary " + ws.vocabulary() + ": " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        err.println("sheaf demo: vocabulary check: " + check.count(Severity.ERROR) + " errors, "
                + check.count(Severity.WARNING) + " warnings");
        // 3. label, measure, report
        AuditSummary s;
        try {
            s = AuditRun.run(ws, out.resolve("audit"), err, listings, read.problems());
        } catch (IOException | RuntimeException e) {
            err.println("sheaf demo: the audit failed: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        problems |= !s.problems().isEmpty();
        double secs = (System.nanoTime() - t0) / 1e9;
        o.println("sheaf demo: " + ws.name());
        o.printf(Locale.ROOT, "files      %,d read of %,d seen, %,d problem(s) (planted bad files are not a source)%n",
                read.filesRead(), read.filesSeen(), read.problems().size());
        o.printf(Locale.ROOT, "listings   %,d%n", s.listings());
        o.printf(Locale.ROOT, "harvest    %,d candidate terms, %,d spec facets -> %s%n", harvest.candidates().size(),
                harvest.specFacets().size(), harvestDir.resolve(HarvestFiles.JSON));
        o.printf(Locale.ROOT, "vocabulary %d concepts in %d facets; check: %d errors, %d warnings%n", s.concepts(), s.facets(),
                check.count(Severity.ERROR), check.count(Severity.WARNING));
        o.printf(Locale.ROOT, "coverage   %.1f%% of listings carry at least one label%n", s.coverage() * 100);
        StringBuilder f = new StringBuilder();
        s.flags().entrySet().stream().sorted(java.util.Map.Entry.comparingByKey())
                .forEach(e -> f.append(f.length() == 0 ? "" : ", ").append(e.getKey()).append(' ').append(e.getValue()));
        o.println("flags      " + f);
        o.println("attention  " + (s.attention().isEmpty() ? "nothing flagged" : s.attention().get(0)));
        o.println("measured   " + (s.judged() ? "judgments" : "no judgments") + ", " + (s.feedback() ? "feedback" : "no feedback"));
        o.printf(Locale.ROOT, "took       %.1f s%n", secs);
        o.println("report     " + s.report());
        o.flush();
        return problems ? ExitCodes.PROBLEMS : ExitCodes.OK;
    }

    private static Path find() {
        String home = System.getenv("SHEAF_HOME");
        if (home != null && !home.isBlank() && Workspace.isWorkspace(Path.of(home).resolve(WORKSPACE))) {
            return Path.of(home).resolve(WORKSPACE);
        }
        if (Workspace.isWorkspace(Path.of(WORKSPACE))) {
            return Path.of(WORKSPACE);
        }
        return null;
    }
}
