package dev.sheaf.miner.mine;

import java.util.Objects;

/**
 * What the harvest counts, keeps and writes; immutable, validated in its constructor (each message
 * states the rule, the value and the fix). Defaults ({@link #defaults()}):
 * n-grams of 1 to {@value #DEFAULT_NGRAM_MAX} tokens; a candidate needs at least
 * {@value #DEFAULT_MIN_FREQUENCY} occurrences in at least {@value #DEFAULT_MIN_DF} listings, and may
 * appear in at most {@value #DEFAULT_MAX_DF_SHARE} of all listings (more is boilerplate); multi-word
 * candidates need NPMI above {@value #DEFAULT_MIN_NPMI} (their parts attract each other); candidates
 * made only of numbers, or only of numbers and units (quantities, harvested as spec values instead),
 * are dropped, and so are section headings ({@link #HEADING_SHARE}); ranked by {@link Score#TERMHOOD}; up to {@value #DEFAULT_LIMIT} candidates
 * (0 = all) with {@value #DEFAULT_EVIDENCE} evidence lines of about {@value #DEFAULT_EVIDENCE_WIDTH}
 * chars of context each side; the top {@value #DEFAULT_TOP_CATEGORIES} categories per candidate by
 * log-odds z with an informative Dirichlet prior worth {@value #DEFAULT_PRIOR_SHARE} of the listings;
 * up to {@value #DEFAULT_SPEC_VALUES} values per spec facet.
 */
