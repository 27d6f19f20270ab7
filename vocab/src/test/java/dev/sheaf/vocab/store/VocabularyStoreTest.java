package dev.sheaf.vocab.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.Fixtures;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class VocabularyStoreTest {
    @TempDir
    Path dir;

    private Path file() {
        return dir.resolve("fernhollow.vocab.json");
    }

    private Path created() throws Exception {
        VocabularyStore.write(file(), Fixtures.fernhollow());
        return file();
    }

    private static Edit addValue(String id) {
        return Edit.addConcept(Concept.builder(id).prefLabel("value " + id).broader("material").build());
    }

    @Test
    void savesAtomicallyAndKeepsThePreviousVersionAsBackup() throws Exception {
        Path f = created();
        String before = Files.readString(f);
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertFalse(s.isDirty());
            assertFalse(s.save(), "nothing to save");
            s.history().apply(addValue("mesh"));
            assertTrue(s.isDirty());
            assertTrue(s.save());
            assertFalse(s.isDirty());
        }
        assertTrue(VocabularyStore.read(f).contains("mesh"));
        assertEquals(before, Files.readString(dir.resolve("fernhollow.vocab.json~")));
        try (var files = Files.list(dir)) {
            assertTrue(files.noneMatch(p -> p.getFileName().toString().endsWith(".tmp")), "no temporary files left");
        }
    }

    @Test
    void recoversUnsavedEditsFromTheJournal() throws Exception {
        Path f = created();
        Vocabulary expected;
        try (VocabularyStore s = VocabularyStore.open(f)) {
            s.history().apply(addValue("mesh"));
            s.history().apply(Edit.rename("toggle", Label.of("toggle fastener")));
            s.history().apply(addValue("canvas"));
            s.history().undo();
            expected = s.current();
            // closed without saving, as after a crash
        }
        assertEquals(1, VocabularyStore.unsavedSteps(f) > 0 ? 1 : 0);
        assertFalse(VocabularyStore.read(f).contains("mesh"), "the file itself is untouched");
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertEquals(4, s.recovery().replayedSteps());
            assertEquals(expected, s.current());
            assertTrue(s.isDirty());
            assertTrue(s.history().canRedo(), "the undone edit can be redone after recovery");
            s.history().redo();
            assertTrue(s.current().contains("canvas"));
            s.save();
        }
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertTrue(s.recovery().isEmpty(), "after a save the journal starts afresh");
            assertTrue(s.current().contains("canvas"));
        }
    }

    @Test
    void ignoresAnIncompleteLastJournalLine() throws Exception {
        Path f = created();
        try (VocabularyStore s = VocabularyStore.open(f)) {
            s.history().apply(addValue("mesh"));
        }
        Files.writeString(Journal.pathFor(f), "{\"kind\":\"step\",\"seq\":2,\"ref\"", StandardCharsets.UTF_8,
                StandardOpenOption.APPEND);
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertEquals(1, s.recovery().replayedSteps());
            assertTrue(s.recovery().notes().get(0).contains("incomplete"));
            assertTrue(s.current().contains("mesh"));
        }
    }

    @Test
    void setsADamagedJournalAsideInsteadOfGuessing() throws Exception {
        Path f = created();
        try (VocabularyStore s = VocabularyStore.open(f)) {
            s.history().apply(addValue("mesh"));
            s.history().apply(addValue("canvas"));
        }
        java.util.List<String> lines = Files.readAllLines(Journal.pathFor(f));
        lines.set(1, "this is not json");
        Files.write(Journal.pathFor(f), lines);
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertEquals(0, s.recovery().replayedSteps());
            assertTrue(s.recovery().notes().get(0).contains("damaged"), s.recovery().notes().toString());
        }
        try (var files = Files.list(dir)) {
            assertTrue(files.anyMatch(p -> p.getFileName().toString().contains(".journal.damaged-")));
        }
    }

    @Test
    void aJournalForAnotherVersionOfTheFileIsNotReplayed() throws Exception {
        Path f = created();
        try (VocabularyStore s = VocabularyStore.open(f)) {
            s.history().apply(addValue("mesh"));
        }
        // someone replaces the file (e.g. a checkout) while edits sit in the journal
        VocabularyStore.write(f, Fixtures.fernhollow().apply(addValue("canvas")));
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertEquals(0, s.recovery().replayedSteps());
            assertTrue(s.recovery().notes().get(0).contains("another version"), s.recovery().notes().toString());
            assertFalse(s.current().contains("mesh"));
        }
    }

    @Test
    void refusesToOverwriteAFileChangedOnDiskSinceItWasLoaded() throws Exception {
        Path f = created();
        try (VocabularyStore s = VocabularyStore.open(f)) {
            s.history().apply(addValue("mesh"));
            String theirs = VocabularyStore.toJson(Fixtures.fernhollow().apply(addValue("canvas")));
            Files.writeString(f, theirs); // another editor, bypassing the lock
            StaleVocabularyException e = assertThrows(StaleVocabularyException.class, s::save);
            assertTrue(e.getMessage().contains("changed on disk since it was opened"), e.getMessage());
            assertTrue(e.getMessage().contains("journal"));
            assertEquals(theirs, Files.readString(f), "their version is untouched");
            Path mine = dir.resolve("mine.vocab.json");
            s.saveAs(mine);
            assertTrue(VocabularyStore.read(mine).contains("mesh"));
            s.history().apply(addValue("felt"));
            s.save();
            assertTrue(VocabularyStore.read(mine).contains("felt"));
        }
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertEquals(0, s.recovery().replayedSteps(), "edits saved elsewhere are not replayed onto the old file");
        }
    }

    @Test
    void aSecondSessionInThisProgramIsRefused() throws Exception {
        Path f = created();
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertTrue(s.current().contains("nylon"));
            VocabularyLockedException e = assertThrows(VocabularyLockedException.class, () -> VocabularyStore.open(f));
            assertTrue(e.getMessage().contains("already open"), e.getMessage());
            assertThrows(VocabularyLockedException.class, () -> VocabularyStore.write(f, Fixtures.fernhollow()));
        }
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertTrue(s.recovery().isEmpty(), "the lock is released on close");
        }
    }

    @Test
    void aSecondProcessIsRefusedClearly() throws Exception {
        Path f = created();
        Process holder = ChildJvm.start("hold", f);
        try (BufferedReader r = new BufferedReader(new InputStreamReader(holder.getInputStream(), StandardCharsets.UTF_8))) {
            assertTrue(r.readLine().startsWith("open "));
            VocabularyLockedException e = assertThrows(VocabularyLockedException.class, () -> VocabularyStore.open(f));
            assertTrue(e.getMessage().contains("another program"), e.getMessage());
            assertTrue(e.getMessage().contains("process " + holder.pid()), e.getMessage());
        } finally {
            holder.destroyForcibly().waitFor(30, TimeUnit.SECONDS);
        }
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertTrue(s.current().contains("nylon"), "a killed holder leaves the lock free");
        }
    }

    @Test
    void aDamagedFileGetsLineAndColumnAndIsNotOverwritten() throws Exception {
        Path f = created();
        String broken = Files.readString(f).replace("\"id\": \"toggle\",", "\"id\": \"toggle\"");
        Files.writeString(f, broken);
        VocabularyFormatException e = assertThrows(VocabularyFormatException.class, () -> VocabularyStore.open(f));
        assertTrue(e.line() > 1 && e.column() > 0, e.getMessage());
        assertEquals(broken, Files.readString(f));
        Files.writeString(f, VocabularyStore.toJson(Fixtures.fernhollow()));
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertTrue(s.current().contains("toggle"), "the lock was released after the failed open");
        }
    }

    @Test
    void createRefusesAnExistingFile() throws Exception {
        Path f = created();
        assertThrows(java.io.IOException.class, () -> VocabularyStore.create(f, Fixtures.fernhollow()));
        try (VocabularyStore s = VocabularyStore.create(dir.resolve("new.vocab.json"), Fixtures.fernhollow())) {
            assertFalse(s.isDirty());
        }
    }

    @Test
    void removesTemporaryFilesOfAnInterruptedWriteOnOpen() throws Exception {
        Path f = created();
        Path stale = dir.resolve(".fernhollow.vocab.json.123456.tmp");
        Files.writeString(stale, "{ half");
        Path other = dir.resolve(".other.json.1.tmp");
        Files.writeString(other, "not ours");
        try (VocabularyStore s = VocabularyStore.open(f)) {
            assertTrue(s.recovery().isEmpty());
            assertFalse(Files.exists(stale));
            assertTrue(Files.exists(other));
        }
    }
}
