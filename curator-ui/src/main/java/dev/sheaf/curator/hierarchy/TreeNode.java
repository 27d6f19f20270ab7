package dev.sheaf.curator.hierarchy;

import java.util.List;
import java.util.Objects;

/**
 * One row of the hierarchy: a facet or concept as it appears under one parent. With
 * polyhierarchy a concept has one row under each broader concept; {@link #alsoUnder} names the
 * others, so the curator sees at once that editing it here changes it there too.
 *
 * @param id the concept or facet id
 * @param label its preferred label
 * @param facet whether it is a facet
 * @param parent the id of the concept this row sits under, or null at the top
 * @param alsoUnder preferred labels of its other broader concepts, by label (empty when it has one parent)
 * @param children how many concepts sit directly under it
 * @param regulated whether it is, or sits in, a facet marked as a regulated claim
 * @param unfiled a value at the top, under no facet (the checks report it too)
 */
public record TreeNode(String id, String label, boolean facet, String parent, List<String> alsoUnder, int children,
                       boolean regulated, boolean unfiled) {
    public TreeNode {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(label, "label");
        alsoUnder = List.copyOf(alsoUnder);
        if (children < 0) {
            throw new IllegalArgumentException("children must be >= 0, got " + children);
        }
    }

    /** True when the node has nothing under it. */
    public boolean isLeaf() {
        return children == 0;
    }

    /** The note shown after the label for a concept with several parents ("also under Synthetic fill"), or "". */
    public String alsoUnderNote() {
        return alsoUnder.isEmpty() ? "" : "also under " + String.join(", ", alsoUnder);
    }
}
