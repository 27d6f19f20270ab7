package dev.sheaf.vocab;

/** The three SKOS label kinds. */
public enum LabelKind {
    /** skos:prefLabel: the one label shown, at most one per language. */
    PREFERRED("prefLabel", "preferred"),
    /** skos:altLabel: a synonym or variant that is matched and may be shown. */
    ALTERNATIVE("altLabel", "alternative"),
    /** skos:hiddenLabel: a misspelling or variant that is matched but never shown. */
    HIDDEN("hiddenLabel", "hidden");

    private final String skosName;
    private final String word;

    LabelKind(String skosName, String word) {
        this.skosName = skosName;
        this.word = word;
    }

    /** The SKOS local name (prefLabel, altLabel, hiddenLabel), also used in the vocabulary file. */
    public String skosName() {
        return skosName;
    }

    /** The plain word for messages. */
    public String word() {
        return word;
    }
}
