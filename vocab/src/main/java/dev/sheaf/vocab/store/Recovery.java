package dev.sheaf.vocab.store;

import java.util.List;

/**
 * What opening a vocabulary recovered from its edit journal.
 *
 * @param replayedSteps edits (and undos/redos) made after the last save and replayed now; they are not saved yet
 * @param notes what else happened (an incomplete last journal line ignored, a journal that did not
 *     match the file set aside ...), one sentence each
 */
public record Recovery(int replayedSteps, List<String> notes) {
    public Recovery {
        notes = List.copyOf(notes);
    }

    /** Whether anything was recovered or needs the user's attention. */
    public boolean isEmpty() {
        return replayedSteps == 0 && notes.isEmpty();
    }
}
