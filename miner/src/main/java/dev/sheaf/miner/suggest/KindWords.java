package dev.sheaf.miner.suggest;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The file and command-line words of the suggestion kinds: {@code SAME_GROUP_KEY} ⇄ "same-group-key". */
final class KindWords {

    private KindWords() {
    }

    static String word(Enum<?> kind) {
        return kind.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The constant for a word as {@link #word} writes it (case-insensitive, '_' or '-'); {@code what} names the enum in the error. */
    static <E extends Enum<E>> E of(Class<E> type, String w, String what) {
        String n = w.strip().toUpperCase(Locale.ROOT).replace('-', '_');
        for (E k : type.getEnumConstants()) {
            if (k.name().equals(n)) {
                return k;
            }
        }
        List<String> words = new ArrayList<>();
        for (E k : type.getEnumConstants()) {
            words.add(word(k));
        }
        throw new IllegalArgumentException(what + " \"" + w + "\" is not one of " + String.join(", ", words));
    }
}
