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
 * {"id": "FH-000123", "category": "sleeping-bags", ...,
 *  "concepts": [
 *    {"concept": "hood", "facet": "hood", "polarity": "stated", ...},
 *    {"concept": "pit-zips", "facet": "features", "polarity": "negated", ...},
 *    {"concept": "temperature-rating", "facet": "temperature-rating", "polarity": "stated",
 *     "value": -5.0, "valueMax": -5.0, "unit": "°C", ...}]}
 * }</pre>
 * A stated concept is carried, and so are the concepts above it in the vocabulary (a listing with
 * a helmet-compatible hood has a hood); a concept with only negated occurrences is lacked; a number
 * is the facet's value in the facet's unit (a range: its midpoint). Members not named here are
 * ignored. A line that cannot be read is a {@link Line problem} with its line number and is
 * skipped; reading goes on.
 *
 * <p>Bridges the time until the labeling stage's own reader ({@code AssignmentsJsonl.read}, which
 * also resolves ids merged away) is on this stage's class path.
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

    /** Reads {@code file} (UTF-8 JSON Lines) with no hierarchy; problems name it {@code displayName}. */
    public static GroundingAssignments read(Path file, String displayName) throws IOException {
        return read(file, displayName, FeedbackVocabulary.empty());
    }

    /** Reads {@code file}; a stated concept also carries its ancestors in {@code vocabulary}. */
    public static GroundingAssignments read(Path file, String displayName, FeedbackVocabulary vocabulary) throws IOException {
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
                    GroundingListing l = listing(MAPPER.readTree(text), vocabulary);
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

    private static GroundingListing listing(JsonNode n, FeedbackVocabulary vocabulary) {
        if (n == null || !n.isObject()) {
            throw new IllegalArgumentException("expected one JSON object per line");
        }
        String id = text(n, "id");
        if (id == null) {
            throw new IllegalArgumentException("expected \"id\": the listing's id; found none");
        }
        String category = text(n, "category");
        Set<String> stated = new HashSet<>();
        Set<String> negated = new HashSet<>();
        Map<String, Double> numbers = new HashMap<>();
        JsonNode list = n.get("concepts");
        if (list != null && !list.isArray()) {
            throw new IllegalArgumentException("listing " + id + ": expected \"concepts\": [ ... ]");
        }
        for (JsonNode a : list == null ? List.<JsonNode>of() : list) {
            String concept = text(a, "concept");
            if (concept == null) {
                throw new IllegalArgumentException("listing " + id + ": an entry of \"concepts\" has no \"concept\"");
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
        for (String c : List.copyOf(stated)) {
            stated.addAll(vocabulary.ancestors(c));
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
