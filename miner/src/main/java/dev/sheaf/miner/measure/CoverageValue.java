package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * One value of a facet and how many listings carry it.
 *
 * @param value    the concept id, "yes"/"no", a bucket label, or a number as written in the facet's unit
 * @param label    what people read: the preferred label, or the value itself
 * @param listings listings carrying it
 * @param share    listings / all value occurrences of the facet
 */
public record CoverageValue(String value, String label, long listings, double share) {
    public CoverageValue {
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(label, "label");
    }
}
