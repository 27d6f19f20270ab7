package dev.sheaf.vocab.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

/**
 * An append-only scratch file for records that stream past during a run and are read back later:
 * appends go through one buffer (a write system call per megabyte, not per record) and return the
 * record's offset; reads see every append, flushed or not. {@link #copyTo} reads through a window
 * for callers that read records back roughly in the order they were written; {@link #read} reads
 * one record exactly, for callers that pick a few records anywhere. Safe for several writing
 * threads. Closing deletes the file.
 */
public final class SpillFile implements AutoCloseable {
    private static final int WRITE_BUFFER = 1 << 20;
    private static final int READ_WINDOW = 4 << 20;
    /** How far before a request a window refill starts, so records written out of order by a few places still hit it. */
    private static final int READ_BEHIND = 64 << 10;

    private final Path file;
    private final FileChannel channel;
    private final byte[] pending = new byte[WRITE_BUFFER];
    private int pendingLength;
    /** Bytes already in the file; the logical end is this plus {@link #pendingLength}. */
    private long flushed;
    private ByteBuffer window;
    private long windowStart;

    private SpillFile(Path file, FileChannel channel) {
        this.file = file;
        this.channel = channel;
    }

    /** Creates (or empties) {@code file} for the run. */
    public static SpillFile create(Path file) throws IOException {
        return new SpillFile(file, FileChannel.open(file, StandardOpenOption.CREATE, StandardOpenOption.TRUNCATE_EXISTING,
                StandardOpenOption.WRITE, StandardOpenOption.READ));
    }

    public Path path() {
        return file;
    }

    /** The logical size: every byte appended so far. */
    public synchronized long size() {
        return flushed + pendingLength;
    }

    /** Appends {@code len} bytes of {@code b} from {@code off}; returns the offset they start at. */
    public synchronized long append(byte[] b, int off, int len) throws IOException {
        long at = flushed + pendingLength;
        if (len > pending.length - pendingLength) {
            flush();
        }
        if (len > pending.length) {
            writeFully(ByteBuffer.wrap(b, off, len), flushed);
            flushed += len;
        } else {
            System.arraycopy(b, off, pending, pendingLength, len);
            pendingLength += len;
        }
        return at;
    }

    /**
     * Reads exactly {@code dst.remaining()} bytes starting at {@code offset} into {@code dst}. Only the
     * flush holds the lock: several threads picking records read the file at once.
     */
    public void read(long offset, ByteBuffer dst) throws IOException {
        synchronized (this) {
            flush();
        }
        long pos = offset;
        while (dst.hasRemaining()) {
            int n = channel.read(dst, pos);
            if (n < 0) {
                throw new IOException("the scratch file " + file + " ended at " + pos + ", before the record at "
                        + offset + " was read");
            }
            pos += n;
        }
    }

    /** Copies the {@code len} bytes at {@code offset} to {@code out}, through the read window. */
    public synchronized void copyTo(long offset, int len, OutputStream out) throws IOException {
        flush();
        if (len > READ_WINDOW / 2) {
            ByteBuffer b = ByteBuffer.allocate(len);
            read(offset, b);
            out.write(b.array(), 0, len);
            return;
        }
        if (window == null) {
            window = ByteBuffer.allocate(READ_WINDOW);
            window.limit(0);
        }
        if (offset < windowStart || offset + len > windowStart + window.limit()) {
            fillWindow(offset, len);
        }
        out.write(window.array(), (int) (offset - windowStart), len);
    }

    private void fillWindow(long offset, int len) throws IOException {
        long start = Math.max(0, offset - READ_BEHIND);
        window.clear();
        long pos = start;
        while (window.hasRemaining()) {
            int n = channel.read(window, pos);
            if (n < 0) {
                break;
            }
            pos += n;
        }
        window.flip();
        windowStart = start;
        if (offset + len > windowStart + window.limit()) {
            throw new IOException("the scratch file " + file + " ended at " + pos + ", before the record at " + offset
                    + " (" + len + " bytes) was read");
        }
    }

    private void flush() throws IOException {
        if (pendingLength > 0) {
            writeFully(ByteBuffer.wrap(pending, 0, pendingLength), flushed);
            flushed += pendingLength;
            pendingLength = 0;
        }
    }

    private void writeFully(ByteBuffer b, long at) throws IOException {
        long pos = at;
        while (b.hasRemaining()) {
            pos += channel.write(b, pos);
        }
    }

    /** Closes and deletes the file. */
    @Override
    public void close() throws IOException {
        try {
            channel.close();
        } finally {
            Files.deleteIfExists(file);
        }
    }
}
