package dev.sheaf.miner.suggest;

import java.util.Collection;
import java.util.Collections;
import java.util.EnumSet;
import java.util.Locale;
import java.util.Set;

/**
 * How {@link Suggester} proposes merges and parents. Immutable; built and validated in one place
 * ({@link Builder#build()}); start from a preset: {@link #defaults()}, {@link #precise()} or
 * {@link #broad()}.
 *
 * <p>Defaults (the figures in docs/decisions/130-suggestion-kinds-and-scores.md were measured with them):
 * <ul>
 *   <li>{@code minScore} {@value #DEFAULT_MIN_SCORE}: suggestions with a lower combined score are not returned;</li>
 *   <li>{@code kinds}: every {@link Suggestion.Kind}; {@code hierarchyKinds}: every {@link HierarchySuggestion.Kind};</li>
 *   <li>{@code maxEditShare} {@value #DEFAULT_MAX_EDIT_SHARE}: edits allowed per character for a misspelling
 *       (at least one edit; words shorter than {@value #DEFAULT_MIN_EDIT_LENGTH} letters are never compared);</li>
 *   <li>{@code contextWindow} {@value #DEFAULT_CONTEXT_WINDOW} tokens each side, inside one field text (stop words left out);</li>
 *   <li>{@code contextMinFrequency} {@value #DEFAULT_CONTEXT_MIN_FREQUENCY}: only candidates seen this often get a context vector;</li>
 *   <li>{@code minCosine} {@value #DEFAULT_MIN_COSINE}: the lowest PPMI cosine proposed;</li>
 *   <li>{@code subsumption} {@value #DEFAULT_SUBSUMPTION}: x subsumes y when P(x|y) ≥ this and P(y|x) &lt; 1;</li>
 *   <li>{@code minHierarchyDf} {@value #DEFAULT_MIN_HIERARCHY_DF}: listings a child needs for subsumption;</li>
 *   <li>{@code maxParentDfShare} {@value #DEFAULT_MAX_PARENT_DF_SHARE}: a parent in more of the listings is too general
 *       to subsume anything (boilerplate, the shop's name);</li>
 *   <li>{@code evidenceLines} {@value #DEFAULT_EVIDENCE_LINES} per suggestion.</li>
 * </ul>
 */
public final class SuggestOptions {
    public static final double DEFAULT_MIN_SCORE = 0.5;
    public static final double DEFAULT_MAX_EDIT_SHARE = 0.2;
    public static final int DEFAULT_MIN_EDIT_LENGTH = 5;
    public static final int DEFAULT_CONTEXT_WINDOW = 3;
    public static final int DEFAULT_CONTEXT_MIN_FREQUENCY = 10;
    public static final double DEFAULT_MIN_COSINE = 0.3;
    public static final double DEFAULT_SUBSUMPTION = 0.8;
    public static final int DEFAULT_MIN_HIERARCHY_DF = 5;
    public static final double DEFAULT_MAX_PARENT_DF_SHARE = 0.25;
    public static final int DEFAULT_EVIDENCE_LINES = 3;

    private static final SuggestOptions DEFAULTS = builder().build();

    private final double minScore;
    private final Set<Suggestion.Kind> kinds;
    private final Set<HierarchySuggestion.Kind> hierarchyKinds;
    private final double maxEditShare;
    private final int minEditLength;
    private final int contextWindow;
    private final int contextMinFrequency;
    private final double minCosine;
    private final double subsumption;
    private final int minHierarchyDf;
    private final double maxParentDfShare;
    private final int evidenceLines;

    private SuggestOptions(Builder b) {
        this.minScore = b.minScore;
        this.kinds = Collections.unmodifiableSet(EnumSet.copyOf(b.kinds));
        this.hierarchyKinds = Collections.unmodifiableSet(b.hierarchyKinds.isEmpty()
                ? EnumSet.noneOf(HierarchySuggestion.Kind.class) : EnumSet.copyOf(b.hierarchyKinds));
        this.maxEditShare = b.maxEditShare;
        this.minEditLength = b.minEditLength;
        this.contextWindow = b.contextWindow;
        this.contextMinFrequency = b.contextMinFrequency;
        this.minCosine = b.minCosine;
        this.subsumption = b.subsumption;
        this.minHierarchyDf = b.minHierarchyDf;
        this.maxParentDfShare = b.maxParentDfShare;
        this.evidenceLines = b.evidenceLines;
    }

