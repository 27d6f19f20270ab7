package dev.sheaf.miner.report;

import dev.sheaf.miner.text.EvidenceLine;
import java.util.List;
import java.util.Objects;

/**
 * Everything the report says about one attribute (a concept or a facet).
 *
 * @param id          the attribute's id in the vocabulary (any text; the page makes its own anchor)
 * @param label       the preferred label
 * @param facet       the facet it belongs to, or empty for a facet itself
 * @param otherLabels alternative and hidden labels, as the vocabulary holds them
 * @param measures    its figures
 * @param flags       the flags raised, each with its figure and threshold
 * @param review      why a person must check the claim before use (a regulated or safety claim such as a
 *                    waterproof rating), or empty when nothing calls for it
 * @param evidence    keyword-in-context lines, already chosen and capped by the caller
 * @param evidenceTotal how many evidence lines exist in all (at least {@code evidence.size()})
 */
public record AttributeCard(String id, String label, String facet, List<String> otherLabels, List<Measure> measures,
                            List<ReportFlag> flags, String review, List<EvidenceLine> evidence, int evidenceTotal)
        implements Block {
    public AttributeCard {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(facet, "facet");
        Objects.requireNonNull(review, "review");
        otherLabels = List.copyOf(otherLabels);
        measures = List.copyOf(measures);
        flags = List.copyOf(flags);
        evidence = List.copyOf(evidence);
        if (id.isBlank() || label.isBlank()) {
            throw new IllegalArgumentException("an attribute card needs an id and a label, got id '" + id + "', label '"
                    + label + "'");
        }
        if (evidenceTotal < evidence.size()) {
            throw new IllegalArgumentException("card '" + id + "' shows " + evidence.size() + " evidence lines but says "
                    + "there are " + evidenceTotal + " in all");
        }
    }

    /** True when the claim needs human and compliance review. */
    public boolean needsReview() {
        return !review.isEmpty();
    }
}
