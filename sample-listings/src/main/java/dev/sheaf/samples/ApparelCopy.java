package dev.sheaf.samples;

/** Rain shells, insulated jackets and base layers. */
final class ApparelCopy {
    private ApparelCopy() {
    }

    private static String gender(Draft d) {
        int g = d.r.weighted(40, 40, 20);
        if (d.quirky()) {
            return g == 0 ? "M'S " : g == 1 ? "W'S " : "";
        }
        return g == 0 ? "Men's " : g == 1 ? "Women's " : "";
    }

    static void rainShell(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        boolean waterproof = r.chance(0.9);
        int layers = waterproof ? r.weighted(25, 40, 35) : -1; // 0: 2-layer, 1: 2.5-layer, 2: 3-layer
        String layerName = layers == 0 ? "2-layer" : layers == 1 ? "2.5-layer" : layers == 2 ? "3-layer" : "single-layer";
        int mm = waterproof ? Copy.roundTo(r.between(10000, 30000), 5000) : 0;
        int mvtr = waterproof ? Copy.roundTo(r.between(10000, 30000), 5000) : 0;
        boolean hood = waterproof ? r.chance(0.95) : r.chance(0.7);
        String hoodKind = !hood ? null : new String[] {"helmet-compatible", "adjustable", "stowable"}[r.weighted(30, 45, 25)];
        boolean pitZips = waterproof && r.chance(0.45);
        boolean taped = waterproof && r.chance(0.95);
        boolean partlyTaped = taped && r.chance(0.1);
        double grams = layers == 2 ? r.between(350, 550) : layers == 1 ? r.between(200, 350) : layers == 0 ? r.between(400, 600) : r.between(90, 180);
        if (pitZips) {
            grams += 25;
        }
        boolean packable = (layers == 1 || layers == -1) ? r.chance(0.8) : r.chance(0.3);
        boolean recycled = r.chance(0.3);
        String material = r.chance(0.6) ? "nylon" : "polyester";
        boolean pfc = r.chance(0.4);
        boolean twoWay = r.chance(0.25);
        boolean fibre = r.chance(0.45);
        boolean polyamide = v.uk && material.equals("nylon") && r.chance(0.5);
        d.facts.term(Trait.PROTECTION, waterproof ? "waterproof" : "water-resistant").number(Trait.WATERPROOF_MM, mm)
                .flag(Trait.HOOD, hood).flag(Trait.PIT_ZIPS, pitZips).flag(Trait.TAPED_SEAMS, taped && !partlyTaped)
                .flag(Trait.PACKABLE, packable).flag(Trait.RECYCLED, recycled).term(Trait.MATERIAL, material)
                .flag(Trait.DWR, true).flag(Trait.PFC_FREE, pfc).flag(Trait.TWO_WAY_ZIP, twoWay)
                .flag(Trait.BREATHABLE, waterproof ? mvtr >= 15000 : true).term(Trait.INSULATION, "none");
        if (hood) {
            d.facts.term(Trait.HOOD_KIND, hoodKind);
        }
        d.facts.number(Trait.PACKED_L, grams / 1000 * (packable ? 2.5 : 4));
        String line = Copy.line(d);
        String descriptor = !waterproof ? "Wind Shell" : layers == 2 && r.chance(0.4) ? "3L Shell Jacket" : layers == 1 && r.chance(0.3) ? "2.5L Rain Jacket"
                : r.pick("Rain Jacket", "Waterproof Jacket", "Rain Shell", "Shell Jacket");
        String quirkyDesc = (waterproof ? (layers == 2 ? "3L" : layers == 1 ? "2.5L" : "2L") + " WP JKT" : "WR WIND SHELL") + (hood ? " W/ HD" : " W/O HD");
        d.title(Copy.title(d, gender(d) + line, "", descriptor, quirkyDesc), Trait.PROTECTION);
        String fabric = r.pick("20D", "30D", "40D", "70D") + " " + (recycled ? "recycled " : "") + (material.equals("nylon") ? (polyamide ? "polyamide" : v.nylon()) : v.polyester());
        if (d.quirky()) {
            d.say((waterproof ? "WP/BR " + (layers == 2 ? "3L" : layers == 1 ? "2.5L" : "2L") + " shell, " + v.millimetres(mm) + "." : "WR wind shell, not WP."), Trait.PROTECTION, Trait.WATERPROOF_MM);
            if (hood) {
                d.say("Adj. hd" + (hoodKind.equals("helmet-compatible") ? ", helmet-compat." : ".") , Trait.HOOD);
            } else {
                d.say("W/O hd.", Trait.HOOD);
            }
            if (pitZips) {
                d.say("W/ pit zips.", Trait.PIT_ZIPS);
            }
            if (taped) {
                d.say(partlyTaped ? "Crit. tpd seams." : "Fully tpd seams.", Trait.TAPED_SEAMS);
            }
            d.say("Face " + fabric + ", DWR-trtd" + (pfc ? " (PFC-free)." : "."), Trait.MATERIAL, Trait.PFC_FREE);
        } else {
            if (waterproof) {
                switch (r.nextInt(3)) {
                    case 0: d.say("The " + line + " is a " + layerName + " " + v.waterproof() + ", breathable shell rated to " + v.millimetres(mm) + ".", Trait.PROTECTION, Trait.WATERPROOF_MM, Trait.BREATHABLE); break;
                    case 1: d.say("A " + v.lightweight() + " " + layerName + " rain jacket with a " + v.millimetres(mm) + " waterproof rating for " + r.pick(Lexicon.USES) + ".", Trait.PROTECTION, Trait.WATERPROOF_MM); break;
                    default: d.say(Copy.cap(v.waterproof()) + " and breathable: " + v.millimetres(mm) + " hydrostatic head, " + Voice.thousands(mvtr) + " g/m²/24h.", Trait.PROTECTION, Trait.WATERPROOF_MM, Trait.BREATHABLE); break;
                }
                if (taped) {
                    d.say(partlyTaped ? "Critically taped seams keep weight down." : Copy.cap(v.seamTaped()) + " keep every drop out.", Trait.TAPED_SEAMS);
                }
            } else {
                d.say("A " + v.lightweight() + " wind shell for " + r.pick(Lexicon.USES) + ".");
                d.say(Copy.cap(v.waterResistant()) + " but not " + v.waterproof() + ": it sheds drizzle, not downpours.", Trait.PROTECTION);
            }
            d.say("The " + fabric + " face fabric has a " + (pfc ? "PFC-free " : "") + d.dwr() + ".", Trait.MATERIAL, Trait.DWR, Trait.PFC_FREE);
            if (hood) {
                switch (hoodKind) {
                    case "helmet-compatible": d.say("The helmet-compatible hood adjusts with one hand.", Trait.HOOD); break;
                    case "adjustable": d.say("An adjustable hood with a stiffened brim keeps rain off your face.", Trait.HOOD); break;
                    default: d.say("The hood rolls into the collar when you don't need it.", Trait.HOOD); break;
                }
            } else if (r.chance(0.7)) {
                d.say(r.pick("No hood: pair it with a cap.", "Hoodless, with a tall collar."), Trait.HOOD);
            }
            if (pitZips) {
                d.say(Copy.cap(v.pitZips()) + " dump heat on long climbs.", Trait.PIT_ZIPS);
            } else if (waterproof && r.chance(0.3)) {
                d.say("No pit zips, to save weight.", Trait.PIT_ZIPS);
            }
            if (twoWay) {
                d.say("A " + v.twoWayZipper() + " at the front lets you vent under a harness.", Trait.TWO_WAY_ZIP);
            } else if (r.chance(0.4)) {
                d.say(r.pick("Water-resistant zippers on the hand pockets.", "Laminated zips on the chest pocket."));
            }
            if (packable) {
                d.say(r.pick("Packs into its own pocket.", "Packable into the chest pocket.", "Packs down small into the included " + v.stuffSack() + "."), Trait.PACKABLE);
            }
            Copy.fluff(d, "jacket");
            Copy.tested(d);
        }
        if (fibre) {
            d.facts.term(Trait.FIBRE, "shell " + material);
            String shell = material.equals("nylon") ? (polyamide ? "polyamide" : "nylon") : "polyester";
            d.say(r.chance(0.5) ? "Shell: 100% " + (recycled ? "recycled " : "") + shell + "; membrane: polyurethane (PU)."
                    : Copy.cap(v.fibre()) + " content: 100% " + shell + " with a PU membrane.", Trait.FIBRE);
        }
        if (waterproof) {
            d.bullet(v.millimetres(mm) + " " + v.waterproof() + " rating", Trait.WATERPROOF_MM, Trait.PROTECTION);
        } else {
            d.bullet(Copy.cap(v.waterResistant()) + ", not " + v.waterproof(), Trait.PROTECTION);
        }
        if (hood) {
            d.bullet(Copy.cap(hoodKind) + " hood", Trait.HOOD);
        }
        if (pitZips) {
            d.bullet(Copy.cap(v.pitZips()), Trait.PIT_ZIPS);
        }
        if (taped && !partlyTaped) {
            d.bullet(Copy.cap(v.seamTaped()), Trait.TAPED_SEAMS);
        }
        if (packable) {
            d.bullet("Packs into its own pocket", Trait.PACKABLE);
        }
        if (pfc) {
            d.bullet("PFC-free DWR", Trait.PFC_FREE);
        }
        if (waterproof) {
            d.spec(SpecKey.WATERPROOF, v.millimetres(mm), Trait.WATERPROOF_MM);
            d.spec(SpecKey.BREATHABILITY, d.quirky() ? (mvtr / 1000) + "K G" : r.pick(Voice.thousands(mvtr) + " g/m²/24h", (mvtr / 1000) + "K g/m²/24h", Voice.thousands(mvtr) + " g/m2/24hr"), Trait.BREATHABLE);
            d.spec(SpecKey.LAYERS, d.quirky() ? (layers == 2 ? "3L" : layers == 1 ? "2.5L" : "2L") : r.pick(layerName, layerName.replace("-layer", "L"), layerName + " laminate"));
        }
        Copy.weight(d, grams);
        d.spec(SpecKey.MATERIAL, fabric, Trait.MATERIAL);
        d.spec(SpecKey.FIT, Copy.fit(d));
        d.spec(SpecKey.SIZES, Copy.apparelSizes(d));
        Copy.colour(d);
        Copy.weightClass(d, grams);
    }

