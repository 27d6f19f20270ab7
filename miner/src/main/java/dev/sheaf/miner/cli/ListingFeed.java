package dev.sheaf.miner.cli;

import dev.sheaf.miner.ingest.Listing;
import java.io.IOException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;

/**
 * Where {@code sheaf mine} gets its listings: one seam over the ingest stage
 * ({@code dev.sheaf.miner.ingest.Ingest}), so the command stays thin and its tests can feed it.
 * {@code IngestFeed} is the implementation over the real readers.
 */
interface ListingFeed {

    /** Sources named on the command line, with globs relative to each source and an optional column-mapping file. */
    Job fromArguments(List<Path> sources, List<String> include, List<String> exclude, Path mappingFile) throws IOException;

    /** The sources, profile and output folder of a workspace ({@code workspace.json}). */
    Job fromWorkspace(Path dir) throws IOException;

    /** Writes problems.csv (atomically, spreadsheet-safe). */
    void writeProblems(Path csv, List<Problem> problems) throws IOException;

    /** A resolved set of sources, ready to read. */
    interface Job {
        /** The sources as shown to the user (recorded in the harvest). */
        List<String> sourceNames();

        /** The workspace's analysis profile (preset name or file path), or null. */
        String profile();

        /** The workspace's output folder, or null. */
        Path output();

        /** Bytes the sources hold, for the progress bar; -1 when unknown. */
        long totalBytes();

        /** Streams every listing to the sink (possibly from several threads at once); never throws for bad input. */
        Summary run(int threads, Consumer<Listing> sink, Progress progress) throws IOException;
    }

    /** Called often while reading; must be cheap. */
    @FunctionalInterface
    interface Progress {
        void update(long filesDone, long listings, long bytes, long problems);
    }

    /** What reading found. */
    record Summary(long filesSeen, long filesRead, long listings, long bytes, List<Problem> problems, Duration elapsed) {
        public Summary {
            problems = List.copyOf(problems);
            Objects.requireNonNull(elapsed, "elapsed");
        }
    }

    /** An input that could not be read, or a part of one: file, position, kind, reason. */
    record Problem(String source, String position, String kind, String reason) {
    }
}
