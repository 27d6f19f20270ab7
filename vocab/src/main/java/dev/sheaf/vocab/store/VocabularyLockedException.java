package dev.sheaf.vocab.store;

import java.io.IOException;

/** Another session (this or another program) has the vocabulary open for editing. */
public final class VocabularyLockedException extends IOException {
    private static final long serialVersionUID = 1L;

    VocabularyLockedException(String message) {
        super(message);
    }
}
