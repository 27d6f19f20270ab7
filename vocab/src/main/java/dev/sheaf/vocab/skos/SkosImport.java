package dev.sheaf.vocab.skos;

import dev.sheaf.vocab.Finding;
import dev.sheaf.vocab.Vocabulary;
import java.util.List;
import java.util.Objects;

/**
 * The result of reading a SKOS file: the vocabulary, and what reading found — SKOS integrity
 * violations the model cannot hold (S9, S14, S37) and notes on what was not carried.
 */
public record SkosImport(Vocabulary vocabulary, List<Finding> findings) {
    public SkosImport {
        Objects.requireNonNull(vocabulary);
        findings = List.copyOf(findings);
    }
}
