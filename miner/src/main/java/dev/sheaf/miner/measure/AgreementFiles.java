package dev.sheaf.miner.measure;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * Writes an {@link AgreementReport} as files, each atomically: {@value #ATTRIBUTES_CSV} (one row per
 * attribute), {@value #ANNOTATORS_CSV} (one row per attribute and annotator), {@value #PROBLEMS_CSV}
 * (rows left out; header only when none) and {@value #JSON} (everything, with the pairwise kappas).
 * Figures that are undefined are empty cells in CSV and {@code null} in JSON. Annotators appear only
 * as pseudonyms.
 */
public final class AgreementFiles {
    public static final String ATTRIBUTES_CSV = "agreement.csv";
    public static final String ANNOTATORS_CSV = "annotators.csv";
    public static final String PROBLEMS_CSV = "problems.csv";
    public static final String JSON = "agreement.json";
    /** The format name and version in {@value #JSON}. */
    public static final String FORMAT = "sheaf-agreement";
    public static final int FORMAT_VERSION = 1;

    private static final ObjectMapper JSON_MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private AgreementFiles() {
    }

    /** Writes the four files into {@code dir} (created when missing); returns their paths. */
    public static List<Path> write(AgreementReport report, Path dir) throws IOException {
        Path problems = dir.resolve(PROBLEMS_CSV);
        Path annotators = dir.resolve(ANNOTATORS_CSV);
        Path attributes = dir.resolve(ATTRIBUTES_CSV);
        Path json = dir.resolve(JSON);
        writeProblems(report, problems);
        writeAnnotators(report, annotators);
        writeAttributes(report, attributes);
        AtomicFiles.writeString(json, JSON_MAPPER.writeValueAsString(toJson(report)) + "\n");
        return List.of(attributes, annotators, problems, json);
    }

    private static void writeAttributes(AgreementReport report, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row("attribute", "scale", "metric", "metric_set_by", "items", "judgments", "annotators",
                    "pairable_items", "pairable_judgments", "alpha", "alpha_low", "alpha_high", "confidence",
                    "replicates_usable", "verdict", "observed_agreement", "fleiss_kappa", "fleiss_band", "fleiss_items",
                    "fleiss_judgments_per_item", "mean_cohen_kappa", "mean_cohen_band", "notes");
            for (AgreementAttribute a : report.attributes()) {
                KrippendorffResult k = a.alpha();
                BootstrapInterval ci = a.alphaInterval();
                FleissResult f = a.fleiss();
                csv.row(a.attribute(), a.scale(), a.metric().label(), a.metricFromOptions() ? "option" : "auto", a.items(),
                        a.judgments(), a.annotators(), k.pairableUnits(), k.pairableValues(), k.alpha(), ci.low(),
                        ci.high(), ci.level(), ci.usable(), a.verdict().label(), a.observedAgreement(), f.kappa(),
                        f.band().label(), f.items(), f.judgmentsPerItem(), a.meanCohenKappa(), a.meanCohenBand().label(),
                        String.join("; ", a.allNotes()));
            }
            csv.flush();
        });
    }

    private static void writeAnnotators(AgreementReport report, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row("attribute", "annotator", "judgments", "partners", "comparisons", "agreements", "pairwise_agreement",
                    "mean_cohen_kappa", "mean_cohen_band", "alpha_all", "alpha_without", "alpha_change");
            for (AgreementAnnotator r : report.annotators()) {
                csv.row(r.attribute(), r.annotator(), r.judgments(), r.partners(), r.comparisons(), r.agreements(),
                        r.pairwiseAgreement(), r.meanCohenKappa(), r.meanCohenBand().label(), r.alphaAll(),
                        r.alphaWithout(), r.alphaChange());
            }
            csv.flush();
        });
    }

    private static void writeProblems(AgreementReport report, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row("source", "row", "kind", "reason");
            for (JudgmentProblem p : report.problems()) {
                csv.row(p.source(), p.row(), p.kind(), p.reason());
            }
            csv.flush();
        });
    }

    /** The report as a JSON tree (what {@value #JSON} holds). */
    public static ObjectNode toJson(AgreementReport report) {
        ObjectNode root = JSON_MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", FORMAT_VERSION);
        root.put("source", report.source());
        root.put("judgmentsRead", report.judgmentsRead());
        root.put("judgmentsUsed", report.judgmentsUsed());
        root.put("problems", report.problems().size());
        ObjectNode boot = root.putObject("bootstrap");
        boot.put("method", BootstrapInterval.METHOD);
        boot.put("replicates", report.replicates());
        boot.put("confidence", report.confidence());
        boot.put("seed", report.seed());
        ObjectNode thresholds = root.putObject("thresholds");
        for (Map.Entry<String, Double> e : report.thresholds().asMap().entrySet()) {
            thresholds.put(e.getKey(), e.getValue());
        }
        ArrayNode notes = root.putArray("notes");
        report.notes().forEach(notes::add);
        ArrayNode attributes = root.putArray("attributes");
        for (AgreementAttribute a : report.attributes()) {
            ObjectNode n = attributes.addObject();
            n.put("attribute", a.attribute());
            n.put("scale", a.scale());
            n.put("metric", a.metric().label());
            n.put("metricSetBy", a.metricFromOptions() ? "option" : "auto");
            ObjectNode values = n.putObject("values");
            a.values().forEach(values::put);
            n.put("items", a.items());
            n.put("judgments", a.judgments());
            n.put("annotators", a.annotators());
            KrippendorffResult k = a.alpha();
            ObjectNode alpha = n.putObject("alpha");
            number(alpha, "value", k.alpha());
            alpha.put("undefinedReason", k.undefinedReason().isEmpty() ? null : k.undefinedReason());
            alpha.put("pairableItems", k.pairableUnits());
            alpha.put("pairableJudgments", k.pairableValues());
            number(alpha, "observedDisagreement", k.observedDisagreement());
            number(alpha, "expectedDisagreement", k.expectedDisagreement());
            BootstrapInterval ci = a.alphaInterval();
            number(alpha, "low", ci.low());
            number(alpha, "high", ci.high());
            alpha.put("replicatesUsable", ci.usable());
            alpha.put("seed", ci.seed());
            n.put("verdict", a.verdict().label());
            number(n, "observedAgreement", a.observedAgreement());
            FleissResult f = a.fleiss();
            ObjectNode fleiss = n.putObject("fleissKappa");
            number(fleiss, "value", f.kappa());
            fleiss.put("band", f.band().label());
            fleiss.put("items", f.items());
            fleiss.put("judgmentsPerItem", f.judgmentsPerItem());
            fleiss.put("itemsLeftOut", f.itemsLeftOut());
            fleiss.put("note", f.note());
            number(n, "meanCohenKappa", a.meanCohenKappa());
            n.put("meanCohenBand", a.meanCohenBand().label());
            ArrayNode pairs = n.putArray("pairs");
            for (CohenPair p : a.pairs()) {
                ObjectNode pn = pairs.addObject();
                pn.put("annotatorA", p.annotatorA());
                pn.put("annotatorB", p.annotatorB());
                pn.put("items", p.items());
                number(pn, "agreement", p.agreement());
                number(pn, "cohenKappa", p.kappa());
                pn.put("band", p.band().label());
            }
            ArrayNode an = n.putArray("notes");
            a.allNotes().forEach(an::add);
        }
        ArrayNode annotators = root.putArray("annotators");
        for (AgreementAnnotator r : report.annotators()) {
            ObjectNode n = annotators.addObject();
            n.put("attribute", r.attribute());
            n.put("annotator", r.annotator());
            n.put("judgments", r.judgments());
            n.put("partners", r.partners());
            n.put("comparisons", r.comparisons());
            n.put("agreements", r.agreements());
            number(n, "pairwiseAgreement", r.pairwiseAgreement());
            number(n, "meanCohenKappa", r.meanCohenKappa());
            n.put("meanCohenBand", r.meanCohenBand().label());
            number(n, "alphaAll", r.alphaAll());
            number(n, "alphaWithout", r.alphaWithout());
            number(n, "alphaChange", r.alphaChange());
        }
        ArrayNode overview = root.putArray("overview");
        for (AgreementAnnotatorOverview o : report.overview()) {
            ObjectNode n = overview.addObject();
            n.put("annotator", o.annotator());
            n.put("attributes", o.attributes());
            n.put("judgments", o.judgments());
            n.put("comparisons", o.comparisons());
            number(n, "pairwiseAgreement", o.pairwiseAgreement());
            number(n, "meanCohenKappa", o.meanCohenKappa());
            n.put("meanCohenBand", o.meanCohenBand().label());
            number(n, "largestAlphaRise", o.largestAlphaRise());
            n.put("largestRiseAttribute", o.largestRiseAttribute());
        }
        ArrayNode problems = root.putArray("problemRows");
        for (JudgmentProblem p : report.problems()) {
            ObjectNode n = problems.addObject();
            n.put("source", p.source());
            n.put("row", p.row());
            n.put("kind", p.kind());
            n.put("reason", p.reason());
        }
        return root;
    }

    private static void number(ObjectNode n, String key, double v) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            n.putNull(key);
        } else {
            n.put(key, v);
        }
    }
}
