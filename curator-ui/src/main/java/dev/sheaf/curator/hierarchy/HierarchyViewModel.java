package dev.sheaf.curator.hierarchy;

import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.EditRefusedException;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;

/**
 * The facets and concepts as a tree, and every way of reshaping it: move under another concept
 * or facet (drag and drop, cut and paste), indent under the row above, outdent, put a concept
 * also under a second parent, make a facet or a concept, rename. Every change is one
 * {@link Edit} through the session, so undo and redo take it back.
 *
 * <p>The tree is handed out one level at a time ({@link #children}), so a view builds rows only
 * for what the curator opens; after each change {@link #addTreeListener listeners} hear which
 * parents and rows changed ({@link TreeChange}), found by comparing the snapshots before and
 * after, so a 5,000-concept tree updates a few rows instead of rebuilding.
 *
 * <p>Siblings are ordered by preferred label (the vocabulary keeps no order among siblings; a
 * curator finds a value by its name). The top level shows facets first, then values under no
 * facet. UI thread only.
 */
public final class HierarchyViewModel {
    /** The parent key of the top level in {@link TreeChange#parents()}. */
    public static final String TOP = "";

    private final CuratorSession session;
    private final List<Consumer<TreeChange>> listeners = new CopyOnWriteArrayList<>();
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper(this, "message", "");
    private final ReadOnlyObjectWrapper<Placed> cut = new ReadOnlyObjectWrapper<>(this, "cut");
    private final CuratorSession.VocabularyListener onChange = this::changed;
    /** Case-insensitive, spaces counting ("Water protection" before "Waterproof rating"). */
    private final Comparator<String> collator = Comparator.comparing((String s) -> s.toLowerCase(Locale.ROOT)).thenComparing(s -> s);

    /** What the name prompt above the tree is asking for. */
    public enum Prompt {
        NONE(""), NEW_FACET("New facet"), NEW_CONCEPT("New concept under the selection"), RENAME("Rename");

        private final String title;

        Prompt(String title) {
            this.title = title;
        }

        /** The words shown before the name field. */
        public String title() {
            return title;
        }
    }

    private final ReadOnlyObjectWrapper<Prompt> prompt = new ReadOnlyObjectWrapper<>(this, "prompt", Prompt.NONE);
    private final StringProperty promptText = new SimpleStringProperty(this, "promptText", "");
    private Placed promptTarget;

    /** A concept as placed under one parent (null at the top): what a drag or a cut carries. */
    public record Placed(String id, String parent) {
        public Placed {
            Objects.requireNonNull(id, "id");
        }
    }

    public HierarchyViewModel(CuratorSession session) {
        this.session = Objects.requireNonNull(session);
        session.addVocabularyListener(onChange);
    }

    /** Stops listening to the session. */
    public void dispose() {
        session.removeVocabularyListener(onChange);
    }

    private Vocabulary v() {
        return session.vocabulary();
    }

    // ------------------------------------------------------------------ reading the tree

    /** The rows directly under {@code parent} ({@link #TOP} or null for the top level): facets first, then by label. */
    public List<TreeNode> children(String parent) {
        Vocabulary v = v();
        List<TreeNode> out = new ArrayList<>();
        if (parent == null || parent.equals(TOP)) {
            for (Concept f : v.facets()) {
                out.add(node(v, f, null));
            }
            for (Concept c : v.concepts()) {
                if (c.broader().isEmpty()) {
                    out.add(node(v, c, null));
                }
            }
        } else {
            for (Concept c : v.narrower(parent)) {
                out.add(node(v, c, parent));
            }
        }
        out.sort(Comparator.comparing((TreeNode n) -> !n.facet()).thenComparing(TreeNode::label, collator)
                .thenComparing(TreeNode::id));
        return out;
    }

    /** The row of {@code id} under {@code parent}, if it is there. */
    public Optional<TreeNode> node(String id, String parent) {
        Vocabulary v = v();
        return v.concept(id).map(c -> node(v, c, parent == null || parent.equals(TOP) ? null : parent));
    }

    private TreeNode node(Vocabulary v, Concept c, String parent) {
        List<String> also = new ArrayList<>();
        for (String b : c.broader()) {
            if (!b.equals(parent) && v.contains(b)) {
                also.add(v.displayLabel(b));
            }
        }
        also.sort(collator);
        return new TreeNode(c.id(), c.displayLabel(v.defaultLanguage()), c.isFacet(), parent, also,
                v.narrower(c.id()).size(), isRegulated(v, c.id()), !c.isFacet() && c.broader().isEmpty());
    }

