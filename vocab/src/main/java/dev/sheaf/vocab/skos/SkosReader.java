package dev.sheaf.vocab.skos;

import dev.sheaf.vocab.Bucket;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Finding;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.Mapping;
import dev.sheaf.vocab.MatchKind;
import dev.sheaf.vocab.Provenance;
import dev.sheaf.vocab.Retired;
import dev.sheaf.vocab.Rule;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Severity;
import dev.sheaf.vocab.Terms;
import dev.sheaf.vocab.ValueKind;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Pattern;
import org.eclipse.rdf4j.model.IRI;
import org.eclipse.rdf4j.model.Literal;
import org.eclipse.rdf4j.model.Model;
import org.eclipse.rdf4j.model.Resource;
import org.eclipse.rdf4j.model.Statement;
import org.eclipse.rdf4j.model.Value;
import org.eclipse.rdf4j.model.vocabulary.DCTERMS;
import org.eclipse.rdf4j.model.vocabulary.RDF;
import org.eclipse.rdf4j.model.vocabulary.SKOS;

/** Reads a SKOS graph into a vocabulary, recording what it cannot carry and the integrity conditions the model cannot hold. */
final class SkosReader {
    private static final Pattern ID = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._~-]{0,199}");
    private static final Set<IRI> HANDLED = Set.of(RDF.TYPE, SKOS.IN_SCHEME, SKOS.TOP_CONCEPT_OF, SKOS.PREF_LABEL,
            SKOS.ALT_LABEL, SKOS.HIDDEN_LABEL, SKOS.BROADER, SKOS.NARROWER, SKOS.RELATED, SKOS.SCOPE_NOTE, SKOS.DEFINITION,
            SKOS.EXACT_MATCH, SKOS.CLOSE_MATCH, SKOS.BROAD_MATCH, SKOS.NARROW_MATCH, SKOS.RELATED_MATCH,
            SKOS.BROADER_TRANSITIVE, SKOS.NARROWER_TRANSITIVE, DCTERMS.CREATED, DCTERMS.CREATOR,
            SheafNs.VALUE_KIND, SheafNs.MULTI_VALUED, SheafNs.REGULATED_CLAIM, SheafNs.CATEGORY, SheafNs.UNIT,
            SheafNs.BUCKET, SheafNs.HARVEST_TERM, SheafNs.SPLIT_FROM);

    private final Model m;
    private final String source;
    private final List<Finding> findings = new ArrayList<>();
    private final Map<String, Integer> notCarried = new TreeMap<>();
    private final Map<Resource, String> ids = new HashMap<>();
    private final Set<String> taken = new HashSet<>();
    private String base;
    private String lang;

    SkosReader(Model m, String source) {
        this.m = m;
        this.source = source;
    }

    SkosImport read() throws VocabularyFormatException {
        disjointClasses();
        Resource scheme = chooseScheme();
        lang = literal(scheme, SheafNs.DEFAULT_LANGUAGE).map(Literal::getLabel).map(this::safeLang).orElse(Label.DEFAULT_LANGUAGE);
        Set<Resource> tops = new HashSet<>();
        m.filter(scheme, SKOS.HAS_TOP_CONCEPT, null).objects().forEach(o -> {
            if (o instanceof Resource) {
                tops.add((Resource) o);
            }
        });
        tops.addAll(m.filter(null, SKOS.TOP_CONCEPT_OF, scheme).subjects());
        List<Resource> members = members(scheme, tops);
        List<Resource> retired = sorted(m.filter(null, RDF.TYPE, SheafNs.RETIRED_CONCEPT).subjects());
        retired.removeAll(members);
        base = chooseBase(scheme, members);
        for (Resource r : members) {
            assignId(r);
        }
        for (Resource r : retired) {
            assignId(r);
        }
        Set<Resource> memberSet = new HashSet<>(members);
        List<Concept> concepts = new ArrayList<>();
        for (Resource r : members) {
            Concept c = concept(r, memberSet, tops.contains(r) || m.contains(r, RDF.TYPE, SheafNs.FACET));
            if (c != null) {
                concepts.add(c);
            }
        }
        List<Retired> rs = new ArrayList<>();
        for (Resource r : retired) {
            String replacedBy = m.filter(r, DCTERMS.IS_REPLACED_BY, null).objects().stream()
                    .filter(o -> o instanceof Resource).map(o -> idOf((Resource) o)).filter(x -> x != null).findFirst().orElse(null);
            String former = literal(r, SheafNs.FORMER_LABEL).map(l -> clean(l.getLabel())).orElse(null);
            rs.add(new Retired(ids.get(r), replacedBy, former));
        }
        List<Decision> ds = decisions(scheme);
        if (!notCarried.isEmpty()) {
            List<String> parts = new ArrayList<>();
            notCarried.forEach((k, n) -> parts.add(k + " ×" + n));
            note("not carried into the vocabulary: " + String.join(", ", parts),
                    "keep the SKOS file if you need these; Sheaf's model has no place for them");
        }
        SchemeInfo info = new SchemeInfo(schemeId(scheme), titles(scheme), base, lang);
        try {
            return new SkosImport(Vocabulary.of(info, concepts, rs, ds), findings);
        } catch (IllegalArgumentException e) {
            throw new VocabularyFormatException(source, 0, 0, null, e.getMessage(), e);
        }
    }

    // ---------------------------------------------------------------- S9, S37

    private void disjointClasses() {
        for (Resource r : sorted(m.filter(null, RDF.TYPE, SKOS.CONCEPT_SCHEME).subjects())) {
            if (m.contains(r, RDF.TYPE, SKOS.CONCEPT)) {
                findings.add(new Finding(Rule.SCHEME_IS_CONCEPT, Severity.ERROR, List.of(), r.stringValue(),
                        "<" + r.stringValue() + "> is typed both skos:ConceptScheme and skos:Concept",
                        "give the scheme and the concept different IRIs"));
            }
        }
        Set<Resource> collections = new HashSet<>(m.filter(null, RDF.TYPE, SKOS.COLLECTION).subjects());
        collections.addAll(m.filter(null, RDF.TYPE, SKOS.ORDERED_COLLECTION).subjects());
        for (Resource r : sorted(collections)) {
            if (m.contains(r, RDF.TYPE, SKOS.CONCEPT) || m.contains(r, RDF.TYPE, SKOS.CONCEPT_SCHEME)) {
                findings.add(new Finding(Rule.COLLECTION_IS_CONCEPT, Severity.ERROR, List.of(), r.stringValue(),
                        "<" + r.stringValue() + "> is typed skos:Collection and also skos:"
                                + (m.contains(r, RDF.TYPE, SKOS.CONCEPT) ? "Concept" : "ConceptScheme"),
                        "a collection groups concepts; give it an IRI of its own"));
            }
        }
        if (!collections.isEmpty()) {
            notCarried.merge("skos:Collection", collections.size(), Integer::sum);
        }
    }

    // ---------------------------------------------------------------- scheme and members

    private Resource chooseScheme() throws VocabularyFormatException {
        Set<Resource> schemes = new HashSet<>(m.filter(null, RDF.TYPE, SKOS.CONCEPT_SCHEME).subjects());
        schemes.addAll(m.filter(null, SKOS.HAS_TOP_CONCEPT, null).subjects());
        if (schemes.isEmpty()) {
            throw new VocabularyFormatException(source, 0, 0, null,
                    "no concept scheme found: expected a resource with rdf:type skos:ConceptScheme"
                            + " (Sheaf imports SKOS files that have one)", null);
        }
        List<Resource> list = sorted(schemes);
        list.sort(Comparator.comparingInt((Resource s) -> -(m.filter(null, SKOS.IN_SCHEME, s).size()
                + m.filter(s, SKOS.HAS_TOP_CONCEPT, null).size())).thenComparing(Value::stringValue));
        if (list.size() > 1) {
            List<String> others = new ArrayList<>();
            list.subList(1, list.size()).forEach(s -> others.add("<" + s.stringValue() + ">"));
            note("the file holds " + list.size() + " concept schemes; imported <" + list.get(0).stringValue()
                    + ">, the one with most concepts, and left " + String.join(", ", others),
                    "split the file per scheme to import the others");
        }
        return list.get(0);
    }

    private List<Resource> members(Resource scheme, Set<Resource> tops) {
        Set<Resource> out = new HashSet<>(tops);
        for (Resource c : m.filter(null, RDF.TYPE, SKOS.CONCEPT).subjects()) {
            Set<Value> in = m.filter(c, SKOS.IN_SCHEME, null).objects();
            if (in.isEmpty() || in.contains(scheme)) {
                out.add(c);
            }
        }
        out.addAll(m.filter(null, SKOS.IN_SCHEME, scheme).subjects());
        out.removeIf(r -> m.contains(r, RDF.TYPE, SKOS.CONCEPT_SCHEME) || m.contains(r, RDF.TYPE, SKOS.COLLECTION));
        return sorted(out);
    }

    private String chooseBase(Resource scheme, List<Resource> members) {
        Optional<Literal> declared = literal(scheme, SheafNs.BASE_IRI);
        if (declared.isPresent()) {
            try {
                return SchemeInfo.checkBase(declared.get().getLabel());
            } catch (IllegalArgumentException e) {
                note("the scheme's sheaf:baseIri \"" + declared.get().getLabel() + "\" is not usable (" + e.getMessage()
                        + "); the base was taken from the concept IRIs", "fix or remove sheaf:baseIri");
            }
        }
        Map<String, Integer> counts = new TreeMap<>();
        for (Resource r : members) {
            if (r instanceof IRI) {
                counts.merge(((IRI) r).getNamespace(), 1, Integer::sum);
            }
        }
        String best = null;
        for (Map.Entry<String, Integer> e : counts.entrySet()) {
            if (best == null || e.getValue() > counts.get(best)) {
                best = e.getKey();
            }
        }
        if (best != null && (best.endsWith("/") || best.endsWith("#"))) {
            try {
                return SchemeInfo.checkBase(best);
            } catch (IllegalArgumentException ignored) {
                // fall through to the scheme IRI
            }
        }
        if (scheme instanceof IRI) {
            try {
                return SchemeInfo.checkBase(scheme.stringValue() + "/");
            } catch (IllegalArgumentException ignored) {
                // fall through
            }
        }
        return SchemeInfo.defaultBase("imported");
    }

    private void assignId(Resource r) {
        String id = null;
        if (r instanceof IRI && r.stringValue().startsWith(base)) {
            String local = r.stringValue().substring(base.length());
            if (ID.matcher(local).matches() && !taken.contains(local)) {
                id = local;
            }
        }
        if (id == null) {
            String seed = r instanceof IRI ? ((IRI) r).getLocalName() : "";
            if (seed.isEmpty()) {
                seed = m.filter(r, SKOS.PREF_LABEL, null).objects().stream().map(Value::stringValue).sorted().findFirst().orElse("concept");
            }
            String slug = Terms.slug(java.net.URLDecoder.decode(seed.replace("+", "%2B"), java.nio.charset.StandardCharsets.UTF_8));
            id = slug;
            for (int i = 2; taken.contains(id); i++) {
                id = slug + "-" + i;
            }
            if (r instanceof IRI) {
                notCarried.merge("IRIs outside the base " + base + " (given new ids)", 1, Integer::sum);
            }
        }
        taken.add(id);
        ids.put(r, id);
    }

    /** The id a referenced resource has here; for IRIs in the base that are not imported, the local name (kept as a reference). */
    private String idOf(Resource r) {
        String id = ids.get(r);
        if (id != null) {
            return id;
        }
        if (r instanceof IRI && r.stringValue().startsWith(base)) {
            String local = r.stringValue().substring(base.length());
            if (ID.matcher(local).matches()) {
                return local;
            }
        }
        return null;
    }

    // ---------------------------------------------------------------- concepts

    private Concept concept(Resource r, Set<Resource> members, boolean facet) {
        String id = ids.get(r);
        Concept.Builder b = Concept.builder(id);
        TreeMap<String, TreeSet<String>> prefs = new TreeMap<>();
        for (Literal l : literals(r, SKOS.PREF_LABEL)) {
            Label lab = label(l);
            if (lab != null) {
                prefs.computeIfAbsent(lab.lang(), k -> new TreeSet<>()).add(lab.text());
            }
        }
        prefs.forEach((lg, texts) -> {
            b.prefLabel(Label.of(texts.first(), lg));
            if (texts.size() > 1) {
                List<String> rest = new ArrayList<>(texts).subList(1, texts.size());
                rest.forEach(t -> b.altLabel(Label.of(t, lg)));
                // W3C SKOS Reference S14: at most one prefLabel per language tag
                findings.add(new Finding(Rule.TWO_PREFERRED_LABELS, Severity.ERROR, List.of(id), lg,
                        "<" + r.stringValue() + "> has " + texts.size() + " preferred labels in " + lg + ": \""
                                + String.join("\", \"", texts) + "\"; \"" + texts.first() + "\" was kept as preferred and the"
                                + " others became alternative labels",
                        "keep one preferred label per language in the SKOS file, or accept the import's choice"));
            }
        });
        for (Literal l : literals(r, SKOS.ALT_LABEL)) {
            Label lab = label(l);
            if (lab != null) {
                b.altLabel(lab);
            }
        }
        for (Literal l : literals(r, SKOS.HIDDEN_LABEL)) {
            Label lab = label(l);
            if (lab != null) {
                b.hiddenLabel(lab);
            }
        }
        TreeSet<String> broader = new TreeSet<>();
        for (Value o : m.filter(r, SKOS.BROADER, null).objects()) {
            ref(o, broader, "skos:broader");
        }
        for (Resource s : m.filter(null, SKOS.NARROWER, r).subjects()) {
            ref(s, broader, "skos:narrower");
        }
        broader.remove(id);
        TreeSet<String> related = new TreeSet<>();
        for (Value o : m.filter(r, SKOS.RELATED, null).objects()) {
            ref(o, related, "skos:related");
        }
        for (Resource s : m.filter(null, SKOS.RELATED, r).subjects()) {
            ref(s, related, "skos:related");
        }
        related.remove(id);
        b.related(related);
        notes(r, SKOS.SCOPE_NOTE, "skos:scopeNote").forEach(b::scopeNote);
        notes(r, SKOS.DEFINITION, "skos:definition").forEach(b::definition);
        for (MatchKind k : MatchKind.values()) {
            for (Value o : m.filter(r, SkosWriter.matchProperty(k), null).objects()) {
                if (o instanceof IRI) {
                    b.mapping(new Mapping(k, o.stringValue()));
                } else {
                    notCarried.merge("skos:" + k.skosName() + " to a blank node or literal", 1, Integer::sum);
                }
            }
        }
        for (Value o : m.filter(r, SheafNs.SPLIT_FROM, null).objects()) {
            if (o instanceof Resource) {
                b.splitFrom(idOf((Resource) o));
            }
        }
        b.provenance(provenance(r));
        if (facet) {
            if (!broader.isEmpty()) {
                note("<" + r.stringValue() + "> is a top concept of the scheme and also has broader concepts " + broader
                        + "; it was imported as a facet and its broader links were dropped",
                        "in SKOS, keep top concepts at the top");
            }
            b.facet(facetProperties(r));
        } else {
            b.broader(broader);
        }
        for (Statement st : m.filter(r, null, null)) {
            IRI p = st.getPredicate();
            if (!HANDLED.contains(p)) {
                notCarried.merge(shortName(p), 1, Integer::sum);
            }
        }
        try {
            return b.build();
        } catch (IllegalArgumentException e) {
            note("<" + r.stringValue() + "> could not be imported: " + e.getMessage(), "fix it in the SKOS file");
            return null;
        }
    }

    private void ref(Value o, Set<String> into, String what) {
        if (!(o instanceof Resource)) {
            notCarried.merge(what + " to a literal", 1, Integer::sum);
            return;
        }
        String id = idOf((Resource) o);
        if (id == null) {
            notCarried.merge(what + " to a resource outside the scheme", 1, Integer::sum);
        } else {
            into.add(id);
        }
    }

    private Map<String, String> notes(Resource r, IRI p, String what) {
        Map<String, List<String>> by = new TreeMap<>();
        for (Literal l : literals(r, p)) {
            String t = l.getLabel().strip();
            if (!t.isEmpty()) {
                by.computeIfAbsent(l.getLanguage().map(this::safeLang).orElse(lang), k -> new ArrayList<>()).add(t);
            }
        }
        Map<String, String> out = new LinkedHashMap<>();
        by.forEach((lg, ts) -> {
            ts.sort(null);
            if (ts.size() > 1) {
                notCarried.merge("several " + what + " in one language (joined)", 1, Integer::sum);
            }
            out.put(lg, String.join("\n\n", ts));
        });
        return out;
    }

    private Provenance provenance(Resource r) {
        String term = literal(r, SheafNs.HARVEST_TERM).map(l -> clean(l.getLabel())).orElse(null);
        Instant when = literal(r, DCTERMS.CREATED).map(l -> instant(l.getLabel())).orElse(null);
        String by = m.filter(r, DCTERMS.CREATOR, null).objects().stream().map(Value::stringValue).sorted().findFirst()
                .map(this::clean).orElse(null);
        return term == null && when == null && by == null ? null : new Provenance(term, when, by);
    }

    private Instant instant(String s) {
        try {
            return Instant.parse(s);
        } catch (DateTimeParseException e) {
            try {
                return OffsetDateTime.parse(s).toInstant();
            } catch (DateTimeParseException e2) {
                notCarried.merge("dates without a time zone", 1, Integer::sum);
                return null;
            }
        }
    }

    private FacetProperties facetProperties(Resource r) {
        ValueKind kind = ValueKind.TERM;
        Optional<Literal> vk = literal(r, SheafNs.VALUE_KIND);
        if (vk.isPresent()) {
            try {
                kind = ValueKind.ofWord(vk.get().getLabel());
            } catch (IllegalArgumentException e) {
                note("<" + r.stringValue() + ">: " + e.getMessage() + "; imported as a term facet", "fix sheaf:valueKind");
            }
        }
        boolean multi = literal(r, SheafNs.MULTI_VALUED).map(Literal::booleanValue).orElse(false);
        boolean regulated = literal(r, SheafNs.REGULATED_CLAIM).map(Literal::booleanValue).orElse(false);
        TreeSet<String> cats = new TreeSet<>();
        for (Literal l : literals(r, SheafNs.CATEGORY)) {
            String c = clean(l.getLabel());
            if (c != null) {
                cats.add(c);
            }
        }
        String unit = kind == ValueKind.NUMBER ? literal(r, SheafNs.UNIT).map(l -> clean(l.getLabel())).orElse(null) : null;
        List<Bucket> buckets = new ArrayList<>();
        if (kind == ValueKind.NUMBER) {
            for (Value o : m.filter(r, SheafNs.BUCKET, null).objects()) {
                if (o instanceof Resource) {
                    Resource n = (Resource) o;
                    try {
                        buckets.add(new Bucket(literal(n, SheafNs.BUCKET_LABEL).map(Literal::getLabel).orElse(null),
                                literal(n, SheafNs.MIN).map(Literal::doubleValue).orElse(null),
                                literal(n, SheafNs.MAX).map(Literal::doubleValue).orElse(null)));
                    } catch (RuntimeException e) {
                        note("a bucket of <" + r.stringValue() + "> could not be read: " + e.getMessage(), "fix the bucket");
                    }
                }
            }
        }
        try {
            return new FacetProperties(kind, multi, cats, unit, buckets, regulated);
        } catch (IllegalArgumentException e) {
            note("the facet properties of <" + r.stringValue() + "> could not be read: " + e.getMessage()
                    + "; its buckets were dropped", "fix the buckets");
            return new FacetProperties(kind, multi, cats, unit, List.of(), regulated);
        }
    }

    // ---------------------------------------------------------------- decisions and scheme

    private List<Decision> decisions(Resource scheme) {
        Map<String, Decision> out = new TreeMap<>();
        for (Value o : m.filter(scheme, SheafNs.DECISION, null).objects()) {
            if (!(o instanceof Resource)) {
                continue;
            }
            Resource n = (Resource) o;
            try {
                String concept = m.filter(n, SheafNs.KEPT_AS, null).objects().stream().filter(x -> x instanceof Resource)
                        .map(x -> idOf((Resource) x)).findFirst().orElse(null);
                Decision d = new Decision(literal(n, SheafNs.TERM).map(Literal::getLabel).orElse(null),
                        Decision.Outcome.ofWord(literal(n, SheafNs.OUTCOME).map(Literal::getLabel).orElse("")),
                        concept, literal(n, SheafNs.REASON).map(Literal::getLabel).orElse(null),
                        literal(n, DCTERMS.DATE).map(l -> instant(l.getLabel())).orElse(null),
                        literal(n, DCTERMS.CREATOR).map(Literal::getLabel).orElse(null));
                out.put(d.key(), d);
            } catch (RuntimeException e) {
                note("a candidate decision could not be read: " + e.getMessage(), "fix it in the SKOS file");
            }
        }
        return new ArrayList<>(out.values());
    }

    private String schemeId(Resource scheme) {
        Optional<Literal> id = literal(scheme, DCTERMS.IDENTIFIER);
        if (id.isPresent() && ID.matcher(id.get().getLabel()).matches()) {
            return id.get().getLabel();
        }
        String s = scheme.stringValue().replaceAll("[/#]+$", "");
        return Terms.slug(s.substring(Math.max(s.lastIndexOf('/'), s.lastIndexOf('#')) + 1));
    }

    private java.util.SortedMap<String, String> titles(Resource scheme) {
        TreeMap<String, String> t = new TreeMap<>();
        for (IRI p : List.of(SKOS.PREF_LABEL, DCTERMS.TITLE)) {
            for (Literal l : literals(scheme, p)) {
                String text = clean(l.getLabel());
                if (text != null) {
                    t.putIfAbsent(l.getLanguage().map(this::safeLang).orElse(lang), text);
                }
            }
        }
        return t;
    }

    // ---------------------------------------------------------------- helpers

    private Label label(Literal l) {
        String text = clean(l.getLabel());
        if (text == null) {
            notCarried.merge("blank labels", 1, Integer::sum);
            return null;
        }
        return Label.of(text, l.getLanguage().map(this::safeLang).orElse(lang));
    }

    /** Label text made one trimmed line; null when blank. */
    private String clean(String s) {
        String t = s.replaceAll("\\p{Cntrl}+", " ").replaceAll("\\s+", " ").strip();
        return t.isEmpty() ? null : t;
    }

    private String safeLang(String tag) {
        try {
            return Label.checkLanguage(tag);
        } catch (IllegalArgumentException e) {
            notCarried.merge("language tags Sheaf does not accept (labels kept in the default language)", 1, Integer::sum);
            return lang == null ? Label.DEFAULT_LANGUAGE : lang;
        }
    }

    private List<Literal> literals(Resource r, IRI p) {
        List<Literal> out = new ArrayList<>();
        for (Value o : m.filter(r, p, null).objects()) {
            if (o instanceof Literal) {
                out.add((Literal) o);
            } else {
                notCarried.merge(shortName(p) + " as a resource (e.g. SKOS-XL)", 1, Integer::sum);
            }
        }
        out.sort(Comparator.comparing(Literal::getLabel));
        return out;
    }

    private Optional<Literal> literal(Resource r, IRI p) {
        return literals(r, p).stream().findFirst();
    }

    private void note(String message, String hint) {
        findings.add(new Finding(Rule.IMPORT_NOTE, Severity.INFO, List.of(), message, message, hint));
    }

    private static String shortName(IRI p) {
        if (p.getNamespace().equals(SKOS.NAMESPACE)) {
            return "skos:" + p.getLocalName();
        }
        if (p.getNamespace().equals(DCTERMS.NAMESPACE)) {
            return "dct:" + p.getLocalName();
        }
        return "<" + p.stringValue() + ">";
    }

    private static List<Resource> sorted(Set<Resource> rs) {
        List<Resource> l = new ArrayList<>(rs);
        l.sort(Comparator.comparing(Value::stringValue));
        return l;
    }
}
