package dev.sheaf.miner.cli;

import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import dev.sheaf.vocab.diff.VocabularyDiff;
import dev.sheaf.vocab.store.VocabularyFiles;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheaf diff OLD NEW}: what changed between two versions, recognised by concept id. */
@Command(name = "diff", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        description = {"Show what changed between two versions of a vocabulary.",
                "Concepts are matched by id: renames, merges (an id kept as \"replaced by\") and splits are "
                        + "recognised from the files, never guessed from labels. Either file may be our JSON or SKOS."},
        footerHeading = "%n",
        footer = {"Formats: text (default), markdown (a changelog to paste into a release note), json.",
                "Exit codes: 0 compared (with or without changes), 1 a file could not be read, 2 wrong command line."})
final class DiffCommand implements Callable<Integer> {
    enum Format { text, markdown, json }

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "OLD", description = "the earlier version")
    Path older;

    @Parameters(index = "1", paramLabel = "NEW", description = "the later version")
    Path newer;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text, markdown or json (default: ${DEFAULT-VALUE})")
    Format format;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Vocabulary a;
        Vocabulary b;
        try {
            a = VocabularyFiles.read(older).vocabulary();
            b = VocabularyFiles.read(newer).vocabulary();
        } catch (VocabularyFormatException e) {
            err.println("sheaf diff: " + e.getMessage());
            return ExitCodes.FAILURE;
        } catch (NoSuchFileException e) {
            err.println("sheaf diff: " + e.getFile() + ": " + (e.getReason() == null ? "no such file" : e.getReason()));
            return ExitCodes.FAILURE;
        } catch (IOException e) {
            err.println("sheaf diff: cannot read a vocabulary: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        VocabularyDiff d = VocabularyDiff.between(a, b);
        switch (format) {
            case markdown:
                out.print(d.toMarkdown());
                break;
            case json:
                out.print(d.toJson());
                break;
            default:
                out.print(d.toText());
        }
        out.flush();
        return ExitCodes.OK;
    }
}
