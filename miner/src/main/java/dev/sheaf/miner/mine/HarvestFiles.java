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
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES);
    private static final ObjectWriter WRITER;

    static {
        DefaultIndenter lf = new DefaultIndenter("  ", "\n");
        DefaultPrettyPrinter pp = new DefaultPrettyPrinter().withObjectIndenter(lf).withArrayIndenter(lf);
        WRITER = MAPPER.writer(pp);
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
