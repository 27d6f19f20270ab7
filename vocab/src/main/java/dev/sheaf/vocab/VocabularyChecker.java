package dev.sheaf.vocab;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Deque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.text.Normalizer;
import org.apache.lucene.analysis.en.EnglishMinimalStemmer;

/**
 * Checks a vocabulary against the SKOS integrity conditions that can arise in it and against
 * thesaurus practice; see {@link Rule} for each rule and its source.
 *
 * <p>Some SKOS conditions cannot arise in a Sheaf vocabulary and are checked where they can: S14
 * (one preferred label per language) is built into the model (one preferred label per language
 * key) and checked by the SKOS import; S9 and S37 (a scheme or collection that is also a concept)
 * cannot be expressed in the model and are checked on imported SKOS graphs.
 */
public final class VocabularyChecker {
    private final Vocabulary v;
    private final boolean errorsOnly;
    private final List<Finding> out = new ArrayList<>();

    private VocabularyChecker(Vocabulary v, boolean errorsOnly) {
        this.v = v;
        this.errorsOnly = errorsOnly;
    }

    /** Every finding on {@code v}. */
    public static CheckReport check(Vocabulary v) {
        return check(v, List.of());
    }

    /** Every finding on {@code v}, plus findings made while reading it (SKOS import, S9, S14, S37). */
    public static CheckReport check(Vocabulary v, Collection<Finding> fromReading) {
        VocabularyChecker c = new VocabularyChecker(v, false);
        c.run();
        List<Finding> all = new ArrayList<>(fromReading);
        all.addAll(c.out);
        return new CheckReport(all);
    }

    /** A report for a file that could not be read at all. */
    public static CheckReport unreadable(VocabularyFormatException e) {
        return new CheckReport(List.of(Finding.of(Rule.UNREADABLE, List.of(), e.file(),
                e.getMessage(), "fix the file at that position (its backup ends in ~), then check again")));
    }

    /** Only the error findings (used to refuse edits that would add one). */
    static List<Finding> errors(Vocabulary v) {
        VocabularyChecker c = new VocabularyChecker(v, true);
        c.run();
        List<Finding> e = new ArrayList<>();
        for (Finding f : c.out) {
            if (f.severity() == Severity.ERROR) {
                e.add(f);
            }
        }
        return e;
    }

    private void run() {
        labelKindsOverlap();
        sharedLabels();
        missingPreferred();
        relatedToAncestor();
        exactMatchConflicts();
        references();
        if (errorsOnly) {
            return;
        }
        relatedOneWay();
        cycles();
        orphansAndFacets();
        nearDuplicates();
        singularPlural();
        regulated();
    }

    private String q(String id) {
        return "\"" + v.displayLabel(id) + "\" (" + id + ")";
    }

    private void add(Rule r, Severity s, Collection<String> ids, String subject, String message, String hint) {
        out.add(new Finding(r, s, List.copyOf(ids), subject, message, hint));
    }

    private void add(Rule r, Collection<String> ids, String subject, String message, String hint) {
        add(r, r.severity(), ids, subject, message, hint);
    }

    // S13
    private void labelKindsOverlap() {
        for (Concept c : v.allConcepts()) {
            // most concepts carry each label once: look for a repeat before sorting anything
            Set<Label> seen = new HashSet<>();
            TreeSet<Label> repeated = null;
            for (ConceptLabel l : c.labels()) {
                if (!seen.add(l.label())) {
                    if (repeated == null) {
                        repeated = new TreeSet<>();
                    }
                    repeated.add(l.label());
                }
            }
            if (repeated == null) {
                continue;
            }
            for (Label l : repeated) {
                List<LabelKind> kinds = c.kindsOf(l);
                if (kinds.size() > 1) {
                    List<String> words = new ArrayList<>();
                    kinds.forEach(k -> words.add(k.word()));
                    add(Rule.LABEL_KINDS_OVERLAP, List.of(c.id()), l.toString(),
                            l + " is both " + String.join(" and ", words) + " label of " + q(c.id()),
                            "keep it as one kind only: remove the " + kinds.get(kinds.size() - 1).word() + " copy");
                }
            }
        }
    }