    /** Whether {@code id} is, or sits in, a facet marked as a regulated claim. */
    static boolean isRegulated(Vocabulary v, String id) {
        for (Concept f : v.facetsOf(id)) {
            if (f.facet().regulatedClaim()) {
                return true;
            }
        }
        return false;
    }

    /**
     * The ids from the top down to {@code id} (inclusive), following the first broader concept by
     * id at each step; empty for an unknown id. The view opens these rows to show a concept.
     */
    public List<String> pathTo(String id) {
        Vocabulary v = v();
        List<String> up = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        String cur = id;
        while (cur != null && v.contains(cur) && seen.add(cur)) {
            up.add(0, cur);
            SortedSet<String> b = v.concept(cur).get().broader();
            cur = null;
            for (String x : b) {
                if (v.contains(x)) {
                    cur = x;
                    break;
                }
            }
        }
        return up;
    }

    // ------------------------------------------------------------------ change events

    /** Hears which parents and rows changed after every edit, undo and redo (UI thread). */
    public void addTreeListener(Consumer<TreeChange> l) {
        listeners.add(Objects.requireNonNull(l));
    }

    public void removeTreeListener(Consumer<TreeChange> l) {
        listeners.remove(l);
    }

    private void changed(CuratorSession.VocabularyChange c) {
        if (c.action() != dev.sheaf.vocab.EditHistory.Action.DO) {
            message.set(""); // the status bar says what was undone or redone; our last message is no longer true
        }
        TreeChange t = diff(c.before(), c.after());
        if (!t.isEmpty()) {
            for (Consumer<TreeChange> l : listeners) {
                l.accept(t);
            }
        }
    }

    /**
     * The parents and rows that differ between two snapshots. Unchanged concepts are shared
     * between snapshots, so this is one pass of identity checks over the concepts.
     */
    static TreeChange diff(Vocabulary before, Vocabulary after) {
        Set<String> changed = new LinkedHashSet<>();
        Map<String, Concept> a = after.conceptMap();
        Map<String, Concept> b = before.conceptMap();
        for (Map.Entry<String, Concept> e : a.entrySet()) {
            if (!Objects.equals(b.get(e.getKey()), e.getValue())) {
                changed.add(e.getKey());
            }
        }
        for (String id : b.keySet()) {
            if (!a.containsKey(id)) {
                changed.add(id);
            }
        }
        Set<String> parents = new HashSet<>();
        Set<String> rows = new HashSet<>();
        for (String id : changed) {
            Concept old = b.get(id);
            Concept now = a.get(id);
            parentsOf(old, parents);
            parentsOf(now, parents);
            rows.add(id);
            if (old != null && now != null && old.isFacet() && now.isFacet()
                    && old.facet().regulatedClaim() != now.facet().regulatedClaim()) {
                rows.addAll(after.descendants(id));
            }
            // rows under a relabelled concept name it in their "also under" note
            for (Concept n : after.narrower(id)) {
                rows.add(n.id());
            }
            if (now != null && old != null && !old.broader().equals(now.broader())) {
                // a move can bring a subtree into or out of a regulated facet
                rows.addAll(after.descendants(id));
            }
        }
        rows.addAll(parents);
        rows.remove(TOP);
        return new TreeChange(parents, rows);
    }

    private static void parentsOf(Concept c, Set<String> out) {
        if (c == null) {
            return;
        }
        if (c.broader().isEmpty()) {
            out.add(TOP);
        } else {
            out.addAll(c.broader());
        }
    }

    // ------------------------------------------------------------------ selection

    /** Selects a concept or facet for every panel (null clears). */
    public void select(String id) {
        session.selection().selectConcept(id);
    }

    /** The selected concept id (shared with every panel). */
    public ReadOnlyObjectProperty<String> selectedIdProperty() {
        return session.selection().conceptProperty();
    }

    public String selected() {
        return session.selection().concept();
    }

    // ------------------------------------------------------------------ intents

    /** What the last intent did, or why it was not done; for the status line. */
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    /** The concept waiting to be pasted, or null. */
    public ReadOnlyObjectProperty<Placed> cutProperty() {
        return cut.getReadOnlyProperty();
    }

