package dev.sheaf.curator.session;

import dev.sheaf.miner.ingest.EvidenceIndex;
import dev.sheaf.miner.ingest.Ingest;
import dev.sheaf.miner.ingest.IngestSummary;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.ProblemLog;
import dev.sheaf.miner.ingest.SourceSpec;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import dev.sheaf.miner.mine.HarvestOptions;
import dev.sheaf.miner.mine.Harvester;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;

/**
 * Background work on a workspace's listings, for the desktop: mine a harvest (and build the
 * evidence index in the same pass over the files), or build only the evidence index. Plain Java,
 * run from a background task; progress goes to a {@link Progress} and a {@link BooleanSupplier}
 * says when to stop. A cancelled run writes nothing: the harvest file and the current evidence
 * index stay as they were.
 *
 * <p>The harvest is made with the miner's defaults ({@link HarvestOptions}) and the workspace's
 * analysis profile, exactly as {@code sheaf mine --workspace DIR} makes it, and written to the
 * same files ({@code OUTPUT/harvest.json}, {@code harvest.csv}, {@code problems.csv}).
 */
public final class Mining {
    private Mining() {
    }

    /** Told how far the work has come; called from background threads, often. */
    @FunctionalInterface
    public interface Progress {
        /**
         * @param phase what is happening ("reading listings", "counting 2-grams", "scoring", "writing")
         * @param done  bytes read so far (or -1 when the phase has no measure)
         * @param total bytes to read (or -1 when unknown)
         * @param listings listings read so far
         */
        void update(String phase, long done, long total, long listings);
    }

    /** What a mining run did. */
    public record Result(Harvest harvest, long listings, int problems, boolean indexed) {
    }

    /** The analysis of a workspace's profile (a preset name, or a profile file relative to the workspace). */
    public static Analysis analysisOf(Workspace ws) throws IOException {
        java.util.Optional<Path> file = ws.profileFile();
        AnalysisProfile p = file.isPresent() ? AnalysisProfile.load(file.get()) : AnalysisProfile.resolve(ws.profile());
        return Analysis.of(p);
    }

    /** Opens the workspace's evidence index, or returns null when it has none yet. */
    public static EvidenceIndex openIndex(Workspace ws) throws IOException {
        Path dir = CuratorSession.evidenceFolder(ws);
        return EvidenceIndex.exists(dir) ? EvidenceIndex.open(dir, analysisOf(ws).analyzer()) : null;
    }

    /**
     * Reads every listing source of the workspace once, mining a harvest and building the evidence
     * index together, then writes {@code harvest.json}, {@code harvest.csv} and {@code problems.csv}
     * to the output folder and makes the new index current.
     *
     * @throws CancellationException when {@code cancelled} turned true (nothing was written)
     */
    public static Result mine(Workspace ws, Progress progress, BooleanSupplier cancelled) throws IOException {
        Objects.requireNonNull(progress);
        Analysis analysis = analysisOf(ws);
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        Harvester harvester = Harvester.builder().profile(analysis.profile()).options(HarvestOptions.builder().build())
                .threads(threads).sources(sourceNames(ws))
                .progress(phase -> progress.update(phase, -1, -1, -1)).build();
        long total = SourceSpec.totalBytes(ws.sources());
        Path out = ws.output();
        Files.createDirectories(out);
        try (Harvester.Run run = harvester.start();
             EvidenceIndex.Writer index = EvidenceIndex.writer(CuratorSession.evidenceFolder(ws), analysis.analyzer())) {
            IngestSummary read = read(ws, threads, total, progress, cancelled, l -> {
                run.accept(l);
                index.accept(l);
            });
            progress.update("finishing the evidence index", -1, -1, read.listings());
            index.commit();
            stopIf(cancelled);
            Harvest h = run.finish();
            stopIf(cancelled);
            progress.update("writing the harvest", -1, -1, read.listings());
            HarvestFiles.write(h, out);
            ProblemLog.write(out.resolve("problems.csv"), read.problems());
            return new Result(h, read.listings(), read.problems().size(), true);
        }
    }

    /**
     * Builds only the evidence index of the workspace (when the harvest was mined on the command
     * line and the index is missing), and opens it.
     *
     * @throws CancellationException when {@code cancelled} turned true (the current index, if any, is untouched)
     */
    public static EvidenceIndex index(Workspace ws, Progress progress, BooleanSupplier cancelled) throws IOException {
        Analysis analysis = analysisOf(ws);
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        Path dir = CuratorSession.evidenceFolder(ws);
        try (EvidenceIndex.Writer index = EvidenceIndex.writer(dir, analysis.analyzer())) {
            IngestSummary read = read(ws, threads, SourceSpec.totalBytes(ws.sources()), progress, cancelled, index);
            progress.update("finishing the evidence index", -1, -1, read.listings());
            index.commit();
        }
        return EvidenceIndex.open(dir, analysis.analyzer());
    }

    private static IngestSummary read(Workspace ws, int threads, long total, Progress progress, BooleanSupplier cancelled,
                                      Consumer<Listing> sink) {
        Ingest.Builder b = Ingest.builder().threads(threads).workspaceRoot(ws.dir())
                .onProgress((files, listings, bytes, problems) -> progress.update("reading listings", bytes, total, listings));
        for (SourceSpec s : ws.sources()) {
            b.source(s);
        }
        return b.build().run(l -> {
            if (cancelled.getAsBoolean()) {
                throw new CancellationException("stopped by the curator");
            }
            sink.accept(l);
        });
    }

    private static void stopIf(BooleanSupplier cancelled) {
        if (cancelled.getAsBoolean()) {
            throw new CancellationException("stopped by the curator");
        }
    }

    /** The sources as the harvest records them: relative to the workspace, with {@code /}. */
    static List<String> sourceNames(Workspace ws) {
        List<String> names = new ArrayList<>();
        for (SourceSpec s : ws.sources()) {
            names.add(ws.dir().relativize(s.path().toAbsolutePath().normalize()).toString().replace('\\', '/'));
        }
        return names;
    }

}
