package dev.sheaf.curator.hierarchy;

import java.util.Set;

/**
 * What an edit changed in the tree, so the view updates only those rows instead of rebuilding.
 *
 * @param parents ids whose list of children changed ({@link HierarchyViewModel#TOP} for the top level)
 * @param rows ids whose own row changed (label, note, child count, caution)
 */
public record TreeChange(Set<String> parents, Set<String> rows) {
    public TreeChange {
        parents = Set.copyOf(parents);
        rows = Set.copyOf(rows);
    }

    public boolean isEmpty() {
        return parents.isEmpty() && rows.isEmpty();
    }
}
