package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.Set;

/**
 * Degree morphology of English adjectives: which base word a comparative or superlative form
 * stands for ({@code lighter} → {@code light}, {@code roomier} → {@code roomy}, {@code bigger} →
 * {@code big}, {@code better} → {@code good}). "more X" and "most X" are cues, handled by
 * {@link MentionCues}, not word forms.
 *
 * <p>Order of evidence, first match wins (see docs/decisions/080-degree-morphology.md):
 * <ol>
 *   <li>a word that is itself one of the caller's known terms reads as itself (a vocabulary label
 *       such as {@code liner} is never taken apart);</li>
 *   <li>WordNet's {@code adj.exc} exception list is authoritative: listed bases only, and a word
 *       listed as its own base ({@code customer customer}, {@code forest forest}) is not inflected;</li>
 *   <li>regular suffix rules ({@code -ier/-iest → -y}, doubled consonant {@code -gger → -g},
 *       {@code -er/-est}, {@code -er/-est → -e}) propose bases; a base is accepted only when WordNet
 *       lists it as an adjective or it is a known term, and only when the surface word is not a
 *       more frequent word of its own (the SemCor tag counts in WordNet's {@code index.sense}:
 *       {@code layer}, 9 tags as a noun, is not the comparative of the adjective {@code lay}, 1 tag);</li>
 *   <li>WordNet's {@code adv.exc} adds {@code further/farther → far} and friends;</li>
 *   <li>the word as it stands ({@link DegreeReading.Source#UNCHANGED}) is always the last reading.</li>
 * </ol>
 * Instances are immutable and thread-safe.
 */
public final class ComparativeMorphology {

    /** Suffix rules in the order they are tried; each maps a surface ending to a base ending. */
    private static final String[][] COMPARATIVE_RULES = {{"ier", "y"}, {"er", ""}, {"er", "e"}};
    private static final String[][] SUPERLATIVE_RULES = {{"iest", "y"}, {"est", ""}, {"est", "e"}};
    /** Shortest base a suffix rule may produce ("dry", "wet", "big" are three letters). */
    private static final int MIN_BASE = 2;

    private static final ComparativeMorphology WORDNET = new ComparativeMorphology(Set.of());

    private final Set<String> knownTerms;

    private ComparativeMorphology(Set<String> knownTerms) {
        this.knownTerms = knownTerms;
    }

    /** Morphology backed by WordNet alone. */
    public static ComparativeMorphology wordNet() {
        return WORDNET;
    }

    /**
     * A morphology that also trusts {@code terms} (e.g. a vocabulary's single-word labels): a term
     * is never split into base + suffix, and a rule-produced base that is a term is accepted even
     * when WordNet does not list it as an adjective ({@code grippier} → {@code grippy}).
     * Terms are lower-cased with {@link Locale#ROOT}; blank terms are ignored.
     */
    public ComparativeMorphology withKnownTerms(Collection<String> terms) {
        Objects.requireNonNull(terms, "terms");
        Set<String> all = new LinkedHashSet<>(knownTerms);
        for (String t : terms) {
            Objects.requireNonNull(t, "a known term is null");
            String n = normalise(t);
            if (!n.isEmpty()) {
                all.add(n);
            }
        }
        return new ComparativeMorphology(Set.copyOf(all));
    }

    /** Base form of {@code word} under WordNet alone: {@code base("roomier")} is {@code "roomy"}. */
    public static String base(String word) {
        return WORDNET.best(word).base();
    }

    /** The most likely reading of {@code word} (the first of {@link #readings}). */
    public DegreeReading best(String word) {
        return readings(word).get(0);
    }

