package dev.sheaf.miner.cli;

import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import dev.sheaf.miner.mine.HarvestOptions;
import dev.sheaf.miner.mine.Harvester;
import dev.sheaf.miner.mine.Score;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.io.OutputSet;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarConsumer;
import me.tongfei.progressbar.ProgressBarStyle;
import picocli.CommandLine.Command;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheaf mine}: listing files in, a harvest of candidate attribute terms out. A thin shell over {@link Harvester}. */
@Command(name = "mine",
        mixinStandardHelpOptions = true,
        usageHelpAutoWidth = true,
        description = {
                "Mine candidate attribute terms from listing files into a harvest: every 1- to 3-word term (up to 5 with "
                        + "--ngram-max) with its counts, association scores, most distinctive categories and evidence "
                        + "lines, plus the spec-table keys as facet candidates.",
                "Writes harvest.json (everything), harvest.csv (for spreadsheets), harvest-specs.csv and problems.csv "
                        + "to the output folder. The same input always gives the same bytes.",
                ""},
        footerHeading = "%n",
        footer = {
                "Examples:",
                "  sheaf mine sample-listings/catalog --out out/harvest",
                "  sheaf mine --workspace sample-listings                  sources, profile and output from workspace.json",
                "  sheaf mine feeds/export.csv --mapping mapping.json --out out/harvest --rank-by llr",
                "  sheaf mine site/ --include '**/*.html' --exclude '**/archive/**' --out out/h --min-frequency 10",
                "",
                "Ranking: termhood (default) puts frequent multi-word phrases that stand on their own first; pmi, npmi,",
                "llr, t-score, chi2 and c-value rank multi-word terms only (single words follow); frequency and df count.",
                "Ties are broken by frequency, then by the term, so every run ranks alike.",
                "",
                ExitCodes.HELP_LIST})
final class MineCommand implements Callable<Integer> {

    /** The listing source; tests replace it, the ingest stage provides the real one. */
    static volatile ListingFeed feed = ListingFeeds.DEFAULT;

    @Spec
    CommandSpec spec;

    @Parameters(arity = "0..*", paramLabel = "SOURCE",
            description = "Files or folders of listings (HTML, PDF, DOCX/ODT/RTF, TXT/MD, CSV/TSV, JSON/JSONL).")
    List<Path> sources = new ArrayList<>();

    @Option(names = {"-o", "--out"}, paramLabel = "DIR",
            description = "Output folder (required with SOURCEs; with --workspace default: the workspace's output folder).")
    Path out;

    @Option(names = {"-w", "--workspace"}, paramLabel = "DIR",
            description = "Read sources, profile and output folder from DIR/workspace.json "
                    + "(default when no SOURCE is given and the current folder holds one).")
    Path workspace;

    @Option(names = {"-p", "--profile"}, paramLabel = "NAME|FILE",
            description = "Analysis profile: a preset (default, plain) or a profile file. Default: the workspace's, else default.")
    String profile;

    @Option(names = {"-n", "--ngram-max"}, paramLabel = "N", defaultValue = "" + HarvestOptions.DEFAULT_NGRAM_MAX,
            description = "Longest candidate in words, 1 to 5 (default: ${DEFAULT-VALUE}).")
    int ngramMax;

    @Option(names = "--min-frequency", paramLabel = "N", defaultValue = "" + HarvestOptions.DEFAULT_MIN_FREQUENCY,
            description = "Least occurrences of a candidate (default: ${DEFAULT-VALUE}).")
    int minFrequency;

    @Option(names = "--min-df", paramLabel = "N", defaultValue = "" + HarvestOptions.DEFAULT_MIN_DF,
            description = "Least listings a candidate occurs in (default: ${DEFAULT-VALUE}).")
    int minDf;

    @Option(names = "--max-df-share", paramLabel = "X", defaultValue = "" + HarvestOptions.DEFAULT_MAX_DF_SHARE,
            description = "Most listings a candidate may occur in, as a share; more is boilerplate (default: ${DEFAULT-VALUE}).")
    double maxDfShare;

