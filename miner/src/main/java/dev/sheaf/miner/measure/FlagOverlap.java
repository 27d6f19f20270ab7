package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * Two concepts and how far their listing sets coincide: Jaccard similarity |A ∩ B| / |A ∪ B|
 * (coverage's overlap pairs supply it).
 *
 * @param a             one concept id
 * @param b             the other
 * @param jaccard       |A ∩ B| / |A ∪ B|, in [0, 1]
 * @param shared        |A ∩ B|
 * @param sharedSample  some listing ids carrying both (evidence), may be empty
 */
public record FlagOverlap(String a, String b, double jaccard, long shared, List<String> sharedSample) {
    public FlagOverlap {
        Objects.requireNonNull(a, "a");
        Objects.requireNonNull(b, "b");
        sharedSample = List.copyOf(sharedSample);
        if (a.equals(b)) {
            throw new IllegalArgumentException("an overlap needs two different concepts; got " + a + " twice");
        }
        if (!(jaccard >= 0 && jaccard <= 1) || shared < 0) {
            throw new IllegalArgumentException("Jaccard must lie in [0, 1] and shared be >= 0; got " + jaccard + ", " + shared);
        }
    }

    /** The concept on the other side of {@code id}. */
    public String other(String id) {
        return a.equals(id) ? b : a;
    }
}
