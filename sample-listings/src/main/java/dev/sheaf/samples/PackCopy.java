package dev.sheaf.samples;

/** Backpacks, from kids' daypacks to expedition packs. */
final class PackCopy {
    private PackCopy() {
    }

    static void backpack(Draft d) {
        Rng r = d.r;
        Voice v = d.v;
        int size = r.weighted(6, 38, 38, 18); // kids, day, overnight, expedition
        boolean kids = size == 0;
        double litres = size == 0 ? r.between(10, 20) : size == 1 ? r.between(15, 35) : size == 2 ? r.between(36, 55) : r.between(56, 80);
        litres = Math.round(litres);
        boolean ul = size == 2 && r.chance(0.2);
        double grams = size == 0 ? 250 + litres * 12 : size == 1 ? 350 + litres * 18 : size == 2 ? 900 + litres * 20 : 1400 + litres * 18;
        grams *= r.between(0.85, 1.15) * (ul ? 0.6 : 1.0);
        String frame = size <= 1 ? (r.chance(0.8) ? "frameless" : "framesheet") : ul ? "frameless" : size == 2 && r.chance(0.3) ? "aluminium stay" : "internal frame";
        boolean hipBelt = size == 0 ? false : size == 1 ? r.chance(0.35) : true;
        boolean rainCover = !kids && r.chance(0.35);
        boolean hydration = !kids && r.chance(0.6);
        boolean twoWay = r.chance(0.3);
        boolean dwr = r.chance(0.6);
        boolean notWaterproof = r.chance(0.2);
        boolean recycled = r.chance(0.25);
        String material = recycled ? (r.chance(0.5) ? "nylon" : "polyester") : r.chance(0.65) ? "nylon" : "polyester";
        String fabric = material.equals("nylon")
                ? r.pick("210D " + v.ripstop() + " " + v.nylon(), "420D " + v.nylon(), "100D " + v.ripstop() + " " + v.nylon(), "high-tenacity " + v.nylon())
                : r.pick("600D " + v.polyester(), "300D " + v.polyester(), "210D " + v.ripstop() + " " + v.polyester());
        if (recycled) {
            fabric = "recycled " + fabric;
        }
        d.facts.number(Trait.VOLUME_L, litres).term(Trait.MATERIAL, material).flag(Trait.HIP_BELT, hipBelt)
                .flag(Trait.RAIN_COVER, rainCover).flag(Trait.TWO_WAY_ZIP, twoWay).flag(Trait.DWR, dwr)
                .flag(Trait.RECYCLED, recycled).flag(Trait.KIDS, kids).flag(Trait.CHILD_SAFETY, kids)
                .term(Trait.PROTECTION, dwr ? "water-resistant" : "none").flag(Trait.HOOD, false).flag(Trait.PFC_FREE, dwr && r.chance(0.3));
        String line = Copy.line(d);
        String descriptor = kids ? "Kids' Daypack" : size == 1 ? r.pick("Daypack", "Hiking Daypack", "Day Pack")
                : size == 2 ? (ul ? Copy.cap(v.ultralight()) + " Pack" : r.pick("Backpack", "Hiking Pack", "Trekking Pack"))
                : r.pick("Expedition Pack", "Trekking Pack", "Backpack");
        long l = Math.round(litres);
        d.title(Copy.title(d, line, Long.toString(l), descriptor, l + "L PK" + (rainCover ? " W/ RAIN CVR" : "")), Trait.VOLUME_L);
        if (d.quirky()) {
            d.say(l + "L pk, " + frame.replace("aluminium", "alu").replace("internal", "int.") + ". " + fabric + (dwr ? ", DWR-trtd." : "."), Trait.VOLUME_L, Trait.MATERIAL, Trait.DWR);
            d.say(hipBelt ? "W/ padded hip belt." : "W/O hip belt.", Trait.HIP_BELT);
            if (rainCover) {
                d.say("W/ rain cvr.", Trait.RAIN_COVER);
            }
            if (twoWay) {
                d.say("2W zip main comp.", Trait.TWO_WAY_ZIP);
            }
            if (kids) {
                d.say("Kids sz. Child-safe breakaway buckle.", Trait.CHILD_SAFETY, Trait.KIDS);
            }
        } else {
            if (kids) {
                d.say("This " + l + " L daypack is sized for kids aged 6 to 12.", Trait.VOLUME_L, Trait.KIDS);
                d.say("The chest strap has a child-safe breakaway buckle, and reflective details help drivers see small walkers.", Trait.CHILD_SAFETY);
            } else {
                switch (r.nextInt(3)) {
                    case 0: d.say("The " + line + " " + l + " is a " + v.volume(litres) + " " + (size == 1 ? "daypack" : "pack") + " for " + r.pick(Lexicon.USES) + ".", Trait.VOLUME_L); break;
                    case 1: d.say("A " + (ul ? v.ultralight() + " " : "") + (size == 3 ? "load-hauling " : "") + "pack with " + v.volume(litres) + " of space for " + r.pick(Lexicon.USES) + ".", Trait.VOLUME_L); break;
                    default: d.say(Copy.cap(v.volume(litres)) + " of capacity on a " + (frame.equals("frameless") ? "frameless" : frame) + " carry system.", Trait.VOLUME_L); break;
                }
            }
            d.say("Made from " + fabric + (dwr ? " with a " + (d.facts.flagged(Trait.PFC_FREE) ? "PFC-free " : "") + d.dwr() : "") + ".", Trait.MATERIAL, Trait.DWR, Trait.PFC_FREE);
            if (notWaterproof) {
                d.say("The fabric is " + v.waterResistant() + " but not " + v.waterproof() + ", so use a pack liner in heavy rain.");
            }
            if (hipBelt) {
                d.say(size == 1 ? "A removable " + v.hipBelt() + " steadies the load on rough ground." : "The padded " + v.hipBelt() + " carries most of the weight and has two zip pockets.", Trait.HIP_BELT);
            } else if (!kids && r.chance(0.6)) {
                d.say("No " + v.hipBelt() + ", just a sternum strap with a whistle buckle.", Trait.HIP_BELT);
            }
            if (size >= 2 && r.chance(0.5)) {
                d.say("The main compartment will accommodate a bear canister, and load lifters keep it close to your back.");
            }
            if (size >= 2 && r.chance(0.5)) {
                d.say("A separate sleeping bag compartment opens at the bottom.");
            } else if (size == 1 && r.chance(0.4)) {
                d.say("A separate sleeve holds a laptop or a hydration bladder.");
            }
            if (twoWay) {
                d.say("The main compartment opens with a " + v.twoWayZipper() + ".", Trait.TWO_WAY_ZIP);
            }
            if (rainCover) {
                d.say("An integrated " + v.rainCover() + " stows in its own pocket.", Trait.RAIN_COVER);
            }
            if (hydration) {
                d.say(r.pick("Hydration-compatible (bladder not included).", "A hydration sleeve and hose port are built in."));
            }
            if (!kids && r.chance(0.4)) {
                d.say("Comfortable straps with breathable mesh keep your back cooler.");
            }
            Copy.fluff(d, "pack");
            Copy.tested(d);
        }
        d.bullet(v.volume(litres) + " capacity", Trait.VOLUME_L);
        if (hipBelt) {
            d.bullet("Padded " + v.hipBelt() + " with pockets", Trait.HIP_BELT);
        }
        if (rainCover) {
            d.bullet(Copy.cap(v.rainCover()) + " included", Trait.RAIN_COVER);
        }
        if (twoWay) {
            d.bullet(Copy.cap(v.twoWayZipper()) + " on the main compartment", Trait.TWO_WAY_ZIP);
        }
        d.bullet(kids ? r.pick("Stretch front pocket", "Name label inside", "Reflective details")
                : r.pick("Trekking pole loops", "Ice axe loop", "Stretch front pocket", "Lid pocket with key clip", "Side compression straps"));
        if (hydration && r.chance(0.5)) {
            d.bullet("Hydration compatible");
        }
        if (kids) {
            d.bullet("Child-safe breakaway chest buckle", Trait.CHILD_SAFETY);
        }
        d.spec(SpecKey.VOLUME, d.quirky() ? v.volume(litres) : r.chance(0.3) ? Long.toString(l) : v.volume(litres), Trait.VOLUME_L);
        Copy.weight(d, grams);
        d.spec(SpecKey.FRAME, frame.equals("aluminium stay") ? v.aluminium() + " stay" : Copy.cap(frame));
        d.spec(SpecKey.MATERIAL, fabric, Trait.MATERIAL);
        if (!kids) {
            d.spec(SpecKey.TORSO, r.pick("Fits torso " + v.length(41) + "–" + v.length(51), "S/M, M/L", "Adjustable, " + v.length(40) + "-" + v.length(53), "One size"));
        }
        Copy.colour(d);
        Copy.weightClass(d, grams);
    }
}
