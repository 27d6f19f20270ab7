package dev.sheaf.miner.cli;

/** The exit codes every {@code sheaf} command uses; listed in {@code --help}. */
public final class ExitCodes {
    /** The job finished and every input was read. */
    public static final int OK = 0;
    /** The job could not finish (an output could not be written, an internal error). */
    public static final int FAILURE = 1;
    /** The command line was wrong: unknown option, missing argument, bad value. */
    public static final int USAGE = 2;
    /** The job finished, but some inputs were unreadable; see problems.csv. */
    public static final int PROBLEMS = 3;
    /** A check ran and found errors (sheaf check). */
    public static final int FINDINGS = 4;
    /** The command is not built yet in this version. */
    public static final int NOT_AVAILABLE = 5;

    /** The text for the {@code --help} footer. */
    static final String HELP_LIST = "Exit codes:%n"
            + "  0  ok: finished, every input read%n"
            + "  1  failure: could not finish (see the message on stderr)%n"
            + "  2  usage: wrong command line%n"
            + "  3  problems: finished, but some inputs were unreadable (see problems.csv)%n"
            + "  4  findings: a check found errors%n"
            + "  5  not available: this command is not built yet";

    private ExitCodes() {
    }
}
