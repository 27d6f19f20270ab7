package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * Fleiss' kappa for one attribute (Fleiss 1971, Psychol. Bull. 76(5)), values as nominal categories.
 * Fleiss' kappa needs the same number of judgments on every item; when items differ, it is computed on
 * the items that have the most common number of judgments (ties: the larger number) and the others are
 * left out, which {@code note} says.
 *
 * @param kappa            the coefficient; NaN when undefined
 * @param band             Landis–Koch band
 * @param items            items it was computed on
 * @param judgmentsPerItem judgments on each of those items
 * @param itemsLeftOut     items with another number of judgments (including single judgments)
 * @param note             empty, or what was left out / why kappa is undefined
 */
public record FleissResult(double kappa, KappaBand band, int items, int judgmentsPerItem, int itemsLeftOut, String note) {
    public FleissResult {
        Objects.requireNonNull(band, "band");
        Objects.requireNonNull(note, "note");
        if (items < 0 || judgmentsPerItem < 0 || itemsLeftOut < 0) {
            throw new IllegalArgumentException("counts must be >= 0");
        }
        if (Double.isNaN(kappa) != (band == KappaBand.UNDEFINED)) {
            throw new IllegalArgumentException("band must be UNDEFINED exactly when kappa is NaN");
        }
    }

    /** True when kappa could be computed. */
    public boolean defined() {
        return !Double.isNaN(kappa);
    }
}
