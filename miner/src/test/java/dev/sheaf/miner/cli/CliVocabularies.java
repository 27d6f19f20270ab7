package dev.sheaf.miner.cli;

import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;

/** Invented Fernhollow Outfitters vocabularies for the command tests, and a way to run a command. */
final class CliVocabularies {
    private CliVocabularies() {
    }

    static Vocabulary clean() {
        return Vocabulary.of(SchemeInfo.of("fernhollow", "Fernhollow Outfitters attributes").withBaseIri("https://fernhollow.example/vocab/"),
                List.of(
                        Concept.builder("closure").prefLabel("Closure").facet(FacetProperties.terms()).build(),
                        Concept.builder("zipper").prefLabel("zipper").altLabel("zip").broader("closure").build(),
                        Concept.builder("toggle").prefLabel("toggle").broader("closure").build(),
                        Concept.builder("buckle").prefLabel("buckle").broader("closure").build()),
                List.of(), List.of(Decision.dropped("free shipping", "not a product attribute")));
    }

    /** "zip" is a synonym of two concepts: an ambiguous-label error. */
    static Vocabulary ambiguous() {
        Vocabulary c = clean();
        List<Concept> all = new java.util.ArrayList<>(c.allConcepts());
        all.removeIf(x -> x.id().equals("toggle"));
        all.add(Concept.builder("toggle").prefLabel("toggle").altLabel("zip").broader("closure").build());
        return Vocabulary.of(c.scheme(), all, c.retired(), c.decisions());
    }

    /** The outcome of one command: exit code, stdout, stderr. */
    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Main.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(args);
        return new Run(code, out.toString(), err.toString());
    }
}
