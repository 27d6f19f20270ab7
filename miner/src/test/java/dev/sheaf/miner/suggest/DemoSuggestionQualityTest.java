package dev.sheaf.miner.suggest;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Suggestion quality on the demo catalog, against the synonyms, variants, abbreviations and
 * misspellings its generator planted. Our own functional check on invented data (see
 * {@link DemoQuality} for how pairs are judged), not an outside check value: the floors are what
 * this version measured (docs/decisions/135-suggestion-quality.md), set a little below so that an
 * unrelated change in the miner does not trip them, while a broken kind does.
 *
 * <p>Prints the table with {@code -Dsheaf.print=true}:
 * {@code mvn -o -q -B -pl miner -am test -Dtest=DemoSuggestionQualityTest -Dsurefire.failIfNoSpecifiedTests=false -Dsurefire.excludedGroups= -Dsheaf.print=true}
 */
@Tag("slow")
class DemoSuggestionQualityTest {
    @Test
    void meetsTheMeasuredFloorsOnThePlantedPairs() throws Exception {
        Assumptions.assumeTrue(Files.isDirectory(DemoQuality.WORKSPACE.resolve("catalog")),
                "sample-listings/catalog is absent; re-create it with './sheaf generate demo --out sample-listings'");
        DemoQuality q = new DemoQuality();
        if (Boolean.getBoolean("sheaf.print")) {
            System.out.print(q.table());
        }
        DemoQuality.Point p = q.at(SuggestOptions.DEFAULT_MIN_SCORE, null);
        assertTrue(p.truthPairs() >= 80, "the demo should plant at least 80 findable pairs, found " + p.truthPairs());
        assertTrue(p.precision() >= 0.95, "precision " + p.precision() + "\n" + q.table());
        assertTrue(p.recall() >= 0.55, "recall " + p.recall() + "\n" + q.table());
        // each harvest-only kind finds its own planted pairs
        assertTrue(q.at(SuggestOptions.DEFAULT_MIN_SCORE, Suggestion.Kind.SAME_GROUP_KEY).found() >= 15);
        assertTrue(q.at(SuggestOptions.DEFAULT_MIN_SCORE, Suggestion.Kind.SPELLING_VARIANT).found() >= 18);
        assertTrue(q.at(SuggestOptions.DEFAULT_MIN_SCORE, Suggestion.Kind.ABBREVIATION).found() >= 5);
        assertTrue(q.at(SuggestOptions.DEFAULT_MIN_SCORE, Suggestion.Kind.DISTRIBUTIONAL).found() >= 8);
        // a lower threshold never loses recall
        assertTrue(q.at(0.3, null).recall() >= p.recall());
    }
}
