package dev.sheaf.samples;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Atomic file writes for the generator: content goes to a temporary file beside the target and is
 * renamed over it in one step, so a reader never sees half a file. The generator may not use the
 * vocabulary module's {@code AtomicFiles} (it depends on nothing else of ours), and it skips the
 * fsync that {@code AtomicFiles} does: every file it writes can be regenerated from the seed, and
 * forcing a million small files to disk would dominate a folder corpus run (decision 010).
 */
final class Output {
    private Output() {
    }

    private static final boolean POSIX = java.nio.file.FileSystems.getDefault().supportedFileAttributeViews().contains("posix");
    private static final java.util.Set<java.nio.file.attribute.PosixFilePermission> READABLE =
            java.nio.file.attribute.PosixFilePermissions.fromString("rw-r--r--");

    @FunctionalInterface
    interface Body {
        void write(OutputStream out) throws IOException;
    }

    static void write(Path target, Body body) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + abs.getFileName() + ".", ".tmp");
        boolean done = false;
        try {
            try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(tmp), 1 << 16)) {
                body.write(out);
            }
            if (POSIX) {
                // temp files are created owner-only; generated data is meant to be read by everyone
                Files.setPosixFilePermissions(tmp, READABLE);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                throw new IOException("cannot replace " + abs + " atomically on this file system (" + e.getMessage()
                        + "); write to a local folder instead", e);
            }
            done = true;
        } finally {
            if (!done) {
                Files.deleteIfExists(tmp);
            }
        }
    }

    static void writeString(Path target, String content) throws IOException {
        writeBytes(target, content.getBytes(StandardCharsets.UTF_8));
    }

    static void writeBytes(Path target, byte[] content) throws IOException {
        write(target, out -> out.write(content));
    }
}
