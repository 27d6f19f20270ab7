package dev.sheaf.vocab;

import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;

/**
 * One change to a vocabulary. Made with the factory methods here; applied with {@link
 * Vocabulary#apply} or, with undo and redo, {@link EditHistory#apply}.
 *
 * <p>Every edit is validated before it applies: first its own preconditions (the concepts it
 * names exist, a facet is not merged into a value ...), then the result is checked with the error
 * rules of {@link VocabularyChecker}: an edit that would add an error (a label made ambiguous, an
 * S13 clash, a related link to an ancestor, a dangling reference) or a loop in the hierarchy is
 * refused, and the refusal says why. Errors already in the vocabulary do not block other edits.
 */
public abstract sealed class Edit {

    Edit() {
    }

    /** What this edit does, in words a curator reads in an undo menu ("Merge \"rip-stop\" into \"ripstop nylon\""). */
    public abstract String describe(Vocabulary v);

    /** Why this edit cannot apply to {@code v}; empty when it can. */
    public final List<String> problems(Vocabulary v) {
        return attempt(v).problems();
    }

    abstract void preconditions(Vocabulary v, List<String> problems);

    abstract void perform(Mutation m);

    /** Validates and, when valid, performs this edit on a working copy of {@code v}. */
    final Attempt attempt(Vocabulary v) {
        List<String> problems = new ArrayList<>();
        preconditions(v, problems);
        if (!problems.isEmpty()) {
            return Attempt.refused(problems);
        }
        Mutation m = new Mutation(v);
        perform(m);
        if (!m.refusals().isEmpty()) {
            return Attempt.refused(m.refusals());
        }
        Vocabulary after = m.result();
        Patch forward = m.forward();
        for (String id : forward.concepts().keySet()) {
            if (after.contains(id) && after.ancestors(id).contains(id) && !v.ancestors(id).contains(id)) {
                problems.add("it would make a loop in the hierarchy: \"" + after.displayLabel(id)
                        + "\" (" + id + ") would end up under itself; pick a broader concept that is not below it");
            }
        }
        Set<String> before = v.errorKeys();
        Set<String> afterKeys = new HashSet<>();
        for (Finding f : VocabularyChecker.errors(after)) {
            afterKeys.add(f.key());
            if (!before.contains(f.key())) {
                problems.add("it would create an error (" + f.rule().id() + "): " + f.message());
            }
        }
        if (!problems.isEmpty()) {
            return Attempt.refused(problems);
        }
        // the next edit starts from this snapshot: it need not check it again
        after.knownErrorKeys(afterKeys);
        return new Attempt(after, forward, m.backward(), List.of());
    }

    /** The outcome of {@link #attempt}: the new snapshot and its patches, or the problems. */
    record Attempt(Vocabulary after, Patch forward, Patch backward, List<String> problems) {
        static Attempt refused(List<String> problems) {
            return new Attempt(null, null, null, List.copyOf(problems));
        }

        Attempt orThrow(Edit e, Vocabulary v) {
            if (!problems.isEmpty()) {
                throw new EditRefusedException(e.describe(v), problems);
            }
            return this;
        }
    }

    // ---------------------------------------------------------------- factories

    /** Adds a concept or — when it has facet properties — a facet. Related concepts get the link back. */
    public static Edit addConcept(Concept c) {
        return new AddConcept(c);
    }

    /** Sets the preferred label in the label's language (the old one is dropped). */
    public static Edit rename(String id, Label newPref) {
        return new Rename(id, newPref, false);
    }

    /** Sets the preferred label; with {@code keepOldAsAlternative} the old one stays as an alternative label. */
    public static Edit rename(String id, Label newPref, boolean keepOldAsAlternative) {
        return new Rename(id, newPref, keepOldAsAlternative);
    }

    /** Adds an alternative or hidden label (preferred labels are set with {@link #rename}). */
    public static Edit addLabel(String id, LabelKind kind, Label label) {
        return new AddLabel(id, kind, label);
    }

