package dev.sheaf.samples;

/** Tents, sleeping bags and sleeping pads. */
final class ShelterCopy {
    private ShelterCopy() {
    }

    static void tent(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        int persons = new int[] {1, 2, 2, 2, 3, 3, 4}[r.nextInt(7)];
        int seasons = 2 + r.weighted(15, 70, 15);
        boolean ul = persons <= 2 && seasons < 4 && r.chance(0.35);
        boolean polePitched = ul && r.chance(0.4);
        boolean freestanding = !polePitched && r.chance(0.7);
        double base = new double[] {0, 1150, 1750, 2450, 3400}[persons];
        if (seasons == 4) {
            base *= 1.35;
        }
        if (ul) {
            base *= 0.62;
        }
        if (polePitched) {
            base *= 0.85;
        }
        double grams = base * r.between(0.85, 1.18);
        String material = ul ? (r.chance(0.7) ? "nylon" : "polyester") : (r.chance(0.55) ? "nylon" : "polyester");
        int denier = ul ? r.pick(7, 10, 15, 20) : r.pick(20, 30, 40, 68, 75);
        int flyMm = Copy.roundTo(r.between(1200, seasons == 4 ? 5000 : 3500), 500);
        int floorMm = Copy.roundTo(r.between(3000, 10000), 1000);
        boolean taped = r.chance(0.85);
        boolean flame = r.chance(0.22);
        boolean pfc = r.chance(0.3);
        boolean twoWay = r.chance(0.4);
        int doors = persons == 1 ? 1 : (r.chance(0.7) ? 2 : 1);
        boolean mesh = seasons < 4 && r.chance(0.55);
        boolean uv = r.chance(0.15);
        boolean ripstop = material.equals("nylon") ? r.chance(0.8) : r.chance(0.3);
        double floorM2 = persons * r.between(1.05, 1.45);
        double packedL = grams / 1000.0 * r.between(3.2, 4.5);
        String poles = polePitched ? "trekking poles" : (ul && r.chance(0.4)) ? "carbon" : r.chance(0.85) ? "aluminium" : "fibreglass";
        String seasonTerm = seasons == 2 ? "summer" : seasons == 3 ? "three-season" : "four-season";

        d.facts.number(Trait.PERSONS, persons).term(Trait.SEASON, seasonTerm).term(Trait.MATERIAL, material)
                .term(Trait.PROTECTION, "waterproof").number(Trait.WATERPROOF_MM, flyMm)
                .flag(Trait.TAPED_SEAMS, taped).flag(Trait.FLAME_RESISTANT, flame).flag(Trait.PFC_FREE, pfc)
                .flag(Trait.TWO_WAY_ZIP, twoWay).flag(Trait.FREESTANDING, freestanding)
                .number(Trait.FLOOR_M2, floorM2).number(Trait.PACKED_L, packedL)
                .term(Trait.INSULATION, "none").flag(Trait.HOOD, false);

        String line = Copy.line(d);
        String season = v.season(seasons);
        String descriptor;
        if (seasons == 4) {
            descriptor = r.pick("Mountain Tent", "Expedition Tent", Copy.cap(season) + " Tent");
        } else if (polePitched) {
            descriptor = "Trekking Pole Tent";
        } else if (ul) {
            descriptor = Copy.cap(v.ultralight()) + " Tent";
        } else if (seasons == 2) {
            descriptor = r.pick("Summer Tent", "Festival Tent", "Backpacking Tent");
        } else {
            descriptor = r.pick("Backpacking Tent", Copy.cap(season) + " Tent", "Dome Tent", "Tunnel Tent");
        }
        d.title(Copy.title(d, line, persons + (ul && r.chance(0.5) ? " UL" : ""), descriptor,
                persons + "P " + seasons + "-SSN TENT" + (ul ? " UL" : "")), Trait.PERSONS);

        String fabric = denier + "D " + (ripstop ? v.ripstop() + " " : "") + (material.equals("nylon") ? v.nylon() : v.polyester());
        if (d.quirky()) {
            d.say((ul ? "Lt.wt " : "") + seasons + "-SSN tent, sleeps " + persons + ".", Trait.SEASON, Trait.PERSONS);
            d.say("Fly " + fabric + ", " + v.millimetres(flyMm) + ".", Trait.MATERIAL, Trait.WATERPROOF_MM);
            d.say(doors + " drs / " + doors + " vest. " + (poles.equals("aluminium") ? "Alu poles." : poles.equals("carbon") ? "Carbon poles." : "Uses trekking poles."));
            if (taped) {
                d.say("Fully tpd seams.", Trait.TAPED_SEAMS);
            }
            if (twoWay) {
                d.say("2W zip on door.", Trait.TWO_WAY_ZIP);
            }
            if (flame) {
                d.say("Fabrics flame resistant per CPAI-84.", Trait.FLAME_RESISTANT);
            }
            d.say("W/ stuff sack, w/o footprint.");
        } else {
            String style = freestanding ? "freestanding " : polePitched ? "trekking-pole " : "semi-freestanding ";
            switch (r.nextInt(3)) {
                case 0: d.say("The " + line + " " + persons + " is a " + style + season + " tent that sleeps " + Copy.persons(persons) + ".", Trait.SEASON, Trait.PERSONS, Trait.FREESTANDING); break;
                case 1: d.say("A " + season + " " + (ul ? v.ultralight() + " " : "") + "shelter for " + Copy.persons(persons) + ", built for " + r.pick(Lexicon.USES) + ".", Trait.SEASON, Trait.PERSONS); break;
                default: d.say(Copy.cap(Copy.persons(persons)) + "-person " + season + " tent for " + r.pick(Lexicon.USES) + " and " + r.pick(Lexicon.USES) + ".", Trait.SEASON, Trait.PERSONS); break;
            }
            String hh = r.chance(0.3) ? "hydrostatic head (HH)" : r.pick("hydrostatic head", "waterproof rating", "water column");
            d.say("The fly is " + fabric + " with a " + v.millimetres(flyMm) + " " + hh
                    + (r.chance(0.5) ? ", and the floor is rated to " + v.millimetres(floorMm) + "." : "."), Trait.MATERIAL, Trait.WATERPROOF_MM);
            if (taped) {
                d.say(r.pick("Seams are fully taped.", "All seams are factory seam-sealed.", "Fully seam-taped for stormy nights."), Trait.TAPED_SEAMS);
            } else if (r.chance(0.6)) {
                d.say("Seams are not taped; seal them before the first trip.", Trait.TAPED_SEAMS);
            }
            String vest = v.vestibule();
            if (doors == 2) {
                d.say(r.chance(0.5) ? "Two doors and two " + vest + "s mean nobody climbs over anyone at 3 a.m."
                        : "Two doors, two " + vest + "s and room for boots and packs.");
            } else {
                d.say("One large door with a " + vest + " for packs and boots.");
            }
            if (twoWay) {
                d.say("The door opens with a " + v.twoWayZipper() + " so you can vent from the top.", Trait.TWO_WAY_ZIP);
            }
            if (r.chance(0.5)) {
                d.say("Roomy enough to accommodate " + Copy.persons(persons) + (persons == 1 ? " adult" : " adults") + " and their gear.", Trait.PERSONS);
            }
            if (mesh) {
                d.say("The inner is no-see-um mesh for airflow on warm nights.");
            } else if (seasons == 4) {
                d.say("A solid inner with small mesh panels keeps spindrift out.");
            }
            if (flame) {
                d.say(r.chance(0.5) ? "All fabrics are " + v.flameResistant() + " and meet CPAI-84." : "Fabrics are " + v.flameResistant() + " (CPAI-84).", Trait.FLAME_RESISTANT);
            }
            if (pfc) {
                d.say(r.chance(0.5) ? "Coatings are PFC-free." : "The fly has a PFC-free " + d.dwr() + ".", Trait.PFC_FREE);
            }
            if (uv) {
                d.say("The fly is UV-resistant to slow sun damage on long trips.");
            }
            switch (r.nextInt(4)) {
                case 0: d.say("Stakes and guylines included."); break;
                case 1: d.say("Footprint not included."); break;
                case 2: d.say("Stakes not included; bring your own for sandy ground."); break;
                default: d.say("Comes with a " + v.stuffSack() + ", stakes and a pole repair sleeve."); break;
            }
            if (r.chance(0.4)) {
                d.say(r.chance(0.5) ? "No-fuss pitching with " + v.colour() + "-coded poles and clips."
                        : "Pitches in under " + r.between(3, 6) + " minutes, fly first if it's raining.");
            }
            Copy.fluff(d, "tent");
            Copy.tested(d);
        }
        d.bullet(v.millimetres(flyMm) + " " + v.waterproof() + " fly", Trait.WATERPROOF_MM);
        if (taped) {
            d.bullet(Copy.cap(v.seamTaped()), Trait.TAPED_SEAMS);
        }
        d.bullet(doors + (doors == 1 ? " door, 1 " + v.vestibule() : " doors, 2 " + v.vestibule() + "s"));
        if (twoWay) {
            d.bullet(Copy.cap(v.twoWayZipper()) + " on the door", Trait.TWO_WAY_ZIP);
        }
        d.bullet(poles.equals("aluminium") ? Copy.cap(v.aluminium()) + " poles" : poles.equals("carbon") ? "Carbon poles" : poles.equals("fibreglass") ? "Fibreglass poles" : "Pitches with your " + v.trekkingPoles());
        if (freestanding) {
            d.bullet("Freestanding design", Trait.FREESTANDING);
        }
        if (flame) {
            d.bullet(Copy.cap(v.flameResistant()) + " fabrics", Trait.FLAME_RESISTANT);
        }
        if (r.chance(0.3)) {
            d.bullet("Separate storage pockets inside");
        }

        Copy.weight(d, grams);
        d.spec(SpecKey.PERSONS, r.pick(persons + " person", persons + "-person", persons + "P", Integer.toString(persons)), Trait.PERSONS);
        d.spec(SpecKey.SEASON, d.quirky() ? seasons + "-SSN" : v.season(seasons), Trait.SEASON);
        d.spec(SpecKey.MATERIAL, fabric, Trait.MATERIAL);
        d.spec(SpecKey.WATERPROOF, r.chance(0.5) ? "Fly " + v.millimetres(flyMm) + " / floor " + v.millimetres(floorMm) : v.millimetres(flyMm), Trait.WATERPROOF_MM);
        d.spec(SpecKey.FLOOR_AREA, d.v.supplier.units() == Supplier.Units.IMPERIAL ? Math.round(floorM2 * 10.7639) + " sq ft" : Voice.oneDecimal(floorM2) + " m²", Trait.FLOOR_M2);
        d.spec(SpecKey.DOORS, Integer.toString(doors));
        d.spec(SpecKey.POLES, poles.equals("aluminium") ? (r.chance(0.5) ? "7001 " : "") + v.aluminium() : poles.equals("trekking poles") ? "Trekking poles (not included)" : poles);
        packedSize(d, packedL, 3.0);
        Copy.colour(d, "green", "grey", "orange", "yellow", "blue", "brown");
        Copy.weightClass(d, grams);
    }

