package dev.sheaf.miner.measure;

import java.util.Collection;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * The catalog facts grounding checks feedback against: listing id → {@link GroundingListing}.
 * Built from the labeling stage's assignments; implementations must be thread-safe.
 */
@FunctionalInterface
public interface GroundingCatalog {

    /** The listing with this id, or empty when the catalog does not hold it. */
    Optional<GroundingListing> listing(String id);

    /** A catalog of these listings; ids must be unique. */
    static GroundingCatalog of(Collection<GroundingListing> listings) {
        Map<String, GroundingListing> m = new HashMap<>();
        for (GroundingListing l : listings) {
            if (m.put(l.id(), l) != null) {
                throw new IllegalArgumentException("listing " + l.id() + " appears twice; give each listing once");
            }
        }
        Map<String, GroundingListing> frozen = Map.copyOf(m);
        return id -> Optional.ofNullable(frozen.get(id));
    }
}
