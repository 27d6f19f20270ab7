package dev.sheaf.samples;

import java.util.List;
import java.util.Locale;

/** Copywriting shared by every category: titles, colours, marketing fluff, field-test notes, derived grades. */
final class Copy {
    private Copy() {
    }

    static final String[] NUMBER_WORDS = {"zero", "one", "two", "three", "four", "five", "six"};

    static String persons(int n) {
        return NUMBER_WORDS[n];
    }

    /** "Tarnwick Larchmere 2 Backpacking Tent"; the quirky supplier: "SKELDA KNARR 2P 3-SSN TENT". */
    static String title(Draft d, String line, String model, String descriptor, String quirkyDescriptor) {
        if (d.quirky()) {
            // the quirky supplier puts the model figures into its own descriptor
            return "SKELDA " + line + " " + quirkyDescriptor;
        }
        String m = model.isEmpty() ? "" : " " + model;
        return d.v.supplier.brand() + " " + line + m + " " + descriptor;
    }

    static String line(Draft d) {
        return d.quirky() ? d.r.pick(Lexicon.QUIRKY_LINES) : Lexicon.lineName(d.r);
    }

    /** Picks a colour (from the given families, or any), records the fact and adds the colour spec. */
    static void colour(Draft d, String... families) {
        List<Lexicon.Colour> pool = Lexicon.COLOURS;
        if (families.length > 0) {
            pool = new java.util.ArrayList<>();
            for (Lexicon.Colour c : Lexicon.COLOURS) {
                for (String f : families) {
                    if (c.family().equals(f)) {
                        pool.add(c);
                    }
                }
            }
        }
        Lexicon.Colour c = d.r.pick(pool);
        String name = c.name(d.v.uk);
        if (c.family().equals("grey")) {
            // shop staff mix the spellings
            name = name.replace("Gray", "Grey").replace("Grey", Lexicon.capitalise(d.v.grey()));
        }
        if (d.quirky()) {
            name = name.toUpperCase(Locale.ROOT);
        }
        d.colourName = name;
        d.facts.term(Trait.COLOUR, c.family());
        d.spec(SpecKey.COLOUR, name, Trait.COLOUR);
    }

    static void weight(Draft d, double grams) {
        d.facts.number(Trait.WEIGHT_G, grams);
        d.spec(SpecKey.WEIGHT, d.v.weight(grams), Trait.WEIGHT_G);
    }

    /** A marketing sentence, with the supplier's habitual probability. */
    static void fluff(Draft d, String noun) {
        Rng r = d.r;
        if (d.quirky() || !r.chance(d.v.supplier.fluff())) {
            return;
        }
        String f = r.pick(Lexicon.FLUFF_WORDS);
        String use = r.pick(Lexicon.USES);
        String use2 = r.pick(Lexicon.USES);
        switch (r.nextInt(10)) {
            case 0: d.say("A " + f + " " + noun + " for every adventure."); break;
            case 1: d.say("Premium and versatile, it's the only " + noun + " you'll need."); break;
            case 2: d.say("Take your " + use + " to the next level."); break;
            case 3: d.say("Built to last, season after season."); break;
            case 4: d.say("The ultimate " + noun + " for " + use + "."); break;
            case 5: d.say("Innovative design meets trail-proven performance."); break;
            case 6: d.say("Versatile enough for " + use + " and " + (use2.equals(use) ? "everyday use" : use2) + "."); break;
            case 7: d.say("A must-have for " + use + "."); break;
            case 8: d.say("Durable, comfortable and ready for anything."); break;
            default: d.say("Our most " + (r.chance(0.5) ? "versatile" : "premium") + " " + noun + " yet: " + f + " in every detail."); break;
        }
    }

    /** A field-test note with an invented place: the long tail of rare words. */
    static void tested(Draft d) {
        Rng r = d.r;
        if (d.quirky() || !r.chance(0.4)) {
            return;
        }
        String place = Lexicon.place(r);
        String weather = r.pick(Lexicon.WEATHER);
        switch (r.nextInt(4)) {
            case 0: d.say("Field-tested on the " + place + " in " + weather + "."); break;
            case 1: d.say("Our tester " + r.pick(Lexicon.TESTERS) + " took it over the " + place + " in " + weather + "."); break;
            case 2: d.say("Proven on the " + place + ", in " + weather + "."); break;
            default: d.say("Tested by " + r.pick(Lexicon.TESTERS) + " on the " + place + "."); break;
        }
    }

    /** Weight class 1..5 from four category cut points (grams). */
    static void weightClass(Draft d, double grams) {
        double[] cuts;
        switch (d.category) {
            case TENTS: cuts = new double[] {1100, 1600, 2200, 3000}; break;
            case BACKPACKS: cuts = new double[] {700, 1100, 1500, 2000}; break;
            case SLEEPING_BAGS: cuts = new double[] {850, 1100, 1400, 1800}; break;
            case RAIN_SHELLS: cuts = new double[] {250, 330, 420, 500}; break;
            case INSULATED_JACKETS: cuts = new double[] {300, 380, 460, 560}; break;
            case FOOTWEAR: cuts = new double[] {700, 900, 1200, 1450}; break;
            case STOVES: cuts = new double[] {80, 150, 300, 400}; break;
            case HEADLAMPS: cuts = new double[] {60, 80, 100, 120}; break;
            case SLEEPING_PADS: cuts = new double[] {400, 550, 750, 1000}; break;
            case TREKKING_POLES: cuts = new double[] {380, 450, 510, 560}; break;
            default: cuts = new double[] {160, 190, 220, 260}; break;
        }
        int grade = 1;
        for (double c : cuts) {
            if (grams >= c) {
                grade++;
            }
        }
        d.facts.number(Trait.WEIGHT_CLASS, grade);
    }

    static int grade(double value, double... ascendingCuts) {
        int g = 1;
        for (double c : ascendingCuts) {
            if (value >= c) {
                g++;
            }
        }
        return g;
    }

    static int roundTo(double v, int step) {
        return (int) (Math.round(v / step) * step);
    }

    static String cap(String s) {
        return Lexicon.capitalise(s);
    }

    /** "S–XL" style size ranges. */
    static String apparelSizes(Draft d) {
        String[] ranges = {"XS–XL", "S–XXL", "XS–XXL", "S–XL", "XS-L", "S-XXL"};
        String s = d.r.pick(ranges);
        return d.quirky() ? "SZ " + s.replace('–', '-') : s;
    }

    static String fit(Draft d) {
        return d.r.pick("Regular fit", "Athletic fit", "Relaxed fit", "Slim fit", "Regular");
    }
}
