package dev.sheaf.miner.report;

/**
 * The one escaping function of the report. Every piece of text that did not come from this
 * package (catalog text, feedback sentences, labels, file names, evidence lines) goes through
 * {@link #escape(String)} before it reaches the page, whether it lands in element text or in a
 * double-quoted attribute value.
 *
 * <p>The five characters that can end a text run or an attribute value in HTML ({@code & < > " '})
 * become character references. Characters that HTML forbids in a document (C0 controls other than
 * tab, line feed and carriage return; DEL and the C1 controls; lone surrogates; U+FFFE and U+FFFF)
 * become U+FFFD, so a corrupt catalog string cannot make the page malformed. Nothing else is
 * changed: the page is UTF-8 and carries every other character as is.
 */
final class Html {
    private static final char REPLACEMENT = '\uFFFD';

    private Html() {
    }

    /** The text, safe in element content and in a quoted attribute value. */
    static String escape(String text) {
        StringBuilder out = null;
        int n = text.length();
        for (int i = 0; i < n; i++) {
            char c = text.charAt(i);
            String rep = null;
            switch (c) {
                case '&' -> rep = "&amp;";
                case '<' -> rep = "&lt;";
                case '>' -> rep = "&gt;";
                case '"' -> rep = "&quot;";
                case '\'' -> rep = "&#39;";
                default -> {
                    if (Character.isHighSurrogate(c) && i + 1 < n && Character.isLowSurrogate(text.charAt(i + 1))) {
                        if (out != null) {
                            out.append(c).append(text.charAt(i + 1));
                        }
                        i++;
                        continue;
                    }
                    if (forbidden(c)) {
                        rep = String.valueOf(REPLACEMENT);
                    }
                }
            }
            if (rep == null) {
                if (out != null) {
                    out.append(c);
                }
                continue;
            }
            if (out == null) {
                out = new StringBuilder(n + 16).append(text, 0, i);
            }
            out.append(rep);
        }
        return out == null ? text : out.toString();
    }

    /** {@code name="escaped value"} with a leading space, for building start tags. */
    static String attr(String name, String value) {
        return " " + name + "=\"" + escape(value) + "\"";
    }

    private static boolean forbidden(char c) {
        if (c < 0x20) {
            return c != '\t' && c != '\n' && c != '\r';
        }
        return (c >= 0x7F && c <= 0x9F) || Character.isSurrogate(c) || c == '\uFFFE' || c == '\uFFFF';
    }
}
