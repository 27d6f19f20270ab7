package dev.sheaf.miner.label;

import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * What a label run did.
 *
 * @param listings          listings labeled
 * @param withLabels        listings with at least one stated concept or number
 * @param withoutLabels     listings with no stated label (they may still hold negations)
 * @param withNothing       listings with no assignment of any kind and no unreadable value
 * @param stated            stated assignments (numbers included)
 * @param negated           negated assignments
 * @param categoryErrors    assignments whose facet does not apply to the listing's category
 * @param invalidValues     spec values of number facets that could not be read
 * @param filesSeen         files the sources matched
 * @param filesRead         files that gave listings
 * @param bytesRead         bytes of input read
 * @param problems          files or parts that could not be read (see problems.csv)
 * @param notes             notes from compiling the vocabulary (labels that can never match ...)
 * @param splitSizes        subset name → listings, in subset order; empty without a split
 * @param files             the files written, in the order written
 * @param elapsed           wall-clock time
 */
public record LabelRunSummary(long listings, long withLabels, long withoutLabels, long withNothing, long stated, long negated,
                              long categoryErrors, long invalidValues, long filesSeen, long filesRead, long bytesRead,
                              long problems, List<String> notes, Map<String, Integer> splitSizes, List<String> files,
                              Duration elapsed) {
    public LabelRunSummary {
        notes = List.copyOf(notes);
        splitSizes = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(splitSizes));
        files = List.copyOf(files);
        Objects.requireNonNull(elapsed, "elapsed");
        if (listings < 0 || withLabels + withoutLabels != listings) {
            throw new IllegalArgumentException("listings with and without labels must add up to " + listings + ", got "
                    + withLabels + " + " + withoutLabels);
        }
    }
}
