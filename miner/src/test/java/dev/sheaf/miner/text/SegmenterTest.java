package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Segments are where n-grams may live: never across a field, a sentence, a removed stop word or a negation. */
class SegmenterTest {
    private final Analysis analysis = Analysis.of(AnalysisProfile.defaults());

    private static Listing listing(Field... fields) {
        return new Listing("FH-1", "tents", "feed.jsonl", "line 1", List.of(fields));
    }

    private List<List<String>> terms(Listing l) {
        List<List<String>> out = new ArrayList<>();
        for (TokenSegment s : analysis.segments(l)) {
            out.add(List.of(s.terms()));
        }
        return out;
    }

    @Test
    void aRemovedStopWordIsABoundaryNeverGlue() {
        assertEquals(List.of(List.of("keep", "away"), List.of("direct", "heat")),
                terms(listing(Field.of(FieldKind.DESCRIPTION, "Keep away from direct heat"))));
    }

    @Test
    void sentencesAndListPunctuationEndSegments() {
        assertEquals(List.of(List.of("ripstop", "nylon"), List.of("taped", "seams"), List.of("two", "way", "zipper"),
                        List.of("packs", "small")),
                terms(listing(Field.of(FieldKind.DESCRIPTION, "Ripstop nylon. Taped seams, two-way zipper\nPacks small!"))));
    }

    @Test
    void decimalPointsInsideNumbersDoNotEndASentence() {
        assertEquals(List.of(List.of("weighs", "1.2", "kg"), List.of("packs", "down")),
                terms(listing(Field.of(FieldKind.DESCRIPTION, "Weighs 1.2kg. Packs down"))));
    }

    @Test
    void negationWordsCutSegmentsAndAreNotCounted() {
        assertEquals(List.of(List.of("pfc", "free"), List.of("dwr"), List.of("seam", "sealed")),
                terms(listing(Field.of(FieldKind.BULLET, "PFC free, no DWR, not seam sealed"))));
    }

    @Test
    void fieldsNeverJoinAndSpecKeysAndValuesAreSeparateSegments() {
        Listing l = listing(Field.of(FieldKind.TITLE, "Ridgeline Tent"), Field.of(FieldKind.BULLET, "Tent footprint"),
                Field.spec("Packed Weight", "2 lb 10 oz"));
        List<TokenSegment> segs = analysis.segments(l);
        assertEquals(4, segs.size());
        assertEquals(List.of("ridgeline", "tent"), List.of(segs.get(0).terms()));
        assertEquals(0, segs.get(0).field());
        assertEquals(1, segs.get(1).field());
        TokenSegment key = segs.get(2);
        TokenSegment value = segs.get(3);
        assertEquals(SegmentPart.SPEC_KEY, key.part());
        assertEquals(List.of("packed", "weight"), List.of(key.terms()));
        assertEquals(7, key.start(1));
        assertEquals(13, key.end(1));
        assertEquals(SegmentPart.SPEC_VALUE, value.part());
        assertEquals(List.of("2", "lb", "10", "oz"), List.of(value.terms()));
        assertEquals(2, value.field());
        assertEquals(5, value.start(2));
    }

    @Test
    void offsetsPointAtTheSourceText() {
        String text = "Men's 800-fill DOWN jacket";
        TokenSegment s = analysis.segments(listing(Field.of(FieldKind.TITLE, text))).get(0);
        for (int i = 0; i < s.length(); i++) {
            String surface = text.substring(s.start(i), s.end(i)).toLowerCase(java.util.Locale.ROOT);
            assertTrue(surface.startsWith(s.term(i)), surface + " vs " + s.term(i));
        }
        assertEquals("men's", text.substring(s.start(0), s.end(0)).toLowerCase(java.util.Locale.ROOT));
    }

    @Test
    void theSameTermGetsTheSameIdFromEverySegmenter() throws InterruptedException {
        Listing l = listing(Field.of(FieldKind.TITLE, "alpine tent alpine"));
        int[] fromOther = new int[3];
        Thread t = new Thread(() -> {
            TokenSegment s = analysis.segments(l).get(0);
            for (int i = 0; i < 3; i++) {
                fromOther[i] = s.id(i);
            }
        });
        t.start();
        t.join();
        TokenSegment s = analysis.segments(l).get(0);
        for (int i = 0; i < 3; i++) {
            assertEquals(fromOther[i], s.id(i));
        }
        assertEquals(s.id(0), s.id(2));
        assertEquals("alpine", analysis.terms().term(s.id(0)));
    }

    @Test
    void emptyFieldsGiveNoSegments() {
        assertEquals(List.of(), terms(listing(Field.of(FieldKind.DESCRIPTION, ""), Field.of(FieldKind.TITLE, " , . the"))));
    }
}
