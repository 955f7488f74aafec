package org.shapetrail.app;

import java.util.function.Consumer;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;

/** Runs each job at once on the calling thread: for view-model tests without a toolkit. */
public final class DirectTaskRunner implements TaskRunner {
    private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(0);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");
    private volatile boolean cancelRequested;
    private int cancelAfter = -1;

    @Override
    public <T> Job run(String title, Work<T> work, Consumer<T> onSuccess, Consumer<Throwable> onFailure) {
        cancelRequested = false;
        int[] updates = {0};
        busy.set(true);
        try {
            T value = work.run(new Progress() {
                @Override
                public void update(double done, double total, String msg) {
                    progress.set(total > 0 ? done / total : -1);
                    if (cancelAfter >= 0 && ++updates[0] >= cancelAfter) {
                        cancelRequested = true;
                    }
                }

                @Override
                public boolean isCancelled() {
                    return cancelRequested;
                }
            });
            busy.set(false);
            if (!cancelRequested) {
                onSuccess.accept(value);
            }
        } catch (Exception e) {
            busy.set(false);
            onFailure.accept(e);
        }
        return () -> cancelRequested = true;
    }

    /** Makes the next job's {@link Progress#isCancelled()} answer true after {@code n} progress updates. */
    public void cancelAfterUpdates(int n) {
        cancelAfter = n;
    }

    @Override
    public ReadOnlyBooleanProperty busyProperty() {
        return busy.getReadOnlyProperty();
    }

    @Override
    public ReadOnlyDoubleProperty progressProperty() {
        return progress.getReadOnlyProperty();
    }

    @Override
    public ReadOnlyStringProperty messageProperty() {
        return message.getReadOnlyProperty();
    }

    @Override
    public void cancelCurrent() {
        cancelRequested = true;
    }
}
