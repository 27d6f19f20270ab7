package dev.sheaf.curator.checks;

import java.util.Objects;
import java.util.concurrent.Executor;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BooleanSupplier;
import java.util.function.Consumer;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;

/**
 * Recomputes a derived figure off the UI thread where only the latest request counts: starting a
 * run cancels the one before it, and the result of a cancelled run is never delivered. Used for
 * the checks list and the live figures, which follow every edit; a one-at-a-time queue (like the
 * status bar's long jobs) would make the curator wait for answers to questions no longer asked.
 *
 * <p>Call {@link #start} on the UI thread; results and failures come back through the UI
 * executor. Tests pass {@code Runnable::run} for both executors and run synchronously.
 *
 * @param <T> what a run computes
 */
public final class LatestRun<T> {

    /** The work: check {@code cancelled} between steps and return early when it says so. */
    @FunctionalInterface
    public interface Work<T> {
        T compute(BooleanSupplier cancelled) throws Exception;
    }

    private final Executor worker;
    private final Executor ui;
    private final AtomicReference<AtomicBoolean> current = new AtomicReference<>(new AtomicBoolean());
    private final ReadOnlyBooleanWrapper running = new ReadOnlyBooleanWrapper(this, "running");

    public LatestRun(Executor worker, Executor ui) {
        this.worker = Objects.requireNonNull(worker);
        this.ui = Objects.requireNonNull(ui);
    }

    /** A run on its own daemon thread named {@code name}, reporting through {@code ui} (the desktop passes Platform::runLater). */
    public static <T> LatestRun<T> onDaemonThread(String name, Executor ui) {
        ExecutorService one = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, name);
            t.setDaemon(true);
            return t;
        });
        return new LatestRun<>(one, ui);
    }

    /** Cancels the previous run and starts {@code work}; {@code onDone} or {@code onFail} hear only about this run. */
    public void start(Work<T> work, Consumer<T> onDone, Consumer<Throwable> onFail) {
        AtomicBoolean mine = new AtomicBoolean();
        AtomicBoolean before = current.getAndSet(mine);
        before.set(true);
        running.set(true);
        worker.execute(() -> {
            if (mine.get()) {
                return;
            }
            T result;
            try {
                result = work.compute(mine::get);
            } catch (Throwable t) {
                ui.execute(() -> {
                    if (!mine.get()) {
                        running.set(false);
                        onFail.accept(t);
                    }
                });
                return;
            }
            ui.execute(() -> {
                if (!mine.get()) {
                    running.set(false);
                    onDone.accept(result);
                }
            });
        });
    }

    /** Cancels the current run, if any (its result is dropped). */
    public void cancel() {
        current.get().set(true);
        running.set(false);
    }

    /** True from {@link #start} until the latest run delivered its result. */
    public ReadOnlyBooleanProperty runningProperty() {
        return running.getReadOnlyProperty();
    }
}
