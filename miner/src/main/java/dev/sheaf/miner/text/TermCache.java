package dev.sheaf.miner.text;

import java.util.Arrays;

/**
 * One thread's memo of term chars → global id, so the hot loop allocates nothing for a term it has
 * seen before: an open-addressing table over a shared char pool, compared char by char.
 */
final class TermCache {
    private final TermDictionary dictionary;
    private int[] slots = new int[1 << 12];
    private int mask = slots.length - 1;
    private int[] hashes = new int[1 << 11];
    private int[] offsets = new int[1 << 11];
    private int[] lengths = new int[1 << 11];
    private int[] ids = new int[1 << 11];
    private int[] flags = new int[1 << 11];
    /** The flags of the term of the last {@link #id} call. */
    int lastFlags;
    private char[] pool = new char[1 << 15];
    private int poolSize;
    private int size;

    TermCache(TermDictionary dictionary) {
        this.dictionary = dictionary;
    }

    int id(char[] buf, int len) {
        int h = hash(buf, len);
        int i = h & mask;
        while (true) {
            int e = slots[i] - 1;
            if (e < 0) {
                return insert(i, h, buf, len);
            }
            if (hashes[e] == h && lengths[e] == len && same(offsets[e], buf, len)) {
                lastFlags = flags[e];
                return ids[e];
            }
            i = (i + 1) & mask;
        }
    }

    private boolean same(int off, char[] buf, int len) {
        char[] p = pool;
        for (int k = 0; k < len; k++) {
            if (p[off + k] != buf[k]) {
                return false;
            }
        }
        return true;
    }

    private int insert(int slot, int h, char[] buf, int len) {
        long packed = dictionary.intern(buf, len);
        int id = (int) packed;
        int f = (int) (packed >>> 32);
        if (size == ids.length) {
            int n = size * 2;
            hashes = Arrays.copyOf(hashes, n);
            offsets = Arrays.copyOf(offsets, n);
            lengths = Arrays.copyOf(lengths, n);
            ids = Arrays.copyOf(ids, n);
            flags = Arrays.copyOf(flags, n);
        }
        if (poolSize + len > pool.length) {
            pool = Arrays.copyOf(pool, Math.max(pool.length * 2, poolSize + len));
        }
        System.arraycopy(buf, 0, pool, poolSize, len);
        hashes[size] = h;
        offsets[size] = poolSize;
        lengths[size] = len;
        ids[size] = id;
        flags[size] = f;
        lastFlags = f;
        poolSize += len;
        slots[slot] = ++size;
        if (size * 2 > slots.length) {
            rehash();
        }
        return id;
    }

    private void rehash() {
        slots = new int[slots.length * 2];
        mask = slots.length - 1;
        for (int e = 0; e < size; e++) {
            int i = hashes[e] & mask;
            while (slots[i] != 0) {
                i = (i + 1) & mask;
            }
            slots[i] = e + 1;
        }
    }

    private static int hash(char[] buf, int len) {
        int h = 0x9E3779B9;
        for (int k = 0; k < len; k++) {
            h = 31 * h + buf[k];
        }
        h ^= h >>> 16;
        h *= 0x85EBCA6B;
        h ^= h >>> 13;
        return h;
    }
}
