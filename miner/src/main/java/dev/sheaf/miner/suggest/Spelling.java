package dev.sheaf.miner.suggest;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Spelling variants of one word: a "skeleton" that US and UK spellings and doubled letters share,
 * and the restricted edit distance (optimal string alignment: insert, delete, substitute, swap two
 * neighbours) for misspellings. The patterns are the common US/UK pairs [practice]:
 * -our/-or (colour), -re/-er (fibre, litres), -ise/-ize, -yse/-yze, -inium/-inum (aluminium),
 * ph/f (sulphur), -ogue/-og, grey/gray; and doubled consonants (travelled/traveled).
 */
final class Spelling {
    /** One rewrite and the name a reason shows. */
    private record Rule(String name, Pattern pattern, String replacement) {
    }

    private static final List<Rule> RULES = List.of(
            new Rule("grey/gray", Pattern.compile("^grey"), "gray"),
            new Rule("-our/-or", Pattern.compile("([a-z]{2,})our"), "$1or"),
            new Rule("-re/-er", Pattern.compile("([a-z]{2,}[^aeiou])re(s|d)?$"), "$1er$2"),
            new Rule("-ise/-ize", Pattern.compile("([a-z]{3,})is(e|es|ed|ing|ation|ations|er|ers)$"), "$1iz$2"),
            new Rule("-yse/-yze", Pattern.compile("([a-z]{2,})ys(e|es|ed|ing)$"), "$1yz$2"),
            new Rule("-inium/-inum", Pattern.compile("inium"), "inum"),
            new Rule("ph/f", Pattern.compile("([a-z])ph"), "$1f"),
            new Rule("-ogue/-og", Pattern.compile("ogue(s)?$"), "og$1"));

    private Spelling() {
    }

    /** The skeleton of one lower-case word. */
    static String skeleton(String word) {
        String w = word;
        for (Rule r : RULES) {
            w = r.pattern().matcher(w).replaceAll(r.replacement());
        }
        return collapseDoubles(w);
    }

    /** The names of the rules that change {@code a} or {@code b}, and "doubled letters" when collapsing them does. */
    static List<String> rulesBetween(String a, String b) {
        List<String> out = new ArrayList<>();
        String wa = a;
        String wb = b;
        for (Rule r : RULES) {
            Matcher ma = r.pattern().matcher(wa);
            Matcher mb = r.pattern().matcher(wb);
            String na = ma.replaceAll(r.replacement());
            String nb = mb.replaceAll(r.replacement());
            if (!na.equals(wa) || !nb.equals(wb)) {
                out.add(r.name());
            }
            wa = na;
            wb = nb;
        }
        if (!wa.equals(wb) && collapseDoubles(wa).equals(collapseDoubles(wb))) {
            out.add("doubled letters");
        }
        return out;
    }

    static String collapseDoubles(String w) {
        if (w.length() < 4) {
            return w; // "xxl" / "xl", "ss" / "s": sizes and codes, not doubled consonants
        }
        StringBuilder b = new StringBuilder(w.length());
        for (int i = 0; i < w.length(); i++) {
            char c = w.charAt(i);
            if (b.length() == 0 || b.charAt(b.length() - 1) != c || Character.isDigit(c)) {
                b.append(c);
            }
        }
        return b.toString();
    }

    /** Optimal string alignment distance (Damerau–Levenshtein without repeated edits of one substring). */
    static int distance(String a, String b) {
        int n = a.length();
        int m = b.length();
        int[][] d = new int[n + 1][m + 1];
        for (int i = 0; i <= n; i++) {
            d[i][0] = i;
        }
        for (int j = 0; j <= m; j++) {
            d[0][j] = j;
        }
        for (int i = 1; i <= n; i++) {
            for (int j = 1; j <= m; j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                int v = Math.min(Math.min(d[i - 1][j] + 1, d[i][j - 1] + 1), d[i - 1][j - 1] + cost);
                if (i > 1 && j > 1 && a.charAt(i - 1) == b.charAt(j - 2) && a.charAt(i - 2) == b.charAt(j - 1)) {
                    v = Math.min(v, d[i - 2][j - 2] + 1);
                }
                d[i][j] = v;
            }
        }
        return d[n][m];
    }

    /** The word with one character removed at each position (the deletion neighbourhood, for finding edit-1 pairs fast). */
    static List<String> deletions(String w) {
        List<String> out = new ArrayList<>(w.length());
        for (int i = 0; i < w.length(); i++) {
            out.add(w.substring(0, i) + w.substring(i + 1));
        }
        return out;
    }

    /** Whether a word is made of letters only (misspellings are looked for among words, not codes or numbers). */
    static boolean isWord(String w) {
        for (int i = 0; i < w.length(); i++) {
            if (!Character.isLetter(w.charAt(i))) {
                return false;
            }
        }
        return !w.isEmpty() && w.equals(w.toLowerCase(Locale.ROOT));
    }
}
