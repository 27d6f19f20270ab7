package dev.sheaf.miner.label;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Iterative stratification (Sechidis, Tsoumakas & Vlahavas 2011, ECML PKDD, Algorithm 1): a hand
 * trace of the algorithm and the proportions it keeps. scikit-multilearn, the usual reference
 * implementation, is not installed for /usr/bin/python3 here (and is not a Debian package), so the
 * checks are the algorithm's own steps and its properties.
 */
class StratifiedSplitTest {
    private static final double[] EIGHTY_TEN_TEN = {0.8, 0.1, 0.1};

    @Test
    void followsAlgorithmOneStepByStepOnAHandTracedExample() {
        // Constructed example, traced by hand with the paper's steps [comp]: 10 examples, 60/40,
        // label A on 0-3, label B on 2-7, 8 and 9 unlabelled. Desired: c = (6, 4), cA = (2.4, 1.6),
        // cB = (3.6, 2.4). A is rarer, so its examples go first: 0 -> 0 (2.4 > 1.6), 1 -> 1 (1.6 > 1.4),
        // 2 -> 0 (1.4 > 0.6), 3 -> 1 (0.6 > 0.4); then B's remaining 4, 5, 6, 7 with cB = (2.6, 1.4):
        // 0, 0 (1.6 > 1.4), 1 (1.4 > 0.6), 0 (0.6 > 0.4); the unlabelled two fill c = (1, 1) one each.
        int[][] labels = {{0}, {0}, {0, 1}, {0, 1}, {1}, {1}, {1}, {1}, {}, {}};
        StratifiedSplit.Result r = StratifiedSplit.split(labels, 2, new double[] {0.6, 0.4}, 7);
        int[] s = r.subsetOf();
        assertArrayEquals(new int[] {0, 1, 0, 1, 0, 0, 1, 0}, Arrays.copyOf(s, 8));
        assertNotEquals(s[8], s[9]);
        assertEquals(6, r.size(0));
        assertEquals(4, r.size(1));
        assertEquals(2, r.count(0, 0));
        assertEquals(2, r.count(0, 1));
        assertEquals(4, r.count(1, 0));
        assertEquals(2, r.count(1, 1));
    }

    /** A skewed multi-label set: 3000 examples, 40 labels with falling frequency, co-occurring, 12% unlabelled. */
    private static int[][] skewed(long seed) {
        Random rnd = new Random(seed);
        int n = 3000;
        int[][] out = new int[n][];
        for (int x = 0; x < n; x++) {
            List<Integer> y = new ArrayList<>();
            if (rnd.nextDouble() >= 0.12) {
                for (int l = 0; l < 40; l++) {
                    double p = 0.35 / (1 + l * 0.6);
                    if (rnd.nextDouble() < p || (l > 0 && y.contains(l - 1) && rnd.nextDouble() < 0.2)) {
                        y.add(l);
                    }
                }
            }
            out[x] = y.stream().mapToInt(Integer::intValue).toArray();
        }
        return out;
    }

    @Test
    void eachLabelsPositivesAreSplitCloseToTheProportions() {
        int[][] data = skewed(11);
        StratifiedSplit.Result r = StratifiedSplit.split(data, 40, EIGHTY_TEN_TEN, 42);
        for (int l = 0; l < 40; l++) {
            int total = r.count(l, 0) + r.count(l, 1) + r.count(l, 2);
            for (int j = 0; j < 3; j++) {
                double desired = total * EIGHTY_TEN_TEN[j];
                // within one example of the desired count, or 2% of the label's examples for the most common labels
                assertTrue(Math.abs(r.count(l, j) - desired) <= Math.max(1.0, 0.02 * total),
                        "label " + l + " (" + total + " positives) subset " + j + ": " + r.count(l, j) + " vs desired " + desired);
            }
        }
    }

    @Test
    void subsetSizesAreExactWithinRounding() {
        int[][] data = skewed(5);
        StratifiedSplit.Result r = StratifiedSplit.split(data, 40, EIGHTY_TEN_TEN, 1);
        assertEquals(data.length, r.size(0) + r.size(1) + r.size(2));
        for (int j = 0; j < 3; j++) {
            assertTrue(Math.abs(r.size(j) - data.length * EIGHTY_TEN_TEN[j]) <= 1.0,
                    "subset " + j + " has " + r.size(j) + ", desired " + data.length * EIGHTY_TEN_TEN[j]);
        }
    }

    @Test
    void stratifiesBetterThanARandomSplit() {
        int[][] data = skewed(3);
        StratifiedSplit.Result r = StratifiedSplit.split(data, 40, EIGHTY_TEN_TEN, 9);
        int[] random = new int[data.length];
        Random rnd = new Random(9);
        for (int x = 0; x < data.length; x++) {
            double u = rnd.nextDouble();
            random[x] = u < 0.8 ? 0 : u < 0.9 ? 1 : 2;
        }
        assertTrue(deviation(data, r.subsetOf()) < deviation(data, random) / 2,
                "stratified " + deviation(data, r.subsetOf()) + " vs random " + deviation(data, random));
    }

    /** Mean absolute difference between each label's count per subset and its desired count. */
    private static double deviation(int[][] data, int[] subset) {
        double[][] got = new double[40][3];
        int[] total = new int[40];
        for (int x = 0; x < data.length; x++) {
            for (int l : data[x]) {
                got[l][subset[x]]++;
                total[l]++;
            }
        }
        double d = 0;
        for (int l = 0; l < 40; l++) {
            for (int j = 0; j < 3; j++) {
                d += Math.abs(got[l][j] - total[l] * EIGHTY_TEN_TEN[j]);
            }
        }
        return d / 120;
    }

    @Test
    void theSameSeedGivesTheSameSplitAndTiesDependOnTheSeed() {
        int[][] data = skewed(2);
        assertArrayEquals(StratifiedSplit.split(data, 40, EIGHTY_TEN_TEN, 4).subsetOf(),
                StratifiedSplit.split(data, 40, EIGHTY_TEN_TEN, 4).subsetOf());
        int[][] ties = new int[100][];
        for (int x = 0; x < 100; x++) {
            ties[x] = new int[] {x % 2};
        }
        assertNotEquals(Arrays.toString(StratifiedSplit.split(ties, 2, new double[] {0.5, 0.5}, 1).subsetOf()),
                Arrays.toString(StratifiedSplit.split(ties, 2, new double[] {0.5, 0.5}, 2).subsetOf()));
    }

    @Test
    void proportionsAreParsedAndNamed() {
        assertArrayEquals(new double[] {0.8, 0.1, 0.1}, StratifiedSplit.parseProportions("80/10/10"), 1e-12);
        assertArrayEquals(new double[] {0.7, 0.3}, StratifiedSplit.parseProportions("0.7/0.3"), 1e-12);
        assertEquals(List.of("train", "validation", "test"), StratifiedSplit.subsetNames(3));
        assertEquals(List.of("fold-1", "fold-2", "fold-3", "fold-4"), StratifiedSplit.subsetNames(4));
        assertThrows(IllegalArgumentException.class, () -> StratifiedSplit.parseProportions("80"));
        assertThrows(IllegalArgumentException.class, () -> StratifiedSplit.parseProportions("80/0/20"));
        assertThrows(IllegalArgumentException.class, () -> StratifiedSplit.parseProportions("80/x"));
    }
}
