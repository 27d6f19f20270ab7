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
 * token, so it is one array read); below the root, each node's children as one sorted run of term
 * ids in a flat array (with the child nodes beside them), searched linearly when short and by
 * halving when long: the children of a node sit together in memory, where a hash map would scatter
 * the probes of one walk. Immutable after {@link Builder#build()}, so one trie serves every thread.
 */
final class LabelTrie {
    /**
     * The pseudo-token between two clauses of one text ("adj. hd", "90% down, 10% feathers"): a label
     * holding a break character matches across a break in the text, and nothing else does.
     */
    static final int BREAK = -1;

    private final int[] rootChild;
    /** Node k's children are edge slots {@code childFrom[k]} to {@code childFrom[k + 1]} (exclusive). */
    private final int[] childFrom;
    /**
     * Per edge slot, the term id on the edge plus one (so {@link #BREAK} is 0 and sorts first;
     * ascending within a node) and the node it leads to.
     */
    private final int[] edgeToken;
    private final int[] edgeNode;
    private final int[][] entries;
    private final int maxDepth;

    private LabelTrie(int[] rootChild, int[] childFrom, int[] edgeToken, int[] edgeNode, int[][] entries, int maxDepth) {
        this.rootChild = rootChild;
        this.childFrom = childFrom;
        this.edgeToken = edgeToken;
        this.edgeNode = edgeNode;
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
            int next = child(node, ids[j]);
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

    /** The child of a (non-root) node along term id {@code id}, or 0 when there is none. */
    private int child(int node, int termId) {
        int id = termId + 1;
        int lo = childFrom[node];
        int hi = childFrom[node + 1];
        if (hi - lo <= 8) {
            for (int k = lo; k < hi; k++) {
                int t = edgeToken[k];
                if (t >= id) {
                    return t == id ? edgeNode[k] : 0;
                }
            }
            return 0;
        }
        int k = Arrays.binarySearch(edgeToken, lo, hi, id);
        return k >= 0 ? edgeNode[k] : 0;
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

        /**
         * Adds a path; {@code entry} is recorded once at its end node. Ids are term ids (>= 0) or,
         * inside the path only, {@link #BREAK}.
         */
        void add(int[] ids, int entry) {
            if (ids.length == 0) {
                throw new IllegalArgumentException("a label path needs at least one token");
            }
            int node = 0;
            for (int k = 0; k < ids.length; k++) {
                int id = ids[k];
                if (id < 0 && (id != BREAK || k == 0 || k == ids.length - 1)) {
                    throw new IllegalArgumentException("term ids are >= 0 (BREAK only inside a path), got " + id + " at " + k);
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
            int nodes = entries.size();
            // the edges below the root sorted by (parent, term id + 1): each node's children become one run
            long[] deep = new long[edges.size()];
            int nd = 0;
            for (Long2IntOpenHashMap.Entry e : edges.long2IntEntrySet()) {
                long key = e.getLongKey();
                int parent = (int) (key >>> 32);
                if (parent == 0) {
                    root[(int) key] = e.getIntValue();
                } else {
                    deep[nd++] = ((long) parent << 32) | ((int) key + 1);
                }
            }
            deep = Arrays.copyOf(deep, nd);
            Arrays.sort(deep);
            int[] childFrom = new int[nodes + 1];
            int[] edgeToken = new int[nd];
            int[] edgeNode = new int[nd];
            for (int k = 0; k < nd; k++) {
                childFrom[(int) (deep[k] >>> 32) + 1]++;
                edgeToken[k] = (int) deep[k];
                edgeNode[k] = edges.get((deep[k] & 0xffffffff00000000L) | (((int) deep[k] - 1) & 0xffffffffL));
            }
            for (int k = 0; k < nodes; k++) {
                childFrom[k + 1] += childFrom[k];
            }
            int[][] out = new int[entries.size()][];
            for (int i = 0; i < out.length; i++) {
                IntArrayList e = entries.get(i);
                if (e != null) {
                    int[] a = e.toIntArray();
                    Arrays.sort(a);
                    out[i] = a;
                }
            }
            return new LabelTrie(root, childFrom, edgeToken, edgeNode, out, Math.max(1, maxDepth));
        }
    }
}
