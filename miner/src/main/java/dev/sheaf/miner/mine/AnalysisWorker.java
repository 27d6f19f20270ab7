package dev.sheaf.miner.mine;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.Segmenter;
import dev.sheaf.miner.text.SegmentPart;
import dev.sheaf.miner.text.SegmentSink;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.longs.LongArrayList;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The first pass, on one worker thread: analyses each listing once, appends its segments to the
 * worker's {@link TokenStore}, counts unigram tf and df in plain arrays indexed by term id, tallies
 * spec rows, and spills the text for evidence. Everything here is owned by one thread.
 */
final class AnalysisWorker implements SegmentSink {
    final int index;
    final TokenStore store;
    final TextSpill spill;
    final SpecTally specs = new SpecTally();
    /** Per local listing: category id. */
    final IntArrayList categories = new IntArrayList();
    /** Per local listing: source id << 32 | position within the source. */
    final LongArrayList order = new LongArrayList();

    int[] tf = new int[1 << 12];
    int[] df = new int[1 << 12];
    private int[] lastListing = new int[1 << 12];
    private int stamp;
    /** The current listing's segment offsets, for the text spill. */
    private int[] offsets = new int[1024];
    private int offsetsLen;

    long fields;
    long segments;
    long tokens;

    /**
     * Section headings (decision 051): a heading field that is one segment of at most
     * {@link HarvestOptions#MAX_NGRAM} tokens is a whole heading; every n-gram inside one (the whole
     * heading too) is counted here by {@link #headingKey}, once per occurrence.
     */
    final Object2IntOpenHashMap<String> headings = new Object2IntOpenHashMap<>();
    private List<Field> currentFields;
    private int headingField = -1;
    private int headingSegments;
    private final int[] headingTokens = new int[HarvestOptions.MAX_NGRAM];
    private int headingLength;

    private final Segmenter segmenter;
    private final MineJob job;
    private final Map<String, Integer> categoryCache = new HashMap<>();

    AnalysisWorker(int index, MineJob job, Segmenter segmenter, Path tempDir, long storeBudget) {
        this.index = index;
        this.job = job;
        this.segmenter = segmenter;
        this.store = new TokenStore(storeBudget, tempDir.resolve("tokens-" + index + ".bin"));
        this.spill = new TextSpill(tempDir.resolve("text-" + index + ".bin"));
    }

    void process(Listing l, long orderKey) {
        int local = categories.size();
        stamp = local + 1;
        Integer cat = categoryCache.get(l.category());
        if (cat == null) {
            cat = job.categoryId(l.category());
            categoryCache.put(l.category(), cat);
        }
        categories.add(cat.intValue());
        order.add(orderKey);
        offsetsLen = 0;
        currentFields = l.fields();
        headingField = -1;
        segmenter.analyze(l, this);
        commitHeading();
        spill.write(l, (int) (orderKey >>> 32), offsets, offsetsLen);
        for (Field f : l.fields()) {
            if (f.kind() == FieldKind.SPEC) {
                specs.add(f.key(), f.text());
            }
        }
        fields += l.fields().size();
        store.endListing();
    }

    @Override
    public void segment(int field, SegmentPart part, int[] ids, int[] starts, int[] ends, int length) {
        if (currentFields.get(field).kind() == FieldKind.HEADING) {
            if (field != headingField) {
                commitHeading();
                headingField = field;
                headingSegments = 0;
                headingLength = length <= HarvestOptions.MAX_NGRAM ? length : 0;
                System.arraycopy(ids, 0, headingTokens, 0, headingLength);
            }
            headingSegments++;
        }
        if (offsetsLen + 3 + 2 * length > offsets.length) {
            offsets = Arrays.copyOf(offsets, Math.max(offsets.length * 2, offsetsLen + 3 + 2 * length));
        }
        int[] o = offsets;
        int k = offsetsLen;
        o[k++] = field;
        o[k++] = part.ordinal();
        o[k++] = length;
        for (int i = 0; i < length; i++) {
            o[k++] = starts[i];
            o[k++] = ends[i];
        }
        offsetsLen = k;
        int[] t = tf;
        for (int i = 0; i < length; i++) {
            int id = ids[i];
            if (id >= t.length) {
                grow(id);
                t = tf;
            }
            t[id]++;
            if (lastListing[id] != stamp) {
                lastListing[id] = stamp;
                df[id]++;
            }
            store.token(id);
        }
        store.boundary();
        segments++;
        tokens += length;
    }

    private void commitHeading() {
        if (headingField >= 0 && headingSegments == 1) {
            for (int from = 0; from < headingLength; from++) {
                for (int len = 1; from + len <= headingLength; len++) {
                    headings.addTo(headingKey(headingTokens, from, len), 1);
                }
            }
        }
        headingField = -1;
    }

    /** The token ids t[from, from+len) as a map key: two chars per id. */
    static String headingKey(int[] t, int from, int len) {
        char[] k = new char[2 * len];
        for (int i = 0; i < len; i++) {
            int id = t[from + i];
            k[2 * i] = (char) (id >>> 16);
            k[2 * i + 1] = (char) id;
        }
        return new String(k);
    }

    private void grow(int id) {
        int n = Math.max(tf.length * 2, id + 1);
        tf = Arrays.copyOf(tf, n);
        df = Arrays.copyOf(df, n);
        lastListing = Arrays.copyOf(lastListing, n);
    }

    void seal() {
        store.seal();
    }

    void close() {
        store.close();
        spill.close();
    }
}
