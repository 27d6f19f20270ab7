package dev.sheaf.miner.cli;

import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.label.AssignmentsJsonl;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.miner.measure.CoverageFacet;
import dev.sheaf.miner.measure.CoverageOptions;
import dev.sheaf.miner.measure.CoverageReport;
import dev.sheaf.miner.measure.FlagFill;
import dev.sheaf.miner.measure.FlagOverlap;
import dev.sheaf.miner.measure.OverlapPair;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.io.OutputSet;
import dev.sheaf.vocab.store.VocabularyStore;
import dev.sheaf.miner.measure.AgreementAnalysis;
import dev.sheaf.miner.measure.AgreementOptions;
import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.ConsistencyAgreement;
import dev.sheaf.miner.measure.ConsistencyAnalysis;
import dev.sheaf.miner.measure.ConsistencyAttribute;
import dev.sheaf.miner.measure.ConsistencyFiles;
import dev.sheaf.miner.measure.ConsistencyOptions;
import dev.sheaf.miner.measure.ConsistencyReport;
import dev.sheaf.miner.measure.Direction;
import dev.sheaf.miner.measure.FeedbackColumns;
import dev.sheaf.miner.measure.FeedbackCsv;
import dev.sheaf.miner.measure.FeedbackSentences;
import dev.sheaf.miner.measure.FeedbackTermFinder;
import dev.sheaf.miner.measure.FeedbackVocabulary;
import dev.sheaf.miner.measure.FlagInputs;
import dev.sheaf.miner.measure.FlagKind;
import dev.sheaf.miner.measure.FlagReport;
import dev.sheaf.miner.measure.FlagThresholds;
import dev.sheaf.miner.measure.FlaggedAttribute;
import dev.sheaf.miner.measure.GapTerm;
import dev.sheaf.miner.measure.GroundingAssignments;
import dev.sheaf.miner.measure.GroundingCatalog;
import dev.sheaf.miner.measure.GroundingScales;
import dev.sheaf.miner.measure.GroundingSummary;
import dev.sheaf.miner.measure.JudgmentColumns;
import dev.sheaf.miner.measure.JudgmentsCsv;
import dev.sheaf.miner.measure.Pseudonyms;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code sheaf consistency}: how consistently feedback sentences use each attribute, and the flags
 * that raises. A thin shell over {@link ConsistencyAnalysis} and {@link dev.sheaf.miner.measure.Flags}.
 */
@Command(name = "consistency",
        description = {
                "Measure how consistently feedback sentences use each attribute: mentions and their share of sentences, "
                        + "directions (more, less, present, absent), hedge rate, comparative share, the words people use "
                        + "and their entropy, labels nobody uses, agreement between people on direction, contradictions, "
                        + "grounding in the catalog, and words the vocabulary lacks. Then flag attributes that are "
                        + "contested, vague, ambiguous or regulated claims.",
                "The feedback file is CSV with a header row pair_id,reference_id,target_id,annotator,sentence (other "
                        + "names: the column options); each sentence compares the target listing with the reference.",
                "Annotator ids are personal data: every output shows keyed pseudonyms (ann-xxxxxx); the key file stays "
                        + "private (default: .sheaf/pseudonym.key in the workspace, created on first use).",
                "Writes consistency.csv, consistency.json, contradictions.csv, vocabulary-gaps.csv, mentions.csv and "
                        + "problems.csv to the output folder; prints a table."},
        mixinStandardHelpOptions = true,
        usageHelpAutoWidth = true,
        sortOptions = false,
        footerHeading = "%n",
        footer = {
                "Examples:",
                "  sheaf consistency sample-listings/feedback.csv --vocab sample-listings/fernhollow.vocab.json \\",
                "      --assignments out/label/assignments.jsonl --out out/consistency",
                "  sheaf consistency --workspace sample-listings --threshold hedge.rate=0.4",
                "",
                "Scales (which gradable words speak of which number facet: lighter = less weight, warmer = a lower comfort",
                "rating) come from, first found: the vocabulary, --scales FILE, scales.json in the workspace, or the",
                "bundled demo example when the vocabulary has its facets.",
                "Flag edges: alpha below .667 is contested (Krippendorff 2004); kappa bands after Landis & Koch 1977;",
                "the other edges are common practice, listed with their reasons in consistency.json.",
                "",
                ExitCodes.HELP_LIST})
