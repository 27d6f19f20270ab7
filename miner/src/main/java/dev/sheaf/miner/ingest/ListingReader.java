package dev.sheaf.miner.ingest;

import java.io.IOException;

/**
 * Reads one kind of source file into listings. Implementations emit listings and record problems
 * through the {@link SourceFile}; they throw only when the file cannot be read at all, and the run
 * turns that into an "unreadable" problem.
 */
interface ListingReader {
    /** A short name for messages ("HTML", "CSV/TSV" ...). */
    String name();

    void read(SourceFile file) throws IOException;

    /**
     * Whether this reader streams its file record by record without holding it in memory; the
     * per-file size limit then does not apply, so a feed of a million listings is read whole.
     */
    default boolean streams() {
        return false;
    }
}
