package dev.sheaf.curator.harvest;

import dev.sheaf.curator.session.Notice;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ConceptLabel;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.EditRefusedException;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.Provenance;
import dev.sheaf.vocab.Terms;
import dev.sheaf.vocab.Vocabulary;
import java.io.UncheckedIOException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Consumer;
import java.util.function.Predicate;
import javafx.beans.Observable;
import javafx.beans.property.IntegerProperty;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleIntegerProperty;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import javafx.collections.transformation.FilteredList;
import javafx.collections.transformation.SortedList;

/**
 * Triage of the harvest: every candidate as a {@link CandidateRow}, filtered (text, words,
 * category, least score, least frequency, decision state) and sorted, and the decisions keep,
 * keep as a label of the selected concept, drop, park and forget — each on many rows at once and
 * each one undoable step of the vocabulary (an {@link Edit#batch}).
 *
 * <p>Decisions are recorded in the vocabulary's candidate decisions, so a re-mine does not bring
 * dropped terms back; keeping makes a concept whose preferred label is the term (with the term as
 * provenance), or records the concept that already carries the term as a label.
 *
 * <p>Filtering compares precomputed lower-case strings; {@link #lastFilterMillisProperty()} says
 * what the last change of the filter cost (the performance check reads it).
 */
public final class HarvestViewModel {
    /** The reason recorded for a term dropped from the table. */
    public static final String DROP_REASON = "dropped in triage: not an attribute term";

    private final Consumer<Notice> notices;
    private final ObservableList<CandidateRow> rows = FXCollections.observableArrayList(r -> new Observable[] {r.stateProperty()});
    private final FilteredList<CandidateRow> filtered = new FilteredList<>(rows);
    private final SortedList<CandidateRow> sorted = new SortedList<>(filtered);
    private final ObservableList<String> categories = FXCollections.observableArrayList();
    private final StringProperty text = new SimpleStringProperty(this, "text", "");
    private final IntegerProperty words = new SimpleIntegerProperty(this, "words", 0);
    private final StringProperty category = new SimpleStringProperty(this, "category", "");
    private final StringProperty minScore = new SimpleStringProperty(this, "minScore", "");
    private final StringProperty minFrequency = new SimpleStringProperty(this, "minFrequency", "");
    private final ObjectProperty<StateFilter> state = new SimpleObjectProperty<>(this, "state", StateFilter.TO_DECIDE);
    private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper(this, "summary", "");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final ReadOnlyStringWrapper placeholder = new ReadOnlyStringWrapper(this, "placeholder", "No workspace is open.");
    private final ReadOnlyDoubleWrapper lastFilterMillis = new ReadOnlyDoubleWrapper(this, "lastFilterMillis");
    private final CuratorSession.VocabularyListener onChange = c -> refreshStates(c.after());
    private CuratorSession session;

    public HarvestViewModel(Consumer<Notice> notices) {
        this.notices = Objects.requireNonNull(notices);
        text.addListener((o, a, b) -> refilter());
        words.addListener((o, a, b) -> refilter());
        category.addListener((o, a, b) -> refilter());
        minScore.addListener((o, a, b) -> refilter());
        minFrequency.addListener((o, a, b) -> refilter());
        state.addListener((o, a, b) -> refilter());
        refilter();
    }

    /** Follows another session (or none). */
    public void setSession(CuratorSession s) {
        if (session != null) {
            session.removeVocabularyListener(onChange);
        }
        session = s;
        if (s != null) {
            s.addVocabularyListener(onChange);
            s.harvestProperty().addListener((o, a, b) -> {
                if (session == s) {
                    load(b);
                }
            });
            load(s.harvest());
        } else {
            load(null);
        }
    }

    private void load(Harvest h) {
        List<CandidateRow> list = new ArrayList<>();
        TreeSet<String> cats = new TreeSet<>();
        if (h != null) {
            for (Harvest.Candidate c : h.candidates()) {
                list.add(new CandidateRow(c));
            }
            for (Harvest.CategoryCount cc : h.corpus().categories()) {
                if (!cc.name().isEmpty()) {
                    cats.add(cc.name());
                }
            }
        }
        List<String> catList = new ArrayList<>();
        catList.add("");
        catList.addAll(cats);
        categories.setAll(catList);
        if (!categories.contains(category.get())) {
            category.set("");
        }
        if (session != null) {
            states(list, session.vocabulary());
        }
        rows.setAll(list);
        placeholder.set(session == null ? "No workspace is open." : h == null ? "No harvest yet: mining the listings…"
                : "No candidate matches the filter.");
        refilter();
    }

