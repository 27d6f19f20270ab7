package dev.sheaf.samples;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The demo's ground truth, {@code planted.json}: what was planted and how often, counted over the
 * generated listing text (title, description, bullets, spec keys and values; page boilerplate not
 * included). A count is the number of listings whose text holds the form as a whole word,
 * case-insensitively. Every form listed occurs at least once: building fails otherwise, so the
 * file cannot promise what the catalog does not hold. Invented data for Sheaf's own functional
 * tests; never an outside check value.
 */
final class Planted {
    final ObjectNode root;

    private Planted(ObjectNode root) {
        this.root = root;
    }

    byte[] json() throws IOException {
        return Json.pretty(root);
    }

    private static final JsonNodeFactory F = JsonNodeFactory.instance;

    /**
     * Whether {@code lowerText} holds {@code lowerForm} as a whole word: not preceded or followed by a
     * letter or digit (both already lower-cased with {@link Locale#ROOT}). A plain scan, not a regex:
     * a case-insensitive regex with look-arounds over every listing for every form is far slower.
     */
    static boolean holdsWord(String lowerText, String lowerForm) {
        int from = 0;
        while (true) {
            int i = lowerText.indexOf(lowerForm, from);
            if (i < 0) {
                return false;
            }
            int end = i + lowerForm.length();
            boolean startOk = i == 0 || !Character.isLetterOrDigit(lowerText.charAt(i - 1));
            boolean endOk = end == lowerText.length() || !Character.isLetterOrDigit(lowerText.charAt(end));
            if (startOk && endOk) {
                return true;
            }
            from = i + 1;
        }
    }

    private static final class Counter {
        final List<String> texts = new ArrayList<>();
        final List<String> ids = new ArrayList<>();
        final List<String> missing = new ArrayList<>();

        int listings(String form) {
            String f = form.toLowerCase(Locale.ROOT);
            int n = 0;
            for (String t : texts) {
                if (holdsWord(t, f)) {
                    n++;
                }
            }
            if (n == 0 && !missing.contains(form)) {
                missing.add(form);
            }
            return n;
        }

        ObjectNode form(String form) {
            return F.objectNode().put("form", form).put("listings", listings(form));
        }
    }

