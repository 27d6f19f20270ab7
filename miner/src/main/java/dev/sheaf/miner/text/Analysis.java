package dev.sheaf.miner.text;

import dev.sheaf.miner.ingest.Listing;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.LowerCaseFilter;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.Tokenizer;
import org.apache.lucene.analysis.classic.ClassicTokenizer;
import org.apache.lucene.analysis.en.EnglishPossessiveFilter;
import org.apache.lucene.analysis.miscellaneous.ASCIIFoldingFilter;
import org.apache.lucene.analysis.standard.StandardTokenizer;

/**
 * The analysis stage's front door: one {@link AnalysisProfile} turned into
 * <ul>
 *   <li>a Lucene {@link Analyzer} ({@link #analyzer()}) for the evidence index and the labeler —
 *       tokenizer, English possessives, lower case (locale-independent), optional ASCII folding,
 *       number/unit splitting, stop words removed with a position gap, negation words kept with type
 *       {@link #TYPE_NEGATION}, unit words typed {@link #TYPE_UNIT};</li>
 *   <li>per-thread {@link Segmenter}s that turn a listing into segments of term ids with offsets for
 *       the miner, cut at field, sentence/phrase, stop-word and negation boundaries.</li>
 * </ul>
 * Thread-safe; the analyzer reuses its token streams per thread.
 */
public final class Analysis {
    /** Type of a negation word ("no", "not", "without" …). */
    public static final String TYPE_NEGATION = "<NEG>";
    /** Type of a unit token split from or following a number ("kg" in "1.2kg"). */
    public static final String TYPE_UNIT = "<UNIT>";
    /** Type of a number token, as Lucene's tokenizers name it. */
    public static final String TYPE_NUMBER = StandardTokenizer.TOKEN_TYPES[StandardTokenizer.NUM];
    /** Type of an emoji token, as Lucene's standard tokenizer names it; a boundary for the miner. */
    public static final String TYPE_EMOJI = StandardTokenizer.TOKEN_TYPES[StandardTokenizer.EMOJI];

    /** Term flags the segmenter reads from its term cache. */
    static final int STOP = 1;
    static final int NEGATION = 2;
    static final int UNIT = 4;
    static final int NUMBER = 8;

    private final AnalysisProfile profile;
    private final Analyzer analyzer;
    private final Analyzer miningAnalyzer;
    private final TermDictionary terms;
    private final boolean[] asciiBreaks = new boolean[128];
    private final String otherBreaks;
    private final ThreadLocal<Segmenter> segmenters;

    private Analysis(AnalysisProfile profile) {
        this.profile = profile;
        this.analyzer = new ProfileAnalyzer(profile, true);
        this.miningAnalyzer = new ProfileAnalyzer(profile, false);
        org.apache.lucene.analysis.CharArraySet stops = profile.stopSet();
        org.apache.lucene.analysis.CharArraySet negations = profile.negationSet();
        org.apache.lucene.analysis.CharArraySet units = profile.unitSet();
        this.terms = new TermDictionary(t -> (stops.contains(t) ? STOP : 0) | (negations.contains(t) ? NEGATION : 0)
                | (units.contains(t) ? UNIT : 0)
                | (UnitSplitFilter.numberPrefix(t.toCharArray(), t.length()) == t.length() ? NUMBER : 0));
        StringBuilder other = new StringBuilder();
        for (char c : profile.breakCharacters().toCharArray()) {
            if (c < 128) {
                asciiBreaks[c] = true;
            } else {
                other.append(c);
            }
        }
        this.otherBreaks = other.toString();
        this.segmenters = ThreadLocal.withInitial(this::newSegmenter);
    }

    /** The analysis of a profile; every call makes a new term dictionary. */
    public static Analysis of(AnalysisProfile profile) {
        return new Analysis(Objects.requireNonNull(profile, "profile"));
    }

    public AnalysisProfile profile() {
        return profile;
    }

    /** The Lucene analyzer of this profile (thread-safe; reuses token streams per thread). */
    public Analyzer analyzer() {
        return analyzer;
    }

    /**
     * The chain without the stop filter: the segmenter applies stop words, negations and the
     * unit-after-number rule itself from term flags, with exactly the analyzer's semantics.
     */
    Analyzer miningAnalyzer() {
        return miningAnalyzer;
    }

    /** The term ids every segmenter of this analysis hands out. */
    public TermDictionary terms() {
        return terms;
    }

    /** A segmenter for one thread (not thread-safe itself). */
    public Segmenter newSegmenter() {
        return new Segmenter(this);
    }

    /** The segments of a listing as values (convenience over {@link Segmenter#analyze}; uses a per-thread segmenter). */
    public List<TokenSegment> segments(Listing listing) {
        List<TokenSegment> out = new ArrayList<>();
        segmenters.get().analyze(listing, (field, part, ids, starts, ends, length) -> {
            String[] t = new String[length];
            for (int i = 0; i < length; i++) {
                t[i] = terms.term(ids[i]);
            }
            out.add(new TokenSegment(field, part, java.util.Arrays.copyOf(ids, length),
                    java.util.Arrays.copyOf(starts, length), java.util.Arrays.copyOf(ends, length), t));
        });
        return out;
    }

    boolean isBreak(char c) {
        return c < 128 ? asciiBreaks[c] : otherBreaks.indexOf(c) >= 0;
    }

    static Tokenizer newTokenizer(AnalysisProfile.TokenizerKind kind, int maxLength) {
        if (kind == AnalysisProfile.TokenizerKind.CLASSIC) {
            ClassicTokenizer t = new ClassicTokenizer();
            t.setMaxTokenLength(maxLength);
            return t;
        }
        StandardTokenizer t = new StandardTokenizer();
        t.setMaxTokenLength(maxLength);
        return t;
    }

    /** The Lucene chain of a profile. */
    private static final class ProfileAnalyzer extends Analyzer {
        private final AnalysisProfile p;
        private final boolean stopFilter;
        private final org.apache.lucene.analysis.CharArraySet stops;
        private final org.apache.lucene.analysis.CharArraySet negations;
        private final org.apache.lucene.analysis.CharArraySet units;

        ProfileAnalyzer(AnalysisProfile p, boolean stopFilter) {
            this.p = p;
            this.stopFilter = stopFilter;
            this.stops = p.stopSet();
            this.negations = p.negationSet();
            this.units = p.unitSet();
        }

        @Override
        protected TokenStreamComponents createComponents(String fieldName) {
            Tokenizer src = newTokenizer(p.tokenizer(), p.maxTokenLength());
            TokenStream ts = src;
            if (p.possessives()) {
                ts = new EnglishPossessiveFilter(ts);
            }
            ts = new LowerCaseFilter(ts);
            if (p.asciiFolding()) {
                ts = new ASCIIFoldingFilter(ts);
            }
            if (p.numbers() == AnalysisProfile.Numbers.SPLIT_UNITS) {
                ts = new UnitSplitFilter(ts, units);
            }
            if (stopFilter) {
                ts = new MarkingStopFilter(ts, stops, negations);
            }
            return new TokenStreamComponents(src, ts);
        }

        @Override
        protected TokenStream normalize(String fieldName, TokenStream in) {
            TokenStream ts = new LowerCaseFilter(in);
            return p.asciiFolding() ? new ASCIIFoldingFilter(ts) : ts;
        }
    }
}
