package dev.sheaf.vocab.skos;

import org.eclipse.rdf4j.model.IRI;
import org.eclipse.rdf4j.model.ValueFactory;
import org.eclipse.rdf4j.model.impl.SimpleValueFactory;

/** Terms of Sheaf's namespace for what SKOS has no property for (documented in docs/vocab-format.md). */
final class SheafNs {
    static final String NS = "https://sheaf.dev/ns#";
    static final String PREFIX = "sheaf";
    private static final ValueFactory VF = SimpleValueFactory.getInstance();

    static final IRI FACET = iri("Facet");
    static final IRI VALUE_KIND = iri("valueKind");
    static final IRI MULTI_VALUED = iri("multiValued");
    static final IRI REGULATED_CLAIM = iri("regulatedClaim");
    static final IRI CATEGORY = iri("category");
    static final IRI UNIT = iri("unit");
    static final IRI BUCKET = iri("bucket");
    static final IRI BUCKET_LABEL = iri("bucketLabel");
    static final IRI MIN = iri("min");
    static final IRI MAX = iri("max");
    static final IRI HARVEST_TERM = iri("harvestTerm");
    static final IRI SPLIT_FROM = iri("splitFrom");
    static final IRI RETIRED_CONCEPT = iri("RetiredConcept");
    static final IRI FORMER_LABEL = iri("formerLabel");
    static final IRI DEFAULT_LANGUAGE = iri("defaultLanguage");
    static final IRI BASE_IRI = iri("baseIri");
    static final IRI DECISION = iri("decision");
    static final IRI CANDIDATE_DECISION = iri("CandidateDecision");
    static final IRI TERM = iri("term");
    static final IRI OUTCOME = iri("outcome");
    static final IRI KEPT_AS = iri("keptAs");
    static final IRI REASON = iri("reason");

    private SheafNs() {
    }

    private static IRI iri(String local) {
        return VF.createIRI(NS, local);
    }
}
