package dev.sheaf.miner.ingest;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Which CSV/TSV columns or JSON members hold which listing fields. JSON members may be dotted
 * paths ({@code "attributes.weight"}). A null name means "not in this source".
 *
 * <p>{@code specs} lists the columns or members that hold spec values: an object member gives one
 * spec per entry, an array of {@code {key|name, value}} objects one per element, a text cell like
 * {@code "Weight: 1.2 kg; Colour: moss"} one per pair, any other value one spec keyed by the column
 * name. {@code ["*"]} means every column or member not mapped to another field.
 *
 * @param id          listing id column (id, sku, product_id when detected)
 * @param title       product name column
 * @param description description column
 * @param category    category column
 * @param bullets     bullet columns, in order (an array member gives one bullet per element)
 * @param specs       spec columns, or {@code ["*"]}
 * @param text        other running-text columns
 */
public record ColumnMapping(String id, String title, String description, String category,
                            List<String> bullets, List<String> specs, List<String> text) {

    /** The spec entry meaning "every column not otherwise mapped". */
    public static final String ALL_OTHERS = "*";

    private static final Set<String> KEYS = Set.of("id", "title", "description", "category", "bullets", "specs", "text");
    private static final List<String> ID_NAMES = List.of("id", "sku", "productid");
    private static final List<String> TITLE_NAMES = List.of("title", "name", "productname");
    private static final List<String> DESCRIPTION_NAMES = List.of("description", "desc", "body");
    private static final List<String> CATEGORY_NAMES = List.of("category", "type", "department");
    private static final List<String> BULLET_NAMES = List.of("bullets", "features", "highlights");
    private static final List<String> SPEC_NAMES = List.of("specs", "attributes", "specifications");
    private static final Pattern NUMBERED_BULLET = Pattern.compile("(bullet|feature|highlight)s?\\d+");
    private static final ObjectMapper JSON = new ObjectMapper();

    public ColumnMapping {
        bullets = bullets == null ? List.of() : List.copyOf(bullets);
        specs = specs == null ? List.of() : List.copyOf(specs);
        text = text == null ? List.of() : List.copyOf(text);
        for (String s : new String[] {id, title, description, category}) {
            if (s != null && s.isBlank()) {
                throw new IllegalArgumentException("a mapped column name must not be blank; leave it out (null) when the source has no such column");
            }
        }
        if (specs.contains(ALL_OTHERS) && specs.size() > 1) {
            throw new IllegalArgumentException("specs [\"*\"] already takes every other column; list names or \"*\", not both: " + specs);
        }
    }

    /** True when specs is {@code ["*"]}. */
    public boolean specsFromAllOthers() {
        return specs.equals(List.of(ALL_OTHERS));
    }

    /** Every column name this mapping names explicitly (not "*"). */
    public Set<String> mappedNames() {
        Set<String> s = new java.util.LinkedHashSet<>();
        for (String n : new String[] {id, title, description, category}) {
            if (n != null) {
                s.add(n);
            }
        }
        s.addAll(bullets);
        s.addAll(text);
        for (String n : specs) {
            if (!n.equals(ALL_OTHERS)) {
                s.add(n);
            }
        }
        return s;
    }

    /**
     * The mapping detected from column or member names (case, spaces, {@code _} and {@code -} are
     * ignored): id|sku|product_id, title|name|product_name, description|desc|body,
     * category|type|department, bullets|features|highlights (or numbered feature_1, bullet 2 ...),
     * specs|attributes|specifications. When no spec column is found, specs is {@code ["*"]}; a
     * table (CSV/TSV) always takes every other column as a spec.
     */
    static ColumnMapping detect(Collection<String> names, boolean table) {
        Map<String, String> byNorm = new LinkedHashMap<>();
        for (String n : names) {
            byNorm.putIfAbsent(norm(n), n);
        }
        List<String> bullets = new ArrayList<>();
        String bulletList = first(byNorm, BULLET_NAMES);
        if (bulletList != null) {
            bullets.add(bulletList);
        }
        for (String n : names) {
            if (NUMBERED_BULLET.matcher(norm(n)).matches()) {
                bullets.add(n);
            }
        }
        String specs = first(byNorm, SPEC_NAMES);
        List<String> specList = table || specs == null ? List.of(ALL_OTHERS) : List.of(specs);
        return new ColumnMapping(first(byNorm, ID_NAMES), first(byNorm, TITLE_NAMES), first(byNorm, DESCRIPTION_NAMES),
                first(byNorm, CATEGORY_NAMES), bullets, specList, List.of());
    }

    /** True when a column name is one of the spec-container names (specs, attributes, specifications). */
    static boolean isSpecContainerName(String name) {
        return SPEC_NAMES.contains(norm(name));
    }

    private static String first(Map<String, String> byNorm, List<String> candidates) {
        for (String c : candidates) {
            String n = byNorm.get(c);
            if (n != null) {
                return n;
            }
        }
        return null;
    }

    static String norm(String name) {
        StringBuilder b = new StringBuilder(name.length());
        String lower = name.toLowerCase(Locale.ROOT);
        for (int i = 0; i < lower.length(); i++) {
            char c = lower.charAt(i);
            if (Character.isLetterOrDigit(c)) {
                b.append(c);
            }
        }
        return b.toString();
    }

    /**
     * Reads a mapping file: a JSON object with the keys id, title, description, category (strings)
     * and bullets, specs, text (a string or an array of strings), e.g.
     * {@code {"id": "sku", "title": "name", "specs": ["*"]}}. Unknown keys are rejected by name.
     *
     * @throws IOException when the file cannot be read or is not such an object
     */
    public static ColumnMapping read(Path file) throws IOException {
        JsonNode node;
        try {
            node = JSON.readTree(Files.newBufferedReader(file, java.nio.charset.StandardCharsets.UTF_8));
        } catch (NoSuchFileException e) {
            throw new IOException("mapping file " + file + " does not exist; give the path of a JSON mapping file", e);
        } catch (JsonProcessingException e) {
            throw new IOException("mapping file " + file + " is not valid JSON: " + e.getOriginalMessage()
                    + " at line " + e.getLocation().getLineNr() + "; expected an object like {\"id\": \"sku\", \"title\": \"name\"}", e);
        }
        return fromJson(node, "mapping file " + file);
    }

    /** Reads a mapping from a JSON object; {@code where} names it in error messages. */
    static ColumnMapping fromJson(JsonNode node, String where) throws IOException {
        if (node == null || !node.isObject()) {
            throw new IOException(where + ": expected a JSON object like {\"id\": \"sku\", \"title\": \"name\"}, found "
                    + (node == null ? "nothing" : node.getNodeType().name().toLowerCase(Locale.ROOT)));
        }
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!KEYS.contains(k)) {
                throw new IOException(where + ": unknown key '" + k + "' in the column mapping; known keys are "
                        + new java.util.TreeSet<>(KEYS));
            }
        }
        try {
            return new ColumnMapping(string(node, "id", where), string(node, "title", where), string(node, "description", where),
                    string(node, "category", where), strings(node, "bullets", where), strings(node, "specs", where),
                    strings(node, "text", where));
        } catch (IllegalArgumentException e) {
            throw new IOException(where + ": " + e.getMessage(), e);
        }
    }

    private static String string(JsonNode node, String key, String where) throws IOException {
        JsonNode v = node.get(key);
        if (v == null || v.isNull()) {
            return null;
        }
        if (!v.isTextual()) {
            throw new IOException(where + ": '" + key + "' must be a column name (a string), found " + v);
        }
        return v.asText();
    }

    private static List<String> strings(JsonNode node, String key, String where) throws IOException {
        JsonNode v = node.get(key);
        if (v == null || v.isNull()) {
            return List.of();
        }
        if (v.isTextual()) {
            return List.of(v.asText());
        }
        if (!v.isArray()) {
            throw new IOException(where + ": '" + key + "' must be a column name or an array of names, found " + v);
        }
        List<String> out = new ArrayList<>();
        for (JsonNode e : v) {
            if (!e.isTextual()) {
                throw new IOException(where + ": '" + key + "' must hold column names (strings), found " + e);
            }
            out.add(e.asText());
        }
        return out;
    }
}
