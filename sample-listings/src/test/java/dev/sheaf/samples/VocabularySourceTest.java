package dev.sheaf.samples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

class VocabularySourceTest {
    private static JsonNode vocab() throws IOException {
        return new ObjectMapper().readTree(VocabularySource.json());
    }

    @Test
    void hasAboutTwentyFacetsAndOneHundredConcepts() throws IOException {
        JsonNode v = vocab();
        assertEquals("fernhollow-vocab-source", v.get("format").asText());
        int facets = v.get("facets").size();
        int concepts = v.get("concepts").size();
        assertTrue(facets >= 12 && facets <= 22, "facets: " + facets);
        assertTrue(concepts >= 80 && concepts <= 150, "concepts: " + concepts);
    }

    @Test
    void everyReferenceResolvesAndNumericFacetsHaveUnitsAndOrderedBuckets() throws IOException {
        JsonNode v = vocab();
        Set<String> categories = new HashSet<>();
        v.get("categories").forEach(c -> categories.add(c.get("id").asText()));
        Map<String, JsonNode> facets = new HashMap<>();
        for (JsonNode f : v.get("facets")) {
            facets.put(f.get("id").asText(), f);
            f.get("categories").forEach(c -> assertTrue(categories.contains(c.asText()), f + " names category " + c));
            String kind = f.get("valueKind").asText();
            assertTrue(List.of("term", "number", "yesno").contains(kind));
            if (kind.equals("number")) {
                assertTrue(f.has("unit") && f.get("buckets").size() >= 3, f.get("id").asText());
                JsonNode b = f.get("buckets");
                assertTrue(b.get(b.size() - 1).get("max").isNull(), f.get("id").asText() + ": the last bucket is open above");
                for (int i = 1; i < b.size(); i++) {
                    // half-open [min, max), ascending and adjacent
                    assertEquals(b.get(i - 1).get("max").asDouble(), b.get(i).get("min").asDouble(), f.get("id").asText() + " bucket " + i);
                }
            }
        }
        Set<String> ids = new HashSet<>();
        v.get("concepts").forEach(c -> assertTrue(ids.add(c.get("id").asText()), "unique id " + c.get("id")));
        for (JsonNode c : v.get("concepts")) {
            assertTrue(facets.containsKey(c.get("facet").asText()));
            c.get("broader").forEach(b -> assertTrue(ids.contains(b.asText()), c.get("id") + " broader " + b));
            c.get("related").forEach(b -> assertTrue(ids.contains(b.asText()), c.get("id") + " related " + b));
        }
    }

    @Test
    void marksTheRegulatedClaimFacets() throws IOException {
        Set<String> regulated = new HashSet<>();
        for (JsonNode f : vocab().get("facets")) {
            if (f.get("regulatedClaim").asBoolean()) {
                regulated.add(f.get("id").asText());
            }
        }
        assertEquals(Set.of("waterproof-rating", "flame-resistance", "uv-protection", "child-safety", "fibre-content"), regulated);
    }

    @Test
    void hasAPolyhierarchyAndHiddenLabelsForThePlantedMisspellings() throws IOException {
        JsonNode v = vocab();
        boolean poly = false;
        Set<String> hidden = new HashSet<>();
        for (JsonNode c : v.get("concepts")) {
            poly |= c.get("broader").size() >= 2;
            c.get("hiddenLabels").forEach(h -> hidden.add(h.asText()));
        }
        assertTrue(poly, "at least one concept has two broader concepts");
        for (String typo : List.of("waterproff", "breatheable", "zippper", "aluminim", "vestibulle", "packible", "headlmap", "lightwieght")) {
            assertTrue(hidden.contains(typo), "hidden label " + typo);
        }
    }

    @Test
    void labelsOfAConceptArePairwiseDistinct() throws IOException {
        for (JsonNode c : vocab().get("concepts")) {
            Set<String> seen = new HashSet<>();
            seen.add(c.get("prefLabel").asText().toLowerCase(java.util.Locale.ROOT));
            for (String kind : List.of("altLabels", "hiddenLabels")) {
                c.get(kind).forEach(l -> assertTrue(seen.add(l.asText().toLowerCase(java.util.Locale.ROOT)), c.get("id") + " repeats " + l));
            }
            assertFalse(c.get("prefLabel").asText().isBlank());
        }
    }
}
