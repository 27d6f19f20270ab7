package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.SortedMap;
import java.util.TreeMap;
import java.util.TreeSet;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ConceptLabel;
import dev.sheaf.vocab.Vocabulary;
import org.apache.lucene.analysis.miscellaneous.ASCIIFoldingFilter;

/**
 * The vocabulary as the consistency stage reads it: concepts with their labels, facets and
 * regulated-claim marks. Immutable; concepts are kept in id order.
 *
 * <p>Labels are compared in one normal form ({@link #normalise}): Lucene StandardTokenizer words,
 * lower-cased with {@code Locale.ROOT}, accents folded to ASCII, joined by one space, so
 * "Pit-Zips", "pit zips" and "PIT ZIPS" are the same label.
 */
public final class FeedbackVocabulary {

    /** A label (in normal form) that two or more concepts carry. */
    public record SharedLabel(String label, List<String> conceptIds) {
        public SharedLabel {
            Objects.requireNonNull(label, "label");
            conceptIds = List.copyOf(conceptIds);
            if (conceptIds.size() < 2) {
                throw new IllegalArgumentException("a shared label needs at least two concepts; got " + conceptIds);
            }
        }
    }

    private final SortedMap<String, FeedbackConcept> concepts;
    private final List<SharedLabel> shared;

    private FeedbackVocabulary(SortedMap<String, FeedbackConcept> concepts) {
        this.concepts = Collections.unmodifiableSortedMap(concepts);
        Map<String, TreeSet<String>> byLabel = new TreeMap<>();
        for (FeedbackConcept c : concepts.values()) {
            for (String l : c.labels()) {
                String n = normalise(l);
                if (!n.isEmpty()) {
                    byLabel.computeIfAbsent(n, k -> new TreeSet<>()).add(c.id());
                }
            }
        }
        List<SharedLabel> s = new ArrayList<>();
        byLabel.forEach((l, ids) -> {
            if (ids.size() > 1) {
                s.add(new SharedLabel(l, List.copyOf(ids)));
            }
        });
        this.shared = List.copyOf(s);
    }

    /** A vocabulary of these concepts; ids must be unique. */
    public static FeedbackVocabulary of(Collection<FeedbackConcept> concepts) {
        SortedMap<String, FeedbackConcept> m = new TreeMap<>();
        for (FeedbackConcept c : concepts) {
            Objects.requireNonNull(c, "a concept is null");
            if (m.put(c.id(), c) != null) {
                throw new IllegalArgumentException("concept id " + c.id() + " appears twice; ids must be unique");
            }
        }
        return new FeedbackVocabulary(m);
    }

    /**
     * The consistency view of a vocabulary: every live concept and facet with all its labels
     * (preferred, alternative and hidden, every language), its first facet, its broader ids, and
     * whether a facet above it is a regulated claim. Labels show in the vocabulary's default language.
     */
    public static FeedbackVocabulary from(Vocabulary v) {
        Objects.requireNonNull(v, "vocabulary");
        List<FeedbackConcept> out = new ArrayList<>();
        for (Concept c : v.allConcepts()) {
            List<String> labels = new ArrayList<>();
            for (ConceptLabel l : c.labels()) {
                if (!labels.contains(l.text())) {
                    labels.add(l.text());
                }
            }
            boolean claim = false;
            for (Concept f : v.facetsOf(c.id())) {
                claim |= f.facet().regulatedClaim();
            }
            out.add(new FeedbackConcept(c.id(), c.displayLabel(v.defaultLanguage()),
                    v.facetOf(c.id()).map(Concept::id).orElse(null), c.isFacet(), labels, claim, List.copyOf(c.broader())));
        }
        return of(out);
    }

    /** An empty vocabulary (no labels, nothing shared). */
    public static FeedbackVocabulary empty() {
        return new FeedbackVocabulary(new TreeMap<>());
    }

