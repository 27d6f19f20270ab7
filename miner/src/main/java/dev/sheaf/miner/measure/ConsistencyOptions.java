package dev.sheaf.miner.measure;

import java.util.Collection;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import org.apache.lucene.analysis.en.EnglishAnalyzer;

/**
 * How {@link ConsistencyAnalysis} reads feedback. Immutable; built and validated by {@link Builder}.
 *
 * <p>Defaults: no vocabulary (every concept id is shown as is), no scales (comparative mentions
 * stay unchecked), no catalog (nothing is grounded), ephemeral pseudonyms (different each run; the
 * command line keeps a key file), stop words {@link #DEFAULT_STOP_WORDS}, vocabulary gaps of up to
 * {@value #DEFAULT_GAP_MAX_WORDS} words found in at least {@value #DEFAULT_GAP_MIN_SENTENCES}
 * sentences, at most {@value #DEFAULT_GAP_LIMIT} listed.
 */
public final class ConsistencyOptions {
    public static final int DEFAULT_GAP_MAX_WORDS = 3;
    public static final int DEFAULT_GAP_MIN_SENTENCES = 2;
    public static final int DEFAULT_GAP_LIMIT = 200;

    /**
     * Words that frame every comparison and are never vocabulary gaps: the pronouns and function
     * words of "I tried this one and the other one", which Lucene's short English list does not hold.
     */
    public static final Set<String> FEEDBACK_FRAME_WORDS = Collections.unmodifiableSet(new TreeSet<>(List.of(
            "i", "i'm", "i've", "i'd", "me", "my", "mine", "we", "our", "you", "your", "it's", "its", "one", "ones",
            "other", "others", "than", "so", "also", "just", "really", "pretty", "tried", "try", "looked", "look",
            "compared", "comparing", "tbh", "thing", "things", "bit", "lot", "do", "does", "did", "has",
            "have", "had", "get", "gets", "got", "this", "that", "those", "these", "here", "there", "what", "which",
            "for", "from", "them", "they", "he", "she", "his", "her", "what's", "which's")));

    /**
     * Lucene's English stop words ({@link EnglishAnalyzer#ENGLISH_STOP_WORDS_SET}) and
     * {@link #FEEDBACK_FRAME_WORDS}. Negation words never reach the gap count either way: they are cues.
     */
    public static final Set<String> DEFAULT_STOP_WORDS = defaultStopWords();

    private final FeedbackTermFinder finder;
    private final FeedbackVocabulary vocabulary;
    private final GroundingScales scales;
    private final GroundingCatalog catalog;
    private final Pseudonyms pseudonyms;
    private final Set<String> stopWords;
    private final int gapMaxWords;
    private final int gapMinSentences;
    private final int gapLimit;

    private ConsistencyOptions(Builder b) {
        this.finder = b.finder;
        this.vocabulary = b.vocabulary;
        this.scales = b.scales;
        this.catalog = b.catalog;
        this.pseudonyms = b.pseudonyms == null ? Pseudonyms.ephemeral() : b.pseudonyms;
        this.stopWords = Collections.unmodifiableSet(new TreeSet<>(b.stopWords));
        this.gapMaxWords = b.gapMaxWords;
        this.gapMinSentences = b.gapMinSentences;
        this.gapLimit = b.gapLimit;
    }

    private static Set<String> defaultStopWords() {
        Set<String> s = new TreeSet<>();
        for (Object w : EnglishAnalyzer.ENGLISH_STOP_WORDS_SET) {
            s.add(new String((char[]) w));
        }
        s.addAll(FEEDBACK_FRAME_WORDS);
        return Collections.unmodifiableSet(s);
    }

    /** Options with this matcher and every default. */
    public static Builder builder(FeedbackTermFinder finder) {
        return new Builder(finder);
    }

    public FeedbackTermFinder finder() {
        return finder;
    }

    public FeedbackVocabulary vocabulary() {
        return vocabulary;
    }

    public GroundingScales scales() {
        return scales;
    }

    /** The catalog facts, or null when none were given. */
    public GroundingCatalog catalog() {
        return catalog;
    }

    public Pseudonyms pseudonyms() {
        return pseudonyms;
    }

    public Set<String> stopWords() {
        return stopWords;
    }

    public int gapMaxWords() {
        return gapMaxWords;
    }

    public int gapMinSentences() {
        return gapMinSentences;
    }

    public int gapLimit() {
        return gapLimit;
    }

    /** Collects options; {@link #build()} validates them in one place. */
    public static final class Builder {
        private final FeedbackTermFinder finder;
        private FeedbackVocabulary vocabulary = FeedbackVocabulary.empty();
        private GroundingScales scales = GroundingScales.none();
        private GroundingCatalog catalog;
        private Pseudonyms pseudonyms;
        private Set<String> stopWords = DEFAULT_STOP_WORDS;
        private int gapMaxWords = DEFAULT_GAP_MAX_WORDS;
        private int gapMinSentences = DEFAULT_GAP_MIN_SENTENCES;
        private int gapLimit = DEFAULT_GAP_LIMIT;

        private Builder(FeedbackTermFinder finder) {
            this.finder = Objects.requireNonNull(finder, "finder");
        }

        /** The vocabulary: labels to show, labels nobody uses, shared labels, regulated claims. */
        public Builder vocabulary(FeedbackVocabulary v) {
            this.vocabulary = Objects.requireNonNull(v, "vocabulary");
            return this;
        }

        public Builder scales(GroundingScales s) {
            this.scales = Objects.requireNonNull(s, "scales");
            return this;
        }

        /** Catalog facts to ground mentions in; null for none. */
        public Builder catalog(GroundingCatalog c) {
            this.catalog = c;
            return this;
        }

        public Builder pseudonyms(Pseudonyms p) {
            this.pseudonyms = Objects.requireNonNull(p, "pseudonyms");
            return this;
        }

        /** Stop words for vocabulary gaps (lower case), e.g. the analysis profile's; replaces the default. */
        public Builder stopWords(Collection<String> words) {
            Set<String> s = new TreeSet<>();
            for (String w : words) {
                Objects.requireNonNull(w, "a stop word is null");
                s.add(w.strip().toLowerCase(Locale.ROOT));
            }
            this.stopWords = s;
            return this;
        }

        public Builder gapMaxWords(int n) {
            this.gapMaxWords = n;
            return this;
        }

        public Builder gapMinSentences(int n) {
            this.gapMinSentences = n;
            return this;
        }

        public Builder gapLimit(int n) {
            this.gapLimit = n;
            return this;
        }

        public ConsistencyOptions build() {
            if (gapMaxWords < 1 || gapMaxWords > 6) {
                throw new IllegalArgumentException("gap max words must be 1 to 6, got " + gapMaxWords);
            }
            if (gapMinSentences < 1) {
                throw new IllegalArgumentException("gap min sentences must be at least 1, got " + gapMinSentences);
            }
            if (gapLimit < 0) {
                throw new IllegalArgumentException("gap limit must be >= 0, got " + gapLimit);
            }
            return new ConsistencyOptions(this);
        }
    }
}
