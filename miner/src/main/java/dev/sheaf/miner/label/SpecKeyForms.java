package dev.sheaf.miner.label;

import dev.sheaf.miner.text.Units;
import java.text.Normalizer;

/** The unit a spec key names at its end ("Weight (kg)", "Capacity [L]", "Weight, g"), for plain-number values. */
final class SpecKeyForms {
    private SpecKeyForms() {
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
