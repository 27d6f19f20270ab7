package dev.sheaf.miner.label;

import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.longs.Long2IntOpenHashMap;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A token trie over term ids: every compiled label is a path from the root, and a node where a
 * label ends carries that label's entries. Matching walks from one token as far as the trie goes
 * and returns the deepest node with entries: the longest label starting there.
 *
 * <p>Why a trie and not Aho–Corasick: the labeler wants leftmost-longest, non-overlapping matches.
 * Starting at token i, the walk stops at the first token that leaves the trie, so the cost per start
 * is bounded by the longest label (a handful of tokens), and after a match the scan resumes at its
 * end. Failure links would only pay off for overlapping matches, which are not wanted
 * (docs/decisions/100-label-matching.md).
 *
 * <p>Layout: the root's children in an array indexed by term id (the first step happens at every
 * token, so it is one array read); deeper edges in one open-addressing map keyed by
 * {@code parent << 32 | termId}. Immutable after {@link Builder#build()}, so one trie serves every
 * thread.
 */
final class LabelTrie {
    private final int[] rootChild;
    private final Long2IntOpenHashMap edges;
    private final int[][] entries;
    private final int maxDepth;

    private LabelTrie(int[] rootChild, Long2IntOpenHashMap edges, int[][] entries, int maxDepth) {
        this.rootChild = rootChild;
        this.edges = edges;
        this.entries = entries;
        this.maxDepth = maxDepth;
    }

    /**
     * The longest label starting at {@code ids[from]} and ending at or before {@code to}.
     *
     * @return {@code (end << 32) | node} with end exclusive, or -1 when no label starts here
     */
    long longest(int[] ids, int from, int to) {
        int first = ids[from];
        if (first < 0 || first >= rootChild.length) {
            return -1;
        }
        int node = rootChild[first];
        if (node <= 0) {
            return -1;
        }
        long best = entries[node] != null ? ((long) (from + 1) << 32) | node : -1;
        int limit = Math.min(to, from + maxDepth);
        for (int j = from + 1; j < limit; j++) {
            int next = edges.get(((long) node << 32) | (ids[j] & 0xffffffffL));
            if (next <= 0) {
                break;
            }
            node = next;
            if (entries[node] != null) {
                best = ((long) (j + 1) << 32) | node;
            }
        }
        return best;
    }

    /** The entries of a node that ends a label. */
    int[] entries(int node) {
        return entries[node];
    }

    int nodes() {
        return entries.length;
    }

    static Builder builder() {
        return new Builder();
    }

    /** Collects label paths; not thread-safe. */
    static final class Builder {
        private final Long2IntOpenHashMap edges = new Long2IntOpenHashMap();
        private final List<IntArrayList> entries = new ArrayList<>();
        private int maxId = -1;
        private int maxDepth;

        private Builder() {
            edges.defaultReturnValue(0);
            entries.add(null); // node 0 is the root, which never ends a label
        }

        /** Adds a path; {@code entry} is recorded once at its end node. */
        void add(int[] ids, int entry) {
            if (ids.length == 0) {
                throw new IllegalArgumentException("a label path needs at least one token");
            }
            int node = 0;
            for (int id : ids) {
                if (id < 0) {
                    throw new IllegalArgumentException("term ids are >= 0, got " + id);
                }
                maxId = Math.max(maxId, id);
                long key = ((long) node << 32) | (id & 0xffffffffL);
                int next = edges.get(key);
                if (next == 0) {
                    next = entries.size();
                    entries.add(null);
                    edges.put(key, next);
                }
                node = next;
            }
            maxDepth = Math.max(maxDepth, ids.length);
            IntArrayList e = entries.get(node);
            if (e == null) {
                e = new IntArrayList(1);
                entries.set(node, e);
            }
            if (!e.contains(entry)) {
                e.add(entry);
            }
        }

        LabelTrie build() {
            int[] root = new int[maxId + 1];
            Long2IntOpenHashMap deep = new Long2IntOpenHashMap(edges.size());
            deep.defaultReturnValue(0);
            for (Long2IntOpenHashMap.Entry e : edges.long2IntEntrySet()) {
                long key = e.getLongKey();
                int parent = (int) (key >>> 32);
                if (parent == 0) {
                    root[(int) key] = e.getIntValue();
                } else {
                    deep.put(key, e.getIntValue());
                }
            }
            deep.trim();
            int[][] out = new int[entries.size()][];
            for (int i = 0; i < out.length; i++) {
                IntArrayList e = entries.get(i);
                if (e != null) {
                    int[] a = e.toIntArray();
                    Arrays.sort(a);
                    out[i] = a;
                }
            }
            return new LabelTrie(root, deep, out, Math.max(1, maxDepth));
        }
    }
}
