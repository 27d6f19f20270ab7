package dev.sheaf.miner.suggest;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.miner.text.TokenSegment;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The harvest's candidates as arrays indexed by candidate number, with the written form to show and
 * a way to turn any text into the harvest's form of a term (the analysed tokens joined by spaces).
 */
final class Catalog {
    final Harvest harvest;
    final Analysis analysis;
    final String[] terms;
    final String[][] tokens;
    final String[] shown;
    final String[] groupKeys;
    final long[] frequency;
    final long[] df;
    final long listings;
    final int maxN;
    private final Object2IntOpenHashMap<String> index = new Object2IntOpenHashMap<>();
    private final Map<String, String> formCache = new HashMap<>();

    Catalog(Harvest harvest, Analysis analysis) {
        this.harvest = harvest;
        this.analysis = analysis;
        List<Harvest.Candidate> cs = harvest.candidates();
        int n = cs.size();
        terms = new String[n];
        tokens = new String[n][];
        shown = new String[n];
        groupKeys = new String[n];
        frequency = new long[n];
        df = new long[n];
        index.defaultReturnValue(-1);
        int max = 1;
        for (int i = 0; i < n; i++) {
            Harvest.Candidate c = cs.get(i);
            terms[i] = c.term();
            tokens[i] = c.term().split(" ");
            max = Math.max(max, tokens[i].length);
            shown[i] = shownForm(c);
            groupKeys[i] = c.groupKey();
            frequency[i] = c.frequency();
            df[i] = c.df();
            index.putIfAbsent(c.term(), i);
        }
        maxN = max;
        listings = Math.max(1, harvest.corpus().listings());
    }

    int size() {
        return terms.length;
    }

    /** The candidate number of a harvest-form term, or -1. */
    int indexOf(String term) {
        return term == null ? -1 : index.getInt(term);
    }

    List<EvidenceLine> evidence(int i) {
        return harvest.candidates().get(i).evidence();
    }

    /**
     * The harvest's form of a text: its tokens through the harvest's analysis, joined by single
     * spaces; null when the text is not one segment (it holds a stop word, a break or nothing countable).
     */
    synchronized String formOf(String text) {
        return formCache.computeIfAbsent(text, t -> {
            List<TokenSegment> segs = analysis.segments(new Listing("-", "", "-", "", List.of(Field.of(FieldKind.TEXT, t))));
            if (segs.size() != 1) {
                return null;
            }
            return String.join(" ", segs.get(0).terms());
        });
    }

    /** The candidate number of any written text ("Two-Way Zipper"), or -1. */
    int find(String text) {
        int i = indexOf(text);
        return i >= 0 ? i : indexOf(formOf(text));
    }

    /** The written form seen most often in the evidence (ties: the first seen), else the term. */
    private static String shownForm(Harvest.Candidate c) {
        Map<String, Integer> counts = new HashMap<>();
        String best = null;
        int bestCount = 0;
        for (EvidenceLine e : c.evidence()) {
            int k = counts.merge(e.match(), 1, Integer::sum);
            if (k > bestCount) {
                best = e.match();
                bestCount = k;
            }
        }
        return best == null ? c.term() : best;
    }
}
