package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Locale;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Unit conversions: the defining factors, the ones derived from them, and misuse. */
class UnitsTest {

    // Exact equality (delta 0) is intended: the expected literal is the double nearest to the exact
    // decimal, which is what Units promises when no division is involved.

    @Test
    void avoirdupoisPoundIsExactlyTheDefinedKilograms() {
        // 1 lb = 0.45359237 kg — NIST SP 811 (2008), Appendix B [mem]
        assertEquals(0.45359237, Units.convert(1, "lb", "kg"), 0.0);
    }

    @Test
    void avoirdupoisOunceIsExactlyTheDefinedGrams() {
        // 1 oz = 28.349523125 g — NIST SP 811 (2008), Appendix B [mem]
        assertEquals(28.349523125, Units.convert(1, "oz", "g"), 0.0);
    }

    @Test
    void inchIsExactlyTwentyFivePointFourMillimetres() {
        // 1 in = 25.4 mm — NIST SP 811 (2008), Appendix B [mem]
        assertEquals(25.4, Units.convert(1, "in", "mm"), 0.0);
    }

    @Test
    void usFluidOunceIsExactlyTheDefinedMillilitres() {
        // 1 US fl oz = 29.5735295625 mL — NIST SP 811 (2008), Appendix B [mem]
        assertEquals(29.5735295625, Units.convert(1, "fl oz", "mL"), 0.0);
    }

    @Test
    void usGallonIsExactlyTheDefinedLitres() {
        // 1 US gal = 3.785411784 L — NIST SP 811 (2008), Appendix B [mem]
        assertEquals(3.785411784, Units.convert(1, "gal", "L"), 0.0);
    }

    @Test
    void cubicInchIsTheCubeOfTwoPointFiveFourCentimetres() {
        // 1 in³ = (2.54 cm)³ = 16.387064 cm³ = 16.387064 mL, from 1 in = 2.54 cm, NIST SP 811 (2008), Appendix B [comp]
        assertEquals(16.387064, Units.convert(1, "in³", "mL"), 0.0);
        assertEquals(16.387064, Units.convert(1, "cubic inches", "cm³"), 0.0);
    }

    @Test
    void derivedFactorsAgreeWithEachOther() {
        // 1 US gal = 231 in³ and = 128 US fl oz; 1 ft = 12 in; 1 lb = 16 oz — from NIST SP 811 (2008), Appendix B [comp]
        assertEquals(231.0, Units.convert(1, "gal", "in³"), 0.0);
        assertEquals(128.0, Units.convert(1, "gal", "fl oz"), 0.0);
        assertEquals(0.3048, Units.convert(1, "ft", "m"), 0.0);
        assertEquals(16.0, Units.convert(1, "lb", "oz"), 0.0);
    }

    @ParameterizedTest(name = "{0} °F = {1} °C")
    @CsvSource({"32, 0", "212, 100", "-40, -40", "14, -10", "50, 10"})
    void fahrenheitToCelsiusFollowsTheDefinition(double f, double c) {
        // t/°C = (t/°F − 32)/1.8 — NIST SP 811 (2008), Appendix B [mem]; these points are exact [comp]
        assertEquals(c, Units.convert(f, "°F", "°C"), 0.0);
        assertEquals(f, Units.convert(c, "°C", "°F"), 0.0);
    }

    @Test
    void aNonTerminatingConversionIsRoundedOnceToTheNearestDouble() {
        // 15 °F = −85/9 °C = −9.444…; the decimal128 quotient is rounded once more to a double.
        assertEquals(-85.0 / 9.0, Units.convert(15, "°F", "°C"), 0.0);
        assertEquals(1.0 / 60.0, Units.convert(1, "min", "h"), 0.0);
    }

    @Test
    void theInputIsReadAsTheDecimalItPrintsAs() {
        // 1.19 kg → lb → kg must come back to 1.19, and 2 lb to 0.90718474 kg exactly: 2 × 0.45359237 — NIST SP 811 (2008), Appendix B [comp]
        assertEquals(0.90718474, Units.convert(2, "pounds", "kilograms"), 0.0);
        double lb = Units.convert(1.19, "kg", "lb");
        assertEquals(1.19, Units.convert(lb, "lb", "kg"), Math.ulp(1.19));
    }

    @Test
    void namesIgnoreCaseDotsAndSpacing() {
        assertEquals(29.5735295625, Units.convert(1, "US fl. oz.", "ml"), 0.0);
        assertEquals(1000.0, Units.convert(1, "LITRE", "mL"), 0.0);
        assertEquals(Optional.of(Dimension.TEMPERATURE), Units.dimensionOf("degF"));
        assertEquals(Optional.of(Dimension.WATER_COLUMN), Units.dimensionOf("mm H₂O"));
        assertEquals(Optional.empty(), Units.dimensionOf("furlong"));
    }

    @Test
    void unitNamesFoldTheSameUnderATurkishDefaultLocale() {
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("tr-TR"));
            // "LITRE", "INCH", "MILLILITERS" contain I, which Turkish lower-cases to dotless ı.
            assertEquals(1000.0, Units.convert(1, "LITRE", "MILLILITERS"), 0.0);
            assertEquals(25.4, Units.convert(1, "INCH", "MM"), 0.0);
            assertEquals(Optional.of(Dimension.TEMPERATURE), Units.dimensionOf("FAHRENHEIT"));
        } finally {
            Locale.setDefault(saved);
        }
    }

    @Test
    void convertingAcrossDimensionsIsMisuse() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Units.convert(1, "kg", "L"));
        assertTrue(e.getMessage().contains("MASS") && e.getMessage().contains("VOLUME"), e.getMessage());
    }

    @Test
    void anUnknownUnitIsNamedInTheMessage() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Units.convert(1, "stone", "kg"));
        assertTrue(e.getMessage().contains("'stone'") && e.getMessage().contains("expected"), e.getMessage());
    }

    @Test
    void aNonFiniteValueIsMisuse() {
        assertThrows(IllegalArgumentException.class, () -> Units.convert(Double.NaN, "kg", "g"));
        assertThrows(IllegalArgumentException.class, () -> Units.convert(Double.POSITIVE_INFINITY, "kg", "g"));
    }

    @Test
    void everyDimensionsBaseUnitIsAKnownUnitOfThatDimension() {
        for (Dimension d : Dimension.values()) {
            assertEquals(Optional.of(d), Units.dimensionOf(d.baseUnit()), d.name());
            assertEquals(7.0, Units.convert(7, d.baseUnit(), d.baseUnit()), 0.0, d.name());
        }
    }
}
