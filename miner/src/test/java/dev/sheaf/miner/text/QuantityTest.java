package dev.sheaf.miner.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The Quantity record refuses values that cannot describe text. */
class QuantityTest {

    @Test
    void theContractConstructorMakesASingleExactValue() {
        Quantity q = new Quantity(1.2, Dimension.MASS, "kg", 1.2, 3, 9, "1.2 kg");
        assertEquals(1.2, q.valueMax(), 0.0);
        assertEquals(1.2, q.siMax(), 0.0);
        assertFalse(q.isRange());
        assertFalse(q.approximate());
    }

    @Test
    void aSurfaceMustFillItsSpan() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Quantity(1.2, Dimension.MASS, "kg", 1.2, 3, 8, "1.2 kg"));
        assertTrue(e.getMessage().contains("3..8"), e.getMessage());
    }

    @Test
    void aSpanMustStartAtZeroOrLaterAndNotRunBackwards() {
        assertThrows(IllegalArgumentException.class, () -> new Quantity(1, Dimension.MASS, "kg", 1, -1, 3, "1kg!"));
        assertThrows(IllegalArgumentException.class, () -> new Quantity(1, Dimension.MASS, "kg", 1, 5, 4, ""));
    }

    @Test
    void aRangeMustRunFromLowToHigh() {
        assertThrows(IllegalArgumentException.class,
                () -> new Quantity(25, Dimension.VOLUME, "L", 25, 0, 7, "25-20 L", 20, 20, false));
    }

    @Test
    void valuesMustBeFiniteAndTheUnitNamed() {
        assertThrows(IllegalArgumentException.class, () -> new Quantity(Double.NaN, Dimension.MASS, "kg", 1, 0, 1, "x"));
        assertThrows(IllegalArgumentException.class, () -> new Quantity(1, Dimension.MASS, " ", 1, 0, 1, "x"));
        assertThrows(NullPointerException.class, () -> new Quantity(1, null, "kg", 1, 0, 1, "x"));
    }
}
