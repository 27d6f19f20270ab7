package dev.sheaf.miner.measure;

/**
 * The strength-of-agreement bands of Landis and Koch (1977, Biometrics 33(1)),
 * put beside every kappa. The printed bands leave gaps (.20 / .21); Sheaf reads each band's upper
 * edge as inclusive, so κ = 0.20 is slight and κ = 0.205 is fair. Edges are set in
 * {@link AgreementThresholds}.
 */
public enum KappaBand {
    /** κ &lt; 0. */
    POOR("poor"),
    /** 0 ≤ κ ≤ .20. */
    SLIGHT("slight"),
    /** .20 &lt; κ ≤ .40. */
    FAIR("fair"),
    /** .40 &lt; κ ≤ .60. */
    MODERATE("moderate"),
    /** .60 &lt; κ ≤ .80. */
    SUBSTANTIAL("substantial"),
    /** κ &gt; .80. */
    ALMOST_PERFECT("almost perfect"),
    /** κ could not be computed (no variation, no shared items). */
    UNDEFINED("n/a");

    private final String label;

    KappaBand(String label) {
        this.label = label;
    }

    /** The band's name as printed. */
    public String label() {
        return label;
    }
}
