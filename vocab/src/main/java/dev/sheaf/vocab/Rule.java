package dev.sheaf.vocab;

/**
 * The rules {@link VocabularyChecker} applies, each with our id, the standard it comes from and
 * its usual severity. SKOS integrity conditions are numbered as in the W3C SKOS Reference,
 * Recommendation 18 August 2009; thesaurus practice follows ANSI/NISO Z39.19-2005 and
 * ISO 25964-1:2011 (cited without section numbers, which are from memory).
 */
public enum Rule {
    LABEL_KINDS_OVERLAP("label-kinds-overlap", "W3C SKOS Reference (2009), integrity condition S13: "
            + "skos:prefLabel, skos:altLabel and skos:hiddenLabel are pairwise disjoint", Severity.ERROR),
    TWO_PREFERRED_LABELS("two-preferred-labels", "W3C SKOS Reference (2009), integrity condition S14: "
            + "a resource has no more than one skos:prefLabel per language tag", Severity.ERROR),
    RELATED_TO_ANCESTOR("related-to-ancestor", "W3C SKOS Reference (2009), integrity condition S27: "
            + "skos:related is disjoint with skos:broaderTransitive", Severity.ERROR),
    EXACT_MATCH_CONFLICT("exact-match-conflict", "W3C SKOS Reference (2009), integrity condition S46: "
            + "skos:exactMatch is disjoint with skos:broadMatch and skos:relatedMatch", Severity.ERROR),
    SCHEME_IS_CONCEPT("scheme-is-concept", "W3C SKOS Reference (2009), integrity condition S9: "
            + "skos:ConceptScheme is disjoint with skos:Concept", Severity.ERROR),
    COLLECTION_IS_CONCEPT("collection-is-concept", "W3C SKOS Reference (2009), integrity condition S37: "
            + "skos:Collection is disjoint with skos:Concept and skos:ConceptScheme", Severity.ERROR),
    RELATED_ONE_WAY("related-one-way", "W3C SKOS Reference (2009): skos:related is a symmetric property; "
            + "ANSI/NISO Z39.19-2005: related-term links are reciprocal", Severity.WARNING),
    PREFERRED_LABEL_SHARED("preferred-label-shared", "ANSI/NISO Z39.19-2005 and ISO 25964-1:2011: "
            + "a preferred term names one concept; homographs take a qualifier", Severity.ERROR),
    AMBIGUOUS_LABEL("ambiguous-label", "ANSI/NISO Z39.19-2005 and ISO 25964-1:2011: "
            + "each non-preferred term points to exactly one preferred term", Severity.ERROR),
    NO_PREFERRED_LABEL("no-preferred-label", "ANSI/NISO Z39.19-2005 and ISO 25964-1:2011: "
            + "every concept has one preferred term", Severity.ERROR),
    BROADER_CYCLE("broader-cycle", "ANSI/NISO Z39.19-2005 and ISO 25964-1:2011: no circular hierarchy "
            + "(SKOS itself allows broader cycles, so this is a warning)", Severity.WARNING),
    ORPHAN("orphan", "ANSI/NISO Z39.19-2005: every term has a place in the hierarchy "
            + "(here: under a facet)", Severity.WARNING),
    FACET_SINGLE_VALUE("facet-single-value", "ISO 25964-1:2011 facet analysis: a facet divides its "
            + "values; one value divides nothing", Severity.WARNING),
    NEAR_DUPLICATE_LABELS("near-duplicate-labels", "ANSI/NISO Z39.19-2005 and ISO 25964-1:2011: "
            + "variant forms (case, punctuation, spacing, singular/plural) lead to one preferred term", Severity.WARNING),
    SINGULAR_PLURAL("singular-plural", "ANSI/NISO Z39.19-2005, grammatical form of terms: count nouns "
            + "in the plural, mass nouns and properties in the singular", Severity.INFO),
    SEVERAL_FACETS("several-facets", "Sheaf practice: a value belongs to one facet, so a shop filter "
            + "shows it once", Severity.WARNING),
    DANGLING_REFERENCE("dangling-reference", "Sheaf vocabulary format: every id a concept, decision or "
            + "retired id names exists", Severity.ERROR),
    REFERS_TO_MERGED("refers-to-merged", "Sheaf vocabulary format: references name live concepts; "
            + "merged ids are kept only so old label files resolve", Severity.WARNING),
    REGULATED_CLAIM("regulated-claim", "Sheaf cautions: regulated and safety claims (waterproof ratings, "
            + "flame resistance, UV protection, child safety, fibre content) need compliance review", Severity.INFO),
    IMPORT_NOTE("import-note", "Sheaf SKOS import: what the vocabulary model cannot carry", Severity.INFO),
    UNREADABLE("unreadable-file", "Sheaf vocabulary format (docs/vocab-format.md), W3C Turtle / RDF/XML",
            Severity.ERROR);

    private final String id;
    private final String standard;
    private final Severity severity;

    Rule(String id, String standard, Severity severity) {
        this.id = id;
        this.standard = standard;
        this.severity = severity;
    }

    /** Our id, stable across versions (shown in output, usable in suppress lists). */
    public String id() {
        return id;
    }

    /** The standard (and condition) the rule comes from. */
    public String standard() {
        return standard;
    }

    /** The usual severity (a few rules choose per finding, e.g. a shared preferred label across facets is a warning). */
    public Severity severity() {
        return severity;
    }
}
