package dev.sheaf.samples;

import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;

/**
 * A listing being written: collects title, sentences, bullets and specs, each tagged with the
 * traits its words give evidence for, and the facts behind them; then builds the {@link Product}
 * at a level of detail. Tags let the feedback and judgment generators ground a statement only in
 * what the listing really shows.
 */
final class Draft {

    /** How much of the copy a listing keeps. */
    enum Detail {
        /** Product pages and sheets: every sentence, bullet and spec. */
        FULL,
        /** Feeds (CSV, JSONL): the first sentence and up to one more, three bullets, four specs and the colour (about 430 bytes as JSONL). */
        FEED
    }

    /** A piece of copy and the traits it shows, as a bit set over {@link Trait#ordinal()}. */
    private record Piece(String text, long shows) {
    }

    private record SpecPiece(Spec spec, long shows) {
    }

    private static final Trait[] TRAITS = Trait.values();

    static {
        if (TRAITS.length > 64) {
            throw new IllegalStateException("Draft keeps traits in a 64-bit set; there are " + TRAITS.length);
        }
    }

    final String id;
    final Category category;
    final Voice v;
    final Rng r;
    final Facts.Builder facts = Facts.builder();
    private final List<Piece> sentences = new ArrayList<>();
    private final List<Piece> bullets = new ArrayList<>();
    private final List<SpecPiece> specs = new ArrayList<>();
    private final List<String> usedKeys = new ArrayList<>();
    private String title;
    private long titleShows;
    String colourName;
    private boolean dwrSpelledOut;

    Draft(String id, Category category, Voice v) {
        this.id = id;
        this.category = category;
        this.v = v;
        this.r = v.r;
    }

    boolean quirky() {
        return v.quirky;
    }

    /** Adds a spec row; a key form already used in this listing falls back to the export's column name. */
    void spec(SpecKey k, String value, Trait... shows) {
        String key = k.as(v);
        if (k == SpecKey.MATERIAL && !v.quirky && !textile()) {
            key = v.r.chance(0.7) ? "Material" : "Main material";
        }
        if (used(key)) {
            key = k.csv;
        }
        if (used(key)) {
            return;
        }
        usedKeys.add(key);
        specs.add(new SpecPiece(new Spec(k, key, value), tags(shows)));
    }

    void title(String t, Trait... shows) {
        title = t;
        titleShows = tags(shows);
    }

    String title() {
        return title;
    }

    private boolean used(String key) {
        for (String u : usedKeys) {
            if (u.equalsIgnoreCase(key)) {
                return true;
            }
        }
        return false;
    }

    void say(String sentence, Trait... shows) {
        sentences.add(new Piece(sentence, tags(shows)));
    }

    void bullet(String b, Trait... shows) {
        for (Piece p : bullets) {
            if (p.text.equalsIgnoreCase(b)) {
                return;
            }
        }
        bullets.add(new Piece(b, tags(shows)));
    }

    private static long tags(Trait... shows) {
        long bits = 0;
        for (Trait t : shows) {
            bits |= 1L << t.ordinal();
        }
        return bits;
    }

    private boolean textile() {
        switch (category) {
            case STOVES: case HEADLAMPS: case TREKKING_POLES: case FOOTWEAR: return false;
            default: return true;
        }
    }

    /** The water-repellency phrase; the first one in a listing spells "DWR" out in 35% of listings. */
    String dwr() {
        boolean spell = !dwrSpelledOut && r.chance(0.35);
        dwrSpelledOut = true;
        return v.waterRepellent(spell);
    }

    Product build(Detail detail) {
        if (title == null || colourName == null) {
            throw new IllegalStateException("listing " + id + " has no title or colour");
        }
        List<Piece> keptSentences = new ArrayList<>(sentences);
        List<Piece> keptBullets = new ArrayList<>(bullets);
        List<SpecPiece> keptSpecs = new ArrayList<>(specs);
        if (detail == Detail.FEED) {
            // a fixed, rng-free choice, so FULL and FEED copies of one listing share their words
            List<Piece> s = new ArrayList<>();
            s.add(sentences.get(0));
            if (sentences.size() > 2) {
                s.add(sentences.get(1 + Math.floorMod(id.hashCode(), sentences.size() - 1)));
            }
            keptSentences = s;
            keptBullets = keptBullets.subList(0, Math.min(3, keptBullets.size()));
            // feeds keep the first four specs and always the colour (a feed without colour is rare)
            List<SpecPiece> k = new ArrayList<>();
            for (SpecPiece sp : specs) {
                if (k.size() < 4 && sp.spec.kind() != SpecKey.COLOUR || sp.spec.kind() == SpecKey.COLOUR) {
                    k.add(sp);
                }
            }
            keptSpecs = k;
        }
        long shown = titleShows;
        StringBuilder description = new StringBuilder();
        for (Piece p : keptSentences) {
            if (description.length() > 0) {
                description.append(' ');
            }
            description.append(p.text);
            shown |= p.shows;
        }
        List<String> bulletTexts = new ArrayList<>();
        for (Piece p : keptBullets) {
            bulletTexts.add(quirky() ? p.text.toUpperCase(Locale.ROOT) : p.text);
            shown |= p.shows;
        }
        List<Spec> specList = new ArrayList<>();
        for (SpecPiece p : keptSpecs) {
            specList.add(p.spec);
            shown |= p.shows;
        }
        EnumSet<Trait> shownSet = EnumSet.noneOf(Trait.class);
        for (Trait t : TRAITS) {
            if ((shown & (1L << t.ordinal())) != 0) {
                shownSet.add(t);
            }
        }
        return new Product(id, category, v.supplier, title, description.toString(), bulletTexts, specList,
                facts.build(), shownSet, colourName, null);
    }
}
