package dev.sheaf.miner.ingest;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.concurrent.atomic.AtomicInteger;
import org.apache.tika.config.TikaConfig;
import org.apache.tika.exception.EncryptedDocumentException;
import org.apache.tika.exception.TikaException;
import org.apache.tika.exception.WriteLimitReachedException;
import org.apache.tika.exception.ZeroByteFileException;
import org.apache.tika.extractor.EmbeddedDocumentExtractor;
import org.apache.tika.extractor.ParsingEmbeddedDocumentExtractor;
import org.apache.tika.io.TikaInputStream;
import org.apache.tika.metadata.Metadata;
import org.apache.tika.metadata.TikaCoreProperties;
import org.apache.tika.mime.MediaType;
import org.apache.tika.parser.AutoDetectParser;
import org.apache.tika.parser.ParseContext;
import org.apache.tika.parser.Parser;
import org.apache.tika.parser.pdf.PDFParserConfig;
import org.apache.tika.sax.BodyContentHandler;
import org.apache.tika.sax.WriteOutContentHandler;
import org.xml.sax.ContentHandler;
import org.xml.sax.SAXException;

/**
 * PDF, DOCX, ODT, RTF and whatever else Tika's standard parsers read, through one
 * {@link AutoDetectParser}. The extracted text becomes one listing: its first non-empty line is
 * the title, "Key: value" lines are specs (see {@link SpecLines}).
 *
 * <p>Limits: at most {@link SourceFile#writeLimit()} characters of text are kept (a longer
 * document is truncated and reported "too-large"); each parse runs in a worker thread and is
 * abandoned after {@link SourceFile#perFileTimeout()} ("timeout"); at most
 * {@value #MAX_EMBEDDED} embedded documents are parsed per file; Tika's
 * {@code SecureContentHandler} (on by default in {@code AutoDetectParser}) and {@link #zipBomb} stop zip bombs. No
 * external programs are run: the OCR parser and the external-command parsers are excluded, and
 * PDF OCR is off. Nothing is fetched from the network.
 */
final class DocumentReader implements ListingReader {
    /** Embedded documents parsed per file (attachments, embedded sheets), beyond which they are skipped. */
    static final int MAX_EMBEDDED = 100;

    private static final String CONFIG = """
            <?xml version="1.0" encoding="UTF-8"?>
            <properties>
              <parsers>
                <parser class="org.apache.tika.parser.DefaultParser">
                  <parser-exclude class="org.apache.tika.parser.ocr.TesseractOCRParser"/>
                  <parser-exclude class="org.apache.tika.parser.external.CompositeExternalParser"/>
                </parser>
              </parsers>
            </properties>
            """;

    /** Built once: loading Tika's parsers takes a while; the parser itself is thread-safe. */
    private static final class Holder {
        static {
            // POI logs through Log4j's API; without a provider Log4j prints a warning on stderr.
            // Its built-in simple logger (errors only) keeps stderr for Sheaf's own diagnostics.
            if (System.getProperty("log4j2.loggerContextFactory") == null) {
                System.setProperty("log4j2.loggerContextFactory", "org.apache.logging.log4j.simple.SimpleLoggerContextFactory");
            }
        }

        static final AutoDetectParser PARSER = build();

        private static AutoDetectParser build() {
            try {
                TikaConfig config = new TikaConfig(new java.io.ByteArrayInputStream(CONFIG.getBytes(StandardCharsets.UTF_8)));
                return new AutoDetectParser(config);
            } catch (TikaException | IOException | SAXException e) {
                throw new IllegalStateException("cannot configure Tika: " + e.getMessage(), e);
            }
        }
    }

