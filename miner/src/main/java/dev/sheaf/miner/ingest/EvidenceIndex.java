package dev.sheaf.miner.ingest;

import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.io.AtomicFiles;
import java.io.Closeable;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.TreeSet;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.FieldType;
import org.apache.lucene.document.SortedDocValuesField;
import org.apache.lucene.document.StoredField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexOptions;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.ReaderUtil;
import org.apache.lucene.index.SortedDocValues;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.Matches;
import org.apache.lucene.search.MatchesIterator;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.ScoreMode;
import org.apache.lucene.search.SimpleCollector;
import org.apache.lucene.search.Sort;
import org.apache.lucene.search.SortField;
import org.apache.lucene.search.TopFieldDocs;
import org.apache.lucene.search.Weight;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.util.FixedBitSet;
import org.apache.lucene.util.QueryBuilder;

/**
 * The evidence index: an on-disk Lucene index of listings, so evidence lines ("keyword in
 * context"), "how many listings say this" and "which listings" come back at once on a large
 * catalog instead of a rescan of the files. It is derived data: deleting it loses nothing.
 *
 * <p>Layout: one Lucene document per listing. Each listing field is one value of the multi-valued
 * {@code text} field, indexed with positions and offsets by the caller's {@link Analyzer}, wrapped
 * so that a phrase never matches across two fields (a position gap of {@value #FIELD_GAP}) and
 * values' offsets follow each other without a gap: value {@code i} starts at the sum of the
 * lengths of the values before it, which maps a match back to its field and to offsets in that
 * field's text. Each field's kind, spec key and text are stored in field order; the listing's id,
 * category, source and locator are stored once; the id is also kept as sorted doc values (result
 * order) and as an indexed keyword.
 *
 * <p>A build goes into a fresh {@code building-*} folder next to the current index; only when
 * {@link Writer#commit()} succeeds is it renamed to {@code index-N} and named in the file
 * {@code CURRENT} (written atomically). A crash mid-build therefore leaves the previous index
 * current; leftovers are removed by the next successful build.
 *
 * <p>Thread-safety: {@link Writer#add} may be called from several threads; an open
 * {@code EvidenceIndex} may be queried from several threads.
 */
public final class EvidenceIndex implements Closeable {
    /** Characters of context kept on each side of a match in {@link #lines(String, int)}. */
    public static final int DEFAULT_CONTEXT_CHARS = 60;

    static final String TEXT = "text";
    private static final String FIELD = "f";
    private static final String META = "m";
    private static final String LISTING_ID = "lid";
    /** Positions between two fields of one listing, so no phrase spans them. */
    static final int FIELD_GAP = 100;
    private static final String ID = "id";
    private static final String CURRENT = "CURRENT";
    private static final char SEP = '\u001f';
    private static final FieldType TEXT_TYPE = new FieldType();

    static {
        TEXT_TYPE.setTokenized(true);
        TEXT_TYPE.setStored(false);
        TEXT_TYPE.setOmitNorms(true);
        TEXT_TYPE.setIndexOptions(IndexOptions.DOCS_AND_FREQS_AND_POSITIONS_AND_OFFSETS);
        TEXT_TYPE.freeze();
    }

    private final Path folder;
    private final DirectoryReader reader;
    private final IndexSearcher searcher;
    private final QueryBuilder queries;

    private EvidenceIndex(Path folder, DirectoryReader reader, Analyzer analyzer) {
        this.folder = folder;
        this.reader = reader;
        this.searcher = new IndexSearcher(reader);
        this.queries = new QueryBuilder(analyzer);
    }

    /**
     * Starts a new build for {@code dir} (created if missing). The current index, if any, stays
     * current until {@link Writer#commit()}.
     */
    public static Writer writer(Path dir, Analyzer analyzer) throws IOException {
        return new Writer(dir, analyzer);
    }

    /** True when {@code dir} holds a committed evidence index. */
    public static boolean exists(Path dir) {
        return Files.isRegularFile(dir.resolve(CURRENT));
    }

