package dev.sheaf.vocab;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * A working copy an edit changes; remembers the first value of every entry it touches so the
 * forward and backward patches fall out at the end.
 */
final class Mutation {
    private final Vocabulary base;
    private SchemeInfo scheme;
    private final TreeMap<String, Concept> concepts;
    private final TreeMap<String, Retired> retired;
    private final TreeMap<String, Decision> decisions;
    private final TreeMap<String, Optional<Concept>> conceptsBefore = new TreeMap<>();
    private final TreeMap<String, Optional<Retired>> retiredBefore = new TreeMap<>();
    private final TreeMap<String, Optional<Decision>> decisionsBefore = new TreeMap<>();
    private final List<String> refusals = new ArrayList<>();

    Mutation(Vocabulary base) {
        this.base = base;
        this.scheme = base.scheme();
        this.concepts = new TreeMap<>(base.conceptMap());
        this.retired = new TreeMap<>(base.retiredMap());
        this.decisions = new TreeMap<>(base.decisionMap());
    }

    Vocabulary base() {
        return base;
    }

    /** The working state as a snapshot (for edits in a batch that validate against earlier ones). */
    Vocabulary view() {
        return Vocabulary.copyOf(scheme, concepts, retired, decisions);
    }

    SchemeInfo scheme() {
        return scheme;
    }

    String defaultLanguage() {
        return scheme.defaultLanguage();
    }

    Concept concept(String id) {
        return concepts.get(id);
    }

    Concept require(String id) {
        return Objects.requireNonNull(concepts.get(id), id);
    }

    Iterable<Concept> concepts() {
        return new ArrayList<>(concepts.values());
    }

    Iterable<Decision> decisions() {
        return new ArrayList<>(decisions.values());
    }

    void put(Concept c) {
        conceptsBefore.putIfAbsent(c.id(), Optional.ofNullable(concepts.get(c.id())));
        concepts.put(c.id(), c);
    }

    void remove(String id) {
        conceptsBefore.putIfAbsent(id, Optional.ofNullable(concepts.get(id)));
        concepts.remove(id);
    }

    void retire(Retired r) {
        retiredBefore.putIfAbsent(r.id(), Optional.ofNullable(retired.get(r.id())));
        retired.put(r.id(), r);
    }

    void put(Decision d) {
        decisionsBefore.putIfAbsent(d.key(), Optional.ofNullable(decisions.get(d.key())));
        decisions.put(d.key(), d);
    }

    void removeDecision(String key) {
        decisionsBefore.putIfAbsent(key, Optional.ofNullable(decisions.get(key)));
        decisions.remove(key);
    }

    void scheme(SchemeInfo s) {
        scheme = s;
    }

    /** Records a reason the edit cannot go ahead (found while performing, e.g. inside a batch). */
    void refuse(String problem) {
        refusals.add(problem);
    }

    List<String> refusals() {
        return refusals;
    }

    Vocabulary result() {
        return Vocabulary.copyOf(scheme, concepts, retired, decisions);
    }

    Patch forward() {
        return new Patch(scheme.equals(base.scheme()) ? null : scheme,
                changed(conceptsBefore, concepts), changed(retiredBefore, retired), changed(decisionsBefore, decisions));
    }

    Patch backward() {
        return new Patch(scheme.equals(base.scheme()) ? null : base.scheme(),
                unchangedRemoved(conceptsBefore, concepts), unchangedRemoved(retiredBefore, retired),
                unchangedRemoved(decisionsBefore, decisions));
    }

    private static <T> SortedMap<String, Optional<T>> changed(TreeMap<String, Optional<T>> before, TreeMap<String, T> now) {
        TreeMap<String, Optional<T>> out = new TreeMap<>();
        before.forEach((k, was) -> {
            Optional<T> is = Optional.ofNullable(now.get(k));
            if (!is.equals(was)) {
                out.put(k, is);
            }
        });
        return out;
    }

    private static <T> SortedMap<String, Optional<T>> unchangedRemoved(TreeMap<String, Optional<T>> before, TreeMap<String, T> now) {
        TreeMap<String, Optional<T>> out = new TreeMap<>();
        before.forEach((k, was) -> {
            if (!Optional.ofNullable(now.get(k)).equals(was)) {
                out.put(k, was);
            }
        });
        return out;
    }
}
