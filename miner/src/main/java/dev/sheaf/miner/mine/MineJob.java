package dev.sheaf.miner.mine;

import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.Analysis;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;

/**
 * One harvest from start to finish. Pass 1 runs while listings stream in: producers hand batches to
 * a bounded queue, one {@link AnalysisWorker} per thread analyses and counts unigrams. Then, for
 * n = 2 .. max, every worker re-reads its token store and counts only the n-grams whose
 * (n−1)-token prefix and suffix both reached the minimum frequency and df (an n-gram never occurs
 * more often, nor in more listings, than either part, so the pruning is exact); the counts are
 * merged and pruned the same way. Scores, filters and the ranking come next, then one last pass
 * over the stores for the final candidates only (per-category df, first evidence positions), and
 * the evidence lines are cut from the few listings that supply them.
 */
final class MineJob {
    private static final int BATCH = 256;

    final Analysis analysis;
    final HarvestOptions options;
    final int threads;
    final List<String> sourcesParameter;
    final Harvester.Progress progress;
    private final RunFolder runFolder;
    private final Path tempDir;
    private final long memoryBudget;

    private final ArrayBlockingQueue<Batch> queue;
    private final AnalysisWorker[] workers;
    private final Thread[] workerThreads;
    private final Batch end = new Batch();
    private final ThreadLocal<Holder> holder = ThreadLocal.withInitial(this::newHolder);
    private final ConcurrentLinkedQueue<Holder> holders = new ConcurrentLinkedQueue<>();
    private final ConcurrentHashMap<String, SourceSeq> sources = new ConcurrentHashMap<>();
    private final List<String> sourceNames = new ArrayList<>();
    private final ConcurrentHashMap<String, Integer> categories = new ConcurrentHashMap<>();
    private final List<String> categoryNames = new ArrayList<>();
    private final AtomicLong analysed = new AtomicLong();
    private volatile Throwable failure;
    private boolean finished;

    MineJob(Analysis analysis, HarvestOptions options, int threads, Path tempRoot, long memoryBudget,
            List<String> sourcesParameter, Harvester.Progress progress) {
        this.analysis = analysis;
        this.options = options;
        this.threads = threads;
        this.sourcesParameter = List.copyOf(sourcesParameter);
        this.progress = progress;
        this.memoryBudget = memoryBudget;
        try {
            this.runFolder = RunFolder.create(tempRoot);
            this.tempDir = runFolder.dir;
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create a temporary folder under " + tempRoot + " (" + e.getMessage()
                    + "); give a writable temp folder", e);
        }
        this.queue = new ArrayBlockingQueue<>(threads * 4);
        this.workers = new AnalysisWorker[threads];
        this.workerThreads = new Thread[threads];
        long storeBudget = Math.max(16L << 20, memoryBudget * 35 / 100 / threads);
        for (int w = 0; w < threads; w++) {
            AnalysisWorker worker = new AnalysisWorker(w, this, analysis.newSegmenter(), tempDir, storeBudget);
            workers[w] = worker;
            Thread t = new Thread(() -> runWorker(worker), "sheaf-mine-" + w);
            t.setDaemon(true);
            workerThreads[w] = t;
            t.start();
        }
        progress.phase("analysing");
    }

    // ------------------------------------------------------------------ pass 1: streaming

    private static final class Batch {
        final Listing[] items = new Listing[BATCH];
        final long[] order = new long[BATCH];
        int size;
    }

    private static final class Holder {
        Batch batch;
    }

    private static final class SourceSeq {
        final int id;
        final AtomicLong next = new AtomicLong();

        SourceSeq(int id) {
            this.id = id;
        }
    }

    private Holder newHolder() {
        Holder h = new Holder();
        holders.add(h);
        return h;
    }

    void accept(Listing l) {
        if (finished) {
            throw new IllegalStateException("this harvest run is finished; start a new one");
        }
        SourceSeq s = sources.get(l.source());
        if (s == null) {
            s = sources.computeIfAbsent(l.source(), this::newSource);
        }
        long seq = s.next.getAndIncrement();
        if (seq > 0xFFFFFFFFL) {
            throw new IllegalStateException("more than 2^32 listings from one source: " + l.source());
        }
        Holder h = holder.get();
        Batch full = null;
        synchronized (h) {
            if (h.batch == null) {
                h.batch = new Batch();
            }
            Batch b = h.batch;
            b.items[b.size] = l;
            b.order[b.size] = ((long) s.id << 32) | seq;
            if (++b.size == BATCH) {
                full = b;
                h.batch = null;
            }
        }
        if (full != null) {
            put(full);
        }
    }

