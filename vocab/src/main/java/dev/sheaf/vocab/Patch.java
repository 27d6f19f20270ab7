package dev.sheaf.vocab;

import java.util.Collections;
import java.util.Map;
import java.util.Optional;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * The entries one step of editing changes, with their new values: an empty Optional removes the
 * entry. An applied edit keeps two patches (forward and backward), which is all undo and redo
 * need, and what the edit journal writes.
 *
 * @param scheme the new scheme info, or null when unchanged
 * @param concepts live concepts by id
 * @param retired retired ids by id
 * @param decisions candidate decisions by {@linkplain Decision#key key}
 */
public record Patch(SchemeInfo scheme,
                    SortedMap<String, Optional<Concept>> concepts,
                    SortedMap<String, Optional<Retired>> retired,
                    SortedMap<String, Optional<Decision>> decisions) {

    public Patch {
        concepts = Collections.unmodifiableSortedMap(new TreeMap<>(concepts == null ? Map.of() : concepts));
        retired = Collections.unmodifiableSortedMap(new TreeMap<>(retired == null ? Map.of() : retired));
        decisions = Collections.unmodifiableSortedMap(new TreeMap<>(decisions == null ? Map.of() : decisions));
        concepts.forEach((k, v) -> {
            if (v.isPresent() && !v.get().id().equals(k)) {
                throw new IllegalArgumentException("patch entry " + k + " holds concept " + v.get().id());
            }
        });
        retired.forEach((k, v) -> {
            if (v.isPresent() && !v.get().id().equals(k)) {
                throw new IllegalArgumentException("patch entry " + k + " holds retired id " + v.get().id());
            }
        });
        decisions.forEach((k, v) -> {
            if (v.isPresent() && !v.get().key().equals(k)) {
                throw new IllegalArgumentException("patch entry " + k + " holds the decision on " + v.get().key());
            }
        });
    }

    public boolean isEmpty() {
        return scheme == null && concepts.isEmpty() && retired.isEmpty() && decisions.isEmpty();
    }

    /** The ids of concepts (live or retired) this patch touches. */
    public java.util.SortedSet<String> touchedIds() {
        java.util.TreeSet<String> s = new java.util.TreeSet<>(concepts.keySet());
        s.addAll(retired.keySet());
        return Collections.unmodifiableSortedSet(s);
    }
}
