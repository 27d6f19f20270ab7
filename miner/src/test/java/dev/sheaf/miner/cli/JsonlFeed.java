package dev.sheaf.miner.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.bench.JsonlListings;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.PathMatcher;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Collectors;
import java.util.stream.Stream;

/** Test feed: JSONL files and folders of them, read with the test-only reader (the real feed is IngestFeed). */
final class JsonlFeed implements ListingFeed {
    @Override
    public Job fromArguments(List<Path> sources, List<String> include, List<String> exclude, Path mappingFile) {
        return job(sources, include, exclude, null, null);
    }

    @Override
    public Job fromWorkspace(Path dir) throws IOException {
        JsonNode ws = new ObjectMapper().readTree(Files.readString(dir.resolve("workspace.json")));
        List<Path> paths = new ArrayList<>();
        ws.get("sources").forEach(s -> paths.add(dir.resolve(s.get("path").asText())));
        return job(paths, List.of(), List.of(), ws.has("profile") ? ws.get("profile").asText() : null,
                dir.resolve(ws.has("output") ? ws.get("output").asText() : "out"));
    }

    private Job job(List<Path> sources, List<String> include, List<String> exclude, String profile, Path output) {
        return new Job() {
            @Override
            public List<String> sourceNames() {
                return sources.stream().map(p -> p.getFileName().toString()).collect(Collectors.toList());
            }

            @Override
            public String profile() {
                return profile;
            }

            @Override
            public Path output() {
                return output;
            }

            @Override
            public long totalBytes() {
                return -1;
            }

            @Override
            public Summary run(int threads, Consumer<Listing> sink, Progress progress) throws IOException {
                long t0 = System.nanoTime();
                List<Problem> problems = new ArrayList<>();
                long listings = 0;
                long bytes = 0;
                long files = 0;
                for (Path root : sources) {
                    List<Path> filesOf;
                    if (Files.isDirectory(root)) {
                        try (Stream<Path> w = Files.walk(root)) {
                            filesOf = w.filter(Files::isRegularFile).sorted().filter(p -> matches(root, p, include, exclude))
                                    .collect(Collectors.toList());
                        }
                    } else {
                        filesOf = List.of(root);
                    }
                    for (Path f : filesOf) {
                        files++;
                        long[] n = {0};
                        JsonlListings.read(f, f.getFileName().toString(), l -> {
                            n[0]++;
                            sink.accept(l);
                        }, p -> {
                            String[] parts = p.split(",", 4);
                            problems.add(new Problem(parts[0], parts[1], parts[2], parts[3]));
                        });
                        listings += n[0];
                        bytes += Files.size(f);
                        progress.update(files, listings, bytes, problems.size());
                    }
                }
                return new Summary(files, files, listings, bytes, problems, Duration.ofNanos(System.nanoTime() - t0));
            }
        };
    }

    private static boolean matches(Path root, Path file, List<String> include, List<String> exclude) {
        Path rel = root.relativize(file);
        boolean in = include.isEmpty() || include.stream().anyMatch(g -> matcher(g).matches(rel));
        boolean out = exclude.stream().anyMatch(g -> matcher(g).matches(rel));
        return in && !out;
    }

    private static PathMatcher matcher(String glob) {
        return FileSystems.getDefault().getPathMatcher("glob:" + glob);
    }

    @Override
    public void writeProblems(Path csv, List<Problem> problems) throws IOException {
        AtomicFiles.writeText(csv, w -> {
            SafeCsv c = new SafeCsv(w);
            c.row("source", "position", "kind", "reason");
            for (Problem p : problems) {
                c.row(p.source(), p.position(), p.kind(), p.reason());
            }
            c.flush();
        });
    }
}
