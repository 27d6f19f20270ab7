package dev.sheaf.vocab;

import java.util.List;

/** An edit that failed validation; nothing was changed. {@link #problems()} says why, one line each. */
public final class EditRefusedException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient List<String> problems;

    public EditRefusedException(String edit, List<String> problems) {
        super(edit + " was refused: " + String.join("; ", problems));
        this.problems = List.copyOf(problems);
    }

    public List<String> problems() {
        return problems;
    }
}
