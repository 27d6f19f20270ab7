package dev.sheaf.miner.cli;

import dev.sheaf.miner.ingest.IngestProgress;
import dev.sheaf.miner.ingest.SourceSpec;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.label.LabelOptions;
import dev.sheaf.miner.label.LabelRun;
import dev.sheaf.miner.label.LabelRunSummary;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.miner.label.StratifiedSplit;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.VocabularyStore;
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
import java.util.function.Function;
import me.tongfei.progressbar.DelegatingProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheaf label}: every listing labeled with the vocabulary, and the exports. A thin shell over {@link LabelRun}. */
@Command(name = "label",
        description = {
                "Label every listing with the vocabulary: each preferred, alternative and hidden label is matched through the "
                        + "analysis profile (longest match, no overlaps), with polarity (stated or negated: \"no hood\", "
                        + "\"PFC-free\"), numbers from spec tables and text in each number facet's unit and bucket, and "
                        + "concepts whose facet does not apply to the listing's category listed as likely errors.",
                "Writes assignments.jsonl (one listing per line, with evidence spans), labels.csv (multi-hot: 1 stated, "
                        + "0 absent, -1 negated), facet-values.csv, label-summary.csv/.json, category-errors.csv, gap-terms.csv "
                        + "and problems.csv; with --split also split.csv and split-summary.csv (iterative stratification).",
                "Mined labels are not verified product claims: regulated or safety claims (waterproof ratings, flame "
                        + "resistance, UV protection, child safety, fibre content) are marked for human review."},
        mixinStandardHelpOptions = true,
        usageHelpAutoWidth = true,
        sortOptions = false,
        footerHeading = "%n",
        footer = {
                "Examples:",
                "  sheaf label sample-listings/catalog --vocab sample-listings/fernhollow.vocab.json --out out/labels",
                "  sheaf label --workspace sample-listings --split 80/10/10 --seed 7",
                "  sheaf label feed.jsonl --vocab shop.vocab.json --out out --set negationWindow=5 --max-file-mb 2000",
                "",
                "Label settings (--set KEY=VALUE): negation, negationWindow, scopeBreakers, cueExceptions, affixNegation,",
                "quantityWindow, quantityByDimension, sameValueTolerance; see docs/decisions/101 and 102.",
                "",
                ExitCodes.HELP_LIST})
