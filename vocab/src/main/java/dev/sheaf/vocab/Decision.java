package dev.sheaf.vocab;

import java.time.Instant;
import java.util.Locale;
import java.util.Objects;

/**
 * A curator's decision on a mined candidate term. Decisions are keyed by the {@linkplain
 * Terms#normalise normalised} term, so a re-mine that finds "Rip-Stop" again knows that "rip stop"
 * was dropped.
 *
 * @param term the candidate term as mined
 * @param outcome kept, dropped or parked
 * @param concept for kept: the id of the concept the term became or was added to; null otherwise
 * @param reason why (required for dropped, optional otherwise)
 * @param when when decided, or null
 * @param by who decided, or null
 */
public record Decision(String term, Outcome outcome, String concept, String reason, Instant when, String by) {

    /** The three outcomes of a candidate. */
    public enum Outcome {
        KEPT, DROPPED, PARKED;

        /** The word used in files: kept, dropped, parked. */
        public String word() {
            return name().toLowerCase(Locale.ROOT);
        }

        public static Outcome ofWord(String w) {
            for (Outcome o : values()) {
                if (o.word().equals(w)) {
                    return o;
                }
            }
            throw new IllegalArgumentException("decision \"" + w + "\" is not one of kept, dropped, parked");
        }
    }

    public Decision {
        term = Label.checkText(term, "candidate term");
        Objects.requireNonNull(outcome, "outcome");
        if (reason != null) {
            reason = reason.strip();
            if (reason.isEmpty()) {
                reason = null;
            }
        }
        if (by != null) {
            by = Label.checkText(by, "decision 'by'");
        }
        switch (outcome) {
            case KEPT:
                if (concept == null) {
                    throw new IllegalArgumentException("kept term \"" + term + "\" names no concept; say which concept it became");
                }
                Concept.checkId(concept);
                break;
            case DROPPED:
                if (concept != null) {
                    throw new IllegalArgumentException("dropped term \"" + term + "\" names a concept; only kept terms do");
                }
                if (reason == null) {
                    throw new IllegalArgumentException("dropped term \"" + term + "\" has no reason; say why it was dropped");
                }
                break;
            default:
                if (concept != null) {
                    throw new IllegalArgumentException("parked term \"" + term + "\" names a concept; only kept terms do");
                }
        }
    }

    public static Decision kept(String term, String conceptId) {
        return new Decision(term, Outcome.KEPT, conceptId, null, null, null);
    }

    public static Decision dropped(String term, String reason) {
        return new Decision(term, Outcome.DROPPED, null, reason, null, null);
    }

    public static Decision parked(String term) {
        return new Decision(term, Outcome.PARKED, null, null, null, null);
    }

    /** The same decision stamped with when and by whom. */
    public Decision at(Instant when, String by) {
        return new Decision(term, outcome, concept, reason, when, by);
    }

    /** The key decisions are stored and looked up by. */
    public String key() {
        return Terms.normalise(term);
    }
}