    /**
     * Opens the current index of {@code dir}; queries are analysed with {@code analyzer}, which
     * must be the one the index was built with.
     *
     * @throws IOException when there is no committed index in {@code dir}
     */
    public static EvidenceIndex open(Path dir, Analyzer analyzer) throws IOException {
        Objects.requireNonNull(analyzer, "analyzer");
        String name;
        try {
            name = Files.readString(dir.resolve(CURRENT), StandardCharsets.UTF_8).strip();
        } catch (NoSuchFileException e) {
            throw new IOException("no evidence index in " + dir + " (no " + CURRENT + " file); it is built when listings are ingested (sheaf mine)", e);
        }
        Path folder = dir.resolve(name);
        return new EvidenceIndex(folder, DirectoryReader.open(FSDirectory.open(folder)), analyzer);
    }

    /** The folder of the index generation that is open. */
    public Path folder() {
        return folder;
    }

    /** Listings in the index. */
    public long listings() throws IOException {
        return countDistinct(new org.apache.lucene.search.MatchAllDocsQuery());
    }

    /** Evidence lines for {@code phrase}, at most {@code limit}, ordered by listing id, then field order, then offset. */
    public List<EvidenceLine> lines(String phrase, int limit) throws IOException {
        return lines(phrase, limit, DEFAULT_CONTEXT_CHARS);
    }

    /** As {@link #lines(String, int)} with {@code contextChars} of context on each side. */
    public List<EvidenceLine> lines(String phrase, int limit, int contextChars) throws IOException {
        requireLimit(limit);
        Query q = query(phrase);
        List<EvidenceLine> out = new ArrayList<>();
        if (q == null || limit == 0) {
            return out;
        }
        q = searcher.rewrite(q);
        Weight w = searcher.createWeight(q, ScoreMode.COMPLETE_NO_SCORES, 1f);
        TopFieldDocs top = searcher.search(q, limit, new Sort(new SortField(LISTING_ID, SortField.Type.STRING), SortField.FIELD_DOC));
        List<LeafReaderContext> leaves = reader.leaves();
        StoredFields stored = reader.storedFields();
        for (ScoreDoc sd : top.scoreDocs) {
            LeafReaderContext leaf = leaves.get(ReaderUtil.subIndex(sd.doc, leaves));
            Matches m = w.matches(leaf, sd.doc - leaf.docBase);
            MatchesIterator it = m == null ? null : m.getMatches(TEXT);
            if (it == null) {
                continue;
            }
            Document doc = stored.document(sd.doc);
            String[] meta = split(doc.get(META), 4);
            String[] packed = doc.getValues(FIELD);
            String[][] fields = new String[packed.length][];
            int[] base = new int[packed.length + 1];
            for (int i = 0; i < packed.length; i++) {
                fields[i] = split(packed[i], 3);
                base[i + 1] = base[i] + fields[i][2].length();
            }
            int f = 0;
            while (it.next() && out.size() < limit) {
                int s = it.startOffset();
                int e = it.endOffset();
                while (f + 1 < packed.length && s >= base[f + 1]) {
                    f++;
                }
                if (s < base[f] || e > base[f + 1]) {
                    throw new IllegalStateException("the evidence index in " + folder + " has offsets that do not fit its stored text ("
                            + s + ".." + e + " for '" + phrase + "'); was it built with another analyzer? Rebuild it");
                }
                String[] fv = fields[f];
                out.add(EvidenceLine.cut(meta[0], meta[2], meta[3], fv[0], fv[1], fv[2], s - base[f], e - base[f], contextChars));
            }
            if (out.size() >= limit) {
                break;
            }
        }
        return out;
    }

    /** Listings with at least one field containing {@code phrase}. */
    public long count(String phrase) throws IOException {
        Query q = query(phrase);
        return q == null ? 0 : countDistinct(q);
    }

