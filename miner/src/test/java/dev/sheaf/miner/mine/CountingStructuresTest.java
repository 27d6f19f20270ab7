package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The token store and the count tables, with and without spilling to disk, against plain collections. */
class CountingStructuresTest {
    @TempDir
    Path tmp;

    @Test
    void theTokenStoreReplaysEveryListingInOrderAlsoWhenSpilled() {
        Random r = new Random(3);
        List<int[]> written = new ArrayList<>();
        try (TokenStore store = new TokenStore(1 << 20, tmp.resolve("t.bin"))) {
            for (int l = 0; l < 20_000; l++) {
                int n = r.nextInt(120);
                int[] sym = new int[n];
                for (int i = 0; i < n; i++) {
                    sym[i] = r.nextInt(10) == 0 ? TokenStore.BOUNDARY : r.nextInt(r.nextBoolean() ? 100 : 3_000_000);
                    if (sym[i] == TokenStore.BOUNDARY) {
                        store.boundary();
                    } else {
                        store.token(sym[i]);
                    }
                }
                store.endListing();
                written.add(sym);
            }
            store.seal();
            assertTrue(store.spilled(), "a 1 MiB budget must spill this many listings");
            int[] seen = {0};
            store.forEach((index, sym, len) -> {
                assertEquals(seen[0], index);
                assertEquals(written.get(index).length, len);
                for (int i = 0; i < len; i++) {
                    assertEquals(written.get(index)[i], sym[i]);
                }
                seen[0]++;
            });
            assertEquals(written.size(), seen[0]);
        }
    }

    @Test
    void countsMergeExactlyWithAndWithoutRunFiles() {
        Random r = new Random(11);
        Map<Long, long[]> oracle = new HashMap<>();
        List<NgramCounter> small = new ArrayList<>();
        List<NgramCounter> large = new ArrayList<>();
        for (int w = 0; w < 3; w++) {
            NgramCounter s = new NgramCounter(2_000, tmp, "s" + w);
            NgramCounter big = new NgramCounter(10_000_000, tmp, "b" + w);
            for (int listing = 1; listing <= 4_000; listing++) {
                Set<Long> inListing = new HashSet<>();
                for (int k = r.nextInt(30); k > 0; k--) {
                    long code = FrequentTable.code(r.nextInt(400), r.nextInt(r.nextBoolean() ? 20 : 5000));
                    s.add(code, listing);
                    big.add(code, listing);
                    long[] c = oracle.computeIfAbsent(code, x -> new long[2]);
                    c[0]++;
                    if (inListing.add(code)) {
                        c[1]++;
                    }
                }
                s.listingDone();
                big.listingDone();
            }
            small.add(s);
            large.add(big);
        }
        assertTrue(small.get(0).hasRuns(), "the small tables must have spilled");
        assertTrue(!large.get(0).hasRuns(), "the large tables must not spill");
        for (List<NgramCounter> counters : List.of(small, large)) {
            CountMerger.Merged m = CountMerger.merge(counters, 3, 2);
            assertEquals(oracle.size(), m.distinct());
            long expected = oracle.values().stream().filter(c -> c[0] >= 3 && c[1] >= 2).count();
            assertEquals(expected, m.table().size);
            for (int i = 0; i < m.table().size; i++) {
                long[] c = oracle.get(m.table().codes[i]);
                assertEquals(c[0], m.table().tf[i]);
                assertEquals(c[1], m.table().df[i]);
                assertEquals(i, m.table().get(m.table().codes[i]));
            }
        }
    }
}
