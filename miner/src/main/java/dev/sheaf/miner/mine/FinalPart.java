package dev.sheaf.miner.mine;

import it.unimi.dsi.fastutil.longs.Long2IntOpenHashMap;

/**
 * One worker's share of the final pass: for every final candidate, the listings per category that
 * contain it, and the positions of its first occurrence in the first {@code k} listings in input
 * order (smallest order keys), kept sorted, never all occurrences.
 */
final class FinalPart {
    private static final long DENSE_LIMIT = 32L << 20;

    final int cands;
    final int cats;
    final int k;
    private final int[] dense;
    private final Long2IntOpenHashMap sparse;
    private final long[] evKey;
    private final long[] evRef;
    private final int[] evN;

    FinalPart(int cands, int cats, int k) {
        this.cands = cands;
        this.cats = Math.max(1, cats);
        this.k = k;
        if ((long) cands * this.cats <= DENSE_LIMIT) {
            dense = new int[cands * this.cats];
            sparse = null;
        } else {
            dense = null;
            sparse = new Long2IntOpenHashMap();
        }
        evKey = new long[cands * k];
        evRef = new long[cands * k];
        evN = new int[cands];
    }

    /** worker (8 bits) | listing within the worker (32 bits) | symbol position within the listing (24 bits). */
    static long ref(int worker, int listing, int pos) {
        if (pos >= 1 << 24 || worker >= 1 << 8) {
            throw new IllegalStateException("a listing with more than 16M tokens, or more than 255 threads");
        }
        return ((long) worker << 56) | ((listing & 0xFFFFFFFFL) << 24) | pos;
    }

    static int refWorker(long ref) {
        return (int) (ref >>> 56);
    }

    static int refListing(long ref) {
        return (int) (ref >>> 24);
    }

    static int refPos(long ref) {
        return (int) (ref & 0xFFFFFF);
    }

    void categoryHit(int cand, int cat) {
        if (dense != null) {
            dense[cand * cats + cat]++;
        } else {
            sparse.addTo((long) cand * cats + cat, 1);
        }
    }

    int categoryDf(int cand, int cat) {
        return dense != null ? dense[cand * cats + cat] : sparse.get((long) cand * cats + cat);
    }

    void offerEvidence(int cand, long key, long ref) {
        if (k == 0) {
            return;
        }
        int base = cand * k;
        int n = evN[cand];
        if (n == k && key >= evKey[base + k - 1]) {
            return;
        }
        int i = n == k ? k - 1 : n;
        while (i > 0 && evKey[base + i - 1] > key) {
            evKey[base + i] = evKey[base + i - 1];
            evRef[base + i] = evRef[base + i - 1];
            i--;
        }
        evKey[base + i] = key;
        evRef[base + i] = ref;
        if (n < k) {
            evN[cand] = n + 1;
        }
    }

    int evidenceCount(int cand) {
        return evN[cand];
    }

    long evidenceRef(int cand, int slot) {
        return evRef[cand * k + slot];
    }

    void mergeFrom(FinalPart o) {
        if (dense != null) {
            for (int i = 0; i < dense.length; i++) {
                dense[i] += o.dense[i];
            }
        } else {
            o.sparse.long2IntEntrySet().forEach(e -> sparse.addTo(e.getLongKey(), e.getIntValue()));
        }
        for (int c = 0; c < cands; c++) {
            int base = c * k;
            for (int s = 0; s < o.evN[c]; s++) {
                offerEvidence(c, o.evKey[base + s], o.evRef[base + s]);
            }
        }
    }
}
