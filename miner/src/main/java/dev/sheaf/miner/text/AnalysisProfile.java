package dev.sheaf.miner.text;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.SortedSet;
import java.util.TreeSet;
import org.apache.lucene.analysis.CharArraySet;
import org.apache.lucene.analysis.en.EnglishAnalyzer;

/**
 * How field text becomes tokens: an immutable, validated configuration with named presets and a
 * JSON file form. Every setting has a default taken from the {@code default} preset.
 *
 * <p>Settings and their defaults (preset {@code default}):
 * <ul>
 *   <li>{@code tokenizer} — {@code standard} (Lucene's UAX#29 word breaking; keeps {@code 10,000} and
 *       {@code 1.2} whole) or {@code classic}.</li>
 *   <li>{@code maxTokenLength} — 255 chars; longer runs are skipped and act as a boundary.</li>
 *   <li>{@code asciiFolding} — {@code true}: {@code café} and {@code cafe} are one term.</li>
 *   <li>{@code possessives} — {@code true}: {@code men's} becomes {@code men}.</li>
 *   <li>{@code stopWords} — {@link #TRADE_STOP_WORDS}, Lucene's English list reviewed for this trade:
 *       "no" and "not" moved to the negation words, function words common in product copy added,
 *       and words that are attributes in outdoor gear ("down", "up", "off", "over", "out", "all" …)
 *       never stopped. {@code "lucene"} selects Lucene's list unchanged, {@code "none"}
 *       none. {@code addStopWords} and {@code keepWords} adjust the chosen list.</li>
 *   <li>{@code negationWords} — {@link #NEGATION_WORDS}: kept in the Lucene token stream with type
 *       {@link Analysis#TYPE_NEGATION} even when the stop list holds them, so labeling and feedback can
 *       see them; the miner treats them as boundaries.</li>
 *   <li>{@code numbers} — {@code split-units}: {@code 1.2kg} becomes {@code 1.2} + {@code kg} (as if
 *       written {@code 1.2 kg}) when the letters are one of {@code units}; a unit word right after a
 *       number is typed {@link Analysis#TYPE_UNIT} and never stopped ({@code 10 in}). {@code keep}
 *       leaves tokens as the tokenizer made them.</li>
 *   <li>{@code units} — {@link #DEFAULT_UNITS}; {@code addUnits} extends them.</li>
 *   <li>{@code breakCharacters} — {@value #DEFAULT_BREAKS_DISPLAY} plus line breaks: a gap between two
 *       tokens holding one of these ends a segment (a sentence or a list item), so no n-gram
 *       crosses it.</li>
 * </ul>
 * Words in lists are lower-cased with {@link Locale#ROOT} (and folded when {@code asciiFolding} is on)
 * and must each be exactly one token.
 */
public final class AnalysisProfile {

    /** The format name written into and expected in profile files. */
    public static final String FORMAT = "sheaf-analysis-profile";
    public static final int FORMAT_VERSION = 1;

    /** Which Lucene tokenizer splits the text. */
    public enum TokenizerKind {
        /** {@code org.apache.lucene.analysis.standard.StandardTokenizer} (Unicode UAX#29 word breaks). */
        STANDARD,
        /** {@code org.apache.lucene.analysis.classic.ClassicTokenizer} (keeps product codes such as {@code FH-1234} whole). */
        CLASSIC;

        public String label() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** What happens to numbers glued to units. */
    public enum Numbers {
        /** {@code 1.2kg} → {@code 1.2} {@code kg}; unit words after numbers are never stopped. */
        SPLIT_UNITS,
        /** Tokens stay as the tokenizer made them. */
        KEEP;

        public String label() {
            return name().toLowerCase(Locale.ROOT).replace('_', '-');
        }
    }

