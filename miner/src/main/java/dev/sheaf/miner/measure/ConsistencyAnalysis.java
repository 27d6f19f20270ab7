package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.stream.IntStream;

/**
 * The feedback-consistency stage's front door: how people use each attribute when they compare a
 * target listing with a reference. Per attribute: mentions and their share of sentences; the
 * directions (more, less, present, absent); hedge rate and comparative share; the surface forms
 * and their entropy; labels nobody uses; agreement between people on direction; contradictions;
 * and grounding in the catalog. Over all sentences: vocabulary gaps.
 *
 * <p>Sentences are read in parallel (the reader is stateless); the figures are then summed in
 * sentence order, so a run is deterministic. Annotators get pseudonyms before anything is stored.
 */
public final class ConsistencyAnalysis {
    private static final Direction[] DIRECTIONS = Direction.values();

    private ConsistencyAnalysis() {
    }

    /** Analyses {@code feedback} with {@code options}. Never throws for bad data; see the report's problems. */
    public static ConsistencyReport run(FeedbackSentences feedback, ConsistencyOptions options) {
        Objects.requireNonNull(feedback, "feedback");
        Objects.requireNonNull(options, "options");
        List<FeedbackSentence> sentences = feedback.sentences();
        Set<String> people = new TreeSet<>();
        Set<String> pairs = new HashSet<>();
        for (FeedbackSentence s : sentences) {
            people.add(s.annotator());
            pairs.add(s.pairId());
        }
        Map<String, String> pseudonym = options.pseudonyms().assign(people);
        FeedbackReader reader = new FeedbackReader(options);
        FeedbackReader.Reading[] readings = new FeedbackReader.Reading[sentences.size()];
        IntStream.range(0, sentences.size()).parallel().forEach(i -> {
            FeedbackSentence s = sentences.get(i);
            readings[i] = reader.read(s, pseudonym.get(s.annotator()));
        });

        GapFinder gaps = new GapFinder(options.gapMaxWords(), options.gapMinSentences(), options.gapLimit(),
                options.stopWords());
        List<FeedbackMention> all = new ArrayList<>();
        Map<String, List<Integer>> byAttribute = new TreeMap<>();
        List<Integer> sentenceOf = new ArrayList<>();
        Map<String, Set<String>> usedLabels = new HashMap<>();
        int withMentions = 0;
        for (int i = 0; i < readings.length; i++) {
            FeedbackReader.Reading r = readings[i];
            FeedbackSentence s = sentences.get(i);
            gaps.add(s.text(), s.row(), r.tokens(), r.covered());
            if (!r.mentions().isEmpty()) {
                withMentions++;
            }
            for (FeedbackMention m : r.mentions()) {
                byAttribute.computeIfAbsent(m.attribute(), k -> new ArrayList<>()).add(all.size());
                all.add(m);
                sentenceOf.add(i);
                if (m.conceptId() != null) {
                    usedLabels.computeIfAbsent(m.conceptId(), k -> new HashSet<>())
                            .add(FeedbackVocabulary.normalise(m.label() != null ? m.label() : m.form()));
                }
            }
        }

        FeedbackVocabulary vocabulary = options.vocabulary();
        Set<String> scaleFacets = new HashSet<>();
        options.scales().scales().forEach(sc -> scaleFacets.add(sc.facet()));
        List<ConsistencyAttribute> attributes = new ArrayList<>();
        List<ConsistencyContradiction> contradictions = new ArrayList<>();
        for (Map.Entry<String, List<Integer>> e : byAttribute.entrySet()) {
            ConsistencyAttribute a = attribute(e.getKey(), e.getValue(), all, sentenceOf, sentences.size(), vocabulary,
                    scaleFacets, usedLabels);
            attributes.add(a);
            contradictions.addAll(a.contradictions());
        }
        List<String> unmentioned = new ArrayList<>();
        for (FeedbackConcept c : vocabulary.concepts()) {
            if (!usedLabels.containsKey(c.id()) && !byAttribute.containsKey(c.id())) {
                unmentioned.add(c.id());
            }
        }
        List<String> notes = new ArrayList<>();
        if (options.catalog() == null) {
            notes.add("no catalog facts were given, so no mention is grounded; pass the labeler's assignments");
        }
        if (options.scales().isEmpty()) {
            notes.add("no scales were given, so comparative mentions (lighter, warmer) are not checked against catalog values");
        } else if (options.scales().source().startsWith("bundled example")) {
            notes.add("scales: " + options.scales().source());
        }
        for (GroundingScale sc : options.scales().scales()) {
            if (vocabulary.concepts().size() > 0 && vocabulary.concept(sc.facet()).isEmpty()) {
                notes.add("scale facet '" + sc.facet() + "' is not in the vocabulary; its mentions are counted under that id");
            }
        }
        return new ConsistencyReport(feedback.source(), feedback.rowsRead(), sentences.size(), pairs.size(), people.size(),
                withMentions, attributes, all, contradictions, gaps.result(), unmentioned, feedback.problems(),
                options.scales().source(), options.catalog() != null, notes);
    }

