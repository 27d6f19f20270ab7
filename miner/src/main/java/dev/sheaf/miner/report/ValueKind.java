package dev.sheaf.miner.report;

/**
 * What a number in the report is, which decides how it is shown. Files behind the report
 * (CSV, JSON) always carry the raw number; only the page formats it.
 */
public enum ValueKind {
    /** Text, shown as is (escaped). */
    TEXT,
    /** A whole count, shown with thousands separators: {@code 1,240}. */
    COUNT,
    /** A share in [0, 1], shown as a whole percent: {@code 42%}, {@code <1%}, {@code >99%}. */
    SHARE,
    /** A coefficient such as alpha or kappa, shown with three decimals and a true minus sign: {@code −0.120}. */
    COEFFICIENT
}
