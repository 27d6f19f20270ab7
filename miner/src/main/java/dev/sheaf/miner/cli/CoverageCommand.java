package dev.sheaf.miner.cli;

import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.label.AssignmentsJsonl;
import dev.sheaf.miner.measure.ConcentrationFinding;
import dev.sheaf.miner.measure.CoverageConcept;
import dev.sheaf.miner.measure.CoverageCurvePoint;
import dev.sheaf.miner.measure.CoverageFacet;
import dev.sheaf.miner.measure.CoverageFiles;
import dev.sheaf.miner.measure.CoverageGapTerm;
import dev.sheaf.miner.measure.CoverageOptions;
import dev.sheaf.miner.measure.CoverageReport;
import dev.sheaf.miner.measure.FillRate;
import dev.sheaf.miner.measure.OverlapPair;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.io.OutputSet;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code sheaf coverage}: how well each attribute covers the labeled catalog. A thin shell over {@link CoverageReport}. */
@Command(name = "coverage",
        description = {
                "Measure how well each attribute covers the catalog, from the label stage's assignments.jsonl and the vocabulary: "
                        + "per concept (listings, share of the listings its facet applies to, by category and by source file), "
                        + "per facet (fill rate where it applies and over all listings, conflicts of single-valued facets, value "
                        + "distribution and entropy), concepts carried by one file or category, pairs of concepts that label the "
                        + "same listings, listings with no attribute and their commonest terms, and the coverage curve.",
                "Prints a table; writes coverage.csv, coverage-by-category.csv, coverage-by-source.csv, facet-fill.csv, "
                        + "facet-distribution.csv, overlap.csv, concentration.csv, coverage-curve.csv, coverage-gaps.csv and coverage.json."},
        mixinStandardHelpOptions = true,
        usageHelpAutoWidth = true,
        sortOptions = false,
        footerHeading = "%n",
        footer = {
                "Examples:",
                "  sheaf coverage out/labels --vocab sample-listings/fernhollow.vocab.json --out out/coverage",
                "  sheaf coverage --workspace sample-listings --set concentration=0.8 --set overlapMinJaccard=0.4",
                "",
                "Settings (--set KEY=VALUE): concentration (0.9), concentrationMinListings (5), overlapMinJaccard (0.5),",
                "overlapMinListings (3), gapTerms (50), examples (5). Fill rate = filled / listings where the facet applies;",
                "\"fill (all)\" also counts listings where it does not apply (docs/decisions/105).",
                "",
                ExitCodes.HELP_LIST})
