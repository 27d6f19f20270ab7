package dev.sheaf.samples;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

/**
 * Free-text feedback: pseudonymous shoppers compare a target listing with a reference listing of
 * the same category ("this one" is the reference): "lighter than this one and with a bigger hood".
 * Comparative and presence statements are grounded in what both listings' text shows; each shopper
 * gets the direction right with their own accuracy, so most statements agree with the specs and
 * some contradict them. Comfort, coziness, sturdiness and overall quality have nothing in the
 * catalog to ground them: the vague, contested attributes.
 */
final class Feedback {

    static final int TARGET_SENTENCES = 2000;
    static final int SHOPPERS = 140;

    record Row(String pairId, String referenceId, String targetId, String annotator, String sentence) {
    }

    /** How one statement relates to the listings. */
    enum Grounding { AGREES, CONTRADICTS, UNGROUNDED }

    /** Per-attribute tallies for the ground-truth file. */
    static final class Tally {
        int mentions;
        int agrees;
        int contradicts;
        int ungrounded;
        final String kind;

        Tally(String kind) {
            this.kind = kind;
        }
    }

    final List<Row> rows = new ArrayList<>();
    final Map<String, Tally> tallies = new TreeMap<>();
    int pairs;

    private record Shopper(String id, double hedge, double accuracy, double misspell, double vague, boolean lower, boolean uk) {
    }

    /** A numeric dimension compared between two listings. */
    private enum Dim {
        WEIGHT("weight", Trait.WEIGHT_G, 1,
                new String[] {"heavier"}, new String[] {"heavy"}, new String[] {"heaviest"},
                new String[] {"lighter"}, new String[] {"light"}, new String[] {"lightest"}),
        VOLUME("volume", Trait.VOLUME_L, 1,
                new String[] {"roomier", "bigger", "more spacious"}, new String[] {"roomy", "big"}, new String[] {"roomiest", "biggest"},
                new String[] {"smaller", "less roomy"}, new String[] {"small"}, new String[] {"smallest"}),
        ROOM("floor-space", Trait.FLOOR_M2, 1,
                new String[] {"roomier", "more spacious", "bigger inside"}, new String[] {"roomy", "spacious"}, new String[] {"roomiest"},
                new String[] {"more cramped", "smaller inside", "less roomy"}, new String[] {"cramped"}, new String[] {"smallest"}),
        WARMTH("warmth", null, 1,
                new String[] {"warmer", "toastier"}, new String[] {"warm"}, new String[] {"warmest"},
                new String[] {"colder", "less warm"}, new String[] {"cold", "chilly"}, new String[] {"coldest"}),
        WATERPROOF("waterproofness", Trait.WATERPROOF_MM, 1,
                new String[] {"more waterproof", "drier in the rain"}, new String[] {"waterproof"}, new String[] {"most waterproof"},
                new String[] {"less waterproof", "leakier"}, new String[] {"leaky"}, new String[] {"leakiest"}),
        BRIGHTNESS("brightness", Trait.LUMENS, 1,
                new String[] {"brighter"}, new String[] {"bright"}, new String[] {"brightest"},
                new String[] {"dimmer", "less bright"}, new String[] {"dim"}, new String[] {"dimmest"}),
        BOIL("boil-speed", Trait.BOIL_S, -1,
                new String[] {"faster", "quicker to boil"}, new String[] {"fast", "quick"}, new String[] {"fastest"},
                new String[] {"slower", "slower to boil"}, new String[] {"slow"}, new String[] {"slowest"}),
        PACKED("packed-size", Trait.PACKED_L, 1,
                new String[] {"bulkier", "less compact"}, new String[] {"bulky"}, new String[] {"bulkiest"},
                new String[] {"more compact", "smaller packed"}, new String[] {"compact"}, new String[] {"most compact"}),
        THICKNESS("thickness", Trait.THICKNESS_CM, 1,
                new String[] {"thicker", "plusher"}, new String[] {"thick", "plush"}, new String[] {"thickest"},
                new String[] {"thinner"}, new String[] {"thin"}, new String[] {"thinnest"});

