package dev.sheaf.miner.measure;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Objects;

/**
 * What {@link Flags#evaluate} reads; every part is optional, and a flag kind whose input is
 * missing is not evaluated (the report says so). Immutable; build with {@link #builder()}.
 */
public final class FlagInputs {
    private final ConsistencyReport consistency;
    private final AgreementReport agreement;
    private final FeedbackVocabulary vocabulary;
    private final List<FlagFill> fill;
    private final List<FlagOverlap> overlaps;

    private FlagInputs(Builder b) {
        this.consistency = b.consistency;
        this.agreement = b.agreement;
        this.vocabulary = b.vocabulary;
        this.fill = List.copyOf(b.fill);
        this.overlaps = List.copyOf(b.overlaps);
    }

    public static Builder builder() {
        return new Builder();
    }

    /** Feedback consistency (contested by direction, vague, ambiguous mentions), or null. */
    public ConsistencyReport consistency() {
        return consistency;
    }

    /** Annotator agreement (contested by alpha), or null. */
    public AgreementReport agreement() {
        return agreement;
    }

    /** The vocabulary (shared labels, regulated claims, labels to show), or null. */
    public FeedbackVocabulary vocabulary() {
        return vocabulary;
    }

    /** Fill rates (thin); empty when not given. */
    public List<FlagFill> fill() {
        return fill;
    }

    /** Overlap pairs (overlapping); empty when not given. */
    public List<FlagOverlap> overlaps() {
        return overlaps;
    }

    /** Collects the inputs. */
    public static final class Builder {
        private ConsistencyReport consistency;
        private AgreementReport agreement;
        private FeedbackVocabulary vocabulary;
        private final List<FlagFill> fill = new ArrayList<>();
        private final List<FlagOverlap> overlaps = new ArrayList<>();

        private Builder() {
        }

        public Builder consistency(ConsistencyReport r) {
            this.consistency = r;
            return this;
        }

        public Builder agreement(AgreementReport r) {
            this.agreement = r;
            return this;
        }

        public Builder vocabulary(FeedbackVocabulary v) {
            this.vocabulary = v;
            return this;
        }

        public Builder fill(Collection<FlagFill> f) {
            f.forEach(x -> fill.add(Objects.requireNonNull(x, "a fill rate is null")));
            return this;
        }

        public Builder overlaps(Collection<FlagOverlap> o) {
            o.forEach(x -> overlaps.add(Objects.requireNonNull(x, "an overlap is null")));
            return this;
        }

        public FlagInputs build() {
            java.util.Set<String> seen = new java.util.HashSet<>();
            for (FlagFill f : fill) {
                if (!seen.add(f.attribute())) {
                    throw new IllegalArgumentException("two fill rates for " + f.attribute() + "; give one per attribute");
                }
            }
            return new FlagInputs(this);
        }
    }
}
