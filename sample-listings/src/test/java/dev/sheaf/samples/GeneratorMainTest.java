package dev.sheaf.samples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The command line, through picocli with injected writers. */
class GeneratorMainTest {
    @TempDir
    Path tmp;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        return GeneratorMain.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
    }

    @Test
    void helpTeachesTheFormatsExamplesAndExitCodes() {
        assertEquals(0, run("--help"));
        String help = out.toString();
        for (String s : new String[] {"--listings", "--format", "jsonl", "folder", "--seed", "demo", "Examples:", "Exit codes", "430 bytes", "/tmp/fh-1m.jsonl"}) {
            assertTrue(help.contains(s), "help mentions " + s + ":\n" + help);
        }
        assertEquals(0, run("demo", "--help"));
        assertTrue(out.toString().contains("--replace"));
    }

    @Test
    void writesASmallJsonlCorpusAndReportsOnStdout() throws IOException {
        Path f = tmp.resolve("small.jsonl");
        assertEquals(0, run("--listings", "300", "--format", "jsonl", "--out", f.toString(), "--seed", "5"));
        assertEquals(300, Files.readAllLines(f).size());
        assertTrue(out.toString().contains("wrote 300 listings"), out.toString());
        assertTrue(out.toString().contains("seed 5"));
    }

    @Test
    void missingOptionsAreNamedWithAnExitCodeOfTwo() {
        assertEquals(GeneratorMain.USAGE, run("--listings", "10"));
        assertTrue(err.toString().contains("--format") && err.toString().contains("--out"), err.toString());
    }

    @Test
    void rejectsAZeroCountAnUnknownFormatAndAFolderForJsonl() {
        assertEquals(GeneratorMain.USAGE, run("--listings", "0", "--format", "jsonl", "--out", tmp.resolve("x.jsonl").toString()));
        assertTrue(err.toString().contains("1 or more"), err.toString());
        assertEquals(GeneratorMain.USAGE, run("--listings", "5", "--format", "xml", "--out", tmp.resolve("x").toString()));
        assertEquals(GeneratorMain.USAGE, run("--listings", "5", "--format", "jsonl", "--out", tmp.toString()));
        assertTrue(err.toString().contains("is a folder"), err.toString());
    }

    @Test
    void aFolderCorpusNeedsANewOrEmptyFolder() throws IOException {
        Files.writeString(tmp.resolve("keep.txt"), "mine");
        assertEquals(GeneratorMain.USAGE, run("--listings", "5", "--format", "folder", "--out", tmp.toString()));
        assertTrue(err.toString().contains("new or empty folder"), err.toString());
        assertTrue(Files.exists(tmp.resolve("keep.txt")));
    }

    @Test
    void demoRefusesToOverwriteACatalogWithoutReplace() throws IOException {
        Files.createDirectories(tmp.resolve("catalog"));
        Files.writeString(tmp.resolve("catalog/old.html"), "old");
        Files.writeString(tmp.resolve("pom.xml"), "not ours");
        assertEquals(GeneratorMain.USAGE, run("demo", "--out", tmp.toString()));
        assertTrue(err.toString().contains("--replace"), err.toString());
        assertTrue(Files.exists(tmp.resolve("catalog/old.html")));
    }

    @Test
    void anUnwritableTargetIsReportedWithExitCodeOne() throws IOException {
        Path blocker = tmp.resolve("file");
        Files.writeString(blocker, "x");
        assertEquals(GeneratorMain.WRITE_FAILED, run("--listings", "5", "--format", "jsonl", "--out", blocker.resolve("sub/x.jsonl").toString()));
        assertTrue(err.toString().contains("could not write"), err.toString());
    }
}
