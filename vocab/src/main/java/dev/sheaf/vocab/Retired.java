package dev.sheaf.vocab;

/**
 * A concept id that is no longer live. Its id is never reused, so label files that name it still
 * resolve: a merged concept points to the concept it was merged into; a deleted one points nowhere.
 *
 * @param id the retired id
 * @param replacedBy the id it was merged into (which may itself be retired: follow the chain with
 *     {@link Vocabulary#resolve}), or null when the concept was deleted
 * @param formerLabel its preferred label in the default language when it was retired, for people reading old files
 */
public record Retired(String id, String replacedBy, String formerLabel) {
    public Retired {
        Concept.checkId(id);
        if (replacedBy != null) {
            Concept.checkId(replacedBy);
            if (replacedBy.equals(id)) {
                throw new IllegalArgumentException("retired concept " + id + " is replaced by itself");
            }
        }
        if (formerLabel != null) {
            formerLabel = Label.checkText(formerLabel, "former label");
        }
    }

    public boolean merged() {
        return replacedBy != null;
    }
}
