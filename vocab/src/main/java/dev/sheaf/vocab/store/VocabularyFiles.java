package dev.sheaf.vocab.store;

import dev.sheaf.vocab.Finding;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.skos.Skos;
import dev.sheaf.vocab.skos.SkosImport;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

/** Reads a vocabulary from any file Sheaf understands: our JSON, or SKOS in Turtle or RDF/XML. Read-only, no lock. */
public final class VocabularyFiles {

    /** The kinds of vocabulary file. */
    public enum Kind { SHEAF_JSON, TURTLE, RDF_XML }

    /**
     * A vocabulary as read.
     *
     * @param vocabulary the vocabulary
     * @param findings what reading found (SKOS integrity conditions the model cannot hold, import notes); empty for our JSON
     * @param kind which kind of file it was
     */
    public record Loaded(Vocabulary vocabulary, List<Finding> findings, Kind kind) {
        public Loaded {
            findings = List.copyOf(findings);
        }
    }

    private VocabularyFiles() {
    }

    /**
     * Reads a file: {@code .json} as our format, {@code .ttl} as Turtle, {@code .rdf/.owl/.xml} as
     * RDF/XML; any other name by its first character ({ JSON, < RDF/XML, else Turtle).
     */
    public static Loaded read(Path file) throws IOException {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new NoSuchFileException(file.toString(), null, "no such vocabulary file; check the path");
        }
        Kind kind = kindOf(file, bytes);
        if (kind == Kind.SHEAF_JSON) {
            return new Loaded(JsonCodec.read(bytes, file.toString()), List.of(), kind);
        }
        SkosImport imp = Skos.read(new ByteArrayInputStream(bytes), kind == Kind.TURTLE ? Skos.Syntax.TURTLE : Skos.Syntax.RDF_XML,
                file.toString());
        return new Loaded(imp.vocabulary(), imp.findings(), kind);
    }

    static Kind kindOf(Path file, byte[] bytes) {
        String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
        if (n.endsWith(".json")) {
            return Kind.SHEAF_JSON;
        }
        if (Skos.Syntax.matches(file)) {
            return Skos.Syntax.forFile(file) == Skos.Syntax.TURTLE ? Kind.TURTLE : Kind.RDF_XML;
        }
        for (byte b : bytes) {
            if (!Character.isWhitespace(b) && b != (byte) 0xEF && b != (byte) 0xBB && b != (byte) 0xBF) {
                return b == '{' ? Kind.SHEAF_JSON : b == '<' ? Kind.RDF_XML : Kind.TURTLE;
            }
        }
        return Kind.SHEAF_JSON;
    }
}
