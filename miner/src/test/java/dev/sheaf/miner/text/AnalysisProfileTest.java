package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.lucene.analysis.en.EnglishAnalyzer;
import org.junit.jupiter.api.Test;

class AnalysisProfileTest {

    @Test
    void theDefaultStopListNeverStopsTradeAttributes() {
        AnalysisProfile p = AnalysisProfile.defaults();
        for (String w : List.of("down", "up", "off", "over", "out", "all", "under", "more", "very", "free", "non")) {
            assertFalse(p.stopWords().contains(w), w + " must not be a stop word");
        }
        assertTrue(p.stopWords().containsAll(List.of("the", "and", "from", "with", "your", "on")));
    }

    @Test
    void negationsAreNeverStopWordsEvenWhenAListNamesThem() {
        AnalysisProfile p = AnalysisProfile.builder("x").addStopWords(List.of("no", "without")).build();
        assertFalse(p.stopWords().contains("no"));
        assertFalse(p.stopWords().contains("without"));
        assertTrue(p.negationWords().containsAll(List.of("no", "not", "without")));
    }

    @Test
    void thePlainPresetHoldsLucenesEnglishListExceptTheNegations() {
        AnalysisProfile plain = AnalysisProfile.preset("plain");
        assertEquals(EnglishAnalyzer.ENGLISH_STOP_WORDS_SET.size() - 2, plain.stopWords().size());
        assertFalse(plain.asciiFolding());
        assertEquals(AnalysisProfile.Numbers.KEEP, plain.numbers());
    }

    @Test
    void aProfileFileExtendsItsBaseAndRoundTrips() {
        AnalysisProfile p = AnalysisProfile.fromJson("""
                {"format":"sheaf-analysis-profile","formatVersion":1,"name":"shop","base":"default",
                 "addStopWords":["Shipping"],"keepWords":["from"],"addUnits":["dtex"],"asciiFolding":false}""", "shop.json");
        assertEquals("shop", p.name());
        assertTrue(p.stopWords().contains("shipping"));
        assertFalse(p.stopWords().contains("from"));
        assertTrue(p.units().contains("dtex"));
        assertFalse(p.asciiFolding());
        assertEquals(p, AnalysisProfile.fromJson(p.toJson(), "again"));
    }

    @Test
    void unknownKeysAreRejectedByName() {
        var e = assertThrows(AnalysisProfile.ProfileException.class,
                () -> AnalysisProfile.fromJson("{\"stopwords\":[\"a\"]}", "p.json"));
        assertTrue(e.getMessage().contains("\"stopwords\" is not a profile setting"), e.getMessage());
        assertTrue(e.getMessage().contains("stopWords"), "lists the real settings: " + e.getMessage());
    }

    @Test
    void badValuesSayTheRuleTheValueAndTheFix() {
        var e = assertThrows(AnalysisProfile.ProfileException.class,
                () -> AnalysisProfile.fromJson("{\"tokenizer\":\"whitespace\"}", "p.json"));
        assertTrue(e.getMessage().contains("must be \"standard\" or \"classic\", found \"whitespace\""), e.getMessage());
        e = assertThrows(AnalysisProfile.ProfileException.class,
                () -> AnalysisProfile.fromJson("{\"addStopWords\":[\"free shipping\"]}", "p.json"));
        assertTrue(e.getMessage().contains("must be one token") && e.getMessage().contains("free shipping"), e.getMessage());
        e = assertThrows(AnalysisProfile.ProfileException.class,
                () -> AnalysisProfile.fromJson("{\"maxTokenLength\":0}", "p.json"));
        assertTrue(e.getMessage().contains("from 1 to 1024") && e.getMessage().contains("found 0"), e.getMessage());
        e = assertThrows(AnalysisProfile.ProfileException.class,
                () -> AnalysisProfile.fromJson("{\"breakCharacters\":\".a\"}", "p.json"));
        assertTrue(e.getMessage().contains("punctuation or line breaks only"), e.getMessage());
        e = assertThrows(AnalysisProfile.ProfileException.class,
                () -> AnalysisProfile.fromJson("[1]", "p.json"));
        assertTrue(e.getMessage().contains("one JSON object"), e.getMessage());
    }

    @Test
    void unknownPresetNamesThePresets() {
        var e = assertThrows(IllegalArgumentException.class, () -> AnalysisProfile.preset("english"));
        assertTrue(e.getMessage().contains("default") && e.getMessage().contains("plain"), e.getMessage());
    }
}
