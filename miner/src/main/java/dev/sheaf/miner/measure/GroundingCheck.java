package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * The catalog check of one mention.
 *
 * @param outcome        grounded, not grounded or unchecked
 * @param kind           {@link #PRESENCE} for a present/absent mention of a concept, {@link #COMPARISON} for a
 *                       more/less mention checked on a number facet
 * @param facet          the number facet compared (comparison only), else null
 * @param targetValue    the target's value (comparison only), else null
 * @param referenceValue the reference's value (comparison only), else null
 * @param contrast       presence only, when grounded and the reference is known: true when the reference
 *                       differs (lacks what the target is said to have, or has what the target is said to
 *                       lack); otherwise null
 * @param reason         a plain-English account of the outcome
 */
public record GroundingCheck(GroundingOutcome outcome, String kind, String facet, Double targetValue, Double referenceValue,
                             Boolean contrast, String reason) {
    /** A present/absent mention checked on the target's concepts. */
    public static final String PRESENCE = "presence";
    /** A more/less mention checked on a number facet's values. */
    public static final String COMPARISON = "comparison";

    public GroundingCheck {
        Objects.requireNonNull(outcome, "outcome");
        Objects.requireNonNull(reason, "reason");
        if (!PRESENCE.equals(kind) && !COMPARISON.equals(kind)) {
            throw new IllegalArgumentException("grounding kind must be " + PRESENCE + " or " + COMPARISON + ", got " + kind);
        }
        if (contrast != null && (outcome != GroundingOutcome.GROUNDED || !PRESENCE.equals(kind))) {
            throw new IllegalArgumentException("contrast belongs to grounded presence checks only");
        }
    }

    public boolean grounded() {
        return outcome == GroundingOutcome.GROUNDED;
    }

    public boolean checked() {
        return outcome != GroundingOutcome.UNCHECKED;
    }
}
