package dev.sheaf.miner.label;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The tables for data scientists, written from the listing rows (docs/decisions/103-label-exports.md):
 * the multi-hot matrix, the per-facet value table, the label summary and the split files. Every
 * file is written atomically and every CSV through {@link SafeCsv}.
 */
final class LabelExports {
    private static final int STATED = 1;
    private static final int ABSENT = 0;
    private static final int NEGATED = -1;
    private static final List<String> ROW_HEAD = List.of("id", "category", "source");

    private LabelExports() {
    }

    /** Canonical row order of the files: by source, then by position in the source. */
    static final Comparator<LabelRow> FILE_ORDER = Comparator.comparing(LabelRow::source).thenComparingLong(LabelRow::seq);
    /** Order the split sees: by id, then source and locator, so it does not depend on reading order. */
    static final Comparator<LabelRow> SPLIT_ORDER = Comparator.comparing(LabelRow::id).thenComparing(LabelRow::source)
            .thenComparing(LabelRow::locator);

    /** {@code labels.csv}: id, category, source, then one column per concept and bucket: 1 stated, 0 absent, -1 negated. */
    static void writeMatrix(Path file, LabelColumns cols, List<LabelRow> rows) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            List<Object> head = new ArrayList<>(ROW_HEAD);
            head.addAll(cols.headers);
            csv.row(head);
            Object[] head3 = new Object[3];
            int[] cells = new int[cols.size()];
            for (LabelRow r : rows) {
                head3[0] = r.id();
                head3[1] = r.category();
                head3[2] = r.source();
                Arrays.fill(cells, ABSENT);
                for (int code : r.codes()) {
                    int c = code >>> 1;
                    boolean negated = (code & 1) == 1;
                    if (!negated || cells[c] != STATED) {
                        cells[c] = negated ? NEGATED : STATED;
                    }
                }
                csv.row(head3, cells);
            }
            csv.flush();
        });
    }

    /** {@code facet-values.csv}: id, category, source, then one column per facet with its values joined by "|". */
    static void writeFacetValues(Path file, LabelColumns cols, List<LabelRow> rows) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            List<Object> head = new ArrayList<>(ROW_HEAD);
            head.addAll(cols.facetHeaders);
            csv.row(head);
            Object[] cells = new Object[3 + cols.facets.size()];
            for (LabelRow r : rows) {
                cells[0] = r.id();
                cells[1] = r.category();
                cells[2] = r.source();
                System.arraycopy(r.facetCells(), 0, cells, 3, r.facetCells().length);
                csv.row(cells);
            }
            csv.flush();
        });
    }

    /** Per column: positives, negated, applicable listings. */
    static final class ColumnCounts {
        final long[] positives;
        final long[] negated;
        final long[] applicable;
        final long listings;

        ColumnCounts(LabelColumns cols, List<LabelRow> rows) {
            positives = new long[cols.size()];
            negated = new long[cols.size()];
            applicable = new long[cols.size()];
            listings = rows.size();
            Map<String, Long> perCategory = new HashMap<>();
            for (LabelRow r : rows) {
                perCategory.merge(r.category(), 1L, Long::sum);
                int lastStated = -1;
                for (int code : r.codes()) {
                    int c = code >>> 1;
                    if ((code & 1) == 0) {
                        positives[c]++;
                        lastStated = c;
                    } else if (c != lastStated) {
                        negated[c]++;
                    }
                }
            }
            for (int c = 0; c < cols.size(); c++) {
                long a = 0;
                for (Map.Entry<String, Long> e : perCategory.entrySet()) {
                    if (cols.applies(c, e.getKey())) {
                        a += e.getValue();
                    }
                }
                applicable[c] = a;
            }
        }
    }

    static final List<String> SUMMARY_HEADER = List.of("column", "concept", "facet", "label", "positives", "negated", "absent",
            "positive_share", "imbalance_ratio", "applicable", "positive_share_applicable");

    /** {@code label-summary.csv} and {@code .json}: positives, negations and imbalance per column, and the totals. */
    static void writeSummary(Path csvFile, Path jsonFile, LabelColumns cols, List<LabelRow> rows, LabelRunSummary totals,
                             Map<String, String> settings, SplitOutcome split) throws IOException {
        ColumnCounts counts = new ColumnCounts(cols, rows);
        AtomicFiles.writeText(csvFile, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row(SUMMARY_HEADER);
            for (int c = 0; c < cols.size(); c++) {
                long p = counts.positives[c];
                long n = counts.listings;
                csv.row(cols.keys.get(c), cols.conceptOf.get(c), cols.facetOf.get(c), cols.labelOf.get(c), p, counts.negated[c],
                        n - p - counts.negated[c], share(p, n), ratio(p, n), counts.applicable[c], share(p, counts.applicable[c]));
            }
            csv.flush();
        });
        AtomicFiles.write(jsonFile, out -> {
            try (JsonGenerator g = new JsonFactory().createGenerator(out).useDefaultPrettyPrinter()) {
                g.writeStartObject();
                g.writeStringField("format", "sheaf-label-summary");
                g.writeNumberField("formatVersion", 1);
                g.writeNumberField("listings", totals.listings());
                g.writeNumberField("listingsWithLabels", totals.withLabels());
                g.writeNumberField("listingsWithoutLabels", totals.withoutLabels());
                g.writeNumberField("listingsWithNothing", totals.withNothing());
                g.writeNumberField("statedAssignments", totals.stated());
                g.writeNumberField("negatedAssignments", totals.negated());
                g.writeNumberField("categoryErrors", totals.categoryErrors());
                g.writeNumberField("invalidValues", totals.invalidValues());
                g.writeNumberField("problems", totals.problems());
                g.writeObjectFieldStart("settings");
                for (Map.Entry<String, String> e : settings.entrySet()) {
                    g.writeStringField(e.getKey(), e.getValue());
                }
                g.writeEndObject();
                g.writeArrayFieldStart("notes");
                for (String s : totals.notes()) {
                    g.writeString(s);
                }
                g.writeEndArray();
                g.writeArrayFieldStart("columns");
                for (int c = 0; c < cols.size(); c++) {
                    long p = counts.positives[c];
                    long n = counts.listings;
                    g.writeStartObject();
                    g.writeStringField("column", cols.keys.get(c));
                    g.writeStringField("concept", cols.conceptOf.get(c));
                    g.writeStringField("facet", cols.facetOf.get(c));
                    g.writeStringField("label", cols.labelOf.get(c));
                    g.writeNumberField("positives", p);
                    g.writeNumberField("negated", counts.negated[c]);
                    g.writeNumberField("absent", n - p - counts.negated[c]);
                    number(g, "positiveShare", share(p, n));
                    number(g, "imbalanceRatio", ratio(p, n));
                    g.writeNumberField("applicable", counts.applicable[c]);
                    number(g, "positiveShareApplicable", share(p, counts.applicable[c]));
                    g.writeEndObject();
                }
                g.writeEndArray();
                if (split != null) {
                    g.writeObjectFieldStart("split");
                    g.writeNumberField("seed", split.seed);
                    g.writeObjectFieldStart("sizes");
                    for (int j = 0; j < split.names.size(); j++) {
                        g.writeNumberField(split.names.get(j), split.result.size(j));
                    }
                    g.writeEndObject();
                    g.writeObjectFieldStart("proportions");
                    for (int j = 0; j < split.names.size(); j++) {
                        g.writeNumberField(split.names.get(j), split.result.proportions()[j]);
                    }
                    g.writeEndObject();
                    g.writeEndObject();
                }
                g.writeEndObject();
            }
        });
    }

    private static void number(JsonGenerator g, String name, Double v) throws IOException {
        if (v == null) {
            g.writeNullField(name);
        } else {
            g.writeNumberField(name, v);
        }
    }

    /** p / n, or null when n is 0. */
    static Double share(long p, long n) {
        return n == 0 ? null : (double) p / n;
    }

    /** majority / minority of positive vs not positive, or null when one class is empty. */
    static Double ratio(long p, long n) {
        long q = n - p;
        long min = Math.min(p, q);
        return min == 0 ? null : (double) Math.max(p, q) / min;
    }

    /** {@code category-errors.csv}: assignments whose facet does not apply to the listing's category. */
    static final List<String> CATEGORY_ERRORS_HEADER = List.of("id", "category", "source", "concept", "label", "facet",
            "facet_categories", "polarity", "field", "text");

    static List<Object[]> categoryErrors(Assignments a, Vocabulary v) {
        List<Object[]> out = new ArrayList<>();
        for (Assignment x : a.categoryErrors()) {
            Evidence e = x.evidence().get(0);
            String cats = x.facetId() == null ? "" : v.concept(x.facetId()).map(Concept::facet)
                    .map(p -> String.join("|", p.categories())).orElse("");
            out.add(new Object[] {a.listingId(), a.category(), a.source(), x.conceptId(), v.displayLabel(x.conceptId()),
                x.facetId(), cats, x.polarity().word(), e.fieldKind().label() + (e.key().isEmpty() ? "" : " " + e.key()), e.text()});
        }
        return out;
    }

    static void writeCategoryErrors(Path file, List<Object[]> rows) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row(CATEGORY_ERRORS_HEADER);
            for (Object[] r : rows) {
                csv.row(r);
            }
            csv.flush();
        });
    }

    /** A split and how it was made. */
    static final class SplitOutcome {
        final List<String> names;
        final StratifiedSplit.Result result;
        final long seed;
        final List<LabelRow> order;

        SplitOutcome(List<String> names, StratifiedSplit.Result result, long seed, List<LabelRow> order) {
            this.names = names;
            this.result = result;
            this.seed = seed;
            this.order = order;
        }
    }

    /** Splits the rows by iterative stratification over their stated matrix columns. */
    static SplitOutcome split(LabelColumns cols, List<LabelRow> rows, double[] proportions, long seed) {
        List<LabelRow> order = new ArrayList<>(rows);
        order.sort(SPLIT_ORDER);
        int[][] labels = new int[order.size()][];
        for (int i = 0; i < labels.length; i++) {
            labels[i] = Arrays.stream(order.get(i).codes()).filter(c -> (c & 1) == 0).map(c -> c >>> 1).toArray();
        }
        StratifiedSplit.Result r = StratifiedSplit.split(labels, cols.size(), proportions, seed);
        return new SplitOutcome(StratifiedSplit.subsetNames(proportions.length), r, seed, order);
    }

    /** {@code split.csv} (id, category, source, locator, split) and {@code split-summary.csv} (per column, per subset). */
    static void writeSplit(Path splitFile, Path summaryFile, LabelColumns cols, SplitOutcome s) throws IOException {
        int[] subset = s.result.subsetOf();
        AtomicFiles.writeText(splitFile, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row("id", "category", "source", "locator", "split");
            for (int i = 0; i < s.order.size(); i++) {
                LabelRow r = s.order.get(i);
                csv.row(r.id(), r.category(), r.source(), r.locator(), s.names.get(subset[i]));
            }
            csv.flush();
        });
        AtomicFiles.writeText(summaryFile, w -> {
            SafeCsv csv = new SafeCsv(w);
            List<Object> head = new ArrayList<>(List.of("column", "label", "positives"));
            for (String n : s.names) {
                head.add(n);
                head.add(n + "_share");
            }
            csv.row(head);
            List<Object> all = new ArrayList<>(List.of("(all listings)", "", (long) s.order.size()));
            for (int j = 0; j < s.names.size(); j++) {
                all.add((long) s.result.size(j));
                all.add(share(s.result.size(j), s.order.size()));
            }
            csv.row(all);
            for (int c = 0; c < cols.size(); c++) {
                long total = 0;
                for (int j = 0; j < s.names.size(); j++) {
                    total += s.result.count(c, j);
                }
                List<Object> row = new ArrayList<>(List.of(cols.keys.get(c), cols.labelOf.get(c), total));
                for (int j = 0; j < s.names.size(); j++) {
                    row.add((long) s.result.count(c, j));
                    row.add(share(s.result.count(c, j), total));
                }
                csv.row(row);
            }
            csv.flush();
        });
    }

    static Map<String, Integer> sizes(SplitOutcome s) {
        Map<String, Integer> m = new LinkedHashMap<>();
        if (s != null) {
            for (int j = 0; j < s.names.size(); j++) {
                m.put(s.names.get(j), s.result.size(j));
            }
        }
        return m;
    }

}
