package dev.sheaf.samples;

/**
 * What is true of an invented product, before any wording: the ground truth the feedback and
 * judgment generators compare against. Units are fixed here, whatever unit the text uses.
 */
enum Trait {
    /** Mass in grams (footwear: per pair; trekking poles: per pair). */
    WEIGHT_G(Kind.NUMBER),
    /** Pack volume in litres. */
    VOLUME_L(Kind.NUMBER),
    /** Tent capacity in persons. */
    PERSONS(Kind.NUMBER),
    /** Floor area in square metres. */
    FLOOR_M2(Kind.NUMBER),
    /** Sleeping bag comfort temperature in degrees Celsius. */
    COMFORT_C(Kind.NUMBER),
    FILL_POWER(Kind.NUMBER),
    /** Insulation mass in grams. */
    FILL_G(Kind.NUMBER),
    /** "down", "synthetic", "none". */
    INSULATION(Kind.TERM),
    HOOD(Kind.FLAG),
    /** "helmet-compatible", "adjustable", "stowable", "insulated", "fixed". */
    HOOD_KIND(Kind.TERM),
    /** "waterproof", "water-resistant", "none". */
    PROTECTION(Kind.TERM),
    /** Hydrostatic head in millimetres (0 = not stated). */
    WATERPROOF_MM(Kind.NUMBER),
    DWR(Kind.FLAG),
    PFC_FREE(Kind.FLAG),
    TWO_WAY_ZIP(Kind.FLAG),
    PIT_ZIPS(Kind.FLAG),
    TAPED_SEAMS(Kind.FLAG),
    FLAME_RESISTANT(Kind.FLAG),
    CHILD_SAFETY(Kind.FLAG),
    UPF(Kind.NUMBER),
    /** The fibre-content statement, when the listing makes one. */
    FIBRE(Kind.TERM),
    /** Main material facet value: "nylon", "polyester", "merino wool", "leather", "aluminium", "carbon fibre", "foam", "steel", "titanium", "mesh". */
    MATERIAL(Kind.TERM),
    /** Colour family: green, blue, grey, red, orange, yellow, black, brown, purple, white. */
    COLOUR(Kind.TERM),
    /** "summer", "three-season", "four-season". */
    SEASON(Kind.TERM),
    LUMENS(Kind.NUMBER),
    BEAM_M(Kind.NUMBER),
    /** "AAA", "rechargeable", "hybrid". */
    BATTERY(Kind.TERM),
    /** "IPX4", "IPX7", "IPX8", or absent. */
    IP(Kind.TERM),
    /** Seconds to boil one litre. */
    BOIL_S(Kind.NUMBER),
    FUEL(Kind.TERM),
    OUTPUT_W(Kind.NUMBER),
    R_VALUE(Kind.NUMBER),
    THICKNESS_CM(Kind.NUMBER),
    PAD_TYPE(Kind.TERM),
    /** Packed volume in litres (how small it packs). */
    PACKED_L(Kind.NUMBER),
    PACKABLE(Kind.FLAG),
    HIP_BELT(Kind.FLAG),
    RAIN_COVER(Kind.FLAG),
    FREESTANDING(Kind.FLAG),
    BREATHABLE(Kind.FLAG),
    RECYCLED(Kind.FLAG),
    KIDS(Kind.FLAG),
    /** Derived warmth grade 1..5 for insulating products. */
    WARMTH(Kind.NUMBER),
    /** Derived weight class 1..5 within the category (quintile-like bands). */
    WEIGHT_CLASS(Kind.NUMBER);

    enum Kind { NUMBER, FLAG, TERM }

    final Kind kind;

    Trait(Kind kind) {
        this.kind = kind;
    }
}
