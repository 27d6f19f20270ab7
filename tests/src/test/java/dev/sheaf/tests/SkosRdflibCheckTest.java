package dev.sheaf.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.skos.Skos;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Our SKOS export parsed by a second, independent RDF parser: Debian's python3-rdflib through
 * /usr/bin/python3 (CHECKS.md, "Vocabulary standards": SKOS exports are parsed back by a second,
 * independent RDF parser). The counts it finds must equal what the vocabulary holds, and the
 * graph must show broader/narrower reciprocity and topConceptOf/hasTopConcept agreement.
 * Skips when rdflib is missing, unless SHEAF_REQUIRE_REFERENCES=1 (CI), where it fails.
 */
class SkosRdflibCheckTest {
    private static final String PYTHON = System.getenv().getOrDefault("SHEAF_PYTHON", "/usr/bin/python3");
    private static final boolean REQUIRED = "1".equals(System.getenv("SHEAF_REQUIRE_REFERENCES"));

    private static final String SCRIPT = String.join("\n",
            "import json, sys",
            "from collections import Counter",
            "from rdflib import Graph, RDF, Namespace",
            "SKOS = Namespace('http://www.w3.org/2004/02/skos/core#')",
            "g = Graph()",
            "g.parse(sys.argv[1], format=sys.argv[2])",
            "concepts = set(g.subjects(RDF.type, SKOS.Concept))",
            "schemes = set(g.subjects(RDF.type, SKOS.ConceptScheme))",
            "def labels(p):",
            "    return [(s, o) for s, o in g.subject_objects(p) if s in concepts]",
            "pref, alt, hidden = labels(SKOS.prefLabel), labels(SKOS.altLabel), labels(SKOS.hiddenLabel)",
            "per_lang = Counter(o.language for s, o in pref)",
            "per_concept_lang = Counter((s, o.language) for s, o in pref)",
            "broader = set(g.subject_objects(SKOS.broader))",
            "narrower = set(g.subject_objects(SKOS.narrower))",
            "top_of = set(s for s, o in g.subject_objects(SKOS.topConceptOf))",
            "has_top = set(o for s, o in g.subject_objects(SKOS.hasTopConcept))",
            "kinds = [set(pref), set(alt), set(hidden)]",
            "overlap = len(kinds[0] & kinds[1]) + len(kinds[0] & kinds[2]) + len(kinds[1] & kinds[2])",
            "print(json.dumps({",
            "  'triples': len(g), 'schemes': len(schemes), 'concepts': len(concepts),",
            "  'prefLabels': len(pref), 'altLabels': len(alt), 'hiddenLabels': len(hidden),",
            "  'prefLabelsPerLanguage': dict(per_lang),",
            "  'conceptsWithTwoPrefLabelsInOneLanguage': sum(1 for n in per_concept_lang.values() if n > 1),",
            "  'untaggedLabels': sum(1 for s, o in pref + alt + hidden if not o.language),",
            "  'broader': len(broader), 'narrower': len(narrower),",
            "  'broaderWithoutNarrower': len([1 for c, b in broader if (b, c) not in narrower]),",
            "  'narrowerWithoutBroader': len([1 for b, c in narrower if (c, b) not in broader]),",
            "  'topConceptOf': len(top_of), 'hasTopConcept': len(has_top),",
            "  'topConceptsAgree': top_of == has_top,",
            "  'related': len(set(g.subject_objects(SKOS.related))),",
            "  'labelKindOverlaps': overlap,",
            "}))");

    @TempDir
    Path dir;

    @BeforeAll
    static void needsRdflib() throws Exception {
        boolean available;
        try {
            Process p = new ProcessBuilder(PYTHON, "-c", "import rdflib").redirectErrorStream(true).start();
            available = p.waitFor(60, TimeUnit.SECONDS) && p.exitValue() == 0;
        } catch (IOException e) {
            available = false;
        }
        if (!available && REQUIRED) {
            fail("SHEAF_REQUIRE_REFERENCES=1 but " + PYTHON + " cannot import rdflib; install python3-rdflib (apt-get install -y python3-rdflib)");
        }
        Assumptions.assumeTrue(available, PYTHON + " with rdflib (Debian python3-rdflib) is not installed; skipping");
    }

