package dev.sheaf.miner.text;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;

/**
 * An exact rational number {@code num / den} as read from text (1.2 = 12/10, 1½ = 3/2, ⅓ = 1/3).
 * Longs, not BigDecimal, because this runs for every number in a large corpus: operations are
 * exact or return null on overflow, and {@link #toDouble()} is one IEEE division of two exactly
 * representable integers, hence the correctly rounded double.
 */
final class QuantityValue implements Comparable<QuantityValue> {
    /** 2^53: every long of at most this magnitude is exact as a double. */
    static final long EXACT = 1L << 53;
    private static final long[] POW10 = new long[19];

    static {
        POW10[0] = 1;
        for (int k = 1; k < POW10.length; k++) {
            POW10[k] = POW10[k - 1] * 10;
        }
    }

    final long num;
    final long den;

    private QuantityValue(long num, long den) {
        this.num = num;
        this.den = den;
    }

    static long pow10(int k) {
        return POW10[k];
    }

    /** unscaled × 10^−scale, for 0 ≤ scale ≤ 18. */
    static QuantityValue decimal(long unscaled, int scale) {
        return new QuantityValue(unscaled, POW10[scale]);
    }

    static QuantityValue of(long num, long den) {
        if (den <= 0) {
            throw new IllegalArgumentException("denominator must be positive, got " + den);
        }
        return new QuantityValue(num, den);
    }

    /** this + other, or null when the exact result does not fit in longs. */
    QuantityValue plus(QuantityValue other) {
        try {
            if (den == other.den) {
                return new QuantityValue(Math.addExact(num, other.num), den);
            }
            return new QuantityValue(Math.addExact(Math.multiplyExact(num, other.den), Math.multiplyExact(other.num, den)),
                    Math.multiplyExact(den, other.den));
        } catch (ArithmeticException overflow) {
            return null;
        }
    }

    /** this × k, or null on overflow. */
    QuantityValue times(long k) {
        try {
            return new QuantityValue(Math.multiplyExact(num, k), den);
        } catch (ArithmeticException overflow) {
            return null;
        }
    }

    QuantityValue negate() {
        return new QuantityValue(-num, den);
    }

    boolean isInteger() {
        return num % den == 0;
    }

    int signum() {
        return Long.signum(num);
    }

    /** The nearest double (exact operands, one rounding); through 34 digits when the operands exceed 2^53. */
    double toDouble() {
        if (Math.abs(num) <= EXACT && den <= EXACT) {
            return (double) num / (double) den;
        }
        return toBigDecimal().doubleValue();
    }

    BigDecimal toBigDecimal() {
        BigDecimal n = BigDecimal.valueOf(num);
        return den == 1 ? n : n.divide(BigDecimal.valueOf(den), MathContext.DECIMAL128);
    }

    @Override
    public int compareTo(QuantityValue o) {
        if (den == o.den) {
            return Long.compare(num, o.num);
        }
        return BigInteger.valueOf(num).multiply(BigInteger.valueOf(o.den))
                .compareTo(BigInteger.valueOf(o.num).multiply(BigInteger.valueOf(den)));
    }

    int compareTo(long k) {
        return compareTo(new QuantityValue(k, 1));
    }

    @Override
    public String toString() {
        return num + "/" + den;
    }
}
