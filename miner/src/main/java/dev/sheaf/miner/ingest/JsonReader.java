package dev.sheaf.miner.ingest;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectReader;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Listings from JSON (an array of objects, an object with an array-of-objects member such as
 * {@code "products"}, or one object) and JSON Lines (one object per line), streamed with Jackson.
 * Members map to fields by the source's {@link ColumnMapping} (dotted paths reach nested members)
 * or by detection from each object's member names. Specs may be an object, an array of
 * {@code {key|name, value}} objects, or a "Key: value; ..." string.
 *
 * <p>In JSON Lines a broken line is a problem at {@code "line N"} and the other lines are still
 * read. In a JSON document a syntax error ends the file: the listings before it are kept.
 */
final class JsonReader implements ListingReader {
    private static final JsonFactory FACTORY = JsonFactory.builder()
            .streamReadConstraints(StreamReadConstraints.builder().maxNestingDepth(200).build()).build();
    private static final ObjectMapper MAPPER = new ObjectMapper(FACTORY);
    private static final ObjectReader TREE = MAPPER.reader();

    @Override
    public boolean streams() {
        return true;
    }

    @Override
    public String name() {
        return "JSON";
    }

    @Override
    public void read(SourceFile file) throws IOException {
        String ext = file.extension();
        if (ext.equals("jsonl") || ext.equals("ndjson")) {
            readLines(file);
        } else {
            readDocument(file);
        }
    }

    private void readLines(SourceFile file) throws IOException {
        DecodingReader r = file.openText(null);
        if (r == null) {
            return;
        }
        Mapper mapper = new Mapper(file);
        InputStream raw = r.charset().equals(StandardCharsets.UTF_8) || r.charset().equals(StandardCharsets.US_ASCII)
                ? r.undecoded() : null;
        if (raw != null) {
            try (r) {
                new Utf8Lines(file, mapper, r.byteBase()).read(raw);
            }
            return;
        }
        try (BufferedReader in = new BufferedReader(r, 1 << 16)) {
            String line;
            long n = 0;
            while ((line = in.readLine()) != null) {
                n++;
                if (n == 1 && line.startsWith("\uFEFF")) {
                    line = line.substring(1);
                }
                if (!line.isBlank()) {
                    parseLine(file, mapper, line, n);
                }
            }
        } finally {
            file.reportEncoding(r);
        }
    }

    /** Parses one JSON Lines line (text) and hands its listing to the mapper, or records why not. */
    private static void parseLine(SourceFile file, Mapper mapper, String line, long n) throws IOException {
        JsonNode node;
        try {
            node = TREE.readTree(line);
        } catch (JsonProcessingException e) {
            badLine(file, n, e);
            return;
        }
        emitLine(file, mapper, node, n);
    }

    private static void badLine(SourceFile file, long n, JsonProcessingException e) {
        file.problem("line " + n, "parse", "not valid JSON (" + e.getOriginalMessage()
                + "); the line was skipped. Each line must hold one complete JSON object");
    }

    private static void emitLine(SourceFile file, Mapper mapper, JsonNode node, long n) {
        if (node == null || !node.isObject()) {
            file.problem("line " + n, "parse", "expected a JSON object on the line, found "
                    + (node == null ? "nothing" : node.getNodeType().name().toLowerCase(java.util.Locale.ROOT)) + "; the line was skipped");
            return;
        }
        mapper.emit((ObjectNode) node, "line " + n);
    }

    /**
     * JSON Lines in UTF-8 read as bytes: lines are cut at LF and parsed by Jackson straight from the
     * buffer, so the text is never decoded to chars nor copied into a String per line. A line that
     * does not parse and is not valid UTF-8 takes the text path (decoded with U+FFFD for each
     * undecodable sequence, counted for the encoding problem), so the outcomes are the text path's
     * (one difference: a surrogate encoded as three bytes, which Java's decoder rejects, is taken
     * as the char it encodes, as Jackson reads it).
     */
    private static final class Utf8Lines {
        private final SourceFile file;
        private final Mapper mapper;
        private final long byteBase;
        private long malformed;
        private long firstMalformedByte = -1;
        private long firstMalformedLine = -1;

