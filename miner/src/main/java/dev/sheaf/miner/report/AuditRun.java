package dev.sheaf.miner.report;

import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.Problem;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.label.Assignment;
import dev.sheaf.miner.label.Assignments;
import dev.sheaf.miner.label.AssignmentsJsonl;
import dev.sheaf.miner.label.Evidence;
import dev.sheaf.miner.label.LabelRun;
import dev.sheaf.miner.label.LabelRunSummary;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.miner.measure.AgreementAnalysis;
import dev.sheaf.miner.measure.AgreementAttribute;
import dev.sheaf.miner.measure.AgreementFiles;
import dev.sheaf.miner.measure.AgreementOptions;
import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.ConsistencyAnalysis;
import dev.sheaf.miner.measure.ConsistencyAttribute;
import dev.sheaf.miner.measure.ConsistencyFiles;
import dev.sheaf.miner.measure.ConsistencyOptions;
import dev.sheaf.miner.measure.ConsistencyReport;
import dev.sheaf.miner.measure.CoverageConcept;
import dev.sheaf.miner.measure.CoverageCurvePoint;
import dev.sheaf.miner.measure.CoverageFacet;
import dev.sheaf.miner.measure.CoverageFiles;
import dev.sheaf.miner.measure.CoverageOptions;
import dev.sheaf.miner.measure.CoverageReport;
import dev.sheaf.miner.measure.FeedbackColumns;
import dev.sheaf.miner.measure.FeedbackCsv;
import dev.sheaf.miner.measure.FeedbackMention;
import dev.sheaf.miner.measure.FeedbackSentences;
import dev.sheaf.miner.measure.FeedbackTermFinder;
import dev.sheaf.miner.measure.FeedbackVocabulary;
import dev.sheaf.miner.measure.FillRate;
import dev.sheaf.miner.measure.Flag;
import dev.sheaf.miner.measure.FlagFill;
import dev.sheaf.miner.measure.FlagInputs;
import dev.sheaf.miner.measure.FlagOverlap;
import dev.sheaf.miner.measure.FlagReport;
import dev.sheaf.miner.measure.FlagThresholds;
import dev.sheaf.miner.measure.FlaggedAttribute;
import dev.sheaf.miner.measure.Flags;
import dev.sheaf.miner.measure.GroundingAssignments;
import dev.sheaf.miner.measure.GroundingScales;
import dev.sheaf.miner.measure.JudgmentColumns;
import dev.sheaf.miner.measure.JudgmentsCsv;
import dev.sheaf.miner.measure.OverlapPair;
import dev.sheaf.miner.measure.Pseudonyms;
import dev.sheaf.miner.text.Analysis;
import dev.sheaf.miner.text.AnalysisProfile;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ConceptLabel;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.io.OutputSet;
import dev.sheaf.vocab.store.VocabularyFiles;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/**
 * The audit as one step: labels a workspace, measures coverage, consistency and agreement (each
 * stage reading the file the one before wrote: label, then assignments.jsonl, then coverage ...),
 * and writes one self-contained {@link HtmlReport} with the tables behind it.
 *
 * <pre>{@code
 * AuditSummary s = AuditRun.run(Workspace.load(dir), dir.resolve("out/audit"), progress);
 * }</pre>
 *
 * Output layout under the folder: labels/, coverage/, consistency/ (with feedback),
 * agreement/ (with judgments), report.html and tables/ (the report's tables as CSV and JSON).
 */
public final class AuditRun {
    /** Evidence lines shown per card. */
    static final int EVIDENCE_PER_CARD = 3;
    /** Entries in the attention list. */
    static final int ATTENTION = 10;

    private AuditRun() {
    }

    /**
     * Runs every stage over {@code ws} and writes the results to {@code outDir}.
     *
     * @param progress where to say what is happening (stderr in the CLI)
     * @throws IOException when an input cannot be read at all or an output cannot be written
     */
    public static AuditSummary run(Workspace ws, Path outDir, PrintWriter progress) throws IOException {
        return run(ws, outDir, progress, null, List.of());
    }

