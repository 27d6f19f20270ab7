package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Path;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.VocabularyStore;
import java.util.List;
import java.util.Set;
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

    static Vocabulary tiny() throws IOException {
        return VocabularyStore.read(fixture("tiny.vocab.json"));
    }

    @Test
    void convertsAVocabularyWithEveryLabelItsFacetsAndClaims() throws IOException {
        FeedbackVocabulary v = FeedbackVocabulary.from(tiny());
        FeedbackConcept hood = v.concept("hood").orElseThrow();
        assertEquals(List.of("hood", "hooded", "hodd"), hood.labels(), "preferred, alternative, hidden");
        assertEquals(Set.of("hood", "features"), v.ancestors("helmet-hood"));
        assertEquals("features", hood.facetId());
        assertEquals("features", v.concept("helmet-hood").orElseThrow().facetId(), "found through broader links");
        assertTrue(v.concept("weight").orElseThrow().isFacet());
        assertEquals("Weight", v.displayLabel("weight"));
        assertTrue(v.concept("waterproof").orElseThrow().regulatedClaim(), "inherited from its regulated facet");
        assertTrue(v.concept("waterproof").orElseThrow().labels().contains("wasserdicht"), "every language");
        assertEquals(List.of(new FeedbackVocabulary.SharedLabel("down", List.of("down", "down-jacket"))), v.sharedLabels());
    }

    @Test
    void readsAssignmentsIntoCatalogFactsForTheListingsFeedbackNames() throws IOException {
        GroundingAssignments a = GroundingAssignments.read(fixture("assignments.jsonl"), tiny(), Set.of("T1", "R1", "R2"));
        assertEquals(4, a.listings());
        assertEquals(3, a.kept());
        GroundingListing t1 = a.catalog().listing("T1").orElseThrow();
        assertTrue(t1.carries("helmet-hood"));
        assertTrue(t1.carries("hood"), "a helmet-compatible hood is a hood");
        assertEquals(900.0, t1.number("weight"));
        assertEquals("rain-shells", t1.category());
        assertTrue(a.catalog().listing("R1").orElseThrow().negated().contains("hood"));
        assertEquals(0.0, a.catalog().listing("R2").orElseThrow().number("temperature-rating"), "a range: its midpoint");
        assertTrue(a.catalog().listing("T2").isEmpty(), "not named by the feedback");
        assertEquals(1, a.problems().size());
        assertTrue(a.problems().get(0).contains("line 5"), a.problems().get(0));
    }

    @Test
    void theLabelersMatcherFindsTermsInASentence() throws IOException {
        Vocabulary v = tiny();
        FeedbackTermFinder f = FeedbackTermFinder.labeler(Labeler.of(v, Analysis.of(AnalysisProfile.defaults())));
        String s = "No hood, but PIT-ZIPS and a down jacket";
        List<FeedbackTermHit> hits = f.find(s);
        for (FeedbackTermHit h : hits) {
            assertEquals(h.surface(), s.substring(h.start(), h.end()));
        }
        assertTrue(hits.stream().anyMatch(h -> h.conceptId().equals("hood") && h.surface().equals("hood")), hits.toString());
        assertTrue(hits.stream().anyMatch(h -> h.conceptId().equals("pit-zips") && h.surface().equals("PIT-ZIPS")), hits.toString());
        assertTrue(hits.stream().anyMatch(h -> h.conceptId().equals("down-jacket") && h.surface().equals("down jacket")),
                hits.toString());
    }

    @Test
    void theLabelersMatcherAndExactLabelsGiveTheSameReportOnTheFixture() throws IOException {
        Vocabulary v = tiny();
        FeedbackVocabulary fv = FeedbackVocabulary.from(v);
        FeedbackSentences s = FeedbackCsv.read(fixture("feedback.csv"), FeedbackColumns.DEFAULT, "feedback.csv");
        ConsistencyOptions.Builder base = ConsistencyOptions.builder(FeedbackTermFinder.labeler(Labeler.of(v,
                Analysis.of(AnalysisProfile.defaults())))).vocabulary(fv).pseudonyms(ConsistencyFixtures.PSEUDONYMS);
        ConsistencyReport labeler = ConsistencyAnalysis.run(s, base.build());
        ConsistencyReport exact = ConsistencyAnalysis.run(s, ConsistencyOptions.builder(FeedbackTermFinder.exactLabels(fv))
                .vocabulary(fv).pseudonyms(ConsistencyFixtures.PSEUDONYMS).build());
        assertEquals(exact.attributes().stream().map(ConsistencyAttribute::attribute).toList(),
                labeler.attributes().stream().map(ConsistencyAttribute::attribute).toList());
        assertEquals(exact.mentions().size(), labeler.mentions().size());
    }
}
