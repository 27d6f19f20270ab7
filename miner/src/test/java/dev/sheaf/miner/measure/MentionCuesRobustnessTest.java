package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Any text and any in-range spans: never an exception, every offset inside the sentence. */
class MentionCuesRobustnessTest {

    private static final String[] WORDS = {"not", "no", "without", "too", "more", "less", "as", "than", "a", "bit",
            "kind", "of", "I", "think", "hood", "lighter", "roomier", "warm", "-free", "ish", "enough", "doesn't",
            "isn\u2019t", "but", "and", ",", ".", ";", " - ", "(", ")", "\n", "\t", "PFC", "WARMEST", "lightest",
            "water", "sweater", "missing", "not included", "\u00e9t\u00e9", "\u0130", "\u0131", "\uD83C\uDFD5\uFE0F",
            "\u0301", "\uD800", "\uDC00", "\u200B", "\u00A0", "2.5", "kg", "x", "'", "\"", "-", "--", "er", "est"};

    @Test
    void neverThrowsAndKeepsEveryOffsetInsideTheSentenceOnRandomText() {
        Random random = new Random(20240531L);
        for (int round = 0; round < 3000; round++) {
            String sentence = randomSentence(random);
            List<MentionSpan> spans = randomSpans(random, sentence.length());
            List<Mention> mentions = MentionCues.standard().read(sentence, spans);
            assertEquals(spans.size(), mentions.size());
            for (int i = 0; i < spans.size(); i++) {
                Mention m = mentions.get(i);
                assertEquals(spans.get(i).start(), m.start());
                assertEquals(spans.get(i).end(), m.end());
                assertEquals(sentence.substring(m.start(), m.end()), m.text());
                for (Cue c : m.cues()) {
                    assertInside(sentence, c);
                }
            }
            for (Cue c : MentionCues.standard().hedges(sentence)) {
                assertInside(sentence, c);
            }
        }
    }

    @Test
    void givesTheSameReadingsFromManyThreadsAsFromOne() throws Exception {
        List<MentionCuesSentenceTableTest.Row> rows = MentionCuesSentenceTableTest.rows();
        List<List<Mention>> sequential = rows.stream()
                .map(r -> MentionCues.standard().read(r.sentence(), r.spans())).toList();
        for (int round = 0; round < 5; round++) {
            List<List<Mention>> parallel = rows.parallelStream()
                    .map(r -> MentionCues.standard().read(r.sentence(), r.spans())).toList();
            assertEquals(sequential, parallel);
        }
    }

    @Test
    void survivesMisspellingsAndReadsTheCommonOnes() {
        String[] sentences = {"lightr than the other", "heavyer and roomyer", "doesnt have a hod", "isnt waterprof",
                "kinda too bulkey", "abit heavier", "not as warrm as i hoped", "withoot a hood", "moer breathable"};
        for (String s : sentences) {
            List<Mention> ms = MentionCues.standard().read(s, List.of(new MentionSpan(0, s.length()),
                    new MentionSpan(s.length() - 3, s.length())));
            assertEquals(2, ms.size());
        }
        assertEquals(Direction.ABSENT, read("doesnt have a hod", "hod").direction());
        assertEquals(Direction.ABSENT, read("isnt waterprof", "waterprof").direction());
        assertTrue(read("kinda too bulkey", "bulkey").hedged());
        assertEquals(Direction.PRESENT, read("lightr than the other", "lightr").direction(),
                "an unknown word that does not end in -er is no comparative, even before 'than'");
    }

    @Test
    void readsTheSameUnderATurkishDefaultLocale() {
        String s = "I THINK IT IS NOT LIGHTER, AND THE HOOD IS TOO BIG; WITHOUT PIT ZIPS";
        List<MentionSpan> spans = List.of(span(s, "LIGHTER"), span(s, "HOOD"), span(s, "BIG"), span(s, "PIT ZIPS"));
        List<Mention> root = MentionCues.standard().read(s, spans);
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("tr-TR"));
            List<Mention> turkish = MentionCues.standard().read(s, spans);
            assertEquals(root, turkish);
            assertEquals(List.of(Direction.LESS, Direction.PRESENT, Direction.MORE, Direction.ABSENT),
                    turkish.stream().map(Mention::direction).toList());
            assertTrue(turkish.get(0).hedged(), "'I THINK' folds to 'i think', not to a dotless i");
            assertEquals("light", turkish.get(0).cues(CueKind.DEGREE_FORM).get(0).normal());
            assertEquals("i think", MentionCues.standard().hedges(s).get(0).normal());
        } finally {
            Locale.setDefault(saved);
        }
    }

    private static Mention read(String sentence, String term) {
        return MentionCues.standard().read(sentence, span(sentence, term));
    }

    private static MentionSpan span(String sentence, String term) {
        int at = sentence.indexOf(term);
        return new MentionSpan(at, at + term.length());
    }

    private static void assertInside(String sentence, Cue c) {
        assertTrue(c.start() >= 0 && c.end() <= sentence.length() && c.start() < c.end(),
                () -> c + " outside [0, " + sentence.length() + ") of '" + sentence + "'");
        assertEquals(sentence.substring(c.start(), c.end()), c.text());
    }

    private static String randomSentence(Random random) {
        StringBuilder b = new StringBuilder();
        int words = random.nextInt(25);
        for (int i = 0; i < words; i++) {
            if (random.nextInt(8) == 0) {
                b.append((char) random.nextInt(0x3000));
            } else {
                b.append(WORDS[random.nextInt(WORDS.length)]);
            }
            if (random.nextBoolean()) {
                b.append(' ');
            }
        }
        return b.toString();
    }

    private static List<MentionSpan> randomSpans(Random random, int length) {
        List<MentionSpan> spans = new ArrayList<>();
        if (length == 0) {
            return spans;
        }
        int n = random.nextInt(5);
        for (int i = 0; i < n; i++) {
            int start = random.nextInt(length);
            int end = start + 1 + random.nextInt(Math.min(12, length - start));
            spans.add(new MentionSpan(start, end));
        }
        return spans;
    }
}
