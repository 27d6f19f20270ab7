package dev.sheaf.samples;

import java.util.Objects;

/**
 * One specification row as written in a listing: the key in the supplier's words and the value
 * with its unit; {@code kind} is the generator's own knowledge of which spec it is (the CSV export
 * writes it under {@link SpecKey#csv}).
 */
record Spec(SpecKey kind, String key, String value) {
    Spec {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(key, "key");
        Objects.requireNonNull(value, "value");
        if (key.isBlank() || value.isBlank()) {
            throw new IllegalArgumentException("spec key and value must not be blank: '" + key + "' = '" + value + "'");
        }
    }
}
