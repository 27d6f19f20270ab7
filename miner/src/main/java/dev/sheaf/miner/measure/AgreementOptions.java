package dev.sheaf.miner.measure;

import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;
import java.util.function.Function;

/**
 * How {@link AgreementAnalysis} runs. Immutable; start from {@link #DEFAULTS} or {@link #builder()}.
 *
 * @param seed              seed of the bootstrap; the same seed gives the same interval. Default 1
 * @param replicates        bootstrap replicates per attribute; 0 turns the interval off. Default 2000
 * @param confidence        level of the bootstrap interval, in (0, 1). Default 0.95
 * @param metrics           metric per (resolved) attribute, overriding the automatic choice; default none
 * @param ordinalMaxLevels  numeric values that are all integers with at most this many distinct values
 *                          are read as ordinal grades; other numbers as interval. Default 10
 * @param thresholds        verdict and band edges. Default {@link AgreementThresholds#DEFAULTS}
 * @param attributeResolver maps the attribute as written to the attribute key used for grouping
 *                          (e.g. a label to a concept id); null means "unknown attribute" and the
 *                          row becomes a problem. Default: identity (stripped)
 * @param pseudonyms        how annotator ids are shown. Default {@link Pseudonyms#ephemeral()}, a fresh key
 */
public record AgreementOptions(long seed, int replicates, double confidence, Map<String, AgreementMetric> metrics,
                               int ordinalMaxLevels, AgreementThresholds thresholds,
                               Function<String, String> attributeResolver, Pseudonyms pseudonyms) {

    /** Most replicates accepted: more does not narrow a percentile interval's Monte Carlo error usefully. */
    public static final int MAX_REPLICATES = 1_000_000;

    /** Default options, with an ephemeral pseudonym key. */
    public static final AgreementOptions DEFAULTS = builder().build();

    public AgreementOptions {
        if (replicates < 0 || replicates > MAX_REPLICATES) {
            throw new IllegalArgumentException("replicates must be between 0 (no interval) and " + MAX_REPLICATES
                    + ", got " + replicates);
        }
        if (!(confidence > 0 && confidence < 1)) {
            throw new IllegalArgumentException("confidence must lie strictly between 0 and 1 (e.g. 0.95), got " + confidence);
        }
        if (ordinalMaxLevels < 2) {
            throw new IllegalArgumentException("ordinalMaxLevels must be at least 2, got " + ordinalMaxLevels);
        }
        Objects.requireNonNull(thresholds, "thresholds");
        Objects.requireNonNull(attributeResolver, "attributeResolver");
        Objects.requireNonNull(pseudonyms, "pseudonyms");
        metrics = Map.copyOf(new TreeMap<>(Objects.requireNonNull(metrics, "metrics")));
    }

    /** A builder holding the defaults. */
    public static Builder builder() {
        return new Builder();
    }

    /** A builder holding these options. */
    public Builder toBuilder() {
        Builder b = new Builder();
        b.seed = seed;
        b.replicates = replicates;
        b.confidence = confidence;
        b.metrics = new TreeMap<>(metrics);
        b.ordinalMaxLevels = ordinalMaxLevels;
        b.thresholds = thresholds;
        b.attributeResolver = attributeResolver;
        b.pseudonyms = pseudonyms;
        return b;
    }

    /** Builds {@link AgreementOptions}; values are validated by {@link #build()}. */
    public static final class Builder {
        private long seed = 1;
        private int replicates = 2000;
        private double confidence = 0.95;
        private Map<String, AgreementMetric> metrics = new TreeMap<>();
        private int ordinalMaxLevels = 10;
        private AgreementThresholds thresholds = AgreementThresholds.DEFAULTS;
        private Function<String, String> attributeResolver = String::strip;
        private Pseudonyms pseudonyms;

        private Builder() {
        }

        public Builder seed(long seed) {
            this.seed = seed;
            return this;
        }

        public Builder replicates(int replicates) {
            this.replicates = replicates;
            return this;
        }

        public Builder confidence(double confidence) {
            this.confidence = confidence;
            return this;
        }

        /** Sets the metric of one attribute (the key after resolution). */
        public Builder metric(String attribute, AgreementMetric metric) {
            metrics.put(Objects.requireNonNull(attribute, "attribute"), Objects.requireNonNull(metric, "metric"));
            return this;
        }

        /** Replaces every per-attribute metric. */
        public Builder metrics(Map<String, AgreementMetric> metrics) {
            this.metrics = new TreeMap<>(metrics);
            return this;
        }

        public Builder ordinalMaxLevels(int levels) {
            this.ordinalMaxLevels = levels;
            return this;
        }

        public Builder thresholds(AgreementThresholds thresholds) {
            this.thresholds = thresholds;
            return this;
        }

        public Builder attributeResolver(Function<String, String> resolver) {
            this.attributeResolver = resolver;
            return this;
        }

        public Builder pseudonyms(Pseudonyms pseudonyms) {
            this.pseudonyms = pseudonyms;
            return this;
        }

        public AgreementOptions build() {
            return new AgreementOptions(seed, replicates, confidence, metrics, ordinalMaxLevels, thresholds,
                    attributeResolver, pseudonyms == null ? Pseudonyms.ephemeral() : pseudonyms);
        }
    }
}
