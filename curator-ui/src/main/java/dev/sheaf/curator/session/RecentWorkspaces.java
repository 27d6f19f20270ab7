package dev.sheaf.curator.session;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.vocab.io.AtomicFiles;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The workspaces opened lately, most recent first, at most {@value #MAX}: a small JSON file
 * ({@code {"format": "sheaf-recent-workspaces", "formatVersion": 1, "workspaces": ["/abs/path", ...]}})
 * in the user's config folder, written atomically. A missing or unreadable file is an empty list
 * (it only saves typing; nothing depends on it).
 *
 * <p>Config folder: the system property {@code sheaf.config.dir} when set, else
 * {@code $XDG_CONFIG_HOME/sheaf}, else {@code ~/.config/sheaf}.
 */
public final class RecentWorkspaces {
    public static final int MAX = 10;
    public static final String FILE_NAME = "recent-workspaces.json";
    private static final String FORMAT = "sheaf-recent-workspaces";
    private static final ObjectMapper JSON = new ObjectMapper();

    private final Path file;

    public RecentWorkspaces(Path file) {
        this.file = file;
    }

    /** The list in the user's config folder. */
    public static RecentWorkspaces forUser() {
        return new RecentWorkspaces(configDir().resolve(FILE_NAME));
    }

    /** The user's Sheaf config folder (see the class comment). */
    public static Path configDir() {
        String p = System.getProperty("sheaf.config.dir");
        if (p != null && !p.isBlank()) {
            return Path.of(p);
        }
        String xdg = System.getenv("XDG_CONFIG_HOME");
        if (xdg != null && !xdg.isBlank()) {
            return Path.of(xdg, "sheaf");
        }
        return Path.of(System.getProperty("user.home"), ".config", "sheaf");
    }

    public Path file() {
        return file;
    }

    /** The remembered folders that still hold a workspace, most recent first. */
    public List<Path> list() {
        List<Path> out = new ArrayList<>();
        try {
            if (!Files.isRegularFile(file)) {
                return out;
            }
            JsonNode root = JSON.readTree(Files.readString(file, StandardCharsets.UTF_8));
            JsonNode ws = root == null ? null : root.get("workspaces");
            if (ws != null && ws.isArray()) {
                for (JsonNode n : ws) {
                    Path p = Path.of(n.asText());
                    if (dev.sheaf.miner.ingest.Workspace.isWorkspace(p) && !out.contains(p) && out.size() < MAX) {
                        out.add(p);
                    }
                }
            }
        } catch (IOException | RuntimeException e) {
            return out;
        }
        return out;
    }

    /** Puts {@code dir} first (absolute, normalised) and writes the file atomically. */
    public List<Path> remember(Path dir) throws IOException {
        Path abs = dir.toAbsolutePath().normalize();
        List<Path> l = new ArrayList<>(list());
        l.remove(abs);
        l.add(0, abs);
        while (l.size() > MAX) {
            l.remove(l.size() - 1);
        }
        ObjectNode root = JSON.createObjectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", 1);
        ArrayNode a = root.putArray("workspaces");
        l.forEach(p -> a.add(p.toString()));
        Files.createDirectories(file.getParent());
        AtomicFiles.writeString(file, JSON.writerWithDefaultPrettyPrinter().writeValueAsString(root) + "\n");
        return l;
    }
}
