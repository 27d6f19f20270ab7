package dev.sheaf.vocab.store;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.code_intelligence.jazzer.junit.FuzzTest;
import dev.sheaf.vocab.VocabularyFormatException;

/**
 * Fuzz test of the vocabulary JSON reader: any bytes either read as a vocabulary or fail with a
 * {@link VocabularyFormatException} naming the file (and, when known, the line and column); any
 * other exception is a bug. Seeds in {@code VocabularyJsonFuzzTestInputs/read/}; fuzz with
 * {@code JAZZER_FUZZ=1 mvn -o -pl vocab test -Dtest='VocabularyJsonFuzzTest'}.
 */
class VocabularyJsonFuzzTest {
    @FuzzTest(maxDuration = "60s")
    void read(byte[] data) {
        try {
            JsonCodec.read(data, "fuzz.vocab.json");
        } catch (VocabularyFormatException e) {
            assertTrue(e.getMessage().startsWith("fuzz.vocab.json"), e.getMessage());
        }
    }
}
