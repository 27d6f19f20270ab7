package dev.sheaf.miner.text;

/**
 * What a {@link Quantity} measures, with the base unit its {@link Quantity#si()} value is stated in.
 *
 * <p>The base units are chosen for this trade, not for SI purity: volume is in litres (pack and bottle
 * sizes are stated in litres, so the base value reads as written), temperature in degrees Celsius,
 * water column in millimetres of water. Every base unit is exact for every unit Sheaf reads, except
 * where a division is unavoidable (°F → °C, minutes → hours, fractions such as ⅓), see {@link Units}.
 */
public enum Dimension {
    /** Mass; base unit kilogram. Units: g, kg, oz, lb (and "2 lb 10 oz" compounds). */
    MASS("kg"),
    /** Length; base unit metre. Units: mm, cm, m, in ("), ft ('), and "5' 10"" compounds. */
    LENGTH("m"),
    /** Volume; base unit litre. Units: mL, cL, L, US fl oz, US gal, cubic inch, cm³. */
    VOLUME("L"),
    /** Temperature; base unit degree Celsius. Units: °C, °F. */
    TEMPERATURE("°C"),
    /** Hydrostatic head (water column); base unit millimetre of water. */
    WATER_COLUMN("mm H2O"),
    /** Down fill power, US method; base unit "FP" (cubic inches per ounce). */
    FILL_POWER("FP"),
    /** Luminous flux; base unit lumen. */
    LUMINOUS_FLUX("lm"),
    /** Duration (burn time, run time); base unit hour. Units: h, min. */
    DURATION("h"),
    /** Yarn linear density; base unit denier (grams per 9000 m). */
    LINEAR_DENSITY("D"),
    /** Person capacity ("2-person", "3P"); base unit person. */
    COUNT("person"),
    /** Season rating ("3-season"); base unit season. */
    SEASONS("season");

    private final String baseUnit;

    Dimension(String baseUnit) {
        this.baseUnit = baseUnit;
    }

    /** The symbol of the unit {@link Quantity#si()} is stated in, as {@link Units#convert} accepts it. */
    public String baseUnit() {
        return baseUnit;
    }
}
