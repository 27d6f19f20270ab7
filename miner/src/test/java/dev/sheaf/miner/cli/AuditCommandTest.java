package dev.sheaf.miner.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.VocabularyStore;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AuditCommandTest {
    @TempDir
    Path dir;

    private static final String[] CONCEPTS = {"zipper", "toggle", "buckle", "nylon", "wool"};

    private void workspace(boolean withFeedback) throws IOException {
        Vocabulary v = Vocabulary.of(SchemeInfo.of("fernhollow", "Fernhollow Outfitters attributes"), List.of(
                Concept.builder("closure").prefLabel("Closure").facet(FacetProperties.terms()).build(),
                Concept.builder("zipper").prefLabel("zipper").altLabel("zip").broader("closure").build(),
                Concept.builder("toggle").prefLabel("toggle").broader("closure").build(),
                Concept.builder("buckle").prefLabel("buckle").broader("closure").build(),
                Concept.builder("material").prefLabel("Material").facet(FacetProperties.terms()).build(),
                Concept.builder("nylon").prefLabel("nylon").broader("material").build(),
                Concept.builder("wool").prefLabel("wool").altLabel("merino").broader("material").build()),
                List.of(), List.of());
        VocabularyStore.write(dir.resolve("demo.vocab.json"), v);
        Files.createDirectories(dir.resolve("catalog"));
        StringBuilder jsonl = new StringBuilder();
        String[] titles = {"Ridge pack with zipper pockets", "Merino wool base layer", "Nylon stuff sack with toggle",
            "Trail pack, buckle hip belt, nylon body", "Wool beanie", "Rain shell with two-way zip"};
        for (int i = 0; i < titles.length; i++) {
            jsonl.append("{\"id\":\"FH-00000").append(i + 1).append("\",\"category\":\"").append(i % 2 == 0 ? "packs" : "layers")
                    .append("\",\"title\":\"").append(titles[i]).append("\",\"description\":\"Made for the trail.\"}\n");
        }
        Files.writeString(dir.resolve("catalog/feed.jsonl"), jsonl, StandardCharsets.UTF_8);
        Files.writeString(dir.resolve("catalog/page.html"), "<html><head><title>Camp mug</title></head><body><h1>Camp mug</h1>"
                + "<p>Steel mug with a toggle lid.</p></body></html>", StandardCharsets.UTF_8);
        String extra = "";
        if (withFeedback) {
            Files.writeString(dir.resolve("feedback.csv"), "pair_id,reference_id,target_id,annotator,sentence\n"
                    + "P1,FH-000001,FH-000002,shopper-1,The wool is softer.\n"
                    + "P1,FH-000001,FH-000002,shopper-2,Maybe more wool than the other.\n"
                    + "P2,FH-000003,FH-000004,shopper-1,The buckle is sturdier.\n", StandardCharsets.UTF_8);
            StringBuilder j = new StringBuilder("item,annotator,attribute,value\n");
            for (int i = 1; i <= 6; i++) {
                for (String r : new String[] {"rater-A", "rater-B", "rater-C"}) {
                    j.append("FH-00000").append(i).append(',').append(r).append(",closure,")
                            .append((i + (r.equals("rater-C") ? 1 : 0)) % 2 == 0 ? "zipper" : "buckle").append('\n');
                }
            }
            Files.writeString(dir.resolve("judgments.csv"), j, StandardCharsets.UTF_8);
            extra = ", \"feedback\": \"feedback.csv\", \"judgments\": \"judgments.csv\"";
        }
        Files.writeString(dir.resolve("workspace.json"), "{\"format\":\"sheaf-workspace\",\"formatVersion\":1,\"name\":\"Test shop\","
                + "\"sources\":[{\"path\":\"catalog\",\"include\":[\"**/*\"]}],\"vocabulary\":\"demo.vocab.json\"" + extra + "}",
                StandardCharsets.UTF_8);
    }

    @Test
    void writesOneReportWithACardPerConceptTheCautionsAndItsTables() throws IOException {
        workspace(true);
        CliVocabularies.Run r = CliVocabularies.run("audit", dir.toString());
        assertTrue(r.code() == ExitCodes.OK || r.code() == ExitCodes.PROBLEMS, r.err());
        Path report = dir.resolve("out/audit/report.html");
        assertTrue(Files.isRegularFile(report), r.err());
        Document d = Jsoup.parse(report.toFile(), "UTF-8");
        String text = d.text();
        for (String c : CONCEPTS) {
            assertTrue(d.select("article, section, div").stream().anyMatch(e -> e.ownText().contains(c) || e.text().startsWith(c))
                    || text.contains(c), "card for " + c);
        }
        assertTrue(text.contains("not verified product claims"), "cautions");
        assertTrue(text.contains("Krippendorff"), "agreement section cites its method");
        assertFalse(text.contains("rater-A"), "annotators by pseudonym only");
        assertTrue(Files.isRegularFile(dir.resolve("out/audit/labels/assignments.jsonl")));
        assertTrue(Files.isRegularFile(dir.resolve("out/audit/coverage/coverage.csv")));
        assertTrue(Files.isRegularFile(dir.resolve("out/audit/consistency/consistency.csv")));
        assertTrue(Files.isRegularFile(dir.resolve("out/audit/agreement/agreement.csv")));
        assertTrue(r.out().contains("listings   7"), r.out());
        assertTrue(r.out().contains("report"), r.out());
    }

    @Test
    void skipsFeedbackAndAgreementWithASentenceWhenTheWorkspaceHasNeither() throws IOException {
        workspace(false);
        CliVocabularies.Run r = CliVocabularies.run("audit", "--workspace", dir.toString(), "--out", dir.resolve("elsewhere").toString());
        assertEquals(ExitCodes.OK, r.code(), r.err());
        String text = Jsoup.parse(dir.resolve("elsewhere/report.html").toFile(), "UTF-8").text();
        assertTrue(text.contains("names no judgments file"), text);
        assertTrue(text.contains("names no feedback file"), text);
        assertFalse(Files.exists(dir.resolve("elsewhere/consistency")));
    }

    @Test
    void refusesAFolderWithoutAWorkspace() {
        CliVocabularies.Run r = CliVocabularies.run("audit", dir.toString());
        assertEquals(ExitCodes.FAILURE, r.code());
        assertTrue(r.err().contains("cannot read the workspace"), r.err());
    }

    @Test
    void demoFailsClearlyWhenTheWorkspaceIsMissing() {
        CliVocabularies.Run r = CliVocabularies.run("demo", "--workspace", dir.resolve("none").toString(), "--out",
                dir.resolve("o").toString());
        assertEquals(ExitCodes.FAILURE, r.code());
        assertTrue(r.err().contains("demo workspace"), r.err());
    }

    @Test
    void demoRunsTheWholeJobOnASmallWorkspace() throws IOException {
        workspace(true);
        CliVocabularies.Run r = CliVocabularies.run("demo", "--workspace", dir.toString(), "--out", dir.resolve("demo").toString());
        assertTrue(r.code() == ExitCodes.OK || r.code() == ExitCodes.PROBLEMS, r.err());
        assertTrue(Files.isRegularFile(dir.resolve("demo/harvest/harvest.json")));
        assertTrue(Files.isRegularFile(dir.resolve("demo/audit/report.html")));
        assertTrue(r.out().lines().count() >= 10, r.out());
    }
}
