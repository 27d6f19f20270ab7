package dev.sheaf.curator.session;

import dev.sheaf.miner.ingest.EvidenceIndex;
import dev.sheaf.miner.ingest.Listing;
import dev.sheaf.miner.ingest.Workspace;
import dev.sheaf.miner.mine.Harvest;
import dev.sheaf.miner.mine.HarvestFiles;
import dev.sheaf.miner.text.EvidenceLine;
import dev.sheaf.vocab.Edit;
import dev.sheaf.vocab.EditHistory;
import dev.sheaf.vocab.EditRefusedException;
import dev.sheaf.vocab.Label;
import dev.sheaf.vocab.SchemeInfo;
import dev.sheaf.vocab.Terms;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.store.Recovery;
import dev.sheaf.vocab.store.StaleVocabularyException;
import dev.sheaf.vocab.store.VocabularyLockedException;
import dev.sheaf.vocab.store.VocabularyStore;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

/**
 * The one open workspace: its {@link Workspace} description, its {@link Harvest} (may be absent
 * until mined), its vocabulary opened for editing through a {@link VocabularyStore} (lock, edit
 * journal, atomic save), the evidence index when there is one, and the curator's
 * {@link Selection}. Every view-model of the desktop works through one session.
 *
 * <h2>Editing</h2>
 * Every change to the vocabulary goes through {@link #apply(Edit)}, {@link #undo()} or
 * {@link #redo()}, which use the store's {@link EditHistory}: each step is written to the journal
 * before it takes effect, so nothing is lost when the program stops. After each step
 * {@link #vocabularyProperty()} holds the new immutable snapshot and every
 * {@link VocabularyListener} hears about it (with the step's description, before and after).
 * Group several edits that a curator sees as one action with {@link Edit#batch}, so one undo
 * takes them back.
 *
 * <h2>Threads</h2>
 * Open a session off the UI thread ({@link #open} reads files); after that, call every method
 * and read every property on the JavaFX application thread only (the history is not
 * thread-safe and the properties are bound by views). The {@link Vocabulary} and {@link Harvest}
 * values handed out are immutable and may be given to background tasks. The evidence queries
 * ({@link #evidenceLines}, {@link #listing}, {@link #listingsWith}) are thread-safe and are
 * meant to run on background tasks.
 *
 * <h2>Files</h2>
 * <ul>
 *   <li>harvest: {@code OUTPUT/harvest.json} ({@link #harvestFile(Workspace)}), as {@code sheaf mine --workspace} writes it;</li>
 *   <li>evidence index: {@code OUTPUT/evidence/} ({@link #evidenceFolder(Workspace)});</li>
 *   <li>vocabulary: the file {@code workspace.json} names, else {@code vocabulary.vocab.json} in
 *       the workspace folder ({@link #vocabularyFile(Workspace)}), created empty when missing.</li>
 * </ul>
 */
public final class CuratorSession implements AutoCloseable {
    /** The vocabulary file used when {@code workspace.json} names none. */
    public static final String DEFAULT_VOCABULARY = "vocabulary.vocab.json";
    /** The evidence index folder inside the workspace's output folder. */
    public static final String EVIDENCE_FOLDER = "evidence";

    /** Hears about every change of the vocabulary (do, undo, redo), on the UI thread, after it took effect. */
    @FunctionalInterface
    public interface VocabularyListener {
        void changed(VocabularyChange change);
    }

    /**
     * One change of the vocabulary.
     *
     * @param action      do, undo or redo
     * @param description what the edit did, as the history describes it ("Keep \"ripstop\" as ...")
     * @param before      the snapshot before
     * @param after       the snapshot now current
     */
    public record VocabularyChange(EditHistory.Action action, String description, Vocabulary before, Vocabulary after) {
        public VocabularyChange {
            Objects.requireNonNull(action);
            Objects.requireNonNull(description);
            Objects.requireNonNull(before);
            Objects.requireNonNull(after);
        }
    }

    private final Workspace workspace;
    private final VocabularyStore store;
    private final boolean createdVocabulary;
    private final Selection selection = new Selection();
    private final ReadOnlyObjectWrapper<Harvest> harvest = new ReadOnlyObjectWrapper<>(this, "harvest");
    private final ReadOnlyObjectWrapper<Vocabulary> vocabulary = new ReadOnlyObjectWrapper<>(this, "vocabulary");
    private final ReadOnlyBooleanWrapper dirty = new ReadOnlyBooleanWrapper(this, "dirty");
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper(this, "canUndo");
    private final ReadOnlyBooleanWrapper canRedo = new ReadOnlyBooleanWrapper(this, "canRedo");
    private final ReadOnlyStringWrapper undoText = new ReadOnlyStringWrapper(this, "undoText", "");
    private final ReadOnlyStringWrapper redoText = new ReadOnlyStringWrapper(this, "redoText", "");
    private final List<VocabularyListener> listeners = new CopyOnWriteArrayList<>();
    private volatile EvidenceIndex evidence;
    private volatile Map<String, Harvest.Candidate> candidatesByKey = Map.of();

