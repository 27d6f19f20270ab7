package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Quantities in running text and whole spec values: values, units, base values, offsets and surfaces.
 * Texts are invented Fernhollow Outfitters copy; the unit factors they rely on are checked in {@link UnitsTest}.
 */
class QuantitiesTest {

    /** The one quantity in text; fails when there are none or several. */
    private static Quantity only(String text) {
        List<Quantity> found = Quantities.find(text);
        assertEquals(1, found.size(), () -> "expected one quantity in '" + text + "', found " + found);
        Quantity q = found.get(0);
        assertEquals(text.substring(q.start(), q.end()), q.surface(), "surface is the text at the offsets");
        return q;
    }

    private static void assertQuantity(Quantity q, String surface, int start, Dimension dim, String unit, double value, double si) {
        assertEquals(surface, q.surface(), "surface");
        assertEquals(start, q.start(), "start");
        assertEquals(start + surface.length(), q.end(), "end");
        assertEquals(dim, q.dimension(), "dimension");
        assertEquals(unit, q.unit(), "unit");
        assertEquals(value, q.value(), 0.0, "value");
        assertEquals(si, q.si(), Math.ulp(si), "si");
    }

    // ------------------------------------------------------------------ one value, every dimension

    @ParameterizedTest(name = "[{index}] {0}")
    @CsvSource(delimiter = '|', textBlock = """
            Weighs 1.2 kg packed.              | 1.2 kg         | 7  | MASS           | kg     | 1.2     | 1.2
            Only 850 g on the trail            | 850 g          | 5  | MASS           | g      | 850     | 0.85
            A 12 oz mug                        | 12 oz          | 2  | MASS           | oz     | 12      | 0.3401942775
            3 lbs of gear                      | 3 lbs          | 0  | MASS           | lb     | 3       | 1.36077711
            500 grams                          | 500 grams      | 0  | MASS           | g      | 500     | 0.5
            Poles of 8.5 mm                    | 8.5 mm         | 9  | LENGTH         | mm     | 8.5     | 0.0085
            Packs to 45 cm                     | 45 cm          | 9  | LENGTH         | cm     | 45      | 0.45
            A 2 m ridgeline                    | 2 m            | 2  | LENGTH         | m      | 2       | 2
            7 in long                          | 7 in           | 0  | LENGTH         | in     | 7       | 0.1778
            a 12" stuff sack                   | 12"            | 2  | LENGTH         | in     | 12      | 0.3048
            a 6' pole                          | 6'             | 2  | LENGTH         | ft     | 6       | 1.8288
            Cord, 50 feet                      | 50 feet        | 6  | LENGTH         | ft     | 50      | 15.24
            A 20L daypack                      | 20L            | 2  | VOLUME         | L      | 20      | 20
            750 mL bottle                      | 750 mL         | 0  | VOLUME         | mL     | 750     | 0.75
            1.5 litres                         | 1.5 litres     | 0  | VOLUME         | L      | 1.5     | 1.5
            2 liter reservoir                  | 2 liter        | 0  | VOLUME         | L      | 2       | 2
            holds 12 fl oz                     | 12 fl oz       | 6  | VOLUME         | fl oz  | 12      | 0.35488235475
            holds 12 fl. oz.                   | 12 fl. oz      | 6  | VOLUME         | fl oz  | 12      | 0.35488235475
            a 2 gal jug                        | 2 gal          | 2  | VOLUME         | gal    | 2       | 7.570823568
            2000 cu in main bag                | 2000 cu in     | 0  | VOLUME         | in³    | 2000    | 32.774128
            2,400 cubic inches                 | 2,400 cubic inches | 0 | VOLUME       | in³    | 2400    | 39.3289536
            1800 in³                           | 1800 in³       | 0  | VOLUME         | in³    | 1800    | 29.4967152
            15°F comfort                       | 15°F           | 0  | TEMPERATURE    | °F     | 15      | -9.444444444444445
            limit -9 °C                        | -9 °C          | 6  | TEMPERATURE    | °C     | -9      | -9
            rated to 20 degrees F              | 20 degrees F   | 9  | TEMPERATURE    | °F     | 20      | -6.666666666666667
            3000 mm H2O                        | 3000 mm H2O    | 0  | WATER_COLUMN   | mm H2O | 3000    | 3000
            Fly: 10,000 mm waterproof          | 10,000 mm      | 5  | WATER_COLUMN   | mm H2O | 10000   | 10000
            rated 1,500 mm HH                  | 1,500 mm       | 6  | WATER_COLUMN   | mm H2O | 1500    | 1500
            a 10k mm fly                       | 10k mm         | 2  | WATER_COLUMN   | mm H2O | 10000   | 10000
            800-fill down                      | 800-fill       | 0  | FILL_POWER     | FP     | 800     | 800
            850 fill power goose down          | 850 fill power | 0  | FILL_POWER     | FP     | 850     | 850
            down, FP 700                       | FP 700         | 6  | FILL_POWER     | FP     | 700     | 700
            300 lumens max                     | 300 lumens     | 0  | LUMINOUS_FLUX  | lm     | 300     | 300
            a 400lm headlamp                   | 400lm          | 2  | LUMINOUS_FLUX  | lm     | 400     | 400
            burns 40 hours                     | 40 hours       | 6  | DURATION       | h      | 40      | 40
            boils in 3.5 min                   | 3.5 min        | 9  | DURATION       | min    | 3.5     | 0.058333333333333334
            20D ripstop                        | 20D            | 0  | LINEAR_DENSITY | D      | 20      | 20
            70 denier floor                    | 70 denier      | 0  | LINEAR_DENSITY | D      | 70      | 70
            a 2-person tent                    | 2-person       | 2  | COUNT          | person | 2       | 2
            the 3P model                       | 3P             | 4  | COUNT          | person | 3       | 3
            a two-person shelter               | two-person     | 2  | COUNT          | person | 2       | 2
            a 3-season tent                    | 3-season       | 2  | SEASONS        | season | 3       | 3
            a Three Season bag                 | Three Season   | 2  | SEASONS        | season | 3       | 3
            """)
    void readsOneQuantity(String text, String surface, int start, Dimension dim, String unit, double value, double si) {
        assertQuantity(only(text), surface, start, dim, unit, value, si);
    }

