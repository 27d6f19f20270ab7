package dev.sheaf.vocab;

/** SKOS mapping properties: links from a concept to a concept in another scheme. */
public enum MatchKind {
    EXACT("exactMatch"), CLOSE("closeMatch"), BROAD("broadMatch"), NARROW("narrowMatch"), RELATED("relatedMatch");

    private final String skosName;

    MatchKind(String skosName) {
        this.skosName = skosName;
    }

    /** The SKOS local name, also the word used in the vocabulary file ({@code exactMatch} ...). */
    public String skosName() {
        return skosName;
    }

    /** The kind for a SKOS local name; throws naming the accepted words. */
    public static MatchKind ofSkosName(String name) {
        for (MatchKind k : values()) {
            if (k.skosName.equals(name)) {
                return k;
            }
        }
        throw new IllegalArgumentException("mapping kind \"" + name
                + "\" is not one of exactMatch, closeMatch, broadMatch, narrowMatch, relatedMatch");
    }
}
