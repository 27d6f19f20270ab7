package dev.sheaf.miner.ingest;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedReader;
import java.io.BufferedWriter;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.Stream;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.FSDirectory;

/**
 * Throughput of JSON Lines ingest and of the evidence index, each next to a reference: Jackson
 * reading the same lines into trees (no mapping), and Lucene indexing the same text as one plain
 * field per listing (no offsets, no stored fields). Not a unit test; run it by hand:
 *
 * <pre>
 * mvn -o -q -pl miner -am test-compile
 * mvn -o -q -pl miner dependency:build-classpath -Dmdep.outputFile=/tmp/cp.txt
 * java -Xmx2g -cp miner/target/test-classes:miner/target/classes:vocab/target/classes:$(cat /tmp/cp.txt) \
 *      dev.sheaf.miner.ingest.IngestBenchmark [FILE.jsonl | --listings N]
 * </pre>
 *
 * Without a file it uses the first {@code /tmp/fh-*.jsonl}, else writes a synthetic corpus of
 * 100,000 listings (about 430 bytes each, like the generator's) to a temp file.
 */
public final class IngestBenchmark {
    private IngestBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        Path file = null;
        int n = 100_000;
        for (int i = 0; i < args.length; i++) {
            if (args[i].equals("--listings")) {
                n = Integer.parseInt(args[++i]);
            } else {
                file = Path.of(args[i]);
            }
        }
        if (file == null) {
            try (Stream<Path> s = Files.list(Path.of("/tmp"))) {
                file = s.filter(p -> p.getFileName().toString().matches("fh-.*\\.jsonl")).sorted().findFirst().orElse(null);
            }
        }
        if (file == null) {
            file = Files.createTempFile("sheaf-bench-", ".jsonl");
            file.toFile().deleteOnExit();
            synthetic(file, n);
        }
        long bytes = Files.size(file);
        System.out.printf(Locale.ROOT, "corpus %s: %,d bytes, %d threads%n", file, bytes, Runtime.getRuntime().availableProcessors());