    private SourceSeq newSource(String name) {
        synchronized (sourceNames) {
            sourceNames.add(name);
            return new SourceSeq(sourceNames.size() - 1);
        }
    }

    int categoryId(String name) {
        Integer id = categories.get(name);
        if (id != null) {
            return id;
        }
        synchronized (categoryNames) {
            return categories.computeIfAbsent(name, k -> {
                categoryNames.add(k);
                return categoryNames.size() - 1;
            });
        }
    }

    long analysed() {
        return analysed.get();
    }

    private void put(Batch b) {
        try {
            queue.put(b);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while handing listings to the miner", e);
        }
    }

    private void runWorker(AnalysisWorker worker) {
        while (true) {
            Batch b;
            try {
                b = queue.take();
            } catch (InterruptedException e) {
                return;
            }
            if (b == end) {
                return;
            }
            if (failure != null) {
                continue; // keep draining so producers never block on a dead worker
            }
            try {
                for (int i = 0; i < b.size; i++) {
                    worker.process(b.items[i], b.order[i]);
                }
                analysed.addAndGet(b.size);
            } catch (Throwable t) {
                failure = t;
            }
        }
    }

    // ------------------------------------------------------------------ finish

    Harvest finish() {
        if (finished) {
            throw new IllegalStateException("finish() was already called");
        }
        finished = true;
        try {
            for (Holder h : holders) {
                Batch b;
                synchronized (h) {
                    b = h.batch;
                    h.batch = null;
                }
                if (b != null && b.size > 0) {
                    put(b);
                }
            }
            for (int w = 0; w < threads; w++) {
                put(end);
            }
            for (Thread t : workerThreads) {
                t.join();
            }
            if (failure != null) {
                throw new IllegalStateException("the miner failed while analysing: " + failure, failure);
            }
            for (AnalysisWorker w : workers) {
                w.seal();
            }
            ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
                Thread t = new Thread(r, "sheaf-count");
                t.setDaemon(true);
                return t;
            });
            try {
                return new Counting(pool).run();
            } finally {
                pool.shutdownNow();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while mining", e);
        } finally {
            close();
        }
    }

    void close() {
        finished = true;
        for (Thread t : workerThreads) {
            if (t != null && t.isAlive()) {
                t.interrupt(); // closed without finish(): the run is abandoned
            }
        }
        for (Thread t : workerThreads) {
            try {
                if (t != null) {
                    t.join(10_000);
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                break;
            }
        }
        for (AnalysisWorker w : workers) {
            if (w != null) {
                w.close();
            }
        }
        runFolder.close();
    }

    // ------------------------------------------------------------------ counting passes and scoring

    /** Everything after pass 1; holds the merged levels. */
    final class Counting {
        private final ExecutorService pool;
        private final int maxN = options.ngramMax();
        private final int minF = options.minFrequency();
        private final int minDf = options.minDf();
        private final String[] terms = analysis.terms().snapshot();
        private final int vocab = terms.length;
        /** Level 1: merged tf and df by term id. */
        private final int[] tf1 = new int[vocab];
        private final int[] df1 = new int[vocab];
        private final boolean[] frequent1 = new boolean[vocab];
        /** Levels 2..maxN. */
        private final FrequentTable[] levels = new FrequentTable[HarvestOptions.MAX_NGRAM + 1];
        private final long[] distinct = new long[HarvestOptions.MAX_NGRAM + 1];
        /** Whole headings of all workers (decision 051). */
        private final it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap<String> headings =
                new it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap<>();
        private int levelsCounted = 1;

        private long listings;
        private long fields;
        private long segments;
        private long tokens;

        Counting(ExecutorService pool) {
            this.pool = pool;
        }

        Harvest run() throws InterruptedException {
            mergeUnigrams();
            // one length beyond the longest candidate is counted too, only so that C-value nesting sees
            // a fragment of a longer fixed phrase ("returns within 30" inside "free returns within 30")
            int countTo = Math.min(maxN + 1, HarvestOptions.MAX_NGRAM);
            for (int n = 2; n <= countTo; n++) {
                progress.phase("counting " + n + "-grams");
                countLevel(n);
                levelsCounted = n;
                if (levels[n].size == 0) {
                    break;
                }
            }
            progress.phase("scoring");
            Scoring scoring = new Scoring(this);
            int[] selected = scoring.select(this::siteTemplate);
            progress.phase("evidence");
            FinalPass fin = finalPass(scoring, selected);
            progress.phase("spec facets");
            List<Harvest.SpecFacet> facets = specFacets();
            progress.phase("building the harvest");
            return scoring.build(selected, fin, facets);
        }

        private void mergeUnigrams() {
            for (AnalysisWorker w : workers) {
                int n = Math.min(vocab, w.tf.length);
                for (int id = 0; id < n; id++) {
                    tf1[id] = Math.addExact(tf1[id], w.tf[id]);
                    df1[id] = Math.addExact(df1[id], w.df[id]);
                }
                for (it.unimi.dsi.fastutil.objects.Object2IntMap.Entry<String> e : w.headings.object2IntEntrySet()) {
                    headings.addTo(e.getKey(), e.getIntValue());
                }
                listings += w.categories.size();
                fields += w.fields;
                segments += w.segments;
                tokens += w.tokens;
                w.tf = null;
                w.df = null;
            }
            for (int id = 0; id < vocab; id++) {
                frequent1[id] = tf1[id] >= minF && df1[id] >= minDf;
            }
            distinct[1] = vocab;
        }

        /** Frequency of an n-gram by level and index. */
        int tf(int level, int idx) {
            return level == 1 ? tf1[idx] : levels[level].tf[idx];
        }

        int df(int level, int idx) {
            return level == 1 ? df1[idx] : levels[level].df[idx];
        }

        /** Writes the token ids of (level, idx) into out[0..level). */
        void tokensOf(int level, int idx, int[] out) {
            for (int m = level; m >= 2; m--) {
                long c = levels[m].codes[idx];
                out[m - 1] = FrequentTable.lastOf(c);
                idx = FrequentTable.prefixOf(c);
            }
            out[0] = idx;
        }

        /** The index of the n-gram t[from, from+len) at level len, or -1 when it was pruned. */
        int indexOf(int[] t, int from, int len) {
            int idx = t[from];
            if (!frequent1[idx]) {
                return -1;
            }
            for (int m = 2; m <= len; m++) {
                idx = levels[m].get(FrequentTable.code(idx, t[from + m - 1]));
                if (idx < 0) {
                    return -1;
                }
            }
            return idx;
        }

        String term(int level, int idx) {
            int[] t = new int[level];
            tokensOf(level, idx, t);
            StringBuilder b = new StringBuilder();
            for (int i = 0; i < level; i++) {
                if (i > 0) {
                    b.append(' ');
                }
                b.append(terms[t[i]]);
            }
            return b.toString();
        }

        private void countLevel(int n) throws InterruptedException {
            long perWorker = Math.max(1L << 20, memoryBudget * 40 / 100 / threads);
            int maxEntries = (int) Math.min(1 << 28, perWorker / 50);
            List<NgramCounter> counters = new ArrayList<>();
            List<Future<?>> futures = new ArrayList<>();
            for (AnalysisWorker w : workers) {
                NgramCounter c = new NgramCounter(maxEntries, tempDir, "w" + w.index + "-n" + n + "-");
                counters.add(c);
                futures.add(pool.submit(() -> countWorker(w, n, c)));
            }
            await(futures);
            CountMerger.Merged m = CountMerger.merge(counters, minF, minDf);
            levels[n] = m.table();
            distinct[n] = m.distinct();
        }

        private void countWorker(AnalysisWorker w, int n, NgramCounter counter) {
            int[][] cur = {new int[256]};
            w.store.forEach((index, sym, len) -> {
                int stamp = index + 1;
                int from = 0;
                for (int i = 0; i <= len; i++) {
                    if (i == len || sym[i] == TokenStore.BOUNDARY) {
                        int segLen = i - from;
                        if (segLen >= n) {
                            if (cur[0].length < segLen) {
                                cur[0] = new int[segLen * 2];
                            }
                            countSegment(sym, from, segLen, n, cur[0], counter, stamp);
                        }
                        from = i + 1;
                    }
                }
                counter.listingDone();
            });
        }

        private void countSegment(int[] sym, int from, int len, int n, int[] cur, NgramCounter counter, int stamp) {
            for (int j = 0; j < len; j++) {
                int id = sym[from + j];
                cur[j] = frequent1[id] ? id : -1;
            }
            for (int m = 2; m < n; m++) {
                FrequentTable t = levels[m];
                for (int j = 0; j + m <= len; j++) {
                    cur[j] = cur[j] >= 0 && cur[j + 1] >= 0 ? t.get(FrequentTable.code(cur[j], sym[from + j + m - 1])) : -1;
                }
            }
            for (int j = 0; j + n <= len; j++) {
                if (cur[j] >= 0 && cur[j + 1] >= 0) {
                    counter.add(FrequentTable.code(cur[j], sym[from + j + n - 1]), stamp);
                }
            }
        }

        private void await(List<Future<?>> futures) throws InterruptedException {
            for (Future<?> f : futures) {
                try {
                    f.get();
                } catch (ExecutionException e) {
                    Throwable c = e.getCause();
                    if (c instanceof RuntimeException) {
                        throw (RuntimeException) c;
                    }
                    if (c instanceof Error) {
                        throw (Error) c;
                    }
                    throw new IllegalStateException(c);
                }
            }
        }

        // ---------------------------------------------------------------- final pass

        /**
         * Candidates numbered 0..n-1 by (level, index): per level, index → candidate (-1: none),
         * plus per first token the longest candidate starting with it.
         */
        private record CandidateMap(int[][] candOf, int[] reach) {
        }

        private CandidateMap candidateMap(int[] level, int[] index) {
            int[][] candOf = new int[maxN + 1][];
            candOf[1] = new int[vocab];
            Arrays.fill(candOf[1], -1);
            for (int m = 2; m <= candidateLevels(); m++) {
                candOf[m] = new int[levels[m].size];
                Arrays.fill(candOf[m], -1);
            }
            int[] reach = new int[vocab];
            int[] t = new int[HarvestOptions.MAX_NGRAM];
            for (int c = 0; c < level.length; c++) {
                int m = level[c];
                candOf[m][index[c]] = c;
                tokensOf(m, index[c], t);
                reach[t[0]] = Math.max(reach[t[0]], m);
            }
            return new CandidateMap(candOf, reach);
        }

        /** Per-listing df of the candidates by bucket (category, or source kind when bucketOfSource is given), with evidence when k > 0. */
        private FinalPart bucketPass(CandidateMap map, int cands, int buckets, int[] bucketOfSource, int k)
                throws InterruptedException {
            int[] rank = sourceRanks();
            List<FinalPart> parts = new ArrayList<>();
            List<Future<?>> futures = new ArrayList<>();
            for (AnalysisWorker w : workers) {
                FinalPart part = new FinalPart(cands, buckets, k);
                parts.add(part);
                futures.add(pool.submit(() -> finalWorker(w, part, map.candOf(), map.reach(), rank, bucketOfSource)));
            }
            await(futures);
            FinalPart total = parts.get(0);
            for (int i = 1; i < parts.size(); i++) {
                total.mergeFrom(parts.get(i));
            }
            return total;
        }

        /**
         * Site-template text (decision 049): for survivors given by level and index, true where the
         * term is in more than {@link HarvestOptions#TEMPLATE_SHARE} of the listings of one kind of
         * source file (by extension) that holds at least {@link HarvestOptions#TEMPLATE_MIN_LISTINGS}
         * listings, while the corpus also holds listings from other kinds. Null when no kind
         * qualifies (one kind only: its share is the df share, already capped).
         */
        boolean[] siteTemplate(int[] level, int[] index) throws InterruptedException {
            String[] names = sourceNames.toArray(new String[0]);
            List<String> kinds = new ArrayList<>();
            int[] kindOf = new int[names.length];
            for (int i = 0; i < names.length; i++) {
                String kind = sourceKind(names[i]);
                int at = kinds.indexOf(kind);
                if (at < 0) {
                    kinds.add(kind);
                    at = kinds.size() - 1;
                }
                kindOf[i] = at;
            }
            if (kinds.size() < 2 || options.maxDfShare() >= 1) {
                return null;
            }
            long[] kindListings = new long[kinds.size()];
            for (AnalysisWorker w : workers) {
                for (int i = 0; i < w.order.size(); i++) {
                    kindListings[kindOf[(int) (w.order.getLong(i) >>> 32)]]++;
                }
            }
            boolean any = false;
            for (long n : kindListings) {
                any |= n >= HarvestOptions.TEMPLATE_MIN_LISTINGS;
            }
            if (!any || level.length == 0) {
                return null;
            }
            FinalPart df = bucketPass(candidateMap(level, index), level.length, kinds.size(), kindOf, 0);
            boolean[] drop = new boolean[level.length];
            for (int c = 0; c < level.length; c++) {
                for (int g = 0; g < kindListings.length; g++) {
                    if (kindListings[g] >= HarvestOptions.TEMPLATE_MIN_LISTINGS
                            && df.categoryDf(c, g) > HarvestOptions.TEMPLATE_SHARE * kindListings[g]) {
                        drop[c] = true;
                        break;
                    }
                }
            }
            return drop;
        }

        private FinalPass finalPass(Scoring scoring, int[] selected) throws InterruptedException {
            int cands = selected.length;
            int[] candLevel = new int[cands];
            int[] candIndex = new int[cands];
            for (int c = 0; c < cands; c++) {
                candLevel[c] = scoring.level(selected[c]);
                candIndex[c] = scoring.index(selected[c]);
            }
            int nCats = categoryNames.size();
            int k = options.evidence();
            FinalPart total = bucketPass(candidateMap(candLevel, candIndex), cands, nCats, null, k);
            progress.phase("evidence lines");
            dev.sheaf.miner.text.EvidenceLine[][] lines = evidenceLines(total, candLevel, k);
            return new FinalPass(total, lines, categoryNames.toArray(new String[0]), categoryListings());
        }

        /** The kind of a source file: its extension, lower-cased ("html", "jsonl"); "" when it has none. */
        private static String sourceKind(String name) {
            int slash = Math.max(name.lastIndexOf('/'), name.lastIndexOf('\\'));
            int dot = name.lastIndexOf('.');
            return dot > slash + 1 ? name.substring(dot + 1).toLowerCase(java.util.Locale.ROOT) : "";
        }

        private long[] categoryListings() {
            long[] out = new long[categoryNames.size()];
            for (AnalysisWorker w : workers) {
                for (int i = 0; i < w.categories.size(); i++) {
                    out[w.categories.getInt(i)]++;
                }
            }
            return out;
        }

        private int[] sourceRanks() {
            String[] names = sourceNames.toArray(new String[0]);
            Integer[] ids = new Integer[names.length];
            for (int i = 0; i < ids.length; i++) {
                ids[i] = i;
            }
            Arrays.sort(ids, (a, b) -> names[a].compareTo(names[b]));
            int[] rank = new int[names.length];
            for (int r = 0; r < ids.length; r++) {
                rank[ids[r]] = r;
            }
            return rank;
        }

        private void finalWorker(AnalysisWorker w, FinalPart part, int[][] candOf, int[] reach, int[] rank, int[] bucketOfSource) {
            int[] lastStamp = new int[part.cands];
            w.store.forEach((index, sym, len) -> {
                int stamp = index + 1;
                long ord = w.order.getLong(index);
                int cat = bucketOfSource == null ? w.categories.getInt(index) : bucketOfSource[(int) (ord >>> 32)];
                long key = ((long) rank[(int) (ord >>> 32)] << 32) | (ord & 0xFFFFFFFFL);
                int end = 0;
                for (int j = 0; j < len; j++) {
                    int id = sym[j];
                    if (id == TokenStore.BOUNDARY) {
                        continue;
                    }
                    if (end <= j) {
                        end = j;
                        while (end < len && sym[end] != TokenStore.BOUNDARY) {
                            end++;
                        }
                    }
                    // only positions where some candidate starts; follow the prefix chain as far as one reaches
                    int longest = Math.min(reach[id], end - j);
                    if (longest == 0) {
                        continue;
                    }
                    hit(candOf[1][id], w.index, index, j, stamp, cat, key, part, lastStamp);
                    int idx = id;
                    for (int m = 2; m <= longest; m++) {
                        idx = levels[m].get(FrequentTable.code(idx, sym[j + m - 1]));
                        if (idx < 0) {
                            break;
                        }
                        hit(candOf[m][idx], w.index, index, j, stamp, cat, key, part, lastStamp);
                    }
                }
            });
        }

        private void hit(int cand, int worker, int listing, int pos, int stamp, int cat, long key, FinalPart part, int[] lastStamp) {
            if (cand < 0 || lastStamp[cand] == stamp) {
                return;
            }
            lastStamp[cand] = stamp;
            part.categoryHit(cand, cat);
            part.offerEvidence(cand, key, FinalPart.ref(worker, listing, pos));
        }

        private dev.sheaf.miner.text.EvidenceLine[][] evidenceLines(FinalPart total, int[] candLevel, int k)
                throws InterruptedException {
            int cands = total.cands;
            dev.sheaf.miner.text.EvidenceLine[][] out = new dev.sheaf.miner.text.EvidenceLine[cands][];
            for (int c = 0; c < cands; c++) {
                out[c] = new dev.sheaf.miner.text.EvidenceLine[total.evidenceCount(c)];
            }
            if (k == 0) {
                return out;
            }
            // group the wanted (candidate, slot) pairs by worker and listing
            List<List<long[]>> byWorker = new ArrayList<>();
            for (int w = 0; w < threads; w++) {
                byWorker.add(new ArrayList<>());
            }
            for (int c = 0; c < cands; c++) {
                for (int s = 0; s < total.evidenceCount(c); s++) {
                    long ref = total.evidenceRef(c, s);
                    byWorker.get(FinalPart.refWorker(ref)).add(new long[] {ref, c, s});
                }
            }
            String[] sourceArr = sourceNames.toArray(new String[0]);
            List<Future<?>> futures = new ArrayList<>();
            for (int w = 0; w < threads; w++) {
                List<long[]> wanted = byWorker.get(w);
                AnalysisWorker worker = workers[w];
                futures.add(pool.submit(() -> new EvidenceCutter(worker.spill, sourceArr, options.evidenceWidth())
                        .cut(wanted, candLevel, out)));
            }
            await(futures);
            return out;
        }

        // ---------------------------------------------------------------- spec facets

        private List<Harvest.SpecFacet> specFacets() {
            SpecTally all = new SpecTally();
            for (AnalysisWorker w : workers) {
                all.addAll(w.specs);
            }
            return SpecFacets.build(all, options.specValues());
        }

        // accessors for Scoring
        /** How often the tokens t[0, len) occurred inside a whole section heading (decision 051). */
        int wholeHeadings(int[] t, int len) {
            return headings.isEmpty() ? 0 : headings.getInt(AnalysisWorker.headingKey(t, 0, len));
        }

        MineJob outer() {
            return MineJob.this;
        }

        String[] terms() {
            return terms;
        }

        int vocab() {
            return vocab;
        }

        boolean frequent1(int id) {
            return frequent1[id];
        }

        int levelsCounted() {
            return levelsCounted;
        }

        /** The longest candidate length that was counted (the last counted level may be context only). */
        int candidateLevels() {
            return Math.min(levelsCounted, maxN);
        }

        FrequentTable level(int n) {
            return levels[n];
        }

        long distinct(int n) {
            return distinct[n];
        }

        long listings() {
            return listings;
        }

        long fields() {
            return fields;
        }

        long segments() {
            return segments;
        }

        long tokens() {
            return tokens;
        }

        long sourceCount() {
            return sourceNames.size();
        }
    }

    /** Per-category df and evidence of the final candidates. */
    record FinalPass(FinalPart counts, dev.sheaf.miner.text.EvidenceLine[][] evidence, String[] categories,
                     long[] categoryListings) {
    }

}
