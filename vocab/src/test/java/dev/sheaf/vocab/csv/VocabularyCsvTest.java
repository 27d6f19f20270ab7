package dev.sheaf.vocab.csv;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.Fixtures;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class VocabularyCsvTest {
    private final Vocabulary v = Fixtures.fernhollow();

    @TempDir
    Path dir;

    private static String csv(Vocabulary v) throws Exception {
        StringWriter w = new StringWriter();
        VocabularyCsv.write(v, w);
        return w.toString();
    }

    private static Vocabulary back(String csv, Vocabulary like) throws Exception {
        return VocabularyCsv.read(new StringReader(csv), like.scheme(), "x.csv");
    }

    /** What the CSV carries: everything but candidate decisions. */
    private static Vocabulary withoutDecisions(Vocabulary v) {
        return Vocabulary.of(v.scheme(), v.allConcepts(), v.retired(), List.of());
    }

    @Test
    void roundTripIsExactForConceptsFacetsAndRetiredIds() throws Exception {
        Vocabulary edited = v.apply(Edit.split("zipper", List.of(Label.of("zip")), Label.of("zip")));
        assertEquals(withoutDecisions(edited), back(csv(edited), edited));
    }

    @Test
    void writesOneRowPerConceptWithAHeader() throws Exception {
        String[] lines = csv(v).split("\r\n");
        assertEquals(1 + v.size() + v.retired().size(), lines.length);
        assertTrue(lines[0].startsWith("id,type,broader,related,replacedBy,prefLabel@en,altLabels@en,hiddenLabels@en,"), lines[0]);
        assertTrue(lines[0].contains("prefLabel@de"), "other languages follow the default one");
        assertTrue(csv(v).contains("capacity,facet,,,,Capacity,"));
        assertTrue(csv(v).contains("daypack=..30|weekend=30..50|expedition=50.."));
        assertTrue(csv(v).contains("rip-stop,retired,,,ripstop-nylon,rip-stop"));
    }

    @Test
    void neutralisesFormulaInjectionAndRestoresTheExactTextOnImport() throws Exception {
        // OWASP "CSV Injection": cells starting with = + - @ tab CR LF are prefixed with ' [pub]
        Concept evil = Concept.builder("evil").prefLabel("=HYPERLINK(\"http://x\",\"y\")").altLabel("+1 rated")
                .altLabel("-20 °C comfort").altLabel("@home").altLabel("'=quoted already").altLabel("pipe|inside")
                .altLabel("back\\slash").hiddenLabel("'90s").broader("material")
                .scopeNote("=cmd|' /C calc'!A0\nsecond line").build();
        Vocabulary w = v.apply(Edit.addConcept(evil));
        String text = csv(w);
        assertTrue(text.contains("\"'=HYPERLINK(\"\"http://x\"\",\"\"y\"\")\""), "the formula is neutralised and quoted");
        assertTrue(text.contains("\"'=cmd|' /C calc'!A0\nsecond line\""));
        for (String line : text.split("\r\n")) {
            for (String cell : line.split(",")) {
                String c = cell.startsWith("\"") ? cell.substring(1) : cell;
                assertTrue(c.isEmpty() || "=+-@\t\r".indexOf(c.charAt(0)) < 0, "no cell starts with a formula character: " + cell);
            }
        }
        assertEquals(withoutDecisions(w), back(text, w));
    }

    @Test
    void exportsAtomicallyAndReadsAFileBack() throws Exception {
        Path f = dir.resolve("fernhollow.csv");
        VocabularyCsv.export(v, f);
        assertEquals(withoutDecisions(v), VocabularyCsv.read(f, v.scheme()));
    }

    @Test
    void splitsAndJoinsEscapedMultiValuedCells() {
        List<String> values = List.of("a|b", "c\\d", "", "e");
        assertEquals(values, VocabularyCsv.split(VocabularyCsv.join(values)));
        assertEquals("a\\|b|c\\\\d||e", VocabularyCsv.join(values));
    }

    @Test
    void aBadCellIsReportedWithLineAndColumn() throws Exception {
        String text = csv(v).replace("toggle,concept,closure", "toggle,concept,closure|not valid id");
        VocabularyFormatException e = assertThrows(VocabularyFormatException.class, () -> back(text, v));
        List<String> lines = List.of(text.split("\r\n"));
        int expectedLine = 0;
        for (int i = 0; i < lines.size(); i++) {
            if (lines.get(i).startsWith("toggle,")) {
                expectedLine = i + 1;
            }
        }
        assertEquals(expectedLine, e.line());
        assertEquals(3, e.column(), "the broader column");
        assertTrue(e.problem().contains("concept id \"not valid id\""), e.problem());
    }

    @Test
    void aNotesCellWithALineBreakDoesNotShiftLaterLineNumbers() throws Exception {
        Vocabulary w = v.apply(Edit.setScopeNote("down", "en", "line one\nline two"));
        String text = csv(w).replace("zipper,concept,closure", "zipper,thing,closure");
        VocabularyFormatException e = assertThrows(VocabularyFormatException.class, () -> back(text, w));
        assertEquals(text.substring(0, text.indexOf("zipper,thing")).split("\n", -1).length, e.line());
        assertTrue(e.problem().contains("expected facet, concept or retired"), e.problem());
    }

    @Test
    void unknownColumnsAreRefusedByName() {
        VocabularyFormatException e = assertThrows(VocabularyFormatException.class,
                () -> back("id,type,colour\r\nx,concept,red\r\n", v));
        assertEquals(1, e.line());
        assertEquals(3, e.column());
        assertTrue(e.problem().contains("unknown column \"colour\""), e.problem());
    }

    @Test
    void aBrokenQuoteIsReportedAsInvalidCsv() {
        VocabularyFormatException e = assertThrows(VocabularyFormatException.class,
                () -> back("id,type,prefLabel@en\r\nx,concept,\"open\r\n", v));
        assertTrue(e.problem().startsWith("not valid CSV"), e.problem());
    }
}
