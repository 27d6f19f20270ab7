package dev.sheaf.miner.label;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.SourceSpec;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.Vocabulary;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A whole run: listings in, every export out, in a fixed order. */
class LabelRunTest {
    @TempDir
    Path dir;

    private final Vocabulary vocab = LabelFixtures.vocabulary();
    private final Labeler labeler = Labeler.of(vocab, Analysis.of(AnalysisProfile.defaults()));

    static List<Listing> catalog() {
        List<Listing> ls = new ArrayList<>();
        ls.add(new Listing("FH-003", "jackets", "feed.jsonl", "line 3", List.of(Field.of(FieldKind.TITLE, "Ridgeline Shell"),
                Field.of(FieldKind.DESCRIPTION, "Ripstop nylon, no hood, not insulated. =cmd|' /C calc'!A0"),
                Field.spec("Weight", "2 lb 10 oz"))));
        ls.add(new Listing("FH-001", "footwear", "feed.jsonl", "line 1", List.of(Field.of(FieldKind.TITLE, "Scree Runner"),
                Field.of(FieldKind.BULLET, "Non-slip sole"), Field.spec("Weight", "850 g"))));
        ls.add(new Listing("FH-002", "jackets", "feed.jsonl", "line 2", List.of(Field.of(FieldKind.TITLE, "Fjell Anorak"),
                Field.of(FieldKind.BULLET, "non-slip cuffs, merino wool lining, waterproof"))));
        ls.add(new Listing("FH-010", "tents", "a-first.jsonl", "line 1", List.of(Field.of(FieldKind.TITLE, "Tarn Tent"),
                Field.of(FieldKind.DESCRIPTION, "Sturdy poles and roomy vestibule"))));
        ls.add(new Listing("FH-011", "tents", "a-first.jsonl", "line 2", List.of(Field.of(FieldKind.TITLE, "Cirque Tent"),
                Field.of(FieldKind.DESCRIPTION, "Roomy vestibule, sturdy poles"), Field.spec("Weight", "heavy"))));
        return ls;
    }

    static List<CSVRecord> csv(Path f) throws IOException {
        try (Reader r = Files.newBufferedReader(f, StandardCharsets.UTF_8)) {
            return CSVFormat.RFC4180.parse(r).getRecords();
        }
    }

    @Test
    void writesEveryExportWithRowsInSourceOrder() throws IOException {
        LabelRunSummary s = LabelRun.builder(labeler).build().run(catalog(), List.of(), dir);
        for (String f : List.of(AssignmentsJsonl.FILE_NAME, LabelRun.LABELS_CSV, LabelRun.FACET_VALUES_CSV, LabelRun.SUMMARY_CSV,
                LabelRun.SUMMARY_JSON, LabelRun.CATEGORY_ERRORS_CSV, LabelRun.PROBLEMS_CSV, LabelRun.GAP_TERMS_CSV)) {
            assertTrue(Files.isRegularFile(dir.resolve(f)), f);
        }
        try (var files = Files.list(dir)) {
            assertTrue(files.noneMatch(p -> p.getFileName().toString().endsWith(".spill")), "the spill file is removed");
        }
        assertEquals(5, s.listings());
        assertEquals(3, s.withLabels());
        assertEquals(2, s.withoutLabels());
        assertEquals(1, s.withNothing()); // FH-011 has an unreadable weight, FH-010 nothing at all
        assertEquals(1, s.invalidValues());
        assertEquals(1, s.categoryErrors());

        List<String> ids = new ArrayList<>();
        for (String line : Files.readAllLines(dir.resolve(AssignmentsJsonl.FILE_NAME), StandardCharsets.UTF_8)) {
            ids.add(new ObjectMapper().readTree(line).get("id").asText());
        }
        assertEquals(List.of("FH-010", "FH-011", "FH-003", "FH-001", "FH-002"), ids, "by source, then position in the source");
    }

