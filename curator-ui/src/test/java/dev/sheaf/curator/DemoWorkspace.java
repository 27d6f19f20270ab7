package dev.sheaf.curator;

import dev.sheaf.curator.session.Mining;
import dev.sheaf.miner.ingest.Workspace;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.StandardCopyOption;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.List;

/**
 * Copies of the demo workspace ({@code sample-listings/}) in temporary folders, so tests never
 * write into the committed one. The demo is mined once per test run into a template; {@link #mined}
 * copies the template (harvest and evidence index included), {@link #fresh} copies only the
 * workspace, catalog and vocabulary (no harvest yet).
 */
public final class DemoWorkspace {
    private static Path template;

    private DemoWorkspace() {
    }

    /** The committed demo folder. */
    public static Path source() {
        Path p = Path.of("..", "sample-listings").toAbsolutePath().normalize();
        if (!Files.isRegularFile(p.resolve("workspace.json"))) {
            throw new IllegalStateException("the demo workspace is not at " + p + " (tests run from curator-ui/)");
        }
        return p;
    }

    /** The demo's workspace.json, catalog and vocabulary copied into {@code dir} (no harvest). */
    public static Path fresh(Path dir) throws IOException {
        Path src = source();
        Files.createDirectories(dir);
        for (String f : List.of("workspace.json", "fernhollow.vocab.json", "feedback.csv", "judgments.csv")) {
            Files.copy(src.resolve(f), dir.resolve(f), StandardCopyOption.REPLACE_EXISTING);
        }
        copyTree(src.resolve("catalog"), dir.resolve("catalog"));
        return dir;
    }

    /** A copy of the demo with its harvest and evidence index already made. */
    public static synchronized Path mined(Path dir) throws IOException {
        if (template == null) {
            Path t = Files.createTempDirectory("sheaf-demo-template");
            fresh(t);
            Mining.mine(Workspace.load(t), (a, b, c, d) -> { }, () -> false);
            template = t;
        }
        copyTree(template, dir);
        return dir;
    }

    public static void copyTree(Path from, Path to) throws IOException {
        Files.walkFileTree(from, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult preVisitDirectory(Path d, BasicFileAttributes a) throws IOException {
                Files.createDirectories(to.resolve(from.relativize(d).toString()));
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult visitFile(Path f, BasicFileAttributes a) throws IOException {
                String n = f.getFileName().toString();
                if (!n.endsWith(".lock") && !n.contains(".journal")) {
                    Files.copy(f, to.resolve(from.relativize(f).toString()), StandardCopyOption.REPLACE_EXISTING);
                }
                return FileVisitResult.CONTINUE;
            }
        });
    }

    static void deleteQuietly(Path p) {
        try {
            if (Files.exists(p)) {
                Files.walkFileTree(p, new SimpleFileVisitor<>() {
                    @Override
                    public FileVisitResult visitFile(Path f, BasicFileAttributes a) throws IOException {
                        Files.delete(f);
                        return FileVisitResult.CONTINUE;
                    }

                    @Override
                    public FileVisitResult postVisitDirectory(Path d, IOException e) throws IOException {
                        Files.delete(d);
                        return FileVisitResult.CONTINUE;
                    }
                });
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
