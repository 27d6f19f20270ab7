package dev.sheaf.miner.text;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Rough throughput of {@link Quantities#find} on listing-like text, beside two references on the same
 * text in the same run: a precompiled regular expression for "number + unit" (what a quick extractor
 * would use; it reads far fewer forms) and a bare char loop (the floor: touching every char once).
 * Not a unit test and not JMH: a warmed-up loop with wall-clock timing, good to a factor, no better.
 *
 * <pre>
 * mvn -o -q -B -pl miner -am test-compile
 * java -Xmx2g -cp miner/target/classes:miner/target/test-classes dev.sheaf.miner.text.QuantitiesBenchmark [listings] [rounds]
 * </pre>
 *
 * The text is generated here from invented Fernhollow Outfitters phrases (seed 42), about 430 chars a
 * listing like the generated corpora; it is load, not a check value.
 */
public final class QuantitiesBenchmark {
    private static final Pattern REFERENCE = Pattern.compile(
            "(?<![\\w.])(?:\\d{1,3}(?:,\\d{3})+|\\d+)(?:\\.\\d+)?\\s?"
                    + "(?:kg|g|lbs?|oz|mm|cm|m|in|ft|mL|L|l|gal|°[FC]|lm|lumens|hours|h|denier|D)\\b");

    private static final String[] OPENERS = {"The Fernhollow %s is a %d-person, %d-season tent", "Our %s daypack carries %d L",
            "The %s sleeping bag is filled with %d-fill down", "A %s headlamp with %d lumens", "The %s stove boils 1 L in %d min"};
    private static final String[] NAMES = {"Ridgeline", "Alder", "Tarn", "Bracken", "Cairn", "Heron", "Larch", "Scree"};
    private static final String[] PHRASES = {
            "weighing %d.%d kg (%d lb %d oz) on the trail", "with a %dD ripstop fly rated %d,000 mm waterproof",
            "packs down to %d x %d in", "comfort rated to %d°F / -%d°C", "made from recycled nylon with a soft brushed lining",
            "two-way zippers and %d pockets keep small things in reach", "approx. %d g without the stuff sack",
            "burns for %d hours on a single canister", "holds %d fl oz of water", "the hip belt fits waists %d-%d in",
            "taped seams, a bathtub floor and reflective guy lines", "ships with stakes, guylines and a repair kit"};

    private QuantitiesBenchmark() {
    }

    public static void main(String[] args) {
        int listings = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
        int rounds = args.length > 1 ? Integer.parseInt(args[1]) : 8;
        List<String> texts = corpus(listings, new Random(42));
        long chars = 0;
        for (String t : texts) {
            chars += t.length();
        }
        System.out.printf("corpus: %,d listings, %,d chars (%.1f MB as UTF-16 chars / 2 bytes each counted as 1 MB = 10^6 chars)%n",
                listings, chars, chars / 1e6);
        for (int r = 0; r < rounds; r++) {
            long t0 = System.nanoTime();
            long found = 0;
            for (String t : texts) {
                found += Quantities.find(t).size();
            }
            long t1 = System.nanoTime();
            long matched = 0;
            for (String t : texts) {
                Matcher m = REFERENCE.matcher(t);
                while (m.find()) {
                    matched++;
                }
            }
            long t2 = System.nanoTime();
            long digits = 0;
            for (String t : texts) {
                for (int k = 0; k < t.length(); k++) {
                    char c = t.charAt(k);
                    if (c >= '0' && c <= '9') {
                        digits++;
                    }
                }
            }
            long t3 = System.nanoTime();
            System.out.printf("round %d: Quantities.find %6.1f Mchar/s (%,d quantities, %,.0f listings/s) | regex reference %6.1f Mchar/s (%,d matches) | char loop %7.1f Mchar/s (%,d digits)%n",
                    r + 1, mps(chars, t1 - t0), found, listings / ((t1 - t0) / 1e9), mps(chars, t2 - t1), matched, mps(chars, t3 - t2), digits);
        }
        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP && pool.getPeakUsage() != null) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        System.out.printf("peak heap (sum of pool peaks, includes the corpus): %.0f MB; cores: %d%n",
                peak / 1e6, Runtime.getRuntime().availableProcessors());
    }

    private static double mps(long chars, long nanos) {
        return chars / 1e6 / (nanos / 1e9);
    }

    static List<String> corpus(int listings, Random r) {
        List<String> out = new ArrayList<>(listings);
        StringBuilder sb = new StringBuilder(512);
        for (int i = 0; i < listings; i++) {
            sb.setLength(0);
            sb.append(String.format(OPENERS[r.nextInt(OPENERS.length)], NAMES[r.nextInt(NAMES.length)], 1 + r.nextInt(4), 2 + r.nextInt(3)));
            while (sb.length() < 380 + r.nextInt(100)) {
                sb.append(r.nextBoolean() ? ", " : ". ");
                sb.append(String.format(PHRASES[r.nextInt(PHRASES.length)], 1 + r.nextInt(40), r.nextInt(10), 1 + r.nextInt(9), r.nextInt(16)));
            }
            sb.append('.');
            out.add(sb.toString());
        }
        return out;
    }
}
