package org.shapetrail.app;

import java.util.concurrent.Callable;
import java.util.function.Consumer;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyStringProperty;

/**
 * Runs long work off the FX thread: the real runner uses {@code javafx.concurrent.Task}s on a daemon
 * executor with callbacks on the FX thread; tests use {@link DirectTaskRunner}, which runs at once.
 */
public interface TaskRunner {
    /** Work that reports progress and can be asked to stop. */
    interface Work<T> {
        T run(Progress progress) throws Exception;
    }

    /** What running work sees: report progress, ask whether it was cancelled. */
    interface Progress {
        void update(double done, double total, String message);

        boolean isCancelled();
    }

    /** A started job. */
    interface Job {
        void cancel();
    }

    <T> Job run(String title, Work<T> work, Consumer<T> onSuccess, Consumer<Throwable> onFailure);

    /** True while any job runs. */
    ReadOnlyBooleanProperty busyProperty();

    /** Progress of the current job, 0..1, or −1 when unknown. */
    ReadOnlyDoubleProperty progressProperty();

    ReadOnlyStringProperty messageProperty();

    /** Cancels the running job, if any. */
    void cancelCurrent();

    /** Convenience for work without progress. */
    default <T> Job run(String title, Callable<T> work, Consumer<T> onSuccess, Consumer<Throwable> onFailure) {
        return run(title, (Work<T>) p -> work.call(), onSuccess, onFailure);
    }
}
