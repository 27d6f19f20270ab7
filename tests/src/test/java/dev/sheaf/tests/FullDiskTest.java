package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import dev.sheaf.miner.cli.Main;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A full disk and a read-only output folder: {@code sheaf mine} ends with exit code 1 and a message
 * that names the folder and the cause, and the outputs of the earlier run are intact, byte for byte.
 * The same holds for {@code sheaf label} and {@code sheaf audit} when the disk fills half-way through
 * their outputs: with a limit between the sizes of the new run's files, the smaller ones would have
 * been replaced, one by one, if each file were committed alone; as one output set, none is.
 * A full disk is simulated without privileges by a file-size limit on the child ({@code ulimit -f}
 * in bash: the JVM ignores SIGXFSZ, so the write fails with EFBIG, "File too large", as ENOSPC would).
 */
class FullDiskTest {
    private static final Path HTML = Path.of("..", "sample-listings", "catalog", "html");

    @TempDir
    Path dir;

    @Test
    void aFileSizeLimitFailsTheRunClearlyAndKeepsTheEarlierOutputs() throws Exception {
        Path out = dir.resolve("out");
        assertEquals(0, mineHere(out, "40"));
        Map<String, byte[]> before = files(out);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        // 1 MiB per file: the run's spill files fit, the full harvest.json (several MB) does not
        String cmd = "ulimit -f 1024; exec \"$0\" -Xmx512m -cp \"$1\" " + Main.class.getName() + " mine \"$2\" --out \"$3\""
                + " --no-progress --threads 2 --limit 0 --min-frequency 1 --min-df 1";
        Process p = new ProcessBuilder("bash", "-c", cmd, java, cp, HTML.toString(), out.toString())
                .redirectErrorStream(true).start();
        String said = new String(p.getInputStream().readAllBytes());
        assertEquals(1, p.waitFor(), said);
        assertTrue(said.contains("cannot write the harvest to " + out) && said.contains("File too large"), said);
        assertSame(before, files(out));
    }

    @Test
    void aDiskFullHalfWayThroughTheHarvestLeavesEveryFileTheOldVersion() throws Exception {
        Path out = dir.resolve("out");
        assertEquals(0, mineHere(out, "40"));
        String[] next = {"mine", HTML.toString(), "--out", "OUT", "--no-progress", "--threads", "2", "--limit", "2000"};
        assertEachFileOldAfterAFullDisk(out, next, "cannot write the harvest to " + out);
    }

    @Test
    void aDiskFullHalfWayThroughTheLabelExportsLeavesEveryFileTheOldVersion() throws Exception {
        Path ws = KillDuringWriteTest.smallWorkspace(dir.resolve("ws"));
        Path out = dir.resolve("labels");
        String vocab = ws.resolve("vocab.json").toString();
        assertEquals(0, run("label", ws.resolve("catalog/stoves").toString(), "--vocab", vocab, "--out", out.toString(),
                "--no-progress", "--threads", "1"));
        // a small catalog: its spill file and assignments fit under the limit, the summary written last does not
        String[] next = {"label", ws.resolve("catalog/tents").toString(), "--vocab", vocab, "--out", "OUT", "--no-progress",
                "--threads", "1", "--split", "80/10/10"};
        assertEachFileOldAfterAFullDisk(out, next, "cannot write the results to " + out);
    }

    @Test
    void aDiskFullHalfWayThroughTheAuditLeavesEveryFileTheOldVersion() throws Exception {
        Path ws = KillDuringWriteTest.smallWorkspace(dir.resolve("ws"));
        Path out = dir.resolve("audit");
        String json = Files.readString(ws.resolve("workspace.json"));
        Files.writeString(ws.resolve("workspace.json"), json.replace("\"path\": \"catalog\"", "\"path\": \"catalog/tents\""));
        assertEquals(0, run("audit", ws.toString(), "--out", out.toString()));
        Files.writeString(ws.resolve("workspace.json"), json);
        assertEachFileOldAfterAFullDisk(out, new String[] {"audit", ws.toString(), "--out", "OUT"}, "cannot read or write");
    }

