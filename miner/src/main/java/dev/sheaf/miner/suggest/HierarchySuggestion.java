package dev.sheaf.miner.suggest;

import dev.sheaf.miner.text.EvidenceLine;
import java.util.List;
import java.util.Objects;

/**
 * A proposal to put one term or concept under another (SKOS broader), with the reason and the
 * counts. Immutable.
 *
 * @param kind     what made it
 * @param parent   the broader side (for {@link Kind#FACET_VALUE}: a facet proposal, {@link Node#facet()} true)
 * @param child    the narrower side
 * @param score    in [0, 1]; higher is surer
 * @param reason   a readable sentence ("'two way zipper' is a kind of 'zipper': same head word")
 * @param counts   listings with the parent, with the child, with both
 * @param evidence a few keyword-in-context lines of the child (may be empty)
 */
public record HierarchySuggestion(Kind kind, Node parent, Node child, double score, String reason, Counts counts,
                                  List<EvidenceLine> evidence) {

    /** What made a hierarchy suggestion. */
    public enum Kind {
        /** A spec key becomes a facet and the values written under it its concepts. */
        FACET_VALUE,
        /** The child is the parent with modifiers in front: "two way zipper" under "zipper". */
        HEAD_MODIFIER,
        /** Document subsumption: P(parent | child) ≥ threshold and P(child | parent) < 1 (Sanderson &amp; Croft 1999). */
        SUBSUMPTION;

        /** The word used in files: facet-value, head-modifier, subsumption. */
        public String word() {
            return KindWords.word(this);
        }

        /** The kind for a word as {@link #word()} writes it. */
        public static Kind ofWord(String w) {
            return KindWords.of(Kind.class, w, "hierarchy kind");
        }
    }

    /**
     * One side of a hierarchy suggestion.
     *
     * @param term      the harvest's form of the term, or for a facet proposal the spec facet's name
     * @param shown     the form to show (most frequent written form, or the spec key as written)
     * @param conceptId the concept it already is, or null
     * @param facet     true when this side is proposed as a facet (a spec key)
     */
    public record Node(String term, String shown, String conceptId, boolean facet) {
        public Node {
            Objects.requireNonNull(term, "term");
            Objects.requireNonNull(shown, "shown");
        }
    }

    /**
     * Listing counts behind a suggestion.
     *
     * @param parentListings listings with the parent (for a facet: spec rows with the key)
     * @param childListings  listings with the child (for a facet value: rows with that value)
     * @param bothListings   listings with both (for a facet value: rows with the value under this key)
     */
    public record Counts(long parentListings, long childListings, long bothListings) {
        public Counts {
            if (parentListings < 0 || childListings < 0 || bothListings < 0) {
                throw new IllegalArgumentException("counts must not be negative, got " + parentListings + ", "
                        + childListings + ", " + bothListings);
            }
        }
    }

    public HierarchySuggestion {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(parent, "parent");
        Objects.requireNonNull(child, "child");
        Objects.requireNonNull(reason, "reason");
        Objects.requireNonNull(counts, "counts");
        Suggestion.checkScore(score, "score");
        if (parent.term().equals(child.term()) && parent.facet() == child.facet()) {
            throw new IllegalArgumentException("a term cannot be proposed under itself: '" + child.term() + "'");
        }
        evidence = List.copyOf(evidence);
    }

    /** A stable key: kind, parent and child. */
    public String key() {
        return kind.word() + ": " + parent.term() + " > " + child.term();
    }
}
