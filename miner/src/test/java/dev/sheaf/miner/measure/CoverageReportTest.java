package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.label.Assignment;
import dev.sheaf.miner.label.Assignments;
import dev.sheaf.miner.label.Evidence;
import dev.sheaf.miner.label.InvalidValue;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.miner.label.LabelFixtures;
import dev.sheaf.miner.label.Polarity;
import dev.sheaf.miner.text.SegmentPart;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** Coverage figures on hand-made assignments whose answers can be counted by eye. */
class CoverageReportTest {
    private final Vocabulary vocab = LabelFixtures.vocabulary();

    private static final Evidence EV = new Evidence(0, FieldKind.DESCRIPTION, "", SegmentPart.TEXT, 0, 1, "x",
            LabelKind.PREFERRED, Polarity.STATED, null);
    private static final Evidence NEG = new Evidence(0, FieldKind.DESCRIPTION, "", SegmentPart.TEXT, 0, 1, "x",
            LabelKind.PREFERRED, Polarity.NEGATED, "no");
    private static final Evidence NUM = new Evidence(0, FieldKind.SPEC, "Weight", SegmentPart.SPEC_VALUE, 0, 1, "x",
            null, Polarity.STATED, null);

    /** Items: "hooded" stated, "!hooded" negated, "weight=1.2" a number; facets and applicability from the fixture vocabulary. */
    private Assignments listing(String id, String category, String source, String... items) {
        List<Assignment> as = new ArrayList<>();
        List<InvalidValue> invalid = new ArrayList<>();
        for (String it : items) {
            if (it.startsWith("invalid:")) {
                invalid.add(new InvalidValue(it.substring(8), 0, "Weight", "heavy", "expected a number"));
            } else if (it.contains("=")) {
                String facet = it.substring(0, it.indexOf('='));
                double v = Double.parseDouble(it.substring(it.indexOf('=') + 1));
                String bucket = vocab.concept(facet).orElseThrow().facet().bucketFor(v).map(b -> b.label()).orElse(null);
                as.add(new Assignment(facet, facet, Polarity.STATED, List.of(NUM), v, v, "kg", bucket,
                        Labeler.applies(vocab.concept(facet).orElseThrow().facet(), category), false));
            } else {
                boolean neg = it.startsWith("!");
                String c = neg ? it.substring(1) : it;
                var facet = vocab.facetOf(c).orElseThrow();
                as.add(new Assignment(c, facet.id(), neg ? Polarity.NEGATED : Polarity.STATED, List.of(neg ? NEG : EV), null, null,
                        null, null, Labeler.applies(facet.facet(), category), false));
            }
        }
        as.sort(java.util.Comparator.comparing(Assignment::conceptId).thenComparing(a -> a.value() == null ? 0 : a.value()));
        return new Assignments(id, category, source, "", as, invalid);
    }

    private static FillRate fill(CoverageReport r, String facet, String category) {
        CoverageFacet f = r.facets().stream().filter(x -> x.facetId().equals(facet)).findFirst().orElseThrow();
        if (category.equals(FillRate.ALL)) {
            return f.overall();
        }
        return f.byCategory().stream().filter(x -> x.category().equals(category)).findFirst().orElseThrow();
    }

    private CoverageReport hoodCatalog() {
        return CoverageReport.of(vocab, CoverageOptions.defaults(), List.of(
                listing("J1", "jackets", "a.csv", "hooded"),
                listing("J2", "jackets", "a.csv", "hooded", "removable-hood"),
                listing("J3", "jackets", "a.csv", "!hooded"),
                listing("J4", "jackets", "b.csv"),
                listing("T1", "tents", "b.csv", "hooded"),
                listing("T2", "tents", "b.csv", "merino-wool")), List.of());
    }

