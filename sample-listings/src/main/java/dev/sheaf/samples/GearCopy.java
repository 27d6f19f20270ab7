package dev.sheaf.samples;

/** Footwear, stoves, headlamps and trekking poles. */
final class GearCopy {
    private GearCopy() {
    }

    static void footwear(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        int type = r.weighted(35, 10, 35, 12, 8); // mid boot, high boot, trail shoe, approach shoe, sandal
        double wpChance = type <= 1 ? 0.8 : type == 2 ? 0.4 : type == 3 ? 0.2 : 0;
        boolean waterproof = r.chance(wpChance);
        boolean waterResistant = !waterproof && type != 4 && r.chance(0.3);
        double grams = type == 0 ? r.between(1100, 1700) : type == 1 ? r.between(1500, 2000) : type == 2 ? r.between(550, 850) : type == 3 ? r.between(750, 1000) : r.between(450, 700);
        int drop = r.pick(4, 6, 8, 8, 10, 12);
        boolean leather = type <= 1 ? r.chance(0.55) : type == 3 ? r.chance(0.4) : false;
        String upper = leather ? r.pick("full-grain leather", "nubuck leather", "suede and mesh") : type == 4 ? "webbing straps" : r.pick("synthetic mesh", "engineered mesh", "ripstop mesh");
        String material = leather ? "leather" : "mesh";
        boolean vegan = !leather && type != 4 && r.chance(0.2);
        boolean mens = r.chance(0.5);
        d.facts.term(Trait.PROTECTION, waterproof ? "waterproof" : waterResistant ? "water-resistant" : "none")
                .term(Trait.MATERIAL, material).flag(Trait.BREATHABLE, !waterproof || r.chance(0.5)).flag(Trait.HOOD, false);
        String line = Copy.line(d);
        String noun = type == 0 ? (waterproof ? "Mid WP Hiking Boot" : "Mid Hiking Boot") : type == 1 ? "Mountain Boot" : type == 2 ? (waterproof ? "Waterproof Trail Shoe" : "Trail Shoe")
                : type == 3 ? "Approach Shoe" : "Trail Sandal";
        String qd = (type <= 1 ? "MID " : "") + (waterproof ? "WP " : "") + (type <= 1 ? "BOOT" : type == 4 ? "SANDAL" : "SHOE");
        d.title(Copy.title(d, (d.quirky() ? (mens ? "M'S " : "W'S ") : mens ? "Men's " : "Women's ") + line, "", noun, qd), Trait.PROTECTION);
        String sole = v.nonSlip() + " rubber outsole";
        if (d.quirky()) {
            d.say((waterproof ? "WP/BR membrane. " : waterResistant ? "WR suede. " : "Not WP, mesh drains fast. ") + Copy.cap(upper) + " upper.", Trait.PROTECTION, Trait.MATERIAL);
            d.say(drop + "MM drop, lugged sole, " + v.weight(grams / 2) + " per shoe (SZ 9).", Trait.WEIGHT_G);
        } else {
            String kind = type <= 1 ? "hiking boot" : type == 2 ? "trail shoe" : type == 3 ? "approach shoe" : "sandal";
            switch (r.nextInt(3)) {
                case 0: d.say("The " + line + " is a " + v.lightweight() + " " + kind + " with a " + upper + " upper for " + r.pick(Lexicon.USES) + ".", Trait.MATERIAL); break;
                case 1: d.say("A " + upper + " " + kind + " that is comfortable out of the box.", Trait.MATERIAL); break;
                default: d.say(Copy.cap(upper) + " meets a grippy " + sole + " in this " + kind + ".", Trait.MATERIAL); break;
            }
            if (waterproof) {
                d.say(r.pick("A " + v.waterproof() + " breathable membrane keeps feet dry in bogs and puddles.", "The " + v.waterproof() + " lining keeps out water; the mesh collar still breathes."), Trait.PROTECTION);
            } else if (waterResistant) {
                d.say("The suede is " + v.waterResistant() + " but the shoe is not " + v.waterproof() + ".", Trait.PROTECTION);
            } else if (type == 4) {
                d.say("Not waterproof by design: it drains and dries in minutes.", Trait.PROTECTION);
            } else if (r.chance(0.5)) {
                d.say("Not waterproof: breathable mesh drains fast and dries quickly on hot days.", Trait.PROTECTION, Trait.BREATHABLE);
            }
            d.say("The " + sole + " has " + r.between(3, 6) + " mm lugs" + (r.chance(0.5) ? " and a rubber toe cap." : "."));
            if (vegan) {
                d.say("Vegan: no animal-derived materials.");
            }
            if (r.chance(0.4)) {
                d.say(r.pick("Durable stitching and a padded collar.", "A cushioned midsole softens long descents.", "Speed lacing with locking hooks."));
            }
            Copy.fluff(d, type <= 1 ? "boot" : "shoe");
            Copy.tested(d);
        }
        d.bullet(waterproof ? Copy.cap(v.waterproof()) + " breathable membrane" : waterResistant ? Copy.cap(v.waterResistant()) + " suede" : "Breathable, quick-drying mesh", Trait.PROTECTION);
        d.bullet(Copy.cap(sole));
        d.bullet(drop + " mm drop");
        if (r.chance(0.5)) {
            d.bullet("Rubber toe cap");
        }
        d.facts.number(Trait.WEIGHT_G, grams);
        boolean perShoe = d.quirky() || r.chance(0.4);
        d.spec(SpecKey.WEIGHT, perShoe ? v.weight(grams / 2) + (d.quirky() ? " PER SHOE" : r.pick(" per shoe (UK 8)", " per shoe, size 9", " (single shoe)"))
                : v.weight(grams) + r.pick(" (pair)", " per pair", " / pair"), Trait.WEIGHT_G);
        d.spec(SpecKey.DROP, drop + " mm");
        d.spec(SpecKey.SOLE, Copy.cap(sole));
        d.spec(SpecKey.UPPER, Copy.cap(upper), Trait.MATERIAL);
        d.spec(SpecKey.SIZES, r.pick("EU 36–47", "US 5–13", "UK 3–12", "EU 38-48", "US 6-14"));
        Copy.colour(d, "grey", "black", "brown", "green", "blue", "red", "orange");
        Copy.weightClass(d, grams);
    }

