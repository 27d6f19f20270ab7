package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything {@link ConsistencyAnalysis} found in a feedback file. People appear only as pseudonyms.
 *
 * @param source                the feedback source's display name
 * @param rowsRead              data rows read
 * @param sentences             sentences analysed (rows left out are in {@code problems})
 * @param pairs                 distinct pairs among them
 * @param annotators            distinct people among them
 * @param sentencesWithMentions sentences with at least one attribute mention
 * @param attributes            per attribute, by attribute id
 * @param mentions              every mention, in sentence order
 * @param contradictions        every contradiction, by attribute then pair
 * @param gaps                  feedback words and phrases no label covers, ranked
 * @param unmentioned           vocabulary concepts (facets included) nobody mentioned, by id
 * @param problems              rows left out, in source order
 * @param scalesSource          where the scales came from ("none" when there were none)
 * @param catalogGiven          whether catalog facts were given for grounding
 * @param notes                 remarks about the run as a whole
 */
public record ConsistencyReport(String source, int rowsRead, int sentences, int pairs, int annotators,
                                int sentencesWithMentions, List<ConsistencyAttribute> attributes,
                                List<FeedbackMention> mentions, List<ConsistencyContradiction> contradictions,
                                List<GapTerm> gaps, List<String> unmentioned, List<FeedbackProblem> problems,
                                String scalesSource, boolean catalogGiven, List<String> notes) {
    public ConsistencyReport {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(scalesSource, "scalesSource");
        attributes = List.copyOf(attributes);
        mentions = List.copyOf(mentions);
        contradictions = List.copyOf(contradictions);
        gaps = List.copyOf(gaps);
        unmentioned = List.copyOf(unmentioned);
        problems = List.copyOf(problems);
        notes = List.copyOf(notes);
        if (sentencesWithMentions > sentences || sentences > rowsRead) {
            throw new IllegalArgumentException("need sentencesWithMentions <= sentences <= rowsRead; got "
                    + sentencesWithMentions + ", " + sentences + ", " + rowsRead);
        }
    }

    /** The attribute with this id, if anyone mentioned it. */
    public Optional<ConsistencyAttribute> attribute(String id) {
        return attributes.stream().filter(a -> a.attribute().equals(id)).findFirst();
    }

    /** True when some rows were left out. */
    public boolean hasProblems() {
        return !problems.isEmpty();
    }
}
