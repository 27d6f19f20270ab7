package dev.sheaf.tests;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.encryption.AccessPermission;
import org.apache.pdfbox.pdmodel.encryption.StandardProtectionPolicy;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;
import org.apache.poi.xwpf.usermodel.XWPFDocument;

/**
 * Writes the hostile corpus: broken, malicious and merely awkward files, each with what ingest is
 * expected to make of it. Generated rather than committed, so the big ones (a 50 MB line, a zip
 * bomb) cost nothing in the repository and every byte is explained here. The same seed gives the
 * same files.
 *
 * <p>External entities point at {@link #SECRET} in a file outside the corpus and at an http URL on
 * the loopback interface ({@code httpPort}, where the test listens): if either were resolved, the
 * secret would show up in the harvest, or the listener would see a connection.
 */
final class HostileCorpus {
    /** A word that exists only in the XXE target file; it must never reach any output. */
    static final String SECRET = "xxesecretqzv";
    /** A word that exists only in a plain control file; it must reach the harvest (so the secret check can fail). */
    static final String CONTROL = "xxecontrolqzv";

    /** Size of the single-line text file: 50 MB (decimal), just under the default 50 MiB limit, so it is read. */
    static final int LONG_LINE_BYTES = 50_000_000;

    /**
     * One hostile input and what ingest must make of it.
     *
     * @param file     path below the corpus root, with {@code /}
     * @param input    what the file is
     * @param kinds    the problem kinds it must raise (empty: none)
     * @param listings the listings it must give
     */
    record Entry(String file, String input, Set<String> kinds, int listings) {
        String expected() {
            String l = listings + (listings == 1 ? " listing" : " listings");
            return kinds.isEmpty() ? l + ", no problem" : l + ", " + String.join(" + ", kinds.stream().sorted().toList());
        }
    }

    private final Path root;
    private final List<Entry> entries = new ArrayList<>();
    private boolean rootReadsEverything;

    private HostileCorpus(Path root) {
        this.root = root;
    }

    /** Writes the corpus below {@code root}/hostile; {@code secretFile} is written outside it. */
    static HostileCorpus write(Path root, Path secretFile, int httpPort) throws IOException {
        HostileCorpus c = new HostileCorpus(root);
        c.writeAll(secretFile, httpPort);
        return c;
    }

    List<Entry> entries() {
        return List.copyOf(entries);
    }

    int expectedListings() {
        return entries.stream().mapToInt(Entry::listings).sum();
    }

    /** True when chmod 000 did not stop this process reading (running as root). */
    boolean rootReadsEverything() {
        return rootReadsEverything;
    }

