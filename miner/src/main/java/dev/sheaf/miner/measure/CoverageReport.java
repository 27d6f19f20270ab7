package dev.sheaf.miner.measure;

import dev.sheaf.miner.label.Assignment;
import dev.sheaf.miner.label.Assignments;
import dev.sheaf.miner.label.AssignmentsJsonl;
import dev.sheaf.miner.label.InvalidValue;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.io.SafeCsv;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.longs.Long2LongOpenHashMap;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import it.unimi.dsi.fastutil.objects.Object2LongOpenHashMap;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.Collections;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.PriorityQueue;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;

/**
 * The coverage stage's front door: how well the vocabulary covers the labeled catalog, computed
 * from the label stage's {@code assignments.jsonl} (never from the listings again) and today's
 * vocabulary.
 *
 * <ul>
 *   <li>per concept: listings where it is stated, its share of the listings its facet applies to,
 *       by category and by source file ({@link CoverageConcept}, {@link CoverageCell});</li>
 *   <li>per facet: the fill rate overall and per category in both readings, conflicts of
 *       single-valued facets, the value distribution and its Shannon entropy
 *       ({@link CoverageFacet}, {@link FillRate});</li>
 *   <li>concentration: concepts carried by one source file or one category ({@link ConcentrationFinding});</li>
 *   <li>overlap: pairs of concepts whose listing sets nearly coincide, with Jaccard and lift
 *       ({@link OverlapPair}); only pairs that share a listing are ever counted, one listing at a
 *       time, so the cost follows the co-occurrences, not concepts² × listings;</li>
 *   <li>listings with no attribute at all, and the commonest terms in them ({@link CoverageGapTerm},
 *       counted by the label stage with the miner's analysis);</li>
 *   <li>the coverage curve: the share of listings covered by the best k concepts, chosen greedily by
 *       marginal gain ({@link CoverageCurvePoint}; docs/decisions/106).</li>
 * </ul>
 * "Covered" and "labeled" mean stated: a negated concept is information, but not a label.
 */
public final class CoverageReport {
    private final CoverageOptions options;
    private final long listings;
    private final long withNothing;
    private final long withoutLabels;
    private final List<String> nothingExamples;
    private final Map<String, Long> categories;
    private final Map<String, Long> sources;
    private final List<CoverageConcept> concepts;
    private final List<CoverageCell> byCategory;
    private final List<CoverageCell> bySource;
    private final List<CoverageFacet> facets;
    private final List<ConcentrationFinding> concentration;
    private final List<OverlapPair> overlaps;
    private final List<CoverageCurvePoint> curve;
    private final List<CoverageGapTerm> gapTerms;
    private final List<String> problems;
    private final List<String> notes;
    private final long resolved;

    private CoverageReport(Accumulator a, List<CoverageGapTerm> gaps, List<String> problems, List<String> notes, long resolved) {
        this.options = a.options;
        this.listings = a.n;
        this.withNothing = a.nothing;
        this.withoutLabels = a.noLabels;
        List<String> ex = new ArrayList<>(a.nothingIds);
        Collections.sort(ex);
        this.nothingExamples = List.copyOf(ex.subList(0, Math.min(ex.size(), a.options.examples())));
        this.categories = Collections.unmodifiableMap(a.categoryCounts());
        this.sources = Collections.unmodifiableMap(a.sourceCounts());
        this.concepts = a.concepts();
        this.byCategory = a.cells(true);
        this.bySource = a.cells(false);
        this.facets = a.facets();
        this.concentration = a.concentration(concepts);
        this.overlaps = a.overlaps();
        this.curve = a.curve();
        List<CoverageGapTerm> g = new ArrayList<>(gaps);
        this.gapTerms = List.copyOf(g.subList(0, Math.min(g.size(), a.options.gapTerms())));
        this.problems = List.copyOf(problems);
        this.notes = List.copyOf(notes);
        this.resolved = resolved;
    }

