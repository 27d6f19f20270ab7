package dev.sheaf.miner.mine;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.sheaf.miner.text.EvidenceLine;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

/**
 * Scores, filters and ranks the pruned n-grams, and builds the harvest records of the final
 * candidates. The candidate pool is every n-gram that reached the minimum frequency and df; C-value
 * nesting is computed over that pool. Ranking is total and deterministic: rank score descending,
 * frequency descending, term ascending (the term is unique, so no two candidates ever tie).
 */
final class Scoring {
    private final MineJob.Counting c;
    private final HarvestOptions o;
    private final int maxLevel;
    private final long n;
    private final long listings;

    /** Pool: level and index of each entry. */
    private int[] pLevel;
    private int[] pIdx;
    private int poolSize;
    /** Nested frequency sums and counts per level and index (for C-value and termhood). */
    private final long[][] nestedSum;
    private final int[][] nestedCount;
    /** Per level and index: frequency of the most frequent one-word-longer extension (for termhood). */
    private final int[][] maxExtension;

    private final boolean[] letter;
    private final boolean[] number;
    private final boolean[] unit;
    /** Per unit token: its occurrences right after a number or unit, from the counted bigrams (a lower bound). */
    private final long[] afterNumber;

    /** Survivors of the filters: pool entry and rank score. */
    private int[] survivor;
    private double[] rankScore;
    private String[] termCache;
    private int survivors;

    Scoring(MineJob.Counting c) {
        this.c = c;
        this.o = c.outer().options;
        this.maxLevel = c.levelsCounted();
        this.n = c.tokens();
        this.listings = c.listings();
        this.nestedSum = new long[maxLevel + 1][];
        this.nestedCount = new int[maxLevel + 1][];
        this.maxExtension = new int[maxLevel + 1][];
        String[] terms = c.terms();
        letter = new boolean[terms.length];
        number = new boolean[terms.length];
        unit = new boolean[terms.length];
        Set<String> units = c.outer().analysis.profile().units();
        for (int id = 0; id < terms.length; id++) {
            String t = terms[id];
            letter[id] = t.codePoints().anyMatch(Character::isLetter);
            number[id] = isNumber(t);
            unit[id] = units.contains(t);
        }
        afterNumber = new long[terms.length];
        if (maxLevel >= 2 && o.dropQuantities()) {
            int[] pair = new int[2];
            for (int i = 0; i < c.level(2).size; i++) {
                c.tokensOf(2, i, pair);
                // after a number, or after a unit of one ("10k mm": the k of ten thousand)
                if ((number[pair[0]] || unit[pair[0]]) && unit[pair[1]]) {
                    afterNumber[pair[1]] += c.tf(2, i);
                }
            }
        }
    }

    /**
     * A quantity's tail (decision 052): a term of two or more words whose first word is a unit that
     * follows a number (or a unit after one) at least {@link HarvestOptions#QUANTITY_TAIL_SHARE} of the times it occurs ("d nylon"
     * of "70D nylon", "mm waterproof rating" of "3000 mm waterproof rating"). The number is cut off by
     * the n-gram's start, not by the text: the term itself ("nylon", "waterproof rating") is a
     * candidate of its own and the quantity a spec value.
     */
    private boolean quantityTail(int m, int[] t) {
        return m >= 2 && unit[t[0]] && afterNumber[t[0]] >= HarvestOptions.QUANTITY_TAIL_SHARE * c.tf(1, t[0]);
    }

    private static boolean isNumber(String t) {
        if (t.isEmpty() || !Character.isDigit(t.charAt(0))) {
            return false;
        }
        for (int i = 0; i < t.length(); i++) {
            char ch = t.charAt(i);
            if (!Character.isDigit(ch) && ch != '.' && ch != ',') {
                return false;
            }
        }
        return true;
    }

    int level(int p) {
        return pLevel[survivor[p]];
    }

    int index(int p) {
        return pIdx[survivor[p]];
    }

    // ------------------------------------------------------------------ selection

    /** Finds the survivors (by level and index) that are site-template text; null when none can be. */
    interface TemplateCheck {
        boolean[] find(int[] level, int[] index) throws InterruptedException;
    }

    /** Returns the selected survivors (indices into the survivor list) in rank order. */
    int[] select(TemplateCheck template) throws InterruptedException {
        buildPool();
        nest();
        filter();
        dropTemplate(template);
        int limit = o.limit() == 0 ? survivors : Math.min(o.limit(), survivors);
        int[] chosen;
        if (limit == survivors) {
            chosen = new int[survivors];
            for (int i = 0; i < survivors; i++) {
                chosen[i] = i;
            }
        } else {
            chosen = topK(limit);
        }
        Integer[] boxed = new Integer[chosen.length];
        for (int i = 0; i < chosen.length; i++) {
            boxed[i] = chosen[i];
        }
        Arrays.sort(boxed, this::compare);
        for (int i = 0; i < chosen.length; i++) {
            chosen[i] = boxed[i];
        }
        return chosen;
    }

