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
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A full disk and a read-only output folder: {@code sheaf mine} ends with exit code 1 and a message
 * that names the folder and the cause, and the outputs of the earlier run are intact, byte for byte.
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