    static Planted of(DemoCatalog catalog, Feedback feedback, Judgments judgments) {
        Counter c = new Counter();
        for (Product p : catalog.products()) {
            c.texts.add(p.allText().toLowerCase(Locale.ROOT));
            c.ids.add(p.id());
        }
        ObjectNode root = F.objectNode();
        root.put("format", "fernhollow-planted");
        root.put("formatVersion", 1);
        root.put("seed", catalog.seed);
        root.put("note", "Ground truth of the invented Fernhollow Outfitters demo, for Sheaf's own functional tests and the suggestion-quality measurement. "
                + "Never an outside check value. Counts are listings whose own text (title, description, bullets, spec keys and values) "
                + "holds the form as a whole word, case-insensitively; page boilerplate is not counted.");
        root.set("catalog", catalogSection(catalog));
        ArrayNode syn = root.putArray("synonymGroups");
        for (String[] g : SYNONYMS) {
            ObjectNode o = syn.addObject().put("id", g[0]).put("kind", g[1]);
            ArrayNode m = o.putArray("members");
            for (int i = 2; i < g.length; i++) {
                m.add(c.form(g[i]));
            }
        }
        ArrayNode var = root.putArray("variantGroups");
        for (String[] g : VARIANTS) {
            ObjectNode o = var.addObject().put("id", g[0]).put("kind", g[1]);
            ArrayNode m = o.putArray("members");
            for (int i = 2; i < g.length; i++) {
                m.add(c.form(g[i]));
            }
        }
        ArrayNode abbr = root.putArray("abbreviations");
        for (String[] a : ABBREVIATIONS) {
            ObjectNode o = abbr.addObject().put("short", a[0]).put("long", a[1]).put("shortListings", c.listings(a[0]));
            if (a.length > 2) {
                o.put("spelledOutAs", a[2]).put("spelledOutListings", c.listings(a[2]));
            }
        }
        ArrayNode typos = root.putArray("misspellings");
        for (DemoCatalog.Planting pl : catalog.plantings) {
            ObjectNode o = typos.addObject().put("form", pl.typo().wrong()).put("correct", pl.typo().right())
                    .put("listings", pl.listingIds().size());
            pl.listingIds().forEach(o.putArray("listingIds")::add);
        }
        ArrayNode multi = root.putArray("multiwordTerms");
        for (String m : MULTIWORD) {
            multi.add(c.form(m));
        }
        root.set("quantities", quantities(catalog));
        ArrayNode fluff = root.putArray("marketingFluff");
        for (String w : FLUFF) {
            fluff.add(c.form(w));
        }
        ArrayNode neg = root.putArray("negations");
        for (String[] n : NEGATIONS) {
            neg.add(c.form(n[0]).put("polarity", n[1]).put("concept", n[2]));
        }
        ObjectNode reg = root.putObject("regulatedClaims");
        for (String[] r : REGULATED) {
            ArrayNode a = reg.putArray(r[0]);
            for (int i = 1; i < r.length; i++) {
                a.add(c.form(r[i]));
            }
        }
        root.set("quirkySupplier", quirky(catalog, c));
        ArrayNode pc = root.putArray("parentChild");
        for (String[] p : PARENT_CHILD) {
            pc.addObject().put("child", p[0]).put("parent", p[1]).put("childListings", c.listings(p[0])).put("parentListings", c.listings(p[1]));
        }
        ArrayNode amb = root.putArray("ambiguities");
        for (String[] a : AMBIGUITIES) {
            amb.addObject().put("form", a[0]).put("listings", c.listings(a[0])).put("meanings", a[1]);
        }
        ArrayNode variants = root.putArray("colourVariants");
        for (Product p : catalog.products()) {
            if (p.variantOf() != null) {
                variants.addObject().put("listing", p.id()).put("variantOf", p.variantOf());
            }
        }
        ArrayNode bad = root.putArray("badFiles");
        for (BadFiles.Bad b : BadFiles.EXPECTED) {
            bad.addObject().put("file", b.file()).put("expectedProblem", b.expectedProblem()).put("what", b.what());
        }
        if (!c.missing.isEmpty()) {
            throw new IllegalStateException("planted forms that do not occur in the demo catalog (fix the tables or the copy): " + c.missing);
        }
        root.set("feedback", feedbackSection(feedback));
        root.set("judgments", judgmentsSection(judgments));
        return new Planted(root);
    }

    private static ObjectNode catalogSection(DemoCatalog catalog) {
        ObjectNode o = F.objectNode();
        o.put("listings", catalog.entries.size());
        ObjectNode byFormat = o.putObject("byFormat");
        catalog.countsByFormat().forEach((k, v) -> byFormat.put(k.ext, v));
        ObjectNode byCat = o.putObject("byCategory");
        catalog.countsByCategory().forEach((k, v) -> byCat.put(k.id, v));
        Map<String, Integer> bySupplier = new TreeMap<>();
        for (Product p : catalog.products()) {
            bySupplier.merge(p.supplier().name(), 1, Integer::sum);
        }
        ObjectNode bs = o.putObject("bySupplier");
        bySupplier.forEach(bs::put);
        return o;
    }

    private static ObjectNode quirky(DemoCatalog catalog, Counter c) {
        ObjectNode o = F.objectNode();
        o.put("name", Supplier.SKELDA.name());
        int n = 0;
        Map<DemoCatalog.Format, Integer> byFormat = new EnumMap<>(DemoCatalog.Format.class);
        Map<String, String> keys = new TreeMap<>();
        for (DemoCatalog.Entry e : catalog.entries) {
            if (e.product().supplier().quirky()) {
                n++;
                byFormat.merge(e.format(), 1, Integer::sum);
                for (Spec s : e.product().specs()) {
                    keys.put(s.key(), s.kind().csv);
                }
            }
        }
        o.put("listings", n);
        ObjectNode bf = o.putObject("byFormat");
        byFormat.forEach((k, v) -> bf.put(k.ext, v));
        ObjectNode ks = o.putObject("ownKeys");
        keys.forEach(ks::put);
        ArrayNode ab = o.putArray("ownAbbreviations");
        for (String[] a : QUIRKY_ABBREVIATIONS) {
            ab.addObject().put("short", a[0]).put("means", a[1]).put("listings", c.listings(a[0]));
        }
        o.put("ownUnits", "imperial only: weights as decimal pounds ('2.73 LBS'), volumes in 'CU.IN.', temperatures in bare °F ('20F'), "
                + "lengths in 'IN.', hydrostatic head as '20K MM H2O', beam in 'FT', heat output in 'BTU', boil time in decimal 'MIN'");
        o.put("ownStyle", "titles, keys, colours and bullets in capitals; telegraphic descriptions");
        return o;
    }

