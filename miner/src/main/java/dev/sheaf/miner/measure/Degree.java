package dev.sheaf.miner.measure;

/** Grammatical degree of an adjective form: {@code light}, {@code lighter}, {@code lightest}. */
public enum Degree {
    /** The plain form ({@code light}), or a word that is not an inflected adjective at all. */
    POSITIVE,
    /** {@code lighter}, {@code better}. */
    COMPARATIVE,
    /** {@code lightest}, {@code best}. */
    SUPERLATIVE
}
