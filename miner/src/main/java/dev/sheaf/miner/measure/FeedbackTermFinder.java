package dev.sheaf.miner.measure;

import dev.sheaf.miner.label.Labeler;
import java.util.List;

/**
 * The vocabulary matcher as the consistency stage needs it: which concepts a sentence names, and
 * where. One span may give several hits when a label belongs to several concepts (the mention is
 * then ambiguous). Hits may come in any order; each must lie inside the sentence. Implementations
 * must be thread-safe.
 *
 * <p>Degree forms are not the finder's job: when a word is no label, {@link ConsistencyAnalysis}
 * asks the finder again with its base form from {@link ComparativeMorphology} ("roomier" →
 * "roomy"), so any matcher gains comparative and superlative morphology.
 *
 * <p>Two implementations: {@link #labeler(Labeler)}, the labeling stage's own matcher, so feedback
 * and catalog are matched by the same rules (what the command line uses), and
 * {@link #exactLabels(FeedbackVocabulary)}, a plain whole-token label match for small tests.
 */
@FunctionalInterface
public interface FeedbackTermFinder {

    /** The concepts named in {@code sentence}, with 0-based, end-exclusive char offsets into it. */
    List<FeedbackTermHit> find(String sentence);

    /**
     * Whole-token, leftmost-longest, case-insensitive match of every label of every concept
     * (Lucene's StandardTokenizer words, lower-cased with {@code Locale.ROOT}, accents folded to
     * ASCII); a match never crosses clause punctuation. A label shared by several concepts gives
     * one hit per concept.
     */
    static FeedbackTermFinder exactLabels(FeedbackVocabulary vocabulary) {
        return new FeedbackLabelMatcher(vocabulary);
    }

    /**
     * The labeling stage's matcher: each sentence is labeled as a one-field listing with the
     * labeler's vocabulary, analysis profile and options; every term occurrence is a hit.
     */
    static FeedbackTermFinder labeler(Labeler labeler) {
        return new FeedbackLabelerFinder(labeler);
    }
}
