package dev.sheaf.curator.session;

/** The one notice shown wherever a regulated-claim facet is selected or edited (DESIGN.md, "Cautions"): the details pane, the facet form, the figures. */
public final class Caution {
    /** The words of the notice. */
    public static final String REGULATED_CLAIM = "Regulated claim: labels mined from listing text are not verified product claims. "
            + "Values of this facet (such as waterproof ratings, flame resistance, UV protection, child safety or fibre content) "
            + "need human review, and defer to the applicable labelling rules and your compliance review before they are shown to shoppers.";

    private Caution() {
    }
}
