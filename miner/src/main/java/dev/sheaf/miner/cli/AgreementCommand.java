package dev.sheaf.miner.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.measure.AgreementAnalysis;
import dev.sheaf.miner.measure.AgreementAnnotatorOverview;
import dev.sheaf.miner.measure.AgreementAttribute;
import dev.sheaf.miner.measure.AgreementFiles;
import dev.sheaf.miner.measure.AgreementMetric;
import dev.sheaf.miner.measure.AgreementOptions;
import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.AgreementThresholds;
import dev.sheaf.miner.measure.BootstrapInterval;
import dev.sheaf.miner.measure.JudgmentColumns;
import dev.sheaf.miner.measure.Judgments;
import dev.sheaf.miner.measure.JudgmentsCsv;
import dev.sheaf.miner.measure.Pseudonyms;
import dev.sheaf.vocab.io.OutputSet;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheaf agreement}: how consistently annotators apply each attribute. A thin shell over {@link AgreementAnalysis}. */
@Command(name = "agreement",
        description = {
                "Measure annotator agreement per attribute: Krippendorff's alpha with a bootstrap interval, Fleiss' kappa, "
                        + "observed agreement and pairwise Cohen's kappa, and per annotator the agreement with the others.",
                "The judgments file is CSV with a header row item,annotator,attribute,value (other names: the column options). "
                        + "Values are present/absent (yes/no, true/false, 1/0), facet values, or numeric grades.",
                "Annotator ids are personal data: every output shows keyed pseudonyms (ann-xxxxxx); the key file stays "
                        + "private (default: .sheaf/pseudonym.key in the workspace, created on first use).",
                "Writes agreement.csv, annotators.csv, problems.csv and agreement.json to the output folder; prints a table."},
        mixinStandardHelpOptions = true,
        usageHelpAutoWidth = true,
        sortOptions = false,
        footerHeading = "%n",
        footer = {
                "Examples:",
                "  sheaf agreement sample-listings/judgments.csv --out out/agreement",
                "  sheaf agreement --workspace sample-listings --seed 7 --replicates 5000 --metric warmth=interval",
                "",
                "Verdicts: alpha >= .800 reliable, >= .667 tentative, else contested (Krippendorff 2004); kappa bands after",
                "Landis & Koch 1977. Change the edges with --threshold, e.g. --threshold alpha.reliable=0.9.",
                "",
                ExitCodes.HELP_LIST})
