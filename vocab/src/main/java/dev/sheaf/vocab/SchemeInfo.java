package dev.sheaf.vocab;

import java.util.Map;
import java.util.Objects;
import java.util.SortedMap;
import java.util.TreeMap;

/**
 * What a vocabulary says about itself.
 *
 * @param id short name of the scheme ("fernhollow"); same rules as concept ids
 * @param titles title per language
 * @param baseIri the namespace concept IRIs are made in for SKOS (base + id); ends with / or #
 * @param defaultLanguage the language of preferred labels that must exist for every concept
 */
public record SchemeInfo(String id, SortedMap<String, String> titles, String baseIri, String defaultLanguage) {
    public SchemeInfo {
        Concept.checkId(id);
        titles = Concept.langMap(titles, "title");
        baseIri = checkBase(baseIri);
        defaultLanguage = Label.checkLanguage(defaultLanguage);
    }

    /** A scheme with the default base IRI ({@code https://sheaf.dev/vocab/ID/}) and language {@code en}. */
    public static SchemeInfo of(String id, String title) {
        Map<String, String> t = title == null ? Map.of() : Map.of(Label.DEFAULT_LANGUAGE, title);
        return new SchemeInfo(id, new TreeMap<>(t), defaultBase(id), Label.DEFAULT_LANGUAGE);
    }

    /** The base IRI a scheme gets when none is set. */
    public static String defaultBase(String id) {
        return "https://sheaf.dev/vocab/" + id + "/";
    }

    public SchemeInfo withBaseIri(String base) {
        return new SchemeInfo(id, titles, base, defaultLanguage);
    }

    public SchemeInfo withTitle(String lang, String title) {
        TreeMap<String, String> t = new TreeMap<>(titles);
        if (title == null) {
            t.remove(Label.checkLanguage(lang));
        } else {
            t.put(Label.checkLanguage(lang), title);
        }
        return new SchemeInfo(id, t, baseIri, defaultLanguage);
    }

    /** The title in the default language, else the id. */
    public String title() {
        return titles.getOrDefault(defaultLanguage, id);
    }

    /** Checks a base IRI: absolute, ending with / or #. */
    public static String checkBase(String base) {
        Objects.requireNonNull(base, "base IRI");
        Mapping.checkIri(base, "base IRI");
        if (!(base.endsWith("/") || base.endsWith("#"))) {
            throw new IllegalArgumentException("base IRI \"" + base + "\" must end with / or # so that concept ids can be appended");
        }
        return base;
    }
}