    /** Whether {@code what} may be dropped on {@code target}: not a facet, not onto itself or below itself, not already there. */
    public boolean canMoveUnder(Placed what, String target) {
        Vocabulary v = v();
        Optional<Concept> c = v.concept(what.id());
        if (c.isEmpty() || c.get().isFacet() || target == null || !v.contains(target) || target.equals(what.id())) {
            return false;
        }
        return !c.get().broader().contains(target) && !v.descendants(what.id()).contains(target);
    }

    /** Moves a concept from the parent it was dragged from (other parents stay) to {@code target}. */
    public boolean moveUnder(Placed what, String target) {
        Vocabulary v = v();
        Optional<Concept> c = v.concept(what.id());
        if (c.isEmpty()) {
            return refuse("nothing to move: " + what.id() + " is no longer in the vocabulary");
        }
        if (c.get().isFacet()) {
            return refuse("\"" + c.get().displayLabel(v.defaultLanguage()) + "\" is a facet; facets stay at the top");
        }
        if (target == null || !v.contains(target)) {
            return refuse("pick a concept or facet to move \"" + v.displayLabel(what.id()) + "\" under");
        }
        TreeSet<String> broader = new TreeSet<>(c.get().broader());
        if (what.parent() != null) {
            broader.remove(what.parent());
        }
        broader.add(target);
        return apply(Edit.move(what.id(), broader));
    }

    /** Puts a concept also under {@code target}, keeping its other parents (polyhierarchy). */
    public boolean alsoUnder(String id, String target) {
        return apply(Edit.addBroader(id, target));
    }

    /** Takes a concept out from under one of its several parents. */
    public boolean notUnder(Placed what) {
        Vocabulary v = v();
        Optional<Concept> c = v.concept(what.id());
        if (c.isEmpty() || what.parent() == null) {
            return refuse("select a concept under a parent first");
        }
        if (c.get().broader().size() < 2) {
            return refuse("\"" + v.displayLabel(what.id()) + "\" has only this parent; move it instead");
        }
        return apply(Edit.removeBroader(what.id(), what.parent()));
    }

    /** Marks a concept to be moved by {@link #paste}. */
    public void cut(Placed what) {
        Vocabulary v = v();
        if (v.concept(what.id()).map(Concept::isFacet).orElse(true)) {
            refuse("facets stay at the top; cut a concept instead");
            return;
        }
        cut.set(what);
        message.set("Cut \"" + v.displayLabel(what.id()) + "\": select where it goes and paste (Ctrl+V)");
    }

    /** Moves the cut concept under {@code target} and selects it there, so the curator sees where it went. */
    public boolean paste(String target) {
        Placed p = cut.get();
        if (p == null) {
            return refuse("nothing is cut; cut a concept first (Ctrl+X)");
        }
        if (!canMoveUnder(p, target)) {
            return refuse("\"" + v().displayLabel(p.id()) + "\" cannot go under \"" + v().displayLabel(target)
                    + "\" (it is there already, is the concept itself, or sits above it)");
        }
        boolean ok = moveUnder(p, target);
        if (ok) {
            cut.set(null);
            select(p.id());
        }
        return ok;
    }

    /** Moves a concept under the sibling shown just above it. */
    public boolean indent(Placed what) {
        List<TreeNode> siblings = children(what.parent());
        int i = indexOf(siblings, what.id());
        if (i < 0) {
            return refuse("select a concept first");
        }
        if (siblings.get(i).facet()) {
            return refuse("facets stay at the top");
        }
        int j = i - 1;
        while (j >= 0 && siblings.get(j).facet() && what.parent() != null) {
            j--;
        }
        if (j < 0) {
            return refuse("\"" + siblings.get(i).label() + "\" is first among its siblings; there is nothing above to put it under");
        }
        return moveUnder(what, siblings.get(j).id());
    }

    /** Moves a concept one level up: from its parent to its parent's parents. */
    public boolean outdent(Placed what) {
        Vocabulary v = v();
        Optional<Concept> c = v.concept(what.id());
        if (c.isEmpty() || what.parent() == null) {
            return refuse("that is already at the top");
        }
        Concept parent = v.concept(what.parent()).orElse(null);
        if (parent == null) {
            return refuse("select a concept first");
        }
        if (parent.isFacet()) {
            return refuse("\"" + c.get().displayLabel(v.defaultLanguage()) + "\" is directly under the facet \""
                    + parent.displayLabel(v.defaultLanguage()) + "\"; drag it to another facet to change facets");
        }
        TreeSet<String> broader = new TreeSet<>(c.get().broader());
        broader.remove(parent.id());
        broader.addAll(parent.broader());
        return apply(Edit.move(what.id(), broader));
    }

