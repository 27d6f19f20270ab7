package dev.sheaf.curator.suggestions;

import dev.sheaf.curator.checks.LatestRun;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.curator.session.Selection;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.suggest.HierarchySuggestion;
import dev.sheaf.miner.suggest.SuggestOptions;
import dev.sheaf.miner.suggest.Suggester;
import dev.sheaf.miner.suggest.Suggestion;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.EditRefusedException;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.Executor;
import javafx.application.Platform;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The merge suggestions for what the curator selected (a candidate term or a concept; every
 * suggestion when nothing is selected), with their reasons, and the three answers: accept
 * ({@link #accept}), keep apart ({@link #keepApart}) and dismiss ({@link #dismiss}). Each answer is
 * one undoable edit that the suggestion engine reads back, so an answered suggestion does not come
 * back ({@link MergePlan}).
 *
 * <p>Beside them, the parent suggestions ({@link #parents()}: "zipper" above "two way zipper",
 * a spec key above its values, a term whose listings contain another's) for the same selection,
 * answered by {@link #putUnder} (move there, or also there); an answered one drops out because the
 * engine sees the child under the parent.
 *
 * <p>The {@link Suggester} is built from the session's harvest on a background thread (again when
 * the harvest changes); after each edit it is only filtered against the new vocabulary, which is
 * quick. UI thread only.
 */
public final class SuggestionsViewModel {
    /** Suggestions shown at most when nothing is selected. */
    public static final int MAX_ALL = 300;

    /**
     * One row of the list.
     *
     * @param suggestion the suggestion
     * @param members the members as shown ("rip-stop ⇄ ripstop")
     * @param score the combined score, two decimals
     * @param reason the reason sentence(s)
     * @param kinds the supporting kinds ("spelling-variant, same-group-key")
     */
    public record Row(Suggestion suggestion, String members, String score, String reason, String kinds) {
    }

    /**
     * One parent suggestion as shown.
     *
     * @param suggestion the suggestion
     * @param text "zipper ⊃ two way zipper" (parent first)
     * @param meta "score 0.80 · head-modifier · parent is a concept"
     * @param reason the engine's sentence
     */
    public record ParentRow(HierarchySuggestion suggestion, String text, String meta, String reason) {
    }

    /** Parent suggestions shown at most. */
    public static final int MAX_PARENTS = 200;

    private final CuratorSession session;
    private final ObservableList<ParentRow> parents = FXCollections.observableArrayList();
    private final ObjectProperty<ParentRow> selectedParent = new SimpleObjectProperty<>(this, "selectedParent");
    private final ReadOnlyStringWrapper parentScope = new ReadOnlyStringWrapper(this, "parentScope", "");
    private final LatestRun<Suggester> build;
    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final ObjectProperty<Row> selected = new SimpleObjectProperty<>(this, "selected");
    private final ObservableList<String> choices = FXCollections.observableArrayList();
    private final ObjectProperty<String> preferred = new SimpleObjectProperty<>(this, "preferred");
    private final ReadOnlyStringWrapper scope = new ReadOnlyStringWrapper(this, "scope", "");
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final CuratorSession.VocabularyListener onChange = c -> refilter(c.after());
    private Suggester suggester;

    /** Builds on a daemon thread and reports through {@code Platform::runLater}. */
    public SuggestionsViewModel(CuratorSession session) {
        this(session, LatestRun.onDaemonThread("sheaf-suggestions", Platform::runLater));
    }

    /** With these executors (tests pass {@code Runnable::run} for both). */
    public SuggestionsViewModel(CuratorSession session, Executor worker, Executor ui) {
        this(session, new LatestRun<>(worker, ui));
    }

    private SuggestionsViewModel(CuratorSession session, LatestRun<Suggester> build) {
        this.session = Objects.requireNonNull(session);
        this.build = build;
        session.addVocabularyListener(onChange);
        Selection sel = session.selection();
        sel.termProperty().addListener((o, a, b) -> show());
        sel.conceptProperty().addListener((o, a, b) -> show());
        sel.focusProperty().addListener((o, a, b) -> show());
        session.harvestProperty().addListener((o, a, b) -> rebuild());
        selected.addListener((o, a, b) -> pickDefault());
        rebuild();
    }

    public void dispose() {
        session.removeVocabularyListener(onChange);
        build.cancel();
    }

    private void rebuild() {
        Harvest h = session.harvest();
        suggester = null;
        rows.clear();
        parents.clear();
        if (h == null) {
            scope.set("No harvest yet: mine the workspace to get merge suggestions");
            parentScope.set("No harvest yet: no parent suggestions");
            return;
        }
        scope.set("Looking for synonyms and variants…");
        Vocabulary v = session.vocabulary();
        build.start(cancelled -> Suggester.builder(h).vocabulary(v).options(SuggestOptions.defaults()).build(), s -> {
            suggester = s.withVocabulary(session.vocabulary());
            show();
        }, e -> scope.set("The suggestions could not be made: " + e.getMessage()));
    }

    private void refilter(Vocabulary after) {
        if (suggester != null) {
            suggester = suggester.withVocabulary(after);
            show();
        }
    }

    /** Lists the suggestions for the current selection. */
    private void show() {
        if (suggester == null) {
            return;
        }
        Selection sel = session.selection();
        Vocabulary v = session.vocabulary();
        List<Suggestion> list;
        if (sel.focus() == Selection.Focus.TERM && sel.term() != null) {
            list = suggester.forTerm(sel.term());
            scope.set(count(list.size()) + " for the term \"" + sel.term() + "\"");
        } else if (sel.focus() == Selection.Focus.CONCEPT && sel.concept() != null && v.contains(sel.concept())) {
            list = suggester.forConcept(sel.concept());
            scope.set(count(list.size()) + " for \"" + v.displayLabel(sel.concept()) + "\"");
        } else {
            List<Suggestion> all = suggester.suggestions();
            list = all.size() > MAX_ALL ? all.subList(0, MAX_ALL) : all;
            scope.set(count(all.size()) + " in all" + (all.size() > MAX_ALL ? " (the best " + MAX_ALL + " shown)" : ""));
        }
        String keep = selected.get() == null ? null : selected.get().suggestion().key();
        List<Row> out = new ArrayList<>(list.size());
        Row again = null;
        for (Suggestion s : list) {
            Row r = row(s);
            out.add(r);
            if (s.key().equals(keep)) {
                again = r;
            }
        }
        rows.setAll(out);
        selected.set(again != null ? again : out.isEmpty() ? null : out.get(0));
        showParents(sel, v);
    }

    private void showParents(Selection sel, Vocabulary v) {
        List<HierarchySuggestion> list;
        String where;
        if (sel.focus() == Selection.Focus.TERM && sel.term() != null) {
            list = suggester.hierarchyForTerm(sel.term());
            where = " for the term \"" + sel.term() + "\"";
        } else if (sel.focus() == Selection.Focus.CONCEPT && sel.concept() != null && v.contains(sel.concept())) {
            list = suggester.hierarchyForConcept(sel.concept());
            where = " for \"" + v.displayLabel(sel.concept()) + "\"";
        } else {
            list = suggester.hierarchy();
            where = " in all";
        }
        int n = list.size();
        if (n > MAX_PARENTS) {
            list = list.subList(0, MAX_PARENTS);
        }
        parentScope.set((n == 1 ? "1 parent suggestion" : n + " parent suggestions") + where
                + (n > MAX_PARENTS ? " (the best " + MAX_PARENTS + " shown)" : ""));
        String keep = selectedParent.get() == null ? null : selectedParent.get().suggestion().key();
        List<ParentRow> out = new ArrayList<>(list.size());
        ParentRow again = null;
        for (HierarchySuggestion h : list) {
            ParentRow r = parentRow(v, h);
            out.add(r);
            if (h.key().equals(keep)) {
                again = r;
            }
        }
        parents.setAll(out);
        selectedParent.set(again != null ? again : out.isEmpty() ? null : out.get(0));
    }

    static ParentRow parentRow(Vocabulary v, HierarchySuggestion h) {
        String parent = h.parent().conceptId() != null && v.contains(h.parent().conceptId()) ? v.displayLabel(h.parent().conceptId())
                : h.parent().shown();
        String child = h.child().conceptId() != null && v.contains(h.child().conceptId()) ? v.displayLabel(h.child().conceptId())
                : h.child().shown();
        boolean ready = h.parent().conceptId() != null && v.contains(h.parent().conceptId());
        String state = ready ? (h.child().conceptId() != null ? "both concepts" : "new term")
                : h.parent().facet() ? "facet not made yet" : "parent not kept yet";
        return new ParentRow(h, parent + " ⊃ " + child, String.format(Locale.ROOT, "score %.2f · %s · %s", h.score(), h.kind().word(), state),
                h.reason());
    }

    private static String count(int n) {
        return n == 1 ? "1 merge suggestion" : n + " merge suggestions";
    }

    static Row row(Suggestion s) {
        List<String> names = new ArrayList<>();
        for (Suggestion.Member m : s.members()) {
            names.add(m.shown());
        }
        List<String> kinds = new ArrayList<>();
        for (Suggestion.Support x : s.support()) {
            kinds.add(x.kind().word());
        }
        return new Row(s, String.join(" ⇄ ", names), String.format(Locale.ROOT, "%.2f", s.score()), s.reason(),
                String.join(", ", kinds));
    }

    private void pickDefault() {
        Row r = selected.get();
        if (r == null) {
            choices.clear();
            preferred.set(null);
            return;
        }
        Vocabulary v = session.vocabulary();
        choices.setAll(MergePlan.preferredChoices(v, r.suggestion()));
        preferred.set(MergePlan.defaultPreferred(v, r.suggestion()));
    }

    // ------------------------------------------------------------------ intents

    /** Merges the selected suggestion's members with the picked preferred label; the next suggestion is selected. */
    public boolean accept() {
        Row r = selected.get();
        if (r == null) {
            return say("Not done: select a suggestion first");
        }
        String pref = preferred.get() == null ? MergePlan.defaultPreferred(session.vocabulary(), r.suggestion()) : preferred.get();
        try {
            return apply(MergePlan.accept(session.vocabulary(), r.suggestion(), pref));
        } catch (EditRefusedException e) {
            return say("Not done: " + String.join("; ", e.problems()));
        }
    }

    /** Records that the members are different things (related concepts), so the suggestion does not come back. */
    public boolean keepApart() {
        Row r = selected.get();
        if (r == null) {
            return say("Not done: select a suggestion first");
        }
        Optional<Edit> e = MergePlan.keepApart(r.suggestion());
        if (e.isEmpty()) {
            return say("Not done: keep apart links two concepts; keep the terms as concepts first (in the harvest), or dismiss");
        }
        return apply(e.get());
    }

    /** Dismisses the selected suggestion: its undecided plain terms are dropped with the reason (all concepts: kept apart). */
    public boolean dismiss() {
        Row r = selected.get();
        if (r == null) {
            return say("Not done: select a suggestion first");
        }
        Optional<Edit> e = MergePlan.dismiss(session.vocabulary(), r.suggestion());
        if (e.isEmpty()) {
            return say("Not done: every member already has a decision; undo it in the harvest first");
        }
        return apply(e.get());
    }

    /** Picks the n-th preferred choice (0-based); false when there is none. */
    public boolean pick(int n) {
        if (n < 0 || n >= choices.size()) {
            return false;
        }
        preferred.set(choices.get(n));
        return true;
    }

    /** Puts the selected parent suggestion's child under its parent: moved there, or with {@code also} one more parent. */
    public boolean putUnder(boolean also) {
        ParentRow r = selectedParent.get();
        if (r == null) {
            return say("Not done: select a parent suggestion first");
        }
        Edit e;
        try {
            e = MergePlan.putUnder(session.vocabulary(), r.suggestion(), also);
        } catch (IllegalArgumentException ex) {
            return say("Not done: " + ex.getMessage());
        }
        return apply(e);
    }

    private boolean apply(Edit e) {
        try {
            String d = e.describe(session.vocabulary());
            session.apply(e);
            return say(d);
        } catch (EditRefusedException ex) {
            return say("Not done: " + String.join("; ", ex.problems()));
        } catch (RuntimeException ex) {
            return say("Not done: " + ex.getMessage());
        }
    }

    private boolean say(String m) {
        message.set(m);
        return !m.startsWith("Not done");
    }

    // ------------------------------------------------------------------ properties

    public ObservableList<Row> rows() {
        return rows;
    }

    /** The suggestion the answers apply to. */
    public ObjectProperty<Row> selectedProperty() {
        return selected;
    }

    /** The labels that may become preferred, for the selected suggestion. */
    public ObservableList<String> preferredChoices() {
        return choices;
    }

    /** The label that becomes preferred on accept. */
    public ObjectProperty<String> preferredProperty() {
        return preferred;
    }

    /** What the list shows ("3 merge suggestions for …"). */
    public ReadOnlyStringProperty scopeProperty() {
        return scope.getReadOnlyProperty();
    }

    /** The parent suggestions for the current selection, best first. */
    public ObservableList<ParentRow> parents() {
        return parents;
    }

    /** The parent suggestion {@link #putUnder} answers. */
    public ObjectProperty<ParentRow> selectedParentProperty() {
        return selectedParent;
    }

    /** What the parent list shows ("4 parent suggestions for …"). */
    public ReadOnlyStringProperty parentScopeProperty() {
        return parentScope.getReadOnlyProperty();
    }

    /** What the last answer did, or why it was not done. */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty buildingProperty() {
        return build.runningProperty();
    }

    /** The suggester in use, or null while it is being built (for tests). */
    Suggester suggester() {
        return suggester;
    }
}
