package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * A concept's listings in one category or one source file.
 *
 * @param conceptId  the concept
 * @param key        the category or the source file
 * @param listings   listings in it where the concept is stated
 * @param total      listings in it (for a category: where the facet applies; 0 when it does not apply)
 * @param share      listings / total, NaN when total is 0
 */
public record CoverageCell(String conceptId, String key, long listings, long total, double share) {
    public CoverageCell {
        Objects.requireNonNull(conceptId, "conceptId");
        Objects.requireNonNull(key, "key");
    }
}
