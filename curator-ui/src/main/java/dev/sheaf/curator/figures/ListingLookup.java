package dev.sheaf.curator.figures;

import java.io.IOException;
import java.util.List;
import java.util.Optional;

/**
 * The listing queries the figures need; thread-safe, called from the figures' background thread.
 * The desktop answers them from the workspace's evidence index ({@link IndexLookup}).
 */
public interface ListingLookup {
    /** Ids of every listing whose fields contain {@code phrase}, distinct. */
    List<String> listingIds(String phrase) throws IOException;

    /** The category of a listing ("" when it has none), or empty for an unknown id. */
    Optional<String> category(String listingId) throws IOException;

    /** How many listings there are in all. */
    long listings() throws IOException;
}