    private static ObjectNode quantities(DemoCatalog catalog) {
        ObjectNode o = F.objectNode();
        for (String[] q : QUANTITY_PATTERNS) {
            Pattern p = Pattern.compile(q[2]);
            int listings = 0;
            List<String> examples = new ArrayList<>();
            for (Product pr : catalog.products()) {
                Matcher m = p.matcher(pr.allText());
                boolean any = false;
                while (m.find()) {
                    any = true;
                    if (examples.size() < 3 && !examples.contains(m.group())) {
                        examples.add(m.group());
                    }
                }
                if (any) {
                    listings++;
                }
            }
            if (listings == 0) {
                throw new IllegalStateException("no quantity of the form " + q[1] + " in the demo catalog");
            }
            ObjectNode e = o.has(q[0]) ? (ObjectNode) o.get(q[0]) : o.putObject(q[0]);
            ObjectNode form = e.putObject(q[1]);
            form.put("listings", listings);
            examples.forEach(form.putArray("examples")::add);
        }
        return o;
    }

    private static ObjectNode feedbackSection(Feedback fb) {
        ObjectNode o = F.objectNode();
        o.put("sentences", fb.rows.size()).put("pairs", fb.pairs);
        java.util.Set<String> shoppers = new java.util.TreeSet<>();
        for (Feedback.Row r : fb.rows) {
            shoppers.add(r.annotator());
        }
        o.put("shoppers", shoppers.size());
        o.put("note", "'this one' is the reference listing; each statement is about the target. A comparative or presence statement is grounded "
                + "when both listings' text shows the attribute; 'agrees' means the statement matches the specs, 'contradicts' that the shopper got it wrong.");
        ObjectNode attrs = o.putObject("attributes");
        fb.tallies.forEach((k, t) -> attrs.putObject(k).put("kind", t.kind).put("mentions", t.mentions)
                .put("agreesWithSpecs", t.agrees).put("contradictsSpecs", t.contradicts).put("ungrounded", t.ungrounded));
        Feedback.VAGUE.forEach(o.putArray("vagueAttributes")::add);
        List<String> sentences = new ArrayList<>();
        for (Feedback.Row r : fb.rows) {
            sentences.add(r.sentence());
        }
        o.set("hedges", formCounts(sentences, List.of("a bit", "slightly", "kind of", "sort of", "somewhat", "rather", "a little", "a tad",
                "not quite", "lightish", "warmish", "smallish", "heavy-ish", "bulky-ish")));
        o.set("comparativeForms", formCounts(sentences, List.of("lighter", "heavier", "roomier", "bigger", "smaller", "warmer", "colder",
                "brighter", "dimmer", "bulkier", "more compact", "thicker", "thinner", "faster", "slower", "more waterproof", "less waterproof",
                "better", "worse", "nicer", "comfier", "cozier", "cosier", "sturdier")));
        o.set("superlatives", formCounts(sentences, List.of("lightest", "heaviest", "warmest", "roomiest", "brightest", "most compact",
                "the best one", "the most comfortable one", "coziest", "cosiest", "sturdiest")));
        o.set("constructions", formCounts(sentences, List.of("not as", "too", "more", "less", "with a", "without a", "has a", "has no",
                "lacks", "no hood", "doesn't have", "isn't", "than this one", "as this one")));
        Map<String, String> inverse = new LinkedHashMap<>();
        Feedback.SHOPPER_TYPOS.forEach((right, wrong) -> inverse.put(wrong, right));
        ArrayNode typos = o.putArray("misspellings");
        for (Map.Entry<String, String> e : inverse.entrySet()) {
            int n = count(sentences, e.getKey());
            if (n > 0) {
                typos.addObject().put("form", e.getKey()).put("correct", e.getValue()).put("sentences", n);
            }
        }
        return o;
    }

