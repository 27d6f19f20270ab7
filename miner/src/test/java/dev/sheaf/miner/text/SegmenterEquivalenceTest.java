package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The segmenter's fast path (all texts of a listing in one stream, stop words and negations from
 * term flags) gives exactly the segments that the public Lucene analyzer defines, text by text:
 * a segment ends at a position gap, a break character, a negation or an emoji.
 */
class SegmenterEquivalenceTest {
    private static final String[] PIECES = {
        "1.2kg", "10,000mm", "2 lb 10 oz", "10 in", "in", "the", "from", "no", "not", "without", "Don’t", "men's",
        "DOWN", "800-fill", "4x4", "2nd", "😀", "e\u0301", "İ", "ß", ".", ",", ";", "\n", "•", " ", "-", "'", "20l",
        "x", "a", "zip-off", "ripstop", "nylon", "tent", "12", "kg", "on", "2", "l", "(", ")", "|", "café"};

    private static String random(Random r) {
        StringBuilder b = new StringBuilder();
        for (int i = r.nextInt(25); i > 0; i--) {
            b.append(PIECES[r.nextInt(PIECES.length)]);
            b.append(r.nextInt(3) == 0 ? "" : " ");
        }
        return b.toString();
    }

    /** The reference: each text through analyzer(), cut at position gaps, break gaps, negations and emoji. */
    private static List<String> reference(Analysis a, Listing l) throws IOException {
        List<String> out = new ArrayList<>();
        for (int fi = 0; fi < l.fields().size(); fi++) {
            Field f = l.fields().get(fi);
            if (f.kind() == FieldKind.SPEC) {
                reference(a, fi, SegmentPart.SPEC_KEY, f.key(), out);
                reference(a, fi, SegmentPart.SPEC_VALUE, f.text(), out);
            } else {
                reference(a, fi, SegmentPart.TEXT, f.text(), out);
            }
        }
        return out;
    }

    private static void reference(Analysis a, int field, SegmentPart part, String text, List<String> out) throws IOException {
        StringBuilder seg = new StringBuilder();
        try (TokenStream ts = a.analyzer().tokenStream("f", text)) {
            CharTermAttribute t = ts.addAttribute(CharTermAttribute.class);
            OffsetAttribute o = ts.addAttribute(OffsetAttribute.class);
            PositionIncrementAttribute p = ts.addAttribute(PositionIncrementAttribute.class);
            TypeAttribute ty = ts.addAttribute(TypeAttribute.class);
            ts.reset();
            int prevEnd = 0;
            while (ts.incrementToken()) {
                boolean gap = false;
                for (int i = prevEnd; i < o.startOffset(); i++) {
                    gap |= a.isBreak(text.charAt(i));
                }
                prevEnd = o.endOffset();
                boolean skip = ty.type().equals(Analysis.TYPE_NEGATION) || ty.type().equals(Analysis.TYPE_EMOJI);
                if ((skip || gap || p.getPositionIncrement() > 1) && seg.length() > 0) {
                    out.add(field + "/" + part + ":" + seg);
                    seg.setLength(0);
                }
                if (!skip) {
                    seg.append(' ').append(t).append('@').append(o.startOffset()).append('-').append(o.endOffset());
                }
            }
            ts.end();
        }
        if (seg.length() > 0) {
            out.add(field + "/" + part + ":" + seg);
        }
    }

    private static List<String> fast(Analysis a, Listing l) {
        List<String> out = new ArrayList<>();
        a.newSegmenter().analyze(l, (field, part, ids, starts, ends, length) -> {
            StringBuilder seg = new StringBuilder();
            for (int i = 0; i < length; i++) {
                seg.append(' ').append(a.terms().term(ids[i])).append('@').append(starts[i]).append('-').append(ends[i]);
            }
            out.add(field + "/" + part + ":" + seg);
        });
        return out;
    }

    @ParameterizedTest
    @ValueSource(strings = {"default", "plain"})
    void theFastPathMatchesTheAnalyzerTextByText(String preset) throws IOException {
        Analysis a = Analysis.of(AnalysisProfile.preset(preset));
        Random r = new Random(99 + preset.length());
        int segments = 0;
        for (int i = 0; i < 3000; i++) {
            List<Field> fields = new ArrayList<>();
            for (int k = r.nextInt(5); k >= 0; k--) {
                fields.add(r.nextInt(3) == 0 ? Field.spec(random(r), random(r)) : Field.of(FieldKind.DESCRIPTION, random(r)));
            }
            Listing l = new Listing("x" + i, "", "s", "", fields);
            List<String> want = reference(a, l);
            assertEquals(want, fast(a, l), "listing " + fields);
            segments += want.size();
        }
        assertTrue(segments > 5000, "the random listings must produce segments, got " + segments);
    }
}
