package dev.sheaf.miner.measure;

import java.util.Objects;
import java.util.Set;

/**
 * A feedback row left out, and why. Reasons never name the annotator (personal data); the row
 * number lets someone who holds the file look the row up.
 *
 * @param source where the row came from (a display path), never null
 * @param row    the spreadsheet row (the header is row 1), or 0 for a problem with the whole source
 * @param kind   one of {@link #KINDS}
 * @param reason what was expected, what was found, and what to do
 */
public record FeedbackProblem(String source, long row, String kind, String reason) {
    /**
     * The kinds: {@code header} (a named column is missing), {@code missing-column} (the row is
     * shorter than the header), {@code empty-field} (an id or the sentence is empty), {@code encoding}
     * (bytes that are not UTF-8), {@code parse} (the CSV syntax breaks; reading stops there),
     * {@code repeated} (the same person wrote the same sentence about the same pair again; counted
     * once), {@code pair-conflict} (a pair id seen before with other reference or target listings)
     * and {@code same-listing} (reference and target are the same listing: nothing is compared).
     */
    public static final Set<String> KINDS = Set.of("header", "missing-column", "empty-field", "encoding", "parse",
            "repeated", "pair-conflict", "same-listing");

    public FeedbackProblem {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(reason, "reason");
        if (!KINDS.contains(kind)) {
            throw new IllegalArgumentException("feedback problem kind must be one of " + KINDS + ", got " + kind);
        }
        if (row < 0) {
            throw new IllegalArgumentException("row must be >= 0, got " + row);
        }
    }
}
