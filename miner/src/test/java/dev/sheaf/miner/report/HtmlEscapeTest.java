package dev.sheaf.miner.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;

class HtmlEscapeTest {

    /** How a browser-grade parser reads an escaped string back, in text and in a double-quoted attribute. */
    private static Element parsedBack(String raw) {
        String e = Html.escape(raw);
        Document doc = Jsoup.parse("<!DOCTYPE html><html><body><p id=\"t\" title=\"" + e + "\">" + e + "</p></body></html>");
        return doc.getElementById("t");
    }

    @Test
    void escapesTheFiveCharactersThatEndTextOrAnAttribute() {
        assertEquals("&lt;b&gt; &amp; &quot;q&quot; &#39;s&#39;", Html.escape("<b> & \"q\" 's'"));
    }

    @Test
    void leavesPlainTextAloneWithoutCopying() {
        String plain = "Ridgeline 2 tent, 1.9 kg — waterproof to 3,000 mm; naïve café 🏕";
        assertSame(plain, Html.escape(plain));
    }

    @Test
    void hostileStringsReadBackAsTheSameTextWithNoElementOrAttribute() {
        for (String h : Hostile.STRINGS) {
            Element p = parsedBack(h);
            assertEquals(h, p.wholeText(), "text of " + h);
            assertEquals(h, p.attr("title"), "attribute of " + h);
            assertEquals(0, p.children().size(), "no element made from " + h);
            assertEquals(2, p.attributes().size(), "no attribute made from " + h);
        }
    }

    @Test
    void closingTagsOfRawTextElementsStayText() {
        String e = Html.escape("</style></script></title>");
        assertFalse(e.contains("</"), e);
    }

    @Test
    void controlCharactersHtmlForbidsBecomeReplacementCharacters() {
        assertEquals("a\uFFFDb\uFFFDc\uFFFDd", Html.escape("a\u0000b\u0007c\u0085d"));
        assertEquals("tab\tand\nnewline", Html.escape("tab\tand\nnewline"));
        assertEquals("\uFFFD\uFFFD", Html.escape("\uFFFE\u007F"));
    }

    @Test
    void surrogatePairsStayAndLoneSurrogatesAreReplaced() {
        assertEquals("\uD83C\uDFD5", Html.escape("\uD83C\uDFD5"));
        assertEquals("x\uFFFDy\uFFFD", Html.escape("x\uD83Cy\uDFD5"));
        assertEquals("&lt;\uFFFD", Html.escape("<\uD83C"));
    }

    @Test
    void randomStringsRoundTripThroughAParser() {
        // Alphabet of the characters that matter to HTML, a few letters, spaces and non-ASCII.
        // Carriage returns are left out: a parser folds CR and CRLF into LF by specification.
        char[] alphabet = "<>&\"'=/ !-[]`;:#xyzé\u00a0\u2028\t\n".toCharArray();
        Random random = new Random(42);
        for (int n = 0; n < 2000; n++) {
            StringBuilder s = new StringBuilder();
            int length = random.nextInt(40);
            for (int i = 0; i < length; i++) {
                s.append(alphabet[random.nextInt(alphabet.length)]);
            }
            String raw = s.toString();
            Element p = parsedBack(raw);
            assertEquals(raw, p.wholeText(), "text of [" + raw + "]");
            assertEquals(raw, p.attr("title"), "attribute of [" + raw + "]");
            assertTrue(p.children().isEmpty(), raw);
        }
    }

    @Test
    void attributeHelperQuotesAndEscapes() {
        assertEquals(" title=\"a &quot;b&quot; &lt;c&gt;\"", Html.attr("title", "a \"b\" <c>"));
    }
}