final class LabelCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(arity = "0..*", paramLabel = "SOURCE",
            description = "Listing files or folders (default: the workspace's sources).")
    List<Path> sources = new ArrayList<>();

    @Option(names = "--vocab", paramLabel = "FILE", description = "The vocabulary file (*.vocab.json). Default: the workspace's.")
    Path vocab;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder. Default: OUTPUT/labels of the workspace, else out/labels.")
    Path out;

    @Option(names = "--workspace", paramLabel = "DIR",
            description = "Workspace folder (default: the current folder when it holds a workspace.json and no SOURCE is given).")
    Path workspace;

    @Option(names = "--profile", paramLabel = "NAME|FILE",
            description = "Analysis profile: a preset (default, plain) or a profile file. Default: the workspace's, else default.")
    String profile;

    @Option(names = "--split", paramLabel = "A/B[/C]", description = "Also write a stratified split, e.g. 80/10/10 (train/validation/test).")
    String split;

    @Option(names = "--seed", paramLabel = "N", defaultValue = "42", description = "Seed of the split's tie-breaks (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--preset", paramLabel = "NAME", defaultValue = "default",
            description = "Label settings preset: default, or literal (no negation detection). Default: ${DEFAULT-VALUE}.")
    String preset;

    @Option(names = "--set", paramLabel = "KEY=VALUE", description = "Change one label setting (repeatable); see below.")
    Map<String, String> settings = new LinkedHashMap<>();

    @Option(names = "--threads", paramLabel = "N", description = "Threads (default: every core).")
    Integer threads;

    @Option(names = "--max-file-mb", paramLabel = "MB", defaultValue = "50",
            description = "Skip documents larger than this as too-large (streamed feeds are read at any size; default: ${DEFAULT-VALUE}).")
    long maxFileMb;

    @Option(names = "--no-progress", description = "No progress bar on stderr (it is shown only on a terminal anyway).")
    boolean noProgress;

    /** Reads vocabulary files. */
    static final Function<Path, Vocabulary> VOCABULARIES = Vocabularies::read;

    @Override
    public Integer call() {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Workspace ws;
        try {
            ws = workspace(workspace, sources.isEmpty());
        } catch (IOException e) {
            err.println("sheaf label: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        List<SourceSpec> specs = new ArrayList<>();
        for (Path p : sources) {
            if (!Files.exists(p)) {
                err.println("sheaf label: source " + p + " does not exist; give listing files or folders. Try 'sheaf label --help'.");
                return ExitCodes.USAGE;
            }
            specs.add(SourceSpec.of(p));
        }
        if (specs.isEmpty()) {
            if (ws == null) {
                err.println("sheaf label: expected SOURCE files or folders, or --workspace DIR; found neither (and no "
                        + "workspace.json in the current folder). Try 'sheaf label --help'.");
                return ExitCodes.USAGE;
            }
            specs.addAll(ws.sources());
        }
        Path vocabFile = vocab != null ? vocab : ws == null ? null : ws.vocabulary();
        if (vocabFile == null) {
            err.println("sheaf label: expected --vocab FILE (or a workspace naming a \"vocabulary\"); found none.");
            return ExitCodes.USAGE;
        }
        Path outDir = out != null ? out : ws != null ? ws.output().resolve("labels") : Path.of("out", "labels");
        LabelOptions options;
        double[] proportions = null;
        AnalysisProfile prof;
        try {
            options = LabelOptions.fromMap(LabelOptions.preset(preset), settings);
            if (split != null) {
                proportions = StratifiedSplit.parseProportions(split);
            }
            prof = profile(profile, ws);
        } catch (IllegalArgumentException e) {
            err.println("sheaf label: " + e.getMessage());
            err.println("Try 'sheaf label --help'.");
            return ExitCodes.USAGE;
        } catch (IOException e) {
            err.println("sheaf label: cannot read the analysis profile: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        Vocabulary v;
        try {
            v = VOCABULARIES.apply(vocabFile);
        } catch (VocabularyUnreadable e) {
            err.println("sheaf label: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        Labeler labeler = Labeler.of(v, Analysis.of(prof), options);
        for (String note : labeler.notes()) {
            err.println("sheaf label: note: " + note);
        }
        LabelRun.Builder run = LabelRun.builder(labeler).sources(specs).maxFileBytes(maxFileMb * 1024 * 1024)
                .split(proportions, seed);
        if (threads != null) {
            run.threads(threads);
        }
        if (ws != null) {
            run.workspaceRoot(ws.dir());
        }
        LabelRunSummary s;
        try (Progress progress = Progress.open(!noProgress && System.console() != null, "label", err)) {
            run.onProgress(progress);
            s = run.build().run(outDir);
        } catch (IOException e) {
            err.println("sheaf label: cannot write the results to " + outDir + ": " + e.getMessage());
            return ExitCodes.FAILURE;
        } catch (IllegalArgumentException e) {
            err.println("sheaf label: " + e.getMessage());
            return ExitCodes.USAGE;
        }
        stdout.printf(Locale.ROOT, "listings            %,d%n", s.listings());
        stdout.printf(Locale.ROOT, "  with labels       %,d%n", s.withLabels());
        stdout.printf(Locale.ROOT, "  without labels    %,d  (%,d with nothing at all)%n", s.withoutLabels(), s.withNothing());
        stdout.printf(Locale.ROOT, "stated assignments  %,d%n", s.stated());
        stdout.printf(Locale.ROOT, "negated             %,d%n", s.negated());
        stdout.printf(Locale.ROOT, "category errors     %,d  (%s)%n", s.categoryErrors(), LabelRun.CATEGORY_ERRORS_CSV);
        stdout.printf(Locale.ROOT, "unreadable numbers  %,d%n", s.invalidValues());
        if (!s.splitSizes().isEmpty()) {
            StringBuilder b = new StringBuilder();
            s.splitSizes().forEach((k, n) -> b.append(b.length() == 0 ? "" : ", ").append(k).append(' ').append(String.format(Locale.ROOT, "%,d", n)));
            stdout.println("split               " + b + "  (seed " + seed + ")");
        }
        stdout.flush();
        err.printf(Locale.ROOT, "sheaf label: %,d listings from %,d files (%,d bytes) in %.1f s; results in %s%n", s.listings(),
                s.filesRead(), s.bytesRead(), s.elapsed().toMillis() / 1000.0, outDir);
        if (s.problems() > 0) {
            err.printf(Locale.ROOT, "sheaf label: %,d input problem%s; see %s%n", s.problems(), s.problems() == 1 ? "" : "s",
                    outDir.resolve(LabelRun.PROBLEMS_CSV));
            return ExitCodes.PROBLEMS;
        }
        return ExitCodes.OK;
    }

    /** The workspace given, or the current folder's when it has one and {@code implicit} allows it; null for none. */
    static Workspace workspace(Path dir, boolean implicit) throws IOException {
        if (dir != null) {
            return Workspace.load(dir);
        }
        if (implicit && Workspace.isWorkspace(Path.of("."))) {
            return Workspace.load(Path.of("."));
        }
        return null;
    }

    private static AnalysisProfile profile(String name, Workspace ws) throws IOException {
        if (name != null) {
            return AnalysisProfile.resolve(name);
        }
        if (ws == null) {
            return AnalysisProfile.defaults();
        }
        return ws.profileFile().isPresent() ? AnalysisProfile.load(ws.profileFile().get()) : AnalysisProfile.preset(ws.profile());
    }

    /** A vocabulary file could not be read; the message says why and what to do. */
    static final class VocabularyUnreadable extends RuntimeException {
        VocabularyUnreadable(String message, Throwable cause) {
            super(message, cause);
        }
    }

    /** Reads a vocabulary file with the vocabulary store (read-only: no lock, no journal). */
    static final class Vocabularies {
        private Vocabularies() {
        }

        static Vocabulary read(Path file) {
            if (!Files.isRegularFile(file)) {
                throw new VocabularyUnreadable("vocabulary file " + file + " does not exist; give the *.vocab.json file "
                        + "the curator saves (or export one with 'sheaf export')", null);
            }
            try {
                return VocabularyStore.read(file);
            } catch (IOException e) {
                throw new VocabularyUnreadable("cannot read the vocabulary " + file + ": " + e.getMessage(), e);
            }
        }
    }

    /** A progress bar on stderr fed by ingest progress; does nothing when off. */
    static final class Progress implements IngestProgress, AutoCloseable {
        private final ProgressBar bar;
        private final PrintWriter err;

        private Progress(ProgressBar bar, PrintWriter err) {
            this.bar = bar;
            this.err = err;
        }

        static Progress open(boolean on, String task, PrintWriter err) {
            if (!on) {
                return new Progress(null, err);
            }
            ProgressBar b = new ProgressBarBuilder().setTaskName(task).setInitialMax(-1).setStyle(ProgressBarStyle.ASCII)
                    .setUnit(" listings", 1).showSpeed().setUpdateIntervalMillis(250)
                    .setConsumer(new DelegatingProgressBarConsumer(line -> {
                        err.print('\r');
                        err.print(line);
                        err.flush();
                    })).build();
            return new Progress(b, err);
        }

        @Override
        public void update(long filesDone, long listings, long bytes, long problems) {
            if (bar != null) {
                bar.stepTo(listings);
                bar.setExtraMessage(String.format(Locale.ROOT, "%d files, %d MB, %d problems", filesDone, bytes >> 20, problems));
            }
        }

        @Override
        public void close() {
            if (bar != null) {
                bar.close();
                err.println();
                err.flush();
            }
        }
    }

}
