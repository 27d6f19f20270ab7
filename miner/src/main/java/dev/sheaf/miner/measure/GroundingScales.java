package dev.sheaf.miner.measure;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * Which gradable words speak of which number facet, and which way: the data that lets a
 * comparative mention ("lighter", "warmer", "roomier") be checked against catalog values. It is
 * data, never code, because the facets and their directions belong to each shop's vocabulary.
 *
 * <p>File format ({@value #FORMAT}, version {@value #FORMAT_VERSION}); unknown keys are rejected by name:
 * <pre>{@code
 * {
 *   "format": "sheaf-scales",
 *   "formatVersion": 1,
 *   "note": "optional: what these scales are for",
 *   "scales": [
 *     { "facet": "weight", "direction": "less", "words": ["light"], "note": "lighter = weighs less" },
 *     { "facet": "weight", "direction": "more", "words": ["heavy"] },
 *     { "facet": "comfort-temperature", "direction": "less", "words": ["warm"],
 *       "note": "a warmer bag is rated for a lower temperature" },
 *     { "facet": "capacity", "direction": "more", "concepts": ["roomy"] }
 *   ]
 * }
 * }</pre>
 * {@code words} are base forms (the analysis also finds "lighter", "lightest", "lightish");
 * {@code concepts} are vocabulary concept ids. A word or concept may stand in one entry only.
 *
 * <p>Where scales come from, first found wins ({@link #first}): the vocabulary's own scales when it
 * carries them, then a file given by the user ({@code --scales}), then {@value #WORKSPACE_FILE} in
 * the workspace folder, then the bundled example {@link #bundledExample()}, which fits the
 * Fernhollow demo catalog only and says so in every report that uses it.
 */
public final class GroundingScales {
    public static final String FORMAT = "sheaf-scales";
    public static final int FORMAT_VERSION = 1;
    /** The file a workspace may hold beside workspace.json. */
    public static final String WORKSPACE_FILE = "scales.json";
    /** Where the bundled example lives on the class path. */
    public static final String EXAMPLE_RESOURCE = "/dev/sheaf/miner/measure/example-scales.json";

    private static final Set<String> ROOT_KEYS = Set.of("format", "formatVersion", "note", "scales");
    private static final Set<String> ENTRY_KEYS = Set.of("facet", "direction", "words", "concepts", "note");
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private final String source;
    private final List<GroundingScale> scales;
    private final Map<String, GroundingScale> byWord = new HashMap<>();
    private final Map<String, GroundingScale> byConcept = new HashMap<>();

    private GroundingScales(String source, List<GroundingScale> scales) {
        this.source = Objects.requireNonNull(source, "source");
        this.scales = List.copyOf(scales);
        for (GroundingScale s : this.scales) {
            for (String w : s.words()) {
                String n = FeedbackVocabulary.normalise(w);
                if (n.isEmpty()) {
                    throw new IllegalArgumentException("scale for facet " + s.facet() + " lists a word with no letters: '" + w + "'");
                }
                GroundingScale prev = byWord.put(n, s);
                if (prev != null) {
                    throw new IllegalArgumentException("the word '" + n + "' is on two scales (" + describe(prev) + " and "
                            + describe(s) + "); keep it on one");
                }
            }
            for (String c : s.concepts()) {
                GroundingScale prev = byConcept.put(c, s);
                if (prev != null) {
                    throw new IllegalArgumentException("concept " + c + " is on two scales (" + describe(prev) + " and "
                            + describe(s) + "); keep it on one");
                }
            }
        }
    }

    /** Scales made in code; {@code source} names them in reports. */
    public static GroundingScales of(String source, List<GroundingScale> scales) {
        return new GroundingScales(source, scales);
    }

    /** No scales: comparative mentions stay unchecked. */
    public static GroundingScales none() {
        return new GroundingScales("none", List.of());
    }

    /** Reads a scales file. */
    public static GroundingScales read(Path file) throws IOException {
        return fromJson(Files.readString(file, StandardCharsets.UTF_8), file.toString());
    }

    /**
     * The bundled example for the Fernhollow demo catalog; its source says it is an example, so a
     * report built on it never passes for a shop's own scales.
     */
    public static GroundingScales bundledExample() {
        try (InputStream in = GroundingScales.class.getResourceAsStream(EXAMPLE_RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("the bundled scales " + EXAMPLE_RESOURCE + " are missing from the class path");
            }
            GroundingScales s = fromJson(new String(in.readAllBytes(), StandardCharsets.UTF_8), "bundled example");
            return new GroundingScales("bundled example for the demo catalog (give your own with --scales)", s.scales);
        } catch (IOException e) {
            throw new IllegalStateException("cannot read the bundled scales " + EXAMPLE_RESOURCE, e);
        }
    }

    /** The first candidate that holds at least one scale, else {@link #none()}; null candidates are skipped. */
    public static GroundingScales first(GroundingScales... inPrecedenceOrder) {
        for (GroundingScales s : inPrecedenceOrder) {
            if (s != null && !s.isEmpty()) {
                return s;
            }
        }
        return none();
    }

    /**
     * Parses the JSON text of a scales file.
     *
     * @throws IOException whose message names the place ({@code where}, line and column or entry) and the fix
     */
    public static GroundingScales fromJson(String json, String where) throws IOException {
        JsonNode root;
        try {
            root = MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            JsonLocation l = e.getLocation();
            throw new IOException(where + (l == null ? "" : ":" + l.getLineNr() + ":" + l.getColumnNr())
                    + ": not valid JSON (" + e.getOriginalMessage() + "); fix the file", e);
        }
        if (root == null || !root.isObject()) {
            throw new IOException(where + ": expected one JSON object with \"format\": \"" + FORMAT + "\"; found "
                    + (root == null ? "nothing" : root.getNodeType().name().toLowerCase(Locale.ROOT)));
        }
        unknownKeys(root, ROOT_KEYS, where);
        if (!FORMAT.equals(text(root, "format"))) {
            throw new IOException(where + ": expected \"format\": \"" + FORMAT + "\", found " + root.get("format")
                    + "; this is not a Sheaf scales file");
        }
        JsonNode v = root.get("formatVersion");
        if (v == null || !v.canConvertToInt() || v.asInt() != FORMAT_VERSION) {
            throw new IOException(where + ": expected \"formatVersion\": " + FORMAT_VERSION + ", found " + v
                    + "; this version of Sheaf reads version " + FORMAT_VERSION);
        }
        JsonNode list = root.get("scales");
        if (list == null || !list.isArray()) {
            throw new IOException(where + ": expected \"scales\": [ ... ], a list of scale entries; found " + list);
        }
        List<GroundingScale> out = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            JsonNode e = list.get(i);
            String at = where + ": scales[" + i + "]";
            if (!e.isObject()) {
                throw new IOException(at + ": expected an object { \"facet\": ..., \"direction\": ..., \"words\": [...] }; found " + e);
            }
            unknownKeys(e, ENTRY_KEYS, at);
            String facet = text(e, "facet");
            if (facet == null || facet.isBlank()) {
                throw new IOException(at + ": expected \"facet\": the id of a number facet, e.g. \"weight\"; found " + e.get("facet"));
            }
            String dir = text(e, "direction");
            Direction d = "more".equals(dir) ? Direction.MORE : "less".equals(dir) ? Direction.LESS : null;
            if (d == null) {
                throw new IOException(at + ": expected \"direction\": \"more\" or \"less\" (does more of the word mean a larger "
                        + "value of " + facet + "?); found " + e.get("direction"));
            }
            List<String> words = strings(e, "words", at);
            List<String> concepts = strings(e, "concepts", at);
            String note = e.has("note") ? text(e, "note") : "";
            if (note == null) {
                throw new IOException(at + ": expected \"note\" to be text; found " + e.get("note"));
            }
            try {
                out.add(new GroundingScale(facet.strip(), d, words, concepts, note));
            } catch (IllegalArgumentException ex) {
                throw new IOException(at + ": " + ex.getMessage(), ex);
            }
        }
        try {
            return new GroundingScales(where, out);
        } catch (IllegalArgumentException ex) {
            throw new IOException(where + ": " + ex.getMessage(), ex);
        }
    }

    private static void unknownKeys(JsonNode o, Set<String> known, String where) throws IOException {
        for (Iterator<String> it = o.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!known.contains(k)) {
                throw new IOException(where + ": unknown key \"" + k + "\"; expected one of " + new java.util.TreeSet<>(known));
            }
        }
    }

    private static String text(JsonNode o, String key) {
        JsonNode n = o.get(key);
        return n != null && n.isTextual() ? n.asText() : null;
    }

    private static List<String> strings(JsonNode o, String key, String where) throws IOException {
        JsonNode n = o.get(key);
        if (n == null) {
            return List.of();
        }
        if (!n.isArray()) {
            throw new IOException(where + ": expected \"" + key + "\": [\"...\"], a list of text; found " + n);
        }
        List<String> out = new ArrayList<>();
        for (JsonNode x : n) {
            if (!x.isTextual() || x.asText().isBlank()) {
                throw new IOException(where + ": \"" + key + "\" should hold non-blank text only; found " + x);
            }
            out.add(x.asText().strip());
        }
        return out;
    }

    private static String describe(GroundingScale s) {
        return s.facet() + " " + s.direction().name().toLowerCase(Locale.ROOT);
    }

    /** Where these scales came from (a path, "bundled example ...", "vocabulary", "none"). */
    public String source() {
        return source;
    }

    public List<GroundingScale> scales() {
        return scales;
    }

    public boolean isEmpty() {
        return scales.isEmpty();
    }

    /** The scale a word (any spelling; normalised here) stands on. */
    public Optional<GroundingScale> forWord(String word) {
        return Optional.ofNullable(byWord.get(FeedbackVocabulary.normalise(word)));
    }

    /** The scale a concept stands on. */
    public Optional<GroundingScale> forConcept(String conceptId) {
        return Optional.ofNullable(byConcept.get(conceptId));
    }

    /** Every scale word in normal form. */
    public Set<String> words() {
        return Set.copyOf(byWord.keySet());
    }

    @Override
    public String toString() {
        return "GroundingScales[" + source + ", " + scales.size() + " scales]";
    }
}
