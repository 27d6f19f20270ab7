package dev.sheaf.curator.bench;

import dev.sheaf.curator.app.MainView;
import dev.sheaf.curator.app.MainViewModel;
import dev.sheaf.curator.harvest.CandidateRow;
import dev.sheaf.curator.harvest.DecisionState;
import dev.sheaf.curator.harvest.HarvestViewModel;
import dev.sheaf.curator.harvest.StateFilter;
import dev.sheaf.curator.session.Background;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.curator.session.RecentWorkspaces;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.VocabularyStore;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.atomic.AtomicReference;

/**
 * How quickly the curator opens a large workspace and filters its harvest: bench/curator-benchmark.sh.
 *
 * <pre>java -cp ... dev.sheaf.curator.bench.CuratorBenchmark WORKSPACE [--concepts 5000] [--ui]</pre>
 *
 * The workspace must hold a harvest ({@code out/harvest.json}); when its vocabulary file is missing, one
 * of {@code --concepts} concepts is made from the harvest's terms (25 facets, values under them, a kept
 * decision for each and 2,000 dropped terms), so the states the table shows are realistic. Prints, in
 * one run: the parse floor (harvest.json and the vocabulary read alone), the whole open (session and
 * table rows with their decision states), the per-keystroke filter times beside a plain loop over the
 * same strings, and the cost of one keep and of a drop on 100 rows. With {@code --ui}, the same on the
 * real window under Monocle: open until the table has its rows laid out, and keystrokes with the
 * table's layout pass.
 */
public final class CuratorBenchmark {
    private static final String TYPED = "waterproof";

    private CuratorBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        if (args.length < 1) {
            System.err.println("usage: CuratorBenchmark WORKSPACE [--concepts N] [--ui]");
            System.exit(2);
        }
        Path dir = Path.of(args[0]);
        int concepts = 5000;
        boolean ui = false;
        for (int i = 1; i < args.length; i++) {
            if (args[i].equals("--concepts")) {
                concepts = Integer.parseInt(args[++i]);
            } else if (args[i].equals("--ui")) {
                ui = true;
            }
        }
        Workspace ws = Workspace.load(dir);
        Path vf = CuratorSession.vocabularyFile(ws);
        if (!Files.exists(vf)) {
            Harvest h = HarvestFiles.readJson(CuratorSession.harvestFile(ws));
            VocabularyStore.write(vf, synthetic(h, concepts));
            System.out.printf(Locale.ROOT, "made %s with %,d concepts from the harvest's terms%n", vf.getFileName(), concepts);
        }

        long t0 = System.nanoTime();
        long c0 = cpu();
        Harvest h = HarvestFiles.readJson(CuratorSession.harvestFile(ws));
        double readHarvest = ms(t0);
        double readHarvestCpu = cpuMs(c0);
        t0 = System.nanoTime();
        c0 = cpu();
        Vocabulary v = VocabularyStore.read(vf);
        double readVocab = ms(t0);
        double readVocabCpu = cpuMs(c0);
        System.out.printf(Locale.ROOT, "workspace   %,d candidates, %,d concepts, %,d decisions%n", h.candidates().size(), v.size(),
                v.decisions().size());
        row("floor: read harvest.json alone (Jackson), cold", readHarvest, readHarvestCpu, "");
        row("floor: read the vocabulary alone, cold", readVocab, readVocabCpu, "");

        // the whole open, as the window does it: session (harvest, vocabulary store with lock and journal) and the table's rows;
        // beside it where the wall time went: this thread's CPU, the other threads' (GC, JIT), and the rest (waiting for a core or the disk)
        Spent spent = Spent.now();
        t0 = System.nanoTime();
        c0 = cpu();
        CuratorSession s = CuratorSession.open(dir);
        double sessionMs = ms(t0);
        double sessionCpu = cpuMs(c0);
        HarvestViewModel hv = new HarvestViewModel(n -> { });
        hv.setSession(s);
        double openMs = ms(t0);
        double openCpu = cpuMs(c0);
        row("open: session (harvest + vocabulary + lock + journal)", sessionMs, sessionCpu, "");
        row("open: session and table rows with decision states", openMs, openCpu, target(openMs, openCpu, 2000, "< 2 s"));
        spent.print("open", openMs, openCpu);
        // the steps of the open again, now that the files are in the page cache and the code compiled
        t0 = System.nanoTime();
        HarvestFiles.readJson(CuratorSession.harvestFile(ws));
        row("  again, warm: read harvest.json", ms(t0), "");
        t0 = System.nanoTime();
        VocabularyStore.read(vf);
        row("  again, warm: read the vocabulary", ms(t0), "");

