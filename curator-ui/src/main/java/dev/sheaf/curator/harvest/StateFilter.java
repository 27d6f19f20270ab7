package dev.sheaf.curator.harvest;

/** Which decision states the triage table shows. */
public enum StateFilter {
    TO_DECIDE("To decide"),
    PARKED("Parked"),
    KEPT("Kept"),
    DROPPED("Dropped"),
    IN_VOCABULARY("Already in the vocabulary"),
    ALL("All candidates");

    private final String label;

    StateFilter(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    boolean accepts(DecisionState s) {
        switch (this) {
            case TO_DECIDE:
                return s == DecisionState.UNDECIDED;
            case PARKED:
                return s == DecisionState.PARKED;
            case KEPT:
                return s == DecisionState.KEPT;
            case DROPPED:
                return s == DecisionState.DROPPED;
            case IN_VOCABULARY:
                return s == DecisionState.IN_VOCABULARY;
            default:
                return true;
        }
    }

    @Override
    public String toString() {
        return label;
    }
}
