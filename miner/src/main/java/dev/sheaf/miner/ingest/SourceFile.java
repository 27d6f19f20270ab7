package dev.sheaf.miner.ingest;

import java.io.BufferedInputStream;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.Charset;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Locale;
import java.util.function.Function;

/**
 * One file being read: what a {@link ListingReader} gets. It emits listings and records problems
 * through here, so the run can count them; one instance is used by one thread.
 */
final class SourceFile {
    /** Limits and callbacks shared by every file of a run. */
    interface Run {
        void listing(Listing listing);

        void problem(Problem problem);

        void bytes(long n);

        Duration perFileTimeout();

        /** Characters of extracted text kept per document (Tika's write limit). */
        int writeLimit();
    }

    private final Path path;
    private final String display;
    private final long size;
    private final ColumnMapping mapping;
    private final Run run;
    private int listings;
    private int problems;

    SourceFile(Path path, String display, long size, ColumnMapping mapping, Run run) {
        this.path = path;
        this.display = display;
        this.size = size;
        this.mapping = mapping;
        this.run = run;
    }

    Path path() {
        return path;
    }

    /** The file as shown to the user and stored in {@link Listing#source()}. */
    String display() {
        return display;
    }

    long size() {
        return size;
    }

    /** The mapping the source gives, or null for auto-detection. */
    ColumnMapping mapping() {
        return mapping;
    }

    Duration perFileTimeout() {
        return run.perFileTimeout();
    }

    int writeLimit() {
        return run.writeLimit();
    }

    /** The file name without its folder and last extension ("tent-ridge-2" for "tent-ridge-2.html"). */
    String stem() {
        String n = path.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }

    String extension() {
        String n = path.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(dot + 1).toLowerCase(Locale.ROOT) : "";
    }

    void emit(Listing l) {
        listings++;
        run.listing(l);
    }

    void problem(String position, String kind, String reason) {
        problems++;
        run.problem(new Problem(display, position, kind, reason));
    }

    int listings() {
        return listings;
    }

    int problems() {
        return problems;
    }

    /** The raw bytes, counted as read. */
    InputStream open() throws IOException {
        return new Counting(Files.newInputStream(path), run);
    }

    /**
     * Opens the file as text: detects the encoding (see {@link Decoding}), refuses binary content
     * (records a "corrupt" problem and returns null).
     *
     * @param declared finds an encoding the file declares in its first bytes (HTML meta), or null
     */
    DecodingReader openText(Function<byte[], Charset> declared) throws IOException {
        // the buffer holds the sniffed head (it grows to the mark limit if the size was wrong)
        BufferedInputStream in = new BufferedInputStream(open(), (int) Math.min(Decoding.SNIFF_BYTES, Math.max(1 << 13, size + 1)));
        boolean ok = false;
        try {
            in.mark(Decoding.SNIFF_BYTES);
            byte[] head = in.readNBytes(Decoding.SNIFF_BYTES);
            in.reset();
            boolean whole = head.length < Decoding.SNIFF_BYTES;
            if (Decoding.looksBinary(head, head.length, Decoding.bom(head, head.length))) {
                problem("", "corrupt", "expected text but found binary content (NUL or control bytes) in the first "
                        + Math.min(head.length, 8192) + " bytes; check that the file is what its name says, or exclude it");
                return null;
            }
            Charset decl = declared == null ? null : declared.apply(head);
            Decoding.Guess g = Decoding.guess(head, head.length, whole, decl);
            in.skipNBytes(g.bomLength());
            ok = true;
            return new DecodingReader(in, g.charset(), g.bomLength(), size);
        } finally {
            if (!ok) {
                in.close();
            }
        }
    }

    /** Records an encoding problem when the reader met undecodable bytes. Call after reading. */
    void reportEncoding(DecodingReader r) {
        reportEncoding(r.charset(), r.malformed(), r.firstMalformedByte(), r.firstMalformedLine());
    }

    /** Records an encoding problem: {@code malformed} undecodable sequences, the first at that byte and line. */
    void reportEncoding(Charset charset, long malformed, long firstByte, long firstLine) {
        if (malformed > 0) {
            problem("line " + firstLine, "encoding", malformed + " byte sequence(s) are not valid "
                    + charset.name() + " (first at byte " + firstByte
                    + "); they were replaced by U+FFFD. Re-save the file as UTF-8");
        }
    }

    /** Reads all text (the file is within the size limit); null when it is binary. */
    String readText(Function<byte[], Charset> declared) throws IOException {
        return readText(declared, Integer.MAX_VALUE - 16);
    }

    /**
     * Reads at most {@code maxChars} characters of text; when more follow, they are not read and a
     * "too-large" problem says so. Null when the file is binary.
     */
    String readText(Function<byte[], Charset> declared, int maxChars) throws IOException {
        try (DecodingReader r = openText(declared)) {
            if (r == null) {
                return null;
            }
            StringBuilder b = new StringBuilder((int) Math.min(Math.min(size, maxChars), Integer.MAX_VALUE - 16));
            char[] buf = new char[8192];
            int n;
            while (b.length() < maxChars && (n = r.read(buf, 0, Math.min(buf.length, maxChars - b.length()))) >= 0) {
                b.append(buf, 0, n);
            }
            if (b.length() >= maxChars && r.read() >= 0) {
                problem("", "too-large", "only the first " + maxChars + " characters of text were read (the limit for one listing); "
                        + "split the file or raise the text limit");
            }
            reportEncoding(r);
            String s = b.toString();
            return s.startsWith("\uFEFF") ? s.substring(1) : s;
        }
    }

    private static final class Counting extends FilterInputStream {
        private final Run run;

        Counting(InputStream in, Run run) {
            super(in);
            this.run = run;
        }

        @Override
        public int read() throws IOException {
            int b = super.read();
            if (b >= 0) {
                run.bytes(1);
            }
            return b;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            int n = super.read(b, off, len);
            if (n > 0) {
                run.bytes(n);
            }
            return n;
        }

        @Override
        public long skip(long n) throws IOException {
            long s = super.skip(n);
            run.bytes(s);
            return s;
        }
    }
}
