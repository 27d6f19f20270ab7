package dev.sheaf.miner.suggest;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Finds short forms defined in running text, "long form (SF)" and "SF (long form)", with the
 * algorithm of Schwartz &amp; Hearst 2003 ("A simple algorithm for identifying abbreviation
 * definitions in biomedical text", PSB 2003): the long form is the shortest run of words before the
 * parenthesis whose characters match the short form's from right to left, the short form's first
 * character at the start of a word, with at most min(|SF| + 5, 2·|SF|) words.
 */
final class Abbreviations {
    /** A definition found: the short form, the long form and where the whole "long (short)" phrase sits in the text. */
    interface Sink {
        void found(String shortForm, String longForm, int start, int end);
    }

    private static final Pattern PAREN = Pattern.compile("\\(([^()]{1,80})\\)");
    private static final Pattern WORD = Pattern.compile("\\S+");

    private Abbreviations() {
    }

    /** Reports every definition in {@code text}. */
    static void scan(String text, Sink sink) {
        if (text.indexOf('(') < 0) {
            return;
        }
        Matcher m = PAREN.matcher(text);
        while (m.find()) {
            String inside = m.group(1).strip();
            String before = text.substring(0, m.start());
            if (isShortForm(inside)) {
                String[] words = lastWords(before, maxWords(inside));
                if (words == null) {
                    continue;
                }
                String window = String.join(" ", words);
                String lf = bestLongForm(inside, window);
                if (lf != null && valid(inside, lf)) {
                    int start = before.lastIndexOf(lf.substring(0, Math.min(lf.length(), firstWordLength(lf))));
                    sink.found(inside, lf, Math.max(0, start), m.end());
                }
            } else {
                // "SF (long form)": the word before the parenthesis is the short form
                String[] prev = lastWords(before, 1);
                if (prev == null || prev.length != 1) {
                    continue;
                }
                String sf = trimPunct(prev[0]);
                if (isShortForm(sf) && inside.split("\\s+").length >= 2) {
                    String lf = bestLongForm(sf, inside);
                    if (lf != null && valid(sf, lf) && lf.equals(inside)) {
                        sink.found(sf, lf, Math.max(0, before.lastIndexOf(sf)), m.end());
                    }
                }
            }
        }
    }

    /** A short form: 2–10 characters, starts with a letter or digit, holds a letter and an upper-case letter, at most two words. */
    static boolean isShortForm(String s) {
        if (s.length() < 2 || s.length() > 10 || !Character.isLetterOrDigit(s.charAt(0)) || s.split("\\s+").length > 2) {
            return false;
        }
        boolean letter = false;
        boolean upper = false;
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            letter |= Character.isLetter(c);
            upper |= Character.isUpperCase(c);
        }
        return letter && upper;
    }

    private static int maxWords(String sf) {
        return Math.min(sf.length() + 5, sf.length() * 2);
    }

    /** The last {@code n} whitespace-separated words of {@code text}, stopping at a sentence or clause break; null when none. */
    private static String[] lastWords(String text, int n) {
        int cut = Math.max(Math.max(text.lastIndexOf(". "), text.lastIndexOf(", ")),
                Math.max(Math.max(text.lastIndexOf(';'), text.lastIndexOf(':')), Math.max(text.lastIndexOf('\n'), text.lastIndexOf(')'))));
        String tail = text.substring(cut + 1).strip();
        if (tail.isEmpty()) {
            return null;
        }
        java.util.List<String> ws = new java.util.ArrayList<>();
        Matcher w = WORD.matcher(tail);
        while (w.find()) {
            ws.add(w.group());
        }
        int from = Math.max(0, ws.size() - n);
        return ws.subList(from, ws.size()).toArray(new String[0]);
    }

    /** Schwartz &amp; Hearst's findBestLongForm. */
    static String bestLongForm(String shortForm, String longForm) {
        int s = shortForm.length() - 1;
        int l = longForm.length() - 1;
        String sf = shortForm.toLowerCase(Locale.ROOT);
        String lf = longForm.toLowerCase(Locale.ROOT);
        while (s >= 0) {
            char c = sf.charAt(s);
            if (!Character.isLetterOrDigit(c)) {
                s--;
                continue;
            }
            while ((l >= 0 && lf.charAt(l) != c) || (s == 0 && l > 0 && Character.isLetterOrDigit(lf.charAt(l - 1)))) {
                l--;
            }
            if (l < 0) {
                return null;
            }
            l--;
            s--;
        }
        l = longForm.lastIndexOf(' ', l) + 1;
        return longForm.substring(l);
    }

    private static boolean valid(String sf, String lf) {
        String t = lf.strip();
        return t.length() > sf.length() && t.split("\\s+").length <= maxWords(sf) && !t.toLowerCase(Locale.ROOT).equals(sf.toLowerCase(Locale.ROOT));
    }

    private static int firstWordLength(String s) {
        int i = s.indexOf(' ');
        return i < 0 ? s.length() : i;
    }

    private static String trimPunct(String w) {
        int a = 0;
        int b = w.length();
        while (a < b && !Character.isLetterOrDigit(w.charAt(a))) {
            a++;
        }
        while (b > a && !Character.isLetterOrDigit(w.charAt(b - 1))) {
            b--;
        }
        return w.substring(a, b);
    }
}
