package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PseudonymsTest {
    private static final byte[] KEY = "fernhollow-test-key-0123456789ab".getBytes(StandardCharsets.US_ASCII);

    @Test
    void theSameKeyGivesTheSamePseudonym() {
        assertEquals(Pseudonyms.withKey(KEY).of("ines@fernhollow.example"), Pseudonyms.withKey(KEY.clone()).of("ines@fernhollow.example"));
    }

    @Test
    void anotherKeyGivesAnotherPseudonym() {
        byte[] other = KEY.clone();
        other[0] ^= 1;
        assertNotEquals(Pseudonyms.withKey(KEY).of("ines"), Pseudonyms.withKey(other).of("ines"));
    }

    @Test
    void pseudonymsAreShortHexAndNeverHoldTheId() {
        String p = Pseudonyms.withKey(KEY).of("ines");
        assertTrue(p.matches("ann-[0-9a-f]{6}"), p);
        assertTrue(!p.contains("ines"));
    }

    @Test
    void pseudonymsOfASetAreDistinctEvenWhenShortOnesCollide() {
        // 6000 ids over 16.7 million six-digit values: a collision is all but certain (birthday bound), so
        // the set must be lengthened, and every pseudonym then has the same longer length.
        List<String> ids = new ArrayList<>();
        for (int i = 0; i < 6000; i++) {
            ids.add("annotator-" + i);
        }
        Map<String, String> assigned = Pseudonyms.withKey(KEY).assign(ids);
        assertEquals(6000, new HashSet<>(assigned.values()).size());
        int length = assigned.values().iterator().next().length();
        assertTrue(assigned.values().stream().allMatch(p -> p.length() == length));
    }

    @Test
    void aSmallSetKeepsSixDigitsAndTheSameLabelsAsOf() {
        Pseudonyms p = Pseudonyms.withKey(KEY);
        Map<String, String> assigned = p.assign(List.of("tomas", "ines", "ines"));
        assertEquals(Map.of("ines", p.of("ines"), "tomas", p.of("tomas")), assigned);
    }

    @Test
    void aKeyFileIsCreatedOnceAndThenReused(@TempDir Path dir) throws IOException {
        Path keyFile = dir.resolve(".sheaf/pseudonym.key");
        String first = Pseudonyms.fromKeyFile(keyFile).of("ines");
        assertTrue(Files.exists(keyFile));
        assertTrue(Files.readString(keyFile).strip().matches("[0-9a-f]{64}"));
        assertEquals(first, Pseudonyms.fromKeyFile(keyFile).of("ines"));
        if (keyFile.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            // the key lets anyone undo the pseudonyms: readable by its owner only
            assertEquals("rw-------", java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(keyFile)));
        }
    }

    @Test
    void aKeyFileThatIsNotHexIsAnIoErrorSayingWhatToDo(@TempDir Path dir) throws IOException {
        Path keyFile = dir.resolve("pseudonym.key");
        Files.writeString(keyFile, "not a key");
        IOException e = assertThrows(IOException.class, () -> Pseudonyms.fromKeyFile(keyFile));
        assertTrue(e.getMessage().contains("hex"), e.getMessage());
    }

    @Test
    void aShortKeyIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> Pseudonyms.withKey(new byte[8]));
    }

    @Test
    void theKeyIsNotInToString() {
        assertTrue(!Pseudonyms.withKey(KEY).toString().contains("fernhollow"));
    }
}
