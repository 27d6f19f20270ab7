package dev.sheaf.miner.ingest;

import java.io.IOException;
import java.nio.file.FileSystemLoopException;
import java.nio.file.FileSystems;
import java.nio.file.FileVisitOption;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.PathMatcher;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.Semaphore;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The front door of ingest: reads every file of the given sources into {@link Listing}s.
 *
 * <pre>{@code
 * IngestSummary s = Ingest.builder().source(SourceSpec.of(catalog)).workspaceRoot(ws).build()
 *         .run(listing -> ...);
 * }</pre>
 *
 * <p>Folders are walked recursively (symbolic links are followed, loops are detected and
 * reported; hidden files and folders, whose names start with {@code .}, are skipped). A file
 * matched by two sources is read once, by the source whose path is the file itself if there is
 * one, else by the first. Files are read in parallel; listings of one file reach the sink in file
 * order from one thread, but different files' listings arrive from several threads at once, so
 * the sink must be thread-safe. Bad input never stops a run: each problem is recorded (see
 * {@link Problem}) and the run goes on. An exception thrown by the sink stops the run and is
 * rethrown by {@link #run}.
 */
public final class Ingest {
    /** Default largest file read: 50 MB. */
    public static final long DEFAULT_MAX_FILE_BYTES = 50L * 1024 * 1024;
    /** Default time one document parse may take: 60 s. */
    public static final Duration DEFAULT_PER_FILE_TIMEOUT = Duration.ofSeconds(60);
    /** Default characters of text kept per extracted document (PDF, DOCX ...) and per text file: 5 million. */
    public static final int DEFAULT_MAX_TEXT_CHARS = 5_000_000;

    private final List<SourceSpec> sources;
    private final long maxFileBytes;
    private final Duration perFileTimeout;
    private final int threads;
    private final Path workspaceRoot;
    private final IngestProgress progress;
    private final int maxTextChars;

    private Ingest(Builder b) {
        this.sources = List.copyOf(b.sources);
        this.maxFileBytes = b.maxFileBytes;
        this.perFileTimeout = b.perFileTimeout;
        this.threads = b.threads;
        this.workspaceRoot = b.workspaceRoot == null ? null : b.workspaceRoot.toAbsolutePath().normalize();
        this.progress = b.progress;
        this.maxTextChars = b.maxTextChars;
    }

    public static Builder builder() {
        return new Builder();
    }

    /** Settings of a run; every setter validates its argument. */
    public static final class Builder {
        private final List<SourceSpec> sources = new ArrayList<>();
        private long maxFileBytes = DEFAULT_MAX_FILE_BYTES;
        private Duration perFileTimeout = DEFAULT_PER_FILE_TIMEOUT;
        private int threads = Runtime.getRuntime().availableProcessors();
        private Path workspaceRoot;
        private IngestProgress progress = IngestProgress.NONE;
        private int maxTextChars = DEFAULT_MAX_TEXT_CHARS;

        private Builder() {
        }

        public Builder source(SourceSpec s) {
            sources.add(Objects.requireNonNull(s, "source"));
            return this;
        }

        public Builder sources(Collection<SourceSpec> s) {
            s.forEach(this::source);
            return this;
        }

        /**
         * Files read whole (HTML, PDF, DOCX, text) larger than this are not read ("too-large");
         * streamed feeds (CSV/TSV, JSON, JSON Lines) have no size limit. Default
         * {@value #DEFAULT_MAX_FILE_BYTES} bytes.
         */
        public Builder maxFileBytes(long bytes) {
            if (bytes <= 0) {
                throw new IllegalArgumentException("maxFileBytes must be positive, got " + bytes);
            }
            this.maxFileBytes = bytes;
            return this;
        }

        /** Time one document parse may take before it is abandoned ("timeout"); default 60 s. */
        public Builder perFileTimeout(Duration d) {
            if (d == null || d.isNegative() || d.isZero()) {
                throw new IllegalArgumentException("perFileTimeout must be positive, got " + d);
            }
            this.perFileTimeout = d;
            return this;
        }

        /** Files read at once; default the number of processors. */
        public Builder threads(int n) {
            if (n < 1) {
                throw new IllegalArgumentException("threads must be at least 1, got " + n);
            }
            this.threads = n;
            return this;
        }

        /** Listing sources and problem files are shown relative to this folder. */
        public Builder workspaceRoot(Path root) {
            this.workspaceRoot = root;
            return this;
        }

        public Builder onProgress(IngestProgress p) {
            this.progress = Objects.requireNonNull(p, "progress");
            return this;
        }

        /** Characters of text kept per extracted document (Tika's write limit) and per text file; default 5 million. */
        public Builder maxTextChars(int n) {
            if (n < 1) {
                throw new IllegalArgumentException("maxTextChars must be positive, got " + n);
            }
            this.maxTextChars = n;
            return this;
        }

        public Ingest build() {
            if (sources.isEmpty()) {
                throw new IllegalStateException("no source given: call source(SourceSpec) at least once");
            }
            return new Ingest(this);
        }

        /** Shorthand for {@code build().run(sink)}. */
        public IngestSummary run(Consumer<Listing> sink) {
            return build().run(sink);
        }
    }

    /** A failure of the caller's sink, carried out of the worker so the run can stop and rethrow it. */
    private static final class SinkFailure extends RuntimeException {
        SinkFailure(RuntimeException cause) {
            super(cause);
        }
    }

    /** Reads every source; streams listings to {@code sink} (thread-safe!), returns what was read. */
    public IngestSummary run(Consumer<Listing> sink) {
        Objects.requireNonNull(sink, "sink");
        long start = System.nanoTime();
        Counters c = new Counters(sink);
        ThreadPoolExecutor pool = new ThreadPoolExecutor(threads, threads, 30, TimeUnit.SECONDS, new LinkedBlockingQueue<>(), r -> {
            Thread t = new Thread(r, "sheaf-ingest-" + c.threadNo.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
        Semaphore inFlight = new Semaphore(threads * 4);
        try {
            // Files are handed to the workers while the folders are still being walked.
            plan(c, p -> {
                if (c.failure.get() != null) {
                    return false;
                }
                c.filesSeen.incrementAndGet();
                inFlight.acquireUninterruptibly();
                pool.execute(() -> {
                    try {
                        if (c.failure.get() == null) {
                            readOne(p.path, p.spec, c);
                        }
                    } catch (RuntimeException | Error e) {
                        c.failure.compareAndSet(null, e instanceof SinkFailure ? e.getCause() : e);
                    } finally {
                        inFlight.release();
                    }
                });
                return true;
            });
        } finally {
            pool.shutdown();
            awaitQuietly(pool);
        }
        Throwable f = c.failure.get();
        if (f instanceof RuntimeException re) {
            throw re;
        }
        if (f instanceof Error err) {
            throw err;
        }
        List<Problem> problems;
        synchronized (c.problems) {
            problems = new ArrayList<>(c.problems);
        }
        problems.sort(PROBLEM_ORDER);
        return new IngestSummary(c.filesSeen.get(), c.filesRead.get(), c.listings.get(), c.bytes.get(), problems,
                Duration.ofNanos(System.nanoTime() - start));
    }

    private static void awaitQuietly(ExecutorService pool) {
        boolean interrupted = false;
        while (true) {
            try {
                if (pool.awaitTermination(1, TimeUnit.HOURS)) {
                    break;
                }
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }

    private final class Counters implements SourceFile.Run {
        final Consumer<Listing> sink;
        final AtomicLong filesSeen = new AtomicLong();
        final AtomicLong filesDone = new AtomicLong();
        final AtomicLong filesRead = new AtomicLong();
        final AtomicLong listings = new AtomicLong();
        final AtomicLong bytes = new AtomicLong();
        final AtomicLong problemCount = new AtomicLong();
        final AtomicInteger threadNo = new AtomicInteger();
        final List<Problem> problems = new ArrayList<>();
        final AtomicReference<Throwable> failure = new AtomicReference<>();

        Counters(Consumer<Listing> sink) {
            this.sink = sink;
        }

        @Override
        public void listing(Listing l) {
            try {
                sink.accept(l);
            } catch (RuntimeException e) {
                throw new SinkFailure(e);
            }
            long n = listings.incrementAndGet();
            progress.update(filesDone.get(), n, bytes.get(), problemCount.get());
        }

        @Override
        public void problem(Problem p) {
            synchronized (problems) {
                problems.add(p);
            }
            problemCount.incrementAndGet();
        }

        @Override
        public void bytes(long n) {
            bytes.addAndGet(n);
        }

        @Override
        public Duration perFileTimeout() {
            return perFileTimeout;
        }

        @Override
        public int writeLimit() {
            return maxTextChars;
        }
    }

    private record Planned(Path path, SourceSpec spec) {
    }

    /** Takes one planned file; false stops the walk. */
    private interface Plan {
        boolean take(Planned p);
    }

    /** Every file to read, each once, in source order; a file named by a source of its own is read by that source. */
    private void plan(Counters c, Plan out) {
        Map<Path, SourceSpec> explicit = new LinkedHashMap<>();
        for (SourceSpec s : sources) {
            Path p = s.path().toAbsolutePath().normalize();
            if (Files.isRegularFile(p)) {
                explicit.putIfAbsent(p, s);
            }
        }
        Set<Path> seen = new HashSet<>(explicit.keySet());
        Set<Path> emittedExplicit = new HashSet<>();
        for (SourceSpec s : sources) {
            Path p = s.path().toAbsolutePath().normalize();
            if (Files.isRegularFile(p)) {
                if (explicit.get(p) == s && emittedExplicit.add(p) && !out.take(new Planned(p, s))) {
                    return;
                }
            } else if (Files.isDirectory(p)) {
                if (!walk(p, s, seen, out, c)) {
                    return;
                }
            } else {
                c.problem(new Problem(display(s.path()), "", "unreadable", "the source path does not exist or is not a file or folder; "
                        + "check the path (relative paths are resolved against the workspace folder)"));
            }
        }
    }

    private boolean walk(Path root, SourceSpec s, Set<Path> seen, Plan out, Counters c) {
        List<PathMatcher> include = matchers(s.include());
        List<PathMatcher> exclude = matchers(s.exclude());
        boolean[] stopped = {false};
        try {
            Files.walkFileTree(root, EnumSet.of(FileVisitOption.FOLLOW_LINKS), Integer.MAX_VALUE, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult preVisitDirectory(Path dir, BasicFileAttributes attrs) {
                    return !dir.equals(root) && dir.getFileName().toString().startsWith(".")
                            ? FileVisitResult.SKIP_SUBTREE : FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attrs) {
                    if (file.getFileName().toString().startsWith(".")) {
                        return FileVisitResult.CONTINUE;
                    }
                    if (attrs.isSymbolicLink()) {
                        // links are followed: a link seen as a link leads nowhere (dangling, or a loop of links)
                        c.problem(new Problem(display(file), "", "unreadable",
                                "a symbolic link that leads to no file (its target is missing, or links loop); it was skipped"));
                        return FileVisitResult.CONTINUE;
                    }
                    if (!attrs.isRegularFile()) {
                        return FileVisitResult.CONTINUE;
                    }
                    Path rel = root.relativize(file);
                    if ((include.isEmpty() || matches(include, rel)) && !matches(exclude, rel)) {
                        Path abs = file.toAbsolutePath().normalize();
                        if (seen.add(abs) && !out.take(new Planned(abs, s))) {
                            stopped[0] = true;
                            return FileVisitResult.TERMINATE;
                        }
                    }
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult visitFileFailed(Path file, IOException e) {
                    String why = e instanceof FileSystemLoopException
                            ? "a symbolic link loops back to a folder above it; the loop was not followed"
                            : "cannot be read (" + e.getClass().getSimpleName() + ": " + e.getMessage() + "); check its permissions";
                    c.problem(new Problem(display(file), "", "unreadable", why));
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            c.problem(new Problem(display(root), "", "unreadable", "the folder cannot be walked: " + e.getMessage()));
        }
        return !stopped[0];
    }

    private static List<PathMatcher> matchers(List<String> globs) {
        List<PathMatcher> m = new ArrayList<>();
        for (String g : globs) {
            m.add(FileSystems.getDefault().getPathMatcher("glob:" + g));
            // "**/x" should also match x at the top level, as users expect
            String rest = g;
            while (rest.startsWith("**/")) {
                rest = rest.substring(3);
                m.add(FileSystems.getDefault().getPathMatcher("glob:" + rest));
            }
        }
        return m;
    }

    private static boolean matches(List<PathMatcher> ms, Path rel) {
        for (PathMatcher m : ms) {
            if (m.matches(rel)) {
                return true;
            }
        }
        return false;
    }

    /** A path as shown: relative to the workspace root when under it, with {@code /} separators. */
    String display(Path p) {
        Path abs = p.toAbsolutePath().normalize();
        Path shown = workspaceRoot != null && abs.startsWith(workspaceRoot) ? workspaceRoot.relativize(abs) : p.normalize();
        return shown.toString().replace(java.io.File.separatorChar, '/');
    }

    private void readOne(Path path, SourceSpec spec, Counters c) {
        String shown = display(displayPath(path, spec));
        SourceFile file = null;
        try {
            long size = Files.size(path);
            file = new SourceFile(path, shown, size, spec.mapping(), c);
            if (size == 0) {
                file.problem("", "empty", "the file is empty (0 bytes)");
            } else {
                ListingReader reader = Readers.forFile(file);
                if (size > maxFileBytes && !reader.streams()) {
                    file.problem("", "too-large", "the file has " + size + " bytes, more than the limit of " + maxFileBytes
                            + " for a " + reader.name() + " file, which is read whole; raise the limit or split the file");
                    return;
                }
                try {
                    reader.read(file);
                } catch (StackOverflowError e) {
                    file.problem("", "corrupt", "the " + reader.name() + " reader gave up: the content is nested too deeply");
                }
                if (file.listings() == 0 && file.problems() == 0) {
                    file.problem("", "empty", "no listings found in the file (read as " + reader.name() + ")");
                }
            }
        } catch (SinkFailure e) {
            throw e;
        } catch (IOException e) {
            Problem p = new Problem(shown, "", "unreadable", "cannot be read: " + e.getClass().getSimpleName() + ": " + e.getMessage());
            if (file != null) {
                file.problem(p.position(), p.kind(), p.reason());
            } else {
                c.problem(p);
            }
        } catch (RuntimeException e) {
            String reason = "the reader failed unexpectedly (" + e.getClass().getSimpleName() + ": " + e.getMessage()
                    + "); the file was skipped";
            if (file != null) {
                file.problem("", "parse", reason);
            } else {
                c.problem(new Problem(shown, "", "parse", reason));
            }
        } finally {
            long done = c.filesDone.incrementAndGet();
            if (file != null && file.listings() > 0) {
                c.filesRead.incrementAndGet();
            }
            progress.update(done, c.listings.get(), c.bytes.get(), c.problemCount.get());
        }
    }

    /** The file's path in the form the source named it (relative paths stay relative when there is no workspace root). */
    private Path displayPath(Path abs, SourceSpec spec) {
        if (workspaceRoot != null) {
            return abs;
        }
        Path given = spec.path();
        Path givenAbs = given.toAbsolutePath().normalize();
        if (abs.equals(givenAbs)) {
            return given;
        }
        return abs.startsWith(givenAbs) ? given.resolve(givenAbs.relativize(abs)) : abs;
    }

    private static final Pattern NUMBER = Pattern.compile("\\d+");

    /** Source, then the number in the position (row 2 before row 10), then the text. */
    static final Comparator<Problem> PROBLEM_ORDER = Comparator.comparing(Problem::source)
            .thenComparingLong(p -> {
                Matcher m = NUMBER.matcher(p.position());
                return m.find() ? Long.parseLong(m.group().length() > 18 ? m.group().substring(0, 18) : m.group()) : -1L;
            })
            .thenComparing(Problem::position).thenComparing(Problem::kind).thenComparing(Problem::reason);
}