    /** Reads {@code assignments.jsonl} (and {@code gap-terms.csv} beside it, when there) against the vocabulary. */
    public static CoverageReport read(Path assignments, Vocabulary v, CoverageOptions o) throws IOException {
        Accumulator acc = new Accumulator(v, o);
        AssignmentsJsonl.ReadSummary s = AssignmentsJsonl.read(assignments, v, acc::add);
        List<String> problems = new ArrayList<>(s.problems());
        Path gaps = assignments.resolveSibling("gap-terms.csv");
        List<CoverageGapTerm> terms = List.of();
        List<String> notes = new ArrayList<>();
        if (Files.isRegularFile(gaps)) {
            terms = readGapTerms(gaps, problems);
        } else {
            notes.add("no gap-terms.csv beside " + assignments.getFileName() + "; the terms of unlabeled listings are not reported "
                    + "(run sheaf label again to write it)");
        }
        return new CoverageReport(acc, terms, problems, notes, s.resolved());
    }

    /** The report over assignments in hand. */
    public static CoverageReport of(Vocabulary v, CoverageOptions o, Iterable<Assignments> assignments, List<CoverageGapTerm> gaps) {
        Accumulator acc = new Accumulator(v, o);
        for (Assignments a : assignments) {
            acc.add(a);
        }
        return new CoverageReport(acc, gaps, List.of(), List.of(), 0);
    }

