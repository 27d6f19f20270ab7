package dev.sheaf.miner.text;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Finds quantities with units in running text and reads whole spec values — the front door of the
 * quantity reader. See {@link Quantity} for what is reported and {@link Dimension} for the units read.
 *
 * <p>Rules in brief (decisions 060–062): numbers may use thousands commas ({@code 1,200}), thin or
 * no-break spaces ({@code 1 200}), a decimal point, fractions ({@code ½ 1/2 1½ 1-1/2}) and ranges
 * ({@code 1.1–1.3 kg}, {@code 20-25 L}, {@code 20 to 25 L}). A <b>decimal comma is not read</b>:
 * {@code "1,2 kg"} gives no quantity at all, never 1.2 kg or 2 kg, because an English catalog's
 * {@code 1,200} is twelve hundred and guessing per value would make the same text mean different
 * things. Everything is locale-independent (no {@code Locale} default is consulted).
 *
 * <p>Thread-safe: every call uses its own scanner. Linear in the text; no regular expressions.
 */
public final class Quantities {
    private Quantities() {
    }

    /** Every quantity in {@code text}, in text order, with 0-based, end-exclusive offsets. */
    public static List<Quantity> find(CharSequence text) {
        Objects.requireNonNull(text, "text");
        return List.copyOf(new QuantityScanner(text, null).run());
    }

    /**
     * Reads a whole spec value such as {@code "2 lb 10 oz"}, {@code "1.19 kg (2 lb 10 oz)"} or
     * {@code "15°F / -9°C"}: the value must consist of one quantity, optionally followed by the same
     * quantity in other units (the first one is returned), with nothing but brackets, slashes,
     * commas, spaces and "approx." around. A list of several dimensions ("84 x 52 x 40 in") or text
     * around the quantity ("about 2 kg packed") gives empty.
     */
    public static Optional<Quantity> parse(String value) {
        return parse("", value);
    }

    /**
     * As {@link #parse(String)}, with the spec key as context for ambiguous units: under a key such as
     * "Hydrostatic head" or "Waterproof rating", {@code "3000 mm"} is a water column, not a length;
     * under "Comfort rating", {@code "15 F"} is a temperature.
     */
    public static Optional<Quantity> parse(String key, String value) {
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(value, "value");
        List<Quantity> found = new QuantityScanner(value, key).run();
        if (found.isEmpty()) {
            return Optional.empty();
        }
        Quantity first = found.get(0);
        boolean approx = first.approximate();
        int p = 0;
        for (int k = 0; k < found.size(); k++) {
            Quantity q = found.get(k);
            if (q.dimension() != first.dimension()) {
                return Optional.empty();
            }
            int filler = filler(value, p, q.start(), k == 0);
            if (filler < 0) {
                return Optional.empty();
            }
            approx |= filler == 1;
            p = q.end();
        }
        int tail = filler(value, p, value.length(), false);
        if (tail < 0) {
            return Optional.empty();
        }
        approx |= tail == 1;
        if (approx == first.approximate()) {
            return Optional.of(first);
        }
        return Optional.of(new Quantity(first.value(), first.dimension(), first.unit(), first.si(), first.start(), first.end(),
                first.surface(), first.valueMax(), first.siMax(), true));
    }

    /** -1 if value[from, to) holds more than separators; 1 if it holds an approximation word; else 0. */
    private static int filler(String value, int from, int to, boolean leading) {
        int result = 0;
        int k = from;
        while (k < to) {
            char c = value.charAt(k);
            if (Character.isWhitespace(c) || Character.isSpaceChar(c)) {
                k++;
            } else if (!leading && "/()[],;|=.~\u2248".indexOf(c) >= 0) {
                k++;
            } else if ((c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z')) {
                int e = k;
                while (e < to && ((value.charAt(e) >= 'a' && value.charAt(e) <= 'z') || (value.charAt(e) >= 'A' && value.charAt(e) <= 'Z'))) {
                    e++;
                }
                String w = value.substring(k, e).toLowerCase(java.util.Locale.ROOT);
                if (leading || !(w.equals("approx") || w.equals("approximately") || w.equals("ca") || w.equals("circa"))) {
                    return -1;
                }
                result = 1;
                k = e;
            } else {
                return -1;
            }
        }
        return result;
    }
}
