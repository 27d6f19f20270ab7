package dev.sheaf.miner.suggest;

import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ConceptLabel;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Vocabulary;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.function.Function;

/**
 * What the vocabulary has already decided, seen in the harvest's form of terms: which concept a
 * term belongs to (a label of it, or a kept decision), which terms were dropped, and which pairs of
 * concepts were kept apart — linked as related (SKOS: associated, not the same), or one already
 * under the other. See docs/decisions/132-decided-suggestions.md.
 */
final class Decided {
    static final Decided NONE = new Decided(null, t -> t);

    private final Vocabulary vocabulary;
    private final Map<String, String> conceptOf = new HashMap<>();
    private final Set<String> dropped = new HashSet<>();

    Decided(Vocabulary v, Function<String, String> toForm) {
        this.vocabulary = v;
        if (v == null) {
            return;
        }
        for (Concept c : v.allConcepts()) {
            for (ConceptLabel l : c.labels()) {
                String f = toForm.apply(l.label().text());
                if (f != null) {
                    conceptOf.putIfAbsent(f, c.id());
                }
            }
        }
        for (Decision d : v.decisions()) {
            String f = toForm.apply(d.term());
            if (f == null) {
                continue;
            }
            if (d.outcome() == Decision.Outcome.DROPPED) {
                dropped.add(f);
            } else if (d.outcome() == Decision.Outcome.KEPT && v.contains(d.concept())) {
                conceptOf.putIfAbsent(f, d.concept());
            }
        }
    }

    Vocabulary vocabulary() {
        return vocabulary;
    }

    /** The concept id of a harvest-form term, or null. */
    String conceptOf(String term) {
        return conceptOf.get(term);
    }

    boolean dropped(String term) {
        return dropped.contains(term);
    }

    /** Whether two different concepts were kept apart: related, or one is an ancestor of the other. */
    boolean keptApart(String a, String b) {
        if (vocabulary == null || a.equals(b)) {
            return false;
        }
        Concept ca = vocabulary.concept(a).orElse(null);
        if (ca == null || !vocabulary.contains(b)) {
            return false;
        }
        return ca.related().contains(b) || under(a, b) || under(b, a);
    }

    /** Whether {@code child} is already somewhere under {@code parent}. */
    boolean under(String child, String parent) {
        return vocabulary != null && vocabulary.contains(child) && vocabulary.ancestors(child).contains(parent);
    }
}
