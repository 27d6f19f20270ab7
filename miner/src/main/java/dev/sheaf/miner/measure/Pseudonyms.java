package dev.sheaf.miner.measure;

import dev.sheaf.vocab.io.AtomicFiles;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.GeneralSecurityException;
import java.security.SecureRandom;
import java.util.Collection;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeSet;
import javax.crypto.Mac;
import javax.crypto.spec.SecretKeySpec;

/**
 * Turns annotator ids (personal data) into pseudonyms such as {@code ann-3f9c1e}: the first hex
 * digits of HMAC-SHA256(key, id), with a secret key kept per workspace. The same key gives the same
 * pseudonym in every run and every file, so an auditor can follow one rater across reports, while
 * without the key the pseudonym cannot be tied back to the id (not even by trying likely names).
 * See docs/decisions/072-annotator-pseudonyms.md.
 *
 * <p>Pseudonyms have {@value #MIN_DIGITS} hex digits; within one set of annotators, when two would
 * collide (about once in 17 million pairs), every pseudonym in that set is lengthened until all differ.
 */
public final class Pseudonyms {
    /** Hex digits in a pseudonym unless a collision forces more. */
    public static final int MIN_DIGITS = 6;
    /** Prefix of every pseudonym. */
    public static final String PREFIX = "ann-";
    private static final int KEY_BYTES = 32;

    private final byte[] key;

    private Pseudonyms(byte[] key) {
        if (key.length < 16) {
            throw new IllegalArgumentException("a pseudonym key needs at least 16 bytes, got " + key.length);
        }
        this.key = key.clone();
    }

    /** Pseudonyms under the given secret key (at least 16 bytes). */
    public static Pseudonyms withKey(byte[] key) {
        return new Pseudonyms(key);
    }

    /**
     * Pseudonyms under a fresh random key: never the raw id, but different in every run. For code that
     * has no workspace; the command line keeps a key file instead.
     */
    public static Pseudonyms ephemeral() {
        byte[] k = new byte[KEY_BYTES];
        new SecureRandom().nextBytes(k);
        return new Pseudonyms(k);
    }

    /**
     * Pseudonyms under the key in {@code keyFile} (hex text), creating the file with a new random key
     * when it does not exist. The file is written atomically; on POSIX file systems it is readable by its
     * owner only. Keep it out of anything you circulate.
     *
     * @throws IOException when the file cannot be read or written, or does not hold a hex key
     */
    public static Pseudonyms fromKeyFile(Path keyFile) throws IOException {
        if (!Files.exists(keyFile)) {
            byte[] k = new byte[KEY_BYTES];
            new SecureRandom().nextBytes(k);
            AtomicFiles.writeOwnerOnly(keyFile, HexFormat.of().formatHex(k) + "\n");
            return new Pseudonyms(k);
        }
        String text = Files.readString(keyFile, StandardCharsets.US_ASCII).strip();
        byte[] k;
        try {
            k = HexFormat.of().parseHex(text);
        } catch (IllegalArgumentException e) {
            throw new IOException("the pseudonym key file " + keyFile + " should hold one line of hex digits; "
                    + "it does not. Restore it from a backup, or delete it to start new pseudonyms", e);
        }
        if (k.length < 16) {
            throw new IOException("the pseudonym key in " + keyFile + " has " + k.length
                    + " bytes; at least 16 are needed. Delete the file to start new pseudonyms");
        }
        return new Pseudonyms(k);
    }

    /** The pseudonym of one id with {@link #MIN_DIGITS} digits (as in a set with no collision). */
    public String of(String id) {
        return PREFIX + digest(id).substring(0, MIN_DIGITS);
    }

    /** Pseudonyms for a set of ids, all distinct, keyed by id in sorted id order. */
    public Map<String, String> assign(Collection<String> ids) {
        TreeSet<String> sorted = new TreeSet<>(ids);
        Map<String, String> full = new LinkedHashMap<>();
        for (String id : sorted) {
            full.put(id, digest(id));
        }
        for (int digits = MIN_DIGITS; ; digits++) {
            Map<String, String> out = new LinkedHashMap<>();
            TreeSet<String> seen = new TreeSet<>();
            boolean distinct = true;
            for (Map.Entry<String, String> e : full.entrySet()) {
                String p = PREFIX + e.getValue().substring(0, digits);
                distinct &= seen.add(p);
                out.put(e.getKey(), p);
            }
            if (distinct) {
                return out;
            }
        }
    }

    private String digest(String id) {
        try {
            Mac mac = Mac.getInstance("HmacSHA256");
            mac.init(new SecretKeySpec(key, "HmacSHA256"));
            return HexFormat.of().formatHex(mac.doFinal(id.getBytes(StandardCharsets.UTF_8)));
        } catch (GeneralSecurityException e) {
            throw new IllegalStateException("HmacSHA256 is required of every Java platform", e);
        }
    }

    @Override
    public String toString() {
        return "Pseudonyms[HMAC-SHA256, key hidden]";
    }
}