        final String attribute;
        final Trait trait;
        final int sign;
        final String[] moreComp;
        final String[] moreBase;
        final String[] moreSup;
        final String[] lessComp;
        final String[] lessBase;
        final String[] lessSup;

        Dim(String attribute, Trait trait, int sign, String[] moreComp, String[] moreBase, String[] moreSup,
            String[] lessComp, String[] lessBase, String[] lessSup) {
            this.attribute = attribute;
            this.trait = trait;
            this.sign = sign;
            this.moreComp = moreComp;
            this.moreBase = moreBase;
            this.moreSup = moreSup;
            this.lessComp = lessComp;
            this.lessBase = lessBase;
            this.lessSup = lessSup;
        }

        /** The comparable value, or NaN when the listing's text does not show it. */
        double value(Product p) {
            if (this == WARMTH) {
                switch (p.category()) {
                    case SLEEPING_BAGS: return p.shows(Trait.COMFORT_C) ? -p.facts().number(Trait.COMFORT_C) : Double.NaN;
                    case SLEEPING_PADS: return p.shows(Trait.R_VALUE) ? p.facts().number(Trait.R_VALUE) : Double.NaN;
                    default: return p.shows(Trait.WARMTH) && p.facts().has(Trait.WARMTH) ? p.facts().number(Trait.WARMTH) : Double.NaN;
                }
            }
            if (!p.shows(trait) || !p.facts().has(trait)) {
                return Double.NaN;
            }
            return sign * p.facts().number(trait);
        }
    }

    private static List<Dim> dims(Category c) {
        switch (c) {
            case TENTS: return List.of(Dim.WEIGHT, Dim.ROOM, Dim.WATERPROOF, Dim.PACKED);
            case BACKPACKS: return List.of(Dim.WEIGHT, Dim.VOLUME);
            case SLEEPING_BAGS: return List.of(Dim.WEIGHT, Dim.WARMTH, Dim.PACKED);
            case RAIN_SHELLS: return List.of(Dim.WEIGHT, Dim.WATERPROOF);
            case INSULATED_JACKETS: case BASE_LAYERS: return List.of(Dim.WEIGHT, Dim.WARMTH);
            case STOVES: return List.of(Dim.WEIGHT, Dim.BOIL);
            case HEADLAMPS: return List.of(Dim.WEIGHT, Dim.BRIGHTNESS);
            case SLEEPING_PADS: return List.of(Dim.WEIGHT, Dim.WARMTH, Dim.THICKNESS);
            default: return List.of(Dim.WEIGHT);
        }
    }

    /** Features a target has or lacks. */
    private enum Feature {
        HOOD("hood", Trait.HOOD, new String[] {"has a hood", "comes with a hood", "with a hood", "has a proper hood"},
                new String[] {"has no hood", "no hood", "without a hood", "lacks a hood", "doesn't have a hood"}),
        PIT_ZIPS("pit-zips", Trait.PIT_ZIPS, new String[] {"has pit zips", "with pit zips", "comes with pit zips"},
                new String[] {"lacks pit zips", "no pit zips", "without pit zips"}),
        HIP_BELT("hip-belt", Trait.HIP_BELT, new String[] {"has a proper hip belt", "with a hip belt", "has a padded hipbelt"},
                new String[] {"no hip belt", "lacks a hip belt", "without a hipbelt"}),
        RAIN_COVER("rain-cover", Trait.RAIN_COVER, new String[] {"comes with a rain cover", "has a raincover"},
                new String[] {"no rain cover", "doesn't come with a rain cover"}),
        TWO_WAY_ZIPPER("two-way-zipper", Trait.TWO_WAY_ZIP, new String[] {"has a two-way zipper", "with a 2-way zip", "has a two way zipper"},
                new String[] {"no two-way zipper", "lacks a 2-way zipper", "without a two-way zip"}),
        WATERPROOF_CLAIM("waterproof-claim", Trait.PROTECTION, new String[] {"is actually waterproof", "fully waterproof"},
                new String[] {"isn't waterproof", "not waterproof", "not really waterproof"}),
        PACKABLE("packable", Trait.PACKABLE, new String[] {"packs into its own pocket", "packable"},
                new String[] {"doesn't pack down small", "not packable"});

