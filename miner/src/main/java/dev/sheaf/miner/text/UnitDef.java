package dev.sheaf.miner.text;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Objects;

/**
 * One unit: its canonical symbol, its dimension and its exact affine map to the dimension's base
 * unit, {@code base = (value - offset) * mul / div}. {@code mul}, {@code div} and {@code offset} are
 * exact decimals; only the division can round (to {@link MathContext#DECIMAL128}, 34 digits, half-even).
 */
record UnitDef(String symbol, Dimension dimension, BigDecimal mul, BigDecimal div, BigDecimal offset) {
    UnitDef {
        Objects.requireNonNull(symbol, "symbol");
        Objects.requireNonNull(dimension, "dimension");
        if (mul.signum() <= 0 || div.signum() <= 0) {
            throw new IllegalArgumentException("unit " + symbol + " needs a positive factor, got " + mul + "/" + div);
        }
        Objects.requireNonNull(offset, "offset");
    }

    static UnitDef linear(String symbol, Dimension dimension, String factorToBase) {
        return new UnitDef(symbol, dimension, new BigDecimal(factorToBase), BigDecimal.ONE, BigDecimal.ZERO);
    }

    boolean isBase() {
        return mul.compareTo(BigDecimal.ONE) == 0 && div.compareTo(BigDecimal.ONE) == 0 && offset.signum() == 0;
    }

    /** The value in the base unit: exact unless {@code div} is not 1. */
    BigDecimal toBase(BigDecimal value) {
        BigDecimal shifted = offset.signum() == 0 ? value : value.subtract(offset);
        BigDecimal scaled = shifted.multiply(mul);
        return div.compareTo(BigDecimal.ONE) == 0 ? scaled : scaled.divide(div, MathContext.DECIMAL128);
    }

    /** The base value as the nearest double (one rounding after exact arithmetic, see {@link #toBase}). */
    double toBaseDouble(BigDecimal value) {
        return isBase() ? value.doubleValue() : toBase(value).doubleValue();
    }
}
