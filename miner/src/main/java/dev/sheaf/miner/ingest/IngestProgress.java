package dev.sheaf.miner.ingest;

/**
 * Told how far a run has come. Called after every listing and every finished file, possibly from
 * several threads at once, so an implementation must be thread-safe and cheap (for example, store
 * the numbers in volatile fields and let a display thread read them).
 */
@FunctionalInterface
public interface IngestProgress {
    /** Does nothing. */
    IngestProgress NONE = (files, listings, bytes, problems) -> { };

    /**
     * @param filesDone files finished so far (read or given up)
     * @param listings  listings handed to the sink so far
     * @param bytes     bytes of input consumed so far
     * @param problems  problems recorded so far
     */
    void update(long filesDone, long listings, long bytes, long problems);
}
