package dev.sheaf.vocab.diff;

import dev.sheaf.vocab.ConceptLabel;
import java.util.List;

/** One change between two versions of a vocabulary. Labels are the preferred labels in the default language. */
public sealed interface Change {

    /** The concept the change is about (for decisions: the normalised term). */
    String id();

    /** A new concept or facet. */
    record Added(String id, String label, boolean facet, List<String> under) implements Change {
        public Added {
            under = List.copyOf(under);
        }
    }

    /** A concept deleted (or missing from the new version). */
    record Removed(String id, String label, boolean facet) implements Change {
    }

    /** A preferred label changed (the id stayed). */
    record Renamed(String id, String lang, String from, String to) implements Change {
    }

    /** A concept merged into another: the old id is kept as "replaced by". */
    record Merged(String id, String label, String intoId, String intoLabel) implements Change {
    }

    /** Labels split off a concept into a new one. */
    record Split(String id, String label, String newId, String newLabel, List<String> movedLabels) implements Change {
        public Split {
            movedLabels = List.copyOf(movedLabels);
        }
    }

    /** A concept put under other broader concepts (names given as labels). */
    record Moved(String id, String label, List<String> from, List<String> to) implements Change {
        public Moved {
            from = List.copyOf(from);
            to = List.copyOf(to);
        }
    }

    /** Alternative, hidden or extra-language preferred labels added or removed. */
    record LabelsChanged(String id, String label, List<ConceptLabel> added, List<ConceptLabel> removed) implements Change {
        public LabelsChanged {
            added = List.copyOf(added);
            removed = List.copyOf(removed);
        }
    }

    /** Another property changed: notes, related concepts, mappings, facet properties. */
    record Changed(String id, String label, String what, String before, String after) implements Change {
    }

    /** A candidate decision recorded, changed or forgotten. */
    record DecisionChanged(String id, String term, String before, String after) implements Change {
    }
}
