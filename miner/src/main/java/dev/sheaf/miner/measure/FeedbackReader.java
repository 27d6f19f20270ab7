package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Turns one feedback sentence into {@link FeedbackMention}s (docs/decisions/110 and 111):
 * <ol>
 *   <li>the matcher's hits; hits with the same span are one mention of several concepts (ambiguous);</li>
 *   <li>every word no hit covers is tried as a degree form: its bases from {@link ComparativeMorphology}
 *       ("roomier" → "roomy") and its {@code -ish} base ("lightish" → "light") are looked up with the
 *       same matcher; the first base that is a whole label wins;</li>
 *   <li>a word still uncovered whose form or base is a scale word ("heavier" → "heavy") is a mention
 *       of the scale's facet;</li>
 *   <li>{@link MentionCues} reads direction, comparison, hedges and negation for every span;</li>
 *   <li>a more/less mention of a concept on a scale (by concept id, or by the word's base form), and
 *       every scale-word mention, counts under the scale's facet, its direction turned by the scale
 *       ("lighter" → less weight); present/absent mentions of a concept stay with the concept;</li>
 *   <li>each mention is checked against the catalog ({@link GroundingRules}).</li>
 * </ol>
 * Thread-safe.
 */
final class FeedbackReader {

    /** What one sentence gave: its mentions, and every span a term covers (for vocabulary gaps). */
    record Reading(List<FeedbackMention> mentions, List<int[]> covered, CueTokens tokens) {
    }

    private final FeedbackTermFinder finder;
    private final GroundingScales scales;
    private final GroundingCatalog catalog;
    private final ComparativeMorphology morphology;
    private final MentionCues cues;
    /** Words seen per run are few (feedback repeats itself); both caches stop growing at {@value #CACHE}. */
    private static final int CACHE = 200_000;
    private final Map<String, List<String>> baseHits = new ConcurrentHashMap<>();
    private final Map<String, List<String>> bases = new ConcurrentHashMap<>();

    FeedbackReader(ConsistencyOptions options) {
        this.finder = options.finder();
        this.scales = options.scales();
        this.catalog = options.catalog();
        Set<String> known = new TreeSet<>(options.vocabulary().singleWordLabels());
        known.addAll(scales.words());
        this.morphology = ComparativeMorphology.wordNet().withKnownTerms(known);
        this.cues = MentionCues.using(morphology);
    }

    /** A span with the concepts it resolves to and how it was found. */
    private static final class Span {
        final int start;
        final int end;
        final Set<String> concepts = new TreeSet<>();
        final Map<String, String> labelOf = new LinkedHashMap<>();
        String via;
        GroundingScale scaleWord;

        Span(int start, int end, String via) {
            this.start = start;
            this.end = end;
            this.via = via;
        }
    }

    Reading read(FeedbackSentence s, String pseudonym) {
        String text = s.text();
        CueTokens tokens = CueTokens.of(text);
        Map<Long, Span> spans = new LinkedHashMap<>();
        for (FeedbackTermHit h : finder.find(text)) {
            if (h == null || h.end() > text.length() || !text.substring(h.start(), h.end()).equals(h.surface())) {
                throw new IllegalArgumentException("the term finder returned " + h + ", which does not point into the sentence '"
                        + text + "'; a finder must give offsets into the sentence it was given");
            }
            Span sp = spans.computeIfAbsent(key(h.start(), h.end()), k -> new Span(h.start(), h.end(), FeedbackMention.VIA_LABEL));
            sp.concepts.add(h.conceptId());
            sp.labelOf.putIfAbsent(h.conceptId(), h.label());
        }
        List<int[]> covered = new ArrayList<>();
        for (Span sp : spans.values()) {
            covered.add(new int[] {sp.start, sp.end});
        }
        for (int i = 0; i < tokens.size(); i++) {
            CueTokens.Token t = tokens.get(i);
            if (overlaps(t.start(), t.end(), covered)) {
                continue;
            }
            Span found = degreeForm(t);
            if (found == null) {
                found = scaleWord(t);
            }
            if (found != null) {
                spans.put(key(found.start, found.end), found);
                covered.add(new int[] {found.start, found.end});
            }
        }
        if (spans.isEmpty()) {
            return new Reading(List.of(), covered, tokens);
        }
        List<Span> ordered = new ArrayList<>(spans.values());
        ordered.sort((a, b) -> a.start != b.start ? Integer.compare(a.start, b.start) : Integer.compare(a.end, b.end));
        List<MentionSpan> ms = new ArrayList<>(ordered.size());
        for (Span sp : ordered) {
            ms.add(new MentionSpan(sp.start, sp.end));
        }
        List<Mention> read = cues.read(text, ms);
        List<FeedbackMention> out = new ArrayList<>();
        for (int k = 0; k < ordered.size(); k++) {
            Span sp = ordered.get(k);
            Mention m = read.get(k);
            String form = FeedbackVocabulary.normalise(m.text());
            if (sp.scaleWord != null) {
                out.add(mention(s, pseudonym, m, form, sp.scaleWord.facet(), null, List.of(), sp.labelOf.get(""), sp.via,
                        sp.scaleWord));
                continue;
            }
            for (String concept : sp.concepts) {
                List<String> others = new ArrayList<>(sp.concepts);
                others.remove(concept);
                GroundingScale scale = null;
                if (m.direction() == Direction.MORE || m.direction() == Direction.LESS) {
                    scale = scales.forConcept(concept).or(() -> wordScale(m, form)).orElse(null);
                }
                out.add(mention(s, pseudonym, m, form, scale == null ? concept : scale.facet(), concept, others,
                        sp.labelOf.get(concept), sp.via, scale));
            }
        }
        return new Reading(List.copyOf(out), covered, tokens);
    }

    private FeedbackMention mention(FeedbackSentence s, String pseudonym, Mention m, String form, String attribute,
                                    String concept, List<String> others, String label, String via, GroundingScale scale) {
        Direction direction = scale == null ? m.direction() : scale.onFacet(m.direction());
        GroundingCheck g = GroundingRules.check(attribute, direction, scale, s.targetId(), s.referenceId(), catalog);
        return new FeedbackMention(s.row(), s.pairId(), s.referenceId(), s.targetId(), pseudonym, s.text(), m.start(),
                m.end(), m.text(), form, attribute, concept, others, label, via, m.direction(), direction, m.comparative(),
                m.hedged(), m.negated(), m.excessive(), scale == null ? null : scale.facet(), g, m.notes());
    }

    /** The scale of the mention's own word: its degree base ("lighter" → light), -ish base, or the form itself. */
    private Optional<GroundingScale> wordScale(Mention m, String form) {
        for (Cue c : m.cues(CueKind.DEGREE_FORM)) {
            if (c.start() >= m.start() && c.end() <= m.end()) {
                Optional<GroundingScale> s = scales.forWord(c.normal());
                if (s.isPresent()) {
                    return s;
                }
            }
        }
        Optional<String> ish = morphology.ishBase(form);
        if (ish.isPresent() && scales.forWord(ish.get()).isPresent()) {
            return scales.forWord(ish.get());
        }
        return scales.forWord(form);
    }

    /** The word as a degree form of a label: "roomier" when "roomy" is a label. */
    private Span degreeForm(CueTokens.Token t) {
        for (String base : bases(t.norm())) {
            List<String> concepts = baseHits.get(base);
            if (concepts == null) {
                concepts = wholeLabel(base);
                if (baseHits.size() < CACHE) {
                    baseHits.put(base, concepts);
                }
            }
            if (!concepts.isEmpty()) {
                Span sp = new Span(t.start(), t.end(), FeedbackMention.VIA_DEGREE_FORM);
                for (String c : concepts) {
                    sp.concepts.add(c);
                    sp.labelOf.put(c, base);
                }
                return sp;
            }
        }
        return null;
    }

    /** The word, or one of its bases, as a scale word. */
    private Span scaleWord(CueTokens.Token t) {
        List<String> tries = new ArrayList<>();
        tries.add(t.norm());
        tries.addAll(bases(t.norm()));
        for (String w : tries) {
            Optional<GroundingScale> s = scales.forWord(w);
            if (s.isPresent()) {
                Span sp = new Span(t.start(), t.end(), FeedbackMention.VIA_SCALE_WORD);
                sp.scaleWord = s.get();
                sp.labelOf.put("", FeedbackVocabulary.normalise(w));
                return sp;
            }
        }
        return null;
    }

    /** Degree bases ("roomier" → roomy) and the -ish base, most likely first, without the word itself. */
    private List<String> bases(String word) {
        List<String> cached = bases.get(word);
        if (cached != null) {
            return cached;
        }
        List<String> b = List.copyOf(computeBases(word));
        if (bases.size() < CACHE) {
            bases.put(word, b);
        }
        return b;
    }

    private List<String> computeBases(String word) {
        Set<String> out = new java.util.LinkedHashSet<>();
        for (DegreeReading r : morphology.readings(word)) {
            if (r.inflected()) {
                out.add(r.base());
            }
        }
        morphology.ishBase(word).ifPresent(out::add);
        out.remove(word);
        return new ArrayList<>(out);
    }

    /** The concepts whose label is exactly {@code word} (the whole string). */
    private List<String> wholeLabel(String word) {
        Set<String> out = new TreeSet<>();
        for (FeedbackTermHit h : finder.find(word)) {
            if (h.start() == 0 && h.end() == word.length()) {
                out.add(h.conceptId());
            }
        }
        return List.copyOf(out);
    }

    private static long key(int start, int end) {
        return ((long) start << 32) | end;
    }

    private static boolean overlaps(int start, int end, List<int[]> covered) {
        for (int[] c : covered) {
            if (start < c[1] && c[0] < end) {
                return true;
            }
        }
        return false;
    }
}
