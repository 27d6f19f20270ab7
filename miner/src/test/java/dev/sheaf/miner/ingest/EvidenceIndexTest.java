package dev.sheaf.miner.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.text.EvidenceLine;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import org.apache.lucene.analysis.en.EnglishAnalyzer;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The evidence index: keyword-in-context lines with exact offsets, counts, ids, and a safe swap. */
class EvidenceIndexTest {
    private static final List<Listing> LISTINGS = List.of(
            new Listing("FH-2", "tents", "html/b.html", "", List.of(
                    Field.of(FieldKind.TITLE, "Ridgeline Two-Way Zipper Tent"),
                    Field.of(FieldKind.DESCRIPTION, "Doors with a two-way zipper open from the top. The TWO-WAY ZIPPER never snags."),
                    Field.spec("Zipper", "two-way, YKK-free coil"))),
            new Listing("FH-1", "packs", "feeds/x.csv", "row 2", List.of(
                    Field.of(FieldKind.TITLE, "Alder Pack"),
                    Field.of(FieldKind.BULLET, "Lid pocket with a two-way zipper"))),
            new Listing("FH-3", "packs", "feeds/x.csv", "row 3", List.of(
                    Field.of(FieldKind.TITLE, "Tarn Bottle"),
                    Field.of(FieldKind.BULLET, "Two lids; one way to drink"))));

    private static Map<String, Listing> byId() {
        return LISTINGS.stream().collect(Collectors.toMap(Listing::id, l -> l));
    }

    private static void build(Path dir, List<Listing> listings) throws IOException {
        try (EvidenceIndex.Writer w = EvidenceIndex.writer(dir, new StandardAnalyzer())) {
            listings.forEach(w);
            w.commit();
        }
    }

    @Test
    void givesBackAListingAsIndexed(@TempDir Path dir) throws IOException {
        build(dir, LISTINGS);
        try (EvidenceIndex ix = EvidenceIndex.open(dir, new StandardAnalyzer())) {
            for (Listing l : LISTINGS) {
                assertEquals(java.util.Optional.of(l), ix.listing(l.id()), "fields, kinds, keys and order as indexed");
            }
            assertEquals(java.util.Optional.empty(), ix.listing("FH-404"));
        }
    }

    @Test
    void evidenceLinesPointAtTheExactSourceText(@TempDir Path dir) throws IOException {
        build(dir, LISTINGS);
        try (EvidenceIndex ix = EvidenceIndex.open(dir, new StandardAnalyzer())) {
            List<EvidenceLine> lines = ix.lines("two-way zipper", 10);
            assertEquals(List.of("FH-1", "FH-2", "FH-2", "FH-2"), lines.stream().map(EvidenceLine::listingId).toList(),
                    "ordered by listing id, then field, then offset; 'one way' is not a match");
            Map<String, Listing> byId = byId();
            for (EvidenceLine e : lines) {
                Listing l = byId.get(e.listingId());
                Field f = l.fields().stream().filter(x -> x.kind().label().equals(e.field()) && x.key().equals(e.key()))
                        .findFirst().orElseThrow();
                assertEquals(f.text().substring(e.start(), e.end()), e.match(), "offsets index the field text");
                assertEquals(l.source(), e.source());
                assertEquals(l.locator(), e.locator());
            }
            EvidenceLine d = lines.get(2);
            assertEquals("description", d.field());
            assertEquals(13, d.start(), "0-based UTF-16 offset in the description");
            assertEquals(27, d.end());
            assertEquals("two-way zipper", d.match());
            assertEquals("Doors with a ", d.left(), "EvidenceLine.cut keeps the space before the match");
            assertEquals("TWO-WAY ZIPPER", lines.get(3).match(), "the match as written, not as analysed");
            assertEquals("Lid pocket with a ", lines.get(0).left());
            assertEquals("bullet", lines.get(0).field());
            assertEquals(2, ix.lines("two-way zipper", 2).size(), "limit counts lines");
        }
    }

    @Test
    void specFieldsKeepTheirKey(@TempDir Path dir) throws IOException {
        build(dir, LISTINGS);
        try (EvidenceIndex ix = EvidenceIndex.open(dir, new StandardAnalyzer())) {
            List<EvidenceLine> lines = ix.lines("coil", 5);
            assertEquals(1, lines.size());
            assertEquals("spec", lines.get(0).field());
            assertEquals("Zipper", lines.get(0).key());
            assertEquals("coil", lines.get(0).match());
        }
    }

    @Test
    void countAndIdsAreOfDistinctListings(@TempDir Path dir) throws IOException {
        build(dir, LISTINGS);
        try (EvidenceIndex ix = EvidenceIndex.open(dir, new StandardAnalyzer())) {
            assertEquals(2, ix.count("two-way zipper"), "FH-2 has it three times but counts once");
            assertEquals(List.of("FH-1", "FH-2"), ix.listingIds("two-way zipper", 10));
            assertEquals(List.of("FH-1"), ix.listingIds("two-way zipper", 1));
            assertEquals(3, ix.count("two"));
            assertEquals(0, ix.count("waterproof"));
            assertEquals(List.of(), ix.lines("", 5));
            assertEquals(3, ix.listings());
        }
    }

