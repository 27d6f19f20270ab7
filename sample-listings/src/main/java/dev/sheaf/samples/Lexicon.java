package dev.sheaf.samples;

import java.util.List;

/**
 * Word pools of the invented shop. Product-line names, place names and tester names are built from
 * syllables, so large corpora get thousands of distinct names and a long tail of rare words; every
 * name here was made up for this demo (no real brand or product names).
 */
final class Lexicon {
    private Lexicon() {
    }

    static final List<String> LINE_HEADS = List.of(
            "Alder", "Brack", "Cairn", "Dunlin", "Esk", "Fern", "Gorse", "Heath", "Ingle", "Jorum",
            "Kin", "Larch", "Moor", "Nab", "Oak", "Pike", "Quill", "Rowan", "Scree", "Thorn",
            "Umber", "Vale", "Wren", "Yarrow", "Birch", "Cragg", "Dale", "Emb", "Flisk", "Glen",
            "Holm", "Ling", "Marr", "Ness", "Otter", "Peat", "Rill", "Sedge", "Tarn", "Whin",
            "Aske", "Blea", "Cotter", "Dray", "Elter", "Ferris", "Garth", "Hob", "Ivel", "Jura");

    static final List<String> LINE_TAILS = List.of(
            "mere", "wood", "fell", "ridge", "beck", "stone", "gill", "dale", "side", "top",
            "wick", "haven", "more", "ford", "crest", "brook", "shaw", "law", "scar", "hope",
            "field", "moss", "rigg", "thwaite", "holt");

    /** Words of the quirky supplier's own line names (written in capitals). */
    static final List<String> QUIRKY_LINES = List.of(
            "KNARR", "VARDE", "BRUN", "STORM", "FJELL", "GLINT", "HALD", "ROST", "SKAV", "TINDE",
            "ULV", "ISBRE", "MYR", "NUT", "ODDE", "RAUM", "SLETT", "TORV", "VIDDA", "AUR");

    static final List<String> PLACE_HEADS = List.of(
            "Skarn", "Blae", "Corrie", "Drum", "Easter", "Fionn", "Garbh", "Haw", "Inver", "Knock",
            "Lochan", "Mell", "Nether", "Over", "Pen", "Raven", "Sgurr", "Tor", "Upper", "Wester",
            "Black", "Cold", "High", "Long", "Red", "White", "Grey", "Hollow", "Stony", "Windy",
            "Bleak", "Crag", "Deep", "Fold", "Gap", "Hart", "Kirk", "Lang", "Mill", "Sheep");

    static final List<String> PLACE_TAILS = List.of(
            "hope", "side", "dale", "more", "law", "rig", "haugh", "cleugh", "beck", "gill",
            "moss", "tarn", "shank", "knowe", "thwaite", "combe", "ness", "holme", "by", "ton");

    static final List<String> PLACE_KINDS = List.of(
            "Ridge", "Pass", "Traverse", "Horseshoe", "Edge", "Moor", "Forest", "Coast Path", "Loop", "Col",
            "Glen", "Plateau", "Bothy", "Round", "Way", "Hut Trail", "Fells", "Basin", "Saddle", "Spur");

    static final List<String> WEATHER = List.of(
            "horizontal sleet", "a week of drizzle", "a late-spring blizzard", "thick hill fog", "driving rain",
            "an August heatwave", "hail at the summit", "wet snow", "a cold, clear night", "persistent mizzle",
            "gale-force gusts", "freezing rain", "midge season", "an autumn storm", "a dry, dusty heat",
            "a thunderstorm on the ridge", "steady rain for three days", "a hard frost", "blowing spindrift", "sea haar");

    static final List<String> TESTERS = List.of(
            "Maren", "Ossian", "Tamsin", "Idris", "Briony", "Calum", "Ysolde", "Ewan", "Freya", "Lorcan",
            "Ailsa", "Torin", "Morwen", "Hamish", "Sela", "Dorian", "Isla", "Corin", "Elspeth", "Ruaridh");