    // Z39.19: one preferred term per concept, non-preferred terms point to one concept
    private void sharedLabels() {
        // only labels on two or more uses can be shared; sort just those (the findings come out in label order)
        TreeMap<Label, List<Vocabulary.LabelUse>> sorted = new TreeMap<>();
        for (Map.Entry<Label, List<Vocabulary.LabelUse>> e : v.labelIndex().entrySet()) {
            if (e.getValue().size() > 1) {
                sorted.put(e.getKey(), e.getValue());
            }
        }
        for (Map.Entry<Label, List<Vocabulary.LabelUse>> e : sorted.entrySet()) {
            TreeSet<String> ids = new TreeSet<>();
            boolean nonPreferred = false;
            for (Vocabulary.LabelUse u : e.getValue()) {
                ids.add(u.conceptId());
                nonPreferred |= u.kind() != LabelKind.PREFERRED;
            }
            if (ids.size() < 2) {
                continue;
            }
            Label l = e.getKey();
            List<String> names = new ArrayList<>();
            ids.forEach(id -> names.add(q(id)));
            if (nonPreferred) {
                add(Rule.AMBIGUOUS_LABEL, ids, l.toString(),
                        l + " is a label of " + String.join(" and ", names)
                                + " and not only as their preferred label, so a match on it cannot tell which concept is meant",
                        "keep " + l + " on one concept (move or remove the others), or merge the concepts if they are the same");
            } else {
                boolean sameFacet = false;
                List<String> list = new ArrayList<>(ids);
                for (int i = 0; i < list.size() && !sameFacet; i++) {
                    for (int j = i + 1; j < list.size() && !sameFacet; j++) {
                        sameFacet = shareFacet(list.get(i), list.get(j));
                    }
                }
                add(Rule.PREFERRED_LABEL_SHARED, sameFacet ? Severity.ERROR : Severity.WARNING, ids, l.toString(),
                        l + " is the preferred label of " + String.join(" and ", names)
                                + (sameFacet ? " in the same facet" : " (in different facets: a homograph)"),
                        sameFacet ? "merge them if they mean the same, or rename one"
                                : "add a qualifier to tell them apart, e.g. \"" + l.text() + " (" + facetName(list.get(0)) + ")\"");
            }
        }
    }

    private boolean shareFacet(String a, String b) {
        Set<String> fa = new HashSet<>();
        v.facetsOf(a).forEach(f -> fa.add(f.id()));
        List<Concept> fb = v.facetsOf(b);
        if (fa.isEmpty() && fb.isEmpty()) {
            return true;
        }
        for (Concept f : fb) {
            if (fa.contains(f.id())) {
                return true;
            }
        }
        return false;
    }

    private String facetName(String id) {
        return v.facetOf(id).map(f -> f.displayLabel(v.defaultLanguage())).orElse("qualifier");
    }

    private void missingPreferred() {
        String lang = v.defaultLanguage();
        for (Concept c : v.allConcepts()) {
            if (!c.prefLabels().containsKey(lang)) {
                add(Rule.NO_PREFERRED_LABEL, List.of(c.id()), lang,
                        q(c.id()) + " has no preferred label in " + lang + ", the vocabulary's default language",
                        "rename it: give it a preferred label in " + lang);
            }
        }
    }

    // S27
    private void relatedToAncestor() {
        Set<String> seen = new HashSet<>();
        for (Concept c : v.allConcepts()) {
            for (String r : c.related()) {
                if (!v.contains(r)) {
                    continue;
                }
                String pair = c.id().compareTo(r) < 0 ? c.id() + " " + r : r + " " + c.id();
                if (!seen.add(pair)) {
                    continue;
                }
                String above = v.ancestors(c.id()).contains(r) ? r : v.ancestors(r).contains(c.id()) ? c.id() : null;
                if (above != null) {
                    String below = above.equals(r) ? c.id() : r;
                    add(Rule.RELATED_TO_ANCESTOR, List.of(c.id(), r), "",
                            q(below) + " is related to " + q(above) + ", which is also above it in the hierarchy",
                            "remove the related link; the broader link already connects them");
                }
            }
        }
    }

