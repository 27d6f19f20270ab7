package dev.sheaf.vocab.skos;

import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Mapping;
import dev.sheaf.vocab.MatchKind;
import dev.sheaf.vocab.Provenance;
import dev.sheaf.vocab.Retired;
import dev.sheaf.vocab.Vocabulary;
import java.util.List;
import java.util.Map;
import org.eclipse.rdf4j.model.BNode;
import org.eclipse.rdf4j.model.IRI;
import org.eclipse.rdf4j.model.Model;
import org.eclipse.rdf4j.model.ValueFactory;
import org.eclipse.rdf4j.model.impl.SimpleValueFactory;
import org.eclipse.rdf4j.model.impl.TreeModel;
import org.eclipse.rdf4j.model.vocabulary.DCTERMS;
import org.eclipse.rdf4j.model.vocabulary.OWL;
import org.eclipse.rdf4j.model.vocabulary.RDF;
import org.eclipse.rdf4j.model.vocabulary.SKOS;
import org.eclipse.rdf4j.model.vocabulary.XSD;

/** Builds the RDF graph of a vocabulary (sorted, with stable blank-node ids, so output is repeatable). */
final class SkosWriter {
    private static final ValueFactory VF = SimpleValueFactory.getInstance();

    private SkosWriter() {
    }

    static IRI schemeIri(String base) {
        return VF.createIRI(base.substring(0, base.length() - 1));
    }

    static IRI matchProperty(MatchKind k) {
        switch (k) {
            case EXACT:
                return SKOS.EXACT_MATCH;
            case CLOSE:
                return SKOS.CLOSE_MATCH;
            case BROAD:
                return SKOS.BROAD_MATCH;
            case NARROW:
                return SKOS.NARROW_MATCH;
            default:
                return SKOS.RELATED_MATCH;
        }
    }

