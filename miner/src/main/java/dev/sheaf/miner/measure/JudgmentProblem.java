package dev.sheaf.miner.measure;

import java.util.Objects;
import java.util.Set;

/**
 * A judgment row that was left out of the analysis, and why. Reasons never name the annotator
 * (personal data); the row number lets someone who holds the file look the row up.
 *
 * @param source where the row came from (a display path), never null
 * @param row    the spreadsheet row (the header is row 1), or 0 for a problem with the whole source
 * @param kind   one of {@link #KINDS}
 * @param reason what was expected, what was found, and what to do
 */
public record JudgmentProblem(String source, long row, String kind, String reason) {
    /**
     * The kinds of problem: {@code header} (a named column is missing from the header),
     * {@code missing-column} (the row is shorter than the header), {@code empty-field} (item,
     * annotator or attribute empty), {@code empty-value}, {@code encoding} (bytes that are not
     * UTF-8), {@code parse} (the CSV syntax breaks; reading stops there), {@code unreadable},
     * {@code unknown-attribute} (the attribute resolver knows no such attribute), {@code repeated}
     * (the same item, annotator and attribute again with the same value; counted once) and
     * {@code conflict} (the same item, annotator and attribute with different values; all such
     * rows left out).
     */
    public static final Set<String> KINDS = Set.of("header", "missing-column", "empty-field", "empty-value",
            "encoding", "parse", "unreadable", "unknown-attribute", "repeated", "conflict");

    public JudgmentProblem {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(reason, "reason");
        if (!KINDS.contains(kind)) {
            throw new IllegalArgumentException("problem kind must be one of " + KINDS + ", got " + kind);
        }
        if (row < 0) {
            throw new IllegalArgumentException("row must be >= 0, got " + row);
        }
    }
}
