package dev.sheaf.miner.measure;

import java.util.List;
import java.util.Objects;

/**
 * The judgments read from one source, with the rows that could not be read. Immutable.
 * Repeated and conflicting rows are kept here as read; {@link AgreementAnalysis} finds them,
 * because whether two rows judge the same attribute depends on the attribute resolver.
 */
public final class Judgments {
    private final String source;
    private final List<Judgment> list;
    private final List<JudgmentProblem> problems;

    private Judgments(String source, List<Judgment> list, List<JudgmentProblem> problems) {
        this.source = Objects.requireNonNull(source, "source");
        this.list = List.copyOf(list);
        this.problems = List.copyOf(problems);
    }

    /** Judgments from {@code source} (a display name) with the rows that could not be read. */
    public static Judgments of(String source, List<Judgment> judgments, List<JudgmentProblem> problems) {
        return new Judgments(source, judgments, problems);
    }

    /** Judgments made in code (no reading problems). */
    public static Judgments of(String source, List<Judgment> judgments) {
        return new Judgments(source, judgments, List.of());
    }

    /** The source's display name (a path relative to the workspace, or a label). */
    public String source() {
        return source;
    }

    /** The judgments in source order. */
    public List<Judgment> list() {
        return list;
    }

    /** The rows that could not be read, in source order. */
    public List<JudgmentProblem> problems() {
        return problems;
    }

    @Override
    public String toString() {
        return "Judgments[" + source + ", " + list.size() + " judgments, " + problems.size() + " problems]";
    }
}
