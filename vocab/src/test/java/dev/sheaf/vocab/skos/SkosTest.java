package dev.sheaf.vocab.skos;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.vocab.CheckReport;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.Finding;
import dev.sheaf.vocab.Fixtures;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Rule;
import dev.sheaf.vocab.Severity;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyChecker;
import dev.sheaf.vocab.VocabularyFormatException;
import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import org.eclipse.rdf4j.model.Model;
import org.eclipse.rdf4j.model.vocabulary.SKOS;
import org.eclipse.rdf4j.rio.RDFFormat;
import org.eclipse.rdf4j.rio.Rio;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class SkosTest {
    private final Vocabulary v = Fixtures.fernhollow();

    @TempDir
    Path dir;

    private static SkosImport roundTrip(Vocabulary v, Skos.Syntax s, String base) throws Exception {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        Skos.write(v, s, out, base);
        return Skos.read(new ByteArrayInputStream(out.toByteArray()), s, "roundtrip");
    }

    private static SkosImport fixture(String name) throws Exception {
        try (InputStream in = SkosTest.class.getResourceAsStream("/skos/" + name)) {
            return Skos.read(in, Skos.Syntax.forFile(Path.of(name)), name);
        }
    }

    @ParameterizedTest
    @EnumSource(Skos.Syntax.class)
    void roundTripLosesNothing(Skos.Syntax syntax) throws Exception {
        SkosImport back = roundTrip(v, syntax, v.scheme().baseIri());
        assertEquals(v, back.vocabulary());
        assertTrue(back.findings().isEmpty(), back.findings().toString());
    }

    @ParameterizedTest
    @EnumSource(Skos.Syntax.class)
    void roundTripKeepsEditsResultsMergesSplitsAndDanglingReferences(Skos.Syntax syntax) throws Exception {
        Vocabulary edited = v.apply(Edit.merge("polyester", "nylon"))
                .apply(Edit.split("zipper", List.of(Label.of("zip")), Label.of("zip")))
                .apply(Edit.delete("toggle"));
        SkosImport back = roundTrip(edited, syntax, edited.scheme().baseIri());
        assertEquals(edited, back.vocabulary());
        assertEquals("zipper", back.vocabulary().concept("zip").orElseThrow().splitFrom());
        assertEquals("nylon", back.vocabulary().resolve("polyester").orElseThrow().id());
    }

    @Test
    void writesTheSameBytesEveryTime() {
        String a = Skos.toString(v, Skos.Syntax.TURTLE, v.scheme().baseIri());
        String b = Skos.toString(Vocabulary.of(v.scheme(), List.copyOf(v.allConcepts()), v.retired(), v.decisions()),
                Skos.Syntax.TURTLE, v.scheme().baseIri());
        assertEquals(a, b);
    }

    @Test
    void writesSchemeTopConceptsLabelsAndBothHierarchyDirections() throws Exception {
        String ttl = Skos.toString(v, Skos.Syntax.TURTLE, "https://shop.example/attr/");
        Model m = Rio.parse(new ByteArrayInputStream(ttl.getBytes(StandardCharsets.UTF_8)), "", RDFFormat.TURTLE);
        var vf = org.eclipse.rdf4j.model.impl.SimpleValueFactory.getInstance();
        var scheme = vf.createIRI("https://shop.example/attr");
        var nylon = vf.createIRI("https://shop.example/attr/nylon");
        var rip = vf.createIRI("https://shop.example/attr/ripstop-nylon");
        var material = vf.createIRI("https://shop.example/attr/material");
        assertTrue(m.contains(scheme, org.eclipse.rdf4j.model.vocabulary.RDF.TYPE, SKOS.CONCEPT_SCHEME));
        assertTrue(m.contains(scheme, SKOS.HAS_TOP_CONCEPT, material));
        assertTrue(m.contains(material, SKOS.TOP_CONCEPT_OF, scheme));
        assertTrue(m.contains(rip, SKOS.BROADER, nylon));
        assertTrue(m.contains(nylon, SKOS.NARROWER, rip));
        assertTrue(m.contains(nylon, SKOS.PREF_LABEL, vf.createLiteral("Nylon", "de")));
        assertTrue(m.contains(rip, SKOS.HIDDEN_LABEL, vf.createLiteral("ripstop nylong", "en")));
        assertTrue(m.contains(vf.createIRI("https://shop.example/attr/waterproof-rating"),
                vf.createIRI(Skos.NAMESPACE, "regulatedClaim"), vf.createLiteral(true)));
        assertEquals(5, m.filter(scheme, SKOS.HAS_TOP_CONCEPT, null).size());
        assertTrue(ttl.contains("@prefix sheaf: <https://sheaf.dev/ns#>"), ttl.substring(0, 400));
    }

    @Test
    void aConfiguredBaseIriIsUsedAndKeptOnImport() throws Exception {
        SkosImport back = roundTrip(v, Skos.Syntax.TURTLE, "https://shop.example/attr#");
        assertEquals("https://shop.example/attr#", back.vocabulary().scheme().baseIri());
        assertEquals(List.copyOf(v.allConcepts()), List.copyOf(back.vocabulary().allConcepts()));
        assertThrows(IllegalArgumentException.class, () -> Skos.toString(v, Skos.Syntax.TURTLE, "https://no-slash.example"));
    }

    @Test
    void exportsAtomicallyToAFile() throws Exception {
        Path f = dir.resolve("fernhollow.ttl");
        Skos.export(v, Skos.Syntax.TURTLE, f, null);
        assertEquals(v, Skos.read(f).vocabulary());
    }

    @ParameterizedTest
    @EnumSource(Skos.Syntax.class)
    void importsAHandWrittenScheme(Skos.Syntax syntax) throws Exception {
        SkosImport imp = fixture(syntax == Skos.Syntax.TURTLE ? "hand-written.ttl" : "hand-written.rdf");
        Vocabulary h = imp.vocabulary();
        assertEquals("https://fernhollow.example/gear/", h.scheme().baseIri());
        assertEquals("scheme", h.scheme().id());
        assertEquals("Fernhollow gear", h.scheme().title());
        assertEquals(List.of("closure"), h.facets().stream().map(Concept::id).toList(), "the top concept is a facet");
        assertEquals("Closure", h.concept("closure").orElseThrow().prefLabels().get("en"), "untagged labels take the default language");
        assertEquals(Set.of("closure"), h.concept("buckle").orElseThrow().broader(), "broader derived from skos:narrower");
        assertEquals(Set.of("zipper"), h.concept("buckle").orElseThrow().related(), "related is symmetric");
        assertEquals("Reißverschluss", h.concept("zipper").orElseThrow().prefLabels().get("de"));
        assertEquals("snap-button", h.concept("snap-button").orElseThrow().id(), "an IRI outside the base gets a new id");
        String notes = imp.findings().toString();
        assertTrue(notes.contains("skos:notation ×1"), notes);
        assertTrue(notes.contains("skos:example ×1"), notes);
        assertTrue(imp.findings().stream().allMatch(f -> f.severity() == Severity.INFO));
        CheckReport r = VocabularyChecker.check(h, imp.findings());
        assertFalse(r.hasErrors(), r.findings().toString());
    }

    // --- W3C SKOS Reference (2009) S14: at most one prefLabel per language tag [mem, corroborated]

    @Test
    void s14TwoPreferredLabelsInOneLanguageAreReportedAndOneIsDemoted() throws Exception {
        SkosImport imp = fixture("s14-two-preferred.ttl");
        List<Finding> f = imp.findings().stream().filter(x -> x.rule() == Rule.TWO_PREFERRED_LABELS).toList();
        assertEquals(1, f.size());
        assertEquals(Severity.ERROR, f.get(0).severity());
        assertEquals(List.of("zipper"), f.get(0).concepts());
        Concept z = imp.vocabulary().concept("zipper").orElseThrow();
        assertEquals("zip", z.prefLabels().get("en"), "the first by text is kept");
        assertTrue(z.altLabels().contains(Label.of("zipper")));
        assertTrue(VocabularyChecker.check(imp.vocabulary(), imp.findings()).hasErrors());
    }

    @Test
    void s14OnePreferredLabelPerLanguagePasses() throws Exception {
        assertTrue(fixture("hand-written.ttl").findings().stream().noneMatch(x -> x.rule() == Rule.TWO_PREFERRED_LABELS));
    }

    // --- S9: skos:ConceptScheme disjoint with skos:Concept [mem, corroborated]

    @Test
    void s9ASchemeThatIsAlsoAConceptIsAnError() throws Exception {
        SkosImport imp = fixture("s9-scheme-is-concept.ttl");
        List<Finding> f = imp.findings().stream().filter(x -> x.rule() == Rule.SCHEME_IS_CONCEPT).toList();
        assertEquals(1, f.size());
        assertEquals("https://fernhollow.example/gear/scheme", f.get(0).subject());
        assertFalse(imp.vocabulary().contains("scheme"), "the scheme is not imported as a concept");
        assertTrue(fixture("hand-written.ttl").findings().stream().noneMatch(x -> x.rule() == Rule.SCHEME_IS_CONCEPT));
    }

    // --- S37: skos:Collection disjoint with skos:Concept and skos:ConceptScheme [mem, corroborated]

    @Test
    void s37ACollectionThatIsAlsoAConceptIsAnError() throws Exception {
        SkosImport imp = fixture("s37-collection-is-concept.ttl");
        assertEquals(1, imp.findings().stream().filter(x -> x.rule() == Rule.COLLECTION_IS_CONCEPT).count());
        assertTrue(fixture("hand-written.ttl").findings().stream().noneMatch(x -> x.rule() == Rule.COLLECTION_IS_CONCEPT));
    }

    @Test
    void turtleSyntaxErrorsCarryLineAndColumn() {
        VocabularyFormatException e = assertThrows(VocabularyFormatException.class, () -> fixture("broken.ttl"));
        // RDF4J's Turtle parser reports the line only (column 0 = unknown)
        assertEquals(7, e.line(), e.getMessage());
        assertTrue(e.getMessage().startsWith("broken.ttl:7: "), e.getMessage());
        assertTrue(e.problem().startsWith("not valid Turtle"), e.problem());
    }

    @Test
    void rdfXmlSyntaxErrorsCarryLineAndColumn() {
        VocabularyFormatException e = assertThrows(VocabularyFormatException.class, () -> fixture("broken.rdf"));
        assertEquals(8, e.line(), e.getMessage());
        assertTrue(e.column() > 0, e.getMessage());
        assertTrue(e.problem().contains("end-tag"), e.problem());
    }

    @Test
    void aFileWithoutAConceptSchemeIsRefusedWithTheReason() {
        VocabularyFormatException e = assertThrows(VocabularyFormatException.class, () -> fixture("no-scheme.ttl"));
        assertTrue(e.problem().contains("skos:ConceptScheme"), e.problem());
    }

    @Test
    void fixtureFolderHoldsTheFiles() throws Exception {
        try (var files = Files.list(Path.of(SkosTest.class.getResource("/skos/README.md").toURI()).getParent())) {
            assertTrue(files.count() >= 8);
        }
    }
}
