package dev.sheaf.samples;


/**
 * Writes invented listings. Listing {@code i} depends only on the seed and {@code i} (and the
 * category and supplier it is given), never on what was generated before, so corpora stream and
 * any prefix of a large corpus is the same as a smaller corpus.
 */
final class ProductFactory {
    private static final Category[] CATEGORIES = Category.values();
    private static final double[] SHARES = new double[CATEGORIES.length];

    static {
        for (int i = 0; i < CATEGORIES.length; i++) {
            SHARES[i] = CATEGORIES[i].share();
        }
    }

    private final long seed;

    ProductFactory(long seed) {
        this.seed = seed;
    }

    /** "FH-000042"; seven digits and more once the index passes 999,999. */
    static String id(long index) {
        String digits = Long.toString(index);
        return digits.length() >= 6 ? "FH-" + digits : "FH-" + "000000".substring(digits.length()) + digits;
    }

    Category categoryFor(long index) {
        return CATEGORIES[Rng.of(seed, "category", index).weighted(SHARES)];
    }

    Supplier supplierFor(long index, Category c) {
        return Supplier.forCategory(c, Rng.of(seed, "supplier", index));
    }

    Product make(long index, Draft.Detail detail) {
        Category c = categoryFor(index);
        return make(index, c, supplierFor(index, c), detail);
    }

    Product make(long index, Category c, Supplier s, Draft.Detail detail) {
        Rng r = Rng.of(seed, "listing", index);
        Draft d = new Draft(id(index), c, new Voice(s, r));
        switch (c) {
            case TENTS: ShelterCopy.tent(d); break;
            case SLEEPING_BAGS: ShelterCopy.sleepingBag(d); break;
            case SLEEPING_PADS: ShelterCopy.sleepingPad(d); break;
            case BACKPACKS: PackCopy.backpack(d); break;
            case RAIN_SHELLS: ApparelCopy.rainShell(d); break;
            case INSULATED_JACKETS: ApparelCopy.insulatedJacket(d); break;
            case BASE_LAYERS: ApparelCopy.baseLayer(d); break;
            case FOOTWEAR: GearCopy.footwear(d); break;
            case STOVES: GearCopy.stove(d); break;
            case HEADLAMPS: GearCopy.headlamp(d); break;
            case TREKKING_POLES: GearCopy.trekkingPoles(d); break;
            default: throw new IllegalStateException("no copywriter for " + c);
        }
        return d.build(detail);
    }
}
