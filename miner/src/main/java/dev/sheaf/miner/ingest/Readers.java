package dev.sheaf.miner.ingest;

import java.io.IOException;
import java.util.Map;
import org.apache.tika.mime.MediaType;

/** Picks the reader for a file: by extension, else by the media type Tika detects from its content. */
final class Readers {
    static final ListingReader HTML = new HtmlReader();
    static final ListingReader TABLE = new TableReader();
    static final ListingReader JSON = new JsonReader();
    static final ListingReader TEXT = new TextReader();
    static final ListingReader DOCUMENT = new DocumentReader();

    private static final Map<String, ListingReader> BY_EXTENSION = Map.ofEntries(
            Map.entry("html", HTML), Map.entry("htm", HTML), Map.entry("xhtml", HTML), Map.entry("shtml", HTML),
            Map.entry("csv", TABLE), Map.entry("tsv", TABLE), Map.entry("tab", TABLE), Map.entry("psv", TABLE),
            Map.entry("json", JSON), Map.entry("jsonl", JSON), Map.entry("ndjson", JSON),
            Map.entry("txt", TEXT), Map.entry("text", TEXT), Map.entry("md", TEXT), Map.entry("markdown", TEXT),
            Map.entry("pdf", DOCUMENT), Map.entry("docx", DOCUMENT), Map.entry("doc", DOCUMENT), Map.entry("odt", DOCUMENT),
            Map.entry("rtf", DOCUMENT), Map.entry("pptx", DOCUMENT), Map.entry("odp", DOCUMENT), Map.entry("epub", DOCUMENT));

    private Readers() {
    }

    static ListingReader forFile(SourceFile file) throws IOException {
        ListingReader r = BY_EXTENSION.get(file.extension());
        if (r != null) {
            return r;
        }
        MediaType t = DocumentReader.detect(file).getBaseType();
        String s = t.toString();
        if (s.equals("text/html") || s.equals("application/xhtml+xml")) {
            return HTML;
        }
        if (s.equals("text/csv") || s.equals("text/tab-separated-values")) {
            return TABLE;
        }
        if (s.equals("application/json")) {
            return JSON;
        }
        if (t.getType().equals("text")) {
            return TEXT;
        }
        return DOCUMENT;
    }
}
