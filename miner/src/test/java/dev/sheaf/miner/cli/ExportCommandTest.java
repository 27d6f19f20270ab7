package dev.sheaf.miner.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.csv.VocabularyCsv;
import dev.sheaf.vocab.skos.Skos;
import dev.sheaf.vocab.store.VocabularyStore;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ExportCommandTest {
    @TempDir
    Path dir;

    private Path source() throws Exception {
        Path p = dir.resolve("fernhollow.vocab.json");
        VocabularyStore.write(p, CliVocabularies.clean());
        return p;
    }

    @Test
    void exportsTurtleThatReadsBackTheSame() throws Exception {
        Path out = dir.resolve("fernhollow.ttl");
        CliVocabularies.Run r = CliVocabularies.run("export", source().toString(), "--to", "turtle", "--out", out.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertEquals("", r.out(), "data goes to the file, not stdout");
        assertTrue(r.err().contains("wrote"), r.err());
        assertEquals(CliVocabularies.clean(), Skos.read(out).vocabulary());
    }

    @Test
    void exportsRdfXmlWithAChosenBaseIri() throws Exception {
        Path out = dir.resolve("fernhollow.rdf");
        CliVocabularies.Run r = CliVocabularies.run("export", source().toString(), "--to", "rdfxml", "--out", out.toString(),
                "--base-iri", "https://shop.example/attributes/");
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(Files.readString(out).contains("https://shop.example/attributes/zipper"));
        Vocabulary back = Skos.read(out).vocabulary();
        assertEquals("https://shop.example/attributes/", back.scheme().baseIri());
        assertEquals(List.copyOf(CliVocabularies.clean().allConcepts()), List.copyOf(back.allConcepts()));
    }

    @Test
    void exportsCsv() throws Exception {
        Path out = dir.resolve("fernhollow.csv");
        assertEquals(ExitCodes.OK, CliVocabularies.run("export", source().toString(), "--to", "csv", "--out", out.toString()).code());
        Vocabulary v = CliVocabularies.clean();
        assertEquals(List.copyOf(v.allConcepts()), List.copyOf(VocabularyCsv.read(out, v.scheme()).allConcepts()));
    }

    @Test
    void refusesABadBaseIriOrOneForCsv() throws Exception {
        CliVocabularies.Run r = CliVocabularies.run("export", source().toString(), "--to", "turtle", "--out",
                dir.resolve("x.ttl").toString(), "--base-iri", "https://no-trailing-slash.example");
        assertEquals(ExitCodes.USAGE, r.code());
        assertTrue(r.err().contains("must end with / or #"), r.err());
        assertEquals(ExitCodes.USAGE, CliVocabularies.run("export", source().toString(), "--to", "csv", "--out",
                dir.resolve("x.csv").toString(), "--base-iri", "https://shop.example/").code());
        assertTrue(Files.notExists(dir.resolve("x.ttl")));
    }

    @Test
    void needsTargetAndOutput() throws Exception {
        CliVocabularies.Run r = CliVocabularies.run("export", source().toString(), "--out", dir.resolve("x.ttl").toString());
        assertEquals(ExitCodes.USAGE, r.code());
        assertTrue(r.err().contains("--to"), r.err());
        assertEquals(ExitCodes.USAGE, CliVocabularies.run("export", source().toString(), "--to", "pdf", "--out", "x").code());
    }

    @Test
    void aMissingVocabularyFails() {
        CliVocabularies.Run r = CliVocabularies.run("export", dir.resolve("nope.json").toString(), "--to", "csv", "--out",
                dir.resolve("x.csv").toString());
        assertEquals(ExitCodes.FAILURE, r.code());
        assertTrue(r.err().contains("no such vocabulary file"), r.err());
    }
}
