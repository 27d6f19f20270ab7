package dev.sheaf.miner.text;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Objects;
import java.util.Optional;

/**
 * Unit conversions with the exact factors of NIST SP 811 (2008), Appendix B: 1 lb = 0.45359237 kg,
 * 1 oz = 28.349523125 g, 1 in = 25.4 mm, 1 US fl oz = 29.5735295625 mL, 1 US gal = 3.785411784 L,
 * and those derived from them exactly (1 ft = 0.3048 m, 1 in³ = 16.387064 mL).
 *
 * <p><b>Rounding.</b> The input double is read as the shortest decimal that prints as it
 * ({@link BigDecimal#valueOf(double)}: 1.19 is 1.19, not its binary neighbour). The conversion is then
 * done in exact decimal arithmetic, with at most one division rounded to 34 significant digits
 * (IEEE 754 decimal128, half-even) when the factors need one (°F ↔ °C, min ↔ h, kg → lb ...), and the
 * result is the double nearest to that decimal. Conversions whose exact result has a short decimal
 * expansion (2 lb → 0.90718474 kg) are therefore correctly rounded.
 *
 * <p>Units are named by their symbol ({@code "kg"}, {@code "fl oz"}, {@code "in³"}, {@code "°F"},
 * {@code "mm H2O"}) or a common spelling ({@code "pounds"}, {@code "litre"}, {@code "in3"},
 * {@code "degF"}); case, dots and extra spaces are ignored.
 */
public final class Units {
    private Units() {
    }

    /**
     * Converts {@code value} from one unit to another of the same {@link Dimension}.
     *
     * @return the converted value (infinite only if it exceeds the double range)
     * @throws IllegalArgumentException if a unit is unknown, the dimensions differ, or value is not finite
     */
    public static double convert(double value, String from, String to) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("value to convert must be finite, got " + value);
        }
        UnitDef f = require(from, "from");
        UnitDef t = require(to, "to");
        if (f.dimension() != t.dimension()) {
            throw new IllegalArgumentException("cannot convert " + f.symbol() + " (" + f.dimension() + ") to "
                    + t.symbol() + " (" + t.dimension() + "): pick two units of the same dimension");
        }
        return convertExact(BigDecimal.valueOf(value), f, t).doubleValue();
    }

    /** The dimension a unit name belongs to, or empty when Sheaf does not know the unit. */
    public static Optional<Dimension> dimensionOf(String unit) {
        UnitDef u = UnitTable.named(Objects.requireNonNull(unit, "unit"));
        return u == null ? Optional.empty() : Optional.of(u.dimension());
    }

    /** x_to = (x − off_f)·mul_f·div_t / (div_f·mul_t) + off_t, with the single division rounded to DECIMAL128. */
    static BigDecimal convertExact(BigDecimal value, UnitDef f, UnitDef t) {
        BigDecimal numerator = value.subtract(f.offset()).multiply(f.mul()).multiply(t.div());
        BigDecimal denominator = f.div().multiply(t.mul());
        BigDecimal q = denominator.compareTo(BigDecimal.ONE) == 0 ? numerator : numerator.divide(denominator, MathContext.DECIMAL128);
        return q.add(t.offset());
    }

    private static UnitDef require(String unit, String role) {
        Objects.requireNonNull(unit, role);
        UnitDef u = UnitTable.named(unit);
        if (u == null) {
            throw new IllegalArgumentException("unknown unit '" + unit + "' (" + role + "); expected a symbol such as "
                    + "kg, g, lb, oz, m, cm, mm, in, ft, L, mL, fl oz, gal, in³, °C, °F, mm H2O, FP, lm, h, min, D, person, season");
        }
        return u;
    }
}