        for (int round = 0; round < 2; round++) { // round 0 warms the JIT
            boolean report = round == 1;
            long t0 = System.nanoTime();
            long c0 = cpu();
            long refLines = jacksonReference(file);
            double ref = seconds(t0);
            double refCpu = cpuSeconds(c0);

            t0 = System.nanoTime();
            c0 = cpu();
            AtomicLong count = new AtomicLong();
            IngestSummary s = Ingest.builder().source(SourceSpec.of(file)).maxFileBytes(Long.MAX_VALUE).build().run(l -> count.incrementAndGet());
            double ingest = seconds(t0);
            double ingestCpu = cpuSeconds(c0);

            Path ix = Files.createTempDirectory("sheaf-bench-ix-");
            t0 = System.nanoTime();
            c0 = cpu();
            try (EvidenceIndex.Writer w = EvidenceIndex.writer(ix, new StandardAnalyzer())) {
                Ingest.builder().source(SourceSpec.of(file)).maxFileBytes(Long.MAX_VALUE).build().run(w);
                w.commit();
            }
            double indexed = seconds(t0);
            double indexedCpu = cpuSeconds(c0);
            long ixBytes = size(ix);

            Path ref2 = Files.createTempDirectory("sheaf-bench-ref-");
            t0 = System.nanoTime();
            c0 = cpu();
            luceneReference(file, ref2);
            double luceneRef = seconds(t0);
            double luceneRefCpu = cpuSeconds(c0);
            if (report) {
                line("JSONL reading: Jackson trees only (reference)", refLines, bytes, ref, refCpu);
                line("JSONL reading: Ingest, listings mapped", s.listings(), bytes, ingest, ingestCpu);
                line("Ingest + evidence index (offsets, stored fields)", s.listings(), bytes, indexed, indexedCpu);
                line("Lucene, one plain text field per listing (reference)", refLines, bytes, luceneRef, luceneRefCpu);
                System.out.printf(Locale.ROOT, "evidence index size: %,d bytes (%.1f bytes/listing); problems: %d%n", ixBytes,
                        ixBytes / (double) s.listings(), s.problems().size());
            }
            delete(ix);
            delete(ref2);
        }
        long peak = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                peak += p.getPeakUsage().getUsed();
            }
        }
        System.out.printf(Locale.ROOT, "peak heap (sum of pool peaks): %,d MB of max %,d MB%n", peak >> 20,
                Runtime.getRuntime().maxMemory() >> 20);
    }

    /** Wall-clock rates, and the CPU seconds spent (the fair figure on a shared machine). */
    private static void line(String what, long listings, long bytes, double s, double cpu) {
        System.out.printf(Locale.ROOT, "%-53s %,9.0f listings/s %6.1f MB/s wall %6.2f s | %,9.0f listings/cpu-s %6.1f MB/cpu-s%n",
                what, listings / s, bytes / s / 1e6, s, listings / cpu, bytes / cpu / 1e6);
    }

    private static long cpu() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean()).getProcessCpuTime();
    }

    private static double cpuSeconds(long c0) {
        return (cpu() - c0) / 1e9;
    }

    private static double seconds(long t0) {
        return (System.nanoTime() - t0) / 1e9;
    }

    private static long jacksonReference(Path file) throws IOException {
        ObjectMapper m = new ObjectMapper();
        long n = 0;
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String line;
            while ((line = r.readLine()) != null) {
                if (!line.isBlank() && m.readTree(line) != null) {
                    n++;
                }
            }
        }
        return n;
    }

    private static void luceneReference(Path file, Path dir) throws IOException {
        try (IndexWriter w = new IndexWriter(FSDirectory.open(dir), new IndexWriterConfig(new StandardAnalyzer()).setRAMBufferSizeMB(128));
             Stream<String> lines = Files.lines(file, StandardCharsets.UTF_8)) {
            lines.parallel().forEach(l -> {
                Document d = new Document();
                d.add(new TextField("text", l, org.apache.lucene.document.Field.Store.NO));
                try {
                    w.addDocument(d);
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
            });
            w.commit();
        }
    }

    private static final String[] CATEGORIES = {"tents", "sleeping-bags", "packs", "jackets", "stoves", "footwear"};
    private static final String[] WORDS = ("light warm waterproof breathable ripstop nylon down synthetic two-way zipper "
            + "hood pocket trail alpine roomy compact packable durable taped seams vent mesh padded frame buckle strap "
            + "quick-dry merino wool fleece insulated reflective").split(" ");

    /** Listings shaped like the generator's JSONL (id, category, title, description, bullets, specs). */
    static void synthetic(Path file, int n) throws IOException {
        Random r = new Random(42);
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            for (int i = 1; i <= n; i++) {
                String cat = CATEGORIES[r.nextInt(CATEGORIES.length)];
                w.write(String.format(Locale.ROOT,
                        "{\"id\":\"FH-%06d\",\"category\":\"%s\",\"title\":\"%s %s %s\",\"description\":\"%s\","
                                + "\"bullets\":[\"%s\",\"%s\",\"%s\"],\"specs\":{\"Weight\":\"%.1f kg\",\"Colour\":\"%s\",\"Fabric\":\"%s\"}}\n",
                        i, cat, cap(words(r, 1)), cap(words(r, 1)), cat, cap(words(r, 18)) + ".", cap(words(r, 4)), cap(words(r, 5)),
                        cap(words(r, 3)), 0.2 + r.nextInt(40) / 10.0, words(r, 1), words(r, 2)));
            }
        }
    }

    private static String words(Random r, int k) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < k; i++) {
            if (i > 0) {
                b.append(' ');
            }
            b.append(WORDS[r.nextInt(WORDS.length)]);
        }
        return b.toString();
    }

    private static String cap(String s) {
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }

    private static long size(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.filter(Files::isRegularFile).mapToLong(p -> p.toFile().length()).sum();
        }
    }

    private static void delete(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : (Iterable<Path>) s.sorted(Comparator.reverseOrder())::iterator) {
                Files.deleteIfExists(p);
            }
        }
    }
}
