package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.junit.jupiter.api.Test;

/**
 * The sentence table (src/test/resources/measure/mention-sentences.tsv, format in the README
 * beside it): invented outdoor-gear feedback with the reading each span must get. It is a
 * specification, so every row must pass; the test reports the accuracy before failing.
 */
class MentionCuesSentenceTableTest {

    private static final Set<String> FLAGS = Set.of("comparative", "hedged", "excessive", "negated");

    record Row(int line, String sentence, List<MentionSpan> spans, List<String> expected) {
    }

    @Test
    void readsEverySentenceInTheTableAsSpecified() throws IOException {
        List<Row> rows = rows();
        assertTrue(rows.size() >= 60, "expected at least 60 sentences in the table, found " + rows.size());
        int spans = 0;
        List<String> wrong = new ArrayList<>();
        for (Row row : rows) {
            List<Mention> mentions = MentionCues.standard().read(row.sentence(), row.spans());
            for (int i = 0; i < mentions.size(); i++) {
                spans++;
                String got = describe(mentions.get(i));
                String want = normalise(row.expected().get(i));
                if (!got.equals(want)) {
                    wrong.add("line " + row.line() + " '" + mentions.get(i).text() + "' in \"" + row.sentence()
                            + "\": expected " + want + ", got " + got + " " + mentions.get(i).cues());
                }
            }
        }
        System.out.printf(Locale.ROOT, "mention sentence table: %d sentences, %d spans, %d correct (%.1f%%)%n",
                rows.size(), spans, spans - wrong.size(), 100.0 * (spans - wrong.size()) / spans);
        assertEquals(List.of(), wrong, () -> String.join("\n", wrong));
    }

    private static String describe(Mention m) {
        StringBuilder b = new StringBuilder(m.direction().name());
        if (m.comparative()) {
            b.append(" comparative");
        }
        if (m.hedged()) {
            b.append(" hedged");
        }
        if (m.excessive()) {
            b.append(" excessive");
        }
        if (m.negated()) {
            b.append(" negated");
        }
        return b.toString();
    }

    /** Puts the expected flags in {@link #describe}'s order and rejects unknown words. */
    private static String normalise(String expectation) {
        String[] words = expectation.strip().split("\\s+");
        Direction d = Direction.valueOf(words[0]);
        List<String> flags = new ArrayList<>();
        for (int i = 1; i < words.length; i++) {
            if (!FLAGS.contains(words[i])) {
                throw new IllegalArgumentException("unknown flag '" + words[i] + "' in '" + expectation
                        + "'; expected any of " + FLAGS);
            }
            flags.add(words[i]);
        }
        StringBuilder b = new StringBuilder(d.name());
        for (String f : List.of("comparative", "hedged", "excessive", "negated")) {
            if (flags.contains(f)) {
                b.append(' ').append(f);
            }
        }
        return b.toString();
    }

    static List<Row> rows() throws IOException {
        String text;
        try (InputStream in = MentionCuesSentenceTableTest.class.getResourceAsStream("/measure/mention-sentences.tsv")) {
            if (in == null) {
                throw new IOException("test resource /measure/mention-sentences.tsv is missing");
            }
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
        List<Row> rows = new ArrayList<>();
        String[] lines = text.split("\n");
        for (int n = 0; n < lines.length; n++) {
            String line = lines[n].strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            String[] cols = line.split("\t");
            if (cols.length != 2) {
                throw new IOException("line " + (n + 1) + ": expected 2 tab-separated columns, found " + cols.length);
            }
            StringBuilder sentence = new StringBuilder();
            List<MentionSpan> spans = new ArrayList<>();
            int open = -1;
            for (char c : cols[0].toCharArray()) {
                if (c == '[') {
                    open = sentence.length();
                } else if (c == ']') {
                    spans.add(new MentionSpan(open, sentence.length()));
                } else {
                    sentence.append(c);
                }
            }
            List<String> expected = List.of(cols[1].split(";"));
            if (expected.size() != spans.size()) {
                throw new IOException("line " + (n + 1) + ": " + spans.size() + " spans but " + expected.size()
                        + " expectations");
            }
            rows.add(new Row(n + 1, sentence.toString(), spans, expected));
        }
        return rows;
    }
}
