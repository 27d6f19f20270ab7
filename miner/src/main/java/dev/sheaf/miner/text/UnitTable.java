package dev.sheaf.miner.text;

import java.math.BigDecimal;
import java.text.Normalizer;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * The units Sheaf reads, their factors and the spellings that name them.
 *
 * <p>Factors marked NIST are exact by definition, NIST SP 811 (2008), Appendix B [mem]; the others
 * are derived from them exactly (ft = 12 in, in³ = (2.54 cm)³, ...) [comp], or are SI prefixes.
 */
final class UnitTable {
    static final UnitDef GRAM = UnitDef.linear("g", Dimension.MASS, "0.001");
    static final UnitDef KILOGRAM = UnitDef.linear("kg", Dimension.MASS, "1");
    /** NIST: 1 oz (avoirdupois) = 28.349523125 g. */
    static final UnitDef OUNCE = UnitDef.linear("oz", Dimension.MASS, "0.028349523125");
    /** NIST: 1 lb (avoirdupois) = 0.45359237 kg. */
    static final UnitDef POUND = UnitDef.linear("lb", Dimension.MASS, "0.45359237");

    static final UnitDef MILLIMETRE = UnitDef.linear("mm", Dimension.LENGTH, "0.001");
    static final UnitDef CENTIMETRE = UnitDef.linear("cm", Dimension.LENGTH, "0.01");
    static final UnitDef METRE = UnitDef.linear("m", Dimension.LENGTH, "1");
    /** NIST: 1 in = 2.54 cm. */
    static final UnitDef INCH = UnitDef.linear("in", Dimension.LENGTH, "0.0254");
    /** 1 ft = 12 in = 0.3048 m [comp]. */
    static final UnitDef FOOT = UnitDef.linear("ft", Dimension.LENGTH, "0.3048");

    static final UnitDef MILLILITRE = UnitDef.linear("mL", Dimension.VOLUME, "0.001");
    static final UnitDef CENTILITRE = UnitDef.linear("cL", Dimension.VOLUME, "0.01");
    static final UnitDef LITRE = UnitDef.linear("L", Dimension.VOLUME, "1");
    /** NIST: 1 US fluid ounce = 29.5735295625 mL. */
    static final UnitDef FLUID_OUNCE = UnitDef.linear("fl oz", Dimension.VOLUME, "0.0295735295625");
    /** NIST: 1 US gallon = 3.785411784 L. */
    static final UnitDef GALLON = UnitDef.linear("gal", Dimension.VOLUME, "3.785411784");
    /** 1 in³ = (2.54 cm)³ = 16.387064 mL exactly [comp]. */
    static final UnitDef CUBIC_INCH = UnitDef.linear("in³", Dimension.VOLUME, "0.016387064");
    static final UnitDef CUBIC_CENTIMETRE = UnitDef.linear("cm³", Dimension.VOLUME, "0.001");

    static final UnitDef CELSIUS = UnitDef.linear("°C", Dimension.TEMPERATURE, "1");
    /** °C = (°F − 32) × 5/9 (the division rounds to 34 digits). */
    static final UnitDef FAHRENHEIT = new UnitDef("°F", Dimension.TEMPERATURE,
            BigDecimal.valueOf(5), BigDecimal.valueOf(9), BigDecimal.valueOf(32));

    static final UnitDef MM_WATER = UnitDef.linear("mm H2O", Dimension.WATER_COLUMN, "1");
    static final UnitDef FILL_POWER = UnitDef.linear("FP", Dimension.FILL_POWER, "1");
    static final UnitDef LUMEN = UnitDef.linear("lm", Dimension.LUMINOUS_FLUX, "1");
    static final UnitDef HOUR = UnitDef.linear("h", Dimension.DURATION, "1");
    /** 1 min = 1/60 h (the division rounds to 34 digits). */
    static final UnitDef MINUTE = new UnitDef("min", Dimension.DURATION, BigDecimal.ONE, BigDecimal.valueOf(60), BigDecimal.ZERO);
    static final UnitDef DENIER = UnitDef.linear("D", Dimension.LINEAR_DENSITY, "1");
    static final UnitDef PERSON = UnitDef.linear("person", Dimension.COUNT, "1");
    static final UnitDef SEASON = UnitDef.linear("season", Dimension.SEASONS, "1");

