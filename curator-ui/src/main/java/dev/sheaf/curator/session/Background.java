package dev.sheaf.curator.session;

import java.util.Objects;
import java.util.concurrent.CancellationException;
import java.util.concurrent.Executor;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

/**
 * Long work off the UI thread, one job at a time, with progress and cancel for the status bar.
 * A job runs on the worker; its progress, result and failure are handed to the UI executor,
 * which is where the properties change. The desktop uses a daemon worker thread and
 * {@code Platform::runLater}; tests pass {@code Runnable::run} for both and run synchronously.
 */
public final class Background {

    /** A piece of long work: reports progress, checks {@code cancelled} often, returns a result. */
    @FunctionalInterface
    public interface Job<T> {
        T run(Mining.Progress progress, BooleanSupplier cancelled) throws Exception;
    }

    private final Executor worker;
    private final Executor ui;
    private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running");
    private final ReadOnlyStringWrapper title = new ReadOnlyStringWrapper(this, "title", "");
    private final ReadOnlyStringWrapper detail = new ReadOnlyStringWrapper(this, "detail", "");
    private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(this, "progress", 0);
    private volatile AtomicBoolean cancel = new AtomicBoolean();
    private volatile long lastReport;

    public Background(Executor worker, Executor ui) {
        this.worker = Objects.requireNonNull(worker);
        this.ui = Objects.requireNonNull(ui);
    }

    /** A background of one daemon worker thread, reporting through {@code ui} (the desktop passes Platform::runLater). */
    public static Background withWorkerThread(Executor ui) {
        ExecutorService one = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, "sheaf-curator-work");
            t.setDaemon(true);
            return t;
        });
        return new Background(one, ui);
    }

    /**
     * Starts a job (UI thread). {@code onDone} gets the result on the UI thread; {@code onFail}
     * gets the failure ({@link CancellationException} when the user cancelled).
     *
     * @throws IllegalStateException when a job is already running
     */
    public <T> void submit(String jobTitle, Job<T> job, Consumer<T> onDone, Consumer<Throwable> onFail) {
        if (running.get()) {
            throw new IllegalStateException("\"" + title.get() + "\" is still running; wait for it or cancel it first");
        }
        AtomicBoolean c = new AtomicBoolean();
        cancel = c;
        running.set(true);
        title.set(jobTitle);
        detail.set("");
        progress.set(-1);
        worker.execute(() -> {
            T result;
            try {
                result = job.run(this::report, c::get);
                if (c.get()) {
                    throw new CancellationException("stopped by the curator");
                }
            } catch (Throwable t) {
                ui.execute(() -> {
                    finish();
                    onFail.accept(t);
                });
                return;
            }
            T r = result;
            ui.execute(() -> {
                finish();
                onDone.accept(r);
            });
        });
    }

    private void finish() {
        running.set(false);
        title.set("");
        detail.set("");
        progress.set(0);
    }

    /** Throttled to about ten updates a second, so a fast reader does not flood the UI thread. */
    private void report(String phase, long done, long total, long listings) {
        long now = System.nanoTime();
        if (now - lastReport < 100_000_000L && done >= 0 && done < total) {
            return;
        }
        lastReport = now;
        double p = done >= 0 && total > 0 ? Math.min(1.0, (double) done / total) : -1;
        String d = listings >= 0 ? String.format(java.util.Locale.ROOT, "%s · %,d listings", phase, listings) : phase;
        ui.execute(() -> {
            if (running.get()) {
                progress.set(p);
                detail.set(d);
            }
        });
    }

    /** Asks the running job to stop (it stops at its next check; nothing half-done is written). */
    public void cancel() {
        cancel.set(true);
    }

    public ReadOnlyBooleanProperty runningProperty() {
        return running.getReadOnlyProperty();
    }

    /** What is running ("Mining the harvest"), "" when idle. */
    public ReadOnlyStringProperty titleProperty() {
        return title.getReadOnlyProperty();
    }

    /** The current phase and count ("reading listings · 1,204 listings"). */
    public ReadOnlyStringProperty detailProperty() {
        return detail.getReadOnlyProperty();
    }

    /** 0..1, or -1 when the phase has no measure (an indeterminate bar). */
    public ReadOnlyDoubleProperty progressProperty() {
        return progress.getReadOnlyProperty();
    }
}
