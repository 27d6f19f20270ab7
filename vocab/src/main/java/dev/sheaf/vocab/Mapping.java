package dev.sheaf.vocab;

import java.net.URI;
import java.net.URISyntaxException;
import java.util.Comparator;
import java.util.Objects;

/**
 * A mapping to a concept in another scheme (SKOS mapping properties), e.g. an exact match in a
 * marketplace's attribute list.
 *
 * @param kind which SKOS mapping property
 * @param iri the absolute IRI of the other concept
 */
public record Mapping(MatchKind kind, String iri) implements Comparable<Mapping> {
    private static final Comparator<Mapping> ORDER = Comparator.comparing(Mapping::kind).thenComparing(Mapping::iri);

    public Mapping {
        Objects.requireNonNull(kind, "kind");
        iri = checkIri(iri, "mapping target");
    }

    static String checkIri(String iri, String what) {
        Objects.requireNonNull(iri, what);
        try {
            URI u = new URI(iri);
            if (!u.isAbsolute()) {
                throw new IllegalArgumentException(what + " \"" + iri + "\" is not an absolute IRI (expected e.g. https://example.org/x)");
            }
        } catch (URISyntaxException e) {
            throw new IllegalArgumentException(what + " \"" + iri + "\" is not an IRI: " + e.getReason(), e);
        }
        return iri;
    }

    @Override
    public int compareTo(Mapping o) {
        return ORDER.compare(this, o);
    }
}
