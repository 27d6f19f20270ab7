package dev.sheaf.samples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

class VoiceTest {

    @Test
    void numberFormattingMatchesTheJdkFormatterUnderLocaleRoot() {
        // reference: java.util.Formatter with Locale.ROOT ("%,d"); decimals agree except on exact binary halves
        Rng r = new Rng(5);
        for (int i = 0; i < 5000; i++) {
            long n = (long) (r.nextDouble() * 50_000_000) - 1_000_000;
            assertEquals(String.format(Locale.ROOT, "%,d", n), Voice.thousands(n));
            double d = r.between(-50, 5000);
            assertEquals(String.format(Locale.ROOT, "%.1f", Math.round(d * 10) / 10.0), Voice.oneDecimal(d), "value " + d);
            assertEquals(String.format(Locale.ROOT, "%.2f", Math.round(d * 100) / 100.0), Voice.twoDecimals(d), "value " + d);
        }
    }

    @Test
    void formattingIgnoresTheDefaultLocale() {
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("de-DE"));
            assertEquals("1,200", Voice.thousands(1200));
            assertEquals("1.2", Voice.oneDecimal(1.2));
        } finally {
            Locale.setDefault(saved);
        }
    }

    private static final Pattern LB_OZ = Pattern.compile("(\\d+) lbs? (\\d+) oz");
    private static final Pattern KG = Pattern.compile("(\\d+\\.\\d+) kg");
    private static final Pattern G = Pattern.compile("([\\d,]+) ?g\\b");

    @Test
    void weightsAreTheSameMassInEveryUnitSystem() {
        // 1 lb = 0.45359237 kg, 1 oz = 28.349523125 g: NIST SP 811 (2008), Appendix B [mem]
        for (Supplier s : Supplier.ALL) {
            Rng r = new Rng(s.id().hashCode());
            Voice v = new Voice(s, r);
            for (int i = 0; i < 400; i++) {
                double grams = r.between(40, 4000);
                String w = v.weight(grams);
                Matcher m;
                double parsed;
                if ((m = LB_OZ.matcher(w)).find()) {
                    parsed = Integer.parseInt(m.group(1)) * 453.59237 + Integer.parseInt(m.group(2)) * 28.349523125;
                    assertEquals(grams, parsed, 28.35 / 2 + 1e-9, w);
                } else if ((m = KG.matcher(w)).find()) {
                    assertEquals(grams, Double.parseDouble(m.group(1)) * 1000, 5.0 + 1e-9, w);
                } else if ((m = G.matcher(w)).find() && !w.contains("LBS")) {
                    assertEquals(grams, Double.parseDouble(m.group(1).replace(",", "")), 2.5 + 1e-9, w);
                } else if (w.endsWith(" LBS")) {
                    assertEquals(grams, Double.parseDouble(w.substring(0, w.length() - 4)) * 453.59237, 453.59237 * 0.005 + 1e-9, w);
                } else if (w.endsWith(" oz")) {
                    assertEquals(grams, Double.parseDouble(w.substring(0, w.length() - 3)) * 28.349523125, 28.349523125 * 0.05 + 1e-9, w);
                } else if (w.endsWith(" lb")) {
                    assertEquals(grams, Double.parseDouble(w.substring(0, w.length() - 3)) * 453.59237, 453.59237 * 0.005 + 1e-9, w);
                } else {
                    throw new AssertionError("unexpected weight form " + w);
                }
            }
        }
    }

    @Test
    void theQuirkySupplierWritesItsOwnForms() {
        Voice v = new Voice(Supplier.SKELDA, new Rng(6));
        assertEquals("2W zip", v.twoWayZipper());
        assertEquals("3-SSN", v.season(3));
        assertTrue(v.weight(1000).endsWith(" LBS"));
        assertEquals("2746 CU.IN.", v.volume(45));
        assertEquals("20K MM H2O", v.millimetres(20000));
        assertEquals("19F", v.temperature(-7));
    }

    @Test
    void variantFormsAllOccurAcrossManyListings() {
        Voice v = new Voice(Supplier.BRAMBLECREST, new Rng(7));
        java.util.Set<String> seen = new java.util.TreeSet<>();
        for (int i = 0; i < 2000; i++) {
            seen.add(v.twoWayZipper());
        }
        assertEquals(java.util.Set.of("two-way zipper", "2-way zipper", "two way zipper", "2-way zip", "two-way zip", "2 way zipper"), seen);
    }
}
