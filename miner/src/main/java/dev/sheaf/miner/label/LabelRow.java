package dev.sheaf.miner.label;

import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.io.SafeCsv;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.TreeSet;

/**
 * One listing as the tables need it, small enough to keep a million in memory: matrix codes
 * (column·2, plus 1 when negated; a stated and a negated code for one column never both occur)
 * and the facet-value cells.
 */
record LabelRow(String id, String category, String source, String locator, long seq, int[] codes, Object[] facetCells,
                boolean empty, boolean noStated, int negated, int invalid) {

    static LabelRow of(Assignments a, long seq, LabelColumns cols, Vocabulary v) {
        int[] codes = new int[a.assignments().size()];
        int n = 0;
        int negated = 0;
        for (Assignment x : a.assignments()) {
            if (!x.isStated()) {
                negated++;
            }
            int c = cols.column(x);
            if (c >= 0) {
                codes[n++] = c * 2 + (x.isStated() ? 0 : 1);
            }
        }
        codes = Arrays.stream(codes, 0, n).distinct().sorted().toArray();
        Object[] cells = new Object[cols.facets.size()];
        for (int f = 0; f < cells.length; f++) {
            cells[f] = cell(cols.facets.get(f), a, v);
        }
        return new LabelRow(a.listingId(), a.category(), a.source(), a.locator(), seq, codes, cells, a.isEmpty(),
                a.hasNoStatedLabel(), negated, a.invalid().size());
    }

    /** The facet's values in this listing, joined with "|": labels of stated values, yes/no, or numbers. */
    private static Object cell(Concept facet, Assignments a, Vocabulary v) {
        ValueKind kind = facet.facet().valueKind();
        if (kind == ValueKind.YES_NO) {
            for (Assignment x : a.assignments()) {
                if (x.conceptId().equals(facet.id())) {
                    return x.isStated() ? "yes" : "no";
                }
            }
            return null;
        }
        if (kind == ValueKind.NUMBER) {
            List<Assignment> nums = new ArrayList<>();
            for (Assignment x : a.assignments()) {
                if (x.isNumber() && x.conceptId().equals(facet.id())) {
                    nums.add(x);
                }
            }
            if (nums.isEmpty()) {
                return null;
            }
            if (nums.size() == 1 && nums.get(0).value().equals(nums.get(0).valueMax())) {
                return nums.get(0).value(); // a number cell: never neutralised, so "-9" stays a number
            }
            StringBuilder b = new StringBuilder();
            for (Assignment x : nums) {
                if (b.length() > 0) {
                    b.append('|');
                }
                b.append(SafeCsv.formatDouble(x.value()));
                if (!x.value().equals(x.valueMax())) {
                    b.append("..").append(SafeCsv.formatDouble(x.valueMax()));
                }
            }
            return b.toString();
        }
        TreeSet<String> labels = new TreeSet<>();
        for (Assignment x : a.assignments()) {
            if (x.isStated() && !x.isNumber() && facet.id().equals(x.facetId())) {
                labels.add(v.displayLabel(x.conceptId()));
            }
        }
        return labels.isEmpty() ? null : String.join("|", labels);
    }

}
