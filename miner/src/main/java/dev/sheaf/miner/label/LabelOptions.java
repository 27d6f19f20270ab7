package dev.sheaf.miner.label;

import java.util.Arrays;
import java.util.Collection;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;

/**
 * How the labeler decides polarity and reads numbers: an immutable, validated configuration with
 * named presets. The rules themselves are in docs/decisions/101-negation-scope.md and
 * 102-numeric-facets.md.
 *
 * <p>Settings and their defaults (preset {@code default}):
 * <ul>
 *   <li>{@code negation} — {@code true}: look for negation cues at all ({@code literal} turns it off).</li>
 *   <li>{@code negationWindow} — 3: at most this many tokens between a negation word (the analysis
 *       profile's negation words) and the start of the match, inside one clause.</li>
 *   <li>{@code scopeBreakers} — {@link #DEFAULT_SCOPE_BREAKERS}: words that end a negation's scope
 *       before the match ("no hood <b>but</b> a high collar").</li>
 *   <li>{@code cueExceptions} — {@link #DEFAULT_CUE_EXCEPTIONS}: a negation word directly followed by
 *       one of these is no negation ("not only waterproof but ...").</li>
 *   <li>{@code affixNegation} — {@code true}: "-free" or " free" and "-less" right after a match
 *       ("PFC-free", "hood-less") and "non-"/"non " right before it ("non-insulated") negate it.</li>
 *   <li>{@code quantityWindow} — 4: at most this many words between a number facet's label and a
 *       quantity in running text ("weight approx. 1.2 kg").</li>
 *   <li>{@code quantityByDimension} — {@code true}: a quantity with no facet label before it still
 *       goes to the number facet when that facet is the only one measuring its dimension
 *       ("weighs 1.2 kg" → weight).</li>
 *   <li>{@code sameValueTolerance} — 0.005: two numbers of one facet within this relative difference
 *       are one value ("1.19 kg" and "2 lb 10 oz"), not a conflict.</li>
 * </ul>
 * Words are compared after the analysis profile's normalisation (lower case, folding).
 */
public final class LabelOptions {
    /** Words that close a negation's scope [practice]. */
    public static final SortedSet<String> DEFAULT_SCOPE_BREAKERS = Collections.unmodifiableSortedSet(new TreeSet<>(List.of(
            "but", "and", "yet", "although", "though", "however", "except", "whereas", "while", "unlike", "instead",
            "plus", "with")));
    /** Words that, right after a negation word, cancel it ("not only", "not just") [practice]. */
    public static final SortedSet<String> DEFAULT_CUE_EXCEPTIONS = Collections.unmodifiableSortedSet(new TreeSet<>(List.of(
            "only", "just", "merely", "simply", "matter", "doubt")));

    private static final List<String> KEYS = List.of("negation", "negationWindow", "scopeBreakers", "cueExceptions",
            "affixNegation", "quantityWindow", "quantityByDimension", "sameValueTolerance");

    private static final Map<String, LabelOptions> PRESETS;

    static {
        Map<String, LabelOptions> p = new LinkedHashMap<>();
        p.put("default", builder().build());
        p.put("literal", builder().negation(false).build());
        PRESETS = Collections.unmodifiableMap(p);
    }

    private final boolean negation;
    private final int negationWindow;
    private final SortedSet<String> scopeBreakers;
    private final SortedSet<String> cueExceptions;
    private final boolean affixNegation;
    private final int quantityWindow;
    private final boolean quantityByDimension;
    private final double sameValueTolerance;

    private LabelOptions(Builder b) {
        this.negation = b.negation;
        this.negationWindow = b.negationWindow;
        this.scopeBreakers = Collections.unmodifiableSortedSet(new TreeSet<>(b.scopeBreakers));
        this.cueExceptions = Collections.unmodifiableSortedSet(new TreeSet<>(b.cueExceptions));
        this.affixNegation = b.affixNegation;
        this.quantityWindow = b.quantityWindow;
        this.quantityByDimension = b.quantityByDimension;
        this.sameValueTolerance = b.sameValueTolerance;
    }

    public static LabelOptions defaults() {
        return PRESETS.get("default");
    }

    /** The preset names: {@code default} and {@code literal} (no negation detection: every match is stated). */
    public static Set<String> presetNames() {
        return PRESETS.keySet();
    }

    public static LabelOptions preset(String name) {
        LabelOptions o = PRESETS.get(name);
        if (o == null) {
            throw new IllegalArgumentException("unknown label options preset '" + name + "'; the presets are "
                    + String.join(", ", PRESETS.keySet()));
        }
        return o;
    }

    /**
     * Settings from text key/value pairs (a command line's {@code --option key=value}), over a
     * preset. Unknown keys are rejected by name; lists are comma-separated.
     */
    public static LabelOptions fromMap(LabelOptions base, Map<String, String> settings) {
        Builder b = base.toBuilder();
        for (Map.Entry<String, String> e : settings.entrySet()) {
            String k = e.getKey();
            String v = e.getValue() == null ? "" : e.getValue().trim();
            switch (k) {
                case "negation" -> b.negation(bool(k, v));
                case "negationWindow" -> b.negationWindow(integer(k, v));
                case "scopeBreakers" -> b.scopeBreakers(words(v));
                case "cueExceptions" -> b.cueExceptions(words(v));
                case "affixNegation" -> b.affixNegation(bool(k, v));
                case "quantityWindow" -> b.quantityWindow(integer(k, v));
                case "quantityByDimension" -> b.quantityByDimension(bool(k, v));
                case "sameValueTolerance" -> b.sameValueTolerance(number(k, v));
                default -> throw new IllegalArgumentException("\"" + k + "\" is not a label option; the options are "
                        + String.join(", ", KEYS) + " — remove it or correct its spelling");
            }
        }
        return b.build();
    }

