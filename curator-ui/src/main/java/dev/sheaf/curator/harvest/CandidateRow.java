package dev.sheaf.curator.harvest;

import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.vocab.Terms;
import java.util.List;
import java.util.Locale;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

/**
 * One candidate of the harvest as the triage table shows it: the mined figures (fixed) and the
 * decision state (follows the vocabulary). The lower-case term and the decision key are computed
 * once, so filtering a keystroke over 20,000 rows compares plain strings.
 */
public final class CandidateRow {
    private final Harvest.Candidate candidate;
    final String lower;
    final String key;
    final String[] categories;
    private final ReadOnlyObjectWrapper<DecisionState> state = new ReadOnlyObjectWrapper<>(this, "state", DecisionState.UNDECIDED);
    private final ReadOnlyStringWrapper conceptLabel = new ReadOnlyStringWrapper(this, "conceptLabel", "");
    String conceptId;

    CandidateRow(Harvest.Candidate c) {
        this.candidate = c;
        this.lower = c.term().toLowerCase(Locale.ROOT);
        this.key = Terms.normalise(c.term());
        List<Harvest.CategoryScore> tc = c.topCategories();
        this.categories = new String[tc.size()];
        for (int i = 0; i < tc.size(); i++) {
            categories[i] = tc.get(i).category();
        }
    }

    public Harvest.Candidate candidate() {
        return candidate;
    }

    public String term() {
        return candidate.term();
    }

    public int rank() {
        return candidate.rank();
    }

    public int words() {
        return candidate.n();
    }

    public long frequency() {
        return candidate.frequency();
    }

    public long df() {
        return candidate.df();
    }

    /** The ranking score, NaN when it is not defined for this term. */
    public double score() {
        return candidate.score() == null ? Double.NaN : candidate.score();
    }

    /** The category where the term is most distinctive, or "". */
    public String topCategory() {
        return categories.length == 0 ? "" : categories[0];
    }

    public ReadOnlyObjectProperty<DecisionState> stateProperty() {
        return state.getReadOnlyProperty();
    }

    public DecisionState state() {
        return state.get();
    }

    /** The concept a kept term became or joined (its preferred label), or the concept that already has it as a label; else "". */
    public ReadOnlyStringProperty conceptLabelProperty() {
        return conceptLabel.getReadOnlyProperty();
    }

    /** The id behind {@link #conceptLabelProperty()}, or null. */
    public String conceptId() {
        return conceptId;
    }

    /** Sets the state; returns true when it changed. */
    boolean update(DecisionState s, String cid, String clabel) {
        boolean changed = s != state.get() || !clabel.equals(conceptLabel.get());
        conceptId = cid;
        state.set(s);
        conceptLabel.set(clabel);
        return changed;
    }

    @Override
    public String toString() {
        return candidate.term() + " [" + state.get() + "]";
    }
}