        final String attribute;
        final Trait trait;
        final String[] has;
        final String[] lacks;

        Feature(String attribute, Trait trait, String[] has, String[] lacks) {
            this.attribute = attribute;
            this.trait = trait;
            this.has = has;
            this.lacks = lacks;
        }

        /** 1 = has, 0 = lacks, -1 = the listing's text does not say. */
        int state(Product p) {
            if (this == WATERPROOF_CLAIM) {
                if (!p.shows(Trait.PROTECTION)) {
                    return -1;
                }
                return "waterproof".equals(p.facts().term(Trait.PROTECTION)) ? 1 : 0;
            }
            if (!p.shows(trait)) {
                return -1;
            }
            return p.facts().flag(trait) ? 1 : 0;
        }
    }

    private static List<Feature> features(Category c) {
        switch (c) {
            case RAIN_SHELLS: return List.of(Feature.HOOD, Feature.PIT_ZIPS, Feature.TWO_WAY_ZIPPER, Feature.WATERPROOF_CLAIM, Feature.PACKABLE);
            case INSULATED_JACKETS: return List.of(Feature.HOOD, Feature.TWO_WAY_ZIPPER, Feature.PACKABLE);
            case SLEEPING_BAGS: return List.of(Feature.HOOD, Feature.TWO_WAY_ZIPPER);
            case BASE_LAYERS: return List.of(Feature.HOOD);
            case BACKPACKS: return List.of(Feature.HIP_BELT, Feature.RAIN_COVER, Feature.TWO_WAY_ZIPPER);
            case TENTS: return List.of(Feature.TWO_WAY_ZIPPER);
            case FOOTWEAR: case HEADLAMPS: return List.of(Feature.WATERPROOF_CLAIM);
            default: return List.of();
        }
    }

    /** Attributes people use with no anchor in the catalog text. */
    static final List<String> VAGUE = List.of("comfortable", "cozy", "sturdy", "overall-quality");

    private static List<String> vague(Category c) {
        List<String> v = new ArrayList<>();
        if (c != Category.STOVES && c != Category.HEADLAMPS && c != Category.TREKKING_POLES) {
            v.add("comfortable");
        }
        if (c == Category.SLEEPING_BAGS || c == Category.INSULATED_JACKETS || c == Category.BASE_LAYERS
                || c == Category.FOOTWEAR || c == Category.SLEEPING_PADS) {
            v.add("cozy");
        }
        if (c == Category.TENTS || c == Category.BACKPACKS || c == Category.FOOTWEAR || c == Category.TREKKING_POLES
                || c == Category.STOVES || c == Category.RAIN_SHELLS) {
            v.add("sturdy");
        }
        v.add("overall-quality");
        return v;
    }

    /** Misspellings some shoppers make; README and planted.json report how often each occurs. */
    static final Map<String, String> SHOPPER_TYPOS = typoMap();

