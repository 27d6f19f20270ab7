package dev.sheaf.vocab;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

/**
 * Every rule has a failing and a passing case. Sources: W3C SKOS Reference, Recommendation
 * 18 Aug 2009, integrity conditions [mem, corroborated]; ANSI/NISO Z39.19-2005 and ISO 25964-1:2011
 * practices [mem for section numbers] (CHECKS.md "Vocabulary standards").
 */
class VocabularyCheckerTest {
    private static final Vocabulary CLEAN = Fixtures.fernhollow();

    private static Vocabulary with(Concept... changed) {
        TreeMap<String, Concept> m = new TreeMap<>(CLEAN.conceptMap());
        for (Concept c : changed) {
            m.put(c.id(), c);
        }
        return Vocabulary.of(CLEAN.scheme(), m.values(), CLEAN.retired(), CLEAN.decisions());
    }

    private static Concept.Builder edit(String id) {
        return CLEAN.concept(id).orElseThrow().toBuilder();
    }

    private static List<Finding> findings(Vocabulary v, Rule r) {
        return VocabularyChecker.check(v).of(r);
    }

    @Test
    void theFixtureIsCleanExceptForTheRegulatedClaimNote() {
        CheckReport r = VocabularyChecker.check(CLEAN);
        assertEquals(List.of(Rule.REGULATED_CLAIM), r.findings().stream().map(Finding::rule).toList(), r.findings().toString());
        assertFalse(r.hasErrors());
    }

    // --- W3C SKOS Reference (2009) S13: prefLabel, altLabel, hiddenLabel pairwise disjoint [mem, corroborated]

    @Test
    void s13FlagsALabelThatIsBothPreferredAndAlternative() {
        Vocabulary v = with(edit("zipper").altLabel("zipper").build());
        List<Finding> f = findings(v, Rule.LABEL_KINDS_OVERLAP);
        assertEquals(1, f.size());
        assertEquals(List.of("zipper"), f.get(0).concepts());
        assertEquals(Severity.ERROR, f.get(0).severity());
        assertTrue(f.get(0).message().contains("preferred and alternative"), f.get(0).message());
    }

    @Test
    void s13FlagsAlternativeAndHiddenOverlap() {
        Vocabulary v = with(edit("zipper").hiddenLabel("zip").build());
        assertEquals(1, findings(v, Rule.LABEL_KINDS_OVERLAP).size());
    }

    @Test
    void s13AllowsTheSameTextInAnotherLanguage() {
        // S13 compares literals with their language tags: "Material"@en and "Material"@de differ
        assertTrue(findings(CLEAN, Rule.LABEL_KINDS_OVERLAP).isEmpty());
        Vocabulary v = with(edit("zipper").altLabel(Label.of("zipper", "de")).build());
        assertTrue(findings(v, Rule.LABEL_KINDS_OVERLAP).isEmpty());
    }

    // --- S27: skos:related disjoint with skos:broaderTransitive [mem, corroborated]

    @Test
    void s27FlagsARelatedLinkToAnAncestor() {
        Vocabulary v = with(edit("two-way-zipper").related("closure").build(), edit("closure").related("two-way-zipper").build());
        List<Finding> f = findings(v, Rule.RELATED_TO_ANCESTOR);
        assertEquals(1, f.size(), f.toString());
        assertEquals(List.of("closure", "two-way-zipper"), f.get(0).concepts());
    }

    @Test
    void s27AllowsRelatedSiblings() {
        // zipper and drawcord are both under closure and related: allowed
        assertTrue(findings(CLEAN, Rule.RELATED_TO_ANCESTOR).isEmpty());
    }

    // --- S46: exactMatch disjoint with broadMatch and relatedMatch [mem, corroborated]

    @Test
    void s46FlagsExactAndBroadMatchToTheSameConcept() {
        Vocabulary v = with(edit("nylon").mapping(new Mapping(MatchKind.BROAD, "https://example.org/materials/nylon")).build());
        assertEquals(1, findings(v, Rule.EXACT_MATCH_CONFLICT).size());
        Vocabulary w = with(edit("nylon").mapping(new Mapping(MatchKind.RELATED, "https://example.org/materials/nylon")).build());
        assertEquals(1, findings(w, Rule.EXACT_MATCH_CONFLICT).size());
    }

