package dev.sheaf.vocab;

import java.util.Locale;

/** What kind of value a facet takes. */
public enum ValueKind {
    /** One of the facet's concepts (material: ripstop nylon). */
    TERM,
    /** A number with a unit, optionally grouped into buckets (capacity: 45 L). */
    NUMBER,
    /** Yes or no (packable). */
    YES_NO;

    /** The word used in files: term, number, yes-no. */
    public String word() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The kind for its file word; throws naming the accepted words. */
    public static ValueKind ofWord(String word) {
        for (ValueKind k : values()) {
            if (k.word().equals(word)) {
                return k;
            }
        }
        throw new IllegalArgumentException("value kind \"" + word + "\" is not one of term, number, yes-no");
    }
}
