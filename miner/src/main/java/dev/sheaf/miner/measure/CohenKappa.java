package dev.sheaf.miner.measure;

/**
 * Cohen's kappa for two annotators: p_o = share of shared items with equal values,
 * p_e = Σ_k p_A(k) p_B(k) with each annotator's own proportions over the shared items,
 * κ = (p_o − p_e) / (1 − p_e); undefined when there are no shared items or p_e = 1.
 */
final class CohenKappa {
    private CohenKappa() {
    }

    /** Kappa from a square contingency table (rows: annotator A's category, columns: B's). */
    static double fromTable(long[][] table) {
        int k = table.length;
        double total = 0;
        double diagonal = 0;
        double[] rows = new double[k];
        double[] cols = new double[k];
        for (int i = 0; i < k; i++) {
            if (table[i].length != k) {
                throw new IllegalArgumentException("a Cohen table must be square; row " + i + " has " + table[i].length
                        + " cells, expected " + k);
            }
            for (int j = 0; j < k; j++) {
                total += table[i][j];
                rows[i] += table[i][j];
                cols[j] += table[i][j];
            }
            diagonal += table[i][i];
        }
        if (total == 0) {
            return Double.NaN;
        }
        double po = diagonal / total;
        double pe = 0;
        for (int i = 0; i < k; i++) {
            pe += (rows[i] / total) * (cols[i] / total);
        }
        if (pe == 1) {
            return Double.NaN;
        }
        return (po - pe) / (1 - pe);
    }
}
