package dev.sheaf.miner.text;

/**
 * Receives the segments of one listing from {@link Segmenter#analyze}: maximal runs of countable
 * tokens inside one field text, cut at sentence and phrase breaks, removed stop words and negation
 * words. The arrays are the segmenter's buffers: valid only during the call, read the first
 * {@code length} entries.
 */
@FunctionalInterface
public interface SegmentSink {
    /**
     * @param field  index of the field in {@code Listing.fields()}
     * @param part   which text of the field
     * @param ids    term ids ({@link TermDictionary})
     * @param starts start offsets (0-based UTF-16, into the part's text)
     * @param ends   end offsets, exclusive
     * @param length number of tokens, at least 1
     */
    void segment(int field, SegmentPart part, int[] ids, int[] starts, int[] ends, int length);
}