    /** Invented Fernhollow Outfitters vocabulary with polyhierarchy, two languages, all label kinds, a merge and a split. */
    static Vocabulary vocabulary() {
        List<Concept> c = new ArrayList<>();
        c.add(Concept.builder("material").prefLabel("Material").prefLabel(Label.of("Material", "de"))
                .facet(FacetProperties.terms().withMultiValued(true)).build());
        c.add(Concept.builder("insulation").prefLabel("Insulation").prefLabel(Label.of("Isolierung", "de"))
                .facet(FacetProperties.terms()).build());
        c.add(Concept.builder("capacity").prefLabel("Capacity").facet(FacetProperties.number("L", List.of())).build());
        c.add(Concept.builder("nylon").prefLabel("nylon").prefLabel(Label.of("Nylon", "de")).altLabel("polyamide")
                .broader("material").build());
        c.add(Concept.builder("ripstop-nylon").prefLabel("ripstop nylon").altLabel("rip-stop nylon")
                .hiddenLabel("ripstop nylong").broader("nylon").build());
        c.add(Concept.builder("polyester").prefLabel("polyester").broader("material").build());
        c.add(Concept.builder("down").prefLabel("down").prefLabel(Label.of("Daune", "de")).altLabel("down fill")
                .broader("material", "insulation").related("synthetic-fill").build());
        c.add(Concept.builder("synthetic-fill").prefLabel("synthetic fill").altLabel("synthetic insulation")
                .broader("insulation").related("down").build());
        c.add(Concept.builder("merino-wool").prefLabel("merino wool").altLabel("merino").broader("material").build());
        Vocabulary v = Vocabulary.of(new SchemeInfo("fernhollow", new TreeMap<>(Map.of("en", "Fernhollow attributes")),
                "https://fernhollow.example/vocab/", "en"), c, List.of(), List.of(Decision.dropped("free shipping", "not an attribute")));
        return v.apply(Edit.merge("polyester", "nylon"))
                .apply(Edit.split("merino-wool", List.of(Label.of("merino")), Label.of("merino")));
    }

    private JsonNode rdflib(Path file, String format) throws Exception {
        Path script = dir.resolve("count.py");
        Files.writeString(script, SCRIPT, StandardCharsets.UTF_8);
        Process p = new ProcessBuilder(PYTHON, script.toString(), file.toString(), format).redirectErrorStream(false).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "rdflib timed out");
        assertEquals(0, p.exitValue(), "rdflib could not parse our export: " + err);
        return new ObjectMapper().readTree(out);
    }

    @ParameterizedTest
    @EnumSource(Skos.Syntax.class)
    void rdflibReadsTheCountsTheVocabularyHolds(Skos.Syntax syntax) throws Exception {
        Vocabulary v = vocabulary();
        Path f = dir.resolve(syntax == Skos.Syntax.TURTLE ? "fernhollow.ttl" : "fernhollow.rdf");
        Skos.export(v, syntax, f, null);
        JsonNode r = rdflib(f, syntax == Skos.Syntax.TURTLE ? "turtle" : "xml");

        int pref = 0;
        int alt = 0;
        int hidden = 0;
        int broader = 0;
        int related = 0;
        Map<String, Integer> perLang = new TreeMap<>();
        for (Concept c : v.allConcepts()) {
            pref += c.prefLabels().size();
            alt += c.altLabels().size();
            hidden += c.hiddenLabels().size();
            broader += c.broader().size();
            related += c.related().size();
            c.prefLabels().keySet().forEach(l -> perLang.merge(l, 1, Integer::sum));
        }
        assertEquals(1, r.get("schemes").asInt());
        assertEquals(v.size(), r.get("concepts").asInt(), "every live concept, facets included; retired ids are not concepts");
        assertEquals(pref, r.get("prefLabels").asInt());
        assertEquals(alt, r.get("altLabels").asInt());
        assertEquals(hidden, r.get("hiddenLabels").asInt());
        Map<String, Integer> seen = new TreeMap<>();
        r.get("prefLabelsPerLanguage").fields().forEachRemaining(e -> seen.put(e.getKey(), e.getValue().asInt()));
        assertEquals(perLang, seen);
        // W3C SKOS Reference (2009) S14 and S13 as seen by rdflib [mem, corroborated]
        assertEquals(0, r.get("conceptsWithTwoPrefLabelsInOneLanguage").asInt());
        assertEquals(0, r.get("labelKindOverlaps").asInt());
        assertEquals(0, r.get("untaggedLabels").asInt(), "every label carries its language tag");
        // broader and narrower both written, each the inverse of the other
        assertEquals(broader, r.get("broader").asInt());
        assertEquals(broader, r.get("narrower").asInt());
        assertEquals(0, r.get("broaderWithoutNarrower").asInt());
        assertEquals(0, r.get("narrowerWithoutBroader").asInt());
        assertEquals(v.facets().size(), r.get("topConceptOf").asInt());
        assertEquals(v.facets().size(), r.get("hasTopConcept").asInt());
        assertTrue(r.get("topConceptsAgree").asBoolean());
        assertEquals(related, r.get("related").asInt());
    }

    @Test
    void theFixtureIsNotTrivial() {
        Vocabulary v = vocabulary();
        assertTrue(v.facets().size() >= 3 && v.concepts().size() >= 5);
        assertTrue(v.retired().size() == 1 && v.concept("merino").isPresent(), "holds a merge and a split");
        assertEquals(2, v.concept("down").orElseThrow().broader().size(), "holds polyhierarchy");
    }
}
