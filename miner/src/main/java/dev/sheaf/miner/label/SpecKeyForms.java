package dev.sheaf.miner.label;

import dev.sheaf.miner.text.Units;
import java.text.Normalizer;
import java.util.Locale;

/**
 * The key form a spec row and a number facet's label are compared in, and the unit a key may name
 * ("Weight (kg)").
 *
 * <p>Stand-in until {@code dev.sheaf.miner.mine.SpecKeys} (owned by the quantities helper) is merged
 * into this branch: the rule set is the documented part of it that matters for matching one key
 * against one label — NFKC, lower case with {@link Locale#ROOT}, a trailing colon and a bracketed or
 * comma-separated unit suffix dropped, underscores and hyphens as spaces, dots dropped, spaces
 * collapsed. Both sides go through the same function, so swapping in {@code SpecKeys.normalise} is a
 * one-line change (see {@link #normalise}).
 */
final class SpecKeyForms {
    private SpecKeyForms() {
    }

    /** The canonical comparison form of a spec key or facet label; may be empty. */
    static String normalise(String rawKey) {
        String s = stripUnitSuffix(Normalizer.normalize(rawKey, Normalizer.Form.NFKC).toLowerCase(Locale.ROOT).strip());
        StringBuilder b = new StringBuilder(s.length());
        boolean space = false;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            if (c == '.' || c == ':') {
                continue;
            }
            if (c == '_' || c == '-' || Character.isWhitespace(c)) {
                space = b.length() > 0;
                continue;
            }
            if (space) {
                b.append(' ');
                space = false;
            }
            b.append(c);
        }
        return b.toString();
    }

    /** The unit named at the end of a key ("Weight (kg)", "Capacity [L]", "Weight, g"), or null. */
    static String unitSuffix(String rawKey) {
        String s = Normalizer.normalize(rawKey, Normalizer.Form.NFKC).strip();
        int cut = suffixStart(s);
        if (cut < 0) {
            return null;
        }
        return unitOf(s, cut);
    }

    private static String stripUnitSuffix(String s) {
        int cut = suffixStart(s);
        return cut > 0 ? s.substring(0, cut).strip() : stripColon(s);
    }

    /** Where a unit suffix starts, or -1 when the key ends in none. */
    private static int suffixStart(String raw) {
        String t = stripColon(raw);
        int cut = -1;
        if (t.endsWith(")") && t.lastIndexOf('(') > 0) {
            cut = t.lastIndexOf('(');
        } else if (t.endsWith("]") && t.lastIndexOf('[') > 0) {
            cut = t.lastIndexOf('[');
        } else if (t.lastIndexOf(',') > 0) {
            cut = t.lastIndexOf(',');
        }
        return cut > 0 && unitOf(t, cut) != null ? cut : -1;
    }

    private static String unitOf(String raw, int cut) {
        String t = stripColon(raw);
        String u = t.substring(cut + 1);
        if (u.endsWith(")") || u.endsWith("]")) {
            u = u.substring(0, u.length() - 1);
        }
        u = u.strip();
        return !u.isEmpty() && Units.dimensionOf(u).isPresent() ? u : null;
    }

    private static String stripColon(String s) {
        String t = s.strip();
        return t.endsWith(":") ? t.substring(0, t.length() - 1).strip() : t;
    }
}
