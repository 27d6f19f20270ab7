package dev.sheaf.miner.measure;

/**
 * What an alpha says about an attribute, after Krippendorff (2004, Content Analysis, 2nd ed.):
 * rely on data with α ≥ .800, draw only tentative conclusions at .667 ≤ α &lt; .800, and treat
 * lower values as contested. Edges are set in {@link AgreementThresholds}.
 */
public enum AgreementVerdict {
    /** α ≥ the reliable edge (.800). */
    RELIABLE("reliable"),
    /** tentative edge (.667) ≤ α &lt; reliable edge. */
    TENTATIVE("tentative"),
    /** α below the tentative edge: people disagree when applying the attribute. */
    CONTESTED("contested"),
    /** α could not be computed (fewer than two pairable values, or no variation at all). */
    UNDEFINED("n/a");

    private final String label;

    AgreementVerdict(String label) {
        this.label = label;
    }

    /** The verdict as printed. */
    public String label() {
        return label;
    }
}
