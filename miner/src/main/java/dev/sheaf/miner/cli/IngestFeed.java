package dev.sheaf.miner.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.ingest.ColumnMapping;
import dev.sheaf.miner.ingest.Ingest;
import dev.sheaf.miner.ingest.IngestSummary;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.ProblemLog;
import dev.sheaf.miner.ingest.SourceSpec;
import dev.sheaf.miner.ingest.Workspace;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.function.Consumer;

/** {@link ListingFeed} over the ingest stage: the real readers, with their problem records. */
final class IngestFeed implements ListingFeed {
    private static final Set<String> MAPPING_KEYS = Set.of("id", "title", "description", "category", "bullets", "specs", "text");

    @Override
    public Job fromArguments(List<Path> sources, List<String> include, List<String> exclude, Path mappingFile) throws IOException {
        ColumnMapping mapping = mappingFile == null ? null : readMapping(mappingFile);
        List<SourceSpec> specs = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (Path p : sources) {
            specs.add(new SourceSpec(p, List.copyOf(include), List.copyOf(exclude), mapping));
            names.add(p.toString().replace('\\', '/'));
        }
        return new IngestJob(specs, Path.of("").toAbsolutePath(), names, null, null);
    }

    @Override
    public Job fromWorkspace(Path dir) throws IOException {
        Workspace ws = Workspace.load(dir);
        List<String> names = new ArrayList<>();
        Path root = dir.toAbsolutePath().normalize();
        for (SourceSpec s : ws.sources()) {
            names.add(root.relativize(s.path().toAbsolutePath().normalize()).toString().replace('\\', '/'));
        }

        return new IngestJob(ws.sources(), root, names, ws.profile(), ws.output());
    }

    @Override
    public void writeProblems(Path csv, List<Problem> problems) throws IOException {
        List<dev.sheaf.miner.ingest.Problem> p = new ArrayList<>();
        for (Problem q : problems) {
            p.add(new dev.sheaf.miner.ingest.Problem(q.source(), q.position(), q.kind(), q.reason()));
        }
        ProblemLog.write(csv, p);
    }

    /** A mapping file: one JSON object with the members of a workspace source's "mapping". */
    static ColumnMapping readMapping(Path file) throws IOException {
        JsonNode n = new ObjectMapper().readTree(Files.readString(file));
        if (n == null || !n.isObject()) {
            throw new IllegalArgumentException(file + ": a mapping file holds one JSON object such as "
                    + "{\"id\": \"sku\", \"title\": \"name\", \"specs\": [\"*\"]}");
        }
        for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!MAPPING_KEYS.contains(k)) {
                throw new IllegalArgumentException(file + ": \"" + k + "\" is not a mapping member; the members are "
                        + String.join(", ", List.of("id", "title", "description", "category", "bullets", "specs", "text")));
            }
        }
        return new ColumnMapping(text(n, "id"), text(n, "title"), text(n, "description"), text(n, "category"),
                list(n, "bullets"), list(n, "specs"), list(n, "text"));
    }

    private static String text(JsonNode n, String k) {
        return n.hasNonNull(k) ? n.get(k).asText() : null;
    }

    private static List<String> list(JsonNode n, String k) {
        List<String> out = new ArrayList<>();
        if (n.hasNonNull(k)) {
            JsonNode v = n.get(k);
            if (v.isArray()) {
                v.forEach(e -> out.add(e.asText()));
            } else {
                out.add(v.asText());
            }
        }
        return out;
    }

    private static final class IngestJob implements Job {
        private final List<SourceSpec> specs;
        private final Path root;
        private final List<String> names;
        private final String profile;
        private final Path output;

        IngestJob(List<SourceSpec> specs, Path root, List<String> names, String profile, Path output) {
            this.specs = specs;
            this.root = root;
            this.names = names;
            this.profile = profile;
            this.output = output;
        }

        @Override
        public List<String> sourceNames() {
            return names;
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
            return SourceSpec.totalBytes(specs);
        }

        @Override
        public Summary run(int threads, Consumer<Listing> sink, Progress progress) {
            Ingest.Builder b = Ingest.builder().threads(threads).workspaceRoot(root)
                    .onProgress((filesDone, listings, bytes, problems) -> progress.update(filesDone, listings, bytes, problems));
            for (SourceSpec s : specs) {
                b.source(s);
            }

            IngestSummary r = b.build().run(sink);
            List<Problem> problems = new ArrayList<>();
            for (dev.sheaf.miner.ingest.Problem p : r.problems()) {
                problems.add(new Problem(p.source(), p.position(), p.kind(), p.reason()));
            }

            return new Summary(r.filesSeen(), r.filesRead(), r.listings(), r.bytesRead(), problems, r.elapsed());
        }
    }
}
