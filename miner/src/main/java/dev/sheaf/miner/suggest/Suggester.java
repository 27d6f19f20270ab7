package dev.sheaf.miner.suggest;

import dev.sheaf.miner.ingest.EvidenceIndex;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.Vocabulary;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;

/**
 * The suggestion stage's front door: a harvest (and optionally the listings it was mined from, a
 * vocabulary and an evidence index) in; ranked proposals to merge synonyms and variants
 * ({@link Suggestion}) and to place terms under others ({@link HierarchySuggestion}) out, each with
 * its reason and evidence.
 *
 * <pre>{@code
 * Suggester.Builder b = Suggester.builder(harvest).vocabulary(vocab).options(SuggestOptions.defaults());
 * ingest.run(b);                       // optional: the listings, for contexts, co-occurrence and abbreviations
 * Suggester s = b.build();             // does the work (seconds on 100,000 listings)
 * s.suggestions();                     // all merges, best first
 * s.forTerm("water resistant");        // merges that involve one term (any written form)
 * s.forConcept("dwr");                 // merges that involve one concept (through its labels)
 * s.hierarchy();                       // parents
 * s = s.withVocabulary(edited);        // after the curator decided: the same work, filtered again, at once
 * }</pre>
 *
 * <p>What needs what: same group key, spelling variants, WordNet synonyms, values under the same
 * spec key, head–modifier parents and facet proposals need only the harvest. Distributional
 * similarity, subsumption and abbreviations spelled out in the text need a pass over the listings
 * ({@link Builder#accept}); without it, abbreviations are looked for in the harvest's evidence
 * lines only, and {@link Summary#notes()} says which kinds did not run and why.
 *
 * <p>Decided suggestions never come back (docs/decisions/132-decided-suggestions.md): a member that
 * was dropped is removed; members that are already labels of one concept (merged) count as one;
 * two concepts that are related or one under the other were kept apart. A suggestion with no
 * undecided pair left is not returned; a hierarchy suggestion whose child is already under the parent
 * neither.
 *
 * <p>Thread-safety: {@link Builder#accept} may be called from several threads at once; a built
 * {@code Suggester} is immutable and may be queried from any thread.
 */
public final class Suggester {
    private static final Comparator<Suggestion> RANK = Comparator.comparingDouble(Suggestion::score).reversed()
            .thenComparing(Comparator.comparingLong(Suggester::totalFrequency).reversed())
            .thenComparing(Suggestion::key);
    private static final Comparator<HierarchySuggestion> HRANK = Comparator.comparingDouble(HierarchySuggestion::score).reversed()
            .thenComparing(Comparator.comparingLong((HierarchySuggestion h) -> h.counts().childListings()).reversed())
            .thenComparing(HierarchySuggestion::key);

    private final Catalog catalog;
    private final SuggestOptions options;
    private final List<Suggestion> raw;
    private final List<HierarchySuggestion> rawHierarchy;
    private final Decided decided;
    private final List<Suggestion> suggestions;
    private final List<HierarchySuggestion> hierarchy;
    private final Summary summary;

    private Suggester(Catalog catalog, SuggestOptions options, List<Suggestion> raw, List<HierarchySuggestion> rawHierarchy,
                      Decided decided, Summary summary) {
        this.catalog = catalog;
        this.options = options;
        this.raw = raw;
        this.rawHierarchy = rawHierarchy;
        this.decided = decided;
        List<Suggestion> s = new ArrayList<>();
        for (Suggestion r : raw) {
            Suggestion f = filter(r, decided);
            if (f != null && f.score() >= options.minScore()) {
                s.add(f);
            }
        }
        s.sort(RANK);
        this.suggestions = Collections.unmodifiableList(s);
        List<HierarchySuggestion> h = new ArrayList<>();
        for (HierarchySuggestion r : rawHierarchy) {
            HierarchySuggestion f = filter(r, decided);
            if (f != null && f.score() >= options.minScore()) {
                h.add(f);
            }
        }
        h.sort(HRANK);
        this.hierarchy = Collections.unmodifiableList(h);
        this.summary = summary;
    }

    /** Starts a suggester over a harvest. */
    public static Builder builder(Harvest harvest) {
        return new Builder(harvest);
    }

    public SuggestOptions options() {
        return options;
    }

    /** Every merge suggestion at or above {@link SuggestOptions#minScore()}, best first (score, then frequency, then key). */
    public List<Suggestion> suggestions() {
        return suggestions;
    }

