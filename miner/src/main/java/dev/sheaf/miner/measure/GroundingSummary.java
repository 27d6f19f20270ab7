package dev.sheaf.miner.measure;

/**
 * How an attribute's mentions stand against the catalog.
 *
 * @param presenceChecked      present/absent mentions the catalog could check
 * @param presenceGrounded     of those, grounded
 * @param contrastKnown        grounded presence mentions whose reference is in the catalog
 * @param contrasts            of those, where the reference is the other way (lacks it, or has it)
 * @param comparisonChecked    more/less mentions the catalog could check (scale, both values)
 * @param comparisonGrounded   of those, grounded
 * @param unchecked            mentions the catalog could not check
 * @param mentions             all mentions
 */
public record GroundingSummary(int presenceChecked, int presenceGrounded, int contrastKnown, int contrasts,
                               int comparisonChecked, int comparisonGrounded, int unchecked, int mentions) {
    public GroundingSummary {
        if (presenceGrounded > presenceChecked || comparisonGrounded > comparisonChecked || contrasts > contrastKnown
                || contrastKnown > presenceGrounded || presenceChecked + comparisonChecked + unchecked != mentions
                || presenceGrounded < 0 || comparisonGrounded < 0 || contrasts < 0 || unchecked < 0) {
            throw new IllegalArgumentException("inconsistent grounding counts: presence " + presenceGrounded + "/"
                    + presenceChecked + ", contrast " + contrasts + "/" + contrastKnown + ", comparison "
                    + comparisonGrounded + "/" + comparisonChecked + ", unchecked " + unchecked + ", mentions " + mentions);
        }
    }

    /** Presence precision: grounded / checked present-or-absent mentions; NaN when none was checked. */
    public double presencePrecision() {
        return ratio(presenceGrounded, presenceChecked);
    }

    /** Comparison precision: grounded / checked more-or-less mentions; NaN when none was checked. */
    public double comparisonPrecision() {
        return ratio(comparisonGrounded, comparisonChecked);
    }

    /** Share of grounded presence mentions that set the target apart from the reference; NaN when unknown. */
    public double contrastRate() {
        return ratio(contrasts, contrastKnown);
    }

    public int checked() {
        return presenceChecked + comparisonChecked;
    }

    public int grounded() {
        return presenceGrounded + comparisonGrounded;
    }

    /** Grounding precision over every checked mention; NaN when none was checked. */
    public double precision() {
        return ratio(grounded(), checked());
    }

    /** Grounded mentions over all mentions (unchecked ones count against it); NaN for no mentions. */
    public double groundedShare() {
        return ratio(grounded(), mentions);
    }

    private static double ratio(int a, int b) {
        return b == 0 ? Double.NaN : (double) a / b;
    }
}
