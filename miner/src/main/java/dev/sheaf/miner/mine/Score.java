package dev.sheaf.miner.mine;

import com.fasterxml.jackson.annotation.JsonCreator;
import com.fasterxml.jackson.annotation.JsonValue;
import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Collectors;

/** A score candidates can be ranked by ({@code --rank-by}). */
public enum Score {
    /**
     * The default: log2(n + 1) · (f − frequency of the term's most frequent one-word extension), a
     * C-value-style discount for words and phrases that only occur inside a longer phrase
     * ({@link CValue#termhood}). See docs/decisions/045-default-ranking.md for why it puts attribute
     * phrases first.
     */
    TERMHOOD("termhood"),
    /** Occurrences (term frequency). */
    FREQUENCY("frequency"),
    /** Listings that contain the term. */
    DF("df"),
    /** Pointwise mutual information in bits (n ≥ 2). */
    PMI("pmi"),
    /** Normalised PMI in [−1, 1] (n ≥ 2). */
    NPMI("npmi"),
    /** Dunning's log-likelihood ratio G² (n ≥ 2). */
    LLR("llr"),
    /** Student's t (n ≥ 2). */
    T_SCORE("t-score"),
    /** Pearson's χ² (n ≥ 2). */
    CHI2("chi2"),
    /** Frantzi, Ananiadou &amp; Mima's C-value (n ≥ 2). */
    C_VALUE("c-value");

    private final String label;

    Score(String label) {
        this.label = label;
    }

    @JsonValue
    public String label() {
        return label;
    }

    /** Only defined for multi-word candidates. */
    public boolean multiWordOnly() {
        return this != TERMHOOD && this != FREQUENCY && this != DF;
    }

    @JsonCreator
    public static Score fromLabel(String s) {
        String k = s.trim().toLowerCase(Locale.ROOT);
        for (Score v : values()) {
            if (v.label.equals(k) || v.name().toLowerCase(Locale.ROOT).equals(k)) {
                return v;
            }
        }
        throw new IllegalArgumentException("unknown score '" + s + "'; choose one of "
                + Arrays.stream(values()).map(Score::label).collect(Collectors.joining(", ")));
    }
}
