package dev.sheaf.miner.label;

import dev.sheaf.miner.ingest.Ingest;
import dev.sheaf.miner.ingest.IngestProgress;
import dev.sheaf.miner.ingest.IngestSummary;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.Problem;
import dev.sheaf.miner.ingest.ProblemLog;
import dev.sheaf.miner.ingest.SourceSpec;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.OutputSet;
import dev.sheaf.vocab.io.SpillFile;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;

/**
 * A whole label run: listings streamed from {@link Ingest} on all cores through a {@link Labeler},
 * and every export written to one folder — {@value AssignmentsJsonl#FILE_NAME}, {@value #LABELS_CSV},
 * {@value #FACET_VALUES_CSV}, {@value #SUMMARY_CSV}, {@value #SUMMARY_JSON},
 * {@value #CATEGORY_ERRORS_CSV}, {@value #PROBLEMS_CSV}, {@value GapTerms#FILE_NAME} and, with a
 * split, {@value #SPLIT_CSV} and {@value #SPLIT_SUMMARY_CSV}.
 *
 * <p>Rows come out in a fixed order whatever the threads did: by source, then by position in the
 * source. While the run lasts, each listing's JSON line goes to a spill file beside the output (so a
 * million listings' evidence is never all in memory) and a small row stays in memory for the
 * tables; the spill is copied out in order at the end and deleted.
 */
public final class LabelRun {
    public static final String LABELS_CSV = "labels.csv";
    public static final String FACET_VALUES_CSV = "facet-values.csv";
    public static final String SUMMARY_CSV = "label-summary.csv";
    public static final String SUMMARY_JSON = "label-summary.json";
    public static final String CATEGORY_ERRORS_CSV = "category-errors.csv";
    public static final String PROBLEMS_CSV = "problems.csv";
    public static final String SPLIT_CSV = "split.csv";
    public static final String SPLIT_SUMMARY_CSV = "split-summary.csv";
    public static final String GAP_TERMS_CSV = GapTerms.FILE_NAME;

    private final Labeler labeler;
    private final List<SourceSpec> sources;
    private final Path workspaceRoot;
    private final int threads;
    private final double[] split;
    private final long seed;
    private final IngestProgress progress;
    private final int gapTerms;
    private final long maxFileBytes;

    private LabelRun(Builder b) {
        this.labeler = b.labeler;
        this.sources = List.copyOf(b.sources);
        this.workspaceRoot = b.workspaceRoot;
        this.threads = b.threads;
        this.split = b.split;
        this.seed = b.seed;
        this.progress = b.progress;
        this.gapTerms = b.gapTerms;
        this.maxFileBytes = b.maxFileBytes;
    }

    public static Builder builder(Labeler labeler) {
        return new Builder(labeler);
    }

    /** Reads the sources with {@link Ingest}, labels every listing and writes the exports to {@code outDir}. */
    public LabelRunSummary run(Path outDir) throws IOException {
        if (sources.isEmpty()) {
            throw new IllegalStateException("a label run needs at least one source; add one with Builder.source");
        }
        long t0 = System.nanoTime();
        Ingest.Builder ib = Ingest.builder().sources(sources).threads(threads).onProgress(progress).maxFileBytes(maxFileBytes);
        if (workspaceRoot != null) {
            ib.workspaceRoot(workspaceRoot);
        }
        try (Collector c = new Collector(outDir)) {
            IngestSummary s;
            try {
                s = ib.build().run(c::submit);
            } finally {
                c.drain();
            }
            return c.finish(s.problems(), s.filesSeen(), s.filesRead(), s.bytesRead(), t0);
        }
    }

    /** Labels listings already in hand and writes the exports; for tests and embedding. */
    public LabelRunSummary run(Iterable<Listing> listings, List<Problem> problems, Path outDir) throws IOException {
        long t0 = System.nanoTime();
        try (Collector c = new Collector(outDir)) {
            try {
                for (Listing l : listings) {
                    c.submit(l);
                }
            } finally {
                c.drain();
            }
            return c.finish(problems, 0, 0, 0, t0);
        }
    }

