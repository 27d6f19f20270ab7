package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * The front door of annotator agreement: per attribute Krippendorff's alpha with a bootstrap
 * interval, Fleiss' kappa, observed agreement and pairwise Cohen's kappa; per annotator, agreement
 * with the others and alpha without them. Bad rows become {@link JudgmentProblem}s, never exceptions.
 *
 * <pre>{@code
 * Judgments j = JudgmentsCsv.read(Path.of("judgments.csv"), JudgmentColumns.DEFAULT);
 * AgreementReport r = AgreementAnalysis.run(j, AgreementOptions.builder().seed(7).build());
 * }</pre>
 */
public final class AgreementAnalysis {
    private AgreementAnalysis() {
    }

    /** Runs the analysis. Deterministic for the same judgments, seed and pseudonym key. */
    public static AgreementReport run(Judgments judgments, AgreementOptions options) {
        List<JudgmentProblem> problems = new ArrayList<>(judgments.problems());
        Map<String, List<Judgment>> byAttribute = new TreeMap<>();
        for (Judgment j : judgments.list()) {
            String key = options.attributeResolver().apply(j.attribute());
            if (key == null || key.isBlank()) {
                problems.add(new JudgmentProblem(judgments.source(), j.row(), "unknown-attribute",
                        "attribute '" + j.attribute() + "' is not known; expected a concept or facet id or label of the "
                                + "vocabulary. Correct the attribute or add it to the vocabulary. Row skipped"));
                continue;
            }
            byAttribute.computeIfAbsent(key, k -> new ArrayList<>()).add(j);
        }
        List<String> everyone = new ArrayList<>();
        byAttribute.values().forEach(list -> list.forEach(j -> everyone.add(j.annotator())));
        Map<String, String> pseudonym = options.pseudonyms().assign(everyone);

        List<AgreementAttribute> attributes = new ArrayList<>();
        List<AgreementAnnotator> annotators = new ArrayList<>();
        int used = 0;
        for (Map.Entry<String, List<Judgment>> e : byAttribute.entrySet()) {
            AttributeData data = AttributeData.of(e.getKey(), e.getValue(), pseudonym, options, judgments.source(), problems);
            used += data.judgments;
            analyse(data, options, attributes, annotators);
        }
        List<String> notes = new ArrayList<>();
        for (String asked : options.metrics().keySet()) {
            if (!byAttribute.containsKey(asked)) {
                notes.add("a metric was set for attribute '" + asked + "', but no judgment names that attribute; "
                        + "check the spelling (attributes judged: " + String.join(", ", byAttribute.keySet()) + ")");
            }
        }
        problems.sort(Comparator.comparingLong(JudgmentProblem::row));
        return new AgreementReport(judgments.source(), attributes, annotators, overview(attributes, annotators, options.thresholds()), problems,
                judgments.list().size(), used, options.seed(), options.replicates(), options.confidence(),
                options.thresholds(), notes);
    }

