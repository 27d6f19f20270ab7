package dev.sheaf.vocab.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Two processes saving one vocabulary: while one has it open, a save from another process (a whole
 * write, as an import or a CLI command does) is refused with a message naming the holder, and the
 * file, its backup and its journal are left byte for byte as they were.
 */
class TwoProcessSaveTest {
    @Test
    void aSaveFromASecondProcessIsRefusedAndNothingIsClobbered(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("shared.vocab.json");
        VocabularyStore.write(f, Fixtures.fernhollow());
        byte[] before = Files.readAllBytes(f);
        Process holder = ChildJvm.start("hold", f);
        try (BufferedReader r = new BufferedReader(new InputStreamReader(holder.getInputStream(), StandardCharsets.UTF_8))) {
            assertTrue(r.readLine().startsWith("open "));
            List<Path> others = siblings(dir);
            List<byte[]> othersBefore = new ArrayList<>();
            for (Path p : others) {
                othersBefore.add(Files.readAllBytes(p));
            }
            Vocabulary v = Fixtures.fernhollow();
            List<Concept> more = new ArrayList<>(v.allConcepts());
            more.add(Concept.builder("clobber").prefLabel("clobbered value").broader("material").build());
            Vocabulary mine = Vocabulary.of(v.scheme(), more, v.retired(), v.decisions());
            VocabularyLockedException e = assertThrows(VocabularyLockedException.class, () -> VocabularyStore.write(f, mine));
            assertTrue(e.getMessage().contains("process " + holder.pid()), e.getMessage());
            assertArrayEquals(before, Files.readAllBytes(f), "the file is untouched");
            assertTrue(siblings(dir).equals(others), "no file added or removed: " + siblings(dir));
            for (int i = 0; i < others.size(); i++) {
                assertArrayEquals(othersBefore.get(i), Files.readAllBytes(others.get(i)), others.get(i) + " changed");
            }
        } finally {
            holder.destroyForcibly().waitFor(30, TimeUnit.SECONDS);
        }
    }

    private static List<Path> siblings(Path dir) throws java.io.IOException {
        try (var s = Files.list(dir)) {
            return s.sorted().toList();
        }
    }
}