    /** Receives listings from any thread. */
    private final class Collector implements AutoCloseable {
        private final Path outDir;
        private final SpillFile spill;
        private final List<Spilled> rows = Collections.synchronizedList(new ArrayList<>());
        private final List<Object[]> categoryErrors = Collections.synchronizedList(new ArrayList<>());
        private final Map<String, AtomicLong> seqs = new ConcurrentHashMap<>();
        private final LabelColumns cols;
        private final GapTerms gaps;
        private final AtomicLong stated = new AtomicLong();
        private final AtomicLong negated = new AtomicLong();
        private final AtomicLong invalid = new AtomicLong();
        private final java.util.concurrent.BlockingQueue<Batch> queue = new java.util.concurrent.ArrayBlockingQueue<>(threads * 4);
        /** Each reading thread's batch being filled. */
        private final Map<Thread, Batch> filling = new ConcurrentHashMap<>();
        private final List<Thread> workers = new ArrayList<>();
        private final java.util.concurrent.atomic.AtomicReference<Throwable> failure = new java.util.concurrent.atomic.AtomicReference<>();

        Collector(Path outDir) throws IOException {
            this.outDir = outDir;
            Files.createDirectories(outDir);
            this.spill = SpillFile.create(AtomicFiles.scratchFile(outDir, "assignments"));
            this.cols = LabelColumns.of(labeler.vocabulary());
            this.gaps = new GapTerms(labeler.analysis());
            for (int i = 0; i < threads; i++) {
                Thread t = new Thread(this::work, "sheaf-label-" + (i + 1));
                t.setDaemon(true);
                workers.add(t);
                t.start();
            }
        }

        /**
         * Called by the reading threads: numbers the listing within its source (listings of one file
         * arrive in file order from one thread) and hands it to the labeling threads, so a catalog
         * that is one big file is still labeled on every core. Each reading thread hands its listings
         * over {@value Batch#SIZE} at a time: one at a time cost a lock wake-up per listing, and at a
         * million listings a third of the run's CPU time went to the kernel.
         */
        void submit(Listing l) {
            rethrow();
            long seq = seqs.computeIfAbsent(l.source(), k -> new AtomicLong()).getAndIncrement();
            Batch b = filling.computeIfAbsent(Thread.currentThread(), t -> new Batch());
            if (b.add(l, seq)) {
                filling.remove(Thread.currentThread());
                try {
                    queue.put(b); // put, not add: a fast single-thread producer can leave the queue full
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new IllegalStateException("interrupted while labeling", e);
                }
            }
        }

        private void work() {
            while (true) {
                Batch b;
                try {
                    b = queue.take();
                } catch (InterruptedException e) {
                    return;
                }
                if (b == Batch.END) {
                    return;
                }
                if (failure.get() != null) {
                    continue; // keep draining so the readers never block on a full queue
                }
                try {
                    accept(b);
                } catch (RuntimeException | Error e) {
                    failure.compareAndSet(null, e);
                }
            }
        }

