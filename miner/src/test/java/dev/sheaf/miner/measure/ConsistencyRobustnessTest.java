package dev.sheaf.miner.measure;

import static dev.sheaf.miner.measure.ConsistencyFixtures.run;
import static dev.sheaf.miner.measure.ConsistencyFixtures.s;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** Random input, a Turkish default locale, determinism under parallel reading, and a misbehaving matcher. */
class ConsistencyRobustnessTest {
    private static final String[] PIECES = {"hood", "Pit-Zips", "lighter", "heavier", "roomier", "not", "no", "a bit",
        "more", "less", "too", "than", "as", "warm", ",", ".", ";", " - ", "!", "?", "I think", "\u00e9t\u00e9", "\uD83D\uDE00",
        "\u0130", "ish", "-ish", "don't", "\u2019", "\"", "(", ")", "12", "kg", "down", "waterproof", "   ", "\n", "\t",
        "x\u0301", "\u200B", "roomy", "spacious", "the", "and", "but"};

    private static String randomSentence(Random r) {
        StringBuilder b = new StringBuilder();
        int n = 1 + r.nextInt(14);
        for (int i = 0; i < n; i++) {
            if (r.nextInt(4) == 0) {
                b.append((char) (32 + r.nextInt(0x2FF)));
            } else {
                b.append(PIECES[r.nextInt(PIECES.length)]);
            }
            b.append(r.nextBoolean() ? " " : "");
        }
        String t = b.toString();
        return t.isBlank() ? "x" : t;
    }

    @Test
    void randomSentencesNeverBreakTheAnalysisAndOffsetsPointAtTheirText() {
        Random r = new Random(20240611L);
        List<FeedbackSentence> sentences = new ArrayList<>();
        for (int i = 0; i < 600; i++) {
            sentences.add(s("P" + (i % 37), "R" + (i % 37), "T" + (i % 37), "w" + (i % 11), randomSentence(r), i + 2));
        }
        ConsistencyReport report = run(sentences, null);
        assertEquals(600, report.sentences());
        for (FeedbackMention m : report.mentions()) {
            assertEquals(m.surface(), m.sentence().substring(m.start(), m.end()));
        }
        int sum = report.attributes().stream().mapToInt(ConsistencyAttribute::mentions).sum();
        assertEquals(report.mentions().size(), sum);
    }

    @Test
    void caseFoldingIgnoresATurkishDefaultLocale() {
        Locale before = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("tr-TR"));
            ConsistencyReport r = run(List.of(s("P1", "R", "T", "a", "PIT ZIPS AND A HOODED SHELL", 2)), null);
            assertTrue(r.attribute("pit-zips").isPresent(), "'PIT' folds to 'pit', not to a dotless i");
            assertTrue(r.attribute("hood").isPresent());
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void parallelReadingGivesTheSameReportEveryRun() {
        Random r = new Random(7);
        List<FeedbackSentence> sentences = new ArrayList<>();
        for (int i = 0; i < 400; i++) {
            sentences.add(s("P" + (i % 50), "R" + (i % 50), "T" + (i % 50), "w" + (i % 9), randomSentence(r), i + 2));
        }
        assertEquals(run(sentences, null), run(sentences, null));
    }

    @Test
    void aMatcherGivingOffsetsOutsideTheSentenceIsABug() {
        FeedbackTermFinder bad = sentence -> List.of(new FeedbackTermHit("hood", 0, 4, "hood", "hood"));
        ConsistencyOptions o = ConsistencyOptions.builder(bad).pseudonyms(ConsistencyFixtures.PSEUDONYMS).build();
        FeedbackSentences f = FeedbackSentences.of("t", List.of(s("P", "R", "T", "a", "no", 2)));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ConsistencyAnalysis.run(f, o));
        assertTrue(e.getMessage().contains("does not point into the sentence"), e.getMessage());
    }
}