    long survivors() {
        return survivors;
    }

    private void buildPool() {
        int size = 0;
        for (int id = 0; id < c.vocab(); id++) {
            if (c.frequent1(id)) {
                size++;
            }
        }
        for (int m = 2; m <= maxLevel; m++) {
            size += c.level(m).size;
        }
        pLevel = new int[size];
        pIdx = new int[size];
        int p = 0;
        for (int id = 0; id < c.vocab(); id++) {
            if (c.frequent1(id)) {
                pLevel[p] = 1;
                pIdx[p++] = id;
            }
        }
        for (int m = 2; m <= maxLevel; m++) {
            for (int i = 0; i < c.level(m).size; i++) {
                pLevel[p] = m;
                pIdx[p++] = i;
            }
        }
        poolSize = size;
    }

    /**
     * For every pool n-gram b of length ≥ 2, each distinct shorter n-gram a inside it gets f(b) and
     * one more container (C-value), and its two one-word-shorter parts learn f(b) as a candidate for
     * their most frequent extension (termhood).
     */
    private void nest() {
        nestedSum[1] = new long[c.vocab()];
        nestedCount[1] = new int[c.vocab()];
        maxExtension[1] = new int[c.vocab()];
        for (int m = 2; m <= maxLevel; m++) {
            nestedSum[m] = new long[c.level(m).size];
            nestedCount[m] = new int[c.level(m).size];
            maxExtension[m] = new int[c.level(m).size];
        }
        int[] t = new int[HarvestOptions.MAX_NGRAM];
        long[] seen = new long[32];
        for (int p = 0; p < poolSize; p++) {
            int m = pLevel[p];
            if (m < 2) {
                continue;
            }
            c.tokensOf(m, pIdx[p], t);
            long fb = c.tf(m, pIdx[p]);
            int nSeen = 0;
            for (int len = 1; len < m; len++) {
                for (int s = 0; s + len <= m; s++) {
                    int idx = c.indexOf(t, s, len);
                    if (idx < 0) {
                        throw new IllegalStateException("a part of a frequent n-gram was pruned; the counts are inconsistent");
                    }
                    long key = ((long) len << 40) | idx;
                    boolean dup = false;
                    for (int q = 0; q < nSeen; q++) {
                        if (seen[q] == key) {
                            dup = true;
                            break;
                        }
                    }
                    if (dup) {
                        continue;
                    }
                    seen[nSeen++] = key;
                    nestedSum[len][idx] += fb;
                    nestedCount[len][idx]++;
                    if (len == m - 1 && fb > maxExtension[len][idx]) {
                        maxExtension[len][idx] = (int) fb;
                    }
                }
            }
        }
    }

    /** Removes the survivors the check marks, keeping the others in order. */
    private void dropTemplate(TemplateCheck template) throws InterruptedException {
        int[] lv = new int[survivors];
        int[] ix = new int[survivors];
        for (int s = 0; s < survivors; s++) {
            lv[s] = pLevel[survivor[s]];
            ix[s] = pIdx[survivor[s]];
        }
        boolean[] drop = template.find(lv, ix);
        if (drop == null) {
            return;
        }
        int kept = 0;
        for (int s = 0; s < survivors; s++) {
            if (!drop[s]) {
                survivor[kept] = survivor[s];
                rankScore[kept] = rankScore[s];
                kept++;
            }
        }
        survivors = kept;
        termCache = new String[kept];
    }

