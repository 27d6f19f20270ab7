package dev.sheaf.miner.text;

import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.ArrayList;
import java.util.List;

/**
 * The shared term ↔ id table of one {@link Analysis}: ids are dense from 0 in first-seen order, so
 * they are not stable across runs and never leave the process (files carry terms, not ids).
 * Thread-safe; the hot path reaches it only on a per-thread cache miss.
 */
public final class TermDictionary {
    private final Object2IntOpenHashMap<String> ids = new Object2IntOpenHashMap<>();
    private final List<String> terms = new ArrayList<>();
    private final it.unimi.dsi.fastutil.ints.IntArrayList flags = new it.unimi.dsi.fastutil.ints.IntArrayList();
    private final java.util.function.ToIntFunction<String> flagger;

    TermDictionary(java.util.function.ToIntFunction<String> flagger) {
        this.flagger = flagger;
        ids.defaultReturnValue(-1);
    }

    /** The id and the profile flags of a term: {@code flags << 32 | id}. */
    synchronized long intern(char[] buf, int len) {
        String s = new String(buf, 0, len);
        int id = ids.getInt(s);
        if (id < 0) {
            id = terms.size();
            ids.put(s, id);
            terms.add(s);
            flags.add(flagger.applyAsInt(s));
        }
        return ((long) flags.getInt(id) << 32) | id;
    }

    /** The id of an analysed term, or -1 when it never occurred. */
    public synchronized int lookup(String term) {
        return ids.getInt(term);
    }

    /** The term of an id. */
    public synchronized String term(int id) {
        return terms.get(id);
    }

    /** A snapshot of all terms, indexed by id. */
    public synchronized String[] snapshot() {
        return terms.toArray(new String[0]);
    }

    public synchronized int size() {
        return terms.size();
    }
}
