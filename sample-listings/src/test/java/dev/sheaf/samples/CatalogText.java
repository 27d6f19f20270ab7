package dev.sheaf.samples;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.poi.xwpf.extractor.XWPFWordExtractor;
import org.apache.poi.xwpf.usermodel.XWPFDocument;

/**
 * Reads a demo workspace back from its files, with the libraries a reader would use (PDFBox, POI,
 * Commons CSV, Jackson) and not with the generator's own objects: listing id → the text a reader
 * sees in that listing (whitespace collapsed, HTML tags removed and the few entities decoded).
 */
final class CatalogText {
    private CatalogText() {
    }

    static Map<String, String> read(Path workspace) throws IOException {
        Map<String, String> byId = new TreeMap<>();
        Path catalog = workspace.resolve("catalog");
        List<Path> files;
        try (Stream<Path> s = Files.walk(catalog)) {
            files = s.filter(Files::isRegularFile).sorted().collect(Collectors.toList());
        }
        for (Path f : files) {
            String name = f.getFileName().toString();
            if (name.startsWith("README")) {
                continue;
            }
            if (name.endsWith(".csv")) {
                try (Reader r = Files.newBufferedReader(f, StandardCharsets.UTF_8);
                     CSVParser p = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
                    for (CSVRecord rec : p) {
                        byId.put(rec.get("sku"), collapse(String.join("\n", rec.toList())));
                    }
                }
            } else if (name.endsWith(".jsonl")) {
                ObjectMapper m = new ObjectMapper();
                for (String line : Files.readAllLines(f, StandardCharsets.UTF_8)) {
                    JsonNode n = m.readTree(line);
                    StringBuilder b = new StringBuilder();
                    b.append(n.get("title").asText()).append('\n').append(n.get("description").asText()).append('\n');
                    n.get("bullets").forEach(x -> b.append(x.asText()).append('\n'));
                    for (Iterator<Map.Entry<String, JsonNode>> it = n.get("specs").fields(); it.hasNext();) {
                        Map.Entry<String, JsonNode> e = it.next();
                        b.append(e.getKey()).append(": ").append(e.getValue().asText()).append('\n');
                    }
                    byId.put(n.get("id").asText(), collapse(b.toString()));
                }
            } else {
                String id = name.substring(0, 9).toUpperCase(Locale.ROOT);
                byId.put(id, collapse(textOf(f)));
            }
        }
        return byId;
    }

    static String textOf(Path f) throws IOException {
        String name = f.getFileName().toString();
        if (name.endsWith(".pdf")) {
            try (PDDocument d = Loader.loadPDF(f.toFile())) {
                return new PDFTextStripper().getText(d);
            }
        }
        if (name.endsWith(".docx")) {
            try (InputStream in = Files.newInputStream(f); XWPFDocument d = new XWPFDocument(in); XWPFWordExtractor x = new XWPFWordExtractor(d)) {
                return x.getText();
            }
        }
        String raw = Files.readString(f, StandardCharsets.UTF_8);
        if (name.endsWith(".html")) {
            raw = raw.replaceAll("<[^>]+>", " ").replace("&rsaquo;", "›").replace("&middot;", "·").replace("&copy;", "©")
                    .replace("&lt;", "<").replace("&gt;", ">").replace("&quot;", "\"").replace("&amp;", "&");
        }
        return raw;
    }

    static String collapse(String s) {
        return s.replaceAll("\\s+", " ");
    }

    /** Whole word, case-insensitive: the rule planted.json counts by. */
    static java.util.regex.Pattern word(String form) {
        return java.util.regex.Pattern.compile("(?<![\\p{L}\\p{N}])" + java.util.regex.Pattern.quote(form) + "(?![\\p{L}\\p{N}])",
                java.util.regex.Pattern.CASE_INSENSITIVE | java.util.regex.Pattern.UNICODE_CASE);
    }

    static boolean holds(String text, String form) {
        return word(form).matcher(text).find();
    }
}
