package dev.sheaf.miner.ingest;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.code_intelligence.jazzer.junit.FuzzTest;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

/**
 * Fuzz tests of every reader: bytes in a file of the reader's type, read as a run would read it.
 * A reader may record problems (any documented kind, with a reason) and emit listings; it must not
 * throw, and must not fall back on the run's "the reader failed unexpectedly" catch-all.
 *
 * <p>{@code mvn verify} runs the seeds in {@code ReadersFuzzTestInputs/<method>/} (regression mode);
 * {@code JAZZER_FUZZ=1 mvn -o -pl miner test -Dtest='ReadersFuzzTest#html'} fuzzes one target (see
 * docs/reliability.md). Crashing inputs found by fuzzing belong in the seed folder.
 */
class ReadersFuzzTest {
    private static final Path DIR;

    static {
        try {
            DIR = Files.createTempDirectory("sheaf-fuzz-readers");
            DIR.toFile().deleteOnExit();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Collects what one file gave. */
    private static final class Collect implements SourceFile.Run {
        final List<Listing> listings = new ArrayList<>();
        final List<Problem> problems = new ArrayList<>();

        @Override
        public void listing(Listing l) {
            listings.add(l);
        }

        @Override
        public void problem(Problem p) {
            problems.add(p);
        }

        @Override
        public void bytes(long n) {
        }

        @Override
        public Duration perFileTimeout() {
            return Duration.ofSeconds(10);
        }

        @Override
        public int writeLimit() {
            return 100_000;
        }
    }

    static void read(ListingReader reader, String ext, byte[] data) throws IOException {
        Path p = DIR.resolve("input." + ext);
        Files.write(p, data);
        Collect c = new Collect();
        SourceFile f = new SourceFile(p, "input." + ext, data.length, null, c);
        if (data.length > 0) {
            reader.read(f);
        }
        for (Problem pr : c.problems) {
            assertTrue(Problem.KINDS.contains(pr.kind()), pr.toString());
            assertTrue(!pr.reason().isBlank(), pr.toString());
        }
        for (Listing l : c.listings) {
            assertNotNull(l.id());
            assertTrue(l.source().equals("input." + ext), l.toString());
        }
    }

    @FuzzTest(maxDuration = "60s")
    void html(byte[] data) throws IOException {
        read(Readers.HTML, "html", data);
    }

    @FuzzTest(maxDuration = "60s")
    void csv(byte[] data) throws IOException {
        read(Readers.TABLE, "csv", data);
    }

    @FuzzTest(maxDuration = "60s")
    void tsv(byte[] data) throws IOException {
        read(Readers.TABLE, "tsv", data);
    }

    @FuzzTest(maxDuration = "60s")
    void json(byte[] data) throws IOException {
        read(Readers.JSON, "json", data);
    }

    @FuzzTest(maxDuration = "60s")
    void jsonl(byte[] data) throws IOException {
        read(Readers.JSON, "jsonl", data);
    }

    @FuzzTest(maxDuration = "60s")
    void text(byte[] data) throws IOException {
        read(Readers.TEXT, "md", data);
    }

    /** PDF, DOCX and RTF through Tika: the first byte picks the extension, the rest is the file. */
    @FuzzTest(maxDuration = "60s")
    void document(byte[] data) throws IOException {
        if (data.length == 0) {
            return;
        }
        String ext = switch (data[0] & 3) {
            case 0 -> "pdf";
            case 1 -> "docx";
            case 2 -> "rtf";
            default -> "odt";
        };
        read(Readers.DOCUMENT, ext, java.util.Arrays.copyOfRange(data, 1, data.length));
    }
}