    /** Removes a label; a concept keeps its preferred label in the default language (rename it instead). */
    public static Edit removeLabel(String id, LabelKind kind, Label label) {
        return new RemoveLabel(id, kind, label);
    }

    /** Moves a label to another concept, or to another kind on the same concept (alternative to hidden ...). */
    public static Edit moveLabel(String fromId, Label label, String toId, LabelKind toKind) {
        return new MoveLabel(fromId, label, toId, toKind);
    }

    /**
     * Merges {@code fromId} into {@code intoId}: every label of the first becomes an alternative
     * (hidden labels stay hidden) of the second, references to it (broader, related, kept
     * decisions) are rewired, and its id is kept as retired, "replaced by" the second.
     */
    public static Edit merge(String fromId, String intoId) {
        return new Merge(fromId, intoId);
    }

    /** Splits labels off {@code sourceId} into a new concept with the same broader concepts; its id is made from {@code newPref}. */
    public static Edit split(String sourceId, Collection<Label> moved, Label newPref) {
        return new Split(sourceId, moved, newPref, null);
    }

    /** As {@link #split(String, Collection, Label)} with a chosen id for the new concept. */
    public static Edit split(String sourceId, Collection<Label> moved, Label newPref, String newId) {
        return new Split(sourceId, moved, newPref, newId);
    }

    /** Puts a concept under these broader concepts instead of its current ones. */
    public static Edit move(String id, Collection<String> newBroader) {
        return new Move(id, null, newBroader);
    }

    /** Puts a concept under one broader concept instead of its current ones. */
    public static Edit moveUnder(String id, String newBroader) {
        return new Move(id, null, List.of(newBroader));
    }

    /** Adds a broader concept (polyhierarchy). */
    public static Edit addBroader(String id, String broader) {
        return new Move(id, List.of(), List.of(broader));
    }

    /** Removes one broader concept. */
    public static Edit removeBroader(String id, String broader) {
        return new Move(id, List.of(broader), List.of());
    }

    /** Links two concepts as related (both ways). */
    public static Edit relate(String a, String b) {
        return new Relate(a, b, true);
    }

    /** Removes a related link (both ways). */
    public static Edit unrelate(String a, String b) {
        return new Relate(a, b, false);
    }

    /** Deletes a concept; refused while anything refers to it. Its id is retired (never reused). */
    public static Edit delete(String id) {
        return new Delete(id, false);
    }

    /**
     * Deletes a concept even though others refer to it: narrower concepts lose it as broader, related
     * links are removed, decisions that kept a term as it become parked. Its id is retired.
     */
    public static Edit deleteForced(String id) {
        return new Delete(id, true);
    }

    /** Sets (or with null text removes) the scope note in a language. */
    public static Edit setScopeNote(String id, String lang, String text) {
        return new SetNote(id, true, lang, text);
    }

    /** Sets (or with null text removes) the definition in a language. */
    public static Edit setDefinition(String id, String lang, String text) {
        return new SetNote(id, false, lang, text);
    }

    /** Replaces a facet's properties. */
    public static Edit setFacetProperties(String facetId, FacetProperties properties) {
        return new SetFacet(facetId, properties);
    }

    /** Adds a mapping to a concept of another scheme. */
    public static Edit addMapping(String id, Mapping mapping) {
        return new SetMapping(id, mapping, true);
    }

    /** Removes a mapping. */
    public static Edit removeMapping(String id, Mapping mapping) {
        return new SetMapping(id, mapping, false);
    }

    /** Records a decision on a candidate term, replacing an earlier one on the same normalised term. */
    public static Edit recordDecision(Decision decision) {
        return new RecordDecision(decision);
    }

    /** Forgets the decision on a term (it becomes a fresh candidate again). */
    public static Edit clearDecision(String term) {
        return new ClearDecision(term);
    }