        /** Waits until every submitted listing is labeled; rethrows the first labeling failure. */
        void drain() throws IOException {
            try {
                for (Batch b : filling.values()) {
                    queue.put(b); // the reading threads are done: their part-filled batches go as they are
                }
                filling.clear();
                for (int i = 0; i < workers.size(); i++) {
                    queue.put(Batch.END);
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException("interrupted while stopping the labeling threads", e);
            }
            for (Thread t : workers) {
                try {
                    t.join();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new IOException("interrupted while waiting for the labeling threads", e);
                }
            }
            workers.clear();
            Throwable f = failure.get();
            if (f instanceof UncheckedIOException u) {
                throw u.getCause();
            }
            rethrow();
        }

        private void rethrow() {
            Throwable f = failure.get();
            if (f instanceof RuntimeException re) {
                throw re;
            }
            if (f instanceof Error err) {
                throw err;
            }
        }

        /** Labels a batch; its JSON lines go to the spill in one append, its rows and counts in one step each. */
        private void accept(Batch b) {
            LabelRow[] labelRows = new LabelRow[b.size];
            byte[][] lines = new byte[b.size][];
            int bytes = 0;
            long s = 0;
            long n = 0;
            long bad = 0;
            List<Object[]> errors = new ArrayList<>();
            for (int i = 0; i < b.size; i++) {
                Listing l = b.listings[i];
                Assignments a = labeler.label(l);
                labelRows[i] = LabelRow.of(a, b.seqs[i], cols, labeler.vocabulary());
                lines[i] = AssignmentsJsonl.line(a, labeler.vocabulary());
                bytes += lines[i].length;
                for (Assignment x : a.assignments()) {
                    if (x.isStated()) {
                        s++;
                    } else {
                        n++;
                    }
                }
                bad += a.invalid().size();
                if (!a.categoryErrors().isEmpty()) {
                    errors.addAll(LabelExports.categoryErrors(a, labeler.vocabulary()));
                }
                if (a.isEmpty()) {
                    gaps.add(l);
                }
            }
            byte[] joined = new byte[bytes];
            int at = 0;
            for (byte[] line : lines) {
                System.arraycopy(line, 0, joined, at, line.length);
                at += line.length;
            }
            long off;
            try {
                off = spill.append(joined, 0, joined.length);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot write the spill file " + spill.path(), e);
            }
            List<Spilled> spilled = new ArrayList<>(b.size);
            for (int i = 0; i < b.size; i++) {
                spilled.add(new Spilled(labelRows[i], off, lines[i].length));
                off += lines[i].length;
            }
            rows.addAll(spilled);
            stated.addAndGet(s);
            negated.addAndGet(n);
            invalid.addAndGet(bad);
            if (!errors.isEmpty()) {
                categoryErrors.addAll(errors);
            }
        }

        /** Writes every export as one {@link OutputSet}: on a failure half-way, the earlier exports are all kept. */
        LabelRunSummary finish(List<Problem> problems, long filesSeen, long filesRead, long bytes, long t0) throws IOException {
            try (OutputSet set = OutputSet.open(outDir)) {
                LabelRunSummary s = writeExports(problems, filesSeen, filesRead, bytes, t0);
                set.commit();
                return s;
            }
        }

        private LabelRunSummary writeExports(List<Problem> problems, long filesSeen, long filesRead, long bytes, long t0)
                throws IOException {
            List<Spilled> sorted = new ArrayList<>(rows);
            sorted.sort((x, y) -> LabelExports.FILE_ORDER.compare(x.row, y.row));
            List<LabelRow> table = new ArrayList<>(sorted.size());
            long withLabels = 0;
            long nothing = 0;
            for (Spilled s : sorted) {
                table.add(s.row);
                if (!s.row.noStated()) {
                    withLabels++;
                }
                if (s.row.empty()) {
                    nothing++;
                }
            }
            List<String> files = new ArrayList<>();
            Path jsonl = outDir.resolve(AssignmentsJsonl.FILE_NAME);
            AtomicFiles.write(jsonl, out -> {
                for (Spilled s : sorted) {
                    spill.copyTo(s.offset, s.length, out);
                }
            });
            files.add(jsonl.toString());
            LabelExports.writeMatrix(outDir.resolve(LABELS_CSV), cols, table);
            files.add(outDir.resolve(LABELS_CSV).toString());
            LabelExports.writeFacetValues(outDir.resolve(FACET_VALUES_CSV), cols, table);
            files.add(outDir.resolve(FACET_VALUES_CSV).toString());
            List<Object[]> errors = new ArrayList<>(categoryErrors);
            errors.sort((x, y) -> {
                int c = ((String) x[2]).compareTo((String) y[2]);
                c = c != 0 ? c : ((String) x[0]).compareTo((String) y[0]);
                return c != 0 ? c : ((String) x[3]).compareTo((String) y[3]);
            });
            LabelExports.writeCategoryErrors(outDir.resolve(CATEGORY_ERRORS_CSV), errors);
            files.add(outDir.resolve(CATEGORY_ERRORS_CSV).toString());
            ProblemLog.write(outDir.resolve(PROBLEMS_CSV), problems);
            files.add(outDir.resolve(PROBLEMS_CSV).toString());
            GapTerms.write(outDir.resolve(GAP_TERMS_CSV), gaps.top(gapTerms));
            files.add(outDir.resolve(GAP_TERMS_CSV).toString());
            LabelExports.SplitOutcome so = null;
            if (split != null) {
                so = LabelExports.split(cols, table, split, seed);
                LabelExports.writeSplit(outDir.resolve(SPLIT_CSV), outDir.resolve(SPLIT_SUMMARY_CSV), cols, so);
                files.add(outDir.resolve(SPLIT_CSV).toString());
                files.add(outDir.resolve(SPLIT_SUMMARY_CSV).toString());
            }
            files.add(outDir.resolve(SUMMARY_CSV).toString());
            files.add(outDir.resolve(SUMMARY_JSON).toString());
            LabelRunSummary summary = new LabelRunSummary(table.size(), withLabels, table.size() - withLabels, nothing,
                    stated.get(), negated.get(), errors.size(), invalid.get(), filesSeen, filesRead, bytes, problems.size(),
                    labeler.notes(), LabelExports.sizes(so), files, Duration.ofNanos(System.nanoTime() - t0));
            Map<String, String> settings = new LinkedHashMap<>();
            settings.put("profile", labeler.analysis().profile().name());
            settings.put("vocabulary", labeler.vocabulary().scheme().id());
            labeler.options().toMap().forEach((k, v) -> settings.put("label." + k, v));
            LabelExports.writeSummary(outDir.resolve(SUMMARY_CSV), outDir.resolve(SUMMARY_JSON), cols, table, summary, settings, so);
            return summary;
        }

        @Override
        public void close() throws IOException {
            for (Thread t : workers) {
                t.interrupt();
            }
            spill.close();
        }
    }

