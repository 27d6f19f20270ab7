package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class LogOddsTest {
    @Test
    void zFollowsTheInformativeDirichletFormula() {
        // Monroe, Colaresi & Quinn 2008, Political Analysis 16(4), eqs. for the log-odds with an informative
        // Dirichlet prior and its variance [mem]; constructed numbers computed by hand from those formulas:
        // y_i = 30 of n_i = 100, y_r = 10 of n_r = 300, n = 400, a0 = 0.01 * 400 = 4, a_w = 4 * 40 / 400 = 0.4
        double aw = 0.4;
        double delta = Math.log((30 + aw) / (100 + 4 - 30 - aw)) - Math.log((10 + aw) / (300 + 4 - 10 - aw));
        double z = delta / Math.sqrt(1 / (30 + aw) + 1 / (10 + aw));
        assertEquals(z, LogOdds.z(30, 100, 40, 400, 0.01), 1e-12);
        assertTrue(z > 5, "a term in 30% of one category and 3% of the rest is distinctive");
    }

    @Test
    void aTermSpreadInProportionIsDistinctiveNowhere() {
        assertEquals(0.0, LogOdds.z(10, 100, 40, 400, 0.01), 1e-12);
    }

    @Test
    void topListsPositiveZOnlyBestFirstAndIgnoresUncategorisedListings() {
        LogOdds lo = new LogOdds(new String[] {"tents", "", "jackets", "packs"}, new long[] {100, 500, 100, 100}, 0.01);
        List<Harvest.CategoryScore> top = lo.top(new int[] {40, 300, 5, 10}, 3);
        assertEquals(1, top.size());
        assertEquals("tents", top.get(0).category());
        assertEquals(40, top.get(0).df());
        assertEquals(List.of(), new LogOdds(new String[] {"tents"}, new long[] {10}, 0.01).top(new int[] {5}, 3),
                "one category has nothing to be distinctive against");
    }
}
