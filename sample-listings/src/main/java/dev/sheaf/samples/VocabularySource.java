package dev.sheaf.samples;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * The demo vocabulary a curator might have built for Fernhollow Outfitters, in the generator's own
 * simple form ({@code fernhollow-vocab-source.json}): facets (id, label, multiValued, categories,
 * valueKind term|number|yesno, unit and half-open buckets [min, max) for numbers, regulatedClaim)
 * and concepts (id, facet, preferred, alternative and hidden labels, broader and related ids, scope
 * note). It is converted into the real vocabulary format elsewhere. Validated when built: ids
 * unique, every reference resolves, labels of one concept pairwise distinct, no label shared by two
 * concepts of one facet.
 */
final class VocabularySource {
    private VocabularySource() {
    }

    record Bucket(String id, String label, Double min, Double max) {
    }

    record Facet(String id, String label, boolean multiValued, List<String> categories, String valueKind,
                 String unit, List<Bucket> buckets, boolean regulatedClaim, String scopeNote) {
    }

    record Concept(String id, String facet, String prefLabel, List<String> altLabels, List<String> hiddenLabels,
                   List<String> broader, List<String> related, String scopeNote) {
    }

    static final List<Facet> FACETS = new ArrayList<>();
    static final List<Concept> CONCEPTS = new ArrayList<>();

    private static final List<String> ALL = ids(Category.values());
    private static final List<String> APPAREL_AND_BAGS = List.of("rain-shells", "insulated-jackets", "base-layers", "sleeping-bags");

    private static List<String> ids(Category... cs) {
        List<String> l = new ArrayList<>();
        for (Category c : cs) {
            l.add(c.id);
        }
        return l;
    }

    private static void facet(String id, String label, boolean multi, List<String> cats, String kind, String unit,
                              List<Bucket> buckets, boolean regulated, String note) {
        FACETS.add(new Facet(id, label, multi, cats, kind, unit, buckets, regulated, note));
    }

    private static String current;

    private static void in(String facet) {
        current = facet;
    }

    private static void c(String id, String pref, List<String> alt, List<String> hidden, List<String> broader, List<String> related, String note) {
        CONCEPTS.add(new Concept(id, current, pref, alt, hidden, broader, related, note));
    }

    private static void c(String id, String pref, String... alt) {
        c(id, pref, List.of(alt), List.of(), List.of(), List.of(), null);
    }

    private static void n(String id, String pref, String broader, String... alt) {
        c(id, pref, List.of(alt), List.of(), List.of(broader), List.of(), null);
    }

    private static Bucket b(String id, String label, Double min, Double max) {
        return new Bucket(id, label, min, max);
    }

