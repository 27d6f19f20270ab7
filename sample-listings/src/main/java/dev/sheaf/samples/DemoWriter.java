package dev.sheaf.samples;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntConsumer;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

/**
 * Writes the whole demo workspace (catalog, broken files, feedback, judgments, demo vocabulary,
 * ground truth, workspace.json, README) into a folder. With the same seed the bytes are the same.
 */
final class DemoWriter {
    private DemoWriter() {
    }

    /** Folders this writer owns inside the workspace (replaced as a whole with {@code --replace}). */
    static final List<String> OWNED_FOLDERS = List.of("catalog", "bad");

    /** What was written, for the command's summary line. */
    record Summary(int listings, int files, long bytes, int feedbackRows, int judgmentRows) {
    }

    static Summary write(long seed, Path dir, IntConsumer progress) throws IOException {
        DemoCatalog catalog = DemoCatalog.build(seed);
        Feedback feedback = Feedback.generate(catalog, seed);
        Judgments judgments = Judgments.generate(catalog, seed);
        List<Path> written = new ArrayList<>();
        int done = 0;
        for (DemoCatalog.Entry e : catalog.entries) {
            if (!e.format().perFile()) {
                continue;
            }
            Path target = dir.resolve(e.path());
            Product p = e.product();
            switch (e.format()) {
                case HTML: {
                    Rng r = Rng.of(seed, "html", Long.parseLong(p.id().substring(3)));
                    HtmlPage.SpecShape shape = HtmlPage.SpecShape.values()[r.weighted(40, 30, 30)];
                    Output.writeString(target, HtmlPage.render(p, shape, r.chance(0.6)));
                    break;
                }
                case PDF: Output.writeBytes(target, PdfSheet.render(p)); break;
                case DOCX: Output.writeBytes(target, DocxSheet.render(p)); break;
                case TXT: Output.writeString(target, TextNote.plain(p)); break;
                case MD: Output.writeString(target, TextNote.markdown(p)); break;
                default: throw new IllegalStateException(e.format().toString());
            }
            written.add(target);
            if (++done % 100 == 0) {
                progress.accept(done);
            }
        }
        Path csv = dir.resolve(DemoCatalog.CSV_PATH);
        Output.write(csv, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            Feeds.writeCsv(w, catalog.products(DemoCatalog.Format.CSV));
            w.flush();
        });
        written.add(csv);
        Path jsonl = dir.resolve(DemoCatalog.JSONL_PATH);
        Output.write(jsonl, out -> {
            try (Feeds.JsonlWriter w = new Feeds.JsonlWriter(out)) {
                for (Product p : catalog.products(DemoCatalog.Format.JSONL)) {
                    w.write(p);
                }
            }
        });
        written.add(jsonl);
        written.add(writeCsv(dir.resolve("feedback.csv"), List.of("pair_id", "reference_id", "target_id", "annotator", "sentence"), rows -> {
            for (Feedback.Row r : feedback.rows) {
                rows.add(List.of(r.pairId(), r.referenceId(), r.targetId(), r.annotator(), r.sentence()));
            }
        }));
        written.add(writeCsv(dir.resolve("judgments.csv"), List.of("item", "annotator", "attribute", "value"), rows -> {
            for (Judgments.Row r : judgments.rows) {
                rows.add(List.of(r.item(), r.annotator(), r.attribute(), r.value()));
            }
        }));
        written.addAll(BadFiles.write(dir.resolve("bad"), catalog.products(DemoCatalog.Format.PDF).get(0), seed));
        Path vocab = dir.resolve("fernhollow-vocab-source.json");
        Output.writeBytes(vocab, VocabularySource.json());
        written.add(vocab);
        Planted planted = Planted.of(catalog, feedback, judgments);
        Path plantedJson = dir.resolve("planted.json");
        Output.writeBytes(plantedJson, planted.json());
        written.add(plantedJson);
        Path ws = dir.resolve("workspace.json");
        Output.writeString(ws, WORKSPACE_JSON);
        written.add(ws);
        Path readme = dir.resolve("README.md");
        Output.writeString(readme, Readme.render(planted));
        written.add(readme);
        Path catalogReadme = dir.resolve("catalog/README.md");
        Output.writeString(catalogReadme, CATALOG_README);
        written.add(catalogReadme);
        long bytes = 0;
        for (Path p : written) {
            bytes += Files.size(p);
        }
        return new Summary(catalog.entries.size(), written.size(), bytes, feedback.rows.size(), judgments.rows.size());
    }

    private interface RowSource {
        void fill(List<List<String>> rows);
    }

    private static Path writeCsv(Path target, List<String> header, RowSource source) throws IOException {
        List<List<String>> rows = new ArrayList<>();
        source.fill(rows);
        Output.write(target, out -> {
            Writer w = new OutputStreamWriter(out, StandardCharsets.UTF_8);
            try (CSVPrinter p = new CSVPrinter(w, CSVFormat.RFC4180)) {
                p.printRecord(header);
                for (List<String> row : rows) {
                    for (String cell : row) {
                        Feeds.spreadsheetSafe(cell, target.getFileName().toString());
                    }
                    p.printRecord(row);
                }
                p.flush();
            }
        });
        return target;
    }

    static final String WORKSPACE_JSON = "{\n"
            + "  \"format\": \"sheaf-workspace\",\n"
            + "  \"formatVersion\": 1,\n"
            + "  \"name\": \"Fernhollow Outfitters demo\",\n"
            + "  \"sources\": [\n"
            + "    { \"path\": \"catalog\", \"include\": [\"**/*\"], \"exclude\": [\"**/README*\"] },\n"
            + "    { \"path\": \"catalog/feeds/catalog-export.csv\",\n"
            + "      \"mapping\": { \"id\": \"sku\", \"title\": \"name\", \"category\": \"category\", \"description\": \"description\",\n"
            + "                   \"bullets\": [\"feature_1\", \"feature_2\", \"feature_3\"], \"specs\": [\"*\"] } }\n"
            + "  ],\n"
            + "  \"profile\": \"default\",\n"
            + "  \"vocabulary\": \"fernhollow.vocab.json\",\n"
            + "  \"feedback\": \"feedback.csv\",\n"
            + "  \"judgments\": \"judgments.csv\",\n"
            + "  \"output\": \"out\"\n"
            + "}\n";

    static final String CATALOG_README = "# Fernhollow Outfitters catalog (invented demo data)\n\n"
            + "Generated by `./sheaf generate demo`; see ../README.md for what is planted here.\n\n"
            + "- `html/<category>/` product pages (spec tables, definition lists or \"Key: value\" lines)\n"
            + "- `pdf/<category>/` supplier spec sheets\n"
            + "- `docx/<category>/` supplier product sheets\n"
            + "- `text/<category>/` buyer notes (.txt) and wiki pages (.md)\n"
            + "- `feeds/catalog-export.csv` the shop's catalog export; `feeds/partner-feed.jsonl` a partner feed\n";
}
