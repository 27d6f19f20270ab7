package dev.sheaf.samples;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.Reader;
import java.io.StringWriter;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.pdfbox.Loader;
import org.apache.poi.xwpf.usermodel.XWPFDocument;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo workspace: regenerated once through the command line into a temporary folder, compared
 * byte for byte with the committed files, and read back with PDFBox, POI, Commons CSV and Jackson.
 */
class DemoSetTest {
    /** The module folder: surefire runs tests with the module as the working directory. */
    static final Path COMMITTED = Path.of("").toAbsolutePath();

    @TempDir
    static Path tmp;

    static Path fresh;
    static Map<String, String> text;
    static JsonNode planted;
    static DemoCatalog catalog;

    @BeforeAll
    static void regenerate() throws IOException {
        fresh = tmp.resolve("demo");
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = GeneratorMain.commandLine(new PrintWriter(out), new PrintWriter(err)).execute("demo", "--out", fresh.toString());
        assertEquals(0, code, "generate demo failed: " + err);
        assertTrue(out.toString().contains("1,600 listings"), out.toString());
        text = CatalogText.read(fresh);
        planted = new ObjectMapper().readTree(fresh.resolve("planted.json").toFile());
        catalog = DemoCatalog.build(GeneratorMain.DEFAULT_SEED);
    }

    private static List<Path> files(Path root) throws IOException {
        try (Stream<Path> s = Files.walk(root)) {
            return s.filter(Files::isRegularFile).map(root::relativize).sorted().collect(Collectors.toList());
        }
    }

    @Test
    void regeneratesTheCommittedDemoByteForByte() throws IOException {
        List<Path> generated = files(fresh);
        assertTrue(generated.size() > 600, "guard: the generated set is nearly empty: " + generated.size());
        List<String> differ = new ArrayList<>();
        for (Path rel : generated) {
            Path committed = COMMITTED.resolve(rel);
            if (!Files.exists(committed) || !java.util.Arrays.equals(Files.readAllBytes(committed), Files.readAllBytes(fresh.resolve(rel)))) {
                differ.add(rel.toString());
            }
        }
        assertTrue(differ.isEmpty(), differ.size() + " committed demo files are missing or differ from the generator's output, e.g. "
                + differ.subList(0, Math.min(5, differ.size())) + "; run ./sheaf generate demo --out sample-listings --replace and commit");
        Set<Path> expected = new HashSet<>(generated);
        for (String owned : DemoWriter.OWNED_FOLDERS) {
            for (Path rel : files(COMMITTED.resolve(owned))) {
                Path full = Path.of(owned).resolve(rel);
                assertTrue(expected.contains(full), "committed file " + full + " is not produced by the generator any more; delete it");
            }
        }
    }

    @Test
    void buildingTheCatalogTwiceGivesTheSameListingsAndSheets() throws IOException {
        DemoCatalog a = catalog;
        DemoCatalog b = DemoCatalog.build(GeneratorMain.DEFAULT_SEED);
        assertEquals(a.products(), b.products());
        Product sheet = a.products(DemoCatalog.Format.DOCX).get(0);
        assertArrayEquals(DocxSheet.render(sheet), DocxSheet.render(b.products(DemoCatalog.Format.DOCX).get(0)));
        assertArrayEquals(PdfSheet.render(a.products(DemoCatalog.Format.PDF).get(0)), PdfSheet.render(b.products(DemoCatalog.Format.PDF).get(0)));
        ProductFactory other = new ProductFactory(7);
        ProductFactory same = new ProductFactory(GeneratorMain.DEFAULT_SEED);
        assertFalse(same.make(1, Draft.Detail.FULL).equals(other.make(1, Draft.Detail.FULL)), "another seed must give another catalog");
    }