    /**
     * Spellings the scanner accepts as a whole unit word after a number, lower-cased (ASCII).
     * Case-sensitive one-letter forms (g, m, h, L/l, D, P, F, C) and multi-word forms (fl oz,
     * cu in, deg F, fill power, mm H2O) are handled in {@link QuantityScanner}.
     */
    private static final Map<String, UnitDef> WORDS = new HashMap<>();
    /** Everything {@link Units#convert} accepts, keyed by {@link #key}. */
    private static final Map<String, UnitDef> NAMES = new LinkedHashMap<>();

    static {
        word(GRAM, "gram", "grams", "gramme", "grammes");
        word(KILOGRAM, "kg", "kgs", "kilo", "kilos", "kilogram", "kilograms", "kilogramme", "kilogrammes");
        word(OUNCE, "oz", "ounce", "ounces");
        word(POUND, "lb", "lbs", "pound", "pounds");
        word(MILLIMETRE, "mm", "millimeter", "millimeters", "millimetre", "millimetres");
        word(CENTIMETRE, "cm", "centimeter", "centimeters", "centimetre", "centimetres");
        word(METRE, "meter", "meters", "metre", "metres");
        word(INCH, "in", "inch", "inches");
        word(FOOT, "ft", "foot", "feet");
        word(MILLILITRE, "ml", "milliliter", "milliliters", "millilitre", "millilitres");
        word(CENTILITRE, "cl", "centiliter", "centiliters", "centilitre", "centilitres");
        word(LITRE, "liter", "liters", "litre", "litres", "ltr");
        word(GALLON, "gal", "gals", "gallon", "gallons");
        word(CUBIC_INCH, "ci");
        word(CUBIC_CENTIMETRE, "cc");
        word(FILL_POWER, "fp");
        word(LUMEN, "lm", "lumen", "lumens");
        word(HOUR, "hr", "hrs", "hour", "hours");
        word(MINUTE, "min", "mins", "minute", "minutes");
        word(DENIER, "denier");
        word(PERSON, "person", "persons", "people");
        word(SEASON, "season", "seasons");

        for (Map.Entry<String, UnitDef> e : WORDS.entrySet()) {
            NAMES.put(key(e.getKey()), e.getValue());
        }
        for (UnitDef u : new UnitDef[] {GRAM, KILOGRAM, OUNCE, POUND, MILLIMETRE, CENTIMETRE, METRE, INCH, FOOT,
                MILLILITRE, CENTILITRE, LITRE, FLUID_OUNCE, GALLON, CUBIC_INCH, CUBIC_CENTIMETRE, CELSIUS, FAHRENHEIT,
                MM_WATER, FILL_POWER, LUMEN, HOUR, MINUTE, DENIER, PERSON, SEASON}) {
            NAMES.put(key(u.symbol()), u);
        }
        name(LITRE, "l");
        name(GRAM, "g");
        name(HOUR, "h");
        name(FLUID_OUNCE, "floz", "fluid ounce", "fluid ounces", "us fl oz");
        name(CUBIC_INCH, "in3", "cu in", "cubic inch", "cubic inches");
        name(CUBIC_CENTIMETRE, "cm3");
        name(CELSIUS, "c", "degc", "deg c", "celsius");
        name(FAHRENHEIT, "f", "degf", "deg f", "fahrenheit");
        name(MM_WATER, "mm h2o", "mmh2o", "mm w.c.");
        name(DENIER, "d");
    }

    private UnitTable() {
    }

    private static void word(UnitDef unit, String... spellings) {
        for (String s : spellings) {
            WORDS.put(s, unit);
        }
    }

    private static void name(UnitDef unit, String... spellings) {
        for (String s : spellings) {
            NAMES.put(key(s), unit);
        }
    }

    /** The unit a lower-cased ASCII word names, or null. */
    static UnitDef word(String lowerWord) {
        return WORDS.get(lowerWord);
    }

    /** The unit a symbol or spelling names (case, dots and spacing ignored), or null. */
    static UnitDef named(String name) {
        return NAMES.get(key(name));
    }

    /** Folds a unit name for lookup: NFKC (so ³ is 3, ℃ is °C), ROOT lower case, no dots, single spaces, º/˚ as °. */
    static String key(String name) {
        String s = Normalizer.normalize(name, Normalizer.Form.NFKC).toLowerCase(Locale.ROOT)
                .replace('º', '°').replace('˚', '°').replace(".", "").replace('₂', '2')
                .trim().replaceAll("\\s+", " ");
        if (s.startsWith("°")) {
            s = s.substring(1).trim();
        }
        return s;
    }
}
