package dev.sheaf.miner.ingest;

import static dev.sheaf.miner.ingest.Fixtures.fixture;
import static dev.sheaf.miner.ingest.Fixtures.read;
import static dev.sheaf.miner.ingest.Fixtures.spec;
import static dev.sheaf.miner.ingest.Fixtures.specKeys;
import static dev.sheaf.miner.ingest.Fixtures.texts;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** What each reader makes of its fixture: fields, spec keys and values, ids, categories, positions. */
class ReadersTest {

    @ParameterizedTest
    @ValueSource(strings = {"html", "csv", "tsv", "json", "jsonl", "text", "markdown", "rtf", "encoding"})
    void everyFixtureFolderHoldsFiles(String folder) throws IOException {
        try (Stream<Path> s = Files.list(fixture(folder))) {
            assertTrue(s.anyMatch(p -> Files.isRegularFile(p)), "fixture folder ingest/" + folder + " is empty");
        }
    }

    @Test
    void htmlPageGivesTitleIdCategoryBulletsAndSpecsFromEveryTableShape() {
        Listing l = read(fixture("html/ridgeline-2p-tent.html")).only();
        assertEquals("FH-T-0042", l.id());
        assertEquals("Tents", l.category(), "category from the breadcrumb's last link");
        assertEquals("Ridgeline 2P Tent", l.title(), "og:title");
        assertEquals(List.of("A two-person backpacking tent with two doors and a full-coverage fly."), texts(l, FieldKind.DESCRIPTION));
        assertEquals(List.of("Features", "Specifications"), texts(l, FieldKind.HEADING), "the h1 used as title is not repeated");
        assertEquals(List.of("Two doors and two vestibules", "Colour-coded clips for quick pitching"), texts(l, FieldKind.BULLET));
        assertEquals("30D ripstop nylon", spec(l, "Floor"), "Key: value list item");
        assertEquals("1.9 kg", spec(l, "Packed weight"), "th/td row");
        assertEquals("105 cm", spec(l, "Peak height"), "td/td row");
        assertEquals("Aluminium, 8.7 mm", spec(l, "Poles"), "dt/dd, trailing colon dropped");
        assertEquals("2 people", spec(l, "Capacity"));
        assertEquals("3", spec(l, "Seasons"), "Key: value line in a paragraph, split at <br>");
        assertEquals("20D silicone-coated nylon", spec(l, "Fly fabric"));
        assertEquals(List.of("Pitch it fast in wind and rain."), texts(l, FieldKind.TEXT));
        String all = l.fields().toString();
        assertFalse(all.contains("99 kg"), "script ignored");
        assertFalse(all.contains("font-family"), "style ignored");
        assertFalse(all.contains("menu") || all.contains("Sleeping bags"), "nav ignored");
        assertFalse(all.contains("Returns"), "footer ignored");
        assertEquals("ridgeline-2p-tent.html", l.source().substring(l.source().lastIndexOf('/') + 1));
    }

    @Test
    void htmlHeaderRowOverOneValueRowIsASpecTableAndDataSkuIsTheId() {
        Listing l = read(fixture("html/sideways-table.html")).only();
        assertEquals("FH-S-0007", l.id());
        assertEquals("Emberline Stove", l.title(), "h1 when there is no og:title");
        assertEquals(List.of("Fuel", "Burn time", "Weight"), specKeys(l));
        assertEquals("60 min", spec(l, "Burn time"));
        assertEquals(List.of("Boils a litre in 4 minutes."), texts(l, FieldKind.TEXT));
        assertEquals("", l.category());
    }

    @Test
    void csvRowsMapByDetectedColumnsAndARaggedRowIsAPositionedProblem() {
        Fixtures.Result r = read(fixture("csv/catalog-export.csv"));
        assertEquals(List.of("FH-B-001", "FH-B-002", "FH-B-004"), r.ids(), "the ragged row is skipped, later rows still read");
        Listing l = r.byId("FH-B-001");
        assertEquals("packs", l.category());
        assertEquals("row 2", l.locator(), "the header is row 1");
        assertEquals("Alder 40L Pack", l.title());
        assertEquals(List.of("A 40-litre pack for long weekends, with a \"floating\" lid."), texts(l, FieldKind.DESCRIPTION));
        assertEquals(List.of("Padded hip belt", "Rain cover"), texts(l, FieldKind.BULLET));
        assertEquals(List.of("Weight", "Colour"), specKeys(l), "every unmapped column is a spec");
        assertEquals("1.4 kg", spec(l, "Weight"));
        assertEquals(List.of("Mesh back panel"), texts(r.byId("FH-B-002"), FieldKind.BULLET), "empty cells give no field");
        Problem p = r.problems().get(0);
        assertEquals(1, r.problems().size(), r.problems().toString());
        assertEquals("row 4", p.position());
        assertEquals("parse", p.kind());
        assertTrue(p.reason().contains("expected 8 cells") && p.reason().contains("found 3"), p.reason());
    }

