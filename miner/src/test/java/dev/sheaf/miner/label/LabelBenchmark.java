package dev.sheaf.miner.label;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Ingest;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.SourceSpec;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.Segmenter;
import dev.sheaf.miner.text.TermDictionary;
import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import it.unimi.dsi.fastutil.longs.Long2IntOpenHashMap;
import java.io.BufferedWriter;
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.ToLongFunction;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.IntStream;

/**
 * Labeling throughput with a large vocabulary, beside two references on the same listings:
 * an analysis-only pass (the miner's {@link Analysis} over every field, no matching) and a
 * straightforward baseline (one precompiled {@link java.util.regex} alternation of every label over
 * the raw field text). Not a unit test: {@code bench/label-benchmark.sh} runs it (see
 * bench/README-label.md).
 *
 * <pre>
 * LabelBenchmark --corpus FILE.jsonl [--concepts 5000] [--labels 20000] [--vocab-sample 200000]
 *                [--regex-sample 5000] [--threads N] [--rounds 2] [--harvest harvest.json] [--digest]
 * LabelBenchmark --synthetic N --out FILE.jsonl      (when the corpus generator is not available)
 * </pre>
 */
public final class LabelBenchmark {
    private LabelBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path corpus = null;
        Path out = null;
        int synthetic = 0;
        int concepts = 5000;
        int labels = 20000;
        int vocabSample = 200_000;
        int regexSample = 5000;
        int threads = Runtime.getRuntime().availableProcessors();
        int rounds = 2;
        Path harvest = null;
        boolean digest = false;
        Set<String> passes = new java.util.LinkedHashSet<>(PASSES);
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--corpus" -> corpus = Path.of(args[++i]);
                case "--out" -> out = Path.of(args[++i]);
                case "--synthetic" -> synthetic = Integer.parseInt(args[++i]);
                case "--concepts" -> concepts = Integer.parseInt(args[++i]);
                case "--labels" -> labels = Integer.parseInt(args[++i]);
                case "--vocab-sample" -> vocabSample = Integer.parseInt(args[++i]);
                case "--regex-sample" -> regexSample = Integer.parseInt(args[++i]);
                case "--threads" -> threads = Integer.parseInt(args[++i]);
                case "--rounds" -> rounds = Integer.parseInt(args[++i]);
                case "--harvest" -> harvest = Path.of(args[++i]);
                case "--digest" -> digest = true;
                case "--passes" -> passes = passes(args[++i]);
                default -> throw new IllegalArgumentException("unknown argument " + args[i]);
            }
        }
        if (synthetic > 0) {
            synthetic(out, synthetic);
            return;
        }
        if (corpus == null) {
            throw new IllegalArgumentException("give --corpus FILE.jsonl (or --synthetic N --out FILE)");
        }

        long t0 = System.nanoTime();
        List<Listing> listings = Collections.synchronizedList(new ArrayList<>());
        Ingest.builder().source(SourceSpec.of(corpus)).threads(1).build().run(listings::add);
        List<Listing> all = new ArrayList<>(listings);
        all.sort(Comparator.comparingLong(LabelBenchmark::line));
        long textBytes = 0;
        for (Listing l : all) {
            textBytes += textBytes(l);
        }
        System.out.printf(Locale.ROOT, "corpus      %s: %,d listings, %,d bytes on disk, %,d bytes of field text (UTF-8); read in %.1f s%n",
                corpus, all.size(), Files.size(corpus), textBytes, secs(t0));
        System.out.printf(Locale.ROOT, "machine     %d cores available, %d threads used, Java %s, max heap %,d MB%n",
                Runtime.getRuntime().availableProcessors(), threads, System.getProperty("java.version"),
                Runtime.getRuntime().maxMemory() >> 20);

        Analysis analysis = Analysis.of(AnalysisProfile.defaults());
        t0 = System.nanoTime();
        List<String> grams = harvest != null ? harvestTerms(harvest, labels)
                : frequentNgrams(analysis, all.subList(0, Math.min(vocabSample, all.size())), labels);
        String from = harvest != null ? String.format(Locale.ROOT, "the %,d best-ranked candidates of the harvest %s", grams.size(), harvest)
                : String.format(Locale.ROOT, "the %,d most frequent 1-3-grams of %,d listings", grams.size(), Math.min(vocabSample, all.size()));
        Vocabulary vocab = vocabulary(grams, concepts);
        double vocabSecs = secs(t0);
        t0 = System.nanoTime();
        Labeler labeler = Labeler.of(vocab, analysis);
        double compileSecs = secs(t0);
        System.out.printf(Locale.ROOT, "vocabulary  %,d concepts in %d facets, %,d labels from %s "
                        + "(%.1f s) + 2 number facets; compiled in %.2f s (%,d labels in the matcher, %d notes)%n",
                vocab.concepts().size(), vocab.facets().size() - 2, grams.size(), from,
                vocabSecs, compileSecs, labeler.labelsCompiled(), labeler.notes().size());

        if (digest) {
            // a fingerprint of every assignment of every listing, to show that a speed change changed no output
            java.security.MessageDigest md = java.security.MessageDigest.getInstance("SHA-256");
            for (Listing l : all) {
                md.update(labeler.label(l).toString().getBytes(StandardCharsets.UTF_8));
            }
            System.out.printf(Locale.ROOT, "digest      SHA-256 of every Assignments of %,d listings: %s%n", all.size(),
                    java.util.HexFormat.of().formatHex(md.digest()));
            return;
        }
        ForkJoinPool pool = new ForkJoinPool(threads);
        List<Listing> regexListings = all.subList(0, Math.min(regexSample, all.size()));
        long regexBytes = 0;
        for (Listing l : regexListings) {
            regexBytes += textBytes(l);
        }
        t0 = System.nanoTime();
        Pattern regex = alternation(vocab);
        double regexCompile = secs(t0);

        Result an = null;
        Result anLab = null;
        Result qty = null;
        Result lab = null;
        Result re = null;
        // one segmenter per thread for every round, as the labeler keeps one per thread: a fresh one each
        // round would start with an empty term cache and make the floor slower than it is
        ThreadLocal<Segmenter> segs = ThreadLocal.withInitial(analysis::newSegmenter);
        // the token stream the labeler matches on: the same profile with stop and negation words kept as tokens
        Analysis labelingTokens = Analysis.of(Labeler.labelingProfile(analysis.profile()));
        ThreadLocal<Segmenter> labSegs = ThreadLocal.withInitial(labelingTokens::newSegmenter);
        for (int round = 0; round < rounds; round++) { // the first round warms the JIT
            an = !passes.contains("analysis") ? null : time(pool, all, l -> {
                long[] n = {0};
                segs.get().analyze(l, (f, p, ids, st, en, len) -> n[0] += len);
                return n[0];
            });
            anLab = !passes.contains("tokens") ? null : time(pool, all, l -> {
                long[] n = {0};
                labSegs.get().analyze(l, (f, p, ids, st, en, len) -> n[0] += len);
                return n[0];
            });
            lab = !passes.contains("labeling") ? null : time(pool, all, l -> labeler.label(l).assignments().size());
            qty = !passes.contains("quantities") ? null : time(pool, all, LabelBenchmark::quantities);
            re = !passes.contains("regex") ? null : time(pool, regexListings, l -> {
                long n = 0;
                Matcher m = regex.matcher("");
                for (Field f : l.fields()) {
                    if (f.kind() == FieldKind.SPEC) {
                        m.reset(f.key());
                        while (m.find()) {
                            n++;
                        }
                    }
                    m.reset(f.text());
                    while (m.find()) {
                        n++;
                    }
                }
                return n;
            });
            if (round < rounds - 1) {
                System.out.printf(Locale.ROOT, "warm-up     round %d done%n", round + 1);
            }
        }
        pool.shutdown();
        System.out.println();
        System.out.printf(Locale.ROOT, "%-34s %12s %14s %10s %10s %12s %12s %12s%n", "pass", "listings", "listings/s", "MB/s", "CPU s",
                "MB/CPU-s", "worker CPU s", "output");
        row("analysis only (miner's Analysis)", all.size(), textBytes, an, "tokens");
        row("  same, stop words kept (labeler's)", all.size(), textBytes, anLab, "tokens");
        row("quantity reading only", all.size(), textBytes, qty, "quantities");
        row("labeling (Labeler.label)", all.size(), textBytes, lab, "assignments");
        row("regex alternation (sample)", regexListings.size(), regexBytes, re, "matches");
        System.out.println();
        report(an, anLab, qty, lab, re, textBytes, regexBytes, all.size(), regexCompile);
        System.out.printf(Locale.ROOT, "peak RSS    %,d MB (whole JVM, corpus held in memory); peak heap after GC %,d MB%n",
                peakRssKb() >> 10, peakHeap() >> 20);
    }

    /** The passes, in the order each round runs them. */
    static final List<String> PASSES = List.of("analysis", "tokens", "labeling", "quantities", "regex");

    private static Set<String> passes(String list) {
        Set<String> out = new java.util.LinkedHashSet<>();
        for (String p : list.split(",")) {
            if (!PASSES.contains(p.strip())) {
                throw new IllegalArgumentException("unknown pass \"" + p + "\"; passes are " + String.join(", ", PASSES));
            }
            out.add(p.strip());
        }
        return out;
    }

    /** The comparisons whose passes ran. */
    private static void report(Result an, Result anLab, Result qty, Result lab, Result re, long textBytes, long regexBytes, int listings,
                               double regexCompile) {
        if (lab == null) {
            return;
        }
        if (an != null) {
            System.out.printf(Locale.ROOT, "labeling / analysis-only: %.2fx CPU time, %.2fx worker CPU time, %.2fx wall time (target <= 1.5x)%n",
                    lab.cpu / an.cpu, lab.work / an.work, lab.wall / an.wall);
        }
        if (anLab != null) {
            System.out.printf(Locale.ROOT, "labeling / the labeler's own token stream: %.2fx CPU time (matching, negation, numbers and output "
                    + "over the analysis it cannot skip); %.1f assignments a listing%n", lab.cpu / anLab.cpu, (double) lab.output / listings);
        }
        if (an != null && anLab != null && qty != null) {
            System.out.printf(Locale.ROOT, "floor of labeling: its token stream plus the quantity reading alone = %.2fx the analysis-only CPU "
                    + "time%n", (anLab.cpu + qty.cpu) / an.cpu);
        }
        if (re != null) {
            System.out.printf(Locale.ROOT, "labeling vs regex baseline: %.0fx faster per CPU-second, %.0fx per wall-second (target >= 10x); "
                    + "regex compiled in %.2f s%n", (textBytes / lab.cpu) / (regexBytes / re.cpu), (textBytes / lab.wall) / (regexBytes / re.wall),
                    regexCompile);
        }
    }

    /**
     * One pass: wall seconds, process CPU seconds (every thread of the JVM: the workers, and the
     * collector and compiler threads working for them), CPU seconds of the worker threads inside
     * the pass's tasks alone, and the pass's output count.
     */
    private record Result(double wall, double cpu, double work, long output) {
    }

    private static Result time(ForkJoinPool pool, List<Listing> ls, ToLongFunction<Listing> f) throws Exception {
        System.gc();
        long c0 = cpuNanos();
        long t0 = System.nanoTime();
        AtomicLong out = new AtomicLong();
        AtomicLong work = new AtomicLong();
        java.lang.management.ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        // small enough that a short pass (the regex sample) still spreads over every thread
        int chunk = Math.max(1, Math.min(1000, ls.size() / (pool.getParallelism() * 16)));
        pool.submit(() -> IntStream.range(0, (ls.size() + chunk - 1) / chunk).parallel().forEach(k -> {
            long w0 = threads.getCurrentThreadCpuTime();
            long n = 0;
            for (int i = k * chunk; i < Math.min(ls.size(), (k + 1) * chunk); i++) {
                n += f.applyAsLong(ls.get(i));
            }
            out.addAndGet(n);
            work.addAndGet(threads.getCurrentThreadCpuTime() - w0);
        })).get();
        return new Result(secs(t0), (cpuNanos() - c0) / 1e9, work.get() / 1e9, out.get());
    }

    private static void row(String name, long n, long bytes, Result r, String what) {
        if (r == null) {
            System.out.printf(Locale.ROOT, "%-34s %12s%n", name, "not run");
            return;
        }
        System.out.printf(Locale.ROOT, "%-34s %,12d %,14.0f %10.2f %10.2f %12.2f %12.2f %,12d %s%n", name, n, n / r.wall,
                bytes / 1e6 / r.wall, r.cpu, bytes / 1e6 / r.cpu, r.work, r.output, what);
    }

    private static long cpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean()).getProcessCpuTime();
    }

    private static double secs(long t0) {
        return (System.nanoTime() - t0) / 1e9;
    }

    private static long line(Listing l) {
        String loc = l.locator();
        return loc.startsWith("line ") ? Long.parseLong(loc.substring(5)) : 0;
    }

    private static long textBytes(Listing l) {
        long b = 0;
        for (Field f : l.fields()) {
            b += f.text().getBytes(StandardCharsets.UTF_8).length + f.key().getBytes(StandardCharsets.UTF_8).length;
        }
        return b;
    }

    /**
     * The quantity reading a labeler with number facets cannot skip, alone: every spec value read
     * whole (under its key) and every other text with a digit scanned for quantities.
     */
    private static long quantities(Listing l) {
        long n = 0;
        for (Field f : l.fields()) {
            String t = f.text();
            if (!hasDigit(t)) {
                continue;
            }
            if (f.kind() == FieldKind.SPEC) {
                n += dev.sheaf.miner.text.Quantities.parse(f.key(), t).isPresent() ? 1 : 0;
            } else {
                n += dev.sheaf.miner.text.Quantities.find(t).size();
            }
        }
        return n;
    }

    private static boolean hasDigit(String s) {
        for (int i = 0; i < s.length(); i++) {
            if (Character.isDigit(s.charAt(i))) {
                return true;
            }
        }
        return false;
    }

    /** The {@code limit} best-ranked candidate terms of a harvest ({@code sheaf mine}'s harvest.json), in rank order. */
    static List<String> harvestTerms(Path harvestJson, int limit) throws IOException {
        List<String> out = new ArrayList<>();
        for (dev.sheaf.miner.mine.Harvest.Candidate c : dev.sheaf.miner.mine.HarvestFiles.readJson(harvestJson).candidates()) {
            if (out.size() == limit) {
                break;
            }
            out.add(c.term());
        }
        return out;
    }

    /** The {@code limit} most frequent 1-, 2- and 3-grams of the miner's segments (no numbers), most frequent first. */
    static List<String> frequentNgrams(Analysis analysis, List<Listing> sample, int limit) {
        Long2IntOpenHashMap[] counts = {new Long2IntOpenHashMap(), new Long2IntOpenHashMap(), new Long2IntOpenHashMap()};
        Segmenter seg = analysis.newSegmenter();
        TermDictionary dict = analysis.terms();
        for (Listing l : sample) {
            seg.analyze(l, (f, p, ids, st, en, len) -> {
                for (int i = 0; i < len; i++) {
                    long key = 0;
                    for (int n = 0; n < 3 && i + n < len; n++) {
                        int id = ids[i + n];
                        if (id >= (1 << 21)) {
                            throw new IllegalStateException("more than 2^21 distinct terms; use a smaller --vocab-sample");
                        }
                        key = (key << 21) | id;
                        counts[n].addTo(key, 1);
                    }
                }
            });
        }
        String[] terms = dict.snapshot();
        List<Object[]> all = new ArrayList<>();
        for (int n = 0; n < 3; n++) {
            int len = n + 1;
            for (Long2IntOpenHashMap.Entry e : counts[n].long2IntEntrySet()) {
                if (e.getIntValue() < 5) {
                    continue;
                }
                StringBuilder b = new StringBuilder();
                boolean numeric = false;
                for (int k = len - 1; k >= 0; k--) {
                    String t = terms[(int) ((e.getLongKey() >>> (21 * k)) & ((1 << 21) - 1))];
                    numeric |= Character.isDigit(t.charAt(0));
                    b.append(b.length() == 0 ? "" : " ").append(t);
                }
                if (!numeric) {
                    all.add(new Object[] {b.toString(), e.getIntValue()});
                }
            }
        }
        all.sort(Comparator.comparingInt((Object[] x) -> (Integer) x[1]).reversed().thenComparing(x -> (String) x[0]));
        List<String> out = new ArrayList<>();
        for (Object[] x : all.subList(0, Math.min(limit, all.size()))) {
            out.add((String) x[0]);
        }
        return out;
    }

    /**
     * {@code concepts} concepts in 50 term facets (every fifth facet limited to three categories), each
     * with up to four of the n-grams as labels (preferred, two alternatives, one hidden: n-gram i, i+C,
     * i+2C, i+3C), plus a weight facet in kg with buckets and a capacity facet in L.
     */
    static Vocabulary vocabulary(List<String> grams, int concepts) {
        List<Concept> c = new ArrayList<>();
        int facets = 50;
        List<String> someCategories = List.of("tents", "backpacks", "stoves");
        for (int f = 0; f < facets; f++) {
            FacetProperties p = FacetProperties.terms().withMultiValued(true);
            if (f % 5 == 4) {
                p = p.withCategories(someCategories);
            }
            c.add(Concept.builder(String.format("f%02d", f)).prefLabel(String.format("facet %02d", f)).facet(p).build());
        }
        int n = Math.min(concepts, grams.size());
        for (int i = 0; i < n; i++) {
            Concept.Builder b = Concept.builder(String.format("c%05d", i)).prefLabel(grams.get(i)).broader(String.format("f%02d", i % facets));
            if (i + n < grams.size()) {
                b.altLabel(grams.get(i + n));
            }
            if (i + 2 * n < grams.size()) {
                b.altLabel(grams.get(i + 2 * n));
            }
            if (i + 3 * n < grams.size()) {
                b.hiddenLabel(grams.get(i + 3 * n));
            }
            c.add(b.build());
        }
        c.add(Concept.builder("weight").prefLabel("weight").altLabel("item weight").facet(FacetProperties.number("kg",
                List.of(new Bucket("under 0.5 kg", null, 0.5), new Bucket("0.5-1 kg", 0.5, 1.0), new Bucket("1-2 kg", 1.0, 2.0),
                        new Bucket("2 kg and over", 2.0, null)))).build());
        c.add(Concept.builder("capacity").prefLabel("capacity").altLabel("volume").facet(FacetProperties.number("L", List.of())).build());
        return Vocabulary.of(SchemeInfo.of("bench", "Benchmark vocabulary"), c, List.of(), List.of());
    }

    /**
     * The straightforward baseline: every label of every concept in one alternation, longest label
     * first (java.util.regex takes the first alternative that matches, not the longest), words
     * joined by white space or hyphens, case-insensitive, bounded by non-letters.
     */
    static Pattern alternation(Vocabulary v) {
        List<String> texts = new ArrayList<>();
        for (Concept c : v.allConcepts()) {
            c.labels().forEach(l -> texts.add(l.text()));
        }
        texts.sort(Comparator.comparingInt(String::length).reversed().thenComparing(Comparator.naturalOrder()));
        StringBuilder b = new StringBuilder("(?<![\\p{L}\\p{N}])(?:");
        for (int i = 0; i < texts.size(); i++) {
            if (i > 0) {
                b.append('|');
            }
            String[] words = texts.get(i).split("[\\s-]+");
            for (int w = 0; w < words.length; w++) {
                if (w > 0) {
                    b.append("[\\s-]+");
                }
                b.append(Pattern.quote(words[w]));
            }
        }
        b.append(")(?![\\p{L}\\p{N}])");
        return Pattern.compile(b.toString(), Pattern.CASE_INSENSITIVE | Pattern.UNICODE_CASE);
    }

    private static long peakRssKb() {
        try {
            for (String line : Files.readAllLines(Path.of("/proc/self/status"))) {
                if (line.startsWith("VmHWM:")) {
                    return Long.parseLong(line.replaceAll("[^0-9]", ""));
                }
            }
        } catch (IOException | NumberFormatException e) {
            return -1;
        }
        return -1;
    }

    private static long peakHeap() {
        long peak = 0;
        for (var pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == java.lang.management.MemoryType.HEAP && pool.getCollectionUsage() != null) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        return peak;
    }

    /** A stand-in corpus of the generator's JSON Lines shape, for when {@code ./sheaf generate} is not built. */
    static void synthetic(Path out, int n) throws IOException {
        Random r = new Random(42);
        String[] cats = {"tents", "backpacks", "stoves", "insulated-jackets", "rain-jackets", "sleeping-bags", "footwear"};
        String[] mats = {"ripstop nylon", "recycled polyester", "merino wool", "stainless steel", "aluminium", "canvas", "goose down"};
        String[] feats = {"waterproof", "windproof", "packable", "adjustable hood", "taped seams", "two-way zipper", "no hood",
            "PFC-free DWR", "non-slip sole", "reflective trim", "YKK zips", "hip belt pockets"};
        Files.createDirectories(out.toAbsolutePath().getParent());
        try (BufferedWriter w = Files.newBufferedWriter(out, StandardCharsets.UTF_8)) {
            for (int i = 1; i <= n; i++) {
                String cat = cats[r.nextInt(cats.length)];
                String mat = mats[r.nextInt(mats.length)];
                w.write(String.format(Locale.ROOT, "{\"id\":\"FH-%06d\",\"category\":\"%s\",\"title\":\"Fernhollow %s %d\","
                                + "\"description\":\"A %s %s with %s and %s, built for long trails. Not %s.\","
                                + "\"bullets\":[\"%s\",\"%s\"],\"specs\":{\"Weight\":\"%d g\",\"Material\":\"%s\"}}%n",
                        i, cat, cat, i, feats[r.nextInt(feats.length)], cat, mat, feats[r.nextInt(feats.length)],
                        feats[r.nextInt(feats.length)], feats[r.nextInt(feats.length)], feats[r.nextInt(feats.length)],
                        200 + r.nextInt(3000), mat));
            }
        }
    }
}
