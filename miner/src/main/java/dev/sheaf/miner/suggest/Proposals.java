package dev.sheaf.miner.suggest;

import dev.sheaf.miner.text.EvidenceLine;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/**
 * Collects what every kind proposes, keyed by the set of member terms, so that two kinds that
 * find the same pair make one suggestion with two supports. A pair inside a group of the same
 * variant key joins that group's suggestion. Not thread-safe.
 */
final class Proposals {
    /** A member as the kinds see it, before the vocabulary is consulted. */
    record Term(String term, String shown, long frequency, long df) {
    }

    static final class Entry {
        final LinkedHashMap<String, Term> members = new LinkedHashMap<>();
        final EnumMap<Suggestion.Kind, Suggestion.Support> support = new EnumMap<>(Suggestion.Kind.class);
        final List<EvidenceLine> evidence = new ArrayList<>();
    }

    private final Map<String, Entry> entries = new LinkedHashMap<>();
    private final Map<String, String> groupOf = new HashMap<>();

    /** Adds a group (two or more members) found by one kind; every member is marked as in this group. */
    void addGroup(Collection<Term> members, Suggestion.Support s) {
        String key = key(members);
        Entry e = entries.computeIfAbsent(key, k -> new Entry());
        for (Term t : members) {
            e.members.putIfAbsent(t.term(), t);
            groupOf.putIfAbsent(t.term(), key);
        }
        put(e, s);
    }

    /** Adds a pair found by one kind; a pair inside one group strengthens the group instead. */
    void addPair(Term a, Term b, Suggestion.Support s, EvidenceLine first) {
        if (a.term().equals(b.term())) {
            return;
        }
        String ga = groupOf.get(a.term());
        Entry e;
        if (ga != null && ga.equals(groupOf.get(b.term()))) {
            e = entries.get(ga);
        } else {
            e = entries.computeIfAbsent(key(List.of(a, b)), k -> new Entry());
            e.members.putIfAbsent(a.term(), a);
            e.members.putIfAbsent(b.term(), b);
        }
        put(e, s);
        if (first != null && !e.evidence.contains(first)) {
            e.evidence.add(first);
        }
    }

    /** Whether these two terms are already proposed together (by any kind). */
    Entry find(String a, String b) {
        String ga = groupOf.get(a);
        if (ga != null && ga.equals(groupOf.get(b))) {
            return entries.get(ga);
        }
        TreeSet<String> k = new TreeSet<>(List.of(a, b));
        return entries.get(String.join(" | ", k));
    }

    /** Adds a support to an existing entry (a corroborating kind). */
    void corroborate(Entry e, Suggestion.Support s) {
        put(e, s);
    }

    Collection<Entry> entries() {
        return entries.values();
    }

    private static void put(Entry e, Suggestion.Support s) {
        Suggestion.Support old = e.support.get(s.kind());
        if (old == null || s.score() > old.score()) {
            e.support.put(s.kind(), s);
        }
    }

    private static String key(Collection<Term> members) {
        TreeSet<String> k = new TreeSet<>();
        for (Term t : members) {
            k.add(t.term());
        }
        return String.join(" | ", k);
    }

    /** Members most frequent first, then by term. */
    static final Comparator<Term> MEMBER_ORDER = Comparator.comparingLong(Term::frequency).reversed().thenComparing(Term::term);
}