    @Test
    void fillRateCountsOnlyListingsWhereTheFacetApplies() {
        // Reading of CHECKS.md "Coverage" [practice]: fill rate(a, S) = |S where a applies and has a valid value| /
        // |S where a applies|. "Not applicable" listings (the two tents: hood applies to jackets only) are NOT in the
        // denominator; the tent that mentions a hood is a category error and fills nothing; the negated hood is no value.
        FillRate all = fill(hoodCatalog(), "hood", FillRate.ALL);
        assertEquals(6, all.listings());
        assertEquals(4, all.applicable());
        assertEquals(2, all.filled());
        assertEquals(0.5, all.rate(), 1e-12);
        FillRate jackets = fill(hoodCatalog(), "hood", "jackets");
        assertEquals(0.5, jackets.rate(), 1e-12);
        FillRate tents = fill(hoodCatalog(), "hood", "tents");
        assertEquals(0, tents.applicable());
        assertTrue(Double.isNaN(tents.rate()), "no listing in S where the facet applies: the rate is undefined");
    }

    @Test
    void fillRateAllReadingCountsNotApplicableListingsInTheDenominator() {
        // The other reading: "not applicable" listings ARE in the denominator: filled / |S| = 2 / 6 overall,
        // 2 / 4 among jackets (all applicable) and 0 / 2 among tents.
        assertEquals(2.0 / 6, fill(hoodCatalog(), "hood", FillRate.ALL).rateAll(), 1e-12);
        assertEquals(0.5, fill(hoodCatalog(), "hood", "jackets").rateAll(), 1e-12);
        assertEquals(0.0, fill(hoodCatalog(), "hood", "tents").rateAll(), 1e-12);
        // a facet that applies everywhere reads the same both ways
        FillRate material = fill(hoodCatalog(), "material", FillRate.ALL);
        assertEquals(material.rate(), material.rateAll(), 1e-12);
        assertEquals(1.0 / 6, material.rate(), 1e-12);
    }

    @Test
    void aSingleValuedFacetWithTwoValuesIsAConflict() {
        FillRate hood = fill(hoodCatalog(), "hood", FillRate.ALL);
        assertEquals(1, hood.conflicts());
        CoverageFacet f = hoodCatalog().facets().stream().filter(x -> x.facetId().equals("hood")).findFirst().orElseThrow();
        assertEquals(List.of("J2"), f.conflictExamples());
        CoverageReport r = CoverageReport.of(vocab, CoverageOptions.defaults(), List.of(
                listing("P1", "packs", "a.csv", "weight=1.2", "weight=1.5"),
                listing("P2", "packs", "a.csv", "weight=1.2", "merino-wool", "ripstop-nylon")), List.of());
        assertEquals(1, fill(r, "weight", FillRate.ALL).conflicts());
        assertEquals(0, fill(r, "material", FillRate.ALL).conflicts(), "material is multi-valued");
        // a value with a broader value of the same facet is one statement: no-see-um mesh is under mesh
        Vocabulary single = Vocabulary.of(vocab.scheme(), vocab.allConcepts().stream()
                .map(c -> c.id().equals("material") ? c.toBuilder().facet(c.facet().withMultiValued(false)).build() : c).toList(),
                vocab.retired(), List.of());
        CoverageReport h = CoverageReport.of(single, CoverageOptions.defaults(), List.of(
                listing("M1", "tents", "a.csv", "mesh", "no-see-um-mesh"), listing("M2", "tents", "a.csv", "mesh", "nylon")), List.of());
        assertEquals(1, fill(h, "material", FillRate.ALL).conflicts());
    }

    @Test
    void yesNoFacetsAreFilledByANoAndUnreadableNumbersFillNothing() {
        CoverageReport r = CoverageReport.of(vocab, CoverageOptions.defaults(), List.of(
                listing("A", "jackets", "a.csv", "!packable"),
                listing("B", "jackets", "a.csv", "invalid:weight"),
                listing("C", "jackets", "a.csv", "weight=0.5")), List.of());
        assertEquals(1, fill(r, "packable", FillRate.ALL).filled());
        FillRate w = fill(r, "weight", FillRate.ALL);
        assertEquals(1, w.filled());
        assertEquals(1, w.invalid());
        assertEquals(1.0 / 3, w.rate(), 1e-12);
    }

