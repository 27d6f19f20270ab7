package dev.sheaf.miner.measure;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.Test;

class SurfaceFormsTest {

    @Test
    void uniformOverFourFormsIsTwoBits() {
        // H = -4 * (1/4) log2(1/4) = 2 bits [comp]
        SurfaceForms f = SurfaceForms.of(Map.of("lighter", 5, "lightest", 5, "light", 5, "lightish", 5));
        assertEquals(2.0, f.entropyBits(), 1e-15);
        assertEquals(4, f.distinct());
        assertEquals(20, f.total());
    }

    @Test
    void dyadicDistributionIsOneAndThreeQuarterBits() {
        // p = 1/2, 1/4, 1/8, 1/8: H = 1/2 + 2/4 + 3/8 + 3/8 = 1.75 bits [comp]
        SurfaceForms f = SurfaceForms.of(Map.of("a", 4, "b", 2, "c", 1, "d", 1));
        assertEquals(1.75, f.entropyBits(), 1e-15);
    }

    @Test
    void oneFormIsZeroBitsAndNoFormsToo() {
        assertEquals(0.0, SurfaceForms.of(Map.of("hood", 9)).entropyBits());
        assertEquals(0.0, SurfaceForms.of(Map.of()).entropyBits());
    }

    @Test
    void entropyIsBitIdenticalWhateverTheOrderOfTheCounts() {
        Map<String, Integer> a = new LinkedHashMap<>();
        Map<String, Integer> b = new TreeMap<>((x, y) -> y.compareTo(x));
        int[] counts = {7, 3, 11, 1, 5, 2};
        for (int i = 0; i < counts.length; i++) {
            a.put("f" + i, counts[i]);
            b.put("f" + i, counts[i]);
        }
        assertEquals(Double.doubleToLongBits(SurfaceForms.of(a).entropyBits()),
                Double.doubleToLongBits(SurfaceForms.of(b).entropyBits()));
    }

    @Test
    void formsAreMostFrequentFirstThenByForm() {
        SurfaceForms f = SurfaceForms.of(Map.of("roomy", 2, "roomier", 2, "spacious", 5));
        assertEquals(List.of("spacious", "roomier", "roomy"), f.forms().stream().map(SurfaceForms.Form::form).toList());
        assertEquals("spacious (5); roomier (2)", f.top(2));
    }

    @Test
    void aTotalThatIsNotTheSumIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> new SurfaceForms(List.of(new SurfaceForms.Form("a", 2)), 3, 0));
    }
}
