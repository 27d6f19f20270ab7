package dev.sheaf.vocab.io;

import java.io.IOException;
import java.io.OutputStream;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Writes a file so that a reader (or a crash) only ever sees the old complete file or the new
 * complete file: the content goes to a temporary file in the same folder, is forced to disk, and
 * is then renamed over the target in one atomic step. The folder is forced too, so the rename
 * survives a power cut on file systems that support it. Inside an open {@link OutputSet} the rename
 * waits for the set's commit, so a command's files are replaced together. Temporaries left by a
 * killed run are removed by the next one ({@link #sweepStale}).
 */
public final class AtomicFiles {

    /** Produces the content; gets a buffered stream that must not be closed by the body. */
    @FunctionalInterface
    public interface Body {
        void write(OutputStream out) throws IOException;
    }

    /** Produces text content (UTF-8). */
    @FunctionalInterface
    public interface TextBody {
        void write(Writer out) throws IOException;
    }

    private static final String TMP = ".tmp";
    private static final String SPILL = ".spill";
    /** The names {@link #newTempFile} gives: a dot, up to 16 hex digits, a dot, the target's name, .tmp or .spill. */
    private static final java.util.regex.Pattern STALE_NAME = java.util.regex.Pattern.compile("\\.[0-9a-f]{1,16}\\..+\\.(tmp|spill)");
    /**
     * When this run began writing (this class's loading: every temporary of this process is made after
     * it). Not the process's start time, which the JDK derives from the boot time and which was seen
     * to come out early here: a run started right after a killed one then kept the killed one's last
     * temporaries.
     */
    private static final java.time.Instant RUN_START = java.time.Instant.now();
    private static final java.util.Set<Path> SWEPT = java.util.concurrent.ConcurrentHashMap.newKeySet();

    private AtomicFiles() {
    }

    /** Writes {@code target} atomically; on any failure the previous file is untouched and the temp file removed. */
    public static void write(Path target, Body body) throws IOException {
        write(target, body, false);
    }

    /**
     * Writes {@code target} atomically. With {@code keepBackup}, the previous version (if any) is
     * first copied to {@code target + "~"} so one earlier version is always at hand.
     */
    public static void write(Path target, Body body, boolean keepBackup) throws IOException {
        write(target, body, keepBackup, false);
    }

    /**
     * Writes a secret (a key) atomically: the file is created readable and writable by its owner
     * only (on file systems with POSIX permissions), before any byte is written to it.
     */
    public static void writeOwnerOnly(Path target, String content) throws IOException {
        write(target, out -> out.write(content.getBytes(StandardCharsets.UTF_8)), false, true);
    }

    private static void write(Path target, Body body, boolean keepBackup, boolean ownerOnly) throws IOException {
        Path abs = target.toAbsolutePath().normalize();
        OutputSet set = OutputSet.covering(abs);
        if (set == null) {
            writeInPlace(abs, body, keepBackup, ownerOnly);
            return;
        }
        Path staged = set.stagingPath(abs); // put in place, with the rest of the set, by its commit
        writeInPlace(staged, body, false, ownerOnly);
        try {
            set.stage(staged, abs, keepBackup);
        } catch (IOException e) {
            Files.deleteIfExists(staged);
            throw e;
        }
    }

    private static void writeInPlace(Path abs, Body body, boolean keepBackup, boolean ownerOnly) throws IOException {
        Path dir = abs.getParent();
        Files.createDirectories(dir);
        Path tmp = newTempFile(dir, abs.getFileName() + TMP, ownerOnly);
        boolean done = false;
        try {
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
                 OutputStream raw = Channels.newOutputStream(ch);
                 OutputStream out = new java.io.BufferedOutputStream(raw, 1 << 16)) {
                body.write(new NonClosing(out));
                out.flush();
                ch.force(true);
            }
            replace(tmp, abs, keepBackup);
            forceDirectory(dir);
            done = true;
        } finally {
            if (!done) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    /** Renames a complete temporary over {@code target}, first copying the old version to {@code target~} if asked. */
    static void replace(Path tmp, Path target, boolean keepBackup) throws IOException {
        if (keepBackup && Files.exists(target)) {
            Path backup = target.resolveSibling(target.getFileName() + "~");
            Path btmp = newTempFile(target.getParent(), target.getFileName() + ".bak" + TMP, false);
            boolean done = false;
            try {
                Files.copy(target, btmp, StandardCopyOption.REPLACE_EXISTING);
                move(btmp, backup);
                done = true;
            } finally {
                if (!done) {
                    Files.deleteIfExists(btmp);
                }
            }
        }
        move(tmp, target);
    }

    /** Writes UTF-8 text atomically. */
    public static void writeText(Path target, TextBody body) throws IOException {
        write(target, out -> {
            // buffered on the char side: the encoder wraps every write call, so a table written cell by cell
            // (labels.csv: millions of one-character cells) spent most of its time there
            Writer w = new java.io.BufferedWriter(new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8), 1 << 16);
            body.write(w);
            w.flush();
        });
    }

    /** Writes a whole string atomically (UTF-8). */
    public static void writeString(Path target, String content) throws IOException {
        write(target, out -> out.write(content.getBytes(StandardCharsets.UTF_8)));
    }

    /**
     * A fresh scratch file in {@code dir} named like the temporaries ({@code .<random hex>.<name>.spill}),
     * for a run's own working data that it deletes when done; if the run is killed, the next run's
     * {@link #sweepStale} removes it.
     */
    public static Path scratchFile(Path dir, String name) throws IOException {
        Files.createDirectories(dir);
        return newTempFile(dir, name + SPILL, true); // a run's private working data
    }

    /** A fresh, empty hidden folder in {@code dir} named like the temporaries ({@code .<random hex>.<name>.tmp}). */
    static Path newTempDirectory(Path dir, String name) throws IOException {
        Files.createDirectories(dir);
        sweepStale(dir);
        java.util.concurrent.ThreadLocalRandom rnd = java.util.concurrent.ThreadLocalRandom.current();
        for (int attempt = 0; ; attempt++) {
            try {
                return Files.createDirectory(dir.resolve("." + Long.toHexString(rnd.nextLong()) + "." + name + TMP));
            } catch (java.nio.file.FileAlreadyExistsException e) {
                if (attempt > 100) {
                    throw e;
                }
            }
        }
    }

    /** Deletes a folder we made and everything in it, links themselves and not what they point at; a missing folder is fine. */
    public static void deleteTree(Path root) throws IOException {
        if (!Files.exists(root, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            return;
        }
        Files.walkFileTree(root, new java.nio.file.SimpleFileVisitor<>() {
            @Override
            public java.nio.file.FileVisitResult visitFile(Path f, java.nio.file.attribute.BasicFileAttributes a) throws IOException {
                Files.deleteIfExists(f);
                return java.nio.file.FileVisitResult.CONTINUE;
            }

            @Override
            public java.nio.file.FileVisitResult postVisitDirectory(Path d, IOException e) throws IOException {
                if (e != null) {
                    throw e;
                }
                Files.deleteIfExists(d);
                return java.nio.file.FileVisitResult.CONTINUE;
            }
        });
    }

    /**
     * Removes the temporaries an earlier run left in {@code dir} when it was killed (our naming only:
     * {@code .<1 to 16 hex digits>.<name>.tmp} or {@code .spill}; regular files, and an output set's
     * staging folder with what it holds; links are neither followed nor removed) and only those last
     * changed before this process started, so a temporary of this run,
     * or one another running process is still writing, is never touched. Each folder is swept once
     * per process; a file that cannot be removed is left. Not recursive.
     *
     * @return how many files were removed
     */
    public static int sweepStale(Path dir) {
        Path abs = dir.toAbsolutePath().normalize();
        if (!SWEPT.add(abs)) {
            return 0;
        }
        int removed = 0;
        try (java.nio.file.DirectoryStream<Path> ds = Files.newDirectoryStream(abs, ".*")) {
            for (Path p : ds) {
                if (!STALE_NAME.matcher(p.getFileName().toString()).matches()) {
                    continue;
                }
                try {
                    java.nio.file.attribute.BasicFileAttributes a = Files.readAttributes(p,
                            java.nio.file.attribute.BasicFileAttributes.class, java.nio.file.LinkOption.NOFOLLOW_LINKS);
                    if (!a.lastModifiedTime().toInstant().isBefore(RUN_START)) {
                        continue;
                    }
                    if (a.isRegularFile() && Files.deleteIfExists(p)) {
                        removed++;
                    } else if (a.isDirectory() && p.getFileName().toString().endsWith(".staging" + TMP)) {
                        deleteTree(p);
                        removed++;
                    }
                } catch (IOException e) {
                    // left for a later run; a temporary is hidden and never taken for an output
                }
            }
        } catch (IOException | java.nio.file.DirectoryIteratorException e) {
            // an unreadable folder: the write that follows reports it
        }
        return removed;
    }

    /**
     * A fresh file beside the target. Unlike {@link Files#createTempFile}, which makes files readable
     * by their owner only, this one gets the ordinary permissions (the process umask), because our
     * outputs are reports and tables meant to be shared.
     */
    private static Path newTempFile(Path dir, String suffix, boolean ownerOnly) throws IOException {
        sweepStale(dir);
        java.nio.file.attribute.FileAttribute<?>[] attrs = ownerOnly
                && dir.getFileSystem().supportedFileAttributeViews().contains("posix")
                ? new java.nio.file.attribute.FileAttribute<?>[] {java.nio.file.attribute.PosixFilePermissions.asFileAttribute(
                        java.nio.file.attribute.PosixFilePermissions.fromString("rw-------"))}
                : new java.nio.file.attribute.FileAttribute<?>[0];
        java.util.concurrent.ThreadLocalRandom rnd = java.util.concurrent.ThreadLocalRandom.current();
        for (int attempt = 0; ; attempt++) {
            Path p = dir.resolve("." + Long.toHexString(rnd.nextLong()) + "." + suffix);
            try {
                return Files.createFile(p, attrs);
            } catch (java.nio.file.FileAlreadyExistsException e) {
                if (attempt > 100) {
                    throw e;
                }
            }
        }
    }

    private static void move(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            throw new IOException("cannot replace " + to + " atomically on this file system: " + e.getMessage()
                    + "; write the output to a local folder instead", e);
        }
    }

    static void forceDirectory(Path dir) {
        // Forcing a directory is supported on Linux and macOS, not on Windows; a failure only
        // weakens durability across a power cut, never atomicity, so it is not an error.
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException ignored) {
            // see above
        }
    }

    /** Keeps a body from closing the channel before it is forced. */
    private static final class NonClosing extends java.io.FilterOutputStream {
        NonClosing(OutputStream out) {
            super(out);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
        }

        @Override
        public void close() throws IOException {
            out.flush();
        }
    }
}
