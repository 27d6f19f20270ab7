package dev.sheaf.curator.app;

import dev.sheaf.curator.details.DetailsViewModel;
import dev.sheaf.curator.evidence.EvidenceViewModel;
import dev.sheaf.curator.harvest.HarvestViewModel;
import dev.sheaf.curator.session.Background;
import dev.sheaf.curator.session.CuratorSession;
import dev.sheaf.curator.session.Notice;
import dev.sheaf.curator.session.Mining;
import dev.sheaf.curator.session.RecentWorkspaces;
import dev.sheaf.miner.ingest.EvidenceIndex;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.vocab.EditRefusedException;
import dev.sheaf.vocab.store.StaleVocabularyException;
import dev.sheaf.vocab.store.VocabularyLockedException;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.Executor;
import java.util.function.Consumer;
import javafx.beans.binding.Bindings;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;

/**
 * The main window's state: the open {@link CuratorSession}, the status line, background work
 * (opening, mining, indexing) with progress and cancel, the recent workspaces, and the panels'
 * view-models (harvest, details, evidence), which follow the session. Intents: open, save,
 * save as, undo, redo, mine again, cancel, close. Notices (errors, warnings) go to listeners.
 */
public final class MainViewModel {
    private final Background background;
    private final Executor ui;
    private final RecentWorkspaces recent;
    private final ReadOnlyObjectWrapper<CuratorSession> session = new ReadOnlyObjectWrapper<>(this, "session");
    private final ReadOnlyStringWrapper status = new ReadOnlyStringWrapper(this, "status", "Open a workspace to start (Ctrl+O).");
    private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "Sheaf curator");
    private final ReadOnlyStringWrapper saveState = new ReadOnlyStringWrapper(this, "saveState", "");
    private final ObservableList<Path> recentList = FXCollections.observableArrayList();
    private final List<Consumer<Notice>> noticeListeners = new CopyOnWriteArrayList<>();
    private final HarvestViewModel harvest;
    private final DetailsViewModel details;
    private final EvidenceViewModel evidence;

    /**
     * @param background long work (opening, mining, indexing)
     * @param queries    where evidence queries run (a worker; tests pass Runnable::run)
     * @param ui         the UI thread (Platform::runLater; tests pass Runnable::run)
     * @param recent     the recent-workspaces file
     */
    public MainViewModel(Background background, Executor queries, Executor ui, RecentWorkspaces recent) {
        this.background = Objects.requireNonNull(background);
        this.ui = Objects.requireNonNull(ui);
        this.recent = Objects.requireNonNull(recent);
        this.harvest = new HarvestViewModel(this::post);
        this.details = new DetailsViewModel();
        this.evidence = new EvidenceViewModel(queries, ui, this::post);
        recentList.setAll(recent.list());
        session.addListener((o, was, now) -> {
            harvest.setSession(now);
            details.setSession(now);
            evidence.setSession(now);
            updateTitle();
            if (now != null) {
                now.dirtyProperty().addListener((x, a, b) -> updateTitle());
                now.vocabularyProperty().addListener((x, a, b) -> updateTitle());
                // every edit, from whichever panel, says what it did (the harvest's own message follows for its edits)
                now.addVocabularyListener(c -> {
                    if (c.action() == dev.sheaf.vocab.EditHistory.Action.DO) {
                        status.set(c.description() + ". Undo: Ctrl+Z.");
                    }
                });
            }
        });
        harvest.messageProperty().addListener((o, a, b) -> {
            if (b != null && !b.isEmpty()) {
                status.set(b);
            }
        });
    }

    // ------------------------------------------------------------------ intents

    /** Opens a workspace folder in the background (closing the current one first; its unsaved edits stay in its journal). */
    public void open(Path dir) {
        if (background.runningProperty().get()) {
            post(new Notice(Notice.Kind.WARNING, "Still busy", "\"" + background.titleProperty().get()
                    + "\" is running; wait for it or cancel it (Esc in the status bar) before opening another workspace."));
            return;
        }
        closeSession();
        Path abs = dir.toAbsolutePath().normalize();
        status.set("Opening " + abs + " …");
        background.submit("Opening the workspace", (p, c) -> CuratorSession.open(abs), s -> opened(s, abs), e -> {
            if (e instanceof VocabularyLockedException) {
                post(new Notice(Notice.Kind.ERROR, "The vocabulary is open elsewhere", e.getMessage()
                        + ". The workspace was not opened, so nothing can be overwritten."));
            } else {
                post(new Notice(Notice.Kind.ERROR, "Cannot open the workspace", message(e)));
            }
            status.set("Could not open " + abs + ".");
        });
    }

    private void opened(CuratorSession s, Path dir) {
        session.set(s);
        try {
            recentList.setAll(recent.remember(dir));
        } catch (IOException e) {
            status.set("Opened; the recent-workspaces list could not be written (" + e.getMessage() + ").");
        }
        StringBuilder b = new StringBuilder("Opened ").append(s.workspace().name()).append(": ");
        b.append(s.createdVocabulary() ? "started a new vocabulary " : "vocabulary ").append(s.vocabularyFile().getFileName());
        b.append(String.format(Locale.ROOT, " (%,d concepts)", s.vocabulary().size()));
        if (s.harvest() != null) {
            b.append(String.format(Locale.ROOT, ", %,d candidates", s.harvest().candidates().size()));
        }
        b.append('.');
        status.set(b.toString());
        if (!s.recovery().isEmpty()) {
            post(new Notice(Notice.Kind.INFO, "Unsaved edits recovered", String.join("\n", s.recovery().notes())));
        }
        if (s.harvest() == null) {
            mine();
        } else if (!s.hasEvidenceIndex()) {
            index();
        }
    }

    /** Mines the harvest from the workspace's sources in the background (and builds the evidence index). */
    public void mine() {
        CuratorSession s = session.get();
        if (s == null || background.runningProperty().get()) {
            return;
        }
        Workspace ws = s.workspace();
        background.submit("Mining the harvest", (p, c) -> {
            Mining.Result r = Mining.mine(ws, p, c);
            return new Object[] {r, Mining.openIndex(ws)};
        }, out -> {
            Mining.Result r = (Mining.Result) out[0];
            if (session.get() != s) {
                return;
            }
            s.setEvidenceIndex((EvidenceIndex) out[1]);
            s.setHarvest(r.harvest());
            status.set(String.format(Locale.ROOT, "Mined %,d listings: %,d candidates%s.", r.listings(),
                    r.harvest().candidates().size(), r.problems() == 0 ? "" : String.format(Locale.ROOT,
                            "; %,d input problems listed in %s", r.problems(), ws.output().resolve("problems.csv"))));
        }, e -> failed("Mining", e));
    }

    /** Builds the evidence index in the background (when the harvest came from the command line). */
    public void index() {
        CuratorSession s = session.get();
        if (s == null || background.runningProperty().get()) {
            return;
        }
        Workspace ws = s.workspace();
        background.submit("Indexing listings for evidence", (p, c) -> Mining.index(ws, p, c), ix -> {
            if (session.get() == s) {
                s.setEvidenceIndex(ix);
                evidence.refresh();
                status.set("Evidence index ready: every listing is searchable.");
            }
        }, e -> failed("Indexing", e));
    }

    private void failed(String what, Throwable e) {
        if (e instanceof CancellationException) {
            status.set(what + " was cancelled; nothing was written.");
        } else {
            post(new Notice(Notice.Kind.ERROR, what + " failed", message(e)));
            status.set(what + " failed.");
        }
    }

    /** Asks the running background job to stop. */
    public void cancelWork() {
        background.cancel();
    }

    /** Saves the vocabulary; a file changed on disk is reported (nothing overwritten). Returns true when the vocabulary is saved. */
    public boolean save() {
        CuratorSession s = session.get();
        if (s == null) {
            return false;
        }
        try {
            boolean wrote = s.save();
            status.set(wrote ? "Saved " + s.vocabularyFile().getFileName() + "." : "Nothing to save: the file is up to date.");
            updateTitle();
            return true;
        } catch (StaleVocabularyException e) {
            post(new Notice(Notice.Kind.WARNING, "The file changed on disk", e.getMessage()));
        } catch (IOException | UncheckedIOException e) {
            post(new Notice(Notice.Kind.ERROR, "Cannot save", message(e) + " Your edits are safe in the edit journal."));
        }
        return false;
    }

    /** Saves under another name and continues there. */
    public boolean saveAs(Path target) {
        CuratorSession s = session.get();
        if (s == null) {
            return false;
        }
        try {
            s.saveAs(target);
            status.set("Saved as " + target + "; editing continues there.");
            updateTitle();
            return true;
        } catch (IOException | UncheckedIOException e) {
            post(new Notice(Notice.Kind.ERROR, "Cannot save as " + target.getFileName(), message(e)));
            return false;
        }
    }

    public void undo() {
        CuratorSession s = session.get();
        if (s != null && s.canUndoProperty().get()) {
            String d = s.undoTextProperty().get();
            guarded(s::undo);
            status.set("Undone: " + d);
        }
    }

    public void redo() {
        CuratorSession s = session.get();
        if (s != null && s.canRedoProperty().get()) {
            String d = s.redoTextProperty().get();
            guarded(s::redo);
            status.set("Redone: " + d);
        }
    }

    private void guarded(Runnable r) {
        try {
            r.run();
        } catch (EditRefusedException | UncheckedIOException e) {
            post(new Notice(Notice.Kind.ERROR, "Not done", message(e)));
        }
    }

    /** True when closing now would leave edits that are not in the vocabulary file (they are in the journal). */
    public boolean hasUnsavedEdits() {
        CuratorSession s = session.get();
        return s != null && s.isDirty();
    }

    /** Closes the workspace; unsaved edits stay in the edit journal and come back on the next open. */
    public void closeSession() {
        CuratorSession s = session.get();
        if (s == null) {
            return;
        }
        session.set(null);
        try {
            s.close();
        } catch (IOException e) {
            post(new Notice(Notice.Kind.WARNING, "Closing the vocabulary", message(e)));
        }
        status.set("Closed " + s.workspace().name() + ".");
    }

    // ------------------------------------------------------------------ state

    public ReadOnlyObjectProperty<CuratorSession> sessionProperty() {
        return session.getReadOnlyProperty();
    }

    public CuratorSession session() {
        return session.get();
    }

    public Background background() {
        return background;
    }

    public ReadOnlyStringProperty statusProperty() {
        return status.getReadOnlyProperty();
    }

    /** Window title: workspace, vocabulary file and an unsaved mark. */
    public ReadOnlyStringProperty titleProperty() {
        return title.getReadOnlyProperty();
    }

    /** "Saved", or "Unsaved edits (kept in the journal)". */
    public ReadOnlyStringProperty saveStateProperty() {
        return saveState.getReadOnlyProperty();
    }

    public ObservableList<Path> recentWorkspaces() {
        return recentList;
    }

    public HarvestViewModel harvest() {
        return harvest;
    }

    public DetailsViewModel details() {
        return details;
    }

    public EvidenceViewModel evidence() {
        return evidence;
    }

    public void addNoticeListener(Consumer<Notice> l) {
        noticeListeners.add(l);
    }

    void post(Notice n) {
        ui.execute(() -> {
            if (n.kind() == Notice.Kind.INFO) {
                status.set(n.title() + ": " + n.text().replace('\n', ' '));
            }
            for (Consumer<Notice> l : noticeListeners) {
                l.accept(n);
            }
        });
    }

    private void updateTitle() {
        CuratorSession s = session.get();
        if (s == null) {
            title.set("Sheaf curator");
            saveState.set("");
            return;
        }
        title.set((s.isDirty() ? "• " : "") + s.workspace().name() + " — " + s.vocabularyFile().getFileName() + " — Sheaf curator");
        saveState.set(s.isDirty() ? "Unsaved edits (safe in the journal)" : "Saved");
    }

    static String message(Throwable e) {
        Throwable t = e;
        while ((t instanceof UncheckedIOException || t instanceof java.util.concurrent.CompletionException) && t.getCause() != null) {
            t = t.getCause();
        }
        String m = t.getMessage();
        return m == null || m.isBlank() ? t.getClass().getSimpleName() : m;
    }

    /** True while a workspace is open (menus bind their disabled state to it). */
    public javafx.beans.binding.BooleanBinding hasSession() {
        return Bindings.isNotNull(session);
    }
}
