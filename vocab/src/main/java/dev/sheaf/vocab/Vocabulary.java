package dev.sheaf.vocab;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.SortedMap;
import java.util.SortedSet;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * A controlled vocabulary: scheme info, facets and concepts (live), retired ids, and candidate
 * decisions. An immutable snapshot: {@link #apply(Edit)} returns a new snapshot, so a labeler can
 * keep reading one version while a curator edits the next (see docs/decisions/020).
 *
 * <p>Everything is ordered by id (concepts, retired ids) or by normalised term (decisions).
 * Derived views (narrower, facet of a concept, label index) are computed on first use and cached.
 */
public final class Vocabulary {
    private final SchemeInfo scheme;
    private final SortedMap<String, Concept> concepts;
    private final SortedMap<String, Retired> retired;
    private final SortedMap<String, Decision> decisions;

    private volatile Index index;
    private volatile Set<String> errorKeys;
    private volatile Map<String, SortedSet<String>> membership;

    private Vocabulary(SchemeInfo scheme, SortedMap<String, Concept> concepts, SortedMap<String, Retired> retired,
                       SortedMap<String, Decision> decisions) {
        this.scheme = Objects.requireNonNull(scheme, "scheme");
        this.concepts = Collections.unmodifiableSortedMap(concepts);
        this.retired = Collections.unmodifiableSortedMap(retired);
        this.decisions = Collections.unmodifiableSortedMap(decisions);
    }

    /** An empty vocabulary. */
    public static Vocabulary empty(SchemeInfo scheme) {
        return new Vocabulary(scheme, new TreeMap<>(), new TreeMap<>(), new TreeMap<>());
    }

    /**
     * A vocabulary from its parts. Throws when ids repeat, a retired id is also live, or two
     * decisions are on the same normalised term.
     */
    public static Vocabulary of(SchemeInfo scheme, Collection<Concept> concepts, Collection<Retired> retired,
                                Collection<Decision> decisions) {
        TreeMap<String, Concept> c = new TreeMap<>();
        for (Concept x : concepts) {
            if (c.put(x.id(), x) != null) {
                throw new IllegalArgumentException("concept id " + x.id() + " appears twice; ids must be unique");
            }
        }
        TreeMap<String, Retired> r = new TreeMap<>();
        for (Retired x : retired == null ? List.<Retired>of() : retired) {
            if (c.containsKey(x.id())) {
                throw new IllegalArgumentException("id " + x.id() + " is both a live concept and retired; keep one");
            }
            if (r.put(x.id(), x) != null) {
                throw new IllegalArgumentException("retired id " + x.id() + " appears twice");
            }
        }
        TreeMap<String, Decision> d = new TreeMap<>();
        for (Decision x : decisions == null ? List.<Decision>of() : decisions) {
            Decision prev = d.put(x.key(), x);
            if (prev != null) {
                throw new IllegalArgumentException("candidate terms \"" + prev.term() + "\" and \"" + x.term()
                        + "\" are the same term (\"" + x.key() + "\") and both have a decision; keep one");
            }
        }
        return new Vocabulary(scheme, c, r, d);
    }

    public SchemeInfo scheme() {
        return scheme;
    }

    public String defaultLanguage() {
        return scheme.defaultLanguage();
    }

    /** Facets (top concepts), by id. */
    public List<Concept> facets() {
        return index().facets;
    }

    /** Live concepts that are not facets (values), by id. */
    public List<Concept> concepts() {
        return index().values;
    }

    /** Every live concept, facets included, by id. */
    public Collection<Concept> allConcepts() {
        return concepts.values();
    }

    /** Live concepts, facets included, by id. */
    public SortedMap<String, Concept> conceptMap() {
        return concepts;
    }

    /** Number of live concepts, facets included. */
    public int size() {
        return concepts.size();
    }

    /** A live concept (or facet) by id. */
    public Optional<Concept> concept(String id) {
        return Optional.ofNullable(concepts.get(id));
    }

    /** Whether {@code id} is a live concept or facet. */
    public boolean contains(String id) {
        return concepts.containsKey(id);
    }

    /** Whether {@code id} was ever used here: live or retired. */
    public boolean isKnownId(String id) {
        return concepts.containsKey(id) || retired.containsKey(id);
    }

    public List<Retired> retired() {
        return List.copyOf(retired.values());
    }

    public Optional<Retired> retired(String id) {
        return Optional.ofNullable(retired.get(id));
    }

    SortedMap<String, Retired> retiredMap() {
        return retired;
    }

    SortedMap<String, Decision> decisionMap() {
        return decisions;
    }

    /**
     * The live concept an id stands for today: the concept itself, or — for an id merged away —
     * the concept at the end of its "replaced by" chain. Empty for unknown and deleted ids.
     */
    public Optional<Concept> resolve(String id) {
        Set<String> seen = new HashSet<>();
        String cur = id;
        while (cur != null && seen.add(cur)) {
            Concept c = concepts.get(cur);
            if (c != null) {
                return Optional.of(c);
            }
            Retired r = retired.get(cur);
            cur = r == null ? null : r.replacedBy();
        }
        return Optional.empty();
    }

    /** Live concepts directly under {@code id}, by id. */
    public List<Concept> narrower(String id) {
        SortedSet<String> n = index().narrower.get(id);
        if (n == null) {
            return List.of();
        }
        List<Concept> out = new ArrayList<>(n.size());
        for (String x : n) {
            out.add(concepts.get(x));
        }
        return out;
    }

    /** Ids of every live concept above {@code id} (broader, transitively), excluding {@code id} unless it is in a cycle. */
    public Set<String> ancestors(String id) {
        return walk(id, true);
    }

    /** Ids of every live concept below {@code id} (narrower, transitively), excluding {@code id} unless it is in a cycle. */
    public Set<String> descendants(String id) {
        return walk(id, false);
    }

    private Set<String> walk(String id, boolean up) {
        Set<String> out = new LinkedHashSet<>();
        Deque<String> todo = new ArrayDeque<>(next(id, up));
        while (!todo.isEmpty()) {
            String x = todo.pop();
            if (concepts.containsKey(x) && out.add(x)) {
                todo.addAll(next(x, up));
            }
        }
        return out;
    }

    private Collection<String> next(String id, boolean up) {
        if (up) {
            Concept c = concepts.get(id);
            return c == null ? List.of() : c.broader();
        }
        SortedSet<String> n = index().narrower.get(id);
        return n == null ? List.of() : n;
    }

    /**
     * The facet a concept belongs to: itself when it is a facet, else the facet reached through
     * its broader concepts. With polyhierarchy across facets, the first facet by id; see
     * {@link #facetsOf}.
     */
    public Optional<Concept> facetOf(String id) {
        List<Concept> f = facetsOf(id);
        return f.isEmpty() ? Optional.empty() : Optional.of(f.get(0));
    }

    /** Every facet a concept is under (itself when it is a facet), by id. */
    public List<Concept> facetsOf(String id) {
        Concept c = concepts.get(id);
        if (c == null) {
            return List.of();
        }
        if (c.isFacet()) {
            return List.of(c);
        }
        SortedSet<String> fs = facetMembership().get(id);
        if (fs == null) {
            return List.of();
        }
        List<Concept> out = new ArrayList<>(fs.size());
        for (String f : fs) {
            out.add(concepts.get(f));
        }
        return out;
    }

    /** Concept id → facets above it; computed once per snapshot by walking down from each facet. */
    private Map<String, SortedSet<String>> facetMembership() {
        Map<String, SortedSet<String>> m = membership;
        if (m == null) {
            m = new HashMap<>();
            for (Concept f : facets()) {
                for (String d : descendants(f.id())) {
                    m.computeIfAbsent(d, k -> new TreeSet<>()).add(f.id());
                }
            }
            membership = m;
        }
        return m;
    }

    /** The values of a facet: every live concept under it, by id. */
    public List<Concept> valuesOf(String facetId) {
        List<Concept> out = new ArrayList<>();
        for (String d : new TreeSet<>(descendants(facetId))) {
            out.add(concepts.get(d));
        }
        return out;
    }

    /** Live concepts carrying exactly this label (any kind). */
    public List<Concept> conceptsWithLabel(Label label) {
        List<LabelUse> uses = index().labels.get(label);
        if (uses == null) {
            return List.of();
        }
        TreeMap<String, Concept> out = new TreeMap<>();
        for (LabelUse u : uses) {
            out.put(u.conceptId(), concepts.get(u.conceptId()));
        }
        return List.copyOf(out.values());
    }

    /** Every use of every label: label → (concept, kind), for checks and labelers. */
    Map<Label, List<LabelUse>> labelIndex() {
        return index().labels;
    }

    /** Candidate decisions by normalised term. */
    public List<Decision> decisions() {
        return List.copyOf(decisions.values());
    }

    /** The decision on a term (compared {@linkplain Terms#normalise normalised}). */
    public Optional<Decision> decision(String term) {
        return Optional.ofNullable(decisions.get(Terms.normalise(term)));
    }

    /** Whether a term was dropped; a re-mine uses this to keep dropped terms from coming back. */
    public boolean isDropped(String term) {
        Decision d = decisions.get(Terms.normalise(term));
        return d != null && d.outcome() == Decision.Outcome.DROPPED;
    }

    /** The preferred label in the default language (or another), or the id for unknown ids. */
    public String displayLabel(String id) {
        Concept c = concepts.get(id);
        if (c != null) {
            return c.displayLabel(scheme.defaultLanguage());
        }
        Retired r = retired.get(id);
        return r != null && r.formerLabel() != null ? r.formerLabel() : id;
    }

    /** A fresh id made from a label ({@link Terms#slug}), with "-2", "-3" ... appended when taken (live or retired). */
    public String newId(String label) {
        String base = Terms.slug(label);
        if (!isKnownId(base)) {
            return base;
        }
        for (int i = 2; ; i++) {
            String id = base + "-" + i;
            if (!isKnownId(id)) {
                return id;
            }
        }
    }

    /**
     * Applies a validated edit and returns the new snapshot; this one is unchanged.
     *
     * @throws EditRefusedException when the edit does not validate (the reasons are in it)
     */
    public Vocabulary apply(Edit edit) {
        return edit.attempt(this).orThrow(edit, this).after();
    }

    /** This vocabulary with a patch applied (no validation: patches come from validated edits). */
    Vocabulary with(Patch p) {
        TreeMap<String, Concept> c = new TreeMap<>(concepts);
        p.concepts().forEach((k, v) -> {
            if (v.isPresent()) {
                c.put(k, v.get());
            } else {
                c.remove(k);
            }
        });
        TreeMap<String, Retired> r = new TreeMap<>(retired);
        p.retired().forEach((k, v) -> {
            if (v.isPresent()) {
                r.put(k, v.get());
            } else {
                r.remove(k);
            }
        });
        TreeMap<String, Decision> d = new TreeMap<>(decisions);
        p.decisions().forEach((k, v) -> {
            if (v.isPresent()) {
                d.put(k, v.get());
            } else {
                d.remove(k);
            }
        });
        return new Vocabulary(p.scheme() == null ? scheme : p.scheme(), c, r, d);
    }

    /** A snapshot of working maps (copied). */
    static Vocabulary copyOf(SchemeInfo s, SortedMap<String, Concept> c, SortedMap<String, Retired> r,
                             SortedMap<String, Decision> d) {
        return new Vocabulary(s, new TreeMap<>(c), new TreeMap<>(r), new TreeMap<>(d));
    }

    /** Keys of the error findings of this snapshot; cached, used to refuse edits that add errors. */
    Set<String> errorKeys() {
        Set<String> k = errorKeys;
        if (k == null) {
            k = new HashSet<>();
            for (Finding f : VocabularyChecker.errors(this)) {
                k.add(f.key());
            }
            errorKeys = k;
        }
        return k;
    }

    /** Records the error keys of this snapshot when the edit that made it has just computed them. */
    void knownErrorKeys(Set<String> keys) {
        if (errorKeys == null) {
            errorKeys = Set.copyOf(keys);
        }
    }

    private Index index() {
        Index i = index;
        if (i == null) {
            i = new Index(concepts);
            index = i;
        }
        return i;
    }

    @Override
    public boolean equals(Object o) {
        if (this == o) {
            return true;
        }
        if (!(o instanceof Vocabulary)) {
            return false;
        }
        Vocabulary v = (Vocabulary) o;
        return scheme.equals(v.scheme) && concepts.equals(v.concepts) && retired.equals(v.retired)
                && decisions.equals(v.decisions);
    }

    @Override
    public int hashCode() {
        return Objects.hash(scheme, concepts, retired, decisions);
    }

    @Override
    public String toString() {
        return "Vocabulary[" + scheme.id() + ": " + facets().size() + " facets, " + concepts().size() + " concepts, "
                + retired.size() + " retired, " + decisions.size() + " decisions]";
    }

    /** One use of a label by a concept. */
    record LabelUse(String conceptId, LabelKind kind) {
    }

    /** Derived views, computed once per snapshot. */
    private static final class Index {
        final List<Concept> facets;
        final List<Concept> values;
        final Map<String, SortedSet<String>> narrower = new HashMap<>();
        final Map<Label, List<LabelUse>> labels = new HashMap<>();

        Index(SortedMap<String, Concept> concepts) {
            List<Concept> f = new ArrayList<>();
            List<Concept> v = new ArrayList<>();
            for (Concept c : concepts.values()) {
                (c.isFacet() ? f : v).add(c);
                for (String b : c.broader()) {
                    narrower.computeIfAbsent(b, k -> new TreeSet<>()).add(c.id());
                }
                for (ConceptLabel l : c.labels()) {
                    labels.computeIfAbsent(l.label(), k -> new ArrayList<>(2)).add(new LabelUse(c.id(), l.kind()));
                }
            }
            facets = Collections.unmodifiableList(f);
            values = Collections.unmodifiableList(v);
        }
    }
}
