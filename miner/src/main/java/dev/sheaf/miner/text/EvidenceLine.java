package dev.sheaf.miner.text;

import java.util.Objects;

/**
 * A keyword-in-context line: the words before a match, the match as written, the words after,
 * and where it was found. Offsets are 0-based char offsets into the field text, end exclusive.
 *
 * @param listingId the listing's id
 * @param source    the source file, as in {@code Listing.source()}
 * @param locator   where inside the source ("line 12"), or empty
 * @param field     the field kind label ({@code title}, {@code description}, {@code spec} ...)
 * @param key       the spec key for spec fields, otherwise empty
 * @param left      context before the match (trimmed to a few words)
 * @param match     the matched text exactly as in the source
 * @param right     context after the match
 * @param start     offset of the match in the field text
 * @param end       end offset (exclusive) of the match in the field text
 */
public record EvidenceLine(String listingId, String source, String locator, String field, String key,
                           String left, String match, String right, int start, int end) {
    public EvidenceLine {
        Objects.requireNonNull(listingId, "listingId");
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(locator, "locator");
        Objects.requireNonNull(field, "field");
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(left, "left");
        Objects.requireNonNull(match, "match");
        Objects.requireNonNull(right, "right");
        if (start < 0 || end < start) {
            throw new IllegalArgumentException("evidence span must satisfy 0 <= start <= end, got " + start + ".." + end);
        }
    }

    /** Cuts a KWIC line out of a field text around [start, end), keeping about {@code width} chars each side on word boundaries. */
    public static EvidenceLine cut(String listingId, String source, String locator, String field, String key,
                                   String text, int start, int end, int width) {
        int l = Math.max(0, start - width);
        while (l > 0 && l < start && !Character.isWhitespace(text.charAt(l - 1))) {
            l++;
        }
        int r = Math.min(text.length(), end + width);
        while (r < text.length() && r > end && !Character.isWhitespace(text.charAt(r))) {
            r--;
        }
        String left = oneLine(text.substring(l, start)).stripLeading();
        String right = oneLine(text.substring(end, r)).stripTrailing();
        return new EvidenceLine(listingId, source, locator, field, key, left, oneLine(text.substring(start, end)), right, start, end);
    }

    /** Every run of whitespace (as the regex {@code \\s+}: space, tab, line breaks, form feed, vertical tab) becomes one space. */
    private static String oneLine(String s) {
        StringBuilder b = null;
        int n = s.length();
        for (int i = 0; i < n; i++) {
            char c = s.charAt(i);
            boolean ws = c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\f' || c == '\u000B';
            if (ws && (c != ' ' || (i + 1 < n && isWs(s.charAt(i + 1))))) {
                if (b == null) {
                    b = new StringBuilder(n).append(s, 0, i);
                }
                b.append(' ');
                while (i + 1 < n && isWs(s.charAt(i + 1))) {
                    i++;
                }
            } else if (b != null) {
                b.append(c);
            }
        }
        return b == null ? s : b.toString();
    }

    /** The line on one row, as the CSV files write it: "left [match] right — source locator". */
    public String oneLine() {
        String where = locator.isEmpty() ? source : source + " " + locator;
        return (left.isEmpty() ? "" : left + " ") + "[" + match + "]" + (right.isEmpty() ? "" : " " + right) + " — " + where;
    }

    private static boolean isWs(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\r' || c == '\f' || c == '\u000B';
    }
}
