package dev.sheaf.samples;

import java.util.Locale;

/**
 * How one supplier words one listing: spelling (gray/grey), hyphenation and spacing variants
 * (two-way / 2-way / two way), synonyms (pit zips / underarm vents), abbreviations and units.
 * The variant frequencies are the planted phenomena; {@code README.md} lists them.
 * Numbers are formatted with {@link Locale#ROOT} ("1,200", "1.2").
 */
final class Voice {
    final Supplier supplier;
    final Rng r;
    final boolean uk;
    final boolean quirky;

    Voice(Supplier supplier, Rng r) {
        this.supplier = supplier;
        this.r = r;
        this.uk = supplier.uk();
        this.quirky = supplier.quirky();
    }

    // ---- spelling: each supplier keeps its own, but shop staff mix them (15%) ----

    private boolean ukNow() {
        return r.chance(0.15) ? !uk : uk;
    }

    String colour() {
        return ukNow() ? "colour" : "color";
    }

    String grey() {
        return ukNow() ? "grey" : "gray";
    }

    String aluminium() {
        return ukNow() ? "aluminium" : "aluminum";
    }

    String fibre() {
        return ukNow() ? "fibre" : "fiber";
    }

    String odour() {
        return ukNow() ? "odour" : "odor";
    }

    String litres() {
        return ukNow() ? "litres" : "liters";
    }

    String metres() {
        return ukNow() ? "metres" : "meters";
    }

    String centre() {
        return ukNow() ? "centre" : "center";
    }

    // ---- hyphenation and spacing variants ----

    String twoWayZipper() {
        if (quirky) {
            return "2W zip";
        }
        switch (r.weighted(40, 22, 14, 10, 8, 6)) {
            case 0: return uk ? "two-way zip" : "two-way zipper";
            case 1: return "2-way zipper";
            case 2: return "two way zipper";
            case 3: return "2-way zip";
            case 4: return "two-way zip";
            default: return "2 way zipper";
        }
    }

    String zipper() {
        return uk ? (r.chance(0.7) ? "zip" : "zipper") : (r.chance(0.85) ? "zipper" : "zip");
    }

    /** "three-season" and its variants; {@code seasons} is 2, 3 or 4. */
    String season(int seasons) {
        if (quirky) {
            return seasons + "-SSN";
        }
        String word = seasons == 2 ? "two" : seasons == 3 ? "three" : "four";
        switch (r.weighted(42, 34, 10, 10, 4)) {
            case 0: return word + "-season";
            case 1: return seasons + "-season";
            case 2: return word + " season";
            case 3: return seasons + " season";
            default: return Lexicon.capitalise(word) + "-Season";
        }
    }

    String ripstop() {
        if (quirky) {
            return "rip-stop";
        }
        switch (r.weighted(70, 20, 10)) {
            case 0: return "ripstop";
            case 1: return "rip-stop";
            default: return "rip stop";
        }
    }

    String nylon() {
        return quirky ? "nyl." : "nylon";
    }

    String polyester() {
        return quirky ? "poly" : "polyester";
    }

    String pitZips() {
        if (quirky) {
            return "pit zips";
        }
        switch (r.weighted(45, 15, 10, 20, 10)) {
            case 0: return "pit zips";
            case 1: return "pit-zips";
            case 2: return "pitzips";
            case 3: return "underarm vents";
            default: return "armpit zips";
        }
    }

    String hipBelt() {
        if (quirky) {
            return "hip belt";
        }
        switch (r.weighted(55, 15, 15, 15)) {
            case 0: return "hip belt";
            case 1: return "hipbelt";
            case 2: return "hip-belt";
            default: return "waist belt";
        }
    }

    String nonSlip() {
        switch (r.weighted(45, 15, 10, 30)) {
            case 0: return "non-slip";
            case 1: return "nonslip";
            case 2: return "non slip";
            default: return "slip-resistant";
        }
    }

    String stuffSack() {
        switch (r.weighted(70, 15, 15)) {
            case 0: return "stuff sack";
            case 1: return "stuff-sack";
            default: return "stuffsack";
        }
    }

