package dev.sheaf.vocab.store;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.core.util.Separators;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.exc.InvalidFormatException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import com.fasterxml.jackson.databind.exc.UnrecognizedPropertyException;
import com.fasterxml.jackson.databind.exc.ValueInstantiationException;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Mapping;
import dev.sheaf.vocab.MatchKind;
import dev.sheaf.vocab.Patch;
import dev.sheaf.vocab.Provenance;
import dev.sheaf.vocab.Retired;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Our vocabulary JSON (docs/vocab-format.md): written pretty, with a fixed key order and every
 * list sorted, so a version-control diff shows exactly what changed; read strictly (unknown keys,
 * duplicate keys and trailing content are errors with line and column).
 */
final class JsonCodec {
    static final String FORMAT = "sheaf-vocabulary";
    static final int VERSION = 1;

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    static final ObjectMapper READER = JsonMapper.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .enable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
            .enable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
            .disable(DeserializationFeature.ACCEPT_FLOAT_AS_INT)
            .build();

    private static final ObjectMapper WRITER = new ObjectMapper();

    private JsonCodec() {
    }

    // ------------------------------------------------------------------ writing

    /** The file content: pretty-printed UTF-8 JSON with LF line ends and a final newline. */
    static byte[] write(Vocabulary v) {
        return (pretty(toNode(v)) + "\n").getBytes(StandardCharsets.UTF_8);
    }