final class ConsistencyCommand implements Callable<Integer> {
    private static final int TABLE_GAPS = 10;

    @Spec
    CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FEEDBACK.csv",
            description = "The feedback file (default: the workspace's \"feedback\" file).")
    Path feedbackFile;

    @Option(names = "--vocab", paramLabel = "FILE",
            description = "The vocabulary (*.vocab.json). Default: the workspace's \"vocabulary\" file.")
    Path vocabFile;

    @Option(names = "--assignments", paramLabel = "FILE",
            description = "The labeler's assignments.jsonl (from 'sheaf label'), to ground mentions in the catalog and to "
                    + "flag thin and overlapping attributes. Default: OUTPUT/labels/assignments.jsonl in the workspace when "
                    + "it exists; without it nothing is grounded.")
    Path assignmentsFile;

    @Option(names = "--workspace", paramLabel = "DIR",
            description = "Workspace folder; its workspace.json names the feedback, vocabulary and judgments files and the "
                    + "output folder. Default: the current folder when it holds a workspace.json.")
    Path workspace;

    @Option(names = "--out", paramLabel = "DIR",
            description = "Output folder. Default: OUTPUT/consistency in the workspace, else out/consistency.")
    Path out;

    @Option(names = "--scales", paramLabel = "FILE", description = "Scales file (format sheaf-scales); see above.")
    Path scalesFile;

    @Option(names = "--judgments", paramLabel = "FILE",
            description = "Judgments CSV for Krippendorff's alpha per attribute (contested below .667). "
                    + "Default: the workspace's \"judgments\" file when it names one.")
    Path judgmentsFile;

    @Option(names = "--threshold", paramLabel = "KEY=VALUE",
            description = "Override a flag edge, e.g. hedge.rate=0.4, alpha.tentative=0.7, mentions.min=10. Repeatable; "
                    + "the keys are listed in consistency.json.")
    Map<String, Double> thresholds = new LinkedHashMap<>();

    @Option(names = "--key", paramLabel = "FILE",
            description = "Pseudonym key file (created when missing). Default: .sheaf/pseudonym.key in the workspace, "
                    + "else beside the feedback file. Keep it out of anything you circulate.")
    Path keyFile;

    @Option(names = "--pair-column", paramLabel = "NAME", defaultValue = "pair_id", description = "Default: ${DEFAULT-VALUE}.")
    String pairColumn;

    @Option(names = "--reference-column", paramLabel = "NAME", defaultValue = "reference_id",
            description = "Default: ${DEFAULT-VALUE}.")
    String referenceColumn;

    @Option(names = "--target-column", paramLabel = "NAME", defaultValue = "target_id", description = "Default: ${DEFAULT-VALUE}.")
    String targetColumn;

    @Option(names = "--annotator-column", paramLabel = "NAME", defaultValue = "annotator",
            description = "Default: ${DEFAULT-VALUE}.")
    String annotatorColumn;

    @Option(names = "--sentence-column", paramLabel = "NAME", defaultValue = "sentence",
            description = "Default: ${DEFAULT-VALUE}.")
    String sentenceColumn;

    @Override
    public Integer call() {
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Path wsDir = workspace;
        if (wsDir == null && feedbackFile == null && Workspace.isWorkspace(Path.of("."))) {
            wsDir = Path.of(".");
        }
        Workspace ws = null;
        if (wsDir != null) {
            try {
                ws = Workspace.load(wsDir);
            } catch (IOException e) {
                err.println("sheaf consistency: " + e.getMessage());
                return ExitCodes.FAILURE;
            }
        }
        Path feedback = feedbackFile != null ? feedbackFile : ws == null ? null : ws.feedback();
        Path vocabPath = vocabFile != null ? vocabFile : ws == null ? null : ws.vocabulary();
        if (feedback == null) {
            err.println("sheaf consistency: expected a feedback file or --workspace DIR whose workspace.json names "
                    + "\"feedback\"; found neither. Try 'sheaf consistency --help'.");
            return ExitCodes.USAGE;
        }
        if (vocabPath == null) {
            err.println("sheaf consistency: expected --vocab FILE (or a workspace naming \"vocabulary\"); the vocabulary "
                    + "says which words are attributes. Try 'sheaf consistency --help'.");
            return ExitCodes.USAGE;
        }
        Path outDir = out != null ? out : ws != null ? ws.output().resolve("consistency") : Path.of("out", "consistency");
        Path judgments = judgmentsFile != null ? judgmentsFile : ws == null ? null : ws.judgments();
        Path assignments = assignmentsFile;
        if (assignments == null && ws != null
                && Files.isRegularFile(ws.output().resolve("labels").resolve(AssignmentsJsonl.FILE_NAME))) {
            assignments = ws.output().resolve("labels").resolve(AssignmentsJsonl.FILE_NAME);
        }
        Path key = keyFile != null ? keyFile
                : (ws != null ? ws.dir() : parentOf(feedback)).resolve(".sheaf").resolve("pseudonym.key");

        FlagThresholds flagThresholds;
        FeedbackColumns columns;
        try {
            flagThresholds = FlagThresholds.fromMap(thresholds);
            columns = new FeedbackColumns(pairColumn, referenceColumn, targetColumn, annotatorColumn, sentenceColumn);
        } catch (IllegalArgumentException e) {
            err.println("sheaf consistency: " + e.getMessage());
            err.println("Try 'sheaf consistency --help'.");
            return ExitCodes.USAGE;
        }

        boolean problems = false;
        FeedbackSentences sentences;
        Vocabulary vocab;
        FeedbackVocabulary vocabulary;
        AnalysisProfile profile;
        GroundingScales scales;
        GroundingCatalog catalog = null;
        List<FlagFill> fill = new ArrayList<>();
        List<FlagOverlap> overlaps = new ArrayList<>();
        AgreementReport agreement = null;
        Pseudonyms pseudonyms;
        try {
            sentences = FeedbackCsv.read(feedback, columns, display(ws, feedback));
            vocab = VocabularyStore.read(vocabPath);
            vocabulary = FeedbackVocabulary.from(vocab);
            profile = ws == null ? AnalysisProfile.defaults() : ws.profileFile().isPresent()
                    ? AnalysisProfile.load(ws.profileFile().get()) : AnalysisProfile.preset(ws.profile());
            scales = GroundingScales.first(
                    // the vocabulary's own scales go first here once the vocabulary format carries them
                    scalesFile == null ? null : GroundingScales.read(scalesFile),
                    ws != null && Files.isRegularFile(ws.dir().resolve(GroundingScales.WORKSPACE_FILE))
                            ? GroundingScales.read(ws.dir().resolve(GroundingScales.WORKSPACE_FILE)) : null,
                    example(vocabulary));
            if (assignments != null) {
                Set<String> named = new HashSet<>();
                sentences.sentences().forEach(x -> {
                    named.add(x.targetId());
                    named.add(x.referenceId());
                });
                GroundingAssignments a = GroundingAssignments.read(assignments, vocab, named);
                catalog = a.catalog();
                CoverageReport coverage = CoverageReport.read(assignments, vocab, CoverageOptions.defaults());
                for (CoverageFacet f : coverage.facets()) {
                    fill.add(new FlagFill(f.facetId(), f.overall().applicable(), f.overall().filled(), List.of()));
                }
                for (OverlapPair o : coverage.overlaps()) {
                    overlaps.add(new FlagOverlap(o.a(), o.b(), o.jaccard(), o.both(), List.of()));
                }
                for (String pr : a.problems()) {
                    err.println("sheaf consistency: " + display(ws, assignments) + ": " + pr);
                }
                problems |= !a.problems().isEmpty();
                err.printf(Locale.ROOT, "sheaf consistency: catalog facts for %d of the %d listings in %s%n", a.kept(),
                        a.listings(), display(ws, assignments));
            }
            boolean newKey = !Files.exists(key);
            pseudonyms = Pseudonyms.fromKeyFile(key);
            if (newKey) {
                err.println("sheaf consistency: created pseudonym key " + key + " (keep it private; the same key keeps "
                        + "pseudonyms stable across runs)");
            }
            if (judgments != null) {
                agreement = AgreementAnalysis.run(JudgmentsCsv.read(judgments, JudgmentColumns.DEFAULT, display(ws, judgments)),
                        AgreementOptions.builder().thresholds(flagThresholds.agreement()).pseudonyms(pseudonyms).build());
                if (agreement.hasProblems()) {
                    err.printf(Locale.ROOT, "sheaf consistency: %d judgment row%s left out of alpha (run 'sheaf agreement' "
                            + "for the list)%n", agreement.problems().size(), agreement.problems().size() == 1 ? "" : "s");
                    problems = true;
                }
            }
        } catch (IllegalArgumentException e) {
            err.println("sheaf consistency: " + e.getMessage());
            return ExitCodes.USAGE;
        } catch (IOException e) {
            err.println("sheaf consistency: cannot read " + describe(e));
            return ExitCodes.FAILURE;
        }

        Labeler labeler = Labeler.of(vocab, Analysis.of(profile));
        Set<String> stopWords = new java.util.TreeSet<>(profile.stopWords());
        stopWords.addAll(ConsistencyOptions.FEEDBACK_FRAME_WORDS);
        ConsistencyOptions options = ConsistencyOptions.builder(FeedbackTermFinder.labeler(labeler))
                .vocabulary(vocabulary).scales(scales).catalog(catalog).pseudonyms(pseudonyms).stopWords(stopWords).build();
        ConsistencyReport report = ConsistencyAnalysis.run(sentences, options);
        FlagReport flags = dev.sheaf.miner.measure.Flags.evaluate(FlagInputs.builder().consistency(report)
                .agreement(agreement).vocabulary(vocabulary).fill(fill).overlaps(overlaps).build(), flagThresholds);
        printTable(report, flags, stdout);
        try {
            OutputSet.writeAll(outDir, set -> ConsistencyFiles.write(report, flags, outDir));
        } catch (IOException e) {
            err.println("sheaf consistency: cannot write the results to " + outDir + ": " + describe(e));
            return ExitCodes.FAILURE;
        }
        err.printf(Locale.ROOT, "sheaf consistency: %d sentences, %d mentions of %d attributes, %d flagged; scales: %s; "
                        + "results in %s%n", report.sentences(), report.mentions().size(), report.attributes().size(),
                flags.flagged().size(), report.scalesSource(), outDir);
        if (report.hasProblems()) {
            err.printf(Locale.ROOT, "sheaf consistency: %d feedback row%s left out; see %s%n", report.problems().size(),
                    report.problems().size() == 1 ? "" : "s", outDir.resolve(ConsistencyFiles.PROBLEMS_CSV));
            problems = true;
        }
        return problems ? ExitCodes.PROBLEMS : ExitCodes.OK;
    }

    /** The bundled example scales, when the vocabulary holds at least one of their facets (the demo's). */
    private static GroundingScales example(FeedbackVocabulary vocabulary) {
        GroundingScales s = GroundingScales.bundledExample();
        return s.scales().stream().anyMatch(x -> vocabulary.concept(x.facet()).isPresent()) ? s : null;
    }

    static void printTable(ConsistencyReport report, FlagReport flags, PrintWriter out) {
        List<String[]> rows = new ArrayList<>();
        rows.add(new String[] {"attribute", "mentions", "share", "more/less/pres/abs", "hedged", "comparative",
            "agreement (pairs)", "contradictions", "grounded (checked)", "flags"});
        List<ConsistencyAttribute> sorted = new ArrayList<>(report.attributes());
        sorted.sort(Comparator.comparingInt((ConsistencyAttribute a) -> -a.mentions()).thenComparing(ConsistencyAttribute::attribute));
        for (ConsistencyAttribute a : sorted) {
            ConsistencyAgreement g = a.agreement();
            GroundingSummary s = a.grounding();
            rows.add(new String[] {a.attribute(), Integer.toString(a.mentions()), pct(a.share()),
                a.directions().get(Direction.MORE) + "/" + a.directions().get(Direction.LESS) + "/"
                        + a.directions().get(Direction.PRESENT) + "/" + a.directions().get(Direction.ABSENT),
                pct(a.hedgeRate()), pct(a.comparativeShare()),
                g.pairsJudged() == 0 ? "n/a" : pct(g.meanAgreement()) + " (" + g.pairsJudged() + ")",
                Integer.toString(g.contradictoryPairs()),
                s.checked() == 0 ? "n/a" : pct(s.precision()) + " (" + s.checked() + ")",
                kinds(flags.flags(a.attribute()).orElse(null))});
        }
        print(rows, out);
        List<String> elsewhere = new ArrayList<>();
        for (FlaggedAttribute f : flags.flagged()) {
            if (report.attribute(f.attribute()).isEmpty()) {
                elsewhere.add(f.attribute() + " (" + kinds(f) + ")");
            }
        }
        if (!elsewhere.isEmpty()) {
            out.println();
            out.println("Flagged without feedback mentions: " + String.join(", ", elsewhere));
        }
        if (flags.count(FlagKind.CLAIM) > 0) {
            out.println("Claims need compliance review before they ship: mined labels are not verified product claims.");
        }
        if (!report.gaps().isEmpty()) {
            out.println();
            List<String> g = new ArrayList<>();
            for (GapTerm t : report.gaps().subList(0, Math.min(TABLE_GAPS, report.gaps().size()))) {
                g.add(t.term() + " (" + t.frequency() + ")");
            }
            out.println("Words the vocabulary lacks: " + String.join(", ", g));
        }
        List<String> notes = new ArrayList<>(report.notes());
        notes.addAll(flags.notes());
        if (!notes.isEmpty()) {
            out.println();
            out.println("Notes:");
            notes.forEach(n -> out.println("  " + n));
        }
        out.flush();
    }

    private static String kinds(FlaggedAttribute f) {
        if (f == null) {
            return "";
        }
        List<String> k = new ArrayList<>();
        f.kinds().forEach(x -> k.add(x.label()));
        return String.join(" ", k);
    }

    /** Prints rows as aligned columns; every column but the first and the last is right-aligned. */
    private static void print(List<String[]> rows, PrintWriter out) {
        int cols = rows.get(0).length;
        int[] width = new int[cols];
        for (String[] r : rows) {
            for (int c = 0; c < cols; c++) {
                width[c] = Math.max(width[c], r[c].length());
            }
        }
        for (String[] r : rows) {
            StringBuilder line = new StringBuilder();
            for (int c = 0; c < cols; c++) {
                String pad = " ".repeat(width[c] - r[c].length());
                boolean right = c > 0 && c < cols - 1;
                line.append(right ? pad + r[c] : r[c] + (c == cols - 1 ? "" : pad));
                if (c < cols - 1) {
                    line.append("  ");
                }
            }
            out.println(line.toString().stripTrailing());
        }
    }

    private static String pct(double v) {
        return Double.isNaN(v) ? "n/a" : String.format(Locale.ROOT, "%.0f%%", v * 100);
    }

    private static String display(Workspace ws, Path file) {
        if (ws == null) {
            return file.toString();
        }
        Path f = file.toAbsolutePath().normalize();
        return f.startsWith(ws.dir()) ? ws.dir().relativize(f).toString() : file.toString();
    }

    private static Path parentOf(Path file) {
        Path p = file.toAbsolutePath().getParent();
        return p == null ? Path.of(".") : p;
    }

    private static String describe(IOException e) {
        if (e instanceof NoSuchFileException) {
            return e.getMessage() + " (no such file); check the path";
        }
        if (e instanceof AccessDeniedException) {
            return e.getMessage() + " (permission denied)";
        }
        return e.getMessage();
    }
}
