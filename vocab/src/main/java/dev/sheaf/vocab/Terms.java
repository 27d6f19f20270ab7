package dev.sheaf.vocab;

import java.text.Normalizer;
import java.util.Locale;
import java.util.regex.Pattern;

/** Text helpers shared by the vocabulary and its users. */
public final class Terms {
    private static final Pattern SEPARATORS = Pattern.compile("[\\s\\p{Pd}_]+");
    private static final Pattern MARKS = Pattern.compile("\\p{M}+");
    private static final Pattern NOT_SLUG = Pattern.compile("[^a-z0-9]+");

    private Terms() {
    }

    /**
     * The form candidate terms are compared in: Unicode NFKC, lower case ({@link Locale#ROOT}), runs
     * of whitespace, hyphens/dashes and underscores replaced by one space, trimmed. "Rip-Stop",
     * "rip stop" and "RIP_STOP" are the same term; plural and singular are not (stemming is the
     * miner's business).
     */
    public static String normalise(String term) {
        String t = Normalizer.normalize(term, Normalizer.Form.NFKC).toLowerCase(Locale.ROOT);
        return SEPARATORS.matcher(t).replaceAll(" ").strip();
    }

    /** A readable id made from a label: "Ripstop Nylon (70D)" becomes {@code ripstop-nylon-70d}. */
    public static String slug(String text) {
        String t = Normalizer.normalize(text, Normalizer.Form.NFKD);
        t = MARKS.matcher(t).replaceAll("").toLowerCase(Locale.ROOT);
        t = NOT_SLUG.matcher(t).replaceAll("-");
        t = t.replaceAll("^-+|-+$", "");
        if (t.length() > 60) {
            t = t.substring(0, 60).replaceAll("-+$", "");
        }
        return t.isEmpty() ? "concept" : t;
    }
}