    /** Ids of listings containing {@code phrase}, in id order, at most {@code limit} (distinct). */
    public List<String> listingIds(String phrase, int limit) throws IOException {
        requireLimit(limit);
        Query q = query(phrase);
        if (q == null || limit == 0) {
            return List.of();
        }
        List<FixedBitSet> perLeaf = new ArrayList<>();
        List<SortedDocValues> values = new ArrayList<>();
        // Per segment, the set of id ordinals that match; ordinals sort like the ids, so the
        // smallest ids are the first set bits. One collector: the searcher has no executor.
        searcher.search(q, new org.apache.lucene.search.CollectorManager<SimpleCollector, Void>() {
            @Override
            public SimpleCollector newCollector() {
                return new SimpleCollector() {
                    private SortedDocValues ids;
                    private FixedBitSet ords;

                    @Override
                    protected void doSetNextReader(LeafReaderContext ctx) throws IOException {
                        ids = ctx.reader().getSortedDocValues(LISTING_ID);
                        ords = ids == null ? null : new FixedBitSet(Math.max(1, ids.getValueCount()));
                        if (ids != null) {
                            synchronized (perLeaf) {
                                perLeaf.add(ords);
                                values.add(ids);
                            }
                        }
                    }

                    @Override
                    public void collect(int doc) throws IOException {
                        if (ids != null && ids.advanceExact(doc)) {
                            ords.set(ids.ordValue());
                        }
                    }

                    @Override
                    public ScoreMode scoreMode() {
                        return ScoreMode.COMPLETE_NO_SCORES;
                    }
                };
            }

            @Override
            public Void reduce(java.util.Collection<SimpleCollector> collectors) {
                return null;
            }
        });
        TreeSet<String> smallest = new TreeSet<>();
        for (int i = 0; i < perLeaf.size(); i++) {
            FixedBitSet ords = perLeaf.get(i);
            SortedDocValues ids = values.get(i);
            int taken = 0;
            for (int o = ords.nextSetBit(0); o != org.apache.lucene.search.DocIdSetIterator.NO_MORE_DOCS && taken < limit;
                 o = o + 1 < ords.length() ? ords.nextSetBit(o + 1) : org.apache.lucene.search.DocIdSetIterator.NO_MORE_DOCS) {
                BytesRef b = ids.lookupOrd(o);
                smallest.add(b.utf8ToString());
                taken++;
                if (smallest.size() > limit) {
                    smallest.pollLast();
                }
            }
        }
        return List.copyOf(smallest);
    }

    /**
     * The listing with this id as it was indexed (id, category, source, locator and every field in
     * reading order), or empty when no listing has it. With duplicate ids, the first one indexed.
     */
    public java.util.Optional<Listing> listing(String id) throws IOException {
        Objects.requireNonNull(id, "id");
        TopFieldDocs top = searcher.search(new org.apache.lucene.search.TermQuery(new org.apache.lucene.index.Term(ID, id)), 1,
                new Sort(SortField.FIELD_DOC));
        if (top.scoreDocs.length == 0) {
            return java.util.Optional.empty();
        }
        Document doc = reader.storedFields().document(top.scoreDocs[0].doc);
        String[] meta = split(doc.get(META), 4);
        List<Field> fields = new ArrayList<>();
        for (String packed : doc.getValues(FIELD)) {
            String[] f = split(packed, 3);
            fields.add(new Field(FieldKind.fromLabel(f[0]), f[1], f[2]));
        }
        return java.util.Optional.of(new Listing(meta[0], meta[1], meta[2], meta[3], fields));
    }

    private long countDistinct(Query q) throws IOException {
        return searcher.count(q);
    }

    private Query query(String phrase) {
        Objects.requireNonNull(phrase, "phrase");
        if (phrase.isBlank()) {
            return null;
        }
        return queries.createPhraseQuery(TEXT, phrase);
    }

    private static void requireLimit(int limit) {
        if (limit < 0) {
            throw new IllegalArgumentException("limit must be >= 0, got " + limit);
        }
    }

    private static String[] split(String packed, int parts) {
        String[] out = new String[parts];
        int from = 0;
        for (int i = 0; i < parts - 1; i++) {
            int at = packed.indexOf(SEP, from);
            out[i] = packed.substring(from, at);
            from = at + 1;
        }
        out[parts - 1] = packed.substring(from);
        return out;
    }