    @Test
    void s46AllowsExactAndCloseMatch() {
        // S46 names broadMatch and relatedMatch only; closeMatch alongside exactMatch is not a clash
        Vocabulary v = with(edit("nylon").mapping(new Mapping(MatchKind.CLOSE, "https://example.org/materials/nylon")).build());
        assertTrue(findings(v, Rule.EXACT_MATCH_CONFLICT).isEmpty());
    }

    // --- Z39.19 / ISO 25964-1: one preferred term per concept; homographs take a qualifier [mem]

    @Test
    void flagsAPreferredLabelSharedWithinOneFacetAsAnError() {
        Vocabulary v = with(Concept.builder("nylon-2").prefLabel("nylon").broader("material").build());
        List<Finding> f = findings(v, Rule.PREFERRED_LABEL_SHARED);
        assertEquals(1, f.size());
        assertEquals(Severity.ERROR, f.get(0).severity());
        assertEquals(List.of("nylon", "nylon-2"), f.get(0).concepts());
    }

    @Test
    void flagsAHomographAcrossFacetsAsAWarningWithAQualifierHint() {
        Vocabulary v = with(Concept.builder("toggle-material").prefLabel("toggle").broader("material").build());
        List<Finding> f = findings(v, Rule.PREFERRED_LABEL_SHARED);
        assertEquals(1, f.size());
        assertEquals(Severity.WARNING, f.get(0).severity());
        assertTrue(f.get(0).hint().contains("qualifier"));
    }

    @Test
    void passesDistinctPreferredLabels() {
        assertTrue(findings(CLEAN, Rule.PREFERRED_LABEL_SHARED).isEmpty());
    }

    // --- Z39.19 / ISO 25964-1: each non-preferred term points to exactly one preferred term [mem]

    @Test
    void flagsANonPreferredLabelOnTwoConcepts() {
        Vocabulary v = with(edit("two-way-zipper").altLabel("zip").build());
        List<Finding> f = findings(v, Rule.AMBIGUOUS_LABEL);
        assertEquals(1, f.size());
        assertEquals(List.of("two-way-zipper", "zipper"), f.get(0).concepts());
        assertEquals("\"zip\"@en", f.get(0).subject());
    }

    @Test
    void flagsAPreferredLabelThatIsAnotherConceptsSynonym() {
        Vocabulary v = with(Concept.builder("zip").prefLabel("zip").broader("closure").build());
        assertEquals(1, findings(v, Rule.AMBIGUOUS_LABEL).size());
    }

    @Test
    void passesSynonymsThatPointToOneConcept() {
        assertTrue(findings(CLEAN, Rule.AMBIGUOUS_LABEL).isEmpty());
    }

    // --- Z39.19: every concept has a preferred term [mem]

    @Test
    void flagsAConceptWithoutAPreferredLabelInTheDefaultLanguage() {
        Vocabulary v = with(Concept.builder("loden").prefLabel(Label.of("Loden", "de")).broader("material").build());
        List<Finding> f = findings(v, Rule.NO_PREFERRED_LABEL);
        assertEquals(List.of("loden"), f.get(0).concepts());
        assertTrue(findings(CLEAN, Rule.NO_PREFERRED_LABEL).isEmpty());
    }

    // --- Z39.19 / ISO 25964-1: no circular hierarchy; SKOS allows cycles, so a warning [mem]

    @Test
    void warnsAboutABroaderCycle() {
        Vocabulary v = with(edit("nylon").broader("ripstop-nylon").build());
        List<Finding> f = findings(v, Rule.BROADER_CYCLE);
        assertEquals(1, f.size());
        assertEquals(Severity.WARNING, f.get(0).severity());
        assertEquals(List.of("nylon", "ripstop-nylon"), f.get(0).concepts());
        assertFalse(VocabularyChecker.check(v).hasErrors(), "a cycle alone is no error in SKOS");
    }

    @Test
    void warnsAboutASelfLoopAndPassesATree() {
        Vocabulary v = with(edit("toggle").broader("toggle").build());
        assertEquals(List.of("toggle"), findings(v, Rule.BROADER_CYCLE).get(0).concepts());
        assertTrue(findings(CLEAN, Rule.BROADER_CYCLE).isEmpty());
    }

