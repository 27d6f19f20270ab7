package dev.sheaf.curator.harvest;

/** Where a candidate stands: not decided, kept, dropped, parked, or already a label in the vocabulary without a decision. */
public enum DecisionState {
    UNDECIDED("to decide"),
    KEPT("kept"),
    DROPPED("dropped"),
    PARKED("parked"),
    IN_VOCABULARY("in vocabulary");

    private final String word;

    DecisionState(String word) {
        this.word = word;
    }

    /** How the table shows it. */
    public String word() {
        return word;
    }
}