    private CuratorSession(Workspace workspace, VocabularyStore store, boolean created, Harvest h, EvidenceIndex evidence) {
        this.workspace = workspace;
        this.store = store;
        this.createdVocabulary = created;
        this.evidence = evidence;
        setHarvest(h);
        refresh();
        store.history().addListener((step, before, after) -> {
            refresh();
            VocabularyChange c = new VocabularyChange(step.action(), step.description(), before, after);
            for (VocabularyListener l : listeners) {
                l.changed(c);
            }
        });
    }

    /**
     * Opens a workspace folder: reads {@code workspace.json}, the harvest if there is one, opens
     * the evidence index if there is one, and opens the vocabulary for editing (creating an empty
     * one named after the workspace when the file does not exist). Reads files: call it off the
     * UI thread.
     *
     * @throws VocabularyLockedException when another program (or this one) has the vocabulary open
     * @throws IOException when {@code workspace.json}, the harvest or the vocabulary cannot be read
     *                     (the message names the file and what is wrong)
     */
    public static CuratorSession open(Path dir) throws IOException {
        Workspace ws = Workspace.load(dir);
        Path hf = harvestFile(ws);
        Harvest h = Files.isRegularFile(hf) ? HarvestFiles.readJson(hf) : null;
        Path vf = vocabularyFile(ws);
        boolean created = !Files.exists(vf);
        VocabularyStore store = created ? VocabularyStore.create(vf, emptyVocabulary(ws)) : VocabularyStore.open(vf);
        EvidenceIndex ix = null;
        try {
            ix = openEvidence(ws);
            return new CuratorSession(ws, store, created, h, ix);
        } catch (IOException | RuntimeException e) {
            store.close();
            if (ix != null) {
                ix.close();
            }
            throw e;
        }
    }

    /** The empty vocabulary a new workspace starts with: scheme id and title from the workspace. */
    static Vocabulary emptyVocabulary(Workspace ws) {
        String id = Terms.slug(ws.name());
        return Vocabulary.empty(SchemeInfo.of(id.isEmpty() ? "vocabulary" : id, ws.name()));
    }

    private static EvidenceIndex openEvidence(Workspace ws) throws IOException {
        return Mining.openIndex(ws);
    }

    /** Where the harvest of a workspace lives: {@code OUTPUT/harvest.json}. */
    public static Path harvestFile(Workspace ws) {
        return ws.output().resolve(HarvestFiles.JSON);
    }

    /** Where the evidence index of a workspace lives: {@code OUTPUT/evidence}. */
    public static Path evidenceFolder(Workspace ws) {
        return ws.output().resolve(EVIDENCE_FOLDER);
    }

    /** The vocabulary file of a workspace: the one it names, else {@value #DEFAULT_VOCABULARY} in its folder. */
    public static Path vocabularyFile(Workspace ws) {
        return ws.vocabulary() != null ? ws.vocabulary() : ws.dir().resolve(DEFAULT_VOCABULARY);
    }

    // ------------------------------------------------------------------ what is open

    public Workspace workspace() {
        return workspace;
    }

    /** The vocabulary file being edited. */
    public Path vocabularyFile() {
        return store.file();
    }

    /** True when the vocabulary file did not exist and this session started an empty one. */
    public boolean createdVocabulary() {
        return createdVocabulary;
    }

    /** What opening recovered from the edit journal (unsaved steps of a session that stopped). */
    public Recovery recovery() {
        return store.recovery();
    }

    /** The curator's selection (selected candidate term, selected concept id). */
    public Selection selection() {
        return selection;
    }

    /** The harvest, or null before the workspace has been mined. */
    public ReadOnlyObjectProperty<Harvest> harvestProperty() {
        return harvest.getReadOnlyProperty();
    }

    public Harvest harvest() {
        return harvest.get();
    }

    /** Installs a harvest (after mining in the background); UI thread. */
    public void setHarvest(Harvest h) {
        Map<String, Harvest.Candidate> m = new HashMap<>();
        if (h != null) {
            for (Harvest.Candidate c : h.candidates()) {
                m.putIfAbsent(Terms.normalise(c.term()), c);
            }
        }
        candidatesByKey = m;
        harvest.set(h);
    }

    /** The candidate of the harvest for a term (matched by its normalised form), if the harvest has it. */
    public Optional<Harvest.Candidate> candidate(String term) {
        return Optional.ofNullable(candidatesByKey.get(Terms.normalise(term)));
    }

    /** The current vocabulary snapshot; changes after every edit, undo and redo. */
    public ReadOnlyObjectProperty<Vocabulary> vocabularyProperty() {
        return vocabulary.getReadOnlyProperty();
    }

    public Vocabulary vocabulary() {
        return vocabulary.get();
    }

    // ------------------------------------------------------------------ editing

    /** Adds a listener for every change of the vocabulary (called on the UI thread, after the change). */
    public void addVocabularyListener(VocabularyListener l) {
        listeners.add(Objects.requireNonNull(l));
    }

    public void removeVocabularyListener(VocabularyListener l) {
        listeners.remove(l);
    }

    /** Why {@code edit} cannot apply now; empty when it can. */
    public List<String> validate(Edit edit) {
        return store.history().validate(edit);
    }

