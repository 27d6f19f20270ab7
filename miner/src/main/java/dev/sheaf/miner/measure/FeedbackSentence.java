package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * One feedback sentence: a person compares a target listing with a reference listing.
 *
 * <p>The annotator id is personal data: it is kept here so the analysis can tell people apart,
 * but every report, file and message Sheaf writes shows the pseudonym from {@link Pseudonyms}.
 *
 * @param pairId      the comparison this sentence belongs to, never blank
 * @param referenceId the listing compared against, never blank
 * @param targetId    the listing the sentence is about, never blank
 * @param annotator   the writer's id as in the file, never blank
 * @param text        the sentence, never blank (offsets of mentions point into it)
 * @param row         the spreadsheet row (the header is row 1), or 0 when it did not come from a file
 */
public record FeedbackSentence(String pairId, String referenceId, String targetId, String annotator, String text,
                               long row) {
    public FeedbackSentence {
        requireText(pairId, "pair id");
        requireText(referenceId, "reference id");
        requireText(targetId, "target id");
        requireText(annotator, "annotator");
        requireText(text, "sentence");
        if (row < 0) {
            throw new IllegalArgumentException("row must be 0 (not from a file) or a 1-based row number, got " + row);
        }
    }

    private static void requireText(String s, String what) {
        Objects.requireNonNull(s, what);
        if (s.isBlank()) {
            throw new IllegalArgumentException(what + " must not be blank; a row with an empty " + what
                    + " is a problem to record, not a sentence");
        }
    }
}