    static {
        facet("material", "Material", true, ALL, "term", null, List.of(), false, null);
        in("material");
        c("nylon", "nylon", List.of("polyamide", "nyl."), List.of(), List.of(), List.of(), "Polyamide fabric; 'polyamide' is the usual EU label word.");
        n("ripstop-nylon", "ripstop nylon", "nylon", "rip-stop nylon", "rip stop nylon");
        c("recycled-nylon", "recycled nylon", List.of(), List.of(), List.of("nylon", "recycled-material"), List.of(), "Polyhierarchy: a nylon and a recycled material.");
        c("polyester", "polyester", "poly");
        c("recycled-polyester", "recycled polyester", List.of(), List.of(), List.of("polyester", "recycled-material"), List.of(), "Polyhierarchy: a polyester and a recycled material.");
        c("recycled-material", "recycled material", "recycled");
        c("wool", "wool");
        n("merino-wool", "merino wool", "wool", "merino");
        c("leather", "leather");
        n("full-grain-leather", "full-grain leather", "leather");
        n("nubuck", "nubuck", "leather", "nubuck leather");
        n("suede", "suede", "leather");
        c("mesh", "mesh", "synthetic mesh", "engineered mesh", "ripstop mesh");
        c("no-see-um-mesh", "no-see-um mesh", List.of(), List.of(), List.of("mesh"), List.of(), "A fine insect mesh: the 'no' is part of the name, not a negation.");
        c("aluminium", "aluminium", List.of("aluminum", "alu"), List.of("aluminim"), List.of(), List.of(), null);
        c("carbon-fibre", "carbon fibre", "carbon fiber", "carbon");
        c("fibreglass", "fibreglass", "fiberglass");
        c("titanium", "titanium", "ti");
        c("stainless-steel", "stainless steel", "steel");
        c("closed-cell-foam", "closed-cell foam", "CCF", "foam");
        c("elastane", "elastane", "spandex");
        c("lyocell", "lyocell");

        facet("insulation", "Insulation", false, List.of("insulated-jackets", "sleeping-bags"), "term", null, List.of(), false, null);
        in("insulation");
        c("down", "down", List.of("down fill", "DN"), List.of(), List.of(), List.of(), "Goose or duck down; fill power (FP) says how well it lofts.");
        n("goose-down", "goose down", "down");
        n("duck-down", "duck down", "down");
        c("hydrophobic-down", "hydrophobic down", List.of("water-resistant down", "DWR-treated down"), List.of(), List.of("down"), List.of("dwr"), null);
        c("synthetic-insulation", "synthetic insulation", "synthetic fill", "synthetic", "SYN", "polyester insulation", "hollow-fibre polyester fill", "hollow-fiber polyester fill");

        facet("fill-power", "Fill power", false, List.of("insulated-jackets", "sleeping-bags"), "number", "cuin/oz",
                List.of(b("under-650", "under 650", null, 650.0), b("650-749", "650–749", 650.0, 750.0), b("750-849", "750–849", 750.0, 850.0), b("850-plus", "850 and up", 850.0, null)),
                false, "Written 800, 800 FP, 800-fill, 800 cuin; 'Loft' on some sheets.");
        facet("weight", "Weight", false, ALL, "number", "g",
                List.of(b("under-250-g", "under 250 g", null, 250.0), b("250-499-g", "250–499 g", 250.0, 500.0), b("500-999-g", "500–999 g", 500.0, 1000.0),
                        b("1000-1999-g", "1–2 kg", 1000.0, 2000.0), b("2000-g-plus", "2 kg and up", 2000.0, null)),
                false, "Item weight; footwear and trekking poles per pair (some listings state per shoe or per pole). On base layers 'Weight' can be the fabric weight in g/m².");
        facet("pack-volume", "Pack volume", false, List.of("backpacks"), "number", "L",
                List.of(b("under-20-l", "under 20 L", null, 20.0), b("20-34-l", "20–34 L", 20.0, 35.0), b("35-54-l", "35–54 L", 35.0, 55.0), b("55-l-plus", "55 L and up", 55.0, null)),
                false, "Written L, l, liters, litres, cu in, cubic inches; the key may be Capacity.");
        facet("tent-capacity", "Tent capacity", false, List.of("tents"), "number", "persons",
                List.of(b("1-person", "1 person", 1.0, 2.0), b("2-person", "2 persons", 2.0, 3.0), b("3-person", "3 persons", 3.0, 4.0), b("4-person-plus", "4 and more", 4.0, null)),
                false, "Written 2P, 2-person, 2 person, sleeps two; the key may be Capacity.");
        facet("season-rating", "Season rating", false, List.of("tents", "sleeping-bags", "sleeping-pads"), "term", null, List.of(), false, null);
        in("season-rating");
        c("summer", "summer", "two-season", "2-season", "2 season", "2-SSN");
        c("three-season", "three-season", "3-season", "three season", "3 season", "3-SSN");
        c("four-season", "four-season", "4-season", "four season", "4 season", "4-SSN", "winter");
        facet("temperature-rating", "Temperature rating", false, List.of("sleeping-bags"), "number", "°C",
                List.of(b("minus-10-c-and-below", "−10 °C and colder", null, -9.0), b("minus-9-to-minus-5-c", "−9 to −5 °C", -9.0, -4.0), b("minus-4-to-4-c", "−4 to 4 °C", -4.0, 5.0), b("5-c-plus", "5 °C and warmer", 5.0, null)),
                false, "Comfort rating; written in °C, °F or both, with '-' or the Unicode minus sign.");
        facet("r-value", "R-value", false, List.of("sleeping-pads"), "number", "m²·K/W",
                List.of(b("r-under-2", "under 2", null, 2.0), b("r-2-to-3.9", "2–3.9", 2.0, 4.0), b("r-4-to-5.4", "4–5.4", 4.0, 5.5), b("r-5.5-plus", "5.5 and up", 5.5, null)),
                false, "Written 4.2, R 4.2, R4.2.");
        facet("light-output", "Light output", false, List.of("headlamps"), "number", "lm",
                List.of(b("under-200-lm", "under 200 lm", null, 200.0), b("200-399-lm", "200–399 lm", 200.0, 400.0), b("400-699-lm", "400–699 lm", 400.0, 700.0), b("700-lm-plus", "700 lm and up", 700.0, null)),
                false, null);

        facet("water-protection", "Water protection", true, List.of("rain-shells", "insulated-jackets", "tents", "backpacks", "footwear", "headlamps", "sleeping-bags"),
                "term", null, List.of(), false, "Wording of water protection; the rating itself is the regulated facet waterproof-rating.");
        in("water-protection");
        c("waterproof", "waterproof", List.of("water-proof", "WP", "fully waterproof"), List.of("waterproff"), List.of(), List.of(), "Also negated in copy: 'not waterproof'.");
        c("water-resistant", "water-resistant", List.of("water resistant", "WR", "splash-proof", "weather-resistant"), List.of("water-resistent"), List.of(), List.of(), null);
        c("dwr", "durable water repellent", List.of("DWR", "DWR finish", "DWR coating", "DWR treatment", "water-repellent finish", "water repellent coating",
                "durable water-repellent treatment", "DWR-treated", "DWR-trtd"), List.of(), List.of(), List.of("water-resistant"),
                "A finish that makes water bead; shoppers use it as a near-synonym of water-resistant. Not a waterproof claim.");
        c("pfc-free-dwr", "PFC-free DWR", List.of(), List.of(), List.of("dwr"), List.of("pfc-free"), null);
        n("waterproof-breathable-membrane", "waterproof breathable membrane", "waterproof", "waterproof-breathable membrane", "waterproof lining", "WP/BR membrane");
        c("taped-seams", "taped seams", "seam-taped", "factory seam-sealed", "seam taped", "tpd seams");
        n("fully-taped-seams", "fully taped seams", "taped-seams", "fully seam-taped", "fully seam taped", "fully tpd seams");
        n("critically-taped-seams", "critically taped seams", "taped-seams", "crit. tpd seams");
        c("ipx4", "IPX4", List.of("IPX4 water resistant"), List.of(), List.of("water-resistant"), List.of(), "IP code (IEC 60529): a rating claim.");
        c("ipx7", "IPX7", List.of("IPX7 waterproof"), List.of(), List.of("waterproof"), List.of(), "IP code (IEC 60529): a rating claim.");
        c("ipx8", "IPX8", List.of(), List.of(), List.of("waterproof"), List.of(), "IP code (IEC 60529): a rating claim.");
        facet("waterproof-rating", "Waterproof rating", false, List.of("rain-shells", "tents"), "number", "mm H2O",
                List.of(b("under-5000-mm", "under 5,000 mm", null, 5000.0), b("5000-9999-mm", "5,000–9,999 mm", 5000.0, 10000.0),
                        b("10000-19999-mm", "10,000–19,999 mm", 10000.0, 20000.0), b("20000-mm-plus", "20,000 mm and up", 20000.0, null)),
                true, "Hydrostatic head (HH), 'water column'; written 20,000 mm, 20000mm, 20K mm, 20K MM H2O. Regulated: review before publishing.");

        facet("hood", "Hood", false, List.of("rain-shells", "insulated-jackets", "sleeping-bags", "base-layers"), "term", null, List.of(), false,
                "Negated in copy as 'no hood', 'hoodless', 'W/O HD'.");
        in("hood");
        c("hood", "hood", "hooded", "hd");
        n("helmet-compatible-hood", "helmet-compatible hood", "hood");
        n("adjustable-hood", "adjustable hood", "hood", "adj. hd");
        n("stowable-hood", "stowable hood", "hood", "roll-away hood");
        c("insulated-hood", "insulated hood", List.of(), List.of("insualted hood"), List.of("hood"), List.of(), null);
        n("balaclava-hood", "balaclava-style hood", "hood");

        facet("closure", "Closure", true, List.of("rain-shells", "insulated-jackets", "base-layers", "sleeping-bags", "backpacks", "tents"), "term", null, List.of(), false, null);
        in("closure");
        c("zipper", "zipper", List.of("zip"), List.of("zippper"), List.of(), List.of(), null);
        c("two-way-zipper", "two-way zipper", List.of("2-way zipper", "two way zipper", "2-way zip", "two-way zip", "2 way zipper", "2W zip"),
                List.of("two-way zippper"), List.of("zipper"), List.of(), null);
        n("water-resistant-zipper", "water-resistant zipper", "zipper", "laminated zip", "waterproof zip");
        n("quarter-zip", "quarter-zip", "zipper", "1/4-zip", "1/4 zip", "quarter zip");
        n("half-zip", "half-zip", "zipper", "half zip");
        n("full-length-zipper", "full-length zipper", "zipper", "full-length zip", "full lgth");

        facet("features", "Features", true, ALL, "term", null, List.of(), false, "Everything a shopper filters on that is not a material or a rating.");
        in("features");
        c("pit-zips", "pit zips", List.of("pit-zips", "pitzips", "underarm vents", "armpit zips"), List.of(), List.of(), List.of("zipper"), null);
        c("hip-belt", "hip belt", "hipbelt", "hip-belt", "waist belt");
        c("rain-cover", "rain cover", "raincover", "rain-cover", "rain cvr");
        c("hydration-compatible", "hydration compatible", "hydration sleeve", "hydration-compatible");
        c("load-lifters", "load lifters");
        c("sternum-strap", "sternum strap");
        c("trekking-pole-loops", "trekking pole loops");
        c("ice-axe-loop", "ice axe loop");
        c("packable", "packable", List.of("packs into its own pocket", "packs in own pocket"), List.of("packible"), List.of(), List.of("stuff-sack"), null);
        c("stuff-sack", "stuff sack", "stuff-sack", "stuffsack");
        c("breathable", "breathable", List.of("BR"), List.of("breatheable"), List.of(), List.of(), null);
        c("odour-resistant", "odour-resistant", "odor-resistant", "naturally odour resistant", "naturally odor resistant", "anti-odor treatment", "anti-odour treatment");
        c("thumb-loops", "thumb loops");
        c("flatlock-seams", "flatlock seams");
        c("draft-collar", "draft collar");
        c("foot-box", "trapezoidal foot box", "foot box");
        c("piezo-ignition", "piezo ignition", "piezo igniter", "push-button ignition", "piezo");
        c("simmer-control", "simmer control", "simmer ring");
        c("wind-screen", "wind screen", "windscreen", "wind shield");
        c("heat-exchanger", "heat exchanger", "integrated pot");
        c("red-light-mode", "red light mode");
        c("lock-mode", "lock mode", "lockout mode", "lock-out mode");
        c("rechargeable-battery", "rechargeable battery", "USB-C rechargeable", "Li-ion", "rechargeable");
        c("aaa-batteries", "AAA batteries", "3 x AAA", "3xAAA", "3 × AAA");
        c("lever-lock", "lever lock");
        c("twist-lock", "twist lock");
        c("folding-poles", "folding design", "push-button folding");
        c("anti-shock", "anti-shock", "shock-absorbing");
        c("freestanding", "freestanding");
        c("vestibule", "vestibule", List.of("porch"), List.of("vestibulle"), List.of(), List.of(), null);
        c("non-slip-outsole", "non-slip outsole", List.of("non-slip", "nonslip", "non slip", "slip-resistant"), List.of(), List.of(), List.of(),
                "A positive feature despite the 'non-' prefix.");
        c("rubber-toe-cap", "rubber toe cap");
        c("lightweight", "lightweight", List.of("light-weight", "light weight", "lt.wt"), List.of("lightwieght"), List.of(), List.of(),
                "Vague on its own: prefer the weight facet's buckets.");
        n("ultralight", "ultralight", "lightweight", "ultra-light", "ultra light", "UL");
        c("pfc-free", "PFC-free", List.of("made without PFCs"), List.of(), List.of(), List.of(), "A positive claim; '-free' does not negate the product.");
        c("vegan", "vegan", List.of("no animal-derived materials"), List.of(), List.of(), List.of(), null);

        facet("product-type", "Product type", false, List.of("stoves", "sleeping-pads", "sleeping-bags", "footwear", "backpacks", "headlamps"), "term", null, List.of(), false, null);
        in("product-type");
        c("canister-stove", "canister stove", "gas canister stove");
        c("stove-system", "stove system");
        c("liquid-fuel-stove", "liquid-fuel stove", "liquid fuel stove");
        c("multi-fuel-stove", "multi-fuel stove", "multi fuel stove");
        c("alcohol-stove", "alcohol stove");
        c("solid-fuel-stove", "solid fuel stove");
        c("air-pad", "air pad", "air mattress", "air mat");
        c("self-inflating-mat", "self-inflating mat", "self inflating mat", "S/I mat");
        c("closed-cell-foam-pad", "closed-cell foam pad", "foam pad", "CCF pad");
        c("mummy-bag", "mummy sleeping bag", "mummy", "mummy bag");
        c("quilt", "quilt");
        c("rectangular-bag", "rectangular sleeping bag", "rectangular");
        c("semi-rectangular-bag", "semi-rectangular sleeping bag", "semi-rectangular");
        c("hiking-boot", "hiking boot", "mid hiking boot", "mountain boot");
        c("trail-shoe", "trail shoe");
        c("approach-shoe", "approach shoe");
        c("trail-sandal", "trail sandal", "sandal");
        c("daypack", "daypack", "day pack", "hiking daypack");
        c("kids-daypack", "kids' daypack", List.of(), List.of(), List.of("daypack"), List.of("child-safe"), null);
        c("trekking-pack", "trekking pack", "hiking pack");
        c("expedition-pack", "expedition pack");
        c("headlamp", "headlamp", List.of("head torch"), List.of("headlmap"), List.of(), List.of(), null);
        n("kids-headlamp", "kids' headlamp", "headlamp");
        n("rechargeable-headlamp", "rechargeable headlamp", "headlamp");

        facet("flame-resistance", "Flame resistance", false, List.of("tents"), "yesno", null, List.of(), true,
                "Regulated claim: flag for compliance review.");
        in("flame-resistance");
        c("flame-resistant", "flame resistant", "flame-resistant", "fire retardant", "flame-retardant", "CPAI-84");
        facet("uv-protection", "UV protection", false, List.of("base-layers", "tents"), "number", "UPF",
                List.of(b("upf-15-29", "UPF 15–29", 15.0, 30.0), b("upf-30-49", "UPF 30–49", 30.0, 50.0), b("upf-50-plus", "UPF 50+", 50.0, null)),
                true, "Regulated claim (ultraviolet protection factor, UPF): review before publishing.");
        in("uv-protection");
        c("uv-protection-claim", "UV protection", "sun protection", "UPF", "ultraviolet protection factor");
        c("uv-resistant-fabric", "UV-resistant fabric", List.of("UV-resistant"), List.of(), List.of(), List.of("uv-protection-claim"),
                "About fabric ageing in sunlight, not protection of the wearer: ambiguous with UV protection.");
        facet("child-safety", "Child safety", false, List.of("backpacks", "headlamps", "stoves"), "yesno", null, List.of(), true,
                "Regulated claim: flag for compliance review.");
        in("child-safety");
        c("child-resistant", "child-resistant", "child-resistant valve lock", "child-resistant cap");
        c("child-safe", "child-safe", "child-safe buckle", "child-safe battery compartment", "child safety");
        c("small-parts-warning", "small-parts warning", "not suitable for children under 3 years");
        facet("fibre-content", "Fibre content", true, APPAREL_AND_BAGS, "term", null, List.of(), true,
                "Regulated claim (textile labelling): review before publishing.");
        in("fibre-content");
        c("100-merino-wool", "100% merino wool");
        c("merino-blend", "merino wool blend", "merino blend");
        c("100-polyester", "100% polyester");
        n("100-recycled-polyester", "100% recycled polyester", "100-polyester");
        c("100-nylon", "100% nylon", "100% polyamide");
        c("nylon-elastane-blend", "nylon-elastane blend", "88% nylon, 12% elastane");
        c("down-feather-fill", "down and feather fill", "90% goose down, 10% feathers", "90% duck down, 10% feathers");

        facet("colour", "Colour", false, ALL, "term", null, List.of(), false, "Colour family; named colours are narrower.");
        in("colour");
        c("green", "green");
        c("blue", "blue");
        c("grey", "grey", "gray");
        c("red", "red");
        c("orange", "orange");
        c("yellow", "yellow");
        c("black", "black");
        c("brown", "brown");
        c("purple", "purple");
        c("white", "white");
        n("slate-grey", "slate grey", "grey", "slate gray");
        n("storm-grey", "storm grey", "grey", "storm gray");
        n("pebble-grey", "pebble grey", "grey", "pebble gray");
        n("sulphur", "sulphur", "yellow", "sulfur");
        validate();
    }