    static final List<String> USES = List.of(
            "weekend trips", "thru-hiking", "alpine starts", "bikepacking", "car camping", "fastpacking",
            "winter camping", "festival weekends", "wild camping", "coastal walks", "hut-to-hut treks",
            "family campouts", "trail running", "overnighters", "long-distance trails", "scrambling",
            "canoe trips", "hillwalking", "backpacking", "day hikes");

    /** Marketing words a curator usually drops. */
    static final List<String> FLUFF_WORDS = List.of(
            "premium", "versatile", "ultimate", "innovative", "best-in-class", "next-level", "game-changing",
            "must-have", "high-performance", "adventure-ready", "go-anywhere", "trail-proven", "expedition-grade");

    /** A colour: family (facet value) and display name in US and UK spelling. */
    record Colour(String family, String us, String uk) {
        String name(boolean ukSpelling) {
            return ukSpelling ? uk : us;
        }
    }

    static final List<Colour> COLOURS = List.of(
            new Colour("green", "Moss Green", "Moss Green"),
            new Colour("green", "Olive", "Olive"),
            new Colour("green", "Fern", "Fern"),
            new Colour("green", "Pine", "Pine"),
            new Colour("green", "Sage", "Sage"),
            new Colour("green", "Lichen", "Lichen"),
            new Colour("blue", "Fjord Blue", "Fjord Blue"),
            new Colour("blue", "Navy", "Navy"),
            new Colour("blue", "Cobalt", "Cobalt"),
            new Colour("blue", "Glacier Blue", "Glacier Blue"),
            new Colour("blue", "Slate Blue", "Slate Blue"),
            new Colour("grey", "Slate Gray", "Slate Grey"),
            new Colour("grey", "Charcoal", "Charcoal"),
            new Colour("grey", "Storm Gray", "Storm Grey"),
            new Colour("grey", "Pebble Gray", "Pebble Grey"),
            new Colour("grey", "Ash", "Ash"),
            new Colour("red", "Brick Red", "Brick Red"),
            new Colour("red", "Cranberry", "Cranberry"),
            new Colour("red", "Ember Red", "Ember Red"),
            new Colour("orange", "Rust", "Rust"),
            new Colour("orange", "Amber", "Amber"),
            new Colour("orange", "Tangerine", "Tangerine"),
            new Colour("yellow", "Mustard", "Mustard"),
            new Colour("yellow", "Sulfur", "Sulphur"),
            new Colour("yellow", "Lemon", "Lemon"),
            new Colour("black", "Black", "Black"),
            new Colour("black", "Jet Black", "Jet Black"),
            new Colour("brown", "Peat", "Peat"),
            new Colour("brown", "Chestnut", "Chestnut"),
            new Colour("brown", "Bark", "Bark"),
            new Colour("brown", "Sand", "Sand"),
            new Colour("purple", "Heather", "Heather"),
            new Colour("purple", "Plum", "Plum"),
            new Colour("white", "Chalk", "Chalk"));

    /** Linking syllables that lengthen some names ("Brack" + "en" + "mere"). */
    static final List<String> INFIXES = List.of("en", "ing", "ow", "ar", "il", "an", "el", "or", "ock", "ith", "un", "ay");

    /** A product-line name such as "Larchmere" or "Brackenfell" (50 × 25 plain, × 12 more with an infix: 16,250 names). */
    static String lineName(Rng r) {
        String head = r.pickSkewed(LINE_HEADS, 2);
        String infix = r.chance(0.3) ? r.pickSkewed(INFIXES, 1.5) : "";
        return head + infix + r.pickSkewed(LINE_TAILS, 1.5);
    }

    /**
     * An invented place such as "Skarnhope Ridge" or "Blaeowgill Col" (40 × 20 plain, × 12 more with an infix,
     * × 20 kinds: over 200,000 names; skewed, so a long tail of words seen once).
     */
    static String place(Rng r) {
        String head = r.pickSkewed(PLACE_HEADS, 2);
        String infix = r.chance(0.5) ? r.pick(INFIXES) : "";
        return head + infix + r.pickSkewed(PLACE_TAILS, 2) + " " + r.pickSkewed(PLACE_KINDS, 1.5);
    }

    static String capitalise(String s) {
        if (s.isEmpty() || !Character.isLowerCase(s.charAt(0))) {
            return s;
        }
        return Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
