package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * Everything {@link AgreementAnalysis} found, ready to print or write with {@link AgreementFiles}.
 * Annotators appear only as pseudonyms.
 *
 * @param source          the judgments' source
 * @param attributes      per attribute, sorted by attribute key
 * @param annotators      per attribute and annotator, sorted by attribute then pseudonym
 * @param overview        per annotator over all attributes, sorted by pseudonym
 * @param problems        rows left out (reading problems, unknown attributes, repeats, conflicts), by row
 * @param judgmentsRead   judgments read from the source
 * @param judgmentsUsed   judgments in the figures
 * @param seed            bootstrap seed
 * @param replicates      bootstrap replicates per attribute
 * @param confidence      bootstrap confidence level
 * @param thresholds      the verdict and band edges used
 * @param notes           notes about the run as a whole (e.g. an option naming an attribute nobody judged)
 */
public record AgreementReport(String source, List<AgreementAttribute> attributes, List<AgreementAnnotator> annotators,
                              List<AgreementAnnotatorOverview> overview, List<JudgmentProblem> problems,
                              int judgmentsRead, int judgmentsUsed, long seed, int replicates, double confidence,
                              AgreementThresholds thresholds, List<String> notes) {
    public AgreementReport {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(thresholds, "thresholds");
        attributes = List.copyOf(attributes);
        annotators = List.copyOf(annotators);
        overview = List.copyOf(overview);
        problems = List.copyOf(problems);
        notes = List.copyOf(notes);
        if (judgmentsUsed > judgmentsRead || judgmentsUsed < 0) {
            throw new IllegalArgumentException("need 0 <= judgmentsUsed <= judgmentsRead, got " + judgmentsUsed
                    + " of " + judgmentsRead);
        }
    }

    /** The attribute with this key, if it was judged. */
    public java.util.Optional<AgreementAttribute> attribute(String key) {
        return attributes.stream().filter(a -> a.attribute().equals(key)).findFirst();
    }

    /** True when some rows were left out. */
    public boolean hasProblems() {
        return !problems.isEmpty();
    }
}
