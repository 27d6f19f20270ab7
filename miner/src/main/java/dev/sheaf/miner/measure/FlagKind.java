package dev.sheaf.miner.measure;

import java.util.Locale;

/** What can be wrong with an attribute before it ships. */
public enum FlagKind {
    /** People disagree when applying it: low Krippendorff's alpha, or low direction agreement in feedback. */
    CONTESTED,
    /** People use it loosely: hedged, only comparatively, or in ways the catalog does not bear out. */
    VAGUE,
    /** Few listings carry a value where it applies (low fill rate). */
    THIN,
    /** It labels nearly the same listings as another concept (high Jaccard similarity). */
    OVERLAPPING,
    /** One label, several concepts: a label shared in the vocabulary, or mentions that resolve to several concepts. */
    AMBIGUOUS,
    /** A regulated or safety claim: needs compliance review before it ships. */
    CLAIM;

    /** Lower-case name, as in files. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }
}