    /** Replaces the scheme info (title, base IRI, default language). */
    public static Edit setScheme(SchemeInfo scheme) {
        return new SetScheme(scheme);
    }

    /** Several edits as one step (one undo), applied in order, each validated against the result of the previous. */
    public static Edit batch(String description, List<Edit> edits) {
        return new Batch(description, edits);
    }

    // ---------------------------------------------------------------- helpers

    static String q(Vocabulary v, String id) {
        return "\"" + v.displayLabel(id) + "\" (" + id + ")";
    }

    static boolean live(Vocabulary v, String id, String role, List<String> problems) {
        if (v.contains(id)) {
            return true;
        }
        if (v.retired(id).isPresent()) {
            String to = v.retired(id).get().replacedBy();
            problems.add(role + " " + id + " was " + (to == null ? "deleted" : "merged into " + q(v, to))
                    + "; use " + (to == null ? "a live concept" : to) + " instead");
        } else {
            problems.add(role + " " + id + " is not a concept in this vocabulary; check the id");
        }
        return false;
    }

    // ---------------------------------------------------------------- edits

    static final class AddConcept extends Edit {
        final Concept c;

        AddConcept(Concept c) {
            this.c = Objects.requireNonNull(c, "concept");
        }

        @Override
        public String describe(Vocabulary v) {
            return "Add " + (c.isFacet() ? "facet" : "concept") + " \"" + c.displayLabel(v.defaultLanguage()) + "\"";
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (v.isKnownId(c.id())) {
                p.add("id " + c.id() + " is already used" + (v.contains(c.id()) ? "" : " by a retired concept")
                        + "; pick another, e.g. " + v.newId(c.displayLabel(v.defaultLanguage())));
            }
            for (String b : c.broader()) {
                live(v, b, "broader concept", p);
            }
            for (String r : c.related()) {
                live(v, r, "related concept", p);
            }
        }

        @Override
        void perform(Mutation m) {
            m.put(c);
            for (String r : c.related()) {
                m.put(m.require(r).toBuilder().related(c.id()).build());
            }
        }
    }

    static final class Rename extends Edit {
        final String id;
        final Label label;
        final boolean keepOld;

        Rename(String id, Label label, boolean keepOld) {
            this.id = Objects.requireNonNull(id);
            this.label = Objects.requireNonNull(label);
            this.keepOld = keepOld;
        }

        @Override
        public String describe(Vocabulary v) {
            return "Rename " + q(v, id) + " to \"" + label.text() + "\"";
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (live(v, id, "concept", p) && label.text().equals(v.concept(id).get().prefLabels().get(label.lang()))) {
                p.add(q(v, id) + " is already called \"" + label.text() + "\" in " + label.lang());
            }
        }

        @Override
        void perform(Mutation m) {
            Concept c = m.require(id);
            Concept.Builder b = c.toBuilder();
            String old = c.prefLabels().get(label.lang());
            b.removeLabel(LabelKind.ALTERNATIVE, label);
            b.removeLabel(LabelKind.HIDDEN, label);
            b.prefLabel(label);
            if (keepOld && old != null) {
                b.altLabel(new Label(old, label.lang()));
            }
            m.put(b.build());
        }
    }

    static final class AddLabel extends Edit {
        final String id;
        final LabelKind kind;
        final Label label;

        AddLabel(String id, LabelKind kind, Label label) {
            this.id = Objects.requireNonNull(id);
            this.kind = Objects.requireNonNull(kind);
            this.label = Objects.requireNonNull(label);
        }

        @Override
        public String describe(Vocabulary v) {
            return "Add " + kind.word() + " label " + label + " to " + q(v, id);
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (kind == LabelKind.PREFERRED) {
                p.add("a preferred label is set by renaming the concept, not added");
                return;
            }
            if (live(v, id, "concept", p) && v.concept(id).get().labels(kind).contains(label)) {
                p.add(q(v, id) + " already has the " + kind.word() + " label " + label);
            }
        }

