package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * One person's judgment of one attribute on one item, as read from a judgments file.
 *
 * <p>The annotator id is personal data: it is kept here because the analysis needs to tell
 * annotators apart, but no report, file or message Sheaf writes shows it; they show the
 * pseudonym from {@link Pseudonyms} instead.
 *
 * @param item      the item (listing) id, never blank
 * @param annotator the annotator id as written in the file, never blank
 * @param attribute the attribute as written (a concept or facet id or label), never blank;
 *                  resolved later by {@link AgreementOptions#attributeResolver()}
 * @param value     the judged value as written (present/absent, a facet value, a grade), never blank
 * @param row       the spreadsheet row it came from (the header is row 1), or 0 when it did not come from a file
 */
public record Judgment(String item, String annotator, String attribute, String value, long row) {
    public Judgment {
        requireText(item, "item");
        requireText(annotator, "annotator");
        requireText(attribute, "attribute");
        requireText(value, "value");
        if (row < 0) {
            throw new IllegalArgumentException("row must be 0 (not from a file) or a 1-based row number, got " + row);
        }
    }

    private static void requireText(String s, String what) {
        Objects.requireNonNull(s, what);
        if (s.isBlank()) {
            throw new IllegalArgumentException(what + " must not be blank; a row with an empty " + what
                    + " is a problem to record, not a judgment");
        }
    }
}
