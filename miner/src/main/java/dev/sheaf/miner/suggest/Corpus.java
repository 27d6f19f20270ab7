package dev.sheaf.miner.suggest;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.miner.text.Segmenter;
import dev.sheaf.miner.text.TermDictionary;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import it.unimi.dsi.fastutil.longs.Long2IntMap;
import it.unimi.dsi.fastutil.longs.Long2IntOpenHashMap;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentLinkedQueue;

/**
 * One pass over the listings for the kinds that need the text itself: which candidates each
 * listing holds (listing-level co-occurrence), the tokens around each occurrence of a frequent
 * candidate inside its field text, stop words left out (context vectors), and abbreviations spelled out in the text.
 * Candidates are found in the segments the miner counts in, with the harvest's own analysis, so an
 * occurrence here is an occurrence there. Listings may be fed from several threads; each thread
 * counts on its own and {@link #finish()} adds the counts up (the result does not depend on timing).
 */
final class Corpus {
    /** One abbreviation definition: how often, and the first line that shows it (first in listing id order). */
    static final class Definition {
        final String shortForm;
        final String longForm;
        int listings;
        EvidenceLine first;
        String firstId;

        Definition(String shortForm, String longForm) {
            this.shortForm = shortForm;
            this.longForm = longForm;
        }
    }

    /**
     * The counts.
     *
     * @param listings    listings read
     * @param docs        per listing, the distinct candidate numbers it holds, sorted (listings in id order)
     * @param contexts    (candidate &lt;&lt; 32 | feature) → count; a feature is a term id × 2, +1 for the right side
     * @param definitions abbreviation definitions by "short\u0001long" in the harvest's form
     */
    record Result(long listings, List<int[]> docs, Long2IntOpenHashMap contexts, Map<String, Definition> definitions) {
    }

    private final Catalog catalog;
    private final int window;
    private final int contextMin;
    private final Object2IntOpenHashMap<String> tokenIds = new Object2IntOpenHashMap<>();
    private final Long2IntOpenHashMap trie = new Long2IntOpenHashMap();
    private final int[] nodeCandidate;
    private final ConcurrentLinkedQueue<Acc> accs = new ConcurrentLinkedQueue<>();
    private final ThreadLocal<Acc> local = ThreadLocal.withInitial(this::newAcc);

    Corpus(Catalog catalog, SuggestOptions options) {
        this.catalog = catalog;
        this.window = options.contextWindow();
        this.contextMin = options.contextMinFrequency();
        tokenIds.defaultReturnValue(-1);
        trie.defaultReturnValue(-1);
        IntArrayList cand = new IntArrayList();
        cand.add(-1); // root
        for (int i = 0; i < catalog.size(); i++) {
            int node = 0;
            for (String t : catalog.tokens[i]) {
                int tok = tokenIds.getInt(t);
                if (tok < 0) {
                    tok = tokenIds.size();
                    tokenIds.put(t, tok);
                }
                long key = ((long) node << 32) | tok;
                int next = trie.get(key);
                if (next < 0) {
                    next = cand.size();
                    cand.add(-1);
                    trie.put(key, next);
                }
                node = next;
            }
            if (cand.getInt(node) < 0) {
                cand.set(node, i);
            }
        }
        nodeCandidate = cand.toIntArray();
    }

    private Acc newAcc() {
        Acc a = new Acc(catalog.analysis.newSegmenter(), catalog.analysis.terms());
        accs.add(a);
        return a;
    }

    void accept(Listing l) {
        local.get().add(l);
    }

    Result finish() {
        List<Acc> all = new ArrayList<>(accs);
        long listings = 0;
        List<Map.Entry<String, int[]>> docs = new ArrayList<>();
        Long2IntOpenHashMap ctx = new Long2IntOpenHashMap();
        Map<String, Definition> defs = new HashMap<>();
        for (Acc a : all) {
            listings += a.listings;
            for (int k = 0; k < a.docIds.size(); k++) {
                docs.add(Map.entry(a.docIds.get(k), a.docs.get(k)));
            }
            for (Long2IntMap.Entry e : a.contexts.long2IntEntrySet()) {
                ctx.addTo(e.getLongKey(), e.getIntValue());
            }
            for (Definition d : a.definitions.values()) {
                String key = d.shortForm + "\u0001" + d.longForm;
                Definition m = defs.computeIfAbsent(key, k -> new Definition(d.shortForm, d.longForm));
                m.listings += d.listings;
                if (m.firstId == null || d.firstId.compareTo(m.firstId) < 0) {
                    m.firstId = d.firstId;
                    m.first = d.first;
                }
            }
        }
        docs.sort(Map.Entry.comparingByKey());
        List<int[]> ordered = new ArrayList<>(docs.size());
        for (Map.Entry<String, int[]> e : docs) {
            ordered.add(e.getValue());
        }
        return new Result(listings, ordered, ctx, defs);
    }

