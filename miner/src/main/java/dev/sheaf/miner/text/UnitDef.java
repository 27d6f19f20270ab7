package dev.sheaf.miner.text;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Objects;

/**
 * One unit: its canonical symbol, its dimension and its exact affine map to the dimension's base
 * unit, {@code base = (value - offset) * mul / div}. {@code mul}, {@code div} and {@code offset} are
 * exact decimals; in decimal arithmetic only the division can round (to {@link MathContext#DECIMAL128},
 * 34 digits, half-even).
 */
final class UnitDef {
    private final String symbol;
    private final Dimension dimension;
    private final BigDecimal mul;
    private final BigDecimal div;
    private final BigDecimal offset;
    /** The same map in longs for the hot path: mul unscaled, 10^mulScale × div, integer offset; null if they do not fit. */
    private final long[] fast;

    UnitDef(String symbol, Dimension dimension, BigDecimal mul, BigDecimal div, BigDecimal offset) {
        this.symbol = Objects.requireNonNull(symbol, "symbol");
        this.dimension = Objects.requireNonNull(dimension, "dimension");
        this.mul = Objects.requireNonNull(mul, "mul");
        this.div = Objects.requireNonNull(div, "div");
        this.offset = Objects.requireNonNull(offset, "offset");
        if (mul.signum() <= 0 || div.signum() <= 0) {
            throw new IllegalArgumentException("unit " + symbol + " needs a positive factor, got " + mul + "/" + div);
        }
        this.fast = computeFast();
    }

    static UnitDef linear(String symbol, Dimension dimension, String factorToBase) {
        return new UnitDef(symbol, dimension, new BigDecimal(factorToBase), BigDecimal.ONE, BigDecimal.ZERO);
    }

    String symbol() {
        return symbol;
    }

    Dimension dimension() {
        return dimension;
    }

    BigDecimal mul() {
        return mul;
    }

    BigDecimal div() {
        return div;
    }

    BigDecimal offset() {
        return offset;
    }

    /** The value in the base unit: exact unless {@code div} is not 1. */
    BigDecimal toBase(BigDecimal value) {
        BigDecimal shifted = offset.signum() == 0 ? value : value.subtract(offset);
        BigDecimal scaled = shifted.multiply(mul);
        return div.compareTo(BigDecimal.ONE) == 0 ? scaled : scaled.divide(div, MathContext.DECIMAL128);
    }

    /**
     * The base value of an exact rational as the nearest double: {@code (num − offset·den)·mul / (den·div)}
     * computed in longs and divided once when both sides are exact doubles (|N|, D ≤ 2^53), which IEEE 754
     * rounds correctly; otherwise through {@link #toBase(BigDecimal)} (34-digit intermediate, then nearest double).
     */
    double toBaseDouble(QuantityValue v) {
        if (fast != null) {
            try {
                long n = fast[2] == 0 ? v.num : Math.subtractExact(v.num, Math.multiplyExact(fast[2], v.den));
                long top = Math.multiplyExact(n, fast[0]);
                long bottom = Math.multiplyExact(v.den, fast[1]);
                if (Math.abs(top) <= QuantityValue.EXACT && bottom <= QuantityValue.EXACT) {
                    return (double) top / (double) bottom;
                }
            } catch (ArithmeticException overflow) {
                // fall through to the decimal path
            }
        }
        return toBase(v.toBigDecimal()).doubleValue();
    }

    private long[] computeFast() {
        try {
            BigDecimal m = mul.scale() < 0 ? mul.setScale(0) : mul;
            long mulUnscaled = m.unscaledValue().longValueExact();
            long bottom = Math.multiplyExact(QuantityValue.pow10(m.scale()), div.longValueExact());
            long off = offset.longValueExact();
            return new long[] {mulUnscaled, bottom, off};
        } catch (ArithmeticException | ArrayIndexOutOfBoundsException notExact) {
            return null;
        }
    }

    @Override
    public String toString() {
        return symbol;
    }
}
