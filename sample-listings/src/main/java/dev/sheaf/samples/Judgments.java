package dev.sheaf.samples;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * Annotator judgments: about 300 listings (product pages and sheets, where the full copy is
 * visible), each judged by 5 of 8 pseudonymous raters on the attributes that apply to its category.
 * Clear attributes follow the listing's text (a rater errs about 1% of the time, and guesses when
 * the text is silent); tentative ones need interpretation (a grade from a stated weight); contested
 * ones have no anchor in the text and each rater has their own bias. A few judgments are missing.
 */
final class Judgments {

    static final int ITEMS = 300;
    static final int RATERS_PER_ITEM = 5;
    static final List<String> RATERS = List.of("rater-A", "rater-B", "rater-C", "rater-D", "rater-E", "rater-F", "rater-G", "rater-H");
    /** Probability that one judgment (item, rater, attribute) is missing. */
    static final double MISSING = 0.002;

    enum Kind { BINARY, NOMINAL, ORDINAL }

    /** Agreement class planted for an attribute (Krippendorff 2004 bands: reliable ≥ .800, tentative .667–.800, contested below). */
    enum Agreement { CLEAR, TENTATIVE, CONTESTED }

    enum Attribute {
        HOOD("hood", Kind.BINARY, Agreement.CLEAR, EnumSet.of(Category.RAIN_SHELLS, Category.INSULATED_JACKETS, Category.SLEEPING_BAGS, Category.BASE_LAYERS)),
        WATERPROOF("waterproof", Kind.BINARY, Agreement.CLEAR, judgedCategories()),
        MATERIAL("main-material", Kind.NOMINAL, Agreement.CLEAR, judgedCategories()),
        INSULATION("insulation", Kind.NOMINAL, Agreement.CLEAR, EnumSet.of(Category.INSULATED_JACKETS, Category.SLEEPING_BAGS)),
        COLOUR("colour", Kind.NOMINAL, Agreement.CLEAR, judgedCategories()),
        TWO_WAY_ZIPPER("two-way-zipper", Kind.BINARY, Agreement.CLEAR, EnumSet.of(Category.RAIN_SHELLS, Category.INSULATED_JACKETS, Category.SLEEPING_BAGS, Category.BACKPACKS, Category.TENTS)),
        PIT_ZIPS("pit-zips", Kind.BINARY, Agreement.CLEAR, EnumSet.of(Category.RAIN_SHELLS)),
        SEASON("season-rating", Kind.NOMINAL, Agreement.CLEAR, EnumSet.of(Category.TENTS, Category.SLEEPING_BAGS)),
        PFC_FREE("pfc-free", Kind.BINARY, Agreement.CLEAR, judgedCategories()),
        FIBRE_CONTENT("fibre-content-stated", Kind.BINARY, Agreement.CLEAR, EnumSet.of(Category.RAIN_SHELLS, Category.INSULATED_JACKETS, Category.SLEEPING_BAGS, Category.BASE_LAYERS)),
        RECYCLED("recycled-material", Kind.BINARY, Agreement.CLEAR, judgedCategories()),
        WEIGHT_CLASS("weight-class", Kind.ORDINAL, Agreement.TENTATIVE, judgedCategories()),
        WARMTH("warmth", Kind.ORDINAL, Agreement.TENTATIVE, EnumSet.of(Category.INSULATED_JACKETS, Category.SLEEPING_BAGS, Category.BASE_LAYERS)),
        PACKABLE("packable", Kind.BINARY, Agreement.TENTATIVE, EnumSet.of(Category.INSULATED_JACKETS, Category.RAIN_SHELLS, Category.SLEEPING_BAGS)),
        BREATHABLE("breathable", Kind.BINARY, Agreement.TENTATIVE, EnumSet.of(Category.RAIN_SHELLS, Category.FOOTWEAR, Category.BASE_LAYERS)),
        COMFORTABLE("comfortable", Kind.ORDINAL, Agreement.CONTESTED, judgedCategories()),
        COZY("cozy", Kind.BINARY, Agreement.CONTESTED, EnumSet.of(Category.INSULATED_JACKETS, Category.SLEEPING_BAGS, Category.BASE_LAYERS, Category.FOOTWEAR)),
        STURDY("sturdy", Kind.ORDINAL, Agreement.CONTESTED, EnumSet.of(Category.TENTS, Category.BACKPACKS, Category.FOOTWEAR, Category.RAIN_SHELLS)),
        STYLISH("stylish", Kind.ORDINAL, Agreement.CONTESTED, judgedCategories()),
        VERSATILE("versatile", Kind.BINARY, Agreement.CONTESTED, judgedCategories()),
        PREMIUM("premium-feel", Kind.ORDINAL, Agreement.CONTESTED, judgedCategories()),
        ECO_FRIENDLY("eco-friendly", Kind.BINARY, Agreement.CONTESTED, judgedCategories()),
        GOOD_VALUE("good-value", Kind.ORDINAL, Agreement.CONTESTED, judgedCategories());