    /**
     * The packed-size spec of a cylinder holding {@code litres}, {@code ratio} times longer than it is
     * wide ("18 x 46 cm"), so "packs smaller" can be checked against the text.
     */
    static void packedSize(Draft d, double litres, double ratio) {
        double diameter = StrictMath.cbrt(4000 * litres / (ratio * StrictMath.PI));
        d.spec(SpecKey.PACKED_SIZE, d.v.length(diameter) + " x " + d.v.length(diameter * ratio), Trait.PACKED_L);
    }

    static void sleepingBag(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        boolean down = r.chance(0.55);
        int seasonIdx = r.weighted(20, 55, 25);
        int comfort = seasonIdx == 0 ? r.between(5, 10) : seasonIdx == 1 ? r.between(-3, 4) : r.between(-20, -5);
        int fp = down ? r.pick(600, 650, 700, 700, 750, 800, 800, 850, 900) : 0;
        String shape = new String[] {"mummy", "rectangular", "semi-rectangular", "quilt"}[r.weighted(65, 12, 13, 10)];
        boolean hood = !shape.equals("quilt") && !(shape.equals("rectangular") && r.chance(0.5));
        double fill = down ? (250 + (10 - comfort) * 28) * 800.0 / fp * r.between(0.9, 1.1) : (500 + (10 - comfort) * 55) * r.between(0.9, 1.1);
        double grams = (down ? r.between(450, 650) : r.between(600, 800)) + fill;
        double packedL = down ? grams / 1000 * 4.5 * 700.0 / fp : grams / 1000 * 7;
        boolean twoWay = !shape.equals("quilt") && r.chance(0.55);
        boolean hydrophobic = down && r.chance(0.35);
        boolean dwr = r.chance(0.6);
        boolean pfc = r.chance(0.3);
        boolean recycled = r.chance(0.25);
        boolean fibre = r.chance(0.4);
        boolean goose = down && (fp >= 750 || r.chance(0.3));
        String seasonTerm = seasonIdx == 0 ? "summer" : seasonIdx == 1 ? "three-season" : "four-season";
        int warmth = comfort >= 10 ? 1 : comfort >= 4 ? 2 : comfort >= -2 ? 3 : comfort >= -9 ? 4 : 5;
        d.facts.term(Trait.INSULATION, down ? "down" : "synthetic").number(Trait.COMFORT_C, comfort)
                .number(Trait.FILL_G, fill).flag(Trait.HOOD, hood).number(Trait.PACKED_L, packedL)
                .flag(Trait.TWO_WAY_ZIP, twoWay).flag(Trait.DWR, dwr).flag(Trait.PFC_FREE, pfc).flag(Trait.RECYCLED, recycled)
                .term(Trait.SEASON, seasonTerm).number(Trait.WARMTH, warmth).term(Trait.MATERIAL, recycled || r.chance(0.7) ? "nylon" : "polyester")
                .term(Trait.PROTECTION, dwr || hydrophobic ? "water-resistant" : "none").flag(Trait.PACKABLE, packedL < 6);
        if (down) {
            d.facts.number(Trait.FILL_POWER, fp);
        }
        if (hood) {
            d.facts.term(Trait.HOOD_KIND, "insulated");
        }
        String material = (String) d.facts.get(Trait.MATERIAL);
        String line = Copy.line(d);
        boolean fahrenheit = v.supplier.units() != Supplier.Units.METRIC;
        String tempModel = fahrenheit ? Long.toString(Math.round(comfort * 9.0 / 5.0 + 32)) : Integer.toString(comfort);
        String noun = shape.equals("quilt") ? "Quilt" : shape.equals("mummy") && r.chance(0.5) ? "Mummy Bag" : "Sleeping Bag";
        d.title(Copy.title(d, line, tempModel, (down ? "Down " : "Synthetic ") + noun,
                tempModel + "F " + (down ? "DN" : "SYN") + " " + (shape.equals("quilt") ? "QUILT" : "MUMMY")), Trait.INSULATION);
        String downPhrase = fp + "-fill " + (goose ? "goose" : "duck") + " down";
        String fillPhrase = down ? downPhrase : r.pick("synthetic insulation", "synthetic fill", "hollow-fibre polyester fill".replace("fibre", v.fibre()));
        if (d.quirky()) {
            d.say(seasonIdx + 2 + "-SSN " + (shape.equals("quilt") ? "quilt" : "mummy") + ", " + (down ? fp + "FP DN" : "SYN ins") + ".", Trait.INSULATION, Trait.SEASON);
            d.say("Comfort " + v.temperature(comfort) + ".", Trait.COMFORT_C, Trait.WARMTH);
            d.say(hood ? "W/ hd, draft collar." : "W/O hd.", Trait.HOOD);
            if (twoWay) {
                d.say("2W zip, full lgth.", Trait.TWO_WAY_ZIP);
            }
            if (dwr) {
                d.say("Shell " + v.nylon() + " DWR-trtd.", Trait.DWR);
            }
        } else {
            String sb = "sleeping bag";
            switch (r.nextInt(3)) {
                case 0: d.say("The " + line + " is a " + v.season(seasonIdx + 2) + " " + (shape.equals("quilt") ? "quilt" : shape + " " + sb) + " filled with " + fillPhrase + ".", Trait.INSULATION, Trait.SEASON); break;
                case 1: d.say("A " + (shape.equals("quilt") ? "" : shape + " ") + sb + " with " + fillPhrase + " for " + r.pick(Lexicon.USES) + ".", Trait.INSULATION); break;
                default: d.say(Copy.cap(fillPhrase) + " in a " + v.lightweight() + " " + (shape.equals("quilt") ? "quilt" : sb) + " made for " + r.pick(Lexicon.USES) + ".", Trait.INSULATION); break;
            }
            d.say("Comfort rating " + v.temperature(comfort) + ", limit " + v.temperature(comfort - r.between(5, 7)) + ".", Trait.COMFORT_C, Trait.WARMTH);
            if (hood) {
                d.say(r.chance(0.5) ? "A contoured hood and draft collar seal in warmth." : "The insulated hood cinches down with one pull.", Trait.HOOD);
            } else if (shape.equals("quilt")) {
                d.say(r.chance(0.5) ? "No hood and no zip: pair it with a warm hat." : "Hoodless and zipperless, to save weight.", Trait.HOOD);
            } else {
                d.say("No hood; the rectangular cut leaves room to move.", Trait.HOOD);
            }
            if (twoWay) {
                d.say("A full-length " + v.twoWayZipper() + " lets you vent at the feet.", Trait.TWO_WAY_ZIP);
            } else if (!shape.equals("quilt")) {
                d.say("Half-length " + v.zipper() + " with an anti-snag guard.");
            }
            if (hydrophobic) {
                d.say(r.pick("The down is treated to be water-resistant.", "Hydrophobic down stays lofty in damp weather.", "DWR-treated down dries faster."), Trait.DWR);
            }
            if (dwr) {
                d.say("The " + material + " shell has a " + (pfc ? "PFC-free " : "") + d.dwr() + ".", Trait.DWR, Trait.MATERIAL, Trait.PFC_FREE);
            } else if (pfc) {
                d.say("Made without PFCs (PFC-free).", Trait.PFC_FREE);
            }
            if (fibre) {
                d.facts.term(Trait.FIBRE, down ? "shell nylon, fill down" : "shell nylon, fill polyester");
                d.say(Copy.cap(v.fibre()) + " content: shell 100% " + (recycled ? "recycled " : "") + material + "; lining 100% polyester; fill "
                        + (down ? (goose ? "90% goose down, 10% feathers" : "90% duck down, 10% feathers") : "100% polyester") + ".", Trait.FIBRE);
            }
            if (r.chance(0.45)) {
                d.say("Comes with a " + v.stuffSack() + " and a cotton storage sack.");
            }
            Copy.fluff(d, "sleeping bag");
            Copy.tested(d);
        }
        d.bullet(down ? Copy.cap(downPhrase) : "Synthetic insulation that stays warm when damp", Trait.INSULATION);
        d.bullet(hood ? "Insulated hood with draft collar" : "No hood", Trait.HOOD);
        if (twoWay) {
            d.bullet(Copy.cap(v.twoWayZipper()), Trait.TWO_WAY_ZIP);
        }
        d.bullet("Trapezoidal foot box");
        if (recycled) {
            d.bullet("Recycled " + material + " shell", Trait.RECYCLED);
        }
        if (r.chance(0.3)) {
            d.bullet(Copy.cap(v.stuffSack()) + " included");
        }
        Copy.weight(d, grams);
        d.spec(SpecKey.TEMPERATURE, r.chance(0.6) ? v.temperature(comfort) : "Comfort " + v.temperature(comfort), Trait.COMFORT_C, Trait.WARMTH);
        d.spec(SpecKey.INSULATION, down ? (goose ? "Goose down" : "Duck down") : "Synthetic", Trait.INSULATION);
        if (down) {
            d.spec(SpecKey.FILL_POWER, r.pick(fp + "", fp + " FP", fp + " cuin", fp + "-fill", fp + " (EU)"));
        }
        d.spec(SpecKey.FILL_WEIGHT, v.weight(fill));
        d.spec(SpecKey.SHAPE, Copy.cap(shape));
        d.spec(SpecKey.LENGTH, r.pick("Regular (fits to " + v.length(183) + ")", "Long (fits to " + v.length(198) + ")", v.length(r.pick(200, 210, 220))));
        packedSize(d, packedL, 1.8);
        d.spec(SpecKey.MATERIAL, (recycled ? "Recycled " : "") + r.pick("20D ", "30D ", "15D ") + (material.equals("nylon") ? v.nylon() : v.polyester()), Trait.MATERIAL);
        Copy.colour(d, "green", "blue", "red", "orange", "grey", "black", "purple");
        Copy.weightClass(d, grams);
    }