    /** The concepts (facets included), by id. */
    public Collection<FeedbackConcept> concepts() {
        return concepts.values();
    }

    public Optional<FeedbackConcept> concept(String id) {
        return Optional.ofNullable(concepts.get(id));
    }

    /** The label to show for an id: the concept's label, else the id itself. */
    public String displayLabel(String id) {
        FeedbackConcept c = concepts.get(id);
        return c == null ? id : c.label();
    }

    /** Labels (normal form) carried by two or more concepts, in label order. */
    public List<SharedLabel> sharedLabels() {
        return shared;
    }

    /** The shared labels one concept carries, in label order. */
    public List<SharedLabel> sharedLabels(String conceptId) {
        List<SharedLabel> out = new ArrayList<>();
        for (SharedLabel s : shared) {
            if (s.conceptIds().contains(conceptId)) {
                out.add(s);
            }
        }
        return out;
    }

    /** Every concept above {@code id} through broader links (not {@code id} itself unless in a cycle), in id order. */
    public Set<String> ancestors(String id) {
        Set<String> out = new TreeSet<>();
        java.util.Deque<String> todo = new java.util.ArrayDeque<>();
        FeedbackConcept c = concepts.get(id);
        if (c != null) {
            todo.addAll(c.broader());
        }
        while (!todo.isEmpty()) {
            String x = todo.pop();
            if (out.add(x)) {
                FeedbackConcept b = concepts.get(x);
                if (b != null) {
                    todo.addAll(b.broader());
                }
            }
        }
        return out;
    }

    /** Every one-word label in normal form (the words {@link ComparativeMorphology} must not take apart). */
    public Set<String> singleWordLabels() {
        Set<String> out = new TreeSet<>();
        for (FeedbackConcept c : concepts.values()) {
            for (String l : c.labels()) {
                String n = normalise(l);
                if (!n.isEmpty() && n.indexOf(' ') < 0) {
                    out.add(n);
                }
            }
        }
        return out;
    }

    /** A concept's labels by normal form, first spelling kept, in the concept's label order. */
    Map<String, String> labelForms(String conceptId) {
        Map<String, String> out = new LinkedHashMap<>();
        FeedbackConcept c = concepts.get(conceptId);
        if (c != null) {
            for (String l : c.labels()) {
                String n = normalise(l);
                if (!n.isEmpty()) {
                    out.putIfAbsent(n, l);
                }
            }
        }
        return out;
    }

    /** Normal forms already computed; bounded, since feedback repeats a few thousand forms at most. */
    private static final java.util.concurrent.ConcurrentHashMap<String, String> NORMAL = new java.util.concurrent.ConcurrentHashMap<>();
    private static final int NORMAL_CACHE = 100_000;

    /** The normal form of a label or a piece of text: its words, lower-cased, folded, joined by one space. */
    public static String normalise(String text) {
        String cached = NORMAL.get(text);
        if (cached != null) {
            return cached;
        }
        String n = tokenised(text);
        if (NORMAL.size() < NORMAL_CACHE) {
            NORMAL.put(text, n);
        }
        return n;
    }

    private static String tokenised(String text) {
        CueTokens t = CueTokens.of(text);
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < t.size(); i++) {
            if (i > 0) {
                b.append(' ');
            }
            b.append(fold(t.norm(i)));
        }
        return b.toString();
    }

    /** One token folded to ASCII ("crème" → "creme"); already lower case. */
    static String fold(String token) {
        for (int i = 0; i < token.length(); i++) {
            if (token.charAt(i) >= 0x80) {
                char[] out = new char[token.length() * 4];
                int n = ASCIIFoldingFilter.foldToASCII(token.toCharArray(), 0, out, 0, token.length());
                return new String(out, 0, n);
            }
        }
        return token;
    }

    @Override
    public String toString() {
        return "FeedbackVocabulary[" + concepts.size() + " concepts, " + shared.size() + " shared labels]";
    }
}