    // ------------------------------------------------------------------ filter

    private void refilter() {
        long t0 = System.nanoTime();
        String t = text.get() == null ? "" : text.get().strip().toLowerCase(Locale.ROOT);
        int w = words.get();
        String cat = category.get() == null ? "" : category.get();
        double ms = parse(minScore.get(), Double.NaN);
        double mf = parse(minFrequency.get(), 0);
        StateFilter sf = state.get() == null ? StateFilter.ALL : state.get();
        Predicate<CandidateRow> p = r -> sf.accepts(r.state())
                && (w == 0 || r.words() == w)
                && (mf <= 0 || r.frequency() >= mf)
                && (Double.isNaN(ms) || r.score() >= ms)
                && (cat.isEmpty() || hasCategory(r, cat))
                && (t.isEmpty() || r.lower.contains(t));
        filtered.setPredicate(p);
        lastFilterMillis.set((System.nanoTime() - t0) / 1e6);
        updateSummary();
    }

    private static boolean hasCategory(CandidateRow r, String cat) {
        for (String c : r.categories) {
            if (c.equals(cat)) {
                return true;
            }
        }
        return false;
    }

    private static double parse(String s, double none) {
        if (s == null || s.isBlank()) {
            return none;
        }
        try {
            return Double.parseDouble(s.strip().replace(',', '.'));
        } catch (NumberFormatException e) {
            return none;
        }
    }

    /** Clears every filter except the decision state. */
    public void clearFilters() {
        text.set("");
        words.set(0);
        category.set("");
        minScore.set("");
        minFrequency.set("");
    }

    private void updateSummary() {
        EnumMap<DecisionState, Integer> n = new EnumMap<>(DecisionState.class);
        for (CandidateRow r : rows) {
            n.merge(r.state(), 1, Integer::sum);
        }
        summary.set(String.format(Locale.ROOT, "%,d of %,d shown · to decide %,d · kept %,d · dropped %,d · parked %,d · in vocabulary %,d",
                filtered.size(), rows.size(), n.getOrDefault(DecisionState.UNDECIDED, 0), n.getOrDefault(DecisionState.KEPT, 0),
                n.getOrDefault(DecisionState.DROPPED, 0), n.getOrDefault(DecisionState.PARKED, 0),
                n.getOrDefault(DecisionState.IN_VOCABULARY, 0)));
    }

    // ------------------------------------------------------------------ states

    private void refreshStates(Vocabulary v) {
        states(rows, v);
        updateSummary();
    }

    /**
     * Normalised forms of decision terms and labels, kept across refreshes: the texts barely change
     * from one edit to the next, and normalising (NFKC, case, separators) is what a refresh would
     * otherwise spend its time on with thousands of concepts. Bounded by the distinct texts seen.
     */
    private final Map<String, String> keys = new HashMap<>();

    private String key(String text) {
        return keys.computeIfAbsent(text, Terms::normalise);
    }

    /** Each row's state from the vocabulary's decisions and labels. */
    private void states(List<CandidateRow> list, Vocabulary v) {
        Map<String, Decision> decisions = new HashMap<>();
        for (Decision d : v.decisions()) {
            decisions.put(key(d.term()), d);
        }
        Map<String, String> labelled = new HashMap<>();
        for (Concept c : v.allConcepts()) {
            for (String p : c.prefLabels().values()) {
                labelled.putIfAbsent(key(p), c.id());
            }
            for (Label l : c.altLabels()) {
                labelled.putIfAbsent(key(l.text()), c.id());
            }
            for (Label l : c.hiddenLabels()) {
                labelled.putIfAbsent(key(l.text()), c.id());
            }
        }
        for (CandidateRow r : list) {
            Decision d = decisions.get(r.key);
            if (d != null) {
                DecisionState s = d.outcome() == Decision.Outcome.KEPT ? DecisionState.KEPT
                        : d.outcome() == Decision.Outcome.DROPPED ? DecisionState.DROPPED : DecisionState.PARKED;
                String cid = d.concept();
                r.update(s, cid, cid == null ? "" : v.displayLabel(cid));
            } else {
                String cid = labelled.get(r.key);
                r.update(cid == null ? DecisionState.UNDECIDED : DecisionState.IN_VOCABULARY, cid, cid == null ? "" : v.displayLabel(cid));
            }
        }
    }