    @Option(names = "--min-npmi", paramLabel = "X", defaultValue = "" + HarvestOptions.DEFAULT_MIN_NPMI,
            description = "Multi-word candidates need NPMI above this; -1 keeps all (default: ${DEFAULT-VALUE}).")
    double minNpmi;

    @Option(names = "--rank-by", paramLabel = "SCORE", defaultValue = "termhood", converter = ScoreConverter.class,
            description = "termhood, frequency, df, pmi, npmi, llr, t-score, chi2 or c-value (default: ${DEFAULT-VALUE}).")
    Score rankBy;

    @Option(names = {"-k", "--evidence"}, paramLabel = "K", defaultValue = "" + HarvestOptions.DEFAULT_EVIDENCE,
            description = "Evidence lines per candidate (default: ${DEFAULT-VALUE}).")
    int evidence;

    @Option(names = "--limit", paramLabel = "N", defaultValue = "" + HarvestOptions.DEFAULT_LIMIT,
            description = "Most candidates written, 0 = all (default: ${DEFAULT-VALUE}).")
    int limit;

    @Option(names = "--keep-numbers", description = "Keep candidates made only of numbers.")
    boolean keepNumbers;

    @Option(names = "--keep-quantities", description = "Keep candidates made only of numbers and units (\"1.2 kg\").")
    boolean keepQuantities;

    @Option(names = "--keep-headings", description = "Keep candidates seen almost only in short section headings "
            + "(\"Specifications\", \"Key features\"): parts of the page, dropped by default.")
    boolean keepHeadings;

    @Option(names = {"-t", "--threads"}, paramLabel = "N", description = "Threads (default: one per core).")
    Integer threads;

    @Option(names = "--mapping", paramLabel = "FILE",
            description = "Column/member mapping for CSV and JSON sources (JSON: id, title, description, category, bullets, specs, text).")
    Path mapping;

    @Option(names = "--include", paramLabel = "GLOB", description = "Only files matching (relative to each SOURCE); repeatable.")
    List<String> include = new ArrayList<>();

    @Option(names = "--exclude", paramLabel = "GLOB", description = "Skip files matching (relative to each SOURCE); repeatable.")
    List<String> exclude = new ArrayList<>();

    @Option(names = "--temp-dir", paramLabel = "DIR", description = "Folder for temporary spill files (default: the system temp folder).")
    Path tempDir;

    @Option(names = "--no-progress", description = "No progress bar on stderr (it is also off when there is no terminal).")
    boolean noProgress;

    @Option(names = "--progress", description = "Show the progress bar on stderr even without a terminal (for logs).")
    boolean progress;

