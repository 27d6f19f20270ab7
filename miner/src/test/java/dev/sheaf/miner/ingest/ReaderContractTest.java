package dev.sheaf.miner.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Every reader honours the same contract: it reads a good file, and it turns empty, blank,
 * wrongly encoded, corrupt and over-large input into problems, never into an exception, a stopped
 * run or garbage listings.
 */
class ReaderContractTest {
    private static final String TITLE = "Größe Parka";
    private static final String MATERIAL = "Baumwolle für Außen";

    /** One sample per reader, made from a title and a Material spec in a given legacy encoding. */
    enum Format {
        HTML("html", true), CSV("csv", true), TSV("tsv", true), JSON("json", true), JSONL("jsonl", true),
        TEXT("txt", true), MARKDOWN("md", true), RTF("rtf", false), PDF("pdf", false), DOCX("docx", false);

        final String ext;
        /** True when the file is decoded by Sheaf (so encoding damage is Sheaf's to report). */
        final boolean decoded;

        Format(String ext, boolean decoded) {
            this.ext = ext;
            this.decoded = decoded;
        }

        byte[] sample(String title, String material, Charset cs) throws IOException {
            return switch (this) {
                case HTML -> ("<html><head><title>" + title + "</title></head><body><h1>" + title + "</h1><p>Material: "
                        + material + "</p></body></html>").getBytes(cs);
                case CSV -> ("id,title,Material\nX1," + title + "," + material + "\n").getBytes(cs);
                case TSV -> ("id\ttitle\tMaterial\nX1\t" + title + "\t" + material + "\n").getBytes(cs);
                case JSON -> ("[{\"id\": \"X1\", \"title\": \"" + title + "\", \"specs\": {\"Material\": \"" + material + "\"}}]").getBytes(cs);
                case JSONL -> ("{\"id\": \"X1\", \"title\": \"" + title + "\", \"specs\": {\"Material\": \"" + material + "\"}}\n").getBytes(cs);
                case TEXT -> (title + "\n\nMaterial: " + material + "\n").getBytes(cs);
                case MARKDOWN -> ("# " + title + "\n\nMaterial: " + material + "\n").getBytes(cs);
                case RTF -> ("{\\rtf1\\ansi\\ansicpg1252\\deff0{\\fonttbl{\\f0 Arial;}}\\f0 " + title + "\\par\n\\par\nMaterial: "
                        + material + "\\par\n}").getBytes(StandardCharsets.ISO_8859_1);
                case PDF -> Fixtures.pdf(List.of(title, "Material: " + material), null);
                case DOCX -> Fixtures.docx(title, List.of("Material: " + material), List.of());
            };
        }

        /** Content with nothing to read in it (but not zero bytes). */
        byte[] blank() throws IOException {
            return switch (this) {
                case HTML -> "<html><head></head><body>  </body></html>".getBytes(StandardCharsets.UTF_8);
                case CSV -> "id,title,Material\n".getBytes(StandardCharsets.UTF_8);
                case TSV -> "id\ttitle\tMaterial\n".getBytes(StandardCharsets.UTF_8);
                case JSON -> "[]".getBytes(StandardCharsets.UTF_8);
                case JSONL, TEXT, MARKDOWN -> "\n  \n\n".getBytes(StandardCharsets.UTF_8);
                case RTF -> "{\\rtf1\\ansi }".getBytes(StandardCharsets.US_ASCII);
                case PDF -> Fixtures.pdf(List.of(), null);
                case DOCX -> Fixtures.docx("", List.of(), List.of());
            };
        }
    }

    private static Fixtures.Result run(Path file, long maxBytes) {
        return Fixtures.read(Ingest.builder().source(SourceSpec.of(file)).threads(1).maxFileBytes(maxBytes));
    }

    @ParameterizedTest
    @EnumSource(Format.class)
    void readsAGoodFile(Format f, @TempDir Path dir) throws IOException {
        Path p = Fixtures.write(dir, "good." + f.ext, f.sample(TITLE, MATERIAL, StandardCharsets.UTF_8));
        Fixtures.Result r = run(p, Ingest.DEFAULT_MAX_FILE_BYTES);
        Listing l = r.only();
        assertEquals(TITLE, l.title());
        assertEquals(MATERIAL, Fixtures.spec(l, "Material"));
        assertTrue(r.problems().isEmpty(), r.problems().toString());
        assertEquals(1, r.summary().filesRead());
    }

    @ParameterizedTest
    @EnumSource(Format.class)
    void zeroBytesIsAnEmptyProblem(Format f, @TempDir Path dir) throws IOException {
        Fixtures.Result r = run(Fixtures.write(dir, "zero." + f.ext, new byte[0]), Ingest.DEFAULT_MAX_FILE_BYTES);
        assertTrue(r.listings().isEmpty());
        assertEquals(List.of("empty"), r.problemKinds());
        assertEquals("zero." + f.ext, Path.of(r.problems().get(0).source()).getFileName().toString());
    }

    @ParameterizedTest
    @EnumSource(Format.class)
    void contentWithNothingToReadIsAnEmptyProblem(Format f, @TempDir Path dir) throws IOException {
        Fixtures.Result r = run(Fixtures.write(dir, "blank." + f.ext, f.blank()), Ingest.DEFAULT_MAX_FILE_BYTES);
        assertTrue(r.listings().isEmpty(), r.listings().toString());
        assertEquals(List.of("empty"), r.problemKinds());
    }