public record HarvestOptions(int ngramMax, int minFrequency, int minDf, double maxDfShare, double minNpmi,
                             boolean dropNumbers, boolean dropQuantities, boolean dropHeadings, Score rankBy, int limit,
                             int evidence, int evidenceWidth, int topCategories, double priorShare,
                             int specValues) {
    public static final int DEFAULT_NGRAM_MAX = 3;
    public static final int MAX_NGRAM = 5;
    public static final int DEFAULT_MIN_FREQUENCY = 5;
    public static final int DEFAULT_MIN_DF = 3;
    public static final double DEFAULT_MAX_DF_SHARE = 0.5;
    public static final double DEFAULT_MIN_NPMI = 0.0;
    public static final int DEFAULT_LIMIT = 10_000;
    public static final int DEFAULT_EVIDENCE = 5;
    public static final int DEFAULT_EVIDENCE_WIDTH = 48;
    public static final int DEFAULT_TOP_CATEGORIES = 3;
    public static final double DEFAULT_PRIOR_SHARE = 0.01;
    public static final int DEFAULT_SPEC_VALUES = 25;
    /**
     * Site-template text (decision 049): with a df-share cap below 1, a term found in more than this
     * share of the listings of one kind of source file is dropped, when that kind holds at least
     * {@link #TEMPLATE_MIN_LISTINGS} listings and the corpus has other kinds too — page chrome such as
     * a shop name or "SKU" line on every HTML page, below the corpus-wide cap only because other
     * feeds lack it. [practice]
     */
    public static final double TEMPLATE_SHARE = 0.9;
    public static final int TEMPLATE_MIN_LISTINGS = 50;
    /**
     * Section headings (decision 051): a candidate of which at least this share of occurrences are in
     * a short heading of a page or sheet ("Specifications", "Key features", "Tech specs") names a part
     * of the page, not of the product, and is dropped unless {@code dropHeadings} is off. [practice]
     */
    public static final double HEADING_SHARE = 0.9;
    /**
     * Quantity tails (decision 052): with {@code dropQuantities}, a term of two or more words whose
     * first word is a unit that follows a number (or a unit after one) at least this share of the
     * times it occurs ("d nylon" of "70D nylon") is dropped. [practice]
     */
    public static final double QUANTITY_TAIL_SHARE = 0.9;

    public HarvestOptions {
        Objects.requireNonNull(rankBy, "rankBy");
        require(ngramMax >= 1 && ngramMax <= MAX_NGRAM, "n-gram max must be from 1 to " + MAX_NGRAM + ", got " + ngramMax
                + "; 3 suits attribute phrases (\"two way zipper\")");
        require(minFrequency >= 1, "minimum frequency must be at least 1, got " + minFrequency);
        require(minDf >= 1, "minimum document frequency must be at least 1 listing, got " + minDf);
        require(maxDfShare > 0 && maxDfShare <= 1, "maximum df share must be in (0, 1], got " + maxDfShare
                + "; 0.5 drops terms found in more than half of all listings, 1 keeps everything");
        require(minNpmi >= -1 && minNpmi <= 1, "minimum NPMI must be in [-1, 1], got " + minNpmi + "; -1 disables the filter");
        require(limit >= 0, "limit must be >= 0 (0 = all candidates), got " + limit);
        require(evidence >= 0 && evidence <= 100, "evidence lines per candidate must be from 0 to 100, got " + evidence);
        require(evidenceWidth >= 0 && evidenceWidth <= 1000, "evidence width must be from 0 to 1000 chars, got " + evidenceWidth);
        require(topCategories >= 0 && topCategories <= 100, "top categories must be from 0 to 100, got " + topCategories);
        require(priorShare > 0 && priorShare <= 10, "prior share must be in (0, 10], got " + priorShare
                + "; 0.01 makes the prior worth 1% of the listings");
        require(specValues >= 0, "spec values per facet must be >= 0, got " + specValues);
        require(!(rankBy.multiWordOnly() && ngramMax == 1), "ranking by " + rankBy.label()
                + " needs multi-word candidates, but the n-gram max is 1; raise --ngram-max or rank by termhood, frequency or df");
    }

    private static void require(boolean ok, String message) {
        if (!ok) {
            throw new IllegalArgumentException(message);
        }
    }

    public static HarvestOptions defaults() {
        return builder().build();
    }

    public static Builder builder() {
        return new Builder();
    }

    public Builder toBuilder() {
        Builder b = new Builder();
        b.ngramMax = ngramMax;
        b.minFrequency = minFrequency;
        b.minDf = minDf;
        b.maxDfShare = maxDfShare;
        b.minNpmi = minNpmi;
        b.dropNumbers = dropNumbers;
        b.dropQuantities = dropQuantities;
        b.dropHeadings = dropHeadings;
        b.rankBy = rankBy;
        b.limit = limit;
        b.evidence = evidence;
        b.evidenceWidth = evidenceWidth;
        b.topCategories = topCategories;
        b.priorShare = priorShare;
        b.specValues = specValues;
        return b;
    }

    /** Everything counted, nothing filtered beyond the frequency floor: for reference checks. */
    public static HarvestOptions everything(int ngramMax, int minFrequency) {
        return builder().ngramMax(ngramMax).minFrequency(minFrequency).minDf(1).maxDfShare(1).minNpmi(-1)
                .dropNumbers(false).dropQuantities(false).dropHeadings(false).rankBy(Score.FREQUENCY).limit(0).build();
    }

    public static final class Builder {
        private int ngramMax = DEFAULT_NGRAM_MAX;
        private int minFrequency = DEFAULT_MIN_FREQUENCY;
        private int minDf = DEFAULT_MIN_DF;
        private double maxDfShare = DEFAULT_MAX_DF_SHARE;
        private double minNpmi = DEFAULT_MIN_NPMI;
        private boolean dropNumbers = true;
        private boolean dropHeadings = true;
        private boolean dropQuantities = true;
        private Score rankBy = Score.TERMHOOD;
        private int limit = DEFAULT_LIMIT;
        private int evidence = DEFAULT_EVIDENCE;
        private int evidenceWidth = DEFAULT_EVIDENCE_WIDTH;
        private int topCategories = DEFAULT_TOP_CATEGORIES;
        private double priorShare = DEFAULT_PRIOR_SHARE;
        private int specValues = DEFAULT_SPEC_VALUES;

        public Builder ngramMax(int v) {
            ngramMax = v;
            return this;
        }

        public Builder minFrequency(int v) {
            minFrequency = v;
            return this;
        }

        public Builder minDf(int v) {
            minDf = v;
            return this;
        }

        public Builder maxDfShare(double v) {
            maxDfShare = v;
            return this;
        }

        public Builder minNpmi(double v) {
            minNpmi = v;
            return this;
        }

        public Builder dropNumbers(boolean v) {
            dropNumbers = v;
            return this;
        }

        /** Drop candidates that occur almost only as whole section headings (default on). */
        public Builder dropHeadings(boolean v) {
            dropHeadings = v;
            return this;
        }

        public Builder dropQuantities(boolean v) {
            dropQuantities = v;
            return this;
        }

        public Builder rankBy(Score v) {
            rankBy = v;
            return this;
        }

        public Builder limit(int v) {
            limit = v;
            return this;
        }

        public Builder evidence(int v) {
            evidence = v;
            return this;
        }

        public Builder evidenceWidth(int v) {
            evidenceWidth = v;
            return this;
        }

        public Builder topCategories(int v) {
            topCategories = v;
            return this;
        }

        public Builder priorShare(double v) {
            priorShare = v;
            return this;
        }

        public Builder specValues(int v) {
            specValues = v;
            return this;
        }

        public HarvestOptions build() {
            return new HarvestOptions(ngramMax, minFrequency, minDf, maxDfShare, minNpmi, dropNumbers, dropQuantities,
                    dropHeadings, rankBy, limit, evidence, evidenceWidth, topCategories, priorShare, specValues);
        }
    }
}