    @Override
    public Integer call() {
        PrintWriter outW = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        long t0 = System.nanoTime();
        ListingFeed f = feed;
        ListingFeed.Job job;
        Path outDir;
        AnalysisProfile prof;
        HarvestOptions opts;
        try {
            Path ws = workspace;
            if (ws == null && sources.isEmpty()) {
                if (Files.isRegularFile(Path.of("workspace.json"))) {
                    ws = Path.of(".");
                } else {
                    return usage(err, "give one or more SOURCEs (files or folders) with --out DIR, or --workspace DIR");
                }
            }
            if (ws != null && !sources.isEmpty()) {
                return usage(err, "give either SOURCEs or --workspace, not both");
            }
            if (ws == null) {
                for (Path s : sources) {
                    if (!Files.exists(s)) {
                        return usage(err, "source '" + s + "' does not exist; give an existing file or folder");
                    }
                }
                if (out == null) {
                    return usage(err, "--out DIR is required with SOURCEs (where harvest.json and harvest.csv go)");
                }
                if (mapping != null && !Files.isRegularFile(mapping)) {
                    return usage(err, "mapping file '" + mapping + "' does not exist");
                }
                job = f.fromArguments(sources, include, exclude, mapping);
                outDir = out;
            } else {
                if (!Files.isRegularFile(ws.resolve("workspace.json"))) {
                    return usage(err, "'" + ws + "' holds no workspace.json; give a workspace folder or SOURCEs with --out");
                }
                job = f.fromWorkspace(ws);
                outDir = out != null ? out : job.output() != null ? job.output() : ws.resolve("out");
            }
            String p = profile != null ? profile : job.profile() != null ? job.profile() : "default";
            prof = AnalysisProfile.resolve(p);
            opts = HarvestOptions.builder().ngramMax(ngramMax).minFrequency(minFrequency).minDf(minDf).maxDfShare(maxDfShare)
                    .minNpmi(minNpmi).rankBy(rankBy).evidence(evidence).limit(limit).dropNumbers(!keepNumbers)
                    .dropQuantities(!keepQuantities).dropHeadings(!keepHeadings).build();
        } catch (ListingFeeds.Unavailable e) {
            err.println("sheaf mine: " + e.getMessage() + "; see README.md for what works today.");
            return ExitCodes.NOT_AVAILABLE;
        } catch (IllegalArgumentException e) {
            return usage(err, e.getMessage());
        } catch (IOException e) {
            err.println("sheaf mine: cannot read the sources: " + e.getMessage());
            return ExitCodes.FAILURE;
        }

        int nThreads = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        if (nThreads < 1 || nThreads > 255) {
            return usage(err, "--threads must be from 1 to 255, got " + nThreads);
        }
        boolean showProgress = !noProgress && (progress || System.console() != null);
        Harvester.Builder hb = Harvester.builder().profile(prof).options(opts).threads(nThreads).sources(job.sourceNames());
        if (tempDir != null) {
            hb.tempRoot(tempDir);
        }
        if (showProgress) {
            hb.progress(phase -> {
                if (!phase.equals("analysing")) {
                    err.printf(Locale.ROOT, "sheaf mine: %s … (at %.2f s)%n", phase, (System.nanoTime() - t0) / 1e9);
                    err.flush();
                }
            });
        }
        ListingFeed.Summary read;
        Harvest harvest;
        try (Harvester.Run run = hb.build().start();
             Bar bar = showProgress ? new Bar(err, job.totalBytes()) : null) {
            read = job.run(nThreads, run, bar == null ? (a, b, c, d) -> { } : bar::update);
            if (bar != null) {
                bar.done();
            }
            harvest = run.finish();
        } catch (IOException e) {
            err.println("sheaf mine: reading stopped: " + e.getMessage());
            return ExitCodes.FAILURE;
        } catch (RuntimeException e) {
            err.println("sheaf mine: the miner failed: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        try {
            OutputSet.writeAll(outDir, set -> {
                HarvestFiles.write(harvest, outDir);
                f.writeProblems(outDir.resolve("problems.csv"), read.problems());
            });
        } catch (IOException e) {
            err.println("sheaf mine: cannot write the harvest to " + outDir + ": " + e.getMessage()
                    + "; check that the folder is writable and has room");
            return ExitCodes.FAILURE;
        }
        summary(outW, harvest, read, outDir, Duration.ofNanos(System.nanoTime() - t0));
        outW.flush();
        if (!read.problems().isEmpty()) {
            err.printf(Locale.ROOT, "sheaf mine: %d input problem(s), listed in %s%n", read.problems().size(),
                    outDir.resolve("problems.csv"));
            return ExitCodes.PROBLEMS;
        }
        return ExitCodes.OK;
    }

    private int usage(PrintWriter err, String message) {
        err.println("sheaf mine: " + message);
        err.println("Try 'sheaf mine --help'.");
        return ExitCodes.USAGE;
    }

    private static void summary(PrintWriter o, Harvest h, ListingFeed.Summary read, Path outDir, Duration took) {
        Harvest.CorpusStats c = h.corpus();
        double secs = Math.max(1e-3, took.toNanos() / 1e9);
        o.printf(Locale.ROOT, "sheaf mine: harvest of %s%n", String.join(", ", h.parameters().sources()));
        row(o, "files", String.format(Locale.ROOT, "%,d read of %,d seen (%.1f MB)", read.filesRead(), read.filesSeen(),
                read.bytes() / 1e6));
        row(o, "listings", String.format(Locale.ROOT, "%,d in %,d categories", c.listings(), c.categories().size()));
        row(o, "tokens", String.format(Locale.ROOT, "%,d (%,d distinct terms)", c.tokens(), c.distinctTerms()));
        StringBuilder ng = new StringBuilder();
        for (Harvest.NgramLevel l : c.ngrams()) {
            ng.append(String.format(Locale.ROOT, "%s%d-grams %,d", ng.length() == 0 ? "" : ", ", l.n(), l.frequent()));
        }
        row(o, "frequent", ng.toString());
        row(o, "candidates", String.format(Locale.ROOT, "%,d written of %,d matching (ranked by %s)", c.candidatesWritten(),
                c.candidatesMatched(), h.parameters().options().rankBy().label()));
        row(o, "spec facets", String.format(Locale.ROOT, "%,d", h.specFacets().size()));
        row(o, "problems", String.format(Locale.ROOT, "%,d", read.problems().size()));
        row(o, "time", String.format(Locale.ROOT, "%.1f s (%.1f MB/s, %,.0f listings/s)", secs, read.bytes() / 1e6 / secs,
                c.listings() / secs));
        int top = Math.min(10, h.candidates().size());
        if (top > 0) {
            o.println("top candidates:");
            for (int i = 0; i < top; i++) {
                Harvest.Candidate k = h.candidates().get(i);
                o.printf(Locale.ROOT, "  %3d  %-32s %,9d  df %,d%n", k.rank(), k.term(), k.frequency(), k.df());
            }
        }
        o.printf(Locale.ROOT, "wrote %s, %s, %s and problems.csv in %s%n", HarvestFiles.JSON, HarvestFiles.CSV,
                HarvestFiles.SPECS_CSV, outDir);
    }

    private static void row(PrintWriter o, String label, String value) {
        o.printf(Locale.ROOT, "  %-12s %s%n", label, value);
    }

    /** Accepts score labels ("t-score") and names ("T_SCORE"). */
    static final class ScoreConverter implements ITypeConverter<Score> {
        @Override
        public Score convert(String value) {
            return Score.fromLabel(value);
        }
    }

    /** The progress bar on stderr: MB read, listings and rate, problems so far. */
    private static final class Bar implements AutoCloseable {
        private final ProgressBar bar;
        private final long start = System.nanoTime();
        private boolean closed;

        Bar(PrintWriter err, long totalBytes) {
            ProgressBarConsumer consumer = new ProgressBarConsumer() {
                @Override
                public int getMaxRenderedLength() {
                    return 100;
                }

                @Override
                public void accept(String rendered) {
                    err.print('\r');
                    err.print(rendered);
                    err.flush();
                }

                @Override
                public void close() {
                    err.println();
                    err.flush();
                }
            };
            bar = new ProgressBarBuilder().setTaskName("sheaf mine").setInitialMax(totalBytes > 0 ? totalBytes : -1)
                    .setUnit(" MB", 1_000_000).setStyle(ProgressBarStyle.ASCII).setUpdateIntervalMillis(250)
                    .setConsumer(consumer).showSpeed().build();
        }

        void update(long filesDone, long listings, long bytes, long problems) {
            double secs = Math.max(1e-3, (System.nanoTime() - start) / 1e9);
            bar.stepTo(bytes);
            bar.setExtraMessage(String.format(Locale.ROOT, "%,d files, %,d listings (%,.0f/s), %,d problems", filesDone,
                    listings, listings / secs, problems));
        }

        void done() {
            close();
        }

        @Override
        public void close() {
            if (!closed) {
                closed = true;
                bar.close();
            }
        }
    }
}
