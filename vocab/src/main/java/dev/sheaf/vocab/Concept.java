package dev.sheaf.vocab;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.SortedMap;
import java.util.SortedSet;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.regex.Pattern;

/**
 * A concept: a value (ripstop nylon) or a narrower value, or — when {@link #facet} is set — a facet
 * (material), which is a top concept of the scheme. Immutable; change it through {@link Edit}s.
 *
 * <p>The record checks shape only (ids, label syntax, facets have no broader). Whether labels
 * collide, references dangle or the hierarchy loops is for {@link VocabularyChecker}, so a
 * hand-edited file with such problems can still be loaded and checked.
 *
 * @param id stable id that survives renames: letters, digits and {@code . _ ~ -}, starting with a letter or digit
 * @param prefLabels preferred label per language
 * @param altLabels alternative labels (synonyms, variants)
 * @param hiddenLabels hidden labels (misspellings): matched, never shown
 * @param scopeNotes scope note per language
 * @param definitions definition per language
 * @param broader ids of broader concepts (several are allowed)
 * @param related ids of related concepts (kept symmetric by the edits)
 * @param mappings links to concepts of other schemes
 * @param provenance where it came from, or null
 * @param splitFrom the id of the concept it was split from, or null
 * @param facet facet properties when this concept is a facet, null for values
 */
