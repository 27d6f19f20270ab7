package dev.sheaf.miner.measure;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

/**
 * Reads what the consistency stage needs from a Sheaf vocabulary file ({@code *.vocab.json},
 * format {@code sheaf-vocabulary} version 1): facet and concept ids, preferred, alternative and
 * hidden labels in every language, broader links (to find each concept's facet) and the facets'
 * {@code regulatedClaim}. Everything else in the file is the vocabulary module's to validate and is
 * not looked at here.
 *
 * <p>This reader bridges the time until the vocabulary module's own reader is on the class path of
 * this stage; then the command reads {@code VocabularyStore.read(file)} and converts the
 * {@code Vocabulary} (one place), and this class goes.
 */
public final class FeedbackVocabularyFile {
    /** The vocabulary file's format name. */
    public static final String FORMAT = "sheaf-vocabulary";
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private FeedbackVocabularyFile() {
    }

    /**
     * Reads {@code file}.
     *
     * @throws IOException when the file cannot be read, is not JSON, or is not a Sheaf vocabulary
     *                     (the message says where and what to do)
     */
    public static FeedbackVocabulary read(Path file) throws IOException {
        return fromJson(Files.readString(file, StandardCharsets.UTF_8), file.toString());
    }

    /** Parses the JSON text of a vocabulary file; {@code where} names it in messages. */
    public static FeedbackVocabulary fromJson(String json, String where) throws IOException {
        JsonNode root;
        try {
            root = MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            JsonLocation l = e.getLocation();
            throw new IOException(where + (l == null ? "" : ":" + l.getLineNr() + ":" + l.getColumnNr())
                    + ": not valid JSON (" + e.getOriginalMessage() + "); fix the file or check it with 'sheaf check'", e);
        }
        if (root == null || !root.isObject() || !FORMAT.equals(root.path("format").asText(null))) {
            throw new IOException(where + ": expected a Sheaf vocabulary file with \"format\": \"" + FORMAT + "\"; found "
                    + (root != null && root.has("format") ? "\"format\": " + root.get("format") : "no format member"));
        }
        if (root.path("formatVersion").asInt(-1) != 1) {
            throw new IOException(where + ": expected \"formatVersion\": 1, found " + root.get("formatVersion")
                    + "; this version of Sheaf reads version 1");
        }
        String language = root.path("scheme").path("defaultLanguage").asText("en");
        Map<String, JsonNode> facets = new LinkedHashMap<>();
        Map<String, JsonNode> concepts = new LinkedHashMap<>();
        collect(root.get("facets"), "facets", where, facets);
        collect(root.get("concepts"), "concepts", where, concepts);
        Set<String> regulated = new HashSet<>();
        facets.forEach((id, n) -> {
            if (n.path("regulatedClaim").asBoolean(false)) {
                regulated.add(id);
            }
        });
        List<FeedbackConcept> out = new ArrayList<>();
        for (Map.Entry<String, JsonNode> e : facets.entrySet()) {
            out.add(new FeedbackConcept(e.getKey(), display(e.getValue(), language, e.getKey()), e.getKey(), true,
                    labels(e.getValue()), regulated.contains(e.getKey())));
        }
        for (Map.Entry<String, JsonNode> e : concepts.entrySet()) {
            if (facets.containsKey(e.getKey())) {
                throw new IOException(where + ": id " + e.getKey() + " is both a facet and a concept; ids must be unique");
            }
            TreeSet<String> above = facetsAbove(e.getKey(), concepts, facets.keySet());
            boolean claim = above.stream().anyMatch(regulated::contains);
            List<String> broader = new ArrayList<>();
            e.getValue().path("broader").forEach(b -> broader.add(b.asText()));
            out.add(new FeedbackConcept(e.getKey(), display(e.getValue(), language, e.getKey()),
                    above.isEmpty() ? null : above.first(), false, labels(e.getValue()), claim, broader));
        }
        return FeedbackVocabulary.of(out);
    }

    private static void collect(JsonNode list, String key, String where, Map<String, JsonNode> into) throws IOException {
        if (list == null || list.isNull()) {
            return;
        }
        if (!list.isArray()) {
            throw new IOException(where + ": expected \"" + key + "\": [ ... ]; found " + list.getNodeType());
        }
        for (int i = 0; i < list.size(); i++) {
            JsonNode n = list.get(i);
            String id = n.path("id").asText("");
            if (id.isBlank()) {
                throw new IOException(where + ": " + key + "[" + i + "] has no \"id\"; every entry needs one");
            }
            if (into.put(id, n) != null) {
                throw new IOException(where + ": id " + id + " appears twice in \"" + key + "\"; ids must be unique");
            }
        }
    }

    /** Facets reached by walking broader links up from {@code id}. */
    private static TreeSet<String> facetsAbove(String id, Map<String, JsonNode> concepts, Set<String> facets) {
        TreeSet<String> out = new TreeSet<>();
        Set<String> seen = new HashSet<>();
        Deque<String> todo = new ArrayDeque<>();
        todo.add(id);
        while (!todo.isEmpty()) {
            String x = todo.pop();
            if (!seen.add(x)) {
                continue;
            }
            if (facets.contains(x)) {
                out.add(x);
                continue;
            }
            JsonNode n = concepts.get(x);
            if (n != null) {
                for (JsonNode b : n.path("broader")) {
                    todo.add(b.asText());
                }
            }
        }
        return out;
    }

    private static String display(JsonNode n, String language, String id) {
        JsonNode pref = n.path("prefLabel");
        if (pref.has(language)) {
            return pref.get(language).asText();
        }
        Iterator<String> langs = pref.fieldNames();
        return langs.hasNext() ? pref.get(langs.next()).asText() : id;
    }

    private static List<String> labels(JsonNode n) {
        List<String> out = new ArrayList<>();
        n.path("prefLabel").forEach(l -> add(out, l));
        for (String kind : new String[] {"altLabel", "hiddenLabel"}) {
            n.path(kind).forEach(byLanguage -> byLanguage.forEach(l -> add(out, l)));
        }
        return out;
    }

    private static void add(List<String> out, JsonNode label) {
        String t = label.asText("").strip();
        if (!t.isEmpty() && !out.contains(t)) {
            out.add(t);
        }
    }
}
