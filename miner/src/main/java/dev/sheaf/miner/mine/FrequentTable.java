package dev.sheaf.miner.mine;

import it.unimi.dsi.fastutil.HashCommon;
import java.util.Arrays;

/**
 * The n-grams of one length that survived pruning (frequency and df at the minimums), with dense
 * indices 0..size-1, their codes, tf and df. Read-only once built, so every worker thread of the
 * next pass may look codes up at once.
 *
 * <p>Codes: a unigram's code is its term id; an n-gram's code is
 * {@code (index of its (n-1)-token prefix in the previous level) << 32 | id of its last token}.
 */
final class FrequentTable {
    private long[] slotKeys;
    private int[] slotIndex;
    private int mask;

    long[] codes;
    int[] tf;
    int[] df;
    int size;

    FrequentTable(int expected) {
        int cap = Integer.highestOneBit(Math.max(16, (int) Math.min(1 << 30, expected * 2L + 2))) * 2;
        slotKeys = new long[cap];
        Arrays.fill(slotKeys, -1L);
        slotIndex = new int[cap];
        mask = cap - 1;
        codes = new long[Math.max(16, expected)];
        tf = new int[codes.length];
        df = new int[codes.length];
    }

    /** Adds a code that is not yet present; returns its index. */
    int add(long code, int tfv, int dfv) {
        if (size == codes.length) {
            int n = size * 2;
            codes = Arrays.copyOf(codes, n);
            tf = Arrays.copyOf(tf, n);
            df = Arrays.copyOf(df, n);
        }
        if ((size + 1) * 2L > slotKeys.length) {
            rehash(slotKeys.length * 2);
        }
        int idx = size++;
        codes[idx] = code;
        tf[idx] = tfv;
        df[idx] = dfv;
        int i = (int) HashCommon.mix(code) & mask;
        while (slotKeys[i] != -1L) {
            i = (i + 1) & mask;
        }
        slotKeys[i] = code;
        slotIndex[i] = idx;
        return idx;
    }

    /** The index of a code, or -1. */
    int get(long code) {
        int i = (int) HashCommon.mix(code) & mask;
        while (true) {
            long c = slotKeys[i];
            if (c == code) {
                return slotIndex[i];
            }
            if (c == -1L) {
                return -1;
            }
            i = (i + 1) & mask;
        }
    }

    private void rehash(int cap) {
        slotKeys = new long[cap];
        Arrays.fill(slotKeys, -1L);
        slotIndex = new int[cap];
        mask = cap - 1;
        for (int idx = 0; idx < size; idx++) {
            int i = (int) HashCommon.mix(codes[idx]) & mask;
            while (slotKeys[i] != -1L) {
                i = (i + 1) & mask;
            }
            slotKeys[i] = codes[idx];
            slotIndex[i] = idx;
        }
    }

    static long code(int prefixIndex, int lastId) {
        return ((long) prefixIndex << 32) | (lastId & 0xFFFFFFFFL);
    }

    static int prefixOf(long code) {
        return (int) (code >>> 32);
    }

    static int lastOf(long code) {
        return (int) code;
    }
}
