package dev.sheaf.vocab.store;

import dev.sheaf.vocab.EditHistory;
import dev.sheaf.vocab.Vocabulary;
import dev.sheaf.vocab.VocabularyFormatException;
import dev.sheaf.vocab.io.AtomicFiles;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.channels.FileLock;
import java.nio.channels.OverlappingFileLockException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

/**
 * A vocabulary file opened for editing: the session lock, the current vocabulary with its undo
 * history, and the edit journal that makes every edit durable before the next save.
 *
 * <ul>
 *   <li>{@link #open} takes the lock ({@code NAME.lock}, held with {@link FileChannel#tryLock}
 *       until {@link #close}); a second session on the same file is refused with
 *       {@link VocabularyLockedException}. The lock file stays behind (deleting it would race).</li>
 *   <li>Every edit, undo and redo is appended to {@code NAME.journal} and forced to disk before
 *       it takes effect; {@code open} replays what the last session did not save.</li>
 *   <li>{@link #save} writes atomically ({@link AtomicFiles}), keeps the previous version as
 *       {@code NAME~}, and refuses with {@link StaleVocabularyException} when the file changed on
 *       disk since it was loaded (SHA-256 of its content).</li>
 * </ul>
 * The static {@link #read} and {@link #toJson} are for read-only use (check, diff, export).
 */
public final class VocabularyStore implements AutoCloseable {
    private Path file;
    private FileChannel lockChannel;
    private FileLock lock;
    private Journal journal;
    private final EditHistory history;
    private String loadedHash;
    private Vocabulary saved;
    private final Recovery recovery;

    private VocabularyStore(Path file, FileChannel lockChannel, FileLock lock, Vocabulary loaded, String hash,
                            List<EditHistory.Step> replay, List<String> notes) throws IOException {
        this.file = file;
        this.lockChannel = lockChannel;
        this.lock = lock;
        this.loadedHash = hash;
        this.saved = loaded;
        this.history = new EditHistory(loaded);
        int replayed = 0;
        for (EditHistory.Step s : replay) {
            history.replay(s);
            replayed++;
        }
        this.journal = Journal.start(Journal.pathFor(file), hash, replay);
        this.history.setRecorder(step -> journal.append(step));
        this.recovery = new Recovery(replayed, notes);
    }

    // ------------------------------------------------------------------ read-only use

    /** Reads a vocabulary file (our JSON) without locking it or looking at its journal. */
    public static Vocabulary read(Path file) throws IOException {
        return JsonCodec.read(readBytes(file), file.toString());
    }

    /** The file content for a vocabulary: pretty, stably ordered JSON (docs/vocab-format.md). */
    public static String toJson(Vocabulary v) {
        return new String(JsonCodec.write(v), StandardCharsets.UTF_8);
    }

    /** Parses our JSON; {@code source} names it in error messages. */
    public static Vocabulary fromJson(String json, String source) throws VocabularyFormatException {
        return JsonCodec.read(json.getBytes(StandardCharsets.UTF_8), source);
    }

    /**
     * Writes a vocabulary to a file atomically, keeping the previous version as {@code NAME~}.
     * Refused while another session has the file open for editing.
     */
    public static void write(Path file, Vocabulary v) throws IOException {
        Path abs = file.toAbsolutePath();
        try (FileChannel ch = openLockFile(abs)) {
            FileLock l = tryLock(ch, abs);
            try {
                AtomicFiles.write(abs, out -> out.write(JsonCodec.write(v)), true);
            } finally {
                l.release();
            }
        }
    }

    /** How many journal steps beside {@code file} are not in the file yet (0 when there is no journal or it does not match). */
    public static int unsavedSteps(Path file) throws IOException {
        Journal.Contents c = Journal.read(Journal.pathFor(file.toAbsolutePath()));
        if (c == null || c.damage() != null) {
            return 0;
        }
        List<EditHistory.Step> s = c.stepsToReplay(sha256(readBytes(file)));
        return s == null ? 0 : s.size();
    }

    // ------------------------------------------------------------------ editing sessions

