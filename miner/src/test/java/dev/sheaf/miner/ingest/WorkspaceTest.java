package dev.sheaf.miner.ingest;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Loading workspace.json and mapping files: resolved paths, defaults, and unknown keys rejected by name. */
class WorkspaceTest {
    private static final String EXAMPLE = """
            {
              "format": "sheaf-workspace",
              "formatVersion": 1,
              "name": "Fernhollow Outfitters demo",
              "sources": [
                { "path": "catalog", "include": ["**/*"], "exclude": ["**/README*"] },
                { "path": "catalog/feeds/catalog-export.csv",
                  "mapping": { "id": "sku", "title": "name", "category": "category", "description": "description",
                               "bullets": ["feature_1", "feature_2", "feature_3"], "specs": ["*"] } }
              ],
              "profile": "default",
              "vocabulary": "fernhollow.vocab.json",
              "feedback": "feedback.csv",
              "judgments": "judgments.csv",
              "output": "out"
            }
            """;

    private static Path workspace(Path dir, String json) throws IOException {
        Files.writeString(dir.resolve("workspace.json"), json, StandardCharsets.UTF_8);
        return dir;
    }

    @Test
    void loadsTheContractExampleWithPathsResolvedAgainstTheFolder(@TempDir Path dir) throws IOException {
        Workspace w = Workspace.load(workspace(dir, EXAMPLE));
        Path abs = dir.toAbsolutePath().normalize();
        assertEquals(abs, w.dir());
        assertEquals("Fernhollow Outfitters demo", w.name());
        assertEquals(2, w.sources().size());
        SourceSpec a = w.sources().get(0);
        assertEquals(abs.resolve("catalog"), a.path());
        assertEquals(List.of("**/*"), a.include());
        assertEquals(List.of("**/README*"), a.exclude());
        assertNull(a.mapping());
        ColumnMapping m = w.sources().get(1).mapping();
        assertEquals(new ColumnMapping("sku", "name", "description", "category", List.of("feature_1", "feature_2", "feature_3"),
                List.of("*"), List.of()), m);
        assertTrue(m.specsFromAllOthers());
        assertEquals("default", w.profile());
        assertEquals(Optional.empty(), w.profileFile(), "a preset name is not a file");
        assertEquals(abs.resolve("fernhollow.vocab.json"), w.vocabulary());
        assertEquals(abs.resolve("feedback.csv"), w.feedback());
        assertEquals(abs.resolve("judgments.csv"), w.judgments());
        assertEquals(abs.resolve("out"), w.output());
    }

    @Test
    void defaultsApplyWhenOptionalKeysAreLeftOut(@TempDir Path dir) throws IOException {
        Workspace w = Workspace.load(workspace(dir, """
                {"format": "sheaf-workspace", "formatVersion": 1, "sources": [{"path": "."}], "profile": "profiles/shop.json"}
                """));
        assertEquals(dir.getFileName().toString(), w.name());
        assertEquals(dir.toAbsolutePath().normalize().resolve("out"), w.output());
        assertNull(w.vocabulary());
        assertEquals(Optional.of(dir.toAbsolutePath().normalize().resolve("profiles/shop.json")), w.profileFile());
    }

    @Test
    void unknownKeysAreRejectedWithTheirNameAndTheFile(@TempDir Path dir) throws IOException {
        workspace(dir, EXAMPLE.replace("\"output\": \"out\"", "\"outptu\": \"out\""));
        IOException e = assertThrows(IOException.class, () -> Workspace.load(dir));
        assertTrue(e.getMessage().contains("'outptu'") && e.getMessage().contains("workspace.json"), e.getMessage());

        workspace(dir, EXAMPLE.replace("\"exclude\"", "\"exclude_\""));
        e = assertThrows(IOException.class, () -> Workspace.load(dir));
        assertTrue(e.getMessage().contains("'sources[0].exclude_'"), e.getMessage());

        workspace(dir, EXAMPLE.replace("\"title\": \"name\"", "\"titel\": \"name\""));
        e = assertThrows(IOException.class, () -> Workspace.load(dir));
        assertTrue(e.getMessage().contains("'titel'") && e.getMessage().contains("sources[1].mapping"), e.getMessage());
    }