    static Model toModel(Vocabulary v, String base) {
        Model m = new TreeModel();
        m.setNamespace("skos", SKOS.NAMESPACE);
        m.setNamespace("dct", DCTERMS.NAMESPACE);
        m.setNamespace("owl", OWL.NAMESPACE);
        m.setNamespace("xsd", XSD.NAMESPACE);
        m.setNamespace(SheafNs.PREFIX, SheafNs.NS);
        m.setNamespace("", base);
        IRI s = schemeIri(base);
        m.add(s, RDF.TYPE, SKOS.CONCEPT_SCHEME);
        m.add(s, DCTERMS.IDENTIFIER, VF.createLiteral(v.scheme().id()));
        m.add(s, SheafNs.BASE_IRI, VF.createLiteral(base, XSD.ANYURI));
        m.add(s, SheafNs.DEFAULT_LANGUAGE, VF.createLiteral(v.defaultLanguage()));
        v.scheme().titles().forEach((lang, t) -> m.add(s, SKOS.PREF_LABEL, VF.createLiteral(t, lang)));
        int[] buckets = {0};
        for (Concept c : v.allConcepts()) {
            IRI ci = VF.createIRI(base + c.id());
            m.add(ci, RDF.TYPE, SKOS.CONCEPT);
            m.add(ci, SKOS.IN_SCHEME, s);
            c.prefLabels().forEach((lang, t) -> m.add(ci, SKOS.PREF_LABEL, VF.createLiteral(t, lang)));
            for (Label l : c.altLabels()) {
                m.add(ci, SKOS.ALT_LABEL, VF.createLiteral(l.text(), l.lang()));
            }
            for (Label l : c.hiddenLabels()) {
                m.add(ci, SKOS.HIDDEN_LABEL, VF.createLiteral(l.text(), l.lang()));
            }
            for (String b : c.broader()) {
                IRI bi = VF.createIRI(base + b);
                m.add(ci, SKOS.BROADER, bi);
                m.add(bi, SKOS.NARROWER, ci);
            }
            for (String r : c.related()) {
                m.add(ci, SKOS.RELATED, VF.createIRI(base + r));
            }
            notes(m, ci, SKOS.SCOPE_NOTE, c.scopeNotes());
            notes(m, ci, SKOS.DEFINITION, c.definitions());
            for (Mapping x : c.mappings()) {
                m.add(ci, matchProperty(x.kind()), VF.createIRI(x.iri()));
            }
            if (c.splitFrom() != null) {
                m.add(ci, SheafNs.SPLIT_FROM, VF.createIRI(base + c.splitFrom()));
            }
            Provenance p = c.provenance();
            if (p != null) {
                if (p.harvestTerm() != null) {
                    m.add(ci, SheafNs.HARVEST_TERM, VF.createLiteral(p.harvestTerm()));
                }
                if (p.when() != null) {
                    m.add(ci, DCTERMS.CREATED, VF.createLiteral(p.when().toString(), XSD.DATETIME));
                }
                if (p.by() != null) {
                    m.add(ci, DCTERMS.CREATOR, VF.createLiteral(p.by()));
                }
            }
            if (c.isFacet()) {
                facet(m, ci, s, c.facet(), buckets);
            }
        }
        for (Retired r : v.retired()) {
            IRI ri = VF.createIRI(base + r.id());
            m.add(ri, RDF.TYPE, SheafNs.RETIRED_CONCEPT);
            m.add(ri, OWL.DEPRECATED, VF.createLiteral(true));
            if (r.replacedBy() != null) {
                m.add(ri, DCTERMS.IS_REPLACED_BY, VF.createIRI(base + r.replacedBy()));
            }
            if (r.formerLabel() != null) {
                m.add(ri, SheafNs.FORMER_LABEL, VF.createLiteral(r.formerLabel(), v.defaultLanguage()));
            }
        }
        List<Decision> ds = v.decisions();
        for (int i = 0; i < ds.size(); i++) {
            Decision d = ds.get(i);
            BNode n = VF.createBNode("decision" + (i + 1));
            m.add(s, SheafNs.DECISION, n);
            m.add(n, RDF.TYPE, SheafNs.CANDIDATE_DECISION);
            m.add(n, SheafNs.TERM, VF.createLiteral(d.term()));
            m.add(n, SheafNs.OUTCOME, VF.createLiteral(d.outcome().word()));
            if (d.concept() != null) {
                m.add(n, SheafNs.KEPT_AS, VF.createIRI(base + d.concept()));
            }
            if (d.reason() != null) {
                m.add(n, SheafNs.REASON, VF.createLiteral(d.reason()));
            }
            if (d.when() != null) {
                m.add(n, DCTERMS.DATE, VF.createLiteral(d.when().toString(), XSD.DATETIME));
            }
            if (d.by() != null) {
                m.add(n, DCTERMS.CREATOR, VF.createLiteral(d.by()));
            }
        }
        return m;
    }

    private static void notes(Model m, IRI ci, IRI p, Map<String, String> notes) {
        notes.forEach((lang, t) -> m.add(ci, p, VF.createLiteral(t, lang)));
    }

    private static void facet(Model m, IRI ci, IRI s, FacetProperties f, int[] counter) {
        m.add(ci, SKOS.TOP_CONCEPT_OF, s);
        m.add(s, SKOS.HAS_TOP_CONCEPT, ci);
        m.add(ci, RDF.TYPE, SheafNs.FACET);
        m.add(ci, SheafNs.VALUE_KIND, VF.createLiteral(f.valueKind().word()));
        m.add(ci, SheafNs.MULTI_VALUED, VF.createLiteral(f.multiValued()));
        m.add(ci, SheafNs.REGULATED_CLAIM, VF.createLiteral(f.regulatedClaim()));
        for (String cat : f.categories()) {
            m.add(ci, SheafNs.CATEGORY, VF.createLiteral(cat));
        }
        if (f.unit() != null) {
            m.add(ci, SheafNs.UNIT, VF.createLiteral(f.unit()));
        }
        List<Bucket> bs = f.buckets();
        for (int i = 0; i < bs.size(); i++) {
            Bucket b = bs.get(i);
            BNode n = VF.createBNode("bucket" + (++counter[0]));
            m.add(ci, SheafNs.BUCKET, n);
            m.add(n, SheafNs.BUCKET_LABEL, VF.createLiteral(b.label()));
            if (b.min() != null) {
                m.add(n, SheafNs.MIN, VF.createLiteral(b.min()));
            }
            if (b.max() != null) {
                m.add(n, SheafNs.MAX, VF.createLiteral(b.max()));
            }
        }
    }
}