        keystrokes("filter: type \"" + TYPED + "\", delete it (cold JIT)", hv);
        keystrokes("filter: the same again (warm)", hv);
        double floor = plainLoop(hv);
        row("floor: plain loop, String.contains over the same strings", floor, "");
        hv.stateProperty().set(StateFilter.ALL);
        List<Double> other = new ArrayList<>();
        hv.wordsProperty().set(2);
        other.add(hv.lastFilterMillisProperty().get());
        hv.categoryProperty().set(hv.categories().size() > 1 ? hv.categories().get(1) : "");
        other.add(hv.lastFilterMillisProperty().get());
        hv.minFrequencyProperty().set("100");
        other.add(hv.lastFilterMillisProperty().get());
        hv.clearFilters();
        other.add(hv.lastFilterMillisProperty().get());
        hv.stateProperty().set(StateFilter.TO_DECIDE);
        other.add(hv.lastFilterMillisProperty().get());
        double otherMax = other.stream().mapToDouble(Double::doubleValue).max().orElse(0);
        row("filter: words, category, min count, clear, state (max)", otherMax, target(otherMax, 100, "< 100 ms"));

        List<CandidateRow> undecided = hv.rows().stream().filter(r -> r.state() == DecisionState.UNDECIDED).limit(120).toList();
        for (int round = 0; round < 3; round++) {
            Vocabulary snap = s.vocabulary();
            dev.sheaf.vocab.Edit e = dev.sheaf.vocab.Edit.recordDecision(Decision.parked(undecided.get(110 + round).term()));
            t0 = System.nanoTime();
            c0 = cpu();
            snap.apply(e);
            row("floor: one decision applied to the snapshot alone", ms(t0), cpuMs(c0), "");
        }
        for (int round = 0; round < 2; round++) {
            String when = round == 0 ? " (cold)" : " (warm)";
            t0 = System.nanoTime();
            c0 = cpu();
            hv.keep(List.of(undecided.get(round)));
            row("K: keep one term (edit, journal, table states)" + when, ms(t0), cpuMs(c0), target(ms(t0), cpuMs(c0), 100, "< 100 ms"));
            t0 = System.nanoTime();
            c0 = cpu();
            hv.drop(undecided.subList(2 + round * 50, 52 + round * 50));
            row("D: drop 50 selected terms at once" + when, ms(t0), cpuMs(c0), target(ms(t0), cpuMs(c0), 100, "< 100 ms"));
        }
        while (s.undo()) {
            // leave the vocabulary as it was
        }
        s.close();

