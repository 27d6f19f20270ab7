package dev.sheaf.vocab.store;

import dev.sheaf.vocab.Fixtures;
import java.nio.file.Files;
import java.nio.file.Path;

/** Rewrites the golden file after a deliberate format change: run its main, review the diff, commit. */
public final class GoldenWriter {
    private GoldenWriter() {
    }

    public static void main(String[] args) throws Exception {
        Path p = Path.of(args.length > 0 ? args[0] : "vocab/src/test/resources/format/fernhollow.vocab.json");
        Files.write(p, JsonCodec.write(Fixtures.fernhollow()));
    }
}
