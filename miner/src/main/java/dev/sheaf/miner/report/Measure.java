package dev.sheaf.miner.report;

import java.util.List;
import java.util.Objects;

/**
 * One figure on an attribute card, e.g. fill rate 72% with basis "180 of 250 tents".
 *
 * @param name  the figure's name
 * @param value the figure; NaN shows as "n/a"
 * @param scale how it is shown (not {@link ValueKind#TEXT})
 * @param basis what it was computed from or its interval ("95% CI 0.52–0.81"), or empty
 */
public record Measure(String name, double value, ValueKind scale, String basis) {
    public Measure {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(scale, "scale");
        Objects.requireNonNull(basis, "basis");
        if (name.isBlank()) {
            throw new IllegalArgumentException("a measure needs a name");
        }
        if (scale == ValueKind.TEXT) {
            throw new IllegalArgumentException("measure '" + name + "' is a number; use COUNT, SHARE or COEFFICIENT");
        }
    }

    /**
     * Krippendorff's alpha of an attribute, with its interval, item count and verdict as the basis:
     * "95% interval 0.114 to 0.700 · 14 items · contested".
     */
    public static Measure alpha(dev.sheaf.miner.measure.AgreementAttribute a) {
        List<String> basis = new java.util.ArrayList<>();
        var ci = a.alphaInterval();
        if (ci.defined()) {
            basis.add(Numbers.percent(ci.level()) + " interval " + Numbers.coefficient(ci.low()) + " to "
                    + Numbers.coefficient(ci.high()));
        }
        basis.add(Numbers.count(a.items()) + (a.items() == 1 ? " item" : " items"));
        basis.add(a.alpha().defined() ? a.verdict().label() : a.alpha().undefinedReason());
        return new Measure("Krippendorff's alpha", a.alpha().alpha(), ValueKind.COEFFICIENT, String.join(" \u00b7 ", basis));
    }

    /** The value as shown. */
    public String shown() {
        return Numbers.format(value, scale);
    }
}