    /**
     * Lucene's English stop words ({@link EnglishAnalyzer#ENGLISH_STOP_WORDS_SET}) minus "no" and
     * "not" (negations, kept apart), plus function words common in product copy. Deliberately absent:
     * down, up, off, over, out, all, under, through, around, about, more, less, most, very, too,
     * only, extra, free, non — attributes or hedges here ("800-fill down", "zip-off", "all-season",
     * "non-slip", "PFC-free", "more breathable"). "on" stays stopped: in product copy it is nearly
     * always the preposition ("on the trail"), and "slip-on" is rare enough to be missed.
     */
    public static final SortedSet<String> TRADE_STOP_WORDS = Collections.unmodifiableSortedSet(new TreeSet<>(List.of(
            // Lucene's list, less "no" and "not"
            "a", "an", "and", "are", "as", "at", "be", "but", "by", "for", "if", "in", "into", "is", "it",
            "of", "on", "or", "such", "that", "the", "their", "then", "there", "these", "they", "this", "to",
            "was", "will", "with",
            // function words of product copy
            "from", "your", "yours", "you", "you're", "you'll", "you've", "our", "ours", "we", "we're",
            "we've", "us", "its", "it'll", "has", "have", "had", "can", "so", "than", "which", "who",
            "whom", "whose", "what", "when", "where", "while", "how", "why", "also", "been", "being",
            "do", "does", "did", "were", "am", "he", "she", "his", "her", "him", "them", "those",
            "here", "i", "i'm", "i've", "me", "my", "would", "should", "could", "may", "might",
            "must", "shall", "they're", "yet", "whether", "because")));

    /** Negation cues, never stopped, typed {@link Analysis#TYPE_NEGATION}. Curly-apostrophe forms are added automatically. */
    public static final SortedSet<String> NEGATION_WORDS = Collections.unmodifiableSortedSet(new TreeSet<>(List.of(
            "no", "not", "without", "never", "none", "nor", "cannot", "don't", "doesn't", "didn't",
            "isn't", "aren't", "wasn't", "weren't", "won't", "can't", "couldn't", "shouldn't",
            "wouldn't", "hasn't", "haven't")));

    /** Unit symbols split off a glued number ({@code 20l} → {@code 20 l}) and protected after numbers. */
    public static final SortedSet<String> DEFAULT_UNITS = Collections.unmodifiableSortedSet(new TreeSet<>(List.of(
            "mg", "g", "kg", "oz", "lb", "lbs", "mm", "cm", "m", "km", "in", "inch", "inches", "ft", "yd",
            "ml", "cl", "l", "floz", "gal", "qt", "c", "f", "k", "lm", "mah", "wh", "w", "v", "h", "hr",
            "hrs", "min", "s", "sec", "d", "fp", "p", "mph", "kph", "gsm", "upf", "ipx4", "ipx7", "ipx8")));

    static final String DEFAULT_BREAKS = ".!?;:,()[]{}|•·…\u2022\n\r";
    static final String DEFAULT_BREAKS_DISPLAY = ". ! ? ; : , ( ) [ ] { } | • · …";
    static final String PLAIN_BREAKS = ".!?\n\r";

    private static final List<String> KEYS = List.of("format", "formatVersion", "name", "base", "tokenizer",
            "maxTokenLength", "asciiFolding", "possessives", "stopWords", "addStopWords", "keepWords",
            "negationWords", "numbers", "units", "addUnits", "breakCharacters");

    private static final Map<String, AnalysisProfile> PRESETS;

    static {
        Map<String, AnalysisProfile> p = new LinkedHashMap<>();
        p.put("default", new Builder("default").build());
        Builder plain = new Builder("plain");
        plain.asciiFolding = false;
        plain.possessives = false;
        plain.stopWords = new TreeSet<>();
        for (Object w : EnglishAnalyzer.ENGLISH_STOP_WORDS_SET) {
            plain.stopWords.add(new String((char[]) w));
        }
        plain.numbers = Numbers.KEEP;
        plain.breakCharacters = PLAIN_BREAKS;
        p.put("plain", plain.build());
        PRESETS = Collections.unmodifiableMap(p);
    }

    private final String name;
    private final TokenizerKind tokenizer;
    private final int maxTokenLength;
    private final boolean asciiFolding;
    private final boolean possessives;
    private final SortedSet<String> stopWords;
    private final SortedSet<String> negationWords;
    private final Numbers numbers;
    private final SortedSet<String> units;
    private final String breakCharacters;