    // S46
    private void exactMatchConflicts() {
        for (Concept c : v.allConcepts()) {
            Set<String> exact = new HashSet<>();
            for (Mapping m : c.mappings()) {
                if (m.kind() == MatchKind.EXACT) {
                    exact.add(m.iri());
                }
            }
            for (Mapping m : c.mappings()) {
                if ((m.kind() == MatchKind.BROAD || m.kind() == MatchKind.RELATED) && exact.contains(m.iri())) {
                    add(Rule.EXACT_MATCH_CONFLICT, List.of(c.id()), m.iri(),
                            q(c.id()) + " has both exactMatch and " + m.kind().skosName() + " to <" + m.iri() + ">",
                            "keep the one that is true: an exact match cannot also be broader or merely related");
                }
            }
        }
    }

    private void references() {
        for (Concept c : v.allConcepts()) {
            for (String b : c.broader()) {
                reference(c.id(), b, "a broader concept");
            }
            for (String r : c.related()) {
                reference(c.id(), r, "a related concept");
            }
        }
        for (Decision d : v.decisions()) {
            if (d.concept() != null && v.resolve(d.concept()).isEmpty()) {
                add(Rule.DANGLING_REFERENCE, List.of(d.concept()), d.key(),
                        "candidate term \"" + d.term() + "\" was kept as " + d.concept() + ", which "
                                + (v.retired(d.concept()).isPresent() ? "was deleted" : "does not exist"),
                        "record the decision again with a live concept, or park it");
            }
        }
        for (Retired r : v.retired()) {
            if (r.replacedBy() == null) {
                continue;
            }
            if (!v.isKnownId(r.replacedBy())) {
                add(Rule.DANGLING_REFERENCE, List.of(r.id()), "replacedBy",
                        "merged id " + r.id() + " is replaced by " + r.replacedBy() + ", which does not exist",
                        "point replacedBy at the concept it was merged into");
            } else if (loops(r.id())) {
                add(Rule.DANGLING_REFERENCE, List.of(r.id()), "replacedBy",
                        "the replaced-by chain from merged id " + r.id() + " loops and never reaches a concept",
                        "point one replacedBy in the chain at a live concept");
            }
        }
    }

    private boolean loops(String id) {
        Set<String> seen = new HashSet<>();
        String cur = id;
        while (cur != null) {
            if (!seen.add(cur)) {
                return true;
            }
            cur = v.retired(cur).map(Retired::replacedBy).orElse(null);
        }
        return false;
    }

    private void reference(String from, String to, String role) {
        if (v.contains(to)) {
            return;
        }
        Retired r = v.retired(to).orElse(null);
        if (r != null && r.replacedBy() != null) {
            if (!errorsOnly) {
                String now = v.resolve(to).map(Concept::id).orElse(r.replacedBy());
                add(Rule.REFERS_TO_MERGED, List.of(from, to), role,
                        q(from) + " names " + to + " as " + role + ", but " + to + " was merged into " + q(now),
                        "point it at " + now + " instead");
            }
            return;
        }
        add(Rule.DANGLING_REFERENCE, List.of(from, to), role,
                q(from) + " names " + to + " as " + role + ", but " + to + (r != null ? " was deleted" : " does not exist"),
                "remove the link or point it at an existing concept");
    }

    private void relatedOneWay() {
        for (Concept c : v.allConcepts()) {
            for (String r : c.related()) {
                Concept o = v.concept(r).orElse(null);
                if (o != null && !o.related().contains(c.id())) {
                    add(Rule.RELATED_ONE_WAY, List.of(c.id(), r), "",
                            q(c.id()) + " is related to " + q(r) + " but not the other way round",
                            "add the link back on " + r + " (edits do this; the file was changed by hand)");
                }
            }
        }
    }