    @Test
    void tsvIsSniffedAndADuplicateHeaderIsRenamedAndReported() {
        Fixtures.Result r = read(fixture("tsv/stoves.tsv"));
        assertEquals(List.of("FH-S-010", "FH-S-011"), r.ids());
        Listing l = r.byId("FH-S-010");
        assertEquals("Emberline Stove", l.title());
        assertEquals("85 g", spec(l, "Weight"));
        assertEquals("3 oz", spec(l, "Weight (2)"));
        assertEquals(1, r.problems().size());
        assertEquals("row 1", r.problems().get(0).position());
        assertTrue(r.problems().get(0).reason().contains("'Weight' twice"), r.problems().get(0).reason());
    }

    @Test
    void csvWithAnUnbalancedQuoteKeepsEveryOtherRow(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("broken.csv");
        Files.writeString(f, "id,title,Weight\nA1,First,1 kg\nA2,\"Second,2 kg\nA3,Third,3 kg\nA4,Fourth,4 kg\n",
                java.nio.charset.StandardCharsets.UTF_8);
        Fixtures.Result r = read(f);
        assertEquals(List.of("A1", "A3", "A4"), r.ids(), r.problems().toString());
        assertEquals("row 3", r.problems().get(0).position());
        assertEquals("parse", r.problems().get(0).kind());
        assertEquals("row 4", r.byId("A3").locator());
    }

    @Test
    void csvSemicolonDelimiterAndAGivenMappingWithSpecPairsInACell(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("export.csv");
        Files.writeString(f, "Art;Bez;Eigenschaften;Preis\nX1;Fell Gaiters;Height: 38 cm | Closure: hook;39\n",
                java.nio.charset.StandardCharsets.UTF_8);
        ColumnMapping m = new ColumnMapping("Art", "Bez", null, null, List.of(), List.of("Eigenschaften"), List.of());
        Listing l = read(Ingest.builder().source(SourceSpec.of(f).withMapping(m))).only();
        assertEquals("X1", l.id());
        assertEquals("Fell Gaiters", l.title());
        assertEquals(List.of("Height", "Closure"), specKeys(l), "only the listed spec column; Preis is not mapped");
        assertEquals("hook", spec(l, "Closure"));
    }

    @Test
    void jsonObjectWithAProductsArrayReadsSpecPairsAndSpecObjects() {
        Fixtures.Result r = read(fixture("json/products.json"));
        assertEquals(List.of("FH-J-100", "FH-J-101"), r.ids());
        Listing a = r.byId("FH-J-100");
        assertEquals("jackets", a.category(), "the most specific element of a category path");
        assertEquals("Skerry Rain Jacket", a.title());
        assertEquals(List.of("Pit zips", "Helmet-compatible hood"), texts(a, FieldKind.BULLET));
        assertEquals("310 g", spec(a, "Weight"));
        assertEquals("fully taped", spec(a, "Seam sealing"));
        assertEquals("line 4", a.locator());
        Listing b = r.byId("FH-J-101");
        assertEquals("800-fill down", spec(b, "Fill"));
        assertEquals("365", spec(b, "Weight"), "numbers become their text");
        assertTrue(r.problems().isEmpty(), r.problems().toString());
    }

    @Test
    void jsonLinesSkipABrokenLineAndReadTheRest() {
        Fixtures.Result r = read(fixture("jsonl/feed.jsonl"));
        assertEquals(List.of("FH-000001", "FH-000002", "FH-000004"), r.ids());
        assertEquals(1, r.problems().size());
        assertEquals("line 3", r.problems().get(0).position());
        assertEquals("parse", r.problems().get(0).kind());
        Listing l = r.byId("FH-000002");
        assertEquals("line 2", l.locator());
        assertEquals("-5 °C", spec(l, "Comfort"));
        assertEquals("isobutane", spec(r.byId("FH-000004"), "Fuel"), "specs as [{key, value}]");
    }

