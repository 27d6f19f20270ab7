package dev.sheaf.vocab.store;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.vocab.EditHistory;
import dev.sheaf.vocab.io.AtomicFiles;
import java.io.Closeable;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The append-only edit journal beside a vocabulary file ({@code NAME.journal}), JSON Lines: a
 * header naming the content hash of the file it applies to, then one line per step, each forced
 * to disk before the step takes effect, and a "saving" marker before every save. See
 * docs/decisions/021.
 */
final class Journal implements Closeable {
    static final String FORMAT = "sheaf-vocabulary-journal";

    /** One line after the header: a step, or a marker that a save of content {@code savingHash} began. */
    record Entry(EditHistory.Step step, String savingHash) {
    }

    /** A journal as read back. */
    record Contents(String base, List<Entry> entries, boolean incompleteTail, String damage) {
        List<EditHistory.Step> stepsToReplay(String fileHash) {
            int from;
            if (fileHash.equals(base)) {
                from = 0;
            } else {
                from = -1;
                for (int i = entries.size() - 1; i >= 0; i--) {
                    if (fileHash.equals(entries.get(i).savingHash())) {
                        from = i + 1;
                        break;
                    }
                }
                if (from < 0) {
                    return null;
                }
            }
            List<EditHistory.Step> out = new ArrayList<>();
            for (Entry e : entries.subList(from, entries.size())) {
                if (e.step() != null) {
                    out.add(e.step());
                }
            }
            return out;
        }
    }

    private final Path path;
    private final FileChannel channel;

    private Journal(Path path, FileChannel channel) {
        this.path = path;
        this.channel = channel;
    }

    static Path pathFor(Path file) {
        return file.resolveSibling(file.getFileName() + ".journal");
    }

    /** Starts a journal afresh (atomically replacing any old one): header with {@code base}, then {@code steps}. */
    static Journal start(Path path, String base, List<EditHistory.Step> steps) throws IOException {
        StringBuilder sb = new StringBuilder();
        sb.append(JsonCodec.compact(header(base))).append('\n');
        for (EditHistory.Step s : steps) {
            sb.append(JsonCodec.compact(step(s))).append('\n');
        }
        AtomicFiles.writeString(path, sb.toString());
        FileChannel ch = FileChannel.open(path, StandardOpenOption.WRITE, StandardOpenOption.APPEND);
        return new Journal(path, ch);
    }

    Path path() {
        return path;
    }

    void append(EditHistory.Step s) throws IOException {
        line(JsonCodec.compact(step(s)));
    }

    void markSaving(String hash) throws IOException {
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("kind", "saving");
        n.put("hash", hash);
        line(JsonCodec.compact(n));
    }

    private void line(String json) throws IOException {
        ByteBuffer b = ByteBuffer.wrap((json + "\n").getBytes(StandardCharsets.UTF_8));
        while (b.hasRemaining()) {
            channel.write(b);
        }
        channel.force(false);
    }

    @Override
    public void close() throws IOException {
        channel.close();
    }

    private static ObjectNode header(String base) {
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("journal", FORMAT);
        n.put("version", 1);
        n.put("base", base);
        return n;
    }

    private static ObjectNode step(EditHistory.Step s) {
        ObjectNode n = JsonNodeFactory.instance.objectNode();
        n.put("kind", "step");
        n.put("seq", s.seq());
        n.put("ref", s.ref());
        n.put("action", s.action().name().toLowerCase(Locale.ROOT));
        n.put("description", s.description());
        n.put("when", s.when().toString());
        n.set("forward", JsonCodec.patch(s.forward()));
        n.set("backward", JsonCodec.patch(s.backward()));
        return n;
    }

    /**
     * Reads a journal. A last line without its line end (the program stopped while writing it) is
     * ignored: that step never took effect. Any other unreadable line makes the journal damaged.
     * Returns null when there is no journal.
     */
    static Contents read(Path path) throws IOException {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(path);
        } catch (NoSuchFileException e) {
            return null;
        }
        String text = new String(bytes, StandardCharsets.UTF_8);
        boolean incomplete = !text.isEmpty() && !text.endsWith("\n");
        String[] lines = text.split("\n", -1);
        int usable = lines.length - 1; // the part after the last "\n" is empty or incomplete
        if (usable < 1) {
            return new Contents(null, List.of(), incomplete, incomplete ? null : "the journal is empty");
        }
        String base;
        try {
            JsonNode h = JsonCodec.READER.readTree(lines[0]);
            if (!FORMAT.equals(h.path("journal").asText()) || !h.path("base").isTextual()) {
                return new Contents(null, List.of(), incomplete, "line 1 is not a journal header");
            }
            base = h.get("base").asText();
        } catch (IOException e) {
            return new Contents(null, List.of(), incomplete, "line 1 is not JSON: " + e.getMessage());
        }
        List<Entry> entries = new ArrayList<>();
        for (int i = 1; i < usable; i++) {
            try {
                JsonNode n = JsonCodec.READER.readTree(lines[i]);
                String kind = n.path("kind").asText();
                if (kind.equals("saving")) {
                    entries.add(new Entry(null, n.get("hash").asText()));
                } else if (kind.equals("step")) {
                    entries.add(new Entry(new EditHistory.Step(n.get("seq").asLong(), n.get("ref").asLong(),
                            EditHistory.Action.valueOf(n.get("action").asText().toUpperCase(Locale.ROOT)),
                            n.get("description").asText(), Instant.parse(n.get("when").asText()),
                            JsonCodec.readPatch(n.get("forward")), JsonCodec.readPatch(n.get("backward"))), null));
                } else {
                    return new Contents(base, entries, incomplete, "line " + (i + 1) + " has unknown kind \"" + kind + "\"");
                }
            } catch (IOException | RuntimeException e) {
                return new Contents(base, entries, incomplete, "line " + (i + 1) + " cannot be read: " + e.getMessage());
            }
        }
        return new Contents(base, entries, incomplete, null);
    }
}