    private static ConsistencyAttribute attribute(String id, List<Integer> indices, List<FeedbackMention> all,
                                                  List<Integer> sentenceOf, int sentenceCount, FeedbackVocabulary vocabulary,
                                                  Set<String> scaleFacets, Map<String, Set<String>> usedLabels) {
        EnumMap<Direction, Integer> directions = new EnumMap<>(Direction.class);
        Map<String, Integer> forms = new TreeMap<>();
        Set<Integer> inSentences = new HashSet<>();
        int hedged = 0;
        int comparative = 0;
        int negated = 0;
        int excessive = 0;
        int ambiguous = 0;
        int presenceChecked = 0;
        int presenceGrounded = 0;
        int contrastKnown = 0;
        int contrasts = 0;
        int comparisonChecked = 0;
        int comparisonGrounded = 0;
        int unchecked = 0;
        List<FeedbackMention> mine = new ArrayList<>(indices.size());
        for (int i : indices) {
            FeedbackMention m = all.get(i);
            mine.add(m);
            inSentences.add(sentenceOf.get(i));
            directions.merge(m.direction(), 1, Integer::sum);
            forms.merge(m.form(), 1, Integer::sum);
            hedged += m.hedged() ? 1 : 0;
            comparative += m.comparative() ? 1 : 0;
            negated += m.negated() ? 1 : 0;
            excessive += m.excessive() ? 1 : 0;
            ambiguous += m.ambiguous() ? 1 : 0;
            GroundingCheck g = m.grounding();
            if (!g.checked()) {
                unchecked++;
            } else if (GroundingCheck.PRESENCE.equals(g.kind())) {
                presenceChecked++;
                if (g.grounded()) {
                    presenceGrounded++;
                    if (g.contrast() != null) {
                        contrastKnown++;
                        contrasts += g.contrast() ? 1 : 0;
                    }
                }
            } else {
                comparisonChecked++;
                comparisonGrounded += g.grounded() ? 1 : 0;
            }
        }
        List<String> unused = new ArrayList<>();
        Set<String> used = usedLabels.getOrDefault(id, Set.of());
        vocabulary.labelForms(id).forEach((normal, written) -> {
            if (!used.contains(normal)) {
                unused.add(written);
            }
        });
        String kind = vocabulary.concept(id).isPresent() ? ConsistencyAttribute.KIND_CONCEPT
                : scaleFacets.contains(id) ? ConsistencyAttribute.KIND_SCALE : ConsistencyAttribute.KIND_UNKNOWN;
        List<ConsistencyContradiction> contradictions = new ArrayList<>();
        ConsistencyAgreement agreement = agreement(id, mine, contradictions);
        GroundingSummary grounding = new GroundingSummary(presenceChecked, presenceGrounded, contrastKnown, contrasts,
                comparisonChecked, comparisonGrounded, unchecked, mine.size());
        return new ConsistencyAttribute(id, vocabulary.displayLabel(id), kind, mine.size(), inSentences.size(),
                sentenceCount == 0 ? 0 : (double) inSentences.size() / sentenceCount, directions, hedged, comparative,
                negated, excessive, ambiguous, SurfaceForms.of(forms), unused, agreement, grounding, contradictions);
    }