    @Override
    public void close() throws IOException {
        reader.close();
    }

    /**
     * Builds a new index generation. {@link #add} (or {@link #accept}, usable as an ingest sink) is
     * thread-safe and cheap: listings are collected in batches of {@value #BATCH} and analysed and
     * added by the writer's own threads (one per processor), so even one large feed read by one
     * thread is indexed on every core; at most two batches per thread wait, which bounds memory.
     * Lucene buffers documents in RAM and flushes large segments. Nothing becomes visible until
     * {@link #commit()}; {@link #close()} without a commit throws the build away.
     */
    public static final class Writer implements Consumer<Listing>, Closeable {
        static final int BATCH = 256;
        private final Path dir;
        private final Path building;
        private final IndexWriter writer;
        private final AtomicLong added = new AtomicLong();
        private final java.util.concurrent.ExecutorService pool;
        private final java.util.concurrent.Semaphore slots;
        private final int threads;
        private final Object lock = new Object();
        private final java.util.concurrent.atomic.AtomicReference<Throwable> failure = new java.util.concurrent.atomic.AtomicReference<>();
        private List<Listing> batch = new ArrayList<>(BATCH);
        private boolean finished;

        private Writer(Path dir, Analyzer analyzer) throws IOException {
            Objects.requireNonNull(analyzer, "analyzer");
            this.dir = dir.toAbsolutePath().normalize();
            Files.createDirectories(this.dir);
            this.building = Files.createTempDirectory(this.dir, "building-");
            IndexWriterConfig cfg = new IndexWriterConfig(new FieldGaps(analyzer))
                    .setOpenMode(IndexWriterConfig.OpenMode.CREATE)
                    .setRAMBufferSizeMB(128)
                    .setUseCompoundFile(false)
                    .setCommitOnClose(false);
            this.writer = new IndexWriter(FSDirectory.open(building), cfg);
            this.threads = Runtime.getRuntime().availableProcessors();
            this.slots = new java.util.concurrent.Semaphore(threads * 2);
            java.util.concurrent.atomic.AtomicInteger no = new java.util.concurrent.atomic.AtomicInteger();
            this.pool = java.util.concurrent.Executors.newFixedThreadPool(threads, r -> {
                Thread t = new Thread(r, "sheaf-evidence-" + no.incrementAndGet());
                t.setDaemon(true);
                return t;
            });
        }

        /**
         * Queues one listing for the index (listings without fields are skipped).
         *
         * @throws IOException when an earlier batch could not be written (the build is then unusable)
         */
        public void add(Listing l) throws IOException {
            rethrow();
            if (l.fields().isEmpty()) {
                return;
            }
            List<Listing> full = null;
            synchronized (lock) {
                if (finished) {
                    throw new IllegalStateException("this evidence index build was already committed or closed");
                }
                batch.add(l);
                if (batch.size() >= BATCH) {
                    full = batch;
                    batch = new ArrayList<>(BATCH);
                }
            }
            if (full != null) {
                submit(full);
            }
        }

        private void submit(List<Listing> listings) {
            slots.acquireUninterruptibly();
            pool.execute(() -> {
                try {
                    if (failure.get() == null) {
                        for (Listing l : listings) {
                            writer.addDocument(document(l));
                            added.incrementAndGet();
                        }
                    }
                } catch (IOException | RuntimeException e) {
                    failure.compareAndSet(null, e);
                } finally {
                    slots.release();
                }
            });
        }

        private static Document document(Listing l) {
            Document d = new Document();
            for (Field f : l.fields()) {
                d.add(new org.apache.lucene.document.Field(TEXT, f.text(), TEXT_TYPE));
                d.add(new StoredField(FIELD, f.kind().label() + SEP + f.key() + SEP + f.text()));
            }
            d.add(new StoredField(META, l.id() + SEP + l.category() + SEP + l.source() + SEP + l.locator()));
            d.add(new StringField(ID, l.id(), org.apache.lucene.document.Field.Store.NO));
            d.add(new SortedDocValuesField(LISTING_ID, new BytesRef(l.id())));
            return d;
        }

