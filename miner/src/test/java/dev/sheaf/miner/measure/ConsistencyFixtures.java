package dev.sheaf.miner.measure;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;

/** Small constructed vocabularies, scales, catalogs and sentences shared by the consistency tests. */
final class ConsistencyFixtures {
    private ConsistencyFixtures() {
    }

    /** A fixed key, so pseudonyms are the same in every test run. */
    static final Pseudonyms PSEUDONYMS = Pseudonyms.withKey("constructed test key, 32 bytes!!".getBytes(StandardCharsets.US_ASCII));

    /** Constructed: hood, pit zips, roomy (with a label nobody uses), two concepts sharing "down", a regulated claim. */
    static FeedbackVocabulary vocabulary() {
        return FeedbackVocabulary.of(List.of(
                new FeedbackConcept("features", "Features", "features", true, List.of("features"), false),
                new FeedbackConcept("hood", "hood", "features", false, List.of("hood", "hooded"), false),
                new FeedbackConcept("pit-zips", "pit zips", "features", false, List.of("pit zips", "Pit-Zips", "armpit zips"), false),
                new FeedbackConcept("roomy", "roomy", "features", false, List.of("roomy", "spacious"), false),
                new FeedbackConcept("down", "down", "insulation", false, List.of("down"), false),
                new FeedbackConcept("down-jacket", "down jacket", "product-type", false, List.of("down", "down jacket"), false),
                new FeedbackConcept("waterproof", "waterproof", "water-protection", false, List.of("waterproof"), true),
                new FeedbackConcept("weight", "Weight", "weight", true, List.of("weight"), false)));
    }

    /** Constructed: light/heavy on weight, warm/cold on temperature rating (lower = warmer). */
    static GroundingScales scales() {
        return GroundingScales.of("test scales", List.of(
                new GroundingScale("weight", Direction.LESS, List.of("light"), List.of(), "lighter = weighs less"),
                new GroundingScale("weight", Direction.MORE, List.of("heavy"), List.of(), ""),
                new GroundingScale("temperature-rating", Direction.LESS, List.of("warm"), List.of(), "warmer = lower rating"),
                new GroundingScale("temperature-rating", Direction.MORE, List.of("cold"), List.of(), "")));
    }

    static FeedbackSentence s(String pair, String ref, String target, String who, String text, long row) {
        return new FeedbackSentence(pair, ref, target, who, text, row);
    }

    static GroundingListing listing(String id, Set<String> stated, Set<String> negated, Map<String, Double> numbers) {
        return new GroundingListing(id, null, stated, negated, numbers);
    }

    static ConsistencyReport run(List<FeedbackSentence> sentences, GroundingCatalog catalog) {
        FeedbackVocabulary v = vocabulary();
        ConsistencyOptions o = ConsistencyOptions.builder(FeedbackTermFinder.exactLabels(v)).vocabulary(v)
                .scales(scales()).catalog(catalog).pseudonyms(PSEUDONYMS).build();
        return ConsistencyAnalysis.run(FeedbackSentences.of("constructed", new ArrayList<>(sentences)), o);
    }
}