    static void insulatedJacket(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        boolean vest = r.chance(0.1);
        boolean parka = !vest && r.chance(0.12);
        boolean down = r.chance(0.5);
        int fp = down ? r.pick(600, 650, 700, 750, 800, 800, 850, 900) : 0;
        int gsm = down ? 0 : r.pick(40, 60, 60, 80, 100, 133, 170, 200);
        double fillG = down ? r.between(60, parka ? 300 : 200) : gsm * r.between(1.1, 1.4);
        if (vest) {
            fillG *= 0.6;
        }
        boolean hood = !vest && (parka || r.chance(0.55));
        String hoodKind = hood ? (parka ? "helmet-compatible" : r.pick("insulated", "adjustable", "insulated")) : null;
        double grams = (down ? 180 + fillG * 1.3 : 250 + fillG * 1.6) * (vest ? 0.7 : 1.0) + (hood ? 40 : 0);
        double index = down ? fillG * fp / 700.0 : fillG * 0.75;
        int warmth = Copy.grade(index, 80, 130, 180, 240);
        boolean dwr = r.chance(0.85);
        boolean notWaterproof = r.chance(0.25);
        boolean hydrophobic = down && r.chance(0.3);
        boolean packable = !parka && r.chance(0.65);
        boolean twoWay = parka ? r.chance(0.8) : r.chance(0.15);
        boolean pfc = r.chance(0.35);
        boolean recycled = r.chance(0.35);
        boolean fibre = r.chance(0.5);
        String material = r.chance(0.75) ? "nylon" : "polyester";
        boolean goose = down && (fp >= 750 || r.chance(0.3));
        d.facts.term(Trait.INSULATION, down ? "down" : "synthetic").number(Trait.FILL_G, fillG).flag(Trait.HOOD, hood)
                .number(Trait.WARMTH, warmth).flag(Trait.DWR, dwr).term(Trait.PROTECTION, dwr ? "water-resistant" : "none")
                .flag(Trait.PACKABLE, packable).flag(Trait.TWO_WAY_ZIP, twoWay).flag(Trait.PFC_FREE, pfc)
                .flag(Trait.RECYCLED, recycled).term(Trait.MATERIAL, material).number(Trait.PACKED_L, grams / 1000 * (down ? 5 : 7));
        if (down) {
            d.facts.number(Trait.FILL_POWER, fp);
        }
        if (hood) {
            d.facts.term(Trait.HOOD_KIND, hoodKind);
        }
        String line = Copy.line(d);
        String descriptor = vest ? (down ? "Down Vest" : "Insulated Vest") : parka ? (down ? "Down Parka" : "Belay Parka")
                : hood ? (down ? r.pick("Down Hoody", "Down Hooded Jacket", "Puffer Hoody") : r.pick("Insulated Hoody", "Synthetic Hooded Jacket"))
                : (down ? r.pick("Down Jacket", "Puffer Jacket", "Down Sweater") : r.pick("Insulated Jacket", "Synthetic Jacket"));
        String qd = (down ? fp + "FP DN " : "SYN INS. ") + (vest ? "VEST" : parka ? "PARKA" : "JKT") + (hood ? " W/ HD" : " W/O HD");
        d.title(Copy.title(d, gender(d) + line, "", descriptor, qd), Trait.INSULATION);
        String fill = down ? fp + "-fill " + (goose ? "goose" : "duck") + " down" : gsm + " g/m² synthetic insulation";
        String shell = r.pick("20D ", "10D ", "15D ", "30D ") + (recycled ? "recycled " : "") + (r.chance(0.5) ? v.ripstop() + " " : "") + (material.equals("nylon") ? v.nylon() : v.polyester());
        if (d.quirky()) {
            d.say("Ins. " + (vest ? "vest" : "jkt") + ", " + (down ? fp + "FP DN" : gsm + "G SYN") + ", " + v.weight(fillG) + " fill.", Trait.INSULATION);
            d.say(hood ? "W/ adj. hd." : "W/O hd.", Trait.HOOD);
            if (dwr) {
                d.say("Shell " + shell + ", DWR-trtd, WR not WP.", Trait.DWR, Trait.MATERIAL);
            }
            if (packable) {
                d.say("Packs in own pocket.", Trait.PACKABLE);
            }
            if (twoWay) {
                d.say("2W zip.", Trait.TWO_WAY_ZIP);
            }
        } else {
            switch (r.nextInt(3)) {
                case 0: d.say("The " + line + " is " + (vest ? "a vest" : "an insulated jacket") + " with " + fill + " for " + r.pick(Lexicon.USES) + ".", Trait.INSULATION); break;
                case 1: d.say(Copy.cap(fill) + " in a " + v.lightweight() + " " + (vest ? "vest" : "jacket") + (parka ? " built for belays and cold camps" : "") + ".", Trait.INSULATION); break;
                default: d.say("A warm, " + v.lightweight() + " " + (vest ? "vest" : "layer") + " insulated with " + fill + ".", Trait.INSULATION); break;
            }
            d.say("It carries " + v.weight(fillG) + " of fill" + (down ? " at " + fp + " fill power (FP)." : "."), Trait.FILL_G, Trait.WARMTH);
            if (hood) {
                d.say(hoodKind.equals("helmet-compatible") ? "The helmet-compatible hood fits over a climbing helmet."
                        : hoodKind.equals("insulated") ? "An insulated hood keeps the wind off your neck." : "The adjustable hood moves with your head.", Trait.HOOD);
            } else if (!vest && r.chance(0.6)) {
                d.say(r.pick("No hood, so it layers cleanly under a shell.", "Hoodless, with a stand-up collar.", "Stand-up collar; no hood."), Trait.HOOD);
            }
            if (dwr) {
                d.say("The " + shell + " shell has a " + (pfc ? "PFC-free " : "") + d.dwr() + (notWaterproof ? "; it is " + v.waterResistant() + ", not waterproof." : "."), Trait.DWR, Trait.MATERIAL, Trait.PFC_FREE);
            } else {
                d.say("The shell is " + shell + ".", Trait.MATERIAL);
            }
            if (hydrophobic) {
                d.say(r.pick("Hydrophobic down keeps its loft in damp weather.", "The down is DWR-treated to be water-resistant."));
            }
            if (packable) {
                d.say(r.pick("Packs into its own pocket.", "Packable: it stuffs into its hand pocket.", "Packs into the included " + v.stuffSack() + "."), Trait.PACKABLE);
            }
            if (twoWay) {
                d.say("A " + v.twoWayZipper() + " makes it easy to belay in.", Trait.TWO_WAY_ZIP);
            }
            Copy.fluff(d, vest ? "vest" : "jacket");
            Copy.tested(d);
        }
        if (fibre) {
            d.facts.term(Trait.FIBRE, down ? "shell nylon, fill down" : "shell nylon, fill polyester");
            d.say("Shell: 100% " + (recycled ? "recycled " : "") + material + ". Fill: " + (down ? (goose ? "90% goose down, 10% feathers" : "90% duck down, 10% feathers") : "100% polyester") + ".", Trait.FIBRE);
        }
        d.bullet(Copy.cap(fill), Trait.INSULATION);
        if (hood) {
            d.bullet(Copy.cap(hoodKind) + " hood", Trait.HOOD);
        } else if (!vest) {
            d.bullet("No hood", Trait.HOOD);
        }
        if (packable) {
            d.bullet("Packable", Trait.PACKABLE);
        }
        if (dwr) {
            d.bullet(pfc ? "PFC-free DWR" : "DWR finish", Trait.DWR, Trait.PFC_FREE);
        }
        if (twoWay) {
            d.bullet(Copy.cap(v.twoWayZipper()), Trait.TWO_WAY_ZIP);
        }
        d.bullet(r.pick("Zippered hand pockets", "Elastic cuffs", "Drop-in chest pocket", "Hem drawcord", "Hem draw cord", "Adjustable draw-cord hem"));
        d.spec(SpecKey.INSULATION, down ? (goose ? "Goose down" : "Duck down") : (d.quirky() ? "SYN" : "Synthetic, " + gsm + " g/m²"), Trait.INSULATION);
        if (down) {
            d.spec(SpecKey.FILL_POWER, r.pick(fp + "", fp + " FP", fp + " cuin", fp + "-fill"));
        }
        d.spec(SpecKey.FILL_WEIGHT, v.weight(fillG), Trait.FILL_G);
        Copy.weight(d, grams);
        d.spec(SpecKey.MATERIAL, shell, Trait.MATERIAL);
        d.spec(SpecKey.FIT, Copy.fit(d));
        d.spec(SpecKey.SIZES, Copy.apparelSizes(d));
        Copy.colour(d);
        Copy.weightClass(d, grams);
    }