    @Test
    void theMatrixHasOneColumnPerConceptAndBucketWithOneZeroMinusOne() throws IOException {
        LabelRun.builder(labeler).build().run(catalog(), List.of(), dir);
        List<CSVRecord> rows = csv(dir.resolve(LabelRun.LABELS_CSV));
        CSVRecord head = rows.get(0);
        assertEquals("id", head.get(0));
        assertEquals("category", head.get(1));
        assertEquals("source", head.get(2));
        assertEquals(List.of("id", "category", "source", "DWR [dwr]", "hood [hooded]", "insulated [insulated]", "made in USA [made-in-usa]",
                "merino wool [merino-wool]", "mesh [mesh]", "no-see-um mesh [no-see-um-mesh]", "non-slip [non-slip]",
                "nylon [nylon]", "packable [packable]", "PFC-free [pfc-free]", "removable hood [removable-hood]",
                "ripstop nylon [ripstop-nylon]", "water resistant [water-resistant]", "waterproof [waterproof]",
                "windproof [windproof]", "weight: ultralight [weight#ultralight]", "weight: light [weight#light]",
                "weight: standard [weight#standard]"), head.toList());
        assertEquals(6, rows.size());
        CSVRecord shell = rows.stream().filter(r -> r.get(0).equals("FH-003")).findFirst().orElseThrow();
        assertEquals("1", cell(head, shell, "ripstop nylon [ripstop-nylon]"));
        assertEquals("-1", cell(head, shell, "hood [hooded]"));
        assertEquals("-1", cell(head, shell, "insulated [insulated]"));
        assertEquals("0", cell(head, shell, "nylon [nylon]"));
        assertEquals("1", cell(head, shell, "weight: light [weight#light]"));
        assertEquals("0", cell(head, shell, "weight: ultralight [weight#ultralight]"));
    }

    private static String cell(CSVRecord head, CSVRecord row, String column) {
        for (int i = 0; i < head.size(); i++) {
            if (head.get(i).equals(column)) {
                return row.get(i);
            }
        }
        throw new AssertionError("no column " + column + " in " + head);
    }

    @Test
    void facetValuesJoinValuesAndKeepNumbersAsNumbers() throws IOException {
        LabelRun.builder(labeler).build().run(catalog(), List.of(), dir);
        List<CSVRecord> rows = csv(dir.resolve(LabelRun.FACET_VALUES_CSV));
        CSVRecord head = rows.get(0);
        CSVRecord anorak = rows.stream().filter(r -> r.get(0).equals("FH-002")).findFirst().orElseThrow();
        assertEquals("merino wool", cell(head, anorak, "material [material]"));
        assertEquals("non-slip", cell(head, anorak, "sole grip [sole-grip]"));
        CSVRecord boot = rows.stream().filter(r -> r.get(0).equals("FH-001")).findFirst().orElseThrow();
        assertEquals("0.85", cell(head, boot, "weight (kg) [weight]"));
    }

    @Test
    void spreadsheetFormulasInListingTextAreNeutralised() throws IOException {
        Listing l = new Listing("=HYPERLINK(\"x\")", "-jackets", "feed.jsonl", "line 9",
                List.of(Field.of(FieldKind.DESCRIPTION, "merino wool")));
        LabelRun.builder(labeler).build().run(List.of(l), List.of(), dir);
        List<CSVRecord> rows = csv(dir.resolve(LabelRun.LABELS_CSV));
        assertEquals("'=HYPERLINK(\"x\")", rows.get(1).get(0));
        assertEquals("'-jackets", rows.get(1).get(1));
    }

    @Test
    void theSummaryCountsPositivesNegationsAndImbalance() throws IOException {
        LabelRun.builder(labeler).build().run(catalog(), List.of(), dir);
        List<CSVRecord> rows = csv(dir.resolve(LabelRun.SUMMARY_CSV));
        assertEquals(LabelExports.SUMMARY_HEADER, rows.get(0).toList());
        CSVRecord hood = rows.stream().filter(r -> r.get(0).equals("hooded")).findFirst().orElseThrow();
        assertEquals("0", hood.get(4));
        assertEquals("1", hood.get(5));
        assertEquals("4", hood.get(6));
        assertEquals("", hood.get(8), "no positives: the imbalance ratio is undefined");
        assertEquals("2", hood.get(9), "hood applies to the two jackets only");
        CSVRecord nonSlip = rows.stream().filter(r -> r.get(0).equals("non-slip")).findFirst().orElseThrow();
        assertEquals("2", nonSlip.get(4));
        assertEquals("0.4", nonSlip.get(7));
        assertEquals("1.5", nonSlip.get(8), "3 without / 2 with");
        JsonNode json = new ObjectMapper().readTree(dir.resolve(LabelRun.SUMMARY_JSON).toFile());
        assertEquals(5, json.get("listings").asInt());
        assertEquals(2, json.get("listingsWithoutLabels").asInt());
        assertTrue(json.get("columns").get(0).has("imbalanceRatio"));
    }

