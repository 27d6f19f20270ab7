package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A killed run's temporary folder is swept by the next run; a living run's never is. */
class RunFolderTest {
    @TempDir
    Path root;

    @Test
    void aFolderWhoseLockNobodyHoldsIsSweptAndALockedOneIsKept() throws IOException {
        // what kill -9 leaves: the folder and its lock file, the lock itself gone with the process
        Path dead = Files.createDirectory(root.resolve(RunFolder.PREFIX + "111"));
        Files.createFile(dead.resolve(RunFolder.LOCK));
        Files.write(dead.resolve("tokens-0.bin"), new byte[4096]);
        Path notOurs = Files.createDirectory(root.resolve("other-folder"));
        try (RunFolder alive = RunFolder.create(root)) {
            assertFalse(Files.exists(dead), "the dead run's folder is swept");
            assertTrue(Files.isDirectory(alive.dir));
            assertTrue(Files.exists(notOurs), "only our naming is swept");
            // a second run while the first lives: the first's folder stays
            try (RunFolder second = RunFolder.create(root)) {
                assertTrue(Files.isDirectory(alive.dir), "a living run's folder is never swept");
                assertTrue(Files.isDirectory(second.dir));
            }
            assertEquals(0, RunFolder.sweep(root));
            assertTrue(Files.isDirectory(alive.dir));
        }
        try (var s = Files.list(root)) {
            assertEquals(1, s.count(), "closing deletes the run's folder; only the other folder is left");
        }
    }

    @Test
    void aLockHeldByAnotherChannelMeansAlive() throws IOException {
        Path d = Files.createDirectory(root.resolve(RunFolder.PREFIX + "222"));
        try (FileChannel ch = FileChannel.open(d.resolve(RunFolder.LOCK), StandardOpenOption.CREATE, StandardOpenOption.WRITE);
             var lock = ch.lock()) {
            assertEquals(0, RunFolder.sweep(root));
            assertTrue(Files.isDirectory(d));
        }
        assertEquals(1, RunFolder.sweep(root));
        assertFalse(Files.exists(d));
    }

    @Test
    void aFolderWithoutALockIsSweptOnlyWhenOld() throws IOException {
        Path young = Files.createDirectory(root.resolve(RunFolder.PREFIX + "333"));
        Path old = Files.createDirectory(root.resolve(RunFolder.PREFIX + "444"));
        Files.setLastModifiedTime(old, FileTime.from(Instant.now().minus(RunFolder.UNLOCKED_AGE).minusSeconds(60)));
        assertEquals(1, RunFolder.sweep(root));
        assertTrue(Files.isDirectory(young), "a run may be about to take its lock");
        assertFalse(Files.exists(old));
    }
}
