package dev.sheaf.curator.checks;

import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.vocab.CheckReport;
import dev.sheaf.vocab.Finding;
import dev.sheaf.vocab.Severity;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyChecker;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.Executor;
import javafx.application.Platform;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The vocabulary checks as a list (severity, rule, message, hint) that follows every edit: each
 * change starts {@link VocabularyChecker#check} on a background thread and a newer change
 * cancels the older run, so the list always shows the checks of the vocabulary as it is now.
 * {@link #jumpTo} selects the finding's concept, which the hierarchy then opens and shows.
 * UI thread only.
 */
public final class ChecksViewModel {

    /**
     * One row of the list.
     *
     * @param severity error, warning or note
     * @param rule the rule's id ("no-pref-label" ...)
     * @param message what is wrong
     * @param hint how to fix it
     * @param concepts the concept ids involved (the first is the one to jump to)
     */
    public record CheckRow(Severity severity, String rule, String message, String hint, List<String> concepts) {
        public CheckRow {
            Objects.requireNonNull(severity);
            Objects.requireNonNull(rule);
            Objects.requireNonNull(message);
            hint = hint == null ? "" : hint;
            concepts = List.copyOf(concepts);
        }

        /** The word shown in the severity column: error, warning, note. */
        public String severityWord() {
            return severity == Severity.INFO ? "note" : severity.word();
        }
    }

    private final CuratorSession session;
    private final LatestRun<CheckReport> run;
    private final ObservableList<CheckRow> rows = FXCollections.observableArrayList();
    private final ReadOnlyStringWrapper summary = new ReadOnlyStringWrapper(this, "summary", "Checking…");
    private final CuratorSession.VocabularyListener onChange = c -> recheck();
    private long lastMillis = -1;

    /** Checks on a daemon thread, results through {@code Platform::runLater}. */
    public ChecksViewModel(CuratorSession session) {
        this(session, LatestRun.onDaemonThread("sheaf-checks", Platform::runLater));
    }

    /** Checks with these executors (tests pass {@code Runnable::run} for both). */
    public ChecksViewModel(CuratorSession session, Executor worker, Executor ui) {
        this(session, new LatestRun<>(worker, ui));
    }

    private ChecksViewModel(CuratorSession session, LatestRun<CheckReport> run) {
        this.session = Objects.requireNonNull(session);
        this.run = run;
        session.addVocabularyListener(onChange);
        recheck();
    }

    public void dispose() {
        session.removeVocabularyListener(onChange);
        run.cancel();
    }

    /** Starts checking the current vocabulary (cancelling a check still running). */
    public void recheck() {
        Vocabulary v = session.vocabulary();
        summary.set("Checking…");
        long t0 = System.nanoTime();
        run.start(cancelled -> VocabularyChecker.check(v), report -> {
            lastMillis = (System.nanoTime() - t0) / 1_000_000;
            show(report);
        }, failure -> summary.set("The checks failed: " + failure.getMessage()));
    }

    private void show(CheckReport report) {
        List<CheckRow> out = new ArrayList<>();
        for (Finding f : report.findings()) {
            out.add(new CheckRow(f.severity(), f.rule().id(), f.message(), f.hint(), f.concepts()));
        }
        out.sort(Comparator.comparing(CheckRow::severity).thenComparing(CheckRow::rule).thenComparing(CheckRow::message));
        rows.setAll(out);
        summary.set(report.findings().isEmpty() ? "No findings: the vocabulary passes every check" : report.summary());
    }

    /** Selects the first concept of the row that still exists; false when it names none. */
    public boolean jumpTo(CheckRow row) {
        if (row == null) {
            return false;
        }
        Vocabulary v = session.vocabulary();
        for (String id : row.concepts()) {
            if (v.contains(id)) {
                session.selection().selectConcept(id);
                return true;
            }
        }
        return false;
    }

    /** The findings, errors first. */
    public ObservableList<CheckRow> rows() {
        return rows;
    }

    /** "2 errors, 1 warning, 0 notes", or "Checking…" while a check runs. */
    public ReadOnlyStringProperty summaryProperty() {
        return summary.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty runningProperty() {
        return run.runningProperty();
    }

    /** How long the last delivered check took, in milliseconds (-1 before the first). */
    public long lastMillis() {
        return lastMillis;
    }
}
