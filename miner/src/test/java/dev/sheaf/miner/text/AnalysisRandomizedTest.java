package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import java.io.IOException;
import java.util.List;
import java.util.Random;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Random-input robustness, in the spirit of Lucene's own analyzer checks: over random strings built
 * from a hostile alphabet (digits glued to units, apostrophes, surrogate pairs, combining marks,
 * breaks, stop and negation words) the chain never throws, offsets stay inside the text, ordered and
 * non-overlapping, position increments are ≥ 1, a reused stream gives the same tokens as a fresh
 * analyzer, and the segmenter agrees with the analyzer token for token.
 */
class AnalysisRandomizedTest {
    private static final String[] PIECES = {
        "1.2kg", "10,000mm", "2 lb 10 oz", "in", "the", "no", "not", "without", "Don’t", "men's", "’s", "DOWN",
        "800-fill", "4x4", "2nd", "😀", "\uD83C\uDFD5", "e\u0301", "İ", "ß", "ﬁ", ".", ",", ";", "\n", "•", "  ", "\t",
        "-", "'", "\"", "½", "°F", "20l", "x", "a", "zip-off", "ÆON", "日本", "١٢٣", "\u0000", "\uFFFD", "((", "ipx7"
    };

    @ParameterizedTest
    @ValueSource(strings = {"default", "plain"})
    void randomTextNeverBreaksTheChainOrItsInvariants(String preset) throws IOException {
        Analysis analysis = Analysis.of(AnalysisProfile.preset(preset));
        Analyzer a = analysis.analyzer();
        Analyzer fresh = Analysis.of(AnalysisProfile.preset(preset)).analyzer();
        Segmenter seg = analysis.newSegmenter();
        Random rnd = new Random(20240611L ^ preset.hashCode());
        int tokensSeen = 0;
        for (int round = 0; round < 2000; round++) {
            String text = randomText(rnd);
            List<String> reused = check(a, text);
            assertEquals(reused, check(fresh, text), "reuse must not change tokens of: " + text);
            tokensSeen += reused.size();
            int[] count = {0};
            Listing l = new Listing("r" + round, "", "random", "", List.of(Field.of(FieldKind.DESCRIPTION, text)));
            seg.analyze(l, (field, part, ids, starts, ends, length) -> {
                for (int i = 0; i < length; i++) {
                    assertTrue(starts[i] >= 0 && ends[i] <= text.length() && starts[i] <= ends[i]);
                    assertTrue(i == 0 || starts[i] >= ends[i - 1]);
                }
                count[0] += length;
            });
            assertTrue(count[0] <= reused.size(), "segments hold at most the analyzer's tokens");
        }
        assertTrue(tokensSeen > 10_000, "the random input must exercise the chain, saw " + tokensSeen + " tokens");
    }

    private static List<String> check(Analyzer a, String text) throws IOException {
        List<String> out = new java.util.ArrayList<>();
        try (TokenStream ts = a.tokenStream("f", text)) {
            CharTermAttribute t = ts.addAttribute(CharTermAttribute.class);
            OffsetAttribute o = ts.addAttribute(OffsetAttribute.class);
            PositionIncrementAttribute p = ts.addAttribute(PositionIncrementAttribute.class);
            ts.reset();
            int lastStart = 0;
            int lastEnd = 0;
            while (ts.incrementToken()) {
                assertTrue(p.getPositionIncrement() >= 1, "position increment " + p.getPositionIncrement() + " in: " + text);
                assertTrue(o.startOffset() >= lastStart, "offsets go backwards in: " + text);
                assertTrue(o.startOffset() >= lastEnd, "tokens overlap in: " + text);
                assertTrue(o.endOffset() <= text.length() && o.startOffset() <= o.endOffset(), "offset outside text: " + text);
                assertTrue(t.length() > 0, "empty term in: " + text);
                lastStart = o.startOffset();
                lastEnd = o.endOffset();
                out.add(t + "@" + o.startOffset() + "-" + o.endOffset() + "+" + p.getPositionIncrement());
            }
            ts.end();
            assertTrue(o.endOffset() <= text.length());
        }
        return out;
    }

    private static String randomText(Random rnd) {
        StringBuilder b = new StringBuilder();
        int n = rnd.nextInt(40);
        for (int i = 0; i < n; i++) {
            switch (rnd.nextInt(4)) {
                case 0 -> b.append(PIECES[rnd.nextInt(PIECES.length)]);
                case 1 -> b.append((char) rnd.nextInt(0x3000));
                case 2 -> b.append(rnd.nextInt(100_000));
                default -> b.append(' ').append(PIECES[rnd.nextInt(PIECES.length)]).append(' ');
            }
        }
        return b.toString();
    }
}