    static void stove(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        int fuel = r.weighted(40, 15, 15, 10, 12, 8); // canister, canister system, liquid, multi, alcohol, solid
        String fuelTerm = fuel <= 1 ? "canister" : fuel == 2 ? "liquid fuel" : fuel == 3 ? "multi-fuel" : fuel == 4 ? "alcohol" : "solid fuel";
        int watts = fuel == 0 ? r.between(20, 35) * 100 : fuel == 1 ? r.between(14, 20) * 100 : fuel <= 3 ? r.between(25, 33) * 100 : 0;
        int boil = fuel == 0 ? r.between(150, 270) : fuel == 1 ? r.between(110, 180) : fuel <= 3 ? r.between(180, 270) : fuel == 4 ? r.between(420, 600) : r.between(480, 720);
        double grams = fuel == 0 ? r.between(45, 110) : fuel == 1 ? r.between(350, 520) : fuel == 2 ? r.between(300, 420) : fuel == 3 ? r.between(380, 450) : fuel == 4 ? r.between(30, 90) : r.between(50, 120);
        boolean piezo = fuel <= 1 && r.chance(0.55);
        boolean simmer = fuel <= 1 ? r.chance(0.6) : fuel <= 3 ? r.chance(0.4) : r.chance(0.1);
        boolean windscreen = r.chance(0.4);
        boolean child = fuel <= 3 && r.chance(0.2);
        String material = fuel == 4 ? r.pick("aluminium", "titanium") : fuel == 5 ? "steel" : r.pick("titanium", "steel", "aluminium", "steel");
        d.facts.term(Trait.FUEL, fuelTerm).number(Trait.BOIL_S, boil).term(Trait.MATERIAL, material).flag(Trait.CHILD_SAFETY, child);
        if (watts > 0) {
            d.facts.number(Trait.OUTPUT_W, watts);
        }
        String line = Copy.line(d);
        String noun = fuel == 0 ? (grams < 70 ? Copy.cap(v.ultralight()) + " Stove" : "Canister Stove") : fuel == 1 ? "Stove System" : fuel == 2 ? "Liquid-Fuel Stove"
                : fuel == 3 ? "Multi-Fuel Stove" : fuel == 4 ? "Alcohol Stove" : "Solid Fuel Stove";
        String mat = material.equals("aluminium") ? v.aluminium() : material.equals("steel") ? "stainless steel" : material;
        d.title(Copy.title(d, line, "", noun, (material.equals("titanium") ? "TI " : "") + (fuel <= 1 ? "CANISTER STV" : fuel <= 3 ? "LIQ. FUEL STV" : "STV") + (piezo ? " W/ PIEZO" : "")), Trait.FUEL);
        if (d.quirky()) {
            d.say(Copy.cap(fuelTerm) + " stv, " + mat + ". Boil 1L " + v.boilTime(boil) + ".", Trait.FUEL, Trait.BOIL_S);
            d.say(piezo ? "W/ piezo." : "W/O piezo.");
            if (child) {
                d.say("Child-resistant valve lock.", Trait.CHILD_SAFETY);
            }
        } else {
            switch (r.nextInt(3)) {
                case 0: d.say("The " + line + " is " + (fuel == 4 ? "an " : "a ") + fuelTerm + " stove in " + mat + " for " + r.pick(Lexicon.USES) + ".", Trait.FUEL, Trait.MATERIAL); break;
                case 1: d.say("A " + v.lightweight() + " " + mat + " " + fuelTerm + " stove that boils a litre in " + v.boilTime(boil) + ".", Trait.FUEL, Trait.MATERIAL, Trait.BOIL_S); break;
                default: d.say(Copy.cap(fuelTerm) + " burner, " + mat + " body, " + v.boilTime(boil) + " to boil 1 L.", Trait.FUEL, Trait.MATERIAL, Trait.BOIL_S); break;
            }
            if (fuel == 1) {
                d.say("An integrated pot with a heat exchanger saves fuel in the wind.");
            }
            if (fuel == 2 || fuel == 3) {
                d.say("Runs from a separate fuel bottle; the pump is serviceable in the field.");
            }
            if (piezo) {
                d.say("A " + v.piezo() + " lights it without matches.");
            } else if (fuel == 0 && r.chance(0.5)) {
                d.say("No piezo: bring a lighter or a fire steel.");
            }
            if (simmer) {
                d.say(fuel == 4 ? "A simmer ring lets you cook, not just boil." : "Simmer control is fine enough for real cooking.");
            }
            if (windscreen) {
                d.say(r.pick("A folding wind screen is included.", "Comes with a windscreen.", "Wind shield included."));
            }
            if (child) {
                d.say(r.pick("A child-resistant valve lock prevents accidental opening.", "The fuel bottle has a child-resistant cap."), Trait.CHILD_SAFETY);
            }
            d.say("Do not use inside tents or enclosed spaces: carbon monoxide risk.");
            if (fuel == 0 && r.chance(0.5)) {
                d.say("Fuel canister sold separately.");
            }
            Copy.fluff(d, "stove");
            Copy.tested(d);
        }
        d.bullet("Boils 1 L in " + v.boilTime(boil), Trait.BOIL_S);
        if (watts > 0) {
            d.bullet(v.watts(watts) + " output");
        }
        if (piezo) {
            d.bullet(Copy.cap(v.piezo()));
        }
        if (simmer) {
            d.bullet("Simmer control");
        }
        if (child) {
            d.bullet("Child-resistant valve", Trait.CHILD_SAFETY);
        }
        d.spec(SpecKey.FUEL, d.quirky() ? fuelTerm.toUpperCase(java.util.Locale.ROOT) : fuel <= 1 ? r.pick("Isobutane-propane canister", "Screw-on gas canister", "Canister (EN 417 thread)") : Copy.cap(fuelTerm), Trait.FUEL);
        if (watts > 0) {
            d.spec(SpecKey.OUTPUT, v.watts(watts));
        }
        d.spec(SpecKey.BOIL_TIME, v.boilTime(boil), Trait.BOIL_S);
        if (fuel <= 1) {
            d.spec(SpecKey.BURN_TIME, "approx. " + r.between(50, 90) + " min (100 g canister)");
        }
        Copy.weight(d, grams);
        d.spec(SpecKey.MATERIAL, Copy.cap(mat), Trait.MATERIAL);
        Copy.colour(d, "black", "grey", "orange", "red", "blue");
        Copy.weightClass(d, grams);
    }