    @Test
    void categoryErrorsAreListed() throws IOException {
        LabelRun.builder(labeler).build().run(catalog(), List.of(), dir);
        List<CSVRecord> rows = csv(dir.resolve(LabelRun.CATEGORY_ERRORS_CSV));
        assertEquals(2, rows.size());
        assertEquals(List.of("FH-002", "jackets", "feed.jsonl", "non-slip", "non-slip", "sole-grip", "footwear", "stated",
                "bullet", "non-slip"), rows.get(1).toList());
    }

    @Test
    void termsOfUnlabeledListingsAreCounted() throws IOException {
        LabelRun.builder(labeler).build().run(catalog(), List.of(), dir);
        List<CSVRecord> rows = csv(dir.resolve(LabelRun.GAP_TERMS_CSV));
        assertEquals(GapTerms.HEADER, rows.get(0).toList());
        // only FH-010 has nothing at all: "sturdy poles" is one of its bigrams, "and" is a stop word
        assertTrue(rows.stream().anyMatch(r -> r.get(0).equals("2") && r.get(1).equals("sturdy poles") && r.get(2).equals("1")));
        assertTrue(rows.stream().noneMatch(r -> r.get(1).contains("and")));
        assertTrue(rows.stream().noneMatch(r -> r.get(1).equals("cirque")), "FH-011 has an unreadable value, so it is not empty");
    }

    @Test
    void theJsonLinesReadBackAsTheSameAssignments() throws IOException {
        LabelRun.builder(labeler).build().run(catalog(), List.of(), dir);
        List<Assignments> back = new ArrayList<>();
        AssignmentsJsonl.ReadSummary rs = AssignmentsJsonl.read(dir.resolve(AssignmentsJsonl.FILE_NAME), vocab, back::add);
        assertEquals(5, rs.listings());
        assertTrue(rs.problems().isEmpty(), rs.problems().toString());
        for (Assignments a : back) {
            Listing l = catalog().stream().filter(x -> x.id().equals(a.listingId())).findFirst().orElseThrow();
            assertEquals(labeler.label(l), a);
        }
    }

    @Test
    void readsFromIngestOnEveryThreadAndSplits() throws IOException {
        StringBuilder feed = new StringBuilder();
        for (int i = 0; i < 400; i++) {
            String d = switch (i % 4) {
                case 0 -> "Ripstop nylon shell, no hood";
                case 1 -> "Merino wool layer. Weighs 300 g";
                case 2 -> "Waterproof, windproof and packable";
                default -> "Plain text about nothing";
            };
            feed.append(String.format("{\"id\":\"FH-%04d\",\"category\":\"jackets\",\"title\":\"Item %d\",\"description\":\"%s\"}%n",
                    i, i, d));
        }
        Path src = dir.resolve("in/feed.jsonl");
        Files.createDirectories(src.getParent());
        Files.writeString(src, feed, StandardCharsets.UTF_8);
        Path out = dir.resolve("out");
        LabelRunSummary s = LabelRun.builder(labeler).source(SourceSpec.of(src)).workspaceRoot(dir).threads(3)
                .split(StratifiedSplit.parseProportions("80/10/10"), 42).build().run(out);
        assertEquals(400, s.listings());
        assertEquals(List.of(320, 40, 40), List.copyOf(s.splitSizes().values()));
        List<CSVRecord> split = csv(out.resolve(LabelRun.SPLIT_CSV));
        assertEquals(401, split.size());
        List<CSVRecord> summary = csv(out.resolve(LabelRun.SPLIT_SUMMARY_CSV));
        CSVRecord wool = summary.stream().filter(r -> r.get(0).equals("merino-wool")).findFirst().orElseThrow();
        assertEquals(List.of("100", "80", "10", "10"), List.of(wool.get(2), wool.get(3), wool.get(5), wool.get(7)));
        List<String> lines = Files.readAllLines(out.resolve(AssignmentsJsonl.FILE_NAME));
        assertEquals(400, lines.size());
        assertTrue(lines.get(0).contains("\"id\":\"FH-0000\"") && lines.get(399).contains("\"id\":\"FH-0399\""),
                "file order survives parallel labeling");
        assertFalse(lines.get(0).contains("\"source\":\"/"), "sources are shown relative to the workspace root");
    }
}
