package dev.sheaf.miner.mine;

import it.unimi.dsi.fastutil.HashCommon;
import it.unimi.dsi.fastutil.longs.LongArrays;
import java.io.BufferedOutputStream;
import java.io.DataOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * One worker's counts of n-gram codes for one counting pass: term frequency and document frequency
 * in one open-addressing probe (keys, tf, df and the last listing that touched the slot, in
 * parallel primitive arrays — fastutil's maps hold one value per key, this needs three).
 *
 * <p>When the table holds {@code maxEntries} codes at a listing boundary it is sorted and written
 * to a run file and emptied; runs are merged at the end. Spilling only at listing boundaries keeps
 * df exact: a listing's codes are all in one run, so per-run listing counts add up.
 */
final class NgramCounter {
    private static final long EMPTY = -1L;
    private static final float LOAD = 0.6f;

    private final int maxEntries;
    private final Path tempDir;
    private final String runPrefix;
    private final List<Path> runs = new ArrayList<>();

    long[] keys;
    int[] tf;
    int[] df;
    private int[] last;
    private int mask;
    int size;
    private int growAt;

    NgramCounter(int maxEntries, Path tempDir, String runPrefix) {
        this.maxEntries = Math.max(1024, maxEntries);
        this.tempDir = tempDir;
        this.runPrefix = runPrefix;
        allocate(1 << 16);
    }

    private void allocate(int capacity) {
        keys = new long[capacity];
        Arrays.fill(keys, EMPTY);
        tf = new int[capacity];
        df = new int[capacity];
        last = new int[capacity];
        mask = capacity - 1;
        growAt = (int) (capacity * LOAD);
        size = 0;
    }

    /** Counts one occurrence of {@code code} in the listing with the given stamp (stamps grow, start at 1). */
    void add(long code, int listingStamp) {
        int i = (int) HashCommon.mix(code) & mask;
        long[] k = keys;
        while (true) {
            long c = k[i];
            if (c == code) {
                tf[i]++;
                if (last[i] != listingStamp) {
                    last[i] = listingStamp;
                    df[i]++;
                }
                return;
            }
            if (c == EMPTY) {
                k[i] = code;
                tf[i] = 1;
                df[i] = 1;
                last[i] = listingStamp;
                if (++size >= growAt) {
                    grow();
                }
                return;
            }
            i = (i + 1) & mask;
        }
    }

    /** At a listing boundary: spill to a run file when the table is at its budget. */
    void listingDone() {
        if (size >= maxEntries) {
            spill();
        }
    }

    boolean hasRuns() {
        return !runs.isEmpty();
    }

    List<Path> runs() {
        return runs;
    }

    /** Looks a code up; the slot index or -1. */
    int find(long code) {
        int i = (int) HashCommon.mix(code) & mask;
        while (true) {
            long c = keys[i];
            if (c == code) {
                return i;
            }
            if (c == EMPTY) {
                return -1;
            }
            i = (i + 1) & mask;
        }
    }

    /** Marks a slot as merged into another table (the df stamp is no longer needed once counting is over). */
    void consume(int slot) {
        last[slot] = Integer.MIN_VALUE;
    }

    boolean consumed(int slot) {
        return last[slot] == Integer.MIN_VALUE;
    }

    boolean occupied(int slot) {
        return keys[slot] != EMPTY;
    }

    int capacity() {
        return keys.length;
    }

    private void grow() {
        long[] ok = keys;
        int[] otf = tf;
        int[] odf = df;
        int[] ol = last;
        int n = size;
        allocate(ok.length * 2);
        size = n;
        for (int j = 0; j < ok.length; j++) {
            long c = ok[j];
            if (c != EMPTY) {
                int i = (int) HashCommon.mix(c) & mask;
                while (keys[i] != EMPTY) {
                    i = (i + 1) & mask;
                }
                keys[i] = c;
                tf[i] = otf[j];
                df[i] = odf[j];
                last[i] = ol[j];
            }
        }
    }

    /** Sorts the table's entries by code and writes them as a run: (code, tf, df) triples. */
    void spill() {
        if (size == 0) {
            return;
        }
        long[] codes = new long[size];
        long[] counts = new long[size];
        int n = 0;
        for (int i = 0; i < keys.length; i++) {
            if (keys[i] != EMPTY) {
                codes[n] = keys[i];
                counts[n] = ((long) tf[i] << 32) | (df[i] & 0xFFFFFFFFL);
                n++;
            }
        }
        LongArrays.radixSort(codes, counts);
        try {
            Path run = Files.createTempFile(tempDir, runPrefix, ".run");
            try (DataOutputStream out = new DataOutputStream(new BufferedOutputStream(Files.newOutputStream(run), 1 << 16))) {
                out.writeInt(n);
                for (int i = 0; i < n; i++) {
                    out.writeLong(codes[i]);
                    out.writeLong(counts[i]);
                }
            }
            runs.add(run);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write a count run to " + tempDir + " (" + e.getMessage()
                    + "); free disk space or choose another temp folder", e);
        }
        allocate(Math.min(keys.length, 1 << 16));
    }
}
