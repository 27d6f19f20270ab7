package dev.sheaf.curator.session;

import java.util.Objects;

/**
 * Something the curator must read: shown by the view as a dialog (errors and warnings) or in the
 * status bar (information).
 *
 * @param kind  how serious
 * @param title a few words ("The vocabulary is open elsewhere")
 * @param text  what happened, where, and what to do
 */
public record Notice(Kind kind, String title, String text) {
    /** How serious a notice is. */
    public enum Kind { INFO, WARNING, ERROR }

    public Notice {
        Objects.requireNonNull(kind);
        Objects.requireNonNull(title);
        Objects.requireNonNull(text);
    }
}
