package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class KrippendorffAlphaTest {
    /**
     * Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]+[comp]:
     * 4 observers x 12 units, '.' = missing.
     */
    static final String[] EXAMPLE = {
        "1 2 3 3 2 1 4 1 2 . . .",
        "1 2 3 3 2 2 4 1 2 5 . 3",
        ". 3 3 3 2 3 4 2 2 5 1 .",
        "1 2 3 3 2 4 4 1 2 5 1 ."};

    /** Units of the example as category indices 0..4 for values 1..5. */
    static List<int[]> exampleUnits() {
        String[][] cells = new String[EXAMPLE.length][];
        for (int o = 0; o < EXAMPLE.length; o++) {
            cells[o] = EXAMPLE[o].split(" ");
        }
        List<int[]> units = new ArrayList<>();
        for (int u = 0; u < cells[0].length; u++) {
            List<Integer> values = new ArrayList<>();
            for (String[] observer : cells) {
                if (!observer[u].equals(".")) {
                    values.add(Integer.parseInt(observer[u]) - 1);
                }
            }
            units.add(values.stream().mapToInt(Integer::intValue).toArray());
        }
        return units;
    }

    static final double[] GRADES = {1, 2, 3, 4, 5};

    private static KrippendorffResult alpha(AgreementMetric metric) {
        return new KrippendorffAlpha(exampleUnits(), 5, GRADES, metric).result();
    }

    @Test
    void nominalAlphaOfThePublishedExampleWithMissingValues() {
        // Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]+[comp]: nominal 0.743
        assertEquals(0.743, alpha(AgreementMetric.NOMINAL).alpha(), 0.0005);
    }

    @Test
    void intervalAlphaOfThePublishedExampleWithMissingValues() {
        // Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]+[comp]: interval 0.849
        assertEquals(0.849, alpha(AgreementMetric.INTERVAL).alpha(), 0.0005);
    }

    @Test
    void ordinalAndRatioAlphaOfThePublishedExample() {
        // Krippendorff 2011, "Computing Krippendorff's Alpha-Reliability", U. Penn ASC paper 43 [mem]: ordinal 0.815,
        // ratio 0.797 (recalled, not in CHECKS.md; the live NLTK check in AgreementReferenceCheckTest confirms ordinal).
        assertEquals(0.815, alpha(AgreementMetric.ORDINAL).alpha(), 0.0005);
        assertEquals(0.797, alpha(AgreementMetric.RATIO).alpha(), 0.0005);
    }

    @Test
    void dropsTheUnitWithASingleValueAndCountsThePairableValues() {
        KrippendorffResult r = alpha(AgreementMetric.NOMINAL);
        // [comp] from the example: unit 12 holds one value; the other 11 units hold 3+4*8+3+2 = 40 values.
        assertEquals(11, r.pairableUnits());
        assertEquals(40, r.pairableValues());
    }

    @Test
    void coincidenceMatrixIsSymmetricAndItsMarginalsCountThePairableValues() {
        KrippendorffAlpha ka = new KrippendorffAlpha(exampleUnits(), 5, GRADES, AgreementMetric.NOMINAL);
        double[][] o = ka.coincidences(null);
        double total = 0;
        for (int c = 0; c < 5; c++) {
            for (int k = 0; k < 5; k++) {
                assertEquals(o[c][k], o[k][c], 1e-12);
                total += o[c][k];
            }
        }
        assertEquals(40, total, 1e-9);
        // [comp] value 5 occurs three times, all in unit 10 (m = 3): o_55 = 3*2/2 = 3.
        assertEquals(3, o[4][4], 1e-12);
    }

    @Test
    void perfectAgreementGivesOneUnderEveryMetric() {
        List<int[]> units = List.of(new int[] {0, 0, 0}, new int[] {1, 1}, new int[] {2, 2, 2}, new int[] {0, 0});
        for (AgreementMetric m : AgreementMetric.values()) {
            assertEquals(1.0, new KrippendorffAlpha(units, 3, new double[] {1, 2, 3}, m).result().alpha(), 1e-12, m.label());
        }
    }

    @Test
    void alphaIsUndefinedWhenEveryValueIsTheSame() {
        KrippendorffResult r = new KrippendorffAlpha(List.of(new int[] {1, 1}, new int[] {1, 1, 1}), 2,
                new double[] {0, 1}, AgreementMetric.NOMINAL).result();
        assertFalse(r.defined());
        assertTrue(r.undefinedReason().contains("no variation"), r.undefinedReason());
    }

    @Test
    void alphaIsUndefinedWhenNoItemHasTwoJudgments() {
        KrippendorffResult r = new KrippendorffAlpha(List.of(new int[] {0}, new int[] {1}), 2,
                new double[] {0, 1}, AgreementMetric.NOMINAL).result();
        assertFalse(r.defined());
        assertEquals(0, r.pairableUnits());
    }

    @Test
    void everyMetricGivesTheSameAlphaOnTwoValuedData() {
        // With two categories δ² has one off-diagonal value, which cancels between D_o and D_e [comp].
        List<int[]> units = List.of(new int[] {0, 1, 1}, new int[] {1, 1}, new int[] {0, 0, 0}, new int[] {0, 1}, new int[] {1, 1, 0});
        double nominal = new KrippendorffAlpha(units, 2, new double[] {0, 1}, AgreementMetric.NOMINAL).result().alpha();
        for (AgreementMetric m : AgreementMetric.values()) {
            assertEquals(nominal, new KrippendorffAlpha(units, 2, new double[] {0, 1}, m).result().alpha(), 1e-12, m.label());
        }
    }

    @Test
    void ordinalAlphaDependsOnlyOnTheOrderOfTheGrades() {
        double[] stretched = {1, 2, 30, 400, 5000};
        assertEquals(alpha(AgreementMetric.ORDINAL).alpha(),
                new KrippendorffAlpha(exampleUnits(), 5, stretched, AgreementMetric.ORDINAL).result().alpha(), 1e-12);
        assertTrue(Math.abs(alpha(AgreementMetric.INTERVAL).alpha()
                - new KrippendorffAlpha(exampleUnits(), 5, stretched, AgreementMetric.INTERVAL).result().alpha()) > 0.01);
    }

    @Test
    void observedAgreementIsTheShareOfMatchingPairs() {
        // Two units: (a, a) matches, (a, b) does not: one of two ordered-pair weights each -> 2 of 4 values agree.
        KrippendorffAlpha ka = new KrippendorffAlpha(List.of(new int[] {0, 0}, new int[] {0, 1}), 2,
                new double[] {0, 1}, AgreementMetric.NOMINAL);
        assertEquals(0.5, ka.observedAgreement(), 1e-12);
    }
}
