package dev.sheaf.vocab.diff;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import dev.sheaf.vocab.Concept;
import dev.sheaf.vocab.ConceptLabel;
import dev.sheaf.vocab.Decision;
import dev.sheaf.vocab.FacetProperties;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.LabelKind;
import dev.sheaf.vocab.Mapping;
import dev.sheaf.vocab.Retired;
import dev.sheaf.vocab.Vocabulary;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * What changed between two versions of a vocabulary. Concepts are matched by id, never by label:
 * a rename is a changed preferred label on the same id, a merge is an id that became retired
 * "replaced by" another, a split is a new concept whose split origin is a concept of the old
 * version. Consequences of a merge or split (labels arriving on the target, references rewired)
 * are folded into that one entry.
 */
public final class VocabularyDiff {
    private static final String[] SECTIONS = {"Added", "Removed", "Renamed", "Merged", "Split", "Moved", "Labels",
            "Other changes", "Candidate decisions"};

    private final Vocabulary before;
    private final Vocabulary after;
    private final List<Change> changes;

    private VocabularyDiff(Vocabulary before, Vocabulary after, List<Change> changes) {
        this.before = before;
        this.after = after;
        this.changes = List.copyOf(changes);
    }

    /** The changes from {@code before} to {@code after}. */
    public static VocabularyDiff between(Vocabulary before, Vocabulary after) {
        return new VocabularyDiff(before, after, new Differ(before, after).run());
    }

    public List<Change> changes() {
        return changes;
    }

    public boolean isEmpty() {
        return changes.isEmpty();
    }

    /** Changes of one kind. */
    public <T extends Change> List<T> of(Class<T> kind) {
        List<T> out = new ArrayList<>();
        for (Change c : changes) {
            if (kind.isInstance(c)) {
                out.add(kind.cast(c));
            }
        }
        return out;
    }

    // ------------------------------------------------------------------ rendering

    /** Plain text, one line per change, grouped by kind. */
    public String toText() {
        StringBuilder sb = new StringBuilder();
        sb.append(summary()).append('\n');
        for (String section : SECTIONS) {
            List<String> lines = lines(section, false);
            if (!lines.isEmpty()) {
                sb.append('\n').append(section).append(":\n");
                lines.forEach(l -> sb.append("  ").append(l).append('\n'));
            }
        }
        return sb.toString();
    }

    /** A changelog a merchandiser can paste into a release note. */
    public String toMarkdown() {
        StringBuilder sb = new StringBuilder();
        sb.append("## Vocabulary changes: ").append(md(after.scheme().title())).append("\n\n");
        sb.append(summary()).append('\n');
        for (String section : SECTIONS) {
            List<String> lines = lines(section, true);
            if (!lines.isEmpty()) {
                sb.append("\n### ").append(section).append("\n\n");
                lines.forEach(l -> sb.append("- ").append(l).append('\n'));
            }
        }
        return sb.toString();
    }

