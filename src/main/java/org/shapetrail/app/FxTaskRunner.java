package org.shapetrail.app;

import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.function.Consumer;
import javafx.application.Platform;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import javafx.beans.property.ReadOnlyDoubleProperty;
import javafx.beans.property.ReadOnlyDoubleWrapper;
import javafx.beans.property.ReadOnlyStringProperty;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.concurrent.Task;

/** Runs jobs as JavaFX tasks on one daemon thread; callbacks and properties change on the FX thread. */
public final class FxTaskRunner implements TaskRunner {
    private final ExecutorService executor = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "shapetrail-work");
        t.setDaemon(true);
        return t;
    });
    private final ReadOnlyBooleanWrapper busy = new ReadOnlyBooleanWrapper(false);
    private final ReadOnlyDoubleWrapper progress = new ReadOnlyDoubleWrapper(0);
    private final ReadOnlyStringWrapper message = new ReadOnlyStringWrapper("");
    private Task<?> current;

    @Override
    public <T> Job run(String title, Work<T> work, Consumer<T> onSuccess, Consumer<Throwable> onFailure) {
        Task<T> task = new Task<>() {
            @Override
            protected T call() throws Exception {
                updateMessage(title);
                return work.run(new Progress() {
                    @Override
                    public void update(double done, double total, String msg) {
                        updateProgress(done, total);
                        if (msg != null) {
                            updateMessage(msg);
                        }
                    }

                    @Override
                    public boolean isCancelled() {
                        return isCancelled0();
                    }
                });
            }

            private boolean isCancelled0() {
                return isCancelled();
            }
        };
        task.setOnSucceeded(e -> {
            finish(task);
            onSuccess.accept(task.getValue());
        });
        task.setOnFailed(e -> {
            finish(task);
            onFailure.accept(task.getException());
        });
        task.setOnCancelled(e -> finish(task));
        Runnable bind = () -> {
            current = task;
            busy.set(true);
            progress.bind(task.progressProperty());
            message.bind(task.messageProperty());
        };
        if (Platform.isFxApplicationThread()) {
            bind.run();
        } else {
            Platform.runLater(bind);
        }
        executor.submit(task);
        return () -> task.cancel(true);
    }

    private void finish(Task<?> task) {
        if (current == task) {
            progress.unbind();
            message.unbind();
            progress.set(0);
            message.set("");
            busy.set(false);
            current = null;
        }
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
        if (current != null) {
            current.cancel(true);
        }
    }
}
