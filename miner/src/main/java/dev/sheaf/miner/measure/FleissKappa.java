package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Fleiss' kappa (Fleiss 1971): with N items, n judgments each and n_ij the judgments of item i in
 * category j, P_i = (Σ_j n_ij² − n) / (n (n − 1)), P̄ = mean P_i, p_j = Σ_i n_ij / (N n),
 * P̄_e = Σ_j p_j², κ = (P̄ − P̄_e) / (1 − P̄_e).
 */
final class FleissKappa {
    private FleissKappa() {
    }

    /** Kappa from a count table (rows: items, columns: categories); every row must have the same sum ≥ 2. */
    static double fromTable(int[][] table) {
        int items = table.length;
        if (items == 0) {
            throw new IllegalArgumentException("a Fleiss table needs at least one item");
        }
        int categories = table[0].length;
        int n = 0;
        for (int c : table[0]) {
            n += c;
        }
        if (n < 2) {
            throw new IllegalArgumentException("each item needs at least two judgments, the first has " + n);
        }
        double[] columnSum = new double[categories];
        double pSum = 0;
        for (int[] row : table) {
            int sum = 0;
            double squares = 0;
            for (int j = 0; j < categories; j++) {
                sum += row[j];
                squares += (double) row[j] * row[j];
                columnSum[j] += row[j];
            }
            if (sum != n) {
                throw new IllegalArgumentException("every item needs the same number of judgments: " + n + " then " + sum);
            }
            pSum += (squares - n) / ((double) n * (n - 1));
        }
        double pBar = pSum / items;
        double pe = 0;
        for (double s : columnSum) {
            double p = s / ((double) items * n);
            pe += p * p;
        }
        if (pe == 1) {
            return Double.NaN;
        }
        return (pBar - pe) / (1 - pe);
    }

    /** Fleiss' kappa for units (category indices per item), on the modal-count subset. */
    static FleissResult of(List<int[]> units, int categories, AgreementThresholds thresholds) {
        Map<Integer, Integer> itemsByCount = new TreeMap<>();
        for (int[] u : units) {
            if (u.length >= 2) {
                itemsByCount.merge(u.length, 1, Integer::sum);
            }
        }
        if (itemsByCount.isEmpty()) {
            return new FleissResult(Double.NaN, KappaBand.UNDEFINED, 0, 0, units.size(),
                    "n/a: no item has two or more judgments");
        }
        int modal = 0;
        int modalItems = -1;
        for (Map.Entry<Integer, Integer> e : itemsByCount.entrySet()) { // ascending, so >= keeps the larger count on ties
            if (e.getValue() >= modalItems) {
                modal = e.getKey();
                modalItems = e.getValue();
            }
        }
        int[][] table = new int[modalItems][categories];
        int r = 0;
        for (int[] u : units) {
            if (u.length == modal) {
                for (int c : u) {
                    table[r][c]++;
                }
                r++;
            }
        }
        int leftOut = units.size() - modalItems;
        double kappa = fromTable(table);
        String note;
        if (Double.isNaN(kappa)) {
            note = "n/a: every judgment on the items used has the same value";
        } else if (leftOut > 0) {
            note = "unequal numbers of judgments: computed on the " + modalItems + " items with " + modal
                    + " judgments each; " + leftOut + " other item" + (leftOut == 1 ? "" : "s") + " left out";
        } else {
            note = "";
        }
        return new FleissResult(kappa, thresholds.band(kappa), modalItems, modal, leftOut, note);
    }
}