    @Test
    void holdsEveryFormatInTheContractedLayout() throws IOException {
        Map<String, Integer> byExt = new HashMap<>();
        for (Path rel : files(fresh.resolve("catalog"))) {
            String n = rel.getFileName().toString();
            byExt.merge(n.substring(n.lastIndexOf('.') + 1), 1, Integer::sum);
        }
        assertTrue(byExt.getOrDefault("pdf", 0) >= 20, "PDF sheets: " + byExt);
        assertTrue(byExt.getOrDefault("docx", 0) >= 20, "DOCX sheets: " + byExt);
        assertTrue(byExt.getOrDefault("html", 0) >= 500, "HTML pages: " + byExt);
        assertTrue(byExt.getOrDefault("txt", 0) >= 10 && byExt.getOrDefault("md", 0) >= 10, "text notes: " + byExt);
        assertEquals(1, byExt.get("csv"));
        assertEquals(1, byExt.get("jsonl"));
        for (String dir : List.of("catalog/html", "catalog/pdf", "catalog/docx", "catalog/text", "catalog/feeds", "bad")) {
            assertTrue(Files.isDirectory(fresh.resolve(dir)), dir);
        }
        for (String f : List.of("workspace.json", "feedback.csv", "judgments.csv", "fernhollow-vocab-source.json", "planted.json", "README.md")) {
            assertTrue(Files.isRegularFile(fresh.resolve(f)), f);
        }
        long bytes = 0;
        for (Path rel : files(fresh)) {
            bytes += Files.size(fresh.resolve(rel));
        }
        assertTrue(bytes < 10_000_000, "the demo set must stay under ~10 MB, is " + bytes);
    }

    @Test
    void holdsAtLeast1500ListingsInAtLeastEightCategories() throws IOException {
        assertTrue(text.size() >= 1500, "listings read back: " + text.size());
        Set<String> categories = new TreeSet<>();
        try (Stream<Path> s = Files.list(fresh.resolve("catalog/html"))) {
            s.forEach(p -> categories.add(p.getFileName().toString()));
        }
        assertTrue(categories.size() >= 8, "categories: " + categories);
        assertEquals(text.size(), planted.get("catalog").get("listings").asInt());
    }

    @Test
    void csvExportHasTheContractedColumnsAndOneRowPerListing() throws IOException {
        try (Reader r = Files.newBufferedReader(fresh.resolve(DemoCatalog.CSV_PATH), StandardCharsets.UTF_8);
             CSVParser p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
            List<String> header = p.getHeaderNames();
            assertEquals(List.of("sku", "name", "category", "description", "feature_1", "feature_2", "feature_3"), header.subList(0, 7));
            assertTrue(header.size() > 20, "spec columns follow: " + header);
            List<CSVRecord> records = p.getRecords();
            assertEquals(DemoCatalog.Format.CSV.count, records.size());
            assertTrue(records.stream().anyMatch(rec -> rec.get("description").contains("\n")), "a multi-line description exercises quoting");
            for (CSVRecord rec : records) {
                for (String cell : rec) {
                    assertFalse(!cell.isEmpty() && "=+-@\t\r".indexOf(cell.charAt(0)) >= 0, "formula-like cell " + cell + " in " + rec.get("sku"));
                }
            }
        }
    }

    @Test
    void jsonlFeedFollowsTheContractedShape() throws IOException {
        ObjectMapper m = new ObjectMapper();
        List<String> lines = Files.readAllLines(fresh.resolve(DemoCatalog.JSONL_PATH), StandardCharsets.UTF_8);
        assertEquals(DemoCatalog.Format.JSONL.count, lines.size());
        for (String line : lines) {
            JsonNode n = m.readTree(line);
            List<String> names = new ArrayList<>();
            n.fieldNames().forEachRemaining(names::add);
            assertEquals(List.of("id", "category", "title", "description", "bullets", "specs"), names);
            assertTrue(n.get("id").asText().matches("FH-\\d{6}"));
            assertTrue(n.get("bullets").isArray() && n.get("specs").isObject());
        }
    }

