package dev.sheaf.vocab.csv;

import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Mapping;
import dev.sheaf.vocab.MatchKind;
import dev.sheaf.vocab.Provenance;
import dev.sheaf.vocab.Retired;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.TreeSet;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * A vocabulary as a spreadsheet: one row per concept (facets first, then values, then retired
 * ids), every cell through {@link SafeCsv} (formula injection neutralised on export, the
 * neutralising {@code '} removed again on import, so the round trip is exact).
 *
 * <p>Columns: {@code id, type (facet|concept|retired), broader, related, replacedBy}, then per
 * language (the default first) {@code prefLabel@LANG, altLabels@LANG, hiddenLabels@LANG,
 * scopeNote@LANG, definition@LANG}, then {@code valueKind, multiValued, categories, unit,
 * buckets, regulatedClaim, mappings, harvestTerm, addedAt, addedBy, splitFrom}. Cells with
 * several values join them with {@code |}; a {@code |} or {@code \} inside a value is written
 * {@code \|} or {@code \\}. Buckets are {@code label=min..max} (either bound may be empty),
 * mappings {@code exactMatch IRI}. Candidate decisions and scheme details are not in the CSV
 * (the JSON and SKOS files carry them).
 */
public final class VocabularyCsv {
    private static final List<String> LEAD = List.of("id", "type", "broader", "related", "replacedBy");
    private static final List<String> PER_LANG = List.of("prefLabel", "altLabels", "hiddenLabels", "scopeNote", "definition");
    private static final List<String> TAIL = List.of("valueKind", "multiValued", "categories", "unit", "buckets",
            "regulatedClaim", "mappings", "harvestTerm", "addedAt", "addedBy", "splitFrom");

    private VocabularyCsv() {
    }

    /** Writes the CSV (RFC 4180, CRLF) to {@code out}; does not close it. */
    public static void write(Vocabulary v, Writer out) throws IOException {
        List<String> langs = languages(v);
        List<String> header = new ArrayList<>(LEAD);
        for (String l : langs) {
            for (String p : PER_LANG) {
                header.add(p + "@" + l);
            }
        }
        header.addAll(TAIL);
        SafeCsv csv = new SafeCsv(out);
        csv.row(header);
        List<Concept> rows = new ArrayList<>(v.facets());
        rows.addAll(v.concepts());
        for (Concept c : rows) {
            List<String> r = new ArrayList<>();
            r.add(c.id());
            r.add(c.isFacet() ? "facet" : "concept");
            r.add(join(c.broader()));
            r.add(join(c.related()));
            r.add("");
            for (String l : langs) {
                r.add(c.prefLabels().getOrDefault(l, ""));
                r.add(join(texts(c.altLabels(), l)));
                r.add(join(texts(c.hiddenLabels(), l)));
                r.add(c.scopeNotes().getOrDefault(l, ""));
                r.add(c.definitions().getOrDefault(l, ""));
            }
            FacetProperties f = c.facet();
            r.add(f == null ? "" : f.valueKind().word());
            r.add(f == null ? "" : Boolean.toString(f.multiValued()));
            r.add(f == null ? "" : join(f.categories()));
            r.add(f == null || f.unit() == null ? "" : f.unit());
            List<String> bs = new ArrayList<>();
            if (f != null) {
                for (Bucket b : f.buckets()) {
                    bs.add(b.label() + "=" + (b.min() == null ? "" : SafeCsv.formatDouble(b.min())) + ".."
                            + (b.max() == null ? "" : SafeCsv.formatDouble(b.max())));
                }
            }
            r.add(join(bs));
            r.add(f == null ? "" : Boolean.toString(f.regulatedClaim()));
            List<String> ms = new ArrayList<>();
            c.mappings().forEach(m -> ms.add(m.kind().skosName() + " " + m.iri()));
            r.add(join(ms));
            Provenance p = c.provenance();
            r.add(p == null || p.harvestTerm() == null ? "" : p.harvestTerm());
            r.add(p == null || p.when() == null ? "" : p.when().toString());
            r.add(p == null || p.by() == null ? "" : p.by());
            r.add(c.splitFrom() == null ? "" : c.splitFrom());
            csv.row(r);
        }
        for (Retired x : v.retired()) {
            List<String> r = new ArrayList<>();
            r.add(x.id());
            r.add("retired");
            r.add("");
            r.add("");
            r.add(x.replacedBy() == null ? "" : x.replacedBy());
            for (String l : langs) {
                r.add(l.equals(v.defaultLanguage()) && x.formerLabel() != null ? x.formerLabel() : "");
                for (int i = 1; i < PER_LANG.size(); i++) {
                    r.add("");
                }
            }
            for (int i = 0; i < TAIL.size(); i++) {
                r.add("");
            }
            csv.row(r);
        }
        csv.flush();
    }

    /** Writes a CSV file atomically (UTF-8). */
    public static void export(Vocabulary v, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> write(v, w));
    }

    /** Reads a CSV file written by {@link #write}; {@code scheme} supplies what the CSV does not hold. */
    public static Vocabulary read(Path file, SchemeInfo scheme) throws IOException {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return read(r, scheme, file.toString());
        }
    }

    /**
     * Reads CSV in the layout {@link #write} produces. Columns may be missing (empty) or in any
     * order; unknown columns are refused by name.
     *
     * @throws VocabularyFormatException with the line and column of the first bad cell
     */
    public static Vocabulary read(Reader in, SchemeInfo scheme, String source) throws IOException {
        List<Concept> concepts = new ArrayList<>();
        List<Retired> retired = new ArrayList<>();
        try (CSVParser p = CSVParser.builder().setReader(in).setFormat(SafeCsv.readFormat()).get()) {
            List<String> header = p.getHeaderNames();
            checkHeader(header, source);
            long line = 2;
            for (CSVRecord rec : p) {
                new Row(rec, header, source, line, scheme.defaultLanguage()).into(concepts, retired);
                line = p.getCurrentLineNumber() + 1;
            }
        } catch (org.apache.commons.csv.CSVException e) {
            throw malformed(e, source); // a quoting error in the header row, met when the parser starts
        } catch (UncheckedIOException e) {
            throw malformed(e.getCause(), source);
        } catch (IllegalStateException | IllegalArgumentException e) {
            if (e.getCause() instanceof IOException) {
                throw malformed((IOException) e.getCause(), source);
            }
            throw new VocabularyFormatException(source, 0, 0, null, e.getMessage(), e);
        }
        try {
            return Vocabulary.of(scheme, concepts, retired, List.of());
        } catch (IllegalArgumentException e) {
            throw new VocabularyFormatException(source, 0, 0, null, e.getMessage(), e);
        }
    }

    private static VocabularyFormatException malformed(IOException e, String source) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("line (\\d+)").matcher(String.valueOf(e.getMessage()));
        int line = m.find() ? Integer.parseInt(m.group(1)) : 0;
        return new VocabularyFormatException(source, line, 0, null, "not valid CSV (RFC 4180): " + e.getMessage(), e);
    }

    private static void checkHeader(List<String> header, String source) throws VocabularyFormatException {
        if (!header.contains("id") || !header.contains("type")) {
            throw new VocabularyFormatException(source, 1, 0, null, "expected a header row with at least the columns id and type, found "
                    + header, null);
        }
        for (int i = 0; i < header.size(); i++) {
            String h = header.get(i);
            String base = h.contains("@") ? h.substring(0, h.indexOf('@')) : h;
            boolean ok = LEAD.contains(h) || TAIL.contains(h);
            if (!ok && h.contains("@") && PER_LANG.contains(base)) {
                try {
                    Label.checkLanguage(h.substring(h.indexOf('@') + 1));
                    ok = true;
                } catch (IllegalArgumentException e) {
                    ok = false;
                }
            }
            if (!ok) {
                throw new VocabularyFormatException(source, 1, i + 1, null, "unknown column \"" + h + "\"; expected "
                        + String.join(", ", LEAD) + ", " + String.join("@LANG, ", PER_LANG) + "@LANG, " + String.join(", ", TAIL), null);
            }
        }
    }

    /** One CSV row being read, with what is needed to say where a bad cell is. */
    private static final class Row {
        private final CSVRecord rec;
        private final List<String> header;
        private final String source;
        private final long line;
        private final String defaultLang;

        Row(CSVRecord rec, List<String> header, String source, long line, String defaultLang) {
            this.rec = rec;
            this.header = header;
            this.source = source;
            this.line = line;
            this.defaultLang = defaultLang;
        }

        String cell(String name) {
            return rec.isMapped(name) && rec.isSet(name) ? SafeCsv.restore(rec.get(name)) : "";
        }

        VocabularyFormatException bad(String column, String problem, Throwable cause) {
            return new VocabularyFormatException(source, (int) line, header.indexOf(column) + 1, column, problem, cause);
        }

        void into(List<Concept> concepts, List<Retired> retired) throws VocabularyFormatException {
            String id = cell("id");
            String type = cell("type");
            try {
                Concept.checkId(id);
            } catch (IllegalArgumentException e) {
                throw bad("id", e.getMessage(), e);
            }
            if (type.equals("retired")) {
                String rb = cell("replacedBy");
                String former = cell("prefLabel@" + defaultLang);
                try {
                    retired.add(new Retired(id, rb.isEmpty() ? null : rb, former.isEmpty() ? null : former));
                } catch (IllegalArgumentException e) {
                    throw bad("replacedBy", e.getMessage(), e);
                }
                return;
            }
            if (!type.equals("concept") && !type.equals("facet")) {
                throw bad("type", "expected facet, concept or retired, found \"" + type + "\"", null);
            }
            Concept.Builder b = Concept.builder(id);
            String column = "id";
            try {
                column = "broader";
                split(cell("broader")).forEach(x -> b.broader(Concept.checkId(x)));
                column = "related";
                split(cell("related")).forEach(x -> b.related(Concept.checkId(x)));
                for (String h : header) {
                    int at = h.indexOf('@');
                    if (at < 0) {
                        continue;
                    }
                    column = h;
                    String kind = h.substring(0, at);
                    String lang = h.substring(at + 1);
                    String v = cell(h);
                    if (v.isEmpty()) {
                        continue;
                    }
                    switch (kind) {
                        case "prefLabel":
                            b.prefLabel(Label.of(v, lang));
                            break;
                        case "altLabels":
                            split(v).forEach(t -> b.altLabel(Label.of(t, lang)));
                            break;
                        case "hiddenLabels":
                            split(v).forEach(t -> b.hiddenLabel(Label.of(t, lang)));
                            break;
                        case "scopeNote":
                            b.scopeNote(lang, v);
                            break;
                        default:
                            b.definition(lang, v);
                    }
                }
                column = "mappings";
                for (String m : split(cell("mappings"))) {
                    int sp = m.indexOf(' ');
                    if (sp < 0) {
                        throw new IllegalArgumentException("expected \"exactMatch IRI\", found \"" + m + "\"");
                    }
                    b.mapping(new Mapping(MatchKind.ofSkosName(m.substring(0, sp)), m.substring(sp + 1)));
                }
                column = "addedAt";
                String term = cell("harvestTerm");
                String when = cell("addedAt");
                String by = cell("addedBy");
                if (!term.isEmpty() || !when.isEmpty() || !by.isEmpty()) {
                    Instant t;
                    try {
                        t = when.isEmpty() ? null : Instant.parse(when);
                    } catch (java.time.format.DateTimeParseException e) {
                        throw new IllegalArgumentException("expected a time like 2025-03-01T10:00:00Z, found \"" + when + "\"", e);
                    }
                    column = "harvestTerm";
                    b.provenance(new Provenance(term.isEmpty() ? null : term, t, by.isEmpty() ? null : by));
                }
                column = "splitFrom";
                String sf = cell("splitFrom");
                b.splitFrom(sf.isEmpty() ? null : Concept.checkId(sf));
                if (type.equals("facet")) {
                    column = "valueKind";
                    b.facet(facet());
                }
                column = "id";
                concepts.add(b.build());
            } catch (IllegalArgumentException e) {
                throw bad(column, e.getMessage(), e);
            }
        }

        private FacetProperties facet() {
            String vk = cell("valueKind");
            ValueKind kind = vk.isEmpty() ? ValueKind.TERM : ValueKind.ofWord(vk);
            List<Bucket> bs = new ArrayList<>();
            for (String b : split(cell("buckets"))) {
                int eq = b.lastIndexOf('=');
                int dots = b.indexOf("..", eq + 1);
                if (eq <= 0 || dots < 0) {
                    throw new IllegalArgumentException("expected a bucket like \"light=1..2\", found \"" + b + "\"");
                }
                bs.add(new Bucket(b.substring(0, eq), number(b.substring(eq + 1, dots)), number(b.substring(dots + 2))));
            }
            String unit = cell("unit");
            return new FacetProperties(kind, bool(cell("multiValued"), "multiValued"), new TreeSet<>(split(cell("categories"))),
                    unit.isEmpty() ? null : unit, bs, bool(cell("regulatedClaim"), "regulatedClaim"));
        }

        private static Double number(String s) {
            if (s.isEmpty()) {
                return null;
            }
            try {
                return Double.parseDouble(s);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("expected a number, found \"" + s + "\"", e);
            }
        }

        private static boolean bool(String s, String what) {
            if (s.isEmpty() || s.equals("false")) {
                return false;
            }
            if (s.equals("true")) {
                return true;
            }
            throw new IllegalArgumentException(what + ": expected true or false, found \"" + s + "\"");
        }
    }

    // ------------------------------------------------------------------ cells with several values

    static String join(Collection<String> values) {
        StringBuilder sb = new StringBuilder();
        for (String v : values) {
            if (sb.length() > 0) {
                sb.append('|');
            }
            sb.append(v.replace("\\", "\\\\").replace("|", "\\|"));
        }
        return sb.toString();
    }

    static List<String> split(String cell) {
        List<String> out = new ArrayList<>();
        if (cell.isEmpty()) {
            return out;
        }
        StringBuilder cur = new StringBuilder();
        for (int i = 0; i < cell.length(); i++) {
            char c = cell.charAt(i);
            if (c == '\\' && i + 1 < cell.length()) {
                cur.append(cell.charAt(++i));
            } else if (c == '|') {
                out.add(cur.toString());
                cur.setLength(0);
            } else {
                cur.append(c);
            }
        }
        out.add(cur.toString());
        return out;
    }

    private static List<String> texts(Collection<Label> labels, String lang) {
        List<String> out = new ArrayList<>();
        for (Label l : labels) {
            if (l.lang().equals(lang)) {
                out.add(l.text());
            }
        }
        return out;
    }

    private static List<String> languages(Vocabulary v) {
        TreeSet<String> ls = new TreeSet<>();
        for (Concept c : v.allConcepts()) {
            ls.addAll(c.prefLabels().keySet());
            c.altLabels().forEach(l -> ls.add(l.lang()));
            c.hiddenLabels().forEach(l -> ls.add(l.lang()));
            ls.addAll(c.scopeNotes().keySet());
            ls.addAll(c.definitions().keySet());
        }
        ls.remove(v.defaultLanguage());
        List<String> out = new ArrayList<>();
        out.add(v.defaultLanguage());
        out.addAll(ls);
        return out;
    }
}
