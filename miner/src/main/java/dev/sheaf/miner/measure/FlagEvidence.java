package dev.sheaf.miner.measure;

import java.util.Objects;
import java.util.Set;

/**
 * One piece of evidence behind a flag: a sentence, a listing, a label, a concept, or the figures of
 * a judgment analysis. People appear only as pseudonyms.
 *
 * @param kind  one of {@link #KINDS}
 * @param text  the sentence, listing id, label, concept id or summary
 * @param where where it comes from ("row 12, pair P0007, ann-3f9c1e"), or the empty string
 */
public record FlagEvidence(String kind, String text, String where) {
    public static final String SENTENCE = "sentence";
    public static final String LISTING = "listing";
    public static final String LABEL = "label";
    public static final String CONCEPT = "concept";
    public static final String JUDGMENTS = "judgments";
    public static final Set<String> KINDS = Set.of(SENTENCE, LISTING, LABEL, CONCEPT, JUDGMENTS);

    public FlagEvidence {
        Objects.requireNonNull(text, "text");
        Objects.requireNonNull(where, "where");
        if (!KINDS.contains(kind)) {
            throw new IllegalArgumentException("evidence kind must be one of " + KINDS + ", got " + kind);
        }
    }

    /** A feedback sentence, placed by row, pair and pseudonym. */
    static FlagEvidence sentence(FeedbackMention m) {
        return new FlagEvidence(SENTENCE, m.sentence(), "row " + m.row() + ", pair " + m.pairId() + ", " + m.annotator());
    }
}
