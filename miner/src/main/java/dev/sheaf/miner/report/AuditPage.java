package dev.sheaf.miner.report;

import dev.sheaf.miner.label.LabelRunSummary;
import dev.sheaf.miner.measure.AgreementAttribute;
import dev.sheaf.miner.measure.AgreementReport;
import dev.sheaf.miner.measure.ConsistencyAgreement;
import dev.sheaf.miner.measure.ConsistencyAttribute;
import dev.sheaf.miner.measure.ConsistencyReport;
import dev.sheaf.miner.measure.CoverageConcept;
import dev.sheaf.miner.measure.CoverageCurvePoint;
import dev.sheaf.miner.measure.CoverageFacet;
import dev.sheaf.miner.measure.CoverageReport;
import dev.sheaf.miner.measure.FeedbackMention;
import dev.sheaf.miner.measure.FillRate;
import dev.sheaf.miner.measure.Flag;
import dev.sheaf.miner.measure.FlagReport;
import dev.sheaf.miner.measure.FlaggedAttribute;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ConceptLabel;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

/** Turns the stage results of one audit into the page: summary, charts, tables and one card per attribute. */
final class AuditPage {
    /** The coverage curve marks where this share of listings is reached. */
    static final double CURVE_MARK = 0.9;
    private static final int FEEDBACK_PER_CARD = 2;

    private final String name;
    private final Vocabulary vocab;
    private final LabelRunSummary labels;
    private final CoverageReport cov;
    private final AgreementReport agreement;
    private final ConsistencyReport consistency;
    private final FlagReport flags;
    private final Map<String, List<EvidenceLine>> evidence;
    private final Map<String, Integer> evidenceTotal;
    private final String pseudonymNote;
    private final List<String> attentionLines = new ArrayList<>();

    AuditPage(String name, Vocabulary vocab, LabelRunSummary labels, CoverageReport cov, AgreementReport agreement,
              ConsistencyReport consistency, FlagReport flags, Map<String, List<EvidenceLine>> evidence,
              Map<String, Integer> evidenceTotal, String pseudonymNote) {
        this.name = name == null || name.isBlank() ? "Workspace" : name;
        this.vocab = vocab;
        this.labels = labels;
        this.cov = cov;
        this.agreement = agreement;
        this.consistency = consistency;
        this.flags = flags;
        this.evidence = evidence;
        this.evidenceTotal = evidenceTotal;
        this.pseudonymNote = pseudonymNote;
    }

    double overallCoverage() {
        return cov.listings() == 0 ? 0 : (double) (cov.listings() - cov.listingsWithoutLabels()) / cov.listings();
    }

    List<String> attentionLines() {
        return List.copyOf(attentionLines);
    }

    HtmlReport build() {
        HtmlReport.Builder b = HtmlReport.builder(name + ": vocabulary audit")
                .subtitle("Labels, coverage, consistency and agreement of " + vocab.concepts().size() + " concepts")
                .meta("Written by sheaf audit");
        b.keyFigure(KeyFigure.count("Listings", cov.listings(), "labelled from the workspace sources"));
        b.keyFigure(KeyFigure.count("Concepts", vocab.concepts().size(), "in " + vocab.facets().size() + " facets"));
        b.keyFigure(KeyFigure.share("Coverage", overallCoverage(), "of listings carry at least one label"));
        for (dev.sheaf.miner.measure.FlagKind k : dev.sheaf.miner.measure.FlagKind.values()) {
            b.keyFigure(KeyFigure.count("Flagged " + k.label(), flags.count(k), "attributes"));
        }
        if (!pseudonymNote.isEmpty()) {
            b.meta("Written by sheaf audit. " + pseudonymNote);
        }
        attention(b);
        b.section(coverageSection());
        b.section(agreementSection());
        b.section(feedbackSection());
        b.section(flagSection());
        b.section(cardSection());
        return b.build();
    }

    // ---------------------------------------------------------------- summary

    private void attention(HtmlReport.Builder b) {
        List<FlaggedAttribute> sorted = new ArrayList<>(flags.flagged());
        sorted.sort(Comparator.comparingInt((FlaggedAttribute f) -> -f.flags().size()).thenComparing(FlaggedAttribute::attribute));
        int n = 0;
        for (FlaggedAttribute f : sorted) {
            if (n == AuditRun.ATTENTION) {
                break;
            }
            if (vocab.concept(f.attribute()).isEmpty()) {
                continue;
            }
            List<String> reasons = new ArrayList<>();
            for (Flag x : f.flags()) {
                reasons.add(x.kind().label() + ": " + reportFlag(x).map(ReportFlag::statement)
                        .orElse("a regulated or safety claim; needs compliance review"));
            }
            b.attention(new AttentionItem(label(f.attribute()), f.attribute(), reasons));
            attentionLines.add(label(f.attribute()) + " — " + String.join("; ", f.flags().stream().map(x -> x.kind().label()).toList()));
            n++;
        }
        b.attentionLimit(Math.max(1, n));
    }

