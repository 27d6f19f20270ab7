package dev.sheaf.miner.report;

import java.util.Objects;

/**
 * One step of the coverage curve: with the {@code k} concepts that label the most listings, how many
 * listings carry at least one of them.
 *
 * @param k       rank of the concept just added (1 = the concept on the most listings)
 * @param concept the concept added at this rank, as shown
 * @param covered listings labelled with at least one of the top {@code k} concepts
 */
public record CoveragePoint(int k, String concept, long covered) {
    public CoveragePoint {
        Objects.requireNonNull(concept, "concept");
        if (k < 1 || covered < 0) {
            throw new IllegalArgumentException("a coverage point needs k >= 1 and covered >= 0, got k " + k
                    + ", covered " + covered);
        }
    }
}