    private AnalysisProfile(Builder b) {
        this.name = b.name;
        this.tokenizer = b.tokenizer;
        this.maxTokenLength = b.maxTokenLength;
        this.asciiFolding = b.asciiFolding;
        this.possessives = b.possessives;
        this.stopWords = Collections.unmodifiableSortedSet(new TreeSet<>(b.stopWords));
        this.negationWords = Collections.unmodifiableSortedSet(new TreeSet<>(b.negationWords));
        this.numbers = b.numbers;
        this.units = Collections.unmodifiableSortedSet(new TreeSet<>(b.units));
        this.breakCharacters = b.breakCharacters;
    }

    /** The preset names: {@code default} (reviewed for outdoor gear) and {@code plain} (Lucene's English list, no folding, no unit splitting). */
    public static Set<String> presetNames() {
        return PRESETS.keySet();
    }

    /** The named preset; {@link IllegalArgumentException} naming the presets when unknown. */
    public static AnalysisProfile preset(String name) {
        AnalysisProfile p = PRESETS.get(name);
        if (p == null) {
            throw new IllegalArgumentException("unknown analysis profile '" + name + "'; the presets are "
                    + String.join(", ", PRESETS.keySet()) + ", or give the path of a profile file (*.json)");
        }
        return p;
    }

    /** The {@code default} preset. */
    public static AnalysisProfile defaults() {
        return PRESETS.get("default");
    }

    /** A preset name or the path of a profile file. */
    public static AnalysisProfile resolve(String presetOrPath) throws IOException {
        if (PRESETS.containsKey(presetOrPath)) {
            return PRESETS.get(presetOrPath);
        }
        Path p = Path.of(presetOrPath);
        if (Files.isRegularFile(p)) {
            return load(p);
        }
        throw new IllegalArgumentException("analysis profile '" + presetOrPath + "' is neither a preset ("
                + String.join(", ", PRESETS.keySet()) + ") nor an existing file; give a preset name or a profile file path");
    }

    /** Reads a profile file (UTF-8 JSON). */
    public static AnalysisProfile load(Path file) throws IOException {
        return fromJson(Files.readString(file, StandardCharsets.UTF_8), file.toString());
    }

