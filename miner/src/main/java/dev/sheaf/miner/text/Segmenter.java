package dev.sheaf.miner.text;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Arrays;
import java.util.List;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.TypeAttribute;

/**
 * Turns listings into segments for the miner; one per thread (not thread-safe), reusing the
 * analyzer's token streams, its own buffers and a term cache, so the per-token work allocates
 * nothing once a term has been seen.
 *
 * <p>A segment ends at: the end of a field text (a spec's key and value are separate texts); a gap
 * between two tokens that holds one of the profile's break characters (sentence ends, list
 * punctuation, line breaks); a removed stop word (a position gap — a removed word is a boundary,
 * never glue, so "away from direct heat" gives "away" and "direct heat"); a negation word; an emoji.
 */
public final class Segmenter {
    private final Analysis analysis;
    private final TermCache cache;
    private int[] ids = new int[256];
    private int[] starts = new int[256];
    private int[] ends = new int[256];

    private TokenStream lastStream;
    private CharTermAttribute termAtt;
    private OffsetAttribute offsetAtt;
    private TypeAttribute typeAtt;
    private PositionIncrementAttribute posAtt;

    Segmenter(Analysis analysis) {
        this.analysis = analysis;
        this.cache = new TermCache(analysis.terms());
    }

    /** Analyses every field of the listing in order and hands each segment to the sink. */
    public void analyze(Listing listing, SegmentSink sink) {
        List<Field> fields = listing.fields();
        for (int fi = 0; fi < fields.size(); fi++) {
            Field f = fields.get(fi);
            if (f.kind() == FieldKind.SPEC) {
                run(fi, SegmentPart.SPEC_KEY, f.key(), sink);
                run(fi, SegmentPart.SPEC_VALUE, f.text(), sink);
            } else {
                run(fi, SegmentPart.TEXT, f.text(), sink);
            }
        }
    }

    /** Analyses one text as field {@code field}, part {@code part}. */
    public void analyze(int field, SegmentPart part, String text, SegmentSink sink) {
        run(field, part, text, sink);
    }

    private void run(int field, SegmentPart part, String text, SegmentSink sink) {
        if (text.isEmpty()) {
            return;
        }
        TokenStream ts = analysis.analyzer().tokenStream("text", text);
        if (ts != lastStream) {
            lastStream = ts;
            termAtt = ts.getAttribute(CharTermAttribute.class);
            offsetAtt = ts.getAttribute(OffsetAttribute.class);
            typeAtt = ts.getAttribute(TypeAttribute.class);
            posAtt = ts.getAttribute(PositionIncrementAttribute.class);
        }
        try {
            ts.reset();
            int n = 0;
            int prevEnd = 0;
            while (ts.incrementToken()) {
                int start = offsetAtt.startOffset();
                int end = offsetAtt.endOffset();
                boolean boundary = posAtt.getPositionIncrement() > 1 || gapBreaks(text, prevEnd, start);
                prevEnd = end;
                String type = typeAtt.type();
                if (type == Analysis.TYPE_NEGATION || type == Analysis.TYPE_EMOJI) {
                    if (n > 0) {
                        sink.segment(field, part, ids, starts, ends, n);
                        n = 0;
                    }
                    continue;
                }
                if (boundary && n > 0) {
                    sink.segment(field, part, ids, starts, ends, n);
                    n = 0;
                }
                if (n == ids.length) {
                    grow();
                }
                ids[n] = cache.id(termAtt.buffer(), termAtt.length());
                starts[n] = start;
                ends[n] = end;
                n++;
            }
            ts.end();
            if (n > 0) {
                sink.segment(field, part, ids, starts, ends, n);
            }
        } catch (IOException e) {
            // reading from a String cannot fail; a failure here is a programming error
            throw new UncheckedIOException(e);
        } finally {
            try {
                ts.close();
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        }
    }

    private boolean gapBreaks(String text, int from, int to) {
        for (int i = from; i < to; i++) {
            if (analysis.isBreak(text.charAt(i))) {
                return true;
            }
        }
        return false;
    }

    private void grow() {
        int n = ids.length * 2;
        ids = Arrays.copyOf(ids, n);
        starts = Arrays.copyOf(starts, n);
        ends = Arrays.copyOf(ends, n);
    }
}