        Utf8Lines(SourceFile file, Mapper mapper, long byteBase) {
            this.file = file;
            this.mapper = mapper;
            this.byteBase = byteBase;
        }

        void read(InputStream in) throws IOException {
            byte[] buf = new byte[1 << 16];
            int len = 0; // bytes in buf
            int from = 0; // start of the current line in buf
            long fileOffset = byteBase; // file offset of buf[0]
            long n = 0;
            int scanned = 0;
            while (true) {
                int got = in.read(buf, len, buf.length - len);
                boolean eof = got < 0;
                if (!eof) {
                    len += got;
                }
                int i = scanned;
                for (; i < len; i++) {
                    if (buf[i] == '\n') {
                        line(buf, from, i, ++n, fileOffset + from);
                        from = i + 1;
                    }
                }
                if (eof) {
                    if (from < len) {
                        line(buf, from, len, ++n, fileOffset + from);
                    }
                    break;
                }
                // keep the unfinished line: move it to the front, or grow the buffer for a long line
                if (from > 0) {
                    System.arraycopy(buf, from, buf, 0, len - from);
                    fileOffset += from;
                    len -= from;
                    from = 0;
                } else if (len == buf.length) {
                    buf = java.util.Arrays.copyOf(buf, buf.length * 2);
                }
                scanned = len;
            }
            file.reportEncoding(StandardCharsets.UTF_8, malformed, firstMalformedByte, firstMalformedLine);
        }

        private void line(byte[] b, int start, int end, long n, long offset) throws IOException {
            if (end > start && b[end - 1] == '\r') {
                end--;
            }
            if (n == 1 && end - start >= 3 && b[start] == (byte) 0xEF && b[start + 1] == (byte) 0xBB && b[start + 2] == (byte) 0xBF) {
                start += 3; // a second byte-order mark, as the text path drops one
                offset += 3;
            }
            if (blank(b, start, end)) {
                return;
            }
            JsonNode node;
            try {
                node = TREE.readTree(b, start, end - start);
            } catch (JsonProcessingException e) {
                // a line with undecodable bytes goes the text way, so it reads as the text path reads it
                DecodingReader d = new DecodingReader(new java.io.ByteArrayInputStream(b, start, end - start),
                        StandardCharsets.UTF_8, offset, end - start);
                StringBuilder text = new StringBuilder(end - start);
                try (d) {
                    char[] cb = new char[4096];
                    int k;
                    while ((k = d.read(cb, 0, cb.length)) >= 0) {
                        text.append(cb, 0, k);
                    }
                }
                if (d.malformed() > 0) {
                    if (malformed == 0) {
                        firstMalformedByte = d.firstMalformedByte();
                        firstMalformedLine = n;
                    }
                    malformed += d.malformed();
                }
                String t = text.toString();
                if (t.isBlank()) {
                    return; // blank by Unicode's whitespace, as the text path skips it
                }
                if (d.malformed() == 0) {
                    badLine(file, n, e);
                } else {
                    parseLine(file, mapper, t, n);
                }
                return;
            }
            emitLine(file, mapper, node, n);
        }

        /** Only what {@link String#isBlank()} counts as blank in ASCII (a line of other bytes is parsed). */
        private static boolean blank(byte[] b, int start, int end) {
            for (int i = start; i < end; i++) {
                byte c = b[i];
                if (c != ' ' && c != '\t' && c != '\r' && c != 0x0B && c != '\f' && (c < 0x1C || c > 0x1F)) {
                    return false;
                }
            }
            return true;
        }
    }

