package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * A concept whose coverage comes almost entirely from one source file or one category: a sign that
 * one supplier's wording, not the catalog, carries it.
 *
 * @param conceptId the concept
 * @param label     its preferred label
 * @param by        {@code "source"} or {@code "category"}
 * @param top       the file or category
 * @param share     its share of the concept's listings
 * @param listings  the concept's listings
 */
public record ConcentrationFinding(String conceptId, String label, String by, String top, double share, long listings) {
    public ConcentrationFinding {
        Objects.requireNonNull(conceptId, "conceptId");
        Objects.requireNonNull(top, "top");
        if (!by.equals("source") && !by.equals("category")) {
            throw new IllegalArgumentException("by must be source or category, got " + by);
        }
    }
}
