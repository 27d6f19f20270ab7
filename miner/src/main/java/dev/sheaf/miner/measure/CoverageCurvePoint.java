package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * One step of the coverage curve: the k-th concept chosen greedily and the listings covered so far.
 *
 * @param rank     k, from 1
 * @param conceptId the concept added at this step
 * @param label    its preferred label
 * @param gain     listings it newly covers
 * @param covered  listings covered by the first k concepts
 * @param share    covered / all listings
 */
public record CoverageCurvePoint(int rank, String conceptId, String label, long gain, long covered, double share) {
    public CoverageCurvePoint {
        Objects.requireNonNull(conceptId, "conceptId");
        if (rank < 1 || gain < 1 || covered < gain) {
            throw new IllegalArgumentException("curve point " + rank + " must add at least one listing, got gain " + gain);
        }
    }
}
