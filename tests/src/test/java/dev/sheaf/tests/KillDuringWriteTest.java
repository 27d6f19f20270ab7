package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
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
 * harvest files, problems.csv and an HTML report in one folder, two versions in turn: every output
 * file must then be absent (never written yet), or byte for byte one complete version. The
 * vocabulary store's own kill test is {@code vocab/…/CrashDuringSaveTest}. A process kill leaves the
 * page cache intact, so this tests atomicity, not power loss.
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
        // the reference bytes: each version written once, by the same code, in this process
        List<Map<String, byte[]>> ref = new ArrayList<>();
        for (int v = 0; v < 2; v++) {
            Path r = Files.createDirectories(dir.resolve("ref" + v));
            WriteLoopMain.outputs(harvest[v], v).write(r);
            ref.add(files(r));
        }
        assertEquals(ref.get(0).keySet(), ref.get(1).keySet());
        Path out = Files.createDirectories(dir.resolve("out"));
        Random rnd = new Random(seed);
        int midRound = 0;
        int corrupted = 0;
        List<String> bad = new ArrayList<>();
        for (int k = 0; k < kills; k++) {
            Process p = start(harvest, out);
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
                if (e.getKey().endsWith(".tmp")) {
                    continue; // a write in progress when killed: hidden, never taken for an output
                }
                byte[] want0 = ref.get(0).get(e.getKey());
                byte[] want1 = ref.get(1).get(e.getKey());
                if (want0 == null || !Arrays.equals(e.getValue(), want0) && !Arrays.equals(e.getValue(), want1)) {
                    corrupted++;
                    bad.add("kill " + k + ": " + e.getKey() + " (" + e.getValue().length + " bytes)");
                }
            }
        }
        long temps;
        try (Stream<Path> s = Files.list(out)) {
            temps = s.filter(f -> f.getFileName().toString().endsWith(".tmp")).count();
        }
        System.out.printf("kill-during-write: %d kills, %d after the second round began, %d files corrupted, %d temporary files left%n",
                kills, midRound, corrupted, temps);
        assertEquals(List.of(), bad);
        assertTrue(midRound > 0, "no kill landed after the child had started writing");
    }

    private static void mine(Path out, String limit) {
        StringWriter o = new StringWriter();
        StringWriter e = new StringWriter();
        int code = Main.commandLine(new PrintWriter(o), new PrintWriter(e)).execute("mine",
                Path.of("..", "sample-listings", "catalog", "html").toString(), "--out", out.toString(), "--no-progress",
                "--limit", limit, "--threads", "2");
        assertEquals(0, code, e.toString());
    }

    private static Process start(Path[] harvest, Path out) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        ProcessBuilder pb = new ProcessBuilder(List.of(java, "-Xmx256m", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-cp", cp,
                WriteLoopMain.class.getName(), harvest[0].toString(), harvest[1].toString(), out.toString()));
        pb.redirectError(ProcessBuilder.Redirect.INHERIT);
        return pb.start();
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