    /**
     * UTF-8 JSON Lines are parsed from bytes, other encodings from decoded text: the same lines
     * must give the same listings and the same problems either way, including a line longer than the
     * read buffer, CRLF ends, blank lines of Unicode spaces, a broken line and an undecodable byte.
     */
    @Test
    void jsonLinesReadTheSameFromBytesAsFromText(@TempDir Path dir) throws IOException {
        StringBuilder long1 = new StringBuilder();
        for (int i = 0; i < 12000; i++) { // 84 kB: longer than the 64 kB read buffer
            long1.append("Wärme ");
        }
        String[] lines = {
            "{\"id\":\"A1\",\"title\":\"Fjell Tent – 2P\",\"specs\":{\"Weight\":\"1.2 kg\"}}",
            "\u2003\u2002 ",
            "{\"id\":\"A2\",\"title\":\"Long\",\"description\":\"" + long1 + "\"}",
            "{\"id\":\"A3\",\"title\": broken",
            "",
            "[1, 2]",
            "{\"id\":\"A4\",\"title\":\"Ørsted Mug 🏕\",\"bullets\":[\"350 ml\",\"Ti\"]}",
        };
        String text = String.join("\r\n", lines) + "\n";
        Path utf8 = Files.writeString(dir.resolve("utf8.jsonl"), text, java.nio.charset.StandardCharsets.UTF_8);
        java.io.ByteArrayOutputStream b16 = new java.io.ByteArrayOutputStream();
        b16.write(0xFF);
        b16.write(0xFE);
        b16.write(text.getBytes(java.nio.charset.StandardCharsets.UTF_16LE));
        Path utf16 = Files.write(dir.resolve("utf16.jsonl"), b16.toByteArray());
        Fixtures.Result bytes = read(utf8);
        Fixtures.Result chars = read(utf16);
        assertEquals(List.of("A1", "A2", "A4"), bytes.ids().stream().sorted().toList());
        assertEquals(chars.ids().stream().sorted().toList(), bytes.ids().stream().sorted().toList());
        for (String id : List.of("A1", "A2", "A4")) {
            assertEquals(chars.byId(id).fields(), bytes.byId(id).fields(), id);
            assertEquals(chars.byId(id).locator(), bytes.byId(id).locator(), id);
        }
        assertEquals(List.of("line 4", "line 6"), bytes.problems().stream().map(Problem::position).sorted().toList());
        assertEquals(chars.problems().stream().map(p -> p.position() + " " + p.kind()).sorted().toList(),
                bytes.problems().stream().map(p -> p.position() + " " + p.kind()).sorted().toList());
        assertEquals("line 7", bytes.byId("A4").locator());
        assertEquals(12000 * 6 - 1, texts(bytes.byId("A2"), FieldKind.DESCRIPTION).get(0).length());
    }

    @Test
    void jsonMappingReachesNestedMembersByDottedPath(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("nested.jsonl");
        Files.writeString(f, "{\"ref\":{\"code\":\"N1\"},\"label\":\"Moor Hat\",\"attributes\":{\"weight\":\"80 g\",\"brim\":\"wide\"}}\n",
                java.nio.charset.StandardCharsets.UTF_8);
        ColumnMapping m = new ColumnMapping("ref.code", "label", null, null, List.of(), List.of("attributes.weight"), List.of());
        Listing l = read(Ingest.builder().source(SourceSpec.of(f).withMapping(m))).only();
        assertEquals("N1", l.id());
        assertEquals(List.of("weight"), specKeys(l));
        assertEquals("80 g", spec(l, "weight"));
    }

    @Test
    void plainTextGivesTitleSpecsBulletsAndIdFromSkuLine() {
        Listing l = read(fixture("text/trail-mug.txt")).only();
        assertEquals("FH-M-020", l.id());
        assertEquals("cookware", l.category());
        assertEquals("Cairn Titanium Mug", l.title());
        assertEquals(List.of("Capacity", "Weight"), specKeys(l));
        assertEquals("68 g", spec(l, "Weight"));
        assertEquals(List.of("Laser-etched volume marks", "Fits a 100 g canister"), texts(l, FieldKind.BULLET));
        assertEquals(List.of("A 450 ml mug that nests over a small gas canister. Folding handles stay cool."), texts(l, FieldKind.TEXT));
    }

