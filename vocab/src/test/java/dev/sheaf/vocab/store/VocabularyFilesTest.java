package dev.sheaf.vocab.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.sheaf.vocab.Fixtures;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.skos.Skos;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class VocabularyFilesTest {
    @TempDir
    Path dir;

    private final Vocabulary v = Fixtures.fernhollow();

    @Test
    void readsOurJsonAndSkosAlike() throws Exception {
        Path json = dir.resolve("a.vocab.json");
        VocabularyStore.write(json, v);
        Path ttl = dir.resolve("a.ttl");
        Skos.export(v, Skos.Syntax.TURTLE, ttl, null);
        Path rdf = dir.resolve("a.rdf");
        Skos.export(v, Skos.Syntax.RDF_XML, rdf, null);
        assertEquals(VocabularyFiles.Kind.SHEAF_JSON, VocabularyFiles.read(json).kind());
        assertEquals(VocabularyFiles.Kind.TURTLE, VocabularyFiles.read(ttl).kind());
        assertEquals(VocabularyFiles.Kind.RDF_XML, VocabularyFiles.read(rdf).kind());
        for (Path p : new Path[] {json, ttl, rdf}) {
            assertEquals(v, VocabularyFiles.read(p).vocabulary(), p.toString());
        }
    }

    @Test
    void sniffsFilesWithOtherNames() throws Exception {
        Path a = dir.resolve("vocab.txt");
        Files.writeString(a, VocabularyStore.toJson(v));
        assertEquals(VocabularyFiles.Kind.SHEAF_JSON, VocabularyFiles.read(a).kind());
        Path b = dir.resolve("vocab.data");
        Files.writeString(b, Skos.toString(v, Skos.Syntax.RDF_XML, v.scheme().baseIri()));
        assertEquals(VocabularyFiles.Kind.RDF_XML, VocabularyFiles.read(b).kind());
        Path c = dir.resolve("vocab.n3");
        Files.writeString(c, Skos.toString(v, Skos.Syntax.TURTLE, v.scheme().baseIri()));
        assertEquals(v, VocabularyFiles.read(c).vocabulary());
    }

    @Test
    void aMissingFileSaysSo() {
        NoSuchFileException e = assertThrows(NoSuchFileException.class, () -> VocabularyFiles.read(dir.resolve("nope.json")));
        assertEquals("no such vocabulary file; check the path", e.getReason());
    }
}
