package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * The feedback sentences read from one source, with the rows left out. Immutable.
 *
 * @param source    the source's display name (a path relative to the workspace, or a label)
 * @param sentences the usable sentences, in source order
 * @param problems  the rows left out, in source order
 * @param rowsRead  data rows seen (blank rows not counted)
 */
public record FeedbackSentences(String source, List<FeedbackSentence> sentences, List<FeedbackProblem> problems,
                                int rowsRead) {
    public FeedbackSentences {
        Objects.requireNonNull(source, "source");
        sentences = List.copyOf(sentences);
        problems = List.copyOf(problems);
        if (rowsRead < sentences.size()) {
            throw new IllegalArgumentException("rowsRead (" + rowsRead + ") must be at least the " + sentences.size()
                    + " sentences kept");
        }
    }

    /** Sentences made in code (no reading problems). */
    public static FeedbackSentences of(String source, List<FeedbackSentence> sentences) {
        return new FeedbackSentences(source, sentences, List.of(), sentences.size());
    }
}
