package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.label.AssignmentsJsonl;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.miner.label.LabelRun;
import dev.sheaf.miner.measure.AgreementAnalysis;
import dev.sheaf.miner.measure.AgreementOptions;
import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.ConsistencyAnalysis;
import dev.sheaf.miner.measure.ConsistencyAttribute;
import dev.sheaf.miner.measure.ConsistencyOptions;
import dev.sheaf.miner.measure.ConsistencyReport;
import dev.sheaf.miner.measure.FeedbackColumns;
import dev.sheaf.miner.measure.FeedbackMention;
import dev.sheaf.miner.measure.FeedbackCsv;
import dev.sheaf.miner.measure.FeedbackSentence;
import dev.sheaf.miner.measure.FeedbackSentences;
import dev.sheaf.miner.measure.FeedbackTermFinder;
import dev.sheaf.miner.measure.FeedbackVocabulary;
import dev.sheaf.miner.measure.FlagInputs;
import dev.sheaf.miner.measure.FlagKind;
import dev.sheaf.miner.measure.FlagReport;
import dev.sheaf.miner.measure.FlagThresholds;
import dev.sheaf.miner.measure.Flags;
import dev.sheaf.miner.measure.GapTerm;
import dev.sheaf.miner.measure.GroundingAssignments;
import dev.sheaf.miner.measure.GroundingCatalog;
import dev.sheaf.miner.measure.GroundingScales;
import dev.sheaf.miner.measure.JudgmentColumns;
import dev.sheaf.miner.measure.JudgmentsCsv;
import dev.sheaf.miner.measure.Pseudonyms;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.Vocabulary;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Feedback consistency and flags on the Fernhollow demo workspace, against what the demo plants
 * ({@code sample-listings/planted.json}). Demo ground truth, not an outside check.
 */
class DemoConsistencyTest {
    private static final Pseudonyms KEY = Pseudonyms.withKey("demo functional test key, 32 byte".getBytes(StandardCharsets.US_ASCII));

    private static JsonNode planted;
    private static Vocabulary vocabulary;
    private static FeedbackVocabulary feedbackVocabulary;
    private static FeedbackSentences feedback;
    private static Labeler labeler;

    @BeforeAll
    static void read() throws IOException {
        planted = new ObjectMapper().readTree(DemoVocabulary.DEMO.resolve("planted.json").toFile());
        vocabulary = DemoVocabulary.read();
        feedbackVocabulary = FeedbackVocabulary.from(vocabulary);
        feedback = FeedbackCsv.read(DemoVocabulary.DEMO.resolve("feedback.csv"), FeedbackColumns.DEFAULT);
        labeler = Labeler.of(vocabulary, Analysis.of(AnalysisProfile.defaults()));
    }

    private static ConsistencyReport consistency(GroundingCatalog catalog) {
        return ConsistencyAnalysis.run(feedback, ConsistencyOptions.builder(FeedbackTermFinder.labeler(labeler))
                .vocabulary(feedbackVocabulary).scales(GroundingScales.bundledExample()).catalog(catalog).pseudonyms(KEY).build());
    }

    private static List<String> judged(String agreement) {
        List<String> out = new java.util.ArrayList<>();
        for (JsonNode a : planted.get("judgments").get("attributes")) {
            if (a.get("agreement").asText().equals(agreement)) {
                out.add(a.get("id").asText());
            }
        }
        return out;
    }

    @Test
    void plantedContestedAttributesAreFlaggedContestedAndClearOnesAreNot() throws IOException {
        ConsistencyReport c = consistency(null);
        AgreementReport a = AgreementAnalysis.run(JudgmentsCsv.read(DemoVocabulary.DEMO.resolve("judgments.csv"),
                JudgmentColumns.DEFAULT), AgreementOptions.builder().replicates(0).pseudonyms(KEY).build());
        FlagReport f = Flags.evaluate(FlagInputs.builder().consistency(c).agreement(a).vocabulary(feedbackVocabulary).build(),
                FlagThresholds.DEFAULTS);
        List<String> contested = judged("contested");
        List<String> clear = judged("clear");
        assertEquals(8, contested.size(), "the demo plants eight contested attributes");
        assertEquals(11, clear.size(), "and eleven clear ones");
        for (String id : contested) {
            assertTrue(f.has(id, FlagKind.CONTESTED), id + " is planted contested: " + f.flags(id));
        }
        for (String id : clear) {
            assertFalse(f.has(id, FlagKind.CONTESTED), id + " is planted clear: " + f.flags(id));
        }
        // clear attributes that shoppers also describe are read from feedback, and their direction agreement passes
        for (String id : List.of("hood", "waterproof", "two-way-zipper")) {
            assertTrue(c.attribute(id).orElseThrow().agreement().pairsJudged() >= 10, id);
        }
    }

    @Test
    void plantedVagueWordsAndMisspellingsSurfaceAsVocabularyGaps() {
        ConsistencyReport c = consistency(null);
        Map<String, GapTerm> gaps = new TreeMap<>();
        c.gaps().forEach(g -> gaps.put(g.term(), g));
        List<String> top = c.gaps().subList(0, 10).stream().map(GapTerm::term).toList();
        // the vague attributes the demo vocabulary lacks: comfortable, cozy, sturdy (overall quality is "better", "worse")
        for (String w : List.of("comfortable", "cozy", "sturdy", "better", "worse")) {
            assertTrue(top.contains(w), w + " not among the top gaps " + top);
        }
        // misspellings no morphology reads come out with exactly the sentences the demo planted them in
        Set<String> readAsDegreeForms = Set.of("heavyer", "warmmer");
        for (JsonNode m : planted.get("feedback").get("misspellings")) {
            String form = m.get("form").asText();
            if (readAsDegreeForms.contains(form)) {
                assertFalse(gaps.containsKey(form), form + " is read as a degree form of a scale word, not a gap");
                assertTrue(c.mentions().stream().anyMatch(x -> x.form().equals(form)), form);
            } else {
                assertEquals(m.get("sentences").asInt(), gaps.get(form).sentences(), form);
            }
        }
    }

