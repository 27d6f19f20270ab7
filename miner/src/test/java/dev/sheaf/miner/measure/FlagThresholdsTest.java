package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.junit.jupiter.api.Test;

class FlagThresholdsTest {

    @Test
    void defaultsCiteTheirSources() {
        FlagThresholds d = FlagThresholds.DEFAULTS;
        // Krippendorff 2004, Content Analysis 2nd ed. [mem]: tentative .667, reliable .800
        assertEquals(0.667, d.alphaContested());
        assertEquals(0.800, d.agreement().alphaReliable());
        // Landis & Koch 1977, Biometrics 33(1) [pub]: band edges
        assertEquals(0.20, d.agreement().kappaSlight());
        assertEquals(0.80, d.agreement().kappaSubstantial());
        for (String key : FlagThresholds.KEYS) {
            String source = FlagThresholds.SOURCES.get(key);
            assertTrue(source != null && !source.isBlank(), "no source for " + key);
        }
        assertTrue(FlagThresholds.SOURCES.get("alpha.tentative").contains("Krippendorff 2004"));
        assertTrue(FlagThresholds.SOURCES.get("kappa.fair").contains("Landis & Koch 1977"));
        for (String key : new String[] {"hedge.rate", "grounding.precision", "grounding.checkable", "fill.rate", "overlap.jaccard"}) {
            assertTrue(FlagThresholds.SOURCES.get(key).startsWith("[practice] "), key);
        }
    }

    @Test
    void overridesChangeOneEdgeAndLeaveTheRest() {
        FlagThresholds t = FlagThresholds.fromMap(Map.of("hedge.rate", 0.5, "alpha.tentative", 0.6, "mentions.min", 10));
        assertEquals(0.5, t.hedgeRate());
        assertEquals(0.6, t.alphaContested());
        assertEquals(10, t.minMentions());
        assertEquals(FlagThresholds.DEFAULTS.fillRate(), t.fillRate());
        assertEquals(FlagThresholds.DEFAULTS.agreement().kappaFair(), t.agreement().kappaFair());
        FlagThresholds u = FlagThresholds.DEFAULTS.with("fill.rate", 0.9);
        assertNotSame(FlagThresholds.DEFAULTS, u);
        assertEquals(0.5, FlagThresholds.DEFAULTS.fillRate(), "the defaults are immutable");
        assertEquals(0.9, u.asMap().get("fill.rate"));
        assertEquals(FlagThresholds.KEYS, new java.util.ArrayList<>(u.asMap().keySet()));
    }

    @Test
    void unknownKeysAreRejectedByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> FlagThresholds.fromMap(Map.of("hedge.rates", 0.5)));
        assertTrue(e.getMessage().contains("'hedge.rates'") && e.getMessage().contains("hedge.rate"), e.getMessage());
    }

    @Test
    void outOfRangeValuesAreRejectedWithTheRule() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> FlagThresholds.DEFAULTS.with("fill.rate", 1.5))
                .getMessage().contains("[0, 1]"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> FlagThresholds.DEFAULTS.with("mentions.min", 2.5))
                .getMessage().contains("whole number"));
        assertThrows(IllegalArgumentException.class, () -> FlagThresholds.DEFAULTS.with("alpha.tentative", 0.9),
                "tentative above reliable");
    }
}
