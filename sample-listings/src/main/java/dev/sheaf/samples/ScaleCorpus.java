package dev.sheaf.samples;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Benchmark corpora of any size from the same invented shop: the same copywriters, suppliers,
 * variants and misspellings as the demo (misspellings at a rate instead of exact counts).
 * Streaming: one listing is built, written and dropped at a time, so the heap stays small for any N.
 */
final class ScaleCorpus {
    private ScaleCorpus() {
    }

    /** Share of listings that carry one planted misspelling. */
    static final double TYPO_RATE = 0.01;
    /** Files per sub-folder of a folder corpus. */
    static final int FILES_PER_FOLDER = 1000;

    /** Progress callback: listings written so far and bytes (approximate for folders). */
    interface Progress {
        void update(long listings, long bytes);
    }

    static Product listing(ProductFactory factory, long seed, long i, Draft.Detail detail) {
        Product p = factory.make(i, detail);
        return Typos.maybePlant(p, Rng.of(seed, "scale-typo", i), TYPO_RATE);
    }

    /** Listings per work unit; a few units per thread are in flight, so memory stays bounded. */
    static final int BATCH = 2000;

    static int threads() {
        return Math.max(1, Math.min(Runtime.getRuntime().availableProcessors(), 8));
    }

    /**
     * Writes listings 1..n as JSON lines. Batches are generated on all cores and written in order,
     * so the bytes do not depend on the number of threads.
     */
    static long jsonl(long n, long seed, Path out, Progress progress) throws IOException {
        return jsonl(n, seed, out, progress, threads());
    }

    static long jsonl(long n, long seed, Path out, Progress progress, int threads) throws IOException {
        ProductFactory factory = new ProductFactory(seed);
        long[] bytes = {0};
        Output.write(out, os -> {
            runBatches(n, threads, (from, to) -> {
                java.io.ByteArrayOutputStream buf = new java.io.ByteArrayOutputStream((int) (to - from + 1) * 480);
                try (Feeds.JsonlWriter w = new Feeds.JsonlWriter(buf)) {
                    for (long i = from; i <= to; i++) {
                        w.write(listing(factory, seed, i, Draft.Detail.FEED));
                    }
                }
                return buf.toByteArray();
            }, (to, chunk) -> {
                os.write(chunk);
                long before = bytes[0];
                bytes[0] += chunk.length;
                if (to / 50_000 != (to - BATCH) / 50_000 || to == n) {
                    progress.update(to, bytes[0]);
                }
                return before;
            });
        });
        return bytes[0];
    }

    interface BatchWork {
        byte[] run(long from, long to) throws IOException;
    }

    interface BatchSink {
        long accept(long to, byte[] chunk) throws IOException;
    }

    private static void runBatches(long n, int threads, BatchWork work, BatchSink sink) throws IOException {
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "sheaf-generate");
            t.setDaemon(true);
            return t;
        });
        try {
            java.util.ArrayDeque<java.util.concurrent.Future<byte[]>> inflight = new java.util.ArrayDeque<>();
            java.util.ArrayDeque<Long> ends = new java.util.ArrayDeque<>();
            long next = 1;
            while (next <= n || !inflight.isEmpty()) {
                while (next <= n && inflight.size() < threads * 2) {
                    long from = next;
                    long to = Math.min(n, next + BATCH - 1);
                    inflight.add(pool.submit(() -> work.run(from, to)));
                    ends.add(to);
                    next = to + 1;
                }
                byte[] chunk;
                try {
                    chunk = inflight.poll().get();
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    throw new IOException("interrupted while generating", e);
                } catch (java.util.concurrent.ExecutionException e) {
                    Throwable c = e.getCause();
                    if (c instanceof IOException) {
                        throw (IOException) c;
                    }
                    if (c instanceof RuntimeException) {
                        throw (RuntimeException) c;
                    }
                    throw new IOException(c);
                }
                sink.accept(ends.poll(), chunk);
            }
        } finally {
            pool.shutdownNow();
        }
    }

    /** Kinds of files in a folder corpus: mostly HTML pages, a few notes and sheets. */
    static String kind(long seed, long i) {
        switch (Rng.of(seed, "file-kind", i).weighted(90, 4, 4, 1, 1)) {
            case 0: return "html";
            case 1: return "txt";
            case 2: return "md";
            case 3: return "pdf";
            default: return "docx";
        }
    }

    static long folder(long n, long seed, Path dir, Progress progress) throws IOException {
        ProductFactory factory = new ProductFactory(seed);
        long[] bytes = {0};
        runBatches(n, threads(), (from, to) -> {
            long written = 0;
            for (long i = from; i <= to; i++) {
                written += writeFile(factory, seed, i, dir);
            }
            return java.nio.ByteBuffer.allocate(8).putLong(written).array();
        }, (to, chunk) -> {
            bytes[0] += java.nio.ByteBuffer.wrap(chunk).getLong();
            if (to / 10_000 != (to - BATCH) / 10_000 || to == n) {
                progress.update(to, bytes[0]);
            }
            return bytes[0];
        });
        return bytes[0];
    }

    private static long writeFile(ProductFactory factory, long seed, long i, Path dir) throws IOException {
        String kind = kind(seed, i);
        Product p = listing(factory, seed, i, Draft.Detail.FULL);
        long folder = (i - 1) / FILES_PER_FOLDER;
        String name = Long.toString(folder);
        Path sub = dir.resolve(name.length() >= 4 ? name : "0000".substring(name.length()) + name);
        Path file = sub.resolve(p.id().toLowerCase(Locale.ROOT) + "." + kind);
        byte[] content;
        switch (kind) {
            case "html": {
                Rng r = Rng.of(seed, "html", i);
                content = HtmlPage.render(p, HtmlPage.SpecShape.values()[r.weighted(40, 30, 30)], r.chance(0.6))
                        .getBytes(java.nio.charset.StandardCharsets.UTF_8);
                break;
            }
            case "txt": content = TextNote.plain(p).getBytes(java.nio.charset.StandardCharsets.UTF_8); break;
            case "md": content = TextNote.markdown(p).getBytes(java.nio.charset.StandardCharsets.UTF_8); break;
            case "pdf": content = PdfSheet.render(p); break;
            default: content = DocxSheet.render(p); break;
        }
        Output.writeBytes(file, content);
        return content.length;
    }

}
