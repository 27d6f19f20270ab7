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
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * Writes a {@link ConsistencyReport} and its {@link FlagReport} as files, each atomically and every
 * CSV through {@link SafeCsv}:
 * <ul>
 *   <li>{@value #ATTRIBUTES_CSV}: one row per attribute (mentioned in feedback or flagged), figures and flags;</li>
 *   <li>{@value #CONTRADICTIONS_CSV}: one row per person in each contradictory pair, with the sentence;</li>
 *   <li>{@value #GAPS_CSV}: feedback words and phrases no label covers, ranked;</li>
 *   <li>{@value #MENTIONS_CSV}: every mention with its direction, hedge, comparison and grounding;</li>
 *   <li>{@value #PROBLEMS_CSV}: feedback rows left out (header only when none);</li>
 *   <li>{@value #JSON}: everything above, with the flags' evidence, thresholds and their sources.</li>
 * </ul>
 * Undefined figures are empty cells in CSV and {@code null} in JSON. People appear only as pseudonyms.
 */
public final class ConsistencyFiles {
    public static final String ATTRIBUTES_CSV = "consistency.csv";
    public static final String CONTRADICTIONS_CSV = "contradictions.csv";
    public static final String GAPS_CSV = "vocabulary-gaps.csv";
    public static final String MENTIONS_CSV = "mentions.csv";
    public static final String PROBLEMS_CSV = "problems.csv";
    public static final String JSON = "consistency.json";
    /** The format name and version in {@value #JSON}. */
    public static final String FORMAT = "sheaf-consistency";
    public static final int FORMAT_VERSION = 1;
    /** Surface forms listed per attribute in the CSV (the JSON has all). */
    static final int CSV_FORMS = 10;

    private static final ObjectMapper JSON_MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ConsistencyFiles() {
    }

    /** Writes the files into {@code dir} (created when missing); returns their paths. */
    public static List<Path> write(ConsistencyReport report, FlagReport flags, Path dir) throws IOException {
        Path problems = dir.resolve(PROBLEMS_CSV);
        Path mentions = dir.resolve(MENTIONS_CSV);
        Path gaps = dir.resolve(GAPS_CSV);
        Path contradictions = dir.resolve(CONTRADICTIONS_CSV);
        Path attributes = dir.resolve(ATTRIBUTES_CSV);
        Path json = dir.resolve(JSON);
        writeProblems(report, problems);
        writeMentions(report, mentions);
        writeGaps(report, gaps);
        writeContradictions(report, contradictions);
        writeAttributes(report, flags, attributes);
        AtomicFiles.writeString(json, JSON_MAPPER.writeValueAsString(toJson(report, flags)) + "\n");
        return List.of(attributes, contradictions, gaps, mentions, problems, json);
    }

    /** One row per attribute: the feedback figures where people mentioned it, and every flag. */
    static List<Row> rows(ConsistencyReport report, FlagReport flags) {
        Map<String, Row> rows = new TreeMap<>();
        for (ConsistencyAttribute a : report.attributes()) {
            rows.put(a.attribute(), new Row(a.attribute(), a.label(), a, null));
        }
        if (flags != null) {
            for (FlaggedAttribute f : flags.flagged()) {
                Row r = rows.get(f.attribute());
                rows.put(f.attribute(), new Row(f.attribute(), r == null ? f.label() : r.label(), r == null ? null : r.feedback(), f));
            }
        }
        return new ArrayList<>(rows.values());
    }

    /** An attribute's feedback figures (or null) and flags (or null). */
    record Row(String attribute, String label, ConsistencyAttribute feedback, FlaggedAttribute flags) {
        String flagKinds() {
            if (flags == null) {
                return "";
            }
            List<String> k = new ArrayList<>();
            flags.kinds().forEach(x -> k.add(x.label()));
            return String.join(" ", k);
        }
    }

    private static void writeAttributes(ConsistencyReport report, FlagReport flags, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row("attribute", "label", "kind", "mentions", "sentences", "share", "more", "less", "present", "absent",
                    "hedged", "hedge_rate", "comparative", "comparative_share", "negated", "excessive", "ambiguous",
                    "distinct_forms", "surface_entropy_bits", "surface_forms", "unused_labels", "pairs_mentioned",
                    "pairs_judged", "direction_agreement", "contradictory_pairs", "contradiction_share", "direction_alpha",
                    "presence_checked", "presence_grounded", "presence_precision", "contrast_rate", "comparison_checked",
                    "comparison_grounded", "comparison_precision", "unchecked", "grounding_precision", "grounded_share",
                    "flags", "flag_details");
            for (Row r : rows(report, flags)) {
                List<Object> cells = new ArrayList<>();
                cells.add(r.attribute());
                cells.add(r.label());
                ConsistencyAttribute a = r.feedback();
                if (a == null) {
                    cells.add("");
                    for (int i = 0; i < 34; i++) {
                        cells.add(null);
                    }
                } else {
                    ConsistencyAgreement g = a.agreement();
                    GroundingSummary s = a.grounding();
                    cells.addAll(List.of(a.kind(), a.mentions(), a.sentences(), a.share(), a.directions().get(Direction.MORE),
                            a.directions().get(Direction.LESS), a.directions().get(Direction.PRESENT),
                            a.directions().get(Direction.ABSENT), a.hedged(), a.hedgeRate(), a.comparative(),
                            a.comparativeShare(), a.negated(), a.excessive(), a.ambiguous(), a.surfaceForms().distinct(),
                            a.surfaceForms().entropyBits(), a.surfaceForms().top(CSV_FORMS), String.join("; ", a.unusedLabels()),
                            g.pairsMentioned(), g.pairsJudged(), g.meanAgreement(), g.contradictoryPairs(),
                            g.contradictionShare(), g.alpha().alpha(), s.presenceChecked(), s.presenceGrounded(),
                            s.presencePrecision(), s.contrastRate(), s.comparisonChecked(), s.comparisonGrounded(),
                            s.comparisonPrecision(), s.unchecked(), s.precision(), s.groundedShare()));
                }
                cells.add(r.flagKinds());
                cells.add(details(r.flags()));
                csv.row(cells.stream().map(c -> c == null ? "" : c).toList());
            }
            csv.flush();
        });
    }

    private static String details(FlaggedAttribute f) {
        if (f == null) {
            return "";
        }
        List<String> out = new ArrayList<>();
        for (Flag x : f.flags()) {
            out.add(x.kind().label() + ": " + x.criterion() + " " + SafeCsv.formatDouble(x.figure())
                    + (x.comparison().equals("is") ? "" : " " + x.comparison() + " " + SafeCsv.formatDouble(x.threshold())));
        }
        return String.join("; ", out);
    }

    private static void writeContradictions(ConsistencyReport report, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row("attribute", "pair_id", "reference_id", "target_id", "kind", "annotator", "direction", "row", "surface",
                    "sentence");
            for (ConsistencyContradiction c : report.contradictions()) {
                for (ConsistencyContradiction.Side s : c.sides()) {
                    csv.row(c.attribute(), c.pairId(), c.referenceId(), c.targetId(), c.kind(), s.annotator(),
                            s.direction().name().toLowerCase(Locale.ROOT), s.row(), s.surface(), s.sentence());
                }
            }
            csv.flush();
        });
    }

    private static void writeGaps(ConsistencyReport report, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row("rank", "term", "words", "frequency", "sentences", "example_row", "example");
            int rank = 0;
            for (GapTerm g : report.gaps()) {
                csv.row(++rank, g.term(), g.words(), g.frequency(), g.sentences(), g.exampleRow(), g.example());
            }
            csv.flush();
        });
    }

    private static void writeMentions(ConsistencyReport report, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row("row", "pair_id", "reference_id", "target_id", "annotator", "attribute", "concept", "also_concepts",
                    "surface", "start", "end", "via", "label", "read", "direction", "comparative", "hedged", "negated",
                    "excessive", "scale_facet", "grounding", "grounding_kind", "target_value", "reference_value", "contrast",
                    "grounding_reason");
            for (FeedbackMention m : report.mentions()) {
                GroundingCheck g = m.grounding();
                csv.row(m.row(), m.pairId(), m.referenceId(), m.targetId(), m.annotator(), m.attribute(),
                        m.conceptId() == null ? "" : m.conceptId(), String.join(" ", m.alsoConcepts()), m.surface(), m.start(),
                        m.end(), m.via(), m.label() == null ? "" : m.label(), m.read().name().toLowerCase(Locale.ROOT),
                        m.directionWord(), m.comparative(), m.hedged(), m.negated(), m.excessive(),
                        m.scaleFacet() == null ? "" : m.scaleFacet(), g.outcome().word(), g.kind(),
                        g.targetValue() == null ? "" : g.targetValue(), g.referenceValue() == null ? "" : g.referenceValue(),
                        g.contrast() == null ? "" : g.contrast(), g.reason());
            }
            csv.flush();
        });
    }

    private static void writeProblems(ConsistencyReport report, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row("source", "row", "kind", "reason");
            for (FeedbackProblem p : report.problems()) {
                csv.row(p.source(), p.row(), p.kind(), p.reason());
            }
            csv.flush();
        });
    }

    /** The report and flags as a JSON tree (what {@value #JSON} holds). */
    public static ObjectNode toJson(ConsistencyReport report, FlagReport flags) {
        ObjectNode root = JSON_MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", FORMAT_VERSION);
        root.put("source", report.source());
        root.put("rowsRead", report.rowsRead());
        root.put("sentences", report.sentences());
        root.put("pairs", report.pairs());
        root.put("annotators", report.annotators());
        root.put("sentencesWithMentions", report.sentencesWithMentions());
        root.put("mentions", report.mentions().size());
        root.put("problems", report.problems().size());
        root.put("scales", report.scalesSource());
        root.put("catalogGiven", report.catalogGiven());
        ArrayNode notes = root.putArray("notes");
        report.notes().forEach(notes::add);
        if (flags != null) {
            flags.notes().forEach(notes::add);
            ObjectNode th = root.putObject("thresholds");
            for (Map.Entry<String, Double> e : flags.thresholds().asMap().entrySet()) {
                ObjectNode t = th.putObject(e.getKey());
                t.put("value", e.getValue());
                t.put("source", FlagThresholds.SOURCES.get(e.getKey()));
            }
        }
        ArrayNode attributes = root.putArray("attributes");
        for (Row r : rows(report, flags)) {
            ObjectNode n = attributes.addObject();
            n.put("attribute", r.attribute());
            n.put("label", r.label());
            if (r.feedback() == null) {
                n.putNull("feedback");
            } else {
                n.set("feedback", feedback(r.feedback()));
            }
            ArrayNode fl = n.putArray("flags");
            if (r.flags() != null) {
                for (Flag f : r.flags().flags()) {
                    fl.add(flag(f));
                }
            }
        }
        ArrayNode contradictions = root.putArray("contradictions");
        for (ConsistencyContradiction c : report.contradictions()) {
            ObjectNode n = contradictions.addObject();
            n.put("attribute", c.attribute());
            n.put("pairId", c.pairId());
            n.put("referenceId", c.referenceId());
            n.put("targetId", c.targetId());
            n.put("kind", c.kind());
            ArrayNode sides = n.putArray("sides");
            for (ConsistencyContradiction.Side s : c.sides()) {
                sides.addObject().put("annotator", s.annotator()).put("direction", s.direction().name().toLowerCase(Locale.ROOT))
                        .put("row", s.row()).put("surface", s.surface()).put("sentence", s.sentence());
            }
        }
        ArrayNode gaps = root.putArray("vocabularyGaps");
        for (GapTerm g : report.gaps()) {
            gaps.addObject().put("term", g.term()).put("words", g.words()).put("frequency", g.frequency())
                    .put("sentences", g.sentences()).put("exampleRow", g.exampleRow()).put("example", g.example());
        }
        ArrayNode unmentioned = root.putArray("unmentionedConcepts");
        report.unmentioned().forEach(unmentioned::add);
        ArrayNode problems = root.putArray("problemRows");
        for (FeedbackProblem p : report.problems()) {
            problems.addObject().put("source", p.source()).put("row", p.row()).put("kind", p.kind()).put("reason", p.reason());
        }
        return root;
    }

    private static ObjectNode feedback(ConsistencyAttribute a) {
        ObjectNode n = JSON_MAPPER.createObjectNode();
        n.put("kind", a.kind());
        n.put("mentions", a.mentions());
        n.put("sentences", a.sentences());
        number(n, "share", a.share());
        ObjectNode d = n.putObject("directions");
        a.directions().forEach((k, v) -> d.put(k.name().toLowerCase(Locale.ROOT), v));
        n.put("hedged", a.hedged());
        number(n, "hedgeRate", a.hedgeRate());
        n.put("comparative", a.comparative());
        number(n, "comparativeShare", a.comparativeShare());
        n.put("negated", a.negated());
        n.put("excessive", a.excessive());
        n.put("ambiguous", a.ambiguous());
        ObjectNode sf = n.putObject("surfaceForms");
        number(sf, "entropyBits", a.surfaceForms().entropyBits());
        ArrayNode forms = sf.putArray("forms");
        for (SurfaceForms.Form f : a.surfaceForms().forms()) {
            forms.addObject().put("form", f.form()).put("count", f.count());
        }
        ArrayNode unused = n.putArray("unusedLabels");
        a.unusedLabels().forEach(unused::add);
        ConsistencyAgreement g = a.agreement();
        ObjectNode ag = n.putObject("agreement");
        ag.put("pairsMentioned", g.pairsMentioned());
        ag.put("pairsJudged", g.pairsJudged());
        number(ag, "meanAgreement", g.meanAgreement());
        ag.put("contradictoryPairs", g.contradictoryPairs());
        number(ag, "contradictionShare", g.contradictionShare());
        ag.put("selfContradictions", g.selfContradictions());
        number(ag, "alpha", g.alpha().alpha());
        if (!g.alpha().defined()) {
            ag.put("alphaUndefined", g.alpha().undefinedReason());
        }
        GroundingSummary s = a.grounding();
        ObjectNode gr = n.putObject("grounding");
        gr.put("presenceChecked", s.presenceChecked());
        gr.put("presenceGrounded", s.presenceGrounded());
        number(gr, "presencePrecision", s.presencePrecision());
        gr.put("contrastKnown", s.contrastKnown());
        gr.put("contrasts", s.contrasts());
        number(gr, "contrastRate", s.contrastRate());
        gr.put("comparisonChecked", s.comparisonChecked());
        gr.put("comparisonGrounded", s.comparisonGrounded());
        number(gr, "comparisonPrecision", s.comparisonPrecision());
        gr.put("unchecked", s.unchecked());
        number(gr, "precision", s.precision());
        number(gr, "groundedShare", s.groundedShare());
        return n;
    }

    private static ObjectNode flag(Flag f) {
        ObjectNode n = JSON_MAPPER.createObjectNode();
        n.put("kind", f.kind().label());
        n.put("criterion", f.criterion());
        number(n, "figure", f.figure());
        number(n, "threshold", f.threshold());
        n.put("comparison", f.comparison());
        n.put("thresholdKey", f.thresholdKey());
        n.put("explanation", f.explanation());
        ArrayNode ev = n.putArray("evidence");
        for (FlagEvidence e : f.evidence()) {
            ev.addObject().put("kind", e.kind()).put("text", e.text()).put("where", e.where());
        }
        return n;
    }

    private static void number(ObjectNode n, String key, double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            n.putNull(key);
        } else {
            n.put(key, v);
        }
    }
}