public record Concept(String id,
                      SortedMap<String, String> prefLabels,
                      SortedSet<Label> altLabels,
                      SortedSet<Label> hiddenLabels,
                      SortedMap<String, String> scopeNotes,
                      SortedMap<String, String> definitions,
                      SortedSet<String> broader,
                      SortedSet<String> related,
                      SortedSet<Mapping> mappings,
                      Provenance provenance,
                      String splitFrom,
                      FacetProperties facet) {

    private static final Pattern ID = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._~-]{0,199}");

    public Concept {
        checkId(id);
        SortedMap<String, String> prefs = new TreeMap<>();
        if (prefLabels != null) {
            prefLabels.forEach((lang, text) -> prefs.put(Label.checkLanguage(lang), new Label(text, lang).text()));
        }
        prefLabels = Collections.unmodifiableSortedMap(prefs);
        altLabels = labels(altLabels);
        hiddenLabels = labels(hiddenLabels);
        scopeNotes = notes(scopeNotes, "scope note");
        definitions = notes(definitions, "definition");
        broader = ids(broader, "broader");
        related = ids(related, "related");
        if (related.contains(id)) {
            throw new IllegalArgumentException("concept " + id + " is related to itself");
        }
        mappings = Collections.unmodifiableSortedSet(new TreeSet<>(mappings == null ? List.of() : mappings));
        if (splitFrom != null) {
            checkId(splitFrom);
        }
        if (facet != null && !broader.isEmpty()) {
            throw new IllegalArgumentException("facet " + id + " has broader concepts " + broader
                    + "; a facet is a top concept of the scheme, so move its broader links to a value instead");
        }
    }

    /** Checks a concept id; throws with the rule when it is not one. */
    public static String checkId(String id) {
        Objects.requireNonNull(id, "concept id");
        if (!ID.matcher(id).matches()) {
            throw new IllegalArgumentException("concept id \"" + id + "\" must be 1-200 characters: letters, digits and . _ ~ -"
                    + ", starting with a letter or digit (e.g. ripstop-nylon)");
        }
        return id;
    }

    public static Builder builder(String id) {
        return new Builder(id);
    }

    /** A builder holding this concept's values, to make a changed copy. */
    public Builder toBuilder() {
        Builder b = new Builder(id);
        b.prefLabels.putAll(prefLabels);
        b.altLabels.addAll(altLabels);
        b.hiddenLabels.addAll(hiddenLabels);
        b.scopeNotes.putAll(scopeNotes);
        b.definitions.putAll(definitions);
        b.broader.addAll(broader);
        b.related.addAll(related);
        b.mappings.addAll(mappings);
        b.provenance = provenance;
        b.splitFrom = splitFrom;
        b.facet = facet;
        return b;
    }

    /** Whether this concept is a facet (a top concept with facet properties). */
    public boolean isFacet() {
        return facet != null;
    }

    public Optional<String> prefLabel(String lang) {
        return Optional.ofNullable(prefLabels.get(Label.checkLanguage(lang)));
    }

    /** The preferred label in {@code lang}, else in any language (first by tag), else the id. */
    public String displayLabel(String lang) {
        String p = prefLabels.get(lang);
        if (p != null) {
            return p;
        }
        return prefLabels.isEmpty() ? id : prefLabels.get(prefLabels.firstKey());
    }

    /** The preferred labels as {@link Label}s. */
    public SortedSet<Label> prefLabelSet() {
        TreeSet<Label> s = new TreeSet<>();
        prefLabels.forEach((lang, text) -> s.add(new Label(text, lang)));
        return Collections.unmodifiableSortedSet(s);
    }

    /** The labels of one kind. */
    public SortedSet<Label> labels(LabelKind kind) {
        switch (kind) {
            case PREFERRED:
                return prefLabelSet();
            case ALTERNATIVE:
                return altLabels;
            default:
                return hiddenLabels;
        }
    }

    /** Every label with its kind: preferred first, then alternative, then hidden; each by language, then text. */
    public List<ConceptLabel> labels() {
        List<ConceptLabel> out = new ArrayList<>();
        for (LabelKind k : LabelKind.values()) {
            for (Label l : labels(k)) {
                out.add(new ConceptLabel(k, l));
            }
        }
        return Collections.unmodifiableList(out);
    }

    /** Every label in one language, with its kind. */
    public List<ConceptLabel> labels(String lang) {
        String l = Label.checkLanguage(lang);
        List<ConceptLabel> out = new ArrayList<>();
        for (ConceptLabel cl : labels()) {
            if (cl.lang().equals(l)) {
                out.add(cl);
            }
        }
        return Collections.unmodifiableList(out);
    }

    /** The kinds under which this concept carries {@code label} (more than one is an S13 violation). */
    public List<LabelKind> kindsOf(Label label) {
        List<LabelKind> out = new ArrayList<>();
        if (label.text().equals(prefLabels.get(label.lang()))) {
            out.add(LabelKind.PREFERRED);
        }
        if (altLabels.contains(label)) {
            out.add(LabelKind.ALTERNATIVE);
        }
        if (hiddenLabels.contains(label)) {
            out.add(LabelKind.HIDDEN);
        }
        return out;
    }

    private static SortedSet<Label> labels(Collection<Label> in) {
        TreeSet<Label> s = new TreeSet<>();
        if (in != null) {
            for (Label l : in) {
                s.add(Objects.requireNonNull(l, "label"));
            }
        }
        return Collections.unmodifiableSortedSet(s);
    }

    private static SortedMap<String, String> notes(Map<String, String> in, String what) {
        SortedMap<String, String> m = new TreeMap<>();
        if (in != null) {
            in.forEach((lang, text) -> {
                Objects.requireNonNull(text, what);
                String t = text.strip();
                if (t.isEmpty()) {
                    throw new IllegalArgumentException(what + " in " + lang + " is blank; leave it out instead");
                }
                m.put(Label.checkLanguage(lang), t);
            });
        }
        return Collections.unmodifiableSortedMap(m);
    }

    static SortedMap<String, String> langMap(Map<String, String> in, String what) {
        SortedMap<String, String> m = new TreeMap<>();
        if (in != null) {
            in.forEach((lang, text) -> m.put(Label.checkLanguage(lang), Label.checkText(text, what)));
        }
        return Collections.unmodifiableSortedMap(m);
    }

    private static SortedSet<String> ids(Collection<String> in, String what) {
        TreeSet<String> s = new TreeSet<>();
        if (in != null) {
            for (String i : in) {
                s.add(checkId(i));
            }
        }
        return Collections.unmodifiableSortedSet(s);
    }

    /** Collects a concept's values; {@link #build()} validates them. */
    public static final class Builder {
        private String id;
        private final SortedMap<String, String> prefLabels = new TreeMap<>();
        private final SortedSet<Label> altLabels = new TreeSet<>();
        private final SortedSet<Label> hiddenLabels = new TreeSet<>();
        private final SortedMap<String, String> scopeNotes = new TreeMap<>();
        private final SortedMap<String, String> definitions = new TreeMap<>();
        private final SortedSet<String> broader = new TreeSet<>();
        private final SortedSet<String> related = new TreeSet<>();
        private final SortedSet<Mapping> mappings = new TreeSet<>();
        private Provenance provenance;
        private String splitFrom;
        private FacetProperties facet;

        private Builder(String id) {
            this.id = id;
        }

        public Builder id(String newId) {
            this.id = newId;
            return this;
        }

        /** Sets the preferred label in the label's language. */
        public Builder prefLabel(Label l) {
            prefLabels.put(l.lang(), l.text());
            return this;
        }

        /** Sets the preferred label in the default language. */
        public Builder prefLabel(String text) {
            return prefLabel(Label.of(text));
        }

        public Builder removePrefLabel(String lang) {
            prefLabels.remove(Label.checkLanguage(lang));
            return this;
        }

        public Builder altLabel(Label l) {
            altLabels.add(l);
            return this;
        }

        public Builder altLabel(String text) {
            return altLabel(Label.of(text));
        }

        public Builder hiddenLabel(Label l) {
            hiddenLabels.add(l);
            return this;
        }

        public Builder hiddenLabel(String text) {
            return hiddenLabel(Label.of(text));
        }

        /** Adds a label of the given kind (preferred replaces the one in that language). */
        public Builder label(LabelKind kind, Label l) {
            switch (kind) {
                case PREFERRED:
                    return prefLabel(l);
                case ALTERNATIVE:
                    return altLabel(l);
                default:
                    return hiddenLabel(l);
            }
        }

        /** Removes a label of the given kind; returns whether it was there. */
        public boolean removeLabel(LabelKind kind, Label l) {
            switch (kind) {
                case PREFERRED:
                    return prefLabels.remove(l.lang(), l.text());
                case ALTERNATIVE:
                    return altLabels.remove(l);
                default:
                    return hiddenLabels.remove(l);
            }
        }

        public Builder scopeNote(String lang, String text) {
            put(scopeNotes, lang, text);
            return this;
        }

        public Builder scopeNote(String text) {
            return scopeNote(Label.DEFAULT_LANGUAGE, text);
        }

        public Builder definition(String lang, String text) {
            put(definitions, lang, text);
            return this;
        }

        public Builder definition(String text) {
            return definition(Label.DEFAULT_LANGUAGE, text);
        }

        public Builder broader(String... ids) {
            broader.addAll(List.of(ids));
            return this;
        }

        public Builder broader(Collection<String> ids) {
            broader.addAll(ids);
            return this;
        }

        public Builder clearBroader() {
            broader.clear();
            return this;
        }

        public Builder removeBroader(String bid) {
            broader.remove(bid);
            return this;
        }

        public Builder related(String... ids) {
            related.addAll(List.of(ids));
            return this;
        }

        public Builder related(Collection<String> ids) {
            related.addAll(ids);
            return this;
        }

        public Builder removeRelated(String rid) {
            related.remove(rid);
            return this;
        }

        public Builder mapping(Mapping m) {
            mappings.add(m);
            return this;
        }

        public Builder mappings(Collection<Mapping> ms) {
            mappings.clear();
            mappings.addAll(ms);
            return this;
        }

        public Builder provenance(Provenance p) {
            this.provenance = p;
            return this;
        }

        public Builder splitFrom(String sid) {
            this.splitFrom = sid;
            return this;
        }

        /** Makes this concept a facet with these properties (null makes it a value again). */
        public Builder facet(FacetProperties p) {
            this.facet = p;
            return this;
        }

        SortedMap<String, String> prefLabels() {
            return prefLabels;
        }

        SortedSet<Label> altLabels() {
            return altLabels;
        }

        SortedSet<Label> hiddenLabels() {
            return hiddenLabels;
        }

        SortedSet<String> broaderIds() {
            return broader;
        }

        SortedSet<String> relatedIds() {
            return related;
        }

        SortedSet<Mapping> mappingSet() {
            return mappings;
        }

        SortedMap<String, String> scopeNotes() {
            return scopeNotes;
        }

        SortedMap<String, String> definitions() {
            return definitions;
        }

        public Concept build() {
            return new Concept(id, prefLabels, altLabels, hiddenLabels, scopeNotes, definitions, broader, related,
                    mappings, provenance, splitFrom, facet);
        }

        private static void put(SortedMap<String, String> m, String lang, String text) {
            String l = Label.checkLanguage(lang);
            if (text == null) {
                m.remove(l);
            } else {
                m.put(l, text);
            }
        }
    }
}