final class CoverageCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "LABELS",
            description = "The label stage's output folder or its assignments.jsonl (default: OUTPUT/labels of the workspace).")
    Path input;

    @Option(names = "--vocab", paramLabel = "FILE", description = "The vocabulary file. Default: the workspace's.")
    Path vocab;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder. Default: OUTPUT/coverage of the workspace, else out/coverage.")
    Path out;

    @Option(names = "--workspace", paramLabel = "DIR",
            description = "Workspace folder (default: the current folder when it holds a workspace.json).")
    Path workspace;

    @Option(names = "--preset", paramLabel = "NAME", defaultValue = "default", description = "Settings preset: default or strict.")
    String preset;

    @Option(names = "--set", paramLabel = "KEY=VALUE", description = "Change one setting (repeatable); see below.")
    Map<String, String> settings = new LinkedHashMap<>();

    @Option(names = "--top", paramLabel = "N", defaultValue = "10", description = "Rows per section of the printed table (default: ${DEFAULT-VALUE}).")
    int top;

    @Override
    public Integer call() {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Workspace ws;
        try {
            ws = LabelCommand.workspace(workspace, input == null);
        } catch (IOException e) {
            err.println("sheaf coverage: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        Path in = input != null ? input : ws != null ? ws.output().resolve("labels") : null;
        if (in == null) {
            err.println("sheaf coverage: expected the label output (a folder or assignments.jsonl) or --workspace DIR; found neither. "
                    + "Run 'sheaf label' first, then try 'sheaf coverage --help'.");
            return ExitCodes.USAGE;
        }
        Path file = Files.isDirectory(in) ? in.resolve(AssignmentsJsonl.FILE_NAME) : in;
        if (!Files.isRegularFile(file)) {
            err.println("sheaf coverage: " + file + " does not exist; run 'sheaf label' first (it writes "
                    + AssignmentsJsonl.FILE_NAME + ").");
            return ExitCodes.USAGE;
        }
        Path vocabFile = vocab != null ? vocab : ws == null ? null : ws.vocabulary();
        if (vocabFile == null) {
            err.println("sheaf coverage: expected --vocab FILE (or a workspace naming a \"vocabulary\"); found none.");
            return ExitCodes.USAGE;
        }
        Path outDir = out != null ? out : ws != null ? ws.output().resolve("coverage") : Path.of("out", "coverage");
        CoverageOptions options;
        try {
            options = CoverageOptions.fromMap(CoverageOptions.preset(preset), settings);
        } catch (IllegalArgumentException e) {
            err.println("sheaf coverage: " + e.getMessage());
            err.println("Try 'sheaf coverage --help'.");
            return ExitCodes.USAGE;
        }
        Vocabulary v;
        try {
            v = LabelCommand.VOCABULARIES.apply(vocabFile);
        } catch (LabelCommand.VocabularyUnreadable e) {
            err.println("sheaf coverage: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        CoverageReport r;
        try {
            r = CoverageReport.read(file, v, options);
            CoverageReport written = r;
            OutputSet.writeAll(outDir, set -> CoverageFiles.write(written, outDir));
        } catch (IOException e) {
            err.println("sheaf coverage: " + e.getMessage());
            return ExitCodes.FAILURE;
        }
        print(r, stdout, top);
        for (String n : r.notes()) {
            err.println("sheaf coverage: note: " + n);
        }
        err.printf(Locale.ROOT, "sheaf coverage: %,d listings, %d concepts, %d facets; results in %s%n", r.listings(),
                r.concepts().size(), r.facets().size(), outDir);
        if (!r.problems().isEmpty()) {
            for (String p : r.problems().subList(0, Math.min(10, r.problems().size()))) {
                err.println("sheaf coverage: " + p);
            }
            err.printf(Locale.ROOT, "sheaf coverage: %d input problem%s (all in %s)%n", r.problems().size(),
                    r.problems().size() == 1 ? "" : "s", outDir.resolve(CoverageFiles.JSON));
            return ExitCodes.PROBLEMS;
        }
        return ExitCodes.OK;
    }

    static void print(CoverageReport r, PrintWriter out, int top) {
        out.printf(Locale.ROOT, "Listings %,d: %,d without a stated label, %,d with no attribute at all%n", r.listings(),
                r.listingsWithoutLabels(), r.listingsWithNothing());
        if (r.resolved() > 0) {
            out.printf(Locale.ROOT, "%,d assignments named merged concepts and were read as their replacements%n", r.resolved());
        }
        out.println();
        out.println("Facets (fill rate = filled / listings where the facet applies; \"all\" counts every listing)");
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"facet", "kind", "applicable", "filled", "fill rate", "fill (all)", "conflicts", "values", "entropy"});
        for (CoverageFacet f : r.facets()) {
            FillRate o = f.overall();
            rows.add(new String[] {f.label(), f.valueKind() + (f.multiValued() ? ", multi" : ""), num(o.applicable()),
                num(o.filled()), pct(o.rate()), pct(o.rateAll()), num(o.conflicts()), num(f.values().size()),
                String.format(Locale.ROOT, "%.2f bits", f.entropyBits())});
        }
        table(rows, out, 2, 8);
        out.println();
        List<CoverageConcept> byListings = new ArrayList<>(r.concepts());
        byListings.sort(Comparator.comparingLong(CoverageConcept::listings).reversed().thenComparing(CoverageConcept::conceptId));
        long unused = byListings.stream().filter(c -> c.listings() == 0).count();
        out.printf(Locale.ROOT, "Concepts: %d, %d used; the most used:%n", r.concepts().size(), r.concepts().size() - unused);
        rows = new ArrayList<>();
        rows.add(new String[] {"concept", "facet", "listings", "negated", "share", "top source", "top category"});
        for (CoverageConcept c : byListings.subList(0, Math.min(top, byListings.size()))) {
            rows.add(new String[] {c.label(), c.facetId() == null ? "-" : c.facetId(), num(c.listings()), num(c.negated()),
                pct(c.share()), c.topSource() == null ? "-" : c.topSource() + " " + pct(c.topSourceShare()),
                c.topCategory() == null ? "-" : c.topCategory() + " " + pct(c.topCategoryShare())});
        }
        table(rows, out, 2, 4);
        if (!r.concentration().isEmpty()) {
            out.println();
            out.println("Concentrated (one file or category carries the concept):");
            for (ConcentrationFinding f : r.concentration().subList(0, Math.min(top, r.concentration().size()))) {
                out.printf(Locale.ROOT, "  %s: %s of %,d listings from %s %s%n", f.label(), pct(f.share()), f.listings(), f.by(), f.top());
            }
        }
        if (!r.overlaps().isEmpty()) {
            out.println();
            out.println("Overlapping pairs (listing sets nearly coincide):");
            rows = new ArrayList<>();
            rows.add(new String[] {"a", "b", "both", "jaccard", "lift", "relation", "suggestion"});
            for (OverlapPair p : r.overlaps().subList(0, Math.min(top, r.overlaps().size()))) {
                rows.add(new String[] {p.labelA(), p.labelB(), num(p.both()), String.format(Locale.ROOT, "%.2f", p.jaccard()),
                    String.format(Locale.ROOT, "%.1f", p.lift()), p.relation(), p.suggestion()});
            }
            table(rows, out, 2, 4);
        }
        if (!r.curve().isEmpty()) {
            out.println();
            StringBuilder b = new StringBuilder("Coverage curve (concepts added greedily by marginal gain): ");
            double[] marks = {0.5, 0.8, 0.9};
            for (double m : marks) {
                CoverageCurvePoint hit = r.curve().stream().filter(p -> p.share() >= m).findFirst().orElse(null);
                b.append(pct(m)).append(hit == null ? " not reached" : " with " + hit.rank()).append("; ");
            }
            CoverageCurvePoint last = r.curve().get(r.curve().size() - 1);
            b.append(last.rank()).append(" concepts cover ").append(pct(last.share())).append(" of listings");
            out.println(b);
        }
        if (!r.gapTerms().isEmpty()) {
            out.println();
            out.println("Commonest terms of listings with no attribute (what the vocabulary may miss):");
            StringBuilder b = new StringBuilder("  ");
            for (CoverageGapTerm g : r.gapTerms().subList(0, Math.min(top * 2, r.gapTerms().size()))) {
                b.append(g.term()).append(" (").append(g.listings()).append("), ");
            }
            out.println(b.substring(0, b.length() - 2));
        }
        out.flush();
    }

    private static String num(long v) {
        return String.format(Locale.ROOT, "%,d", v);
    }

    private static String pct(double v) {
        return Double.isNaN(v) ? "n/a" : String.format(Locale.ROOT, "%.1f%%", v * 100);
    }

    /** Prints rows as aligned columns; columns from {@code firstNumeric} to {@code lastNumeric} are right-aligned. */
    private static void table(List<String[]> rows, PrintWriter out, int firstNumeric, int lastNumeric) {
        int cols = rows.get(0).length;
        int[] width = new int[cols];
        for (String[] r : rows) {
            for (int c = 0; c < cols; c++) {
                width[c] = Math.max(width[c], r[c].length());
            }
        }
        for (String[] r : rows) {
            StringBuilder line = new StringBuilder("  ");
            for (int c = 0; c < cols; c++) {
                String pad = " ".repeat(width[c] - r[c].length());
                line.append(c >= firstNumeric && c <= lastNumeric ? pad + r[c] : r[c] + pad);
                if (c < cols - 1) {
                    line.append("  ");
                }
            }
            out.println(line.toString().stripTrailing());
        }
    }
}