    static String pretty(JsonNode n) {
        DefaultIndenter indent = new DefaultIndenter("  ", "\n");
        DefaultPrettyPrinter pp = new DefaultPrettyPrinter()
                .withSeparators(Separators.createDefaultInstance().withObjectFieldValueSpacing(Separators.Spacing.AFTER))
                .withObjectIndenter(indent);
        pp.indentArraysWith(indent);
        try {
            StringWriter w = new StringWriter();
            WRITER.writer(pp).writeValue(w, n);
            return w.toString();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String compact(JsonNode n) {
        try {
            return WRITER.writeValueAsString(n);
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    static ObjectNode toNode(Vocabulary v) {
        ObjectNode root = NODES.objectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", VERSION);
        root.set("scheme", scheme(v.scheme()));
        ArrayNode facets = root.putArray("facets");
        v.facets().forEach(f -> facets.add(concept(f)));
        ArrayNode concepts = root.putArray("concepts");
        v.concepts().forEach(c -> concepts.add(concept(c)));
        ArrayNode retired = root.putArray("retired");
        v.retired().forEach(r -> retired.add(retired(r)));
        ArrayNode decisions = root.putArray("decisions");
        v.decisions().forEach(d -> decisions.add(decision(d)));
        return root;
    }

    static ObjectNode scheme(SchemeInfo s) {
        ObjectNode n = NODES.objectNode();
        n.put("id", s.id());
        if (!s.titles().isEmpty()) {
            ObjectNode t = n.putObject("title");
            s.titles().forEach(t::put);
        }
        n.put("baseIri", s.baseIri());
        n.put("defaultLanguage", s.defaultLanguage());
        return n;
    }

    static ObjectNode concept(Concept c) {
        ObjectNode n = NODES.objectNode();
        n.put("id", c.id());
        if (!c.prefLabels().isEmpty()) {
            ObjectNode p = n.putObject("prefLabel");
            c.prefLabels().forEach(p::put);
        }
        labels(n, "altLabel", c.altLabels());
        labels(n, "hiddenLabel", c.hiddenLabels());
        if (!c.broader().isEmpty()) {
            ArrayNode b = n.putArray("broader");
            c.broader().forEach(b::add);
        }
        if (!c.related().isEmpty()) {
            ArrayNode r = n.putArray("related");
            c.related().forEach(r::add);
        }
        notes(n, "scopeNote", c.scopeNotes());
        notes(n, "definition", c.definitions());
        if (!c.mappings().isEmpty()) {
            ObjectNode m = n.putObject("mappings");
            for (MatchKind k : MatchKind.values()) {
                ArrayNode a = null;
                for (Mapping x : c.mappings()) {
                    if (x.kind() == k) {
                        if (a == null) {
                            a = m.putArray(k.skosName());
                        }
                        a.add(x.iri());
                    }
                }
            }
        }
        if (c.splitFrom() != null) {
            n.put("splitFrom", c.splitFrom());
        }
        if (c.provenance() != null) {
            Provenance p = c.provenance();
            ObjectNode pn = n.putObject("provenance");
            if (p.harvestTerm() != null) {
                pn.put("harvestTerm", p.harvestTerm());
            }
            if (p.when() != null) {
                pn.put("when", p.when().toString());
            }
            if (p.by() != null) {
                pn.put("by", p.by());
            }
        }
        if (c.facet() != null) {
            FacetProperties f = c.facet();
            n.put("valueKind", f.valueKind().word());
            n.put("multiValued", f.multiValued());
            if (!f.categories().isEmpty()) {
                ArrayNode a = n.putArray("categories");
                f.categories().forEach(a::add);
            }
            if (f.unit() != null) {
                n.put("unit", f.unit());
            }
            if (!f.buckets().isEmpty()) {
                ArrayNode a = n.putArray("buckets");
                for (Bucket b : f.buckets()) {
                    ObjectNode bn = a.addObject();
                    bn.put("label", b.label());
                    if (b.min() != null) {
                        bn.put("min", b.min());
                    }
                    if (b.max() != null) {
                        bn.put("max", b.max());
                    }
                }
            }
            n.put("regulatedClaim", f.regulatedClaim());
        }
        return n;
    }

    private static void labels(ObjectNode n, String key, Collection<Label> labels) {
        if (labels.isEmpty()) {
            return;
        }
        ObjectNode o = n.putObject(key);
        for (Label l : labels) { // sorted by language, then text
            ArrayNode a = o.has(l.lang()) ? (ArrayNode) o.get(l.lang()) : o.putArray(l.lang());
            a.add(l.text());
        }
    }

    private static void notes(ObjectNode n, String key, Map<String, String> notes) {
        if (!notes.isEmpty()) {
            ObjectNode o = n.putObject(key);
            notes.forEach(o::put);
        }
    }

    static ObjectNode retired(Retired r) {
        ObjectNode n = NODES.objectNode();
        n.put("id", r.id());
        if (r.replacedBy() != null) {
            n.put("replacedBy", r.replacedBy());
        }
        if (r.formerLabel() != null) {
            n.put("formerLabel", r.formerLabel());
        }
        return n;
    }

    static ObjectNode decision(Decision d) {
        ObjectNode n = NODES.objectNode();
        n.put("term", d.term());
        n.put("decision", d.outcome().word());
        if (d.concept() != null) {
            n.put("concept", d.concept());
        }
        if (d.reason() != null) {
            n.put("reason", d.reason());
        }
        if (d.when() != null) {
            n.put("when", d.when().toString());
        }
        if (d.by() != null) {
            n.put("by", d.by());
        }
        return n;
    }

    static ObjectNode patch(Patch p) {
        ObjectNode n = NODES.objectNode();
        if (p.scheme() != null) {
            n.set("scheme", scheme(p.scheme()));
        }
        ObjectNode c = n.putObject("concepts");
        p.concepts().forEach((k, v) -> c.set(k, v.map(JsonCodec::concept).orElse(null)));
        ObjectNode r = n.putObject("retired");
        p.retired().forEach((k, v) -> r.set(k, v.map(JsonCodec::retired).orElse(null)));
        ObjectNode d = n.putObject("decisions");
        p.decisions().forEach((k, v) -> d.set(k, v.map(JsonCodec::decision).orElse(null)));
        return n;
    }

    // ------------------------------------------------------------------ reading

    /** Reads a whole file's content; {@code source} names the file in messages. */
    static Vocabulary read(byte[] content, String source) throws VocabularyFormatException {
        checkHeader(content, source);
        try {
            return READER.readValue(content, FileJson.class).toVocabulary();
        } catch (JsonProcessingException e) {
            throw problem(e, source, content);
        } catch (IOException e) {
            throw new VocabularyFormatException(source, 0, 0, null, "cannot be read: " + e.getMessage(), e);
        }
    }

    /** Checks "format" and "formatVersion" first, so a foreign or newer file gets a plain answer at the right line. */
    private static void checkHeader(byte[] content, String source) throws VocabularyFormatException {
        try (JsonParser p = READER.getFactory().createParser(content)) {
            JsonToken t = p.nextToken();
            if (t != JsonToken.START_OBJECT) {
                JsonLocation l = p.currentTokenLocation();
                throw new VocabularyFormatException(source, l.getLineNr(), l.getColumnNr(), null,
                        "expected a JSON object ({ ... }) with \"format\": \"" + FORMAT + "\", found "
                                + (t == null ? "an empty file" : describe(t)), null);
            }
            boolean sawFormat = false;
            while ((t = p.nextToken()) == JsonToken.FIELD_NAME) {
                String name = p.currentName();
                JsonToken vt = p.nextToken();
                JsonLocation l = p.currentTokenLocation();
                if (name.equals("format")) {
                    sawFormat = true;
                    if (vt != JsonToken.VALUE_STRING || !FORMAT.equals(p.getText())) {
                        throw new VocabularyFormatException(source, l.getLineNr(), l.getColumnNr(), "format",
                                "expected \"" + FORMAT + "\", found " + (vt == JsonToken.VALUE_STRING ? "\"" + p.getText() + "\"" : describe(vt))
                                        + "; this is not a Sheaf vocabulary file", null);
                    }
                } else if (name.equals("formatVersion")) {
                    if (vt != JsonToken.VALUE_NUMBER_INT) {
                        throw new VocabularyFormatException(source, l.getLineNr(), l.getColumnNr(), "formatVersion",
                                "expected a whole number, found " + describe(vt), null);
                    }
                    int ver = p.getIntValue();
                    if (ver > VERSION) {
                        throw new VocabularyFormatException(source, l.getLineNr(), l.getColumnNr(), "formatVersion",
                                "this file is format version " + ver + ", written by a newer Sheaf; this one reads version "
                                        + VERSION + " — upgrade Sheaf to open it", null);
                    }
                    if (ver < 1) {
                        throw new VocabularyFormatException(source, l.getLineNr(), l.getColumnNr(), "formatVersion",
                                "expected version " + VERSION + ", found " + ver, null);
                    }
                }
                p.skipChildren();
            }
            if (!sawFormat && t == JsonToken.END_OBJECT) {
                throw new VocabularyFormatException(source, 1, 1, null,
                        "expected a \"format\": \"" + FORMAT + "\" member; this is not a Sheaf vocabulary file", null);
            }
        } catch (VocabularyFormatException e) {
            throw e;
        } catch (JsonProcessingException e) {
            throw problem(e, source);
        } catch (IOException e) {
            throw new VocabularyFormatException(source, 0, 0, null, "cannot be read: " + e.getMessage(), e);
        }
    }

    static VocabularyFormatException problem(JsonProcessingException e, String source) {
        return problem(e, source, null);
    }

    /**
     * Turns a Jackson exception into our message. Databind buffers creator-based objects, so its
     * locations point at the end of the enclosing object; with the content at hand the position
     * of the offending key is looked up by its path instead.
     */
    static VocabularyFormatException problem(JsonProcessingException e, String source, byte[] content) {
        JsonLocation l = e.getLocation();
        int line = l == null ? 0 : l.getLineNr();
        int col = l == null ? 0 : l.getColumnNr();
        String where = e instanceof JsonMappingException ? path((JsonMappingException) e) : null;
        Position at = null;
        if (where != null && content != null) {
            Map<String, Position> positions = positions(content);
            for (String w = where; w != null && at == null; w = parent(w)) {
                at = positions.get(w);
            }
            if (at != null) {
                line = at.line();
                col = at.column();
            }
        }
        Position valueAt = where == null || content == null ? null : positions(content).get(where);
        String what;
        if (e instanceof UnrecognizedPropertyException) {
            UnrecognizedPropertyException u = (UnrecognizedPropertyException) e;
            TreeSet<String> known = new TreeSet<>();
            if (u.getKnownPropertyIds() != null) {
                u.getKnownPropertyIds().forEach(x -> known.add(String.valueOf(x)));
            }
            what = "unknown key \"" + u.getPropertyName() + "\"; expected one of: " + String.join(", ", known)
                    + (u.getPropertyName().equals("valueKind") || u.getPropertyName().equals("unit")
                    ? " (facet properties belong to entries in \"facets\")" : "");
        } else if (e instanceof ValueInstantiationException) {
            Throwable c = e.getCause();
            while (c != null && c.getCause() != null && !(c instanceof IllegalArgumentException || c instanceof DateTimeParseException)) {
                c = c.getCause();
            }
            what = c == null ? e.getOriginalMessage() : c instanceof DateTimeParseException
                    ? "expected a time like 2025-03-01T10:00:00Z, found \"" + ((DateTimeParseException) c).getParsedString() + "\""
                    : c.getMessage();
        } else if (e instanceof InvalidFormatException) {
            InvalidFormatException i = (InvalidFormatException) e;
            what = "expected " + expected(i.getTargetType()) + ", found " + quote(i.getValue());
        } else if (e instanceof MismatchedInputException) {
            MismatchedInputException m = (MismatchedInputException) e;
            String orig = m.getOriginalMessage();
            JsonToken found = valueAt == null ? null : valueAt.token();
            java.util.regex.Matcher tm = java.util.regex.Pattern.compile("token `JsonToken\\.(\\w+)`").matcher(orig);
            if (found == null && tm.find()) {
                found = JsonToken.valueOf(tm.group(1));
            }
            if (orig.startsWith("Trailing token")) {
                what = "expected the end of the file after the closing }, found more content";
            } else if (m.getTargetType() != null) {
                what = "expected " + expected(m.getTargetType()) + ", found " + (found == null ? "nothing" : describe(found));
            } else {
                what = orig;
            }
        } else if (e instanceof JsonParseException) {
            what = e.getOriginalMessage().replace("\n", " ");
            if (what.startsWith("Duplicate field")) {
                what = what + "; each key may appear once in an object";
            }
        } else {
            what = e.getOriginalMessage();
        }
        return new VocabularyFormatException(source, line, col, where, what, e);
    }

    /** Where a key or list element starts, and the first token of its value. */
    record Position(int line, int column, JsonToken token) {
    }

    private static String parent(String path) {
        int dot = path.lastIndexOf('.');
        int br = path.lastIndexOf('[');
        int cut = Math.max(dot, br);
        return cut <= 0 ? null : path.substring(0, cut);
    }

    /** Path ("concepts[7].broader") → position, for every member and element of the document. */
    static Map<String, Position> positions(byte[] content) {
        Map<String, Position> out = new java.util.HashMap<>();
        try (JsonParser p = READER.getFactory().createParser(content)) {
            java.util.ArrayDeque<String> paths = new java.util.ArrayDeque<>();
            java.util.ArrayDeque<int[]> index = new java.util.ArrayDeque<>(); // for arrays: next element index; objects: null marker -1
            JsonToken t = p.nextToken();
            if (t == null) {
                return out;
            }
            paths.push("");
            index.push(new int[] {t == JsonToken.START_ARRAY ? 0 : -1});
            JsonLocation pendingKey = null;
            String pendingPath = null;
            while ((t = p.nextToken()) != null) {
                if (t == JsonToken.END_OBJECT || t == JsonToken.END_ARRAY) {
                    paths.pop();
                    index.pop();
                    if (paths.isEmpty()) {
                        break;
                    }
                    continue;
                }
                if (t == JsonToken.FIELD_NAME) {
                    String base = paths.peek();
                    pendingPath = base.isEmpty() ? p.currentName() : base + "." + p.currentName();
                    pendingKey = p.currentTokenLocation();
                    continue;
                }
                String path;
                JsonLocation loc;
                int[] idx = index.peek();
                if (idx[0] >= 0) {
                    path = paths.peek() + "[" + idx[0]++ + "]";
                    loc = p.currentTokenLocation();
                } else {
                    path = pendingPath;
                    loc = pendingKey;
                }
                out.putIfAbsent(path, new Position(loc.getLineNr(), loc.getColumnNr(), t));
                if (t == JsonToken.START_OBJECT || t == JsonToken.START_ARRAY) {
                    paths.push(path);
                    index.push(new int[] {t == JsonToken.START_ARRAY ? 0 : -1});
                }
            }
        } catch (IOException ignored) {
            // a syntax error is reported by the main parse; positions before it are still useful
        }
        return out;
    }

    private static String quote(Object v) {
        return v instanceof String ? "\"" + v + "\"" : String.valueOf(v);
    }

    private static String path(JsonMappingException e) {
        StringBuilder sb = new StringBuilder();
        for (JsonMappingException.Reference r : e.getPath()) {
            if (r.getFieldName() != null) {
                if (sb.length() > 0) {
                    sb.append('.');
                }
                sb.append(r.getFieldName());
            } else if (r.getIndex() >= 0) {
                sb.append('[').append(r.getIndex()).append(']');
            }
        }
        return sb.length() == 0 ? null : sb.toString();
    }

    private static String expected(Class<?> t) {
        if (t == null) {
            return "another value";
        }
        if (Collection.class.isAssignableFrom(t) || t.isArray()) {
            return "a list [ ... ]";
        }
        if (Map.class.isAssignableFrom(t) || t.isRecord()) {
            return "an object { ... }";
        }
        if (t == String.class) {
            return "a text in double quotes";
        }
        if (t == Boolean.class || t == boolean.class) {
            return "true or false";
        }
        if (Number.class.isAssignableFrom(t) || t.isPrimitive()) {
            return "a number";
        }
        return "a " + t.getSimpleName();
    }

    private static String describe(JsonToken t) {
        if (t == null) {
            return "the end of the file";
        }
        switch (t) {
            case START_OBJECT:
                return "an object { ... }";
            case START_ARRAY:
                return "a list [ ... ]";
            case VALUE_STRING:
                return "a text";
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT:
                return "a number";
            case VALUE_TRUE:
            case VALUE_FALSE:
                return "true/false";
            case VALUE_NULL:
                return "null";
            default:
                return t.asString() == null ? t.name() : t.asString();
        }
    }

    /** Reads a patch written by {@link #patch}. */
    static Patch readPatch(JsonNode n) throws IOException {
        SchemeInfo scheme = n.hasNonNull("scheme") ? READER.treeToValue(n.get("scheme"), SchemeJson.class).toScheme() : null;
        TreeMap<String, Optional<Concept>> cs = new TreeMap<>();
        for (Map.Entry<String, JsonNode> e : n.path("concepts").properties()) {
            cs.put(e.getKey(), e.getValue().isNull() ? Optional.empty() : Optional.of(readConcept(e.getValue())));
        }
        TreeMap<String, Optional<Retired>> rs = new TreeMap<>();
        for (Map.Entry<String, JsonNode> e : n.path("retired").properties()) {
            rs.put(e.getKey(), e.getValue().isNull() ? Optional.empty()
                    : Optional.of(READER.treeToValue(e.getValue(), RetiredJson.class).toRetired()));
        }
        TreeMap<String, Optional<Decision>> ds = new TreeMap<>();
        for (Map.Entry<String, JsonNode> e : n.path("decisions").properties()) {
            ds.put(e.getKey(), e.getValue().isNull() ? Optional.empty()
                    : Optional.of(READER.treeToValue(e.getValue(), DecisionJson.class).toDecision()));
        }
        return new Patch(scheme, cs, rs, ds);
    }

    static Concept readConcept(JsonNode n) throws IOException {
        return n.has("valueKind") ? READER.treeToValue(n, FacetJson.class).toConcept()
                : READER.treeToValue(n, ConceptJson.class).toConcept();
    }

    // ------------------------------------------------------------------ the file's shape

    static Concept.Builder common(String id, Map<String, String> prefLabel, Map<String, List<String>> altLabel,
                                  Map<String, List<String>> hiddenLabel, List<String> broader, List<String> related,
                                  Map<String, String> scopeNote, Map<String, String> definition,
                                  Map<String, List<String>> mappings, String splitFrom, ProvenanceJson provenance) {
        if (id == null) {
            throw new IllegalArgumentException("missing \"id\"; every concept needs a stable id");
        }
        Concept.Builder b = Concept.builder(id);
        if (prefLabel != null) {
            prefLabel.forEach((lang, t) -> b.prefLabel(Label.of(t, lang)));
        }
        if (altLabel != null) {
            altLabel.forEach((lang, ts) -> ts.forEach(t -> b.altLabel(Label.of(t, lang))));
        }
        if (hiddenLabel != null) {
            hiddenLabel.forEach((lang, ts) -> ts.forEach(t -> b.hiddenLabel(Label.of(t, lang))));
        }
        if (broader != null) {
            b.broader(broader);
        }
        if (related != null) {
            b.related(related);
        }
        if (scopeNote != null) {
            scopeNote.forEach(b::scopeNote);
        }
        if (definition != null) {
            definition.forEach(b::definition);
        }
        if (mappings != null) {
            mappings.forEach((k, iris) -> {
                MatchKind mk = MatchKind.ofSkosName(k);
                iris.forEach(i -> b.mapping(new Mapping(mk, i)));
            });
        }
        b.splitFrom(splitFrom);
        if (provenance != null) {
            b.provenance(provenance.toProvenance());
        }
        return b;
    }

    static Instant instant(String s) {
        return s == null ? null : Instant.parse(s);
    }

    record FileJson(String format, Integer formatVersion, SchemeJson scheme, List<FacetJson> facets,
                    List<ConceptJson> concepts, List<RetiredJson> retired, List<DecisionJson> decisions) {
        FileJson {
            if (formatVersion == null) {
                throw new IllegalArgumentException("missing \"formatVersion\" (expected " + VERSION + ")");
            }
            if (scheme == null) {
                throw new IllegalArgumentException("missing \"scheme\" (expected {\"id\": ..., \"baseIri\": ..., \"defaultLanguage\": ...})");
            }
            // duplicate ids and the like are reported here, while the parser still knows the position
            build(scheme, facets, concepts, retired, decisions);
        }

        Vocabulary toVocabulary() {
            return build(scheme, facets, concepts, retired, decisions);
        }

        private static Vocabulary build(SchemeJson scheme, List<FacetJson> facets, List<ConceptJson> concepts,
                                        List<RetiredJson> retired, List<DecisionJson> decisions) {
            List<Concept> all = new ArrayList<>();
            if (facets != null) {
                facets.forEach(f -> all.add(f.concept()));
            }
            if (concepts != null) {
                concepts.forEach(c -> all.add(c.concept()));
            }
            List<Retired> rs = new ArrayList<>();
            if (retired != null) {
                retired.forEach(r -> rs.add(r.toRetired()));
            }
            List<Decision> ds = new ArrayList<>();
            if (decisions != null) {
                decisions.forEach(d -> ds.add(d.toDecision()));
            }
            return Vocabulary.of(scheme.toScheme(), all, rs, ds);
        }
    }

    record SchemeJson(String id, Map<String, String> title, String baseIri, String defaultLanguage) {
        SchemeJson {
            build(id, title, baseIri, defaultLanguage);
        }

        SchemeInfo toScheme() {
            return build(id, title, baseIri, defaultLanguage);
        }

        private static SchemeInfo build(String id, Map<String, String> title, String baseIri, String defaultLanguage) {
            if (id == null) {
                throw new IllegalArgumentException("missing scheme \"id\"");
            }
            return new SchemeInfo(id, title == null ? null : new TreeMap<>(title),
                    baseIri == null ? SchemeInfo.defaultBase(id) : baseIri,
                    defaultLanguage == null ? Label.DEFAULT_LANGUAGE : defaultLanguage);
        }
    }

    record ProvenanceJson(String harvestTerm, String when, String by) {
        ProvenanceJson {
            new Provenance(harvestTerm, instant(when), by);
        }

        Provenance toProvenance() {
            return new Provenance(harvestTerm, instant(when), by);
        }
    }

    record ConceptJson(Concept concept) {
        @JsonCreator
        ConceptJson(@JsonProperty("id") String id, @JsonProperty("prefLabel") Map<String, String> prefLabel,
                    @JsonProperty("altLabel") Map<String, List<String>> altLabel,
                    @JsonProperty("hiddenLabel") Map<String, List<String>> hiddenLabel,
                    @JsonProperty("broader") List<String> broader, @JsonProperty("related") List<String> related,
                    @JsonProperty("scopeNote") Map<String, String> scopeNote,
                    @JsonProperty("definition") Map<String, String> definition,
                    @JsonProperty("mappings") Map<String, List<String>> mappings,
                    @JsonProperty("splitFrom") String splitFrom, @JsonProperty("provenance") ProvenanceJson provenance) {
            this(common(id, prefLabel, altLabel, hiddenLabel, broader, related, scopeNote, definition, mappings,
                    splitFrom, provenance).build());
        }

        Concept toConcept() {
            return concept;
        }
    }

    record BucketJson(Bucket bucket) {
        @JsonCreator
        BucketJson(@JsonProperty("label") String label, @JsonProperty("min") Double min, @JsonProperty("max") Double max) {
            this(new Bucket(label, min, max));
        }
    }

    record FacetJson(Concept concept) {
        @JsonCreator
        FacetJson(@JsonProperty("id") String id, @JsonProperty("prefLabel") Map<String, String> prefLabel,
                  @JsonProperty("altLabel") Map<String, List<String>> altLabel,
                  @JsonProperty("hiddenLabel") Map<String, List<String>> hiddenLabel,
                  @JsonProperty("related") List<String> related,
                  @JsonProperty("scopeNote") Map<String, String> scopeNote,
                  @JsonProperty("definition") Map<String, String> definition,
                  @JsonProperty("mappings") Map<String, List<String>> mappings,
                  @JsonProperty("splitFrom") String splitFrom, @JsonProperty("provenance") ProvenanceJson provenance,
                  @JsonProperty("valueKind") String valueKind, @JsonProperty("multiValued") Boolean multiValued,
                  @JsonProperty("categories") List<String> categories, @JsonProperty("unit") String unit,
                  @JsonProperty("buckets") List<BucketJson> buckets, @JsonProperty("regulatedClaim") Boolean regulatedClaim) {
            this(common(id, prefLabel, altLabel, hiddenLabel, null, related, scopeNote, definition, mappings, splitFrom,
                    provenance).facet(facet(id, valueKind, multiValued, categories, unit, buckets, regulatedClaim)).build());
        }

        private static FacetProperties facet(String id, String valueKind, Boolean multiValued, List<String> categories,
                                             String unit, List<BucketJson> buckets, Boolean regulatedClaim) {
            if (valueKind == null) {
                throw new IllegalArgumentException("facet " + id + " has no \"valueKind\" (expected term, number or yes-no)");
            }
            List<Bucket> bs = new ArrayList<>();
            if (buckets != null) {
                buckets.forEach(b -> bs.add(b.bucket()));
            }
            return new FacetProperties(ValueKind.ofWord(valueKind), Boolean.TRUE.equals(multiValued),
                    categories == null ? null : new TreeSet<>(categories), unit, bs, Boolean.TRUE.equals(regulatedClaim));
        }

        Concept toConcept() {
            return concept;
        }
    }

    record RetiredJson(String id, String replacedBy, String formerLabel) {
        RetiredJson {
            build(id, replacedBy, formerLabel);
        }

        Retired toRetired() {
            return build(id, replacedBy, formerLabel);
        }

        private static Retired build(String id, String replacedBy, String formerLabel) {
            if (id == null) {
                throw new IllegalArgumentException("missing \"id\" of a retired concept");
            }
            return new Retired(id, replacedBy, formerLabel);
        }
    }

    record DecisionJson(String term, String decision, String concept, String reason, String when, String by) {
        DecisionJson {
            build(term, decision, concept, reason, when, by);
        }

        Decision toDecision() {
            return build(term, decision, concept, reason, when, by);
        }

        private static Decision build(String term, String decision, String concept, String reason, String when, String by) {
            if (term == null) {
                throw new IllegalArgumentException("missing \"term\" of a candidate decision");
            }
            if (decision == null) {
                throw new IllegalArgumentException("missing \"decision\" (expected kept, dropped or parked)");
            }
            return new Decision(term, Decision.Outcome.ofWord(decision), concept, reason, instant(when), by);
        }
    }
}
