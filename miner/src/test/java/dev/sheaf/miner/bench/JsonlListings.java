package dev.sheaf.miner.bench;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * A minimal reader of the generator's JSONL shape ({"id","category","title","description",
 * "bullets":[...],"specs":{...}}), for tests and the benchmark ONLY, until the ingest stage
 * (dev.sheaf.miner.ingest.Ingest) is merged; sheaf mine itself reads through Ingest.
 * A line that does not parse is reported to {@code problems} and skipped.
 */
public final class JsonlListings {
    private static final JsonFactory JSON = new JsonFactory();

    private JsonlListings() {
    }

    /** Streams every listing of the file to the sink (from this thread); returns the number of bad lines. */
    public static int read(Path file, String displayName, Consumer<Listing> sink, Consumer<String> problems) throws IOException {
        int bad = 0;
        try (java.io.InputStream in = Files.newInputStream(file)) {
            byte[] buf = new byte[1 << 16];
            byte[] line = new byte[1 << 12];
            int len = 0;
            int no = 0;
            int n;
            boolean eof = false;
            while (!eof) {
                n = in.read(buf);
                if (n < 0) {
                    eof = true;
                    n = 0;
                }
                int from = 0;
                for (int i = 0; i <= n; i++) {
                    boolean endOfLine = i < n ? buf[i] == '\n' : eof;
                    if (i == n && !eof) {
                        int k = n - from;
                        if (len + k > line.length) {
                            line = java.util.Arrays.copyOf(line, Math.max(line.length * 2, len + k));
                        }
                        System.arraycopy(buf, from, line, len, k);
                        len += k;
                        break;
                    }
                    if (!endOfLine) {
                        continue;
                    }
                    int k = i - from;
                    if (len + k > line.length) {
                        line = java.util.Arrays.copyOf(line, Math.max(line.length * 2, len + k));
                    }
                    System.arraycopy(buf, from, line, len, k);
                    len += k;
                    from = i + 1;
                    if (eof && i == n && len == 0) {
                        break;
                    }
                    no++;
                    if (!blank(line, len)) {
                        try {
                            sink.accept(parse(line, len, displayName, "line " + no));
                        } catch (IOException | IllegalArgumentException e) {
                            bad++;
                            problems.accept(displayName + ",line " + no + ",parse," + e.getMessage().replace('\n', ' '));
                        }
                    }
                    len = 0;
                }
            }
        }
        return bad;
    }

    private static boolean blank(byte[] b, int len) {
        for (int i = 0; i < len; i++) {
            if (b[i] != ' ' && b[i] != '\r' && b[i] != '\t') {
                return false;
            }
        }
        return true;
    }

    public static List<Listing> readAll(Path file, String displayName) throws IOException {
        List<Listing> out = new ArrayList<>();
        read(file, displayName, out::add, p -> {
            throw new IllegalArgumentException("bad fixture line: " + p);
        });
        return out;
    }

    static Listing parse(byte[] line, int length, String source, String locator) throws IOException {
        String id = "";
        String category = "";
        List<Field> fields = new ArrayList<>();
        try (JsonParser p = JSON.createParser(line, 0, length)) {
            if (p.nextToken() != JsonToken.START_OBJECT) {
                throw new IOException("a line must hold one JSON object");
            }
            String title = null;
            String description = null;
            List<String> bullets = new ArrayList<>();
            List<Field> specs = new ArrayList<>();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String name = p.getCurrentName();
                JsonToken t = p.nextToken();
                switch (name) {
                    case "id" -> id = p.getValueAsString("");
                    case "category" -> category = p.getValueAsString("");
                    case "title" -> title = p.getValueAsString("");
                    case "description" -> description = p.getValueAsString("");
                    case "bullets" -> {
                        if (t == JsonToken.START_ARRAY) {
                            while (p.nextToken() != JsonToken.END_ARRAY) {
                                bullets.add(p.getValueAsString(""));
                            }
                        } else {
                            p.skipChildren();
                        }
                    }
                    case "specs" -> {
                        if (t == JsonToken.START_OBJECT) {
                            while (p.nextToken() == JsonToken.FIELD_NAME) {
                                String key = p.getCurrentName();
                                p.nextToken();
                                specs.add(Field.spec(key, p.getValueAsString("")));
                            }
                        } else {
                            p.skipChildren();
                        }
                    }
                    default -> p.skipChildren();
                }
            }
            if (title != null) {
                fields.add(Field.of(FieldKind.TITLE, title));
            }
            if (description != null) {
                fields.add(Field.of(FieldKind.DESCRIPTION, description));
            }
            for (String b : bullets) {
                fields.add(Field.of(FieldKind.BULLET, b));
            }
            fields.addAll(specs);
        }
        return new Listing(id, category, source, locator, fields);
    }
}
