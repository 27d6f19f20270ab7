package dev.sheaf.miner.mine;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.ObjectWriter;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.io.AtomicFiles;
import dev.sheaf.vocab.io.SafeCsv;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Reads and writes harvests: {@code harvest.json} (everything, pretty-printed, LF line ends, stable
 * order — the same harvest gives the same bytes), {@code harvest.csv} (one row per candidate, for
 * spreadsheets) and {@code harvest-specs.csv} (one row per spec facet). Every file is written
 * atomically; every CSV cell goes through {@link SafeCsv}.
 */
public final class HarvestFiles {
    public static final String JSON = "harvest.json";
    public static final String CSV = "harvest.csv";
    public static final String SPECS_CSV = "harvest-specs.csv";

    /** Columns of harvest.csv. */
    public static final List<String> CSV_HEADER = List.of("rank", "term", "n", "frequency", "df", "df_share", "score",
            "termhood", "c_value", "pmi", "npmi", "llr", "t_score", "chi2", "group_key", "top_categories", "evidence");

    /** Columns of harvest-specs.csv. */
    public static final List<String> SPECS_HEADER = List.of("facet", "rows", "keys", "distinct_values", "top_values",
            "dimension", "base_unit", "numeric_rows", "min", "max");

    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
            .addMixIn(Harvest.class, ParallelCandidates.class);
    private static final ObjectWriter WRITER;

    /**
     * Deepest nesting level whose entries each get a line of their own. Level 4 holds a candidate's
     * evidence lines and top categories: each is written on one line ({@code { "listingId": …, "end": 5 }}),
     * which keeps the file readable, diffable line by line per evidence line, and about 40% smaller
     * (and as much faster to write) than one line per member.
     */
    static final int LINE_LEVELS = 4;

    static {
        WRITER = MAPPER.writer(new ShallowPrinter());
    }

    /**
     * Pretty printing to {@link #LINE_LEVELS}: a line feed and two spaces per level for shallower
     * entries, a space for deeper ones, so each evidence line and each top category is one line.
     */
    private static final class ShallowPrinter extends DefaultPrettyPrinter {
        private static final long serialVersionUID = 1L;
        private static final DefaultIndenter LF = new DefaultIndenter("  ", "\n");

        ShallowPrinter() {
            this(0);
        }

        /** A printer for a value written at {@code nesting} levels down (its entries one level deeper). */
        ShallowPrinter(int nesting) {
            super(com.fasterxml.jackson.core.util.Separators.createDefaultInstance()
                    .withObjectFieldValueSpacing(com.fasterxml.jackson.core.util.Separators.Spacing.AFTER));
            Indenter shallow = new Indenter() {
                @Override
                public void writeIndentation(com.fasterxml.jackson.core.JsonGenerator g, int level) throws IOException {
                    if (level <= LINE_LEVELS) {
                        LF.writeIndentation(g, level);
                    } else {
                        g.writeRaw(' ');
                    }
                }

                @Override
                public boolean isInline() {
                    return false;
                }
            };
            _objectIndenter = shallow;
            _arrayIndenter = shallow;
            _nesting = nesting;
        }

        private ShallowPrinter(ShallowPrinter base) {
            super(base);
        }

        @Override
        public ShallowPrinter createInstance() {
            return new ShallowPrinter(this);
        }

        @Override
        public void writeEndObject(com.fasterxml.jackson.core.JsonGenerator g, int entries) throws IOException {
            if (_nesting > LINE_LEVELS) {
                --_nesting;
                g.writeRaw(" }");
            } else {
                super.writeEndObject(g, entries);
            }
        }

        @Override
        public void writeEndArray(com.fasterxml.jackson.core.JsonGenerator g, int values) throws IOException {
            if (_nesting > LINE_LEVELS) {
                --_nesting;
                g.writeRaw(" ]");
            } else {
                super.writeEndArray(g, values);
            }
        }
    }

    /**
     * The candidate list, serialised on all cores: each candidate is written to text on its own by a
     * printer that starts at the list's depth, then the texts go out in rank order as raw values, so
     * the bytes are exactly those of writing the list in one go (the candidates are ~95% of the file).
     */
    abstract static class ParallelCandidates {
        @com.fasterxml.jackson.databind.annotation.JsonSerialize(using = CandidatesSerializer.class)
        abstract List<Harvest.Candidate> candidates();
    }

    static final class CandidatesSerializer extends com.fasterxml.jackson.databind.JsonSerializer<List<Harvest.Candidate>> {
        @Override
        public void serialize(List<Harvest.Candidate> list, com.fasterxml.jackson.core.JsonGenerator g,
                              com.fasterxml.jackson.databind.SerializerProvider provider) throws IOException {
            boolean pretty = g.getPrettyPrinter() instanceof ShallowPrinter;
            ObjectWriter element = pretty ? MAPPER.writer(new ShallowPrinter(g.getOutputContext().getNestingDepth() + 1))
                    : MAPPER.writer();
            String[] texts = new String[list.size()];
            try {
                java.util.stream.IntStream.range(0, texts.length).parallel().forEach(i -> {
                    try {
                        texts[i] = element.writeValueAsString(list.get(i));
                    } catch (JsonProcessingException e) {
                        throw new java.io.UncheckedIOException(e);
                    }
                });
            } catch (java.io.UncheckedIOException e) {
                throw e.getCause();
            }
            g.writeStartArray(list, texts.length);
            for (String t : texts) {
                g.writeRawValue(t);
            }
            g.writeEndArray();
        }
    }

