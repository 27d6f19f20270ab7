package dev.sheaf.miner.label;

import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.Segmenter;
import dev.sheaf.miner.text.TermDictionary;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import it.unimi.dsi.fastutil.ints.Int2LongOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import it.unimi.dsi.fastutil.longs.Long2LongOpenHashMap;
import it.unimi.dsi.fastutil.longs.LongOpenHashSet;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;

/**
 * The commonest unigrams and bigrams of the listings that got no attribute at all — what the
 * vocabulary misses. Counted with the miner's own analysis and segments (so a bigram never crosses
 * a removed stop word, a negation, a sentence or a field), leaving out tokens that start with a
 * digit (sizes and model numbers). Thread-safe: each thread counts on its own, {@link #top} merges.
 *
 * <p>Written as {@value #FILE_NAME} with the header {@code n,term,listings,occurrences}; the
 * coverage stage reads it from there.
 */
final class GapTerms {
    static final String FILE_NAME = "gap-terms.csv";
    static final List<String> HEADER = List.of("n", "term", "listings", "occurrences");

    /** One counted n-gram. */
    record Term(int n, String term, long listings, long occurrences) {
    }

    private final Analysis analysis;
    private final List<Counter> counters = new CopyOnWriteArrayList<>();
    private final ThreadLocal<Counter> local;

    GapTerms(Analysis analysis) {
        this.analysis = analysis;
        this.local = ThreadLocal.withInitial(() -> {
            Counter c = new Counter(analysis.newSegmenter());
            counters.add(c);
            return c;
        });
    }

    void add(Listing l) {
        local.get().add(l);
    }

    /** The {@code limit} commonest n-grams by listings, then occurrences, then n-gram. */
    List<Term> top(int limit) {
        Int2LongOpenHashMap uni = new Int2LongOpenHashMap();
        Int2LongOpenHashMap uniDf = new Int2LongOpenHashMap();
        Long2LongOpenHashMap bi = new Long2LongOpenHashMap();
        Long2LongOpenHashMap biDf = new Long2LongOpenHashMap();
        for (Counter c : counters) {
            c.uni.int2LongEntrySet().forEach(e -> uni.addTo(e.getIntKey(), e.getLongValue()));
            c.uniDf.int2LongEntrySet().forEach(e -> uniDf.addTo(e.getIntKey(), e.getLongValue()));
            c.bi.long2LongEntrySet().forEach(e -> bi.addTo(e.getLongKey(), e.getLongValue()));
            c.biDf.long2LongEntrySet().forEach(e -> biDf.addTo(e.getLongKey(), e.getLongValue()));
        }
        TermDictionary d = analysis.terms();
        List<Term> all = new ArrayList<>(uni.size() + bi.size());
        uniDf.int2LongEntrySet().forEach(e -> all.add(new Term(1, d.term(e.getIntKey()), e.getLongValue(), uni.get(e.getIntKey()))));
        biDf.long2LongEntrySet().forEach(e -> all.add(new Term(2, d.term((int) (e.getLongKey() >>> 32)) + " "
                + d.term((int) e.getLongKey()), e.getLongValue(), bi.get(e.getLongKey()))));
        all.sort(Comparator.comparingLong(Term::listings).reversed().thenComparing(Comparator.comparingLong(Term::occurrences).reversed())
                .thenComparingInt(Term::n).thenComparing(Term::term));
        return all.size() > limit ? List.copyOf(all.subList(0, limit)) : List.copyOf(all);
    }

    static void write(Path file, List<Term> terms) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row(HEADER);
            for (Term t : terms) {
                csv.row(t.n(), t.term(), t.listings(), t.occurrences());
            }
            csv.flush();
        });
    }

    private final class Counter {
        final Segmenter segmenter;
        final Int2LongOpenHashMap uni = new Int2LongOpenHashMap();
        final Int2LongOpenHashMap uniDf = new Int2LongOpenHashMap();
        final Long2LongOpenHashMap bi = new Long2LongOpenHashMap();
        final Long2LongOpenHashMap biDf = new Long2LongOpenHashMap();
        final IntOpenHashSet seenUni = new IntOpenHashSet();
        final LongOpenHashSet seenBi = new LongOpenHashSet();

        Counter(Segmenter segmenter) {
            this.segmenter = segmenter;
        }

        void add(Listing l) {
            seenUni.clear();
            seenBi.clear();
            segmenter.analyze(l, (field, part, ids, starts, ends, n) -> {
                String text = part == dev.sheaf.miner.text.SegmentPart.SPEC_KEY ? l.fields().get(field).key()
                        : l.fields().get(field).text();
                int prev = -1;
                for (int i = 0; i < n; i++) {
                    char first = text.charAt(starts[i]);
                    if (first >= '0' && first <= '9') {
                        prev = -1;
                        continue;
                    }
                    int id = ids[i];
                    uni.addTo(id, 1);
                    if (seenUni.add(id)) {
                        uniDf.addTo(id, 1);
                    }
                    if (prev >= 0) {
                        long key = ((long) prev << 32) | (id & 0xffffffffL);
                        bi.addTo(key, 1);
                        if (seenBi.add(key)) {
                            biDf.addTo(key, 1);
                        }
                    }
                    prev = id;
                }
            });
        }
    }
}