    String quarterZip() {
        switch (r.weighted(35, 30, 15, 20)) {
            case 0: return "quarter-zip";
            case 1: return "1/4-zip";
            case 2: return "1/4 zip";
            default: return "quarter zip";
        }
    }

    String selfInflating() {
        return r.chance(0.8) ? "self-inflating" : "self inflating";
    }

    String ultralight() {
        switch (r.weighted(60, 25, 15)) {
            case 0: return "ultralight";
            case 1: return "ultra-light";
            default: return "ultra light";
        }
    }

    String lightweight() {
        if (quirky) {
            return "lt.wt";
        }
        switch (r.weighted(75, 15, 10)) {
            case 0: return "lightweight";
            case 1: return "light-weight";
            default: return "light weight";
        }
    }

    String rainCover() {
        if (quirky) {
            return "rain cvr";
        }
        switch (r.weighted(70, 20, 10)) {
            case 0: return "rain cover";
            case 1: return "raincover";
            default: return "rain-cover";
        }
    }

    String lockMode() {
        switch (r.weighted(50, 30, 20)) {
            case 0: return "lock mode";
            case 1: return "lockout mode";
            default: return "lock-out mode";
        }
    }

    String piezo() {
        switch (r.weighted(50, 30, 20)) {
            case 0: return "piezo igniter";
            case 1: return "piezo ignition";
            default: return "push-button ignition";
        }
    }

    String headlamp() {
        return uk && r.chance(0.6) ? "head torch" : "headlamp";
    }

    String vestibule() {
        return uk && r.chance(0.5) ? "porch" : "vestibule";
    }

    String baseLayer() {
        switch (r.weighted(70, 20, 10)) {
            case 0: return "base layer";
            case 1: return "baselayer";
            default: return "base-layer";
        }
    }

    String trekkingPoles() {
        switch (r.weighted(70, 15, 15)) {
            case 0: return "trekking poles";
            case 1: return "hiking poles";
            default: return "walking poles";
        }
    }

    String airPad() {
        switch (r.weighted(50, 25, 25)) {
            case 0: return "air pad";
            case 1: return "air mattress";
            default: return "air mat";
        }
    }

    String seamTaped() {
        switch (r.weighted(45, 25, 15, 15)) {
            case 0: return "fully taped seams";
            case 1: return "fully seam-taped";
            case 2: return "fully seam taped";
            default: return "factory seam-sealed";
        }
    }

    /** A water-repellency phrase (near-synonyms); the first mention may spell the abbreviation out. */
    String waterRepellent(boolean spellOut) {
        if (quirky) {
            return "DWR-trtd";
        }
        if (spellOut) {
            return "durable water repellent (DWR) finish";
        }
        switch (r.weighted(30, 20, 15, 15, 10, 10)) {
            case 0: return "DWR finish";
            case 1: return "DWR treatment";
            case 2: return "water-repellent finish";
            case 3: return "water repellent coating";
            case 4: return "DWR coating";
            default: return "durable water-repellent treatment";
        }
    }

    String waterResistant() {
        if (quirky) {
            return "WR";
        }
        return r.chance(0.85) ? "water-resistant" : "water resistant";
    }

    String waterproof() {
        if (quirky) {
            return "WP";
        }
        return r.chance(0.94) ? "waterproof" : "water-proof";
    }

    String flameResistant() {
        switch (r.weighted(40, 25, 20, 15)) {
            case 0: return "flame-resistant";
            case 1: return "flame resistant";
            case 2: return "fire retardant";
            default: return "flame-retardant";
        }
    }

    String odourResistant() {
        switch (r.weighted(60, 25, 15)) {
            case 0: return odour() + "-resistant";
            case 1: return "naturally " + odour() + " resistant";
            default: return "anti-" + odour() + " treatment";
        }
    }

    // ---- quantities ----

