package dev.sheaf.miner.measure;

import java.util.Locale;
import java.util.Optional;

/**
 * Checks one mention against the catalog (docs/decisions/112-grounding.md):
 * <ul>
 *   <li><b>Presence</b> (direction present or absent, of a concept): "has a hood" is grounded when the
 *       target states the concept; "no hood" when the target does not state it (it negates it or is
 *       silent). A grounded mention is a <i>contrast</i> when the reference is the other way: it lacks
 *       what the target is said to have, or has what the target is said to lack.</li>
 *   <li><b>Comparison</b> (direction more or less, on a {@link GroundingScale}'s number facet):
 *       grounded when target and reference both have a value and the target's is larger (more) or
 *       smaller (less). Equal values are not grounded: the sentence claims a difference.</li>
 * </ul>
 * Anything the catalog cannot speak to is {@link GroundingOutcome#UNCHECKED}, with the reason.
 */
final class GroundingRules {
    private GroundingRules() {
    }

    static GroundingCheck check(String attribute, Direction direction, GroundingScale scale, String targetId,
                                String referenceId, GroundingCatalog catalog) {
        boolean presence = direction == Direction.PRESENT || direction == Direction.ABSENT;
        String kind = presence ? GroundingCheck.PRESENCE : GroundingCheck.COMPARISON;
        if (!presence && scale == null) {
            return unchecked(kind, null, "no scale maps '" + attribute + "' to a number facet, so 'more' or 'less' of it "
                    + "cannot be compared with catalog values");
        }
        if (catalog == null) {
            return unchecked(kind, presence ? null : scale.facet(), "no catalog facts were given (assignments)");
        }
        Optional<GroundingListing> target = catalog.listing(targetId);
        if (target.isEmpty()) {
            return unchecked(kind, presence ? null : scale.facet(), "the catalog does not hold the target listing " + targetId);
        }
        Optional<GroundingListing> reference = catalog.listing(referenceId);
        if (presence) {
            return presence(attribute, direction, target.get(), reference.orElse(null));
        }
        String facet = scale.facet();
        Double t = target.get().number(facet);
        if (t == null) {
            return unchecked(kind, facet, "the target " + targetId + " has no " + facet + " value");
        }
        if (reference.isEmpty()) {
            return new GroundingCheck(GroundingOutcome.UNCHECKED, kind, facet, t, null, null,
                    "the catalog does not hold the reference listing " + referenceId);
        }
        Double r = reference.get().number(facet);
        if (r == null) {
            return new GroundingCheck(GroundingOutcome.UNCHECKED, kind, facet, t, null, null,
                    "the reference " + referenceId + " has no " + facet + " value");
        }
        int cmp = Double.compare(t, r);
        boolean agrees = direction == Direction.MORE ? cmp > 0 : cmp < 0;
        String claim = direction == Direction.MORE ? "more" : "less";
        String values = facet + " " + number(t) + " (target) vs " + number(r) + " (reference)";
        if (agrees) {
            return new GroundingCheck(GroundingOutcome.GROUNDED, kind, facet, t, r, null, "says " + claim + "; " + values);
        }
        return new GroundingCheck(GroundingOutcome.NOT_GROUNDED, kind, facet, t, r, null,
                "says " + claim + ", but " + values + (cmp == 0 ? " are equal" : ""));
    }

    private static GroundingCheck presence(String concept, Direction direction, GroundingListing target,
                                           GroundingListing reference) {
        boolean has = target.carries(concept);
        boolean saysPresent = direction == Direction.PRESENT;
        String targetState = has ? "states " + concept : target.negated().contains(concept) ? "says it lacks " + concept
                : "does not mention " + concept;
        if (has != saysPresent) {
            return new GroundingCheck(GroundingOutcome.NOT_GROUNDED, GroundingCheck.PRESENCE, null, null, null, null,
                    "says " + (saysPresent ? "present" : "absent") + ", but the target " + target.id() + " " + targetState);
        }
        Boolean contrast = reference == null ? null : reference.carries(concept) != has;
        String ref = reference == null ? "; the reference is not in the catalog"
                : contrast ? "; the reference differs" : "; the reference is the same";
        return new GroundingCheck(GroundingOutcome.GROUNDED, GroundingCheck.PRESENCE, null, null, null, contrast,
                "says " + (saysPresent ? "present" : "absent") + "; the target " + target.id() + " " + targetState + ref);
    }

    private static GroundingCheck unchecked(String kind, String facet, String reason) {
        return new GroundingCheck(GroundingOutcome.UNCHECKED, kind, facet, null, null, null, reason);
    }

    private static String number(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : String.format(Locale.ROOT, "%.4g", v);
    }
}
