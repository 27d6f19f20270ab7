package dev.sheaf.curator.figures;

import dev.sheaf.curator.checks.LatestRun;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.vocab.Vocabulary;
import java.util.Locale;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.concurrent.Executor;
import javafx.application.Platform;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

/**
 * Live figures for the selected concept: listings covered by its labels, the fill rate of its
 * facet in the categories where the facet applies, and its flags when an audit output exists.
 * Recomputed on a background thread whenever the selection or the vocabulary changes; a new
 * request cancels the one still running. UI thread only.
 */
public final class FiguresViewModel {
    private final CuratorSession session;
    private final ListingLookup lookup;
    private final AuditFlags flags;
    private final LatestRun<ConceptFigures> run;
    private final ReadOnlyObjectWrapper<ConceptFigures> figures = new ReadOnlyObjectWrapper<>(this, "figures");
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "Select a concept to see its figures");
    private final CuratorSession.VocabularyListener onChange = c -> refresh();
    private long lastMillis = -1;

    /**
     * Figures on a daemon thread, delivered through {@code Platform::runLater}.
     *
     * @param lookup the listing queries, or null without an evidence index (then only the audit flags show)
     * @param flags the last audit's flags, or null when none
     */
    public FiguresViewModel(CuratorSession session, ListingLookup lookup, AuditFlags flags) {
        this(session, lookup, flags, LatestRun.onDaemonThread("sheaf-figures", Platform::runLater));
    }

    /** As above with these executors (tests pass {@code Runnable::run} for both). */
    public FiguresViewModel(CuratorSession session, ListingLookup lookup, AuditFlags flags, Executor worker, Executor ui) {
        this(session, lookup, flags, new LatestRun<>(worker, ui));
    }

    private FiguresViewModel(CuratorSession session, ListingLookup lookup, AuditFlags flags, LatestRun<ConceptFigures> run) {
        this.session = Objects.requireNonNull(session);
        this.lookup = lookup;
        this.flags = flags;
        this.run = run;
        session.addVocabularyListener(onChange);
        session.selection().conceptProperty().addListener((o, a, b) -> refresh());
        refresh();
    }

    public void dispose() {
        session.removeVocabularyListener(onChange);
        run.cancel();
    }

    /** Recomputes the figures of the selected concept (cancelling a computation still running). */
    public void refresh() {
        String id = session.selection().concept();
        Vocabulary v = session.vocabulary();
        if (id == null || !v.contains(id)) {
            run.cancel();
            figures.set(null);
            status.set("Select a concept to see its figures");
            return;
        }
        status.set("Counting listings for \"" + v.displayLabel(id) + "\"…");
        long t0 = System.nanoTime();
        var corpus = session.harvest() == null ? null : session.harvest().corpus();
        run.start(cancelled -> FigureCalculator.compute(v, id, lookup, corpus, flags, cancelled), f -> {
            lastMillis = (System.nanoTime() - t0) / 1_000_000;
            figures.set(f);
            status.set(lookup == null ? "No evidence index yet: mine the workspace to count listings" : "");
        }, e -> {
            if (!(e instanceof CancellationException)) {
                status.set("The figures could not be computed: " + e.getMessage());
            }
        });
    }

    /** The figures of the selected concept, or null while none is selected. */
    public ReadOnlyObjectProperty<ConceptFigures> figuresProperty() {
        return figures.getReadOnlyProperty();
    }

    /** What is happening ("Counting listings…"), or why no figures show; "" when they are current. */
    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty runningProperty() {
        return run.runningProperty();
    }

    /** How long the last delivered computation took, in milliseconds (-1 before the first). */
    public long lastMillis() {
        return lastMillis;
    }

    /** "123 of 400 listings (30.8%)", or "unknown". */
    public static String coveredText(ConceptFigures f) {
        if (f.covered() < 0) {
            return "unknown (no evidence index)";
        }
        return f.listings() > 0 ? String.format(Locale.ROOT, "%,d of %,d listings (%.1f%%)", f.covered(), f.listings(),
                100.0 * f.covered() / f.listings()) : String.format(Locale.ROOT, "%,d listings", f.covered());
    }

    /** "64.0% of 300 listings in: tents, packs", or why it is unknown. */
    public static String fillText(ConceptFigures f) {
        if (f.facetLabel().isEmpty()) {
            return "not under a facet";
        }
        if (Double.isNaN(f.fillRate())) {
            return f.eligible() == 0 ? "no listings in the categories where " + f.facetLabel() + " applies"
                    : "unknown (needs the harvest and the evidence index)";
        }
        String where = f.facetCategories().isEmpty() ? "every category" : String.join(", ", f.facetCategories());
        return String.format(Locale.ROOT, "%.1f%% (%,d of %,d listings; applies to %s)", 100 * f.fillRate(), f.filled(),
                f.eligible(), where);
    }
}
