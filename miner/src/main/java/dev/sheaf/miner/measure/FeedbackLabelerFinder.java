package dev.sheaf.miner.measure;

import dev.sheaf.miner.ingest.Field;
import dev.sheaf.miner.ingest.FieldKind;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.label.Assignment;
import dev.sheaf.miner.label.Assignments;
import dev.sheaf.miner.label.Evidence;
import dev.sheaf.miner.label.Labeler;
import dev.sheaf.miner.text.SegmentPart;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * {@link FeedbackTermFinder#labeler}: the labeling stage's token matcher run over one sentence as a
 * one-field listing, so feedback and catalog are matched by the same profile, labels and rules.
 * Every occurrence of a term concept (stated or negated: direction is {@link MentionCues}' job) is a
 * hit; numbers read from quantities are not terms and are left out. Thread-safe, as the labeler is.
 */
final class FeedbackLabelerFinder implements FeedbackTermFinder {
    private final Labeler labeler;

    FeedbackLabelerFinder(Labeler labeler) {
        this.labeler = Objects.requireNonNull(labeler, "labeler");
    }

    @Override
    public List<FeedbackTermHit> find(String sentence) {
        Listing one = new Listing("feedback", "", "feedback", "sentence",
                List.of(new Field(FieldKind.TEXT, "", sentence)));
        Assignments a = labeler.label(one);
        List<FeedbackTermHit> out = new ArrayList<>();
        for (Assignment x : a.assignments()) {
            if (x.isNumber()) {
                continue;
            }
            for (Evidence e : x.evidence()) {
                if (e.part() == SegmentPart.TEXT && e.labelKind() != null && e.end() > e.start()) {
                    out.add(new FeedbackTermHit(x.conceptId(), e.start(), e.end(), e.text(), null));
                }
            }
        }
        return out;
    }
}
