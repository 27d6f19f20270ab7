package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * A concept of the vocabulary as the consistency stage needs it.
 *
 * @param id             the stable concept id
 * @param label          the preferred label to show (the id when there is none)
 * @param facetId        the facet the concept is under (itself for a facet), or null
 * @param isFacet        true for a facet (a top concept)
 * @param labels         every label that may match it (preferred, alternative, hidden), as written
 * @param regulatedClaim true when its facet is a regulated or safety claim that needs compliance review
 * @param broader        ids of its broader concepts (a listing carrying it also carries them)
 */
public record FeedbackConcept(String id, String label, String facetId, boolean isFacet, List<String> labels,
                              boolean regulatedClaim, List<String> broader) {
    public FeedbackConcept {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(label, "label");
        labels = List.copyOf(labels);
        broader = List.copyOf(broader);
        if (id.isBlank()) {
            throw new IllegalArgumentException("a concept id must not be blank");
        }
        for (String l : labels) {
            if (l.isBlank()) {
                throw new IllegalArgumentException("concept " + id + " has a blank label; leave it out");
            }
        }
    }

    /** A concept with no broader concepts. */
    public FeedbackConcept(String id, String label, String facetId, boolean isFacet, List<String> labels,
                           boolean regulatedClaim) {
        this(id, label, facetId, isFacet, labels, regulatedClaim, List.of());
    }
}
