package dev.sheaf.miner.mine;

import dev.sheaf.miner.text.Dimension;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Raw spec keys that name one facet candidate ("Weight", "Wt.", "Item weight", "WEIGHT (kg)").
 *
 * @param name      the canonical name: the normalised form carried by most listings in the cluster
 * @param members   the raw keys, most frequent first, then by raw key
 * @param count     the sum of the members' counts
 * @param dimension what the keys' values measure, when their unit suffix or their values say so
 */
public record SpecKeyCluster(String name, List<Member> members, long count, Optional<Dimension> dimension) {
    public SpecKeyCluster {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(dimension, "dimension");
        if (name.isBlank()) {
            throw new IllegalArgumentException("a spec key cluster needs a name, got a blank one");
        }
        members = List.copyOf(members);
        if (members.isEmpty()) {
            throw new IllegalArgumentException("spec key cluster '" + name + "' has no members");
        }
        long sum = 0;
        for (Member m : members) {
            sum += m.count();
        }
        if (sum != count) {
            throw new IllegalArgumentException("spec key cluster '" + name + "' counts " + count
                    + " but its members add up to " + sum);
        }
    }

    /**
     * One raw key as found in the listings.
     *
     * @param rawKey     the key exactly as written
     * @param normalised {@link SpecKeys#normalise(String)} of it
     * @param count      how many times it was seen (at least 1)
     */
    public record Member(String rawKey, String normalised, long count) {
        public Member {
            Objects.requireNonNull(rawKey, "rawKey");
            Objects.requireNonNull(normalised, "normalised");
            if (count < 1) {
                throw new IllegalArgumentException("spec key '" + rawKey + "' must have been seen at least once, got count " + count);
            }
        }
    }
}
