package dev.sheaf.miner.mine;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.miner.text.SegmentPart;
import java.util.Comparator;
import java.util.List;

/**
 * Cuts evidence lines for one worker: reads back each listing that supplies evidence from the text
 * spill, with the token offsets its analysis recorded (a stored symbol position names the same
 * token), and cuts the keyword-in-context line around the occurrence.
 */
final class EvidenceCutter {
    private static final SegmentPart[] PARTS = SegmentPart.values();

    private final TextSpill spill;
    private final String[] sources;
    private final int width;

    EvidenceCutter(TextSpill spill, String[] sources, int width) {
        this.spill = spill;
        this.sources = sources;
        this.width = width;
    }

    /** wanted: {ref, candidate, slot}; writes out[candidate][slot]. */
    void cut(List<long[]> wanted, int[] candLevel, EvidenceLine[][] out) {
        wanted.sort(Comparator.comparingLong(a -> a[0]));
        int i = 0;
        while (i < wanted.size()) {
            int listing = FinalPart.refListing(wanted.get(i)[0]);
            TextSpill.Stored st = spill.read(listing, sources);
            Listing l = st.listing();
            while (i < wanted.size() && FinalPart.refListing(wanted.get(i)[0]) == listing) {
                long[] w = wanted.get(i++);
                int pos = FinalPart.refPos(w[0]);
                int cand = (int) w[1];
                int last = pos + candLevel[cand] - 1;
                if (last >= st.positions() || st.field()[pos] < 0 || st.field()[pos] != st.field()[last]
                        || st.part()[pos] != st.part()[last]) {
                    throw new IllegalStateException("stored offsets of listing " + l.id() + " do not match its tokens");
                }
                Field f = l.fields().get(st.field()[pos]);
                SegmentPart part = PARTS[st.part()[pos]];
                String text = part == SegmentPart.SPEC_KEY ? f.key() : f.text();
                String label = part == SegmentPart.SPEC_KEY ? "spec-key" : f.kind().label();
                String key = f.kind() == FieldKind.SPEC ? f.key() : "";
                out[cand][(int) w[2]] = EvidenceLine.cut(l.id(), l.source(), l.locator(), label, key, text,
                        st.start()[pos], st.end()[last], width);
            }
        }
    }
}
