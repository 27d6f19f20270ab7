package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * Krippendorff's alpha for one attribute, from the coincidence matrix (Krippendorff 2011,
 * "Computing Krippendorff's Alpha-Reliability"): α = 1 − D_o / D_e.
 *
 * @param alpha                 the coefficient; NaN when undefined (see {@code undefinedReason})
 * @param metric                the difference function used
 * @param observedDisagreement  D_o = Σ_c Σ_k o_ck δ²_ck / n
 * @param expectedDisagreement  D_e = Σ_c Σ_k n_c n_k δ²_ck / (n (n − 1))
 * @param pairableUnits         items with at least two judgments (the others are dropped, as Krippendorff specifies)
 * @param pairableValues        n: the judgments in those items
 * @param undefinedReason       why alpha is undefined, or empty when it is defined
 */
public record KrippendorffResult(double alpha, AgreementMetric metric, double observedDisagreement,
                                 double expectedDisagreement, int pairableUnits, int pairableValues,
                                 String undefinedReason) {
    public KrippendorffResult {
        Objects.requireNonNull(metric, "metric");
        Objects.requireNonNull(undefinedReason, "undefinedReason");
        if (pairableUnits < 0 || pairableValues < 0) {
            throw new IllegalArgumentException("counts must be >= 0");
        }
        if (Double.isNaN(alpha) == undefinedReason.isEmpty()) {
            throw new IllegalArgumentException("an undefined alpha needs a reason, and a defined one none; got alpha "
                    + alpha + ", reason '" + undefinedReason + "'");
        }
    }

    /** True when alpha could be computed. */
    public boolean defined() {
        return !Double.isNaN(alpha);
    }
}
