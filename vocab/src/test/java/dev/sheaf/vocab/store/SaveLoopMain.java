package dev.sheaf.vocab.store;

import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Edit;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/**
 * A child process for the crash tests. {@code loop FILE}: opens the vocabulary (recovering its
 * journal), then adds concepts k1, k2 ... forever, printing "done N" once an edit is in the
 * journal, "saving N" before and "saved N" after each save, until it is killed. {@code hold FILE}: opens it, prints
 * "open" and waits. {@code try FILE}: tries to open it and prints "opened" or "refused: message".
 */
public final class SaveLoopMain {
    private SaveLoopMain() {
    }

    public static void main(String[] args) throws Exception {
        PrintStream out = new PrintStream(System.out, true, StandardCharsets.UTF_8);
        Path file = Path.of(args[1]);
        switch (args[0]) {
            case "loop":
                loop(file, out);
                break;
            case "hold":
                try (VocabularyStore s = VocabularyStore.open(file)) {
                    out.println("open " + s.current().size());
                    Thread.sleep(60_000);
                }
                break;
            default:
                try (VocabularyStore s = VocabularyStore.open(file)) {
                    out.println("opened " + s.current().size());
                } catch (VocabularyLockedException e) {
                    out.println("refused: " + e.getMessage());
                }
        }
    }

    private static void loop(Path file, PrintStream out) throws Exception {
        VocabularyStore s = VocabularyStore.open(file);
        int next = highest(s) + 1;
        out.println("ready " + next);
        for (int i = next; ; i++) {
            s.history().apply(Edit.addConcept(Concept.builder("k" + i).prefLabel("kept value " + i).broader("material").build()));
            out.println("done " + i);
            if (i % 2 == 0) {
                out.println("saving " + i);
                s.save();
                out.println("saved " + i);
            }
        }
    }

    static int highest(VocabularyStore s) {
        int max = 0;
        for (Concept c : s.current().allConcepts()) {
            if (c.id().matches("k\\d+")) {
                max = Math.max(max, Integer.parseInt(c.id().substring(1)));
            }
        }
        return max;
    }
}