    // ------------------------------------------------------------------ number forms

    @ParameterizedTest(name = "[{index}] {0}")
    @CsvSource(delimiter = '|', textBlock = """
            1,200 g         | 1200
            10,000 mm H2O   | 10000
            1,234,567 g     | 1234567
            1,200.5 g       | 1200.5
            ½ L             | 0.5
            1/2 in          | 0.5
            3/8 in          | 0.375
            1½ in           | 1.5
            1 ½ in          | 1.5
            1-1/2 in        | 1.5
            1 1/2 in        | 1.5
            0.75 L          | 0.75
            """)
    void readsNumberForms(String text, double value) {
        Quantity q = only(text);
        assertEquals(value, q.value(), 0.0);
        assertEquals(0, q.start());
        assertEquals(text.length(), q.end());
    }

    @Test
    void readsThinAndNoBreakSpacesAsThousandsSeparators() {
        for (char sep : new char[] {'\u2009', '\u202F', '\u00A0'}) {
            String text = "weighs 1" + sep + "200 g";
            Quantity q = only(text);
            assertEquals(1200.0, q.value(), 0.0, "separator U+" + Integer.toHexString(sep));
            assertEquals(7, q.start());
            assertEquals(text.length(), q.end());
        }
    }

    @Test
    void readsAThirdToTheNearestDouble() {
        Quantity q = only("⅓ cup of water, ⅓ L");
        assertEquals(1.0 / 3.0, q.value(), 0.0);
        assertEquals("⅓ L", q.surface());
    }

    // ------------------------------------------------------------------ decimal commas and other refusals

    @ParameterizedTest(name = "[{index}] {0}")
    @ValueSource(strings = {
            "1,2 kg", "1,5 L", "weighs 0,85 kg", "1,2345 kg", "1.200,5 kg", "12,34,567 g", "1.2.3 kg",
            "fits 2 in the bag", "a 2-in-1 jacket", "2 in 1", "the \"Ridge 2\" tent", "3D mesh", "Size 10 C",
            "a 10K run", "10,000 mAh", "70 g/m² fabric", "2 m² of floor", "X200 g", "12/05/2024 kg",
            "the 1.2", "2 great", "9 seasons", "5 fill", "FP 80", "13P", "2 p", "20 D", "model v1.2 kg", ".5 kg",
            "" })
    void findsNoQuantityWhereNoneIsStatedOrTheNotationIsAmbiguous(String text) {
        assertEquals(List.of(), Quantities.find(text));
    }

