package dev.sheaf.samples;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.List;
import java.util.TimeZone;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdfwriter.compress.CompressParameters;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;

/**
 * A supplier's one-page spec sheet as a PDF (PDFBox): heading, description, features and a
 * two-column spec table (key left, value right, no colon: yet another spec shape once the text is
 * extracted). Output is byte-for-byte deterministic: fixed dates, a document id derived from the
 * listing id, the standard Helvetica fonts (not embedded) and no stream compression, so no
 * zlib version can change a byte.
 */
final class PdfSheet {
    private PdfSheet() {
    }

    /** Creation and modification date of every generated PDF and DOCX. */
    static final Calendar FIXED_DATE = fixedDate();

    private static Calendar fixedDate() {
        GregorianCalendar c = new GregorianCalendar(TimeZone.getTimeZone("UTC"), java.util.Locale.ROOT);
        c.clear();
        c.set(2024, Calendar.MARCH, 1, 9, 0, 0);
        return c;
    }

    private static final float MARGIN = 56;
    private static final float WIDTH = PDRectangle.A4.getWidth() - 2 * MARGIN;

    static byte[] render(Product p) throws IOException {
        PDType1Font regular = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
        PDType1Font bold = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
        try (PDDocument doc = new PDDocument()) {
            PDDocumentInformation info = doc.getDocumentInformation();
            info.setTitle(winAnsi(p.title()));
            info.setAuthor(winAnsi(p.supplier().name()));
            info.setSubject("Spec sheet " + p.id());
            info.setProducer("Fernhollow sample generator");
            info.setCreationDate(FIXED_DATE);
            info.setModificationDate(FIXED_DATE);
            long docId = p.id().hashCode() & 0xffffffffL;
            doc.setDocumentId(docId);
            COSArray ids = new COSArray();
            byte[] idBytes = String.format(java.util.Locale.ROOT, "%016x%016x", docId, docId * 31 + 7).getBytes(java.nio.charset.StandardCharsets.US_ASCII);
            ids.add(new COSString(idBytes));
            ids.add(new COSString(idBytes));
            doc.getDocument().getTrailer().setItem(COSName.ID, ids);

            PDPage page = new PDPage(PDRectangle.A4);
            doc.addPage(page);
            try (PDPageContentStream cs = new PDPageContentStream(doc, page, PDPageContentStream.AppendMode.OVERWRITE, false)) {
                Cursor c = new Cursor(cs, PDRectangle.A4.getHeight() - MARGIN);
                c.line(regular, 9, winAnsi(p.supplier().name() + "  ·  Product specification sheet"), MARGIN);
                c.gap(10);
                for (String l : wrap(winAnsi(p.title()), bold, 16, WIDTH)) {
                    c.line(bold, 16, l, MARGIN);
                }
                c.line(regular, 10, "SKU " + p.id() + "  ·  Category: " + p.category().label, MARGIN);
                c.gap(8);
                c.line(bold, 11, "Description", MARGIN);
                for (String l : wrap(winAnsi(p.description()), regular, 10, WIDTH)) {
                    c.line(regular, 10, l, MARGIN);
                }
                if (!p.bullets().isEmpty()) {
                    c.gap(8);
                    c.line(bold, 11, "Features", MARGIN);
                    for (String b : p.bullets()) {
                        List<String> lines = wrap(winAnsi(b), regular, 10, WIDTH - 14);
                        for (int i = 0; i < lines.size(); i++) {
                            c.line(regular, 10, (i == 0 ? "\u2022 " : "  ") + lines.get(i), MARGIN + 4);
                        }
                    }
                }
                c.gap(8);
                c.line(bold, 11, "Specifications", MARGIN);
                for (Spec s : p.specs()) {
                    c.pair(bold, regular, 10, winAnsi(s.key()), winAnsi(s.value()), MARGIN, MARGIN + 150);
                }
                c.gap(16);
                c.line(regular, 8, "Specifications are the supplier's own and may change without notice.", MARGIN);
            }
            ByteArrayOutputStream out = new ByteArrayOutputStream(16384);
            doc.save(out, CompressParameters.NO_COMPRESSION);
            return out.toByteArray();
        }
    }

    /** Moves down the page and writes lines. */
    private static final class Cursor {
        private final PDPageContentStream cs;
        private float y;

        Cursor(PDPageContentStream cs, float top) {
            this.cs = cs;
            this.y = top;
        }

        void gap(float g) {
            y -= g;
        }

        void line(PDType1Font font, float size, String text, float x) throws IOException {
            y -= size * 1.35f;
            cs.beginText();
            cs.setFont(font, size);
            cs.newLineAtOffset(x, y);
            cs.showText(text);
            cs.endText();
        }

        void pair(PDType1Font keyFont, PDType1Font valueFont, float size, String key, String value, float x1, float x2) throws IOException {
            y -= size * 1.45f;
            cs.beginText();
            cs.setFont(keyFont, size);
            cs.newLineAtOffset(x1, y);
            cs.showText(key);
            cs.endText();
            cs.beginText();
            cs.setFont(valueFont, size);
            cs.newLineAtOffset(x2, y);
            cs.showText(value);
            cs.endText();
        }
    }

    static List<String> wrap(String text, PDType1Font font, float size, float width) throws IOException {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (line.length() > 0 && font.getStringWidth(candidate) / 1000 * size > width) {
                lines.add(line.toString());
                line.setLength(0);
                line.append(word);
            } else {
                line.setLength(0);
                line.append(candidate);
            }
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }

    /** The standard fonts speak WinAnsi only: the Unicode minus becomes a hyphen-minus. */
    static String winAnsi(String s) {
        return s.replace('\u2212', '-');
    }
}