        @Override
        void perform(Mutation m) {
            m.put(m.require(id).toBuilder().label(kind, label).build());
        }
    }

    static final class RemoveLabel extends Edit {
        final String id;
        final LabelKind kind;
        final Label label;

        RemoveLabel(String id, LabelKind kind, Label label) {
            this.id = Objects.requireNonNull(id);
            this.kind = Objects.requireNonNull(kind);
            this.label = Objects.requireNonNull(label);
        }

        @Override
        public String describe(Vocabulary v) {
            return "Remove " + kind.word() + " label " + label + " from " + q(v, id);
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (!live(v, id, "concept", p)) {
                return;
            }
            if (!v.concept(id).get().labels(kind).contains(label)) {
                p.add(q(v, id) + " has no " + kind.word() + " label " + label);
            } else if (kind == LabelKind.PREFERRED && label.lang().equals(v.defaultLanguage())) {
                p.add("every concept keeps a preferred label in " + v.defaultLanguage() + "; rename " + q(v, id) + " instead");
            }
        }

        @Override
        void perform(Mutation m) {
            Concept.Builder b = m.require(id).toBuilder();
            b.removeLabel(kind, label);
            m.put(b.build());
        }
    }

    static final class MoveLabel extends Edit {
        final String from;
        final Label label;
        final String to;
        final LabelKind toKind;

        MoveLabel(String from, Label label, String to, LabelKind toKind) {
            this.from = Objects.requireNonNull(from);
            this.label = Objects.requireNonNull(label);
            this.to = Objects.requireNonNull(to);
            this.toKind = Objects.requireNonNull(toKind);
        }

        @Override
        public String describe(Vocabulary v) {
            return from.equals(to)
                    ? "Make " + label + " a " + toKind.word() + " label of " + q(v, from)
                    : "Move label " + label + " from " + q(v, from) + " to " + q(v, to);
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            boolean ok = live(v, from, "concept", p) & live(v, to, "concept", p);
            if (!ok) {
                return;
            }
            Concept f = v.concept(from).get();
            List<LabelKind> kinds = f.kindsOf(label);
            if (kinds.isEmpty()) {
                p.add(q(v, from) + " has no label " + label);
                return;
            }
            if (kinds.contains(LabelKind.PREFERRED) && label.lang().equals(v.defaultLanguage())) {
                p.add(label + " is the preferred label of " + q(v, from) + "; rename it first, or merge the concepts");
            }
            Concept t = v.concept(to).get();
            if (from.equals(to) && kinds.contains(toKind)) {
                p.add(label + " already is a " + toKind.word() + " label of " + q(v, from));
            }
            if (toKind == LabelKind.PREFERRED && t.prefLabels().containsKey(label.lang()) && !from.equals(to)) {
                p.add(q(v, to) + " already has a preferred label in " + label.lang() + "; rename it instead");
            }
        }

        @Override
        void perform(Mutation m) {
            Concept.Builder fb = m.require(from).toBuilder();
            for (LabelKind k : LabelKind.values()) {
                fb.removeLabel(k, label);
            }
            if (from.equals(to)) {
                m.put(fb.label(toKind, label).build());
            } else {
                m.put(fb.build());
                m.put(m.require(to).toBuilder().label(toKind, label).build());
            }
        }
    }

    static final class Merge extends Edit {
        final String from;
        final String into;

        Merge(String from, String into) {
            this.from = Objects.requireNonNull(from);
            this.into = Objects.requireNonNull(into);
        }

        @Override
        public String describe(Vocabulary v) {
            return "Merge " + q(v, from) + " into " + q(v, into);
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            boolean ok = live(v, from, "concept", p) & live(v, into, "concept", p);
            if (!ok) {
                return;
            }
            if (from.equals(into)) {
                p.add("a concept cannot be merged into itself");
            } else if (v.concept(from).get().isFacet() != v.concept(into).get().isFacet()) {
                p.add("cannot merge " + (v.concept(from).get().isFacet() ? "a facet into a value" : "a value into a facet")
                        + "; merge facets with facets and values with values");
            }
        }

