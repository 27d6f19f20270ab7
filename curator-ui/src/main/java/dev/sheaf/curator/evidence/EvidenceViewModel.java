package dev.sheaf.curator.evidence;

import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.curator.session.Notice;
import dev.sheaf.curator.session.Selection;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.Vocabulary;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.Executor;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import javafx.beans.InvalidationListener;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * Evidence for what is selected: keyword-in-context lines for the selected candidate term, or for
 * every label of the selected concept, with listing id, source file and field; and the listing
 * behind a line. Queries run on a worker; only the answer to the latest selection is shown.
 */
public final class EvidenceViewModel {
    /** Most lines shown for one selection. */
    public static final int LIMIT = 200;

    private final Executor worker;
    private final Executor ui;
    private final Consumer<Notice> notices;
    private final ObservableList<EvidenceLine> lines = FXCollections.observableArrayList();
    private final ReadOnlyStringWrapper heading = new ReadOnlyStringWrapper(this, "heading", "Evidence");
    private final ReadOnlyStringWrapper note = new ReadOnlyStringWrapper(this, "note", "");
    private final ReadOnlyBooleanWrapper searching = new ReadOnlyBooleanWrapper(this, "searching");
    private final ObjectProperty<Listing> shownListing = new SimpleObjectProperty<>(this, "shownListing");
    private final AtomicLong generation = new AtomicLong();
    private final InvalidationListener update = o -> refresh();
    private CuratorSession session;

    public EvidenceViewModel(Executor worker, Executor ui, Consumer<Notice> notices) {
        this.worker = Objects.requireNonNull(worker);
        this.ui = Objects.requireNonNull(ui);
        this.notices = Objects.requireNonNull(notices);
    }

    public void setSession(CuratorSession s) {
        if (session != null) {
            session.selection().focusProperty().removeListener(update);
            session.selection().termProperty().removeListener(update);
            session.selection().conceptProperty().removeListener(update);
        }
        session = s;
        if (s != null) {
            s.selection().focusProperty().addListener(update);
            s.selection().termProperty().addListener(update);
            s.selection().conceptProperty().addListener(update);
        }
        refresh();
    }

    /** Looks the current selection up again (after the index was built, or a concept's labels changed). */
    public void refresh() {
        long gen = generation.incrementAndGet();
        CuratorSession s = session;
        List<String> phrases = new ArrayList<>();
        String subject = null;
        if (s != null) {
            Selection sel = s.selection();
            if (sel.focus() == Selection.Focus.TERM && sel.term() != null) {
                phrases.add(sel.term());
                subject = "\"" + sel.term() + "\"";
            } else if (sel.focus() == Selection.Focus.CONCEPT && sel.concept() != null) {
                Vocabulary v = s.vocabulary();
                phrases.addAll(CuratorSession.searchPhrases(v, sel.concept()));
                subject = v.displayLabel(sel.concept()) + (phrases.size() > 1 ? " (" + phrases.size() + " labels)" : "");
            }
        }
        if (phrases.isEmpty()) {
            lines.clear();
            heading.set("Evidence");
            note.set(s == null ? "" : "Select a candidate or a concept to see where the listings say it.");
            searching.set(false);
            return;
        }
        String what = subject;
        searching.set(true);
        heading.set("Evidence for " + what);
        note.set("Searching the listings…");
        worker.execute(() -> {
            List<EvidenceLine> found = new ArrayList<>();
            long listings = 0;
            String error = null;
            try {
                for (String p : phrases) {
                    if (found.size() >= LIMIT) {
                        break;
                    }
                    found.addAll(s.evidenceLines(p, LIMIT - found.size()));
                    long n = s.listingsWith(p);
                    listings = n < 0 || listings < 0 ? -1 : listings + n;
                }
            } catch (Exception e) {
                error = e.getMessage();
            }
            long n = listings;
            String err = error;
            boolean indexed = s.hasEvidenceIndex();
            ui.execute(() -> {
                if (generation.get() != gen) {
                    return;
                }
                searching.set(false);
                lines.setAll(found);
                heading.set("Evidence for " + what);
                if (err != null) {
                    note.set("The evidence index could not be searched: " + err);
                } else if (!indexed) {
                    note.set(found.isEmpty() ? "No lines in the harvest for this; the evidence index is not built yet."
                            : "A few lines from the harvest; the full evidence index is not built yet.");
                } else {
                    note.set(String.format(Locale.ROOT, "%,d line%s shown%s · in %,d listing%s%s", found.size(), found.size() == 1 ? "" : "s",
                            found.size() >= LIMIT ? " (first " + LIMIT + ")" : "", n, n == 1 ? "" : "s",
                            phrases.size() > 1 ? " (counted per label)" : ""));
                }
            });
        });
    }

    /** Fetches the listing behind a line and puts it in {@link #shownListingProperty()} (the view shows it). */
    public void openListing(EvidenceLine line) {
        CuratorSession s = session;
        if (line == null || s == null) {
            return;
        }
        if (!s.hasEvidenceIndex()) {
            notices.accept(new Notice(Notice.Kind.INFO, "Listing not available yet",
                    "Opening a listing needs the evidence index, which is not built yet for this workspace."));
            return;
        }
        worker.execute(() -> {
            Optional<Listing> l;
            String err = null;
            try {
                l = s.listing(line.listingId());
            } catch (Exception e) {
                l = Optional.empty();
                err = e.getMessage();
            }
            Optional<Listing> found = l;
            String e = err;
            ui.execute(() -> {
                if (found.isPresent()) {
                    shownListing.set(found.get());
                } else {
                    notices.accept(new Notice(Notice.Kind.WARNING, "Listing not found", "Listing " + line.listingId()
                            + " (" + line.source() + ") is not in the evidence index" + (e == null ? "" : ": " + e)
                            + ". Mine the workspace again to rebuild it."));
                }
            });
        });
    }

    public ObservableList<EvidenceLine> lines() {
        return lines;
    }

    public ReadOnlyStringProperty headingProperty() {
        return heading.getReadOnlyProperty();
    }

    /** How many lines and listings, or why there are none. */
    public ReadOnlyStringProperty noteProperty() {
        return note.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty searchingProperty() {
        return searching.getReadOnlyProperty();
    }

    /** The listing to show in a dialog; the view sets it back to null when the dialog closes. */
    public ObjectProperty<Listing> shownListingProperty() {
        return shownListing;
    }
}