    /**
     * Parses run here so a hung parser can be abandoned; daemon threads, so an abandoned parse
     * never keeps the program alive.
     */
    private static final ExecutorService PARSES = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "sheaf-parse");
        t.setDaemon(true);
        return t;
    });

    @Override
    public String name() {
        return "document";
    }

    /** The media type Tika sees in a file (by content and name). */
    static MediaType detect(SourceFile file) throws IOException {
        Metadata md = new Metadata();
        md.set(TikaCoreProperties.RESOURCE_NAME_KEY, file.path().getFileName().toString());
        try (TikaInputStream in = TikaInputStream.get(file.path(), md)) {
            return Holder.PARSER.getDetector().detect(in, md);
        } catch (RuntimeException e) {
            return MediaType.OCTET_STREAM; // a detector choked on the content (seen: malformed XML): unknown
        }
    }

    /** The media type of a file's content alone, without its name. */
    private static MediaType detectContent(SourceFile file) throws IOException {
        try (TikaInputStream in = TikaInputStream.get(file.path())) {
            return Holder.PARSER.getDetector().detect(in, new Metadata());
        } catch (RuntimeException e) {
            return MediaType.OCTET_STREAM;
        }
    }

    @Override
    public void read(SourceFile file) throws IOException {
        if (detectContent(file).equals(MediaType.OCTET_STREAM)) {
            MediaType byName = detect(file);
            file.problem("", "corrupt", "the content is not a recognisable document"
                    + (byName.equals(MediaType.OCTET_STREAM) ? "" : " (the name says " + byName + ")")
                    + "; check that the file opens in its own program, or exclude it");
            return;
        }
        String bomb = zipBomb(file);
        if (bomb != null) {
            file.problem("", "corrupt", "refused as a suspected zip bomb (" + bomb + ")");
            return;
        }
        Metadata md = new Metadata();
        md.set(TikaCoreProperties.RESOURCE_NAME_KEY, file.path().getFileName().toString());
        WriteOutContentHandler out = new WriteOutContentHandler(file.writeLimit());
        ContentHandler handler = new BodyContentHandler(out);
        ParseContext ctx = new ParseContext();
        Parser parser = Holder.PARSER;
        ctx.set(Parser.class, parser);
        PDFParserConfig pdf = new PDFParserConfig();
        pdf.setOcrStrategy(PDFParserConfig.OCR_STRATEGY.NO_OCR);
        pdf.setExtractInlineImages(false);
        ctx.set(PDFParserConfig.class, pdf);
        ctx.set(EmbeddedDocumentExtractor.class, new LimitedEmbedded(ctx, MAX_EMBEDDED));

        InputStream raw = file.open();
        TikaInputStream in = TikaInputStream.get(raw);
        Future<?> parse = PARSES.submit(() -> {
            parser.parse(in, handler, md, ctx);
            return null;
        });
        boolean truncated = false;
        try {
            parse.get(file.perFileTimeout().toMillis(), TimeUnit.MILLISECONDS);
        } catch (TimeoutException e) {
            parse.cancel(true);
            file.problem("", "timeout", "parsing took longer than " + file.perFileTimeout().toSeconds()
                    + " s and was abandoned; the file may be damaged or very complex. Raise the per-file timeout or convert it to PDF/text");
            return;
        } catch (InterruptedException e) {
            parse.cancel(true);
            Thread.currentThread().interrupt();
            throw new IOException("interrupted while parsing " + file.display(), e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (WriteLimitReachedException.isWriteLimitReached(c)) {
                truncated = true;
            } else if (isCause(c, EncryptedDocumentException.class)) {
                file.problem("", "encrypted", "the document is password-protected or encrypted; save an unprotected copy to read it");
                return;
            } else if (isCause(c, ZeroByteFileException.class)) {
                file.problem("", "empty", "the file has no content");
                return;
            } else if (c instanceof SAXException && c.getMessage() != null && c.getMessage().contains("Suspected zip bomb")) {
                file.problem("", "corrupt", "refused as a suspected zip bomb (" + c.getMessage() + ")");
                return;
            } else {
                String type = md.get(Metadata.CONTENT_TYPE);
                file.problem("", "corrupt", "could not be parsed as " + (type == null ? "a document" : type) + ": "
                        + rootMessage(c) + "; check that the file opens in its own program");
                return;
            }
        } finally {
            try {
                in.close();
            } catch (IOException ignored) {
                // already failed or finished
            }
        }
        String type = md.get(Metadata.CONTENT_TYPE);
        String text = out.toString();
        if (text.isBlank()) {
            if (type != null && (type.startsWith("image/") || type.startsWith("audio/") || type.startsWith("video/")
                    || type.startsWith("application/octet-stream") || type.startsWith("font/"))) {
                file.problem("", "unsupported", "no text can be read from " + type + " files; exclude them from the source");
            } else {
                file.problem("", "empty", "no text found in the " + (type == null ? "document" : type)
                        + (type != null && type.startsWith("application/pdf")
                        ? " (a scanned PDF has only images; Sheaf does not run OCR)" : ""));
            }
            return;
        }
        if (truncated) {
            file.problem("", "too-large", "only the first " + file.writeLimit() + " characters of text were read");
        }
        TextReader.emit(file, text, false, "");
    }

    /** Most bytes of XML a zip-based document (DOCX, ODT, PPTX, EPUB) may expand to: its parts are loaded whole. */
    static final long MAX_ZIP_XML_BYTES = 64L * 1024 * 1024;
    /** Most a zip-based document may expand, as a multiple of its size, once past {@link #ZIP_RATIO_FLOOR} (POI's own ratio). */
    static final int MAX_ZIP_RATIO = 100;
    static final long ZIP_RATIO_FLOOR = 10L * 1024 * 1024;

    /**
     * Inflates a zip-based document's entries without keeping them, and names the reason when it
     * expands beyond {@link #MAX_ZIP_XML_BYTES} of XML or {@link #MAX_ZIP_RATIO} times its size;
     * null for a file that is not a zip or is within both. Tika's and POI's own checks do not stop
     * a DOCX whose one text run is hundreds of megabytes: POI loads the part whole (measured: out
     * of memory at 512 MB for a 290 KB file). Stops inflating as soon as a limit is passed.
     */
    static String zipBomb(SourceFile file) throws IOException {
        try (InputStream raw = new java.io.BufferedInputStream(java.nio.file.Files.newInputStream(file.path()))) {
            raw.mark(4);
            byte[] magic = raw.readNBytes(4);
            raw.reset();
            if (magic.length < 4 || magic[0] != 'P' || magic[1] != 'K' || magic[2] != 3 || magic[3] != 4) {
                return null;
            }
            long total = 0;
            long xml = 0;
            byte[] buf = new byte[1 << 16];
            try (java.util.zip.ZipInputStream zip = new java.util.zip.ZipInputStream(raw)) {
                for (java.util.zip.ZipEntry e; (e = zip.getNextEntry()) != null; ) {
                    String name = e.getName().toLowerCase(java.util.Locale.ROOT);
                    boolean isXml = name.endsWith(".xml") || name.endsWith(".rels") || name.endsWith(".xhtml") || name.endsWith(".html");
                    for (int n; (n = zip.read(buf)) > 0; ) {
                        total += n;
                        if (isXml) {
                            xml += n;
                        }
                        if (xml > MAX_ZIP_XML_BYTES) {
                            return "its XML parts expand to more than " + MAX_ZIP_XML_BYTES + " bytes";
                        }
                        if (total > ZIP_RATIO_FLOOR && total > (long) MAX_ZIP_RATIO * file.size()) {
                            return "it expands to more than " + MAX_ZIP_RATIO + " times its " + file.size() + " bytes";
                        }
                    }
                }
            } catch (IOException | IllegalArgumentException e) {
                // a damaged zip (or an entry name that is not UTF-8, which ZipInputStream rejects
                // with an IllegalArgumentException): Tika says what it can of it
                return null;
            }
        }
        return null;
    }

    private static boolean isCause(Throwable t, Class<? extends Throwable> k) {
        for (Throwable x = t; x != null; x = x.getCause()) {
            if (k.isInstance(x)) {
                return true;
            }
        }
        return false;
    }

    private static String rootMessage(Throwable t) {
        Throwable r = t;
        while (r.getCause() != null && r.getCause() != r) {
            r = r.getCause();
        }
        String m = r.getMessage();
        return r.getClass().getSimpleName() + (m == null ? "" : ": " + m);
    }

    /** Parses embedded documents like Tika's default extractor, but only the first {@code max}. */
    private static final class LimitedEmbedded extends ParsingEmbeddedDocumentExtractor {
        private final AtomicInteger seen = new AtomicInteger();
        private final int max;

        LimitedEmbedded(ParseContext ctx, int max) {
            super(ctx);
            this.max = max;
        }

        @Override
        public boolean shouldParseEmbedded(Metadata metadata) {
            return seen.incrementAndGet() <= max && super.shouldParseEmbedded(metadata);
        }
    }
}
