package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CohenKappaTest {
    @Test
    void kappaOfThePublishedExample() {
        // Wikipedia "Cohen's kappa" example [pub]; Cohen 1960, Educ. Psychol. Meas. 20(1):
        // 50 items, yes/yes 20, yes/no 5, no/yes 10, no/no 15 -> 0.40
        assertEquals(0.40, CohenKappa.fromTable(new long[][] {{20, 5}, {10, 15}}), 1e-12);
    }

    @Test
    void perfectAgreementGivesOne() {
        assertEquals(1.0, CohenKappa.fromTable(new long[][] {{7, 0, 0}, {0, 2, 0}, {0, 0, 5}}), 1e-12);
    }

    @Test
    void chanceAgreementGivesZero() {
        // [comp] independent marginals: p_o = p_e = 0.5
        assertEquals(0.0, CohenKappa.fromTable(new long[][] {{5, 5}, {5, 5}}), 1e-12);
    }

    @Test
    void undefinedWithoutSharedItemsOrWithoutVariation() {
        assertTrue(Double.isNaN(CohenKappa.fromTable(new long[][] {{0, 0}, {0, 0}})));
        assertTrue(Double.isNaN(CohenKappa.fromTable(new long[][] {{0, 0}, {0, 9}})));
    }
}
