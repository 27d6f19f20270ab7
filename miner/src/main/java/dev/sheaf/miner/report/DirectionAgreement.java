package dev.sheaf.miner.report;

import java.util.Objects;

/**
 * How often feedback that mentions an attribute with a direction (the target has more or less of
 * it, has it or lacks it) agrees with the listings' labels.
 *
 * @param attribute the attribute as shown
 * @param mentions  mentions with a direction that could be checked against the labels
 * @param agreeing  of those, mentions whose direction agrees
 */
public record DirectionAgreement(String attribute, int mentions, int agreeing) {
    public DirectionAgreement {
        Objects.requireNonNull(attribute, "attribute");
        if (mentions < 0 || agreeing < 0 || agreeing > mentions) {
            throw new IllegalArgumentException("direction agreement of '" + attribute
                    + "' needs 0 <= agreeing <= mentions, got " + agreeing + " of " + mentions);
        }
    }

    /** agreeing / mentions; NaN when there are no checked mentions. */
    public double share() {
        return mentions == 0 ? Double.NaN : (double) agreeing / mentions;
    }
}
