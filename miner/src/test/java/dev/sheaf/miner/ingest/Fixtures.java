package dev.sheaf.miner.ingest;

import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.stream.Collectors;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.encryption.AccessPermission;
import org.apache.pdfbox.pdmodel.encryption.StandardProtectionPolicy;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.apache.poi.xwpf.usermodel.XWPFDocument;
import org.apache.poi.xwpf.usermodel.XWPFTable;

/** Test helpers: fixture paths, one-call ingest, and PDF/DOCX files made on the fly. */
final class Fixtures {
    private Fixtures() {
    }

    /** A file or folder under src/test/resources/ingest. */
    static Path fixture(String rel) {
        URL u = Fixtures.class.getResource("/ingest/" + rel);
        assertNotNull(u, "missing test fixture ingest/" + rel);
        try {
            return Path.of(u.toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    /** What a run gave. */
    record Result(List<Listing> listings, IngestSummary summary) {
        Listing only() {
            if (listings.size() != 1) {
                throw new AssertionError("expected one listing, got " + listings.size() + ": " + listings + " problems " + summary.problems());
            }
            return listings.get(0);
        }

        Listing byId(String id) {
            return listings.stream().filter(l -> l.id().equals(id)).findFirst()
                    .orElseThrow(() -> new AssertionError("no listing " + id + " in " + ids()));
        }

        List<String> ids() {
            return listings.stream().map(Listing::id).collect(Collectors.toList());
        }

        List<Problem> problems() {
            return summary.problems();
        }

        List<String> problemKinds() {
            return summary.problems().stream().map(Problem::kind).collect(Collectors.toList());
        }
    }

    static Result read(Path path) {
        return read(Ingest.builder().source(SourceSpec.of(path)).threads(2));
    }

    static Result read(Ingest.Builder b) {
        List<Listing> out = Collections.synchronizedList(new ArrayList<>());
        IngestSummary s = b.build().run(out::add);
        return new Result(new ArrayList<>(out), s);
    }

    static String spec(Listing l, String key) {
        return l.fields().stream().filter(f -> f.kind() == FieldKind.SPEC && f.key().equals(key)).map(Field::text)
                .findFirst().orElseThrow(() -> new AssertionError("no spec '" + key + "' in " + l.fields()));
    }

    static List<String> texts(Listing l, FieldKind kind) {
        return l.fields().stream().filter(f -> f.kind() == kind).map(Field::text).collect(Collectors.toList());
    }

    static List<String> specKeys(Listing l) {
        return l.fields().stream().filter(f -> f.kind() == FieldKind.SPEC).map(Field::key).collect(Collectors.toList());
    }

    /** A one-page PDF with the given lines, optionally encrypted with a user password. */
    static byte[] pdf(List<String> lines, String userPassword) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            PDPage page = new PDPage();
            doc.addPage(page);
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                cs.beginText();
                cs.setFont(new PDType1Font(Standard14Fonts.FontName.HELVETICA), 12);
                cs.setLeading(16);
                cs.newLineAtOffset(72, 720);
                for (String l : lines) {
                    cs.showText(l);
                    cs.newLine();
                }
                cs.endText();
            }
            if (userPassword != null) {
                StandardProtectionPolicy p = new StandardProtectionPolicy("owner-" + userPassword, userPassword, new AccessPermission());
                p.setEncryptionKeyLength(128);
                doc.protect(p);
            }
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            doc.save(out);
            return out.toByteArray();
        }
    }

    /** A DOCX with a title paragraph, body paragraphs and a two-column spec table. */
    static byte[] docx(String title, List<String> paragraphs, List<String[]> specRows) throws IOException {
        try (XWPFDocument doc = new XWPFDocument()) {
            doc.createParagraph().createRun().setText(title);
            for (String p : paragraphs) {
                doc.createParagraph().createRun().setText(p);
            }
            if (!specRows.isEmpty()) {
                XWPFTable t = doc.createTable(specRows.size(), 2);
                for (int i = 0; i < specRows.size(); i++) {
                    t.getRow(i).getCell(0).setText(specRows.get(i)[0]);
                    t.getRow(i).getCell(1).setText(specRows.get(i)[1]);
                }
            }
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            doc.write(out);
            return out.toByteArray();
        }
    }

    static Path write(Path dir, String name, byte[] bytes) throws IOException {
        Path p = dir.resolve(name);
        Files.createDirectories(p.getParent());
        Files.write(p, bytes);
        return p;
    }
}