    @Test
    void entropyIsInBits() {
        // Shannon entropy H = -sum p log2 p [comp]: two equal values 1 bit, four 2 bits, (1/2, 1/4, 1/4) 1.5 bits
        assertEquals(1.0, CoverageFacet.entropy(new long[] {3, 3}), 1e-12);
        assertEquals(2.0, CoverageFacet.entropy(new long[] {1, 1, 1, 1}), 1e-12);
        assertEquals(1.5, CoverageFacet.entropy(new long[] {2, 1, 1}), 1e-12);
        assertEquals(0.0, CoverageFacet.entropy(new long[] {7}));
        assertEquals(0.0, CoverageFacet.entropy(new long[] {}));
        CoverageReport r = CoverageReport.of(vocab, CoverageOptions.defaults(), List.of(
                listing("A", "packs", "a.csv", "weight=0.5"), listing("B", "packs", "a.csv", "weight=1.5"),
                listing("C", "packs", "a.csv", "weight=1.7"), listing("D", "packs", "a.csv", "weight=2.5")), List.of());
        CoverageFacet w = r.facets().stream().filter(x -> x.facetId().equals("weight")).findFirst().orElseThrow();
        assertEquals(List.of("light", "standard", "ultralight"), w.values().stream().map(CoverageValue::value).toList());
        assertEquals(1.5, w.entropyBits(), 1e-12);
    }

    @Test
    void conceptCoverageIsASharOfApplicableListingsByCategoryAndSource() {
        CoverageReport r = hoodCatalog();
        CoverageConcept hood = r.concepts().stream().filter(c -> c.conceptId().equals("hooded")).findFirst().orElseThrow();
        assertEquals(3, hood.listings(), "J1, J2 and the tent T1 state it");
        assertEquals(1, hood.negated());
        assertEquals(4, hood.applicable());
        assertEquals(0.75, hood.share(), 1e-12);
        assertEquals("a.csv", hood.topSource());
        assertEquals(2.0 / 3, hood.topSourceShare(), 1e-12);
        CoverageCell tents = r.byCategory().stream().filter(c -> c.conceptId().equals("hooded") && c.key().equals("tents"))
                .findFirst().orElseThrow();
        assertEquals(1, tents.listings());
        assertEquals(0, tents.total());
        CoverageCell b = r.bySource().stream().filter(c -> c.conceptId().equals("hooded") && c.key().equals("b.csv"))
                .findFirst().orElseThrow();
        assertEquals(1, b.listings());
        assertEquals(3, b.total());
        assertEquals(Map.of("jackets", 4L, "tents", 2L), r.categories());
        assertEquals(1, r.listingsWithNothing());
        assertEquals(List.of("J4"), r.nothingExamples());
        assertEquals(2, r.listingsWithoutLabels(), "J3 only negates, J4 has nothing");
    }

    @Test
    void spellingsOfOneCategoryAreOneRowNamedByTheCommonest() {
        // a spec sheet's "Jackets" and a feed's "jackets" are one category (decision 107); the hood facet applies to both
        CoverageReport r = CoverageReport.of(vocab, CoverageOptions.defaults(), List.of(
                listing("S1", "Jackets", "sheet.pdf", "hooded"),
                listing("J1", "jackets", "a.csv", "hooded"),
                listing("J2", "jackets", "a.csv"),
                listing("T1", "tents", "b.csv")), List.of());
        assertEquals(Map.of("jackets", 3L, "tents", 1L), r.categories());
        assertEquals(2.0 / 3, fill(r, "hood", "jackets").rate(), 1e-12, "S1 and J1 of the three jackets");
    }

