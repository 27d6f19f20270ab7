package dev.sheaf.miner.text;

import java.util.Arrays;
import java.util.Objects;

/**
 * One segment as an immutable value: the tokens of a maximal run inside one field text, with ids
 * and offsets (0-based UTF-16 into the part's text, end exclusive) and the terms they stand for.
 */
public final class TokenSegment {
    private final int field;
    private final SegmentPart part;
    private final int[] ids;
    private final int[] starts;
    private final int[] ends;
    private final String[] terms;

    public TokenSegment(int field, SegmentPart part, int[] ids, int[] starts, int[] ends, String[] terms) {
        Objects.requireNonNull(part, "part");
        if (field < 0) {
            throw new IllegalArgumentException("field index must be >= 0, got " + field);
        }
        int n = ids.length;
        if (n == 0 || starts.length != n || ends.length != n || terms.length != n) {
            throw new IllegalArgumentException("a segment needs at least one token and equal-length arrays, got "
                    + n + "/" + starts.length + "/" + ends.length + "/" + terms.length);
        }
        for (int i = 0; i < n; i++) {
            if (starts[i] < 0 || ends[i] < starts[i] || (i > 0 && starts[i] < ends[i - 1])) {
                throw new IllegalArgumentException("token offsets must be ordered and non-overlapping, token " + i
                        + " is " + starts[i] + ".." + ends[i]);
            }
        }
        this.field = field;
        this.part = part;
        this.ids = ids.clone();
        this.starts = starts.clone();
        this.ends = ends.clone();
        this.terms = terms.clone();
    }

    public int field() {
        return field;
    }

    public SegmentPart part() {
        return part;
    }

    public int length() {
        return ids.length;
    }

    public int id(int i) {
        return ids[i];
    }

    public int start(int i) {
        return starts[i];
    }

    public int end(int i) {
        return ends[i];
    }

    public String term(int i) {
        return terms[i];
    }

    /** The terms, a copy. */
    public String[] terms() {
        return terms.clone();
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof TokenSegment)) {
            return false;
        }
        TokenSegment s = (TokenSegment) o;
        return field == s.field && part == s.part && Arrays.equals(starts, s.starts) && Arrays.equals(ends, s.ends)
                && Arrays.equals(terms, s.terms);
    }

    @Override
    public int hashCode() {
        return Objects.hash(field, part, Arrays.hashCode(starts), Arrays.hashCode(terms));
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("segment[field ").append(field).append(' ').append(part).append(':');
        for (int i = 0; i < terms.length; i++) {
            b.append(' ').append(terms[i]).append('@').append(starts[i]).append('-').append(ends[i]);
        }
        return b.append(']').toString();
    }
}