    private static boolean bool(String k, String v) {
        if (v.equals("true") || v.equals("false")) {
            return Boolean.parseBoolean(v);
        }
        throw new IllegalArgumentException("label option " + k + " must be true or false, found \"" + v + "\"");
    }

    private static int integer(String k, String v) {
        try {
            return Integer.parseInt(v);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("label option " + k + " must be a whole number, found \"" + v + "\"", e);
        }
    }

    private static double number(String k, String v) {
        try {
            return Double.parseDouble(v);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("label option " + k + " must be a number such as 0.005, found \"" + v + "\"", e);
        }
    }

    private static List<String> words(String v) {
        return v.isEmpty() ? List.of() : Arrays.asList(v.split("\\s*,\\s*"));
    }

    public boolean negation() {
        return negation;
    }

    public int negationWindow() {
        return negationWindow;
    }

    public SortedSet<String> scopeBreakers() {
        return scopeBreakers;
    }

    public SortedSet<String> cueExceptions() {
        return cueExceptions;
    }

    public boolean affixNegation() {
        return affixNegation;
    }

    public int quantityWindow() {
        return quantityWindow;
    }

    public boolean quantityByDimension() {
        return quantityByDimension;
    }

    public double sameValueTolerance() {
        return sameValueTolerance;
    }

    /** The settings as text, in a stable order (for summaries). */
    public Map<String, String> toMap() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("negation", Boolean.toString(negation));
        m.put("negationWindow", Integer.toString(negationWindow));
        m.put("scopeBreakers", String.join(",", scopeBreakers));
        m.put("cueExceptions", String.join(",", cueExceptions));
        m.put("affixNegation", Boolean.toString(affixNegation));
        m.put("quantityWindow", Integer.toString(quantityWindow));
        m.put("quantityByDimension", Boolean.toString(quantityByDimension));
        m.put("sameValueTolerance", Double.toString(sameValueTolerance));
        return m;
    }

    public Builder toBuilder() {
        return builder().negation(negation).negationWindow(negationWindow).scopeBreakers(scopeBreakers)
                .cueExceptions(cueExceptions).affixNegation(affixNegation).quantityWindow(quantityWindow)
                .quantityByDimension(quantityByDimension).sameValueTolerance(sameValueTolerance);
    }

    public static Builder builder() {
        return new Builder();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof LabelOptions && toMap().equals(((LabelOptions) o).toMap());
    }

    @Override
    public int hashCode() {
        return toMap().hashCode();
    }

    @Override
    public String toString() {
        return "LabelOptions" + toMap();
    }

    /** Mutable builder; {@link #build()} validates every setting in one place. */
    public static final class Builder {
        private boolean negation = true;
        private int negationWindow = 3;
        private SortedSet<String> scopeBreakers = new TreeSet<>(DEFAULT_SCOPE_BREAKERS);
        private SortedSet<String> cueExceptions = new TreeSet<>(DEFAULT_CUE_EXCEPTIONS);
        private boolean affixNegation = true;
        private int quantityWindow = 4;
        private boolean quantityByDimension = true;
        private double sameValueTolerance = 0.005;

        private Builder() {
        }

        public Builder negation(boolean v) {
            negation = v;
            return this;
        }

        public Builder negationWindow(int v) {
            negationWindow = v;
            return this;
        }

        public Builder scopeBreakers(Collection<String> v) {
            scopeBreakers = new TreeSet<>(v);
            return this;
        }

        public Builder cueExceptions(Collection<String> v) {
            cueExceptions = new TreeSet<>(v);
            return this;
        }

        public Builder affixNegation(boolean v) {
            affixNegation = v;
            return this;
        }

        public Builder quantityWindow(int v) {
            quantityWindow = v;
            return this;
        }

        public Builder quantityByDimension(boolean v) {
            quantityByDimension = v;
            return this;
        }

        public Builder sameValueTolerance(double v) {
            sameValueTolerance = v;
            return this;
        }

        /** Validates; {@link IllegalArgumentException} states the rule, the value and the fix. */
        public LabelOptions build() {
            if (negationWindow < 0 || negationWindow > 10) {
                throw new IllegalArgumentException("negationWindow must be from 0 to 10 tokens, found " + negationWindow
                        + "; 3 covers \"no removable hood\" and \"without any insulation\"");
            }
            if (quantityWindow < 0 || quantityWindow > 10) {
                throw new IllegalArgumentException("quantityWindow must be from 0 to 10 words, found " + quantityWindow);
            }
            if (!(sameValueTolerance >= 0 && sameValueTolerance < 0.5)) {
                throw new IllegalArgumentException("sameValueTolerance must be a relative difference from 0 to below 0.5, found "
                        + sameValueTolerance);
            }
            scopeBreakers = clean(scopeBreakers, "scopeBreakers");
            cueExceptions = clean(cueExceptions, "cueExceptions");
            return new LabelOptions(this);
        }

        private static SortedSet<String> clean(Collection<String> words, String key) {
            SortedSet<String> out = new TreeSet<>();
            for (String w : words) {
                if (w == null || w.isBlank() || w.strip().contains(" ")) {
                    throw new IllegalArgumentException(key + " must hold single words, found \"" + w + "\"");
                }
                out.add(w.strip().toLowerCase(Locale.ROOT));
            }
            return out;
        }
    }
}
