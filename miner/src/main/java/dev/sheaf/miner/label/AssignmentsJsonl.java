package dev.sheaf.miner.label;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.text.SegmentPart;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.Vocabulary;
import java.io.BufferedReader;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * The assignments file, {@code assignments.jsonl}: one listing per line, in UTF-8, readable by any
 * JSON Lines reader (Python: {@code [json.loads(l) for l in open(f, encoding="utf-8")]}).
 *
 * <pre>{@code
 * {"id":"FH-1","category":"jackets","source":"catalog/feed.jsonl","locator":"line 1",
 *  "concepts":[
 *   {"concept":"hooded","facet":"hood","label":"hood","polarity":"negated","applies":true,"review":false,
 *    "evidence":[{"field":1,"fieldKind":"description","key":"","part":"text","start":0,"end":7,
 *                 "text":"No hood","labelKind":"preferred","polarity":"negated","cue":"No"}]},
 *   {"concept":"weight","facet":"weight","label":"weight","polarity":"stated","applies":true,"review":false,
 *    "value":1.19067997125,"valueMax":1.19067997125,"unit":"kg","bucket":"light",
 *    "evidence":[{"field":3,"fieldKind":"spec","key":"Weight","part":"value","start":0,"end":10,"text":"2 lb 10 oz",
 *                 "polarity":"stated"}]}],
 *  "invalid":[{"facet":"capacity","field":4,"key":"Capacity","text":"roomy","reason":"..."}]}
 * }</pre>
 * {@code label} is the concept's preferred label in the vocabulary's default language (hidden
 * labels are never shown; the evidence {@code text} is the listing's own text). Offsets are
 * 0-based UTF-16 char offsets, end exclusive, into the field text ({@code part} "text" or
 * "value") or the spec key ("key") — what Java and JavaScript index by; Python's {@code str}
 * indexes by code point, which differs only around characters outside the BMP (emoji).
 * {@code labelKind} is absent for numbers, {@code cue} for stated occurrences.
 */
public final class AssignmentsJsonl {
    /** The file name the label stage writes and the coverage stage reads. */
    public static final String FILE_NAME = "assignments.jsonl";

    private static final JsonFactory JSON = new JsonFactory();
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private AssignmentsJsonl() {
    }

    /** One listing as one JSON line, with the line feed, in UTF-8. */
    public static byte[] line(Assignments a, Vocabulary v) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(512);
        try (JsonGenerator g = JSON.createGenerator(out)) {
            write(g, a, v);
        } catch (IOException e) {
            throw new UncheckedIOException(e); // writing to memory does not fail
        }
        out.write('\n');
        return out.toByteArray();
    }

    private static void write(JsonGenerator g, Assignments a, Vocabulary v) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", a.listingId());
        g.writeStringField("category", a.category());
        g.writeStringField("source", a.source());
        g.writeStringField("locator", a.locator());
        g.writeArrayFieldStart("concepts");
        for (Assignment x : a.assignments()) {
            g.writeStartObject();
            g.writeStringField("concept", x.conceptId());
            g.writeStringField("facet", x.facetId());
            g.writeStringField("label", v.displayLabel(x.conceptId()));
            g.writeStringField("polarity", x.polarity().word());
            g.writeBooleanField("applies", x.applies());
            g.writeBooleanField("review", x.review());
            if (x.isNumber()) {
                g.writeNumberField("value", x.value());
                g.writeNumberField("valueMax", x.valueMax());
                g.writeStringField("unit", x.unit());
                g.writeStringField("bucket", x.bucket());
            }
            g.writeArrayFieldStart("evidence");
            for (Evidence e : x.evidence()) {
                g.writeStartObject();
                g.writeNumberField("field", e.field());
                g.writeStringField("fieldKind", e.fieldKind().label());
                g.writeStringField("key", e.key());
                g.writeStringField("part", partWord(e.part()));
                g.writeNumberField("start", e.start());
                g.writeNumberField("end", e.end());
                g.writeStringField("text", e.text());
                if (e.labelKind() != null) {
                    g.writeStringField("labelKind", e.labelKind().word());
                }
                g.writeStringField("polarity", e.polarity().word());
                if (e.cue() != null) {
                    g.writeStringField("cue", e.cue());
                }
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("invalid");
        for (InvalidValue iv : a.invalid()) {
            g.writeStartObject();
            g.writeStringField("facet", iv.facetId());
            g.writeNumberField("field", iv.field());
            g.writeStringField("key", iv.key());
            g.writeStringField("text", iv.text());
            g.writeStringField("reason", iv.reason());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    static String partWord(SegmentPart p) {
        return switch (p) {
            case TEXT -> "text";
            case SPEC_KEY -> "key";
            case SPEC_VALUE -> "value";
        };
    }

    static SegmentPart part(String word) {
        return switch (word) {
            case "text" -> SegmentPart.TEXT;
            case "key" -> SegmentPart.SPEC_KEY;
            case "value" -> SegmentPart.SPEC_VALUE;
            default -> throw new IllegalArgumentException("part must be text, key or value, found \"" + word + "\"");
        };
    }

    /** What reading a file gave besides the listings. */
    public record ReadSummary(long lines, long listings, long resolved, List<String> problems) {
        public ReadSummary {
            problems = List.copyOf(problems);
        }
    }

    /**
     * Reads an assignments file, one listing at a time, against today's vocabulary: concept ids
     * merged away since the file was written resolve through "replaced by"
     * ({@link Vocabulary#resolve}); two assignments that now name one concept become one (stated
     * when either was); facets and category applicability are taken from the vocabulary as it is
     * now. Ids the vocabulary no longer knows (deleted, or never there) are left out and reported;
     * so are lines that are not JSON (with their line number) — a bad line never ends the read.
     */
    public static ReadSummary read(Path file, Vocabulary v, Consumer<Assignments> sink) throws IOException {
        long lines = 0;
        long listings = 0;
        long[] resolved = {0};
        List<String> problems = new ArrayList<>();
        Map<String, Integer> unknown = new LinkedHashMap<>();
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String s;
            while ((s = r.readLine()) != null) {
                lines++;
                if (s.isBlank()) {
                    continue;
                }
                Assignments a;
                try {
                    a = parse(MAPPER.readTree(s), v, resolved, unknown);
                } catch (JsonProcessingException e) {
                    problems.add(file.getFileName() + " line " + lines + ": not a JSON object (" + e.getOriginalMessage()
                            + "); the line is left out");
                    continue;
                } catch (IllegalArgumentException | NullPointerException e) {
                    problems.add(file.getFileName() + " line " + lines + ": " + e.getMessage() + "; the line is left out");
                    continue;
                }
                listings++;
                sink.accept(a);
            }
        }
        unknown.forEach((id, n) -> problems.add("concept id \"" + id + "\" (" + n + " assignment" + (n == 1 ? "" : "s")
                + ") is not in the vocabulary, live or merged; those assignments are left out — was it deleted?"));
        return new ReadSummary(lines, listings, resolved[0], problems);
    }

    private static Assignments parse(JsonNode o, Vocabulary v, long[] resolved, Map<String, Integer> unknown) {
        if (o == null || !o.isObject()) {
            throw new IllegalArgumentException("expected a JSON object per line");
        }
        Map<String, Assignment> byKey = new LinkedHashMap<>();
        for (JsonNode c : array(o, "concepts")) {
            String raw = text(c, "concept");
            Optional<Concept> live = v.resolve(raw);
            if (live.isEmpty()) {
                unknown.merge(raw, 1, Integer::sum);
                continue;
            }
            String id = live.get().id();
            if (!id.equals(raw)) {
                resolved[0]++;
            }
            List<Evidence> ev = new ArrayList<>();
            for (JsonNode e : array(c, "evidence")) {
                JsonNode lk = e.get("labelKind");
                JsonNode cue = e.get("cue");
                ev.add(new Evidence(e.get("field").asInt(), FieldKind.fromLabel(text(e, "fieldKind")), text(e, "key"),
                        part(text(e, "part")), e.get("start").asInt(), e.get("end").asInt(), text(e, "text"),
                        lk == null || lk.isNull() ? null : labelKind(lk.asText()), Polarity.ofWord(text(e, "polarity")),
                        cue == null || cue.isNull() ? null : cue.asText()));
            }
            Polarity pol = Polarity.ofWord(text(c, "polarity"));
            List<Concept> facets = v.facetsOf(id);
            String facetId = facets.isEmpty() ? null : facets.get(0).id();
            boolean applies = facets.isEmpty();
            boolean review = false;
            for (Concept f : facets) {
                applies |= f.facet().appliesTo(o.path("category").asText(""));
                review |= f.facet().regulatedClaim();
            }
            Assignment a;
            JsonNode value = c.get("value");
            if (value != null && !value.isNull()) {
                JsonNode unit = c.get("unit");
                JsonNode bucket = c.get("bucket");
                a = new Assignment(id, facetId, pol, ev, value.asDouble(), c.get("valueMax").asDouble(),
                        unit == null || unit.isNull() ? null : unit.asText(), bucket == null || bucket.isNull() ? null : bucket.asText(),
                        applies, review);
            } else {
                a = Assignment.term(id, facetId, pol, ev, applies, review);
            }
            String key = a.isNumber() ? id + "=" + a.value() + ".." + a.valueMax() : id;
            Assignment prev = byKey.get(key);
            byKey.put(key, prev == null ? a : merge(prev, a));
        }
        List<Assignment> out = new ArrayList<>(byKey.values());
        out.sort(java.util.Comparator.comparing(Assignment::conceptId)
                .thenComparing(x -> x.value() == null ? Double.NEGATIVE_INFINITY : x.value()));
        List<InvalidValue> invalid = new ArrayList<>();
        for (JsonNode iv : array(o, "invalid")) {
            Optional<Concept> f = v.resolve(text(iv, "facet"));
            invalid.add(new InvalidValue(f.map(Concept::id).orElse(text(iv, "facet")), iv.get("field").asInt(), text(iv, "key"),
                    text(iv, "text"), text(iv, "reason")));
        }
        return new Assignments(text(o, "id"), o.path("category").asText(""), o.path("source").asText(""),
                o.path("locator").asText(""), out, invalid);
    }

    private static Assignment merge(Assignment a, Assignment b) {
        List<Evidence> ev = new ArrayList<>(a.evidence());
        ev.addAll(b.evidence());
        ev.sort(java.util.Comparator.comparingInt(Evidence::field).thenComparingInt(e -> e.part().ordinal())
                .thenComparingInt(Evidence::start));
        Polarity p = a.isStated() || b.isStated() ? Polarity.STATED : Polarity.NEGATED;
        return new Assignment(a.conceptId(), a.facetId(), p, ev, a.value(), a.valueMax(), a.unit(), a.bucket(), a.applies(),
                a.review());
    }

    private static LabelKind labelKind(String word) {
        for (LabelKind k : LabelKind.values()) {
            if (k.word().equals(word)) {
                return k;
            }
        }
        throw new IllegalArgumentException("labelKind must be preferred, alternative or hidden, found \"" + word + "\"");
    }

    private static Iterable<JsonNode> array(JsonNode o, String key) {
        JsonNode n = o.get(key);
        if (n == null || n.isNull()) {
            return List.of();
        }
        if (!n.isArray()) {
            throw new IllegalArgumentException("\"" + key + "\" must be an array, found " + n.getNodeType().name().toLowerCase(Locale.ROOT));
        }
        return n;
    }

    private static String text(JsonNode o, String key) {
        JsonNode n = o.get(key);
        if (n == null || !n.isTextual()) {
            throw new IllegalArgumentException("\"" + key + "\" must be a string, found " + (n == null ? "nothing" : n.toString()));
        }
        return n.asText();
    }

}