    /** The defaults listed in the class comment. */
    public static SuggestOptions defaults() {
        return DEFAULTS;
    }

    /** Fewer, surer suggestions: minimum score 0.7. */
    public static SuggestOptions precise() {
        return builder().minScore(0.7).build();
    }

    /** More suggestions to look through: minimum score 0.3, cosine from 0.2, subsumption from 0.7. */
    public static SuggestOptions broad() {
        return builder().minScore(0.3).minCosine(0.2).subsumption(0.7).build();
    }

    /** A preset by name: default, precise or broad. */
    public static SuggestOptions preset(String name) {
        switch (name.strip().toLowerCase(Locale.ROOT)) {
            case "default":
                return defaults();
            case "precise":
                return precise();
            case "broad":
                return broad();
            default:
                throw new IllegalArgumentException("suggestion preset \"" + name + "\" is not one of default, precise, broad");
        }
    }

    public static Builder builder() {
        return new Builder();
    }

    /** A builder holding these options, to make a changed copy. */
    public Builder toBuilder() {
        Builder b = new Builder();
        b.minScore = minScore;
        b.kinds = EnumSet.copyOf(kinds);
        b.hierarchyKinds = hierarchyKinds.isEmpty() ? EnumSet.noneOf(HierarchySuggestion.Kind.class) : EnumSet.copyOf(hierarchyKinds);
        b.maxEditShare = maxEditShare;
        b.minEditLength = minEditLength;
        b.contextWindow = contextWindow;
        b.contextMinFrequency = contextMinFrequency;
        b.minCosine = minCosine;
        b.subsumption = subsumption;
        b.minHierarchyDf = minHierarchyDf;
        b.maxParentDfShare = maxParentDfShare;
        b.evidenceLines = evidenceLines;
        return b;
    }

    public double minScore() {
        return minScore;
    }

    public Set<Suggestion.Kind> kinds() {
        return kinds;
    }

    public Set<HierarchySuggestion.Kind> hierarchyKinds() {
        return hierarchyKinds;
    }

    public double maxEditShare() {
        return maxEditShare;
    }

    public int minEditLength() {
        return minEditLength;
    }

    public int contextWindow() {
        return contextWindow;
    }

    public int contextMinFrequency() {
        return contextMinFrequency;
    }

    public double minCosine() {
        return minCosine;
    }

    public double subsumption() {
        return subsumption;
    }

    public int minHierarchyDf() {
        return minHierarchyDf;
    }

    public double maxParentDfShare() {
        return maxParentDfShare;
    }

