package dev.sheaf.vocab;

import java.util.Comparator;
import java.util.Locale;
import java.util.Objects;
import java.util.regex.Pattern;

/**
 * A label: text in a language. The language is a BCP 47 tag kept in lower case ({@code en},
 * {@code en-gb}); labels compare by language, then by text in UTF-16 code-unit order (the order
 * the vocabulary file is written in, independent of locale).
 *
 * @param text the label as shown; not blank, no surrounding whitespace, no line breaks
 * @param lang language tag, lower case
 */
public record Label(String text, String lang) implements Comparable<Label> {
    /** The language a label gets when none is named. */
    public static final String DEFAULT_LANGUAGE = "en";

    private static final Pattern LANG = Pattern.compile("[a-z]{2,3}(-[a-z0-9]{1,8})*");
    private static final Comparator<Label> ORDER = Comparator.comparing(Label::lang).thenComparing(Label::text);

    public Label {
        text = checkText(text, "label");
        lang = checkLanguage(lang);
    }

    /** A label in the default language ({@value #DEFAULT_LANGUAGE}). */
    public static Label of(String text) {
        return new Label(text, DEFAULT_LANGUAGE);
    }

    public static Label of(String text, String lang) {
        return new Label(text, lang);
    }

    /** Validates and lower-cases a language tag; throws with the rule when it is not one. */
    public static String checkLanguage(String lang) {
        Objects.requireNonNull(lang, "language tag");
        String l = lang.toLowerCase(Locale.ROOT);
        if (!LANG.matcher(l).matches()) {
            throw new IllegalArgumentException("language tag \"" + lang
                    + "\" is not a BCP 47 tag such as en, de or en-GB");
        }
        return l;
    }

    static String checkText(String text, String what) {
        Objects.requireNonNull(text, what);
        if (text.isBlank()) {
            throw new IllegalArgumentException(what + " is blank; give the words it should show");
        }
        if (!text.strip().equals(text)) {
            throw new IllegalArgumentException(what + " \"" + text + "\" has spaces at its start or end; remove them");
        }
        for (int i = 0; i < text.length(); i++) {
            if (Character.isISOControl(text.charAt(i))) {
                throw new IllegalArgumentException(what + " \"" + text.replaceAll("\\p{Cntrl}", "?")
                        + "\" holds a control character (line break, tab ...) at index " + i + "; labels are one line");
            }
        }
        return text;
    }

    @Override
    public int compareTo(Label o) {
        return ORDER.compare(this, o);
    }

    /** {@code "text"@lang}, the way SKOS files and messages show a label. */
    @Override
    public String toString() {
        return "\"" + text + "\"@" + lang;
    }
}