    static void baseLayer(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        int kind = r.weighted(40, 25, 25, 10); // 100% merino, merino blend, polyester, sun hoody
        boolean bottoms = kind != 3 && r.chance(0.2);
        int gsm = kind <= 1 ? r.pick(125, 150, 150, 175, 200, 200, 230, 260) : kind == 2 ? r.pick(110, 130, 150, 180) : r.pick(110, 130);
        String fibre;
        String material;
        if (kind == 0) {
            fibre = "100% merino wool";
            material = "merino wool";
        } else if (kind == 1) {
            fibre = r.pick("87% merino wool, 13% nylon", "60% merino wool, 40% polyester", "70% merino wool, 30% lyocell", "52% merino wool, 48% nylon");
            material = "merino wool";
        } else if (kind == 2) {
            fibre = r.chance(0.5) ? "100% recycled polyester" : "100% polyester";
            material = "polyester";
        } else {
            fibre = "88% nylon, 12% elastane";
            material = "nylon";
        }
        boolean upf = kind == 3 || r.chance(0.2);
        int upfValue = kind == 3 ? 50 : r.pick(20, 30, 40, 50);
        String neck = bottoms ? "none" : kind == 3 ? "hooded" : new String[] {"crew", "quarter-zip", "half-zip", "hooded"}[r.weighted(45, 30, 10, 15)];
        boolean hood = neck.equals("hooded");
        boolean odour = kind <= 1 ? r.chance(0.8) : r.chance(0.4);
        boolean thumbLoops = !bottoms && r.chance(0.3);
        double grams = (bottoms ? 0.9 : 1.0) * gsm * r.between(0.8, 1.1) * (hood ? 1.1 : 1.0);
        int warmth = Copy.grade(gsm - (material.equals("merino wool") ? 0 : 30), 150, 180, 210, 240);
        boolean recycled = fibre.contains("recycled");
        d.facts.term(Trait.FIBRE, fibre).term(Trait.MATERIAL, material).flag(Trait.HOOD, hood).number(Trait.WARMTH, warmth)
                .flag(Trait.RECYCLED, recycled).term(Trait.PROTECTION, "none").flag(Trait.BREATHABLE, true)
                .term(Trait.INSULATION, "none").flag(Trait.TWO_WAY_ZIP, false).flag(Trait.PACKABLE, true);
        if (upf) {
            d.facts.number(Trait.UPF, upfValue);
        }
        String line = Copy.line(d);
        String descriptor;
        String qd;
        if (bottoms) {
            descriptor = material.equals("merino wool") ? "Merino " + gsm + " Leggings" : "Thermal Leggings";
            qd = gsm + " " + (material.equals("merino wool") ? "MERINO" : "SYN") + " BTMS";
        } else if (kind == 3) {
            descriptor = "Sun Hoody";
            qd = "SUN HDY UPF50+";
        } else {
            String top = neck.equals("crew") ? "Crew" : neck.equals("quarter-zip") ? Copy.cap(v.quarterZip()) : neck.equals("half-zip") ? "Half-Zip" : "Hoody";
            descriptor = (material.equals("merino wool") ? "Merino " + gsm + " " : Copy.cap(v.baseLayer()) + " ") + top;
            qd = gsm + " " + (material.equals("merino wool") ? "MERINO" : "SYN") + " " + (neck.equals("crew") ? "CREW L/S" : neck.equals("hooded") ? "HDY" : "1/4 ZIP");
        }
        d.title(Copy.title(d, gender(d) + line, "", descriptor, qd), Trait.MATERIAL);
        if (d.quirky()) {
            d.say(gsm + " GSM " + (bottoms ? "btms" : "top") + ", " + fibre + ".", Trait.FIBRE, Trait.MATERIAL);
            if (hood) {
                d.say("W/ hd.", Trait.HOOD);
            }
            if (upf) {
                d.say("UPF " + upfValue + (upfValue == 50 ? "+" : "") + ".");
            }
        } else {
            switch (r.nextInt(3)) {
                case 0: d.say("The " + line + " is a " + gsm + " g/m² " + v.baseLayer() + " in " + fibre + ".", Trait.FIBRE, Trait.MATERIAL); break;
                case 1: d.say("A " + v.lightweight() + " " + v.baseLayer() + (bottoms ? " bottom" : " top") + " knitted from " + fibre + " for " + r.pick(Lexicon.USES) + ".", Trait.FIBRE, Trait.MATERIAL); break;
                default: d.say(Copy.cap(fibre) + ", " + gsm + " gsm, comfortable next to skin.", Trait.FIBRE, Trait.MATERIAL); break;
            }
            if (odour) {
                d.say("The fabric is " + v.odourResistant().replace(" treatment", "-treated") + ", so it goes days between washes.");
            }
            if (hood) {
                d.say(kind == 3 ? "The hood shades your neck and ears." : "A close-fitting, balaclava-style hood.", Trait.HOOD);
            } else if (neck.equals("quarter-zip") || neck.equals("half-zip")) {
                d.say("The " + (neck.equals("quarter-zip") ? v.quarterZip() : "half-zip") + " neck vents heat on climbs.");
            }
            if (upf) {
                d.say(r.pick("UPF " + upfValue + (upfValue == 50 ? "+" : "") + " sun protection.", "Ultraviolet protection factor (UPF) " + upfValue + (upfValue == 50 ? "+" : "") + ".", "UV protection rated UPF " + upfValue + "."), Trait.UPF);
            }
            if (thumbLoops) {
                d.say("Thumb loops keep the sleeves in place under gloves.");
            }
            if (r.chance(0.6)) {
                d.say("Flatlock seams won't chafe under a pack.");
            }
            d.say("Machine washable at 30 °C.");
            Copy.fluff(d, v.baseLayer());
            Copy.tested(d);
        }
        d.bullet(Copy.cap(fibre), Trait.FIBRE);
        d.bullet(gsm + " g/m² fabric");
        if (odour) {
            d.bullet(Copy.cap(v.odourResistant()));
        }
        if (upf) {
            d.bullet("UPF " + upfValue + (upfValue == 50 ? "+" : ""), Trait.UPF);
        }
        if (thumbLoops) {
            d.bullet("Thumb loops");
        }
        d.spec(SpecKey.FIBRE, d.quirky() ? fibre.toUpperCase(java.util.Locale.ROOT) : fibre, Trait.FIBRE, Trait.MATERIAL);
        d.spec(SpecKey.FABRIC_WEIGHT, r.pick(gsm + " g/m²", gsm + " gsm", gsm + " GSM", Voice.oneDecimal(gsm / 33.906) + " oz/yd²"), Trait.WARMTH);
        if (r.chance(0.6)) {
            Copy.weight(d, grams);
        } else {
            d.facts.number(Trait.WEIGHT_G, grams);
        }
        if (upf) {
            d.spec(SpecKey.UPF, upfValue + (upfValue == 50 ? "+" : ""), Trait.UPF);
        }
        d.spec(SpecKey.FIT, Copy.fit(d));
        d.spec(SpecKey.SIZES, Copy.apparelSizes(d));
        Copy.colour(d);
        Copy.weightClass(d, grams);
    }
}