    /** Makes a new facet (term values, single-valued, every category) and selects it; returns its id, or null when refused. */
    public String newFacet(String label) {
        return add(label, null, true);
    }

    /** Makes a new concept under {@code parent} and selects it; returns its id, or null when refused. */
    public String newConcept(String label, String parent) {
        if (parent == null || !v().contains(parent)) {
            refuse("select the facet or concept the new concept goes under");
            return null;
        }
        return add(label, parent, false);
    }

    private String add(String label, String parent, boolean facet) {
        String text = label == null ? "" : label.strip();
        if (text.isEmpty()) {
            refuse("type a name first");
            return null;
        }
        Vocabulary v = v();
        String id = v.newId(text);
        if (id.isEmpty()) {
            refuse("\"" + text + "\" has no letters or digits to make an id from; use another name");
            return null;
        }
        Concept.Builder b = Concept.builder(id).prefLabel(Label.of(text, v.defaultLanguage()));
        if (facet) {
            b.facet(FacetProperties.terms());
        } else {
            b.broader(parent);
        }
        if (!apply(Edit.addConcept(b.build()))) {
            return null;
        }
        select(id);
        return id;
    }

    /** Renames a concept or facet; the old name stays as an alternative label so listings that use it still match. */
    public boolean rename(String id, String label) {
        String text = label == null ? "" : label.strip();
        if (text.isEmpty()) {
            return refuse("a name cannot be empty");
        }
        Vocabulary v = v();
        if (!v.contains(id)) {
            return refuse("select a concept first");
        }
        if (text.equals(v.displayLabel(id))) {
            return refuse("the name is unchanged");
        }
        return apply(Edit.rename(id, Label.of(text, v.defaultLanguage()), true));
    }

    // ------------------------------------------------------------------ the name prompt

    /** What the name prompt asks for ({@link Prompt#NONE} when it is hidden). */
    public ReadOnlyObjectProperty<Prompt> promptProperty() {
        return prompt.getReadOnlyProperty();
    }

    /** The name typed into the prompt. */
    public StringProperty promptTextProperty() {
        return promptText;
    }

    /** Asks for the name of a new facet. */
    public void beginNewFacet() {
        begin(Prompt.NEW_FACET, null, "");
    }

    /** Asks for the name of a new concept under {@code under} (a facet or concept). */
    public void beginNewConcept(Placed under) {
        if (under == null) {
            refuse("select the facet or concept the new concept goes under");
            return;
        }
        begin(Prompt.NEW_CONCEPT, under, "");
    }

    /** Asks for a new name of {@code what}, starting from its current one. */
    public void beginRename(Placed what) {
        if (what == null || !v().contains(what.id())) {
            refuse("select what to rename first");
            return;
        }
        begin(Prompt.RENAME, what, v().displayLabel(what.id()));
    }

    private void begin(Prompt p, Placed target, String text) {
        promptTarget = target;
        promptText.set(text);
        prompt.set(p);
    }

    /** Does what the prompt asked with the typed name; the prompt stays open when the edit is refused. */
    public boolean commitPrompt() {
        Prompt p = prompt.get();
        String text = promptText.get();
        boolean ok = switch (p) {
            case NONE -> false;
            case NEW_FACET -> newFacet(text) != null;
            case NEW_CONCEPT -> newConcept(text, promptTarget.id()) != null;
            case RENAME -> rename(promptTarget.id(), text);
        };
        if (ok) {
            cancelPrompt();
        }
        return ok;
    }

    /** Closes the prompt without doing anything. */
    public void cancelPrompt() {
        prompt.set(Prompt.NONE);
        promptText.set("");
        promptTarget = null;
    }

    private boolean apply(Edit e) {
        try {
            String d = e.describe(v());
            session.apply(e);
            message.set(d);
            return true;
        } catch (EditRefusedException ex) {
            return refuse(String.join("; ", ex.problems()));
        } catch (RuntimeException ex) {
            return refuse(ex.getMessage());
        }
    }

    private boolean refuse(String why) {
        message.set("Not done: " + why);
        return false;
    }

    private static int indexOf(List<TreeNode> nodes, String id) {
        for (int i = 0; i < nodes.size(); i++) {
            if (nodes.get(i).id().equals(id)) {
                return i;
            }
        }
        return -1;
    }
}