    private static int count(List<String> sentences, String form) {
        String f = form.toLowerCase(Locale.ROOT);
        int n = 0;
        for (String s : sentences) {
            if (holdsWord(s.toLowerCase(Locale.ROOT), f)) {
                n++;
            }
        }
        return n;
    }

    private static ObjectNode formCounts(List<String> sentences, List<String> forms) {
        ObjectNode o = F.objectNode();
        for (String f : forms) {
            int n = count(sentences, f);
            if (n > 0) {
                o.put(f, n);
            }
        }
        return o;
    }

    private static ObjectNode judgmentsSection(Judgments j) {
        ObjectNode o = F.objectNode();
        o.put("items", j.items.size()).put("ratersPerItem", Judgments.RATERS_PER_ITEM).put("rows", j.rows.size()).put("missing", j.missing);
        Judgments.RATERS.forEach(o.putArray("raters")::add);
        o.put("note", "Design bands (Krippendorff 2004): clear attributes are planted to reach alpha well above 0.800, tentative ones between "
                + "0.667 and 0.800, contested ones well below 0.667. Nominal alpha for present/absent and facet values; ordinal grades 1-5 are "
                + "planted for interval alpha. Missing judgments are rows left out.");
        ArrayNode attrs = o.putArray("attributes");
        for (Judgments.Attribute a : Judgments.Attribute.values()) {
            ObjectNode ao = attrs.addObject().put("id", a.id).put("kind", a.kind.name().toLowerCase(Locale.ROOT))
                    .put("agreement", a.agreement.name().toLowerCase(Locale.ROOT));
            ArrayNode cs = ao.putArray("categories");
            for (Category c : a.categories) {
                cs.add(c.id);
            }
            ao.put("values", a.kind == Judgments.Kind.BINARY ? "present|absent" : a.kind == Judgments.Kind.ORDINAL ? "1-5"
                    : String.join("|", a == Judgments.Attribute.MATERIAL ? Judgments.MATERIALS : a == Judgments.Attribute.COLOUR ? Judgments.COLOURS
                    : a == Judgments.Attribute.SEASON ? Judgments.SEASONS : Judgments.INSULATIONS));
        }
        return o;
    }

    // ---- the tables (README.md explains each) ----

    static final String[][] SYNONYMS = {
        {"water-repellency", "near-synonym", "water-resistant", "water resistant", "water repellent", "water-repellent", "DWR", "durable water repellent"},
        {"waterproof", "synonym", "waterproof", "water-proof", "WP"},
        {"underarm-ventilation", "synonym", "pit zips", "underarm vents", "armpit zips"},
        {"hip-belt", "synonym", "hip belt", "waist belt"},
        {"outsole-grip", "synonym", "non-slip", "slip-resistant"},
        {"flame-resistance", "synonym", "flame-resistant", "flame resistant", "fire retardant", "flame-retardant"},
        {"headlamp", "regional synonym", "headlamp", "head torch"},
        {"vestibule", "regional synonym", "vestibule", "porch"},
        {"trekking-poles", "synonym", "trekking poles", "hiking poles", "walking poles"},
        {"air-pad", "synonym", "air pad", "air mattress", "air mat"},
        {"nylon", "synonym", "nylon", "polyamide"},
        {"ignition", "synonym", "piezo igniter", "piezo ignition", "push-button ignition"},
        {"packable", "synonym", "packable", "packs into its own pocket"},
        {"sun-protection", "synonym", "UV protection", "sun protection", "UPF"},
        {"wind-screen", "synonym", "wind screen", "windscreen", "wind shield"},
        {"odour-control", "near-synonym", "odour-resistant", "odor-resistant", "anti-odor treatment", "anti-odour treatment"},
    };

