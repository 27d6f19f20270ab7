package dev.sheaf.curator.figures;

import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.miner.ingest.EvidenceIndex;
import dev.sheaf.miner.ingest.Listing;
import java.io.Closeable;
import java.io.IOException;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;

/**
 * {@link ListingLookup} over an evidence index. Categories of listings are remembered once read
 * (they do not change while the index is open), so following edits re-reads only new listings.
 */
public final class IndexLookup implements ListingLookup, Closeable {
    private final EvidenceIndex index;
    private final Map<String, String> categories = new ConcurrentHashMap<>();

    public IndexLookup(EvidenceIndex index) {
        this.index = Objects.requireNonNull(index);
    }

    /** The evidence index of the session's workspace, or empty when it has not been built (mine first). */
    public static Optional<IndexLookup> of(CuratorSession session) throws IOException {
        EvidenceIndex ix = dev.sheaf.curator.session.Mining.openIndex(session.workspace());
        return ix == null ? Optional.empty() : Optional.of(new IndexLookup(ix));
    }

    @Override
    public List<String> listingIds(String phrase) throws IOException {
        long n = index.listings();
        return index.listingIds(phrase, (int) Math.min(Integer.MAX_VALUE - 8, n));
    }

    @Override
    public Optional<String> category(String listingId) throws IOException {
        String c = categories.get(listingId);
        if (c != null) {
            return Optional.of(c);
        }
        Optional<Listing> l = index.listing(listingId);
        l.ifPresent(x -> categories.put(listingId, x.category() == null ? "" : x.category()));
        return l.map(x -> x.category() == null ? "" : x.category());
    }

    @Override
    public long listings() throws IOException {
        return index.listings();
    }

    @Override
    public void close() throws IOException {
        index.close();
    }
}
