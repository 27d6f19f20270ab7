package dev.sheaf.miner.text;

import java.util.Objects;

/**
 * A quantity with a unit, found in text: "1.2 kg", "2 lb 10 oz", "20–25 L", "15°F", "800-fill".
 *
 * <p>Offsets are 0-based UTF-16 char offsets into the scanned text, end exclusive, and
 * {@code surface} is exactly {@code text.substring(start, end)}. The span includes an approximation
 * marker ("~", "approx.", "ca.", "about") and a minus sign when they belong to the quantity.
 *
 * <p>A single value has {@code valueMax == value} and {@code siMax == si}; a range ("1.1–1.3 kg")
 * has its lower end in {@code value}/{@code si} and its upper end in {@code valueMax}/{@code siMax}.
 * A compound ("2 lb 10 oz", "5' 10"") is stated in its smaller unit (42 oz, 70 in).
 *
 * @param value       the number as written (lower end of a range), in {@code unit}
 * @param dimension   what is measured
 * @param unit        the canonical unit symbol ({@code "kg"}, {@code "fl oz"}, {@code "°F"} ...), as {@link Units#convert} accepts it
 * @param si          {@code value} in the dimension's base unit ({@link Dimension#baseUnit()}): the double nearest to the
 *                    exact value, computed from the number as written and the exact unit factors (docs/decisions/060)
 * @param start       offset of the first char
 * @param end         offset after the last char
 * @param surface     the text as written
 * @param valueMax    upper end of a range, else {@code value}
 * @param siMax       upper end of a range in the base unit, else {@code si}
 * @param approximate true when the text marks the value as approximate
 */
public record Quantity(double value, Dimension dimension, String unit, double si, int start, int end, String surface,
                       double valueMax, double siMax, boolean approximate) {
    public Quantity {
        Objects.requireNonNull(dimension, "dimension");
        Objects.requireNonNull(unit, "unit");
        Objects.requireNonNull(surface, "surface");
        if (unit.isBlank()) {
            throw new IllegalArgumentException("a quantity needs a unit symbol, got a blank one");
        }
        if (!Double.isFinite(value) || !Double.isFinite(valueMax) || !Double.isFinite(si) || !Double.isFinite(siMax)) {
            throw new IllegalArgumentException("quantity values must be finite, got " + value + ".." + valueMax
                    + " " + unit + " (" + si + ".." + siMax + " " + dimension.baseUnit() + ")");
        }
        if (valueMax < value || siMax < si) {
            throw new IllegalArgumentException("a range must run from low to high, got " + value + ".." + valueMax + " " + unit);
        }
        if (start < 0 || end < start) {
            throw new IllegalArgumentException("quantity span must satisfy 0 <= start <= end, got " + start + ".." + end);
        }
        if (surface.length() != end - start) {
            throw new IllegalArgumentException("surface '" + surface + "' has " + surface.length()
                    + " chars but the span " + start + ".." + end + " has " + (end - start));
        }
    }

    /** A single value (not a range), not marked approximate. */
    public Quantity(double value, Dimension dimension, String unit, double si, int start, int end, String surface) {
        this(value, dimension, unit, si, start, end, surface, value, si, false);
    }

    /** True when the text states a range ("20-25 L"). */
    public boolean isRange() {
        return valueMax != value;
    }
}
