package dev.sheaf.miner.measure;

/** The kinds of cue word {@link MentionCues} reports beside a mention. */
public enum CueKind {
    /** A comparative or superlative word form; {@link Cue#normal()} is its base ("roomier" → "roomy"). */
    DEGREE_FORM,
    /** "more", "most". */
    MORE,
    /** "less", "least", "fewer", "fewest". */
    LESS,
    /** "as" of "as X as" / "not as X". */
    EQUATIVE,
    /** "than". */
    THAN,
    /** "too", "too much", "overly". */
    EXCESS,
    /** "enough". */
    SUFFICIENCY,
    /** "not", "never", "doesn't". */
    NEGATION,
    /** "no", "without", "lacks", "missing", "-free". */
    ABSENCE,
    /** "with", "has", "comes with", "includes". */
    PRESENCE,
    /** A word from the hedge list ("a bit", "kind of", "I think") or the suffix "-ish". */
    HEDGE
}