    @Test
    void aMissingWorkspaceFileSaysWhatToDo(@TempDir Path dir) {
        assertFalse(Workspace.isWorkspace(dir));
        IOException e = assertThrows(IOException.class, () -> Workspace.load(dir));
        assertTrue(e.getMessage().contains("no workspace.json in " + dir.toAbsolutePath().normalize()), e.getMessage());
    }

    @Test
    void wrongFormatVersionAndTypesAreRejected(@TempDir Path dir) throws IOException {
        workspace(dir, EXAMPLE.replace("\"formatVersion\": 1", "\"formatVersion\": 2"));
        assertTrue(assertThrows(IOException.class, () -> Workspace.load(dir)).getMessage().contains("\"formatVersion\" must be 1"));
        workspace(dir, EXAMPLE.replace("\"name\": \"Fernhollow Outfitters demo\"", "\"name\": 7"));
        assertTrue(assertThrows(IOException.class, () -> Workspace.load(dir)).getMessage().contains("\"name\" must be a string"));
        workspace(dir, "{\"format\": \"sheaf-workspace\", \"formatVersion\": 1, \"sources\": []}");
        assertTrue(assertThrows(IOException.class, () -> Workspace.load(dir)).getMessage().contains("non-empty array"));
        workspace(dir, "{ not json");
        assertTrue(assertThrows(IOException.class, () -> Workspace.load(dir)).getMessage().contains("not valid JSON"));
    }

    @Test
    void aMappingFileLoadsAndRejectsUnknownKeys(@TempDir Path dir) throws IOException {
        Path f = dir.resolve("mapping.json");
        Files.writeString(f, "{\"id\": \"sku\", \"title\": \"name\", \"bullets\": \"features\", \"specs\": \"*\"}", StandardCharsets.UTF_8);
        assertEquals(new ColumnMapping("sku", "name", null, null, List.of("features"), List.of("*"), List.of()), ColumnMapping.read(f));
        Files.writeString(f, "{\"id\": \"sku\", \"colour\": \"c\"}", StandardCharsets.UTF_8);
        IOException e = assertThrows(IOException.class, () -> ColumnMapping.read(f));
        assertTrue(e.getMessage().contains("unknown key 'colour'") && e.getMessage().contains(f.toString()), e.getMessage());
        assertThrows(IOException.class, () -> ColumnMapping.read(dir.resolve("missing.json")));
    }

    @Test
    void aWorkspaceRunsAsIngestSources(@TempDir Path dir) throws IOException {
        Path feeds = Files.createDirectories(dir.resolve("catalog/feeds"));
        Files.copy(Fixtures.fixture("csv/catalog-export.csv"), feeds.resolve("catalog-export.csv"));
        Files.writeString(feeds.resolve("README.txt"), "About these feeds\n", StandardCharsets.UTF_8);
        Workspace w = Workspace.load(workspace(dir, EXAMPLE));
        Fixtures.Result r = Fixtures.read(Ingest.builder().sources(w.sources()).workspaceRoot(w.dir()));
        assertEquals(List.of("FH-B-001", "FH-B-002", "FH-B-004"), r.ids().stream().sorted().toList());
        assertEquals("catalog/feeds/catalog-export.csv", r.byId("FH-B-001").source());
        assertEquals(List.of("Padded hip belt", "Rain cover"), Fixtures.texts(r.byId("FH-B-001"), FieldKind.BULLET));
        assertEquals(1, r.summary().filesSeen(), "README excluded, the feed read once");
        assertTrue(r.problems().stream().anyMatch(p -> p.reason().contains("'feature_3'")), "the mapping names a column the header lacks");
    }
}