    @Test
    void aPhraseOfStopWordsOnlyMatchesNothing(@TempDir Path dir) throws IOException {
        try (EvidenceIndex.Writer w = EvidenceIndex.writer(dir, new StandardAnalyzer(EnglishAnalyzer.ENGLISH_STOP_WORDS_SET))) {
            LISTINGS.forEach(w);
            w.commit();
        }
        try (EvidenceIndex ix = EvidenceIndex.open(dir, new StandardAnalyzer(EnglishAnalyzer.ENGLISH_STOP_WORDS_SET))) {
            assertEquals(0, ix.count("the"));
            assertEquals(List.of(), ix.lines("with a", 5));
            assertEquals(1, ix.count("doors with a two-way"), "a removed stop word keeps its position: the phrase still matches");
        }
    }

    @Test
    void offsetsStayExactAfterEmptyAndStopWordOnlyFields(@TempDir Path dir) throws IOException {
        Listing l = new Listing("E1", "", "s", "", List.of(Field.of(FieldKind.TITLE, "The"), Field.of(FieldKind.BULLET, ""),
                Field.of(FieldKind.BULLET, "  pocket  "), Field.spec("Zip", "Ünïcode ëdge: two-way zipper, then two-way zipper")));
        try (EvidenceIndex.Writer w = EvidenceIndex.writer(dir, new StandardAnalyzer(EnglishAnalyzer.ENGLISH_STOP_WORDS_SET))) {
            w.add(l);
            w.commit();
        }
        try (EvidenceIndex ix = EvidenceIndex.open(dir, new StandardAnalyzer(EnglishAnalyzer.ENGLISH_STOP_WORDS_SET))) {
            List<EvidenceLine> lines = ix.lines("two-way zipper", 5);
            String text = l.fields().get(3).text();
            assertEquals(2, lines.size());
            assertEquals(text.indexOf("two-way"), lines.get(0).start());
            assertEquals(text.lastIndexOf("two-way"), lines.get(1).start());
            for (EvidenceLine e : lines) {
                assertEquals("Zip", e.key());
                assertEquals(text.substring(e.start(), e.end()), e.match());
            }
            assertEquals(0, ix.count("pocket ünïcode"), "no phrase across two fields");
            assertEquals(1, ix.count("ünïcode ëdge"));
        }
    }

    @Test
    void concurrentWritersIndexEveryListing(@TempDir Path dir) throws IOException {
        List<Listing> many = IntStream.range(0, 2000).mapToObj(i -> new Listing(String.format("L%05d", i), "c", "gen", "line " + i,
                List.of(Field.of(FieldKind.TITLE, "Item " + i), Field.of(FieldKind.BULLET, i % 10 == 0 ? "two-way zipper" : "plain"))))
                .toList();
        try (EvidenceIndex.Writer w = EvidenceIndex.writer(dir, new StandardAnalyzer())) {
            many.parallelStream().forEach(w);
            w.commit();
        }
        try (EvidenceIndex ix = EvidenceIndex.open(dir, new StandardAnalyzer())) {
            assertEquals(2000, ix.listings());
            assertEquals(200, ix.count("two-way zipper"));
            assertEquals(List.of("L00000", "L00010", "L00020"), ix.listingIds("two-way zipper", 3));
            List<EvidenceLine> lines = ix.lines("two-way zipper", 3);
            assertEquals(List.of("L00000", "L00010", "L00020"), lines.stream().map(EvidenceLine::listingId).toList());
            assertEquals("line 10", lines.get(1).locator());
        }
    }

    @Test
    void aBuildBecomesCurrentOnlyWhenCommitted(@TempDir Path dir) throws IOException {
        assertFalse(EvidenceIndex.exists(dir));
        assertThrows(IOException.class, () -> EvidenceIndex.open(dir, new StandardAnalyzer()));
        build(dir, LISTINGS);
        try (EvidenceIndex.Writer w = EvidenceIndex.writer(dir, new StandardAnalyzer())) {
            w.add(new Listing("NEW", "", "s", "", List.of(Field.of(FieldKind.TITLE, "two-way zipper"))));
            // closed without commit: as if the build crashed
        }
        try (EvidenceIndex ix = EvidenceIndex.open(dir, new StandardAnalyzer())) {
            assertEquals(3, ix.listings(), "the old index is still current");
        }
        build(dir, LISTINGS.subList(0, 1));
        try (EvidenceIndex ix = EvidenceIndex.open(dir, new StandardAnalyzer())) {
            assertEquals(1, ix.listings(), "the new build replaced it");
        }
        try (Stream<Path> s = Files.list(dir)) {
            List<String> names = new ArrayList<>(s.map(p -> p.getFileName().toString()).sorted().toList());
            assertEquals(2, names.size(), "one generation and CURRENT, no leftovers: " + names);
            assertTrue(names.contains("CURRENT"));
        }
    }

    @Test
    void anIngestRunFeedsTheIndexDirectly(@TempDir Path dir) throws IOException {
        Map<String, Listing> seen = new ConcurrentHashMap<>();
        try (EvidenceIndex.Writer w = EvidenceIndex.writer(dir.resolve("evidence"), new StandardAnalyzer())) {
            Ingest.builder().source(SourceSpec.of(Fixtures.fixture("jsonl"))).build().run(l -> {
                seen.put(l.id(), l);
                w.accept(l);
            });
            w.commit();
        }
        try (EvidenceIndex ix = EvidenceIndex.open(dir.resolve("evidence"), new StandardAnalyzer())) {
            List<EvidenceLine> lines = ix.lines("trekking pole", 5);
            assertEquals(1, lines.size());
            EvidenceLine e = lines.get(0);
            assertEquals("FH-000001", e.listingId());
            assertEquals("line 1", e.locator());
            assertEquals("Trekking-pole", e.match());
            assertEquals(List.of("FH-000002"), ix.listingIds("synthetic", 5));
        }
    }
}
