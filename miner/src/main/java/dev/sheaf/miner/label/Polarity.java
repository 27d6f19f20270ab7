package dev.sheaf.miner.label;

import java.util.Locale;

/** Whether the text states a concept or states its absence ("no hood", "PFC-free"). */
public enum Polarity {
    /** The listing says it has the attribute. */
    STATED,
    /** The listing says it does not have the attribute; exported as such, never as a positive. */
    NEGATED;

    /** The word used in files: {@code stated}, {@code negated}. */
    public String word() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The polarity for its file word; throws naming the accepted words. */
    public static Polarity ofWord(String word) {
        for (Polarity p : values()) {
            if (p.word().equals(word)) {
                return p;
            }
        }
        throw new IllegalArgumentException("polarity \"" + word + "\" is not one of stated, negated");
    }
}
