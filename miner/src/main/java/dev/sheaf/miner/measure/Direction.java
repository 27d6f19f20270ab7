package dev.sheaf.miner.measure;

/** What a feedback sentence says the target product has of an attribute, next to the reference. */
public enum Direction {
    /** More of it: "lighter", "more breathable", "too bulky", "the warmest". */
    MORE,
    /** Less of it: "less bulky", "not as warm", "fewer pockets", "not lighter". */
    LESS,
    /** It is there (the default for a plain mention): "with a hood", "has pit zips", "warm". */
    PRESENT,
    /** It is not there: "without a hood", "no pit zips", "isn't waterproof", "PFC-free". */
    ABSENT
}