    static final String[][] VARIANTS = {
        {"grey", "spelling", "grey", "gray"},
        {"colour", "spelling", "colour", "color"},
        {"colour-coded", "spelling", "colour-coded", "color-coded"},
        {"fibre", "spelling", "fibre", "fiber"},
        {"aluminium", "spelling", "aluminium", "aluminum"},
        {"odour", "spelling", "odour", "odor"},
        {"litres", "spelling", "litres", "liters"},
        {"metres", "spelling", "metres", "meters"},
        {"sulphur", "spelling", "sulphur", "sulfur"},
        {"two-way-zipper", "hyphen/spacing/numeral", "two-way zipper", "2-way zipper", "two way zipper", "2-way zip", "two-way zip", "2 way zipper"},
        {"three-season", "hyphen/spacing/numeral", "three-season", "3-season", "three season", "3 season"},
        {"four-season", "hyphen/spacing/numeral", "four-season", "4-season", "four season", "4 season"},
        {"ripstop", "hyphen/spacing", "ripstop", "rip-stop", "rip stop"},
        {"pit-zips", "hyphen/spacing", "pit zips", "pit-zips", "pitzips"},
        {"hip-belt", "hyphen/spacing", "hip belt", "hipbelt", "hip-belt"},
        {"non-slip", "hyphen/spacing", "non-slip", "nonslip", "non slip"},
        {"stuff-sack", "hyphen/spacing", "stuff sack", "stuff-sack", "stuffsack"},
        {"quarter-zip", "hyphen/spacing/numeral", "quarter-zip", "1/4-zip", "1/4 zip", "quarter zip"},
        {"self-inflating", "hyphen/spacing", "self-inflating", "self inflating"},
        {"ultralight", "hyphen/spacing", "ultralight", "ultra-light", "ultra light"},
        {"lightweight", "hyphen/spacing", "lightweight", "light-weight", "light weight"},
        {"rain-cover", "hyphen/spacing", "rain cover", "raincover", "rain-cover"},
        {"lockout", "hyphen", "lockout", "lock-out"},
        {"base-layer", "hyphen/spacing", "base layer", "baselayer", "base-layer"},
        {"seam-taped", "hyphen/spacing", "seam-taped", "seam taped"},
        {"drawcord", "hyphen/spacing", "drawcord", "draw cord", "draw-cord"},
        {"water-resistant", "hyphen/spacing", "water-resistant", "water resistant"},
        {"waterproof", "hyphen", "waterproof", "water-proof"},
    };

    static final String[][] ABBREVIATIONS = {
        {"DWR", "durable water repellent", "durable water repellent (DWR)"},
        {"HH", "hydrostatic head", "hydrostatic head (HH)"},
        {"FP", "fill power", "fill power (FP)"},
        {"PU", "polyurethane", "polyurethane (PU)"},
        {"UPF", "ultraviolet protection factor", "Ultraviolet protection factor (UPF)"},
        {"UL", "ultralight"},
        {"PFC", "perfluorinated compounds"},
        {"cu in", "cubic inches", "cubic inches"},
        {"gsm", "grams per square metre (g/m²)"},
        {"IPX4", "ingress protection code, water: splashing", "Ingress protection"},
        {"3L", "three-layer (a construction, not litres)", "3-layer"},
        {"CCF", "closed-cell foam", "closed-cell foam (CCF)"},
        {"MVTR", "moisture vapour transmission rate (breathability)"},
    };

    static final String[][] QUIRKY_ABBREVIATIONS = {
        {"w/", "with"}, {"w/o", "without"}, {"nyl.", "nylon"}, {"poly", "polyester"}, {"alu", "aluminium"}, {"hd", "hood"},
        {"jkt", "jacket"}, {"pk", "pack"}, {"ins.", "insulated / insulation"}, {"WP", "waterproof"}, {"WR", "water-resistant"},
        {"BR", "breathable"}, {"DWR-trtd", "DWR-treated"}, {"tpd", "taped"}, {"adj.", "adjustable"}, {"lt.wt", "lightweight"},
        {"drs", "doors"}, {"SSN", "season"}, {"cvr", "cover"}, {"2W zip", "two-way zipper"}, {"SZ", "size"}, {"CLR", "colour"},
        {"LBS", "pounds"}, {"CU.IN.", "cubic inches"}, {"STV", "stove"}, {"HDLMP", "headlamp"}, {"S/I", "self-inflating"},
        {"SYN", "synthetic"}, {"DN", "down"}, {"PR", "pair"}, {"thk", "thick"}, {"lgth", "length"}, {"rech.", "rechargeable"},
        {"compat.", "compatible"}, {"comp", "compartment"}, {"M'S", "men's"}, {"W'S", "women's"},
        {"WGT", "weight"}, {"MATL", "material"}, {"INS. WGT", "fill weight"}, {"H2O RTG", "waterproof rating"},
    };

