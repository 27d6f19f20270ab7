package dev.sheaf.vocab.skos;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.code_intelligence.jazzer.junit.FuzzTest;
import dev.sheaf.vocab.VocabularyFormatException;
import java.io.ByteArrayInputStream;
import java.io.IOException;

/**
 * Fuzz test of the SKOS importer (Turtle and RDF/XML): any bytes either import or fail with a
 * {@link VocabularyFormatException} naming the file; any other exception is a bug. Seeds in
 * {@code SkosFuzzTestInputs/<method>/}; fuzz with
 * {@code JAZZER_FUZZ=1 mvn -o -pl vocab test -Dtest='SkosFuzzTest#turtle'}.
 */
class SkosFuzzTest {
    private static void read(byte[] data, Skos.Syntax syntax, String name) throws IOException {
        try {
            Skos.read(new ByteArrayInputStream(data), syntax, name);
        } catch (VocabularyFormatException e) {
            assertTrue(e.getMessage().startsWith(name), e.getMessage());
        }
    }

    @FuzzTest(maxDuration = "60s")
    void turtle(byte[] data) throws IOException {
        read(data, Skos.Syntax.TURTLE, "fuzz.ttl");
    }

    @FuzzTest(maxDuration = "60s")
    void rdfXml(byte[] data) throws IOException {
        read(data, Skos.Syntax.RDF_XML, "fuzz.rdf");
    }
}
