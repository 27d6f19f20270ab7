package dev.sheaf.samples;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;

/** The ground truth of one product: an immutable map from {@link Trait} to a value of the trait's kind. */
final class Facts {
    private final Map<Trait, Object> values;

    private Facts(EnumMap<Trait, Object> values) {
        this.values = Collections.unmodifiableMap(values);
    }

    boolean has(Trait t) {
        return values.containsKey(t);
    }

    double number(Trait t) {
        Object v = values.get(t);
        if (!(v instanceof Double)) {
            throw new IllegalStateException("no number for " + t + " (have " + values.keySet() + ")");
        }
        return (Double) v;
    }

    /** The flag's value; an absent flag is false (the product simply does not have it). */
    boolean flag(Trait t) {
        return Boolean.TRUE.equals(values.get(t));
    }

    String term(Trait t) {
        Object v = values.get(t);
        return v instanceof String ? (String) v : null;
    }

    Map<Trait, Object> asMap() {
        return values;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Facts && ((Facts) o).values.equals(values);
    }

    @Override
    public int hashCode() {
        return values.hashCode();
    }

    @Override
    public String toString() {
        return "Facts" + values;
    }

    /** A builder holding a copy of these facts, to derive a variant. */
    Builder toBuilder() {
        Builder b = new Builder();
        b.values.putAll(values);
        return b;
    }

    static Builder builder() {
        return new Builder();
    }

    static final class Builder {
        private final EnumMap<Trait, Object> values = new EnumMap<>(Trait.class);

        Builder number(Trait t, double v) {
            check(t, Trait.Kind.NUMBER);
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(t + " must be finite, got " + v);
            }
            values.put(t, v);
            return this;
        }

        Builder flag(Trait t, boolean v) {
            check(t, Trait.Kind.FLAG);
            values.put(t, v);
            return this;
        }

        Builder term(Trait t, String v) {
            check(t, Trait.Kind.TERM);
            if (v == null || v.isBlank()) {
                throw new IllegalArgumentException(t + " needs a non-blank term");
            }
            values.put(t, v);
            return this;
        }

        boolean flagged(Trait t) {
            return Boolean.TRUE.equals(values.get(t));
        }

        Object get(Trait t) {
            return values.get(t);
        }

        private static void check(Trait t, Trait.Kind k) {
            if (t.kind != k) {
                throw new IllegalArgumentException(t + " is a " + t.kind + ", not a " + k);
            }
        }

        Facts build() {
            return new Facts(new EnumMap<>(values));
        }
    }
}
