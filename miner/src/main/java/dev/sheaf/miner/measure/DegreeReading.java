package dev.sheaf.miner.measure;

import java.util.Objects;

/**
 * One reading of a word as a degree form of a base word: {@code roomier} → ({@code roomy},
 * {@link Degree#COMPARATIVE}). Both words are lower-cased with {@link java.util.Locale#ROOT}.
 *
 * @param surface the word as looked up (lower-cased, typographic apostrophes folded to {@code '})
 * @param base    the base form to look up in a vocabulary; equal to {@code surface} for a
 *                {@link Degree#POSITIVE} reading
 * @param degree  the degree of {@code surface}
 * @param source  what the reading rests on
 */
public record DegreeReading(String surface, String base, Degree degree, Source source) {

    /** What a reading rests on, in the order {@link ComparativeMorphology} trusts them. */
    public enum Source {
        /** The caller's known terms list the surface word itself, or the rule-produced base. */
        KNOWN_TERM,
        /** WordNet's exception lists ({@code adj.exc}, then {@code adv.exc}). */
        EXCEPTION_LIST,
        /** A regular suffix rule whose base WordNet lists as an adjective. */
        RULE,
        /** A regular suffix rule accepted only because the word is followed by "than". */
        THAN_CONTEXT,
        /** No inflection recognised: the word read as it stands. */
        UNCHANGED
    }

    public DegreeReading {
        Objects.requireNonNull(surface, "surface");
        Objects.requireNonNull(base, "base");
        Objects.requireNonNull(degree, "degree");
        Objects.requireNonNull(source, "source");
        if (base.isEmpty() && !surface.isEmpty()) {
            throw new IllegalArgumentException("base of '" + surface + "' is empty; expected a word");
        }
        if (degree == Degree.POSITIVE && source != Source.EXCEPTION_LIST && !base.equals(surface)) {
            throw new IllegalArgumentException("a positive reading keeps the word as it stands; got '"
                    + surface + "' -> '" + base + "'");
        }
    }

    /** True for a comparative or superlative reading. */
    public boolean inflected() {
        return degree != Degree.POSITIVE;
    }
}
