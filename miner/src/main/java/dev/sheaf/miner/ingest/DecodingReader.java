package dev.sheaf.miner.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;

/**
 * Decodes a byte stream in one charset, replacing each undecodable byte sequence with U+FFFD and
 * remembering how many there were and where the first one was (byte offset and line), so the
 * reader can report an encoding problem with a position instead of failing or silently garbling.
 */
final class DecodingReader extends Reader {
    private final InputStream in;
    private final Charset charset;
    private final CharsetDecoder decoder;
    private final ByteBuffer bytes;
    private final CharBuffer chars;
    private final long byteBase;
    private long consumed;
    private boolean eof;
    private boolean done;
    private boolean pendingReplacement;
    private long malformed;
    private long firstMalformedByte = -1;
    private long firstMalformedLine = -1;
    private long newlines;

    /**
     * @param in       the stream, positioned after any byte-order mark
     * @param byteBase how many bytes precede the stream's start in the file (the BOM length), for positions
     */
    /**
     * @param sizeHint how many bytes the stream holds, if known: buffers are sized to it (between 4
     *                 and 64 kB), so a folder of small pages does not allocate 128 kB for each page
     */
    DecodingReader(InputStream in, Charset charset, long byteBase, long sizeHint) {
        int size = (int) Math.max(1 << 12, Math.min(1 << 16, sizeHint));
        this.bytes = ByteBuffer.allocate(size);
        this.chars = CharBuffer.allocate(Math.max(1 << 12, size / 2));
        this.in = in;
        this.charset = charset;
        this.byteBase = byteBase;
        this.decoder = charset.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        bytes.flip();
        chars.flip();
    }

    Charset charset() {
        return charset;
    }

    /**
     * The byte stream itself, for a reader that parses bytes (JSON Lines in UTF-8), or null once any
     * char has been read; positioned after the byte-order mark, {@link #byteBase()} bytes into the file.
     */
    InputStream undecoded() {
        return consumed == 0 && !eof && !bytes.hasRemaining() && !chars.hasRemaining() ? in : null;
    }

    /** Bytes of the file before the stream's start (the byte-order mark). */
    long byteBase() {
        return byteBase;
    }

    /** Undecodable byte sequences met so far (each became one U+FFFD). */
    long malformed() {
        return malformed;
    }

    /** Byte offset in the file of the first undecodable sequence, or -1. */
    long firstMalformedByte() {
        return firstMalformedByte;
    }

    /** 1-based line of the first undecodable sequence, or -1. */
    long firstMalformedLine() {
        return firstMalformedLine;
    }

    @Override
    public int read(char[] cbuf, int off, int len) throws IOException {
        if (len == 0) {
            return 0;
        }
        if (!chars.hasRemaining()) {
            fill();
            if (!chars.hasRemaining()) {
                return -1;
            }
        }
        int n = Math.min(len, chars.remaining());
        chars.get(cbuf, off, n);
        return n;
    }

    @Override
    public int read() throws IOException {
        if (!chars.hasRemaining()) {
            fill();
            if (!chars.hasRemaining()) {
                return -1;
            }
        }
        return chars.get();
    }

    private void fill() throws IOException {
        chars.clear();
        try {
            if (pendingReplacement) {
                chars.put('\uFFFD');
                pendingReplacement = false;
            }
            while (!done && chars.position() == 0) {
                int before = chars.position();
                CoderResult r = decoder.decode(bytes, chars, eof);
                countNewlines(before);
                if (r.isError()) {
                    malformed++;
                    if (firstMalformedByte < 0) {
                        firstMalformedByte = byteBase + consumed + bytes.position();
                        firstMalformedLine = newlines + 1;
                    }
                    bytes.position(bytes.position() + r.length());
                    if (chars.hasRemaining()) {
                        chars.put('\uFFFD');
                    } else {
                        pendingReplacement = true;
                    }
                } else if (r.isUnderflow()) {
                    if (eof) {
                        before = chars.position();
                        decoder.flush(chars);
                        countNewlines(before);
                        if (bytes.hasRemaining()) {
                            // a truncated multi-byte sequence at the very end
                            malformed++;
                            if (firstMalformedByte < 0) {
                                firstMalformedByte = byteBase + consumed + bytes.position();
                                firstMalformedLine = newlines + 1;
                            }
                            bytes.position(bytes.limit());
                            if (chars.hasRemaining()) {
                                chars.put('\uFFFD');
                            }
                        }
                        done = true;
                    } else {
                        refill();
                    }
                }
                // overflow: chars is full, hand it out
            }
        } finally {
            chars.flip();
        }
    }

    private void refill() throws IOException {
        consumed += bytes.position();
        bytes.compact();
        int n = in.read(bytes.array(), bytes.position(), bytes.remaining());
        if (n < 0) {
            eof = true;
        } else {
            bytes.position(bytes.position() + n);
        }
        bytes.flip();
    }

    private void countNewlines(int from) {
        if (firstMalformedByte >= 0) {
            return;
        }
        // straight over the backing array: this runs once per decoded char of every text source
        char[] a = chars.array();
        int base = chars.arrayOffset();
        int end = base + chars.position();
        long n = 0;
        for (int i = base + from; i < end; i++) {
            if (a[i] == '\n') {
                n++;
            }
        }
        newlines += n;
    }

    @Override
    public void close() throws IOException {
        in.close();
    }
}