    static final String[] MULTIWORD = {
        "ripstop nylon", "three-season tent", "fill power", "stuff sack", "hip belt", "pit zips", "taped seams", "waterproof breathable membrane",
        "closed-cell foam", "trekking poles", "boil time", "sleeping bag", "insulated jacket", "draft collar", "foot box", "load lifters",
        "rain cover", "red light mode", "lock mode", "piezo igniter", "simmer control", "wind screen", "heat exchanger", "hydrostatic head",
        "water column", "comfort rating", "rubber toe cap", "two-way zipper", "no-see-um mesh", "goose down", "duck down", "merino wool",
        "full-grain leather", "stainless steel", "thumb loops", "flatlock seams", "sternum strap", "trekking pole loops", "ice axe loop",
        "bear canister", "hydration sleeve", "helmet-compatible hood", "synthetic insulation", "rubber outsole", "carbon monoxide",
    };

    static final String[] FLUFF = {
        "premium", "versatile", "ultimate", "innovative", "best-in-class", "next-level", "game-changing", "must-have", "high-performance",
        "adventure-ready", "go-anywhere", "trail-proven", "expedition-grade", "built to last", "next level", "ready for anything",
    };

    /** form, polarity, concept. */
    static final String[][] NEGATIONS = {
        {"no hood", "negated", "hood"},
        {"hoodless", "negated", "hood"},
        {"W/O hd", "negated", "hood"},
        {"not waterproof", "negated", "waterproof"},
        {"not taped", "negated", "taped seams"},
        {"no pit zips", "negated", "pit zips"},
        {"no hip belt", "negated", "hip belt"},
        {"not included", "negated", "included accessory"},
        {"no piezo", "negated", "piezo ignition"},
        {"not suitable for winter", "negated", "four-season"},
        {"no anti-shock", "negated", "anti-shock"},
        {"no zip", "negated", "zipper"},
        {"zipperless", "negated", "zipper"},
        {"PFC-free", "positive (absence of PFCs is the claim)", "PFC-free"},
        {"made without PFCs", "positive (absence of PFCs is the claim)", "PFC-free"},
        {"non-slip", "positive despite 'non-'", "non-slip outsole"},
        {"no-see-um mesh", "not a negation (a fine mesh)", "no-see-um mesh"},
        {"no-fuss", "not a negation (marketing)", "none"},
        {"no animal-derived materials", "positive (vegan claim)", "vegan"},
        {"anti-snag", "positive despite 'anti-'", "zipper"},
        {"not suitable for children under 3 years", "safety warning", "small-parts warning"},
        {"cannot puncture", "positive despite 'not'", "closed-cell foam"},
        {"Do not use inside tents", "safety warning", "none"},
    };

    /** claim facet, forms. */
    static final String[][] REGULATED = {
        {"waterproof-rating", "hydrostatic head", "waterproof rating", "water column", "IPX4", "IPX7", "IPX8", "H2O RTG"},
        {"flame-resistance", "flame-resistant", "flame resistant", "fire retardant", "flame-retardant", "CPAI-84"},
        {"uv-protection", "UPF 50+", "UV protection", "sun protection", "Ultraviolet protection factor", "UV-resistant"},
        {"child-safety", "child-safe", "child-resistant", "child safety", "not suitable for children under 3 years"},
        {"fibre-content", "100% merino wool", "Fibre content", "Fiber content", "Composition", "Material composition", "10% feathers",
            "12% elastane", "100% recycled polyester", "100% polyester", "100% nylon"},
    };

    static final String[][] PARENT_CHILD = {
        {"two-way zipper", "zipper"}, {"ripstop nylon", "nylon"}, {"recycled nylon", "nylon"}, {"recycled polyester", "polyester"},
        {"merino wool", "wool"}, {"goose down", "down"}, {"duck down", "down"}, {"hydrophobic down", "down"},
        {"helmet-compatible hood", "hood"}, {"adjustable hood", "hood"}, {"insulated hood", "hood"}, {"fully taped seams", "taped seams"},
        {"critically taped seams", "taped seams"}, {"waterproof breathable membrane", "waterproof"}, {"full-grain leather", "leather"},
        {"nubuck leather", "leather"}, {"no-see-um mesh", "mesh"}, {"kids' daypack", "daypack"}, {"PFC-free DWR", "DWR"},
        {"ultralight", "lightweight"}, {"kids' headlamp", "headlamp"},
    };

