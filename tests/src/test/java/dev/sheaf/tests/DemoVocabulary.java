package dev.sheaf.tests;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.VocabularyStore;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Turns the demo's {@code fernhollow-vocab-source.json} (the generator's own simple form) into a
 * {@link Vocabulary}, so the label and coverage stages can run on the demo catalog with its own
 * vocabulary. A concept without broader concepts is put directly under its facet. The source keeps
 * facet and concept ids apart; one vocabulary has one id space, so a facet whose id is also a
 * concept's ("hood") becomes {@code <id>-facet}. Two units are renamed to the symbols
 * {@code dev.sheaf.miner.text.Units} reads the values in: fill power's "cuin/oz" is "FP", and a
 * waterproof rating's "mm" is a water column, "mm H2O" (a length in mm would not convert to it).
 *
 * <p>{@code main(SOURCE, TARGET)} writes the result as a vocabulary file.
 */
final class DemoVocabulary {
    /** The demo workspace, seen from the tests module. */
    static final Path DEMO = Path.of("..", "sample-listings");

    private DemoVocabulary() {
    }

    /** The demo vocabulary read from the demo workspace's source form. */
    static Vocabulary read() throws IOException {
        return read(DEMO.resolve("fernhollow-vocab-source.json"));
    }

    static Vocabulary read(Path source) throws IOException {
        JsonNode root = new ObjectMapper().readTree(source.toFile());
        String lang = root.path("language").asText("en");
        List<Concept> out = new ArrayList<>();
        java.util.Set<String> conceptIds = new java.util.HashSet<>();
        root.get("concepts").forEach(c -> conceptIds.add(c.get("id").asText()));
        java.util.Map<String, String> facetId = new java.util.HashMap<>();
        for (JsonNode f : root.get("facets")) {
            String id = f.get("id").asText();
            facetId.put(id, conceptIds.contains(id) ? id + "-facet" : id);
        }
        for (JsonNode f : root.get("facets")) {
            String kind = f.get("valueKind").asText();
            FacetProperties p;
            if (kind.equals("number")) {
                List<Bucket> buckets = new ArrayList<>();
                for (JsonNode b : f.path("buckets")) {
                    buckets.add(new Bucket(b.get("label").asText(), b.get("min").isNull() ? null : b.get("min").asDouble(),
                            b.get("max").isNull() ? null : b.get("max").asDouble()));
                }
                String unit = f.path("unit").isMissingNode() ? null : f.get("unit").asText();
                if ("cuin/oz".equals(unit)) {
                    unit = "FP";
                } else if ("mm".equals(unit) && f.get("id").asText().contains("waterproof")) {
                    unit = "mm H2O";
                }
                p = FacetProperties.number(unit, buckets);
            } else if (kind.equals("yesno") || kind.equals("yes-no")) {
                p = FacetProperties.yesNo();
            } else {
                p = FacetProperties.terms();
            }
            List<String> cats = new ArrayList<>();
            f.path("categories").forEach(c -> cats.add(c.asText()));
            p = p.withMultiValued(f.path("multiValued").asBoolean(false)).withCategories(cats)
                    .withRegulatedClaim(f.path("regulatedClaim").asBoolean(false));
            Concept.Builder b = Concept.builder(facetId.get(f.get("id").asText())).prefLabel(f.get("label").asText()).facet(p);
            f.path("altLabels").forEach(a -> b.altLabel(a.asText()));
            if (f.hasNonNull("scopeNote")) {
                b.scopeNote(lang, f.get("scopeNote").asText());
            }
            out.add(b.build());
        }
        for (JsonNode c : root.get("concepts")) {
            Concept.Builder b = Concept.builder(c.get("id").asText()).prefLabel(c.get("prefLabel").asText());
            c.path("altLabels").forEach(a -> b.altLabel(a.asText()));
            c.path("hiddenLabels").forEach(a -> b.hiddenLabel(a.asText()));
            c.path("related").forEach(a -> b.related(a.asText()));
            if (c.path("broader").isEmpty()) {
                b.broader(facetId.get(c.get("facet").asText()));
            } else {
                c.get("broader").forEach(a -> b.broader(a.asText()));
            }
            if (c.hasNonNull("scopeNote")) {
                b.scopeNote(lang, c.get("scopeNote").asText());
            }
            out.add(b.build());
        }
        return Vocabulary.of(SchemeInfo.of("fernhollow", root.path("name").asText("Fernhollow")), out, List.of(), List.of());
    }

    public static void main(String[] args) throws IOException {
        VocabularyStore.write(Path.of(args[1]), read(Path.of(args[0])));
    }
}
