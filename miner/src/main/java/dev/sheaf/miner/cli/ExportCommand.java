package dev.sheaf.miner.cli;

import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import dev.sheaf.vocab.csv.VocabularyCsv;
import dev.sheaf.vocab.skos.Skos;
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

/** {@code sheaf export VOCAB --to turtle|rdfxml|csv --out FILE [--base-iri IRI]}. */
@Command(name = "export", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        description = {"Export a vocabulary as SKOS (Turtle, RDF/XML) or CSV.",
                "SKOS carries facet properties, provenance and decisions in Sheaf's namespace https://sheaf.dev/ns# "
                        + "(docs/vocab-format.md). CSV has one row per concept; cells are safe to open in a spreadsheet."},
        footerHeading = "%n",
        footer = {"Exit codes: 0 written, 1 the vocabulary could not be read or the file not written, 2 wrong command line."})
final class ExportCommand implements Callable<Integer> {
    enum Target { turtle, rdfxml, csv }

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", paramLabel = "VOCAB", description = "the vocabulary: our JSON or SKOS")
    Path vocab;

    @Option(names = "--to", required = true, paramLabel = "FORMAT", description = "turtle, rdfxml or csv")
    Target to;

    @Option(names = "--out", required = true, paramLabel = "FILE", description = "the file to write (replaced atomically)")
    Path out;

    @Option(names = "--base-iri", paramLabel = "IRI",
            description = "namespace for concept IRIs in SKOS (ends with / or #; default: the vocabulary's own base IRI)")
    String baseIri;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        if (baseIri != null) {
            try {
                SchemeInfo.checkBase(baseIri);
            } catch (IllegalArgumentException e) {
                err.println("sheaf export: --base-iri: " + e.getMessage());
                return ExitCodes.USAGE;
            }
            if (to == Target.csv) {
                err.println("sheaf export: --base-iri applies to SKOS only; CSV uses concept ids");
                return ExitCodes.USAGE;
            }
        }
        Vocabulary v;
        try {
            v = VocabularyFiles.read(vocab).vocabulary();
        } catch (VocabularyFormatException e) {
            err.println("sheaf export: " + e.getMessage());
            return ExitCodes.FAILURE;
        } catch (NoSuchFileException e) {
            err.println("sheaf export: " + e.getFile() + ": " + (e.getReason() == null ? "no such file" : e.getReason()));
            return ExitCodes.FAILURE;
        } catch (IOException e) {
            err.println("sheaf export: cannot read " + vocab + ": " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        try {
            switch (to) {
                case turtle:
                    Skos.export(v, Skos.Syntax.TURTLE, out, baseIri);
                    break;
                case rdfxml:
                    Skos.export(v, Skos.Syntax.RDF_XML, out, baseIri);
                    break;
                default:
                    VocabularyCsv.export(v, out);
            }
        } catch (IOException e) {
            err.println("sheaf export: cannot write " + out + ": " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        err.printf("sheaf export: wrote %s (%s: %d facets, %d concepts)%n", out, to, v.facets().size(), v.concepts().size());
        return ExitCodes.OK;
    }
}