    static final String[][] AMBIGUITIES = {
        {"Capacity", "spec key: litres on backpacks, persons on tents"},
        {"Power", "spec key: heat output on stoves, battery type on headlamps"},
        {"Cut", "spec key: sleeping-bag shape, or apparel fit"},
        {"Size", "spec key: dimensions on pads and bags, or a size range"},
        {"Loft", "spec key meaning fill power"},
        {"Fill", "spec key meaning fill weight"},
        {"3L", "three-layer construction on rain shells, not 3 litres"},
        {"UV-resistant", "fabric resists sun damage; not a UV-protection claim for the wearer"},
        {"per shoe", "footwear weight given per shoe; the ground truth is per pair"},
        {"per pole", "trekking-pole weight given per pole; the ground truth is per pair"},
        {"GSM", "on base layers the key 'Weight' or 'GSM' can be the fabric weight in g/m², not the item weight"},
    };

    /** dimension, form, regex (over listing text). */
    static final String[][] QUANTITY_PATTERNS = {
        {"mass", "kilograms", "\\b\\d+\\.\\d+ kg\\b"},
        {"mass", "grams", "\\b\\d{1,3}(?:,\\d{3})* ?g\\b(?!/)"},
        {"mass", "pounds and ounces", "\\b\\d+ lbs? \\d+ oz\\b"},
        {"mass", "decimal pounds", "\\b\\d+\\.\\d+ lb\\b"},
        {"mass", "ounces", "\\b\\d+\\.\\d oz\\b"},
        {"mass", "quirky decimal pounds", "\\b\\d+\\.\\d{2} LBS\\b"},
        {"volume", "litres (L)", "\\b\\d+ ?[Ll]\\b(?! \\()"},
        {"volume", "litres (word)", "\\b\\d+ (?:liters|litres)\\b"},
        {"volume", "cubic inches", "\\b[\\d,]+ (?:cu in|cubic inches|CU\\.IN\\.)"},
        {"water column", "millimetres", "\\b[\\d,]+ ?mm\\b"},
        {"water column", "thousands (K)", "\\b\\d+(?:\\.\\d)?K (?:mm|MM H2O)"},
        {"temperature", "Celsius", "[-\u2212]?\\d+ ?°C"},
        {"temperature", "Celsius with Unicode minus", "\u2212\\d+ ?°C"},
        {"temperature", "Fahrenheit", "\\b\\d+ ?°F"},
        {"temperature", "quirky bare F", "\\b\\d+F\\b"},
        {"length", "centimetres", "\\b\\d+(?:\\.\\d)? cm\\b"},
        {"length", "inches", "\\b\\d+ (?:in|IN\\.)(?![a-z])|\\b\\d+\""},
        {"area", "square metres / feet", "\\b\\d+(?:\\.\\d)? m²|\\b\\d+ sq ft\\b"},
        {"breathability", "g/m²/24h", "\\b[\\d,]+K? g/m(?:²|2)/24hr?"},
        {"fabric weight", "g/m², gsm, oz/yd²", "\\b\\d+ (?:g/m²|gsm|GSM)(?!/)|\\b\\d+\\.\\d oz/yd²"},
        {"light", "lumens", "\\b\\d+ ?(?:lumens|lm|LM)\\b"},
        {"distance", "metres / feet", "\\b\\d+ (?:m|meters|metres|ft|FT)\\b"},
        {"time", "boil time", "\\b\\d+ min \\d+ s\\b|\\b\\d+:\\d{2} min\\b|\\b\\d+\\.\\d (?:min|MIN)\\b|\\b\\d+ sec\\b"},
        {"time", "hours", "\\b\\d+ h\\b"},
        {"power", "watts / BTU", "\\b[\\d,]+ (?:W|BTU(?:/h)?)\\b"},
        {"thermal resistance", "R-value", "\\bR ?\\d\\.\\d\\b|R-value of \\d\\.\\d"},
        {"persons", "tent capacity", "\\b\\d(?:P|-person| person)\\b"},
        {"fill power", "fill power", "\\b\\d{3}(?:-fill| FP| cuin|FP)\\b"},
    };
}