    /**
     * Opens an existing vocabulary file for editing: takes the lock, reads the file and replays
     * the journal. Nothing is written to the vocabulary file itself.
     *
     * @throws VocabularyLockedException when another session has it open
     * @throws VocabularyFormatException when it cannot be parsed (line, column, what was expected)
     */
    public static VocabularyStore open(Path file) throws IOException {
        Path abs = file.toAbsolutePath();
        FileChannel ch = openLockFile(abs);
        boolean ok = false;
        try {
            FileLock l = tryLock(ch, abs);
            writeHolder(ch);
            removeStaleTemporaries(abs);
            byte[] bytes = readBytes(abs);
            Vocabulary v = JsonCodec.read(bytes, file.toString());
            String hash = sha256(bytes);
            List<String> notes = new ArrayList<>();
            List<EditHistory.Step> replay = recover(abs, hash, notes);
            VocabularyStore s = new VocabularyStore(abs, ch, l, v, hash, replay, notes);
            ok = true;
            return s;
        } finally {
            if (!ok) {
                ch.close();
            }
        }
    }

    /** Creates a new vocabulary file (refused when it exists) and opens it for editing. */
    public static VocabularyStore create(Path file, Vocabulary initial) throws IOException {
        Path abs = file.toAbsolutePath();
        if (Files.exists(abs)) {
            throw new IOException(file + " already exists; open it instead, or choose another name");
        }
        write(abs, initial);
        return open(abs);
    }

    private static List<EditHistory.Step> recover(Path file, String hash, List<String> notes) throws IOException {
        Path jp = Journal.pathFor(file);
        Journal.Contents c = Journal.read(jp);
        if (c == null) {
            return List.of();
        }
        if (c.incompleteTail()) {
            notes.add("the last journal entry was incomplete (the program stopped while writing it) and was ignored;"
                    + " that edit had not taken effect");
        }
        if (c.damage() != null) {
            Path aside = setAside(jp, "damaged");
            notes.add("the edit journal is damaged (" + c.damage() + "); it was kept as " + aside.getFileName()
                    + " and nothing was replayed from it");
            return List.of();
        }
        List<EditHistory.Step> steps = c.stepsToReplay(hash);
        if (steps == null) {
            Path aside = setAside(jp, "unmatched");
            notes.add("the edit journal belongs to another version of " + file.getFileName()
                    + " (the file was replaced since); it was kept as " + aside.getFileName() + " and nothing was replayed");
            return List.of();
        }
        if (!steps.isEmpty()) {
            notes.add("recovered " + steps.size() + " unsaved step" + (steps.size() == 1 ? "" : "s")
                    + " from the edit journal; save to keep them");
        }
        return steps;
    }

    private static Path setAside(Path journal, String why) throws IOException {
        Path aside = journal.resolveSibling(journal.getFileName() + "." + why + "-"
                + Instant.now().toString().replace(':', '-'));
        Files.move(journal, aside, StandardCopyOption.ATOMIC_MOVE);
        return aside;
    }

    public Path file() {
        return file;
    }

    public EditHistory history() {
        return history;
    }

    public Vocabulary current() {
        return history.current();
    }

    /** What opening recovered from the journal. */
    public Recovery recovery() {
        return recovery;
    }

    /** Whether the current vocabulary differs from what is on disk. */
    public boolean isDirty() {
        Vocabulary c = history.current();
        return c != saved && !c.equals(saved);
    }

    /**
     * Saves the current vocabulary: atomically, keeping the previous version as {@code NAME~},
     * then starts a fresh journal. Returns false when there was nothing to save.
     *
     * @throws StaleVocabularyException when the file changed on disk since it was loaded (nothing written)
     */
    public boolean save() throws IOException {
        ensureOpen();
        if (!isDirty()) {
            return false;
        }
        byte[] bytes = JsonCodec.write(history.current());
        checkUnchangedOnDisk();
        writeAndRestartJournal(file, bytes);
        return true;
    }

    /**
     * Saves under another name and continues the session there (the lock moves with it). The
     * old file is left as it is on disk.
     */
    public void saveAs(Path target) throws IOException {
        ensureOpen();
        Path abs = target.toAbsolutePath();
        if (abs.equals(file)) {
            save();
            return;
        }
        FileChannel ch = openLockFile(abs);
        FileLock l;
        try {
            l = tryLock(ch, abs);
            writeHolder(ch);
        } catch (IOException e) {
            ch.close();
            throw e;
        }
        byte[] bytes = JsonCodec.write(history.current());
        String newHash = sha256(bytes);
        AtomicFiles.write(abs, out -> out.write(bytes), true);
        // the old file's journal must not replay onto it later: restart it at the old file as it is now
        journal.close();
        Path old = file;
        try {
            Journal.start(Journal.pathFor(old), sha256(readBytes(old)), List.of()).close();
        } catch (NoSuchFileException gone) {
            Files.deleteIfExists(Journal.pathFor(old));
        }
        lock.release();
        lockChannel.close();
        file = abs;
        lockChannel = ch;
        lock = l;
        journal = Journal.start(Journal.pathFor(abs), newHash, List.of());
        loadedHash = newHash;
        saved = history.current();
    }