        private void rethrow() throws IOException {
            Throwable t = failure.get();
            if (t instanceof IOException e) {
                throw new IOException("writing the evidence index in " + building + " failed: " + e.getMessage(), e);
            }
            if (t instanceof RuntimeException e) {
                throw e;
            }
        }

        /** Waits until every queued batch is written. */
        private void drain() {
            List<Listing> rest;
            synchronized (lock) {
                rest = batch;
                batch = new ArrayList<>();
            }
            if (!rest.isEmpty()) {
                submit(rest);
            }
            slots.acquireUninterruptibly(threads * 2);
            slots.release(threads * 2);
        }

        /** {@link #add} for use as an ingest sink; an I/O failure becomes an {@link UncheckedIOException}. */
        @Override
        public void accept(Listing l) {
            try {
                add(l);
            } catch (IOException e) {
                throw new UncheckedIOException("cannot add listing " + l.id() + " to the evidence index in " + building, e);
            }
        }

        /** Listings written so far (queued ones are counted once written). */
        public long added() {
            return added.get();
        }

        /** Finishes the build and makes it the current index; older generations are removed. */
        public void commit() throws IOException {
            drain();
            synchronized (lock) {
                if (finished) {
                    throw new IllegalStateException("this evidence index build was already committed or closed");
                }
                finished = true;
            }
            pool.shutdown();
            try {
                rethrow();
            } catch (IOException | RuntimeException e) {
                writer.rollback();
                deleteTree(building);
                throw e;
            }
            writer.commit();
            writer.close();
            int next = 1;
            try (Stream<Path> s = Files.list(dir)) {
                for (Path p : (Iterable<Path>) s::iterator) {
                    String n = p.getFileName().toString();
                    if (n.startsWith("index-")) {
                        try {
                            next = Math.max(next, Integer.parseInt(n.substring(6)) + 1);
                        } catch (NumberFormatException ignored) {
                            // not ours
                        }
                    }
                }
            }
            String name = "index-" + next;
            Files.move(building, dir.resolve(name));
            AtomicFiles.writeString(dir.resolve(CURRENT), name + "\n");
            try (DirectoryStream<Path> s = Files.newDirectoryStream(dir)) {
                for (Path p : s) {
                    String n = p.getFileName().toString();
                    if ((n.startsWith("index-") && !n.equals(name)) || n.startsWith("building-")) {
                        deleteTree(p);
                    }
                }
            }
        }

        /** Without a prior {@link #commit()}, discards the build; the current index is untouched. */
        @Override
        public void close() throws IOException {
            synchronized (lock) {
                if (finished) {
                    return;
                }
                finished = true;
                batch = new ArrayList<>();
            }
            failure.compareAndSet(null, new IllegalStateException("build closed"));
            slots.acquireUninterruptibly(threads * 2);
            slots.release(threads * 2);
            pool.shutdown();
            try {
                writer.rollback();
            } finally {
                deleteTree(building);
            }
        }
    }

    /**
     * The caller's analyzer with a position gap between field values (no phrase across fields) and
     * no offset gap (so a value's offsets start where the previous value's text ended).
     */
    private static final class FieldGaps extends org.apache.lucene.analysis.AnalyzerWrapper {
        private final Analyzer wrapped;

        FieldGaps(Analyzer wrapped) {
            super(wrapped.getReuseStrategy());
            this.wrapped = wrapped;
        }

        @Override
        protected Analyzer getWrappedAnalyzer(String fieldName) {
            return wrapped;
        }

        @Override
        public int getPositionIncrementGap(String fieldName) {
            return FIELD_GAP;
        }

        @Override
        public int getOffsetGap(String fieldName) {
            return 0;
        }
    }

    private static void deleteTree(Path p) throws IOException {
        if (!Files.exists(p)) {
            return;
        }
        try (Stream<Path> s = Files.walk(p)) {
            for (Path x : (Iterable<Path>) s.sorted(Comparator.reverseOrder())::iterator) {
                Files.deleteIfExists(x);
            }
        }
    }
}