    // Hand-rolled instead of String.format: the formatter costs microseconds per call, and a
    // million-listing corpus makes tens of millions of these calls. Output as "%,d", "%.1f", "%.2f"
    // with Locale.ROOT (halves rounded away from zero).

    static String thousands(long n) {
        String digits = Long.toString(Math.abs(n));
        StringBuilder b = new StringBuilder(digits.length() + 8);
        if (n < 0) {
            b.append('-');
        }
        int lead = digits.length() % 3;
        for (int i = 0; i < digits.length(); i++) {
            if (i > 0 && (i - lead) % 3 == 0) {
                b.append(',');
            }
            b.append(digits.charAt(i));
        }
        return b.toString();
    }

    static String oneDecimal(double v) {
        return fixed(v, 1);
    }

    static String twoDecimals(double v) {
        return fixed(v, 2);
    }

    private static String fixed(double v, int places) {
        long scale = places == 1 ? 10 : 100;
        long t = Math.round(Math.abs(v) * scale);
        StringBuilder b = new StringBuilder(12);
        if (v < 0 && t != 0) {
            b.append('-');
        }
        b.append(t / scale).append('.');
        long frac = t % scale;
        if (places == 2 && frac < 10) {
            b.append('0');
        }
        return b.append(frac).toString();
    }

    /** "1.20" → "1.2" (one trailing zero dropped, as a copy editor would). */
    private static String dropTrailingZero(String s) {
        return s.endsWith("0") ? s.substring(0, s.length() - 1) : s;
    }

    /** A mass in the supplier's units: "1.24 kg", "1,240 g", "2 lb 12 oz", "2.73 lb", "43.7 oz", "1.24 kg (2 lb 12 oz)", "2.73 LBS". */
    String weight(double grams) {
        double oz = grams / 28.349523125;
        double lb = grams / 453.59237;
        if (quirky) {
            return twoDecimals(lb) + " LBS";
        }
        Supplier.Units u = supplier.units();
        if (u == Supplier.Units.DUAL) {
            return metricWeight(grams) + " (" + imperialWeight(oz, lb) + ")";
        }
        if (u == Supplier.Units.METRIC && r.chance(0.9) || u == Supplier.Units.IMPERIAL && r.chance(0.1)) {
            return metricWeight(grams);
        }
        return imperialWeight(oz, lb);
    }

    private String metricWeight(double grams) {
        if (grams < 1000 || r.chance(0.35)) {
            long g = Math.round(grams / 5.0) * 5;
            return (r.chance(0.8) ? thousands(g) : Long.toString(g)) + (r.chance(0.9) ? " g" : "g");
        }
        return dropTrailingZero(twoDecimals(grams / 1000.0)) + " kg";
    }

    private String imperialWeight(double oz, double lb) {
        if (oz < 16) {
            return oneDecimal(oz) + " oz";
        }
        switch (r.weighted(50, 20, 15, 15)) {
            case 0: {
                long totalOz = Math.round(oz);
                return (totalOz / 16) + " lb " + (totalOz % 16) + " oz";
            }
            case 1: {
                long totalOz = Math.round(oz);
                return (totalOz / 16) + " lbs " + (totalOz % 16) + " oz";
            }
            case 2: return dropTrailingZero(twoDecimals(lb)) + " lb";
            default: return oneDecimal(oz) + " oz";
        }
    }

    /** A volume: "45 L", "45 l", "45L", "45 liters", "2,750 cu in", "45 L (2,746 cu in)", "2746 CU.IN.". */
    String volume(double litres) {
        long cuIn = Math.round(litres * 61.023744);
        if (quirky) {
            return cuIn + " CU.IN.";
        }
        Supplier.Units u = supplier.units();
        long l = Math.round(litres);
        if (u == Supplier.Units.DUAL) {
            return l + " L (" + thousands(cuIn) + " cu in)";
        }
        if (u == Supplier.Units.IMPERIAL && r.chance(0.7)) {
            return r.chance(0.7) ? thousands(Math.round(cuIn / 50.0) * 50) + " cu in" : thousands(cuIn) + " cubic inches";
        }
        switch (r.weighted(50, 12, 18, 20)) {
            case 0: return l + " L";
            case 1: return l + " l";
            case 2: return l + "L";
            default: return l + " " + litres();
        }
    }