    // Tarjan's strongly connected components over broader links between live concepts
    private void cycles() {
        Map<String, Integer> index = new HashMap<>();
        Map<String, Integer> low = new HashMap<>();
        Deque<String> stack = new ArrayDeque<>();
        Set<String> onStack = new HashSet<>();
        int[] counter = {0};
        for (Concept c : v.allConcepts()) {
            if (!index.containsKey(c.id())) {
                strongConnect(c.id(), index, low, stack, onStack, counter);
            }
        }
    }

    private void strongConnect(String root, Map<String, Integer> index, Map<String, Integer> low, Deque<String> stack,
                               Set<String> onStack, int[] counter) {
        // iterative, so deep hierarchies cannot overflow the call stack
        Deque<Object[]> work = new ArrayDeque<>();
        work.push(new Object[] {root, new ArrayList<>(v.concept(root).get().broader()), 0});
        index.put(root, counter[0]);
        low.put(root, counter[0]++);
        stack.push(root);
        onStack.add(root);
        while (!work.isEmpty()) {
            Object[] frame = work.peek();
            String node = (String) frame[0];
            @SuppressWarnings("unchecked")
            List<String> next = (List<String>) frame[1];
            int i = (Integer) frame[2];
            if (i < next.size()) {
                frame[2] = i + 1;
                String w = next.get(i);
                if (!v.contains(w)) {
                    continue;
                }
                if (!index.containsKey(w)) {
                    index.put(w, counter[0]);
                    low.put(w, counter[0]++);
                    stack.push(w);
                    onStack.add(w);
                    work.push(new Object[] {w, new ArrayList<>(v.concept(w).get().broader()), 0});
                } else if (onStack.contains(w)) {
                    low.put(node, Math.min(low.get(node), index.get(w)));
                }
                continue;
            }
            work.pop();
            if (!work.isEmpty()) {
                String parent = (String) work.peek()[0];
                low.put(parent, Math.min(low.get(parent), low.get(node)));
            }
            if (low.get(node).equals(index.get(node))) {
                TreeSet<String> comp = new TreeSet<>();
                String w;
                do {
                    w = stack.pop();
                    onStack.remove(w);
                    comp.add(w);
                } while (!w.equals(node));
                if (comp.size() > 1 || v.concept(node).get().broader().contains(node)) {
                    List<String> names = new ArrayList<>();
                    comp.forEach(x -> names.add(q(x)));
                    add(Rule.BROADER_CYCLE, comp, "",
                            "the broader links of " + String.join(", ", names) + " form a loop",
                            "remove one broader link in the loop so the hierarchy has a top");
                }
            }
        }
    }

    private void orphansAndFacets() {
        for (Concept c : v.concepts()) {
            List<Concept> fs = v.facetsOf(c.id());
            if (fs.isEmpty()) {
                add(Rule.ORPHAN, List.of(c.id()), "",
                        q(c.id()) + (c.broader().isEmpty() ? " is not under any facet"
                                : " has broader concepts, but none of them leads up to a facet"),
                        "move it under a facet's value or the facet itself");
            } else if (fs.size() > 1) {
                List<String> names = new ArrayList<>();
                List<String> ids = new ArrayList<>();
                ids.add(c.id());
                for (Concept f : fs) {
                    names.add(q(f.id()));
                    ids.add(f.id());
                }
                add(Rule.SEVERAL_FACETS, ids, "", q(c.id()) + " is under several facets: " + String.join(", ", names),
                        "keep it under one facet; if it means different things there, split it");
            }
        }
        for (Concept f : v.facets()) {
            if (f.facet().valueKind() != ValueKind.TERM) {
                continue; // number and yes/no facets need no concept values
            }
            int n = v.valuesOf(f.id()).size();
            if (n <= 1) {
                add(Rule.FACET_SINGLE_VALUE, List.of(f.id()), "",
                        "facet " + q(f.id()) + (n == 0 ? " has no values" : " has only one value"),
                        n == 0 ? "add values, or delete the facet" : "add the other values shoppers choose between, "
                                + "or make it a yes/no facet");
            }
        }
    }

