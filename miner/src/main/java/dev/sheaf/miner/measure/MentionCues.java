package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * Reads how a feedback sentence speaks of each matched attribute term: more or less of it, present
 * or absent, relative or not, hedged, excessive, negated, and which cue words said so. A pure
 * function of the raw sentence and the spans; it knows no vocabulary (the caller's
 * {@link ComparativeMorphology} may know its terms).
 *
 * <p>The rules, in the order they apply (docs/decisions/081-mention-cues.md has the reasons):
 * <ol>
 *   <li><b>Words.</b> Lucene's StandardTokenizer on the raw sentence, lower-cased with
 *       {@code Locale.ROOT}; stop words are kept (the cues are stop words).</li>
 *   <li><b>Clause.</b> Cues act only inside the term's clause, which ends at punctuation
 *       ({@code . , ; : ! ? ( ) " …}, a spaced dash, a line break) and at the words and, but,
 *       though, although, however, yet, whereas, while, except, because, since, unlike, which, who.</li>
 *   <li><b>Degree.</b> A one-word term that is a comparative or superlative form ("lighter",
 *       "the roomiest") is MORE and comparative. Otherwise the nearest degree word before the term,
 *       skipping intensifiers (very, much, way, even …), articles and hedges, decides: more/most →
 *       MORE, less/least/fewer → LESS (both comparative), too/too much/overly → MORE and excessive,
 *       "as X as" or "not as X" → equative (comparative), "enough" (before or after) → sufficient.
 *       A comparative adjective just before the term ("with a bigger hood") makes the mention
 *       comparative without changing its direction. A following "than" marks it comparative, and
 *       turns an unknown {@code -er} word into a comparative ("grippier than").</li>
 *   <li><b>Negation</b>, after NegEx (Chapman et al. 2001, J. Biomed. Inform. 34(5)) [mem]: a
 *       negation word (not, never, any {@code n't} word, cannot, nor) or absence word (no, without,
 *       lacks, free of, zero) at most {@value #NEGATION_WINDOW} words before the term in its clause,
 *       or an absence word at most {@value #AFTER_WINDOW} words after it ("not included",
 *       "absent", a clause-final "missing"), or the suffix "-free" ("PFC-free"). Each flips the
 *       polarity, so "not without a hood" is affirmative. Look-alikes are not negations:
 *       "not only", "not just", "no doubt", "whether or not"; "not sure" is a hedge.</li>
 *   <li><b>Direction</b> from degree × polarity: plain → PRESENT / ABSENT; more → MORE / LESS;
 *       less → LESS / MORE; equative → PRESENT / LESS ("not as warm"); excess → MORE / PRESENT
 *       ("not too heavy" denies the excess, not the weight); sufficient → PRESENT / LESS.</li>
 *   <li><b>Hedges</b> from {@link HedgeWords}: degree hedges in the words skipped before the term,
 *       when the statement is gradable; "-ish" on the term; epistemic hedges anywhere in the
 *       term's sentence segment (which ends only at . ! ? ; and contrast words).</li>
 * </ol>
 * Instances are immutable and thread-safe.
 */
public final class MentionCues {

    /** Words allowed between a negation word and the term it negates (NegEx's window [mem]). */
    public static final int NEGATION_WINDOW = 5;
    /** Words allowed between the term and a following absence word ("hood is not included"). */
    public static final int AFTER_WINDOW = 3;

    private static final MentionCues STANDARD = new MentionCues(ComparativeMorphology.wordNet());

    private final MentionReader reader;

    private MentionCues(ComparativeMorphology morphology) {
        this.reader = new MentionReader(morphology);
    }

    /** Cues with WordNet morphology alone. */
    public static MentionCues standard() {
        return STANDARD;
    }

    /** Cues with the caller's morphology, e.g. {@code wordNet().withKnownTerms(vocabularyWords)}. */
    public static MentionCues using(ComparativeMorphology morphology) {
        return new MentionCues(Objects.requireNonNull(morphology, "morphology"));
    }

    /**
     * One {@link Mention} per span, in the order given.
     *
     * @throws IllegalArgumentException when a span ends past the sentence (a caller's bug: the
     *                                  matcher's offsets must come from this same sentence)
     */
    public List<Mention> read(String sentence, List<MentionSpan> spans) {
        Objects.requireNonNull(sentence, "sentence");
        Objects.requireNonNull(spans, "spans");
        for (MentionSpan s : spans) {
            Objects.requireNonNull(s, "a span is null");
            if (s.end() > sentence.length()) {
                throw new IllegalArgumentException("span [" + s.start() + ", " + s.end() + ") ends past the sentence, which has "
                        + sentence.length() + " chars; pass offsets into this same sentence");
            }
        }
        CueTokens tokens = CueTokens.of(sentence);
        List<Mention> out = new ArrayList<>(spans.size());
        for (MentionSpan s : spans) {
            out.add(reader.read(tokens, s));
        }
        return List.copyOf(out);
    }

    /** The mention at one span; see {@link #read(String, List)}. */
    public Mention read(String sentence, MentionSpan span) {
        return read(sentence, List.of(span)).get(0);
    }

    /**
     * The hedge list (lower-case phrases): degree hedges, then epistemic hedges, then {@code "-ish"}.
     * The same list marks mentions as hedged and feeds {@link #hedges(String)}.
     */
    public static List<String> hedgeWords() {
        List<String> all = new ArrayList<>(HedgeWords.DEGREE);
        all.addAll(HedgeWords.EPISTEMIC);
        all.add("-" + HedgeWords.ISH);
        return List.copyOf(all);
    }

    /**
     * Every hedge in the sentence, whatever terms it holds, in sentence order: epistemic hedges
     * always, degree hedges when a gradable word follows, and {@code -ish} words.
     */
    public List<Cue> hedges(String sentence) {
        Objects.requireNonNull(sentence, "sentence");
        return reader.hedges(CueTokens.of(sentence));
    }
}