    /**
     * Every reading of {@code word}, most likely first; never empty, and the last reading is
     * always the word as it stands. {@code word} is one token: it is trimmed, lower-cased with
     * {@link Locale#ROOT}, and typographic apostrophes are folded to {@code '}.
     */
    public List<DegreeReading> readings(String word) {
        Objects.requireNonNull(word, "word");
        String w = normalise(word);
        ComparativeLexicon lexicon = ComparativeLexicon.wordNet();
        List<DegreeReading> out = new ArrayList<>(3);
        if (knownTerms.contains(w)) {
            out.add(new DegreeReading(w, w, Degree.POSITIVE, DegreeReading.Source.KNOWN_TERM));
        }
        List<String> listed = lexicon.adjectiveException(w);
        if (!listed.isEmpty()) {
            // A form listed as its own base ("offer offer" beside "offer off") reads as itself first.
            if (listed.contains(w)) {
                add(out, new DegreeReading(w, w, Degree.POSITIVE, DegreeReading.Source.EXCEPTION_LIST));
            }
            for (String b : listed) {
                Degree d = b.equals(w) ? Degree.POSITIVE : exceptionDegree(w);
                add(out, new DegreeReading(w, b, d, DegreeReading.Source.EXCEPTION_LIST));
            }
        } else {
            for (String b : ruleBases(w, lexicon)) {
                add(out, new DegreeReading(w, b, ruleDegree(w), knownTerms.contains(b) && !lexicon.isAdjective(b)
                        ? DegreeReading.Source.KNOWN_TERM : DegreeReading.Source.RULE));
            }
            for (String b : lexicon.adverbException(w)) {
                add(out, new DegreeReading(w, b, b.equals(w) ? Degree.POSITIVE : exceptionDegree(w),
                        DegreeReading.Source.EXCEPTION_LIST));
            }
        }
        add(out, new DegreeReading(w, w, Degree.POSITIVE, DegreeReading.Source.UNCHANGED));
        return List.copyOf(out);
    }

    /**
     * A reading for an {@code -er} word that the lexicon does not know but the sentence marks as a
     * comparative ("grippier than the old pair"): the first regular rule's base, without the
     * WordNet check. Empty when the word is itself a WordNet word or known term ("water than" is
     * not a comparative), or has no {@code -er} ending.
     */
    Optional<DegreeReading> beforeThan(String word) {
        String w = normalise(word);
        ComparativeLexicon lexicon = ComparativeLexicon.wordNet();
        if (knownTerms.contains(w) || lexicon.entry(w).lemma() || !lexicon.adjectiveException(w).isEmpty()
                || !w.endsWith("er")) {
            return Optional.empty();
        }
        for (String b : candidates(w, COMPARATIVE_RULES)) {
            return Optional.of(new DegreeReading(w, b, Degree.COMPARATIVE, DegreeReading.Source.THAN_CONTEXT));
        }
        return Optional.empty();
    }

    /**
     * The adjective an {@code -ish} word approximates ({@code warmish} → {@code warm},
     * {@code largish} → {@code large}, {@code reddish} → {@code red}); empty for words such as
     * {@code finish}, {@code british} or {@code polish} whose stem is no adjective, or which are
     * WordNet words other than adjectives.
     */
    Optional<String> ishBase(String word) {
        String w = normalise(word);
        if (w.length() < 3 + MIN_BASE || !w.endsWith("ish")) {
            return Optional.empty();
        }
        ComparativeLexicon lexicon = ComparativeLexicon.wordNet();
        ComparativeLexicon.Entry self = lexicon.entry(w);
        if (self.lemma() && !self.adjective()) {
            return Optional.empty();
        }
        String stem = w.substring(0, w.length() - 3);
        List<String> tries = new ArrayList<>(List.of(stem, stem + "e"));
        if (doubled(stem)) {
            tries.add(stem.substring(0, stem.length() - 1));
        }
        for (String t : tries) {
            // Same guard as for comparatives: "selfish" (a word of its own) does not approximate "self".
            if (t.length() >= MIN_BASE && (lexicon.isAdjective(t) || knownTerms.contains(t))
                    && !(self.lemma() && self.useCount() >= lexicon.entry(t).adjectiveUseCount() && !knownTerms.contains(t))) {
                return Optional.of(t);
            }
        }
        return Optional.empty();
    }

