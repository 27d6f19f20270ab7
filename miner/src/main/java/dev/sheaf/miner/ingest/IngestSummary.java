package dev.sheaf.miner.ingest;

import java.time.Duration;
import java.util.List;
import java.util.Objects;

/**
 * What a run read.
 *
 * @param filesSeen files matched by the sources (each counted once)
 * @param filesRead files that gave at least one listing
 * @param listings  listings handed to the sink
 * @param bytesRead bytes of input consumed
 * @param problems  every problem recorded, sorted by source then position
 * @param elapsed   wall-clock time of the run
 */
public record IngestSummary(long filesSeen, long filesRead, long listings, long bytesRead,
                            List<Problem> problems, Duration elapsed) {
    public IngestSummary {
        if (filesSeen < 0 || filesRead < 0 || filesRead > filesSeen || listings < 0 || bytesRead < 0) {
            throw new IllegalArgumentException("counts must be non-negative and filesRead <= filesSeen, got seen="
                    + filesSeen + " read=" + filesRead + " listings=" + listings + " bytes=" + bytesRead);
        }
        problems = List.copyOf(problems);
        Objects.requireNonNull(elapsed, "elapsed");
    }

    /** Number of problems of one kind. */
    public long problemCount(String kind) {
        return problems.stream().filter(p -> p.kind().equals(kind)).count();
    }
}
