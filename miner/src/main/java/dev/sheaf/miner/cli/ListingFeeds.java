package dev.sheaf.miner.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * The feed {@code sheaf mine} uses: the ingest stage. Tests pass their own feed.
 */
final class ListingFeeds {
    private ListingFeeds() {
    }

    /** Thrown when no ingest stage is built in. */
    static final class Unavailable extends IOException {
        Unavailable() {
            super("reading listing files needs the ingest stage, which this build of Sheaf does not include yet");
        }
    }

    static final ListingFeed DEFAULT = new IngestFeed();
}
