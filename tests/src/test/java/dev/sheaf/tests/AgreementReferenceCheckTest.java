package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.miner.measure.AgreementAnalysis;
import dev.sheaf.miner.measure.AgreementAnnotator;
import dev.sheaf.miner.measure.AgreementAttribute;
import dev.sheaf.miner.measure.AgreementMetric;
import dev.sheaf.miner.measure.AgreementOptions;
import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.CohenPair;
import dev.sheaf.miner.measure.Judgment;
import dev.sheaf.miner.measure.Judgments;
import dev.sheaf.miner.measure.Pseudonyms;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Checks every agreement figure against reference libraries: Debian's python3-nltk
 * (nltk.metrics.agreement.AnnotationTask: alpha, kappa) and python3-statsmodels
 * (statsmodels.stats.inter_rater.fleiss_kappa, cohens_kappa), run through /usr/bin/python3 once for
 * all sets. Each figure is compared only with the reference that computes the same quantity; the
 * mapping is in src/test/resources/agreement/reference_agreement.py and
 * docs/decisions/073-agreement-reference-mapping.md. Skips when the references are absent, unless
 * SHEAF_REQUIRE_REFERENCES=1, where it fails.
 */
class AgreementReferenceCheckTest {
    private static final double TOLERANCE = 1e-9;
    private static final int SETS = 200;
    private static final AgreementMetric[] METRICS = AgreementMetric.values();
    private static final String[] WORDS = {"zip", "toggle", "buckle", "snap", "drawcord", "hook"};
    private static final String[] GRADES = {"1", "2", "4", "5", "7", "9"};
    private static final String[] INTERVAL = {"-2", "-0.5", "1", "2.5", "4", "8"};
    private static final String[] RATIO = {"0", "0.5", "1", "2", "5", "10"};
    private static final Pseudonyms KEYED = Pseudonyms.withKey("reference-check-key-fernhollow-01".getBytes(StandardCharsets.US_ASCII));

    /** Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]+[comp]. */
    private static final String[] EXAMPLE = {
        "1 2 3 3 2 1 4 1 2 . . .",
        "1 2 3 3 2 2 4 1 2 5 . 3",
        ". 3 3 3 2 3 4 2 2 5 1 .",
        "1 2 3 3 2 4 4 1 2 5 1 ."};

    @TempDir
    static Path tmp;

    private static final Map<String, AgreementMetric> metricOf = new LinkedHashMap<>();
    private static final Map<String, List<Judgment>> setJudgments = new LinkedHashMap<>();
    private static AgreementReport ours;
    private static Map<String, JsonNode> reference;
    private static Map<String, String> pseudonymOf;
    private static String unavailable;

    @BeforeAll
    static void runBothSides() throws IOException, InterruptedException {
        generate();
        List<Judgment> all = new ArrayList<>();
        setJudgments.values().forEach(all::addAll);
        AgreementOptions.Builder options = AgreementOptions.builder().pseudonyms(KEYED).replicates(0);
        metricOf.forEach(options::metric);
        ours = AgreementAnalysis.run(Judgments.of("generated", all), options.build());
        pseudonymOf = KEYED.assign(all.stream().map(Judgment::annotator).toList());
        reference = runReference();
    }

