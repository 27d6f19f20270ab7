package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * The words people use for one attribute and how evenly: each form with its count, and the Shannon
 * entropy of the distribution, H = −Σ p·log2 p in bits (0 when everyone writes the same form;
 * log2 k when k forms are equally common). High entropy on a small vocabulary of labels means
 * people reach for words the vocabulary may lack.
 *
 * @param forms        each form with its count, most frequent first, then by form (UTF-16 order)
 * @param total        the sum of the counts
 * @param entropyBits  H in bits; 0 for no or one form
 */
public record SurfaceForms(List<Form> forms, int total, double entropyBits) {

    /** One surface form (normal form: lower case, folded) and how often it occurred. */
    public record Form(String form, int count) {
        public Form {
            Objects.requireNonNull(form, "form");
            if (count <= 0) {
                throw new IllegalArgumentException("a surface form occurs at least once; got " + count + " for '" + form + "'");
            }
        }
    }

    private static final Comparator<Form> ORDER = Comparator.comparingInt((Form f) -> -f.count()).thenComparing(Form::form);

    public SurfaceForms {
        forms = List.copyOf(forms);
        int sum = 0;
        for (Form f : forms) {
            sum += f.count();
        }
        if (sum != total) {
            throw new IllegalArgumentException("total " + total + " is not the sum of the counts, " + sum);
        }
        if (!(entropyBits >= 0)) {
            throw new IllegalArgumentException("entropy must be >= 0 bits, got " + entropyBits);
        }
    }

    /** The forms of these counts, with their entropy. */
    public static SurfaceForms of(Map<String, Integer> counts) {
        List<Form> list = new ArrayList<>();
        counts.forEach((form, n) -> list.add(new Form(form, n)));
        list.sort(ORDER);
        int total = 0;
        for (Form f : list) {
            total += f.count();
        }
        return new SurfaceForms(list, total, entropy(list, total));
    }

    /**
     * Shannon entropy in bits of the counts, H = −Σ (n_i/N) log2 (n_i/N). Added smallest first, so the
     * same counts give bit-identical results in any order.
     */
    static double entropy(List<Form> forms, int total) {
        if (total == 0 || forms.size() < 2) {
            return 0;
        }
        double[] terms = new double[forms.size()];
        for (int i = 0; i < terms.length; i++) {
            double p = (double) forms.get(i).count() / total;
            terms[i] = -p * (Math.log(p) / Math.log(2));
        }
        java.util.Arrays.sort(terms);
        double h = 0;
        for (double t : terms) {
            h += t;
        }
        return Math.max(0, h);
    }

    /** The number of distinct forms. */
    public int distinct() {
        return forms.size();
    }

    /** The first {@code k} forms as "form (count)", joined by "; ". */
    public String top(int k) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < Math.min(k, forms.size()); i++) {
            if (i > 0) {
                b.append("; ");
            }
            b.append(forms.get(i).form()).append(" (").append(forms.get(i).count()).append(')');
        }
        return b.toString();
    }
}
