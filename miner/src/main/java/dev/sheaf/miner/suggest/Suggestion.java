package dev.sheaf.miner.suggest;

import dev.sheaf.miner.text.EvidenceLine;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A proposal to merge two or more candidate terms (or the concepts they already belong to) into one
 * concept, with the reason and the evidence. Immutable.
 *
 * <p>One suggestion per set of members: when several kinds of evidence point at the same pair, they
 * are listed in {@link #support()} and combined into {@link #score()} as a noisy-or,
 * {@code 1 − Π(1 − s_k)}; {@link #kind()} is the kind with the highest own score (ties: the order of
 * {@link Kind}).
 *
 * @param kind     the strongest kind of evidence
 * @param members  two or more members, most frequent first (then by term)
 * @param score    combined score in [0, 1]; higher is surer
 * @param reason   one readable sentence per supporting kind, strongest first
 * @param support  every kind that proposed these members, strongest first
 * @param evidence a few keyword-in-context lines showing the members in use (may be empty)
 */
public record Suggestion(Kind kind, List<Member> members, double score, String reason, List<Support> support,
                         List<EvidenceLine> evidence) {

    /** What made a suggestion. Each kind's score is in [0, 1]. */
    public enum Kind {
        /** Same variant group key: case, hyphen, spacing, plural, light stem ({@code VariantKey}). */
        SAME_GROUP_KEY,
        /** Spelling variants: US/UK patterns, doubled consonants, small edit distance for the length. */
        SPELLING_VARIANT,
        /** A short form and its spelled-out form, found in the catalog itself ("durable water repellent (DWR)"). */
        ABBREVIATION,
        /** Synonyms in one WordNet synset whose sense fits the catalog. */
        WORDNET_SYNONYM,
        /** Used in the same contexts: cosine of positive-PMI context vectors from the catalog. */
        DISTRIBUTIONAL,
        /** Values written under the same spec key. */
        SAME_SPEC_KEY;

        /** The word used in files and on the command line: same-group-key, spelling-variant … */
        public String word() {
            return KindWords.word(this);
        }

        /** The kind for a word as {@link #word()} writes it (case-insensitive, '_' or '-'). */
        public static Kind ofWord(String w) {
            return KindWords.of(Kind.class, w, "suggestion kind");
        }
    }

    /**
     * One member of a suggestion.
     *
     * @param term      the harvest's form of the term (analysed tokens joined by spaces)
     * @param shown     the most frequent written form seen (e.g. "Two-Way Zipper"), else the term
     * @param conceptId the concept the term already belongs to (a label of it, or a kept decision), or null
     * @param frequency occurrences in the catalog (from the harvest; 0 when the term is only a concept label)
     * @param df        listings that contain it
     */
    public record Member(String term, String shown, String conceptId, long frequency, long df) {
        public Member {
            Objects.requireNonNull(term, "term");
            Objects.requireNonNull(shown, "shown");
            if (frequency < 0 || df < 0) {
                throw new IllegalArgumentException("member '" + term + "' needs frequency >= 0 and df >= 0, got "
                        + frequency + " and " + df);
            }
        }
    }

    /**
     * One kind of evidence for a suggestion.
     *
     * @param kind    the kind
     * @param score   the kind's own score in [0, 1]
     * @param reason  a readable sentence that says what was found ("US/UK spelling -our/-or")
     * @param figures the numbers behind it, by name ("cosine", "edit distance", "listings together" …), in a stable order
     */
    public record Support(Kind kind, double score, String reason, Map<String, Double> figures) {
        public Support {
            Objects.requireNonNull(kind, "kind");
            Objects.requireNonNull(reason, "reason");
            checkScore(score, "support score");
            figures = Collections.unmodifiableMap(new LinkedHashMap<>(figures));
        }
    }

    public Suggestion {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(reason, "reason");
        members = List.copyOf(members);
        if (members.size() < 2) {
            throw new IllegalArgumentException("a suggestion needs at least two members, got " + members);
        }
        support = List.copyOf(support);
        if (support.isEmpty()) {
            throw new IllegalArgumentException("a suggestion needs at least one kind of support");
        }
        checkScore(score, "score");
        evidence = List.copyOf(evidence);
    }

    /** The members' terms, in member order. */
    public List<String> terms() {
        List<String> t = new ArrayList<>(members.size());
        for (Member m : members) {
            t.add(m.term());
        }
        return Collections.unmodifiableList(t);
    }

    /** The distinct concept ids the members already belong to, in member order (empty when none is a concept yet). */
    public List<String> conceptIds() {
        List<String> ids = new ArrayList<>();
        for (Member m : members) {
            if (m.conceptId() != null && !ids.contains(m.conceptId())) {
                ids.add(m.conceptId());
            }
        }
        return Collections.unmodifiableList(ids);
    }

    /** Whether {@code k} is among the kinds that support this suggestion. */
    public boolean supportedBy(Kind k) {
        for (Support s : support) {
            if (s.kind() == k) {
                return true;
            }
        }
        return false;
    }

    /** The score {@code k} gave, or 0 when it does not support this suggestion. */
    public double scoreOf(Kind k) {
        for (Support s : support) {
            if (s.kind() == k) {
                return s.score();
            }
        }
        return 0;
    }

    /** A stable key for these members: their terms sorted and joined by " | ". */
    public String key() {
        List<String> t = new ArrayList<>(terms());
        Collections.sort(t);
        return String.join(" | ", t);
    }

    static void checkScore(double score, String what) {
        if (!(score >= 0 && score <= 1)) {
            throw new IllegalArgumentException(what + " must be in [0, 1], got " + score);
        }
    }
}