    // ---------------------------------------------------------------- sections

    private Section coverageSection() {
        Section.Builder s = Section.builder("coverage", "Coverage");
        List<FillRateCell> cells = new ArrayList<>();
        for (CoverageFacet f : cov.facets()) {
            for (FillRate r : f.byCategory()) {
                if (!FillRate.ALL.equals(r.category()) && r.applicable() > 0) {
                    cells.add(new FillRateCell(f.label(), r.category(), (int) r.applicable(), (int) r.filled()));
                }
            }
        }
        if (cells.isEmpty()) {
            s.text("No facet applies to any labelled listing, so there is no fill-rate map.");
        } else {
            s.add(new Figure("fill-rate", "Fill rate by facet and category", Charts.fillRateHeatMap("fill-rate", cells),
                    HowToRead.fillRate(flags.thresholds().fillRate())));
        }
        List<CoveragePoint> points = new ArrayList<>();
        for (CoverageCurvePoint p : cov.curve()) {
            points.add(new CoveragePoint(p.rank(), p.label(), p.covered()));
        }
        if (points.isEmpty()) {
            s.text("No concept labels any listing, so there is no coverage curve.");
        } else {
            s.add(new Figure("coverage-curve", "Coverage curve", Charts.coverageCurve("coverage-curve", points, cov.listings(),
                    CURVE_MARK), HowToRead.coverageCurve(cov.listings(), CURVE_MARK)));
        }
        ReportTable.Builder t = ReportTable.builder("coverage-concepts", "Listings per concept",
                ReportTable.Column.text("concept"), ReportTable.Column.text("facet"), ReportTable.Column.count("listings"),
                ReportTable.Column.count("negated"), ReportTable.Column.share("share of applicable"));
        for (CoverageConcept c : cov.concepts()) {
            t.row(c.label(), c.facetId(), c.listings(), c.negated(), c.share());
        }
        s.add(t.note("Share: listings carrying the concept among the listings its facet applies to (method: counts over "
                + "assignments.jsonl, DESIGN.md coverage).").build());
        return s.build();
    }

    private Section agreementSection() {
        Section.Builder s = Section.builder("agreement", "Agreement between annotators");
        if (agreement == null || agreement.attributes().isEmpty()) {
            return s.text("The workspace names no judgments file (or it holds no usable rows), so Krippendorff's alpha "
                    + "is not measured and no attribute is flagged contested from judgments.").build();
        }
        Map<String, String> labels = new HashMap<>();
        for (AgreementAttribute a : agreement.attributes()) {
            labels.put(a.attribute(), label(a.attribute()));
        }
        s.add(new Figure("alpha", "Krippendorff's alpha per attribute", Charts.alpha("alpha", agreement, labels),
                HowToRead.alpha(agreement)));
        ReportTable.Builder t = ReportTable.builder("agreement-attributes", "Agreement per attribute",
                ReportTable.Column.text("attribute"), ReportTable.Column.count("items"), ReportTable.Column.count("judgments"),
                ReportTable.Column.count("annotators"), ReportTable.Column.coefficient("alpha"),
                ReportTable.Column.coefficient("interval low"), ReportTable.Column.coefficient("interval high"));
        for (AgreementAttribute a : agreement.attributes()) {
            t.row(label(a.attribute()), a.items(), a.judgments(), a.annotators(), a.alpha().alpha(), a.alphaInterval().low(),
                    a.alphaInterval().high());
        }
        s.add(t.note("Krippendorff 2004: alpha below 0.667 is contested, 0.667 to 0.8 tentative, 0.8 and above reliable; "
                + "interval by bootstrap over items (decision 070).").build());
        return s.build();
    }

