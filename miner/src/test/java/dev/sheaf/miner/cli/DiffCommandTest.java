package dev.sheaf.miner.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.skos.Skos;
import dev.sheaf.vocab.store.VocabularyStore;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class DiffCommandTest {
    @TempDir
    Path dir;

    private Path older;
    private Path newer;

    private void versions() throws Exception {
        Vocabulary a = CliVocabularies.clean();
        Vocabulary b = a.apply(Edit.rename("buckle", Label.of("side-release buckle"))).apply(Edit.merge("toggle", "zipper"));
        older = dir.resolve("v1.vocab.json");
        newer = dir.resolve("v2.vocab.json");
        VocabularyStore.write(older, a);
        VocabularyStore.write(newer, b);
    }

    @Test
    void showsRenamesAndMergesAsText() throws Exception {
        versions();
        CliVocabularies.Run r = CliVocabularies.run("diff", older.toString(), newer.toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        assertTrue(r.out().startsWith("1 renamed, 1 merged\n"), r.out());
        assertTrue(r.out().contains("\"buckle\" → \"side-release buckle\" (buckle)"), r.out());
        assertTrue(r.out().contains("\"toggle\" (toggle) merged into \"zipper\" (zipper)"), r.out());
    }

    @Test
    void writesAMarkdownChangelog() throws Exception {
        versions();
        CliVocabularies.Run r = CliVocabularies.run("diff", "--format", "markdown", older.toString(), newer.toString());
        assertTrue(r.out().contains("### Merged\n\n- **toggle** merged into **zipper**"), r.out());
        assertTrue(r.out().contains("**side\\-release buckle**"), r.out());
    }

    @Test
    void writesJson() throws Exception {
        versions();
        JsonNode j = new ObjectMapper().readTree(CliVocabularies.run("diff", "--format", "json", older.toString(), newer.toString()).out());
        assertEquals(1, j.get("counts").get("renamed").asInt());
        assertEquals(1, j.get("counts").get("merged").asInt());
    }

    @Test
    void comparesAcrossFormats() throws Exception {
        versions();
        Path ttl = dir.resolve("v2.ttl");
        Skos.export(VocabularyStore.read(newer), Skos.Syntax.TURTLE, ttl, null);
        CliVocabularies.Run r = CliVocabularies.run("diff", older.toString(), ttl.toString());
        assertTrue(r.out().startsWith("1 renamed, 1 merged\n"), r.out());
    }

    @Test
    void anUnreadableFileFailsWithWhereAndWhat() throws Exception {
        versions();
        Files.writeString(newer, "{ \"format\": \"sheaf-vocabulary\", ");
        CliVocabularies.Run r = CliVocabularies.run("diff", older.toString(), newer.toString());
        assertEquals(ExitCodes.FAILURE, r.code());
        assertTrue(r.err().contains("v2.vocab.json:1:"), r.err());
        assertEquals("", r.out());
    }

    @Test
    void needsTwoFiles() {
        assertEquals(ExitCodes.USAGE, CliVocabularies.run("diff", "only-one.vocab.json").code());
    }
}
