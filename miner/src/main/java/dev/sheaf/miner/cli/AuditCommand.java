package dev.sheaf.miner.cli;

import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.report.AuditRun;
import dev.sheaf.miner.report.AuditSummary;
import dev.sheaf.vocab.VocabularyFormatException;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheaf audit}: label, coverage, consistency and agreement over a workspace, and one HTML report. */
@Command(name = "audit", description = {
        "Run labeling, coverage, consistency and agreement over a workspace and write one self-contained HTML report "
                + "(OUTPUT/audit/report.html) with the CSV and JSON tables behind it.",
        "Feedback and judgments are optional; the report says which sections were skipped and why."},
        mixinStandardHelpOptions = true, sortOptions = false, footerHeading = "%n",
        footer = {"Examples:", "  sheaf audit sample-listings", "  sheaf audit --workspace sample-listings --out /tmp/audit", "",
                ExitCodes.HELP_LIST})
final class AuditCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "WORKSPACE", description = "Workspace folder (holds workspace.json).")
    Path positional;

    @Option(names = "--workspace", paramLabel = "DIR", description = "Workspace folder. Default: the current folder when it "
            + "holds a workspace.json.")
    Path workspace;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder. Default: OUTPUT/audit of the workspace.")
    Path out;

    @Override
    public Integer call() {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Path dir = workspace != null ? workspace : positional;
        if (dir == null) {
            if (!Workspace.isWorkspace(Path.of("."))) {
                err.println("sheaf audit: expected a workspace folder (WORKSPACE or --workspace DIR) holding workspace.json; "
                        + "the current folder holds none. Try 'sheaf audit --help'.");
                return ExitCodes.USAGE;
            }
            dir = Path.of(".");
        }
        return run("sheaf audit", dir, out, stdout, err);
    }

    /** Shared with {@code sheaf demo}: runs the audit and prints its summary. */
    static int run(String who, Path dir, Path out, PrintWriter stdout, PrintWriter err) {
        Workspace ws;
        try {
            ws = Workspace.load(dir);
        } catch (IOException | RuntimeException e) {
            err.println(who + ": cannot read the workspace " + dir + ": " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        if (ws.vocabulary() == null) {
            err.println(who + ": " + dir + "/workspace.json names no \"vocabulary\"; the audit needs one to label with.");
            return ExitCodes.USAGE;
        }
        Path outDir = out != null ? out : ws.output().resolve("audit");
        AuditSummary s;
        try {
            s = AuditRun.run(ws, outDir, err);
        } catch (VocabularyFormatException e) {
            err.println(who + ": the vocabulary " + ws.vocabulary() + " is unreadable: " + e.getMessage()
                    + "; run 'sheaf check' on it");
            return ExitCodes.PROBLEMS;
        } catch (IOException e) {
            err.println(who + ": cannot read or write: " + e.getMessage());
            return ExitCodes.PROBLEMS;
        }
        print(s, stdout);
        s.problems().forEach(p -> err.println(who + ": " + p));
        return s.problems().isEmpty() ? ExitCodes.OK : ExitCodes.PROBLEMS;
    }

    static void print(AuditSummary s, PrintWriter o) {
        o.printf(Locale.ROOT, "listings   %,d%n", s.listings());
        o.printf(Locale.ROOT, "vocabulary %d concepts in %d facets%n", s.concepts(), s.facets());
        o.printf(Locale.ROOT, "coverage   %.1f%% of listings carry at least one label%n", s.coverage() * 100);
        StringBuilder f = new StringBuilder();
        s.flags().entrySet().stream().sorted(java.util.Map.Entry.comparingByKey())
                .forEach(e -> f.append(f.length() == 0 ? "" : ", ").append(e.getKey()).append(' ').append(e.getValue()));
        o.println("flags      " + f);
        o.println("measured   " + (s.judged() ? "judgments" : "no judgments") + ", " + (s.feedback() ? "feedback" : "no feedback"));
        if (!s.attention().isEmpty()) {
            o.println("attention  " + s.attention().get(0) + (s.attention().size() > 1 ? " (+" + (s.attention().size() - 1)
                    + " more in the report)" : ""));
        }
        o.println("report     " + s.report());
        o.flush();
    }
}
