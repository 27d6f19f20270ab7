package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class ComparativeMorphologyTest {

    private static final ComparativeMorphology WN = ComparativeMorphology.wordNet();

    @ParameterizedTest(name = "{0} -> {1} ({2})")
    @CsvSource({
            // regular rules onto WordNet adjectives
            "lighter, light, COMPARATIVE, RULE",
            "warmest, warm, SUPERLATIVE, RULE",
            "simpler, simple, COMPARATIVE, RULE",
            "softer, soft, COMPARATIVE, RULE",
            "looser, loose, COMPARATIVE, RULE",
            "boxier, boxy, COMPARATIVE, RULE",
            "latest, late, SUPERLATIVE, RULE",
            "fewer, few, COMPARATIVE, RULE",
            "cooler, cool, COMPARATIVE, RULE",
            // forms WordNet's adj.exc lists (Princeton University, "WordNet", 2010 [pub])
            "roomier, roomy, COMPARATIVE, EXCEPTION_LIST",
            "bigger, big, COMPARATIVE, EXCEPTION_LIST",
            "drier, dry, COMPARATIVE, EXCEPTION_LIST",
            "better, good, COMPARATIVE, EXCEPTION_LIST",
            "best, good, SUPERLATIVE, EXCEPTION_LIST",
            "worse, bad, COMPARATIVE, EXCEPTION_LIST",
            "worst, bad, SUPERLATIVE, EXCEPTION_LIST",
            "sturdiest, sturdy, SUPERLATIVE, EXCEPTION_LIST",
            // adv.exc (same source)
            "further, far, COMPARATIVE, EXCEPTION_LIST",
            "farther, far, COMPARATIVE, EXCEPTION_LIST",
    })
    void readsTheBaseAndDegreeOfComparativesAndSuperlatives(String word, String base, Degree degree,
                                                             DegreeReading.Source source) {
        DegreeReading best = WN.best(word);
        assertEquals(new DegreeReading(word, base, degree, source), best);
        assertEquals(base, ComparativeMorphology.base(word));
    }

    @ParameterizedTest
    @ValueSource(strings = {"water", "never", "sweater", "under", "zipper", "cover", "liner", "summer", "rubber",
            "layer", "matter", "number", "upper", "inner", "outer", "slicker", "customer", "forest", "interest",
            "honest", "modest", "shoulder", "winter", "leather", "other", "either", "hiker", "camper"})
    void doesNotTakeOrdinaryWordsForComparatives(String word) {
        DegreeReading best = WN.best(word);
        assertEquals(Degree.POSITIVE, best.degree(), () -> word + " read as " + best);
        assertEquals(word, best.base());
    }

    @Test
    void keepsAWordWordNetListsAsItsOwnBaseAheadOfItsExceptionReading() {
        // adj.exc lists "offer off" and "offer offer" (Princeton University, "WordNet", 2010 [pub])
        List<DegreeReading> readings = WN.readings("offer");
        assertEquals(Degree.POSITIVE, readings.get(0).degree());
        assertTrue(readings.stream().anyMatch(r -> r.base().equals("off") && r.degree() == Degree.COMPARATIVE),
                () -> readings.toString());
    }

    @Test
    void listsEveryBaseOfAnAmbiguousFormBestFirstAndTheWordItselfLast() {
        List<DegreeReading> readings = WN.readings("better");
        assertEquals(List.of("good", "well", "better"), readings.stream().map(DegreeReading::base).toList());
        assertEquals(DegreeReading.Source.UNCHANGED, readings.get(readings.size() - 1).source());
        assertEquals(List.of("deep", "deeply", "deeper"),
                WN.readings("deeper").stream().map(DegreeReading::base).toList());
    }

    @Test
    void knownTermsKeepALabelWholeAndAcceptBasesWordNetLacks() {
        ComparativeMorphology vocab = WN.withKnownTerms(List.of("Grippy", "lighter", "  "));
        assertEquals(new DegreeReading("grippier", "grippy", Degree.COMPARATIVE, DegreeReading.Source.KNOWN_TERM),
                vocab.best("grippier"));
        assertEquals("grippier", WN.best("grippier").base(), "WordNet alone does not know 'grippy'");
        // "lighter" is a label (a fire-lighter, say): it reads as itself, the comparative comes second
        List<DegreeReading> lighter = vocab.readings("lighter");
        assertEquals(Degree.POSITIVE, lighter.get(0).degree());
        assertEquals("light", lighter.get(1).base());
    }

    @Test
    void foldsCaseWithTheRootLocaleEvenUnderATurkishDefault() {
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("tr-TR"));
            assertEquals("light", ComparativeMorphology.base("LIGHTER"));
            assertEquals("dry", ComparativeMorphology.base("DRIER"));
            assertEquals("tidy", ComparativeMorphology.base("TIDIEST"));
        } finally {
            Locale.setDefault(saved);
        }
    }

    @Test
    void foldsTypographicApostrophesAndTrims() {
        assertEquals("light", ComparativeMorphology.base("  Lighter "));
        assertEquals("doesn't", WN.best("doesn\u2019t").surface());
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "er", "est", "ier", "x", "-er", "12er", "\u00e9t\u00e9er", "a b er", "zzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzzer"})
    void readsOddInputAsItStands(String word) {
        DegreeReading best = WN.best(word);
        assertEquals(Degree.POSITIVE, best.degree());
        assertFalse(WN.readings(word).isEmpty());
    }

    @Test
    void rejectsNullAsMisuse() {
        assertThrows(NullPointerException.class, () -> WN.readings(null));
        assertThrows(NullPointerException.class, () -> WN.withKnownTerms(null));
    }

    @Test
    void readsIshWordsOnlyWhenTheirStemIsAnAdjective() {
        assertEquals(Map.of("warmish", "warm", "largish", "large", "reddish", "red", "longish", "long"),
                Map.of("warmish", WN.ishBase("warmish").orElseThrow(), "largish", WN.ishBase("largish").orElseThrow(),
                        "reddish", WN.ishBase("reddish").orElseThrow(), "longish", WN.ishBase("longish").orElseThrow()));
        for (String w : List.of("finish", "polish", "british", "selfish", "stylish", "dish", "ish")) {
            assertTrue(WN.ishBase(w).isEmpty(), w);
        }
    }

    @Test
    void readsUnknownErWordsAsComparativesOnlyWhenThanFollowsAndTheWordIsNotAWordOfItsOwn() {
        assertEquals("grippy", WN.beforeThan("grippier").orElseThrow().base());
        assertEquals("crunchy", WN.beforeThan("crunchier").orElseThrow().base());
        assertTrue(WN.beforeThan("floppier").isEmpty(), "adj.exc lists floppier; the regular reading applies");
        assertTrue(WN.beforeThan("water").isEmpty());
        assertTrue(WN.beforeThan("sweater").isEmpty());
        assertTrue(WN.beforeThan("fast").isEmpty());
    }

    @Test
    void degreeReadingValidatesItsInvariants() {
        assertThrows(IllegalArgumentException.class,
                () -> new DegreeReading("lighter", "light", Degree.POSITIVE, DegreeReading.Source.RULE));
        assertThrows(IllegalArgumentException.class,
                () -> new DegreeReading("lighter", "", Degree.COMPARATIVE, DegreeReading.Source.RULE));
        assertThrows(NullPointerException.class,
                () -> new DegreeReading("lighter", "light", null, DegreeReading.Source.RULE));
    }
}
