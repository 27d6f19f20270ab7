package dev.sheaf.tests;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The demo vocabulary, built from {@code sample-listings/fernhollow-vocab-source.json} (the
 * generator's own simple form) with the vocabulary API, until the demo ships a
 * {@code fernhollow.vocab.json}. A concept with no broader concept goes under its facet. Facet and
 * concept ids are separate name spaces in the source form ("hood" is both); a facet whose id a
 * concept also has becomes {@code ID-facet} here, so the concept keeps the id judgments use.
 */
final class DemoVocabulary {
    static final Path DEMO = Path.of("..", "sample-listings");

    private DemoVocabulary() {
    }

    static Vocabulary read() throws IOException {
        JsonNode root = new ObjectMapper().readTree(DEMO.resolve("fernhollow-vocab-source.json").toFile());
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
            ValueKind vk = kind.equals("yesno") ? ValueKind.YES_NO : ValueKind.ofWord(kind);
            List<Bucket> buckets = new ArrayList<>();
            for (JsonNode b : f.path("buckets")) {
                buckets.add(new Bucket(b.get("label").asText(), b.get("min").isNull() ? null : b.get("min").asDouble(),
                        b.get("max").isNull() ? null : b.get("max").asDouble()));
            }
            List<String> cats = new ArrayList<>();
            f.path("categories").forEach(c -> cats.add(c.asText()));
            FacetProperties p = new FacetProperties(vk, f.get("multiValued").asBoolean(), new java.util.TreeSet<>(cats),
                    f.hasNonNull("unit") ? f.get("unit").asText() : null, buckets, f.get("regulatedClaim").asBoolean());
            out.add(Concept.builder(facetId.get(f.get("id").asText())).prefLabel(f.get("label").asText()).facet(p).build());
        }
        for (JsonNode c : root.get("concepts")) {
            Concept.Builder b = Concept.builder(c.get("id").asText()).prefLabel(c.get("prefLabel").asText());
            c.path("altLabels").forEach(l -> b.altLabel(l.asText()));
            c.path("hiddenLabels").forEach(l -> b.hiddenLabel(l.asText()));
            c.path("broader").forEach(l -> b.broader(l.asText()));
            c.path("related").forEach(l -> b.related(l.asText()));
            if (!c.path("broader").elements().hasNext()) {
                b.broader(facetId.get(c.get("facet").asText()));
            }
            out.add(b.build());
        }
        return Vocabulary.of(SchemeInfo.of("fernhollow", root.get("name").asText()), out, List.of(), List.of());
    }
}
