package dev.sheaf.vocab.csv;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.code_intelligence.jazzer.junit.FuzzTest;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.VocabularyFormatException;
import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;

/**
 * Fuzz test of the vocabulary CSV importer: any text either imports or fails with a
 * {@link VocabularyFormatException} naming the file; any other exception is a bug. Seeds in
 * {@code VocabularyCsvFuzzTestInputs/read/}; fuzz with
 * {@code JAZZER_FUZZ=1 mvn -o -pl vocab test -Dtest='VocabularyCsvFuzzTest'}.
 */
class VocabularyCsvFuzzTest {
    @FuzzTest(maxDuration = "60s")
    void read(byte[] data) throws IOException {
        try {
            VocabularyCsv.read(new StringReader(new String(data, StandardCharsets.UTF_8)), SchemeInfo.of("fuzz", "Fuzz"), "fuzz.csv");
        } catch (VocabularyFormatException e) {
            assertTrue(e.getMessage().startsWith("fuzz.csv"), e.getMessage());
        }
    }
}
