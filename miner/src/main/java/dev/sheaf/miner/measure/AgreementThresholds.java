package dev.sheaf.miner.measure;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The edges that turn figures into words: Krippendorff's alpha verdicts and the Landis–Koch kappa
 * bands. Immutable; {@link #DEFAULTS} are the published values, and {@link #with(String, double)}
 * or {@link #fromMap(Map)} override them by key (unknown keys are rejected by name).
 *
 * @param alphaReliable     α at or above this is {@link AgreementVerdict#RELIABLE}; default .800
 *                          (Krippendorff 2004, Content Analysis 2nd ed. [mem])
 * @param alphaTentative    α at or above this (and below reliable) is {@link AgreementVerdict#TENTATIVE};
 *                          default .667 (Krippendorff 2004 [mem])
 * @param kappaSlight       upper edge (inclusive) of the slight band; default .20 (Landis &amp; Koch 1977)
 * @param kappaFair         upper edge of fair; default .40
 * @param kappaModerate     upper edge of moderate; default .60
 * @param kappaSubstantial  upper edge of substantial; default .80; above it: almost perfect
 */
public record AgreementThresholds(double alphaReliable, double alphaTentative,
                                  double kappaSlight, double kappaFair, double kappaModerate, double kappaSubstantial) {

    /** Krippendorff 2004 for alpha; Landis &amp; Koch 1977, Biometrics 33(1) for kappa. */
    public static final AgreementThresholds DEFAULTS = new AgreementThresholds(0.800, 0.667, 0.20, 0.40, 0.60, 0.80);

    /** The keys {@link #with} and {@link #fromMap} accept, in component order. */
    public static final List<String> KEYS = List.of("alpha.reliable", "alpha.tentative",
            "kappa.slight", "kappa.fair", "kappa.moderate", "kappa.substantial");

    public AgreementThresholds {
        double[] all = {alphaReliable, alphaTentative, kappaSlight, kappaFair, kappaModerate, kappaSubstantial};
        for (int i = 0; i < all.length; i++) {
            if (!(all[i] >= -1 && all[i] <= 1)) {
                throw new IllegalArgumentException(KEYS.get(i) + " must lie in [-1, 1], got " + all[i]);
            }
        }
        if (alphaTentative > alphaReliable) {
            throw new IllegalArgumentException("alpha.tentative (" + alphaTentative + ") must not exceed alpha.reliable ("
                    + alphaReliable + ")");
        }
        if (!(0 <= kappaSlight && kappaSlight < kappaFair && kappaFair < kappaModerate && kappaModerate < kappaSubstantial)) {
            throw new IllegalArgumentException("kappa band edges must rise: 0 <= kappa.slight < kappa.fair < kappa.moderate"
                    + " < kappa.substantial, got " + kappaSlight + ", " + kappaFair + ", " + kappaModerate + ", " + kappaSubstantial);
        }
    }

    /** A copy with one edge changed; {@code key} is one of {@link #KEYS}. */
    public AgreementThresholds with(String key, double value) {
        double[] v = values();
        int i = KEYS.indexOf(key);
        if (i < 0) {
            throw new IllegalArgumentException("unknown agreement threshold '" + key + "'; known: " + KEYS);
        }
        v[i] = value;
        return new AgreementThresholds(v[0], v[1], v[2], v[3], v[4], v[5]);
    }

    /** The defaults with the given edges overridden; every key must be one of {@link #KEYS}. */
    public static AgreementThresholds fromMap(Map<String, ? extends Number> overrides) {
        AgreementThresholds t = DEFAULTS;
        for (Map.Entry<String, ? extends Number> e : overrides.entrySet()) {
            t = t.with(e.getKey(), e.getValue().doubleValue());
        }
        return t;
    }

    /** The edges by key, in {@link #KEYS} order. */
    public Map<String, Double> asMap() {
        Map<String, Double> m = new LinkedHashMap<>();
        double[] v = values();
        for (int i = 0; i < v.length; i++) {
            m.put(KEYS.get(i), v[i]);
        }
        return m;
    }

    /** The verdict for an alpha; NaN (undefined) gives {@link AgreementVerdict#UNDEFINED}. */
    public AgreementVerdict verdict(double alpha) {
        if (Double.isNaN(alpha)) {
            return AgreementVerdict.UNDEFINED;
        }
        if (alpha >= alphaReliable) {
            return AgreementVerdict.RELIABLE;
        }
        return alpha >= alphaTentative ? AgreementVerdict.TENTATIVE : AgreementVerdict.CONTESTED;
    }

    /** The Landis–Koch band for a kappa; NaN gives {@link KappaBand#UNDEFINED}. */
    public KappaBand band(double kappa) {
        if (Double.isNaN(kappa)) {
            return KappaBand.UNDEFINED;
        }
        if (kappa < 0) {
            return KappaBand.POOR;
        }
        if (kappa <= kappaSlight) {
            return KappaBand.SLIGHT;
        }
        if (kappa <= kappaFair) {
            return KappaBand.FAIR;
        }
        if (kappa <= kappaModerate) {
            return KappaBand.MODERATE;
        }
        return kappa <= kappaSubstantial ? KappaBand.SUBSTANTIAL : KappaBand.ALMOST_PERFECT;
    }

    private double[] values() {
        return new double[] {alphaReliable, alphaTentative, kappaSlight, kappaFair, kappaModerate, kappaSubstantial};
    }
}
