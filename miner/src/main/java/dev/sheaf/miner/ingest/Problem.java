package dev.sheaf.miner.ingest;

import java.util.List;
import java.util.Objects;

/**
 * One file (or one part of a file) that could not be read as expected. Problems are data: a run
 * collects them, counts them in its summary and writes them to {@code problems.csv}; it never stops
 * on one.
 *
 * @param source   the file, as shown to the user (relative to the workspace when there is one)
 * @param position where in the file: {@code "row 17"}, {@code "line 12"}, {@code "byte 4096"}, or
 *                 the empty string for the whole file
 * @param kind     one of {@link #KINDS}
 * @param reason   what was expected, what was found, and what to do, in one sentence or two
 */
public record Problem(String source, String position, String kind, String reason) {
    /** The problem kinds, in the order the summary lists them. */
    public static final List<String> KINDS = List.of(
            "empty", "corrupt", "encrypted", "encoding", "too-large", "timeout", "unsupported", "parse", "unreadable");

    public Problem {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(position, "position");
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(reason, "reason");
        if (!KINDS.contains(kind)) {
            throw new IllegalArgumentException("problem kind must be one of " + KINDS + ", got '" + kind + "'");
        }
    }
}
