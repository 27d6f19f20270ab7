package dev.sheaf.vocab.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Fixtures;
import dev.sheaf.vocab.Vocabulary;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills a child JVM ({@link SaveLoopMain}) with SIGKILL at random moments while it edits and
 * saves without pause, then checks: the file and its backup are always a complete version (a
 * prefix k1..kj of the edits), and opening it recovers every edit the child reported as done.
 * A process kill leaves the page cache intact, so this tests atomicity and the journal, not
 * power loss.
 */
class CrashDuringSaveTest {
    @TempDir
    Path dir;

    @Test
    void fileIsAlwaysOldOrNewAndTheJournalRecoversTheRest() throws Exception {
        run(50, 11);
    }

    @Test
    @Tag("slow")
    void threeHundredKills() throws Exception {
        run(300, 12);
    }

    private void run(int kills, long seed) throws Exception {
        Path f = dir.resolve("crash.vocab.json");
        // a few hundred concepts so that a save takes long enough to be interrupted in the middle
        Vocabulary v = Fixtures.fernhollow();
        List<Concept> extra = new ArrayList<>(v.allConcepts());
        for (int i = 0; i < 400; i++) {
            extra.add(Concept.builder("filler-" + i).prefLabel("filler value " + i).altLabel("filler synonym " + i)
                    .broader("material").scopeNote("A value that makes the file bigger, number " + i + ".").build());
        }
        VocabularyStore.write(f, Vocabulary.of(v.scheme(), extra, v.retired(), v.decisions()));
        Random rnd = new Random(seed);
        int expectedNext = 1;
        int midSave = 0;
        int midWrite = 0;
        for (int run = 0; run < kills; run++) {
            Process p = ChildJvm.start("loop", f);
            AtomicInteger lastDone = new AtomicInteger(-1);
            AtomicInteger lastSaved = new AtomicInteger(-1);
            AtomicInteger ready = new AtomicInteger(-1);
            AtomicInteger saving = new AtomicInteger(-1);
            Thread reader = new Thread(() -> {
                try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
                    String line;
                    while ((line = r.readLine()) != null) {
                        String[] w = line.split(" ");
                        int n = Integer.parseInt(w[1]);
                        switch (w[0]) {
                            case "ready":
                                ready.set(n);
                                break;
                            case "done":
                                lastDone.set(n);
                                break;
                            case "saving":
                                saving.set(n);
                                break;
                            default:
                                lastSaved.set(n);
                        }
                    }
                } catch (java.io.IOException | NumberFormatException e) {
                    // the pipe closes when the child is killed
                }
            });
            reader.start();
            long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
            while (ready.get() < 0 || lastDone.get() < ready.get()) {
                if (!p.isAlive() || System.nanoTime() > deadline) {
                    fail("child did not start editing (run " + run + ")");
                }
                Thread.sleep(2);
            }
            assertEquals(expectedNext, ready.get(), "the child continues after every recovered edit");
            if (run % 2 == 0) {
                Thread.sleep(rnd.nextInt(120)); // anywhere: editing, journaling or saving
            } else {
                while (saving.get() < 0 && p.isAlive() && System.nanoTime() < deadline) {
                    Thread.sleep(1);
                }
                Thread.sleep(rnd.nextInt(15)); // just after a save began
            }
            p.destroyForcibly();
            p.waitFor(30, TimeUnit.SECONDS);
            // every line the child printed before it died must be read before "done" is trusted: on a
            // loaded machine a short wait let a stale count through and the check below failed
            reader.join(120_000);
            assertFalse(reader.isAlive(), "run " + run + ": the child's output was not read to its end");
            int done = lastDone.get();
            if (saving.get() > lastSaved.get()) {
                midSave++; // a save had begun and not finished when the kill came
            }

            Vocabulary onDisk = VocabularyStore.read(f); // never a torn file
            int j = prefix(onDisk, "the file", run);
            assertEquals(VocabularyStore.toJson(onDisk), Files.readString(f), "exactly one complete version");
            Path backup = f.resolveSibling(f.getFileName() + "~");
            if (Files.exists(backup)) {
                prefix(VocabularyStore.read(backup), "the backup", run);
            }
            assertTrue(j <= done + 1, "the file holds no edit the child had not made");
            if (lastSaved.get() > j) {
                fail("run " + run + ": the child saved k" + lastSaved.get() + " but the file holds only up to k" + j);
            }
            try (var files = Files.list(dir)) {
                if (files.anyMatch(x -> x.getFileName().toString().endsWith(".tmp"))) {
                    midWrite++; // killed in the middle of an atomic write: its temporary file is still there
                }
            }
            try (VocabularyStore s = VocabularyStore.open(f)) {
                int m = prefix(s.current(), "the recovered vocabulary", run);
                assertTrue(m >= done, "run " + run + ": every reported edit is recovered (done k" + done + ", recovered k" + m + ")");
                assertTrue(m <= done + 1, "at most the one edit journaled just before the kill is extra");
                s.save();
                expectedNext = m + 1;
            }
        }
        assertTrue(expectedNext > kills, "the children made progress");
        System.err.printf("crash test: %d kills, %d edits; %d kills during a save, %d of them while a file was half written%n",
                kills, expectedNext - 1, midSave, midWrite);
        assertTrue(midSave >= kills / 4, "enough kills land inside a save to mean something: " + midSave);
    }

    /** The kept values must be exactly k1..kj; returns j. */
    private static int prefix(Vocabulary v, String what, int run) {
        TreeSet<Integer> ks = new TreeSet<>();
        for (Concept c : v.allConcepts()) {
            if (c.id().matches("k\\d+")) {
                ks.add(Integer.parseInt(c.id().substring(1)));
            }
        }
        int j = ks.isEmpty() ? 0 : ks.last();
        assertEquals(j, ks.size(), "run " + run + ": " + what + " holds a gap-free run of edits k1..k" + j);
        return j;
    }
}
