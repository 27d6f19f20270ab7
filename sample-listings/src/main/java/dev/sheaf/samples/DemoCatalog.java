package dev.sheaf.samples;

import java.util.ArrayList;
import java.util.Collections;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The Fernhollow Outfitters demo catalog in memory: which listing goes into which file format,
 * colour-variant near-duplicates, and the misspellings planted at exact counts. Everything follows
 * from the seed.
 */
final class DemoCatalog {

    enum Format {
        HTML("html", 560), CSV("csv", 480), JSONL("jsonl", 480), PDF("pdf", 24), DOCX("docx", 24), TXT("txt", 16), MD("md", 16);

        final String ext;
        final int count;

        Format(String ext, int count) {
            this.ext = ext;
            this.count = count;
        }

        /** One file per listing (as opposed to a feed holding many listings). */
        boolean perFile() {
            return this != CSV && this != JSONL;
        }
    }

    static final int LISTINGS = total();
    /** HTML listings that are colour variants of another HTML listing (same copy, other colour). */
    static final int COLOUR_VARIANTS = 30;
    /** DOCX supplier sheets written by the quirky supplier. */
    static final int QUIRKY_DOCX = 8;

    private static int total() {
        int n = 0;
        for (Format f : Format.values()) {
            n += f.count;
        }
        return n;
    }

    /** A listing and where it lives in the workspace (a per-file path, or the feed file holding it). */
    record Entry(Product product, Format format, String path) {
    }

    record Planting(Typos.Typo typo, List<String> listingIds) {
    }

    final long seed;
    final List<Entry> entries;
    final List<Planting> plantings;

    private DemoCatalog(long seed, List<Entry> entries, List<Planting> plantings) {
        this.seed = seed;
        this.entries = Collections.unmodifiableList(entries);
        this.plantings = Collections.unmodifiableList(plantings);
    }

    static final String CSV_PATH = "catalog/feeds/catalog-export.csv";
    static final String JSONL_PATH = "catalog/feeds/partner-feed.jsonl";

    static DemoCatalog build(long seed) {
        ProductFactory factory = new ProductFactory(seed);
        List<Format> plan = new ArrayList<>(LISTINGS);
        for (Format f : Format.values()) {
            for (int i = 0; i < f.count; i++) {
                plan.add(f);
            }
        }
        Rng.of(seed, "formats", 0).shuffle(plan);
        Rng variantRng = Rng.of(seed, "variants", 0);
        Rng supplierRng = Rng.of(seed, "sheet-suppliers", 0);
        int htmlSeen = 0;
        int[] perFormatSeen = new int[Format.values().length];
        List<Product> products = new ArrayList<>(LISTINGS);
        List<Product> htmlBases = new ArrayList<>();
        List<Format> formats = new ArrayList<>(LISTINGS);
        Category[] cats = Category.values();
        // every 18th HTML listing (after the first few) is a colour variant: 30 of 560
        for (int i = 1; i <= LISTINGS; i++) {
            Format f = plan.get(i - 1);
            int k = perFormatSeen[f.ordinal()]++;
            Product p;
            if (f == Format.HTML && htmlSeen >= 10 && (htmlSeen - 10) % 18 == 0 && (htmlSeen - 10) / 18 < COLOUR_VARIANTS) {
                Product base = htmlBases.get(htmlBases.size() - 1 - variantRng.nextInt(Math.min(5, htmlBases.size())));
                p = colourVariant(base, ProductFactory.id(i), variantRng);
            } else if (f == Format.PDF || f == Format.DOCX) {
                // sheets cover every category in turn; the first DOCX sheets come from the quirky supplier
                Category c = cats[k % cats.length];
                Supplier s = f == Format.DOCX && k < QUIRKY_DOCX ? Supplier.SKELDA : Supplier.regularFor(c, supplierRng);
                p = factory.make(i, c, s, Draft.Detail.FULL);
            } else {
                p = factory.make(i, f.perFile() ? Draft.Detail.FULL : Draft.Detail.FEED);
            }
            if (f == Format.HTML) {
                htmlSeen++;
                if (p.variantOf() == null) {
                    htmlBases.add(p);
                }
            }
            products.add(p);
            formats.add(f);
        }
        List<Planting> plantings = plantTypos(products, seed);
        List<Entry> entries = new ArrayList<>(LISTINGS);
        for (int i = 0; i < products.size(); i++) {
            Product p = products.get(i);
            entries.add(new Entry(p, formats.get(i), path(p, formats.get(i))));
        }
        return new DemoCatalog(seed, entries, plantings);
    }