    private void writeAndRestartJournal(Path target, byte[] bytes) throws IOException {
        String newHash = sha256(bytes);
        journal.markSaving(newHash);
        AtomicFiles.write(target, out -> out.write(bytes), true);
        loadedHash = newHash;
        saved = history.current();
        journal.close();
        journal = Journal.start(Journal.pathFor(target), newHash, List.of());
    }

    private void checkUnchangedOnDisk() throws IOException {
        byte[] now;
        try {
            now = Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new StaleVocabularyException(file.getFileName() + " was deleted or moved since it was opened, so it was not"
                    + " saved; your edits are safe in " + Journal.pathFor(file).getFileName() + " — save under another name (save as)");
        }
        if (!sha256(now).equals(loadedHash)) {
            throw new StaleVocabularyException(file.getFileName() + " changed on disk since it was opened (another program or"
                    + " person wrote it), so it was not overwritten; your edits are safe in "
                    + Journal.pathFor(file).getFileName() + " — save under another name (save as) and compare, or close"
                    + " and reopen to start from the new version");
        }
    }

    private void ensureOpen() {
        if (lock == null || !lock.isValid()) {
            throw new IllegalStateException("this vocabulary session is closed");
        }
    }

    /** Releases the lock and closes the journal; unsaved edits stay in the journal for the next open. */
    @Override
    public void close() throws IOException {
        if (lock == null) {
            return;
        }
        try {
            journal.close();
        } finally {
            try {
                if (lock.isValid()) {
                    lock.release();
                }
            } finally {
                lockChannel.close();
                lock = null;
            }
        }
    }

    // ------------------------------------------------------------------ helpers

    static Path lockPath(Path file) {
        return file.resolveSibling(file.getFileName() + ".lock");
    }

    private static FileChannel openLockFile(Path file) throws IOException {
        Files.createDirectories(file.getParent());
        return FileChannel.open(lockPath(file), StandardOpenOption.CREATE, StandardOpenOption.READ, StandardOpenOption.WRITE);
    }

    private static FileLock tryLock(FileChannel ch, Path file) throws IOException {
        FileLock l;
        try {
            l = ch.tryLock();
        } catch (OverlappingFileLockException e) {
            throw new VocabularyLockedException(file.getFileName() + " is already open for editing in this program;"
                    + " use that session, or close it first");
        }
        if (l == null) {
            String holder = "";
            try {
                holder = Files.readString(lockPath(file), StandardCharsets.UTF_8).strip();
            } catch (IOException ignored) {
                // who holds it is a courtesy in the message
            }
            throw new VocabularyLockedException(file.getFileName() + " is open for editing in another program"
                    + (holder.isEmpty() ? "" : " (" + holder + ")") + "; close it there first, or work on a copy");
        }
        return l;
    }

    private static void writeHolder(FileChannel ch) throws IOException {
        String who = "process " + ProcessHandle.current().pid() + " since " + Instant.now();
        ch.truncate(0);
        ch.write(ByteBuffer.wrap(who.getBytes(StandardCharsets.UTF_8)), 0);
        ch.force(false);
    }

    /** Temporary files of interrupted atomic writes (only possible from a session that died; we hold the lock). */
    private static void removeStaleTemporaries(Path file) throws IOException {
        String[] prefixes = {"." + file.getFileName() + ".", "." + Journal.pathFor(file).getFileName() + "."};
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(file.getParent(), ".*.tmp")) {
            for (Path p : ds) {
                String n = p.getFileName().toString();
                for (String pre : prefixes) {
                    if (n.startsWith(pre) && n.substring(pre.length()).indexOf('.') >= 0) {
                        Files.deleteIfExists(p);
                        break;
                    }
                }
            }
        }
    }

    private static byte[] readBytes(Path file) throws IOException {
        try {
            return Files.readAllBytes(file);
        } catch (NoSuchFileException e) {
            throw new NoSuchFileException(file.toString(), null, "no such vocabulary file; check the path");
        }
    }

    static String sha256(byte[] bytes) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes));
        } catch (NoSuchAlgorithmException e) {
            throw new UncheckedIOException(new IOException("SHA-256 is missing from this Java runtime", e));
        }
    }
}
