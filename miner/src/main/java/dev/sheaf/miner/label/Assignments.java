package dev.sheaf.miner.label;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Everything the labeler found in one listing: what the data scientist gets per row.
 *
 * @param listingId   the listing's id
 * @param category    its category (empty when the source has none)
 * @param source      the file it came from
 * @param locator     where in the file
 * @param assignments by concept id, numbers of one facet by value; at most one term assignment per concept
 * @param invalid     spec values of number facets that could not be read
 */
public record Assignments(String listingId, String category, String source, String locator,
                          List<Assignment> assignments, List<InvalidValue> invalid) {
    public Assignments {
        Objects.requireNonNull(listingId, "listingId");
        Objects.requireNonNull(category, "category");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(locator, "locator");
        assignments = List.copyOf(assignments);
        invalid = List.copyOf(invalid);
    }

    /** Stated assignments (numbers included). */
    public List<Assignment> stated() {
        List<Assignment> out = new ArrayList<>();
        for (Assignment a : assignments) {
            if (a.isStated()) {
                out.add(a);
            }
        }
        return out;
    }

    /** Negated assignments. */
    public List<Assignment> negated() {
        List<Assignment> out = new ArrayList<>();
        for (Assignment a : assignments) {
            if (!a.isStated()) {
                out.add(a);
            }
        }
        return out;
    }

    /** Assignments whose facet does not apply to this listing's category. */
    public List<Assignment> categoryErrors() {
        List<Assignment> out = new ArrayList<>();
        for (Assignment a : assignments) {
            if (!a.applies()) {
                out.add(a);
            }
        }
        return out;
    }

    /** True when nothing at all was found: no stated or negated concept, no number, no unreadable value. */
    public boolean isEmpty() {
        return assignments.isEmpty() && invalid.isEmpty();
    }

    /** True when no concept is stated (a listing with only negations has no positive label). */
    public boolean hasNoStatedLabel() {
        for (Assignment a : assignments) {
            if (a.isStated()) {
                return false;
            }
        }
        return true;
    }
}
