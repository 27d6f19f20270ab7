package dev.sheaf.miner.mine;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** A seeded random catalog with heavy repetition, stop words, breaks, specs and several sources: input for oracle tests. */
final class RandomCatalog {
    private static final String[] WORDS = {
        "ripstop", "nylon", "down", "800-fill", "jacket", "tent", "two-way", "zipper", "waterproof", "seams", "taped",
        "hood", "packable", "lightweight", "merino", "wool", "base", "layer", "trekking", "poles", "carbon", "alpine",
        "up", "off", "over", "10,000mm", "1.2kg", "2", "lb", "the", "and", "with", "from", "no", "not", "without", "a",
        "sleeping", "bag", "stove", "titanium", "mesh", "pocket", "pockets", "Zipper", "ZIPPER", "Men's"};
    private static final String[] BREAKS = {" ", " ", " ", " ", " ", ", ", ". ", "; ", "\n", " - ", " (", ") "};
    private static final String[] CATEGORIES = {"tents", "jackets", "packs", "sleeping-bags", ""};
    private static final String[] KEYS = {"Weight", "Wt.", "Material", "Colour", "Color"};
    private static final String[] VALUES = {"1.2 kg", "2 lb 10 oz", "ripstop nylon", "green", "Green", "850 g"};

    private RandomCatalog() {
    }

    static List<Listing> make(long seed, int listings) {
        Random r = new Random(seed);
        List<Listing> out = new ArrayList<>();
        for (int i = 0; i < listings; i++) {
            List<Field> fields = new ArrayList<>();
            fields.add(Field.of(FieldKind.TITLE, text(r, 2 + r.nextInt(5))));
            fields.add(Field.of(FieldKind.DESCRIPTION, text(r, r.nextInt(40))));
            for (int b = r.nextInt(3); b > 0; b--) {
                fields.add(Field.of(FieldKind.BULLET, text(r, 1 + r.nextInt(8))));
            }
            for (int s = r.nextInt(3); s > 0; s--) {
                fields.add(Field.spec(KEYS[r.nextInt(KEYS.length)], VALUES[r.nextInt(VALUES.length)]));
            }
            String source = "feed-" + (i % 3) + ".jsonl";
            out.add(new Listing("L" + i, CATEGORIES[r.nextInt(CATEGORIES.length)], source, "line " + (i / 3 + 1), fields));
        }
        return out;
    }

    private static String text(Random r, int words) {
        StringBuilder b = new StringBuilder();
        for (int w = 0; w < words; w++) {
            if (w > 0) {
                b.append(BREAKS[r.nextInt(BREAKS.length)]);
            }
            // skewed choice: low indices far more often, so n-grams repeat
            int k = (int) Math.floor(Math.pow(r.nextDouble(), 2.2) * WORDS.length);
            b.append(WORDS[Math.min(k, WORDS.length - 1)]);
        }
        return b.toString();
    }
}
