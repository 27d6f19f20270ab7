package dev.sheaf.miner.report;

/** How a figure compares with the threshold that raised a flag. */
public enum Comparison {
    BELOW("<", "below"),
    AT_OR_BELOW("\u2264", "at or below"),
    ABOVE(">", "above"),
    AT_OR_ABOVE("\u2265", "at or above");

    private final String symbol;
    private final String words;

    Comparison(String symbol, String words) {
        this.symbol = symbol;
        this.words = words;
    }

    /** The mathematical sign: {@code <}, {@code ≤}, {@code >}, {@code ≥}. */
    public String symbol() {
        return symbol;
    }

    /** The sign in words, for screen readers and CSV. */
    public String words() {
        return words;
    }

    /** True when {@code value} stands in this relation to {@code threshold}. */
    public boolean holds(double value, double threshold) {
        return switch (this) {
            case BELOW -> value < threshold;
            case AT_OR_BELOW -> value <= threshold;
            case ABOVE -> value > threshold;
            case AT_OR_ABOVE -> value >= threshold;
        };
    }
}