    @Test
    void pdfSheetsOpenWithPdfBoxAndHoldTheirListing() throws IOException {
        List<Path> pdfs = files(fresh.resolve("catalog/pdf"));
        assertTrue(pdfs.size() >= 20);
        for (Path rel : pdfs) {
            Path f = fresh.resolve("catalog/pdf").resolve(rel);
            String t = CatalogText.collapse(CatalogText.textOf(f));
            String id = rel.getFileName().toString().substring(0, 9).toUpperCase(java.util.Locale.ROOT);
            assertTrue(t.contains("SKU " + id), rel + ": " + t);
            assertTrue(t.contains("Specifications") && t.contains("Description"), rel + ": " + t);
            try (var doc = Loader.loadPDF(f.toFile())) {
                assertEquals(1, doc.getNumberOfPages());
                assertNotNull(doc.getDocumentInformation().getCreationDate());
            }
        }
    }

    @Test
    void docxSheetsOpenWithPoiAndHoldTheirListing() throws IOException {
        List<Path> docs = files(fresh.resolve("catalog/docx"));
        assertTrue(docs.size() >= 20);
        int quirky = 0;
        for (Path rel : docs) {
            Path f = fresh.resolve("catalog/docx").resolve(rel);
            try (InputStream in = Files.newInputStream(f); XWPFDocument d = new XWPFDocument(in)) {
                assertEquals(1, d.getTables().size(), rel + " has its spec table");
                assertTrue(d.getTables().get(0).getNumberOfRows() >= 4);
            }
            String t = CatalogText.textOf(f);
            String id = rel.getFileName().toString().substring(0, 9).toUpperCase(java.util.Locale.ROOT);
            assertTrue(t.contains(id), rel + " names its listing");
            if (t.contains("ITEM NO.")) {
                quirky++;
                assertTrue(t.contains("WGT"), "the quirky supplier's own keys: " + t);
            }
        }
        assertEquals(DemoCatalog.QUIRKY_DOCX, quirky);
    }

    @Test
    void feedbackHasTheContractedHeaderAndSeveralShoppersPerPairOfOneCategory() throws IOException {
        Map<String, String> category = categories();
        try (Reader r = Files.newBufferedReader(fresh.resolve("feedback.csv"), StandardCharsets.UTF_8);
             CSVParser p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
            assertEquals(List.of("pair_id", "reference_id", "target_id", "annotator", "sentence"), p.getHeaderNames());
            List<CSVRecord> rows = p.getRecords();
            assertTrue(rows.size() >= 1900 && rows.size() <= 2100, "about 2,000 sentences: " + rows.size());
            Map<String, Set<String>> shoppersPerPair = new HashMap<>();
            for (CSVRecord rec : rows) {
                assertTrue(rec.get("annotator").matches("shopper-\\d{3}"), rec.get("annotator"));
                assertEquals(category.get(rec.get("reference_id")), category.get(rec.get("target_id")), "pair " + rec.get("pair_id"));
                assertFalse(rec.get("sentence").isBlank());
                assertTrue(shoppersPerPair.computeIfAbsent(rec.get("pair_id"), k -> new HashSet<>()).add(rec.get("annotator")),
                        "a shopper speaks once per pair: " + rec.get("pair_id"));
            }
            for (Map.Entry<String, Set<String>> e : shoppersPerPair.entrySet()) {
                assertTrue(e.getValue().size() >= 3 && e.getValue().size() <= 5, e.getKey() + " has " + e.getValue().size() + " shoppers");
            }
            String all = rows.stream().map(rec -> rec.get("sentence")).collect(Collectors.joining("\n"));
            for (String form : List.of("lighter", "than this one", "not as", "too ", "kind of", "slightly", "has no hood", "better", "-ish")) {
                assertTrue(all.contains(form), "feedback uses '" + form + "'");
            }
        }
    }

    private static Map<String, String> categories() {
        Map<String, String> m = new HashMap<>();
        for (Product p : catalog.products()) {
            m.put(p.id(), p.category().id);
        }
        return m;
    }

