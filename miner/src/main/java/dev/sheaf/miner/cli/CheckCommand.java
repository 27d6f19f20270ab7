package dev.sheaf.miner.cli;

import dev.sheaf.vocab.CheckReport;
import dev.sheaf.vocab.VocabularyChecker;
import dev.sheaf.vocab.VocabularyFormatException;
import dev.sheaf.vocab.store.VocabularyFiles;
import dev.sheaf.vocab.store.VocabularyStore;
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

/** {@code sheaf check VOCAB}: SKOS integrity conditions and thesaurus practice, as text or JSON. */
@Command(name = "check", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        description = {"Check a vocabulary against SKOS integrity rules and thesaurus practice.",
                "Reads our JSON (*.vocab.json) and SKOS files (Turtle .ttl, RDF/XML .rdf/.owl/.xml) alike. Each finding "
                        + "names its rule, the standard it comes from (W3C SKOS Reference 2009; ANSI/NISO Z39.19-2005; "
                        + "ISO 25964-1), the concepts involved and how to fix it."},
        footerHeading = "%n",
        footer = {"Exit codes: 0 no errors (warnings and notes allowed), 4 errors found (an unreadable file is one),",
                "1 the file could not be opened, 2 wrong command line."})
final class CheckCommand implements Callable<Integer> {
    enum Format { text, json }

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "VOCAB", description = "the vocabulary file to check")
    Path vocab;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "text or json (default: ${DEFAULT-VALUE})")
    Format format;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        CheckReport report;
        try {
            VocabularyFiles.Loaded l = VocabularyFiles.read(vocab);
            report = VocabularyChecker.check(l.vocabulary(), l.findings());
            if (l.kind() == VocabularyFiles.Kind.SHEAF_JSON) {
                int pending = VocabularyStore.unsavedSteps(vocab);
                if (pending > 0) {
                    err.printf("sheaf check: note: %s.journal holds %d unsaved edit%s; this check reads the file as saved"
                            + " (open it in the curator to recover them)%n", vocab.getFileName(), pending, pending == 1 ? "" : "s");
                }
            }
        } catch (VocabularyFormatException e) {
            report = VocabularyChecker.unreadable(e);
        } catch (NoSuchFileException e) {
            err.println("sheaf check: " + e.getFile() + ": " + (e.getReason() == null ? "no such file" : e.getReason()));
            return ExitCodes.FAILURE;
        } catch (IOException e) {
            err.println("sheaf check: cannot read " + vocab + ": " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        try {
            if (format == Format.json) {
                out.print(report.toJson(vocab.toString()));
            } else {
                report.writeText(out, vocab.toString());
            }
        } catch (IOException e) {
            err.println("sheaf check: cannot write the report: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        out.flush();
        return report.hasErrors() ? ExitCodes.FINDINGS : ExitCodes.OK;
    }
}