    private static void validate() {
        Map<String, Facet> facets = new LinkedHashMap<>();
        for (Facet f : FACETS) {
            if (facets.put(f.id, f) != null) {
                throw new IllegalStateException("facet id twice: " + f.id);
            }
        }
        Map<String, Concept> concepts = new LinkedHashMap<>();
        for (Concept c : CONCEPTS) {
            if (concepts.put(c.id, c) != null) {
                throw new IllegalStateException("concept id twice: " + c.id);
            }
            if (!facets.containsKey(c.facet)) {
                throw new IllegalStateException("concept " + c.id + " names unknown facet " + c.facet);
            }
        }
        Map<String, String> labelOwner = new LinkedHashMap<>();
        for (Concept c : CONCEPTS) {
            for (String ref : c.broader) {
                if (!concepts.containsKey(ref) || ref.equals(c.id)) {
                    throw new IllegalStateException("concept " + c.id + " has a bad broader " + ref);
                }
            }
            for (String ref : c.related) {
                if (!concepts.containsKey(ref) || ref.equals(c.id)) {
                    throw new IllegalStateException("concept " + c.id + " has a bad related " + ref);
                }
            }
            List<String> labels = new ArrayList<>();
            labels.add(c.prefLabel);
            labels.addAll(c.altLabels);
            labels.addAll(c.hiddenLabels);
            java.util.Set<String> seen = new java.util.HashSet<>();
            for (String l : labels) {
                String key = l.toLowerCase(Locale.ROOT);
                if (!seen.add(key)) {
                    throw new IllegalStateException("concept " + c.id + " repeats the label " + l);
                }
                String owner = labelOwner.put(c.facet + "|" + key, c.id);
                if (owner != null) {
                    throw new IllegalStateException("label '" + l + "' on both " + owner + " and " + c.id + " in facet " + c.facet);
                }
            }
        }
    }