        @Override
        void perform(Mutation m) {
            Concept a = m.require(from);
            Concept b = m.require(into);
            Concept.Builder bb = b.toBuilder();
            for (ConceptLabel l : a.labels()) {
                if (b.kindsOf(l.label()).isEmpty()) {
                    bb.label(l.kind() == LabelKind.HIDDEN ? LabelKind.HIDDEN : LabelKind.ALTERNATIVE, l.label());
                }
            }
            bb.broader(a.broader());
            bb.related(a.related());
            bb.removeBroader(from).removeBroader(into).removeRelated(from).removeRelated(into);
            for (Mapping x : a.mappings()) {
                bb.mapping(x);
            }
            a.scopeNotes().forEach((lang, t) -> {
                if (!b.scopeNotes().containsKey(lang)) {
                    bb.scopeNote(lang, t);
                }
            });
            a.definitions().forEach((lang, t) -> {
                if (!b.definitions().containsKey(lang)) {
                    bb.definition(lang, t);
                }
            });
            if (b.isFacet()) {
                bb.clearBroader();
            }
            m.put(bb.build());
            for (Concept x : m.concepts()) {
                if (x.id().equals(from) || x.id().equals(into)) {
                    continue;
                }
                boolean br = x.broader().contains(from);
                boolean rel = x.related().contains(from);
                if (br || rel) {
                    Concept.Builder xb = x.toBuilder();
                    if (br) {
                        xb.removeBroader(from).broader(into);
                    }
                    if (rel) {
                        xb.removeRelated(from).related(into);
                    }
                    m.put(xb.build());
                }
            }
            for (Decision d : m.decisions()) {
                if (from.equals(d.concept())) {
                    m.put(new Decision(d.term(), d.outcome(), into, d.reason(), d.when(), d.by()));
                }
            }
            m.remove(from);
            m.retire(new Retired(from, into, a.displayLabel(m.defaultLanguage())));
        }
    }

    static final class Split extends Edit {
        final String source;
        final SortedSet<Label> moved;
        final Label newPref;
        final String newId;

        Split(String source, Collection<Label> moved, Label newPref, String newId) {
            this.source = Objects.requireNonNull(source);
            this.moved = new TreeSet<>(moved);
            this.newPref = Objects.requireNonNull(newPref);
            this.newId = newId == null ? null : Concept.checkId(newId);
        }

        @Override
        public String describe(Vocabulary v) {
            return "Split " + moved.size() + " label" + (moved.size() == 1 ? "" : "s") + " off " + q(v, source)
                    + " into new concept \"" + newPref.text() + "\"";
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (!live(v, source, "concept", p)) {
                return;
            }
            Concept s = v.concept(source).get();
            if (s.isFacet()) {
                p.add(q(v, source) + " is a facet; facets are not split (add a new facet and move values under it)");
            }
            if (moved.isEmpty()) {
                p.add("no labels chosen to move");
            }
            for (Label l : moved) {
                List<LabelKind> k = s.kindsOf(l);
                if (k.isEmpty()) {
                    p.add(q(v, source) + " has no label " + l);
                } else if (k.contains(LabelKind.PREFERRED)) {
                    p.add(l + " is the preferred label of " + q(v, source) + "; rename it first or leave it");
                }
            }
            if (!moved.contains(newPref) && !s.kindsOf(newPref).isEmpty()) {
                p.add(newPref + " stays a label of " + q(v, source) + "; choose it among the moved labels or pick another");
            }
            if (newId != null && v.isKnownId(newId)) {
                p.add("id " + newId + " is already used; pick another");
            }
        }

