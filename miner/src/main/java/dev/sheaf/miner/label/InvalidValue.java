package dev.sheaf.miner.label;

import java.util.Objects;

/**
 * A spec row that names a number facet but whose value could not be read as a number in the
 * facet's dimension ("Weight: featherlight", "Capacity: 84 x 52 x 40 in"). The facet is present but
 * has no valid value; fill rates count it as unfilled.
 *
 * @param facetId the facet the spec key belongs to
 * @param field   index of the spec field
 * @param key     the spec key as written
 * @param text    the value as written
 * @param reason  what was expected and what was found
 */
public record InvalidValue(String facetId, int field, String key, String text, String reason) {
    public InvalidValue {
        Objects.requireNonNull(facetId, "facetId");
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(reason, "reason");
        if (field < 0) {
            throw new IllegalArgumentException("field index must be >= 0, got " + field);
        }
    }
}