    private static void analyse(AttributeData d, AgreementOptions options, List<AgreementAttribute> attributes,
                                List<AgreementAnnotator> annotators) {
        AgreementThresholds t = options.thresholds();
        JudgmentScale scale = d.scale;
        int k = scale.size();
        List<int[]> units = d.unitCategories(-1);
        KrippendorffAlpha ka = new KrippendorffAlpha(units, k, scale.numbers, scale.metric);
        KrippendorffResult alpha = ka.result();
        BootstrapInterval interval = BootstrapAlpha.interval(ka, options.replicates(), options.confidence(),
                BootstrapAlpha.seedFor(options.seed(), d.attribute));
        FleissResult fleiss = FleissKappa.of(units, k, t);

        int a = d.pseudonyms.size();
        List<CohenPair> pairs = new ArrayList<>();
        long[][] comparisons = new long[a][a];
        long[][] agreements = new long[a][a];
        double[][] kappa = new double[a][a];
        for (int x = 0; x < a; x++) {
            for (int y = x + 1; y < a; y++) {
                long[][] table = new long[k][k];
                long shared = 0;
                for (int u = 0; u < d.items.size(); u++) {
                    int cx = d.category[x][u];
                    int cy = d.category[y][u];
                    if (cx >= 0 && cy >= 0) {
                        table[cx][cy]++;
                        shared++;
                    }
                }
                kappa[x][y] = kappa[y][x] = Double.NaN;
                if (shared == 0) {
                    continue;
                }
                long same = 0;
                for (int c = 0; c < k; c++) {
                    same += table[c][c];
                }
                double kxy = CohenKappa.fromTable(table);
                kappa[x][y] = kappa[y][x] = kxy;
                comparisons[x][y] = comparisons[y][x] = shared;
                agreements[x][y] = agreements[y][x] = same;
                pairs.add(new CohenPair(d.attribute, d.pseudonyms.get(x), d.pseudonyms.get(y), (int) shared,
                        (double) same / shared, kxy, t.band(kxy)));
            }
        }
        double meanKappa = mean(pairs.stream().mapToDouble(CohenPair::kappa).toArray());

        for (int x = 0; x < a; x++) {
            int partners = 0;
            long compared = 0;
            long agreed = 0;
            double[] kappas = new double[a];
            int nk = 0;
            for (int y = 0; y < a; y++) {
                if (y == x || comparisons[x][y] == 0) {
                    continue;
                }
                partners++;
                compared += comparisons[x][y];
                agreed += agreements[x][y];
                kappas[nk++] = kappa[x][y];
            }
            double meanX = mean(java.util.Arrays.copyOf(kappas, nk));
            double without = new KrippendorffAlpha(d.unitCategories(x), k, scale.numbers, scale.metric).result().alpha();
            annotators.add(new AgreementAnnotator(d.attribute, d.pseudonyms.get(x), d.judgmentsOf[x], partners,
                    (int) compared, (int) agreed, compared == 0 ? Double.NaN : (double) agreed / compared, meanX, t.band(meanX),
                    alpha.alpha(), without, without - alpha.alpha()));
        }

        List<String> notes = new ArrayList<>();
        if (scale.note != null) {
            notes.add(scale.note);
        }
        int single = d.items.size() - alpha.pairableUnits();
        if (single > 0 && alpha.pairableUnits() > 0) {
            notes.add(single + " item" + (single == 1 ? " has" : "s have") + " a single judgment and "
                    + (single == 1 ? "is" : "are") + " left out of alpha, as Krippendorff specifies");
        }
        if (!fleiss.note().isEmpty()) {
            notes.add("Fleiss' kappa: " + fleiss.note());
        }
        Map<String, Integer> values = new LinkedHashMap<>();
        for (int c = 0; c < k; c++) {
            if (d.valueCounts[c] > 0) { // a value seen only in conflicting rows is not shown
                values.put(scale.labels.get(c), d.valueCounts[c]);
            }
        }
        attributes.add(new AgreementAttribute(d.attribute, scale.kind.label, scale.metricFromOptions, values,
                d.items.size(), d.judgments, a, alpha, interval, t.verdict(alpha.alpha()), ka.observedAgreement(), fleiss,
                pairs, meanKappa, t.band(meanKappa), notes));
    }

    private static List<AgreementAnnotatorOverview> overview(List<AgreementAttribute> attributes,
                                                             List<AgreementAnnotator> rows, AgreementThresholds thresholds) {
        Map<String, List<AgreementAnnotator>> byAnnotator = new TreeMap<>();
        for (AgreementAnnotator r : rows) {
            byAnnotator.computeIfAbsent(r.annotator(), x -> new ArrayList<>()).add(r);
        }
        List<AgreementAnnotatorOverview> out = new ArrayList<>();
        for (Map.Entry<String, List<AgreementAnnotator>> e : byAnnotator.entrySet()) {
            String who = e.getKey();
            int judgments = 0;
            long compared = 0;
            long agreed = 0;
            double rise = Double.NaN;
            String riseAttribute = "";
            for (AgreementAnnotator r : e.getValue()) {
                judgments += r.judgments();
                compared += r.comparisons();
                agreed += r.agreements();
                if (!Double.isNaN(r.alphaChange()) && (Double.isNaN(rise) || r.alphaChange() > rise)) {
                    rise = r.alphaChange();
                    riseAttribute = r.attribute();
                }
            }
            List<Double> kappas = new ArrayList<>();
            for (AgreementAttribute a : attributes) {
                for (CohenPair p : a.pairs()) {
                    if (p.involves(who)) {
                        kappas.add(p.kappa());
                    }
                }
            }
            double meanKappa = mean(kappas.stream().mapToDouble(Double::doubleValue).toArray());
            out.add(new AgreementAnnotatorOverview(who, e.getValue().size(), judgments, (int) compared,
                    compared == 0 ? Double.NaN : (double) agreed / compared, meanKappa,
                    thresholds.band(meanKappa), rise, riseAttribute));
        }
        return out;
    }

    /** Mean of the non-NaN values; NaN when there are none. */
    static double mean(double[] values) {
        double sum = 0;
        int n = 0;
        for (double v : values) {
            if (!Double.isNaN(v)) {
                sum += v;
                n++;
            }
        }
        return n == 0 ? Double.NaN : sum / n;
    }

    /** One attribute's judgments arranged by item and annotator, with repeats and conflicts set aside. */
    private static final class AttributeData {
        final String attribute;
        final JudgmentScale scale;
        final List<String> items;
        /** Pseudonyms of the attribute's annotators, sorted. */
        final List<String> pseudonyms;
        /** category[annotator][item], −1 when not judged. */
        final int[][] category;
        final int[] judgmentsOf;
        final int[] valueCounts;
        final int judgments;

