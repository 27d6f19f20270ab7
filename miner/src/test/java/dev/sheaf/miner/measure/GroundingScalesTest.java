package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;
import org.junit.jupiter.api.Test;

class GroundingScalesTest {
    private static final String OK = "{\"format\":\"sheaf-scales\",\"formatVersion\":1,\"scales\":["
            + "{\"facet\":\"weight\",\"direction\":\"less\",\"words\":[\"Light\"],\"note\":\"lighter = less\"},"
            + "{\"facet\":\"capacity\",\"direction\":\"more\",\"concepts\":[\"roomy\"]}]}";

    @Test
    void readsWordsAndConceptsWithTheirDirection() throws IOException {
        GroundingScales s = GroundingScales.fromJson(OK, "scales.json");
        assertEquals(2, s.scales().size());
        GroundingScale light = s.forWord("light").orElseThrow();
        assertEquals("weight", light.facet());
        assertEquals(Direction.LESS, light.direction());
        assertEquals("weight", s.forWord("LIGHT").orElseThrow().facet(), "words are compared in normal form");
        assertEquals("capacity", s.forConcept("roomy").orElseThrow().facet());
        assertTrue(s.forWord("roomy").isEmpty());
    }

    @Test
    void onFacetTurnsTheReadDirection() {
        GroundingScale light = new GroundingScale("weight", Direction.LESS, List.of("light"), List.of(), "");
        assertEquals(Direction.LESS, light.onFacet(Direction.MORE));
        assertEquals(Direction.MORE, light.onFacet(Direction.LESS));
        assertEquals(Direction.LESS, light.onFacet(Direction.PRESENT));
        assertEquals(Direction.MORE, light.onFacet(Direction.ABSENT));
    }

    @Test
    void unknownKeysAreRejectedByName() {
        IOException root = assertThrows(IOException.class, () -> GroundingScales.fromJson(
                "{\"format\":\"sheaf-scales\",\"formatVersion\":1,\"scales\":[],\"scale\":[]}", "s.json"));
        assertTrue(root.getMessage().contains("unknown key \"scale\""), root.getMessage());
        IOException entry = assertThrows(IOException.class, () -> GroundingScales.fromJson(
                "{\"format\":\"sheaf-scales\",\"formatVersion\":1,\"scales\":[{\"facet\":\"w\",\"direction\":\"less\","
                        + "\"word\":[\"x\"]}]}", "s.json"));
        assertTrue(entry.getMessage().contains("scales[0]") && entry.getMessage().contains("\"word\""), entry.getMessage());
    }

    @Test
    void badValuesSayWhatWasExpected() {
        IOException dir = assertThrows(IOException.class, () -> GroundingScales.fromJson(
                "{\"format\":\"sheaf-scales\",\"formatVersion\":1,\"scales\":[{\"facet\":\"w\",\"direction\":\"down\","
                        + "\"words\":[\"x\"]}]}", "s.json"));
        assertTrue(dir.getMessage().contains("\"more\" or \"less\""), dir.getMessage());
        IOException none = assertThrows(IOException.class, () -> GroundingScales.fromJson(
                "{\"format\":\"sheaf-scales\",\"formatVersion\":1,\"scales\":[{\"facet\":\"w\",\"direction\":\"more\"}]}", "s.json"));
        assertTrue(none.getMessage().contains("no words and no concepts"), none.getMessage());
        IOException format = assertThrows(IOException.class, () -> GroundingScales.fromJson(
                "{\"format\":\"sheaf-vocabulary\",\"formatVersion\":1,\"scales\":[]}", "s.json"));
        assertTrue(format.getMessage().contains("not a Sheaf scales file"), format.getMessage());
        IOException json = assertThrows(IOException.class, () -> GroundingScales.fromJson("{\"format\":", "s.json"));
        assertTrue(json.getMessage().startsWith("s.json:1:"), json.getMessage());
    }

    @Test
    void aWordOnTwoScalesIsRejected() {
        IOException e = assertThrows(IOException.class, () -> GroundingScales.fromJson(
                "{\"format\":\"sheaf-scales\",\"formatVersion\":1,\"scales\":["
                        + "{\"facet\":\"weight\",\"direction\":\"less\",\"words\":[\"light\"]},"
                        + "{\"facet\":\"light-output\",\"direction\":\"more\",\"words\":[\"light\"]}]}", "s.json"));
        assertTrue(e.getMessage().contains("'light' is on two scales"), e.getMessage());
    }

    @Test
    void theBundledExampleLoadsAndSaysItIsAnExample() {
        GroundingScales s = GroundingScales.bundledExample();
        assertTrue(s.source().startsWith("bundled example"), s.source());
        assertEquals(Direction.LESS, s.forWord("warm").orElseThrow().direction(), "warmer = a lower comfort rating");
        assertEquals("weight", s.forWord("heavy").orElseThrow().facet());
    }

    @Test
    void theFirstNonEmptySourceWins() throws IOException {
        GroundingScales fromVocabulary = GroundingScales.fromJson(OK, "vocabulary");
        GroundingScales file = GroundingScales.bundledExample();
        assertSame(fromVocabulary, GroundingScales.first(null, GroundingScales.none(), fromVocabulary, file));
        assertSame(file, GroundingScales.first(GroundingScales.none(), file));
        assertTrue(GroundingScales.first().isEmpty());
    }
}
