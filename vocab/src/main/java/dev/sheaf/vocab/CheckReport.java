package dev.sheaf.vocab;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.Comparator;
import java.util.List;

/** The findings of one check, errors first; renders as text or JSON. */
public final class CheckReport {
    private static final Comparator<Finding> ORDER = Comparator.comparing(Finding::severity)
            .thenComparing(f -> f.rule().id())
            .thenComparing(Finding::concepts, CheckReport::compareLists)
            .thenComparing(Finding::subject);

    private static int compareLists(List<String> a, List<String> b) {
        for (int i = 0; i < Math.min(a.size(), b.size()); i++) {
            int c = a.get(i).compareTo(b.get(i));
            if (c != 0) {
                return c;
            }
        }
        return Integer.compare(a.size(), b.size());
    }

    private final List<Finding> findings;

    public CheckReport(List<Finding> findings) {
        this.findings = findings.stream().sorted(ORDER).toList();
    }

    public List<Finding> findings() {
        return findings;
    }

    public long count(Severity s) {
        return findings.stream().filter(f -> f.severity() == s).count();
    }

    public boolean hasErrors() {
        return count(Severity.ERROR) > 0;
    }

    /** Findings of one rule. */
    public List<Finding> of(Rule r) {
        return findings.stream().filter(f -> f.rule() == r).toList();
    }

    /** One line of counts: "2 errors, 1 warning, 0 notes". */
    public String summary() {
        return plural(count(Severity.ERROR), "error") + ", " + plural(count(Severity.WARNING), "warning") + ", "
                + plural(count(Severity.INFO), "note");
    }

    private static String plural(long n, String w) {
        return n + " " + w + (n == 1 ? "" : "s");
    }

    /** Plain text for a terminal: one block per finding, then the summary. */
    public void writeText(Appendable out, String source) throws IOException {
        out.append(source).append(": ").append(summary()).append('\n');
        for (Finding f : findings) {
            out.append('\n');
            out.append(String.format(java.util.Locale.ROOT, "%-7s %s: %s%n", f.severity().word(), f.rule().id(), f.message()));
            if (!f.concepts().isEmpty()) {
                out.append("        concepts: ").append(String.join(", ", f.concepts())).append('\n');
            }
            out.append("        fix: ").append(f.hint()).append('\n');
            out.append("        source: ").append(f.rule().standard()).append('\n');
        }
    }

    /** JSON: {"source", "errors", "warnings", "notes", "findings": [{rule, severity, standard, concepts, subject, message, hint}]}. */
    public String toJson(String source) {
        ObjectMapper om = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = om.createObjectNode();
        root.put("source", source);
        root.put("errors", count(Severity.ERROR));
        root.put("warnings", count(Severity.WARNING));
        root.put("notes", count(Severity.INFO));
        ArrayNode arr = root.putArray("findings");
        for (Finding f : findings) {
            ObjectNode n = arr.addObject();
            n.put("rule", f.rule().id());
            n.put("severity", f.severity().word());
            n.put("standard", f.rule().standard());
            ArrayNode cs = n.putArray("concepts");
            f.concepts().forEach(cs::add);
            n.put("subject", f.subject());
            n.put("message", f.message());
            n.put("hint", f.hint());
        }
        try {
            return om.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }
}