    @ParameterizedTest
    @EnumSource(Format.class)
    void legacyEncodedTextReadsCorrectly(Format f, @TempDir Path dir) throws IOException {
        Path p = Fixtures.write(dir, "latin1." + f.ext, f.sample(TITLE, MATERIAL, StandardCharsets.ISO_8859_1));
        Fixtures.Result r = run(p, Ingest.DEFAULT_MAX_FILE_BYTES);
        Listing l = r.only();
        assertEquals(TITLE, l.title(), "a Latin-1 file must read as Latin-1, not as broken UTF-8");
        assertEquals(MATERIAL, Fixtures.spec(l, "Material"));
        assertTrue(r.problems().isEmpty(), r.problems().toString());
    }

    @ParameterizedTest
    @EnumSource(value = Format.class, names = {"HTML", "CSV", "TSV", "JSON", "JSONL", "TEXT", "MARKDOWN"})
    void undecodableBytesAreAnEncodingProblemWithAPositionAndTheRestIsRead(Format f, @TempDir Path dir) throws IOException {
        byte[] good = f.sample(TITLE, MATERIAL, StandardCharsets.UTF_8);
        byte[] marker = "Außen".getBytes(StandardCharsets.UTF_8);
        int at = indexOf(good, marker) + marker.length;
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.write(good, 0, at);
        b.write(0xFF); // never valid in UTF-8
        b.write(good, at, good.length - at);
        Fixtures.Result r = run(Fixtures.write(dir, "damaged." + f.ext, b.toByteArray()), Ingest.DEFAULT_MAX_FILE_BYTES);
        assertEquals(List.of("encoding"), r.problemKinds());
        Problem p = r.problems().get(0);
        assertTrue(p.position().matches("line \\d+"), p.position());
        assertTrue(p.reason().contains("byte " + at), p.reason());
        Listing l = r.only();
        assertEquals(TITLE, l.title(), "the readable text is kept");
        assertEquals(MATERIAL + "\uFFFD", Fixtures.spec(l, "Material"));
    }

    @ParameterizedTest
    @EnumSource(Format.class)
    void binaryJunkIsACorruptProblemNotAListing(Format f, @TempDir Path dir) throws IOException {
        byte[] junk = new byte[4096];
        new Random(42).nextBytes(junk);
        Fixtures.Result r = run(Fixtures.write(dir, "junk." + f.ext, junk), Ingest.DEFAULT_MAX_FILE_BYTES);
        assertTrue(r.listings().isEmpty(), r.listings().toString());
        assertEquals(1, r.problems().size(), r.problems().toString());
        assertTrue(Set.of("corrupt", "unsupported").contains(r.problems().get(0).kind()), r.problems().toString());
    }

    @ParameterizedTest
    @EnumSource(value = Format.class, names = {"PDF", "DOCX"})
    void aTruncatedDocumentIsACorruptProblem(Format f, @TempDir Path dir) throws IOException {
        byte[] good = f.sample(TITLE, MATERIAL, StandardCharsets.UTF_8);
        byte[] half = java.util.Arrays.copyOf(good, good.length / 3);
        Fixtures.Result r = run(Fixtures.write(dir, "cut." + f.ext, half), Ingest.DEFAULT_MAX_FILE_BYTES);
        assertTrue(r.listings().isEmpty() || r.listings().get(0).title().equals(TITLE), "no garbage: " + r.listings());
        if (r.listings().isEmpty()) {
            assertFalse(r.problems().isEmpty());
        }
    }

    @ParameterizedTest
    @EnumSource(value = Format.class, names = {"CSV", "TSV", "JSON", "JSONL"}, mode = EnumSource.Mode.EXCLUDE)
    void aFileReadWholeOverTheSizeLimitIsNotRead(Format f, @TempDir Path dir) throws IOException {
        byte[] good = f.sample(TITLE, MATERIAL, StandardCharsets.UTF_8);
        Fixtures.Result r = run(Fixtures.write(dir, "big." + f.ext, good), good.length - 1);
        assertTrue(r.listings().isEmpty());
        assertEquals(List.of("too-large"), r.problemKinds());
        assertTrue(r.problems().get(0).reason().contains(good.length + " bytes"), r.problems().get(0).reason());
        assertEquals(0, r.summary().bytesRead(), "not a byte of it is read");
    }

    @ParameterizedTest
    @EnumSource(value = Format.class, names = {"CSV", "TSV", "JSON", "JSONL"})
    void aStreamedFeedIsReadWholeWhateverItsSize(Format f, @TempDir Path dir) throws IOException {
        // Feeds are parsed record by record, so a 430 MB JSON Lines export must not be refused.
        byte[] good = f.sample(TITLE, MATERIAL, StandardCharsets.UTF_8);
        Fixtures.Result r = run(Fixtures.write(dir, "big." + f.ext, good), good.length - 1);
        assertEquals(List.of(), r.problemKinds());
        assertEquals(1, r.listings().size());
        assertEquals(TITLE, r.listings().get(0).title());
    }

    private static int indexOf(byte[] hay, byte[] needle) {
        outer:
        for (int i = 0; i + needle.length <= hay.length; i++) {
            for (int j = 0; j < needle.length; j++) {
                if (hay[i + j] != needle[j]) {
                    continue outer;
                }
            }
            return i;
        }
        throw new AssertionError("marker not found");
    }
}
