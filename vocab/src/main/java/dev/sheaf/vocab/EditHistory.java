package dev.sheaf.vocab;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.time.Instant;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;

/**
 * The current vocabulary with unlimited undo and redo. Each change is one {@link Step} holding
 * its forward and backward patch; listeners hear about every change after it is made (plain
 * Java, so a desktop view-model can bind to it). Not thread-safe: use it from one thread (the UI
 * thread); the snapshots it hands out are immutable and may be read anywhere.
 *
 * <p>A store can install a {@link Recorder} that writes each step durably before it takes effect
 * (the edit journal); a step the recorder cannot write is not applied.
 */
public final class EditHistory {

    /** What a step did. */
    public enum Action { DO, UNDO, REDO }

    /**
     * One change as recorded: {@code forward} is what it applied, {@code backward} undoes it.
     *
     * @param seq a number increasing by one per step in this history (and its journal)
     * @param ref for DO, equal to seq; for UNDO and REDO, the seq of the DO step they undo or redo
     * @param action do, undo or redo
     * @param description the edit's description
     * @param when when the step was made
     */
    public record Step(long seq, long ref, Action action, String description, Instant when, Patch forward, Patch backward) {
        public Step {
            Objects.requireNonNull(action);
            Objects.requireNonNull(description);
            Objects.requireNonNull(when);
            Objects.requireNonNull(forward);
            Objects.requireNonNull(backward);
        }
    }

    /** Writes a step durably before it takes effect. */
    @FunctionalInterface
    public interface Recorder {
        void record(Step step) throws IOException;
    }

    /** Hears about every change, after it took effect. */
    @FunctionalInterface
    public interface Listener {
        /**
         * @param step what changed
         * @param before the snapshot before
         * @param after the snapshot now current
         */
        void changed(Step step, Vocabulary before, Vocabulary after);
    }

    /** An entry of the undo or redo stack. */
    private record Entry(long ref, String description, Patch forward, Patch backward) {
    }

    private Vocabulary current;
    private final Deque<Entry> undo = new ArrayDeque<>();
    private final Deque<Entry> redo = new ArrayDeque<>();
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private Recorder recorder;
    private long seq;

    public EditHistory(Vocabulary initial) {
        this.current = Objects.requireNonNull(initial);
    }

    public Vocabulary current() {
        return current;
    }

    /** Why {@code edit} cannot apply now; empty when it can. */
    public List<String> validate(Edit edit) {
        return edit.problems(current);
    }

    /**
     * Validates and applies an edit; it becomes undoable and the redo stack is cleared.
     *
     * @throws EditRefusedException when it does not validate (nothing changes)
     * @throws UncheckedIOException when the recorder (journal) cannot write it (nothing changes)
     */
    public Vocabulary apply(Edit edit) {
        Edit.Attempt a = edit.attempt(current).orThrow(edit, current);
        String d = edit.describe(current);
        long s = seq + 1;
        Step step = new Step(s, s, Action.DO, d, Instant.now(), a.forward(), a.backward());
        Vocabulary before = commit(step, a.after());
        undo.push(new Entry(s, d, a.forward(), a.backward()));
        redo.clear();
        notify(step, before, a.after());
        return current;
    }

    public boolean canUndo() {
        return !undo.isEmpty();
    }

    public boolean canRedo() {
        return !redo.isEmpty();
    }

    /** What undo would undo. */
    public Optional<String> undoDescription() {
        return undo.isEmpty() ? Optional.empty() : Optional.of(undo.peek().description());
    }

    /** What redo would redo. */
    public Optional<String> redoDescription() {
        return redo.isEmpty() ? Optional.empty() : Optional.of(redo.peek().description());
    }

    /** Descriptions on the undo stack, most recent first. */
    public List<String> undoDescriptions() {
        List<String> out = new ArrayList<>();
        undo.forEach(e -> out.add(e.description()));
        return out;
    }

    /** Undoes the most recent step. @throws IllegalStateException when there is nothing to undo */
    public Vocabulary undo() {
        if (undo.isEmpty()) {
            throw new IllegalStateException("nothing to undo");
        }
        Entry e = undo.peek();
        Vocabulary after = current.with(e.backward());
        Step step = new Step(seq + 1, e.ref(), Action.UNDO, e.description(), Instant.now(), e.backward(), e.forward());
        Vocabulary was = commit(step, after);
        redo.push(undo.pop());
        notify(step, was, after);
        return current;
    }

    /** Redoes the most recently undone step. @throws IllegalStateException when there is nothing to redo */
    public Vocabulary redo() {
        if (redo.isEmpty()) {
            throw new IllegalStateException("nothing to redo");
        }
        Entry e = redo.peek();
        Vocabulary after = current.with(e.forward());
        Step step = new Step(seq + 1, e.ref(), Action.REDO, e.description(), Instant.now(), e.forward(), e.backward());
        Vocabulary was = commit(step, after);
        undo.push(redo.pop());
        notify(step, was, after);
        return current;
    }

    public void addListener(Listener l) {
        listeners.add(Objects.requireNonNull(l));
    }

    public void removeListener(Listener l) {
        listeners.remove(l);
    }

    /** Installs the recorder that writes each step before it applies (one at most; null removes it). */
    public void setRecorder(Recorder r) {
        this.recorder = r;
    }

    /** The seq of the last step made or replayed. */
    public long lastSeq() {
        return seq;
    }

    /**
     * Re-applies a recorded step (crash recovery): its forward patch is applied without the
     * recorder, and the undo and redo stacks are rebuilt as they were when it was recorded.
     *
     * @throws IllegalArgumentException when its seq does not follow the last one
     */
    public void replay(Step step) {
        if (step.seq() <= seq) {
            throw new IllegalArgumentException("journal step " + step.seq() + " does not follow step " + seq);
        }
        Vocabulary after = current.with(step.forward());
        Entry asDone = new Entry(step.ref(), step.description(), step.action() == Action.UNDO ? step.backward() : step.forward(),
                step.action() == Action.UNDO ? step.forward() : step.backward());
        switch (step.action()) {
            case DO:
                undo.push(asDone);
                redo.clear();
                break;
            case UNDO:
                if (!undo.isEmpty() && undo.peek().ref() == step.ref()) {
                    undo.pop();
                }
                redo.push(asDone);
                break;
            default:
                if (!redo.isEmpty() && redo.peek().ref() == step.ref()) {
                    redo.pop();
                }
                undo.push(asDone);
        }
        Vocabulary before = current;
        current = after;
        seq = step.seq();
        notify(step, before, after);
    }

    /** Continues numbering after {@code last} (a store calls this when its journal already holds steps). */
    public void continueAfter(long last) {
        if (last > seq) {
            seq = last;
        }
    }

    /** Records the step, then makes {@code after} current; returns the snapshot it replaced. */
    private Vocabulary commit(Step step, Vocabulary after) {
        if (recorder != null) {
            try {
                recorder.record(step);
            } catch (IOException e) {
                throw new UncheckedIOException("could not write \"" + step.description()
                        + "\" to the edit journal, so it was not applied: " + e.getMessage(), e);
            }
        }
        Vocabulary before = current;
        current = after;
        seq = step.seq();
        return before;
    }

    private void notify(Step step, Vocabulary before, Vocabulary after) {
        for (Listener l : listeners) {
            l.changed(step, before, after);
        }
    }
}
