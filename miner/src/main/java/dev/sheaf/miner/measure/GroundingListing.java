package dev.sheaf.miner.measure;

import java.util.Collections;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * What the catalog says about one listing, as far as grounding needs it: the concepts its text
 * states, the concepts it states the absence of, and its number-facet values.
 *
 * @param id       the listing id
 * @param category the listing's category, or null
 * @param stated   concept ids the listing carries (stated)
 * @param negated  concept ids the listing says it lacks ("no hood"); disjoint from {@code stated}
 * @param numbers  number facet id → value in the facet's unit (a range: its midpoint); finite values only
 */
public record GroundingListing(String id, String category, Set<String> stated, Set<String> negated,
                               Map<String, Double> numbers) {
    public GroundingListing {
        Objects.requireNonNull(id, "id");
        stated = Collections.unmodifiableSet(new TreeSet<>(stated));
        negated = Collections.unmodifiableSet(new TreeSet<>(negated));
        numbers = Collections.unmodifiableMap(new TreeMap<>(numbers));
        for (String c : stated) {
            if (negated.contains(c)) {
                throw new IllegalArgumentException("listing " + id + " both states and negates " + c
                        + "; a concept the listing states anywhere is stated");
            }
        }
        for (Map.Entry<String, Double> e : numbers.entrySet()) {
            if (e.getValue() == null || !Double.isFinite(e.getValue())) {
                throw new IllegalArgumentException("listing " + id + " has a non-finite value for " + e.getKey()
                        + ": " + e.getValue());
            }
        }
    }

    /** True when the listing states the concept. */
    public boolean carries(String conceptId) {
        return stated.contains(conceptId);
    }

    /** The listing's value of a number facet, or null. */
    public Double number(String facetId) {
        return numbers.get(facetId);
    }
}
