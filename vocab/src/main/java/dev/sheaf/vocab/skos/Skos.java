package dev.sheaf.vocab.skos;

import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import dev.sheaf.vocab.io.AtomicFiles;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.eclipse.rdf4j.model.Model;
import org.eclipse.rdf4j.rio.RDFFormat;
import org.eclipse.rdf4j.rio.RDFParseException;
import org.eclipse.rdf4j.rio.Rio;
import org.eclipse.rdf4j.rio.RioSetting;
import org.eclipse.rdf4j.rio.WriterConfig;
import org.eclipse.rdf4j.rio.helpers.BasicWriterSettings;

/**
 * SKOS export and import (W3C SKOS Reference, 2009) through RDF4J Rio, in Turtle or RDF/XML.
 *
 * <p>Written: one skos:ConceptScheme ({@code base} without its trailing / or #) with
 * hasTopConcept/topConceptOf for facets; per concept (IRI {@code base + id}) skos:inScheme,
 * prefLabel/altLabel/hiddenLabel with language tags, broader and narrower both, related,
 * scopeNote, definition and the mapping properties. What SKOS has no property for — facet
 * properties, provenance, split origin, retired ids, candidate decisions — goes in Sheaf's
 * namespace {@value #NAMESPACE} (and Dublin Core terms where one fits), so ours → SKOS → ours
 * loses nothing. Read: any file with a skos:ConceptScheme.
 */
public final class Skos {
    /** Sheaf's namespace for facet properties and the rest SKOS lacks. */
    public static final String NAMESPACE = SheafNs.NS;

    /** The RDF syntaxes supported. */
    public enum Syntax {
        TURTLE(RDFFormat.TURTLE), RDF_XML(RDFFormat.RDFXML);

        final RDFFormat format;

        Syntax(RDFFormat f) {
            this.format = f;
        }

        /** The syntax for a file name: .ttl → Turtle; .rdf, .owl, .xml → RDF/XML. */
        public static Syntax forFile(Path file) {
            String n = file.getFileName().toString().toLowerCase(Locale.ROOT);
            if (n.endsWith(".ttl") || n.endsWith(".turtle")) {
                return TURTLE;
            }
            if (n.endsWith(".rdf") || n.endsWith(".owl") || n.endsWith(".xml") || n.endsWith(".rdfxml")) {
                return RDF_XML;
            }
            throw new IllegalArgumentException(file.getFileName() + " is not a SKOS file name Sheaf knows: expected .ttl (Turtle) or .rdf/.owl/.xml (RDF/XML)");
        }

        /** Whether a file name looks like a SKOS file. */
        public static boolean matches(Path file) {
            try {
                forFile(file);
                return true;
            } catch (IllegalArgumentException e) {
                return false;
            }
        }
    }

    private Skos() {
    }

    /** Writes SKOS with the vocabulary's own base IRI. */
    public static void write(Vocabulary v, Syntax syntax, OutputStream out) {
        write(v, syntax, out, v.scheme().baseIri());
    }

    /** Writes SKOS with concept IRIs made from {@code baseIri} (must end with / or #). */
    public static void write(Vocabulary v, Syntax syntax, OutputStream out, String baseIri) {
        String base = SchemeInfo.checkBase(baseIri);
        Model m = SkosWriter.toModel(v, base);
        WriterConfig cfg = new WriterConfig();
        cfg.set((RioSetting<Boolean>) BasicWriterSettings.PRETTY_PRINT, true);
        cfg.set((RioSetting<Boolean>) BasicWriterSettings.INLINE_BLANK_NODES, true);
        Rio.write(m, out, syntax.format, cfg);
    }

    /** The SKOS text (UTF-8). */
    public static String toString(Vocabulary v, Syntax syntax, String baseIri) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        write(v, syntax, out, baseIri);
        return out.toString(StandardCharsets.UTF_8);
    }

    /** Writes a SKOS file atomically. */
    public static void export(Vocabulary v, Syntax syntax, Path file, String baseIri) throws IOException {
        String base = baseIri == null ? v.scheme().baseIri() : baseIri;
        SchemeInfo.checkBase(base);
        AtomicFiles.write(file, out -> write(v, syntax, out, base));
    }

    /** Reads a SKOS file; the syntax comes from its name. */
    public static SkosImport read(Path file) throws IOException {
        try (InputStream in = Files.newInputStream(file)) {
            return read(in, Syntax.forFile(file), file.toString());
        }
    }

    /**
     * Reads SKOS from a stream. {@code source} names it in messages (and serves as base IRI for
     * relative IRIs in the file).
     *
     * @throws VocabularyFormatException when it is not valid RDF (with line and column) or has no concept scheme
     */
    public static SkosImport read(InputStream in, Syntax syntax, String source) throws IOException {
        Model m;
        try {
            m = Rio.parse(in, "file:///" + source.replace('\\', '/').replaceAll("^/+", ""), syntax.format);
        } catch (RDFParseException e) {
            String msg = e.getMessage() == null ? "not valid " + syntax.format.getName() : e.getMessage();
            msg = msg.replaceAll(" \\[line \\d+(, column \\d+)?\\]$", "");
            throw new VocabularyFormatException(source, (int) Math.max(0, e.getLineNumber()),
                    (int) Math.max(0, e.getColumnNumber()), null,
                    "not valid " + syntax.format.getName() + ": " + msg, e);
        } catch (java.io.UnsupportedEncodingException | java.io.CharConversionException e) {
            // the XML declaration names an encoding Java does not have, or the bytes do not fit it
            throw new VocabularyFormatException(source, 1, 0, null, "not valid " + syntax.format.getName()
                    + ": cannot decode the file (" + e.getClass().getSimpleName() + ": " + e.getMessage() + "); save it as UTF-8", e);
        }
        return new SkosReader(m, source).read();
    }
}