    /**
     * As {@link #run(Workspace, Path, PrintWriter)}, labelling listings already read from the workspace
     * sources (by a harvest over the same sources) instead of reading them again; {@code listings} null
     * reads the sources.
     */
    public static AuditSummary run(Workspace ws, Path outDir, PrintWriter progress, List<Listing> listings,
                                   List<Problem> readProblems) throws IOException {
        // every file of the audit (labels, measures, the page) is replaced together, or none is
        try (OutputSet set = OutputSet.open(outDir)) {
            AuditSummary s = run(ws, outDir, progress, listings, readProblems, set);
            set.commit();
            return s;
        }
    }

    private static AuditSummary run(Workspace ws, Path outDir, PrintWriter progress, List<Listing> listings,
                                    List<Problem> readProblems, OutputSet set) throws IOException {
        List<String> problems = new ArrayList<>();
        Files.createDirectories(outDir);
        Vocabulary vocab = VocabularyFiles.read(ws.vocabulary()).vocabulary();
        say(progress, "vocabulary: " + vocab.concepts().size() + " concepts in " + vocab.facets().size() + " facets");

        // 1. label
        Path labelDir = outDir.resolve("labels");
        AnalysisProfile profile = AnalysisProfile.resolve(profileOf(ws));
        Labeler labeler = Labeler.of(vocab, Analysis.of(profile));
        LabelRun.Builder lb = LabelRun.builder(labeler).sources(ws.sources()).workspaceRoot(ws.dir())
                .threads(Math.max(1, Math.min(4, Runtime.getRuntime().availableProcessors())));
        LabelRunSummary ls;
        if (listings == null) {
            ls = lb.build().run(labelDir);
        } else {
            List<Listing> ordered = new ArrayList<>(listings);
            ordered.sort(Comparator.comparing(Listing::source).thenComparing(Listing::locator).thenComparing(Listing::id));
            ls = lb.build().run(ordered, readProblems, labelDir);
        }
        say(progress, "labelled " + ls.listings() + " listings (" + ls.withLabels() + " with at least one label)");
        if (ls.problems() > 0) {
            problems.add(ls.problems() + " input problem(s) while labelling; see " + labelDir.resolve(LabelRun.PROBLEMS_CSV));
        }
        Path assignments = set.current(labelDir.resolve(AssignmentsJsonl.FILE_NAME)); // written, not yet in place

        // 2. coverage, from assignments.jsonl
        Path coverageDir = outDir.resolve("coverage");
        CoverageReport cov = CoverageReport.read(assignments, vocab, CoverageOptions.defaults());
        CoverageFiles.write(cov, coverageDir);
        say(progress, "coverage: " + cov.concepts().size() + " concepts over " + cov.listings() + " listings");
        Map<String, List<EvidenceLine>> evidence = new HashMap<>();
        Map<String, Integer> evidenceTotal = new HashMap<>();
        AssignmentsJsonl.read(assignments, vocab, a -> collectEvidence(a, evidence, evidenceTotal));

        // 3. agreement and consistency
        FeedbackVocabulary fv = FeedbackVocabulary.from(vocab);
        FlagThresholds thresholds = FlagThresholds.DEFAULTS;
        Pseudonyms pseudonyms = Pseudonyms.fromKeyFile(ws.dir().resolve(".sheaf").resolve("pseudonym.key"));
        AgreementReport agreement = null;
        if (ws.judgments() != null && Files.isRegularFile(ws.judgments())) {
            agreement = AgreementAnalysis.run(JudgmentsCsv.read(ws.judgments(), JudgmentColumns.DEFAULT,
                            ws.dir().relativize(ws.judgments()).toString()),
                    AgreementOptions.builder().thresholds(thresholds.agreement()).pseudonyms(pseudonyms).build());
            AgreementFiles.write(agreement, outDir.resolve("agreement"));
            say(progress, "agreement: " + agreement.attributes().size() + " attributes judged");
            if (agreement.hasProblems()) {
                problems.add(agreement.problems().size() + " judgment row(s) left out; see agreement/problems.csv");
            }
        }
        ConsistencyReport consistency = null;
        if (ws.feedback() != null && Files.isRegularFile(ws.feedback())) {
            FeedbackSentences sentences = FeedbackCsv.read(ws.feedback(), FeedbackColumns.DEFAULT,
                    ws.dir().relativize(ws.feedback()).toString());
            java.util.Set<String> named = new java.util.HashSet<>();
            sentences.sentences().forEach(x -> {
                named.add(x.targetId());
                named.add(x.referenceId());
            });
            GroundingAssignments ga = GroundingAssignments.read(assignments, vocab, named);
            GroundingScales bundled = GroundingScales.bundledExample();
            boolean demoScales = bundled.scales().stream().anyMatch(x -> fv.concept(x.facet()).isPresent());
            Path wsScales = ws.dir().resolve(GroundingScales.WORKSPACE_FILE);
            GroundingScales scales = GroundingScales.first(Files.isRegularFile(wsScales) ? GroundingScales.read(wsScales) : null,
                    demoScales ? bundled : null);
            java.util.Set<String> stopWords = new java.util.TreeSet<>(profile.stopWords());
            stopWords.addAll(ConsistencyOptions.FEEDBACK_FRAME_WORDS);
            consistency = ConsistencyAnalysis.run(sentences, ConsistencyOptions.builder(FeedbackTermFinder.labeler(labeler))
                    .vocabulary(fv).scales(scales).catalog(ga.catalog()).pseudonyms(pseudonyms).stopWords(stopWords).build());
            say(progress, "consistency: " + consistency.sentences() + " sentences, " + consistency.mentions().size() + " mentions");
            if (consistency.hasProblems()) {
                problems.add(consistency.problems().size() + " feedback row(s) left out; see consistency/problems.csv");
            }
        }
        FlagReport flags = Flags.evaluate(FlagInputs.builder().consistency(consistency).agreement(agreement).vocabulary(fv)
                .fill(fills(cov)).overlaps(overlaps(cov)).build(), thresholds);
        if (consistency != null) {
            ConsistencyFiles.write(consistency, flags, outDir.resolve("consistency"));
        }

        // 4. the page
        AuditPage page = new AuditPage(ws.name(), vocab, ls, cov, agreement, consistency, flags, evidence, evidenceTotal,
                pseudonymNote(agreement, consistency));
        Path report = outDir.resolve("report.html");
        page.build().write(report);
        say(progress, "report: " + report);
        Map<String, Integer> flagCounts = new LinkedHashMap<>();
        for (dev.sheaf.miner.measure.FlagKind k : dev.sheaf.miner.measure.FlagKind.values()) {
            flagCounts.put(k.label(), (int) flags.count(k));
        }
        return new AuditSummary(cov.listings(), vocab.concepts().size(), vocab.facets().size(), page.overallCoverage(),
                flagCounts, page.attentionLines(), agreement != null, consistency != null, report, problems);
    }