        final String id;
        final Kind kind;
        final Agreement agreement;
        final Set<Category> categories;

        Attribute(String id, Kind kind, Agreement agreement, Set<Category> categories) {
            this.id = id;
            this.kind = kind;
            this.agreement = agreement;
            this.categories = categories;
        }

        // a method, not a constant: enum constants cannot refer to a static field of their own enum
        private static Set<Category> judgedCategories() {
            return EnumSet.of(Category.RAIN_SHELLS, Category.INSULATED_JACKETS, Category.SLEEPING_BAGS, Category.BASE_LAYERS,
                    Category.TENTS, Category.BACKPACKS, Category.FOOTWEAR);
        }
    }

    record Row(String item, String annotator, String attribute, String value) {
    }

    final List<Row> rows = new ArrayList<>();
    final List<String> items = new ArrayList<>();
    int missing;

    static Judgments generate(DemoCatalog catalog, long seed) {
        Judgments j = new Judgments();
        Set<Category> judged = Attribute.judgedCategories();
        List<Product> pool = new ArrayList<>();
        for (DemoCatalog.Entry e : catalog.entries) {
            if (e.format().perFile() && judged.contains(e.product().category())) {
                pool.add(e.product());
            }
        }
        Rng pick = Rng.of(seed, "judged-items", 0);
        pick.shuffle(pool);
        List<Product> chosen = new ArrayList<>(pool.subList(0, ITEMS));
        chosen.sort((a, b) -> a.id().compareTo(b.id()));
        // per-rater habits for the contested attributes
        double[][] bias = new double[RATERS.size()][Attribute.values().length];
        for (int r = 0; r < RATERS.size(); r++) {
            Rng rr = Rng.of(seed, "rater", r);
            for (Attribute a : Attribute.values()) {
                bias[r][a.ordinal()] = a.agreement == Agreement.CONTESTED ? rr.between(-1.2, 1.2)
                        : a.agreement == Agreement.TENTATIVE ? rr.between(-0.4, 0.4) : 0;
            }
        }
        for (Product p : chosen) {
            j.items.add(p.id());
            Rng r = Rng.of(seed, "judgment", Long.parseLong(p.id().substring(3)));
            List<Integer> raters = new ArrayList<>();
            for (int i = 0; i < RATERS.size(); i++) {
                raters.add(i);
            }
            r.shuffle(raters);
            List<Integer> five = new ArrayList<>(raters.subList(0, RATERS_PER_ITEM));
            Collections.sort(five);
            for (int ri : five) {
                for (Attribute a : Attribute.values()) {
                    if (!a.categories.contains(p.category())) {
                        continue;
                    }
                    // what raters of a contested attribute share about this item: a weak common impression
                    double impression = Rng.of(seed, "impression-" + a.id, Long.parseLong(p.id().substring(3))).gaussian();
                    String value = judge(p, a, bias[ri][a.ordinal()], impression, r);
                    if (r.chance(MISSING)) {
                        j.missing++;
                        continue;
                    }
                    j.rows.add(new Row(p.id(), RATERS.get(ri), a.id, value));
                }
            }
        }
        return j;
    }

    static final List<String> MATERIALS = List.of("nylon", "polyester", "merino wool", "leather", "mesh");
    static final List<String> COLOURS = List.of("green", "blue", "grey", "red", "orange", "yellow", "black", "brown", "purple", "white");
    static final List<String> SEASONS = List.of("summer", "three-season", "four-season");
    static final List<String> INSULATIONS = List.of("down", "synthetic");

