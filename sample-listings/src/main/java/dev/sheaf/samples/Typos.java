package dev.sheaf.samples;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Misspellings planted in listing copy. In the demo each one is planted in exactly
 * {@link Typo#demoListings} listings (its first whole-word occurrence in the description, else in
 * a bullet), so tests can count them; in scale corpora each eligible listing gets one with a small
 * probability. Matching is whole-word and case-insensitive; the case of the first letter is kept.
 */
final class Typos {
    private Typos() {
    }

    record Typo(String wrong, String right, int demoListings, Pattern pattern) {
        Typo {
            if (wrong.equalsIgnoreCase(right) || demoListings < 1) {
                throw new IllegalArgumentException("bad typo " + wrong + " for " + right);
            }
        }

        Typo(String wrong, String right, int demoListings) {
            this(wrong, right, demoListings, Pattern.compile("(?<![\\p{L}\\p{N}])" + Pattern.quote(right) + "(?![\\p{L}\\p{N}])",
                    Pattern.CASE_INSENSITIVE | Pattern.UNICODE_CASE));
        }
    }

    static final List<Typo> ALL = List.of(
            new Typo("waterproff", "waterproof", 6),
            new Typo("breatheable", "breathable", 8),
            new Typo("lightwieght", "lightweight", 5),
            new Typo("zippper", "zipper", 4),
            new Typo("insualted", "insulated", 4),
            new Typo("resistent", "resistant", 7),
            new Typo("aluminim", "aluminum", 3),
            new Typo("accomodate", "accommodate", 6),
            new Typo("seperate", "separate", 5),
            new Typo("vestibulle", "vestibule", 3),
            new Typo("durible", "durable", 4),
            new Typo("comfortible", "comfortable", 5),
            new Typo("packible", "packable", 4),
            new Typo("headlmap", "headlamp", 3),
            new Typo("sleeing bag", "sleeping bag", 3));

    /** The listing with its first occurrence of {@code t.right} misspelled, or null when the word is absent. */
    static Product plant(Product p, Typo t) {
        Pattern pat = t.pattern();
        String d = replaceFirst(p.description(), pat, t.wrong);
        if (d != null) {
            return p.withText(d, p.bullets());
        }
        List<String> bullets = new ArrayList<>(p.bullets());
        for (int i = 0; i < bullets.size(); i++) {
            String b = replaceFirst(bullets.get(i), pat, t.wrong);
            if (b != null) {
                bullets.set(i, b);
                return p.withText(p.description(), bullets);
            }
        }
        return null;
    }

    static boolean eligible(Product p, Typo t) {
        Pattern pat = t.pattern();
        if (pat.matcher(p.description()).find()) {
            return true;
        }
        for (String b : p.bullets()) {
            if (pat.matcher(b).find()) {
                return true;
            }
        }
        return false;
    }

    private static String replaceFirst(String text, Pattern pat, String wrong) {
        Matcher m = pat.matcher(text);
        if (!m.find()) {
            return null;
        }
        String found = m.group();
        String repl;
        if (found.equals(found.toUpperCase(Locale.ROOT))) {
            repl = wrong.toUpperCase(Locale.ROOT);
        } else if (Character.isUpperCase(found.charAt(0))) {
            repl = Lexicon.capitalise(wrong);
        } else {
            repl = wrong;
        }
        return text.substring(0, m.start()) + repl + text.substring(m.end());
    }

    /** Scale corpora: with probability {@code rate}, one eligible typo (picked at random) is planted. */
    static Product maybePlant(Product p, Rng r, double rate) {
        if (!r.chance(rate)) {
            return p;
        }
        int start = r.nextInt(ALL.size());
        for (int k = 0; k < ALL.size(); k++) {
            Product planted = plant(p, ALL.get((start + k) % ALL.size()));
            if (planted != null) {
                return planted;
            }
        }
        return p;
    }
}
