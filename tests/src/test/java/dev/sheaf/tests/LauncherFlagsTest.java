package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The launcher's choice of JIT for batch commands (decision 050): the quick compiler only for inputs
 * under SHEAF_C1_BELOW_MB and for the demo, the tuned tiers for larger inputs or none named; the
 * values of --out are not inputs. Read through {@code SHEAF_SHOW_JAVA_OPTS=1}, which prints the flags
 * and starts no JVM.
 */
class LauncherFlagsTest {
    private static final Path LAUNCHER = Path.of("..", "sheaf").toAbsolutePath().normalize();
    private static final String C1 = "-XX:TieredStopAtLevel=1";
    private static final String TUNED = "-XX:Tier4InvocationThreshold=";

    @TempDir
    Path dir;

    @Test
    void smallInputsAndTheDemoGetTheQuickCompilerOnly() throws Exception {
        Path small = Files.writeString(dir.resolve("small.jsonl"), "{\"id\":\"a\",\"title\":\"Tent\"}\n");
        assertTrue(flags(Map.of(), "mine", small.toString(), "--out", dir.resolve("out").toString()).contains(C1));
        assertTrue(flags(Map.of(), "demo").contains(C1));
        Path folder = Files.createDirectories(dir.resolve("catalog"));
        Files.writeString(folder.resolve("one.html"), "<html><title>Tent</title></html>");
        assertTrue(flags(Map.of(), "mine", folder.toString(), "--out", dir.resolve("out").toString()).contains(C1));
    }

    @Test
    void largeInputsAndUnnamedOnesKeepTheTunedTiers() throws Exception {
        Path big = sparse(dir.resolve("big.jsonl"), 150_000_000L);
        String f = flags(Map.of(), "mine", big.toString(), "--out", dir.resolve("out").toString());
        assertTrue(f.contains(TUNED), f);
        assertFalse(f.contains(C1), f);
        // two inputs that are small alone but large together
        Path a = sparse(dir.resolve("a.jsonl"), 60_000_000L);
        Path b = sparse(dir.resolve("b.jsonl"), 60_000_000L);
        assertTrue(flags(Map.of(), "mine", a.toString(), b.toString(), "-o", dir.toString()).contains(TUNED));
        // nothing named: size unknown, tuned tiers
        assertTrue(flags(Map.of(), "mine").contains(TUNED));
    }

    @Test
    void theOutputFolderIsNotCountedAndTheLimitCanBeChangedOrTurnedOff() throws Exception {
        Path small = Files.writeString(dir.resolve("small.jsonl"), "{\"id\":\"a\",\"title\":\"Tent\"}\n");
        Path out = Files.createDirectories(dir.resolve("out"));
        sparse(out.resolve("old-harvest.json"), 150_000_000L);
        assertTrue(flags(Map.of(), "mine", small.toString(), "--out", out.toString()).contains(C1));
        assertTrue(flags(Map.of(), "mine", small.toString(), "--out=" + out).contains(C1));
        assertTrue(flags(Map.of("SHEAF_C1_BELOW_MB", "0"), "mine", small.toString()).contains(TUNED));
        Path mid = sparse(dir.resolve("mid.jsonl"), 150_000_000L);
        assertTrue(flags(Map.of("SHEAF_C1_BELOW_MB", "200"), "mine", mid.toString()).contains(C1));
        // explicit flags win over every choice
        assertEquals("-Xmx1g", flags(Map.of("SHEAF_JAVA_OPTS", "-Xmx1g"), "demo").strip());
    }

    private static Path sparse(Path p, long size) throws IOException {
        try (RandomAccessFile f = new RandomAccessFile(p.toFile(), "rw")) {
            f.setLength(size); // sparse: takes no disk space
        }
        return p;
    }

    private static String flags(Map<String, String> env, String... args) throws Exception {
        List<String> cmd = new ArrayList<>();
        cmd.add(LAUNCHER.toString());
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true);
        pb.environment().remove("SHEAF_JAVA_OPTS");
        pb.environment().remove("SHEAF_JAVA_EXTRA");
        pb.environment().remove("SHEAF_C1_BELOW_MB");
        pb.environment().put("SHEAF_SHOW_JAVA_OPTS", "1");
        pb.environment().putAll(env);
        Process p = pb.start();
        String text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, p.waitFor(), text);
        return text;
    }
}
