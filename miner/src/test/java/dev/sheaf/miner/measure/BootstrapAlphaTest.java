package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class BootstrapAlphaTest {
    /** 80 items, 4 annotators, 3 categories; each judgment copies the item's true value 85% of the time. */
    private static KrippendorffAlpha wellBehaved() {
        Random r = new Random(20240611);
        List<int[]> units = new ArrayList<>();
        for (int u = 0; u < 80; u++) {
            int truth = r.nextInt(3);
            int[] values = new int[4];
            for (int a = 0; a < 4; a++) {
                values[a] = r.nextDouble() < 0.85 ? truth : r.nextInt(3);
            }
            units.add(values);
        }
        return new KrippendorffAlpha(units, 3, new double[] {1, 2, 3}, AgreementMetric.NOMINAL);
    }

    @Test
    void theSameSeedGivesTheSameInterval() {
        KrippendorffAlpha ka = wellBehaved();
        assertEquals(BootstrapAlpha.interval(ka, 500, 0.95, 7), BootstrapAlpha.interval(ka, 500, 0.95, 7));
    }

    @Test
    void anotherSeedGivesAnotherInterval() {
        KrippendorffAlpha ka = wellBehaved();
        assertNotEquals(BootstrapAlpha.interval(ka, 500, 0.95, 7).low(), BootstrapAlpha.interval(ka, 500, 0.95, 8).low());
    }

    @Test
    void theIntervalContainsThePointEstimateOnAWellBehavedExample() {
        KrippendorffAlpha ka = wellBehaved();
        double alpha = ka.result().alpha();
        BootstrapInterval ci = BootstrapAlpha.interval(ka, 2000, 0.95, 1);
        assertTrue(ci.contains(alpha), alpha + " not in " + ci);
        assertEquals(2000, ci.usable());
        assertTrue(ci.high() - ci.low() < 0.3, "interval too wide for 80 items: " + ci);
        assertTrue(ci.high() - ci.low() > 0.01, "interval suspiciously narrow: " + ci);
    }

    @Test
    void aHigherLevelGivesAWiderInterval() {
        KrippendorffAlpha ka = wellBehaved();
        BootstrapInterval ninety = BootstrapAlpha.interval(ka, 1000, 0.90, 3);
        BootstrapInterval ninetyNine = BootstrapAlpha.interval(ka, 1000, 0.99, 3);
        assertTrue(ninetyNine.low() <= ninety.low() && ninetyNine.high() >= ninety.high());
    }

    @Test
    void noReplicatesGiveNoInterval() {
        BootstrapInterval ci = BootstrapAlpha.interval(wellBehaved(), 0, 0.95, 1);
        assertFalse(ci.defined());
        assertEquals(0, ci.replicates());
    }

    @Test
    void replicatesWithoutVariationAreLeftOutOfThePercentiles() {
        // One unit varies, five do not: some resamples hold no variation at all, and have no alpha.
        List<int[]> units = List.of(new int[] {0, 1}, new int[] {0, 0}, new int[] {0, 0}, new int[] {0, 0},
                new int[] {0, 0}, new int[] {0, 0});
        BootstrapInterval ci = BootstrapAlpha.interval(new KrippendorffAlpha(units, 2, new double[] {0, 1},
                AgreementMetric.NOMINAL), 400, 0.95, 5);
        assertTrue(ci.usable() < 400 && ci.usable() > 0, "usable " + ci.usable());
    }

    @Test
    void quantilesInterpolateBetweenOrderStatistics() {
        // Hyndman & Fan 1996 definition 7 (NumPy's default) [practice]: quantile([1,2,3,4], 0.25) = 1.75
        assertEquals(1.75, BootstrapAlpha.quantile(new double[] {1, 2, 3, 4}, 0.25), 1e-12);
        assertEquals(4.0, BootstrapAlpha.quantile(new double[] {1, 2, 3, 4}, 1.0), 1e-12);
        assertEquals(1.0, BootstrapAlpha.quantile(new double[] {1, 2, 3, 4}, 0.0), 1e-12);
    }

    @Test
    void theAttributeSeedIsStableAndDiffersByAttribute() {
        assertEquals(1L ^ "waterproof".hashCode(), BootstrapAlpha.seedFor(1, "waterproof"));
        assertNotEquals(BootstrapAlpha.seedFor(1, "waterproof"), BootstrapAlpha.seedFor(1, "insulated"));
    }
}