        if (ui) {
            uiPass(dir);
        }
        System.exit(0);
    }

    private static void keystrokes(String what, HarvestViewModel hv) {
        double[] t = new double[TYPED.length() * 2];
        int k = 0;
        for (int i = 1; i <= TYPED.length(); i++) {
            hv.textProperty().set(TYPED.substring(0, i));
            t[k++] = hv.lastFilterMillisProperty().get();
        }
        for (int i = TYPED.length() - 1; i >= 0; i--) {
            hv.textProperty().set(TYPED.substring(0, i));
            t[k++] = hv.lastFilterMillisProperty().get();
        }
        report(what, t);
    }

    private static void report(String what, double[] t) {
        double[] sorted = t.clone();
        Arrays.sort(sorted);
        double median = sorted[sorted.length / 2];
        double max = sorted[sorted.length - 1];
        System.out.printf(Locale.ROOT, "  %-58s median %7.1f ms, max %7.1f ms over %d keystrokes  %s%n", what, median, max, t.length,
                target(max, 100, "< 100 ms"));
    }

    private static double plainLoop(HarvestViewModel hv) {
        List<String> lower = new ArrayList<>();
        for (CandidateRow r : hv.rows()) {
            lower.add(r.term().toLowerCase(Locale.ROOT));
        }
        double worst = 0;
        for (int i = 1; i <= TYPED.length(); i++) {
            String q = TYPED.substring(0, i);
            long t0 = System.nanoTime();
            int n = 0;
            for (String s : lower) {
                if (s.contains(q)) {
                    n++;
                }
            }
            worst = Math.max(worst, ms(t0));
            if (n < 0) {
                throw new AssertionError();
            }
        }
        return worst;
    }

    /** Open and type on the real window, headless: needs -Dglass.platform=Monocle -Dmonocle.platform=Headless -Dprism.order=sw. */
    private static void uiPass(Path dir) throws Exception {
        CountDownLatch started = new CountDownLatch(1);
        javafx.application.Platform.startup(started::countDown);
        started.await();
        AtomicReference<Object[]> ref = new AtomicReference<>();
        CountDownLatch shown = new CountDownLatch(1);
        long t0 = System.nanoTime();
        javafx.application.Platform.runLater(() -> {
            MainViewModel vm = dev.sheaf.curator.app.CuratorApp.newViewModel(new RecentWorkspaces(
                    Path.of(System.getProperty("java.io.tmpdir"), "sheaf-bench-recent.json")));
            MainView view = new MainView(vm);
            javafx.stage.Stage stage = new javafx.stage.Stage();
            dev.sheaf.curator.app.CuratorApp.show(stage, view, vm);
            ref.set(new Object[] {vm, view, stage});
            vm.sessionProperty().addListener((o, a, b) -> {
                if (b != null) {
                    stage.getScene().getRoot().applyCss();
                    stage.getScene().getRoot().layout();
                    shown.countDown();
                }
            });
            vm.open(dir);
        });
        shown.await();
        double openMs = ms(t0);
        row("window: open until the table is laid out with its rows", openMs, target(openMs, 2000, "< 2 s"));
        MainViewModel vm = (MainViewModel) ref.get()[0];
        javafx.stage.Stage stage = (javafx.stage.Stage) ref.get()[2];
        // the workspace has no evidence index yet, so opening started building one; stop it so the keystrokes are timed alone
        javafx.application.Platform.runLater(vm::cancelWork);
        while (vm.background().runningProperty().get()) {
            Thread.sleep(50);
        }
        for (int round = 0; round < 2; round++) {
            double[] t = new double[TYPED.length() * 2];
            CountDownLatch typed = new CountDownLatch(1);
            javafx.application.Platform.runLater(() -> {
                int k = 0;
                for (int i = 1; i <= TYPED.length(); i++) {
                    t[k++] = typeAndLayout(vm, stage, TYPED.substring(0, i));
                }
                for (int i = TYPED.length() - 1; i >= 0; i--) {
                    t[k++] = typeAndLayout(vm, stage, TYPED.substring(0, i));
                }
                typed.countDown();
            });
            typed.await();
            report("window: keystroke, filter and table layout" + (round == 0 ? " (cold JIT)" : " (warm)"), t);
            System.out.printf(Locale.ROOT, "  %-58s %7.1f ms CPU per keystroke; wall: %.0f%% filter, %.0f%% layout%n",
                    "  of which", cpuSum / t.length, 100 * setMs / (setMs + layoutMs), 100 * layoutMs / (setMs + layoutMs));
            cpuSum = 0;
            setMs = 0;
            layoutMs = 0;
        }
        CountDownLatch closed = new CountDownLatch(1);
        javafx.application.Platform.runLater(() -> {
            vm.cancelWork();
            vm.closeSession();
            closed.countDown();
        });
        closed.await();
    }

    private static double setMs;
    private static double layoutMs;
    private static double cpuSum;

    private static double typeAndLayout(MainViewModel vm, javafx.stage.Stage stage, String text) {
        long t0 = System.nanoTime();
        long c0 = cpu();
        vm.harvest().textProperty().set(text);
        long t1 = System.nanoTime();
        stage.getScene().getRoot().applyCss();
        stage.getScene().getRoot().layout();
        cpuSum += cpuMs(c0);
        setMs += (t1 - t0) / 1e6;
        layoutMs += (System.nanoTime() - t1) / 1e6;
        return ms(t0);
    }

    /** A vocabulary of {@code n} concepts made from the harvest's terms: 25 facets, the rest values under them, kept decisions, 2,000 drops. */
    static Vocabulary synthetic(Harvest h, int n) {
        int facets = 25;
        List<Concept> cs = new ArrayList<>();
        List<Decision> ds = new ArrayList<>();
        Set<String> ids = new HashSet<>();
        for (int f = 1; f <= facets; f++) {
            boolean regulated = f % 5 == 0;
            cs.add(Concept.builder("facet-" + f).prefLabel(Label.of("benchmark facet " + f))
                    .facet(FacetProperties.terms().withRegulatedClaim(regulated)).build());
            ids.add("facet-" + f);
        }
        List<Harvest.Candidate> cands = h.candidates();
        int i = 0;
        int made = facets;
        while (made < n && i < cands.size()) {
            Harvest.Candidate c = cands.get(i++);
            String id = "c-" + i;
            if (!ids.add(id)) {
                continue;
            }
            cs.add(Concept.builder(id).prefLabel(Label.of(c.term())).broader("facet-" + (1 + made % facets)).build());
            ds.add(Decision.kept(c.term(), id));
            made++;
        }
        for (int d = 0; d < 2000 && i < cands.size(); d++) {
            ds.add(Decision.dropped(cands.get(i++).term(), "benchmark"));
        }
        java.util.Map<String, Decision> byKey = new java.util.LinkedHashMap<>();
        for (Decision d : ds) {
            byKey.putIfAbsent(d.key(), d);
        }
        return Vocabulary.of(SchemeInfo.of("bench", "Benchmark vocabulary"), cs, List.of(), byKey.values());
    }

    private static double ms(long t0) {
        return (System.nanoTime() - t0) / 1e6;
    }

    private static final java.lang.management.ThreadMXBean CPU = java.lang.management.ManagementFactory.getThreadMXBean();

    /** CPU time of this thread, in ns (the figure that a loaded machine does not inflate). */
    private static long cpu() {
        return CPU.getCurrentThreadCpuTime();
    }

    private static double cpuMs(long c0) {
        return (cpu() - c0) / 1e6;
    }

    /** Process CPU, GC and JIT time at a moment, to split a wall time by who used it. */
    private record Spent(long processCpuNanos, long gcMillis, long jitMillis) {
        static Spent now() {
            long gc = 0;
            for (var b : java.lang.management.ManagementFactory.getGarbageCollectorMXBeans()) {
                gc += Math.max(0, b.getCollectionTime());
            }
            var jit = java.lang.management.ManagementFactory.getCompilationMXBean();
            var os = (com.sun.management.OperatingSystemMXBean) java.lang.management.ManagementFactory.getOperatingSystemMXBean();
            return new Spent(os.getProcessCpuTime(), gc, jit == null ? 0 : jit.getTotalCompilationTime());
        }

        void print(String what, double wallMs, double threadCpuMs) {
            Spent e = now();
            double process = (e.processCpuNanos - processCpuNanos) / 1e6;
            System.out.printf(Locale.ROOT, "    %s, where the wall went: this thread %.0f ms CPU; all threads %.0f ms CPU (GC pauses %d ms,"
                    + " JIT compiling %d ms); waiting for a core or the disk %.0f ms (load %.1f)%n", what, threadCpuMs, process,
                    e.gcMillis - gcMillis, e.jitMillis - jitMillis, Math.max(0, wallMs - threadCpuMs),
                    java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        }
    }

    private static void row(String what, double millis, String verdict) {
        System.out.printf(Locale.ROOT, "  %-58s %9.1f ms  %s%n", what, millis, verdict);
    }

    private static void row(String what, double millis, double cpuMillis, String verdict) {
        System.out.printf(Locale.ROOT, "  %-58s %9.1f ms wall %9.1f ms CPU  %s%n", what, millis, cpuMillis, verdict);
    }

    private static String target(double v, double limit, String label) {
        return (v < limit ? "PASS " : "MISS ") + label;
    }

    /** The verdict on wall time, and on CPU time when only the CPU time meets it (a loaded machine inflates wall time). */
    private static String target(double wall, double cpu, double limit, String label) {
        return wall < limit ? "PASS " + label : cpu < limit ? "MISS " + label + " wall, PASS on CPU" : "MISS " + label;
    }
}