        private AttributeData(String attribute, JudgmentScale scale, List<String> items, List<String> pseudonyms,
                              int[][] category) {
            this.attribute = attribute;
            this.scale = scale;
            this.items = items;
            this.pseudonyms = pseudonyms;
            this.category = category;
            this.judgmentsOf = new int[pseudonyms.size()];
            this.valueCounts = new int[scale.size()];
            int total = 0;
            for (int a = 0; a < category.length; a++) {
                for (int c : category[a]) {
                    if (c >= 0) {
                        judgmentsOf[a]++;
                        valueCounts[c]++;
                        total++;
                    }
                }
            }
            this.judgments = total;
        }

        static AttributeData of(String attribute, List<Judgment> list, Map<String, String> pseudonym,
                                AgreementOptions options, String source, List<JudgmentProblem> problems) {
            JudgmentScale scale = JudgmentScale.of(list.stream().map(Judgment::value).toList(),
                    options.metrics().get(attribute), options.ordinalMaxLevels());
            // item -> pseudonym -> the rows judging it
            Map<String, Map<String, List<Judgment>>> cells = new TreeMap<>();
            for (Judgment j : list) {
                cells.computeIfAbsent(j.item(), x -> new TreeMap<>())
                        .computeIfAbsent(pseudonym.get(j.annotator()), x -> new ArrayList<>()).add(j);
            }
            Map<String, Integer> annotatorIndex = new TreeMap<>();
            Map<String, Map<String, Integer>> kept = new LinkedHashMap<>();
            for (Map.Entry<String, Map<String, List<Judgment>>> item : cells.entrySet()) {
                Map<String, Integer> keptHere = new HashMap<>();
                for (Map.Entry<String, List<Judgment>> cell : item.getValue().entrySet()) {
                    Integer c = settle(attribute, item.getKey(), cell.getValue(), scale, source, problems);
                    if (c != null) {
                        keptHere.put(cell.getKey(), c);
                        annotatorIndex.put(cell.getKey(), 0);
                    }
                }
                if (!keptHere.isEmpty()) {
                    kept.put(item.getKey(), keptHere);
                }
            }
            List<String> pseudonyms = new ArrayList<>(annotatorIndex.keySet());
            for (int i = 0; i < pseudonyms.size(); i++) {
                annotatorIndex.put(pseudonyms.get(i), i);
            }
            List<String> items = new ArrayList<>(kept.keySet());
            int[][] category = new int[pseudonyms.size()][items.size()];
            for (int[] row : category) {
                java.util.Arrays.fill(row, -1);
            }
            for (int u = 0; u < items.size(); u++) {
                for (Map.Entry<String, Integer> cell : kept.get(items.get(u)).entrySet()) {
                    category[annotatorIndex.get(cell.getKey())][u] = cell.getValue();
                }
            }
            return new AttributeData(attribute, scale, items, pseudonyms, category);
        }

        /** The one category of an (item, annotator) cell, or null when its rows conflict. */
        private static Integer settle(String attribute, String item, List<Judgment> rows, JudgmentScale scale,
                                      String source, List<JudgmentProblem> problems) {
            int first = scale.categoryOf(rows.get(0).value());
            boolean conflict = false;
            for (Judgment j : rows) {
                conflict |= scale.categoryOf(j.value()) != first;
            }
            if (!conflict) {
                for (Judgment j : rows.subList(1, rows.size())) {
                    problems.add(new JudgmentProblem(source, j.row(), "repeated",
                            "repeats row " + rows.get(0).row() + " (item '" + item + "', attribute '" + attribute
                                    + "', same annotator, same value); counted once"));
                }
                return first;
            }
            StringBuilder said = new StringBuilder();
            for (Judgment j : rows) {
                said.append(said.length() == 0 ? "" : ", ").append('\'').append(j.value()).append("' (row ")
                        .append(j.row()).append(')');
            }
            for (Judgment j : rows) {
                problems.add(new JudgmentProblem(source, j.row(), "conflict",
                        "the same annotator judged item '" + item + "', attribute '" + attribute + "' more than once with "
                                + "different values: " + said + "; all " + rows.size() + " rows left out. Keep one value"));
            }
            return null;
        }

        /** Each item's categories, leaving out annotator {@code without} (−1: nobody). */
        List<int[]> unitCategories(int without) {
            List<int[]> units = new ArrayList<>(items.size());
            int[] buffer = new int[category.length];
            for (int u = 0; u < items.size(); u++) {
                int m = 0;
                for (int a = 0; a < category.length; a++) {
                    if (a != without && category[a][u] >= 0) {
                        buffer[m++] = category[a][u];
                    }
                }
                units.add(java.util.Arrays.copyOf(buffer, m));
            }
            return units;
        }
    }
}
