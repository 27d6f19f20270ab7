package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** Variant keys: which spellings of a candidate share a group and which stay apart. */
class VariantKeyTest {

    @ParameterizedTest(name = "{0} ≡ {1}")
    @CsvSource(delimiter = '|', textBlock = """
            Two-Way Zippers      | two way zipper
            two-way zipper       | twoway zippers
            2-way zipper         | two-way zipper
            3-season             | three season
            Pockets              | pocket
            stuff sacks          | stuff-sack
            stuffsacks           | Stuff Sack
            tent stakes          | tent stake
            boxes                | box
            zip ties             | zip tie
            batteries            | battery
            Women's Jacket       | womens jacket
            naïve                | naive
            roll-top             | Roll Top
            hip-belt pockets     | hipbelt pocket
            10 pockets           | ten pocket
            """)
    void spellingVariantsShareAKey(String a, String b) {
        assertEquals(VariantKey.of(a), VariantKey.of(b));
    }

    @ParameterizedTest(name = "{0} ≠ {1}")
    @CsvSource(delimiter = '|', textBlock = """
            colour           | color
            fibre            | fiber
            quilted          | quilt
            padded           | pad
            insulated        | insulation
            hiking           | hike
            GPS              | GP
            lining           | liner
            11-way           | eleven-way
            glass            | gas
            """)
    void differentTermsAndSpellingsLeftToTheSuggestionStageKeepTheirOwnKeys(String a, String b) {
        assertNotEquals(VariantKey.of(a), VariantKey.of(b));
    }

    @Test
    void theKeyIsTheJoinedLowerCaseSingularWords() {
        assertEquals("twowayzipper", VariantKey.of("Two-Way Zippers"));
        assertEquals("gps", VariantKey.of("GPS"), "short words are not stemmed: gps, abs, gas");
        assertEquals("", VariantKey.of(" -- / "));
    }

    @Test
    void casingIsLocaleIndependent() {
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("tr-TR"));
            // Turkish lower-cases I to dotless ı; the key must not depend on it.
            assertEquals("insulatedliner", VariantKey.of("INSULATED LINERS"));
            assertEquals(VariantKey.of("ripstop liner"), VariantKey.of("RIPSTOP LINER"));
        } finally {
            Locale.setDefault(saved);
        }
    }

    @Test
    void randomTextNeverThrowsAndGivesAStableKey() {
        long seed = Long.getLong("tests.seed", System.nanoTime());
        Random r = new Random(seed);
        String alphabet = "abcXYZ -'’s.,/0123456789ıİéß\u0301\uD83C\uDFD5";
        for (int i = 0; i < 2_000; i++) {
            StringBuilder sb = new StringBuilder();
            int n = r.nextInt(30);
            for (int k = 0; k < n; k++) {
                sb.append(alphabet.charAt(r.nextInt(alphabet.length())));
            }
            String s = sb.toString();
            String key = VariantKey.of(s);
            assertEquals(key, VariantKey.of(s), "seed " + seed + ": same input, same key: '" + s + "'");
        }
    }

    @Test
    void nullIsMisuse() {
        assertThrows(NullPointerException.class, () -> VariantKey.of(null));
    }
}