    private void writeAll(Path secretFile, int httpPort) throws IOException {
        Files.writeString(secretFile, (SECRET + " ").repeat(50) + "\n", StandardCharsets.UTF_8);
        String secretUri = secretFile.toUri().toString();
        String httpUri = "http://127.0.0.1:" + httpPort + "/sheaf-entity.dtd";
        Random rnd = new Random(42);

        // --- empty and junk
        for (String ext : List.of("html", "pdf", "docx", "csv", "jsonl", "txt")) {
            put("hostile/empty/empty." + ext, new byte[0], "zero bytes", Set.of("empty"), 0);
        }
        for (String ext : List.of("html", "pdf", "docx")) {
            byte[] junk = new byte[8192];
            rnd.nextBytes(junk);
            put("hostile/junk/junk." + ext, junk, "8 KiB of random bytes behind a ." + ext + " name", Set.of("corrupt"), 0);
        }

        // --- PDFs made with PDFBox
        byte[] pdf = pdf(List.of("Hostile Ridge Lantern", "ID: HX-PDF-1", "Material: anodised aluminium", "Weight: 120 g"), null);
        put("hostile/pdf/truncated.pdf", Arrays.copyOf(pdf, pdf.length * 2 / 5), "a real PDF cut off after 40% of its bytes",
                Set.of("corrupt"), 0);
        put("hostile/pdf/encrypted.pdf", pdf(List.of("Locked Lantern", "Material: steel"), "s3cret"),
                "a PDF encrypted with a user password (AES-128)", Set.of("encrypted"), 0);
        put("hostile/pdf/owner-password-only.pdf", pdf(List.of("Permissions Lantern", "ID: HX-PDF-2", "Material: brass"), ""),
                "a PDF with an owner password only (opens without one, restricted permissions)", Set.of(), 1);

        // --- DOCX: zip bomb and an external entity in the document part
        put("hostile/docx/zip-bomb.docx", zipBomb(), "a DOCX whose document part expands to 200 MB (about 1000:1)",
                Set.of("corrupt"), 0);
        String xxeBody = "<!DOCTYPE w:document [<!ENTITY x SYSTEM \"" + secretUri + "\">]>"
                + "<w:document xmlns:w=\"http://schemas.openxmlformats.org/wordprocessingml/2006/main\"><w:body>"
                + "<w:p><w:r><w:t>Entity Parka</w:t></w:r></w:p><w:p><w:r><w:t>&x;</w:t></w:r></w:p></w:body></w:document>";
        put("hostile/docx/external-entity.docx", docxWithDocumentXml(xxeBody.getBytes(StandardCharsets.UTF_8)),
                "a DOCX whose document part declares a SYSTEM entity naming a local file", Set.of("corrupt"), 0);

        // --- XML and SVG: external entities and entity expansion
        String xxe = "<?xml version=\"1.0\"?>\n<!DOCTYPE item [<!ENTITY x SYSTEM \"" + secretUri + "\">]>\n"
                + "<item><title>Entity Lantern</title><body>&x; &x; &x; &x;</body></item>\n";
        put("hostile/xml/external-entity-file.xml", utf8(xxe), "XML with a SYSTEM entity naming a local file",
                Set.of(), 1);
        String xxeHttp = "<?xml version=\"1.0\"?>\n<!DOCTYPE item [<!ENTITY % remote SYSTEM \"" + httpUri + "\"> %remote;"
                + "<!ENTITY y SYSTEM \"" + httpUri + "?y\">]>\n<item><title>Remote Lantern</title><body>&y;</body></item>\n";
        put("hostile/xml/external-entity-http.xml", utf8(xxeHttp), "XML with parameter and general entities naming an http URL",
                Set.of(), 1);
        put("hostile/xml/billion-laughs.xml", utf8(laughs("lolz", "")), "XML with nested entity expansion (10^9 'lol')",
                Set.of("corrupt"), 0);
        String svg = "<?xml version=\"1.0\"?>\n<!DOCTYPE svg [<!ENTITY x SYSTEM \"" + secretUri + "\">]>\n"
                + "<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"10\" height=\"10\"><title>Entity Badge</title>"
                + "<text x=\"0\" y=\"5\">&x;</text><image href=\"" + httpUri + "?img\"/></svg>\n";
        put("hostile/svg/external-entity.svg", utf8(svg), "SVG with a SYSTEM entity and an image on an http URL", Set.of(), 1);
        put("hostile/svg/billion-laughs.svg", utf8(laughs("svg", " xmlns=\"http://www.w3.org/2000/svg\"")),
                "SVG with nested entity expansion", Set.of("corrupt"), 0);
        String xhtml = "<?xml version=\"1.0\"?>\n<!DOCTYPE html [<!ENTITY x SYSTEM \"" + secretUri + "\">]>\n"
                + "<html xmlns=\"http://www.w3.org/1999/xhtml\"><head><title>Entity Tarp</title></head>"
                + "<body><h1>Entity Tarp</h1><p>&x;</p><p>Material: ripstop nylon</p><img src=\"" + httpUri + "?x\"/></body></html>\n";
        put("hostile/xml/external-entity.xhtml", utf8(xhtml), "XHTML with a SYSTEM entity and an http image", Set.of(), 1);

        // --- deep, long and oddly encoded text
        StringBuilder deep = new StringBuilder("<html><head><title>Deep Nest Lantern</title></head><body>");
        deep.append("<div>".repeat(100_000)).append("<p>Material: aluminium</p>").append("</div>".repeat(100_000));
        deep.append("</body></html>");
        put("hostile/html/nested-100000.html", utf8(deep.toString()), "HTML with 100,000 nested div elements", Set.of(), 1);
        StringBuilder big = new StringBuilder("<html><head><title>Endless Page Lantern</title></head><body>\n<h1>Endless Page Lantern</h1>\n");
        big.append("<p>Material: steel</p>\n");
        String para = "<p>" + "lantern text that never ends, ".repeat(33) + "</p>\n";
        big.append(para.repeat(6_000)).append("</body></html>\n");
        put("hostile/html/text-6m-characters.html", utf8(big.toString()),
                "an HTML page with 6 million characters of text (the limit for one listing is 5 million)", Set.of("too-large"), 1);
        StringBuilder dl = new StringBuilder("<html><head><title>Nested List Lantern</title></head><body>\n");
        for (int i = 0; i < 2_000; i++) {
            dl.append("<dl><dt>Key ").append(i).append("</dt><dd>value ").append(i).append(" of the nested list\n");
        }
        dl.append("</dd></dl>".repeat(2_000)).append("</body></html>\n");
        put("hostile/html/nested-definitions.html", utf8(dl.toString()),
                "HTML with 2,000 nested definition lists (each value holds all deeper ones: the text grows with the square of the page)",
                Set.of("too-large"), 1);
        putLongLine("hostile/text/single-line-50mb.txt");
        byte[] utf8 = utf8("Größe Parka\n\nMaterial: Baumwolle für Außen\n");
        byte[] broken = Arrays.copyOf(utf8, utf8.length + 1);
        System.arraycopy(utf8, 0, broken, 0, 6);
        broken[6] = (byte) 0xFF;
        System.arraycopy(utf8, 6, broken, 7, utf8.length - 6);
        put("hostile/encoding/invalid-utf8.txt", broken, "UTF-8 with one invalid byte (0xFF) in the title", Set.of("encoding"), 1);
        ByteArrayOutputStream u16 = new ByteArrayOutputStream();
        u16.write(0xFF);
        u16.write(0xFE);
        u16.write("Wärme Mütze\n\nMaterial: Wolle\n".getBytes(StandardCharsets.UTF_16LE));
        put("hostile/encoding/utf16le-bom.txt", u16.toByteArray(), "UTF-16LE with a byte-order mark", Set.of(), 1);
        put("hostile/encoding/latin1.txt", "Côte Veste légère\n\nMatière: laine mérinos\n".getBytes(StandardCharsets.ISO_8859_1),
                "ISO-8859-1 text with accented letters", Set.of(), 1);

        // --- tables and feeds
        put("hostile/csv/unbalanced-quote.csv", utf8("id,title,category,Material\nHX-C1,Quote Tent,tents,nylon\n"
                        + "HX-C2,\"Open Quote Tent,tents,polyester\nHX-C3,After Quote Tent,tents,canvas\n"),
                "CSV whose second record opens a quote that never closes", Set.of("parse"), 2);
        put("hostile/csv/ragged-rows.csv", utf8("id,title,category,Material\nHX-R1,Ragged Stove,stoves,steel\n"
                        + "HX-R2,Short Stove\nHX-R3,Long Stove,stoves,titanium,extra,cells\nHX-R4,Even Stove,stoves,brass\n"),
                "CSV with a short and a long row among good ones", Set.of("parse"), 2);
        put("hostile/csv/duplicate-header.csv", utf8("id,title,Material,Material\nHX-D1,Twin Header Pot,steel,aluminium\n"),
                "CSV with two columns of the same name", Set.of("parse"), 1);
        put("hostile/csv/formula-cells.csv", utf8("id,title,category,Material\n"
                        + "HX-F1,\"=HYPERLINK(\"\"http://127.0.0.1/x\"\",\"\"Click\"\")\",tents,\"=1+2\"\n"
                        + "HX-F2,@SUM(1+9)*cmd|' /C calc'!A0,tents,+cmd|' /C calc'!A0\n"
                        + "HX-F3,-2+3+cmd|' /C calc'!A0,tents,\"\tTab Material\"\n"),
                "CSV whose cells are OWASP formula-injection payloads", Set.of(), 3);
        put("hostile/csv/path-ids.csv", utf8("id,title,category,Material\n../../etc/sheaf-escape,Traversal Tent,../../../tmp/sheaf-cat,nylon\n"
                        + "/etc/passwd,Absolute Tent,..\\..\\win,polyester\n"),
                "CSV whose ids and categories are path-traversal strings", Set.of(), 2);
        put("hostile/jsonl/broken-lines.jsonl", utf8("{\"id\":\"HX-J1\",\"title\":\"Line One Mug\",\"category\":\"mugs\"}\n"
                        + "{\"id\":\"HX-J2\",\"title\":\"Broken\n" + "not json at all\n"
                        + "{\"id\":\"HX-J3\",\"title\":\"Line Four Mug\",\"category\":\"mugs\"}\n"),
                "JSON Lines with a cut-off line and a line of prose among good ones", Set.of("parse"), 2);
        put("hostile/json/nested-100000.json", utf8("[".repeat(100_000) + "]".repeat(100_000)),
                "a JSON document of 100,000 nested arrays", Set.of("parse"), 0);
        put("hostile/json/truncated.json", utf8("[{\"id\":\"HX-K1\",\"title\":\"Whole Bottle\"},{\"id\":\"HX-K2\",\"title\":\"Cut Bot"),
                "a JSON array cut off in its second record", Set.of("parse"), 1);

        // --- files and names
        put("hostile/names/tent with spaces.txt", utf8("Spacious Name Tent\n\nMaterial: nylon\n"), "a name with spaces", Set.of(), 1);
        put("hostile/names/Zelt Größe – 日本語 ✓.html",
                utf8("<html><head><title>Unicode Name Tent</title></head><body><h1>Unicode Name Tent</h1><p>Material: nylon</p></body></html>"),
                "a name with non-ASCII letters, a dash, CJK and a symbol", Set.of(), 1);
        put("hostile/names/control.txt", utf8("Control Word Lantern\n\n" + (CONTROL + " ").repeat(200) + "\n"),
                "a plain file with a word that must reach the harvest (shows the secret check can fail)", Set.of(), 1);
        Path unreadable = root.resolve("hostile/unreadable/no-permission.txt");
        Files.createDirectories(unreadable.getParent());
        Files.writeString(unreadable, "Permission Lantern\n\nMaterial: steel\n", StandardCharsets.UTF_8);
        Files.setPosixFilePermissions(unreadable, PosixFilePermissions.fromString("---------"));
        rootReadsEverything = canRead(unreadable);
        entries.add(rootReadsEverything
                ? new Entry(rel(unreadable), "mode 000 (this run is root, which chmod does not stop: read normally)", Set.of(), 1)
                : new Entry(rel(unreadable), "mode 000", Set.of("unreadable"), 0));
        Path loopDir = Files.createDirectories(root.resolve("hostile/loop/inner"));
        Files.createSymbolicLink(loopDir.resolve("back-up"), loopDir.getParent());
        entries.add(new Entry(rel(loopDir.resolve("back-up")), "a symbolic link to the folder above it", Set.of("unreadable"), 0));
        Path self = loopDir.getParent().resolve("self.txt");
        Files.createSymbolicLink(self, self.getFileName());
        entries.add(new Entry(rel(self), "a symbolic link to itself", Set.of("unreadable"), 0));
        Path dangling = loopDir.getParent().resolve("dangling.txt");
        Files.createSymbolicLink(dangling, Path.of("no-such-target.txt"));
        entries.add(new Entry(rel(dangling), "a symbolic link to a missing file", Set.of("unreadable"), 0));
    }