    @Test
    void conceptsCarriedByOneSourceOrCategoryAreConcentrated() {
        List<Assignments> as = new ArrayList<>();
        for (int i = 0; i < 9; i++) {
            as.add(listing("A" + i, i % 2 == 0 ? "jackets" : "packs", "supplier-a.csv", "merino-wool", "nylon"));
        }
        as.add(listing("B0", "jackets", "supplier-b.csv", "merino-wool", "nylon"));
        for (int i = 0; i < 10; i++) {
            as.add(listing("N" + i, "tents", "supplier-b.csv", "nylon"));
        }
        CoverageReport r = CoverageReport.of(vocab, CoverageOptions.defaults(), as, List.of());
        assertEquals(List.of("merino-wool"), r.concentration().stream().map(ConcentrationFinding::conceptId).distinct().toList());
        ConcentrationFinding f = r.concentration().get(0);
        assertEquals("source", f.by());
        assertEquals("supplier-a.csv", f.top());
        assertEquals(0.9, f.share(), 1e-12);
        CoverageReport stricter = CoverageReport.of(vocab, CoverageOptions.builder().concentration(0.95).build(), as, List.of());
        assertTrue(stricter.concentration().isEmpty());
    }

    @Test
    void nearlyCoincidingConceptsAreOverlapsWithJaccardAndLift() {
        List<Assignments> as = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            as.add(listing("X" + i, "jackets", "a.csv", "merino-wool", "nylon", "mesh"));
        }
        as.add(listing("Y", "jackets", "a.csv", "merino-wool"));
        for (int i = 0; i < 5; i++) {
            as.add(listing("Z" + i, "jackets", "a.csv", "waterproof"));
        }
        CoverageReport r = CoverageReport.of(vocab, CoverageOptions.defaults(), as, List.of());
        OverlapPair p = r.overlaps().stream().filter(o -> o.a().equals("merino-wool") && o.b().equals("nylon")).findFirst()
                .orElseThrow();
        assertEquals(5, p.listingsA());
        assertEquals(4, p.listingsB());
        assertEquals(4, p.both());
        assertEquals(0.8, p.jaccard(), 1e-12, "4 / (5 + 4 - 4)");
        assertEquals(2.0, p.lift(), 1e-12, "4 * 10 / (5 * 4)");
        assertEquals("same-facet", p.relation());
        assertEquals("merge?", p.suggestion());
        assertEquals(1.0, r.overlaps().get(0).jaccard(), 1e-12, "mesh and nylon coincide exactly");
        assertTrue(r.overlaps().stream().noneMatch(o -> o.a().equals("waterproof") || o.b().equals("waterproof")));
    }

    @Test
    void theCoverageCurveAddsTheConceptWithTheLargestMarginalGain() {
        // A = {1,2,3,4} (merino), B = {3,4,5} (nylon), C = {5,6} (mesh), two listings with nothing: by size the order
        // would be A, B, C; by marginal gain it is A (4), then C (2 new) before B (1 new), and B adds nothing after.
        CoverageReport r = CoverageReport.of(vocab, CoverageOptions.defaults(), List.of(
                listing("1", "jackets", "a.csv", "merino-wool"), listing("2", "jackets", "a.csv", "merino-wool"),
                listing("3", "jackets", "a.csv", "merino-wool", "nylon"), listing("4", "jackets", "a.csv", "merino-wool", "nylon"),
                listing("5", "jackets", "a.csv", "nylon", "mesh"), listing("6", "jackets", "a.csv", "mesh"),
                listing("7", "jackets", "a.csv"), listing("8", "jackets", "a.csv")), List.of());
        assertEquals(List.of("merino-wool", "mesh"), r.curve().stream().map(CoverageCurvePoint::conceptId).toList());
        assertEquals(List.of(4L, 2L), r.curve().stream().map(CoverageCurvePoint::gain).toList());
        assertEquals(0.75, r.curve().get(1).share(), 1e-12);
    }

    @Test
    void optionsRejectUnknownKeysByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> CoverageOptions.fromMap(CoverageOptions.defaults(), Map.of("concentraton", "0.8")));
        assertTrue(e.getMessage().contains("\"concentraton\""));
        assertEquals(0.8, CoverageOptions.fromMap(CoverageOptions.defaults(), Map.of("concentration", "0.8")).concentration());
        assertThrows(IllegalArgumentException.class, () -> CoverageOptions.builder().concentration(0.4).build());
    }
}
