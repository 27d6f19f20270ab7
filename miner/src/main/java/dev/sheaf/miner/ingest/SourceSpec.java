package dev.sheaf.miner.ingest;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;
import java.util.stream.Stream;

/**
 * One place to read listings from.
 *
 * @param path    a file or a folder (folders are walked recursively)
 * @param include glob patterns relative to {@code path} ({@code "**}{@code /*.html"}); empty means every file
 * @param exclude glob patterns relative to {@code path}; a file matching any of them is skipped
 * @param mapping how CSV/TSV columns and JSON members map to listing fields; null = detect from the
 *                header or member names
 */
public record SourceSpec(Path path, List<String> include, List<String> exclude, ColumnMapping mapping) {
    public SourceSpec {
        Objects.requireNonNull(path, "path");
        include = include == null ? List.of() : List.copyOf(include);
        exclude = exclude == null ? List.of() : List.copyOf(exclude);
        for (String g : include) {
            requireGlob(g);
        }
        for (String g : exclude) {
            requireGlob(g);
        }
    }

    /** Every file under {@code path}, mapping detected. */
    public static SourceSpec of(Path path) {
        return new SourceSpec(path, List.of(), List.of(), null);
    }

    /** The same source with a given column mapping. */
    public SourceSpec withMapping(ColumnMapping m) {
        return new SourceSpec(path, include, exclude, m);
    }

    private static void requireGlob(String g) {
        if (g == null || g.isBlank()) {
            throw new IllegalArgumentException("a glob pattern must not be empty; use \"**/*\" for every file");
        }
    }

    /**
     * The bytes of every regular file under the sources (include and exclude globs not applied), for a
     * progress bar's total; -1 when a folder cannot be walked, so the bar shows no total.
     */
    public static long totalBytes(List<SourceSpec> sources) {
        long total = 0;
        for (SourceSpec s : sources) {
            try (Stream<Path> w = Files.walk(s.path())) {
                total += w.filter(Files::isRegularFile).mapToLong(f -> f.toFile().length()).sum();
            } catch (IOException | RuntimeException e) {
                return -1;
            }
        }
        return total;
    }
}