    public int evidenceLines() {
        return evidenceLines;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "SuggestOptions[minScore=%s, kinds=%s, hierarchyKinds=%s, maxEditShare=%s, minEditLength=%d, "
                        + "contextWindow=%d, contextMinFrequency=%d, minCosine=%s, subsumption=%s, minHierarchyDf=%d, "
                        + "maxParentDfShare=%s, evidenceLines=%d]", minScore, kinds, hierarchyKinds, maxEditShare, minEditLength,
                contextWindow, contextMinFrequency, minCosine, subsumption, minHierarchyDf, maxParentDfShare, evidenceLines);
    }

    /** Collects options; {@link #build()} checks them all and says which one is wrong and why. */
    public static final class Builder {
        private double minScore = DEFAULT_MIN_SCORE;
        private EnumSet<Suggestion.Kind> kinds = EnumSet.allOf(Suggestion.Kind.class);
        private EnumSet<HierarchySuggestion.Kind> hierarchyKinds = EnumSet.allOf(HierarchySuggestion.Kind.class);
        private double maxEditShare = DEFAULT_MAX_EDIT_SHARE;
        private int minEditLength = DEFAULT_MIN_EDIT_LENGTH;
        private int contextWindow = DEFAULT_CONTEXT_WINDOW;
        private int contextMinFrequency = DEFAULT_CONTEXT_MIN_FREQUENCY;
        private double minCosine = DEFAULT_MIN_COSINE;
        private double subsumption = DEFAULT_SUBSUMPTION;
        private int minHierarchyDf = DEFAULT_MIN_HIERARCHY_DF;
        private double maxParentDfShare = DEFAULT_MAX_PARENT_DF_SHARE;
        private int evidenceLines = DEFAULT_EVIDENCE_LINES;

        private Builder() {
        }

        public Builder minScore(double v) {
            minScore = v;
            return this;
        }

        /** The synonym kinds to run (at least one). */
        public Builder kinds(Collection<Suggestion.Kind> ks) {
            kinds = ks.isEmpty() ? EnumSet.noneOf(Suggestion.Kind.class) : EnumSet.copyOf(ks);
            return this;
        }

        /** The hierarchy kinds to run (may be none). */
        public Builder hierarchyKinds(Collection<HierarchySuggestion.Kind> ks) {
            hierarchyKinds = ks.isEmpty() ? EnumSet.noneOf(HierarchySuggestion.Kind.class) : EnumSet.copyOf(ks);
            return this;
        }

        public Builder maxEditShare(double v) {
            maxEditShare = v;
            return this;
        }

        public Builder minEditLength(int v) {
            minEditLength = v;
            return this;
        }

        public Builder contextWindow(int v) {
            contextWindow = v;
            return this;
        }

        public Builder contextMinFrequency(int v) {
            contextMinFrequency = v;
            return this;
        }

        public Builder minCosine(double v) {
            minCosine = v;
            return this;
        }

        public Builder subsumption(double v) {
            subsumption = v;
            return this;
        }

        public Builder minHierarchyDf(int v) {
            minHierarchyDf = v;
            return this;
        }

        public Builder maxParentDfShare(double v) {
            maxParentDfShare = v;
            return this;
        }

        public Builder evidenceLines(int v) {
            evidenceLines = v;
            return this;
        }

        public SuggestOptions build() {
            unit("minScore", minScore, "0.5");
            if (kinds.isEmpty()) {
                throw new IllegalArgumentException("kinds is empty; give at least one suggestion kind, e.g. same-group-key");
            }
            if (!(maxEditShare > 0 && maxEditShare <= 0.5)) {
                throw new IllegalArgumentException("maxEditShare must be in (0, 0.5], got " + maxEditShare + "; try 0.2");
            }
            range("minEditLength", minEditLength, 2, 100, "5");
            range("contextWindow", contextWindow, 1, 10, "3");
            range("contextMinFrequency", contextMinFrequency, 1, Integer.MAX_VALUE, "10");
            unit("minCosine", minCosine, "0.3");
            if (!(subsumption > 0.5 && subsumption <= 1)) {
                throw new IllegalArgumentException("subsumption must be in (0.5, 1], got " + subsumption + "; the published value is 0.8");
            }
            range("minHierarchyDf", minHierarchyDf, 1, Integer.MAX_VALUE, "5");
            if (!(maxParentDfShare > 0 && maxParentDfShare <= 1)) {
                throw new IllegalArgumentException("maxParentDfShare must be in (0, 1], got " + maxParentDfShare + "; try 0.25");
            }
            range("evidenceLines", evidenceLines, 0, 100, "3");
            return new SuggestOptions(this);
        }

        private static void unit(String name, double v, String example) {
            if (!(v >= 0 && v <= 1)) {
                throw new IllegalArgumentException(name + " must be in [0, 1], got " + v + "; try " + example);
            }
        }

        private static void range(String name, int v, int lo, int hi, String example) {
            if (v < lo || v > hi) {
                throw new IllegalArgumentException(name + " must be from " + lo + " to " + hi + ", got " + v + "; try " + example);
            }
        }
    }
}