    @Test
    void markdownTitleIsTheFirstHashHeadingAndEmphasisIsDropped() {
        Listing l = read(fixture("markdown/daypack.md")).only();
        assertEquals("daypack", l.id(), "no SKU line: the file name");
        assertEquals("Lark 18L Daypack", l.title());
        assertEquals(List.of("Details"), texts(l, FieldKind.HEADING));
        assertEquals("18 L", spec(l, "Volume"));
        assertEquals("one size", spec(l, "Back length"));
        assertEquals(List.of("Stretch side pockets", "Hydration sleeve"), texts(l, FieldKind.BULLET));
    }

    @Test
    void markdownPipeTablesAreSpecTablesWithTheirValuesAndOffsetsAsWritten(@TempDir Path dir) throws IOException {
        String md = String.join("\n",
                "# Tarn 2P Tent",                        // line 1
                "",
                "A light tent.",                          // 3
                "",
                "| Spec | Value |",                        // 5
                "|:-----|------:|",
                "| SKU | FH-T-900 |",
                "| Weight | 1.2 kg |",                     // 8
                "| **Packed size** | 45 x 15 cm |",
                "| Fly \\| floor | 20D \\| 30D nylon |",   // 10: an escaped pipe is text, and no key holds one
                "| Poles | DAC | 8.7 mm |",               // 11: three cells under two
                "",
                "Floor area | Peak height | Doors",         // 13: outer pipes are optional
                "--- | :---: | ---",
                "2.9 m² | 105 cm | 2",                    // 15: one row under a header of three: sideways
                "after the table");
        Path f = dir.resolve("tarn.md");
        Files.writeString(f, md, java.nio.charset.StandardCharsets.UTF_8);
        Fixtures.Result r = read(f);
        Listing l = r.only();
        assertEquals("FH-T-900", l.id(), "an identifier row names the listing and is no spec");
        assertEquals("Tarn 2P Tent", l.title());
        assertEquals(List.of("Weight", "Packed size", "Poles", "Floor area", "Peak height", "Doors"), specKeys(l));
        assertEquals("1.2 kg", spec(l, "Weight"));
        assertEquals("45 x 15 cm", spec(l, "Packed size"), "emphasis dropped");
        assertEquals("DAC, 8.7 mm", spec(l, "Poles"), "the cells after the key, as HTML rows with several values");
        assertEquals("2.9 m²", spec(l, "Floor area"));
        assertEquals("105 cm", spec(l, "Peak height"));
        assertEquals("2", spec(l, "Doors"));
        assertEquals(List.of("Spec | Value"), texts(l, FieldKind.HEADING), "the header row of a key/value table");
        assertEquals(List.of("A light tent.", "Fly | floor | 20D | 30D nylon", "after the table"), texts(l, FieldKind.TEXT));
        assertEquals(1, r.problems().size(), r.problems().toString());
        assertEquals("line 11", r.problems().get(0).position());
        assertEquals("parse", r.problems().get(0).kind());
        assertTrue(r.problems().get(0).reason().contains("3 cells under a header of 2"), r.problems().get(0).reason());

        // offsets of what the labeler finds are into the cell text as read: the value, the key, the row's text
        dev.sheaf.vocab.Vocabulary v = dev.sheaf.vocab.Vocabulary.of(dev.sheaf.vocab.SchemeInfo.of("t", "t"), List.of(
                dev.sheaf.vocab.Concept.builder("weight").prefLabel("weight")
                        .facet(dev.sheaf.vocab.FacetProperties.number("kg", List.of())).build(),
                dev.sheaf.vocab.Concept.builder("nylon").prefLabel("nylon").build(),
                dev.sheaf.vocab.Concept.builder("packed-size").prefLabel("packed size").build()), List.of(), List.of());
        dev.sheaf.miner.label.Assignments a = dev.sheaf.miner.label.Labeler.of(v,
                dev.sheaf.miner.text.Analysis.of(dev.sheaf.miner.text.AnalysisProfile.defaults())).label(l);
        java.util.Map<String, dev.sheaf.miner.label.Evidence> ev = new java.util.TreeMap<>();
        a.assignments().forEach(x -> ev.put(x.conceptId(), x.evidence().get(0)));
        assertEquals(List.of("nylon", "packed-size", "weight"), List.copyOf(ev.keySet()), a.toString());
        assertEquals(List.of(dev.sheaf.miner.text.SegmentPart.SPEC_VALUE, 0, 6, "1.2 kg"),
                List.of(ev.get("weight").part(), ev.get("weight").start(), ev.get("weight").end(), ev.get("weight").text()));
        assertEquals(List.of(dev.sheaf.miner.text.SegmentPart.SPEC_KEY, 0, 11, "Packed size"),
                List.of(ev.get("packed-size").part(), ev.get("packed-size").start(), ev.get("packed-size").end(), ev.get("packed-size").text()));
        assertEquals(List.of(dev.sheaf.miner.text.SegmentPart.TEXT, 24, 29, "nylon"),
                List.of(ev.get("nylon").part(), ev.get("nylon").start(), ev.get("nylon").end(), ev.get("nylon").text()));
    }

