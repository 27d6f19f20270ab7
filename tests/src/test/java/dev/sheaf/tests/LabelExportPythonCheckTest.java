package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.label.LabelRun;
import dev.sheaf.miner.label.LabelRunSummary;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.miner.label.StratifiedSplit;
import dev.sheaf.miner.measure.CoverageFiles;
import dev.sheaf.miner.measure.CoverageOptions;
import dev.sheaf.miner.measure.CoverageReport;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The label and coverage exports open cleanly in Python's own csv and json modules (Debian's
 * /usr/bin/python3, standard library only) and hold the rows they should — with listing text full
 * of commas, quotes, line breaks, spreadsheet formulas, accents and an emoji. Skips when
 * /usr/bin/python3 is absent, unless SHEAF_REQUIRE_REFERENCES=1, where it fails.
 */
class LabelExportPythonCheckTest {
    @TempDir
    Path tmp;

    private static Vocabulary vocabulary() {
        List<Concept> c = new ArrayList<>();
        c.add(Concept.builder("material").prefLabel("material").facet(FacetProperties.terms().withMultiValued(true)).build());
        c.add(Concept.builder("ripstop-nylon").prefLabel("ripstop nylon").altLabel("rip-stop nylon").broader("material").build());
        c.add(Concept.builder("merino-wool").prefLabel("merino wool, \"fine\"").altLabel("merino wool").broader("material").build());
        c.add(Concept.builder("hood").prefLabel("hood").facet(FacetProperties.terms().withCategories(List.of("jackets"))).build());
        c.add(Concept.builder("hooded").prefLabel("hooded").altLabel("hood").broader("hood").build());
        c.add(Concept.builder("weight").prefLabel("weight").facet(FacetProperties.number("kg",
                List.of(new Bucket("ultralight", null, 1.0), new Bucket("light", 1.0, 2.0), new Bucket("=heavy", 2.0, null)))).build());
        return Vocabulary.of(SchemeInfo.of("fernhollow", "Fernhollow"), c, List.of(), List.of());
    }

    private static List<Listing> listings() {
        List<Listing> out = new ArrayList<>();
        String[] texts = {
            "Ripstop nylon, \"no hood\", and a line\nbreak",
            "=HYPERLINK(\"http://x\") merino wool; not hooded",
            "Café-grade mérino wool 🏔 hood",
            "Plain, boring text",
            "-rip-stop nylon; weighs 850 g"};
        for (int i = 0; i < 40; i++) {
            String cat = i % 3 == 0 ? "packs" : "jackets";
            out.add(new Listing((i % 7 == 0 ? "+" : "FH-") + String.format("%03d", i), cat, i % 2 == 0 ? "feed,a.jsonl" : "feed\"b.csv",
                    "line " + i, List.of(Field.of(FieldKind.TITLE, "Item, " + i), Field.of(FieldKind.DESCRIPTION, texts[i % texts.length]),
                    Field.spec("Weight", i % 4 == 0 ? "2 lb 10 oz" : "1.9 kg"))));
        }
        return out;
    }

    @Test
    void exportsOpenInPythonsCsvAndJsonModulesWithTheRightRowCounts() throws IOException, InterruptedException {
        String python = System.getenv().getOrDefault("SHEAF_PYTHON", "/usr/bin/python3");
        if (!Files.isExecutable(Path.of(python))) {
            if ("1".equals(System.getenv("SHEAF_REQUIRE_REFERENCES"))) {
                fail("SHEAF_REQUIRE_REFERENCES=1 but " + python + " is not there");
            }
            Assumptions.abort(python + " is not there");
        }
        Vocabulary v = vocabulary();
        Labeler labeler = Labeler.of(v, Analysis.of(AnalysisProfile.defaults()));
        Path labels = tmp.resolve("labels");
        LabelRunSummary s = LabelRun.builder(labeler).split(StratifiedSplit.parseProportions("80/10/10"), 5).build()
                .run(listings(), List.of(), labels);
        Path coverage = tmp.resolve("coverage");
        CoverageReport cov = CoverageReport.read(labels.resolve("assignments.jsonl"), v, CoverageOptions.defaults());
        CoverageFiles.write(cov, coverage);

        Path script = tmp.resolve("check_label_exports.py");
        try (InputStream in = getClass().getResourceAsStream("/label/check_label_exports.py")) {
            Files.copy(in, script, StandardCopyOption.REPLACE_EXISTING);
        }
        Path out = tmp.resolve("python.json");
        Process p = new ProcessBuilder(python, script.toString(), labels.toString(), coverage.toString(), out.toString())
                .redirectErrorStream(true).redirectOutput(tmp.resolve("python.log").toFile()).start();
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "python did not finish");
        assertEquals(0, p.exitValue(), Files.readString(tmp.resolve("python.log")));
        JsonNode r = new ObjectMapper().readTree(out.toFile());

        int n = listings().size();
        assertEquals(40, s.listings());
        JsonNode csv = r.get("csv");
        for (String f : List.of("labels.csv", "facet-values.csv", "split.csv")) {
            assertEquals(n + 1, csv.get(f).get("rows").asInt(), f + ": one header row and one row per listing");
            assertEquals(1, csv.get(f).get("widths").size(), f + ": every row as wide as the header");
        }
        // 3 concepts (hooded, merino-wool, ripstop-nylon) and 3 weight buckets
        assertEquals(3 + 6, csv.get("labels.csv").get("header").size());
        assertEquals("merino wool, \"fine\" [merino-wool]", csv.get("labels.csv").get("header").get(4).asText());
        assertEquals("weight: =heavy [weight#=heavy]", csv.get("labels.csv").get("header").get(8).asText());
        assertEquals(6 + 1, csv.get("label-summary.csv").get("rows").asInt());
        assertEquals(6 + 1 + 1, csv.get("split-summary.csv").get("rows").asInt(), "header, all listings, one row per column");
        assertEquals(s.categoryErrors() + 1, csv.get("category-errors.csv").get("rows").asInt());
        assertEquals(3 + 1, csv.get("coverage.csv").get("rows").asInt());
        assertEquals(3 * (1 + 2) + 1, csv.get("facet-fill.csv").get("rows").asInt(), "3 facets x (overall + 2 categories)");
        for (var e : (Iterable<java.util.Map.Entry<String, JsonNode>>) csv::fields) {
            assertEquals(1, e.getValue().get("widths").size(), e.getKey() + " has rows of different widths");
        }
        assertEquals(List.of("-1", "0", "1"), List.of(r.get("matrixValues").get(0).asText(), r.get("matrixValues").get(1).asText(),
                r.get("matrixValues").get(2).asText()));
        assertEquals(n, r.get("jsonl").get("lines").asInt());
        assertTrue(r.get("jsonl").get("spans").asInt() > n, "evidence spans are there");
        assertEquals(0, r.get("problems").size(), r.get("problems").toString());
        assertEquals("sheaf-label-summary", r.get("json").get("label-summary.json").get("format").asText());
        assertEquals("sheaf-coverage", r.get("json").get("coverage.json").get("format").asText());
    }
}