    /** 200 random sets (with missing judgments, every metric) plus the three published-example sets. */
    private static void generate() {
        for (AgreementMetric m : new AgreementMetric[] {AgreementMetric.NOMINAL, AgreementMetric.ORDINAL, AgreementMetric.INTERVAL}) {
            String attribute = "example-" + m.label();
            List<Judgment> j = new ArrayList<>();
            for (int o = 0; o < EXAMPLE.length; o++) {
                String[] cells = EXAMPLE[o].split(" ");
                for (int u = 0; u < cells.length; u++) {
                    if (!cells[u].equals(".")) {
                        j.add(new Judgment("unit-" + u, "c" + o, attribute, cells[u], 0));
                    }
                }
            }
            metricOf.put(attribute, m);
            setJudgments.put(attribute, j);
        }
        Random r = new Random(20070101);
        for (int s = 0; s < SETS; s++) {
            AgreementMetric metric = METRICS[s % METRICS.length];
            String[] scale = switch (metric) {
                case NOMINAL -> WORDS;
                case ORDINAL -> GRADES;
                case INTERVAL -> INTERVAL;
                case RATIO -> RATIO;
            };
            boolean complete = s % 3 == 0;
            int coders = 2 + r.nextInt(5);
            int items = 4 + r.nextInt(30);
            int k = 2 + r.nextInt(scale.length - 1);
            double missing = complete ? 0 : 0.1 + 0.4 * r.nextDouble();
            double noise = 0.05 + 0.85 * r.nextDouble();
            String attribute = "set-" + s;
            List<Judgment> j = new ArrayList<>();
            for (int i = 0; i < items; i++) {
                int truth = r.nextInt(k);
                for (int c = 0; c < coders; c++) {
                    if (r.nextDouble() < missing) {
                        continue;
                    }
                    int v = r.nextDouble() < noise ? r.nextInt(k) : truth;
                    j.add(new Judgment("item-" + i, "c" + c, attribute, scale[v], 0));
                }
            }
            metricOf.put(attribute, metric);
            setJudgments.put(attribute, j);
        }
    }