    static void headlamp(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        boolean kids = r.chance(0.1);
        int lumens = kids ? r.between(3, 10) * 10 : Copy.roundTo(100 + 1100 * StrictMath.pow(r.nextDouble(), 1.8), 10);
        int beam = (int) Math.round(StrictMath.sqrt(lumens) * r.between(4, 6));
        int battery = kids ? 0 : r.weighted(40, 45, 15); // AAA, rechargeable, hybrid
        String batteryTerm = battery == 0 ? "AAA" : battery == 1 ? "rechargeable" : "hybrid";
        int ip = r.weighted(55, 25, 5, 15); // IPX4, IPX7, IPX8, none
        String ipTerm = ip == 0 ? "IPX4" : ip == 1 ? "IPX7" : ip == 2 ? "IPX8" : null;
        boolean red = !kids && r.chance(0.7);
        boolean lock = r.chance(0.6);
        double grams = kids ? r.between(40, 70) : r.between(45, 140) + lumens / 40.0;
        int high = r.between(2, 10);
        int low = r.between(20, 200);
        d.facts.number(Trait.LUMENS, lumens).number(Trait.BEAM_M, beam).term(Trait.BATTERY, batteryTerm)
                .flag(Trait.KIDS, kids).flag(Trait.CHILD_SAFETY, kids)
                .term(Trait.PROTECTION, ip == 0 ? "water-resistant" : ip <= 2 ? "waterproof" : "none").term(Trait.MATERIAL, "plastic");
        if (ipTerm != null) {
            d.facts.term(Trait.IP, ipTerm);
        }
        String line = Copy.line(d);
        String lamp = v.headlamp();
        String noun = kids ? "Kids' " + Copy.cap(lamp).replace(" t", " T") : battery == 1 ? "Rechargeable " + Copy.cap(lamp).replace(" t", " T") : Copy.cap(lamp).replace(" t", " T");
        d.title(Copy.title(d, line, Integer.toString(lumens), noun, (kids ? "KIDS " : "") + lumens + "LM HDLMP" + (battery == 1 ? " USB-C" : "")), Trait.LUMENS);
        String batt = battery == 0 ? "3 × AAA batteries (included)" : battery == 1 ? "a built-in Li-ion battery that charges over USB-C" : "a rechargeable pack or 3 × AAA batteries";
        if (d.quirky()) {
            d.say(lumens + "LM max, " + v.distance(beam) + " throw. " + (battery == 0 ? "3xAAA" : "USB-C rech.") + ".", Trait.LUMENS, Trait.BEAM_M, Trait.BATTERY);
            if (ipTerm != null) {
                d.say(ipTerm + (ip == 0 ? " WR." : " WP."), Trait.PROTECTION);
            }
            if (kids) {
                d.say("Kids model, child-safe screw batt. door.", Trait.CHILD_SAFETY);
            }
        } else {
            if (kids) {
                d.say("A " + lumens + "-lumen " + lamp + " sized for children, with a soft, adjustable strap.", Trait.LUMENS, Trait.KIDS);
                d.say("The battery compartment is secured with a screw for child safety.", Trait.CHILD_SAFETY);
                d.say("Not suitable for children under 3 years (small parts).", Trait.CHILD_SAFETY);
            } else {
                switch (r.nextInt(3)) {
                    case 0: d.say("The " + line + " " + lumens + " is a " + v.lumens(lumens) + " " + lamp + " for " + r.pick(Lexicon.USES) + ".", Trait.LUMENS); break;
                    case 1: d.say("A " + v.lightweight() + " " + lamp + " putting out " + v.lumens(lumens) + " with a " + v.distance(beam) + " beam.", Trait.LUMENS, Trait.BEAM_M); break;
                    default: d.say(Copy.cap(v.lumens(lumens)) + " of light, " + v.distance(beam) + " of throw, in a " + Voice.oneDecimal(grams / 28.349523125) + " oz " + lamp + ".", Trait.LUMENS, Trait.BEAM_M); break;
                }
            }
            d.say("It runs on " + batt + ": " + high + " h on high, " + low + " h on low.", Trait.BATTERY);
            if (ip == 0) {
                d.say(r.pick("IPX4 water resistant, so rain is no problem.", "Splash-proof (IPX4).", "Weather-resistant to IPX4."), Trait.PROTECTION);
            } else if (ip == 1) {
                d.say(r.pick("IPX7 waterproof: survives a dunk to 1 m for 30 minutes.", "Waterproof to IPX7."), Trait.PROTECTION);
            } else if (ip == 2) {
                d.say("Waterproof to IPX8 (2 m).", Trait.PROTECTION);
            } else if (r.chance(0.5)) {
                d.say("Not waterproof; keep it under your hood in heavy rain.", Trait.PROTECTION);
            }
            if (red) {
                d.say("A red light mode keeps your night vision.");
            }
            if (lock) {
                d.say("The " + v.lockMode() + " stops it switching on in your pack.");
            }
            Copy.fluff(d, lamp);
            Copy.tested(d);
        }
        d.bullet(v.lumens(lumens) + " max", Trait.LUMENS);
        d.bullet(v.distance(beam) + " beam", Trait.BEAM_M);
        if (ipTerm != null) {
            d.bullet(ipTerm + (ip == 0 ? " water resistant" : " waterproof"), Trait.PROTECTION);
        }
        if (red) {
            d.bullet("Red light mode");
        }
        if (lock) {
            d.bullet(Copy.cap(v.lockMode()));
        }
        if (kids) {
            d.bullet("Child-safe battery compartment", Trait.CHILD_SAFETY);
        }
        d.spec(SpecKey.BRIGHTNESS, v.lumens(lumens), Trait.LUMENS);
        d.spec(SpecKey.BEAM, v.distance(beam), Trait.BEAM_M);
        d.spec(SpecKey.BATTERY, battery == 0 ? "3 x AAA" : battery == 1 ? "Li-ion, USB-C rechargeable" : "Hybrid (Li-ion pack or 3 x AAA)", Trait.BATTERY);
        d.spec(SpecKey.RUNTIME, "High " + high + " h / Low " + low + " h");
        if (ipTerm != null) {
            d.spec(SpecKey.IP_RATING, ipTerm, Trait.PROTECTION);
        }
        Copy.weight(d, grams);
        Copy.colour(d, "black", "orange", "yellow", "blue", "green", "red");
        Copy.weightClass(d, grams);
    }