    /** The merge suggestions that {@code kind} supports, best first. */
    public List<Suggestion> suggestions(Suggestion.Kind kind) {
        List<Suggestion> out = new ArrayList<>();
        for (Suggestion s : suggestions) {
            if (s.supportedBy(kind)) {
                out.add(s);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * The merge suggestions with {@code term} among their members, best first. The term may be
     * written in any form the analysis folds to the harvest's form ("Water-Resistant" finds
     * "water resistant"); a label of a concept finds the suggestions of that concept's terms.
     */
    public List<Suggestion> forTerm(String term) {
        Set<String> forms = formsOf(term);
        List<Suggestion> out = new ArrayList<>();
        for (Suggestion s : suggestions) {
            for (Suggestion.Member m : s.members()) {
                if (forms.contains(m.term())) {
                    out.add(s);
                    break;
                }
            }
        }
        return Collections.unmodifiableList(out);
    }

    /** The merge suggestions with a member that belongs to concept {@code conceptId}, best first. */
    public List<Suggestion> forConcept(String conceptId) {
        List<Suggestion> out = new ArrayList<>();
        for (Suggestion s : suggestions) {
            if (s.conceptIds().contains(conceptId)) {
                out.add(s);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /** Every hierarchy suggestion at or above the minimum score, best first (score, then child listings, then key). */
    public List<HierarchySuggestion> hierarchy() {
        return hierarchy;
    }

    /** The hierarchy suggestions of {@code kind}, best first. */
    public List<HierarchySuggestion> hierarchy(HierarchySuggestion.Kind kind) {
        List<HierarchySuggestion> out = new ArrayList<>();
        for (HierarchySuggestion h : hierarchy) {
            if (h.kind() == kind) {
                out.add(h);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /** The hierarchy suggestions with {@code term} as parent or child (any written form, as {@link #forTerm}). */
    public List<HierarchySuggestion> hierarchyForTerm(String term) {
        Set<String> forms = formsOf(term);
        List<HierarchySuggestion> out = new ArrayList<>();
        for (HierarchySuggestion h : hierarchy) {
            if (forms.contains(h.child().term()) || forms.contains(h.parent().term())) {
                out.add(h);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /** The hierarchy suggestions with concept {@code conceptId} as parent or child. */
    public List<HierarchySuggestion> hierarchyForConcept(String conceptId) {
        List<HierarchySuggestion> out = new ArrayList<>();
        for (HierarchySuggestion h : hierarchy) {
            if (conceptId.equals(h.child().conceptId()) || conceptId.equals(h.parent().conceptId())) {
                out.add(h);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /**
     * The same suggestions seen against another vocabulary (after the curator merged, dropped or kept
     * something apart): nothing is recomputed, only filtered again.
     */
    public Suggester withVocabulary(Vocabulary vocabulary) {
        return new Suggester(catalog, options, raw, rawHierarchy, decide(catalog, vocabulary), summary);
    }

    /** The same suggestions with another minimum score (other options are fixed when built). */
    public Suggester withMinScore(double minScore) {
        return new Suggester(catalog, options.toBuilder().minScore(minScore).build(), raw, rawHierarchy, decided, summary);
    }

    /** What was read and found, and which kinds did not run. */
    public Summary summary() {
        return summary;
    }

    /**
     * The edit that records "keep these apart" for a suggestion whose members are already two
     * concepts: relate them (SKOS related), so the suggestion does not come back. Empty when the
     * members are not exactly two concepts; keep the terms as concepts first.
     */
    public static Optional<Edit> keepApart(Suggestion s) {
        List<String> ids = s.conceptIds();
        boolean allConcepts = s.members().stream().allMatch(m -> m.conceptId() != null);
        if (ids.size() != 2 || !allConcepts) {
            return Optional.empty();
        }
        return Optional.of(Edit.relate(ids.get(0), ids.get(1)));
    }

    /**
     * What a run read and found.
     *
     * @param candidates   harvest candidates considered
     * @param listingsRead listings fed to {@link Builder#accept} (0 when none were)
     * @param found        merge suggestions found per kind before the vocabulary and the minimum score
     * @param foundHierarchy hierarchy suggestions found per kind before the vocabulary and the minimum score
     * @param notes        kinds that did not run and why, and other things worth saying
     * @param elapsed      time spent in {@link Builder#build()}
     */
    public record Summary(int candidates, long listingsRead, Map<Suggestion.Kind, Integer> found,
                          Map<HierarchySuggestion.Kind, Integer> foundHierarchy, List<String> notes, Duration elapsed) {
        public Summary {
            found = Collections.unmodifiableMap(new EnumMap<>(found.isEmpty() ? new EnumMap<>(Suggestion.Kind.class) : found));
            foundHierarchy = Collections.unmodifiableMap(new EnumMap<>(foundHierarchy.isEmpty()
                    ? new EnumMap<>(HierarchySuggestion.Kind.class) : foundHierarchy));
            notes = List.copyOf(notes);
            Objects.requireNonNull(elapsed, "elapsed");
        }
    }

    /**
     * Collects the inputs. Feed listings with {@link #accept} (thread-safe) before {@link #build()};
     * listings fed after {@code build} are an error.
     */
    public static final class Builder implements Consumer<Listing> {
        private final Harvest harvest;
        private Vocabulary vocabulary;
        private SuggestOptions options = SuggestOptions.defaults();
        private AnalysisProfile profile;
        private EvidenceIndex index;
        private Corpus corpus;
        private boolean built;

        private Builder(Harvest harvest) {
            this.harvest = Objects.requireNonNull(harvest, "harvest");
        }

        /** The vocabulary whose decisions and labels filter the suggestions (default: none). */
        public Builder vocabulary(Vocabulary v) {
            this.vocabulary = v;
            return this;
        }

        public Builder options(SuggestOptions o) {
            this.options = Objects.requireNonNull(o, "options");
            return this;
        }

        /**
         * The analysis profile that maps written forms to the harvest's terms. Default: the profile
         * the harvest records it was mined with. Set it before the first {@link #accept}.
         */
        public Builder profile(AnalysisProfile p) {
            if (corpus != null) {
                throw new IllegalStateException("set the profile before feeding listings");
            }
            this.profile = Objects.requireNonNull(p, "profile");
            return this;
        }

        /** An evidence index of the same listings: evidence lines for every member come from it (default: the harvest's lines). */
        public Builder evidenceIndex(EvidenceIndex idx) {
            this.index = idx;
            return this;
        }

        /** Feeds one listing of the corpus the harvest was mined from. Thread-safe. */
        @Override
        public void accept(Listing listing) {
            corpus().accept(listing);
        }

        /** Feeds every listing of an iterable. */
        public Builder listings(Iterable<Listing> listings) {
            for (Listing l : listings) {
                accept(l);
            }
            return this;
        }

        private synchronized Corpus corpus() {
            if (built) {
                throw new IllegalStateException("listings were fed after build()");
            }
            if (corpus == null) {
                corpus = new Corpus(catalogFor(), options);
            }
            return corpus;
        }

        private Catalog catalog;

        private synchronized Catalog catalogFor() {
            if (catalog == null) {
                AnalysisProfile p = profile != null ? profile
                        : AnalysisProfile.fromJson(harvest.parameters().profile().toString(), "the harvest's profile");
                catalog = new Catalog(harvest, Analysis.of(p));
            }
            return catalog;
        }

        /** Runs every kind and returns the suggester. */
        public Suggester build() {
            long t0 = System.nanoTime();
            Catalog c;
            Corpus cp;
            synchronized (this) {
                c = catalogFor();
                cp = corpus;
                built = true;
            }
            List<String> notes = new ArrayList<>();
            Kinds.Timer time = new Kinds.Timer();
            Corpus.Result counts = cp == null ? null : cp.finish();
            time.lap("adding up the listing counts");
            Proposals p = new Proposals();
            Map<Suggestion.Kind, Integer> found = new EnumMap<>(Suggestion.Kind.class);
            Set<Suggestion.Kind> kinds = options.kinds();
            Kinds.run(c, counts, options, p, found, notes);
            List<Suggestion> raw = Kinds.toSuggestions(c, p, options, index);
            time.lap("merge kinds and evidence");
            Map<HierarchySuggestion.Kind, Integer> foundH = new EnumMap<>(HierarchySuggestion.Kind.class);
            List<HierarchySuggestion> rawH = Hierarchy.run(c, counts, options, foundH, notes, index);
            time.lap("hierarchy kinds");
            notes.add("time: " + time);
            Summary s = new Summary(c.size(), counts == null ? 0 : counts.listings(), found, foundH, notes,
                    Duration.ofNanos(System.nanoTime() - t0));
            return new Suggester(c, options, raw, rawH, decide(c, vocabulary), s);
        }
    }

    private static Decided decide(Catalog c, Vocabulary v) {
        return v == null ? Decided.NONE : new Decided(v, c::formOf);
    }

    private Set<String> formsOf(String text) {
        Set<String> forms = new HashSet<>();
        forms.add(text);
        String f = catalog.formOf(text);
        if (f != null) {
            forms.add(f);
            String concept = decided.conceptOf(f);
            if (concept != null) {
                for (Suggestion s : suggestions) {
                    for (Suggestion.Member m : s.members()) {
                        if (concept.equals(m.conceptId())) {
                            forms.add(m.term());
                        }
                    }
                }
            }
        }
        return forms;
    }

    /** The suggestion with the vocabulary's concepts filled in, or null when nothing undecided is left. */
    static Suggestion filter(Suggestion r, Decided d) {
        List<Suggestion.Member> ms = new ArrayList<>();
        for (Suggestion.Member m : r.members()) {
            if (!d.dropped(m.term())) {
                ms.add(new Suggestion.Member(m.term(), m.shown(), d.conceptOf(m.term()), m.frequency(), m.df()));
            }
        }
        if (ms.size() < 2) {
            return null;
        }
        // parts: one per concept, one per free term; a pair of parts is undecided unless two concepts were kept apart
        LinkedHashMap<String, String> parts = new LinkedHashMap<>();
        for (Suggestion.Member m : ms) {
            parts.putIfAbsent(m.conceptId() != null ? "c:" + m.conceptId() : "t:" + m.term(), m.conceptId());
        }
        if (parts.size() < 2) {
            return null;
        }
        List<String> ids = new ArrayList<>(parts.values());
        boolean open = false;
        for (int i = 0; i < ids.size() && !open; i++) {
            for (int j = i + 1; j < ids.size(); j++) {
                if (ids.get(i) == null || ids.get(j) == null || !d.keptApart(ids.get(i), ids.get(j))) {
                    open = true;
                    break;
                }
            }
        }
        if (!open) {
            return null;
        }
        return new Suggestion(r.kind(), ms, r.score(), r.reason(), r.support(), r.evidence());
    }

    static HierarchySuggestion filter(HierarchySuggestion r, Decided d) {
        if (d.dropped(r.child().term()) || (!r.parent().facet() && d.dropped(r.parent().term()))) {
            return null;
        }
        String cp = r.parent().facet() ? r.parent().conceptId() : d.conceptOf(r.parent().term());
        if (r.parent().facet() && cp == null) {
            cp = d.conceptOf(r.parent().term());
        }
        String cc = d.conceptOf(r.child().term());
        if (cp != null && cc != null && (cp.equals(cc) || d.under(cc, cp) || d.keptApart(cc, cp))) {
            return null;
        }
        HierarchySuggestion.Node parent = new HierarchySuggestion.Node(r.parent().term(), r.parent().shown(), cp, r.parent().facet());
        HierarchySuggestion.Node child = new HierarchySuggestion.Node(r.child().term(), r.child().shown(), cc, r.child().facet());
        return new HierarchySuggestion(r.kind(), parent, child, r.score(), r.reason(), r.counts(), r.evidence());
    }

    private static long totalFrequency(Suggestion s) {
        long t = 0;
        for (Suggestion.Member m : s.members()) {
            t += m.frequency();
        }
        return t;
    }

    /** Evidence lines for a list of terms: the first line of each in turn, from the index when there is one. */
    static List<EvidenceLine> evidence(Catalog c, List<String> terms, List<EvidenceLine> first, int limit, EvidenceIndex index) {
        List<EvidenceLine> out = new ArrayList<>();
        for (EvidenceLine e : first) {
            if (out.size() < limit) {
                out.add(e);
            }
        }
        for (int round = 0; out.size() < limit && round < limit; round++) {
            boolean any = false;
            for (String t : terms) {
                if (out.size() >= limit) {
                    break;
                }
                List<EvidenceLine> lines;
                if (index != null) {
                    try {
                        lines = index.lines(t, round + 1);
                    } catch (IOException e) {
                        throw new UncheckedIOException("reading evidence for '" + t + "' from " + index.folder(), e);
                    }
                } else {
                    int i = c.indexOf(t);
                    lines = i < 0 ? List.of() : c.evidence(i);
                }
                if (round < lines.size()) {
                    any = true;
                    if (!out.contains(lines.get(round))) {
                        out.add(lines.get(round));
                    }
                }
            }
            if (!any) {
                break;
            }
        }
        return out;
    }
}
