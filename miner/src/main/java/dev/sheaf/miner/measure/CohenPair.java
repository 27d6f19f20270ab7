package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * Cohen's kappa between two annotators on one attribute, over the items both judged (Cohen 1960,
 * Educ. Psychol. Meas. 20(1)), values as nominal categories.
 *
 * @param attribute  the attribute
 * @param annotatorA pseudonym of one annotator (the smaller one)
 * @param annotatorB pseudonym of the other
 * @param items      items both judged
 * @param agreement  p_o: the share of those items where they gave the same value; NaN when none
 * @param kappa      (p_o − p_e) / (1 − p_e), p_e from each one's own marginals; NaN when undefined
 * @param band       Landis–Koch band
 */
public record CohenPair(String attribute, String annotatorA, String annotatorB, int items, double agreement,
                        double kappa, KappaBand band) {
    public CohenPair {
        Objects.requireNonNull(attribute, "attribute");
        Objects.requireNonNull(annotatorA, "annotatorA");
        Objects.requireNonNull(annotatorB, "annotatorB");
        Objects.requireNonNull(band, "band");
        if (annotatorA.equals(annotatorB)) {
            throw new IllegalArgumentException("a pair needs two different annotators, got " + annotatorA + " twice");
        }
        if (items < 0) {
            throw new IllegalArgumentException("items must be >= 0, got " + items);
        }
        if (Double.isNaN(kappa) != (band == KappaBand.UNDEFINED)) {
            throw new IllegalArgumentException("band must be UNDEFINED exactly when kappa is NaN");
        }
    }

    /** True when kappa could be computed. */
    public boolean defined() {
        return !Double.isNaN(kappa);
    }

    /** True when {@code pseudonym} is one of the two. */
    public boolean involves(String pseudonym) {
        return annotatorA.equals(pseudonym) || annotatorB.equals(pseudonym);
    }
}
