package dev.sheaf.vocab;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;

class VocabularyTest {
    private final Vocabulary v = Fixtures.fernhollow();

    @Test
    void separatesFacetsFromValues() {
        assertEquals(List.of("capacity", "closure", "material", "packable", "waterproof-rating"),
                v.facets().stream().map(Concept::id).toList());
        assertEquals(10, v.concepts().size());
        assertTrue(v.concepts().stream().noneMatch(Concept::isFacet));
    }

    @Test
    void findsTheFacetOfANarrowerValue() {
        assertEquals("material", v.facetOf("ripstop-nylon").orElseThrow().id());
        assertEquals("closure", v.facetOf("two-way-zipper").orElseThrow().id());
        assertEquals("material", v.facetOf("material").orElseThrow().id());
        assertEquals(List.of("down", "merino-wool", "nylon", "polyester"),
                v.narrower("material").stream().map(Concept::id).toList());
        assertEquals(List.of("ripstop-nylon"), v.narrower("nylon").stream().map(Concept::id).toList());
        assertEquals(5, v.valuesOf("material").size());
    }

    @Test
    void resolvesMergedIdsThroughTheChain() {
        assertEquals("ripstop-nylon", v.resolve("rip-stop").orElseThrow().id());
        assertEquals("nylon", v.resolve("nylon").orElseThrow().id());
        assertTrue(v.resolve("no-such-id").isEmpty());
    }

    @Test
    void remembersDroppedTermsByNormalisedForm() {
        assertTrue(v.isDropped("free shipping"));
        assertTrue(v.isDropped("Free-Shipping"));
        assertTrue(v.isDropped("  FREE   shipping "));
        assertFalse(v.isDropped("rip stop"), "kept, not dropped");
        assertFalse(v.isDropped("trail ready"), "parked, not dropped");
        assertFalse(v.isDropped("free shippings"), "plural is a different term here");
    }

    @Test
    void normalisesTermsTheSameUnderATurkishLocale() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("tr-TR"));
            // with the Turkish locale, "I".toLowerCase() would be a dotless ı; ROOT folding keeps "i"
            assertEquals("insulated zip", Terms.normalise("INSULATED ZIP"));
            assertTrue(v.isDropped("FREE SHIPPING"));
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void makesFreshIdsThatNeverReuseRetiredOnes() {
        assertEquals("ripstop-nylon-2", v.newId("Ripstop Nylon"));
        assertEquals("rip-stop-2", v.newId("Rip-Stop"));
        assertEquals("cafe-au-lait", v.newId("Café au lait"));
    }

    @Test
    void listsEveryLabelOfAConceptWithItsKind() {
        Concept c = v.concept("ripstop-nylon").orElseThrow();
        assertEquals(List.of(
                new ConceptLabel(LabelKind.PREFERRED, Label.of("ripstop nylon")),
                new ConceptLabel(LabelKind.ALTERNATIVE, Label.of("rip-stop nylon")),
                new ConceptLabel(LabelKind.HIDDEN, Label.of("ripstop nylong"))), c.labels());
        assertEquals(2, v.concept("nylon").orElseThrow().labels("en").size());
        assertEquals(1, v.concept("nylon").orElseThrow().labels("de").size());
    }

    @Test
    void findsTheBucketOfANumber() {
        FacetProperties cap = v.concept("capacity").orElseThrow().facet();
        assertEquals("daypack", cap.bucketFor(29.9).orElseThrow().label());
        assertEquals("weekend", cap.bucketFor(30).orElseThrow().label());
        assertEquals("expedition", cap.bucketFor(50).orElseThrow().label());
        assertTrue(cap.appliesTo("backpacks"));
        assertFalse(cap.appliesTo("tents"));
    }

    @Test
    void rejectsMalformedValuesWithTheRule() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Concept.checkId("rip stop"));
        assertTrue(e.getMessage().contains("letters, digits"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Label.of(" padded"));
        assertThrows(IllegalArgumentException.class, () -> Label.of("two\nlines"));
        assertThrows(IllegalArgumentException.class, () -> Label.of("x", "english"));
        assertThrows(IllegalArgumentException.class, () -> Decision.dropped("x", " "));
        assertThrows(IllegalArgumentException.class, () -> new FacetProperties(ValueKind.TERM, false, null, "kg", null, false));
        assertThrows(IllegalArgumentException.class, () -> FacetProperties.number("kg",
                List.of(new Bucket("a", 0.0, 2.0), new Bucket("b", 1.0, 3.0))));
        assertThrows(IllegalArgumentException.class, () -> Concept.builder("f").prefLabel("F")
                .facet(FacetProperties.terms()).broader("material").build());
        assertEquals("en-gb", Label.of("colour", "en-GB").lang());
    }

    @Test
    void refusesDuplicateIdsAndDecisionsOnTheSameTerm() {
        Concept a = Concept.builder("a").prefLabel("a").build();
        assertThrows(IllegalArgumentException.class, () -> Vocabulary.of(Fixtures.scheme(), List.of(a, a), null, null));
        assertThrows(IllegalArgumentException.class, () -> Vocabulary.of(Fixtures.scheme(), List.of(a),
                List.of(new Retired("a", null, null)), null));
        assertThrows(IllegalArgumentException.class, () -> Vocabulary.of(Fixtures.scheme(), List.of(a), null,
                List.of(Decision.parked("Rip-Stop"), Decision.parked("rip stop"))));
    }
}
