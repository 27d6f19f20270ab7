package dev.sheaf.miner.mine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class CValueTest {
    @Test
    void cValueOfANestedTermFollowsTheFormula() {
        // Frantzi, Ananiadou & Mima 2000, Int. J. Digital Libraries 3(2) [mem]; the numbers are constructed:
        // "fill down" occurs 30 times, inside "800 fill down" (12) and "650 fill down" (6), so
        // C-value = log2(2) * (30 - (12 + 6) / 2) = 21.
        assertEquals(21.0, CValue.cValue(2, 30, 18, 2), 1e-12);
        // not nested: log2|a| * f(a); a trigram of frequency 12: log2(3) * 12
        assertEquals(Math.log(3) / Math.log(2) * 12, CValue.cValue(3, 12, 0, 0), 1e-12);
    }

    @Test
    void termhoodGivesWayToTheLongerPhraseThatExplainsEveryOccurrence() {
        // constructed: "ripstop" 40 times, always inside "ripstop nylon" (40): nothing left of its own
        assertEquals(0.0, CValue.termhood(1, 40, 40));
        // "waterproof" 100 times, its most frequent extension "waterproof jacket" 30: weight 1 * 70
        assertEquals(70.0, CValue.termhood(1, 100, 30));
        // a pair with no extension: log2(3) * f
        assertEquals(Math.log(3) / Math.log(2) * 25, CValue.termhood(2, 25, 0), 1e-12);
    }

    @Test
    void impossibleInputsAreProgrammingErrors() {
        assertThrows(IllegalArgumentException.class, () -> CValue.cValue(1, 5, 0, 0));
        assertThrows(IllegalArgumentException.class, () -> CValue.termhood(2, 5, 6));
    }
}
