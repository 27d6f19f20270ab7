package dev.sheaf.vocab.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicFilesTest {
    @TempDir
    Path dir;

    @Test
    void replacesTheFileAndKeepsTheOldOneAsBackup() throws IOException {
        Path f = dir.resolve("a.json");
        AtomicFiles.writeString(f, "old");
        AtomicFiles.write(f, out -> out.write("new".getBytes(StandardCharsets.UTF_8)), true);
        assertEquals("new", Files.readString(f));
        assertEquals("old", Files.readString(dir.resolve("a.json~")));
    }

    @Test
    void aFailingBodyLeavesThePreviousFileAndNoTempFile() throws IOException {
        Path f = dir.resolve("b.csv");
        AtomicFiles.writeString(f, "complete");
        assertThrows(IOException.class, () -> AtomicFiles.write(f, out -> {
            out.write("half".getBytes(StandardCharsets.UTF_8));
            throw new IOException("disk full");
        }));
        assertEquals("complete", Files.readString(f));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(1, s.count(), "temp file left behind");
        }
    }

    @Test
    void createsMissingFolders() throws IOException {
        Path f = dir.resolve("x/y/z.txt");
        AtomicFiles.writeText(f, w -> w.write("héllo"));
        assertTrue(Files.exists(f));
        assertEquals("héllo", Files.readString(f, StandardCharsets.UTF_8));
    }

    @Test
    void outputsAreReadableByOthersNotOnlyTheOwner() throws IOException {
        Path f = dir.resolve("report.csv");
        AtomicFiles.writeString(f, "a,b");
        if (f.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            assertTrue(Files.getPosixFilePermissions(f).contains(java.nio.file.attribute.PosixFilePermission.OTHERS_READ)
                    || Files.getPosixFilePermissions(f).contains(java.nio.file.attribute.PosixFilePermission.GROUP_READ),
                    "written with owner-only permissions: " + Files.getPosixFilePermissions(f));
        }
    }
}