final class AgreementCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "JUDGMENTS.csv",
            description = "The judgments file (default: the workspace's \"judgments\" file).")
    Path judgmentsFile;

    @Option(names = "--workspace", paramLabel = "DIR",
            description = "Workspace folder; its workspace.json names the judgments file and the output folder. "
                    + "Default: the current folder when it holds a workspace.json.")
    Path workspace;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Output folder. Default: OUTPUT/agreement in the workspace, else out/agreement.")
    Path out;

    @Option(names = "--seed", paramLabel = "N", defaultValue = "1", description = "Bootstrap seed (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--replicates", paramLabel = "N", defaultValue = "2000",
            description = "Bootstrap replicates per attribute; 0 for no interval (default: ${DEFAULT-VALUE}).")
    int replicates;

    @Option(names = "--confidence", paramLabel = "LEVEL", defaultValue = "0.95",
            description = "Confidence level of the interval (default: ${DEFAULT-VALUE}).")
    double confidence;

    @Option(names = "--metric", paramLabel = "ATTR=METRIC",
            description = "Metric of alpha for one attribute: nominal, ordinal, interval or ratio. Repeatable. "
                    + "Default: chosen from the values (present/absent and words: nominal; up to --ordinal-levels "
                    + "integer grades: ordinal; other numbers: interval).")
    Map<String, AgreementMetric> metrics = new LinkedHashMap<>();

    @Option(names = "--ordinal-levels", paramLabel = "N", defaultValue = "10",
            description = "Integer values with at most N distinct grades are ordinal (default: ${DEFAULT-VALUE}).")
    int ordinalLevels;

    @Option(names = "--threshold", paramLabel = "KEY=VALUE",
            description = "Override a verdict or band edge: alpha.reliable, alpha.tentative, kappa.slight, kappa.fair, "
                    + "kappa.moderate, kappa.substantial. Repeatable.")
    Map<String, Double> thresholds = new LinkedHashMap<>();

    @Option(names = "--key", paramLabel = "FILE",
            description = "Pseudonym key file (created when missing). Default: .sheaf/pseudonym.key in the workspace, "
                    + "else beside the judgments file. Keep it out of anything you circulate.")
    Path keyFile;

    @Option(names = "--item-column", paramLabel = "NAME", defaultValue = "item", description = "Default: ${DEFAULT-VALUE}.")
    String itemColumn;

    @Option(names = "--annotator-column", paramLabel = "NAME", defaultValue = "annotator", description = "Default: ${DEFAULT-VALUE}.")
    String annotatorColumn;

    @Option(names = "--attribute-column", paramLabel = "NAME", defaultValue = "attribute", description = "Default: ${DEFAULT-VALUE}.")
    String attributeColumn;

    @Option(names = "--value-column", paramLabel = "NAME", defaultValue = "value", description = "Default: ${DEFAULT-VALUE}.")
    String valueColumn;

    @Override
    public Integer call() {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Path ws = workspace;
        if (ws == null && judgmentsFile == null && Files.isRegularFile(Path.of("workspace.json"))) {
            ws = Path.of(".");
        }
        if (ws == null && judgmentsFile == null) {
            err.println("sheaf agreement: expected a judgments file or --workspace DIR; found neither "
                    + "(and no workspace.json in the current folder). Try 'sheaf agreement --help'.");
            return ExitCodes.USAGE;
        }
        Path file = judgmentsFile;
        Path outDir = out;
        String display;
        if (ws != null) {
            WorkspaceFiles w;
            try {
                w = WorkspaceFiles.read(ws);
            } catch (IOException e) {
                err.println("sheaf agreement: " + e.getMessage());
                return ExitCodes.FAILURE;
            }
            if (file == null) {
                if (w.judgments == null) {
                    err.println("sheaf agreement: " + ws.resolve("workspace.json") + " names no judgments file; add "
                            + "\"judgments\": \"judgments.csv\" to it, or give the file on the command line.");
                    return ExitCodes.USAGE;
                }
                file = w.judgments;
            }
            if (outDir == null) {
                outDir = w.output.resolve("agreement");
            }
            display = relative(ws, file);
        } else {
            display = file.toString();
        }
        if (outDir == null) {
            outDir = Path.of("out", "agreement");
        }
        Path key = keyFile != null ? keyFile
                : (ws != null ? ws : parentOf(file)).resolve(".sheaf").resolve("pseudonym.key");

        AgreementOptions options;
        JudgmentColumns columns;
        try {
            columns = new JudgmentColumns(itemColumn, annotatorColumn, attributeColumn, valueColumn);
            options = AgreementOptions.builder().seed(seed).replicates(replicates).confidence(confidence)
                    .metrics(metrics).ordinalMaxLevels(ordinalLevels)
                    .thresholds(AgreementThresholds.fromMap(thresholds)).build();
        } catch (IllegalArgumentException e) {
            err.println("sheaf agreement: " + e.getMessage());
            err.println("Try 'sheaf agreement --help'.");
            return ExitCodes.USAGE;
        }

        Judgments judgments;
        Pseudonyms pseudonyms;
        try {
            judgments = JudgmentsCsv.read(file, columns, display);
            boolean newKey = !Files.exists(key);
            pseudonyms = Pseudonyms.fromKeyFile(key);
            if (newKey) {
                err.println("sheaf agreement: created pseudonym key " + key + " (keep it private; the same key keeps "
                        + "pseudonyms stable across runs)");
            }
        } catch (IOException e) {
            err.println("sheaf agreement: cannot read " + describe(e) + "; check the path and permissions.");
            return ExitCodes.FAILURE;
        }
        AgreementReport report = AgreementAnalysis.run(judgments, options.toBuilder().pseudonyms(pseudonyms).build());
        printTable(report, stdout);
        try {
            Path dest = outDir;
            OutputSet.writeAll(dest, set -> AgreementFiles.write(report, dest));
        } catch (IOException e) {
            err.println("sheaf agreement: cannot write the results to " + outDir + ": " + describe(e));
            return ExitCodes.FAILURE;
        }
        err.printf(Locale.ROOT, "sheaf agreement: %d judgments read, %d used, %d attributes; results in %s%n",
                report.judgmentsRead(), report.judgmentsUsed(), report.attributes().size(), outDir);
        if (report.hasProblems()) {
            err.printf(Locale.ROOT, "sheaf agreement: %d row%s left out; see %s%n", report.problems().size(),
                    report.problems().size() == 1 ? "" : "s", outDir.resolve(AgreementFiles.PROBLEMS_CSV));
            return ExitCodes.PROBLEMS;
        }
        return ExitCodes.OK;
    }

    static void printTable(AgreementReport report, PrintWriter out) {
        List<String[]> rows = new ArrayList<>();
        String level = pct(report.confidence());
        rows.add(new String[] {"attribute", "items", "judgments", "alpha [" + level + " CI]", "metric", "Fleiss kappa",
            "observed", "verdict"});
        for (AgreementAttribute a : report.attributes()) {
            BootstrapInterval ci = a.alphaInterval();
            String alpha = num(a.alpha().alpha()) + (ci.defined() ? " [" + num(ci.low()) + ", " + num(ci.high()) + "]" : "");
            String fleiss = a.fleiss().defined()
                    ? num(a.fleiss().kappa()) + " " + a.fleiss().band().label() + (a.fleiss().itemsLeftOut() > 0 ? " *" : "")
                    : "n/a";
            rows.add(new String[] {a.attribute(), Integer.toString(a.items()), Integer.toString(a.judgments()), alpha,
                a.metric().label(), fleiss, Double.isNaN(a.observedAgreement()) ? "n/a" : pct(a.observedAgreement()),
                a.verdict().label()});
        }
        print(rows, out, 1, 2);
        boolean subset = report.attributes().stream().anyMatch(a -> a.fleiss().itemsLeftOut() > 0);
        if (subset) {
            out.println("* Fleiss' kappa on the items with the most common number of judgments (see notes).");
        }
        if (!report.overview().isEmpty()) {
            out.println();
            List<String[]> people = new ArrayList<>();
            people.add(new String[] {"annotator", "attributes", "judgments", "agreement", "mean Cohen kappa",
                "alpha rise if left out"});
            for (AgreementAnnotatorOverview o : report.overview()) {
                people.add(new String[] {o.annotator(), Integer.toString(o.attributes()), Integer.toString(o.judgments()),
                    Double.isNaN(o.pairwiseAgreement()) ? "n/a" : pct(o.pairwiseAgreement()),
                    Double.isNaN(o.meanCohenKappa()) ? "n/a" : num(o.meanCohenKappa()) + " " + o.meanCohenBand().label(),
                    Double.isNaN(o.largestAlphaRise()) ? "n/a" : signed(o.largestAlphaRise()) + " (" + o.largestRiseAttribute() + ")"});
            }
            print(people, out, 1, 2);
        }
        List<String> notes = new ArrayList<>(report.notes());
        for (AgreementAttribute a : report.attributes()) {
            for (String n : a.allNotes()) {
                notes.add(a.attribute() + ": " + n);
            }
        }
        if (!notes.isEmpty()) {
            out.println();
            out.println("Notes:");
            notes.forEach(n -> out.println("  " + n));
        }
        out.flush();
    }

    /** Prints rows as aligned columns; columns from {@code firstNumeric} to {@code lastNumeric} are right-aligned. */
    private static void print(List<String[]> rows, PrintWriter out, int firstNumeric, int lastNumeric) {
        int cols = rows.get(0).length;
        int[] width = new int[cols];
        for (String[] r : rows) {
            for (int c = 0; c < cols; c++) {
                width[c] = Math.max(width[c], r[c].length());
            }
        }
        for (String[] r : rows) {
            StringBuilder line = new StringBuilder();
            for (int c = 0; c < cols; c++) {
                boolean right = c >= firstNumeric && c <= lastNumeric;
                String pad = " ".repeat(width[c] - r[c].length());
                line.append(right ? pad + r[c] : r[c] + (c == cols - 1 ? "" : pad));
                if (c < cols - 1) {
                    line.append("  ");
                }
            }
            out.println(line.toString().stripTrailing());
        }
    }

    private static String num(double v) {
        return Double.isNaN(v) ? "n/a" : String.format(Locale.ROOT, "%.3f", v);
    }

    private static String signed(double v) {
        return String.format(Locale.ROOT, "%+.3f", v);
    }

    private static String pct(double v) {
        return String.format(Locale.ROOT, "%.0f%%", v * 100);
    }

    private static String relative(Path ws, Path file) {
        Path a = ws.toAbsolutePath().normalize();
        Path f = file.toAbsolutePath().normalize();
        return f.startsWith(a) ? a.relativize(f).toString() : file.toString();
    }

    private static Path parentOf(Path file) {
        Path p = file.toAbsolutePath().getParent();
        return p == null ? Path.of(".") : p;
    }

    private static String describe(IOException e) {
        if (e instanceof java.nio.file.NoSuchFileException) {
            return e.getMessage() + " (no such file)";
        }
        if (e instanceof java.nio.file.AccessDeniedException) {
            return e.getMessage() + " (permission denied)";
        }
        return e.getMessage();
    }

    /**
     * The two keys of workspace.json this command needs, read directly until the shared workspace
     * loader is wired in: "judgments" (optional) and "output" (default "out"), relative to the folder.
     */
    static final class WorkspaceFiles {
        final Path judgments;
        final Path output;

        private WorkspaceFiles(Path judgments, Path output) {
            this.judgments = judgments;
            this.output = output;
        }

        static WorkspaceFiles read(Path dir) throws IOException {
            Path file = dir.resolve("workspace.json");
            if (!Files.isRegularFile(file)) {
                throw new IOException("expected a workspace folder holding workspace.json; " + file + " does not exist");
            }
            JsonNode root;
            try {
                root = new ObjectMapper().readTree(file.toFile());
            } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
                throw new IOException(file + " is not valid JSON (" + e.getOriginalMessage() + "); fix the file", e);
            }
            if (root == null || !root.isObject()) {
                throw new IOException(file + " should hold one JSON object; it does not");
            }
            Path judgments = null;
            JsonNode j = root.get("judgments");
            if (j != null && !j.isNull()) {
                if (!j.isTextual() || j.asText().isBlank()) {
                    throw new IOException(file + ": \"judgments\" should be a path such as \"judgments.csv\", found " + j);
                }
                judgments = dir.resolve(j.asText());
            }
            JsonNode o = root.get("output");
            if (o != null && !o.isNull() && (!o.isTextual() || o.asText().isBlank())) {
                throw new IOException(file + ": \"output\" should be a folder path such as \"out\", found " + o);
            }
            return new WorkspaceFiles(judgments, dir.resolve(o == null || o.isNull() ? "out" : o.asText()));
        }
    }
}