    /** JSON: {"summary", "counts": {kind: n}, "changes": [{"kind", ...}]}. */
    public String toJson() {
        ObjectMapper om = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
        ObjectNode root = om.createObjectNode();
        root.put("summary", summary());
        ObjectNode counts = root.putObject("counts");
        for (Map.Entry<String, Integer> e : counts().entrySet()) {
            counts.put(e.getKey(), e.getValue());
        }
        ArrayNode arr = root.putArray("changes");
        for (Change c : changes) {
            ObjectNode n = arr.addObject();
            n.put("kind", kind(c));
            if (c instanceof Change.Added) {
                Change.Added a = (Change.Added) c;
                n.put("id", a.id()).put("label", a.label()).put("facet", a.facet());
                a.under().forEach(n.putArray("under")::add);
            } else if (c instanceof Change.Removed) {
                Change.Removed r = (Change.Removed) c;
                n.put("id", r.id()).put("label", r.label()).put("facet", r.facet());
            } else if (c instanceof Change.Renamed) {
                Change.Renamed r = (Change.Renamed) c;
                n.put("id", r.id()).put("lang", r.lang()).put("from", r.from()).put("to", r.to());
            } else if (c instanceof Change.Merged) {
                Change.Merged m = (Change.Merged) c;
                n.put("id", m.id()).put("label", m.label()).put("into", m.intoId()).put("intoLabel", m.intoLabel());
            } else if (c instanceof Change.Split) {
                Change.Split s = (Change.Split) c;
                n.put("id", s.id()).put("label", s.label()).put("newId", s.newId()).put("newLabel", s.newLabel());
                s.movedLabels().forEach(n.putArray("movedLabels")::add);
            } else if (c instanceof Change.Moved) {
                Change.Moved m = (Change.Moved) c;
                n.put("id", m.id()).put("label", m.label());
                m.from().forEach(n.putArray("from")::add);
                m.to().forEach(n.putArray("to")::add);
            } else if (c instanceof Change.LabelsChanged) {
                Change.LabelsChanged l = (Change.LabelsChanged) c;
                n.put("id", l.id()).put("label", l.label());
                ArrayNode add = n.putArray("added");
                l.added().forEach(x -> add.addObject().put("kind", x.kind().skosName()).put("lang", x.lang()).put("text", x.text()));
                ArrayNode rem = n.putArray("removed");
                l.removed().forEach(x -> rem.addObject().put("kind", x.kind().skosName()).put("lang", x.lang()).put("text", x.text()));
            } else if (c instanceof Change.Changed) {
                Change.Changed x = (Change.Changed) c;
                n.put("id", x.id()).put("label", x.label()).put("what", x.what()).put("before", x.before()).put("after", x.after());
            } else {
                Change.DecisionChanged d = (Change.DecisionChanged) c;
                n.put("term", d.term()).put("before", d.before()).put("after", d.after());
            }
        }
        try {
            return om.writeValueAsString(root) + "\n";
        } catch (JsonProcessingException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Count per kind (added, removed, renamed, merged, split, moved, labels, changed, decision). */
    public Map<String, Integer> counts() {
        Map<String, Integer> m = new LinkedHashMap<>();
        for (String k : List.of("added", "removed", "renamed", "merged", "split", "moved", "labels", "changed", "decision")) {
            m.put(k, 0);
        }
        changes.forEach(c -> m.merge(kind(c), 1, Integer::sum));
        return m;
    }

    /** "3 added, 1 renamed, 1 merged" (kinds with none left out), or "no changes". */
    public String summary() {
        List<String> parts = new ArrayList<>();
        counts().forEach((k, n) -> {
            if (n > 0) {
                parts.add(n + " " + (k.equals("labels") ? "with label changes" : k.equals("decision")
                        ? "candidate decision" + (n == 1 ? "" : "s") : k));
            }
        });
        return parts.isEmpty() ? "no changes" : String.join(", ", parts);
    }

    private static String kind(Change c) {
        if (c instanceof Change.Added) {
            return "added";
        }
        if (c instanceof Change.Removed) {
            return "removed";
        }
        if (c instanceof Change.Renamed) {
            return "renamed";
        }
        if (c instanceof Change.Merged) {
            return "merged";
        }
        if (c instanceof Change.Split) {
            return "split";
        }
        if (c instanceof Change.Moved) {
            return "moved";
        }
        if (c instanceof Change.LabelsChanged) {
            return "labels";
        }
        if (c instanceof Change.Changed) {
            return "changed";
        }
        return "decision";
    }

    private List<String> lines(String section, boolean markdown) {
        List<String> out = new ArrayList<>();
        for (Change c : changes) {
            String s = line(section, c, markdown);
            if (s != null) {
                out.add(s);
            }
        }
        return out;
    }

    private String line(String section, Change c, boolean md) {
        switch (section) {
            case "Added":
                if (c instanceof Change.Added) {
                    Change.Added a = (Change.Added) c;
                    return name(a.label(), a.id(), md) + (a.facet() ? " (new facet)" : a.under().isEmpty() ? ""
                            : " under " + names(a.under(), md));
                }
                return null;
            case "Removed":
                if (c instanceof Change.Removed) {
                    Change.Removed r = (Change.Removed) c;
                    return name(r.label(), r.id(), md) + (r.facet() ? " (facet)" : "")
                            + (after.retired(r.id()).isPresent() ? "; its id stays reserved" : "");
                }
                return null;
            case "Renamed":
                if (c instanceof Change.Renamed) {
                    Change.Renamed r = (Change.Renamed) c;
                    return name(r.from(), null, md) + " → " + name(r.to(), r.id(), md)
                            + (r.lang().equals(after.defaultLanguage()) ? "" : " [" + r.lang() + "]");
                }
                return null;
            case "Merged":
                if (c instanceof Change.Merged) {
                    Change.Merged m = (Change.Merged) c;
                    return name(m.label(), m.id(), md) + " merged into " + name(m.intoLabel(), m.intoId(), md)
                            + "; its labels now lead there";
                }
                return null;
            case "Split":
                if (c instanceof Change.Split) {
                    Change.Split s = (Change.Split) c;
                    return name(s.newLabel(), s.newId(), md) + " split off " + name(s.label(), s.id(), md)
                            + " with " + quoted(s.movedLabels(), md);
                }
                return null;
            case "Moved":
                if (c instanceof Change.Moved) {
                    Change.Moved m = (Change.Moved) c;
                    return name(m.label(), m.id(), md) + " moved from " + (m.from().isEmpty() ? "the top" : names(m.from(), md))
                            + " to " + (m.to().isEmpty() ? "the top" : names(m.to(), md));
                }
                return null;
            case "Labels":
                if (c instanceof Change.LabelsChanged) {
                    Change.LabelsChanged l = (Change.LabelsChanged) c;
                    List<String> parts = new ArrayList<>();
                    if (!l.added().isEmpty()) {
                        parts.add("added " + labelList(l.added(), md));
                    }
                    if (!l.removed().isEmpty()) {
                        parts.add("removed " + labelList(l.removed(), md));
                    }
                    return name(l.label(), l.id(), md) + ": " + String.join("; ", parts);
                }
                return null;
            case "Other changes":
                if (c instanceof Change.Changed) {
                    Change.Changed x = (Change.Changed) c;
                    return name(x.label(), x.id(), md) + ": " + x.what() + " " + text(x.before(), md) + " → " + text(x.after(), md);
                }
                return null;
            default:
                if (c instanceof Change.DecisionChanged) {
                    Change.DecisionChanged d = (Change.DecisionChanged) c;
                    return "\"" + (md ? md(d.term()) : d.term()) + "\": " + (d.before() == null ? "new" : text(d.before(), md))
                            + " → " + (d.after() == null ? "forgotten" : text(d.after(), md));
                }
                return null;
        }
    }

    private String names(List<String> ids, boolean md) {
        List<String> out = new ArrayList<>();
        for (String id : ids) {
            String label = after.contains(id) ? after.displayLabel(id) : before.displayLabel(id);
            out.add(md ? "*" + md(label) + "*" : label);
        }
        return String.join(", ", out);
    }

    private static String name(String label, String id, boolean md) {
        if (md) {
            return "**" + md(label) + "**";
        }
        return id == null ? "\"" + label + "\"" : "\"" + label + "\" (" + id + ")";
    }

    private static String quoted(List<String> ts, boolean md) {
        List<String> out = new ArrayList<>();
        ts.forEach(t -> out.add("\"" + (md ? md(t) : t) + "\""));
        return String.join(", ", out);
    }

    private static String labelList(List<ConceptLabel> ls, boolean md) {
        List<String> out = new ArrayList<>();
        for (ConceptLabel l : ls) {
            String word = l.kind() == LabelKind.ALTERNATIVE ? "synonym" : l.kind() == LabelKind.HIDDEN ? "hidden variant"
                    : "name";
            out.add(word + " \"" + (md ? md(l.text()) : l.text()) + "\"" + (l.lang().equals("en") ? "" : " [" + l.lang() + "]"));
        }
        return String.join(", ", out);
    }

    private static String text(String s, boolean md) {
        if (s == null || s.isEmpty()) {
            return "(none)";
        }
        String one = s.replace('\n', ' ');
        return md ? md(one) : one;
    }

    /** Escapes Markdown's special characters so labels print as they are. */
    static String md(String s) {
        StringBuilder sb = new StringBuilder();
        for (char ch : s.toCharArray()) {
            if ("\\`*_{}[]()<>#+-.!|~".indexOf(ch) >= 0) {
                sb.append('\\');
            }
            sb.append(ch);
        }
        return sb.toString();
    }

    // ------------------------------------------------------------------ computing

    /** Computes the change list. */
    private static final class Differ {
        private final Vocabulary a;
        private final Vocabulary b;
        private final String lang;
        private final List<Change> out = new ArrayList<>();
        /** old id → id that replaces it in the new version (merges). */
        private final Map<String, String> mergedInto = new TreeMap<>();
        /** labels that arrived on a concept through a merge or left it through a split (not reported again). */
        private final Map<String, Set<Label>> explainedAdds = new TreeMap<>();
        private final Map<String, Set<Label>> explainedRemovals = new TreeMap<>();

        Differ(Vocabulary a, Vocabulary b) {
            this.a = a;
            this.b = b;
            this.lang = b.defaultLanguage();
        }

        List<Change> run() {
            for (Concept c : a.allConcepts()) {
                if (!b.contains(c.id())) {
                    Retired r = b.retired(c.id()).orElse(null);
                    if (r != null && r.replacedBy() != null) {
                        String into = b.resolve(c.id()).map(Concept::id).orElse(r.replacedBy());
                        mergedInto.put(c.id(), into);
                        explainedAdds.computeIfAbsent(into, k -> new HashSet<>()).addAll(allLabels(c));
                        out.add(new Change.Merged(c.id(), label(a, c.id()), into, label(b, into)));
                    } else {
                        out.add(new Change.Removed(c.id(), label(a, c.id()), c.isFacet()));
                    }
                }
            }
            for (Concept c : b.allConcepts()) {
                if (a.contains(c.id())) {
                    continue;
                }
                if (c.splitFrom() != null && a.contains(c.splitFrom())) {
                    List<String> moved = new ArrayList<>();
                    Concept src = a.concept(c.splitFrom()).get();
                    Set<Label> srcLabels = allLabels(src);
                    for (Label l : allLabels(c)) {
                        if (srcLabels.contains(l)) {
                            moved.add(l.text());
                            explainedRemovals.computeIfAbsent(src.id(), k -> new HashSet<>()).add(l);
                        }
                    }
                    out.add(new Change.Split(src.id(), label(a, src.id()), c.id(), label(b, c.id()), moved));
                } else {
                    List<String> under = new ArrayList<>(c.broader());
                    out.add(new Change.Added(c.id(), label(b, c.id()), c.isFacet(), under));
                }
            }
            for (Concept old : a.allConcepts()) {
                Concept now = b.concept(old.id()).orElse(null);
                if (now != null) {
                    compare(old, now);
                }
            }
            decisions();
            out.sort(Comparator.comparing((Change c) -> sortLabel(c).toLowerCase(Locale.ROOT)).thenComparing(Change::id));
            return out;
        }

        private String sortLabel(Change c) {
            if (c instanceof Change.DecisionChanged) {
                return ((Change.DecisionChanged) c).term();
            }
            return b.contains(c.id()) ? label(b, c.id()) : label(a, c.id());
        }

        private void compare(Concept old, Concept now) {
            String id = now.id();
            for (String l : union(old.prefLabels().keySet(), now.prefLabels().keySet())) {
                String x = old.prefLabels().get(l);
                String y = now.prefLabels().get(l);
                if (x != null && y != null && !x.equals(y)) {
                    out.add(new Change.Renamed(id, l, x, y));
                }
            }
            List<ConceptLabel> added = new ArrayList<>();
            List<ConceptLabel> removed = new ArrayList<>();
            Set<ConceptLabel> was = new TreeSet<>(old.labels());
            Set<ConceptLabel> is = new TreeSet<>(now.labels());
            Set<Label> inAdds = explainedAdds.getOrDefault(id, Set.of());
            Set<Label> inRemovals = explainedRemovals.getOrDefault(id, Set.of());
            for (ConceptLabel l : is) {
                if (!was.contains(l) && !inAdds.contains(l.label()) && !renamedPref(old, now, l)) {
                    added.add(l);
                }
            }
            for (ConceptLabel l : was) {
                if (!is.contains(l) && !inRemovals.contains(l.label()) && !renamedPref(old, now, l)) {
                    removed.add(l);
                }
            }
            if (!added.isEmpty() || !removed.isEmpty()) {
                out.add(new Change.LabelsChanged(id, label(b, id), added, removed));
            }
            TreeSet<String> oldBroader = new TreeSet<>(old.broader());
            TreeSet<String> oldRelated = new TreeSet<>(old.related());
            for (Map.Entry<String, String> e : mergedInto.entrySet()) {
                if (e.getValue().equals(id)) { // what a merge brings along is part of the merge
                    Concept merged = a.concept(e.getKey()).get();
                    oldBroader.addAll(merged.broader());
                    oldRelated.addAll(merged.related());
                }
            }
            oldBroader = new TreeSet<>(rewired(oldBroader));
            oldBroader.remove(id);
            if (now.isFacet()) {
                oldBroader.clear();
            }
            if (!oldBroader.equals(now.broader())) {
                out.add(new Change.Moved(id, label(b, id), List.copyOf(old.broader()), List.copyOf(now.broader())));
            }
            oldRelated = new TreeSet<>(rewired(oldRelated));
            oldRelated.remove(id);
            if (!oldRelated.equals(now.related())) {
                out.add(new Change.Changed(id, label(b, id), "related", names(a, old.related()), names(b, now.related())));
            }
            notes(id, "scope note", old.scopeNotes(), now.scopeNotes());
            notes(id, "definition", old.definitions(), now.definitions());
            if (!mappings(old).equals(mappings(now)) && !mergedOnly(old, now)) {
                out.add(new Change.Changed(id, label(b, id), "mappings", mappings(old), mappings(now)));
            }
            if (!Objects.equals(old.facet(), now.facet())) {
                facet(id, old.facet(), now.facet());
            }
        }

        /** Whether a label change on the preferred label is already reported as a rename. */
        private static boolean renamedPref(Concept old, Concept now, ConceptLabel l) {
            if (l.kind() != LabelKind.PREFERRED) {
                return false;
            }
            return old.prefLabels().containsKey(l.lang()) && now.prefLabels().containsKey(l.lang());
        }

        /** Mappings that came with a merge are part of the merge. */
        private boolean mergedOnly(Concept old, Concept now) {
            Set<Mapping> expected = new TreeSet<>(old.mappings());
            for (Map.Entry<String, String> e : mergedInto.entrySet()) {
                if (e.getValue().equals(now.id())) {
                    expected.addAll(a.concept(e.getKey()).get().mappings());
                }
            }
            return expected.equals(now.mappings());
        }

        private Set<String> rewired(Set<String> ids) {
            TreeSet<String> out = new TreeSet<>();
            for (String i : ids) {
                out.add(mergedInto.getOrDefault(i, i));
            }
            return out;
        }

        private void notes(String id, String what, Map<String, String> x, Map<String, String> y) {
            for (String l : union(x.keySet(), y.keySet())) {
                if (!Objects.equals(x.get(l), y.get(l))) {
                    out.add(new Change.Changed(id, label(b, id), what + (l.equals(lang) ? "" : " [" + l + "]"), x.get(l), y.get(l)));
                }
            }
        }

        private void facet(String id, FacetProperties x, FacetProperties y) {
            if (x == null || y == null) {
                out.add(new Change.Changed(id, label(b, id), "kind", x == null ? "value" : "facet", y == null ? "value" : "facet"));
                return;
            }
            diff(id, "value kind", x.valueKind().word(), y.valueKind().word());
            diff(id, "multi-valued", yesNo(x.multiValued()), yesNo(y.multiValued()));
            diff(id, "categories", String.join(", ", x.categories()), String.join(", ", y.categories()));
            diff(id, "unit", x.unit(), y.unit());
            diff(id, "buckets", buckets(x), buckets(y));
            diff(id, "regulated claim", yesNo(x.regulatedClaim()), yesNo(y.regulatedClaim()));
        }

        private void diff(String id, String what, String x, String y) {
            if (!Objects.equals(x, y)) {
                out.add(new Change.Changed(id, label(b, id), what, x, y));
            }
        }

        private static String yesNo(boolean v) {
            return v ? "yes" : "no";
        }

        private static String buckets(FacetProperties f) {
            List<String> out = new ArrayList<>();
            f.buckets().forEach(bk -> out.add(bk.label() + " " + (bk.min() == null ? "" : num(bk.min())) + "–"
                    + (bk.max() == null ? "" : num(bk.max()))));
            return String.join(", ", out);
        }

        private static String num(double d) {
            return d == Math.rint(d) ? Long.toString((long) d) : Double.toString(d);
        }

        private void decisions() {
            Map<String, Decision> x = new TreeMap<>();
            a.decisions().forEach(d -> x.put(d.key(), d));
            Map<String, Decision> y = new TreeMap<>();
            b.decisions().forEach(d -> y.put(d.key(), d));
            for (String k : union(x.keySet(), y.keySet())) {
                String before = describe(x.get(k), a);
                String after = describe(y.get(k), b);
                if (!Objects.equals(before, after)) {
                    String term = y.containsKey(k) ? y.get(k).term() : x.get(k).term();
                    out.add(new Change.DecisionChanged(k, term, before, after));
                }
            }
        }

        private String describe(Decision d, Vocabulary v) {
            if (d == null) {
                return null;
            }
            switch (d.outcome()) {
                case KEPT:
                    String target = mergedInto.getOrDefault(d.concept(), d.concept());
                    return "kept as " + (v == a ? label(b, target) : label(v, d.concept()));
                case DROPPED:
                    return "dropped (" + d.reason() + ")";
                default:
                    return "parked";
            }
        }

        private static Set<Label> allLabels(Concept c) {
            Set<Label> s = new HashSet<>();
            c.labels().forEach(l -> s.add(l.label()));
            return s;
        }

        private static String label(Vocabulary v, String id) {
            return v.displayLabel(id);
        }

        private static String names(Vocabulary v, Set<String> ids) {
            List<String> out = new ArrayList<>();
            ids.forEach(i -> out.add(v.displayLabel(i)));
            return String.join(", ", out);
        }

        private static String mappings(Concept c) {
            List<String> out = new ArrayList<>();
            c.mappings().forEach(m -> out.add(m.kind().skosName() + " " + m.iri()));
            return String.join(", ", out);
        }

        private static TreeSet<String> union(Set<String> x, Set<String> y) {
            TreeSet<String> s = new TreeSet<>(x);
            s.addAll(y);
            return s;
        }
    }
}
