package dev.sheaf.miner.measure;

import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;

/**
 * Which header names hold the five feedback columns. Names are matched ignoring case and
 * surrounding spaces; other columns in the file are ignored.
 *
 * @param pairId      the comparison id shared by every sentence about one reference/target pair; default {@code pair_id}
 * @param referenceId the listing compared against ("this one"); default {@code reference_id}
 * @param targetId    the listing the sentence is about; default {@code target_id}
 * @param annotator   the person who wrote the sentence (personal data); default {@code annotator}
 * @param sentence    the free text; default {@code sentence}
 */
public record FeedbackColumns(String pairId, String referenceId, String targetId, String annotator, String sentence) {
    /** {@code pair_id,reference_id,target_id,annotator,sentence}. */
    public static final FeedbackColumns DEFAULT =
            new FeedbackColumns("pair_id", "reference_id", "target_id", "annotator", "sentence");

    public FeedbackColumns {
        Set<String> seen = new LinkedHashSet<>();
        for (String c : new String[] {pairId, referenceId, targetId, annotator, sentence}) {
            Objects.requireNonNull(c, "column name");
            if (c.isBlank()) {
                throw new IllegalArgumentException("a feedback column name must not be blank");
            }
            if (!seen.add(key(c))) {
                throw new IllegalArgumentException("each feedback column needs its own header name; '" + c.strip()
                        + "' is given twice");
            }
        }
        pairId = pairId.strip();
        referenceId = referenceId.strip();
        targetId = targetId.strip();
        annotator = annotator.strip();
        sentence = sentence.strip();
    }

    /** The names in order of meaning: pair, reference, target, annotator, sentence. */
    public List<String> names() {
        return List.of(pairId, referenceId, targetId, annotator, sentence);
    }

    static String key(String headerName) {
        return headerName.strip().toLowerCase(Locale.ROOT);
    }
}
