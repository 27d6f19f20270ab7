package dev.sheaf.miner.measure;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Thresholds of the coverage measures: an immutable, validated configuration with presets.
 *
 * <p>Settings and their defaults (preset {@code default}):
 * <ul>
 *   <li>{@code concentration} — 0.9: a concept is concentrated when at least this share of its
 *       listings comes from one source file, or from one category (categories only when its facet
 *       applies to more than one).</li>
 *   <li>{@code concentrationMinListings} — 5: concepts with fewer listings are too thin to judge.</li>
 *   <li>{@code overlapMinJaccard} — 0.5: pairs of concepts whose listing sets have at least this
 *       Jaccard similarity are reported.</li>
 *   <li>{@code overlapMinListings} — 3: and share at least this many listings.</li>
 *   <li>{@code gapTerms} — 50: how many of the commonest terms of unlabeled listings to report.</li>
 *   <li>{@code examples} — 5: example listing ids kept per conflict and for listings with nothing.</li>
 * </ul>
 * Preset {@code strict}: concentration 0.8, overlap Jaccard 0.3.
 */
public final class CoverageOptions {
    private static final List<String> KEYS = List.of("concentration", "concentrationMinListings", "overlapMinJaccard",
            "overlapMinListings", "gapTerms", "examples");
    private static final Map<String, CoverageOptions> PRESETS;

    static {
        Map<String, CoverageOptions> p = new LinkedHashMap<>();
        p.put("default", builder().build());
        p.put("strict", builder().concentration(0.8).overlapMinJaccard(0.3).build());
        PRESETS = Collections.unmodifiableMap(p);
    }

    private final double concentration;
    private final int concentrationMinListings;
    private final double overlapMinJaccard;
    private final int overlapMinListings;
    private final int gapTerms;
    private final int examples;

    private CoverageOptions(Builder b) {
        concentration = b.concentration;
        concentrationMinListings = b.concentrationMinListings;
        overlapMinJaccard = b.overlapMinJaccard;
        overlapMinListings = b.overlapMinListings;
        gapTerms = b.gapTerms;
        examples = b.examples;
    }

    public static CoverageOptions defaults() {
        return PRESETS.get("default");
    }

    public static Set<String> presetNames() {
        return PRESETS.keySet();
    }

    public static CoverageOptions preset(String name) {
        CoverageOptions o = PRESETS.get(name);
        if (o == null) {
            throw new IllegalArgumentException("unknown coverage preset '" + name + "'; the presets are " + String.join(", ", PRESETS.keySet()));
        }
        return o;
    }

    /** Settings from text key/value pairs over a base; unknown keys are rejected by name. */
    public static CoverageOptions fromMap(CoverageOptions base, Map<String, String> settings) {
        Builder b = base.toBuilder();
        for (Map.Entry<String, String> e : settings.entrySet()) {
            String k = e.getKey();
            String v = e.getValue() == null ? "" : e.getValue().strip();
            try {
                switch (k) {
                    case "concentration" -> b.concentration(Double.parseDouble(v));
                    case "concentrationMinListings" -> b.concentrationMinListings(Integer.parseInt(v));
                    case "overlapMinJaccard" -> b.overlapMinJaccard(Double.parseDouble(v));
                    case "overlapMinListings" -> b.overlapMinListings(Integer.parseInt(v));
                    case "gapTerms" -> b.gapTerms(Integer.parseInt(v));
                    case "examples" -> b.examples(Integer.parseInt(v));
                    default -> throw new IllegalArgumentException("\"" + k + "\" is not a coverage setting; the settings are "
                            + String.join(", ", KEYS) + " — remove it or correct its spelling");
                }
            } catch (NumberFormatException ex) {
                throw new IllegalArgumentException("coverage setting " + k + " must be a number, found \"" + v + "\"", ex);
            }
        }
        return b.build();
    }

    public double concentration() {
        return concentration;
    }

    public int concentrationMinListings() {
        return concentrationMinListings;
    }

    public double overlapMinJaccard() {
        return overlapMinJaccard;
    }

    public int overlapMinListings() {
        return overlapMinListings;
    }

    public int gapTerms() {
        return gapTerms;
    }

    public int examples() {
        return examples;
    }

    public Map<String, String> toMap() {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("concentration", Double.toString(concentration));
        m.put("concentrationMinListings", Integer.toString(concentrationMinListings));
        m.put("overlapMinJaccard", Double.toString(overlapMinJaccard));
        m.put("overlapMinListings", Integer.toString(overlapMinListings));
        m.put("gapTerms", Integer.toString(gapTerms));
        m.put("examples", Integer.toString(examples));
        return m;
    }

    public Builder toBuilder() {
        return builder().concentration(concentration).concentrationMinListings(concentrationMinListings)
                .overlapMinJaccard(overlapMinJaccard).overlapMinListings(overlapMinListings).gapTerms(gapTerms).examples(examples);
    }

    public static Builder builder() {
        return new Builder();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof CoverageOptions && toMap().equals(((CoverageOptions) o).toMap());
    }

    @Override
    public int hashCode() {
        return toMap().hashCode();
    }

    @Override
    public String toString() {
        return "CoverageOptions" + toMap();
    }

    /** Mutable builder; {@link #build()} validates in one place. */
    public static final class Builder {
        private double concentration = 0.9;
        private int concentrationMinListings = 5;
        private double overlapMinJaccard = 0.5;
        private int overlapMinListings = 3;
        private int gapTerms = 50;
        private int examples = 5;

        private Builder() {
        }

        public Builder concentration(double v) {
            concentration = v;
            return this;
        }

        public Builder concentrationMinListings(int v) {
            concentrationMinListings = v;
            return this;
        }

        public Builder overlapMinJaccard(double v) {
            overlapMinJaccard = v;
            return this;
        }

        public Builder overlapMinListings(int v) {
            overlapMinListings = v;
            return this;
        }

        public Builder gapTerms(int v) {
            gapTerms = v;
            return this;
        }

        public Builder examples(int v) {
            examples = v;
            return this;
        }

        public CoverageOptions build() {
            if (!(concentration > 0.5 && concentration <= 1)) {
                throw new IllegalArgumentException("concentration must be a share above 0.5 and at most 1, found " + concentration
                        + "; 0.9 flags concepts that come almost entirely from one file or category");
            }
            if (!(overlapMinJaccard > 0 && overlapMinJaccard <= 1)) {
                throw new IllegalArgumentException("overlapMinJaccard must be above 0 and at most 1, found " + overlapMinJaccard);
            }
            if (concentrationMinListings < 1 || overlapMinListings < 1) {
                throw new IllegalArgumentException("concentrationMinListings and overlapMinListings must be at least 1, found "
                        + concentrationMinListings + " and " + overlapMinListings);
            }
            if (gapTerms < 0 || examples < 0) {
                throw new IllegalArgumentException("gapTerms and examples must be 0 or more, found " + gapTerms + " and " + examples);
            }
            return new CoverageOptions(this);
        }
    }
}
