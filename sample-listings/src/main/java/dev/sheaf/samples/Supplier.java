package dev.sheaf.samples;

import java.util.List;
import java.util.Objects;

/**
 * An invented supplier and its writing habits. Every supplier spells, abbreviates and measures in
 * its own way; {@link #quirky} marks the one whose sheets follow none of the shop's conventions.
 *
 * @param spelling US or UK spelling ("gray"/"grey", "color"/"colour", "aluminum"/"aluminium")
 * @param units    preferred unit system for quantities
 * @param fluff    probability of a marketing sentence in a description, 0..1
 */
record Supplier(String id, String name, String brand, Spelling spelling, Units units, double fluff, boolean quirky,
                List<Category> categories) {

    enum Spelling { US, UK }

    enum Units { METRIC, IMPERIAL, DUAL }

    Supplier {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(brand, "brand");
        Objects.requireNonNull(spelling, "spelling");
        Objects.requireNonNull(units, "units");
        if (fluff < 0 || fluff > 1) {
            throw new IllegalArgumentException("fluff must be in [0, 1], got " + fluff);
        }
        categories = List.copyOf(categories);
        if (categories.isEmpty()) {
            throw new IllegalArgumentException("supplier " + id + " supplies no category");
        }
    }

    boolean uk() {
        return spelling == Spelling.UK;
    }

    static final Supplier TARNWICK = new Supplier("tarnwick", "Tarnwick Outdoor Co.", "Tarnwick", Spelling.UK, Units.METRIC, 0.35, false,
            List.of(Category.TENTS, Category.BACKPACKS, Category.SLEEPING_PADS, Category.TREKKING_POLES, Category.HEADLAMPS));
    static final Supplier BRAMBLECREST = new Supplier("bramblecrest", "Bramblecrest Textiles", "Bramblecrest", Spelling.US, Units.DUAL, 0.6, false,
            List.of(Category.RAIN_SHELLS, Category.INSULATED_JACKETS, Category.BASE_LAYERS, Category.SLEEPING_BAGS));
    static final Supplier QUILLMOOR = new Supplier("quillmoor", "Quillmoor Equipment", "Quillmoor", Spelling.US, Units.IMPERIAL, 0.45, false,
            List.of(Category.STOVES, Category.HEADLAMPS, Category.TREKKING_POLES, Category.BACKPACKS, Category.TENTS));
    static final Supplier MORROWFELL = new Supplier("morrowfell", "Morrowfell Gear", "Morrowfell", Spelling.US, Units.METRIC, 0.5, false,
            List.of(Category.TENTS, Category.BACKPACKS, Category.SLEEPING_PADS, Category.SLEEPING_BAGS, Category.STOVES));
    static final Supplier HALLORAN = new Supplier("halloran-dace", "Halloran & Dace", "Halloran & Dace", Spelling.UK, Units.DUAL, 0.3, false,
            List.of(Category.FOOTWEAR, Category.BASE_LAYERS, Category.RAIN_SHELLS, Category.INSULATED_JACKETS));
    static final Supplier KESTRIN = new Supplier("kestrin", "Kestrin Works", "Kestrin", Spelling.US, Units.IMPERIAL, 0.55, false,
            List.of(Category.SLEEPING_BAGS, Category.INSULATED_JACKETS, Category.FOOTWEAR, Category.SLEEPING_PADS, Category.HEADLAMPS));
    /** The supplier that writes everything differently: own keys, abbreviations, imperial units, capitals. */
    static final Supplier SKELDA = new Supplier("skelda", "Skelda Mountain Works", "SKELDA", Spelling.US, Units.IMPERIAL, 0.0, true,
            List.of(Category.values()));

    static final List<Supplier> ALL = List.of(TARNWICK, BRAMBLECREST, QUILLMOOR, MORROWFELL, HALLORAN, KESTRIN, SKELDA);

    /** Share of listings that come from the quirky supplier. */
    static final double QUIRKY_SHARE = 0.075;

    /** A supplier for a category: the quirky one with {@link #QUIRKY_SHARE}, else one of the regular suppliers of it. */
    static Supplier forCategory(Category c, Rng rng) {
        if (rng.chance(QUIRKY_SHARE)) {
            return SKELDA;
        }
        return regularFor(c, rng);
    }

    static Supplier regularFor(Category c, Rng rng) {
        List<Supplier> fits = REGULAR.get(c);
        return fits.get(rng.nextInt(fits.size()));
    }

    private static final java.util.Map<Category, List<Supplier>> REGULAR = regular();

    private static java.util.Map<Category, List<Supplier>> regular() {
        java.util.Map<Category, List<Supplier>> m = new java.util.EnumMap<>(Category.class);
        for (Category c : Category.values()) {
            List<Supplier> fits = new java.util.ArrayList<>();
            for (Supplier s : ALL) {
                if (!s.quirky && s.categories.contains(c)) {
                    fits.add(s);
                }
            }
            m.put(c, List.copyOf(fits));
        }
        return m;
    }
}
