package dev.sheaf.vocab.io;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * All the files one command writes into one folder, replaced together: while a set is open on a
 * folder, every {@link AtomicFiles} write to a file in it (or in a folder below it), from any thread,
 * goes (atomically, as ever) to the same relative place in a hidden staging folder inside it
 * ({@code .<random hex>.staging.tmp}); {@link #commit()} then renames each file over its target, in
 * the order they were first written, and removes the staging folder. A failure before the commit (a full disk half-way through
 * the harvest, a bug) leaves every earlier output as it was: {@link #close()} without a commit
 * removes the temporaries. Renames need no room, so a full disk cannot stop the commit half-way; a
 * kill during it can, and then each file is still one whole version.
 *
 * <pre>{@code
 * OutputSet.writeAll(outDir, set -> {
 *     HarvestFiles.write(harvest, outDir);
 *     ProblemLog.write(outDir.resolve("problems.csv"), problems);
 * });
 * }</pre>
 *
 * A set opened on a folder that an open set already covers joins it (a label run inside an audit):
 * its commit is left to the outer set, and closing it without a commit abandons the outer set too.
 * A step that reads back a file written earlier in the same set reads {@link #current(Path)} (the
 * staged file keeps its name, so files beside it are found as they would be beside the target).
 */
public final class OutputSet implements AutoCloseable {
    private static final Map<Path, OutputSet> OPEN = new ConcurrentHashMap<>();

    private final Path dir;
    private final OutputSet outer;
    private final Map<Path, Staged> staged = new LinkedHashMap<>();
    private Path staging;
    private boolean committed;
    private boolean closed;
    private boolean abandoned;

    private record Staged(Path file, boolean keepBackup) {
    }

    private OutputSet(Path dir, OutputSet outer) {
        this.dir = dir;
        this.outer = outer;
    }

    /**
     * Opens a set on {@code dir} (created if missing), or joins the open set that covers it.
     * Stale temporaries of earlier, killed runs in {@code dir} are removed ({@link AtomicFiles#sweepStale}).
     */
    public static OutputSet open(Path dir) throws IOException {
        Path abs = dir.toAbsolutePath().normalize();
        Files.createDirectories(abs);
        AtomicFiles.sweepStale(abs);
        OutputSet cover = covering(abs);
        if (cover != null) {
            return new OutputSet(abs, cover);
        }
        OutputSet set = new OutputSet(abs, null);
        if (OPEN.putIfAbsent(abs, set) != null) {
            throw new IllegalStateException("an output set is already open on " + abs);
        }
        return set;
    }

    /** The writing steps of one command: every file they write under the set's folder belongs to the set. */
    @FunctionalInterface
    public interface Steps {
        void run(OutputSet set) throws IOException;
    }

    /** Runs {@code steps} in a set on {@code dir} and commits it when they all succeed; see the class comment. */
    public static void writeAll(Path dir, Steps steps) throws IOException {
        try (OutputSet set = open(dir)) {
            steps.run(set);
            set.commit();
        }
    }

    /** The open set whose folder holds {@code file}, or null. */
    static OutputSet covering(Path file) {
        if (OPEN.isEmpty()) {
            return null;
        }
        for (Path p = file.toAbsolutePath().normalize(); p != null; p = p.getParent()) {
            OutputSet s = OPEN.get(p);
            if (s != null) {
                return s;
            }
        }
        return null;
    }

    /** Where {@code target}'s newest content is now: its staged temporary in this set, else the file itself. */
    public Path current(Path target) {
        if (outer != null) {
            return outer.current(target);
        }
        Path abs = target.toAbsolutePath().normalize();
        synchronized (this) {
            Staged s = staged.get(abs);
            return s != null ? s.file : target;
        }
    }

    /** Where {@code target} (in this set's folder) is written until the commit. */
    synchronized Path stagingPath(Path target) throws IOException {
        checkOpen(target);
        if (staging == null) {
            staging = AtomicFiles.newTempDirectory(dir, "staging");
        }
        return staging.resolve(dir.relativize(target.toAbsolutePath().normalize()).toString());
    }

    private void checkOpen(Path target) throws IOException {
        if (closed || committed || abandoned) {
            throw new IOException("the output set on " + dir + " was " + (committed ? "committed" : "closed") + " before "
                    + target.getFileName() + " was complete");
        }
    }

    /** Records that {@code target}'s new version is complete at {@code file} (from {@link #stagingPath}). */
    synchronized void stage(Path file, Path target, boolean keepBackup) throws IOException {
        checkOpen(target);
        staged.putIfAbsent(target.toAbsolutePath().normalize(), new Staged(file, keepBackup));
    }

    /** Puts every staged file in place, in the order first written; a joined set leaves this to its outer set. */
    public void commit() throws IOException {
        if (outer != null) {
            committed = true;
            return;
        }
        synchronized (this) {
            if (closed || committed) {
                throw new IllegalStateException("the output set on " + dir + " is " + (closed ? "closed" : "committed already"));
            }
            if (abandoned) {
                throw new IOException("a part of the output in " + dir + " failed; the earlier files are kept");
            }
            Set<Path> dirs = new LinkedHashSet<>();
            List<Map.Entry<Path, Staged>> entries = new ArrayList<>(staged.entrySet());
            for (Map.Entry<Path, Staged> e : entries) {
                Files.createDirectories(e.getKey().getParent()); // a folder first written by this set
                AtomicFiles.replace(e.getValue().file, e.getKey(), e.getValue().keepBackup);
                staged.remove(e.getKey());
                dirs.add(e.getKey().getParent());
            }
            dirs.forEach(AtomicFiles::forceDirectory);
            committed = true;
            OPEN.remove(dir, this); // later writes to the folder go straight to their files again
        }
        removeStaging();
    }

    /** Ends the set; without a {@link #commit()}, removes every temporary and leaves the earlier files as they were. */
    @Override
    public void close() throws IOException {
        if (outer != null) {
            if (!committed) {
                outer.abandon();
            }
            return;
        }
        synchronized (this) {
            if (closed) {
                return;
            }
            closed = true;
            OPEN.remove(dir, this);
            staged.clear();
        }
        removeStaging();
    }

    private void removeStaging() throws IOException {
        Path s;
        synchronized (this) {
            s = staging;
        }
        if (s != null) {
            AtomicFiles.deleteTree(s);
        }
    }

    private synchronized void abandon() {
        abandoned = true;
    }
}
