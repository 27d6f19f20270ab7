package dev.sheaf.miner.ingest;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

/**
 * A workspace: a folder with a {@code workspace.json} naming the listing sources, the analysis
 * profile, the vocabulary, the feedback and judgment files and the output folder. Every path in
 * the file is relative to the folder; here they are absolute and normalised.
 *
 * <pre>{@code
 * {"format": "sheaf-workspace", "formatVersion": 1, "name": "...",
 *  "sources": [{"path": "catalog", "include": ["**}{@code /*"], "exclude": [], "mapping": {...}}],
 *  "profile": "default", "vocabulary": "x.vocab.json", "feedback": "feedback.csv",
 *  "judgments": "judgments.csv", "output": "out"}
 * }</pre>
 *
 * @param dir        the workspace folder (absolute)
 * @param name       display name (default: the folder name)
 * @param sources    listing sources, paths resolved
 * @param profile    the analysis profile: a preset name, or a path as written (see {@link #profileFile()})
 * @param vocabulary the vocabulary file, or null when not named
 * @param feedback   the feedback CSV, or null
 * @param judgments  the judgments CSV, or null
 * @param output     the output folder (default {@code out})
 */
public record Workspace(Path dir, String name, List<SourceSpec> sources, String profile, Path vocabulary,
                        Path feedback, Path judgments, Path output) {
    /** The file a workspace folder holds. */
    public static final String FILE_NAME = "workspace.json";
    public static final String FORMAT = "sheaf-workspace";
    public static final int FORMAT_VERSION = 1;

    private static final Set<String> KEYS = Set.of("format", "formatVersion", "name", "sources", "profile", "vocabulary",
            "feedback", "judgments", "output");
    private static final Set<String> SOURCE_KEYS = Set.of("path", "include", "exclude", "mapping");
    private static final ObjectMapper JSON = new ObjectMapper();

    public Workspace {
        Objects.requireNonNull(dir, "dir");
        Objects.requireNonNull(name, "name");
        sources = List.copyOf(sources);
        Objects.requireNonNull(profile, "profile");
        Objects.requireNonNull(output, "output");
    }

    /** True when {@code dir} holds a {@code workspace.json}. */
    public static boolean isWorkspace(Path dir) {
        return Files.isRegularFile(dir.resolve(FILE_NAME));
    }

    /** The profile as a file, when {@code profile} is a path (ends in .json or names a folder) rather than a preset name. */
    public Optional<Path> profileFile() {
        if (profile.endsWith(".json") || profile.indexOf('/') >= 0 || profile.indexOf('\\') >= 0) {
            return Optional.of(dir.resolve(profile).normalize());
        }
        return Optional.empty();
    }

    /**
     * Loads {@code dir/workspace.json}.
     *
     * @throws IOException when the file is missing, not JSON, has an unknown key (named in the
     *                     message), a wrong format name or version, or a value of the wrong type
     */
    public static Workspace load(Path dir) throws IOException {
        Path abs = dir.toAbsolutePath().normalize();
        Path file = abs.resolve(FILE_NAME);
        if (!Files.isRegularFile(file)) {
            throw new IOException("no " + FILE_NAME + " in " + abs + "; a workspace folder must hold one "
                    + "(see sample-listings/workspace.json), or give the sources on the command line");
        }
        JsonNode root;
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            root = JSON.readTree(r);
        } catch (JsonProcessingException e) {
            throw new IOException(file + ": not valid JSON (" + e.getOriginalMessage() + ") at line "
                    + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr(), e);
        }
        String where = file.toString();
        if (root == null || !root.isObject()) {
            throw new IOException(where + ": expected a JSON object with \"format\": \"" + FORMAT + "\"");
        }
        unknownKeys(root, KEYS, where, "");
        String format = string(root, "format", where, null);
        if (!FORMAT.equals(format)) {
            throw new IOException(where + ": \"format\" must be \"" + FORMAT + "\", found " + (format == null ? "none" : "\"" + format + "\""));
        }
        JsonNode version = root.get("formatVersion");
        if (version == null || !version.isInt() || version.asInt() != FORMAT_VERSION) {
            throw new IOException(where + ": \"formatVersion\" must be " + FORMAT_VERSION + ", found " + version
                    + "; this Sheaf reads workspace files of version " + FORMAT_VERSION);
        }
        JsonNode src = root.get("sources");
        if (src == null || !src.isArray() || src.isEmpty()) {
            throw new IOException(where + ": \"sources\" must be a non-empty array like [{\"path\": \"catalog\"}]");
        }
        List<SourceSpec> sources = new ArrayList<>();
        for (int i = 0; i < src.size(); i++) {
            JsonNode s = src.get(i);
            String at = "sources[" + i + "]";
            if (!s.isObject()) {
                throw new IOException(where + ": " + at + " must be an object like {\"path\": \"catalog\"}, found " + s);
            }
            unknownKeys(s, SOURCE_KEYS, where, at + ".");
            String path = string(s, "path", where + " " + at, null);
            if (path == null || path.isBlank()) {
                throw new IOException(where + ": " + at + " has no \"path\"; give a file or folder relative to the workspace");
            }
            ColumnMapping mapping = s.has("mapping") && !s.get("mapping").isNull()
                    ? ColumnMapping.fromJson(s.get("mapping"), where + " " + at + ".mapping") : null;
            try {
                sources.add(new SourceSpec(abs.resolve(path).normalize(), strings(s, "include", where + " " + at),
                        strings(s, "exclude", where + " " + at), mapping));
            } catch (IllegalArgumentException e) {
                throw new IOException(where + ": " + at + ": " + e.getMessage(), e);
            }
        }
        String name = string(root, "name", where, abs.getFileName() == null ? abs.toString() : abs.getFileName().toString());
        String profile = string(root, "profile", where, "default");
        return new Workspace(abs, name, sources, profile, path(abs, string(root, "vocabulary", where, null)),
                path(abs, string(root, "feedback", where, null)), path(abs, string(root, "judgments", where, null)),
                abs.resolve(string(root, "output", where, "out")).normalize());
    }

    private static Path path(Path dir, String p) {
        return p == null ? null : dir.resolve(p).normalize();
    }

    private static void unknownKeys(JsonNode o, Set<String> known, String where, String prefix) throws IOException {
        for (Iterator<String> it = o.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!known.contains(k)) {
                throw new IOException(where + ": unknown key '" + prefix + k + "'; known keys are " + new TreeSet<>(known)
                        + ". Remove it or fix its spelling");
            }
        }
    }

    private static String string(JsonNode o, String key, String where, String dflt) throws IOException {
        JsonNode v = o.get(key);
        if (v == null || v.isNull()) {
            return dflt;
        }
        if (!v.isTextual()) {
            throw new IOException(where + ": \"" + key + "\" must be a string, found "
                    + v.getNodeType().name().toLowerCase(Locale.ROOT) + " " + v);
        }
        return v.asText();
    }

    private static List<String> strings(JsonNode o, String key, String where) throws IOException {
        JsonNode v = o.get(key);
        if (v == null || v.isNull()) {
            return List.of();
        }
        if (v.isTextual()) {
            return List.of(v.asText());
        }
        if (!v.isArray()) {
            throw new IOException(where + ": \"" + key + "\" must be a glob or an array of globs, found " + v);
        }
        List<String> out = new ArrayList<>();
        for (JsonNode e : v) {
            if (!e.isTextual()) {
                throw new IOException(where + ": \"" + key + "\" must hold glob strings, found " + e);
            }
            out.add(e.asText());
        }
        return out;
    }
}