    // ------------------------------------------------------------------ intents

    /** Shows a row's term in the details and evidence panels. */
    public void select(CandidateRow r) {
        if (session != null) {
            session.selection().selectTerm(r == null ? null : r.term());
        }
    }

    /** Keeps each term: a new concept named by it, or — when a concept already has it as a label — that concept. */
    public boolean keep(List<CandidateRow> picked) {
        if (session == null) {
            return false;
        }
        Vocabulary v = session.vocabulary();
        String lang = v.defaultLanguage();
        Instant now = Instant.now();
        List<Edit> edits = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        int made = 0;
        int joined = 0;
        for (CandidateRow r : distinct(picked)) {
            if (r.state() == DecisionState.KEPT) {
                continue;
            }
            String cid = r.state() == DecisionState.IN_VOCABULARY ? r.conceptId() : null;
            if (cid == null) {
                cid = freshId(v, r.term(), ids);
                edits.add(Edit.addConcept(Concept.builder(cid).prefLabel(Label.of(r.term(), lang))
                        .provenance(new Provenance(r.term(), now, null)).build()));
                made++;
            } else {
                joined++;
            }
            edits.add(Edit.recordDecision(Decision.kept(r.term(), cid).at(now, null)));
        }
        if (edits.isEmpty()) {
            message.set("Already kept.");
            return false;
        }
        String what = made + joined == 1
                ? (made == 1 ? "Keep \"" + picked.get(0).term() + "\" as a new concept" : "Keep \"" + picked.get(0).term() + "\" (already a label)")
                : String.format(Locale.ROOT, "Keep %d terms (%d new concepts)", made + joined, made);
        return run(what, edits, what + ".");
    }

    /** Adds each term as an alternative label of the selected concept and records it as kept there. */
    public boolean keepAsLabel(List<CandidateRow> picked) {
        if (session == null) {
            return false;
        }
        String target = session.selection().concept();
        Vocabulary v = session.vocabulary();
        if (target == null || v.concept(target).isEmpty()) {
            notices.accept(new Notice(Notice.Kind.WARNING, "No concept selected",
                    "Select the concept in the vocabulary first, then press Shift+K to add the term as its label."));
            return false;
        }
        Concept c = v.concept(target).get();
        String lang = v.defaultLanguage();
        Instant now = Instant.now();
        List<Edit> edits = new ArrayList<>();
        for (CandidateRow r : distinct(picked)) {
            Label l = Label.of(r.term(), lang);
            boolean has = false;
            for (ConceptLabel cl : c.labels()) {
                has |= Terms.normalise(cl.text()).equals(r.key);
            }
            if (!has) {
                edits.add(Edit.addLabel(target, LabelKind.ALTERNATIVE, l));
            }
            if (r.state() != DecisionState.KEPT || !target.equals(r.conceptId())) {
                edits.add(Edit.recordDecision(Decision.kept(r.term(), target).at(now, null)));
            }
        }
        if (edits.isEmpty()) {
            message.set("Already a label of " + c.displayLabel(lang) + ".");
            return false;
        }
        String what = picked.size() == 1 ? "Keep \"" + picked.get(0).term() + "\" as a label of " + c.displayLabel(lang)
                : String.format(Locale.ROOT, "Keep %d terms as labels of %s", picked.size(), c.displayLabel(lang));
        return run(what, edits, what + ".");
    }

    /** Drops each term; the decision is remembered so a re-mine does not bring it back. */
    public boolean drop(List<CandidateRow> picked) {
        return decide(picked, DecisionState.DROPPED, r -> Decision.dropped(r.term(), DROP_REASON), "Drop");
    }

    /** Parks each term (decide later). */
    public boolean park(List<CandidateRow> picked) {
        return decide(picked, DecisionState.PARKED, r -> Decision.parked(r.term()), "Park");
    }

