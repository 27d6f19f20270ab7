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
 * survives a power cut on file systems that support it.
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
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        Files.createDirectories(dir);
        Path tmp = newTempFile(dir, abs.getFileName() + ".tmp");
        boolean done = false;
        try {
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING);
                 OutputStream raw = Channels.newOutputStream(ch);
                 OutputStream out = new java.io.BufferedOutputStream(raw, 1 << 16)) {
                body.write(new NonClosing(out));
                out.flush();
                ch.force(true);
            }
            if (keepBackup && Files.exists(abs)) {
                Path backup = abs.resolveSibling(abs.getFileName() + "~");
                Path btmp = newTempFile(dir, abs.getFileName() + ".bak.tmp");
                Files.copy(abs, btmp, StandardCopyOption.REPLACE_EXISTING);
                move(btmp, backup);
            }
            move(tmp, abs);
            forceDirectory(dir);
            done = true;
        } finally {
            if (!done) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    /** Writes UTF-8 text atomically. */
    public static void writeText(Path target, TextBody body) throws IOException {
        write(target, out -> {
            Writer w = new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8);
            body.write(w);
            w.flush();
        });
    }

    /** Writes a whole string atomically (UTF-8). */
    public static void writeString(Path target, String content) throws IOException {
        write(target, out -> out.write(content.getBytes(StandardCharsets.UTF_8)));
    }

    /**
     * A fresh file beside the target. Unlike {@link Files#createTempFile}, which makes files readable
     * by their owner only, this one gets the ordinary permissions (the process umask), because our
     * outputs are reports and tables meant to be shared.
     */
    private static Path newTempFile(Path dir, String suffix) throws IOException {
        java.util.concurrent.ThreadLocalRandom rnd = java.util.concurrent.ThreadLocalRandom.current();
        for (int attempt = 0; ; attempt++) {
            Path p = dir.resolve("." + Long.toHexString(rnd.nextLong()) + "." + suffix);
            try {
                return Files.createFile(p);
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

    private static void forceDirectory(Path dir) {
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