    private void filter() {
        survivor = new int[poolSize];
        rankScore = new double[poolSize];
        int[] t = new int[HarvestOptions.MAX_NGRAM];
        int s = 0;
        for (int p = 0; p < poolSize; p++) {
            int m = pLevel[p];
            if (m > o.ngramMax()) {
                continue; // counted for nesting only
            }
            int idx = pIdx[p];
            long df = c.df(m, idx);
            if ((double) df / (double) listings > o.maxDfShare()) {
                continue;
            }
            c.tokensOf(m, idx, t);
            if (o.dropNumbers() || o.dropQuantities()) {
                boolean anyLetter = false;
                boolean anyUnit = false;
                boolean allQuantity = true;
                for (int i = 0; i < m; i++) {
                    anyLetter |= letter[t[i]];
                    anyUnit |= unit[t[i]];
                    allQuantity &= number[t[i]] || unit[t[i]];
                }
                if (o.dropNumbers() && !anyLetter) {
                    continue;
                }
                // numbers and units only ("1.2 kg", "kg", "10,000 mm"): quantities, harvested from spec values
                if (o.dropQuantities() && allQuantity && anyUnit) {
                    continue;
                }
                if (o.dropQuantities() && quantityTail(m, t)) {
                    continue;
                }
            }
            // a part of the page, not of the product: nearly every occurrence is in a section heading (decision 051)
            if (o.dropHeadings() && c.wholeHeadings(t, m) >= HarvestOptions.HEADING_SHARE * c.tf(m, idx)) {
                continue;
            }
            Scores sc = null;
            if (m >= 2 && o.minNpmi() > -1) {
                sc = scores(m, idx, t);
                if (!(sc.npmi > o.minNpmi())) {
                    continue;
                }
            }
            double r;
            switch (o.rankBy()) {
                case TERMHOOD -> r = termhood(m, idx);
                case FREQUENCY -> r = c.tf(m, idx);
                case DF -> r = df;
                case C_VALUE -> r = m >= 2 ? cValue(m, idx) : Double.NEGATIVE_INFINITY;
                default -> {
                    if (m < 2) {
                        r = Double.NEGATIVE_INFINITY;
                    } else {
                        if (sc == null) {
                            sc = scores(m, idx, t);
                        }
                        r = sc.get(o.rankBy());
                    }
                }
            }
            survivor[s] = p;
            rankScore[s] = r;
            s++;
        }
        survivors = s;
        termCache = new String[s];
    }

    private String term(int s) {
        String t = termCache[s];
        if (t == null) {
            int p = survivor[s];
            t = c.term(pLevel[p], pIdx[p]);
            termCache[s] = t;
        }
        return t;
    }

    private long tfOf(int s) {
        int p = survivor[s];
        return c.tf(pLevel[p], pIdx[p]);
    }

    /** Rank order: score descending, frequency descending, term ascending. */
    private int compare(int a, int b) {
        int x = Double.compare(rankScore[b], rankScore[a]);
        if (x != 0) {
            return x;
        }
        x = Long.compare(tfOf(b), tfOf(a));
        if (x != 0) {
            return x;
        }
        return term(a).compareTo(term(b));
    }

    /** The best k survivors (unordered) with a bounded heap whose root is the worst kept. */
    private int[] topK(int k) {
        int[] heap = new int[k];
        int size = 0;
        for (int s = 0; s < survivors; s++) {
            if (size < k) {
                heap[size] = s;
                siftUp(heap, size++);
            } else if (compare(s, heap[0]) < 0) {
                heap[0] = s;
                siftDown(heap, size);
            }
        }
        return heap;
    }

    // max-heap in rank order: the root is the candidate that ranks last
    private void siftUp(int[] h, int i) {
        while (i > 0) {
            int parent = (i - 1) >>> 1;
            if (compare(h[i], h[parent]) > 0) {
                int tmp = h[i];
                h[i] = h[parent];
                h[parent] = tmp;
                i = parent;
            } else {
                return;
            }
        }
    }

    private void siftDown(int[] h, int size) {
        int i = 0;
        while (true) {
            int l = 2 * i + 1;
            if (l >= size) {
                return;
            }
            int r = l + 1;
            int worst = r < size && compare(h[r], h[l]) > 0 ? r : l;
            if (compare(h[worst], h[i]) > 0) {
                int tmp = h[i];
                h[i] = h[worst];
                h[worst] = tmp;
                i = worst;
            } else {
                return;
            }
        }
    }

    // ------------------------------------------------------------------ scores

    /** The association scores of an n-gram: for n = 2 the pair itself, for n > 2 the weakest binary split per measure. */
    static final class Scores {
        double pmi = Double.POSITIVE_INFINITY;
        double npmi = Double.POSITIVE_INFINITY;
        double llr = Double.POSITIVE_INFINITY;
        double t = Double.POSITIVE_INFINITY;
        double chi2 = Double.POSITIVE_INFINITY;

        double get(Score s) {
            return switch (s) {
                case PMI -> pmi;
                case NPMI -> npmi;
                case LLR -> llr;
                case T_SCORE -> t;
                case CHI2 -> chi2;
                default -> throw new IllegalArgumentException(s.label() + " is not an association score");
            };
        }
    }

