package dev.sheaf.vocab;

/**
 * A named range of a number facet ("1–2 kg: light"). The lower bound is inclusive, the upper
 * bound exclusive; a missing bound means unbounded on that side. Values are in the facet's unit.
 *
 * @param label the name shown for the range
 * @param min inclusive lower bound, or null for no lower bound
 * @param max exclusive upper bound, or null for no upper bound
 */
public record Bucket(String label, Double min, Double max) {
    public Bucket {
        label = Label.checkText(label, "bucket label");
        if (min == null && max == null) {
            throw new IllegalArgumentException("bucket \"" + label + "\" has neither min nor max; give at least one bound");
        }
        if (min != null && !Double.isFinite(min) || max != null && !Double.isFinite(max)) {
            throw new IllegalArgumentException("bucket \"" + label + "\" has a bound that is not a finite number");
        }
        if (min != null && max != null && !(min < max)) {
            throw new IllegalArgumentException("bucket \"" + label + "\": min " + min + " must be below max " + max);
        }
    }

    /** Whether {@code value} falls in this bucket (min inclusive, max exclusive). */
    public boolean contains(double value) {
        return (min == null || value >= min) && (max == null || value < max);
    }
}