    private record Spilled(LabelRow row, long offset, int length) {
    }

    /** Listings handed from a reading thread to the labeling threads in one go, each with its number within its source. */
    private static final class Batch {
        static final int SIZE = 64;
        /** Tells a labeling thread to stop. */
        static final Batch END = new Batch();

        final Listing[] listings = new Listing[SIZE];
        final long[] seqs = new long[SIZE];
        int size;

        /** Adds a listing; true when the batch is full. */
        boolean add(Listing l, long seq) {
            listings[size] = l;
            seqs[size++] = seq;
            return size == SIZE;
        }
    }

    /** Collects the sources and settings of a run. */
    public static final class Builder {
        private final Labeler labeler;
        private final List<SourceSpec> sources = new ArrayList<>();
        private Path workspaceRoot;
        private int threads = Runtime.getRuntime().availableProcessors();
        private double[] split;
        private long seed = 1;
        private IngestProgress progress = IngestProgress.NONE;
        private int gapTerms = 200;
        private long maxFileBytes = Ingest.DEFAULT_MAX_FILE_BYTES;

        private Builder(Labeler labeler) {
            this.labeler = Objects.requireNonNull(labeler, "labeler");
        }

        public Builder source(SourceSpec s) {
            sources.add(Objects.requireNonNull(s, "source"));
            return this;
        }

        public Builder sources(List<SourceSpec> s) {
            s.forEach(this::source);
            return this;
        }

        /** Display paths in the outputs are made relative to this folder. */
        public Builder workspaceRoot(Path root) {
            this.workspaceRoot = root;
            return this;
        }

        /** Reading and labeling threads (default: every core). */
        public Builder threads(int n) {
            if (n < 1) {
                throw new IllegalArgumentException("threads must be at least 1, got " + n);
            }
            this.threads = n;
            return this;
        }

        /** Also write a stratified split with these proportions (see {@link StratifiedSplit#parseProportions}). */
        public Builder split(double[] proportions, long seed) {
            this.split = proportions == null ? null : proportions.clone();
            this.seed = seed;
            return this;
        }

        public Builder onProgress(IngestProgress p) {
            this.progress = Objects.requireNonNull(p, "progress");
            return this;
        }

        /** How many of the commonest terms of unlabeled listings to write (default 200). */
        public Builder gapTerms(int n) {
            if (n < 0) {
                throw new IllegalArgumentException("gapTerms must be >= 0, got " + n);
            }
            this.gapTerms = n;
            return this;
        }

        /** Files larger than this are skipped as "too-large" problems (default {@link Ingest#DEFAULT_MAX_FILE_BYTES}). */
        public Builder maxFileBytes(long bytes) {
            if (bytes < 1) {
                throw new IllegalArgumentException("maxFileBytes must be positive, got " + bytes);
            }
            this.maxFileBytes = bytes;
            return this;
        }

        public LabelRun build() {
            return new LabelRun(this);
        }
    }
}