    @Test
    void findsCyclesInAHierarchyDeeperThanTheCallStack() {
        List<Concept> chain = new ArrayList<>();
        int n = 20_000;
        for (int i = 0; i < n; i++) {
            chain.add(Concept.builder("c" + i).prefLabel("value " + i).broader(i == 0 ? "c" + (n - 1) : "c" + (i - 1)).build());
        }
        Vocabulary v = Vocabulary.of(Fixtures.scheme(), chain, null, null);
        List<Finding> f = findings(v, Rule.BROADER_CYCLE);
        assertEquals(1, f.size());
        assertEquals(n, f.get(0).concepts().size());
    }

    // --- Z39.19: every term has a place in the hierarchy [mem]

    @Test
    void warnsAboutAConceptUnderNoFacet() {
        Vocabulary v = with(Concept.builder("gore").prefLabel("membrane").build());
        List<Finding> f = findings(v, Rule.ORPHAN);
        assertEquals(List.of("gore"), f.get(0).concepts());
        assertTrue(f.get(0).message().contains("not under any facet"));
        assertTrue(findings(CLEAN, Rule.ORPHAN).isEmpty());
    }

    // --- ISO 25964-1 facet analysis: a facet with one value [mem]

    @Test
    void warnsAboutATermFacetWithOneValueButNotNumberFacets() {
        Concept fit = Concept.builder("fit").prefLabel("Fit").facet(FacetProperties.terms()).build();
        Concept slim = Concept.builder("slim").prefLabel("slim").broader("fit").build();
        Vocabulary v = with(fit, slim);
        List<Finding> f = findings(v, Rule.FACET_SINGLE_VALUE);
        assertEquals(1, f.size());
        assertEquals(List.of("fit"), f.get(0).concepts());
        // capacity (number) and packable (yes/no) have no concept values and are not flagged
        assertTrue(findings(CLEAN, Rule.FACET_SINGLE_VALUE).isEmpty());
        Vocabulary w = with(fit, slim, Concept.builder("relaxed").prefLabel("relaxed").broader("fit").build());
        assertTrue(findings(w, Rule.FACET_SINGLE_VALUE).isEmpty());
    }

    // --- Z39.19 / ISO 25964-1: variant forms lead to one preferred term [mem]

    @Test
    void warnsAboutLabelsDifferingOnlyByCaseHyphenSpacingOrPlural() {
        Vocabulary v = with(Concept.builder("two-way-zippers").prefLabel("Two Way Zippers").broader("closure").build());
        List<Finding> f = findings(v, Rule.NEAR_DUPLICATE_LABELS);
        assertEquals(1, f.size(), f.toString());
        assertEquals(List.of("two-way-zipper", "two-way-zippers"), f.get(0).concepts());
    }

    @Test
    void leavesVariantsOnOneConceptAndUnrelatedWordsAlone() {
        // ripstop nylon carries "rip-stop nylon" itself: variants on one concept are the point of alt labels
        assertTrue(findings(CLEAN, Rule.NEAR_DUPLICATE_LABELS).isEmpty());
        assertEquals("zipper", VocabularyChecker.singular("zippers"));
        assertEquals("glass", VocabularyChecker.singular("glass"));
    }

    // --- Z39.19: count nouns plural, mass nouns singular (advice only) [mem]

    @Test
    void advisesWhenAFacetMixesSingularAndPluralValues() {
        Concept feat = Concept.builder("features").prefLabel("Features").facet(FacetProperties.terms().withMultiValued(true)).build();
        Vocabulary v = with(feat,
                Concept.builder("pockets").prefLabel("zippered pockets").broader("features").build(),
                Concept.builder("vents").prefLabel("pit vents").broader("features").build(),
                Concept.builder("hood").prefLabel("removable hood").broader("features").build());
        List<Finding> f = findings(v, Rule.SINGULAR_PLURAL);
        assertEquals(1, f.size());
        assertEquals(Severity.INFO, f.get(0).severity());
        assertEquals(List.of("hood"), f.get(0).concepts(), "the minority form is the one to look at");
        assertTrue(f.get(0).hint().contains("advice"));
        assertTrue(findings(CLEAN, Rule.SINGULAR_PLURAL).isEmpty(), "materials all singular");
    }

    // --- SKOS: skos:related is symmetric; Z39.19 RT reciprocal [mem]

