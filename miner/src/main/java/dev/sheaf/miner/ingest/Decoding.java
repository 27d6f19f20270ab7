package dev.sheaf.miner.ingest;

import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.IllegalCharsetNameException;
import java.nio.charset.StandardCharsets;
import java.nio.charset.UnsupportedCharsetException;
import org.apache.tika.parser.txt.CharsetDetector;
import org.apache.tika.parser.txt.CharsetMatch;

/**
 * Finds the character encoding of a text file from its first bytes, in this order:
 * <ol>
 *   <li>a byte-order mark (UTF-8, UTF-16LE/BE, UTF-32LE/BE);</li>
 *   <li>strict UTF-8: the bytes decode as UTF-8 without a single error;</li>
 *   <li>an encoding the file declares (an HTML {@code <meta charset>}), when the caller found one;</li>
 *   <li>damaged UTF-8: at least two valid multi-byte sequences and no more errors than valid
 *       sequences (a Latin-1 file almost never holds valid UTF-8 sequences, a UTF-8 file with a
 *       few broken bytes does) — the broken bytes are then reported as an encoding problem;</li>
 *   <li>Tika's copy of ICU4J's statistical {@link CharsetDetector};</li>
 *   <li>windows-1252 when the detector has no answer.</li>
 * </ol>
 * UTF-16 without a byte-order mark is not detected: its NUL bytes make it look binary.
 */
final class Decoding {
    /** How many leading bytes are examined. */
    static final int SNIFF_BYTES = 1 << 16;

    private static final Charset WINDOWS_1252 = Charset.forName("windows-1252");

    private Decoding() {
    }

    /** The encoding chosen for a file, how many BOM bytes to skip, and why. */
    record Guess(Charset charset, int bomLength, String how) {
    }

    static Guess guess(byte[] head, int len, boolean wholeFile, Charset declared) {
        Guess bom = bom(head, len);
        if (bom != null) {
            return bom;
        }
        int[] counts = utf8Errors(head, len, wholeFile);
        int errors = counts[0];
        int multibyte = counts[1];
        if (errors == 0) {
            return new Guess(StandardCharsets.UTF_8, 0, "valid UTF-8");
        }
        if (declared != null) {
            return new Guess(declared, 0, "declared " + declared.name());
        }
        if (multibyte >= 2 && errors <= multibyte) {
            return new Guess(StandardCharsets.UTF_8, 0, "UTF-8 with " + errors + " broken byte sequence(s)");
        }
        CharsetDetector detector = new CharsetDetector();
        detector.setText(len == head.length ? head : java.util.Arrays.copyOf(head, len));
        CharsetMatch match = detector.detect();
        if (match != null && match.getConfidence() >= 10) {
            try {
                Charset cs = Charset.forName(match.getName());
                if (!cs.name().startsWith("UTF-16") && !cs.name().startsWith("UTF-32")) {
                    return new Guess(cs, 0, "detected " + cs.name() + " (confidence " + match.getConfidence() + ")");
                }
            } catch (IllegalCharsetNameException | UnsupportedCharsetException e) {
                // fall through to the single-byte default
            }
        }
        return new Guess(WINDOWS_1252, 0, "windows-1252 (no confident detection)");
    }

    /** The encoding a byte-order mark announces, or null when there is none. */
    static Guess bom(byte[] b, int len) {
        if (len >= 3 && (b[0] & 0xFF) == 0xEF && (b[1] & 0xFF) == 0xBB && (b[2] & 0xFF) == 0xBF) {
            return new Guess(StandardCharsets.UTF_8, 3, "UTF-8 byte-order mark");
        }
        if (len >= 4 && (b[0] & 0xFF) == 0xFF && (b[1] & 0xFF) == 0xFE && b[2] == 0 && b[3] == 0) {
            return new Guess(Charset.forName("UTF-32LE"), 4, "UTF-32LE byte-order mark");
        }
        if (len >= 4 && b[0] == 0 && b[1] == 0 && (b[2] & 0xFF) == 0xFE && (b[3] & 0xFF) == 0xFF) {
            return new Guess(Charset.forName("UTF-32BE"), 4, "UTF-32BE byte-order mark");
        }
        if (len >= 2 && (b[0] & 0xFF) == 0xFF && (b[1] & 0xFF) == 0xFE) {
            return new Guess(StandardCharsets.UTF_16LE, 2, "UTF-16LE byte-order mark");
        }
        if (len >= 2 && (b[0] & 0xFF) == 0xFE && (b[1] & 0xFF) == 0xFF) {
            return new Guess(StandardCharsets.UTF_16BE, 2, "UTF-16BE byte-order mark");
        }
        return null;
    }

    /** {errors, valid non-ASCII chars} when decoding as strict UTF-8; a sequence cut by the sniff window is not an error. */
    private static int[] utf8Errors(byte[] head, int len, boolean wholeFile) {
        CharsetDecoder dec = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(head, 0, len);
        CharBuffer out = CharBuffer.allocate(4096);
        int errors = 0;
        int multibyte = 0;
        while (true) {
            CoderResult r = dec.decode(in, out, wholeFile);
            multibyte += countNonAscii(out);
            out.clear();
            if (r.isError()) {
                errors++;
                in.position(in.position() + r.length());
            } else if (r.isUnderflow()) {
                if (wholeFile) {
                    CoderResult f = dec.flush(out);
                    if (f.isError()) {
                        errors++;
                    }
                }
                break;
            }
        }
        return new int[] {errors, multibyte};
    }

    private static int countNonAscii(CharBuffer out) {
        int n = 0;
        for (int i = 0; i < out.position(); i++) {
            if (out.get(i) > 0x7F) {
                n++;
            }
        }
        return n;
    }

    /**
     * True when the bytes are not text: NUL bytes or C0 control characters other than tab, line
     * feed, form feed and carriage return make up more than 2% of the first bytes (at least 4 of
     * them). Multi-byte encodings with a byte-order mark are checked after decoding instead.
     *
     * @param guess the byte-order-mark guess, or null when the file has none
     */
    static boolean looksBinary(byte[] head, int len, Guess guess) {
        int n = Math.min(len, 8192);
        int bad = 0;
        if (guess != null && guess.bomLength() >= 2 && !guess.charset().equals(StandardCharsets.UTF_8)) {
            try {
                CharBuffer chars = guess.charset().newDecoder().onMalformedInput(CodingErrorAction.REPLACE)
                        .decode(ByteBuffer.wrap(head, guess.bomLength(), (n - guess.bomLength()) & ~3));
                int m = chars.remaining();
                for (int i = 0; i < m; i++) {
                    if (isBad(chars.get(i))) {
                        bad++;
                    }
                }
                return bad >= 4 && bad * 50L > m;
            } catch (CharacterCodingException e) {
                return true;
            }
        }
        for (int i = 0; i < n; i++) {
            if (isBad((char) (head[i] & 0xFF))) {
                bad++;
            }
        }
        return bad >= 4 && bad * 50L > n;
    }

    private static boolean isBad(char c) {
        return c < 0x20 && c != '\t' && c != '\n' && c != '\r' && c != '\f' || c == 0x7F;
    }
}