        @Override
        void perform(Mutation m) {
            Concept s = m.require(source);
            Concept.Builder sb = s.toBuilder();
            String id = newId != null ? newId : m.view().newId(newPref.text());
            Concept.Builder nb = Concept.builder(id).prefLabel(newPref).broader(s.broader()).splitFrom(source);
            for (Label l : moved) {
                boolean hidden = s.hiddenLabels().contains(l);
                for (LabelKind k : LabelKind.values()) {
                    sb.removeLabel(k, l);
                }
                if (!l.equals(newPref)) {
                    nb.label(hidden ? LabelKind.HIDDEN : LabelKind.ALTERNATIVE, l);
                }
            }
            m.put(sb.build());
            m.put(nb.build());
        }
    }

    static final class Move extends Edit {
        final String id;
        final Set<String> remove;
        final Set<String> add;

        Move(String id, Collection<String> remove, Collection<String> add) {
            this.id = Objects.requireNonNull(id);
            this.remove = remove == null ? null : new LinkedHashSet<>(remove);
            this.add = new LinkedHashSet<>(add);
        }

        @Override
        public String describe(Vocabulary v) {
            List<String> names = new ArrayList<>();
            for (String a : add) {
                names.add(q(v, a));
            }
            if (remove == null) {
                return "Move " + q(v, id) + (add.isEmpty() ? " to the top (no broader)" : " under " + String.join(", ", names));
            }
            if (remove.isEmpty()) {
                return "Also put " + q(v, id) + " under " + String.join(", ", names);
            }
            return "Take " + q(v, id) + " out of " + q(v, remove.iterator().next())
                    + (add.isEmpty() ? "" : " and put it under " + String.join(", ", names));
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (!live(v, id, "concept", p)) {
                return;
            }
            Concept c = v.concept(id).get();
            if (c.isFacet() && !add.isEmpty()) {
                p.add(q(v, id) + " is a facet; facets stay at the top of the scheme");
            }
            for (String a : add) {
                if (a.equals(id)) {
                    p.add("a concept cannot be its own broader concept");
                } else if (live(v, a, "broader concept", p) && v.ancestors(a).contains(id)) {
                    p.add("it would make a loop in the hierarchy: " + q(v, a) + " is below " + q(v, id));
                }
            }
            if (remove != null) {
                for (String r : remove) {
                    if (!c.broader().contains(r)) {
                        p.add(r + " is not a broader concept of " + q(v, id));
                    }
                }
            }
        }

        @Override
        void perform(Mutation m) {
            Concept.Builder b = m.require(id).toBuilder();
            if (remove == null) {
                b.clearBroader();
            } else {
                remove.forEach(b::removeBroader);
            }
            b.broader(add);
            m.put(b.build());
        }
    }

    static final class Relate extends Edit {
        final String a;
        final String b;
        final boolean link;

        Relate(String a, String b, boolean link) {
            this.a = Objects.requireNonNull(a);
            this.b = Objects.requireNonNull(b);
            this.link = link;
        }

        @Override
        public String describe(Vocabulary v) {
            return (link ? "Relate " : "Unrelate ") + q(v, a) + " and " + q(v, b);
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            boolean ok = live(v, a, "concept", p) & live(v, b, "concept", p);
            if (!ok) {
                return;
            }
            if (a.equals(b)) {
                p.add("a concept cannot be related to itself");
                return;
            }
            boolean linked = v.concept(a).get().related().contains(b) && v.concept(b).get().related().contains(a);
            boolean any = v.concept(a).get().related().contains(b) || v.concept(b).get().related().contains(a);
            if (link && linked) {
                p.add(q(v, a) + " and " + q(v, b) + " are already related");
            }
            if (!link && !any) {
                p.add(q(v, a) + " and " + q(v, b) + " are not related");
            }
        }

        @Override
        void perform(Mutation m) {
            Concept.Builder ab = m.require(a).toBuilder();
            Concept.Builder bb = m.require(b).toBuilder();
            if (link) {
                ab.related(b);
                bb.related(a);
            } else {
                ab.removeRelated(b);
                bb.removeRelated(a);
            }
            m.put(ab.build());
            m.put(bb.build());
        }
    }