    private void readDocument(SourceFile file) throws IOException {
        DecodingReader r = file.openText(null);
        if (r == null) {
            return;
        }
        Mapper mapper = new Mapper(file);
        JsonParser p = FACTORY.createParser(new BufferedReader(r, 1 << 16));
        try (p) {
            p.setCodec(MAPPER);
            JsonToken t;
            while ((t = p.nextToken()) != null) {
                if (t == JsonToken.START_ARRAY) {
                    elements(p, mapper);
                } else if (t == JsonToken.START_OBJECT) {
                    rootObject(p, mapper);
                } else {
                    file.problem(position(p), "parse", "expected an array of listing objects or an object, found "
                            + t.asString() + "; the value was skipped");
                }
            }
        } catch (JsonProcessingException e) {
            // a limit of the parser (nesting depth, number or string length) comes without a location
            JsonLocation at = e.getLocation() != null ? e.getLocation() : p.currentLocation();
            file.problem("line " + at.getLineNr(), "parse", "not valid JSON (" + e.getOriginalMessage()
                    + "); the listings before it were read, the rest of the file was skipped");
        } finally {
            file.reportEncoding(r);
        }
    }

    /** Reads array elements up to the closing bracket; objects are listings. */
    private static void elements(JsonParser p, Mapper mapper) throws IOException {
        JsonToken t;
        while ((t = p.nextToken()) != JsonToken.END_ARRAY && t != null) {
            String pos = position(p);
            if (t == JsonToken.START_OBJECT) {
                mapper.emit((ObjectNode) p.readValueAsTree(), pos);
            } else {
                mapper.file.problem(pos, "parse", "expected a listing object in the array, found " + t.asString() + "; skipped");
                p.skipChildren();
            }
        }
    }

    /**
     * A root object: if one member is an array of objects, those are the listings (the other
     * members are metadata); otherwise the object itself is one listing.
     */
    private static void rootObject(JsonParser p, Mapper mapper) throws IOException {
        String pos = position(p);
        ObjectNode rest = MAPPER.createObjectNode();
        boolean listed = false;
        while (p.nextToken() == JsonToken.FIELD_NAME) {
            String name = p.currentName();
            JsonToken v = p.nextToken();
            if (!listed && v == JsonToken.START_ARRAY) {
                JsonToken first = p.nextToken();
                if (first == JsonToken.START_OBJECT) {
                    listed = true;
                    String at = position(p);
                    mapper.emit((ObjectNode) p.readValueAsTree(), at);
                    elements(p, mapper);
                    continue;
                }
                // not an array of objects: keep it as a plain member
                List<JsonNode> items = new ArrayList<>();
                while (first != JsonToken.END_ARRAY && first != null) {
                    items.add(p.readValueAsTree());
                    first = p.nextToken();
                }
                rest.set(name, MAPPER.createArrayNode().addAll(items));
            } else {
                rest.set(name, p.readValueAsTree());
            }
        }
        if (!listed) {
            mapper.emit(rest, pos);
        }
    }

    private static String position(JsonParser p) {
        return "line " + p.currentTokenLocation().getLineNr();
    }

    /** Turns objects into listings with the file's mapping, detecting it from member names when none is given. */
    private static final class Mapper {
        final SourceFile file;
        private List<String> lastNames = List.of();
        private ColumnMapping detected;

        Mapper(SourceFile file) {
            this.file = file;
        }

