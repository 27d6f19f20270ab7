package dev.sheaf.miner.measure;

/**
 * Where a matched attribute term stands in a sentence: 0-based UTF-16 char offsets, end exclusive.
 */
public record MentionSpan(int start, int end) {

    public MentionSpan {
        if (start < 0 || end <= start) {
            throw new IllegalArgumentException("a mention span needs 0 <= start < end; got [" + start + ", "
                    + end + "); pass the matched term's offsets, end exclusive");
        }
    }
}