    static final class Delete extends Edit {
        final String id;
        final boolean force;

        Delete(String id, boolean force) {
            this.id = Objects.requireNonNull(id);
            this.force = force;
        }

        @Override
        public String describe(Vocabulary v) {
            return (force ? "Delete (forced) " : "Delete ") + q(v, id);
        }

        static List<String> references(Vocabulary v, String id) {
            List<String> refs = new ArrayList<>();
            for (Concept x : v.allConcepts()) {
                if (x.broader().contains(id)) {
                    refs.add("broader concept of " + q(v, x.id()));
                }
                if (x.related().contains(id) && !x.id().equals(id)) {
                    refs.add("related to " + q(v, x.id()));
                }
            }
            for (Decision d : v.decisions()) {
                if (id.equals(d.concept())) {
                    refs.add("kept candidate term \"" + d.term() + "\"");
                }
            }
            for (Retired r : v.retired()) {
                if (id.equals(r.replacedBy())) {
                    refs.add("target of merged id " + r.id());
                }
            }
            return refs;
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (!live(v, id, "concept", p) || force) {
                return;
            }
            List<String> refs = references(v, id);
            if (!refs.isEmpty()) {
                p.add(q(v, id) + " is still referenced (" + String.join("; ", refs)
                        + "); move, merge or unlink those first, or delete with force");
            }
        }

        @Override
        void perform(Mutation m) {
            Concept c = m.require(id);
            for (Concept x : m.concepts()) {
                if (x.id().equals(id)) {
                    continue;
                }
                if (x.broader().contains(id) || x.related().contains(id)) {
                    m.put(x.toBuilder().removeBroader(id).removeRelated(id).build());
                }
            }
            for (Decision d : m.decisions()) {
                if (id.equals(d.concept())) {
                    m.put(new Decision(d.term(), Decision.Outcome.PARKED, null,
                            "the concept it was kept as (" + id + ") was deleted", d.when(), d.by()));
                }
            }
            m.remove(id);
            m.retire(new Retired(id, null, c.displayLabel(m.defaultLanguage())));
        }
    }

    static final class SetNote extends Edit {
        final String id;
        final boolean scope;
        final String lang;
        final String text;

        SetNote(String id, boolean scope, String lang, String text) {
            this.id = Objects.requireNonNull(id);
            this.scope = scope;
            this.lang = Label.checkLanguage(lang);
            this.text = text == null || text.isBlank() ? null : text.strip();
        }

        @Override
        public String describe(Vocabulary v) {
            return (text == null ? "Remove the " : "Set the ") + (scope ? "scope note" : "definition") + " of " + q(v, id);
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (live(v, id, "concept", p)) {
                Concept c = v.concept(id).get();
                String cur = (scope ? c.scopeNotes() : c.definitions()).get(lang);
                if (Objects.equals(cur, text)) {
                    p.add("nothing to change: the " + (scope ? "scope note" : "definition") + " is already "
                            + (text == null ? "empty" : "that text"));
                }
            }
        }

        @Override
        void perform(Mutation m) {
            Concept.Builder b = m.require(id).toBuilder();
            if (scope) {
                b.scopeNote(lang, text);
            } else {
                b.definition(lang, text);
            }
            m.put(b.build());
        }
    }

    static final class SetFacet extends Edit {
        final String id;
        final FacetProperties props;

        SetFacet(String id, FacetProperties props) {
            this.id = Objects.requireNonNull(id);
            this.props = Objects.requireNonNull(props);
        }

        @Override
        public String describe(Vocabulary v) {
            return "Change the facet properties of " + q(v, id);
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (live(v, id, "facet", p)) {
                Concept c = v.concept(id).get();
                if (!c.isFacet()) {
                    p.add(q(v, id) + " is a value, not a facet; facet properties belong to facets");
                } else if (c.facet().equals(props)) {
                    p.add("nothing to change: the facet already has these properties");
                }
            }
        }

