package dev.sheaf.vocab;

import java.util.Comparator;
import java.util.Objects;

/** One label of a concept together with its kind; what a labeler iterates over. */
public record ConceptLabel(LabelKind kind, Label label) implements Comparable<ConceptLabel> {
    private static final Comparator<ConceptLabel> ORDER =
            Comparator.comparing(ConceptLabel::kind).thenComparing(ConceptLabel::label);

    public ConceptLabel {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(label, "label");
    }

    public String text() {
        return label.text();
    }

    public String lang() {
        return label.lang();
    }

    @Override
    public int compareTo(ConceptLabel o) {
        return ORDER.compare(this, o);
    }
}
