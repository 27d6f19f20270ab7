package dev.sheaf.miner.ingest;

import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/** Writes problems to a spreadsheet-safe CSV file: {@code source,position,kind,reason}, one header row. */
public final class ProblemLog {
    /** The header row of {@code problems.csv}. */
    public static final List<String> HEADER = List.of("source", "position", "kind", "reason");

    private ProblemLog() {
    }

    /** Writes (atomically) {@code problemsCsv}; an empty list gives a file with the header only. */
    public static void write(Path problemsCsv, List<Problem> problems) throws IOException {
        AtomicFiles.writeText(problemsCsv, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row(HEADER);
            for (Problem p : problems) {
                csv.row(p.source(), p.position(), p.kind(), p.reason());
            }
            csv.flush();
        });
    }
}