    /** True when WordNet lists {@code word} as an adjective or it is a known term. */
    boolean gradable(String word) {
        String w = normalise(word);
        return knownTerms.contains(w) || ComparativeLexicon.wordNet().isAdjective(w);
    }

    private List<String> ruleBases(String w, ComparativeLexicon lexicon) {
        String[][] rules = w.endsWith("est") ? SUPERLATIVE_RULES : w.endsWith("er") ? COMPARATIVE_RULES : null;
        if (rules == null) {
            return List.of();
        }
        ComparativeLexicon.Entry surface = lexicon.entry(w);
        List<String> accepted = new ArrayList<>(2);
        for (String b : candidates(w, rules)) {
            boolean adjective = lexicon.isAdjective(b);
            if (!adjective && !knownTerms.contains(b)) {
                continue;
            }
            int baseUse = lexicon.entry(b).adjectiveUseCount();
            // A surface word with its own WordNet entry that is used at least as often as the base
            // adjective is read as itself ("layer", "matter", "upper", "slicker"), not as a degree form.
            if (surface.lemma() && surface.useCount() >= baseUse && !knownTerms.contains(b)) {
                continue;
            }
            accepted.add(b);
        }
        if (accepted.size() > 1) {
            accepted.sort(Comparator.comparingInt((String b) -> -lexicon.entry(b).adjectiveUseCount()));
        }
        return accepted;
    }

    /** Rule-produced bases in rule order, doubled consonant right after the bare strip. */
    private static List<String> candidates(String w, String[][] rules) {
        LinkedHashSet<String> out = new LinkedHashSet<>();
        for (String[] rule : rules) {
            if (!w.endsWith(rule[0])) {
                continue;
            }
            String stem = w.substring(0, w.length() - rule[0].length());
            if (rule[1].isEmpty() && doubled(stem)) {
                String undoubled = stem.substring(0, stem.length() - 1);
                if (undoubled.length() >= MIN_BASE) {
                    out.add(undoubled);
                }
            }
            String base = stem + rule[1];
            if (stem.length() >= MIN_BASE && hasVowel(stem)) {
                out.add(base);
            }
        }
        out.removeIf(b -> !hasVowel(b));
        return new ArrayList<>(out);
    }

    /** Degree of an exception-list form: {@code -st} superlative, {@code -er}/"worse" comparative. */
    private static Degree exceptionDegree(String w) {
        if (w.endsWith("st")) {
            return Degree.SUPERLATIVE;
        }
        if (w.endsWith("er") || w.equals("worse")) {
            return Degree.COMPARATIVE;
        }
        return Degree.POSITIVE; // "halfways halfway": a spelling variant, not a degree form
    }

    private static Degree ruleDegree(String w) {
        return w.endsWith("est") ? Degree.SUPERLATIVE : Degree.COMPARATIVE;
    }

    private static boolean doubled(String stem) {
        int n = stem.length();
        if (n < 3) {
            return false;
        }
        char c = stem.charAt(n - 1);
        return c == stem.charAt(n - 2) && isConsonant(c) && c != 'l' && c != 's';
    }

    private static boolean isConsonant(char c) {
        return c >= 'a' && c <= 'z' && "aeiouy".indexOf(c) < 0;
    }

    private static boolean hasVowel(String s) {
        for (int i = 0; i < s.length(); i++) {
            if ("aeiouy".indexOf(s.charAt(i)) >= 0) {
                return true;
            }
        }
        return false;
    }

    private static void add(List<DegreeReading> out, DegreeReading r) {
        for (DegreeReading o : out) {
            if (o.base().equals(r.base()) && o.degree() == r.degree()) {
                return;
            }
        }
        out.add(r);
    }

    static String normalise(String word) {
        return word.strip().replace('\u2019', '\'').replace('\u02BC', '\'').toLowerCase(Locale.ROOT);
    }
}