    @Test
    void aMarkdownTableWhoseDelimiterRowDoesNotFitItsHeaderIsTextWithAProblem(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("broken.md");
        Files.writeString(f, "# Cairn Stove\n\n| Output | 3,100 W |\n|---|---|---|\n| Fuel | isobutane |\n\nSimmer control.\n",
                java.nio.charset.StandardCharsets.UTF_8);
        Fixtures.Result r = read(f);
        Listing l = r.only();
        assertEquals("Cairn Stove", l.title(), "the batch goes on: the listing is read");
        assertEquals(List.of(), specKeys(l), "no table, so no spec rows");
        assertEquals(List.of("| Output | 3,100 W |", "| Fuel | isobutane |", "Simmer control."), texts(l, FieldKind.TEXT),
                "as before tables were read: the delimiter row parts paragraphs");
        assertEquals(1, r.problems().size(), r.problems().toString());
        assertEquals("line 4", r.problems().get(0).position());
        assertEquals("parse", r.problems().get(0).kind());
        assertTrue(r.problems().get(0).reason().contains("delimiter row has 3 cells but its header row 2"), r.problems().get(0).reason());
        assertTrue(r.problems().get(0).source().endsWith("broken.md"), r.problems().get(0).source());

        // a line with a pipe but no delimiter row under it is no table at all, and no problem
        Files.writeString(f, "# Cairn Stove\n\nFuel | isobutane\nOutput: 3,100 W\n", java.nio.charset.StandardCharsets.UTF_8);
        Fixtures.Result plain = read(f);
        assertEquals(List.of(), plain.problems());
        assertEquals(List.of("Output"), specKeys(plain.only()));
    }

    @Test
    void rtfIsReadThroughTikaWithItsCodePage() {
        Listing l = read(fixture("rtf/wool-socks.rtf")).only();
        assertEquals("Wool Hiking Socks", l.title());
        assertEquals("merino wool", spec(l, "Material"));
        assertEquals("M", spec(l, "Größe"));
    }

    @Test
    void pdfTextBecomesTitleAndSpecs(@TempDir Path dir) throws IOException {
        Path f = Fixtures.write(dir, "lantern.pdf", Fixtures.pdf(List.of("Glimmer Camp Lantern", "SKU: FH-L-003",
                "Brightness: 300 lumens", "Run time: 12 h", "A warm light for the tent."), null));
        Listing l = read(f).only();
        assertEquals("FH-L-003", l.id());
        assertEquals("Glimmer Camp Lantern", l.title());
        assertEquals("300 lumens", spec(l, "Brightness"));
        assertEquals("12 h", spec(l, "Run time"));
    }

