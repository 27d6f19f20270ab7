package dev.sheaf.miner.mine;

import java.util.ArrayList;
import java.util.List;

/**
 * Category-distinctive terms: the log-odds ratio with an informative Dirichlet prior (Monroe,
 * Colaresi &amp; Quinn 2008, "Fightin' Words", Political Analysis 16(4)), one category against all
 * other categories together.
 *
 * <p>Counts are listings (document frequencies): y_i listings of category i contain the term out of
 * n_i, y_r of the rest out of n_r. The prior is proportional to the term's share of all categorised
 * listings: α_w = α_0 · y / n with α_0 = {@code priorShare} · n. Then
 * δ = ln((y_i + α_w) / (n_i + α_0 − y_i − α_w)) − ln((y_r + α_w) / (n_r + α_0 − y_r − α_w)),
 * σ² ≈ 1/(y_i + α_w) + 1/(y_r + α_w), z = δ / σ. Counting listings rather than occurrences means a
 * term repeated inside one listing cannot make its category look distinctive. Listings without a
 * category take no part; with fewer than two categories nothing is reported.
 */
final class LogOdds {
    private final String[] names;
    private final long[] sizes;
    private final long total;
    private final int named;
    private final double priorShare;

    LogOdds(String[] names, long[] sizes, double priorShare) {
        this.names = names;
        this.sizes = sizes;
        this.priorShare = priorShare;
        long t = 0;
        int k = 0;
        for (int i = 0; i < names.length; i++) {
            if (!names[i].isEmpty() && sizes[i] > 0) {
                t += sizes[i];
                k++;
            }
        }
        this.total = t;
        this.named = k;
    }

    /** z of category i given the term's df per category (same indexing as the names). */
    static double z(long yi, long ni, long y, long n, double priorShare) {
        double a0 = priorShare * n;
        double aw = a0 * y / n;
        long yr = y - yi;
        long nr = n - ni;
        double di = ni + a0 - yi - aw;
        double dr = nr + a0 - yr - aw;
        if (di <= 0 || dr <= 0) {
            return 0.0;
        }
        double delta = StrictMath.log((yi + aw) / di) - StrictMath.log((yr + aw) / dr);
        double var = 1.0 / (yi + aw) + 1.0 / (yr + aw);
        return delta / StrictMath.sqrt(var);
    }

    /** The up-to-{@code k} categories with the highest positive z, by z descending then name. */
    List<Harvest.CategoryScore> top(int[] df, int k) {
        List<Harvest.CategoryScore> out = new ArrayList<>();
        if (named < 2 || k == 0) {
            return out;
        }
        long y = 0;
        for (int i = 0; i < names.length; i++) {
            if (!names[i].isEmpty()) {
                y += df[i];
            }
        }
        if (y == 0) {
            return out;
        }
        for (int i = 0; i < names.length; i++) {
            if (names[i].isEmpty() || sizes[i] == 0) {
                continue;
            }
            double z = z(df[i], sizes[i], y, total, priorShare);
            if (z > 0) {
                out.add(new Harvest.CategoryScore(names[i], df[i], z));
            }
        }
        out.sort((a, b) -> {
            int x = Double.compare(b.z(), a.z());
            return x != 0 ? x : a.category().compareTo(b.category());
        });
        return out.size() > k ? new ArrayList<>(out.subList(0, k)) : out;
    }
}