    private void nearDuplicates() {
        TreeMap<String, TreeMap<String, TreeSet<String>>> groups = new TreeMap<>(); // key → concept → label texts
        for (Concept c : v.allConcepts()) {
            for (ConceptLabel l : c.labels()) {
                String k = l.lang() + "|" + variantKey(l.text(), l.lang());
                groups.computeIfAbsent(k, x -> new TreeMap<>()).computeIfAbsent(c.id(), x -> new TreeSet<>()).add(l.text());
            }
        }
        for (Map.Entry<String, TreeMap<String, TreeSet<String>>> g : groups.entrySet()) {
            TreeMap<String, TreeSet<String>> byConcept = g.getValue();
            if (byConcept.size() < 2) {
                continue;
            }
            TreeSet<String> texts = new TreeSet<>();
            byConcept.values().forEach(texts::addAll);
            if (texts.size() < 2) {
                continue; // the very same text: reported as a shared or ambiguous label
            }
            List<String> names = new ArrayList<>();
            byConcept.forEach((id, ts) -> names.add(q(id) + " has \"" + String.join("\", \"", ts) + "\""));
            add(Rule.NEAR_DUPLICATE_LABELS, byConcept.keySet(), g.getKey(),
                    "labels that differ only in case, hyphens, spacing or plural belong to different concepts: "
                            + String.join("; ", names),
                    "if the concepts mean the same, merge them; if not, make the labels clearly different");
        }
    }

    /** Case, hyphens, spacing and (for English) regular plural folded away. */
    static String variantKey(String text, String lang) {
        String t = Normalizer.normalize(text, Normalizer.Form.NFKC).toLowerCase(Locale.ROOT);
        String[] tokens = t.split("[\\s\\p{Pd}_]+");
        StringBuilder sb = new StringBuilder();
        for (String tok : tokens) {
            sb.append(lang.startsWith("en") ? singular(tok) : tok);
        }
        return sb.toString();
    }

    /** The token with a regular English plural ending removed (Lucene's minimal "S-stemmer", after Harman 1991). */
    static String singular(String token) {
        char[] buf = token.toCharArray();
        int n = new EnglishMinimalStemmer().stem(buf, buf.length);
        return new String(buf, 0, n);
    }

    private void singularPlural() {
        for (Concept f : v.facets()) {
            if (f.facet().valueKind() != ValueKind.TERM) {
                continue;
            }
            TreeMap<String, String> plural = new TreeMap<>();
            TreeMap<String, String> single = new TreeMap<>();
            for (Concept c : v.valuesOf(f.id())) {
                String p = c.prefLabels().get(v.defaultLanguage());
                if (p == null || !v.defaultLanguage().startsWith("en")) {
                    continue;
                }
                String[] toks = Terms.normalise(p).split(" ");
                String head = toks[toks.length - 1];
                if (head.length() <= 3 || !head.chars().allMatch(Character::isLetter)) {
                    continue;
                }
                (singular(head).equals(head) ? single : plural).put(c.id(), p);
            }
            if (plural.isEmpty() || single.isEmpty()) {
                continue;
            }
            TreeMap<String, String> minority = plural.size() <= single.size() ? plural : single;
            boolean minorityPlural = minority == plural;
            add(Rule.SINGULAR_PLURAL, minority.keySet(), f.id(),
                    "facet " + q(f.id()) + " mixes plural values (\"" + String.join("\", \"", plural.values())
                            + "\") with singular ones (\"" + String.join("\", \"", single.values()) + "\")",
                    "Z39.19 advises the plural for things one counts (pockets, zippers) and the singular for "
                            + "materials, substances and properties (nylon, down, waterproofing); if the "
                            + (minorityPlural ? "plural" : "singular") + " values here are the same kind as the rest, "
                            + "change their number; if the facet mixes kinds, that is fine (this is advice, "
                            + "judged from word endings only)");
        }
    }

    private void regulated() {
        for (Concept f : v.facets()) {
            if (f.facet().regulatedClaim()) {
                add(Rule.REGULATED_CLAIM, List.of(f.id()), "",
                        "facet " + q(f.id()) + " is a regulated or safety claim: mined labels are not verified product claims",
                        "have its values reviewed against the applicable labelling rules before they ship");
            }
        }
    }
}
