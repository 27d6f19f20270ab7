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
 * Turns listings into segments for the miner; one per thread (not thread-safe), reusing one token
 * stream, its own buffers and a term cache, so the per-token work allocates nothing once a term
 * has been seen.
 *
 * <p>A segment ends at: the end of a field text (a spec's key and value are separate texts); a gap
 * between two tokens that holds one of the profile's break characters (sentence ends, list
 * punctuation, line breaks); a removed stop word (a removed word is a boundary, never glue, so
 * "away from direct heat" gives "away" and "direct heat"); a negation word; an emoji.
 *
 * <p>For speed the texts of one listing go through the chain as one string, joined by line breaks
 * (a token never spans one), and stop words, negations and the unit-after-number rule are applied
 * here from term flags instead of by a stop filter. The result is token for token what
 * {@link Analysis#analyzer()} gives for each text on its own (tested).
 */
public final class Segmenter {
    private final Analysis analysis;
    private final TermCache cache;
    /** The unit-after-number rule belongs to number/unit handling ({@code numbers: split-units}). */
    private final boolean unitRule;
    private int[] ids = new int[256];
    private int[] starts = new int[256];
    private int[] ends = new int[256];

    private final StringBuilder joined = new StringBuilder(1024);
    private int[] partStart = new int[32];
    private int[] partField = new int[32];
    private SegmentPart[] partKind = new SegmentPart[32];
    private int parts;

    private TokenStream lastStream;
    private CharTermAttribute termAtt;
    private OffsetAttribute offsetAtt;
    private TypeAttribute typeAtt;
    private PositionIncrementAttribute posAtt;

    Segmenter(Analysis analysis) {
        this.analysis = analysis;
        this.cache = new TermCache(analysis.terms());
        this.unitRule = analysis.profile().numbers() == AnalysisProfile.Numbers.SPLIT_UNITS;
    }

    /** Analyses every field of the listing in order and hands each segment to the sink. */
    public void analyze(Listing listing, SegmentSink sink) {
        joined.setLength(0);
        parts = 0;
        List<Field> fields = listing.fields();
        for (int fi = 0; fi < fields.size(); fi++) {
            Field f = fields.get(fi);
            if (f.kind() == FieldKind.SPEC) {
                addPart(fi, SegmentPart.SPEC_KEY, f.key());
                addPart(fi, SegmentPart.SPEC_VALUE, f.text());
            } else {
                addPart(fi, SegmentPart.TEXT, f.text());
            }
        }
        run(sink);
    }

    /** Analyses one text as field {@code field}, part {@code part}. */
    public void analyze(int field, SegmentPart part, String text, SegmentSink sink) {
        joined.setLength(0);
        parts = 0;
        addPart(field, part, text);
        run(sink);
    }

    private void addPart(int field, SegmentPart kind, String text) {
        if (text.isEmpty()) {
            return;
        }
        if (parts == partStart.length) {
            partStart = Arrays.copyOf(partStart, parts * 2);
            partField = Arrays.copyOf(partField, parts * 2);
            partKind = Arrays.copyOf(partKind, parts * 2);
        }
        if (joined.length() > 0) {
            joined.append('\n');
        }
        partStart[parts] = joined.length();
        partField[parts] = field;
        partKind[parts] = kind;
        parts++;
        joined.append(text);
    }

    private void run(SegmentSink sink) {
        if (parts == 0) {
            return;
        }
        String text = joined.toString();
        TokenStream ts = analysis.miningAnalyzer().tokenStream("text", text);
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
            int p = 0;
            int base = 0;
            int nextStart = parts > 1 ? partStart[1] : Integer.MAX_VALUE;
            int prevEnd = 0;
            boolean prevNumber = false;
            while (ts.incrementToken()) {
                int start = offsetAtt.startOffset();
                int end = offsetAtt.endOffset();
                if (start >= nextStart) {
                    if (n > 0) {
                        sink.segment(partField[p], partKind[p], ids, starts, ends, n);
                        n = 0;
                    }
                    while (p + 1 < parts && start >= partStart[p + 1]) {
                        p++;
                    }
                    base = partStart[p];
                    nextStart = p + 1 < parts ? partStart[p + 1] : Integer.MAX_VALUE;
                    prevEnd = base;
                    prevNumber = false;
                }
                boolean adjacent = posAtt.getPositionIncrement() == 1;
                boolean boundary = !adjacent || gapBreaks(text, prevEnd, start);
                prevEnd = end;
                int id = cache.id(termAtt.buffer(), termAtt.length());
                int flags = cache.lastFlags;
                boolean afterNumber = unitRule && prevNumber && adjacent;
                prevNumber = (flags & Analysis.NUMBER) != 0;
                boolean skip;
                if ((flags & Analysis.NEGATION) != 0 || typeAtt.type() == Analysis.TYPE_EMOJI) {
                    skip = true;
                } else if ((flags & Analysis.UNIT) != 0 && afterNumber) {
                    skip = false;
                } else {
                    skip = (flags & Analysis.STOP) != 0;
                }
                if (skip || boundary) {
                    if (n > 0) {
                        sink.segment(partField[p], partKind[p], ids, starts, ends, n);
                        n = 0;
                    }
                    if (skip) {
                        continue;
                    }
                }
                if (n == ids.length) {
                    grow();
                }
                ids[n] = id;
                starts[n] = start - base;
                ends[n] = end - base;
                n++;
            }
            ts.end();
            if (n > 0) {
                sink.segment(partField[p], partKind[p], ids, starts, ends, n);
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