    @Test
    void aDecimalCommaIsNotReadAsAnyQuantityNotEvenItsLastDigits() {
        // "1,2 kg" must not silently become 1.2 kg, nor "2 kg" read from after the comma.
        assertEquals(List.of(), Quantities.find("Gewicht 1,2 kg"));
        assertEquals(Optional.empty(), Quantities.parse("1,2 kg"));
        // A comma followed by exactly three digits is a thousands separator in an English catalog.
        assertEquals(1200.0, only("1,200 g").value(), 0.0);
    }

    @Test
    void readsTheSameUnderGermanAndTurkishDefaultLocales() {
        Locale saved = Locale.getDefault();
        try {
            for (Locale l : new Locale[] {Locale.GERMANY, Locale.forLanguageTag("tr-TR")}) {
                Locale.setDefault(l);
                assertEquals(1.2, only("1.2 kg").value(), 0.0, l.toString());
                assertEquals(1200.0, only("1,200 g").value(), 0.0, l.toString());
                assertEquals(List.of(), Quantities.find("1,2 kg"), l.toString());
                // Upper-case units with I: Turkish lower-cases I to dotless ı unless Locale.ROOT is used.
                assertQuantity(only("1.5 LITRES"), "1.5 LITRES", 0, Dimension.VOLUME, "L", 1.5, 1.5);
                assertQuantity(only("5 INCHES"), "5 INCHES", 0, Dimension.LENGTH, "in", 5, 0.127);
                assertQuantity(only("20 MILLILITERS"), "20 MILLILITERS", 0, Dimension.VOLUME, "mL", 20, 0.02);
                assertEquals(Dimension.FILL_POWER, only("800 FILL POWER").dimension(), l.toString());
                assertEquals(Dimension.WATER_COLUMN, Quantities.parse("WATERPROOF RATING", "3000 MM").orElseThrow().dimension());
            }
        } finally {
            Locale.setDefault(saved);
        }
    }

    // ------------------------------------------------------------------ compounds: one axis per dimension

    @Test
    void aPoundsAndOuncesCompoundLandsOnTheSameAxisAsKilograms() {
        Quantity imperial = only("Trail weight 2 lb 10 oz");
        Quantity metric = only("Trail weight 1.19 kg");
        assertQuantity(imperial, "2 lb 10 oz", 13, Dimension.MASS, "oz", 42, 1.19067997125);
        // 2 × 0.45359237 + 10 × 0.028349523125 = 1.19067997125 kg exactly — NIST SP 811 (2008), Appendix B [comp]
        assertEquals(1.19067997125, imperial.si(), 0.0);
        assertEquals(1.19, metric.si(), 0.0);
        assertEquals(imperial.dimension(), metric.dimension());
        assertEquals(0.00067997125, imperial.si() - metric.si(), 1e-15);
    }

    @Test
    void readsPoundsAndOuncesWrittenWithDots() {
        Quantity q = only("Weight: 1 lb. 4 oz.");
        // the sentence-final dot is left out of the span; the dot between lb and oz is inside it
        assertQuantity(q, "1 lb. 4 oz", 8, Dimension.MASS, "oz", 20, 0.5669904625);
    }

    @Test
    void readsFeetAndInchesCompounds() {
        assertQuantity(only("fits sleepers to 5' 10\""), "5' 10\"", 17, Dimension.LENGTH, "in", 70, 1.778);
        assertQuantity(only("6 ft 2 in tall"), "6 ft 2 in", 0, Dimension.LENGTH, "in", 74, 1.8796);
    }

    // ------------------------------------------------------------------ ranges, approximations, lists

    @Test
    void readsARangeWithBothEnds() {
        Quantity q = only("weighs 1.1–1.3 kg by size");
        assertEquals("1.1–1.3 kg", q.surface());
        assertEquals(7, q.start());
        assertEquals(1.1, q.value(), 0.0);
        assertEquals(1.3, q.valueMax(), 0.0);
        assertEquals(1.1, q.si(), 0.0);
        assertEquals(1.3, q.siMax(), 0.0);
        assertTrue(q.isRange());
    }

