package dev.sheaf.vocab.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.List;
import java.util.TreeMap;
import java.util.concurrent.CompletableFuture;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OutputSetTest {
    @TempDir
    Path dir;

    private void writeOld() throws IOException {
        AtomicFiles.writeString(dir.resolve("a.json"), "old a");
        AtomicFiles.writeString(dir.resolve("b.csv"), "old b");
        AtomicFiles.writeString(dir.resolve("sub/c.csv"), "old c");
    }

    @Test
    void aFailureHalfWayLeavesEveryFileTheOldVersionAndNoTemporary() throws IOException {
        writeOld();
        TreeMap<String, String> before = contents();
        assertThrows(IOException.class, () -> {
            try (OutputSet set = OutputSet.open(dir)) {
                AtomicFiles.writeString(dir.resolve("a.json"), "new a");
                AtomicFiles.writeString(dir.resolve("sub/c.csv"), "new c");
                assertEquals("old a", Files.readString(dir.resolve("a.json")), "nothing is replaced before the commit");
                AtomicFiles.write(dir.resolve("b.csv"), out -> {
                    out.write("new b, half".getBytes());
                    throw new IOException("No space left on device");
                });
                set.commit();
            }
        });
        assertEquals(before, contents());
    }

    @Test
    void theCommitReplacesEveryFileAndTheBackupIsTaken() throws IOException {
        writeOld();
        try (OutputSet set = OutputSet.open(dir)) {
            AtomicFiles.writeString(dir.resolve("a.json"), "new a");
            AtomicFiles.write(dir.resolve("b.csv"), out -> out.write("new b".getBytes()), true);
            AtomicFiles.writeString(dir.resolve("sub/c.csv"), "new c");
            AtomicFiles.writeString(dir.resolve("a.json"), "newer a"); // a second write of one target: the last wins
            Path staged = set.current(dir.resolve("a.json"));
            assertNotEquals(dir.resolve("a.json"), staged);
            assertEquals("newer a", Files.readString(staged), "a later step reads what an earlier one wrote");
            assertEquals("new c", Files.readString(set.current(dir.resolve("sub/c.csv")).resolveSibling("c.csv")),
                    "a staged file keeps its name, beside the others of its folder");
            set.commit();
        }
        TreeMap<String, String> want = new TreeMap<>();
        want.put("a.json", "newer a");
        want.put("b.csv", "new b");
        want.put("b.csv~", "old b");
        want.put("sub/c.csv", "new c");
        assertEquals(want, contents());
        AtomicFiles.writeString(dir.resolve("a.json"), "after");
        assertEquals("after", Files.readString(dir.resolve("a.json")), "after the commit, writes go straight to the file");
    }

    @Test
    void aWriteFromAnotherThreadBelongsToTheSet() throws Exception {
        writeOld();
        TreeMap<String, String> before = contents();
        try (OutputSet set = OutputSet.open(dir)) {
            CompletableFuture.runAsync(() -> {
                try {
                    AtomicFiles.writeString(dir.resolve("a.json"), "new a");
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
            }).join();
            assertEquals("old a", Files.readString(dir.resolve("a.json")));
            // no commit: a failure elsewhere
        }
        assertEquals(before, contents());
    }

    @Test
    void aJoinedSetThatFailsAbandonsTheOuterOne() throws IOException {
        writeOld();
        TreeMap<String, String> before = contents();
        try (OutputSet outer = OutputSet.open(dir)) {
            AtomicFiles.writeString(dir.resolve("a.json"), "new a");
            try (OutputSet inner = OutputSet.open(dir.resolve("sub"))) {
                AtomicFiles.writeString(dir.resolve("sub/c.csv"), "new c");
                // the inner step fails: no commit
            }
            IOException e = assertThrows(IOException.class, outer::commit);
            assertTrue(e.getMessage().contains("earlier files are kept"), e.getMessage());
        }
        assertEquals(before, contents());
    }

    @Test
    void aJoinedSetIsCommittedByTheOuterOne() throws IOException {
        writeOld();
        try (OutputSet outer = OutputSet.open(dir)) {
            try (OutputSet inner = OutputSet.open(dir.resolve("sub"))) {
                AtomicFiles.writeString(dir.resolve("sub/c.csv"), "new c");
                inner.commit();
            }
            assertEquals("old c", Files.readString(dir.resolve("sub/c.csv")));
            outer.commit();
        }
        assertEquals("new c", Files.readString(dir.resolve("sub/c.csv")));
    }

    @Test
    void staleTemporariesOfOurNamingOlderThanTheRunAreRemovedAndNothingElse() throws IOException {
        Path d = Files.createDirectories(dir.resolve("swept"));
        FileTime old = FileTime.from(Instant.now().minus(2, ChronoUnit.DAYS));
        Path staleTmp = old(d.resolve(".3f9a0c1b2d4e5f60.harvest.json.tmp"), old);
        Path staleBak = old(d.resolve(".7.vocab.json.bak.tmp"), old);
        Path staleSpill = old(d.resolve(".00ab.assignments.spill"), old);
        Path fresh = Files.writeString(d.resolve(".0123456789abcdef.labels.csv.tmp"), "a write in progress now");
        List<Path> kept = List.of(
                old(d.resolve("harvest.json.tmp"), old), // no leading dot and hex: not our naming
                old(d.resolve(".notHex.harvest.json.tmp"), old),
                old(d.resolve(".0123456789abcdef0.x.tmp"), old), // 17 digits
                old(d.resolve(".abc.harvest.json"), old), // no .tmp
                old(d.resolve("notes.txt"), old),
                fresh);
        Path target = old(d.resolve("real-output.csv"), old);
        Path link = d.resolve(".abcd.link.tmp");
        Files.createSymbolicLink(link, target);
        Path staging = Files.createDirectories(d.resolve(".5eed.staging.tmp/labels"));
        old(staging.resolve("labels.csv"), old);
        Files.setLastModifiedTime(staging, old);
        Files.setLastModifiedTime(staging.getParent(), old);
        Path ownDir = Files.createDirectories(d.resolve(".abcd.mine.tmp")); // a folder, but not a staging folder
        Files.setLastModifiedTime(ownDir, old);
        Path sub = Files.createDirectories(d.resolve("inner"));
        Path deeper = old(sub.resolve(".abcd.deeper.csv.tmp"), old);

        assertEquals(4, AtomicFiles.sweepStale(d));
        assertFalse(Files.exists(staging.getParent()), "a killed set's staging folder goes, with what it holds");
        assertTrue(Files.isDirectory(ownDir));
        assertFalse(Files.exists(staleTmp));
        assertFalse(Files.exists(staleBak));
        assertFalse(Files.exists(staleSpill));
        for (Path k : kept) {
            assertTrue(Files.exists(k), k + " must be kept");
        }
        assertTrue(Files.isSymbolicLink(link) && Files.exists(target), "a link is not ours to remove, nor what it points at");
        assertTrue(Files.exists(deeper), "a sweep is not recursive");
        assertEquals(0, AtomicFiles.sweepStale(d), "once per folder and process");
    }

    @Test
    void theStagingFolderIsGoneAfterTheCommitAndAfterAFailure() throws IOException {
        writeOld();
        try (OutputSet set = OutputSet.open(dir)) {
            AtomicFiles.writeString(dir.resolve("sub/c.csv"), "new c");
            set.commit();
        }
        try (OutputSet set = OutputSet.open(dir)) {
            AtomicFiles.writeString(dir.resolve("sub/c.csv"), "newer c");
        }
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(List.of("a.json", "b.csv", "sub"), s.map(p -> p.getFileName().toString()).sorted().toList());
        }
        assertEquals("new c", Files.readString(dir.resolve("sub/c.csv")));
    }

    @Test
    void writingIntoAFolderSweepsIt() throws IOException {
        Path d = Files.createDirectories(dir.resolve("written"));
        Path stale = old(d.resolve(".feed.problems.csv.tmp"), FileTime.from(Instant.now().minus(1, ChronoUnit.HOURS)));
        AtomicFiles.writeString(d.resolve("problems.csv"), "x");
        assertFalse(Files.exists(stale));
        try (Stream<Path> s = Files.list(d)) {
            assertEquals(List.of(d.resolve("problems.csv")), s.toList());
        }
    }

    private static Path old(Path p, FileTime t) throws IOException {
        Files.writeString(p, "left by a killed run");
        Files.setLastModifiedTime(p, t);
        return p;
    }

    private TreeMap<String, String> contents() throws IOException {
        TreeMap<String, String> m = new TreeMap<>();
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                m.put(dir.relativize(p).toString(), Files.readString(p));
            }
        }
        return m;
    }
}
