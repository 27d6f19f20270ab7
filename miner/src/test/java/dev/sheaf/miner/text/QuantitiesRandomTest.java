package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Random input never breaks the reader: no exception, offsets inside the text, surfaces equal to the
 * text at the offsets, results in order and not overlapping. The base seed is printed on failure and
 * can be fixed with {@code -Dtests.seed=N} to replay a run.
 */
class QuantitiesRandomTest {
    private static final long SEED = Long.getLong("tests.seed", System.nanoTime());

    /** Characters that exercise the scanner's branches, plus anything from the BMP and some surrogates. */
    private static final String TRICKY = "0123456789.,-–—/⁄ \u00A0\u2009\u202F'\"″′°º˚℃℉~≈½¼¾⅓⅛xX×kKgmLlhDPFC³²\n\t()";
    private static final String[] WORDS = {"kg", "g", "lb", "lbs", "oz", "fl", "fl.", "oz.", "US", "cu", "cubic", "in", "inch",
            "ft", "mm", "H2O", "H₂O", "w.c.", "cm", "m", "L", "mL", "litre", "gal", "fill", "power", "FP", "lm", "lumens",
            "h", "hours", "min", "denier", "D", "person", "P", "season", "two", "three", "deg", "degrees", "F", "C",
            "approx.", "ca.", "about", "~", "to", "x", "long", "the", "waterproof", "comfort", "HH", "1,200", "1,2",
            "10k", "1-1/2", "12/05/2024", "-9", "−9", "Fernhollow's", "\"Ridge", "2\""};

    @Test
    void randomCharactersNeverBreakTheReader() {
        Random r = new Random(SEED);
        for (int iter = 0; iter < 10_000; iter++) {
            int n = r.nextInt(40);
            StringBuilder sb = new StringBuilder(n);
            for (int k = 0; k < n; k++) {
                int pick = r.nextInt(10);
                if (pick < 7) {
                    sb.append(TRICKY.charAt(r.nextInt(TRICKY.length())));
                } else if (pick < 9) {
                    sb.append((char) r.nextInt(0xD800));
                } else {
                    sb.appendCodePoint(0x10000 + r.nextInt(0x1000));
                }
            }
            check(sb.toString(), iter);
        }
    }

    @Test
    void randomUnitSoupNeverBreaksTheReader() {
        Random r = new Random(SEED + 1);
        for (int iter = 0; iter < 10_000; iter++) {
            int n = r.nextInt(12);
            StringBuilder sb = new StringBuilder();
            for (int k = 0; k < n; k++) {
                if (r.nextBoolean()) {
                    sb.append(r.nextInt(5000));
                    if (r.nextInt(3) == 0) {
                        sb.append('.').append(r.nextInt(100));
                    }
                } else {
                    sb.append(WORDS[r.nextInt(WORDS.length)]);
                }
                sb.append(r.nextInt(4) == 0 ? "" : TRICKY.charAt(r.nextInt(TRICKY.length())) + "");
            }
            check(sb.toString(), iter);
        }
    }

    @Test
    void aWrittenValueReadsBackAsTheValueAndItsConversion() {
        // Round-trip property: "<n> <unit>" reads as n, and its base value is Units.convert(n, unit, base).
        String[][] units = {{"kg", "kg"}, {"g", "g"}, {"lb", "lb"}, {"oz", "oz"}, {"mm", "mm"}, {"cm", "cm"}, {"m", "m"},
                {"ft", "ft"}, {"mL", "mL"}, {"L", "L"}, {"fl oz", "fl oz"}, {"gal", "gal"}, {"cu in", "in³"}, {"°F", "°F"},
                {"°C", "°C"}, {"lumens", "lm"}, {"hours", "h"}, {"min", "min"}, {"denier", "D"}};
        Random r = new Random(SEED + 2);
        for (int iter = 0; iter < 3_000; iter++) {
            String[] u = units[r.nextInt(units.length)];
            long whole = r.nextInt(400);
            int frac = r.nextInt(100);
            String number = r.nextBoolean() ? Long.toString(whole) : whole + "." + (frac < 10 ? "0" : "") + frac;
            String text = "about the pack: " + number + " " + u[0] + " in all";
            List<Quantity> found = Quantities.find(text);
            String where = "seed " + SEED + ", text '" + text + "'";
            assertEquals(1, found.size(), where + " " + found);
            Quantity q = found.get(0);
            double v = Double.parseDouble(number);
            assertEquals(v, q.value(), 0.0, where);
            assertEquals(u[1], q.unit(), where);
            assertEquals(Units.convert(v, u[1], q.dimension().baseUnit()), q.si(), 0.0, where);
        }
    }

    private static void check(String text, int iter) {
        List<Quantity> found;
        try {
            found = Quantities.find(text);
            Quantities.parse(text);
            Quantities.parse(text, text);
        } catch (RuntimeException e) {
            throw new AssertionError("seed " + SEED + " iteration " + iter + ": threw on '" + escape(text) + "'", e);
        }
        int last = 0;
        for (Quantity q : found) {
            String where = "seed " + SEED + " iteration " + iter + " text '" + escape(text) + "' quantity " + q;
            if (q.start() < last || q.end() > text.length() || q.end() <= q.start()) {
                fail("offsets out of range or overlapping: " + where);
            }
            assertEquals(text.substring(q.start(), q.end()), q.surface(), where);
            assertTrue(Double.isFinite(q.si()) && q.si() <= q.siMax(), where);
            last = q.end();
        }
    }

    private static String escape(String s) {
        StringBuilder sb = new StringBuilder();
        for (char c : s.toCharArray()) {
            sb.append(c < 0x20 || c > 0x7e ? String.format("\\u%04X", (int) c) : String.valueOf(c));
        }
        return sb.toString();
    }
}
