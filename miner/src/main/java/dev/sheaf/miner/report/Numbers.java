package dev.sheaf.miner.report;

import java.util.Locale;

/** How the page prints numbers: Locale.ROOT, NaN as "n/a", one rule per {@link ValueKind}. */
final class Numbers {
    static final String NOT_AVAILABLE = "n/a";
    private static final char MINUS = '\u2212';

    private Numbers() {
    }

    static String format(double value, ValueKind kind) {
        if (Double.isNaN(value)) {
            return NOT_AVAILABLE;
        }
        return switch (kind) {
            case COUNT -> count(value);
            case SHARE -> percent(value);
            case COEFFICIENT -> coefficient(value);
            case TEXT -> throw new IllegalArgumentException("a number cannot be shown as TEXT; use COUNT, SHARE or COEFFICIENT");
        };
    }

    static String count(double value) {
        if (Double.isInfinite(value)) {
            return value > 0 ? "\u221E" : MINUS + "\u221E";
        }
        String s = String.format(Locale.ROOT, "%,d", Math.round(value));
        return s.replace('-', MINUS);
    }

    /** Whole percent; values that would round to 0% or 100% without being exactly that say so. */
    static String percent(double share) {
        double p = share * 100;
        if (p > 0 && p < 0.5) {
            return "<1%";
        }
        if (p < 100 && p >= 99.5) {
            return ">99%";
        }
        return String.format(Locale.ROOT, "%.0f%%", p).replace('-', MINUS);
    }

    static String coefficient(double value) {
        String s = String.format(Locale.ROOT, "%.3f", value);
        if (s.equals("-0.000")) {
            s = "0.000";
        }
        return s.replace('-', MINUS);
    }

    /** The number as a sort key for the page's table script: plain Java notation, empty for NaN. */
    static String sortKey(double value) {
        return Double.isNaN(value) ? "" : Double.toString(value);
    }
}