    @Test
    void docxParagraphsAndTableRowsBecomeTitleAndSpecs(@TempDir Path dir) throws IOException {
        Path f = Fixtures.write(dir, "sheet.docx", Fixtures.docx("Scree Trekking Poles",
                List.of("Adjustable poles for steep ground.", "Locking: lever"), List.of(new String[] {"Weight", "480 g"},
                        new String[] {"Length", "65-135 cm"})));
        Listing l = read(f).only();
        assertEquals("Scree Trekking Poles", l.title());
        assertEquals("lever", spec(l, "Locking"));
        assertEquals("480 g", spec(l, "Weight"), "a two-cell table row is a spec");
        assertEquals("65-135 cm", spec(l, "Length"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"utf8.txt", "utf8-bom.txt", "utf16le-bom.txt", "windows-1252.txt"})
    void everyEncodingOfTheSameTextReadsTheSame(String name) {
        Fixtures.Result r = read(fixture("encoding/" + name));
        Listing l = r.only();
        assertEquals("Lövberg Ängsmark Parka", l.title());
        assertTrue(spec(l, "Material").startsWith("Baumwolle, Größe: L"), spec(l, "Material"));
        assertEquals(List.of("Warm für Außeneinsätze"), texts(l, FieldKind.BULLET));
        assertTrue(r.problems().isEmpty(), r.problems().toString());
        if (name.equals("windows-1252.txt")) {
            assertEquals("Baumwolle, Größe: L – €", spec(l, "Material"), "windows-1252 punctuation and euro sign");
        }
    }

    @Test
    void latin1CsvReadsAsLatin1() {
        Fixtures.Result r = read(fixture("encoding/latin1.csv"));
        assertEquals("Größe Parka", r.byId("FH-E-1").title());
        assertEquals("Baumwolle für Außen", spec(r.byId("FH-E-1"), "Material"));
        assertEquals("Ängsmark Vest", r.byId("FH-E-2").title());
        assertTrue(r.problems().isEmpty(), r.problems().toString());
    }

    @Test
    void htmlVisibleSkuLineIsTheIdWhenNoTagNamesOneAndNoIdentifierIsASpec(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("fh-000104-tarn-bivy.html");
        Files.writeString(f, """
                <html><head><title>Tarn Bivy</title></head><body>
                <h1>Tarn Bivy</h1>
                <p class="sku">SKU FH-000104 &middot; Supplier: Northwind Outfitters</p>
                <p>A one-person shelter.</p>
                <table><tr><th>Weight</th><td>480 g</td></tr><tr><th>Model no.</th><td>NW-88</td></tr></table>
                </body></html>
                """, java.nio.charset.StandardCharsets.UTF_8);
        Listing l = read(f).only();
        assertEquals("FH-000104", l.id(), "the visible SKU line, not the file name");
        assertEquals(List.of("Weight"), specKeys(l), "SKU, supplier and model number are not specs");
        assertEquals(List.of("A one-person shelter."), texts(l, FieldKind.TEXT));
    }

    @Test
    void htmlTagIdWinsOverTheVisibleLineAndALateSkuIsNotTheId(@TempDir Path dir) throws IOException {
        Path tagged = dir.resolve("a.html");
        Files.writeString(tagged, "<html><body><article data-sku=\"FH-1\"><h1>Pack</h1><p>SKU FH-2 &middot; Supplier: X</p>"
                + "<p>Roomy.</p></article></body></html>", java.nio.charset.StandardCharsets.UTF_8);
        assertEquals("FH-1", read(tagged).only().id());
        StringBuilder late = new StringBuilder("<html><body><h1>Pack</h1><ul>");
        for (int i = 0; i < SpecLines.ID_LINES + 1; i++) {
            late.append("<li>Feature ").append(i).append("</li>");
        }
        late.append("</ul><p>Spare buckle: SKU FH-9</p></body></html>");
        Path f = dir.resolve("fh-000007-pack.html");
        Files.writeString(f, late.toString(), java.nio.charset.StandardCharsets.UTF_8);
        assertEquals("fh-000007-pack", read(f).only().id(), "a SKU far down the page is another product's: the file name");
    }

    @Test
    void pdfSkuAndCategoryLineGivesIdAndCategory(@TempDir Path dir) throws IOException {
        Path f = Fixtures.write(dir, "fh-000201-spec-sheet.pdf", Fixtures.pdf(List.of("Northwind  \u00b7  Product specification sheet",
                "Tarn Bivy", "SKU FH-000201  \u00b7  Category: Shelters", "Weight: 480 g"), null));
        Listing l = read(f).only();
        assertEquals("FH-000201", l.id());
        assertEquals("Shelters", l.category());
        assertEquals(List.of("Weight"), specKeys(l));
    }

    @Test
    void docxItemNumberLineGivesIdAndCategoryWithOrWithoutColons(@TempDir Path dir) throws IOException {
        Path f = Fixtures.write(dir, "fh-001010-pack.docx", Fixtures.docx("Alder 40 Pack",
                List.of("Item no.: FH-001010    Category: Backpacks", "A pack for long weekends."), List.<String[]>of(new String[] {"Weight", "1.4 kg"})));
        Listing l = read(f).only();
        assertEquals("FH-001010", l.id(), "not 'FH-001010    Category: Backpacks'");
        assertEquals("Backpacks", l.category());
        assertEquals(List.of("Weight"), specKeys(l));
        Path q = Fixtures.write(dir, "fh-000358-pack.docx", Fixtures.docx("Skelda Pack",
                List.of("ITEM NO. FH-000358    CAT. Backpacks", "Roomy."), List.<String[]>of(new String[] {"Weight", "1.1 kg"})));
        Listing k = read(q).only();
        assertEquals("FH-000358", k.id(), "not the file name");
        assertEquals("Backpacks", k.category());
        assertEquals(List.of("Weight"), specKeys(k));
    }
}
