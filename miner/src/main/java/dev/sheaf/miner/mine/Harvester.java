package dev.sheaf.miner.mine;

import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;

/**
 * The mining stage's front door: listings in, {@link Harvest} out.
 *
 * <pre>{@code
 * Harvester h = Harvester.builder().profile(AnalysisProfile.defaults()).options(HarvestOptions.defaults()).build();
 * try (Harvester.Run run = h.start()) {
 *     ingest.run(run);              // run.accept(listing) may be called from several threads at once
 *     Harvest harvest = run.finish();
 *     HarvestFiles.write(harvest, outDir);
 * }
 * }</pre>
 *
 * Counts are exact and the harvest depends only on the listings (and, for evidence order, on each
 * listing's source and its position within that source), never on thread timing or thread count.
 * Memory stays within the budget (default: 60% of the maximum heap) by spilling token stores and
 * count runs to a temporary folder, removed when the run closes.
 */
public final class Harvester {

    /** Told when a phase starts: "analysing", "counting 2-grams", …, "scoring", "evidence", "evidence lines", "spec facets", "building the harvest". */
    @FunctionalInterface
    public interface Progress {
        void phase(String name);

        Progress NONE = name -> { };
    }

    private final AnalysisProfile profile;
    private final HarvestOptions options;
    private final int threads;
    private final Path tempRoot;
    private final long memoryBudget;
    private final List<String> sources;
    private final Progress progress;

    private Harvester(Builder b) {
        this.profile = b.profile;
        this.options = b.options;
        this.threads = b.threads;
        this.tempRoot = b.tempRoot;
        this.memoryBudget = b.memoryBudget;
        this.sources = List.copyOf(b.sources);
        this.progress = b.progress;
    }

    public static Builder builder() {
        return new Builder();
    }

    public HarvestOptions options() {
        return options;
    }

    public AnalysisProfile profile() {
        return profile;
    }

    /** Starts a run: worker threads begin analysing as soon as listings arrive. */
    public Run start() {
        return new Run(new MineJob(Analysis.of(profile), options, threads, tempRoot, memoryBudget, sources, progress));
    }

    /** Convenience: mines the listings of an iterable. */
    public Harvest harvest(Iterable<Listing> listings) {
        try (Run run = start()) {
            for (Listing l : listings) {
                run.accept(l);
            }
            return run.finish();
        }
    }

    /** One harvest in progress; {@link #accept} is thread-safe, {@link #finish} is called once, after the last accept. */
    public static final class Run implements Consumer<Listing>, AutoCloseable {
        private final MineJob job;

        private Run(MineJob job) {
            this.job = job;
        }

        @Override
        public void accept(Listing listing) {
            job.accept(Objects.requireNonNull(listing, "listing"));
        }

        /** Listings analysed so far (for progress displays). */
        public long listingsAnalysed() {
            return job.analysed();
        }

        /** Waits for the analysis to drain, counts, scores and returns the harvest. */
        public Harvest finish() {
            return job.finish();
        }

        /** Stops the workers and removes the temporary files (also after a failure). */
        @Override
        public void close() {
            job.close();
        }
    }

    /**
     * Builder. Defaults: the {@code default} profile, {@link HarvestOptions#defaults()}, one thread per
     * core, the system temp folder, 60% of the maximum heap, no source names, no progress.
     */
    public static final class Builder {
        private AnalysisProfile profile = AnalysisProfile.defaults();
        private HarvestOptions options = HarvestOptions.defaults();
        private int threads = Runtime.getRuntime().availableProcessors();
        private Path tempRoot = Path.of(System.getProperty("java.io.tmpdir"));
        private long memoryBudget = Runtime.getRuntime().maxMemory() / 10 * 6;
        private List<String> sources = List.of();
        private Progress progress = Progress.NONE;

        public Builder profile(AnalysisProfile v) {
            profile = Objects.requireNonNull(v, "profile");
            return this;
        }

        public Builder options(HarvestOptions v) {
            options = Objects.requireNonNull(v, "options");
            return this;
        }

        /** Analysis and counting threads, 1 to 255. */
        public Builder threads(int v) {
            if (v < 1 || v > 255) {
                throw new IllegalArgumentException("threads must be from 1 to 255, got " + v);
            }
            threads = v;
            return this;
        }

        /** Where temporary spill files go (a fresh sub-folder is made and removed). */
        public Builder tempRoot(Path v) {
            tempRoot = Objects.requireNonNull(v, "tempRoot");
            return this;
        }

        /** Bytes of heap the run may use for its stores and counters; beyond that it spills to disk. */
        public Builder memoryBudget(long v) {
            if (v < 1 << 20) {
                throw new IllegalArgumentException("memory budget must be at least 1 MiB, got " + v + " bytes");
            }
            memoryBudget = v;
            return this;
        }

        /** The sources as the user named them, recorded in the harvest's parameters. */
        public Builder sources(List<String> v) {
            sources = List.copyOf(v);
            return this;
        }

        public Builder progress(Progress v) {
            progress = Objects.requireNonNull(v, "progress");
            return this;
        }

        public Harvester build() {
            return new Harvester(this);
        }
    }
}
