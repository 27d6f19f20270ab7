package dev.sheaf.miner.measure;

import java.util.Locale;

/** What the catalog says about one feedback mention. */
public enum GroundingOutcome {
    /** The catalog agrees: the target carries what is said present, or its value is on the side claimed. */
    GROUNDED,
    /** The catalog was consulted and does not agree (the target lacks it, the values are equal or the other way). */
    NOT_GROUNDED,
    /** The catalog cannot say: no catalog, a listing it does not hold, a missing value, or no scale for the word. */
    UNCHECKED;

    /** Lower-case name with a hyphen, as in files. */
    public String word() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }
}
