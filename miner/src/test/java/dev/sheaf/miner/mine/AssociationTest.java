package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** Every association measure on published worked examples (sources as ../shared/CHECKS.md lists them). */
class AssociationTest {
    private static final long N_MS = 14_307_668L;

    @Test
    void tScoreOfNewCompanies() {
        // Manning & Schütze 1999, Foundations of Statistical NLP, §5.3.1 [pub]: t = 0.999932
        assertEquals(0.999932, Association.tScore(8, 15_828, 4_675, N_MS), 5e-7);
    }

    @Test
    void pearsonChiSquareOfNewCompanies() {
        // M&S 1999 §5.3.3 [pub]: χ² = 1.55
        assertEquals(1.55, Association.chiSquare(8, 15_828, 4_675, N_MS), 0.005);
    }

    @ParameterizedTest(name = "PMI c1={1} c2={2} c12={0} = {3} bits")
    @CsvSource({
        // M&S 1999 §5.4 [pub]: "Ayatollah Ruhollah" 18.38 bits, "time last" 0.29 bits, sparse row 14.46 bits
        "20, 42, 20, 18.38",
        "20, 15019, 15629, 0.29",
        "1, 106, 6, 14.46"})
    void pmiOfTheBookRows(long c12, long c1, long c2, double bits) {
        assertEquals(bits, Association.pmi(c12, c1, c2, N_MS), 0.005);
    }

    @ParameterizedTest(name = "-2 log lambda c1={0} c2={1} c12={2} = {3}")
    @CsvSource({
        // M&S 1999 Table 5.12 (exact recomputation; the book's printed first row differs) [pub]+[comp];
        // the table prints two decimals, so the tolerance is half a unit in the last place.
        "12593, 932, 150, 1291.32",
        "379, 932, 10, 100.50",
        "932, 934, 10, 82.38",
        "932, 3424, 13, 80.37",
        "932, 291, 6, 57.29"})
    void logLikelihoodRatioOfTable512(long c1, long c2, long c12, double expected) {
        assertEquals(expected, Association.logLikelihood(c12, c1, c2, N_MS), 0.005);
    }

    @Test
    void pmiAndNpmiOnTheDistributionExample() {
        // Wikipedia "Pointwise mutual information" worked example [pub]: p(0,0)=.1, p(0,1)=.7,
        // p(1,0)=.15, p(1,1)=.05, as counts out of 20: c(0,0)=2, c(0,1)=14, c(1,0)=3, c(1,1)=1,
        // so c(x=0)=16, c(y=0)=5, c(y=1)=15. pmi(0,0) = -1, pmi(0,1) = 0.222392 bits;
        // npmi(0,1) = 0.432188 (NPMI per Bouma 2009 [comp]).
        assertEquals(-1.0, Association.pmi(2, 16, 5, 20), 1e-12);
        assertEquals(0.222392, Association.pmi(14, 16, 15, 20), 5e-7);
        assertEquals(0.432188, Association.npmi(14, 16, 15, 20), 5e-7);
    }

    @Test
    void npmiBounds() {
        // Bouma 2009, GSCL, "Normalized (pointwise) mutual information in collocation extraction" [pub]:
        // never together -1, independent 0, always together +1.
        assertEquals(-1.0, Association.npmi(0, 10, 10, 100));
        assertEquals(0.0, Association.npmi(10, 100, 100, 1000), 1e-15);
        assertEquals(1.0, Association.npmi(37, 37, 37, 1000), 1e-15);
        assertTrue(Association.npmi(37, 37, 37, 1000) <= 1.0, "clamped");
    }

    @Test
    void measuresAreExactlyZeroAtIndependence() {
        // c12·n = c1·c2 exactly: every measure of dependence must vanish without rounding noise
        assertEquals(0.0, Association.pmi(10, 100, 100, 1000));
        assertEquals(0.0, Association.tScore(10, 100, 100, 1000));
        assertEquals(0.0, Association.chiSquare(10, 100, 100, 1000));
        assertEquals(0.0, Association.logLikelihood(10, 100, 100, 1000), 1e-12);
    }

    @Test
    void equalCountsGiveBitIdenticalScoresAndTheTableIsSymmetric() {
        Random r = new Random(7);
        for (int i = 0; i < 10_000; i++) {
            long n = 1 + r.nextInt(50_000_000);
            long c1 = 1 + (long) (r.nextDouble() * n);
            long c2 = 1 + (long) (r.nextDouble() * n);
            long c12 = 1 + (long) (r.nextDouble() * Math.min(c1, c2));
            c12 = Math.min(c12, Math.min(c1, c2));
            double g = Association.logLikelihood(c12, c1, c2, n);
            assertEquals(Double.doubleToRawLongBits(g), Double.doubleToRawLongBits(Association.logLikelihood(c12, c1, c2, n)));
            assertEquals(g, Association.logLikelihood(c12, c2, c1, n), Math.abs(g) * 1e-12 + 1e-9);
            assertEquals(Association.pmi(c12, c1, c2, n), Association.pmi(c12, c2, c1, n), 1e-12);
            assertTrue(g >= -1e-9, "G² is never negative: " + g);
            double npmi = Association.npmi(c12, c1, c2, n);
            assertTrue(npmi >= -1 && npmi <= 1);
        }
    }

    @Test
    void impossibleCountsAreAProgrammingError() {
        var e = assertThrows(IllegalArgumentException.class, () -> Association.pmi(5, 4, 10, 100));
        assertTrue(e.getMessage().contains("c12=5"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Association.tScore(0, 4, 10, 100));
    }
}
