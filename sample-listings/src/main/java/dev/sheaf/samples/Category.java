package dev.sheaf.samples;

import java.util.Locale;

/** The shop's product categories; {@link #id} is what every file writes in its category field. */
enum Category {
    TENTS("tents", "Tents", "tent"),
    BACKPACKS("backpacks", "Backpacks", "backpack"),
    SLEEPING_BAGS("sleeping-bags", "Sleeping Bags", "sleeping bag"),
    RAIN_SHELLS("rain-shells", "Rain Shells", "rain jacket"),
    INSULATED_JACKETS("insulated-jackets", "Insulated Jackets", "insulated jacket"),
    FOOTWEAR("footwear", "Footwear", "boot"),
    STOVES("stoves", "Stoves", "stove"),
    HEADLAMPS("headlamps", "Headlamps", "headlamp"),
    SLEEPING_PADS("sleeping-pads", "Sleeping Pads", "sleeping pad"),
    TREKKING_POLES("trekking-poles", "Trekking Poles", "trekking pole"),
    BASE_LAYERS("base-layers", "Base Layers", "base layer");

    final String id;
    final String label;
    final String noun;

    Category(String id, String label, String noun) {
        this.id = id;
        this.label = label;
        this.noun = noun;
    }

    /** Relative share of the catalog (the demo and the scale corpora use the same mix). */
    double share() {
        switch (this) {
            case TENTS: case BACKPACKS: case RAIN_SHELLS: case INSULATED_JACKETS: return 11;
            case SLEEPING_BAGS: case FOOTWEAR: return 10;
            case BASE_LAYERS: return 9;
            case HEADLAMPS: return 8;
            case STOVES: case SLEEPING_PADS: return 7.5;
            default: return 5.5;
        }
    }

    boolean isApparel() {
        return this == RAIN_SHELLS || this == INSULATED_JACKETS || this == BASE_LAYERS;
    }

    static Category byId(String id) {
        for (Category c : values()) {
            if (c.id.equals(id.toLowerCase(Locale.ROOT))) {
                return c;
            }
        }
        throw new IllegalArgumentException("unknown category " + id);
    }
}
