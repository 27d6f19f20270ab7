package dev.sheaf.miner.report;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * What an audit found, for the command's summary.
 *
 * @param listings        listings labelled
 * @param concepts        concepts in the vocabulary (facets not counted)
 * @param facets          facets in the vocabulary
 * @param coverage        share of listings with at least one label (0..1)
 * @param flags           attributes per flag kind (by the flag's file name)
 * @param attention       the attributes most in need of attention, one line each
 * @param judged          whether judgments were measured
 * @param feedback        whether feedback was measured
 * @param report          the page
 * @param problems        input problems, one sentence each (empty when every input read cleanly)
 */
public record AuditSummary(long listings, int concepts, int facets, double coverage, Map<String, Integer> flags,
                           List<String> attention, boolean judged, boolean feedback, Path report, List<String> problems) {
    public AuditSummary {
        Objects.requireNonNull(report, "report");
        flags = Map.copyOf(flags);
        attention = List.copyOf(attention);
        problems = List.copyOf(problems);
        if (listings < 0 || concepts < 0 || facets < 0) {
            throw new IllegalArgumentException("counts must be >= 0");
        }
    }
}