    @ParameterizedTest(name = "[{index}] {0}")
    @CsvSource(delimiter = '|', textBlock = """
            expands 20-25 L      | 20-25 L      | 20 | 25
            expands 20 to 25 L   | 20 to 25 L   | 20 | 25
            for 2-3 persons      | 2-3 persons  | 2  | 3
            a 3-4 season shell   | 3-4 season   | 3  | 4
            rated -9 to -2 °C    | -9 to -2 °C  | -9 | -2
            """)
    void readsRangeForms(String text, String surface, double lo, double hi) {
        Quantity q = only(text);
        assertEquals(surface, q.surface());
        assertEquals(text.indexOf(surface), q.start());
        assertEquals(lo, q.value(), 0.0);
        assertEquals(hi, q.valueMax(), 0.0);
    }

    @Test
    void aFahrenheitRangeConvertsBothEnds() {
        Quantity q = only("comfort 32–50 °F");
        assertEquals(0.0, q.si(), 0.0);
        assertEquals(10.0, q.siMax(), 0.0);
    }

    @ParameterizedTest(name = "[{index}] {0}")
    @CsvSource(delimiter = '|', textBlock = """
            approx. 1.2 kg        | approx. 1.2 kg
            ~1.2 kg               | ~1.2 kg
            ca. 600 g             | ca. 600 g
            about 600 g           | about 600 g
            Approximately 2 L     | Approximately 2 L
            """)
    void anApproximationMarkerIsPartOfTheSpanAndFlagged(String text, String surface) {
        Quantity q = only(text);
        assertEquals(surface, q.surface());
        assertTrue(q.approximate());
    }

    @Test
    void aPlainValueIsNotApproximate() {
        assertFalse(only("weighs 1.2 kg").approximate());
    }

    @Test
    void findsEveryQuantityInRunningTextInOrder() {
        String text = "The Fernhollow Ridgeline 2 is a 2-person, 3-season tent: 1.19 kg (2 lb 10 oz) packed, "
                + "a 20D fly rated 3,000 mm waterproof, and 84 x 52 x 40 in inside.";
        List<Quantity> found = Quantities.find(text);
        String[] surfaces = {"2-person", "3-season", "1.19 kg", "2 lb 10 oz", "20D", "3,000 mm", "84", "52", "40 in"};
        Dimension[] dims = {Dimension.COUNT, Dimension.SEASONS, Dimension.MASS, Dimension.MASS, Dimension.LINEAR_DENSITY,
                Dimension.WATER_COLUMN, Dimension.LENGTH, Dimension.LENGTH, Dimension.LENGTH};
        assertEquals(surfaces.length, found.size(), found::toString);
        int from = 0;
        for (int k = 0; k < surfaces.length; k++) {
            Quantity q = found.get(k);
            int at = text.indexOf(surfaces[k], from);
            assertEquals(surfaces[k], q.surface(), "surface " + k);
            assertEquals(at, q.start(), "start " + k);
            assertEquals(at + surfaces[k].length(), q.end(), "end " + k);
            assertEquals(dims[k], q.dimension(), "dimension " + k);
            from = q.end();
        }
        assertEquals(2.1336, found.get(6).si(), 0.0);   // 84 in = 84 × 0.0254 m
    }

    // ------------------------------------------------------------------ ambiguous spellings

    @Test
    void readsTheDualFahrenheitCelsiusStatement() {
        List<Quantity> found = Quantities.find("Comfort 15 F / -9 C");
        assertEquals(2, found.size(), found::toString);
        assertQuantity(found.get(0), "15 F", 8, Dimension.TEMPERATURE, "°F", 15, -85.0 / 9.0);
        assertQuantity(found.get(1), "-9 C", 15, Dimension.TEMPERATURE, "°C", -9, -9);
        // the same without a cue word: each half vouches for the other
        assertEquals(2, Quantities.find("15 F (-9 C)").size());
        assertEquals(2, Quantities.find("15°F / -9°C").size());
    }

    @Test
    void aBareLetterIsATemperatureOnlyWithACueOrAPartner() {
        assertEquals(List.of(), Quantities.find("Size 10 C"));
        assertEquals(Dimension.TEMPERATURE, only("lower limit 10 C").dimension());
        assertEquals(Dimension.TEMPERATURE, Quantities.parse("Comfort rating", "15 F").orElseThrow().dimension());
        assertEquals(Optional.empty(), Quantities.parse("Width", "10 C"));
    }

