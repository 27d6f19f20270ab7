package dev.sheaf.miner.measure;

import java.util.Locale;

/**
 * Krippendorff's difference functions δ²(c, k) for alpha (Krippendorff 2011, "Computing
 * Krippendorff's Alpha-Reliability", section on metrics). Fleiss' and Cohen's kappa always treat
 * values as nominal categories, whatever the metric.
 */
public enum AgreementMetric {
    /** δ² = 0 if c = k, else 1: values are unordered categories (facet values, present/absent). */
    NOMINAL,
    /**
     * δ²(c, k) = (Σ_{g=c..k} n_g − (n_c + n_k)/2)², with n_g the number of pairable values equal to
     * g: rank-based, so only the order of the grades matters. Needs numeric grades (their order).
     */
    ORDINAL,
    /** δ² = (c − k)²: equal steps between grades. Needs numbers. */
    INTERVAL,
    /** δ² = ((c − k)/(c + k))²: a true zero. Needs numbers ≥ 0 (δ² = 0 when both are 0). */
    RATIO;

    /** Lower-case name, as in options and files. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** True when the metric needs numeric values (every metric but nominal). */
    public boolean needsNumbers() {
        return this != NOMINAL;
    }
}
