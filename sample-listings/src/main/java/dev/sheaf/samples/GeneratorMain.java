package dev.sheaf.samples;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code ./sheaf generate}: writes the demo catalog or large generated corpora. */
@Command(name = "generate", mixinStandardHelpOptions = true, version = "sheaf generate 0.1.0",
        subcommands = GeneratorMain.Demo.class, usageHelpAutoWidth = true,
        description = {
            "Writes invented listings of Fernhollow Outfitters, a fictional outdoor-gear shop: either the demo workspace "
                + "(subcommand 'demo') or a benchmark corpus of any size.",
            "",
            "A corpus has the demo's phenomena at scale: eleven categories, seven suppliers with their own spellings, key "
                + "names and units (one writes everything differently), synonyms, hyphenation variants, misspellings (1%% of "
                + "listings), marketing fluff, negations, regulated claims and a long tail of invented names.",
            "Output is deterministic: listing i depends only on the seed and i, so the same seed always gives the same bytes "
                + "and a smaller corpus is a prefix of a larger one.",
            "",
            "Formats:",
            "  jsonl    one file, one JSON object per line, about 430 bytes per listing:",
            "           {\"id\":\"FH-000001\",\"category\":\"tents\",\"title\":..,\"description\":..,",
            "            \"bullets\":[..],\"specs\":{\"Weight\":\"1.2 kg\",..}}",
            "  folder   one file per listing in sub-folders of 1000 files: HTML pages (90%%),",
            "           .txt and .md notes (4%% each), PDF and DOCX sheets (1%% each).",
            "           The folder must be new or empty.",
            ""},
        footer = {
            "",
            "Examples:",
            "  ./sheaf generate --listings 1000000 --format jsonl --out /tmp/fh-1m.jsonl",
            "  ./sheaf generate --listings 20000 --format folder --out /tmp/fh-20k --seed 7",
            "  ./sheaf generate demo --out /tmp/fernhollow",
            "",
            "Benchmark corpora belong in /tmp or bench/corpora/ (git-ignored), never in the repository."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:done", "1:could not write the output", "2:bad arguments"})
public final class GeneratorMain implements Callable<Integer> {
    /** Exit codes, also listed in --help. */
    static final int OK = 0;
    static final int WRITE_FAILED = 1;
    static final int USAGE = 2;

    /** The seed of the committed demo set and the default of every corpus. */
    static final long DEFAULT_SEED = 42;

    enum Format { jsonl, folder }

    @Spec
    CommandSpec spec;

    @Option(names = "--listings", paramLabel = "N", description = "Number of listings to write (1 or more).")
    Long listings;

    @Option(names = "--format", paramLabel = "jsonl|folder", description = "jsonl: one JSON Lines file; folder: one file per listing.")
    Format format;

    @Option(names = "--out", paramLabel = "PATH", description = "The .jsonl file to write (replaced atomically), or the folder to fill.")
    Path out;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "42", description = "Seed (default: ${DEFAULT-VALUE}).")
    long seed;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        PrintWriter outWriter = spec.commandLine().getOut();
        if (listings == null || format == null || out == null) {
            throw new ParameterException(spec.commandLine(), "generate needs --listings N, --format jsonl|folder and --out PATH "
                    + "(or the subcommand 'demo --out DIR'); missing: " + missing() + ". See ./sheaf generate --help.");
        }
        if (listings < 1) {
            throw new ParameterException(spec.commandLine(), "--listings must be 1 or more, got " + listings + ".");
        }
        long start = System.nanoTime();
        ScaleCorpus.Progress progress = (n, bytes) -> {
            err.printf(Locale.ROOT, "generate: %,d of %,d listings, %,d MB%n", n, listings, bytes >> 20);
            err.flush();
        };
        long bytes;
        if (format == Format.jsonl) {
            if (Files.isDirectory(out)) {
                throw new ParameterException(spec.commandLine(), "--out " + out + " is a folder; --format jsonl writes one file, "
                        + "e.g. --out " + out.resolve("corpus.jsonl") + ".");
            }
            bytes = ScaleCorpus.jsonl(listings, seed, out, progress);
        } else {
            if (Files.isRegularFile(out) || (Files.isDirectory(out) && !isEmpty(out))) {
                throw new ParameterException(spec.commandLine(), "--out " + out + " must be a new or empty folder for --format folder; "
                        + "choose another path or empty it first.");
            }
            bytes = ScaleCorpus.folder(listings, seed, out, progress);
        }
        double secs = (System.nanoTime() - start) / 1e9;
        outWriter.printf(Locale.ROOT, "wrote %,d listings (%,d bytes, %.0f bytes per listing) to %s in %.1f s (seed %d)%n",
                listings, bytes, (double) bytes / listings, out, secs, seed);
        outWriter.flush();
        return OK;
    }

    private String missing() {
        StringBuilder m = new StringBuilder();
        if (listings == null) {
            m.append("--listings");
        }
        if (format == null) {
            m.append(m.length() > 0 ? ", " : "").append("--format");
        }
        if (out == null) {
            m.append(m.length() > 0 ? ", " : "").append("--out");
        }
        return m.toString();
    }

    static boolean isEmpty(Path dir) throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.findAny().isEmpty();
        }
    }

    @Command(name = "demo", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
            description = {
                "Re-creates the Fernhollow Outfitters demo workspace: the catalog (HTML pages, a CSV export, a JSONL feed, PDF and "
                    + "DOCX sheets, text and Markdown notes), bad/ (broken files), feedback.csv, judgments.csv, "
                    + "fernhollow-vocab-source.json, planted.json (the ground truth), workspace.json and README.md.",
                "With the default seed the files are byte-for-byte the ones committed in sample-listings/.",
                ""},
            footer = {
                "",
                "Examples:",
                "  ./sheaf generate demo --out /tmp/fernhollow",
                "  ./sheaf generate demo --out sample-listings --replace",
                "      (refresh the committed demo after changing the generator)"},
            exitCodeListHeading = "%nExit codes:%n",
            exitCodeList = {"0:done", "1:could not write the output", "2:bad arguments"})
    static final class Demo implements Callable<Integer> {
        @Spec
        CommandSpec spec;

        @Option(names = "--out", required = true, paramLabel = "DIR", description = "The workspace folder to write.")
        Path out;

        @Option(names = "--seed", paramLabel = "S", defaultValue = "42", description = "Seed (default: ${DEFAULT-VALUE}, the committed demo).")
        long seed;

        @Option(names = "--replace", description = "Delete DIR/catalog and DIR/bad first (the generator's own folders; nothing else is touched).")
        boolean replace;

        @Override
        public Integer call() throws IOException {
            if (Files.isRegularFile(out)) {
                throw new ParameterException(spec.commandLine(), "--out " + out + " is a file; demo writes a workspace folder.");
            }
            for (String owned : DemoWriter.OWNED_FOLDERS) {
                Path p = out.resolve(owned);
                if (Files.isDirectory(p) && !isEmpty(p)) {
                    if (!replace) {
                        throw new ParameterException(spec.commandLine(), out.resolve(owned) + " already holds files; add --replace to "
                                + "delete " + String.join(" and ", DemoWriter.OWNED_FOLDERS) + " under " + out + " and write them anew, "
                                + "or choose an empty --out folder.");
                    }
                    deleteTree(p);
                }
            }
            long start = System.nanoTime();
            PrintWriter err = spec.commandLine().getErr();
            DemoWriter.Summary s = DemoWriter.write(seed, out, n -> {
                err.printf(Locale.ROOT, "generate demo: %d listing files%n", n);
                err.flush();
            });
            PrintWriter o = spec.commandLine().getOut();
            o.printf(Locale.ROOT, "wrote the demo workspace to %s: %,d listings, %,d files, %,d bytes, %,d feedback sentences, %,d judgments in %.1f s (seed %d)%n",
                    out, s.listings(), s.files(), s.bytes(), s.feedbackRows(), s.judgmentRows(), (System.nanoTime() - start) / 1e9, seed);
            o.flush();
            return OK;
        }
    }

    static void deleteTree(Path root) throws IOException {
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : (Iterable<Path>) walk.sorted(Comparator.reverseOrder())::iterator) {
                Files.delete(p);
            }
        }
    }

    /** The command line with the given writers (tests inject their own). */
    static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new GeneratorMain());
        cl.setOut(out);
        cl.setErr(err);
        cl.setExecutionExceptionHandler((ex, cmd, parsed) -> {
            cmd.getErr().println("generate: could not write the output: " + ex.getMessage());
            cmd.getErr().flush();
            return WRITE_FAILED;
        });
        cl.setParameterExceptionHandler((ex, args) -> {
            // the message says what is wrong; the full help would bury it
            PrintWriter e = ex.getCommandLine().getErr();
            e.println("generate: " + ex.getMessage());
            if (!ex.getMessage().contains("--help")) {
                e.println("Run ./sheaf generate --help (or ./sheaf generate demo --help) for the options and examples.");
            }
            e.flush();
            return USAGE;
        });
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        return cl;
    }

    public static void main(String[] args) {
        // POI logs through the Log4j API; without a provider it prints a warning on every run
        System.setProperty("log4j2.loggerContextFactory", "org.apache.logging.log4j.simple.SimpleLoggerContextFactory");
        System.setProperty("org.apache.logging.log4j.simplelog.StatusLogger.level", "OFF");
        System.setProperty("org.apache.logging.log4j.simplelog.level", "OFF");
        PrintWriter out = new PrintWriter(new java.io.OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new java.io.OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        System.exit(commandLine(out, err).execute(args));
    }
}