    /** A temperature in °C and/or °F. Negative values use "-" in running text and sometimes U+2212 in specs. */
    String temperature(int celsius) {
        long f = Math.round(celsius * 9.0 / 5.0 + 32);
        if (quirky) {
            return f + "F";
        }
        String c = signed(celsius) + (r.chance(0.8) ? " °C" : "°C");
        Supplier.Units u = supplier.units();
        if (u == Supplier.Units.IMPERIAL) {
            return r.chance(0.6) ? f + " °F" : f + " °F (" + c + ")";
        }
        if (u == Supplier.Units.DUAL) {
            return c + " / " + f + " °F";
        }
        return c;
    }

    private String signed(int celsius) {
        if (celsius >= 0) {
            return Integer.toString(celsius);
        }
        return (r.chance(0.25) ? "\u2212" : "-") + (-celsius);
    }

    /** Hydrostatic head: "20,000 mm", "20000 mm", "20,000mm", "20K mm", "20K MM H2O". */
    String millimetres(int mm) {
        if (quirky) {
            return (mm / 1000) + "K MM H2O";
        }
        switch (r.weighted(55, 15, 15, 15)) {
            case 0: return thousands(mm) + " mm";
            case 1: return mm + " mm";
            case 2: return thousands(mm) + "mm";
            default: return (mm % 1000 == 0 ? Integer.toString(mm / 1000) : oneDecimal(mm / 1000.0)) + "K mm";
        }
    }

    /** A length: "198 cm", "78 in", "78\"", "78 IN.". */
    String length(double cm) {
        double in = cm / 2.54;
        if (quirky) {
            return Math.round(in) + " IN.";
        }
        Supplier.Units u = supplier.units();
        if (u == Supplier.Units.IMPERIAL && r.chance(0.75)) {
            return r.chance(0.7) ? Math.round(in) + " in" : Math.round(in) + "\"";
        }
        if (u == Supplier.Units.DUAL) {
            return Math.round(cm) + " cm (" + Math.round(in) + " in)";
        }
        return cm < 10 ? oneDecimal(cm) + " cm" : Math.round(cm) + " cm";
    }

    String lumens(int lm) {
        if (quirky) {
            return lm + "LM";
        }
        switch (r.weighted(50, 35, 15)) {
            case 0: return lm + " lumens";
            case 1: return lm + " lm";
            default: return lm + "lm";
        }
    }

    String distance(int metres) {
        if (quirky) {
            return Math.round(metres * 3.28084) + " FT";
        }
        if (supplier.units() == Supplier.Units.IMPERIAL && r.chance(0.6)) {
            return Math.round(metres * 3.28084) + " ft";
        }
        return metres + (r.chance(0.7) ? " m" : " " + metres());
    }

    /** Boil time: "3 min 30 s", "3.5 min", "3:30 min", "210 sec". */
    String boilTime(int seconds) {
        if (quirky) {
            return oneDecimal(seconds / 60.0) + " MIN";
        }
        switch (r.weighted(35, 30, 25, 10)) {
            case 0: return (seconds / 60) + " min " + (seconds % 60) + " s";
            case 1: return oneDecimal(seconds / 60.0) + " min";
            case 2: return (seconds / 60) + ":" + (seconds % 60 < 10 ? "0" : "") + (seconds % 60) + " min";
            default: return seconds + " sec";
        }
    }

    String watts(int w) {
        long btu = Math.round(w * 3.412142 / 100.0) * 100;
        if (quirky) {
            return thousands(btu) + " BTU";
        }
        if (supplier.units() == Supplier.Units.IMPERIAL) {
            return thousands(btu) + " BTU/h";
        }
        return r.chance(0.5) ? thousands(w) + " W" : thousands(w) + " W (" + thousands(btu) + " BTU)";
    }
}
