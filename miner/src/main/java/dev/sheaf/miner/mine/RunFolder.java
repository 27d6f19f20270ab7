package dev.sheaf.miner.mine;

import dev.sheaf.vocab.io.AtomicFiles;
import java.io.IOException;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.time.Duration;
import java.time.Instant;

/**
 * A mining run's temporary folder ({@code sheaf-mine-*} under the temp root: token stores, text
 * spills, spilled counts — hundreds of MB on a large catalog). The run holds an exclusive lock on
 * {@value #LOCK} inside it for as long as it lives. A run killed with {@code kill -9} cannot delete
 * its folder, so each new run first sweeps the folders whose lock nobody holds (the operating system
 * drops a dead process's locks); a folder without a lock file is swept only when it is older than
 * {@link #UNLOCKED_AGE} (its run died before it could take the lock).
 */
final class RunFolder implements AutoCloseable {
    static final String PREFIX = "sheaf-mine-";
    static final String LOCK = "run.lock";
    static final Duration UNLOCKED_AGE = Duration.ofHours(1);

    final Path dir;
    private final FileChannel channel;
    private final FileLock lock;

    private RunFolder(Path dir, FileChannel channel, FileLock lock) {
        this.dir = dir;
        this.channel = channel;
        this.lock = lock;
    }

    /** Sweeps what killed runs left under {@code root}, then makes and locks this run's folder. */
    static RunFolder create(Path root) throws IOException {
        Files.createDirectories(root);
        sweep(root);
        Path dir = Files.createTempDirectory(root, PREFIX);
        FileChannel ch = FileChannel.open(dir.resolve(LOCK), StandardOpenOption.CREATE, StandardOpenOption.WRITE);
        try {
            FileLock l = ch.tryLock();
            if (l == null) {
                throw new IOException("cannot lock the new temporary folder " + dir);
            }
            return new RunFolder(dir, ch, l);
        } catch (IOException | RuntimeException e) {
            ch.close();
            delete(dir);
            throw e;
        }
    }

    /** Deletes the folders of dead runs under {@code root}; returns how many. Never throws for one it cannot read. */
    static int sweep(Path root) {
        int swept = 0;
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(root, PREFIX + "*")) {
            for (Path d : ds) {
                if (Files.isDirectory(d, LinkOption.NOFOLLOW_LINKS) && dead(d)) {
                    delete(d);
                    swept++;
                }
            }
        } catch (IOException | RuntimeException e) {
            // best effort: a temp root we cannot list has nothing of ours to sweep
        }
        return swept;
    }

    private static boolean dead(Path d) {
        Path lockFile = d.resolve(LOCK);
        if (!Files.isRegularFile(lockFile, LinkOption.NOFOLLOW_LINKS)) {
            try {
                FileTime t = Files.getLastModifiedTime(d, LinkOption.NOFOLLOW_LINKS);
                return t.toInstant().isBefore(Instant.now().minus(UNLOCKED_AGE));
            } catch (IOException e) {
                return false;
            }
        }
        try (FileChannel ch = FileChannel.open(lockFile, StandardOpenOption.WRITE)) {
            FileLock l = ch.tryLock();
            if (l == null) {
                return false; // another process holds it: that run is alive
            }
            l.release();
            return true;
        } catch (OverlappingFileLockException e) {
            return false; // this process holds it: a run of ours is alive
        } catch (IOException e) {
            return false;
        }
    }

    private static void delete(Path d) {
        try {
            AtomicFiles.deleteTree(d);
        } catch (IOException e) {
            // best effort: what is left is swept by a later run
        }
    }

    /** Releases the lock and deletes the folder. */
    @Override
    public void close() {
        try {
            lock.release();
            channel.close();
        } catch (IOException e) {
            // the folder goes anyway
        }
        delete(dir);
    }
}
