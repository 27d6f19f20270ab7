package dev.sheaf.curator.session;

import javafx.beans.property.ObjectProperty;
import javafx.beans.property.SimpleObjectProperty;

/**
 * What the curator is looking at, shared by every panel: the selected candidate term of the
 * harvest and the selected concept of the vocabulary. Either may be null. Panels set them when
 * the user selects something and listen to show details, evidence, suggestions and figures.
 * UI thread only.
 *
 * <p>Keeping a term "as a label of the selected concept" uses {@link #conceptProperty()}, so the
 * harvest and the hierarchy cooperate through this object without knowing each other.
 */
public final class Selection {
    private final ObjectProperty<String> term = new SimpleObjectProperty<>(this, "term");
    private final ObjectProperty<String> concept = new SimpleObjectProperty<>(this, "concept");
    private final ObjectProperty<Focus> focus = new SimpleObjectProperty<>(this, "focus", Focus.NONE);

    /** Which of the two was selected last (what the details and evidence panels show). */
    public enum Focus { NONE, TERM, CONCEPT }

    /** The selected candidate term as mined, or null. Setting a non-null term makes it the {@linkplain #focusProperty() focus}. */
    public ObjectProperty<String> termProperty() {
        return term;
    }

    public String term() {
        return term.get();
    }

    public void selectTerm(String t) {
        term.set(t);
        if (t != null) {
            focus.set(Focus.TERM);
        } else if (focus.get() == Focus.TERM) {
            focus.set(concept.get() != null ? Focus.CONCEPT : Focus.NONE);
        }
    }

    /** The id of the selected concept (or facet), or null. Setting a non-null id makes it the focus. */
    public ObjectProperty<String> conceptProperty() {
        return concept;
    }

    public String concept() {
        return concept.get();
    }

    public void selectConcept(String id) {
        concept.set(id);
        if (id != null) {
            focus.set(Focus.CONCEPT);
        } else if (focus.get() == Focus.CONCEPT) {
            focus.set(term.get() != null ? Focus.TERM : Focus.NONE);
        }
    }

    /** The last thing selected. */
    public ObjectProperty<Focus> focusProperty() {
        return focus;
    }

    public Focus focus() {
        return focus.get();
    }
}
