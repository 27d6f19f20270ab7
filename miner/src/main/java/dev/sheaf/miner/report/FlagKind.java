package dev.sheaf.miner.report;

import java.util.Locale;

/** The five ways an attribute can be unfit to ship (DESIGN.md, "flags"). */
public enum FlagKind {
    /** Hedged, gradable or ungrounded in the listings it describes. */
    VAGUE("used with hedges, as a matter of degree, or without grounding in the listings"),
    /** People disagree when applying it. */
    CONTESTED("people disagree when applying it"),
    /** Covers too few of the listings it applies to. */
    THIN("too few of the listings it applies to carry it"),
    /** Labels largely the same listings as another attribute. */
    OVERLAPPING("labels largely the same listings as another attribute"),
    /** One label, several meanings. */
    AMBIGUOUS("one label is used with more than one meaning");

    private final String meaning;

    FlagKind(String meaning) {
        this.meaning = meaning;
    }

    /** The kind as printed: lower case. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** One clause saying what the flag means. */
    public String meaning() {
        return meaning;
    }
}
