package dev.sheaf.samples;

import java.util.List;

/**
 * The spec keys of the shop and how differently they are written. Each supplier has a habitual
 * form (chosen by a stable hash of supplier and key), and in 30% of listings the copy editor used
 * another form; the quirky supplier always writes its own capitalised abbreviation. {@link #csv} is
 * the column name of the shop's own CSV export, which is consistent.
 */
enum SpecKey {
    WEIGHT("Weight", "WGT", "Weight", "Wt.", "Item weight", "Weight (approx.)", "Total weight"),
    COLOUR("Colour", "CLR", "Color", "Colour", "Colorway", "Colourway"),
    MATERIAL("Material", "MATL", "Material", "Fabric", "Shell fabric", "Main material"),
    VOLUME("Volume (L)", "VOL", "Volume", "Capacity", "Pack volume", "Vol."),
    PERSONS("Sleeps", "CAP", "Capacity", "Sleeps", "Occupancy", "Persons"),
    SEASON("Season", "SSN", "Season", "Seasons", "Season rating"),
    WATERPROOF("Waterproof rating", "H2O RTG", "Waterproof rating", "Hydrostatic head", "Water column", "Waterproofness"),
    BREATHABILITY("Breathability", "BR", "Breathability", "MVTR", "Breathability (g/m²/24h)"),
    TEMPERATURE("Temperature rating", "TEMP", "Temperature rating", "Comfort rating", "Temp. rating", "Comfort temperature"),
    FILL_POWER("Fill power", "FP", "Fill power", "Fill Power (FP)", "Down fill power", "Loft"),
    FILL_WEIGHT("Fill weight", "INS. WGT", "Fill weight", "Insulation weight", "Fill"),
    INSULATION("Insulation", "INS.", "Insulation", "Fill type", "Fill material"),
    PACKED_SIZE("Packed size", "PKD", "Packed size", "Pack size", "Packed dimensions", "Stuff sack size"),
    FLOOR_AREA("Floor area", "FLR", "Floor area", "Floor space", "Floor dimensions"),
    DOORS("Doors", "DRS", "Doors", "Entrances"),
    POLES("Poles", "FRM", "Poles", "Pole material", "Frame"),
    BRIGHTNESS("Brightness", "LM", "Brightness", "Max output", "Light output", "Lumens"),
    BEAM("Beam distance", "THROW", "Beam distance", "Throw", "Max beam"),
    BATTERY("Battery", "BATT", "Battery", "Power", "Batteries"),
    RUNTIME("Run time", "RUN", "Run time", "Runtime", "Battery life"),
    IP_RATING("Water resistance", "IP", "Water resistance", "Ingress protection", "IP rating"),
    BOIL_TIME("Boil time", "BOIL", "Boil time", "Boil time (1 L)", "Time to boil"),
    OUTPUT("Heat output", "OUTPUT", "Output", "Heat output", "Power"),
    FUEL("Fuel", "FUEL", "Fuel", "Fuel type"),
    BURN_TIME("Burn time", "BURN", "Burn time", "Burn time (100 g canister)"),
    R_VALUE("R-value", "R", "R-value", "R value", "Insulation (R)", "Thermal resistance"),
    THICKNESS("Thickness", "THK", "Thickness", "Depth", "Inflated thickness"),
    LENGTH("Length", "LGTH", "Length", "Dimensions", "Size"),
    DROP("Drop", "DROP", "Drop", "Heel-to-toe drop", "Offset"),
    SOLE("Outsole", "SOLE", "Outsole", "Sole", "Sole unit"),
    UPPER("Upper", "UPR", "Upper", "Upper material"),
    LOCK("Locking", "LOCK", "Locking", "Lock type", "Adjustment"),
    COLLAPSED("Collapsed length", "MIN LGTH", "Collapsed length", "Packed length", "Min length"),
    FIBRE("Fibre content", "CONTENT", "Fiber content", "Fibre content", "Material composition", "Composition"),
    UPF("UPF", "UPF", "UPF", "UV protection", "Sun protection"),
    FABRIC_WEIGHT("Fabric weight", "GSM", "Fabric weight", "Weight", "GSM"),
    SIZES("Sizes", "SZ", "Sizes", "Size range", "Available sizes"),
    FIT("Fit", "FIT", "Fit", "Cut"),
    SHAPE("Shape", "SHAPE", "Shape", "Cut", "Style"),
    FRAME("Frame", "FRM", "Frame", "Frame type", "Suspension"),
    TORSO("Torso length", "TORSO", "Torso length", "Fits torso", "Back length"),
    LAYERS("Construction", "LYR", "Construction", "Layers", "Fabric construction"),
    GRIP("Grip", "GRIP", "Grip", "Handle");

    /** The shop's CSV export column. */
    final String csv;
    /** The quirky supplier's key. */
    final String quirky;
    private final List<String> forms;

    SpecKey(String csv, String quirky, String... forms) {
        this.csv = csv;
        this.quirky = quirky;
        this.forms = List.of(forms);
    }

    List<String> forms() {
        return forms;
    }

    /** The key as this supplier writes it in this listing. */
    String as(Voice v) {
        if (v.quirky) {
            return quirky;
        }
        if (this == COLOUR) {
            return v.colour().equals("colour") ? (v.r.chance(0.85) ? "Colour" : "Colourway") : (v.r.chance(0.85) ? "Color" : "Colorway");
        }
        if (this == FIBRE) {
            return v.fibre().equals("fibre") ? (v.r.chance(0.7) ? "Fibre content" : "Composition") : (v.r.chance(0.7) ? "Fiber content" : "Material composition");
        }
        int habit = Math.floorMod(v.supplier.id().hashCode() * 31 + name().hashCode(), forms.size());
        return v.r.chance(0.3) ? forms.get(v.r.nextInt(forms.size())) : forms.get(habit);
    }
}