    /** Forgets the decision on each term (a concept made by keeping it stays). */
    public boolean forget(List<CandidateRow> picked) {
        if (session == null) {
            return false;
        }
        List<Edit> edits = new ArrayList<>();
        for (CandidateRow r : distinct(picked)) {
            if (session.vocabulary().decision(r.term()).isPresent()) {
                edits.add(Edit.clearDecision(r.term()));
            }
        }
        if (edits.isEmpty()) {
            message.set("No decision to forget.");
            return false;
        }
        String what = edits.size() == 1 ? "Forget the decision on \"" + picked.get(0).term() + "\""
                : String.format(Locale.ROOT, "Forget %d decisions", edits.size());
        return run(what, edits, what + ".");
    }

    private boolean decide(List<CandidateRow> picked, DecisionState to, java.util.function.Function<CandidateRow, Decision> make,
                           String verb) {
        if (session == null) {
            return false;
        }
        Instant now = Instant.now();
        List<Edit> edits = new ArrayList<>();
        String first = null;
        for (CandidateRow r : distinct(picked)) {
            if (r.state() != to) {
                edits.add(Edit.recordDecision(make.apply(r).at(now, null)));
                first = first == null ? r.term() : first;
            }
        }
        if (edits.isEmpty()) {
            message.set("Nothing to change.");
            return false;
        }
        String what = edits.size() == 1 ? verb + " \"" + first + "\"" : String.format(Locale.ROOT, "%s %d terms", verb, edits.size());
        return run(what, edits, what + ".");
    }

    private boolean run(String description, List<Edit> edits, String done) {
        try {
            session.apply(Edit.batch(description, edits));
            message.set(done + " Undo: Ctrl+Z.");
            return true;
        } catch (EditRefusedException | UncheckedIOException e) {
            notices.accept(new Notice(Notice.Kind.WARNING, "Not done: " + description, e.getMessage()));
            return false;
        }
    }

    private static List<CandidateRow> distinct(List<CandidateRow> picked) {
        List<CandidateRow> out = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        for (CandidateRow r : picked) {
            if (r != null && seen.add(r.key)) {
                out.add(r);
            }
        }
        return out;
    }

    /** A new concept id for a term, unique in the vocabulary and among ids this batch already took. */
    static String freshId(Vocabulary v, String term, Set<String> taken) {
        String id = v.newId(term);
        if (!taken.contains(id)) {
            taken.add(id);
            return id;
        }
        String base = Terms.slug(term);
        for (int i = 2; ; i++) {
            String c = base + "-" + i;
            if (!taken.contains(c) && !v.isKnownId(c)) {
                taken.add(c);
                return c;
            }
        }
    }

    // ------------------------------------------------------------------ state for views

    /** Every candidate (unfiltered), in harvest order. */
    public ObservableList<CandidateRow> rows() {
        return rows;
    }

    /** The candidates the table shows: filtered, then sorted by the table's comparator (bind it). */
    public SortedList<CandidateRow> shown() {
        return sorted;
    }

    /** "" (any) and the harvest's categories. */
    public ObservableList<String> categories() {
        return categories;
    }

    public StringProperty textProperty() {
        return text;
    }

    /** Words in the term; 0 = any. */
    public IntegerProperty wordsProperty() {
        return words;
    }

    /** A category the term is distinctive in; "" = any. */
    public StringProperty categoryProperty() {
        return category;
    }

    /** Least score, as typed ("" = none). */
    public StringProperty minScoreProperty() {
        return minScore;
    }

    /** Least frequency, as typed ("" = none). */
    public StringProperty minFrequencyProperty() {
        return minFrequency;
    }

    public ObjectProperty<StateFilter> stateProperty() {
        return state;
    }

    /** Counts: shown, total and per decision state. */
    public ReadOnlyStringProperty summaryProperty() {
        return summary.getReadOnlyProperty();
    }

    /** What the last action did (for the status bar). */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** What the empty table says. */
    public ReadOnlyStringProperty placeholderProperty() {
        return placeholder.getReadOnlyProperty();
    }

    /** Milliseconds the last filter change took (predicate over every row, then the sort). */
    public ReadOnlyDoubleProperty lastFilterMillisProperty() {
        return lastFilterMillis.getReadOnlyProperty();
    }
}