    private static Map<String, JsonNode> runReference() throws IOException, InterruptedException {
        String python = System.getenv().getOrDefault("SHEAF_PYTHON", "/usr/bin/python3");
        if (!Files.isExecutable(Path.of(python))) {
            unavailable = python + " is not there";
            return Map.of();
        }
        ObjectMapper mapper = new ObjectMapper();
        ObjectNode input = mapper.createObjectNode();
        ArrayNode sets = input.putArray("sets");
        for (Map.Entry<String, List<Judgment>> e : setJudgments.entrySet()) {
            ObjectNode set = sets.addObject();
            set.put("attribute", e.getKey());
            set.put("metric", metricOf.get(e.getKey()).label());
            ArrayNode rows = set.putArray("judgments");
            for (Judgment j : e.getValue()) {
                rows.addArray().add(j.annotator()).add(j.item()).add(j.value());
            }
        }
        Path in = tmp.resolve("sets.json");
        Path out = tmp.resolve("reference.json");
        Path script = tmp.resolve("reference_agreement.py");
        mapper.writeValue(in.toFile(), input);
        try (InputStream s = AgreementReferenceCheckTest.class.getResourceAsStream("/agreement/reference_agreement.py")) {
            assertNotNull(s, "the reference script is missing from the test resources");
            Files.copy(s, script, StandardCopyOption.REPLACE_EXISTING);
        }
        Process p = new ProcessBuilder(python, script.toString(), in.toString(), out.toString())
                .redirectErrorStream(true).redirectOutput(tmp.resolve("python.log").toFile()).start();
        if (!p.waitFor(10, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            fail("the reference script took more than 10 minutes");
        }
        String log = Files.readString(tmp.resolve("python.log"), StandardCharsets.UTF_8);
        if (p.exitValue() == 3) {
            unavailable = "a reference library is missing: " + mapper.readTree(out.toFile()).path("missing").asText()
                    + " (apt-get install -y python3-nltk python3-statsmodels)";
            return Map.of();
        }
        assertEquals(0, p.exitValue(), "the reference script failed:\n" + log);
        Map<String, JsonNode> byAttribute = new HashMap<>();
        for (JsonNode n : mapper.readTree(out.toFile()).get("sets")) {
            byAttribute.put(n.get("attribute").asText(), n);
        }
        return byAttribute;
    }

    private static void requireReference() {
        if (unavailable == null) {
            return;
        }
        if ("1".equals(System.getenv("SHEAF_REQUIRE_REFERENCES"))) {
            fail("SHEAF_REQUIRE_REFERENCES=1 but " + unavailable);
        }
        Assumptions.abort(unavailable);
    }

    private static AgreementAttribute attribute(String key) {
        return ours.attribute(key).orElseThrow(() -> new AssertionError("no result for " + key));
    }

    private static Double ref(JsonNode node, String field) {
        JsonNode v = node.get(field);
        return v == null || v.isNull() ? null : v.asDouble();
    }

    @Test
    void everySetWasAnalysedAndAnswered() {
        requireReference();
        assertEquals(SETS + 3, ours.attributes().size());
        assertEquals(SETS + 3, reference.size());
    }

    @Test
    void thePublishedExampleMatchesNltkForNominalIntervalAndOrdinal() {
        requireReference();
        for (AgreementMetric m : new AgreementMetric[] {AgreementMetric.NOMINAL, AgreementMetric.ORDINAL, AgreementMetric.INTERVAL}) {
            String key = "example-" + m.label();
            // nltk.metrics.agreement.AnnotationTask.alpha (Debian python3-nltk), live, on the
            // Krippendorff 2011 example; ordinal uses Krippendorff's rank distance passed to NLTK.
            assertEquals(reference.get(key).get("alpha").asDouble(), attribute(key).alpha().alpha(), TOLERANCE, key);
        }
        // Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]+[comp]
        assertEquals(0.743, attribute("example-nominal").alpha().alpha(), 0.0005);
        assertEquals(0.849, attribute("example-interval").alpha().alpha(), 0.0005);
    }

    @Test
    void alphaMatchesNltkUnderEveryMetric() {
        requireReference();
        Map<AgreementMetric, Integer> compared = new EnumMap<>(AgreementMetric.class);
        for (String key : setJudgments.keySet()) {
            JsonNode ref = reference.get(key);
            AgreementAttribute a = attribute(key);
            assertEquals(metricOf.get(key), a.metric(), key);
            Double expected = ref(ref, "alpha");
            if (expected == null || ref.get("singleLabel").asBoolean()) {
                // NLTK raises when D_e = 0 and returns 1 when only one label occurs; Krippendorff's alpha
                // is undefined there (no variation), and Sheaf says so.
                assertTrue(!a.alpha().defined(), key + ": reference undefined, ours " + a.alpha());
                continue;
            }
            // nltk.metrics.agreement.AnnotationTask.alpha (Debian python3-nltk), live
            assertEquals(expected, a.alpha().alpha(), TOLERANCE, key + " " + a.metric().label());
            compared.merge(a.metric(), 1, Integer::sum);
        }
        for (AgreementMetric m : METRICS) {
            assertTrue(compared.getOrDefault(m, 0) >= 40, m + " compared only " + compared.get(m) + " times");
        }
    }

    @Test
    void alphaWithEachAnnotatorLeftOutMatchesNltk() {
        requireReference();
        int compared = 0;
        for (AgreementAnnotator row : ours.annotators()) {
            JsonNode ref = reference.get(row.attribute());
            String raw = rawId(row.annotator());
            JsonNode without = ref.get("alphaWithout").get(raw);
            Double expected = ref(without, "alpha");
            if (expected == null || without.get("singleLabel").asBoolean()) {
                assertTrue(Double.isNaN(row.alphaWithout()), row.toString());
                continue;
            }
            // nltk.metrics.agreement.AnnotationTask.alpha (Debian python3-nltk), live, without that coder
            assertEquals(expected, row.alphaWithout(), TOLERANCE, row.toString());
            compared++;
        }
        assertTrue(compared >= 400, "compared " + compared);
    }

    @Test
    void pairwiseCohenKappaMatchesNltkAndStatsmodels() {
        requireReference();
        int compared = 0;
        for (String key : setJudgments.keySet()) {
            Map<String, CohenPair> pairs = new HashMap<>();
            for (CohenPair p : attribute(key).pairs()) {
                pairs.put(p.annotatorA() + "|" + p.annotatorB(), p);
            }
            JsonNode refPairs = reference.get(key).get("pairs");
            assertEquals(refPairs.size(), pairs.size(), key + ": pairs with shared items");
            for (JsonNode rp : refPairs) {
                String a = pseudonymOf.get(rp.get("a").asText());
                String b = pseudonymOf.get(rp.get("b").asText());
                CohenPair p = pairs.get(a.compareTo(b) < 0 ? a + "|" + b : b + "|" + a);
                assertNotNull(p, key + " pair " + rp);
                assertEquals(rp.get("items").asInt(), p.items(), key);
                Double nltk = ref(rp, "nltkKappa");
                Double statsmodels = ref(rp, "statsmodelsKappa");
                if (nltk == null) {
                    assertTrue(!p.defined(), key + ": NLTK could not compute kappa (" + rp.get("nltkError") + "), ours " + p);
                    continue;
                }
                // nltk AnnotationTask.kappa_pairwise on the two coders' shared items (Debian python3-nltk), live
                assertEquals(nltk, p.kappa(), TOLERANCE, key + " " + p);
                // statsmodels.stats.inter_rater.cohens_kappa (Debian python3-statsmodels), live
                assertNotNull(statsmodels, key + " statsmodels gave no kappa where NLTK did");
                assertEquals(statsmodels, p.kappa(), TOLERANCE, key + " " + p);
                compared++;
            }
        }
        assertTrue(compared >= 1000, "compared " + compared);
    }

    @Test
    void fleissKappaMatchesStatsmodelsAndOnCompleteSetsNltkPi() {
        requireReference();
        int compared = 0;
        int complete = 0;
        for (String key : setJudgments.keySet()) {
            JsonNode ref = reference.get(key);
            AgreementAttribute a = attribute(key);
            assertEquals(ref.get("fleissItems").asInt(), a.fleiss().items(), key + ": items of the modal count");
            Double expected = ref(ref, "fleissStatsmodels");
            if (expected == null) {
                assertTrue(!a.fleiss().defined(), key + ": reference undefined, ours " + a.fleiss());
                continue;
            }
            // statsmodels.stats.inter_rater.fleiss_kappa(table, method='fleiss') (Debian python3-statsmodels), live
            assertEquals(expected, a.fleiss().kappa(), TOLERANCE, key);
            compared++;
            if (ref.get("complete").asBoolean() && ref(ref, "nltkPi") != null) {
                // nltk AnnotationTask.pi, multi-pi = Fleiss' kappa when every coder judges every item, live
                assertEquals(ref(ref, "nltkPi"), a.fleiss().kappa(), TOLERANCE, key);
                assertEquals(0, a.fleiss().itemsLeftOut(), key);
                complete++;
            }
        }
        assertTrue(compared >= 150 && complete >= 50, "compared " + compared + ", complete " + complete);
    }

    @Test
    void meanPairwiseKappaAndObservedAgreementMatchNltkOnCompleteSets() {
        requireReference();
        int compared = 0;
        for (String key : setJudgments.keySet()) {
            JsonNode ref = reference.get(key);
            if (!ref.get("complete").asBoolean()) {
                continue;
            }
            AgreementAttribute a = attribute(key);
            // nltk AnnotationTask.avg_Ao: mean pairwise observed agreement (Debian python3-nltk), live
            assertEquals(ref(ref, "nltkAvgAo"), a.observedAgreement(), TOLERANCE, key);
            Double meanKappa = ref(ref, "nltkMeanKappa");
            if (meanKappa != null) {
                // nltk AnnotationTask.kappa: naive mean of pairwise Cohen's kappa (Debian python3-nltk), live
                assertEquals(meanKappa, a.meanCohenKappa(), TOLERANCE, key);
                compared++;
            }
        }
        assertTrue(compared >= 50, "compared " + compared);
    }

    private static String rawId(String pseudonym) {
        return pseudonymOf.entrySet().stream().filter(e -> e.getValue().equals(pseudonym)).map(Map.Entry::getKey)
                .findFirst().orElseThrow();
    }
}
