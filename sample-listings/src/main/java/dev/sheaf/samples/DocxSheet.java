package dev.sheaf.samples;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.time.LocalDateTime;
import java.util.Optional;
import java.util.zip.CRC32;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.ooxml.POIXMLProperties;
import org.apache.poi.xwpf.usermodel.XWPFDocument;
import org.apache.poi.xwpf.usermodel.XWPFParagraph;
import org.apache.poi.xwpf.usermodel.XWPFRun;
import org.apache.poi.xwpf.usermodel.XWPFTable;
import org.apache.poi.xwpf.usermodel.XWPFTableRow;

/**
 * A supplier's product sheet as a Word document (POI): the way suppliers send new lines to the
 * buying desk. Deterministic: fixed core-property dates, and the package is rewritten with fixed
 * zip entry times and STORED (uncompressed) entries, so neither the clock nor the zlib version can
 * change a byte.
 */
final class DocxSheet {
    private DocxSheet() {
    }

    static byte[] render(Product p) throws IOException {
        ByteArrayOutputStream raw = new ByteArrayOutputStream(32768);
        try (XWPFDocument doc = new XWPFDocument()) {
            POIXMLProperties.CoreProperties props = doc.getProperties().getCoreProperties();
            props.setCreator(p.supplier().name());
            props.setTitle(p.title());
            props.setCreated(Optional.of(PdfSheet.FIXED_DATE.getTime()));
            props.setModified(Optional.of(PdfSheet.FIXED_DATE.getTime()));
            props.setLastModifiedByUser(p.supplier().name());

            run(doc.createParagraph(), p.supplier().name() + " — product sheet for Fernhollow Outfitters", false, 9);
            run(doc.createParagraph(), p.title(), true, 16);
            run(doc.createParagraph(), (p.supplier().quirky() ? "ITEM NO. " : "Item no.: ") + p.id() + "    " + (p.supplier().quirky() ? "CAT. " : "Category: ") + p.category().label, false, 10);
            run(doc.createParagraph(), p.supplier().quirky() ? "DESCRIPTION" : "Description", true, 11);
            run(doc.createParagraph(), p.description(), false, 10);
            if (!p.bullets().isEmpty()) {
                run(doc.createParagraph(), p.supplier().quirky() ? "FEATURES" : "Key features", true, 11);
                for (String b : p.bullets()) {
                    run(doc.createParagraph(), (p.supplier().quirky() ? "- " : "• ") + b, false, 10);
                }
            }
            run(doc.createParagraph(), p.supplier().quirky() ? "SPECS" : "Specifications", true, 11);
            XWPFTable table = doc.createTable(p.specs().size(), 2);
            for (int i = 0; i < p.specs().size(); i++) {
                XWPFTableRow row = table.getRow(i);
                row.getCell(0).setText(p.specs().get(i).key());
                row.getCell(1).setText(p.specs().get(i).value());
            }
            doc.write(raw);
        }
        return normalise(raw.toByteArray());
    }

    private static void run(XWPFParagraph para, String text, boolean bold, int size) {
        XWPFRun r = para.createRun();
        r.setText(text);
        r.setBold(bold);
        r.setFontSize(size);
    }

    /** Rewrites a zip with fixed entry times and STORED entries, entries in their original order. */
    static byte[] normalise(byte[] zip) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream(zip.length * 4);
        LocalDateTime fixed = LocalDateTime.of(2024, 3, 1, 9, 0, 0);
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(zip));
             ZipOutputStream z = new ZipOutputStream(out)) {
            ZipEntry e;
            while ((e = in.getNextEntry()) != null) {
                byte[] data = in.readAllBytes();
                ZipEntry copy = new ZipEntry(e.getName());
                copy.setMethod(ZipEntry.STORED);
                copy.setSize(data.length);
                copy.setCompressedSize(data.length);
                CRC32 crc = new CRC32();
                crc.update(data);
                copy.setCrc(crc.getValue());
                copy.setTimeLocal(fixed);
                z.putNextEntry(copy);
                z.write(data);
                z.closeEntry();
            }
        }
        return out.toByteArray();
    }
}