    private static Map<String, String> typoMap() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("lighter", "ligher");
        m.put("heavier", "heavyer");
        m.put("warmer", "warmmer");
        m.put("comfortable", "confortable");
        m.put("waterproof", "waterprof");
        m.put("bulkier", "bulkyer");
        m.put("roomier", "roomyer");
        m.put("sturdier", "sturdyer");
        return m;
    }

    static final List<String> HEDGES = List.of("a bit", "slightly", "kind of", "sort of", "somewhat", "rather", "a little", "-ish");

    static Feedback generate(DemoCatalog catalog, long seed) {
        Feedback fb = new Feedback();
        Map<Category, List<Product>> byCat = new java.util.EnumMap<>(Category.class);
        for (Product p : catalog.products()) {
            byCat.computeIfAbsent(p.category(), k -> new ArrayList<>()).add(p);
        }
        List<Shopper> shoppers = new ArrayList<>();
        for (int i = 1; i <= SHOPPERS; i++) {
            Rng r = Rng.of(seed, "shopper", i);
            shoppers.add(new Shopper(String.format(Locale.ROOT, "shopper-%03d", i), r.between(0.05, 0.55), r.between(0.72, 0.97),
                    r.chance(0.25) ? r.between(0.15, 0.6) : 0.0, r.between(0.1, 0.45), r.chance(0.4), r.chance(0.3)));
        }
        Category[] cats = Category.values();
        double[] shares = new double[cats.length];
        for (int i = 0; i < cats.length; i++) {
            shares[i] = cats[i].share();
        }
        int pairNo = 0;
        long attempt = 0;
        while (fb.rows.size() < TARGET_SENTENCES) {
            Rng r = Rng.of(seed, "pair", ++attempt);
            List<Product> pool = byCat.get(cats[r.weighted(shares)]);
            Product ref = r.pick(pool);
            Product tgt = r.pick(pool);
            if (ref.id().equals(tgt.id()) || ref.id().equals(tgt.variantOf()) || tgt.id().equals(ref.variantOf())) {
                continue;
            }
            pairNo++;
            String pairId = String.format(Locale.ROOT, "P%04d", pairNo);
            int n = r.between(3, 5);
            List<Shopper> who = new ArrayList<>(shoppers);
            r.shuffle(who);
            for (int k = 0; k < n; k++) {
                Shopper s = who.get(k);
                String sentence = fb.sentence(ref, tgt, s, Rng.of(seed, "sentence", pairNo * 10L + k));
                fb.rows.add(new Row(pairId, ref.id(), tgt.id(), s.id, sentence));
            }
        }
        fb.pairs = pairNo;
        return fb;
    }

    private Tally tally(String attribute, String kind) {
        return tallies.computeIfAbsent(attribute, a -> new Tally(kind));
    }

    private String sentence(Product ref, Product tgt, Shopper s, Rng r) {
        int clauses = r.weighted(55, 40, 5) + 1;
        List<String> parts = new ArrayList<>();
        List<String> usedAttributes = new ArrayList<>();
        for (int c = 0; c < clauses; c++) {
            String clause = clause(ref, tgt, s, r, usedAttributes, c == 0);
            if (clause != null) {
                parts.add(clause);
            }
        }
        if (parts.isEmpty()) {
            parts.add(vagueClause(tgt.category(), s, r, usedAttributes));
        }
        StringBuilder b = new StringBuilder(parts.get(0));
        for (int i = 1; i < parts.size(); i++) {
            b.append(r.pick(" and ", " but ", ", ", " and also ", "; "));
            b.append(parts.get(i));
        }
        String text = b.toString();
        switch (r.weighted(30, 10, 8, 6, 5, 41)) {
            case 0: text += "."; break;
            case 1: text += "!"; break;
            case 2: text += " imo"; break;
            case 3: text += " tbh"; break;
            case 4: text += " for me"; break;
            default: break;
        }
        text = misspell(text, s, r);
        return s.lower ? text : Lexicon.capitalise(text);
    }

    private String clause(Product ref, Product tgt, Shopper s, Rng r, List<String> used, boolean first) {
        double vagueP = s.vague;
        if (r.chance(vagueP)) {
            return vagueClause(tgt.category(), s, r, used);
        }
        if (r.chance(0.3)) {
            String f = featureClause(ref, tgt, s, r, used);
            if (f != null) {
                return f;
            }
        }
        List<Dim> candidates = new ArrayList<>();
        for (Dim d : dims(tgt.category())) {
            double a = d.value(ref);
            double b = d.value(tgt);
            if (!used.contains(d.attribute) && !Double.isNaN(a) && !Double.isNaN(b)
                    && Math.abs(a - b) > 0.06 * Math.max(Math.abs(a), Math.abs(b)) + 1e-9) {
                candidates.add(d);
            }
        }
        if (candidates.isEmpty()) {
            String f = featureClause(ref, tgt, s, r, used);
            return f != null ? f : vagueClause(tgt.category(), s, r, used);
        }
        Dim d = r.pick(candidates);
        used.add(d.attribute);
        boolean truthMore = d.value(tgt) > d.value(ref);
        boolean right = r.chance(s.accuracy);
        boolean saysMore = right == truthMore;
        Tally t = tally(d.attribute, "comparative");
        t.mentions++;
        if (right) {
            t.agrees++;
        } else {
            t.contradicts++;
        }
        return comparative(d, saysMore, s, r, first);
    }

    private static String comparative(Dim d, boolean more, Shopper s, Rng r, boolean first) {
        String[] comp = more ? d.moreComp : d.lessComp;
        String[] base = more ? d.moreBase : d.lessBase;
        String[] oppositeBase = more ? d.lessBase : d.moreBase;
        String[] sup = more ? d.moreSup : d.lessSup;
        boolean hedge = r.chance(s.hedge);
        String than = first && r.chance(0.45) ? " than this one" : "";
        switch (r.weighted(34, 14, 10, 12, 10, 6)) {
            case 0: {
                String c = r.pick(comp);
                if (hedge) {
                    return r.pick("a bit ", "slightly ", "somewhat ", "a little ", "a tad ") + c + than;
                }
                return (r.chance(0.15) ? r.pick("much ", "way ", "a lot ") : "") + c + than;
            }
            case 1: {
                String b = r.pick(oppositeBase);
                String as = first && r.chance(0.5) ? " as this one" : "";
                return (hedge ? "not quite as " : "not as ") + b + as;
            }
            case 2:
                return r.pick(sup).startsWith("most") ? "the " + r.pick(sup) + " of the ones I tried" : "the " + r.pick(sup) + " one I looked at";
            case 3: {
                String b = r.pick(base);
                if (hedge) {
                    if (r.chance(0.3) && (b.equals("light") || b.equals("heavy") || b.equals("warm") || b.equals("small") || b.equals("bulky"))) {
                        return b.equals("light") ? "lightish" : b.equals("warm") ? "warmish" : b.equals("small") ? "smallish" : b + "-ish";
                    }
                    return r.pick("kind of ", "sort of ", "rather ", "somewhat ", "a bit ") + b;
                }
                return r.pick("pretty ", "really ", "very ", "quite ") + b;
            }
            case 4: {
                // "too X" only where X is the unwanted end of the scale
                String b = r.pick(base);
                boolean unwanted = b.equals("heavy") || b.equals("bulky") || b.equals("small") || b.equals("cramped")
                        || b.equals("cold") || b.equals("chilly") || b.equals("dim") || b.equals("thin") || b.equals("slow") || b.equals("leaky");
                if (!unwanted) {
                    return r.pick(comp) + than;
                }
                return (hedge ? r.pick("kind of ", "a bit ", "slightly ") : "") + "too " + b;
            }
            default: {
                // "more/less X"
                String b = r.pick(oppositeBase);
                if (b.equals("light") || b.equals("heavy") || b.equals("warm") || b.equals("cold") || b.equals("thin") || b.equals("thick")
                        || b.equals("big") || b.equals("small") || b.equals("fast") || b.equals("slow") || b.equals("dim") || b.equals("bright")
                        || b.equals("quick") || b.equals("chilly")) {
                    return (hedge ? "a bit " : "") + r.pick(comp) + than;
                }
                return (hedge ? "a bit " : "") + "less " + b + than;
            }
        }
    }

    private String featureClause(Product ref, Product tgt, Shopper s, Rng r, List<String> used) {
        // "with a bigger hood": the target's hood is helmet-compatible, the reference's is not
        if ((tgt.category() == Category.RAIN_SHELLS || tgt.category() == Category.INSULATED_JACKETS) && !used.contains("hood-size")
                && Feature.HOOD.state(tgt) == 1 && Feature.HOOD.state(ref) == 1
                && "helmet-compatible".equals(tgt.facts().term(Trait.HOOD_KIND)) != "helmet-compatible".equals(ref.facts().term(Trait.HOOD_KIND))
                && r.chance(0.4)) {
            used.add("hood-size");
            boolean truthBigger = "helmet-compatible".equals(tgt.facts().term(Trait.HOOD_KIND));
            boolean right = r.chance(s.accuracy);
            Tally t = tally("hood-size", "comparative");
            t.mentions++;
            if (right) {
                t.agrees++;
            } else {
                t.contradicts++;
            }
            boolean bigger = right == truthBigger;
            return bigger ? r.pick("with a bigger hood", "bigger hood", "the hood is bigger") : r.pick("with a smaller hood", "the hood is smaller", "tighter hood");
        }
        List<Feature> candidates = new ArrayList<>();
        for (Feature f : features(tgt.category())) {
            if (!used.contains(f.attribute) && f.state(tgt) >= 0) {
                candidates.add(f);
            }
        }
        if (candidates.isEmpty()) {
            return null;
        }
        Feature f = r.pick(candidates);
        used.add(f.attribute);
        boolean truthHas = f.state(tgt) == 1;
        boolean right = r.chance(s.accuracy);
        Tally t = tally(f.attribute, "presence");
        t.mentions++;
        if (right) {
            t.agrees++;
        } else {
            t.contradicts++;
        }
        boolean has = right == truthHas;
        String phrase = r.pick(has ? f.has : f.lacks);
        if (f == Feature.HOOD && has && r.chance(0.2)) {
            phrase = "with a " + r.pick("decent", "nice", "good") + " hood";
        }
        return phrase;
    }

    private String vagueClause(Category c, Shopper s, Rng r, List<String> used) {
        List<String> options = new ArrayList<>(vague(c));
        options.removeAll(used);
        String a = options.isEmpty() ? "overall-quality" : r.pick(options);
        used.add(a);
        Tally t = tally(a, "vague");
        t.mentions++;
        t.ungrounded++;
        boolean hedge = r.chance(s.hedge);
        String h = hedge ? r.pick("kind of ", "sort of ", "a bit ", "somewhat ", "rather ", "slightly ") : "";
        switch (a) {
            case "comfortable":
                return r.pick(h + "more comfortable", "comfier", "not as comfortable", h + "less comfortable", "super comfy",
                        h + "uncomfortable", "comfortable", "the most comfortable one", h + "comfortable");
            case "cozy": {
                String cozy = s.uk ? "cosy" : "cozy";
                return r.pick(s.uk ? "cosier" : "cozier", "so " + cozy, "not as " + cozy, h + cozy, "feels " + cozy, "the " + (s.uk ? "cosiest" : "coziest"));
            }
            case "sturdy":
                return r.pick("sturdier", "feels sturdier", h + "flimsy", "not as sturdy", "more solid", h + "sturdy", "the sturdiest", "feels flimsy");
            default:
                return r.pick("better", "nicer", "better quality", "worse", "the best one", "better made", h + "better", "not as nice", "worse overall");
        }
    }

    private static String misspell(String text, Shopper s, Rng r) {
        if (s.misspell == 0) {
            return text;
        }
        String out = text;
        for (Map.Entry<String, String> e : SHOPPER_TYPOS.entrySet()) {
            if (out.contains(e.getKey()) && r.chance(s.misspell)) {
                out = out.replaceFirst("\\b" + e.getKey() + "\\b", e.getValue());
            }
        }
        return out;
    }
}
