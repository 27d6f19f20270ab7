package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.cli.Main;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills a child JVM ({@link WriteLoopMain}) with SIGKILL at random moments while it rewrites the
 * harvest files, problems.csv and an HTML report, the label exports and a whole audit (labels,
 * coverage, agreement, consistency, the report and its tables) in one folder, two versions in turn:
 * every output file must then be absent (never written yet), or byte for byte one complete version.
 * Temporaries a kill leaves are removed by the next run: after the last kill, one more child writes
 * one round and none is left. The vocabulary store's own kill test is
 * {@code vocab/…/CrashDuringSaveTest}. A process kill leaves the page cache intact, so this tests
 * atomicity, not power loss.
 */
class KillDuringWriteTest {
    @TempDir
    Path dir;

    @Test
    void everyOutputIsAbsentOrACompleteVersionAfterAKill() throws Exception {
        run(12, 7);
    }

    @Test
    @Tag("slow")
    void threeHundredKills() throws Exception {
        run(300, 8);
    }

    private void run(int kills, long seed) throws Exception {
        Path[] harvest = {dir.resolve("a/harvest.json"), dir.resolve("b/harvest.json")};
        mine(dir.resolve("a"), "40");
        mine(dir.resolve("b"), "400");
        Path ws = smallWorkspace(dir.resolve("ws"));
        // the reference bytes: each version written once, by the same code, in this process, in the folder
        // the child writes to (the label summary names its files by path)
        Path out = dir.resolve("out");
        List<Map<String, byte[]>> ref = new ArrayList<>();
        for (int v = 0; v < 2; v++) {
            WriteLoopMain.outputs(harvest[v], v, ws).write(out);
            ref.add(files(out));
            deleteTree(out);
        }
        assertEquals(ref.get(0).keySet(), ref.get(1).keySet());
        assertTrue(ref.get(0).keySet().containsAll(List.of("labels/labels.csv", "labels/assignments.jsonl", "audit/report.html",
                "audit/labels/labels.csv", "audit/coverage/coverage.csv", "audit/consistency/consistency.json",
                "audit/agreement/agreement.json")), ref.get(0).keySet().toString());
        for (String f : List.of("harvest.json", "problems.csv", "report.html", "labels/labels.csv", "labels/assignments.jsonl",
                "audit/report.html", "audit/labels/labels.csv", "audit/coverage/coverage.csv")) {
            assertFalse(Arrays.equals(ref.get(0).get(f), ref.get(1).get(f)), f + " must differ between the versions ("
                    + ref.get(0).get(f).length + " bytes)");
        }
        Files.createDirectories(out);
        Random rnd = new Random(seed);
        int midRound = 0;
        int corrupted = 0;
        long checked = 0;
        List<String> bad = new ArrayList<>();
        for (int k = 0; k < kills; k++) {
            Process p = start(harvest, ws, out, false);
            AtomicInteger done = new AtomicInteger(-1);
            AtomicInteger ready = new AtomicInteger();
            Thread reader = new Thread(() -> {
                try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
                    for (String line; (line = r.readLine()) != null; ) {
                        if (line.equals("ready")) {
                            ready.set(1);
                        } else if (line.startsWith("done ")) {
                            done.set(Integer.parseInt(line.substring(5)));
                        }
                    }
                } catch (IOException e) {
                    // killed
                }
            });
            reader.start();
            long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
            // the first round loads the classes; kill during a later one, over files already there
            while (done.get() < 0 && p.isAlive() && System.nanoTime() < until) {
                Thread.sleep(5);
            }
            assertTrue(p.isAlive(), "the child ended before it was killed");
            Thread.sleep(rnd.nextInt(1500));
            p.destroyForcibly(); // SIGKILL on Linux
            p.waitFor();
            reader.join();
            if (done.get() >= 1) {
                midRound++;
            }
            for (Map.Entry<String, byte[]> e : files(out).entrySet()) {
                if (isTemporary(e.getKey())) {
                    continue; // a write in progress when killed: hidden, never taken for an output
                }
                checked++;
                byte[] want0 = ref.get(0).get(e.getKey());
                byte[] want1 = ref.get(1).get(e.getKey());
                if (want0 == null || !Arrays.equals(e.getValue(), want0) && !Arrays.equals(e.getValue(), want1)) {
                    corrupted++;
                    bad.add("kill " + k + ": " + e.getKey() + " (" + e.getValue().length + " bytes)");
                }
            }
        }
        long leftByLastKill = files(out).keySet().stream().filter(KillDuringWriteTest::isTemporary).count();
        // one more run, not killed: it sweeps what the killed ones left and leaves nothing of its own
        Process last = start(harvest, ws, out, true);
        String said = new String(last.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, last.waitFor(), said);
        List<String> temps = new ArrayList<>();
        try (Stream<Path> s = Files.walk(out)) {
            s.filter(f -> isTemporary(out.relativize(f).toString())).forEach(f -> temps.add(out.relativize(f).toString()));
        }
        Map<String, byte[]> after = files(out);
        for (Map.Entry<String, byte[]> e : after.entrySet()) {
            assertTrue(Arrays.equals(e.getValue(), ref.get(0).get(e.getKey())), "the last run wrote version 0 of " + e.getKey());
        }
        assertEquals(ref.get(0).keySet(), after.keySet());
        System.out.printf("kill-during-write: %d kills, %d after the second round began, %d files checked, %d files corrupted, "
                + "%d temporary files after the last kill (each child sweeps the ones before), %d after the next run%n", kills, midRound, checked, corrupted,
                leftByLastKill, temps.size());
        assertEquals(List.of(), bad);
        assertTrue(midRound > 0, "no kill landed after the child had started writing");
        assertEquals(List.of(), temps, "the next run removes the temporaries the killed ones left");
    }

    /** A hidden temporary (ours: {@code .<hex>.<name>.tmp} or {@code .spill}), or a file in a staging folder. */
    static boolean isTemporary(String relative) {
        for (String part : relative.split("/")) {
            if (part.startsWith(".") && (part.endsWith(".tmp") || part.endsWith(".spill"))) {
                return true;
            }
        }
        return false;
    }

    /**
     * A workspace of the demo's text listings, its vocabulary, and the first rows of its feedback
     * and judgments (enough for every stage of the audit, small enough for a round in about a second).
     */
    static Path smallWorkspace(Path ws) throws IOException {
        Path demo = Path.of("..", "sample-listings");
        Path text = demo.resolve("catalog/text");
        try (Stream<Path> s = Files.walk(text)) {
            for (Path f : s.filter(Files::isRegularFile).sorted().toList()) {
                Path to = ws.resolve("catalog").resolve(text.relativize(f).toString());
                Files.createDirectories(to.getParent());
                Files.copy(f, to);
            }
        }
        Files.copy(demo.resolve("fernhollow.vocab.json"), ws.resolve("vocab.json"));
        Files.write(ws.resolve("feedback.csv"), Files.readAllLines(demo.resolve("feedback.csv")).subList(0, 301));
        Files.write(ws.resolve("judgments.csv"), Files.readAllLines(demo.resolve("judgments.csv")).subList(0, 3001));
        Files.writeString(ws.resolve("workspace.json"), """
                {"format": "sheaf-workspace", "formatVersion": 1, "name": "Kill test",
                 "sources": [{"path": "catalog", "include": ["**/*"], "exclude": ["**/README*"]}],
                 "profile": "default", "vocabulary": "vocab.json", "feedback": "feedback.csv",
                 "judgments": "judgments.csv", "output": "out"}
                """);
        return ws;
    }

    private static void mine(Path out, String limit) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = Main.commandLine(new PrintWriter(o), new PrintWriter(e)).execute("mine",
                Path.of("..", "sample-listings", "catalog", "html").toString(), "--out", out.toString(), "--no-progress",
                "--limit", limit, "--threads", "2");
        assertEquals(0, code, e.toString());
    }

    private static Process start(Path[] harvest, Path ws, Path out, boolean once) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        List<String> cmd = new ArrayList<>(List.of(java, "-Xmx256m", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-cp", cp,
                WriteLoopMain.class.getName(), harvest[0].toString(), harvest[1].toString(), ws.toString(), out.toString()));
        if (once) {
            cmd.add("--once");
        }
        ProcessBuilder pb = new ProcessBuilder(cmd);
        pb.redirectError(ProcessBuilder.Redirect.INHERIT);
        return pb.start();
    }

    private static void deleteTree(Path root) throws IOException {
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                Files.delete(p);
            }
        }
    }

    private static Map<String, byte[]> files(Path root) throws IOException {
        Map<String, byte[]> m = new TreeMap<>();
        try (Stream<Path> s = Files.walk(root)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                m.put(root.relativize(p).toString(), Files.readAllBytes(p));
            }
        }
        return m;
    }
}