    /**
     * Direction agreement among the people who mention the attribute in the same pair (see
     * {@link ConsistencyAgreement}); fills {@code contradictions} with the pairs where people contradict.
     */
    static ConsistencyAgreement agreement(String attribute, List<FeedbackMention> mentions,
                                          List<ConsistencyContradiction> contradictions) {
        // pair → person → their mentions in sentence order
        Map<String, Map<String, List<FeedbackMention>>> byPair = new LinkedHashMap<>();
        for (FeedbackMention m : mentions) {
            byPair.computeIfAbsent(m.pairId(), k -> new TreeMap<>())
                    .computeIfAbsent(m.annotator(), k -> new ArrayList<>()).add(m);
        }
        int judged = 0;
        int contradictory = 0;
        int self = 0;
        double sum = 0;
        List<int[]> units = new ArrayList<>();
        List<ConsistencyContradiction> found = new ArrayList<>();
        for (Map.Entry<String, Map<String, List<FeedbackMention>>> p : byPair.entrySet()) {
            List<ConsistencyContradiction.Side> sides = new ArrayList<>();
            for (Map.Entry<String, List<FeedbackMention>> person : p.getValue().entrySet()) {
                List<FeedbackMention> said = person.getValue();
                Direction stance = stance(said);
                if (said.stream().map(FeedbackMention::direction).distinct().count() > 1) {
                    self++;
                }
                FeedbackMention first = said.stream().filter(m -> m.direction() == stance).findFirst().orElseThrow();
                sides.add(new ConsistencyContradiction.Side(person.getKey(), stance, first.row(), first.sentence(),
                        first.surface()));
            }
            int m = sides.size();
            if (m < 2) {
                continue;
            }
            judged++;
            int agreeing = 0;
            int[] unit = new int[m];
            for (int i = 0; i < m; i++) {
                unit[i] = sides.get(i).direction().ordinal();
                for (int j = i + 1; j < m; j++) {
                    if (sides.get(i).direction() == sides.get(j).direction()) {
                        agreeing++;
                    }
                }
            }
            units.add(unit);
            sum += agreeing / (m * (m - 1) / 2.0);
            Set<Direction> stances = new HashSet<>();
            sides.forEach(sd -> stances.add(sd.direction()));
            List<String> kinds = new ArrayList<>();
            if (stances.contains(Direction.MORE) && stances.contains(Direction.LESS)) {
                kinds.add("more-vs-less");
            }
            if (stances.contains(Direction.PRESENT) && stances.contains(Direction.ABSENT)) {
                kinds.add("present-vs-absent");
            }
            if (!kinds.isEmpty()) {
                contradictory++;
                FeedbackMention any = p.getValue().values().iterator().next().get(0);
                found.add(new ConsistencyContradiction(attribute, p.getKey(), any.referenceId(), any.targetId(),
                        String.join("+", kinds), sides));
            }
        }
        found.sort(Comparator.comparing(ConsistencyContradiction::pairId));
        contradictions.addAll(found);
        double[] numbers = new double[DIRECTIONS.length];
        for (int i = 0; i < numbers.length; i++) {
            numbers[i] = i;
        }
        KrippendorffResult alpha = new KrippendorffAlpha(units, DIRECTIONS.length, numbers, AgreementMetric.NOMINAL).result();
        return new ConsistencyAgreement(byPair.size(), judged, judged == 0 ? Double.NaN : sum / judged, contradictory,
                judged == 0 ? Double.NaN : (double) contradictory / judged, self, alpha);
    }

    /** The direction most of one person's mentions take; on a tie, the first said. */
    private static Direction stance(List<FeedbackMention> said) {
        EnumMap<Direction, Integer> n = new EnumMap<>(Direction.class);
        for (FeedbackMention m : said) {
            n.merge(m.direction(), 1, Integer::sum);
        }
        Direction best = said.get(0).direction();
        for (FeedbackMention m : said) {
            if (n.get(m.direction()) > n.get(best)) {
                best = m.direction();
            }
        }
        return best;
    }
}
