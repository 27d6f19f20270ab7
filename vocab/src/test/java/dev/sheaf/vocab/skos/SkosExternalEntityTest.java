package dev.sheaf.vocab.skos;

import static org.junit.jupiter.api.Assertions.assertFalse;

import dev.sheaf.vocab.VocabularyFormatException;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** RDF/XML is XML: an imported SKOS file must not be able to read a local file through an external entity. */
class SkosExternalEntityTest {
    @Test
    void anExternalEntityInRdfXmlIsNotResolved(@TempDir Path dir) throws IOException {
        Path secret = dir.resolve("secret.txt");
        Files.writeString(secret, "xxesecretqzv", StandardCharsets.UTF_8);
        String rdf = "<?xml version=\"1.0\"?>\n<!DOCTYPE rdf:RDF [<!ENTITY x SYSTEM \"" + secret.toUri() + "\">]>\n"
                + "<rdf:RDF xmlns:rdf=\"http://www.w3.org/1999/02/22-rdf-syntax-ns#\" xmlns:skos=\"http://www.w3.org/2004/02/skos/core#\">\n"
                + " <skos:ConceptScheme rdf:about=\"http://example.org/s\"><skos:prefLabel xml:lang=\"en\">Scheme</skos:prefLabel></skos:ConceptScheme>\n"
                + " <skos:Concept rdf:about=\"http://example.org/s/c\"><skos:inScheme rdf:resource=\"http://example.org/s\"/>"
                + "<skos:prefLabel xml:lang=\"en\">&x;</skos:prefLabel></skos:Concept>\n</rdf:RDF>\n";
        String seen;
        try {
            SkosImport imp = Skos.read(new ByteArrayInputStream(rdf.getBytes(StandardCharsets.UTF_8)), Skos.Syntax.RDF_XML, "xxe.rdf");
            seen = imp.toString() + imp.vocabulary().allConcepts();
        } catch (VocabularyFormatException e) {
            seen = e.getMessage();
        }
        assertFalse(seen.contains("xxesecretqzv"), seen);
    }
}