    @Test
    void judgmentsHaveTheContractedHeaderFiveRatersPerItemAndValidValues() throws IOException {
        Map<String, JsonNode> attrs = new HashMap<>();
        for (JsonNode a : planted.get("judgments").get("attributes")) {
            attrs.put(a.get("id").asText(), a);
        }
        assertTrue(attrs.size() >= 18 && attrs.size() <= 24, "about 20 attributes: " + attrs.keySet());
        try (Reader r = Files.newBufferedReader(fresh.resolve("judgments.csv"), StandardCharsets.UTF_8);
             CSVParser p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
            assertEquals(List.of("item", "annotator", "attribute", "value"), p.getHeaderNames());
            Map<String, Set<String>> raters = new HashMap<>();
            int rows = 0;
            for (CSVRecord rec : p) {
                rows++;
                raters.computeIfAbsent(rec.get("item"), k -> new HashSet<>()).add(rec.get("annotator"));
                JsonNode a = attrs.get(rec.get("attribute"));
                assertNotNull(a, "unknown attribute " + rec.get("attribute"));
                assertTrue(List.of(a.get("values").asText().split("\\|")).contains(rec.get("value"))
                        || a.get("values").asText().equals("1-5") && rec.get("value").matches("[1-5]"), rec.toString());
            }
            assertEquals(Judgments.ITEMS, raters.size());
            raters.values().forEach(s -> assertEquals(Judgments.RATERS_PER_ITEM, s.size()));
            assertEquals(planted.get("judgments").get("rows").asInt(), rows);
            assertTrue(planted.get("judgments").get("missing").asInt() > 0, "a few judgments are missing");
        }
    }

    @Test
    void everyPlantedFormOccursInTheCatalogText() {
        List<String> forms = new ArrayList<>();
        for (String section : List.of("synonymGroups", "variantGroups")) {
            for (JsonNode g : planted.get(section)) {
                g.get("members").forEach(m -> forms.add(m.get("form").asText()));
            }
        }
        planted.get("multiwordTerms").forEach(m -> forms.add(m.get("form").asText()));
        planted.get("marketingFluff").forEach(m -> forms.add(m.get("form").asText()));
        planted.get("negations").forEach(m -> forms.add(m.get("form").asText()));
        planted.get("regulatedClaims").forEach(a -> a.forEach(m -> forms.add(m.get("form").asText())));
        planted.get("ambiguities").forEach(m -> forms.add(m.get("form").asText()));
        for (JsonNode a : planted.get("abbreviations")) {
            forms.add(a.get("short").asText());
            if (a.has("spelledOutAs")) {
                forms.add(a.get("spelledOutAs").asText());
            }
        }
        planted.get("quirkySupplier").get("ownAbbreviations").forEach(a -> forms.add(a.get("short").asText()));
        for (JsonNode pc : planted.get("parentChild")) {
            forms.add(pc.get("child").asText());
            forms.add(pc.get("parent").asText());
        }
        planted.get("quantities").forEach(dim -> dim.forEach(f -> f.get("examples").forEach(e -> forms.add(e.asText()))));
        assertTrue(forms.size() > 250, "guard: planted.json lists " + forms.size() + " forms");
        String all = String.join("\n", text.values());
        List<String> absent = new ArrayList<>();
        for (String form : new TreeSet<>(forms)) {
            if (!CatalogText.word(form).matcher(all).find() && !all.contains(form)) {
                absent.add(form);
            }
        }
        assertTrue(absent.isEmpty(), "planted but not in the catalog text: " + absent);
    }

    @Test
    void misspellingsOccurInExactlyThePlantedListings() {
        JsonNode typos = planted.get("misspellings");
        assertTrue(typos.size() >= 10);
        for (JsonNode t : typos) {
            String form = t.get("form").asText();
            Set<String> expected = new TreeSet<>();
            t.get("listingIds").forEach(id -> expected.add(id.asText()));
            Set<String> found = new TreeSet<>();
            java.util.regex.Pattern p = CatalogText.word(form);
            text.forEach((id, body) -> {
                if (p.matcher(body).find()) {
                    found.add(id);
                }
            });
            assertEquals(expected, found, "listings holding '" + form + "'");
            assertEquals(t.get("listings").asInt(), found.size());
        }
    }