    static void trekkingPoles(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        boolean carbon = r.chance(0.4);
        int lock = r.weighted(50, 20, 30); // lever, twist, folding
        double grams = carbon ? r.between(300, 420) : r.between(450, 600);
        if (lock == 2) {
            grams -= 30;
        }
        int collapsed = lock == 2 ? r.between(36, 42) : r.between(58, 68);
        int max = r.between(120, 140);
        String grip = r.pick("cork", "foam", "foam", "rubber");
        boolean shock = r.chance(0.3);
        String material = carbon ? "carbon fibre" : "aluminium";
        d.facts.term(Trait.MATERIAL, material).number(Trait.PACKED_L, collapsed / 40.0).flag(Trait.HOOD, false);
        String line = Copy.line(d);
        String mat = carbon ? "carbon " + v.fibre() : v.aluminium();
        String noun = carbon ? "Carbon Trekking Poles" : lock == 2 ? "Folding Trekking Poles" : r.pick("Trekking Poles", "Hiking Poles", "Trekking Poles");
        d.title(Copy.title(d, line, "", noun, (carbon ? "CARBON" : "ALU") + " POLES (PR)"), Trait.MATERIAL);
        String lockName = lock == 0 ? "lever lock" : lock == 1 ? "twist lock" : "push-button folding";
        if (d.quirky()) {
            d.say((carbon ? "Carbon" : "Alu") + " poles, " + lockName + ", " + v.length(collapsed) + " min.", Trait.MATERIAL);
            d.say(shock ? "W/ anti-shock." : "W/O anti-shock.");
        } else {
            switch (r.nextInt(3)) {
                case 0: d.say("The " + line + " " + v.trekkingPoles() + " are made of " + mat + " with " + (lock == 0 ? "lever locks" : lock == 1 ? "twist locks" : "a push-button folding design") + ".", Trait.MATERIAL); break;
                case 1: d.say("A pair of " + v.lightweight() + " " + mat + " " + v.trekkingPoles() + " for " + r.pick(Lexicon.USES) + ".", Trait.MATERIAL); break;
                default: d.say(Copy.cap(mat) + " shafts, " + grip + " grips and " + (lock == 2 ? "a folding design" : lockName + "s") + " in one pair of poles.", Trait.MATERIAL); break;
            }
            d.say("They collapse to " + v.length(collapsed) + " and extend to " + v.length(max) + ".");
            d.say(Copy.cap(grip) + " grips" + (grip.equals("foam") ? " with an extended foam section for traverses." : "."));
            if (shock) {
                d.say(r.pick("Anti-shock springs soften descents.", "Shock-absorbing tips ease your knees."));
            } else if (r.chance(0.3)) {
                d.say("No anti-shock, so they stay quiet on rock.");
            }
            if (r.chance(0.5)) {
                d.say("Carbide tips, rubber tip covers and snow baskets included.");
            }
            Copy.fluff(d, "pair of poles");
            Copy.tested(d);
        }
        d.bullet(Copy.cap(mat) + " shafts", Trait.MATERIAL);
        d.bullet(Copy.cap(lockName) + (lock == 2 ? "" : "s"));
        d.bullet("Collapses to " + v.length(collapsed));
        d.spec(SpecKey.MATERIAL, Copy.cap(carbon ? "carbon " + v.fibre() : (r.chance(0.5) ? "7075 " : "") + v.aluminium()), Trait.MATERIAL);
        d.spec(SpecKey.LOCK, Copy.cap(lockName));
        d.spec(SpecKey.COLLAPSED, v.length(collapsed));
        d.spec(SpecKey.LENGTH, "Adjustable " + v.length(max - 30) + "–" + v.length(max));
        d.facts.number(Trait.WEIGHT_G, grams);
        boolean perPole = r.chance(0.35);
        d.spec(SpecKey.WEIGHT, perPole ? v.weight(grams / 2) + " per pole" : v.weight(grams) + (r.chance(0.5) ? " (pair)" : " per pair"), Trait.WEIGHT_G);
        d.spec(SpecKey.GRIP, Copy.cap(grip));
        Copy.colour(d, "black", "grey", "blue", "red", "green", "orange");
        Copy.weightClass(d, grams);
    }
}
