package dev.sheaf.miner.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Inputs that once crashed or slipped through a run (the whole hostile corpus runs in tests/HostileMineTest). */
class HostileInputTest {
    /** A real DOCX whose document part is one text run of {@code mb} megabytes. */
    private static byte[] bomb(int mb) throws IOException {
        byte[] base = Fixtures.docx("Bomb Tent", List.of("placeholder"), List.of());
        ByteArrayOutputStream result = new ByteArrayOutputStream();
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(base)); ZipOutputStream out = new ZipOutputStream(result)) {
            out.setLevel(9);
            for (ZipEntry e; (e = in.getNextEntry()) != null; ) {
                out.putNextEntry(new ZipEntry(e.getName()));
                if (e.getName().equals("word/document.xml")) {
                    out.write(("<w:document xmlns:w=\"http://schemas.openxmlformats.org/wordprocessingml/2006/main\"><w:body>"
                            + "<w:p><w:r><w:t>").getBytes(StandardCharsets.UTF_8));
                    byte[] chunk = "bomb ".repeat(200_000).getBytes(StandardCharsets.US_ASCII);
                    for (int i = 0; i < mb; i++) {
                        out.write(chunk);
                    }
                    out.write("</w:t></w:r></w:p></w:body></w:document>".getBytes(StandardCharsets.UTF_8));
                } else {
                    in.transferTo(out);
                }
                out.closeEntry();
            }
        }
        return result.toByteArray();
    }

    @Test
    void aDocxThatExpandsAThousandFoldIsRefusedBeforeParsing(@TempDir Path dir) throws IOException {
        byte[] b = bomb(20);
        assertTrue(b.length < 100_000, "small on disk: " + b.length);
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(Fixtures.write(dir, "bomb.docx", b))).threads(1));
        assertEquals(List.of("corrupt"), r.problemKinds());
        assertTrue(r.problems().get(0).reason().contains("zip bomb"), r.problems().get(0).reason());
        assertTrue(r.listings().isEmpty());
    }

    @Test
    void anOrdinaryDocxIsNotTakenForABomb(@TempDir Path dir) throws IOException {
        Path p = Fixtures.write(dir, "ok.docx", Fixtures.docx("Plain Tent", List.of("Material: nylon"), List.of()));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(p)).threads(1));
        assertEquals("Plain Tent", r.only().title());
        assertTrue(r.problems().isEmpty(), r.problems().toString());
    }

    @Test
    void aTextFileIsCutAtTheTextLimitWithAProblem(@TempDir Path dir) throws IOException {
        Path p = Fixtures.write(dir, "long.txt", ("Long Lantern\n\n" + "lantern ".repeat(1000)).getBytes(StandardCharsets.UTF_8));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(p)).threads(1).maxTextChars(500));
        Listing l = r.only();
        assertEquals("Long Lantern", l.title());
        assertTrue(l.fields().stream().mapToInt(f -> f.text().length()).sum() <= 500, l.fields().toString());
        assertEquals(List.of("too-large"), r.problemKinds());
    }

    @Test
    void aTextFileAtTheLimitIsWhole(@TempDir Path dir) throws IOException {
        String text = "Exact Lantern\n\nMaterial: steel\n";
        Path p = Fixtures.write(dir, "exact.txt", text.getBytes(StandardCharsets.UTF_8));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(p)).threads(1).maxTextChars(text.length()));
        assertEquals("steel", Fixtures.spec(r.only(), "Material"));
        assertTrue(r.problems().isEmpty(), r.problems().toString());
    }

    @Test
    void anHtmlPageIsCutAtTheTextLimitWithAProblemAtItsLine(@TempDir Path dir) throws IOException {
        StringBuilder html = new StringBuilder("<html><head><title>Long Lantern</title></head><body>\n<h1>Long Lantern</h1>\n");
        html.append("<p>Material: steel</p>\n");
        for (int i = 0; i < 40; i++) {
            html.append("<p>").append(("paragraph " + i + " of lantern text. ").repeat(20)).append("</p>\n");
        }
        Path p = Fixtures.write(dir, "long.html", html.toString().getBytes(StandardCharsets.UTF_8));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(p)).threads(1).maxTextChars(2000));
        Listing l = r.only();
        assertEquals("Long Lantern", l.title());
        assertEquals("steel", Fixtures.spec(l, "Material"));
        int kept = l.fields().stream().mapToInt(f -> f.key().length() + f.text().length()).sum();
        assertEquals(2000, kept, "the field that reaches the limit is cut at it: " + l.fields());
        assertEquals(List.of("too-large"), r.problemKinds());
        // title and spec fill 25 characters, each paragraph 579: the fourth paragraph (line 7 of the page) reaches 2,000
        assertEquals("line 7", r.problems().get(0).position());
        assertTrue(l.fields().get(l.fields().size() - 1).text().startsWith("paragraph 3 of"));
        assertTrue(l.fields().stream().noneMatch(f -> f.text().contains("paragraph 4 ")), "nothing after the cut is read");
    }

    @Test
    void anHtmlPageThatRepeatsItsTextPastTheLimitIsCutToo(@TempDir Path dir) throws IOException {
        // 300 nested definition lists: each value holds every deeper one, so the text read grows with the square of
        // the page (a short page, under the limit, read without positions first)
        StringBuilder html = new StringBuilder("<html><head><title>Nested Lantern</title></head><body>\n");
        for (int i = 0; i < 300; i++) {
            html.append("<dl><dt>Key ").append(i).append("</dt><dd>value ").append(i).append('\n');
        }
        html.append("</dd></dl>".repeat(300)).append("</body></html>\n");
        assertTrue(html.length() < 20_000);
        Path p = Fixtures.write(dir, "nested.html", html.toString().getBytes(StandardCharsets.UTF_8));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(p)).threads(1).maxTextChars(20_000));
        Listing l = r.only();
        assertTrue(l.fields().stream().mapToInt(f -> f.key().length() + f.text().length()).sum() <= 20_000);
        assertEquals(List.of("too-large"), r.problemKinds());
        assertTrue(r.problems().get(0).position().matches("line \\d+"), r.problems().toString());
    }

    @Test
    void anHtmlPageAtTheLimitIsWhole(@TempDir Path dir) throws IOException {
        String html = "<html><head><title>Exact Lantern</title></head><body><h1>Exact Lantern</h1><p>Material: steel</p></body></html>";
        Path p = Fixtures.write(dir, "exact.html", html.getBytes(StandardCharsets.UTF_8));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(p)).threads(1)
                .maxTextChars("Exact Lantern".length() + "Materialsteel".length()));
        assertEquals("steel", Fixtures.spec(r.only(), "Material"));
        assertTrue(r.problems().isEmpty(), r.problems().toString());
    }

    @Test
    void linksThatLeadNowhereAreUnreadableProblems(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("good.txt"), "Good Lantern\n\nMaterial: steel\n");
        Files.createSymbolicLink(dir.resolve("self.txt"), Path.of("self.txt"));
        Files.createSymbolicLink(dir.resolve("dangling.txt"), Path.of("missing.txt"));
        Fixtures.Result r = Fixtures.read(Ingest.builder().source(SourceSpec.of(dir)).workspaceRoot(dir).threads(1));
        assertEquals(List.of("good"), r.ids());
        assertEquals(List.of("dangling.txt", "self.txt"), r.problems().stream().map(Problem::source).toList());
        assertEquals(List.of("unreadable", "unreadable"), r.problemKinds());
    }
}
