package dev.sheaf.miner.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Locale;
import org.junit.jupiter.api.Test;

class NumbersTest {

    @Test
    void sharesAreWholePercentsThatNeverRoundAwayTheirOwnExtremes() {
        assertEquals("42%", Numbers.percent(0.4231));
        assertEquals("0%", Numbers.percent(0));
        assertEquals("<1%", Numbers.percent(0.004));
        assertEquals(">99%", Numbers.percent(0.996));
        assertEquals("100%", Numbers.percent(1));
        assertEquals("1%", Numbers.percent(0.005));
    }

    @Test
    void coefficientsHaveThreeDecimalsAndATrueMinusSign() {
        assertEquals("0.667", Numbers.coefficient(0.6667));
        assertEquals("\u22120.120", Numbers.coefficient(-0.12));
        assertEquals("0.000", Numbers.coefficient(-0.0001));
    }

    @Test
    void countsGroupThousandsTheSameWayInAnyDefaultLocale() {
        Locale before = Locale.getDefault();
        try {
            for (Locale l : new Locale[] {Locale.GERMANY, new Locale("tr", "TR"), new Locale("fr", "FR")}) {
                Locale.setDefault(l);
                assertEquals("1,240", Numbers.count(1240));
                assertEquals("0.500", Numbers.coefficient(0.5));
                assertEquals("50%", Numbers.percent(0.5));
            }
        } finally {
            Locale.setDefault(before);
        }
    }

    @Test
    void notAvailableIsSaidInWords() {
        assertEquals("n/a", Numbers.format(Double.NaN, ValueKind.SHARE));
        assertEquals("", Numbers.sortKey(Double.NaN));
        assertEquals("0.25", Numbers.sortKey(0.25));
    }

    @Test
    void textIsNotANumberKind() {
        assertThrows(IllegalArgumentException.class, () -> Numbers.format(1, ValueKind.TEXT));
    }
}
