package dev.sheaf.miner.suggest;

import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectWriter;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Writes suggestions: {@code suggestions.json} (format {@value #FORMAT}, version {@value #FORMAT_VERSION}:
 * merges and parents with every support, figure and evidence line; pretty-printed, LF line ends, stable
 * order) and {@code suggestions.csv} (one row per merge or parent, for spreadsheets; every cell through
 * {@link SafeCsv}). Both are written atomically.
 */
public final class SuggestionFiles {
    public static final String FORMAT = "sheaf-suggestions";
    public static final int FORMAT_VERSION = 1;
    public static final String JSON = "suggestions.json";
    public static final String CSV = "suggestions.csv";
    /** Columns of suggestions.csv. */
    public static final List<String> CSV_HEADER = List.of("rank", "type", "kind", "score", "members", "concepts", "supported_by",
            "reason", "counts", "evidence");

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final ObjectWriter WRITER;

    static {
        DefaultIndenter lf = new DefaultIndenter("  ", "\n");
        WRITER = MAPPER.writer(new DefaultPrettyPrinter().withObjectIndenter(lf).withArrayIndenter(lf));
    }

    private SuggestionFiles() {
    }

    /** Writes both files into {@code dir} (which must exist). */
    public static void write(List<Suggestion> merges, List<HierarchySuggestion> parents, Path dir) throws IOException {
        writeJson(merges, parents, dir.resolve(JSON));
        writeCsv(merges, parents, dir.resolve(CSV));
    }

    public static void writeJson(List<Suggestion> merges, List<HierarchySuggestion> parents, Path file) throws IOException {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("formatVersion", FORMAT_VERSION);
        ArrayNode m = root.putArray("merges");
        for (Suggestion s : merges) {
            ObjectNode o = m.addObject();
            o.put("kind", s.kind().word());
            o.put("score", s.score());
            ArrayNode ms = o.putArray("members");
            for (Suggestion.Member x : s.members()) {
                ObjectNode mo = ms.addObject();
                mo.put("term", x.term());
                mo.put("shown", x.shown());
                mo.put("concept", x.conceptId());
                mo.put("frequency", x.frequency());
                mo.put("df", x.df());
            }
            o.put("reason", s.reason());
            ArrayNode sup = o.putArray("support");
            for (Suggestion.Support x : s.support()) {
                ObjectNode so = sup.addObject();
                so.put("kind", x.kind().word());
                so.put("score", x.score());
                so.put("reason", x.reason());
                ObjectNode fig = so.putObject("figures");
                for (Map.Entry<String, Double> f : x.figures().entrySet()) {
                    fig.put(f.getKey(), f.getValue());
                }
            }
            evidence(o, s.evidence());
        }
        ArrayNode h = root.putArray("parents");
        for (HierarchySuggestion s : parents) {
            ObjectNode o = h.addObject();
            o.put("kind", s.kind().word());
            o.put("score", s.score());
            node(o.putObject("parent"), s.parent());
            node(o.putObject("child"), s.child());
            o.put("reason", s.reason());
            ObjectNode c = o.putObject("counts");
            c.put("parentListings", s.counts().parentListings());
            c.put("childListings", s.counts().childListings());
            c.put("bothListings", s.counts().bothListings());
            evidence(o, s.evidence());
        }
        AtomicFiles.write(file, out -> {
            WRITER.without(com.fasterxml.jackson.core.JsonGenerator.Feature.AUTO_CLOSE_TARGET).writeValue(out, root);
            out.write('\n');
        });
    }

    private static void node(ObjectNode o, HierarchySuggestion.Node n) {
        o.put("term", n.term());
        o.put("shown", n.shown());
        o.put("concept", n.conceptId());
        o.put("facet", n.facet());
    }

    private static void evidence(ObjectNode o, List<EvidenceLine> lines) {
        ArrayNode ev = o.putArray("evidence");
        for (EvidenceLine e : lines) {
            ObjectNode eo = ev.addObject();
            eo.put("listing", e.listingId());
            eo.put("source", e.source());
            eo.put("locator", e.locator());
            eo.put("field", e.field());
            eo.put("key", e.key());
            eo.put("left", e.left());
            eo.put("match", e.match());
            eo.put("right", e.right());
        }
    }

    public static void writeCsv(List<Suggestion> merges, List<HierarchySuggestion> parents, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row(CSV_HEADER);
            int rank = 0;
            for (Suggestion s : merges) {
                List<String> ms = new ArrayList<>();
                List<String> counts = new ArrayList<>();
                for (Suggestion.Member m : s.members()) {
                    ms.add(m.shown());
                    counts.add(m.term() + " (" + m.frequency() + ", df " + m.df() + ")");
                }
                List<String> kinds = new ArrayList<>();
                s.support().forEach(x -> kinds.add(x.kind().word() + " " + fixed(x.score())));
                csv.row(++rank, "merge", s.kind().word(), fixed(s.score()), String.join(" | ", ms), String.join(" | ", s.conceptIds()),
                        String.join("; ", kinds), s.reason(), String.join("; ", counts), s.evidence().isEmpty() ? "" : s.evidence().get(0).oneLine());
            }
            rank = 0;
            for (HierarchySuggestion s : parents) {
                String concepts = (s.parent().conceptId() == null ? "" : s.parent().conceptId()) + " > "
                        + (s.child().conceptId() == null ? "" : s.child().conceptId());
                csv.row(++rank, "parent", s.kind().word(), fixed(s.score()), s.parent().shown() + " > " + s.child().shown(),
                        concepts.equals(" > ") ? "" : concepts, s.kind().word(), s.reason(),
                        String.format(Locale.ROOT, "parent %d, child %d, both %d", s.counts().parentListings(), s.counts().childListings(),
                                s.counts().bothListings()), s.evidence().isEmpty() ? "" : s.evidence().get(0).oneLine());
            }
            csv.flush();
        });
    }

    /** Two decimals, Locale.ROOT. */
    static String fixed(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }

}