    @Test
    void warnsAboutAOneWayRelatedLink() {
        Vocabulary v = with(edit("drawcord").removeRelated("zipper").build());
        List<Finding> f = findings(v, Rule.RELATED_ONE_WAY);
        assertEquals(List.of("drawcord", "zipper"), f.get(0).concepts());
        assertTrue(findings(CLEAN, Rule.RELATED_ONE_WAY).isEmpty());
    }

    // --- Sheaf format rules [practice]

    @Test
    void flagsDanglingAndMergedReferences() {
        Vocabulary v = with(edit("toggle").broader("no-such-thing").build(), edit("polyester").broader("rip-stop").build());
        List<Finding> dangling = findings(v, Rule.DANGLING_REFERENCE);
        assertEquals(1, dangling.size());
        assertEquals(List.of("no-such-thing", "toggle"), dangling.get(0).concepts());
        List<Finding> merged = findings(v, Rule.REFERS_TO_MERGED);
        assertEquals(1, merged.size());
        assertTrue(merged.get(0).hint().contains("ripstop-nylon"));
        assertTrue(findings(CLEAN, Rule.DANGLING_REFERENCE).isEmpty());
    }

    @Test
    void flagsAKeptDecisionOnAnUnknownConceptAndABrokenReplacedByChain() {
        Vocabulary v = Vocabulary.of(CLEAN.scheme(), CLEAN.allConcepts(),
                List.of(new Retired("old-a", "old-b", null), new Retired("old-b", "old-a", null), new Retired("x", "gone", null)),
                List.of(Decision.kept("mesh", "mesh-panel")));
        List<Finding> f = findings(v, Rule.DANGLING_REFERENCE);
        assertEquals(4, f.size(), f.toString());
    }

    @Test
    void warnsAboutAValueUnderTwoFacets() {
        Vocabulary v = with(edit("toggle").broader("material").build());
        assertEquals(List.of("closure", "material", "toggle"), findings(v, Rule.SEVERAL_FACETS).get(0).concepts());
        assertTrue(findings(CLEAN, Rule.SEVERAL_FACETS).isEmpty());
    }

    @Test
    void notesRegulatedClaimFacets() {
        List<Finding> f = findings(CLEAN, Rule.REGULATED_CLAIM);
        assertEquals(List.of("waterproof-rating"), f.get(0).concepts());
        Vocabulary v = with(edit("waterproof-rating").facet(CLEAN.concept("waterproof-rating").orElseThrow().facet()
                .withRegulatedClaim(false)).build());
        assertTrue(findings(v, Rule.REGULATED_CLAIM).isEmpty());
    }

    @Test
    void anUnreadableFileIsOneErrorWithItsPosition() {
        CheckReport r = VocabularyChecker.unreadable(new VocabularyFormatException("shop.vocab.json", 12, 7, "concepts[3]",
                "expected a list [ ... ], found a text", null));
        assertTrue(r.hasErrors());
        assertEquals(Rule.UNREADABLE, r.findings().get(0).rule());
        assertTrue(r.findings().get(0).message().startsWith("shop.vocab.json:12:7: at concepts[3]: expected a list"));
        assertFalse(VocabularyChecker.check(CLEAN).of(Rule.UNREADABLE).size() > 0);
    }

    @Test
    void rendersTextAndJsonWithRuleStandardAndHint() throws Exception {
        Vocabulary v = with(edit("two-way-zipper").altLabel("zip").build());
        CheckReport r = VocabularyChecker.check(v);
        StringBuilder sb = new StringBuilder();
        r.writeText(sb, "x.vocab.json");
        String text = sb.toString();
        assertTrue(text.startsWith("x.vocab.json: 1 error, 0 warnings, 1 note"), text);
        assertTrue(text.contains("ambiguous-label"));
        assertTrue(text.contains("fix: "));
        assertTrue(text.contains("source: ANSI/NISO Z39.19-2005"));
        com.fasterxml.jackson.databind.JsonNode j = new com.fasterxml.jackson.databind.ObjectMapper().readTree(r.toJson("x"));
        assertEquals(1, j.get("errors").asInt());
        assertEquals("ambiguous-label", j.get("findings").get(0).get("rule").asText());
        assertEquals("two-way-zipper", j.get("findings").get(0).get("concepts").get(0).asText());
    }
}
