package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class FleissKappaTest {
    /**
     * Wikipedia "Fleiss' kappa" example, also in statsmodels' own tests [pub]; Fleiss 1971, Psychol. Bull. 76(5):
     * 10 subjects x 14 raters x 5 categories.
     */
    static final int[][] WIKIPEDIA = {
        {0, 0, 0, 0, 14}, {0, 2, 6, 4, 2}, {0, 0, 3, 5, 6}, {0, 3, 9, 2, 0}, {2, 2, 8, 1, 1},
        {7, 7, 0, 0, 0}, {3, 2, 6, 3, 0}, {2, 5, 3, 2, 2}, {6, 5, 2, 1, 0}, {0, 2, 2, 3, 7}};

    @Test
    void kappaOfThePublishedTable() {
        // Wikipedia "Fleiss' kappa" example, also in statsmodels' own tests [pub]; Fleiss 1971, Psychol. Bull. 76(5): κ = 0.210 (0.209931)
        assertEquals(0.209931, FleissKappa.fromTable(WIKIPEDIA), 5e-7);
    }

    @Test
    void kappaOfThePublishedTableThroughUnits() {
        List<int[]> units = new ArrayList<>();
        for (int[] row : WIKIPEDIA) {
            int[] u = new int[14];
            int i = 0;
            for (int c = 0; c < row.length; c++) {
                for (int r = 0; r < row[c]; r++) {
                    u[i++] = c;
                }
            }
            units.add(u);
        }
        FleissResult r = FleissKappa.of(units, 5, AgreementThresholds.DEFAULTS);
        // Wikipedia "Fleiss' kappa" example, also in statsmodels' own tests [pub]; Fleiss 1971, Psychol. Bull. 76(5):
        // 0.209931; "fair" per Landis & Koch 1977, Biometrics 33(1) [pub]
        assertEquals(0.209931, r.kappa(), 5e-7);
        assertEquals(KappaBand.FAIR, r.band());
        assertEquals(10, r.items());
        assertEquals(14, r.judgmentsPerItem());
        assertEquals("", r.note());
    }

    @Test
    void unequalNumbersOfJudgmentsUseTheItemsWithTheModalCountAndSaySo() {
        List<int[]> units = List.of(new int[] {0, 0, 0}, new int[] {1, 1, 0}, new int[] {1, 1, 1},
                new int[] {0, 1}, new int[] {1});
        FleissResult r = FleissKappa.of(units, 2, AgreementThresholds.DEFAULTS);
        assertEquals(3, r.items());
        assertEquals(3, r.judgmentsPerItem());
        assertEquals(2, r.itemsLeftOut());
        assertEquals(FleissKappa.fromTable(new int[][] {{3, 0}, {1, 2}, {0, 3}}), r.kappa(), 0);
        assertTrue(r.note().startsWith("unequal numbers of judgments"), r.note());
    }

    @Test
    void aTieBetweenCountsKeepsTheLargerCount() {
        List<int[]> units = List.of(new int[] {0, 0}, new int[] {1, 0}, new int[] {0, 0, 1}, new int[] {1, 1, 1});
        assertEquals(3, FleissKappa.of(units, 2, AgreementThresholds.DEFAULTS).judgmentsPerItem());
    }

    @Test
    void perfectAgreementGivesOne() {
        assertEquals(1.0, FleissKappa.fromTable(new int[][] {{3, 0}, {0, 3}, {3, 0}}), 1e-12);
    }

    @Test
    void undefinedWhenEveryJudgmentIsTheSame() {
        FleissResult r = FleissKappa.of(List.of(new int[] {1, 1}, new int[] {1, 1}), 2, AgreementThresholds.DEFAULTS);
        assertFalse(r.defined());
        assertEquals(KappaBand.UNDEFINED, r.band());
    }

    @Test
    void rejectsATableWithUnequalRows() {
        assertThrows(IllegalArgumentException.class, () -> FleissKappa.fromTable(new int[][] {{2, 0}, {1, 2}}));
    }
}
