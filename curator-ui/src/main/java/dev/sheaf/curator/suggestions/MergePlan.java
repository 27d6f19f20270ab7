package dev.sheaf.curator.suggestions;

import dev.sheaf.miner.suggest.HierarchySuggestion;
import dev.sheaf.miner.suggest.Suggestion;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * Turns a merge suggestion into vocabulary edits, as one undoable step.
 *
 * <ul>
 *   <li><b>accept</b>: the concept whose label the curator picked as preferred (else the first
 *       concept among the members) absorbs the other members' concepts ({@link Edit#merge}); members
 *       that are still plain terms become its alternative labels and are recorded as kept for it;
 *       the picked label becomes the preferred one (the old one stays as an alternative). When no
 *       member is a concept yet, a new concept is made with the picked label, the others as
 *       alternatives, at the top (under no facet) for the curator to place.</li>
 *   <li><b>keep apart</b>: two concepts are linked as related ({@link
 *       dev.sheaf.miner.suggest.Suggester#keepApart}); the suggestion engine then never proposes them again.</li>
 *   <li><b>dismiss</b>: the members that are plain terms, with no decision yet, are recorded as
 *       dropped with the reason; when every member is a concept, dismissing keeps them apart.</li>
 * </ul>
 * Each edit is checked against the result of the previous one before it is added, so a plan is
 * either valid as a whole or refused with the reason.
 *
 * <p>A parent (hierarchy) suggestion is answered by {@link #putUnder}: the child concept moves
 * under the parent concept (or, {@code also}, gets it as one more parent); a child that is still a
 * plain term is kept as a new concept there. The parent must be a concept (or facet) already.
 */
public final class MergePlan {
    private MergePlan() {
    }

    /** The labels a curator may pick as preferred: each member's concept's preferred label, or its written form; distinct, in member order. */
    public static List<String> preferredChoices(Vocabulary v, Suggestion s) {
        Set<String> out = new LinkedHashSet<>();
        for (Suggestion.Member m : s.members()) {
            out.add(choiceOf(v, m));
        }
        return List.copyOf(out);
    }

    /** The default pick: the preferred label of the first member that is a concept, else the most frequent member's form. */
    public static String defaultPreferred(Vocabulary v, Suggestion s) {
        for (Suggestion.Member m : s.members()) {
            if (m.conceptId() != null && v.contains(m.conceptId())) {
                return v.displayLabel(m.conceptId());
            }
        }
        return s.members().get(0).shown();
    }

    private static String choiceOf(Vocabulary v, Suggestion.Member m) {
        return m.conceptId() != null && v.contains(m.conceptId()) ? v.displayLabel(m.conceptId()) : m.shown();
    }

    /** The edit that accepts {@code s} with {@code preferred} as the preferred label. */
    public static Edit accept(Vocabulary v, Suggestion s, String preferred) {
        String lang = v.defaultLanguage();
        List<String> concepts = new ArrayList<>();
        for (String id : s.conceptIds()) {
            if (v.contains(id)) {
                concepts.add(id);
            }
        }
        String into = null;
        for (Suggestion.Member m : s.members()) {
            if (m.conceptId() != null && v.contains(m.conceptId()) && choiceOf(v, m).equals(preferred)) {
                into = m.conceptId();
                break;
            }
        }
        if (into == null && !concepts.isEmpty()) {
            into = concepts.get(0);
        }
        List<Edit> edits = new ArrayList<>();
        Vocabulary w = v;
        if (into == null) {
            String id = v.newId(preferred);
            Concept.Builder b = Concept.builder(id).prefLabel(Label.of(preferred, lang));
            for (Suggestion.Member m : s.members()) {
                if (!m.shown().equals(preferred)) {
                    b.altLabel(Label.of(m.shown(), lang));
                }
            }
            w = add(edits, w, Edit.addConcept(b.build()));
            for (Suggestion.Member m : s.members()) {
                w = add(edits, w, Edit.recordDecision(Decision.kept(m.term(), id)));
            }
            return Edit.batch(describe(v, s, preferred), edits);
        }
        for (String c : concepts) {
            if (!c.equals(into)) {
                w = add(edits, w, Edit.merge(c, into));
            }
        }
        for (Suggestion.Member m : s.members()) {
            if (m.conceptId() != null && w.resolve(m.conceptId()).isPresent()) {
                continue;
            }
            Label l = Label.of(m.shown(), lang);
            Concept target = w.concept(into).orElseThrow();
            if (!target.kindsOf(l).isEmpty() || m.shown().equals(preferred)) {
                if (m.shown().equals(preferred) && target.kindsOf(l).isEmpty()) {
                    w = add(edits, w, Edit.rename(into, l, true));
                }
            } else {
                w = add(edits, w, Edit.addLabel(into, LabelKind.ALTERNATIVE, l));
            }
            w = add(edits, w, Edit.recordDecision(Decision.kept(m.term(), into)));
        }
        if (!preferred.equals(w.displayLabel(into))) {
            w = add(edits, w, Edit.rename(into, Label.of(preferred, lang), true));
        }
        return Edit.batch(describe(v, s, preferred), edits);
    }

    /** The edit that keeps the members apart, or empty when they are not (yet) two concepts. */
    public static Optional<Edit> keepApart(Suggestion s) {
        return dev.sheaf.miner.suggest.Suggester.keepApart(s);
    }

    /** The edit that dismisses {@code s}: its undecided plain terms dropped, or — all concepts — kept apart; empty when nothing can be recorded. */
    public static Optional<Edit> dismiss(Vocabulary v, Suggestion s) {
        List<Edit> edits = new ArrayList<>();
        String first = s.members().get(0).shown();
        for (Suggestion.Member m : s.members()) {
            if ((m.conceptId() == null || !v.contains(m.conceptId())) && v.decision(m.term()).isEmpty()) {
                String other = m.shown().equals(first) && s.members().size() > 1 ? s.members().get(1).shown() : first;
                edits.add(Edit.recordDecision(Decision.dropped(m.term(),
                        "dismissed as a merge with \"" + other + "\" (" + s.kind().word() + ")")));
            }
        }
        if (edits.isEmpty()) {
            return keepApart(s);
        }
        return Optional.of(Edit.batch("Dismiss the suggestion " + s.key(), edits));
    }

    /**
     * The edit that puts the child of {@code h} under its parent: moved there, or with {@code also}
     * added as one more parent; a plain-term child becomes a new concept under it, recorded as kept.
     *
     * @throws IllegalArgumentException with the reason to show when it cannot be done
     */
    public static Edit putUnder(Vocabulary v, HierarchySuggestion h, boolean also) {
        String parent = h.parent().conceptId();
        if (parent == null || !v.contains(parent)) {
            throw new IllegalArgumentException("\"" + h.parent().shown() + "\" is not in the vocabulary yet; "
                    + (h.parent().facet() ? "make it a facet first (Ctrl+Shift+N in the tree)" : "keep it as a concept first (K in the harvest)"));
        }
        String child = h.child().conceptId();
        String under = v.displayLabel(parent);
        if (child != null && v.contains(child)) {
            String what = (also ? "Put \"" : "Move \"") + v.displayLabel(child) + (also ? "\" also under \"" : "\" under \"") + under + "\"";
            return Edit.batch(what, List.of(also ? Edit.addBroader(child, parent) : Edit.moveUnder(child, parent)));
        }
        String id = v.newId(h.child().shown());
        Edit make = Edit.addConcept(Concept.builder(id).prefLabel(Label.of(h.child().shown(), v.defaultLanguage())).broader(parent).build());
        return Edit.batch("Keep \"" + h.child().shown() + "\" as a new concept under \"" + under + "\"",
                List.of(make, Edit.recordDecision(Decision.kept(h.child().term(), id))));
    }

    private static Vocabulary add(List<Edit> edits, Vocabulary w, Edit e) {
        Vocabulary next = w.apply(e);
        edits.add(e);
        return next;
    }

    private static String describe(Vocabulary v, Suggestion s, String preferred) {
        List<String> names = new ArrayList<>();
        for (Suggestion.Member m : s.members()) {
            String n = "\"" + choiceOf(v, m) + "\"";
            if (!names.contains(n)) {
                names.add(n);
            }
        }
        return String.format(Locale.ROOT, "Merge %s as \"%s\"", String.join(", ", names), preferred);
    }
}