    static byte[] json() throws IOException {
        JsonNodeFactory f = JsonNodeFactory.instance;
        ObjectNode root = f.objectNode();
        root.put("format", "fernhollow-vocab-source");
        root.put("formatVersion", 1);
        root.put("name", "Fernhollow Outfitters attribute vocabulary (demo)");
        root.put("language", "en");
        root.put("note", "Invented demo data in the generator's own simple form, to be converted into the Sheaf vocabulary format. "
                + "Buckets are half-open: min inclusive, max exclusive; null means unbounded. Labels of a concept are pairwise distinct.");
        ArrayNode cats = root.putArray("categories");
        for (Category c : Category.values()) {
            cats.addObject().put("id", c.id).put("label", c.label);
        }
        ArrayNode facets = root.putArray("facets");
        for (Facet fc : FACETS) {
            ObjectNode o = facets.addObject();
            o.put("id", fc.id).put("label", fc.label).put("multiValued", fc.multiValued);
            ArrayNode cs = o.putArray("categories");
            fc.categories.forEach(cs::add);
            o.put("valueKind", fc.valueKind);
            if (fc.unit != null) {
                o.put("unit", fc.unit);
            }
            if (!fc.buckets.isEmpty()) {
                ArrayNode bs = o.putArray("buckets");
                for (Bucket bk : fc.buckets) {
                    ObjectNode bo = bs.addObject().put("id", bk.id).put("label", bk.label);
                    if (bk.min == null) {
                        bo.putNull("min");
                    } else {
                        bo.put("min", bk.min);
                    }
                    if (bk.max == null) {
                        bo.putNull("max");
                    } else {
                        bo.put("max", bk.max);
                    }
                }
            }
            o.put("regulatedClaim", fc.regulatedClaim);
            if (fc.scopeNote != null) {
                o.put("scopeNote", fc.scopeNote);
            }
        }
        ArrayNode concepts = root.putArray("concepts");
        for (Concept c : CONCEPTS) {
            ObjectNode o = concepts.addObject();
            o.put("id", c.id).put("facet", c.facet).put("prefLabel", c.prefLabel);
            c.altLabels.forEach(o.putArray("altLabels")::add);
            c.hiddenLabels.forEach(o.putArray("hiddenLabels")::add);
            c.broader.forEach(o.putArray("broader")::add);
            c.related.forEach(o.putArray("related")::add);
            if (c.scopeNote != null) {
                o.put("scopeNote", c.scopeNote);
            }
        }
        return Json.pretty(root);
    }
}