        @Override
        void perform(Mutation m) {
            m.put(m.require(id).toBuilder().facet(props).build());
        }
    }

    static final class SetMapping extends Edit {
        final String id;
        final Mapping mapping;
        final boolean add;

        SetMapping(String id, Mapping mapping, boolean add) {
            this.id = Objects.requireNonNull(id);
            this.mapping = Objects.requireNonNull(mapping);
            this.add = add;
        }

        @Override
        public String describe(Vocabulary v) {
            return (add ? "Map " : "Unmap ") + q(v, id) + " (" + mapping.kind().skosName() + " " + mapping.iri() + ")";
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (live(v, id, "concept", p) && v.concept(id).get().mappings().contains(mapping) == add) {
                p.add(q(v, id) + (add ? " already has" : " has no") + " that mapping");
            }
        }

        @Override
        void perform(Mutation m) {
            Concept c = m.require(id);
            TreeSet<Mapping> ms = new TreeSet<>(c.mappings());
            if (add) {
                ms.add(mapping);
            } else {
                ms.remove(mapping);
            }
            m.put(c.toBuilder().mappings(ms).build());
        }
    }

    static final class RecordDecision extends Edit {
        final Decision d;

        RecordDecision(Decision d) {
            this.d = Objects.requireNonNull(d);
        }

        @Override
        public String describe(Vocabulary v) {
            switch (d.outcome()) {
                case KEPT:
                    return "Keep \"" + d.term() + "\" as " + q(v, d.concept());
                case DROPPED:
                    return "Drop \"" + d.term() + "\" (" + d.reason() + ")";
                default:
                    return "Park \"" + d.term() + "\"";
            }
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (d.concept() != null) {
                live(v, d.concept(), "concept", p);
            }
            if (v.decision(d.term()).map(d::equals).orElse(false)) {
                p.add("that decision is already recorded");
            }
        }

        @Override
        void perform(Mutation m) {
            m.put(d);
        }
    }

    static final class ClearDecision extends Edit {
        final String term;

        ClearDecision(String term) {
            this.term = Objects.requireNonNull(term);
        }

        @Override
        public String describe(Vocabulary v) {
            return "Forget the decision on \"" + term + "\"";
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (v.decision(term).isEmpty()) {
                p.add("there is no decision on \"" + term + "\"");
            }
        }

        @Override
        void perform(Mutation m) {
            m.removeDecision(Terms.normalise(term));
        }
    }

    static final class SetScheme extends Edit {
        final SchemeInfo s;

        SetScheme(SchemeInfo s) {
            this.s = Objects.requireNonNull(s);
        }

        @Override
        public String describe(Vocabulary v) {
            return "Change the scheme details";
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (v.scheme().equals(s)) {
                p.add("nothing to change: the scheme already has these details");
            }
        }

        @Override
        void perform(Mutation m) {
            m.scheme(s);
        }
    }

    static final class Batch extends Edit {
        final String description;
        final List<Edit> edits;

        Batch(String description, List<Edit> edits) {
            this.description = Label.checkText(description, "batch description");
            this.edits = List.copyOf(edits);
        }

        @Override
        public String describe(Vocabulary v) {
            return description;
        }

        @Override
        void preconditions(Vocabulary v, List<String> p) {
            if (edits.isEmpty()) {
                p.add("the batch holds no edits");
            }
        }

        @Override
        void perform(Mutation m) {
            int i = 0;
            for (Edit e : edits) {
                i++;
                Vocabulary now = m.view();
                List<String> p = new ArrayList<>();
                e.preconditions(now, p);
                if (!p.isEmpty()) {
                    for (String x : p) {
                        m.refuse("step " + i + " (" + e.describe(now) + "): " + x);
                    }
                    return;
                }
                e.perform(m);
                if (!m.refusals().isEmpty()) {
                    return;
                }
            }
        }
    }
}