    private Section feedbackSection() {
        Section.Builder s = Section.builder("feedback", "How feedback uses the attributes");
        if (consistency == null) {
            return s.text("The workspace names no feedback file, so mention direction, hedging and grounding are not "
                    + "measured and nothing is flagged vague from feedback.").build();
        }
        List<DirectionAgreement> rows = new ArrayList<>();
        for (ConsistencyAttribute a : consistency.attributes()) {
            ConsistencyAgreement g = a.agreement();
            if (g.pairsJudged() > 0 && !Double.isNaN(g.meanAgreement())) {
                rows.add(new DirectionAgreement(a.label(), g.pairsJudged(), (int) Math.round(g.meanAgreement() * g.pairsJudged())));
            }
        }
        if (rows.isEmpty()) {
            s.text("No pair was judged by two people on the same attribute, so direction agreement is not shown.");
        } else {
            s.add(new Figure("direction-agreement", "Mention direction agreement",
                    Charts.directionAgreement("direction-agreement", rows), HowToRead.directionAgreement()));
        }
        ReportTable.Builder t = ReportTable.builder("feedback-attributes", "Feedback mentions per attribute",
                ReportTable.Column.text("attribute"), ReportTable.Column.count("mentions"),
                ReportTable.Column.share("share of sentences"), ReportTable.Column.share("hedged"),
                ReportTable.Column.share("comparative"), ReportTable.Column.count("contradictory pairs"));
        for (ConsistencyAttribute a : consistency.attributes()) {
            t.row(a.label(), a.mentions(), a.share(), a.hedgeRate(), a.comparativeShare(), a.agreement().contradictoryPairs());
        }
        s.add(t.note("Mentions found with the vocabulary's labels; hedges and comparatives by cue lists (decisions 081, 110).")
                .build());
        return s.build();
    }

    private Section flagSection() {
        Section.Builder s = Section.builder("flags", "Flags over the vocabulary");
        Map<String, Map<FlagKind, Integer>> byFacet = new TreeMap<>();
        ReportTable.Builder t = ReportTable.builder("flags-table", "Every flag with the figure that raised it",
                ReportTable.Column.text("attribute"), ReportTable.Column.text("flag"), ReportTable.Column.text("criterion"),
                ReportTable.Column.coefficient("figure"), ReportTable.Column.text("comparison"),
                ReportTable.Column.coefficient("threshold"));
        for (FlaggedAttribute f : flags.flagged()) {
            for (Flag x : f.flags()) {
                t.row(label(f.attribute()), x.kind().label(), x.criterion(), x.figure(), x.comparison(), x.threshold());
                reportKind(x.kind()).ifPresent(k -> byFacet.computeIfAbsent(facetLabel(f.attribute()), z -> new LinkedHashMap<>())
                        .merge(k, 1, Integer::sum));
            }
        }
        List<FlagCount> counts = new ArrayList<>();
        byFacet.forEach((facet, m) -> m.forEach((k, n) -> counts.add(new FlagCount(k, facet, n))));
        List<String> edges = new ArrayList<>();
        edges.add("contested: alpha below " + Numbers.format(flags.thresholds().agreement().alphaTentative(), ValueKind.COEFFICIENT)
                + " (Krippendorff 2004)");
        edges.add("thin: fill rate below " + Numbers.format(flags.thresholds().fillRate(), ValueKind.SHARE) + " (common practice)");
        if (counts.isEmpty()) {
            s.text("No attribute carries a flag other than a claim review.");
        } else {
            s.add(new Figure("flag-counts", "Flags over the vocabulary", Charts.flags("flag-counts", counts), HowToRead.flags(edges)));
        }
        long claims = flags.count(dev.sheaf.miner.measure.FlagKind.CLAIM);
        s.text(claims + " attribute(s) are regulated or safety claims; their cards say so and they need compliance review.");
        return s.add(t.build()).build();
    }

    private Section cardSection() {
        Section.Builder s = Section.builder("attributes", "Attributes, one card each");
        s.text("Each card shows the attribute's labels, how many listings carry it, agreement and feedback figures where "
                + "measured, its flags with the figure and threshold that raised them, and a few evidence lines.");
        List<Concept> all = new ArrayList<>(vocab.facets());
        all.addAll(vocab.concepts());
        for (Concept c : all) {
            s.add(card(c));
        }
        return s.build();
    }

