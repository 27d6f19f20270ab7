package dev.sheaf.samples;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class RngTest {

    @Test
    void splitMix64MatchesTheReferenceSequence() {
        // SplitMix64 seeded with 0, first outputs of the reference C implementation (Vigna, splitmix64.c) [mem]
        Rng r = new Rng(0);
        assertEquals(0xE220A8397B1DCDAFL, r.nextLong());
        assertEquals(0x6E789E6AA1B965F4L, r.nextLong());
        assertEquals(0x06C45D188009454FL, r.nextLong());
    }

    @Test
    void streamsDependOnSeedPurposeAndIndexOnly() {
        assertEquals(Rng.of(42, "listing", 7).nextLong(), Rng.of(42, "listing", 7).nextLong());
        assertNotEquals(Rng.of(42, "listing", 7).nextLong(), Rng.of(42, "listing", 8).nextLong());
        assertNotEquals(Rng.of(42, "listing", 7).nextLong(), Rng.of(43, "listing", 7).nextLong());
        assertNotEquals(Rng.of(42, "listing", 7).nextLong(), Rng.of(42, "category", 7).nextLong());
    }

    @Test
    void boundedValuesStayInRangeAndCoverIt() {
        Rng r = new Rng(1);
        int[] seen = new int[7];
        for (int i = 0; i < 7000; i++) {
            int v = r.nextInt(7);
            assertTrue(v >= 0 && v < 7);
            seen[v]++;
        }
        for (int c : seen) {
            assertTrue(c > 800 && c < 1200, "roughly uniform: " + java.util.Arrays.toString(seen));
        }
        for (int i = 0; i < 1000; i++) {
            double d = r.nextDouble();
            assertTrue(d >= 0 && d < 1);
            int b = r.between(3, 5);
            assertTrue(b >= 3 && b <= 5);
        }
        assertThrows(IllegalArgumentException.class, () -> r.nextInt(0));
    }

    @Test
    void weightedPicksFollowTheWeights() {
        Rng r = new Rng(2);
        int[] seen = new int[3];
        for (int i = 0; i < 10000; i++) {
            seen[r.weighted(70, 20, 10)]++;
        }
        assertTrue(Math.abs(seen[0] - 7000) < 300 && Math.abs(seen[1] - 2000) < 250 && Math.abs(seen[2] - 1000) < 200, java.util.Arrays.toString(seen));
    }

    @Test
    void shuffleIsAPermutation() {
        List<Integer> l = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            l.add(i);
        }
        new Rng(3).shuffle(l);
        assertNotEquals(0, l.get(0) + l.get(1) * 100 - 100, "shuffled");
        List<Integer> sorted = new ArrayList<>(l);
        sorted.sort(null);
        for (int i = 0; i < 100; i++) {
            assertEquals(i, sorted.get(i));
        }
    }

    @Test
    void skewedPicksFavourTheFrontButReachTheTail() {
        Rng r = new Rng(4);
        List<Integer> items = new ArrayList<>();
        for (int i = 0; i < 100; i++) {
            items.add(i);
        }
        int front = 0;
        int tail = 0;
        for (int i = 0; i < 10000; i++) {
            int v = r.pickSkewed(items, 2);
            front += v < 10 ? 1 : 0;
            tail += v >= 90 ? 1 : 0;
        }
        assertTrue(front > 2500 && tail > 200 && tail < 800, "front " + front + ", tail " + tail);
    }
}