    @Test
    void millimetresAreAWaterColumnWithACueASuffixTheThousandsFormOrFromFiveMetres() {
        assertEquals(Dimension.LENGTH, only("a 2,100 mm inner").dimension());
        assertEquals(Dimension.WATER_COLUMN, only("a 10,000 mm fly").dimension(), "nobody writes a 10 m length in mm");
        assertEquals(Dimension.LENGTH, only("ridge length 6000 mm").dimension(), "unless a length cue says so");
        assertEquals(Dimension.LENGTH, Quantities.parse("Length", "6000 mm").orElseThrow().dimension());
        assertEquals(Dimension.WATER_COLUMN, Quantities.parse("10,000 mm").orElseThrow().dimension());
        assertEquals(Dimension.WATER_COLUMN, only("10,000 mm HH").dimension());
        assertEquals(Dimension.WATER_COLUMN, only("hydrostatic head of 1,500 mm").dimension());
        // a cue nearby does not turn a pole diameter into a rating: cue-only water columns start at 500 mm
        assertEquals(Dimension.LENGTH, only("8.5 mm poles, waterproof fly").dimension());
        assertEquals(Dimension.WATER_COLUMN, Quantities.parse("Hydrostatic head", "3000 mm").orElseThrow().dimension());
        assertEquals(Dimension.LENGTH, Quantities.parse("Length", "3000 mm").orElseThrow().dimension());
    }

    @Test
    void inchMarksInsideAQuotationAreNotInches() {
        assertEquals(List.of(), Quantities.find("the \"Ridge 2\" tent"));
        List<Quantity> found = Quantities.find("Packs to 7\" x 4\"");
        assertEquals(2, found.size(), found::toString);
        assertEquals("7\"", found.get(0).surface());
        assertEquals("4\"", found.get(1).surface());
        assertEquals("6'", only("Fernhollow's 6' pole").surface());
    }

    @Test
    void inIsTheInchOnlyWhereThePrepositionCannotBe() {
        assertEquals(List.of(), Quantities.find("fits 2 in the bag"));
        assertEquals("7 in", only("7 in long").surface());
        assertEquals("7 in", only("packs to 7 in.").surface());
        assertEquals("7 in", only("(7 in)").surface());
        assertEquals("7 in", only("7 in x 4").surface());
    }

    @Test
    void ozAloneIsMassAndFlOzIsVolume() {
        assertEquals(Dimension.MASS, only("8 oz").dimension());
        assertEquals(Dimension.VOLUME, only("8 fl oz").dimension());
        assertEquals(Dimension.VOLUME, only("8 US fl oz").dimension());
        assertEquals("8 US fl oz", only("8 US fl oz").surface());
    }

    // ------------------------------------------------------------------ whole spec values

    @Test
    void parsesAWholeSpecValue() {
        Quantity q = Quantities.parse("2 lb 10 oz").orElseThrow();
        assertQuantity(q, "2 lb 10 oz", 0, Dimension.MASS, "oz", 42, 1.19067997125);
        assertEquals(1.2, Quantities.parse("  1.2 kg ").orElseThrow().si(), 0.0);
        assertEquals(2, Quantities.parse("  1.2 kg ").orElseThrow().start(), "offsets are into the value as given");
    }

    @Test
    void parsesAValueStatedInTwoUnitsAsItsFirstStatement() {
        Quantity q = Quantities.parse("1.19 kg (2 lb 10 oz)").orElseThrow();
        assertEquals("1.19 kg", q.surface());
        assertEquals(Dimension.TEMPERATURE, Quantities.parse("15°F / -9°C").orElseThrow().dimension());
        assertEquals(15.0, Quantities.parse("15°F / -9°C").orElseThrow().value(), 0.0);
    }

    @Test
    void aTrailingApproximationWordMarksTheParsedValue() {
        Quantity q = Quantities.parse("1.2 kg (approx.)").orElseThrow();
        assertTrue(q.approximate());
        assertEquals("1.2 kg", q.surface());
    }

    @ParameterizedTest(name = "[{index}] {0}")
    @ValueSource(strings = {"about 2 kg packed", "2-person, 1.8 kg", "84 x 52 x 40 in", "Nylon", "", "   ",
            "1,2 kg", "2 kg and more", "kg 2"})
    void aValueThatIsNotOneQuantityParsesToEmpty(String value) {
        assertEquals(Optional.empty(), Quantities.parse(value));
    }

    @Test
    void theResultListIsImmutable() {
        List<Quantity> found = Quantities.find("1 kg");
        org.junit.jupiter.api.Assertions.assertThrows(UnsupportedOperationException.class, () -> found.add(found.get(0)));
    }
}