    private AttributeCard card(Concept c) {
        List<String> other = new ArrayList<>();
        for (ConceptLabel l : c.labels()) {
            if (l.kind() != LabelKind.PREFERRED) {
                other.add(l.label().text() + (l.kind() == LabelKind.HIDDEN ? " (hidden)" : ""));
            }
        }
        List<Measure> measures = new ArrayList<>();
        Optional<CoverageConcept> cc = cov.concepts().stream().filter(x -> x.conceptId().equals(c.id())).findFirst();
        cc.ifPresent(x -> {
            measures.add(new Measure("listings", x.listings(), ValueKind.COUNT, "listings whose text states it"));
            measures.add(new Measure("coverage", x.share(), ValueKind.SHARE, "of the " + x.applicable() + " listings its facet applies to"));
        });
        cov.facets().stream().filter(f -> f.facetId().equals(c.id())).findFirst().ifPresent(f -> measures.add(
                new Measure("fill rate", f.overall().rate(), ValueKind.SHARE, f.overall().filled() + " of "
                        + f.overall().applicable() + " applicable listings carry a value")));
        if (agreement != null) {
            agreement.attribute(c.id()).filter(a -> a.alpha().defined()).ifPresent(a -> measures.add(Measure.alpha(a)));
        }
        List<EvidenceLine> lines = new ArrayList<>(evidence.getOrDefault(c.id(), List.of()));
        int total = evidenceTotal.getOrDefault(c.id(), 0);
        if (consistency != null) {
            consistency.attribute(c.id()).ifPresent(a -> {
                measures.add(new Measure("feedback mentions", a.mentions(), ValueKind.COUNT, "sentences naming it"));
                if (!Double.isNaN(a.hedgeRate())) {
                    measures.add(new Measure("hedged", a.hedgeRate(), ValueKind.SHARE, "of its mentions carry a hedge"));
                }
                if (a.grounding().checked() > 0 && !Double.isNaN(a.grounding().precision())) {
                    measures.add(new Measure("grounding", a.grounding().precision(), ValueKind.SHARE,
                            "of " + a.grounding().checked() + " checked mentions agree with the catalog"));
                }
            });
            int added = 0;
            for (FeedbackMention m : consistency.mentions()) {
                if (added == FEEDBACK_PER_CARD) {
                    break;
                }
                if (c.id().equals(m.conceptId()) || c.id().equals(m.attribute())) {
                    String sen = m.sentence();
                    int st = Math.min(m.start(), sen.length());
                    int en = Math.max(st, Math.min(m.end(), sen.length()));
                    lines.add(new EvidenceLine(m.targetId(), "feedback", m.pairId(), "feedback", "", sen.substring(0, st),
                            sen.substring(st, en), sen.substring(en), st, en));
                    added++;
                    total++;
                }
            }
        }
        List<ReportFlag> rf = new ArrayList<>();
        String review = "";
        Optional<FlaggedAttribute> fa = flags.flags(c.id());
        if (fa.isPresent()) {
            for (Flag x : fa.get().flags()) {
                if (x.kind() == dev.sheaf.miner.measure.FlagKind.CLAIM) {
                    review = x.explanation();
                    continue;
                }
                reportFlag(x).ifPresent(rf::add);
            }
        }
        String facet = c.isFacet() ? "" : facetLabel(c.id());
        return new AttributeCard(c.id(), c.displayLabel(vocab.scheme().defaultLanguage()), facet, other, measures, rf, review,
                lines, Math.max(total, lines.size()));
    }

    // ---------------------------------------------------------------- helpers

    static Optional<FlagKind> reportKind(dev.sheaf.miner.measure.FlagKind k) {
        if (k == dev.sheaf.miner.measure.FlagKind.CLAIM) {
            return Optional.empty();
        }
        return Optional.of(FlagKind.valueOf(k.name()));
    }

    /** A measured flag as the card shows it, with its figure and edge; empty for claims. */
    static Optional<ReportFlag> reportFlag(Flag x) {
        Optional<FlagKind> k = reportKind(x.kind());
        if (k.isEmpty()) {
            return Optional.empty();
        }
        String crit = x.criterion().toLowerCase(Locale.ROOT);
        ValueKind scale = crit.contains("alpha") || crit.contains("kappa") || crit.contains("jaccard") ? ValueKind.COEFFICIENT
                : Math.abs(x.figure()) <= 1 && Math.abs(x.threshold()) <= 1 ? ValueKind.SHARE : ValueKind.COUNT;
        Comparison cmp;
        double edge = x.threshold();
        switch (x.comparison()) {
            case "<" -> cmp = Comparison.BELOW;
            case ">" -> cmp = Comparison.ABOVE;
            default -> {
                cmp = Comparison.AT_OR_ABOVE;
                edge = Math.min(x.figure(), x.threshold());
            }
        }
        if (!cmp.holds(x.figure(), edge)) {
            cmp = Comparison.AT_OR_ABOVE;
            edge = x.figure();
        }
        return Optional.of(new ReportFlag(k.get(), x.criterion(), x.figure(), scale, cmp, edge, x.thresholdKey(),
                x.explanation()));
    }

    private String label(String id) {
        return vocab.concept(id).map(c -> c.displayLabel(vocab.scheme().defaultLanguage())).orElse(id);
    }

    private String facetLabel(String id) {
        Optional<Concept> c = vocab.concept(id);
        if (c.isEmpty()) {
            return "other";
        }
        if (c.get().isFacet()) {
            return label(id);
        }
        return cov.concepts().stream().filter(x -> x.conceptId().equals(id)).findFirst().map(x -> label(x.facetId()))
                .orElse("other");
    }
}