    static List<CoverageGapTerm> readGapTerms(Path file, List<String> problems) throws IOException {
        List<CoverageGapTerm> out = new ArrayList<>();
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            for (CSVRecord rec : CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
                try {
                    String term = rec.get("term");
                    if (term.startsWith("'")) {
                        term = term.substring(1); // written neutralised by SafeCsv
                    }
                    out.add(new CoverageGapTerm(Integer.parseInt(rec.get("n")), term, Long.parseLong(rec.get("listings")),
                            Long.parseLong(rec.get("occurrences"))));
                } catch (IllegalArgumentException e) {
                    problems.add(file.getFileName() + " line " + rec.getRecordNumber() + ": " + e.getMessage() + "; the row is left out");
                }
            }
        }
        return out;
    }

    public CoverageOptions options() {
        return options;
    }

    public long listings() {
        return listings;
    }

    /** Listings with no assignment of any kind and no unreadable value. */
    public long listingsWithNothing() {
        return withNothing;
    }

    /** Listings with no stated label (they may hold negations). */
    public long listingsWithoutLabels() {
        return withoutLabels;
    }

    /** Some ids of listings with nothing, by id. */
    public List<String> nothingExamples() {
        return nothingExamples;
    }

    /** Listings per category, by category. */
    public Map<String, Long> categories() {
        return categories;
    }

    /** Listings per source file, by file. */
    public Map<String, Long> sources() {
        return sources;
    }

    public List<CoverageConcept> concepts() {
        return concepts;
    }

    public List<CoverageCell> byCategory() {
        return byCategory;
    }

    public List<CoverageCell> bySource() {
        return bySource;
    }

    public List<CoverageFacet> facets() {
        return facets;
    }

    public List<ConcentrationFinding> concentration() {
        return concentration;
    }

    public List<OverlapPair> overlaps() {
        return overlaps;
    }

    public List<CoverageCurvePoint> curve() {
        return curve;
    }

    public List<CoverageGapTerm> gapTerms() {
        return gapTerms;
    }

    /** Lines of the input left out, ids no longer in the vocabulary, missing side files. */
    public List<String> problems() {
        return problems;
    }

    /** Remarks that are not input problems (a side file that is missing). */
    public List<String> notes() {
        return notes;
    }

    /** Assignments whose concept id was resolved through "replaced by". */
    public long resolved() {
        return resolved;
    }

    /** Streams assignments into compact counters. */
    private static final class Accumulator {
        final Vocabulary v;
        final CoverageOptions options;
        final String[] conceptIds;
        final int[][] conceptFacets;
        final Object2IntOpenHashMap<String> conceptIndex = new Object2IntOpenHashMap<>();
        final Concept[] facetConcepts;
        final Object2IntOpenHashMap<String> facetIndex = new Object2IntOpenHashMap<>();

        final Object2IntOpenHashMap<String> categoryIndex = new Object2IntOpenHashMap<>();
        final List<String> categoryNames = new ArrayList<>();
        private final Object2IntOpenHashMap<String> categorySpellings = new Object2IntOpenHashMap<>();
        final Object2IntOpenHashMap<String> sourceIndex = new Object2IntOpenHashMap<>();
        final List<String> sourceNames = new ArrayList<>();
        final IntArrayList perCategory = new IntArrayList();
        final IntArrayList perSource = new IntArrayList();

        final IntArrayList[] stated;
        final long[] negated;
        final Long2LongOpenHashMap conceptCategory = new Long2LongOpenHashMap();
        final Long2LongOpenHashMap conceptSource = new Long2LongOpenHashMap();
        final Long2LongOpenHashMap filled = new Long2LongOpenHashMap();
        final Long2LongOpenHashMap invalid = new Long2LongOpenHashMap();
        final Long2LongOpenHashMap conflicts = new Long2LongOpenHashMap();
        final List<Object2LongOpenHashMap<String>> values = new ArrayList<>();
        final List<List<String>> conflictIds = new ArrayList<>();
        final Long2LongOpenHashMap pairs = new Long2LongOpenHashMap();
        final List<String> nothingIds = new ArrayList<>();
        int n;
        long nothing;
        long noLabels;

        Accumulator(Vocabulary v, CoverageOptions options) {
            this.v = Objects.requireNonNull(v, "vocabulary");
            this.options = Objects.requireNonNull(options, "options");
            conceptIndex.defaultReturnValue(-1);
            facetIndex.defaultReturnValue(-1);
            categoryIndex.defaultReturnValue(-1);
            sourceIndex.defaultReturnValue(-1);
            List<Concept> fs = v.facets();
            facetConcepts = fs.toArray(new Concept[0]);
            for (int f = 0; f < facetConcepts.length; f++) {
                facetIndex.put(facetConcepts[f].id(), f);
                values.add(new Object2LongOpenHashMap<>());
                conflictIds.add(new ArrayList<>());
            }
            List<String> ids = new ArrayList<>();
            for (Concept c : v.allConcepts()) {
                if (!c.isFacet() || c.facet().valueKind() == ValueKind.YES_NO) {
                    ids.add(c.id());
                }
            }
            conceptIds = ids.toArray(new String[0]);
            conceptFacets = new int[conceptIds.length][];
            stated = new IntArrayList[conceptIds.length];
            negated = new long[conceptIds.length];
            for (int c = 0; c < conceptIds.length; c++) {
                conceptIndex.put(conceptIds[c], c);
                conceptFacets[c] = v.facetsOf(conceptIds[c]).stream().mapToInt(x -> facetIndex.getInt(x.id())).toArray();
                stated[c] = new IntArrayList(0);
            }
        }

        private static int index(Object2IntOpenHashMap<String> idx, List<String> names, IntArrayList counts, String key) {
            return index(idx, names, counts, key, key);
        }

        /** The row of {@code key}, named by the first {@code name} seen with it. */
        private static int index(Object2IntOpenHashMap<String> idx, List<String> names, IntArrayList counts, String key, String name) {
            int i = idx.getInt(key);
            if (i < 0) {
                i = names.size();
                idx.put(key, i);
                names.add(name);
                counts.add(0);
            }
            counts.set(i, counts.getInt(i) + 1);
            return i;
        }

        void add(Assignments a) {
            int i = n++;
            // "Sleeping Bags" from a spec sheet and "sleeping-bags" from a feed are one category (107),
            // named by its commonest spelling
            int cat = index(categoryIndex, categoryNames, perCategory, Labeler.categoryKey(a.category()), a.category());
            int spelt = categorySpellings.addTo(a.category(), 1) + 1;
            if (!categoryNames.get(cat).equals(a.category()) && spelt > categorySpellings.getInt(categoryNames.get(cat))) {
                categoryNames.set(cat, a.category());
            }
            int src = index(sourceIndex, sourceNames, perSource, a.source());
            if (a.isEmpty()) {
                nothing++;
                if (nothingIds.size() < Math.max(options.examples() * 20, 100)) {
                    nothingIds.add(a.listingId());
                }
            }
            if (a.hasNoStatedLabel()) {
                noLabels++;
            }
            Map<Integer, Set<String>> facetValues = new HashMap<>();
            Map<Integer, Set<Double>> numbers = new HashMap<>();
            IntArrayList statedHere = new IntArrayList();
            for (Assignment x : a.assignments()) {
                if (x.isNumber()) {
                    int f = facetIndex.getInt(x.conceptId());
                    if (f >= 0) {
                        facetValues.computeIfAbsent(f, k -> new TreeSet<>()).add(numberKey(facetConcepts[f].facet(), x));
                        numbers.computeIfAbsent(f, k -> new TreeSet<>()).add(x.value());
                    }
                    continue;
                }
                int c = conceptIndex.getInt(x.conceptId());
                if (c < 0) {
                    continue; // a facet of a kind that takes no concept values
                }
                boolean yesNo = facetIndex.getInt(x.conceptId()) >= 0;
                if (x.isStated()) {
                    if (statedHere.isEmpty() || statedHere.getInt(statedHere.size() - 1) != c) {
                        statedHere.add(c);
                        stated[c].add(i);
                        conceptCategory.addTo(key(c, cat), 1);
                        conceptSource.addTo(key(c, src), 1);
                    }
                } else {
                    negated[c]++;
                }
                if (yesNo) {
                    facetValues.computeIfAbsent(facetIndex.getInt(x.conceptId()), k -> new TreeSet<>()).add(x.isStated() ? "yes" : "no");
                } else if (x.isStated()) {
                    for (int f : conceptFacets[c]) {
                        facetValues.computeIfAbsent(f, k -> new TreeSet<>()).add(x.conceptId());
                    }
                }
            }
            for (Map.Entry<Integer, Set<String>> e : facetValues.entrySet()) {
                int f = e.getKey();
                FacetProperties p = facetConcepts[f].facet();
                if (!Labeler.applies(p, a.category())) {
                    continue; // a likely error, listed by the label stage; it fills nothing here
                }
                filled.addTo(key(f, cat), 1);
                for (String val : e.getValue()) {
                    values.get(f).addTo(val, 1);
                }
                // two numbers in one bucket are still two values: conflicts count distinct numbers;
                // a value and a broader one ("hood", "insulated hood") are one statement, not two
                int distinct = numbers.containsKey(f) ? numbers.get(f).size() : mostSpecific(e.getValue());
                if (!p.multiValued() && distinct > 1) {
                    conflicts.addTo(key(f, cat), 1);
                    if (conflictIds.get(f).size() < options.examples()) {
                        conflictIds.get(f).add(a.listingId());
                    }
                }
            }
            Set<Integer> invalidFacets = new TreeSet<>();
            for (InvalidValue iv : a.invalid()) {
                int f = facetIndex.getInt(iv.facetId());
                if (f >= 0 && !facetValues.containsKey(f) && Labeler.applies(facetConcepts[f].facet(), a.category())) {
                    invalidFacets.add(f);
                }
            }
            for (int f : invalidFacets) {
                invalid.addTo(key(f, cat), 1);
            }
            int[] s = statedHere.toIntArray();
            Arrays.sort(s);
            for (int x = 0; x < s.length; x++) {
                for (int y = x + 1; y < s.length; y++) {
                    pairs.addTo(key(s[x], s[y]), 1);
                }
            }
        }

        /** How many of the values are not broader than another of them. */
        private int mostSpecific(Set<String> vals) {
            if (vals.size() < 2) {
                return vals.size();
            }
            int n = 0;
            for (String x : vals) {
                boolean broader = false;
                for (String y : vals) {
                    if (!x.equals(y) && v.contains(y) && v.ancestors(y).contains(x)) {
                        broader = true;
                        break;
                    }
                }
                if (!broader) {
                    n++;
                }
            }
            return n;
        }

        private static String numberKey(FacetProperties p, Assignment x) {
            if (!p.buckets().isEmpty()) {
                return x.bucket() == null ? "(outside every bucket)" : x.bucket();
            }
            String v = SafeCsv.formatDouble(x.value());
            return x.value().equals(x.valueMax()) ? v : v + ".." + SafeCsv.formatDouble(x.valueMax());
        }

        private static long key(int a, int b) {
            return ((long) a << 32) | (b & 0xffffffffL);
        }

        Map<String, Long> categoryCounts() {
            Map<String, Long> m = new TreeMap<>();
            for (int c = 0; c < categoryNames.size(); c++) {
                m.put(categoryNames.get(c), (long) perCategory.getInt(c));
            }
            return m;
        }

        Map<String, Long> sourceCounts() {
            Map<String, Long> m = new TreeMap<>();
            for (int s = 0; s < sourceNames.size(); s++) {
                m.put(sourceNames.get(s), (long) perSource.getInt(s));
            }
            return m;
        }

        boolean conceptApplies(int c, String category) {
            if (conceptFacets[c].length == 0) {
                return true;
            }
            for (int f : conceptFacets[c]) {
                if (Labeler.applies(facetConcepts[f].facet(), category)) {
                    return true;
                }
            }
            return false;
        }

        long applicable(int c) {
            long a = 0;
            for (int k = 0; k < categoryNames.size(); k++) {
                if (conceptApplies(c, categoryNames.get(k))) {
                    a += perCategory.getInt(k);
                }
            }
            return a;
        }

        List<CoverageConcept> concepts() {
            List<CoverageConcept> out = new ArrayList<>(conceptIds.length);
            for (int c = 0; c < conceptIds.length; c++) {
                long l = stated[c].size();
                long app = applicable(c);
                int[] topS = top(conceptSource, c, sourceNames);
                int[] topC = top(conceptCategory, c, categoryNames);
                String facet = conceptFacets[c].length == 0 ? null : facetConcepts[conceptFacets[c][0]].id();
                out.add(new CoverageConcept(conceptIds[c], facet, v.displayLabel(conceptIds[c]), l, negated[c], app,
                        app == 0 ? Double.NaN : (double) l / app,
                        topS[0] < 0 ? null : sourceNames.get(topS[0]), topS[0] < 0 ? Double.NaN : (double) topS[1] / l,
                        topC[0] < 0 ? null : categoryNames.get(topC[0]), topC[0] < 0 ? Double.NaN : (double) topC[1] / l));
            }
            return List.copyOf(out);
        }

        /** {index, count} of the key with the most listings for concept c (ties: the smaller name), or {-1, 0}. */
        private static int[] top(Long2LongOpenHashMap m, int c, List<String> names) {
            int best = -1;
            long bestCount = 0;
            for (int k = 0; k < names.size(); k++) {
                long x = m.get(key(c, k));
                if (x > bestCount || x == bestCount && x > 0 && names.get(k).compareTo(names.get(best)) < 0) {
                    best = k;
                    bestCount = x;
                }
            }
            return new int[] {best, (int) bestCount};
        }

        List<CoverageCell> cells(boolean byCat) {
            List<String> names = byCat ? categoryNames : sourceNames;
            Integer[] order = new Integer[names.size()];
            for (int k = 0; k < order.length; k++) {
                order[k] = k;
            }
            Arrays.sort(order, Comparator.comparing(names::get));
            List<CoverageCell> out = new ArrayList<>();
            for (int c = 0; c < conceptIds.length; c++) {
                for (int k : order) {
                    long l = (byCat ? conceptCategory : conceptSource).get(key(c, k));
                    long total;
                    if (byCat) {
                        total = conceptApplies(c, names.get(k)) ? perCategory.getInt(k) : 0;
                        if (l == 0 && total == 0) {
                            continue;
                        }
                    } else {
                        if (l == 0) {
                            continue;
                        }
                        total = perSource.getInt(k);
                    }
                    out.add(new CoverageCell(conceptIds[c], names.get(k), l, total, total == 0 ? Double.NaN : (double) l / total));
                }
            }
            return List.copyOf(out);
        }

        List<CoverageFacet> facets() {
            List<CoverageFacet> out = new ArrayList<>();
            List<String> cats = new ArrayList<>(categoryNames);
            Collections.sort(cats);
            for (int f = 0; f < facetConcepts.length; f++) {
                FacetProperties p = facetConcepts[f].facet();
                long appAll = 0;
                long filledAll = 0;
                long invalidAll = 0;
                long conflictsAll = 0;
                List<FillRate> per = new ArrayList<>();
                for (String cat : cats) {
                    int k = categoryIndex.getInt(Labeler.categoryKey(cat));
                    long size = perCategory.getInt(k);
                    long app = Labeler.applies(p, cat) ? size : 0;
                    long fl = filled.get(key(f, k));
                    long inv = invalid.get(key(f, k));
                    long cf = conflicts.get(key(f, k));
                    appAll += app;
                    filledAll += fl;
                    invalidAll += inv;
                    conflictsAll += cf;
                    per.add(FillRate.of(facetConcepts[f].id(), cat, size, app, fl, inv, cf));
                }
                FillRate overall = FillRate.of(facetConcepts[f].id(), FillRate.ALL, n, appAll, filledAll, invalidAll, conflictsAll);
                Object2LongOpenHashMap<String> vals = values.get(f);
                long total = 0;
                for (long x : vals.values()) {
                    total += x;
                }
                List<CoverageValue> dist = new ArrayList<>();
                long[] counts = new long[vals.size()];
                int q = 0;
                for (Object2LongOpenHashMap.Entry<String> e : vals.object2LongEntrySet()) {
                    String key = e.getKey();
                    String label = v.contains(key) ? v.displayLabel(key) : key;
                    dist.add(new CoverageValue(key, label, e.getLongValue(), (double) e.getLongValue() / total));
                    counts[q++] = e.getLongValue();
                }
                dist.sort(Comparator.comparingLong(CoverageValue::listings).reversed().thenComparing(CoverageValue::value));
                out.add(new CoverageFacet(facetConcepts[f].id(), v.displayLabel(facetConcepts[f].id()), p.valueKind().word(),
                        p.multiValued(), overall, per, conflictIds.get(f), dist, CoverageFacet.entropy(counts)));
            }
            return List.copyOf(out);
        }

        List<ConcentrationFinding> concentration(List<CoverageConcept> concepts) {
            List<ConcentrationFinding> out = new ArrayList<>();
            for (int c = 0; c < concepts.size(); c++) {
                CoverageConcept x = concepts.get(c);
                if (x.listings() < options.concentrationMinListings()) {
                    continue;
                }
                if (sourceNames.size() > 1 && x.topSourceShare() >= options.concentration()) {
                    out.add(new ConcentrationFinding(x.conceptId(), x.label(), "source", x.topSource(), x.topSourceShare(), x.listings()));
                }
                int applicableCategories = 0;
                for (String cat : categoryNames) {
                    if (conceptApplies(c, cat)) {
                        applicableCategories++;
                    }
                }
                if (applicableCategories > 1 && x.topCategoryShare() >= options.concentration()) {
                    out.add(new ConcentrationFinding(x.conceptId(), x.label(), "category", x.topCategory(), x.topCategoryShare(),
                            x.listings()));
                }
            }
            out.sort(Comparator.comparingDouble(ConcentrationFinding::share).reversed().thenComparing(ConcentrationFinding::conceptId)
                    .thenComparing(ConcentrationFinding::by));
            return List.copyOf(out);
        }

        List<OverlapPair> overlaps() {
            List<OverlapPair> out = new ArrayList<>();
            for (Long2LongOpenHashMap.Entry e : pairs.long2LongEntrySet()) {
                long both = e.getLongValue();
                if (both < options.overlapMinListings()) {
                    continue;
                }
                int a = (int) (e.getLongKey() >>> 32);
                int b = (int) e.getLongKey();
                long la = stated[a].size();
                long lb = stated[b].size();
                double j = OverlapPair.jaccardOf(la, lb, both);
                if (j < options.overlapMinJaccard()) {
                    continue;
                }
                String ia = conceptIds[a];
                String ib = conceptIds[b];
                String relation;
                String suggestion;
                if (v.ancestors(ia).contains(ib) || v.ancestors(ib).contains(ia)) {
                    relation = "hierarchy";
                    suggestion = "expected";
                } else if (sharesFacet(a, b)) {
                    relation = "same-facet";
                    suggestion = "merge?";
                } else {
                    relation = "other-facet";
                    suggestion = "redundant?";
                }
                boolean swap = ia.compareTo(ib) > 0;
                out.add(swap
                        ? new OverlapPair(ib, ia, v.displayLabel(ib), v.displayLabel(ia), lb, la, both, j, OverlapPair.liftOf(lb, la, both, n),
                                relation, suggestion)
                        : new OverlapPair(ia, ib, v.displayLabel(ia), v.displayLabel(ib), la, lb, both, j, OverlapPair.liftOf(la, lb, both, n),
                                relation, suggestion));
            }
            out.sort(Comparator.comparingDouble(OverlapPair::jaccard).reversed().thenComparing(OverlapPair::a)
                    .thenComparing(OverlapPair::b));
            return List.copyOf(out);
        }

        private boolean sharesFacet(int a, int b) {
            for (int x : conceptFacets[a]) {
                for (int y : conceptFacets[b]) {
                    if (x == y) {
                        return true;
                    }
                }
            }
            return false;
        }

        /**
         * Greedy maximum coverage with lazy re-evaluation: a concept's marginal gain only falls as
         * more listings are covered, so a stale gain is an upper bound, and the top of the queue is
         * taken once its recomputed gain still beats the next stale bound. Ties: more listings first,
         * then the smaller concept id, so the curve is deterministic.
         */
        List<CoverageCurvePoint> curve() {
            BitSet covered = new BitSet(n);
            PriorityQueue<long[]> queue = new PriorityQueue<>((x, y) -> {
                int c = Long.compare(y[1], x[1]);
                return c != 0 ? c : conceptIds[(int) x[0]].compareTo(conceptIds[(int) y[0]]);
            });
            for (int c = 0; c < conceptIds.length; c++) {
                if (!stated[c].isEmpty()) {
                    queue.add(new long[] {c, stated[c].size()});
                }
            }
            List<CoverageCurvePoint> out = new ArrayList<>();
            long total = 0;
            while (!queue.isEmpty()) {
                long[] top = queue.poll();
                int c = (int) top[0];
                long gain = 0;
                IntArrayList ls = stated[c];
                for (int k = 0; k < ls.size(); k++) {
                    if (!covered.get(ls.getInt(k))) {
                        gain++;
                    }
                }
                if (gain == 0) {
                    continue;
                }
                long[] next = queue.peek();
                if (next != null && (gain < next[1] || gain == next[1] && conceptIds[c].compareTo(conceptIds[(int) next[0]]) > 0)) {
                    queue.add(new long[] {c, gain});
                    continue;
                }
                for (int k = 0; k < ls.size(); k++) {
                    covered.set(ls.getInt(k));
                }
                total += gain;
                out.add(new CoverageCurvePoint(out.size() + 1, conceptIds[c], v.displayLabel(conceptIds[c]), gain, total,
                        (double) total / n));
            }
            return List.copyOf(out);
        }
    }

    /** A compact map of the main figures, for summaries. */
    public Map<String, Object> totals() {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("listings", listings);
        m.put("listingsWithoutLabels", withoutLabels);
        m.put("listingsWithNothing", withNothing);
        m.put("concepts", concepts.size());
        m.put("conceptsUsed", concepts.stream().filter(c -> c.listings() > 0).count());
        m.put("facets", facets.size());
        m.put("overlappingPairs", overlaps.size());
        m.put("concentratedConcepts", concentration.stream().map(ConcentrationFinding::conceptId).distinct().count());
        m.put("resolvedThroughReplacedBy", resolved);
        return m;
    }
}