    @Test
    void annotatorIdsNeverReachTheReport() {
        ConsistencyReport c = consistency(null);
        Set<String> people = new HashSet<>();
        feedback.sentences().forEach(s -> people.add(s.annotator()));
        assertEquals(planted.get("feedback").get("shoppers").asInt(), people.size());
        String all = c.toString();
        for (String p : people) {
            assertFalse(all.contains(p + ","), p);
            assertFalse(all.contains("annotator=" + p), p);
        }
        assertEquals(feedback.sentences().size(), planted.get("feedback").get("sentences").asInt()
                - feedback.problems().size());
    }

    /**
     * Labels the demo catalog, then grounds the feedback in it: for attributes whose listings the
     * labeler reads, grounding precision comes within five points of the share of statements the
     * demo planted as agreeing with the specs (shoppers err independently of the category).
     */
    @Test
    @Tag("slow")
    void groundingPrecisionFollowsThePlantedShareOfTrueStatements(@TempDir Path out) throws IOException {
        Workspace ws = Workspace.load(DemoVocabulary.DEMO);
        LabelRun.builder(labeler).sources(ws.sources()).workspaceRoot(ws.dir()).build().run(out);
        Set<String> named = new HashSet<>();
        for (FeedbackSentence s : feedback.sentences()) {
            named.add(s.targetId());
            named.add(s.referenceId());
        }
        GroundingAssignments g = GroundingAssignments.read(out.resolve("assignments.jsonl"), vocabulary, named);
        ConsistencyReport c = consistency(g.catalog());
        JsonNode truth = planted.get("feedback").get("attributes");
        // ours → the demo's tally: presence statements, and comparisons on the bundled example scales
        Map<String, String> presence = Map.of("hood", "hood", "waterproof", "waterproof-claim", "hip-belt", "hip-belt");
        Map<String, String> comparison = Map.of("light-output", "brightness", "pack-volume", "volume");
        presence.forEach((ours, demo) -> {
            ConsistencyAttribute a = c.attribute(ours).orElseThrow();
            double expected = truth.get(demo).get("agreesWithSpecs").asDouble() / truth.get(demo).get("mentions").asDouble();
            assertTrue(a.grounding().presenceChecked() >= 30, ours);
            assertEquals(expected, a.grounding().presencePrecision(), 0.05, ours);
        });
        comparison.forEach((ours, demo) -> {
            ConsistencyAttribute a = c.attribute(ours).orElseThrow();
            double expected = truth.get(demo).get("agreesWithSpecs").asDouble() / truth.get(demo).get("mentions").asDouble();
            assertTrue(a.grounding().comparisonChecked() >= 30, ours);
            assertEquals(expected, a.grounding().comparisonPrecision(), 0.05, ours);
        });
        // Waterproof rating, between listings that state one rating: a tent page giving "Fly 2,500 mm / floor
        // 7,000 mm" is grounded on the median of both (4,750), where the demo's tally compares the fly. Since the
        // readers take page and sheet ids from the visible SKU line (decision 107), those old-template pages meet
        // their feedback and the two-rating trap shows (0.78 against 0.86 over all pairs); it is left out here.
        Map<String, Integer> ratings = new HashMap<>();
        AssignmentsJsonl.read(out.resolve("assignments.jsonl"), vocabulary, x -> ratings.put(x.listingId(),
                (int) x.assignments().stream().filter(y -> y.isNumber() && y.conceptId().equals("waterproof-rating")).count()));
        long wChecked = 0;
        long wGrounded = 0;
        for (FeedbackMention m : c.mentions()) {
            if (m.attribute().equals("waterproof-rating") && m.grounding().checked()
                    && ratings.getOrDefault(m.targetId(), 0) == 1 && ratings.getOrDefault(m.referenceId(), 0) == 1) {
                wChecked++;
                wGrounded += m.grounding().grounded() ? 1 : 0;
            }
        }
        JsonNode wp = truth.get("waterproofness");
        assertTrue(wChecked >= 30, "waterproof-rating comparisons checked: " + wChecked);
        assertEquals(wp.get("agreesWithSpecs").asDouble() / wp.get("mentions").asDouble(), (double) wGrounded / wChecked, 0.05,
                "waterproof-rating");
        // Weight, outside footwear and trekking poles: those state weights per shoe or per pole beside
        // others per pair (a trap the demo plants for the labeler), so their comparisons are left out here.
        Set<String> perItem = Set.of("footwear", "trekking-poles");
        long checked = 0;
        long grounded = 0;
        for (FeedbackMention m : c.mentions()) {
            if (m.attribute().equals("weight") && m.grounding().checked()
                    // spec sheets name the category "Trekking Poles", feeds "trekking-poles": one category (decision 107)
                    && !perItem.contains(Labeler.categoryKey(g.catalog().listing(m.targetId()).orElseThrow().category()))) {
                checked++;
                grounded += m.grounding().grounded() ? 1 : 0;
            }
        }
        double expected = truth.get("weight").get("agreesWithSpecs").asDouble() / truth.get("weight").get("mentions").asDouble();
        assertTrue(checked >= 100, "weight comparisons checked: " + checked);
        assertEquals(expected, (double) grounded / checked, 0.05, "weight");
    }
}
