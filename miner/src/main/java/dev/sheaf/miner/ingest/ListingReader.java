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
}