        void emit(ObjectNode o, String locator) {
            ColumnMapping m = file.mapping();
            if (m == null) {
                List<String> names = new ArrayList<>(o.size());
                o.fieldNames().forEachRemaining(names::add);
                if (detected == null || !names.equals(lastNames)) {
                    detected = ColumnMapping.detect(names, false);
                    lastNames = names;
                }
                m = detected;
            }
            List<Field> fields = new ArrayList<>();
            String title = text(at(o, m.title()));
            if (!title.isEmpty()) {
                fields.add(Field.of(FieldKind.TITLE, SpecValues.plain(title)));
            }
            String desc = text(at(o, m.description()));
            if (!desc.isEmpty()) {
                fields.add(Field.of(FieldKind.DESCRIPTION, SpecValues.plain(desc)));
            }
            for (String path : m.bullets()) {
                JsonNode b = at(o, path);
                if (b == null || b.isNull()) {
                    continue;
                }
                if (b.isArray()) {
                    for (JsonNode e : b) {
                        String s = text(e);
                        if (!s.isEmpty()) {
                            fields.add(Field.of(FieldKind.BULLET, SpecValues.plain(s)));
                        }
                    }
                } else {
                    for (String s : SpecValues.items(text(b))) {
                        fields.add(Field.of(FieldKind.BULLET, SpecValues.plain(s)));
                    }
                }
            }
            if (m.specsFromAllOthers()) {
                Set<String> mapped = m.mappedNames();
                for (Map.Entry<String, JsonNode> e : o.properties()) {
                    if (!mapped.contains(e.getKey())) {
                        specs(e.getKey(), e.getValue(), ColumnMapping.isSpecContainerName(e.getKey()), fields);
                    }
                }
            } else {
                for (String path : m.specs()) {
                    specs(leaf(path), at(o, path), true, fields);
                }
            }
            for (String path : m.text()) {
                String s = text(at(o, path));
                if (!s.isEmpty()) {
                    fields.add(Field.of(FieldKind.TEXT, SpecValues.plain(s)));
                }
            }
            String id = text(at(o, m.id()));
            JsonNode cat = at(o, m.category());
            String category = cat != null && cat.isArray() && cat.size() > 0 ? text(cat.get(cat.size() - 1)) : text(cat);
            if (fields.isEmpty()) {
                file.problem(locator, "empty", "the object has no title, description, bullets or specs; skipped");
                return;
            }
            file.emit(new Listing(id.isEmpty() ? file.stem() + "-" + locator.replace(' ', '-') : id, category,
                    file.display(), locator, fields));
        }

        /** Adds the specs a member holds; a container's entries are keyed by their own names. */
        private static void specs(String name, JsonNode v, boolean container, List<Field> out) {
            if (v == null || v.isNull()) {
                return;
            }
            if (v.isObject()) {
                for (Map.Entry<String, JsonNode> e : v.properties()) {
                    specs(container ? e.getKey() : name + "." + e.getKey(), e.getValue(), false, out);
                }
            } else if (v.isArray()) {
                List<String> scalars = new ArrayList<>();
                for (JsonNode e : v) {
                    if (e.isObject() && (e.has("key") || e.has("name")) && e.has("value")) {
                        String k = text(e.has("key") ? e.get("key") : e.get("name"));
                        String val = text(e.get("value"));
                        if (!k.isEmpty() && !val.isEmpty()) {
                            out.add(Field.spec(k, val));
                        }
                    } else if (e.isValueNode()) {
                        String s = text(e);
                        if (!s.isEmpty()) {
                            scalars.add(s);
                        }
                    }
                }
                if (!scalars.isEmpty()) {
                    out.add(Field.spec(name, String.join(", ", scalars)));
                }
            } else {
                SpecValues.addSpecs(name, text(v), container, out);
            }
        }

        /** A member by name or dotted path ("attributes.weight"); an exact name with dots wins. */
        private static JsonNode at(ObjectNode o, String path) {
            if (path == null) {
                return null;
            }
            JsonNode direct = o.get(path);
            if (direct != null || path.indexOf('.') < 0) {
                return direct;
            }
            JsonNode n = o;
            for (String part : path.split("\\.")) {
                n = n == null ? null : n.get(part);
            }
            return n;
        }

        private static String leaf(String path) {
            int dot = path.lastIndexOf('.');
            return dot < 0 ? path : path.substring(dot + 1);
        }

        private static String text(JsonNode n) {
            if (n == null || n.isNull() || n.isContainerNode()) {
                return "";
            }
            return n.asText().strip();
        }
    }
}