    /** One thread's counts. */
    private final class Acc {
        final Segmenter segmenter;
        final TermDictionary dict;
        /** term id → candidate token number, -1 when no candidate has that token, -2 when not looked up yet. */
        int[] tokenOf = new int[1024];
        long listings;
        final List<String> docIds = new ArrayList<>();
        final List<int[]> docs = new ArrayList<>();
        final Long2IntOpenHashMap contexts = new Long2IntOpenHashMap();
        final Map<String, Definition> definitions = new HashMap<>();
        final IntOpenHashSet inListing = new IntOpenHashSet();
        final java.util.Set<String> defsInListing = new java.util.HashSet<>();
        int[] toks = new int[256];

        Acc(Segmenter segmenter, TermDictionary dict) {
            this.segmenter = segmenter;
            this.dict = dict;
            Arrays.fill(tokenOf, -2);
        }

        /** The tokens of the current field text (all its segments, in order) and where each segment starts. */
        final IntArrayList fieldIds = new IntArrayList();
        final IntArrayList segStarts = new IntArrayList();
        int currentField = -1;

        void add(Listing l) {
            listings++;
            inListing.clear();
            currentField = -1;
            segmenter.analyze(l, (field, part, ids, starts, ends, length) -> {
                int key = field * 3 + part.ordinal();
                if (key != currentField) {
                    flushField();
                    currentField = key;
                }
                segStarts.add(fieldIds.size());
                for (int i = 0; i < length; i++) {
                    fieldIds.add(ids[i]);
                }
            });
            flushField();
            int[] d = inListing.toIntArray();
            Arrays.sort(d);
            docIds.add(l.id() + "\u0000" + l.source() + "\u0000" + l.locator());
            docs.add(d);
            defsInListing.clear();
            for (Field f : l.fields()) {
                String text = f.text();
                Abbreviations.scan(text, (sf, lf, start, end) -> define(l, f, text, sf, lf, start, end));
            }
        }

        private void define(Listing l, Field f, String text, String sf, String lf, int start, int end) {
            String s = catalog.formOf(sf);
            String lg = catalog.formOf(lf);
            if (s == null || lg == null || s.equals(lg)) {
                return;
            }
            String key = s + "\u0001" + lg;
            Definition d = definitions.computeIfAbsent(key, k -> new Definition(s, lg));
            if (defsInListing.add(key)) {
                d.listings++;
            }
            if (d.firstId == null || l.id().compareTo(d.firstId) < 0) {
                d.firstId = l.id();
                d.first = EvidenceLine.cut(l.id(), l.source(), l.locator(), f.kind().label(),
                        f.kind() == FieldKind.SPEC ? f.key() : "", text, start, end, 40);
            }
        }

        private int token(int id) {
            if (id >= tokenOf.length) {
                int old = tokenOf.length;
                tokenOf = Arrays.copyOf(tokenOf, Math.max(id + 1, old * 2));
                Arrays.fill(tokenOf, old, tokenOf.length, -2);
            }
            int t = tokenOf[id];
            if (t == -2) {
                t = tokenIds.getInt(dict.term(id));
                tokenOf[id] = t;
            }
            return t;
        }

        /**
         * Finds candidates inside each segment of the buffered field text (an n-gram never crosses a
         * segment) and counts, for frequent ones, the tokens up to {@code window} positions away on
         * either side anywhere in the same field text: a removed stop word or a comma cuts an n-gram,
         * but the words across it are still the term's context.
         */
        private void flushField() {
            int total = fieldIds.size();
            if (total == 0) {
                segStarts.clear();
                return;
            }
            int[] ids = fieldIds.elements();
            if (toks.length < total) {
                toks = new int[total * 2];
            }
            for (int i = 0; i < total; i++) {
                toks[i] = token(ids[i]);
            }
            int maxN = catalog.maxN;
            for (int s = 0; s < segStarts.size(); s++) {
                int from = segStarts.getInt(s);
                int to = s + 1 < segStarts.size() ? segStarts.getInt(s + 1) : total;
                for (int i = from; i < to; i++) {
                    int node = 0;
                    for (int j = i; j < to && j < i + maxN; j++) {
                        int tok = toks[j];
                        if (tok < 0) {
                            break;
                        }
                        node = trie.get(((long) node << 32) | tok);
                        if (node < 0) {
                            break;
                        }
                        int c = nodeCandidate[node];
                        if (c >= 0) {
                            inListing.add(c);
                            if (catalog.frequency[c] >= contextMin) {
                                long base = (long) c << 32;
                                for (int k = Math.max(0, i - window); k < i; k++) {
                                    contexts.addTo(base | (ids[k] * 2L), 1);
                                }
                                for (int k = j + 1; k < total && k <= j + window; k++) {
                                    contexts.addTo(base | (ids[k] * 2L + 1), 1);
                                }
                            }
                        }
                    }
                }
            }
            fieldIds.clear();
            segStarts.clear();
        }
    }
}
