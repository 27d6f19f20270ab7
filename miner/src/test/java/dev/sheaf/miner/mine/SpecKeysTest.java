package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.sheaf.miner.text.Dimension;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Spec keys: normal forms, clusters, canonical names, counts and dimensions. Keys and counts are invented. */
class SpecKeysTest {

    @ParameterizedTest(name = "''{0}'' → ''{1}''")
    @CsvSource(delimiter = '|', textBlock = """
            Weight                   | weight
            Wt.                      | weight
            Item weight              | item weight
            WEIGHT (kg)              | weight
            Weight:                  | weight
            Weight, g                | weight
            Weight in grams          | weight
            Weight (g/oz)            | weight
            Item_Weight              | item weight
            Packed Wt                | packed weight
            Min. trail weight        | minimum trail weight
            Trail weight (approx.)   | trail weight
            Capacity [L]             | capacity
            Vol.                     | volume
            Colour                   | colour
            Main material            | main material
            No. of pockets           | number of pockets
            Pkg. dims                | package dimensions
            Dimensions (L x W x H)   | dimensions
            Temperature rating (°F)  | temperature rating
            HH                       | hydrostatic head
            Fill-power               | fill power
            Pole diameter (mm)       | pole diameter
            Fit (athletic)           | fit athletic
            (kg)                     | kg
            """)
    void normalisesRawKeys(String raw, String normal) {
        assertEquals(normal, SpecKeys.normalise(raw));
    }

    @Test
    void noIsANumberOnlyWhenWrittenWithItsDot() {
        assertEquals("number of pockets", SpecKeys.normalise("No. of pockets"));
        assertEquals("no fly pitch", SpecKeys.normalise("No-fly pitch"));
    }

    @Test
    void normalisesUnderATurkishDefaultLocale() {
        Locale saved = Locale.getDefault();
        try {
            Locale.setDefault(Locale.forLanguageTag("tr-TR"));
            assertEquals("weight", SpecKeys.normalise("WEIGHT (KG)"));
            assertEquals("minimum trail weight", SpecKeys.normalise("MIN. TRAIL WEIGHT"));
            assertEquals(SpecKeys.cluster(Map.of("WEIGHT", 3L, "weight", 2L)).size(), 1);
        } finally {
            Locale.setDefault(saved);
        }
    }

    @Test
    void clustersWeightSpellingsButKeepsPackedAndTrailWeightApart() {
        Map<String, Long> counts = new LinkedHashMap<>();
        counts.put("Weight", 120L);
        counts.put("Wt.", 30L);
        counts.put("Item weight", 45L);
        counts.put("WEIGHT (kg)", 12L);
        counts.put("Packed Wt", 40L);
        counts.put("Packed weight", 25L);
        counts.put("Minimum trail weight", 18L);
        List<SpecKeyCluster> clusters = SpecKeys.cluster(counts);

        assertEquals(List.of("weight", "packed weight", "minimum trail weight"), clusters.stream().map(SpecKeyCluster::name).toList());
        SpecKeyCluster weight = clusters.get(0);
        assertEquals(207L, weight.count());
        assertEquals(List.of("Weight", "Item weight", "Wt.", "WEIGHT (kg)"), weight.members().stream().map(SpecKeyCluster.Member::rawKey).toList());
        assertEquals(List.of(120L, 45L, 30L, 12L), weight.members().stream().map(SpecKeyCluster.Member::count).toList());
        assertEquals(Optional.of(Dimension.MASS), weight.dimension(), "the (kg) suffix names the dimension");
        assertEquals(65L, clusters.get(1).count());
    }

    @Test
    void theCanonicalNameIsTheMostFrequentNormalForm() {
        // "weight" is carried by Weight (10) + Wt. (8) = 18 listings, "item weight" by 15
        List<SpecKeyCluster> clusters = SpecKeys.cluster(Map.of("Weight", 10L, "Wt.", 8L, "Item weight", 15L));
        assertEquals(1, clusters.size());
        assertEquals("weight", clusters.get(0).name());
        // with Item weight the single most common form, it names the cluster
        assertEquals("item weight", SpecKeys.cluster(Map.of("Weight", 10L, "Item weight", 15L)).get(0).name());
    }

