package dev.sheaf.vocab.store;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.Fixtures;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class JsonFormatTest {
    private final Vocabulary v = Fixtures.fernhollow();

    private static String golden() throws Exception {
        try (InputStream in = JsonFormatTest.class.getResourceAsStream("/format/fernhollow.vocab.json")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void writesTheGoldenFileByteForByte() throws Exception {
        assertEquals(golden(), VocabularyStore.toJson(v));
    }

    @Test
    void roundTripsEveryField() throws Exception {
        Vocabulary back = VocabularyStore.fromJson(VocabularyStore.toJson(v), "x");
        assertEquals(v, back);
        assertEquals(VocabularyStore.toJson(v), VocabularyStore.toJson(back));
    }

    @Test
    void orderIsStableWhateverTheInsertionOrder() {
        List<Concept> shuffled = new ArrayList<>(v.allConcepts());
        Collections.shuffle(shuffled, new Random(7));
        Vocabulary w = Vocabulary.of(v.scheme(), shuffled, v.retired(), v.decisions());
        assertArrayEquals(JsonCodec.write(v), JsonCodec.write(w));
    }

    @Test
    void aRenameChangesExactlyOneLineOfTheFile() {
        String before = VocabularyStore.toJson(v);
        String after = VocabularyStore.toJson(v.apply(Edit.rename("toggle", Label.of("toggle fastener"))));
        String[] a = before.split("\n");
        String[] b = after.split("\n");
        assertEquals(a.length, b.length);
        int changed = 0;
        for (int i = 0; i < a.length; i++) {
            if (!a[i].equals(b[i])) {
                changed++;
                assertEquals("        \"en\": \"toggle fastener\"", b[i]);
            }
        }
        assertEquals(1, changed, "a diff in version control shows exactly the change");
    }

    @Test
    void fixtureFolderIsNotEmpty() throws Exception {
        assertTrue(golden().length() > 1000, "golden fixture present");
    }

    // ---------------------------------------------------------------- parse errors with line and column

    private static VocabularyFormatException parseError(String json) {
        return assertThrows(VocabularyFormatException.class, () -> VocabularyStore.fromJson(json, "shop.vocab.json"));
    }

    private String goldenWith(String from, String to) throws Exception {
        String g = golden();
        assertTrue(g.contains(from), from);
        return g.replaceFirst(java.util.regex.Pattern.quote(from), java.util.regex.Matcher.quoteReplacement(to));
    }

    private static int lineOf(String text, String needle) {
        int at = text.indexOf(needle);
        return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }

    @Test
    void aMissingCommaIsReportedAtItsLineAndColumn() throws Exception {
        String bad = goldenWith("\"id\": \"toggle\",", "\"id\": \"toggle\"");
        VocabularyFormatException e = parseError(bad);
        int line = lineOf(bad, "\"id\": \"toggle\"") + 1;
        assertEquals(line, e.line());
        assertEquals(7, e.column(), e.getMessage());
        assertTrue(e.problem().contains("was expecting comma"), e.problem());
        assertTrue(e.getMessage().startsWith("shop.vocab.json:" + line + ":7: "), e.getMessage());
        assertTrue(e.getMessage().contains("nothing was changed"));
    }

    @Test
    void anUnknownKeyIsNamedWithTheKeysExpected() throws Exception {
        String bad = goldenWith("\"broader\": [\n        \"closure\"\n      ]\n    },\n    {\n      \"id\": \"two-way-zipper\"",
                "\"brodaer\": [\n        \"closure\"\n      ]\n    },\n    {\n      \"id\": \"two-way-zipper\"");
        VocabularyFormatException e = parseError(bad);
        assertEquals(lineOf(bad, "\"brodaer\""), e.line());
        assertTrue(e.problem().contains("unknown key \"brodaer\""), e.problem());
        assertTrue(e.problem().contains("broader"), "lists what was expected: " + e.problem());
        assertEquals("concepts[7].brodaer", e.where());
    }

    @Test
    void facetPropertiesOnAValueAreRejectedWithAHint() throws Exception {
        String bad = goldenWith("\"id\": \"toggle\",", "\"id\": \"toggle\",\n      \"valueKind\": \"term\",");
        VocabularyFormatException e = parseError(bad);
        assertTrue(e.problem().contains("belong to entries in \"facets\""), e.problem());
    }

    @Test
    void aWrongTypeSaysWhatWasExpectedAndFound() throws Exception {
        String bad = goldenWith("\"broader\": [\n        \"closure\"\n      ]", "\"broader\": \"closure\"");
        VocabularyFormatException e = parseError(bad);
        assertTrue(e.problem().contains("expected a list"), e.problem());
        assertTrue(e.problem().contains("found a text"), e.problem());
        assertEquals(lineOf(bad, "\"broader\": \"closure\""), e.line());
    }

    @Test
    void anInvalidValueIsReportedWithTheConceptRule() throws Exception {
        String bad = goldenWith("\"id\": \"toggle\"", "\"id\": \"toggle fastener\"");
        VocabularyFormatException e = parseError(bad);
        assertTrue(e.problem().contains("concept id \"toggle fastener\""), e.problem());
        assertEquals(lineOf(bad, "toggle fastener") - 1, e.line(), "reported where the concept starts");
        assertTrue(e.where().startsWith("concepts[7]"), e.where());
    }

    @Test
    void aBadTimeSaysWhatFormIsExpected() throws Exception {
        String bad = goldenWith("\"when\": \"2025-03-01T10:00:00Z\",\n        \"by\"", "\"when\": \"1 March\",\n        \"by\"");
        VocabularyFormatException e = parseError(bad);
        assertTrue(e.problem().contains("2025-03-01T10:00:00Z"), e.problem());
    }

    @Test
    void aTruncatedFileIsReportedAtItsEnd() throws Exception {
        String g = golden();
        String bad = g.substring(0, g.length() / 2);
        VocabularyFormatException e = parseError(bad);
        assertEquals(lineOf(bad + "\u0000", "\u0000"), e.line());
        assertTrue(e.problem().contains("end-of-input"), e.problem());
    }

    @Test
    void duplicateKeysAndTrailingContentAreRefused() throws Exception {
        VocabularyFormatException d = parseError(goldenWith("\"id\": \"toggle\",", "\"id\": \"toggle\",\n      \"id\": \"toggle2\","));
        assertTrue(d.problem().contains("Duplicate field 'id'"), d.problem());
        VocabularyFormatException t = parseError(golden() + "{}");
        assertTrue(t.problem().contains("more content"), t.problem());
    }

    @Test
    void duplicateIdsAreRefused() throws Exception {
        VocabularyFormatException e = parseError(goldenWith("\"id\": \"toggle\"", "\"id\": \"zipper\""));
        assertTrue(e.problem().contains("concept id zipper appears twice"), e.problem());
    }

    @Test
    void aForeignOrNewerFileGetsAPlainAnswer() throws Exception {
        VocabularyFormatException f = parseError("{\n  \"format\": \"something-else\"\n}");
        assertEquals(2, f.line());
        assertTrue(f.problem().contains("not a Sheaf vocabulary file"));
        VocabularyFormatException n = parseError(goldenWith("\"formatVersion\": 1", "\"formatVersion\": 7"));
        assertEquals(3, n.line());
        assertTrue(n.problem().contains("newer Sheaf"), n.problem());
        VocabularyFormatException a = parseError("[1, 2]");
        assertTrue(a.problem().contains("expected a JSON object"), a.problem());
        VocabularyFormatException empty = parseError("");
        assertTrue(empty.problem().contains("empty file"), empty.problem());
    }

    @Test
    void unknownWordsNameTheAcceptedOnes() throws Exception {
        VocabularyFormatException e = parseError(goldenWith("\"valueKind\": \"yes-no\"", "\"valueKind\": \"boolean\""));
        assertTrue(e.problem().contains("term, number, yes-no"), e.problem());
        VocabularyFormatException d = parseError(goldenWith("\"decision\": \"parked\"", "\"decision\": \"maybe\""));
        assertTrue(d.problem().contains("kept, dropped, parked"), d.problem());
    }
}
