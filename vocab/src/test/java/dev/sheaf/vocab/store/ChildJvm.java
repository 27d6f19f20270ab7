package dev.sheaf.vocab.store;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/** Starts {@link SaveLoopMain} in a child JVM on this test class path. */
final class ChildJvm {
    private ChildJvm() {
    }

    static Process start(String mode, Path file) throws IOException {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        ProcessBuilder pb = new ProcessBuilder(List.of(java, "-Xmx128m", "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Xshare:auto",
                "-cp", cp, SaveLoopMain.class.getName(), mode, file.toString()));
        pb.redirectError(ProcessBuilder.Redirect.INHERIT);
        return pb.start();
    }
}