    private HarvestFiles() {
    }

    /** Writes harvest.json, harvest.csv and harvest-specs.csv into {@code dir}. */
    public static void write(Harvest h, Path dir) throws IOException {
        // the JSON is by far the largest file: write it on a second thread while the CSVs are written here
        java.util.concurrent.CompletableFuture<Void> json = java.util.concurrent.CompletableFuture.runAsync(() -> {
            try {
                writeJson(h, dir.resolve(JSON));
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
        writeCsv(h, dir.resolve(CSV));
        writeSpecsCsv(h, dir.resolve(SPECS_CSV));
        try {
            json.join();
        } catch (java.util.concurrent.CompletionException e) {
            if (e.getCause() instanceof java.io.UncheckedIOException) {
                throw ((java.io.UncheckedIOException) e.getCause()).getCause();
            }
            throw e;
        }
    }

    public static String toJson(Harvest h) {
        try {
            return WRITER.writeValueAsString(h) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a harvest must always serialise", e);
        }
    }

    public static void writeJson(Harvest h, Path file) throws IOException {
        AtomicFiles.write(file, out -> {
            WRITER.without(com.fasterxml.jackson.core.JsonGenerator.Feature.AUTO_CLOSE_TARGET).writeValue(out, h);
            out.write('\n');
        });
    }

    /** Reads harvest.json; a wrong format name or version is reported with what to do. */
    public static Harvest readJson(Path file) throws IOException {
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return MAPPER.readValue(r, Harvest.class);
        } catch (com.fasterxml.jackson.databind.exc.ValueInstantiationException e) {
            throw new IOException(file + ": " + (e.getCause() != null ? e.getCause().getMessage() : e.getOriginalMessage()), e);
        } catch (JsonProcessingException e) {
            throw new IOException(file + " is not a readable harvest (" + e.getOriginalMessage() + " at line "
                    + (e.getLocation() == null ? "?" : e.getLocation().getLineNr()) + "); re-run sheaf mine to write it again", e);
        }
    }

    public static void writeCsv(Harvest h, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row(CSV_HEADER);
            for (Harvest.Candidate c : h.candidates()) {
                Harvest.Scores s = c.scores();
                csv.row(c.rank(), c.term(), c.n(), c.frequency(), c.df(), c.dfShare(), c.score(), s.termhood(), s.cValue(),
                        s.pmi(), s.npmi(), s.llr(), s.tScore(), s.chi2(), c.groupKey(), categories(c.topCategories()),
                        c.evidence().isEmpty() ? "" : c.evidence().get(0).oneLine());
            }
            csv.flush();
        });
    }

    public static void writeSpecsCsv(Harvest h, Path file) throws IOException {
        AtomicFiles.writeText(file, w -> {
            SafeCsv csv = new SafeCsv(w);
            csv.row(SPECS_HEADER);
            for (Harvest.SpecFacet f : h.specFacets()) {
                List<String> keys = new ArrayList<>();
                f.keys().forEach(k -> keys.add(k.key() + " (" + k.rows() + ")"));
                List<String> vals = new ArrayList<>();
                f.values().stream().limit(10).forEach(v -> vals.add(v.value() + " (" + v.rows() + ")"));
                Harvest.NumericSummary n = f.numeric();
                csv.row(f.name(), f.rows(), String.join("; ", keys), f.distinctValues(), String.join("; ", vals),
                        n == null ? null : n.dimension(), n == null ? null : n.baseUnit(), n == null ? null : n.rows(),
                        n == null ? null : n.min(), n == null ? null : n.max());
            }
            csv.flush();
        });
    }

    /** "tents (df 120, z 8.31); backpacks (df 40, z 2.10)". */
    static String categories(List<Harvest.CategoryScore> cats) {
        StringBuilder b = new StringBuilder();
        for (Harvest.CategoryScore c : cats) {
            if (b.length() > 0) {
                b.append("; ");
            }
            b.append(c.category()).append(" (df ").append(c.df()).append(", z ");
            fixed2(b, c.z());
            b.append(')');
        }
        return b.toString();
    }

    /** Appends v with two decimals, rounded half away from zero (as {@code %.2f} with {@link Locale#ROOT}). */
    static void fixed2(StringBuilder b, double v) {
        java.math.BigDecimal d = java.math.BigDecimal.valueOf(v).setScale(2, java.math.RoundingMode.HALF_UP);
        if (d.signum() == 0 && v < 0) {
            b.append('-'); // as the formatter writes -0.00
        }
        b.append(d.toPlainString());
    }

}
