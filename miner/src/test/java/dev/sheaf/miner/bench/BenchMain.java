package dev.sheaf.miner.bench;

import dev.sheaf.miner.ingest.Ingest;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.SourceSpec;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.Segmenter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.atomic.AtomicLong;

/**
 * The floors of bench/mine-benchmark.sh (test scope; the whole job is timed through ./sheaf mine):
 * {@code read-only|tokenizer-only|analysis-only FILE [threads]} — the same reading (the ingest stage,
 * as sheaf mine reads) and, for the last two, Lucene's tokenizer alone or the profile's whole analysis
 * over the same threads, with no counting: what mining is measured against.
 */
public final class BenchMain {
    private BenchMain() {
    }

    public static void main(String[] args) throws Exception {
        String mode = args[0];
        Path file = Path.of(args[1]);
        long t0 = System.nanoTime();
        if (mode.equals("analysis-only") || mode.equals("tokenizer-only") || mode.equals("read-only")) {
            int threads = args.length > 2 ? Integer.parseInt(args[2]) : Runtime.getRuntime().availableProcessors();
            long tokens = floor(file, threads, mode);
            System.err.printf("%s: %d tokens in %.2f s wall, %.2f s cpu%n", mode, tokens, (System.nanoTime() - t0) / 1e9, cpu() / 1e9);
        } else {
            throw new IllegalArgumentException("mode must be analysis-only, tokenizer-only or read-only");
        }
    }

    private static long tokens(org.apache.lucene.analysis.Tokenizer tok, String text) {
        if (text == null || text.isEmpty()) {
            return 0;
        }
        long n = 0;
        try {
            tok.setReader(new java.io.StringReader(text));
            tok.reset();
            while (tok.incrementToken()) {
                n++;
            }
            tok.end();
            tok.close();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return n;
    }

    /** CPU time of the whole process so far, in ns (all threads, JIT and GC included). */
    static long cpu() {
        return ((com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    /**
     * The floors, on the same reading thread and workers: {@code read-only} hands each listing to a
     * worker that only counts its characters (the ingest stage alone); {@code tokenizer-only} runs
     * Lucene's tokenizer alone over every text (no filters, no term ids); {@code analysis-only} the
     * profile's whole chain through the segmenter, as the miner's first pass does, with no counting.
     */
    private static long floor(Path file, int threads, String mode) throws Exception {
        Analysis analysis = Analysis.of(AnalysisProfile.defaults());
        ArrayBlockingQueue<List<Listing>> queue = new ArrayBlockingQueue<>(threads * 4);
        List<Listing> poison = new ArrayList<>();
        AtomicLong tokens = new AtomicLong();
        List<Thread> workers = new ArrayList<>();
        for (int w = 0; w < threads; w++) {
            Thread t = new Thread(() -> {
                Segmenter seg = analysis.newSegmenter();
                org.apache.lucene.analysis.standard.StandardTokenizer tok = new org.apache.lucene.analysis.standard.StandardTokenizer();
                long[] n = {0};
                try {
                    while (true) {
                        List<Listing> b = queue.take();
                        if (b == poison) {
                            break;
                        }
                        for (Listing l : b) {
                            if (mode.equals("read-only")) {
                                for (dev.sheaf.miner.ingest.Field f : l.fields()) {
                                    n[0] += f.text().length() + (f.key() == null ? 0 : f.key().length());
                                }
                                continue;
                            }
                            if (mode.equals("tokenizer-only")) {
                                for (dev.sheaf.miner.ingest.Field f : l.fields()) {
                                    n[0] += tokens(tok, f.key()) + tokens(tok, f.text());
                                }
                                continue;
                            }
                            seg.analyze(l, (field, part, ids, starts, ends, length) -> n[0] += length);
                        }
                    }
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
                tokens.addAndGet(n[0]);
            });
            t.start();
            workers.add(t);
        }
        List<Listing>[] batch = new List[] {new ArrayList<>(256)};
        // the reading of sheaf mine itself: the ingest stage's readers, one reading thread per file
        Ingest.builder().source(SourceSpec.of(file)).threads(1).build().run(l -> {
            batch[0].add(l);
            if (batch[0].size() == 256) {
                try {
                    queue.put(batch[0]);
                } catch (InterruptedException e) {
                    throw new IllegalStateException(e);
                }
                batch[0] = new ArrayList<>(256);
            }
        });
        queue.put(batch[0]);
        for (int w = 0; w < threads; w++) {
            queue.put(poison);
        }
        for (Thread t : workers) {
            t.join();
        }
        return tokens.get();
    }
}
