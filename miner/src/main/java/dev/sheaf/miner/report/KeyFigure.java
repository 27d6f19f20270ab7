package dev.sheaf.miner.report;

import java.util.Objects;

/**
 * One tile of the summary: a short label, the figure as shown, and a line that says what it counts.
 *
 * @param label what the figure is ("Listings", "Attributes contested")
 * @param value the figure as shown; use the factories to format numbers the report's way
 * @param note  one short line of context ("read from 6 sources"), or empty
 */
public record KeyFigure(String label, String value, String note) {
    public KeyFigure {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(value, "value");
        Objects.requireNonNull(note, "note");
        if (label.isBlank() || value.isBlank()) {
            throw new IllegalArgumentException("a key figure needs a label and a value, got label '" + label
                    + "' and value '" + value + "'");
        }
    }

    /** A count, shown with thousands separators. */
    public static KeyFigure count(String label, long count, String note) {
        return new KeyFigure(label, Numbers.count(count), note);
    }

    /** A share in [0, 1], shown as a percent. */
    public static KeyFigure share(String label, double share, String note) {
        return new KeyFigure(label, Numbers.format(share, ValueKind.SHARE), note);
    }

    /** A coefficient, shown with three decimals. */
    public static KeyFigure coefficient(String label, double value, String note) {
        return new KeyFigure(label, Numbers.format(value, ValueKind.COEFFICIENT), note);
    }

    /** "part of whole", e.g. "3 of 12". */
    public static KeyFigure ofTotal(String label, long part, long whole, String note) {
        if (part < 0 || part > whole) {
            throw new IllegalArgumentException("need 0 <= part <= whole, got " + part + " of " + whole);
        }
        return new KeyFigure(label, Numbers.count(part) + " of " + Numbers.count(whole), note);
    }
}
