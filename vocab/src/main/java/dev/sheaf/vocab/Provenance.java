package dev.sheaf.vocab;

import java.time.Instant;

/**
 * Where a concept came from.
 *
 * @param harvestTerm the mined candidate term it was kept from, or null when made by hand
 * @param when when it was added, or null when unknown
 * @param by who added it (a user name or a tool), or null when unknown
 */
public record Provenance(String harvestTerm, Instant when, String by) {
    public Provenance {
        if (harvestTerm != null) {
            harvestTerm = Label.checkText(harvestTerm, "harvest term");
        }
        if (by != null) {
            by = Label.checkText(by, "provenance 'by'");
        }
        if (harvestTerm == null && when == null && by == null) {
            throw new IllegalArgumentException("provenance is empty; leave it out instead");
        }
    }
}
