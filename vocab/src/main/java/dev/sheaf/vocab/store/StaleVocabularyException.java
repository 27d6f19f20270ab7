package dev.sheaf.vocab.store;

import java.io.IOException;

/** The file on disk changed since it was loaded, so saving would overwrite someone else's changes. Nothing was written. */
public final class StaleVocabularyException extends IOException {
    private static final long serialVersionUID = 1L;

    StaleVocabularyException(String message) {
        super(message);
    }
}