    private static boolean canRead(Path p) {
        try (InputStream in = Files.newInputStream(p)) {
            in.read();
            return true;
        } catch (IOException e) {
            return false;
        }
    }

    private String rel(Path p) {
        return root.relativize(p).toString().replace('\\', '/');
    }

    private void put(String file, byte[] bytes, String input, Set<String> kinds, int listings) throws IOException {
        Path p = root.resolve(file);
        Files.createDirectories(p.getParent());
        Files.write(p, bytes);
        entries.add(new Entry(file, input, kinds, listings));
    }

    private void putLongLine(String file) throws IOException {
        Path p = root.resolve(file);
        Files.createDirectories(p.getParent());
        byte[] chunk = "trail lantern aluminium ".repeat(1 << 12).getBytes(StandardCharsets.US_ASCII);
        try (OutputStream out = Files.newOutputStream(p)) {
            long left = LONG_LINE_BYTES;
            while (left > 0) {
                int n = (int) Math.min(chunk.length, left);
                out.write(chunk, 0, n);
                left -= n;
            }
        }
        entries.add(new Entry(file, "one 50 MB line of text, no line break", Set.of("too-large"), 1));
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private static String laughs(String rootElement, String attrs) {
        StringBuilder b = new StringBuilder("<?xml version=\"1.0\"?>\n<!DOCTYPE " + rootElement + " [\n <!ENTITY lol \"lol\">\n");
        for (int i = 1; i <= 9; i++) {
            String prev = i == 1 ? "lol" : "lol" + (i - 1);
            b.append(" <!ENTITY lol").append(i).append(" \"").append(("&" + prev + ";").repeat(10)).append("\">\n");
        }
        return b.append("]>\n<").append(rootElement).append(attrs).append(">&lol9;</").append(rootElement).append(">\n").toString();
    }

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
                AccessPermission perms = new AccessPermission();
                if (userPassword.isEmpty()) {
                    perms.setCanModify(false);
                    perms.setCanPrint(false);
                }
                StandardProtectionPolicy p = new StandardProtectionPolicy("owner-" + userPassword + "-x", userPassword, perms);
                p.setEncryptionKeyLength(128);
                doc.protect(p);
            }
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            doc.save(out);
            return out.toByteArray();
        }
    }

    /** A real DOCX (made by POI) whose word/document.xml is replaced by {@code documentXml}. */
    private static byte[] docxWithDocumentXml(byte[] documentXml) throws IOException {
        return rewriteDocx(out -> out.write(documentXml));
    }

    private interface PartWriter {
        void write(OutputStream out) throws IOException;
    }

    private static byte[] rewriteDocx(PartWriter document) throws IOException {
        byte[] base;
        try (XWPFDocument doc = new XWPFDocument()) {
            doc.createParagraph().createRun().setText("placeholder");
            ByteArrayOutputStream b = new ByteArrayOutputStream();
            doc.write(b);
            base = b.toByteArray();
        }
        ByteArrayOutputStream result = new ByteArrayOutputStream();
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(base));
             ZipOutputStream out = new ZipOutputStream(result)) {
            out.setLevel(9);
            for (ZipEntry e; (e = in.getNextEntry()) != null; ) {
                out.putNextEntry(new ZipEntry(e.getName()));
                if (e.getName().equals("word/document.xml")) {
                    document.write(out);
                } else {
                    in.transferTo(out);
                }
                out.closeEntry();
            }
        }
        return result.toByteArray();
    }

    /** 200 MB of one text run, deflated to a few hundred KB. */
    private static byte[] zipBomb() throws IOException {
        return rewriteDocx(out -> {
            out.write(utf8("<w:document xmlns:w=\"http://schemas.openxmlformats.org/wordprocessingml/2006/main\"><w:body>"
                    + "<w:p><w:r><w:t>Bomb Tent</w:t></w:r></w:p><w:p><w:r><w:t>"));
            byte[] chunk = "bomb ".repeat(200_000).getBytes(StandardCharsets.US_ASCII);
            for (int i = 0; i < 200; i++) {
                out.write(chunk);
            }
            out.write(utf8("</w:t></w:r></w:p></w:body></w:document>"));
        });
    }
}