    /**
     * Parses the JSON form. Unknown keys are rejected by name; each bad value is reported with the
     * rule, the value found and the fix. {@code where} names the source in messages.
     */
    public static AnalysisProfile fromJson(String json, String where) {
        JsonNode root;
        try {
            root = new ObjectMapper().enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION).readTree(json);
        } catch (JsonProcessingException e) {
            throw new ProfileException(where + ": not valid JSON (" + e.getOriginalMessage() + " at line "
                    + e.getLocation().getLineNr() + "); a profile file is one JSON object, see AnalysisProfile's documentation");
        }
        if (root == null || !root.isObject()) {
            throw new ProfileException(where + ": a profile file must hold one JSON object, found "
                    + (root == null ? "nothing" : root.getNodeType().name().toLowerCase(Locale.ROOT)));
        }
        for (Iterator<String> it = root.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!KEYS.contains(k)) {
                throw new ProfileException(where + ": \"" + k + "\" is not a profile setting; the settings are "
                        + String.join(", ", KEYS) + " — remove it or correct its spelling");
            }
        }
        if (root.has("format") && !FORMAT.equals(root.get("format").asText())) {
            throw new ProfileException(where + ": \"format\" must be \"" + FORMAT + "\", found " + root.get("format")
                    + "; this file is not an analysis profile");
        }
        if (root.has("formatVersion") && root.get("formatVersion").asInt(-1) != FORMAT_VERSION) {
            throw new ProfileException(where + ": \"formatVersion\" must be " + FORMAT_VERSION + ", found "
                    + root.get("formatVersion") + "; this version of Sheaf reads version " + FORMAT_VERSION);
        }
        AnalysisProfile base = defaults();
        if (root.has("base")) {
            String b = text(root, "base", where);
            base = PRESETS.get(b);
            if (base == null) {
                throw new ProfileException(where + ": \"base\" must name a preset (" + String.join(", ", PRESETS.keySet())
                        + "), found \"" + b + "\"");
            }
        }
        Builder bld = base.toBuilder();
        bld.name = root.has("name") ? text(root, "name", where) : fileStem(where);
        if (root.has("tokenizer")) {
            String t = text(root, "tokenizer", where);
            bld.tokenizer = switch (t) {
                case "standard" -> TokenizerKind.STANDARD;
                case "classic" -> TokenizerKind.CLASSIC;
                default -> throw new ProfileException(where + ": \"tokenizer\" must be \"standard\" or \"classic\", found \""
                        + t + "\"");
            };
        }
        if (root.has("maxTokenLength")) {
            JsonNode n = root.get("maxTokenLength");
            if (!n.isInt()) {
                throw new ProfileException(where + ": \"maxTokenLength\" must be a whole number from 1 to 1024, found " + n);
            }
            bld.maxTokenLength = n.asInt();
        }
        if (root.has("asciiFolding")) {
            bld.asciiFolding = bool(root, "asciiFolding", where);
        }
        if (root.has("possessives")) {
            bld.possessives = bool(root, "possessives", where);
        }
        if (root.has("stopWords")) {
            JsonNode n = root.get("stopWords");
            if (n.isTextual()) {
                bld.stopWords = switch (n.asText()) {
                    case "default" -> new TreeSet<>(TRADE_STOP_WORDS);
                    case "lucene" -> new TreeSet<>(PRESETS.get("plain").stopWords);
                    case "none" -> new TreeSet<>();
                    default -> throw new ProfileException(where + ": \"stopWords\" must be \"default\", \"lucene\", \"none\" "
                            + "or a list of words, found \"" + n.asText() + "\"");
                };
            } else {
                bld.stopWords = new TreeSet<>(words(root, "stopWords", where));
            }
        }
        if (root.has("addStopWords")) {
            bld.stopWords.addAll(words(root, "addStopWords", where));
        }
        if (root.has("keepWords")) {
            bld.stopWords.removeAll(words(root, "keepWords", where));
        }
        if (root.has("negationWords")) {
            bld.negationWords = new TreeSet<>(words(root, "negationWords", where));
        }
        if (root.has("numbers")) {
            String v = text(root, "numbers", where);
            bld.numbers = switch (v) {
                case "split-units" -> Numbers.SPLIT_UNITS;
                case "keep" -> Numbers.KEEP;
                default -> throw new ProfileException(where + ": \"numbers\" must be \"split-units\" or \"keep\", found \"" + v + "\"");
            };
        }
        if (root.has("units")) {
            JsonNode n = root.get("units");
            if (n.isTextual() && n.asText().equals("default")) {
                bld.units = new TreeSet<>(DEFAULT_UNITS);
            } else {
                bld.units = new TreeSet<>(words(root, "units", where));
            }
        }
        if (root.has("addUnits")) {
            bld.units.addAll(words(root, "addUnits", where));
        }
        if (root.has("breakCharacters")) {
            bld.breakCharacters = text(root, "breakCharacters", where);
        }
        try {
            return bld.build();
        } catch (IllegalArgumentException e) {
            throw new ProfileException(where + ": " + e.getMessage());
        }
    }

    private static String fileStem(String where) {
        String s = where.replace('\\', '/');
        s = s.substring(s.lastIndexOf('/') + 1);
        return s.endsWith(".json") ? s.substring(0, s.length() - 5) : s;
    }

    private static String text(JsonNode root, String key, String where) {
        JsonNode n = root.get(key);
        if (!n.isTextual()) {
            throw new ProfileException(where + ": \"" + key + "\" must be a string, found " + n);
        }
        return n.asText();
    }

    private static boolean bool(JsonNode root, String key, String where) {
        JsonNode n = root.get(key);
        if (!n.isBoolean()) {
            throw new ProfileException(where + ": \"" + key + "\" must be true or false, found " + n);
        }
        return n.asBoolean();
    }

    private static List<String> words(JsonNode root, String key, String where) {
        JsonNode n = root.get(key);
        if (!n.isArray()) {
            throw new ProfileException(where + ": \"" + key + "\" must be a list of words such as [\"x\", \"y\"], found " + n);
        }
        List<String> out = new ArrayList<>();
        for (JsonNode e : n) {
            if (!e.isTextual()) {
                throw new ProfileException(where + ": every entry of \"" + key + "\" must be a string, found " + e);
            }
            out.add(e.asText());
        }
        return out;
    }

    /** The JSON form (stable key order, every setting spelled out), readable by {@link #fromJson}. */
    public String toJson() {
        ObjectMapper m = new ObjectMapper();
        try {
            return m.writerWithDefaultPrettyPrinter().writeValueAsString(toJsonTree(m));
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }

    /** The JSON tree of {@link #toJson()}, for embedding in other files. */
    public ObjectNode toJsonTree(ObjectMapper m) {
        ObjectNode o = m.createObjectNode();
        o.put("format", FORMAT);
        o.put("formatVersion", FORMAT_VERSION);
        o.put("name", name);
        o.put("tokenizer", tokenizer.label());
        o.put("maxTokenLength", maxTokenLength);
        o.put("asciiFolding", asciiFolding);
        o.put("possessives", possessives);
        ArrayNode sw = o.putArray("stopWords");
        stopWords.forEach(sw::add);
        ArrayNode nw = o.putArray("negationWords");
        negationWords.forEach(nw::add);
        o.put("numbers", numbers.label());
        ArrayNode u = o.putArray("units");
        units.forEach(u::add);
        o.put("breakCharacters", breakCharacters);
        return o;
    }

    public Builder toBuilder() {
        Builder b = new Builder(name);
        b.tokenizer = tokenizer;
        b.maxTokenLength = maxTokenLength;
        b.asciiFolding = asciiFolding;
        b.possessives = possessives;
        b.stopWords = new TreeSet<>(stopWords);
        b.negationWords = new TreeSet<>(negationWords);
        b.numbers = numbers;
        b.units = new TreeSet<>(units);
        b.breakCharacters = breakCharacters;
        return b;
    }

    public static Builder builder(String name) {
        return new Builder(name);
    }

    public String name() {
        return name;
    }

    public TokenizerKind tokenizer() {
        return tokenizer;
    }

    public int maxTokenLength() {
        return maxTokenLength;
    }

    public boolean asciiFolding() {
        return asciiFolding;
    }

    public boolean possessives() {
        return possessives;
    }

    /** Normalised (lower-cased, folded when folding is on), sorted. */
    public SortedSet<String> stopWords() {
        return stopWords;
    }

    /** Normalised, sorted; without the curly-apostrophe twins the analyzer adds. */
    public SortedSet<String> negationWords() {
        return negationWords;
    }

    public Numbers numbers() {
        return numbers;
    }

    public SortedSet<String> units() {
        return units;
    }

    public String breakCharacters() {
        return breakCharacters;
    }

    CharArraySet stopSet() {
        return new CharArraySet(stopWords, false);
    }

    CharArraySet negationSet() {
        CharArraySet s = new CharArraySet(negationWords.size() * 2, false);
        for (String w : negationWords) {
            s.add(w);
            s.add(w.replace('\'', '\u2019'));
        }
        return s;
    }

    CharArraySet unitSet() {
        return new CharArraySet(units, false);
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof AnalysisProfile)) {
            return false;
        }
        AnalysisProfile p = (AnalysisProfile) o;
        return name.equals(p.name) && tokenizer == p.tokenizer && maxTokenLength == p.maxTokenLength
                && asciiFolding == p.asciiFolding && possessives == p.possessives && stopWords.equals(p.stopWords)
                && negationWords.equals(p.negationWords) && numbers == p.numbers && units.equals(p.units)
                && breakCharacters.equals(p.breakCharacters);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, tokenizer, maxTokenLength, asciiFolding, possessives, stopWords, negationWords,
                numbers, units, breakCharacters);
    }

    @Override
    public String toString() {
        return "AnalysisProfile[" + name + "]";
    }

    /** A profile file or value is wrong; the message says where, what was expected and what was found. */
    public static final class ProfileException extends IllegalArgumentException {
        ProfileException(String message) {
            super(message);
        }
    }

    /** Mutable builder; {@link #build()} validates every setting in one place. */
    public static final class Builder {
        private String name;
        private TokenizerKind tokenizer = TokenizerKind.STANDARD;
        private int maxTokenLength = 255;
        private boolean asciiFolding = true;
        private boolean possessives = true;
        private SortedSet<String> stopWords = new TreeSet<>(TRADE_STOP_WORDS);
        private SortedSet<String> negationWords = new TreeSet<>(NEGATION_WORDS);
        private Numbers numbers = Numbers.SPLIT_UNITS;
        private SortedSet<String> units = new TreeSet<>(DEFAULT_UNITS);
        private String breakCharacters = DEFAULT_BREAKS;

        private Builder(String name) {
            this.name = name;
        }

        public Builder name(String v) {
            name = v;
            return this;
        }

        public Builder tokenizer(TokenizerKind v) {
            tokenizer = v;
            return this;
        }

        public Builder maxTokenLength(int v) {
            maxTokenLength = v;
            return this;
        }

        public Builder asciiFolding(boolean v) {
            asciiFolding = v;
            return this;
        }

        public Builder possessives(boolean v) {
            possessives = v;
            return this;
        }

        public Builder stopWords(Collection<String> v) {
            stopWords = new TreeSet<>(v);
            return this;
        }

        public Builder addStopWords(Collection<String> v) {
            stopWords.addAll(v);
            return this;
        }

        public Builder keepWords(Collection<String> v) {
            stopWords.removeAll(v);
            return this;
        }

        public Builder negationWords(Collection<String> v) {
            negationWords = new TreeSet<>(v);
            return this;
        }

        public Builder numbers(Numbers v) {
            numbers = v;
            return this;
        }

        public Builder units(Collection<String> v) {
            units = new TreeSet<>(v);
            return this;
        }

        public Builder breakCharacters(String v) {
            breakCharacters = v;
            return this;
        }

        /** Validates and normalises; {@link IllegalArgumentException} states the rule, the value and the fix. */
        public AnalysisProfile build() {
            if (name == null || name.isBlank()) {
                throw new IllegalArgumentException("\"name\" must be a non-empty string, found " + (name == null ? "nothing" : "\"" + name + "\""));
            }
            Objects.requireNonNull(tokenizer, "tokenizer");
            Objects.requireNonNull(numbers, "numbers");
            Objects.requireNonNull(breakCharacters, "breakCharacters");
            if (maxTokenLength < 1 || maxTokenLength > 1024) {
                throw new IllegalArgumentException("\"maxTokenLength\" must be from 1 to 1024 chars, found " + maxTokenLength
                        + "; 255 (Lucene's default) suits product text");
            }
            stopWords = normalise(stopWords, "stopWords");
            negationWords = normalise(negationWords, "negationWords");
            units = normalise(units, "units");
            for (String w : negationWords) {
                stopWords.remove(w);
            }
            for (int i = 0; i < breakCharacters.length(); i++) {
                char c = breakCharacters.charAt(i);
                if (Character.isLetterOrDigit(c)) {
                    throw new IllegalArgumentException("\"breakCharacters\" must hold punctuation or line breaks only, found '"
                            + c + "' at index " + i + "; a letter or digit there would split words apart — remove it");
                }
            }
            return new AnalysisProfile(this);
        }

        private SortedSet<String> normalise(Collection<String> words, String key) {
            SortedSet<String> out = new TreeSet<>();
            WordProbe probe = new WordProbe(tokenizer, asciiFolding, maxTokenLength);
            for (String w : words) {
                if (w == null || w.isBlank()) {
                    throw new IllegalArgumentException("\"" + key + "\" must not hold empty entries; remove the empty string");
                }
                List<String> toks = probe.tokens(w);
                if (toks.size() != 1) {
                    throw new IllegalArgumentException("every entry of \"" + key + "\" must be one token, but \"" + w
                            + "\" is " + (toks.isEmpty() ? "no token at all (only punctuation)" : toks.size() + " tokens " + toks)
                            + "; list single words (a removed word ends a phrase, so \"free shipping\" needs no entry)");
                }
                out.add(toks.get(0));
            }
            return out;
        }
    }
}