    private static String profileOf(Workspace ws) {
        return ws.profileFile().map(Path::toString).orElse(ws.profile() == null ? "default" : ws.profile());
    }

    private static String pseudonymNote(AgreementReport a, ConsistencyReport c) {
        return a == null && c == null ? "" : "Annotators appear as keyed pseudonyms; the key stays in .sheaf/ of the workspace.";
    }

    private static void say(PrintWriter p, String s) {
        p.println("sheaf audit: " + s);
        p.flush();
    }

    private static synchronized void collectEvidence(Assignments a, Map<String, List<EvidenceLine>> ev, Map<String, Integer> total) {
        for (Assignment x : a.assignments()) {
            total.merge(x.conceptId(), 1, Integer::sum);
            List<EvidenceLine> l = ev.computeIfAbsent(x.conceptId(), k -> new ArrayList<>());
            if (l.size() < EVIDENCE_PER_CARD && !x.evidence().isEmpty()) {
                Evidence e = x.evidence().get(0);
                l.add(new EvidenceLine(a.listingId(), a.source(), a.locator(), e.fieldKind().name().toLowerCase(Locale.ROOT),
                        e.key() == null ? "" : e.key(), "", e.text(), "", e.start(), e.end()));
            }
        }
    }

    private static List<FlagFill> fills(CoverageReport cov) {
        List<FlagFill> out = new ArrayList<>();
        for (CoverageFacet f : cov.facets()) {
            FillRate o = f.overall();
            if (o.applicable() > 0) {
                out.add(new FlagFill(f.facetId(), o.applicable(), o.filled(), List.of()));
            }
        }
        return out;
    }

    private static List<FlagOverlap> overlaps(CoverageReport cov) {
        List<FlagOverlap> out = new ArrayList<>();
        for (OverlapPair p : cov.overlaps()) {
            out.add(new FlagOverlap(p.a(), p.b(), p.jaccard(), p.both(), List.of()));
        }
        return out;
    }
}
