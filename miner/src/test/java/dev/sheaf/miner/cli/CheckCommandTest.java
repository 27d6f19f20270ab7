package dev.sheaf.miner.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.skos.Skos;
import dev.sheaf.vocab.store.VocabularyStore;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CheckCommandTest {
    @TempDir
    Path dir;

    private Path write(String name, dev.sheaf.vocab.Vocabulary v) throws Exception {
        Path p = dir.resolve(name);
        VocabularyStore.write(p, v);
        return p;
    }

    @Test
    void aCleanVocabularyExitsOkAndSaysSo() throws Exception {
        CliVocabularies.Run r = CliVocabularies.run("check", write("ok.vocab.json", CliVocabularies.clean()).toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().contains(": 0 errors, 0 warnings, 0 notes"), r.out());
    }

    @Test
    void errorsGiveExitCodeFindingsWithRuleConceptsHintAndSource() throws Exception {
        CliVocabularies.Run r = CliVocabularies.run("check", write("bad.vocab.json", CliVocabularies.ambiguous()).toString());
        assertEquals(ExitCodes.FINDINGS, r.code());
        assertTrue(r.out().contains("error   ambiguous-label: "), r.out());
        assertTrue(r.out().contains("concepts: toggle, zipper"), r.out());
        assertTrue(r.out().contains("fix: "), r.out());
        assertTrue(r.out().contains("source: ANSI/NISO Z39.19-2005"), r.out());
    }

    @Test
    void warningsAloneExitOk() throws Exception {
        dev.sheaf.vocab.Vocabulary v = CliVocabularies.clean()
                .apply(Edit.addConcept(Concept.builder("strap").prefLabel("strap").build())); // an orphan: a warning
        CliVocabularies.Run r = CliVocabularies.run("check", write("warn.vocab.json", v).toString());
        assertEquals(ExitCodes.OK, r.code());
        assertTrue(r.out().contains("warning orphan"), r.out());
    }

    @Test
    void writesJsonWhenAsked() throws Exception {
        CliVocabularies.Run r = CliVocabularies.run("check", "--format", "json",
                write("bad.vocab.json", CliVocabularies.ambiguous()).toString());
        assertEquals(ExitCodes.FINDINGS, r.code());
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertEquals(1, j.get("errors").asInt());
        assertEquals("ambiguous-label", j.get("findings").get(0).get("rule").asText());
    }

    @Test
    void readsSkosFilesAlikeIncludingConditionsOnlyTheGraphCanBreak() throws Exception {
        Path ttl = dir.resolve("clean.ttl");
        Skos.export(CliVocabularies.clean(), Skos.Syntax.TURTLE, ttl, null);
        assertEquals(ExitCodes.OK, CliVocabularies.run("check", ttl.toString()).code());
        Path s14 = dir.resolve("s14.ttl");
        // W3C SKOS Reference (2009) S14: at most one prefLabel per language tag [mem, corroborated]
        Files.writeString(s14, "@prefix skos: <http://www.w3.org/2004/02/skos/core#> .\n"
                + "<https://x.example/v> a skos:ConceptScheme ; skos:hasTopConcept <https://x.example/v/closure> .\n"
                + "<https://x.example/v/closure> a skos:Concept ; skos:prefLabel \"Closure\"@en, \"Fastening\"@en .\n");
        CliVocabularies.Run r = CliVocabularies.run("check", s14.toString());
        assertEquals(ExitCodes.FINDINGS, r.code());
        assertTrue(r.out().contains("two-preferred-labels"), r.out());
        assertTrue(r.out().contains("integrity condition S14"), r.out());
    }

    @Test
    void anUnreadableFileIsAnErrorFindingWithLineAndColumn() throws Exception {
        Path p = write("broken.vocab.json", CliVocabularies.clean());
        Files.writeString(p, Files.readString(p).replace("\"id\": \"toggle\",", "\"id\": \"toggle\""));
        CliVocabularies.Run r = CliVocabularies.run("check", p.toString());
        assertEquals(ExitCodes.FINDINGS, r.code());
        assertTrue(r.out().contains("unreadable-file"), r.out());
        assertTrue(r.out().matches("(?s).*broken\\.vocab\\.json:\\d+:\\d+: .*was expecting comma.*"), r.out());
    }

    @Test
    void aMissingFileFailsWithAMessageOnStderr() {
        CliVocabularies.Run r = CliVocabularies.run("check", dir.resolve("nope.vocab.json").toString());
        assertEquals(ExitCodes.FAILURE, r.code());
        assertTrue(r.err().contains("no such vocabulary file"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void aWrongOptionIsAUsageError() throws Exception {
        CliVocabularies.Run r = CliVocabularies.run("check", "--format", "yaml", write("ok.vocab.json", CliVocabularies.clean()).toString());
        assertEquals(ExitCodes.USAGE, r.code());
        assertTrue(r.err().contains("yaml"), r.err());
    }

    @Test
    void mentionsUnsavedEditsInTheJournal() throws Exception {
        Path p = write("open.vocab.json", CliVocabularies.clean());
        try (VocabularyStore s = VocabularyStore.open(p)) {
            s.history().apply(Edit.addConcept(Concept.builder("snap").prefLabel("snap").broader("closure").build()));
        }
        CliVocabularies.Run r = CliVocabularies.run("check", p.toString());
        assertEquals(ExitCodes.OK, r.code());
        assertTrue(r.err().contains("1 unsaved edit"), r.err());
    }
}
