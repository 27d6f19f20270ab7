package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;
import org.junit.jupiter.api.Test;

/** The Lucene chain of the default profile, asserted Lucene-style: terms, offsets, position increments and types. */
class AnalyzerChainTest {
    private static final Analyzer DEFAULT = Analysis.of(AnalysisProfile.defaults()).analyzer();
    private static final String ALNUM = "<ALPHANUM>";
    private static final String NUM = Analysis.TYPE_NUMBER;
    private static final String UNIT = Analysis.TYPE_UNIT;
    private static final String NEG = Analysis.TYPE_NEGATION;

    record Tok(String term, int start, int end, int posInc, String type) {
    }

    static List<Tok> tokens(Analyzer a, String text) throws IOException {
        List<Tok> out = new ArrayList<>();
        try (TokenStream ts = a.tokenStream("f", text)) {
            CharTermAttribute t = ts.addAttribute(CharTermAttribute.class);
            OffsetAttribute o = ts.addAttribute(OffsetAttribute.class);
            PositionIncrementAttribute p = ts.addAttribute(PositionIncrementAttribute.class);
            TypeAttribute ty = ts.addAttribute(TypeAttribute.class);
            ts.reset();
            while (ts.incrementToken()) {
                out.add(new Tok(t.toString(), o.startOffset(), o.endOffset(), p.getPositionIncrement(), ty.type()));
            }
            ts.end();
        }
        return out;
    }

    static void assertTokens(String text, Tok... expected) throws IOException {
        assertEquals(List.of(expected), tokens(DEFAULT, text), "tokens of \"" + text + "\"");
    }

    static Tok tok(String term, int start, int end, int posInc, String type) {
        return new Tok(term, start, end, posInc, type);
    }

    @Test
    void splitsANumberGluedToAUnitIntoNumberAndUnitWithExactOffsets() throws IOException {
        assertTokens("1.2kg",
                tok("1.2", 0, 3, 1, NUM),
                tok("kg", 3, 5, 1, UNIT));
        assertTokens("10,000mm",
                tok("10,000", 0, 6, 1, NUM),
                tok("mm", 6, 8, 1, UNIT));
    }

    @Test
    void keepsDecimalAndThousandsNumbersWholeAndTypesTheFollowingUnit() throws IOException {
        assertTokens("10,000 mm head",
                tok("10,000", 0, 6, 1, NUM),
                tok("mm", 7, 9, 1, UNIT),
                tok("head", 10, 14, 1, ALNUM));
        assertTokens("2 lb 10 oz",
                tok("2", 0, 1, 1, NUM),
                tok("lb", 2, 4, 1, UNIT),
                tok("10", 5, 7, 1, NUM),
                tok("oz", 8, 10, 1, UNIT));
    }

    @Test
    void aUnitWordAfterANumberIsNotStoppedButTheSameWordElsewhereIs() throws IOException {
        // "in" is an English stop word, and the inch symbol after a number
        assertTokens("12 in zip in front",
                tok("12", 0, 2, 1, NUM),
                tok("in", 3, 5, 1, UNIT),
                tok("zip", 6, 9, 1, ALNUM),
                tok("front", 13, 18, 2, ALNUM));
    }

    @Test
    void leavesLettersThatAreNoUnitAttachedToTheirNumber() throws IOException {
        assertTokens("2nd 4x4",
                tok("2nd", 0, 3, 1, ALNUM),
                tok("4x4", 4, 7, 1, ALNUM));
    }

    @Test
    void tradeAttributesSurviveTheStopList() throws IOException {
        assertTokens("800-fill down, zip-off legs, pull over",
                tok("800", 0, 3, 1, NUM),
                tok("fill", 4, 8, 1, ALNUM),
                tok("down", 9, 13, 1, ALNUM),
                tok("zip", 15, 18, 1, ALNUM),
                tok("off", 19, 22, 1, ALNUM),
                tok("legs", 23, 27, 1, ALNUM),
                tok("pull", 29, 33, 1, ALNUM),
                tok("over", 34, 38, 1, ALNUM));
    }

    @Test
    void removedStopWordsLeaveAPositionGap() throws IOException {
        assertTokens("away from the direct heat",
                tok("away", 0, 4, 1, ALNUM),
                tok("direct", 14, 20, 3, ALNUM),
                tok("heat", 21, 25, 1, ALNUM));
    }

    @Test
    void negationWordsAreKeptWithTheirOwnTypeThoughLuceneListsThemAsStopWords() throws IOException {
        assertTokens("Not waterproof, no hood, without DWR; Don’t wash",
                tok("not", 0, 3, 1, NEG),
                tok("waterproof", 4, 14, 1, ALNUM),
                tok("no", 16, 18, 1, NEG),
                tok("hood", 19, 23, 1, ALNUM),
                tok("without", 25, 32, 1, NEG),
                tok("dwr", 33, 36, 1, ALNUM),
                tok("don't", 38, 43, 1, NEG),
                tok("wash", 44, 48, 1, ALNUM));
    }

    @Test
    void possessivesFoldingAndLowerCase() throws IOException {
        assertTokens("MEN'S Café Naïve",
                tok("men", 0, 5, 1, ALNUM),
                tok("cafe", 6, 10, 1, ALNUM),
                tok("naive", 11, 16, 1, ALNUM));
    }

    @Test
    void thePlainPresetUsesLucenesListAndKeepsGluedUnits() throws IOException {
        Analyzer plain = Analysis.of(AnalysisProfile.preset("plain")).analyzer();
        List<Tok> t = tokens(plain, "1.2kg from Café");
        assertEquals(List.of(tok("1.2kg", 0, 5, 1, ALNUM), tok("from", 6, 10, 1, ALNUM), tok("café", 11, 15, 1, ALNUM)), t);
    }

    @Test
    void caseFoldingIgnoresTheDefaultLocale() throws IOException {
        Locale saved = Locale.getDefault();
        List<Tok> root = tokens(DEFAULT, "TITANIUM INSULATED ZIP İLIK");
        try {
            Locale.setDefault(Locale.forLanguageTag("tr-TR"));
            Analyzer fresh = Analysis.of(AnalysisProfile.defaults()).analyzer();
            List<Tok> turkish = tokens(fresh, "TITANIUM INSULATED ZIP İLIK");
            assertEquals(root, turkish);
            assertEquals("titanium", turkish.get(0).term());
            assertEquals("insulated", turkish.get(1).term());
            // and a profile built under the Turkish locale holds the same words
            AnalysisProfile p = AnalysisProfile.builder("tr").addStopWords(List.of("FITTING")).build();
            assertTrue(p.stopWords().contains("fitting"));
            assertFalse(p.stopWords().contains("fıttıng"));
        } finally {
            Locale.setDefault(saved);
        }
    }

    @Test
    void theAnalyzerReusesItsStreamAndGivesTheSameTokensTwice() throws IOException {
        String s = "Ripstop nylon shell; 2-way zipper.";
        assertEquals(tokens(DEFAULT, s), tokens(DEFAULT, s));
        assertArrayEquals(new String[] {"ripstop", "nylon", "shell", "2", "way", "zipper"},
                tokens(DEFAULT, s).stream().map(Tok::term).toArray());
    }
}