    @Test
    void clustersUsAndUkSpellingsAndPlurals() {
        List<SpecKeyCluster> clusters = SpecKeys.cluster(Map.of("Colour", 50L, "Color", 20L, "Colours", 5L, "Main material", 9L,
                "Material", 30L, "Fabric", 12L));
        assertEquals(List.of("colour", "material", "fabric"), clusters.stream().map(SpecKeyCluster::name).toList());
        assertEquals(75L, clusters.get(0).count());
        assertEquals(39L, clusters.get(1).count());
    }

    @Test
    void capacityAndVolumeMergeUnlessTheirValuesMeasureDifferentThings() {
        Map<String, Long> counts = Map.of("Capacity", 40L, "Volume", 30L, "Vol.", 5L);
        assertEquals(1, SpecKeys.cluster(counts).size(), "without values the synonyms merge");

        Map<String, List<String>> values = Map.of(
                "Capacity", List.of("2-person", "3-person", "2P"),
                "Volume", List.of("20 L", "35 L", "1,200 cu in"));
        List<SpecKeyCluster> clusters = SpecKeys.cluster(counts, values);
        assertEquals(2, clusters.size(), clusters::toString);
        assertEquals("capacity", clusters.get(0).name());
        assertEquals(Optional.of(Dimension.COUNT), clusters.get(0).dimension());
        assertEquals("volume", clusters.get(1).name());
        assertEquals(Optional.of(Dimension.VOLUME), clusters.get(1).dimension());
        assertEquals(35L, clusters.get(1).count());

        Map<String, List<String>> sameDimension = Map.of("Capacity", List.of("20 L", "28 L"), "Volume", List.of("35 L"));
        assertEquals(1, SpecKeys.cluster(counts, sameDimension).size());
    }

    @Test
    void oneKeyWhoseValuesMeasureTwoThingsSplitsByDimension() {
        Map<String, Long> counts = Map.of("Capacity", 40L, "Capacity (L)", 25L);
        List<SpecKeyCluster> clusters = SpecKeys.cluster(counts, Map.of("Capacity", List.of("2-person", "4P")));
        assertEquals(2, clusters.size(), clusters::toString);
        assertEquals(Optional.of(Dimension.COUNT), clusters.get(0).dimension());
        assertEquals(Optional.of(Dimension.VOLUME), clusters.get(1).dimension());
    }

    @Test
    void aKeyNeedsHalfItsValuesToMeasureOneDimension() {
        var clusters = SpecKeys.cluster(Map.of("Notes", 3L), Map.of("Notes", List.of("1.2 kg", "ripstop", "bring stakes")));
        assertEquals(Optional.empty(), clusters.get(0).dimension());
        clusters = SpecKeys.cluster(Map.of("Hydrostatic head", 3L), Map.of("Hydrostatic head", List.of("3000 mm", "1,500 mm", "n/a")));
        assertEquals(Optional.of(Dimension.WATER_COLUMN), clusters.get(0).dimension(), "the key is the cue for mm as water column");
    }

    @Test
    void clustersAreOrderedByCountThenNameWhateverTheMapOrder() {
        Map<String, Long> a = new LinkedHashMap<>();
        a.put("Fabric", 5L);
        a.put("Colour", 5L);
        a.put("Weight", 9L);
        Map<String, Long> b = new LinkedHashMap<>();
        b.put("Weight", 9L);
        b.put("Colour", 5L);
        b.put("Fabric", 5L);
        assertEquals(SpecKeys.cluster(a), SpecKeys.cluster(b));
        assertEquals(List.of("weight", "colour", "fabric"), SpecKeys.cluster(a).stream().map(SpecKeyCluster::name).toList());
    }

    @Test
    void keysThatNormaliseToNothingAreLeftOut() {
        assertEquals(List.of(), SpecKeys.cluster(Map.of("  ", 4L, "--", 2L)));
    }

    @Test
    void aCountBelowOneIsMisuseNamedInTheMessage() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> SpecKeys.cluster(Map.of("Weight", 0L)));
        assertTrue(e.getMessage().contains("'Weight'"), e.getMessage());
    }

    @Test
    void differentFacetsKeepDifferentClusterKeys() {
        assertNotEquals(SpecKeys.analyse("Packed weight").clusterKey, SpecKeys.analyse("Weight").clusterKey);
        assertNotEquals(SpecKeys.analyse("Total weight").clusterKey, SpecKeys.analyse("Weight").clusterKey);
        assertEquals(SpecKeys.analyse("Net weight").clusterKey, SpecKeys.analyse("Weight").clusterKey);
        assertEquals(SpecKeys.analyse("Dimensions").clusterKey, SpecKeys.analyse("Dimension").clusterKey);
    }
}