    static void sleepingPad(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        int type = r.weighted(50, 30, 20);
        String typeTerm = type == 0 ? "air pad" : type == 1 ? "self-inflating mat" : "closed-cell foam pad";
        double rv = type == 0 ? r.between(1.2, 7.0) : type == 1 ? r.between(2.5, 6.0) : r.between(1.5, 2.8);
        rv = Math.round(rv * 10) / 10.0;
        double thick = type == 0 ? r.between(5, 10) : type == 1 ? r.between(2.5, 7.5) : r.between(1.5, 2.5);
        int lengthCm = r.pick(183, 183, 198, 168);
        int widthCm = r.pick(51, 51, 64, 76);
        double grams = type == 0 ? 280 + rv * 60 + thick * 25 : type == 1 ? 650 + rv * 120 : r.between(280, 450);
        grams *= r.between(0.9, 1.12) * lengthCm / 183.0;
        double packedL = type == 0 ? grams / 1000 * 3 : type == 1 ? grams / 1000 * 6 : r.between(12, 15);
        int warmth = Copy.grade(rv, 2, 3, 4, 5.5);
        String season = rv >= 5 ? "four-season" : rv >= 2.5 ? "three-season" : "summer";
        String material = type == 2 ? "foam" : r.chance(0.6) ? "nylon" : "polyester";
        d.facts.term(Trait.PAD_TYPE, typeTerm).number(Trait.R_VALUE, rv).number(Trait.THICKNESS_CM, thick)
                .number(Trait.PACKED_L, packedL).number(Trait.WARMTH, warmth).term(Trait.SEASON, season)
                .term(Trait.MATERIAL, material).flag(Trait.PACKABLE, packedL < 3);
        String line = Copy.line(d);
        String noun = type == 0 ? (rv >= 4 ? "Insulated " : "") + Copy.cap(v.airPad()).replace(" p", " P").replace(" m", " M")
                : type == 1 ? "Self-Inflating Mat" : r.pick("Foam Pad", "Foam Sleeping Pad");
        d.title(Copy.title(d, line, "", noun, (type == 0 ? "AIR PAD" : type == 1 ? "S/I MAT" : "FOAM PAD") + " R" + rv), Trait.R_VALUE);
        if (d.quirky()) {
            d.say((type == 0 ? "Air pad" : type == 1 ? "S/I mat" : "CCF pad") + ", R " + rv + ", " + v.length(thick) + " thk.", Trait.R_VALUE, Trait.THICKNESS_CM);
            if (type == 0) {
                d.say(r.chance(0.5) ? "W/ pump sack." : "W/O pump sack.");
            }
        } else {
            String padWord = type == 0 ? v.airPad() : type == 1 ? v.selfInflating() + " mat" : "closed-cell foam pad";
            d.say("The " + line + " is " + (type == 0 ? "an " : "a ") + padWord + " with an R-value of " + rv + " and " + v.length(thick) + " of cushioning.", Trait.R_VALUE, Trait.THICKNESS_CM);
            if (rv < 2.5) {
                d.say("Not suitable for winter: use it in summer or over a foam pad.", Trait.WARMTH);
            } else if (rv >= 5) {
                d.say("Warm enough for " + v.season(4) + " use on snow.", Trait.WARMTH);
            } else {
                d.say("A " + v.season(3) + " pad that is comfortable for side sleepers.", Trait.WARMTH);
            }
            if (type == 0) {
                d.say(r.pick("A two-way valve inflates fast and deflates in seconds.", "The flat valve sits out of the way.", "One-way inflation valve; pump sack included."));
            } else if (type == 2) {
                d.say("Closed-cell foam (CCF) cannot puncture, and it doubles as a sit mat.");
            } else {
                d.say("Open the valve and it self-inflates in a few minutes.");
            }
            Copy.fluff(d, "pad");
            Copy.tested(d);
        }
        d.bullet("R-value " + rv, Trait.R_VALUE);
        d.bullet(v.length(thick) + " thick", Trait.THICKNESS_CM);
        if (type == 0 && r.chance(0.5)) {
            d.bullet("Pump sack included");
        }
        d.bullet("Packs to the size of a " + (packedL < 2 ? "water bottle" : packedL < 4 ? "small loaf" : "rolled towel"));
        d.spec(SpecKey.R_VALUE, r.pick(rv + "", "R " + rv, "R" + rv, rv + " (ASTM F3340)"), Trait.R_VALUE);
        d.spec(SpecKey.THICKNESS, v.length(thick), Trait.THICKNESS_CM);
        d.spec(SpecKey.LENGTH, v.length(lengthCm) + " x " + v.length(widthCm));
        Copy.weight(d, grams);
        d.spec(SpecKey.MATERIAL, type == 2 ? "Closed-cell foam" : r.pick("30D ", "40D ", "20D ") + (material.equals("nylon") ? v.nylon() : v.polyester()), Trait.MATERIAL);
        Copy.colour(d, "green", "blue", "orange", "yellow", "red", "grey");
        Copy.weightClass(d, grams);
    }
}
