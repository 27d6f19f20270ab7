package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;
import org.junit.jupiter.api.Test;

class EvidenceLineTest {
    /** The original definition: whitespace runs collapse as {@code s.replaceAll("\\s+", " ")}. */
    private static EvidenceLine byRegex(String text, int start, int end, int width) {
        int l = Math.max(0, start - width);
        while (l > 0 && l < start && !Character.isWhitespace(text.charAt(l - 1))) {
            l++;
        }
        int r = Math.min(text.length(), end + width);
        while (r < text.length() && r > end && !Character.isWhitespace(text.charAt(r))) {
            r--;
        }
        return new EvidenceLine("i", "s", "", "f", "", text.substring(l, start).replaceAll("\\s+", " ").stripLeading(),
                text.substring(start, end).replaceAll("\\s+", " "), text.substring(end, r).replaceAll("\\s+", " ").stripTrailing(),
                start, end);
    }

    @Test
    void cuttingCollapsesWhitespaceExactlyAsTheRegexDefinition() {
        Random rnd = new Random(8);
        String alphabet = "ab c\t\n\r\f\u000B  \u00A0x.";
        for (int i = 0; i < 20_000; i++) {
            StringBuilder b = new StringBuilder();
            for (int k = rnd.nextInt(60); k >= 0; k--) {
                b.append(alphabet.charAt(rnd.nextInt(alphabet.length())));
            }
            String t = b.toString();
            int s = rnd.nextInt(t.length());
            int e = s + rnd.nextInt(t.length() - s + 1);
            assertEquals(byRegex(t, s, e, 10), EvidenceLine.cut("i", "s", "", "f", "", t, s, e, 10), "text: " + t);
        }
    }
}