    /**
     * Applies an edit: journaled, undoable, listeners told.
     *
     * @throws EditRefusedException when it does not validate (nothing changes; the reasons are in it)
     * @throws UncheckedIOException when the journal cannot be written (nothing changes)
     */
    public Vocabulary apply(Edit edit) {
        return store.history().apply(edit);
    }

    /** Undoes the last step; false when there is nothing to undo. */
    public boolean undo() {
        if (!store.history().canUndo()) {
            return false;
        }
        store.history().undo();
        return true;
    }

    /** Redoes the last undone step; false when there is nothing to redo. */
    public boolean redo() {
        if (!store.history().canRedo()) {
            return false;
        }
        store.history().redo();
        return true;
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    public ReadOnlyBooleanProperty canRedoProperty() {
        return canRedo.getReadOnlyProperty();
    }

    /** What undo would undo ("" when nothing). */
    public ReadOnlyStringProperty undoTextProperty() {
        return undoText.getReadOnlyProperty();
    }

    /** What redo would redo ("" when nothing). */
    public ReadOnlyStringProperty redoTextProperty() {
        return redoText.getReadOnlyProperty();
    }

    /** Whether the vocabulary differs from the file on disk (the edits are safe in the journal meanwhile). */
    public ReadOnlyBooleanProperty dirtyProperty() {
        return dirty.getReadOnlyProperty();
    }

    public boolean isDirty() {
        return dirty.get();
    }

    /**
     * Saves the vocabulary file atomically (the previous version stays as {@code NAME~}).
     *
     * @return false when there was nothing to save
     * @throws StaleVocabularyException when the file changed on disk since it was opened (nothing written; edits safe in the journal)
     */
    public boolean save() throws IOException {
        boolean wrote = store.save();
        refresh();
        return wrote;
    }

    /** Saves under another name and continues editing there. */
    public void saveAs(Path target) throws IOException {
        store.saveAs(target);
        refresh();
    }

    private void refresh() {
        EditHistory h = store.history();
        vocabulary.set(h.current());
        dirty.set(store.isDirty());
        canUndo.set(h.canUndo());
        canRedo.set(h.canRedo());
        undoText.set(h.undoDescription().orElse(""));
        redoText.set(h.redoDescription().orElse(""));
    }

    // ------------------------------------------------------------------ evidence

    /** Whether the evidence index is open (else evidence comes from the harvest's own lines). */
    public boolean hasEvidenceIndex() {
        return evidence != null;
    }

    /** Installs a freshly built evidence index (closing the one it replaces). */
    public void setEvidenceIndex(EvidenceIndex ix) {
        EvidenceIndex old = evidence;
        evidence = ix;
        if (old != null && old != ix) {
            try {
                old.close();
            } catch (IOException ignored) {
                // a reader that fails to close holds no data of ours
            }
        }
    }

    /**
     * Keyword-in-context lines for a phrase, at most {@code limit}: from the evidence index when
     * there is one (every listing), else the harvest's evidence lines for that term (a few). Thread-safe.
     */
    public List<EvidenceLine> evidenceLines(String phrase, int limit) throws IOException {
        EvidenceIndex ix = evidence;
        if (ix != null) {
            return ix.lines(phrase, limit);
        }
        Harvest.Candidate c = candidatesByKey.get(Terms.normalise(phrase));
        List<EvidenceLine> out = new ArrayList<>();
        if (c != null) {
            for (EvidenceLine e : c.evidence()) {
                if (out.size() >= limit) {
                    break;
                }
                out.add(e);
            }
        }
        return out;
    }

    /** Listings whose fields contain the phrase (from the index; from the harvest's df when there is none; -1 when unknown). */
    public long listingsWith(String phrase) throws IOException {
        EvidenceIndex ix = evidence;
        if (ix != null) {
            return ix.count(phrase);
        }
        Harvest.Candidate c = candidatesByKey.get(Terms.normalise(phrase));
        return c == null ? -1 : c.df();
    }

    /** A listing with every field, as indexed; empty without an index or for an unknown id. Thread-safe. */
    public Optional<Listing> listing(String id) throws IOException {
        EvidenceIndex ix = evidence;
        return ix == null ? Optional.empty() : ix.listing(id);
    }

    /** The labels of a concept to look evidence up by (preferred, then alternative; hidden ones too), in the default language first. */
    public static List<String> searchPhrases(Vocabulary v, String conceptId) {
        List<String> out = new ArrayList<>();
        v.concept(conceptId).ifPresent(c -> {
            for (dev.sheaf.vocab.ConceptLabel l : c.labels()) {
                String t = l.label().text();
                if (!out.contains(t)) {
                    out.add(t);
                }
            }
        });
        return out;
    }

    /** Releases the vocabulary lock and closes the journal (unsaved edits stay in it) and the evidence index. */
    @Override
    public void close() throws IOException {
        try {
            store.close();
        } finally {
            setEvidenceIndex(null);
        }
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "CuratorSession[%s, %s]", workspace.dir(), store.file().getFileName());
    }

    static Label label(String text, Vocabulary v) {
        return Label.of(text, v.defaultLanguage());
    }
}
