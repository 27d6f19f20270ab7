package dev.sheaf.miner.measure;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Writes a {@link CoverageReport} as files, each atomically, every CSV through {@link SafeCsv}:
 * {@value #CONCEPTS_CSV} (one row per concept), {@value #BY_CATEGORY_CSV}, {@value #BY_SOURCE_CSV},
 * {@value #FILL_CSV} (per facet, overall and per category, both fill-rate readings),
 * {@value #VALUES_CSV} (value distribution per facet), {@value #OVERLAP_CSV},
 * {@value #CONCENTRATION_CSV}, {@value #CURVE_CSV}, {@value #GAPS_CSV} and {@value #JSON}
 * (everything). Undefined figures are empty cells in CSV and {@code null} in JSON.
 */
public final class CoverageFiles {
    public static final String CONCEPTS_CSV = "coverage.csv";
    public static final String BY_CATEGORY_CSV = "coverage-by-category.csv";
    public static final String BY_SOURCE_CSV = "coverage-by-source.csv";
    public static final String FILL_CSV = "facet-fill.csv";
    public static final String VALUES_CSV = "facet-distribution.csv";
    public static final String OVERLAP_CSV = "overlap.csv";
    public static final String CONCENTRATION_CSV = "concentration.csv";
    public static final String CURVE_CSV = "coverage-curve.csv";
    public static final String GAPS_CSV = "coverage-gaps.csv";
    public static final String JSON = "coverage.json";
    public static final String FORMAT = "sheaf-coverage";
    public static final int FORMAT_VERSION = 1;

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private CoverageFiles() {
    }

    private interface Rows {
        void write(SafeCsv csv) throws IOException;
    }

    private static void csv(Path file, List<String> header, Rows rows) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row(header);
            rows.write(csv);
            csv.flush();
        });
    }

    /** Writes every file into {@code dir}; returns their paths in the order written. */
    public static List<Path> write(CoverageReport r, Path dir) throws IOException {
        List<Path> out = new ArrayList<>();
        Set<String> concentrated = new HashSet<>();
        for (ConcentrationFinding f : r.concentration()) {
            concentrated.add(f.conceptId());
        }
        Path p = dir.resolve(CONCEPTS_CSV);
        csv(p, List.of("concept", "facet", "label", "listings", "negated", "applicable", "share", "top_source", "top_source_share",
                "top_category", "top_category_share", "concentrated"), csv -> {
                    for (CoverageConcept c : r.concepts()) {
                        csv.row(c.conceptId(), c.facetId(), c.label(), c.listings(), c.negated(), c.applicable(), c.share(),
                                c.topSource(), c.topSourceShare(), c.topCategory(), c.topCategoryShare(),
                                concentrated.contains(c.conceptId()) ? "yes" : "no");
                    }
                });
        out.add(p);
        p = dir.resolve(BY_CATEGORY_CSV);
        csv(p, List.of("concept", "category", "listings", "applicable", "share"), csv -> {
            for (CoverageCell c : r.byCategory()) {
                csv.row(c.conceptId(), c.key(), c.listings(), c.total(), c.share());
            }
        });
        out.add(p);
        p = dir.resolve(BY_SOURCE_CSV);
        csv(p, List.of("concept", "source", "listings", "source_listings", "share"), csv -> {
            for (CoverageCell c : r.bySource()) {
                csv.row(c.conceptId(), c.key(), c.listings(), c.total(), c.share());
            }
        });
        out.add(p);
        p = dir.resolve(FILL_CSV);
        csv(p, List.of("facet", "label", "value_kind", "multi_valued", "category", "listings", "applicable", "filled", "invalid",
                "conflicts", "fill_rate", "fill_rate_all", "distinct_values", "entropy_bits"), csv -> {
                    for (CoverageFacet f : r.facets()) {
                        fill(csv, f, f.overall(), true);
                        for (FillRate x : f.byCategory()) {
                            fill(csv, f, x, false);
                        }
                    }
                });
        out.add(p);
        p = dir.resolve(VALUES_CSV);
        csv(p, List.of("facet", "value", "label", "listings", "share"), csv -> {
            for (CoverageFacet f : r.facets()) {
                for (CoverageValue v : f.values()) {
                    csv.row(f.facetId(), v.value(), v.label(), v.listings(), v.share());
                }
            }
        });
        out.add(p);
        p = dir.resolve(OVERLAP_CSV);
        csv(p, List.of("a", "b", "label_a", "label_b", "listings_a", "listings_b", "both", "jaccard", "lift", "relation", "suggestion"),
                csv -> {
                    for (OverlapPair o : r.overlaps()) {
                        csv.row(o.a(), o.b(), o.labelA(), o.labelB(), o.listingsA(), o.listingsB(), o.both(), o.jaccard(), o.lift(),
                                o.relation(), o.suggestion());
                    }
                });
        out.add(p);
        p = dir.resolve(CONCENTRATION_CSV);
        csv(p, List.of("concept", "label", "by", "top", "share", "listings"), csv -> {
            for (ConcentrationFinding c : r.concentration()) {
                csv.row(c.conceptId(), c.label(), c.by(), c.top(), c.share(), c.listings());
            }
        });
        out.add(p);
        p = dir.resolve(CURVE_CSV);
        csv(p, List.of("rank", "concept", "label", "gain", "covered", "share"), csv -> {
            for (CoverageCurvePoint c : r.curve()) {
                csv.row(c.rank(), c.conceptId(), c.label(), c.gain(), c.covered(), c.share());
            }
        });
        out.add(p);
        p = dir.resolve(GAPS_CSV);
        csv(p, List.of("n", "term", "listings", "occurrences"), csv -> {
            for (CoverageGapTerm g : r.gapTerms()) {
                csv.row(g.n(), g.term(), g.listings(), g.occurrences());
            }
        });
        out.add(p);
        p = dir.resolve(JSON);
        AtomicFiles.writeString(p, MAPPER.writeValueAsString(json(r)) + "\n");
        out.add(p);
        return out;
    }

    private static void fill(SafeCsv csv, CoverageFacet f, FillRate x, boolean overall) throws IOException {
        csv.row(f.facetId(), f.label(), f.valueKind(), f.multiValued() ? "yes" : "no", x.category(), x.listings(), x.applicable(),
                x.filled(), x.invalid(), x.conflicts(), x.rate(), x.rateAll(), overall ? (Object) (long) f.values().size() : null,
                overall ? (Object) f.entropyBits() : null);
    }

    static ObjectNode json(CoverageReport r) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("format", FORMAT);
        o.put("formatVersion", FORMAT_VERSION);
        ObjectNode totals = o.putObject("totals");
        for (Map.Entry<String, Object> e : r.totals().entrySet()) {
            totals.put(e.getKey(), ((Number) e.getValue()).longValue());
        }
        ObjectNode settings = o.putObject("settings");
        r.options().toMap().forEach(settings::put);
        ArrayNode nothing = o.putArray("nothingExamples");
        r.nothingExamples().forEach(nothing::add);
        ObjectNode cats = o.putObject("categories");
        r.categories().forEach(cats::put);
        ObjectNode srcs = o.putObject("sources");
        r.sources().forEach(srcs::put);
        ArrayNode concepts = o.putArray("concepts");
        for (CoverageConcept c : r.concepts()) {
            ObjectNode x = concepts.addObject();
            x.put("concept", c.conceptId());
            x.put("facet", c.facetId());
            x.put("label", c.label());
            x.put("listings", c.listings());
            x.put("negated", c.negated());
            x.put("applicable", c.applicable());
            num(x, "share", c.share());
            x.put("topSource", c.topSource());
            num(x, "topSourceShare", c.topSourceShare());
            x.put("topCategory", c.topCategory());
            num(x, "topCategoryShare", c.topCategoryShare());
        }
        ArrayNode facets = o.putArray("facets");
        for (CoverageFacet f : r.facets()) {
            ObjectNode x = facets.addObject();
            x.put("facet", f.facetId());
            x.put("label", f.label());
            x.put("valueKind", f.valueKind());
            x.put("multiValued", f.multiValued());
            fill(x.putObject("overall"), f.overall());
            ArrayNode per = x.putArray("byCategory");
            for (FillRate fr : f.byCategory()) {
                fill(per.addObject(), fr);
            }
            ArrayNode ex = x.putArray("conflictExamples");
            f.conflictExamples().forEach(ex::add);
            num(x, "entropyBits", f.entropyBits());
            ArrayNode vals = x.putArray("values");
            for (CoverageValue v : f.values()) {
                ObjectNode y = vals.addObject();
                y.put("value", v.value());
                y.put("label", v.label());
                y.put("listings", v.listings());
                num(y, "share", v.share());
            }
        }
        ArrayNode overlaps = o.putArray("overlaps");
        for (OverlapPair p : r.overlaps()) {
            ObjectNode x = overlaps.addObject();
            x.put("a", p.a());
            x.put("b", p.b());
            x.put("labelA", p.labelA());
            x.put("labelB", p.labelB());
            x.put("listingsA", p.listingsA());
            x.put("listingsB", p.listingsB());
            x.put("both", p.both());
            num(x, "jaccard", p.jaccard());
            num(x, "lift", p.lift());
            x.put("relation", p.relation());
            x.put("suggestion", p.suggestion());
        }
        ArrayNode conc = o.putArray("concentration");
        for (ConcentrationFinding c : r.concentration()) {
            ObjectNode x = conc.addObject();
            x.put("concept", c.conceptId());
            x.put("label", c.label());
            x.put("by", c.by());
            x.put("top", c.top());
            num(x, "share", c.share());
            x.put("listings", c.listings());
        }
        ArrayNode curve = o.putArray("curve");
        for (CoverageCurvePoint c : r.curve()) {
            ObjectNode x = curve.addObject();
            x.put("rank", c.rank());
            x.put("concept", c.conceptId());
            x.put("label", c.label());
            x.put("gain", c.gain());
            x.put("covered", c.covered());
            num(x, "share", c.share());
        }
        ArrayNode gaps = o.putArray("gapTerms");
        for (CoverageGapTerm g : r.gapTerms()) {
            ObjectNode x = gaps.addObject();
            x.put("n", g.n());
            x.put("term", g.term());
            x.put("listings", g.listings());
            x.put("occurrences", g.occurrences());
        }
        ArrayNode problems = o.putArray("problems");
        r.problems().forEach(problems::add);
        ArrayNode notes = o.putArray("notes");
        r.notes().forEach(notes::add);
        return o;
    }

    private static void fill(ObjectNode x, FillRate f) {
        x.put("category", f.category());
        x.put("listings", f.listings());
        x.put("applicable", f.applicable());
        x.put("filled", f.filled());
        x.put("invalid", f.invalid());
        x.put("conflicts", f.conflicts());
        num(x, "fillRate", f.rate());
        num(x, "fillRateAll", f.rateAll());
    }

    private static void num(ObjectNode x, String name, double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            x.putNull(name);
        } else {
            x.put(name, v);
        }
    }
}