    private Scores scores(int m, int idx, int[] t) {
        long c12 = c.tf(m, idx);
        Scores sc = new Scores();
        for (int split = 1; split < m; split++) {
            long c1 = c.tf(split, c.indexOf(t, 0, split));
            long c2 = c.tf(m - split, c.indexOf(t, split, m - split));
            double pmi = Association.pmi(c12, c1, c2, n);
            sc.pmi = Math.min(sc.pmi, pmi);
            sc.npmi = Math.min(sc.npmi, Association.npmiFromPmi(pmi, c12, n));
            sc.llr = Math.min(sc.llr, Association.logLikelihood(c12, c1, c2, n));
            sc.t = Math.min(sc.t, Association.tScore(c12, c1, c2, n));
            sc.chi2 = Math.min(sc.chi2, Association.chiSquare(c12, c1, c2, n));
        }
        return sc;
    }

    private double cValue(int m, int idx) {
        return CValue.cValue(m, c.tf(m, idx), nestedSum[m][idx], nestedCount[m][idx]);
    }

    private double termhood(int m, int idx) {
        return CValue.termhood(m, c.tf(m, idx), maxExtension[m][idx]);
    }

    // ------------------------------------------------------------------ the harvest

    /** The candidate of rank {@code r + 1}, survivor {@code s}. */
    private Harvest.Candidate candidate(int r, int s, MineJob.FinalPass fin, LogOdds logOdds) {
        int p = survivor[s];
        int m = pLevel[p];
        int idx = pIdx[p];
        long tf = c.tf(m, idx);
        long df = c.df(m, idx);
        Harvest.Scores scores;
        if (m >= 2) {
            int[] t = new int[HarvestOptions.MAX_NGRAM];
            c.tokensOf(m, idx, t);
            Scores sc = scores(m, idx, t);
            scores = new Harvest.Scores(sc.pmi, sc.npmi, sc.llr, sc.t, sc.chi2, cValue(m, idx), termhood(m, idx));
        } else {
            scores = new Harvest.Scores(null, null, null, null, null, null, termhood(m, idx));
        }
        Double score = Double.isInfinite(rankScore[s]) ? null : rankScore[s];
        int[] catDf = new int[fin.categories().length];
        for (int k = 0; k < catDf.length; k++) {
            catDf[k] = fin.counts().categoryDf(r, k);
        }
        List<Harvest.CategoryScore> top = logOdds.top(catDf, o.topCategories());
        String term = term(s);
        List<EvidenceLine> ev = new ArrayList<>();
        for (EvidenceLine e : fin.evidence()[r]) {
            if (e != null) {
                ev.add(e);
            }
        }
        return new Harvest.Candidate(r + 1, term, m, tf, df, (double) df / (double) listings, score, scores, top,
                Integrations.groupKey(term), ev);
    }

    Harvest build(int[] selected, MineJob.FinalPass fin, List<Harvest.SpecFacet> specFacets) {
        LogOdds logOdds = new LogOdds(fin.categories(), fin.categoryListings(), o.priorShare());
        // candidates are independent of one another: built on all cores, kept in rank order
        Harvest.Candidate[] built = new Harvest.Candidate[selected.length];
        java.util.stream.IntStream.range(0, selected.length).parallel()
                .forEach(r -> built[r] = candidate(r, selected[r], fin, logOdds));
        List<Harvest.Candidate> out = Arrays.asList(built);
        List<Harvest.CategoryCount> cats = new ArrayList<>();
        String[] names = fin.categories();
        Integer[] order = new Integer[names.length];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> names[a].compareTo(names[b]));
        for (int i : order) {
            cats.add(new Harvest.CategoryCount(names[i], fin.categoryListings()[i]));
        }
        List<Harvest.NgramLevel> levels = new ArrayList<>();
        long frequent1 = 0;
        for (int id = 0; id < c.vocab(); id++) {
            if (c.frequent1(id)) {
                frequent1++;
            }
        }
        levels.add(new Harvest.NgramLevel(1, c.distinct(1), frequent1));
        for (int m = 2; m <= maxLevel; m++) {
            levels.add(new Harvest.NgramLevel(m, c.distinct(m), c.level(m).size));
        }
        Harvest.CorpusStats stats = new Harvest.CorpusStats(listings, c.fields(), c.segments(), n, c.vocab(),
                c.sourceCount(), cats, levels, survivors, selected.length);
        Harvest.Parameters params = new Harvest.Parameters(c.outer().analysis.profile().toJsonTree(new ObjectMapper()),
                o, c.outer().sourcesParameter, Integrations.COMPONENTS);
        return new Harvest(Harvest.FORMAT, Harvest.FORMAT_VERSION, params, stats, out, specFacets);
    }
}
