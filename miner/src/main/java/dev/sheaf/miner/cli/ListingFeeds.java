package dev.sheaf.miner.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * The feed {@code sheaf mine} uses. This build has no ingest stage yet, so the feed says so and
 * the command exits with {@link ExitCodes#NOT_AVAILABLE}; once {@code dev.sheaf.miner.ingest.Ingest}
 * is present, {@code miner/src/pending/java/dev/sheaf/miner/cli/IngestFeed.java} moves next to this
 * file and {@link #DEFAULT} becomes {@code new IngestFeed()}.
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

    static final ListingFeed DEFAULT = new ListingFeed() {
        @Override
        public Job fromArguments(List<Path> sources, List<String> include, List<String> exclude, Path mappingFile)
                throws IOException {
            throw new Unavailable();
        }

        @Override
        public Job fromWorkspace(Path dir) throws IOException {
            throw new Unavailable();
        }

        @Override
        public void writeProblems(Path csv, List<ListingFeed.Problem> problems) throws IOException {
            throw new Unavailable();
        }
    };
}
