package dev.sheaf.miner.measure;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Catalog facts for grounding, read from the labeling stage's {@code assignments.jsonl}: one JSON
 * object per line and listing,
 * <pre>{@code
 * {"listingId": "FH-000123", "category": "sleeping-bags",
 *  "assignments": [
 *    {"conceptId": "hood", "facetId": "hood", "polarity": "stated", ...},
 *    {"conceptId": "pit-zips", "polarity": "negated", ...},
 *    {"conceptId": "temperature-rating", "polarity": "stated", "value": -5.0, "valueMax": -5.0, "unit": "°C"}]}
 * }</pre>
 * (the member names of the labeler's {@code Assignments} and {@code Assignment} records). A stated
 * concept is carried; a concept with only negated occurrences is lacked; a number is the facet's
 * value (a range: its midpoint). Members not named here are ignored. A line that cannot be read is a
 * {@link Line problem} with its line number and is skipped; reading goes on.
 *
 * @param catalog  the facts
 * @param listings listings read
 * @param problems lines skipped, in file order
 */
public record GroundingAssignments(GroundingCatalog catalog, int listings, List<Line> problems) {

    /** A line left out, and why. */
    public record Line(String source, long line, String reason) {
    }

    public GroundingAssignments {
        java.util.Objects.requireNonNull(catalog, "catalog");
        problems = List.copyOf(problems);
    }

    private static final ObjectMapper MAPPER = new ObjectMapper();

    /** Reads {@code file} (UTF-8 JSON Lines); problems name it {@code displayName}. */
    public static GroundingAssignments read(Path file, String displayName) throws IOException {
        List<GroundingListing> listings = new ArrayList<>();
        List<Line> problems = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String text;
            long no = 0;
            while ((text = in.readLine()) != null) {
                no++;
                if (text.isBlank()) {
                    continue;
                }
                try {
                    GroundingListing l = listing(MAPPER.readTree(text));
                    if (!seen.add(l.id())) {
                        problems.add(new Line(displayName, no, "listing " + l.id() + " appears again; the first line is kept"));
                        continue;
                    }
                    listings.add(l);
                } catch (JsonProcessingException e) {
                    problems.add(new Line(displayName, no, "not valid JSON (" + e.getOriginalMessage() + "); line skipped"));
                } catch (IllegalArgumentException e) {
                    problems.add(new Line(displayName, no, e.getMessage() + "; line skipped"));
                }
            }
        }
        return new GroundingAssignments(GroundingCatalog.of(listings), listings.size(), problems);
    }

    private static GroundingListing listing(JsonNode n) {
        if (n == null || !n.isObject()) {
            throw new IllegalArgumentException("expected one JSON object per line");
        }
        String id = text(n, "listingId", "listing", "id");
        if (id == null) {
            throw new IllegalArgumentException("expected \"listingId\": the listing's id; found none");
        }
        String category = text(n, "category");
        Set<String> stated = new HashSet<>();
        Set<String> negated = new HashSet<>();
        Map<String, Double> numbers = new HashMap<>();
        JsonNode list = n.get("assignments");
        if (list != null && !list.isArray()) {
            throw new IllegalArgumentException("listing " + id + ": expected \"assignments\": [ ... ]");
        }
        for (JsonNode a : list == null ? List.<JsonNode>of() : list) {
            String concept = text(a, "conceptId", "concept");
            if (concept == null) {
                throw new IllegalArgumentException("listing " + id + ": an assignment has no \"conceptId\"");
            }
            JsonNode value = a.get("value");
            if (value != null && value.isNumber()) {
                JsonNode max = a.get("valueMax");
                double v = value.asDouble();
                double hi = max != null && max.isNumber() ? max.asDouble() : v;
                numbers.put(concept, (v + hi) / 2);
                continue;
            }
            if ("negated".equals(text(a, "polarity"))) {
                negated.add(concept);
            } else {
                stated.add(concept);
            }
        }
        negated.removeAll(stated);
        return new GroundingListing(id, category, stated, negated, numbers);
    }

    private static String text(JsonNode n, String... names) {
        for (String name : names) {
            JsonNode v = n.get(name);
            if (v != null && v.isTextual() && !v.asText().isBlank()) {
                return v.asText();
            }
        }
        return null;
    }
}
