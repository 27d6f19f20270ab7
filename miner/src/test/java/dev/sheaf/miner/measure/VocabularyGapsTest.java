package dev.sheaf.miner.measure;

import static dev.sheaf.miner.measure.ConsistencyFixtures.run;
import static dev.sheaf.miner.measure.ConsistencyFixtures.s;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;

/** Vocabulary gaps on constructed sentences; counts worked out by hand. */
class VocabularyGapsTest {

    private static Map<String, GapTerm> gaps(List<FeedbackSentence> sentences) {
        return run(sentences, null).gaps().stream().collect(Collectors.toMap(GapTerm::term, Function.identity()));
    }

    @Test
    void countsWordsNoLabelCoversWithFrequencyAndSentences() {
        Map<String, GapTerm> g = gaps(List.of(
                s("P1", "R", "T", "a", "Comfier and comfier, with a hood", 2),
                s("P1", "R", "T", "b", "So comfier", 3),
                s("P1", "R", "T", "c", "Lighter and sturdier", 4)));
        GapTerm comfier = g.get("comfier");
        assertEquals(3, comfier.frequency());
        assertEquals(2, comfier.sentences());
        assertEquals("Comfier and comfier, with a hood", comfier.example());
        assertEquals(2, comfier.exampleRow());
        assertFalse(g.containsKey("sturdier"), "found in one sentence only: below the default of two");
        assertFalse(g.containsKey("hood"), "a label is no gap");
        assertFalse(g.containsKey("lighter"), "a scale word is a mention, no gap");
    }

    @Test
    void stopWordsCuesAndHedgesAreBoundariesNeverGlue() {
        Map<String, GapTerm> g = gaps(List.of(
                s("P1", "R", "T", "a", "Sleeve cuffs are a bit stiff, sleeve cuffs fray", 2),
                s("P1", "R", "T", "b", "The sleeve cuffs of the jacket", 3)));
        assertEquals(3, g.get("sleeve cuffs").frequency());
        assertFalse(g.containsKey("sleeve"), "only ever seen inside 'sleeve cuffs', with the same frequency");
        assertFalse(g.containsKey("cuffs jacket"), "'of the' stands between them");
        assertFalse(g.containsKey("bit stiff"));
        assertFalse(g.containsKey("the"));
        assertFalse(g.keySet().stream().anyMatch(k -> k.contains("cuffs fray") && k.startsWith("stiff")),
                "a comma ends the phrase");
    }

    @Test
    void rankedByFrequencyThenSentencesThenTerm() {
        List<GapTerm> g = run(List.of(
                s("P1", "R", "T", "a", "zesty zesty", 2),
                s("P1", "R", "T", "b", "zesty, breezy", 3),
                s("P1", "R", "T", "c", "breezy, amber", 4),
                s("P1", "R", "T", "d", "amber", 5)), null).gaps();
        assertEquals(List.of("zesty", "amber", "breezy"), g.stream().map(GapTerm::term).toList());
    }

    @Test
    void customStopWordsReplaceTheDefault() {
        FeedbackVocabulary v = ConsistencyFixtures.vocabulary();
        ConsistencyOptions o = ConsistencyOptions.builder(FeedbackTermFinder.exactLabels(v)).vocabulary(v)
                .stopWords(List.of("zesty")).gapMinSentences(1).pseudonyms(ConsistencyFixtures.PSEUDONYMS).build();
        List<GapTerm> g = ConsistencyAnalysis.run(FeedbackSentences.of("t", List.of(s("P", "R", "T", "a", "zesty one", 2))), o).gaps();
        assertEquals(List.of("one"), g.stream().map(GapTerm::term).toList());
        assertTrue(ConsistencyOptions.DEFAULT_STOP_WORDS.contains("the"));
        assertTrue(ConsistencyOptions.DEFAULT_STOP_WORDS.contains("one"));
    }
}
