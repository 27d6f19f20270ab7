package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Reading the vocabulary and assignments files the consistency stage is given (constructed fixtures). */
class ConsistencyInputFilesTest {

    static Path fixture(String name) {
        try {
            return Path.of(ConsistencyInputFilesTest.class.getResource("/consistency/" + name).toURI());
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    @Test
    void theFixtureFolderIsNotEmpty() {
        for (String f : List.of("tiny.vocab.json", "feedback.csv", "assignments.jsonl", "scales.json")) {
            assertTrue(fixture(f).toFile().length() > 0, f);
        }
    }

    @Test
    void readsConceptsFacetsAndEveryLabelOfAVocabularyFile() throws IOException {
        FeedbackVocabulary v = FeedbackVocabularyFile.read(fixture("tiny.vocab.json"));
        FeedbackConcept hood = v.concept("hood").orElseThrow();
        assertEquals(List.of("hood", "hooded", "hodd"), hood.labels(), "preferred, alternative, hidden");
        assertEquals(java.util.Set.of("hood", "features"), v.ancestors("helmet-hood"));
        assertEquals("features", hood.facetId());
        assertEquals("features", v.concept("helmet-hood").orElseThrow().facetId(), "found through broader links");
        assertTrue(v.concept("weight").orElseThrow().isFacet());
        assertEquals("Weight", v.displayLabel("weight"));
        assertTrue(v.concept("waterproof").orElseThrow().regulatedClaim(), "inherited from its regulated facet");
        assertTrue(v.concept("waterproof").orElseThrow().labels().contains("wasserdicht"), "every language");
        assertEquals(List.of(new FeedbackVocabulary.SharedLabel("down", List.of("down", "down-jacket"))), v.sharedLabels());
    }

    @Test
    void aFileThatIsNoVocabularySaysWhatItFound() {
        IOException format = assertThrows(IOException.class,
                () -> FeedbackVocabularyFile.fromJson("{\"format\":\"sheaf-scales\",\"formatVersion\":1}", "x.json"));
        assertTrue(format.getMessage().contains("\"format\": \"sheaf-scales\""), format.getMessage());
        IOException twice = assertThrows(IOException.class, () -> FeedbackVocabularyFile.fromJson(
                "{\"format\":\"sheaf-vocabulary\",\"formatVersion\":1,\"concepts\":[{\"id\":\"a\"},{\"id\":\"a\"}]}", "x.json"));
        assertTrue(twice.getMessage().contains("appears twice"), twice.getMessage());
        IOException json = assertThrows(IOException.class, () -> FeedbackVocabularyFile.fromJson("{", "x.json"));
        assertTrue(json.getMessage().startsWith("x.json:1:"), json.getMessage());
    }

    @Test
    void readsAssignmentsIntoCatalogFactsAndSkipsABrokenLine() throws IOException {
        FeedbackVocabulary v = FeedbackVocabularyFile.read(fixture("tiny.vocab.json"));
        GroundingAssignments a = GroundingAssignments.read(fixture("assignments.jsonl"), "assignments.jsonl", v);
        assertEquals(4, a.listings());
        GroundingListing t1 = a.catalog().listing("T1").orElseThrow();
        assertTrue(t1.carries("helmet-hood"));
        assertTrue(t1.carries("hood"), "a helmet-compatible hood is a hood");
        assertTrue(t1.carries("features"));
        assertTrue(GroundingAssignments.read(fixture("assignments.jsonl"), "a").catalog().listing("T1").orElseThrow()
                .stated().equals(java.util.Set.of("helmet-hood")), "no vocabulary, no hierarchy");
        assertEquals(900.0, t1.number("weight"));
        assertEquals("rain-shells", t1.category());
        GroundingListing r1 = a.catalog().listing("R1").orElseThrow();
        assertTrue(r1.negated().contains("hood"));
        assertEquals(0.0, a.catalog().listing("R2").orElseThrow().number("temperature-rating"), "a range: its midpoint");
        assertEquals(1, a.problems().size());
        assertEquals(5, a.problems().get(0).line());
        assertTrue(a.catalog().listing("nope").isEmpty());
    }
}