    @Test
    void feedbackGroundTruthMatchesTheSentences() throws IOException {
        String all;
        try (Reader r = Files.newBufferedReader(fresh.resolve("feedback.csv"), StandardCharsets.UTF_8);
             CSVParser p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
            all = p.getRecords().stream().map(rec -> rec.get("sentence")).collect(Collectors.joining("\n"));
        }
        JsonNode fb = planted.get("feedback");
        assertTrue(fb.get("misspellings").size() >= 4, "shoppers misspell");
        for (JsonNode t : fb.get("misspellings")) {
            assertTrue(CatalogText.holds(all, t.get("form").asText()), t.toString());
        }
        int grounded = 0;
        int agrees = 0;
        for (var it = fb.get("attributes").fields(); it.hasNext();) {
            JsonNode a = it.next().getValue();
            if (!a.get("kind").asText().equals("vague")) {
                grounded += a.get("mentions").asInt();
                agrees += a.get("agreesWithSpecs").asInt();
            }
        }
        double share = agrees / (double) grounded;
        assertTrue(share > 0.75 && share < 0.95, "statements mostly agree with the specs, some do not: " + share);
        for (String vague : List.of("comfortable", "cozy", "sturdy")) {
            assertTrue(fb.get("attributes").get(vague).get("mentions").asInt() > 50, vague);
        }
    }

    @Test
    void workspaceJsonNamesTheContractedSourcesAndFiles() throws IOException {
        JsonNode ws = new ObjectMapper().readTree(fresh.resolve("workspace.json").toFile());
        assertEquals("sheaf-workspace", ws.get("format").asText());
        assertEquals(1, ws.get("formatVersion").asInt());
        assertEquals("catalog", ws.get("sources").get(0).get("path").asText());
        assertEquals("sku", ws.get("sources").get(1).get("mapping").get("id").asText());
        for (String key : List.of("feedback", "judgments")) {
            assertTrue(Files.isRegularFile(fresh.resolve(ws.get(key).asText())), key);
        }
        assertTrue(Files.isRegularFile(fresh.resolve(ws.get("sources").get(1).get("path").asText())));
        assertEquals("fernhollow.vocab.json", ws.get("vocabulary").asText());
        assertEquals("out", ws.get("output").asText());
    }

    @Test
    void badFilesAreBrokenInTheDocumentedWays() throws IOException {
        Path bad = fresh.resolve("bad");
        assertEquals(0, Files.size(bad.resolve("empty.html")));
        String pdfText;
        try (var doc = Loader.loadPDF(bad.resolve("truncated.pdf").toFile())) {
            pdfText = new org.apache.pdfbox.text.PDFTextStripper().getText(doc);
        } catch (IOException e) {
            pdfText = "";
        }
        assertTrue(pdfText.isBlank(), "the truncated sheet yields no text: " + pdfText);
        assertFalse(new String(Files.readAllBytes(bad.resolve("truncated.pdf")), StandardCharsets.ISO_8859_1).contains("%%EOF"));
        assertThrows(Exception.class, () -> new XWPFDocument(Files.newInputStream(bad.resolve("not-a-zip.docx"))).close());
        byte[] latin = Files.readAllBytes(bad.resolve("latin1.txt"));
        assertThrows(CharacterCodingException.class, () -> StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(latin)));
        assertTrue(new String(latin, StandardCharsets.ISO_8859_1).contains("laine mérinos"));
        byte[] junk = Files.readAllBytes(bad.resolve("junk.html"));
        assertTrue(junk.length > 1000 && new String(junk, StandardCharsets.ISO_8859_1).indexOf('\0') >= 0);
        try (Reader r = Files.newBufferedReader(bad.resolve("broken-quote.csv"), StandardCharsets.UTF_8)) {
            assertThrows(Exception.class, () -> CSVFormat.RFC4180.builder().setHeader().get().parse(r).getRecords());
        }
        List<String> lines = Files.readAllLines(bad.resolve("broken-line.jsonl"), StandardCharsets.UTF_8);
        ObjectMapper m = new ObjectMapper();
        int ok = 0;
        for (String line : lines) {
            try {
                m.readTree(line);
                ok++;
            } catch (IOException e) {
                assertTrue(line.contains("FH-900013"), "only line 3 is broken: " + line);
            }
        }
        assertEquals(4, ok);
        assertEquals(BadFiles.EXPECTED.size(), files(bad).size());
    }
}