    private static List<Planting> plantTypos(List<Product> products, long seed) {
        Rng r = Rng.of(seed, "typos", 0);
        boolean[] taken = new boolean[products.size()];
        List<Planting> out = new ArrayList<>();
        for (Typos.Typo t : Typos.ALL) {
            List<Integer> candidates = new ArrayList<>();
            for (int i = 0; i < products.size(); i++) {
                if (!taken[i] && Typos.eligible(products.get(i), t)) {
                    candidates.add(i);
                }
            }
            if (candidates.size() < t.demoListings()) {
                throw new IllegalStateException("only " + candidates.size() + " listings can carry the typo '" + t.wrong()
                        + "', need " + t.demoListings());
            }
            r.shuffle(candidates);
            List<Integer> chosen = new ArrayList<>(candidates.subList(0, t.demoListings()));
            Collections.sort(chosen);
            List<String> ids = new ArrayList<>();
            for (int i : chosen) {
                products.set(i, Typos.plant(products.get(i), t));
                taken[i] = true;
                ids.add(products.get(i).id());
            }
            out.add(new Planting(t, ids));
        }
        return out;
    }

    /** The same listing copy in another colour: the title gets the colour, the colour spec and fact change. */
    static Product colourVariant(Product base, String id, Rng r) {
        String family = base.facts().term(Trait.COLOUR);
        Lexicon.Colour c;
        do {
            c = r.pick(Lexicon.COLOURS);
        } while (c.family().equals(family));
        String name = c.name(base.supplier().uk());
        if (base.supplier().quirky()) {
            name = name.toUpperCase(Locale.ROOT);
        }
        List<Spec> specs = new ArrayList<>();
        for (Spec s : base.specs()) {
            specs.add(s.kind() == SpecKey.COLOUR ? new Spec(s.kind(), s.key(), name) : s);
        }
        Facts facts = base.facts().toBuilder().term(Trait.COLOUR, c.family()).build();
        return new Product(id, base.category(), base.supplier(), base.title() + " \u2013 " + name, base.description(),
                base.bullets(), specs, facts, base.shown(), name, base.id());
    }

    static String path(Product p, Format f) {
        String id = p.id().toLowerCase(Locale.ROOT);
        String cat = p.category().id;
        switch (f) {
            case HTML: return "catalog/html/" + cat + "/" + id + "-" + slug(p.title()) + ".html";
            case PDF: return "catalog/pdf/" + cat + "/" + id + "-spec-sheet.pdf";
            case DOCX: return "catalog/docx/" + cat + "/" + id + "-" + p.supplier().id() + ".docx";
            case TXT: return "catalog/text/" + cat + "/" + id + "-buyer-note.txt";
            case MD: return "catalog/text/" + cat + "/" + id + ".md";
            case CSV: return CSV_PATH;
            default: return JSONL_PATH;
        }
    }

    static String slug(String title) {
        String s = title.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
        if (s.length() > 60) {
            s = s.substring(0, 60).replaceAll("-[^-]*$", "");
        }
        return s;
    }

    List<Product> products() {
        List<Product> ps = new ArrayList<>(entries.size());
        for (Entry e : entries) {
            ps.add(e.product);
        }
        return ps;
    }

    List<Product> products(Format f) {
        List<Product> ps = new ArrayList<>();
        for (Entry e : entries) {
            if (e.format == f) {
                ps.add(e.product);
            }
        }
        return ps;
    }

    Map<Format, Integer> countsByFormat() {
        Map<Format, Integer> m = new EnumMap<>(Format.class);
        for (Entry e : entries) {
            m.merge(e.format, 1, Integer::sum);
        }
        return m;
    }

    Map<Category, Integer> countsByCategory() {
        Map<Category, Integer> m = new EnumMap<>(Category.class);
        for (Entry e : entries) {
            m.merge(e.product.category(), 1, Integer::sum);
        }
        return m;
    }
}