    private static String judge(Product p, Attribute a, double bias, double impression, Rng r) {
        Facts f = p.facts();
        switch (a) {
            case HOOD: return clearFlag(f.flag(Trait.HOOD), p.shows(Trait.HOOD), r);
            case WATERPROOF: return clearFlag("waterproof".equals(f.term(Trait.PROTECTION)), p.shows(Trait.PROTECTION) || p.shows(Trait.WATERPROOF_MM), r);
            case MATERIAL: return clearTerm(f.term(Trait.MATERIAL), MATERIALS, r);
            case INSULATION: return clearTerm(f.term(Trait.INSULATION), INSULATIONS, r);
            case COLOUR: return clearTerm(f.term(Trait.COLOUR), COLOURS, r);
            case TWO_WAY_ZIPPER: return clearFlag(f.flag(Trait.TWO_WAY_ZIP), p.shows(Trait.TWO_WAY_ZIP), r);
            case PIT_ZIPS: return clearFlag(f.flag(Trait.PIT_ZIPS), p.shows(Trait.PIT_ZIPS), r);
            case SEASON: return clearTerm(f.term(Trait.SEASON), SEASONS, r);
            case PFC_FREE: return clearFlag(f.flag(Trait.PFC_FREE), p.shows(Trait.PFC_FREE), r);
            case FIBRE_CONTENT: return clearFlag(f.has(Trait.FIBRE), p.shows(Trait.FIBRE), r);
            case RECYCLED: return clearFlag(f.flag(Trait.RECYCLED), f.flag(Trait.RECYCLED), r);
            // tentative: a grade read off stated figures, each rater a little biased, with spread
            case WEIGHT_CLASS: return grade(f.number(Trait.WEIGHT_CLASS) + bias + 0.8 * r.gaussian());
            case WARMTH: return grade(f.number(Trait.WARMTH) + bias + 0.65 * r.gaussian());
            case PACKABLE: return p.shows(Trait.PACKABLE) ? presence(r.chance(0.96) == f.flag(Trait.PACKABLE))
                    : presence(r.chance(clamp((f.flag(Trait.PACKABLE) ? 0.65 : 0.08) + bias / 5)));
            case BREATHABLE: return presence(r.chance(clamp((f.flag(Trait.BREATHABLE) ? 0.95 : 0.07) + bias / 5)));
            // contested: a weak shared impression of the item, the rater's own leaning, a wide spread
            case COZY: return presence(r.chance(clamp(0.5 + 0.25 * impression + bias / 2.4 + (f.has(Trait.WARMTH) ? 0.05 * (f.number(Trait.WARMTH) - 3) : 0))));
            case VERSATILE: return presence(r.chance(clamp(0.5 + 0.25 * impression + bias / 2.4)));
            case ECO_FRIENDLY: return presence(r.chance(clamp(0.45 + 0.25 * impression + bias / 2.4 + (f.flag(Trait.PFC_FREE) || f.flag(Trait.RECYCLED) ? 0.15 : 0))));
            default:
                double anchor = a == Attribute.COMFORTABLE ? 0.1 * (3 - f.number(Trait.WEIGHT_CLASS)) : 0;
                return grade(3 + anchor + 0.6 * impression + bias + 1.0 * r.gaussian());
        }
    }

    private static double clamp(double p) {
        return Math.max(0.02, Math.min(0.98, p));
    }

    private static String presence(boolean present) {
        return present ? "present" : "absent";
    }

    /** Probability that a rater misreads a clear attribute the text states. */
    static final double CLEAR_ERROR = 0.01;

    /** A clear yes/no: right 99% of the time when the text says so; when it is silent, nearly every rater says absent. */
    private static String clearFlag(boolean truth, boolean shown, Rng r) {
        if (!shown) {
            return presence(r.chance(truth ? 0.3 : 0.01));
        }
        return presence(r.chance(1 - CLEAR_ERROR) == truth);
    }

    private static String clearTerm(String truth, List<String> values, Rng r) {
        if (truth == null || !values.contains(truth)) {
            throw new IllegalStateException("no judged value for " + truth + " among " + values);
        }
        if (r.chance(1 - CLEAR_ERROR)) {
            return truth;
        }
        String other;
        do {
            other = r.pick(values);
        } while (other.equals(truth));
        return other;
    }

    private static String grade(double latent) {
        long g = Math.round(latent);
        return Long.toString(Math.max(1, Math.min(5, g)));
    }
}