    /**
     * Runs {@code args} (with OUT for the output folder) once into a scratch folder to learn the new
     * files' sizes, then again over {@code out} in a child under a file-size limit between the two
     * largest: the run must fail, saying {@code message}, and leave {@code out} byte for byte as it was.
     */
    private void assertEachFileOldAfterAFullDisk(Path out, String[] args, String message) throws Exception {
        Map<String, byte[]> before = files(out);
        Path scratch = dir.resolve("scratch-" + out.getFileName());
        assertTrue(List.of(0, 3).contains(run(withOut(args, scratch))), "the run succeeds without a limit");
        List<Long> sizes = new ArrayList<>();
        for (byte[] b : files(scratch).values()) {
            sizes.add((long) b.length);
        }
        sizes.sort(java.util.Comparator.reverseOrder());
        long largest = sizes.get(0);
        long second = sizes.get(1);
        long blocks = (largest + second) / 2 / 1024; // ulimit -f counts blocks of 1,024 bytes
        assertTrue(second < blocks * 1024 && blocks * 1024 < largest,
                "the new files' sizes leave room for a limit between the two largest: " + sizes);
        long replaceable = sizes.stream().filter(n -> n > 0 && n < blocks * 1024).count();
        assertTrue(replaceable >= 2, "files one by one would have replaced several of the old ones: " + sizes);

        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        List<String> cmd = new ArrayList<>(List.of("bash", "-c", "ulimit -f " + blocks + "; exec \"$@\"", "bash", java, "-Xmx512m",
                "-Djava.io.tmpdir=" + Files.createDirectories(dir.resolve("tmp")), "-cp", cp, Main.class.getName()));
        cmd.addAll(List.of(withOut(args, out)));
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        String said = new String(p.getInputStream().readAllBytes());
        int code = p.waitFor();
        assertTrue(code == 1 || code == 3, "exit code " + code + ": " + said);
        assertTrue(said.contains(message) && said.contains("File too large"), said);
        assertSame(before, files(out));
    }

    private static String[] withOut(String[] args, Path out) {
        String[] a = args.clone();
        for (int i = 0; i < a.length; i++) {
            if (a[i].equals("OUT")) {
                a[i] = out.toString();
            }
        }
        return a;
    }

    private static int run(String... args) {
        StringWriter e = new StringWriter();
        int code = Main.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(e)).execute(args);
        if (code != 0 && code != 3) {
            System.err.println(e);
        }
        return code;
    }

    @Test
    void aReadOnlyOutputFolderFailsTheRunClearlyAndKeepsTheEarlierOutputs() throws Exception {
        Path out = dir.resolve("out");
        assertEquals(0, mineHere(out, "40"));
        Map<String, byte[]> before = files(out);
        Files.setPosixFilePermissions(out, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            assumeFalse(Files.isWritable(out) && canCreate(out), "running as root: a read-only mode does not stop writes");
            StringWriter e = new StringWriter();
            int code = Main.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(e)).execute("mine", HTML.toString(),
                    "--out", out.toString(), "--no-progress", "--limit", "400");
            assertEquals(1, code, e.toString());
            assertTrue(e.toString().contains("cannot write the harvest to " + out), e.toString());
            assertSame(before, files(out));
        } finally {
            Files.setPosixFilePermissions(out, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    private static boolean canCreate(Path d) {
        try {
            Files.delete(Files.createFile(d.resolve(".probe")));
            return true;
        } catch (IOException e) {
            return false;
        }
    }

    private static int mineHere(Path out, String limit) {
        StringWriter e = new StringWriter();
        return Main.commandLine(new PrintWriter(new StringWriter()), new PrintWriter(e)).execute("mine", HTML.toString(), "--out",
                out.toString(), "--no-progress", "--limit", limit, "--threads", "2");
    }

    private static void assertSame(Map<String, byte[]> before, Map<String, byte[]> after) {
        assertEquals(before.keySet(), after.keySet(), "no file added or removed (no temporary file left)");
        for (String f : before.keySet()) {
            assertArrayEquals(before.get(f), after.get(f), f + " changed");
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
