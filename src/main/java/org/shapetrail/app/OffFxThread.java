package org.shapetrail.app;

import java.util.concurrent.Callable;
import javafx.application.Platform;
import javafx.beans.property.BooleanProperty;

/**
 * Runs a short piece of store work (one transaction) away from the FX thread while the window goes on
 * drawing: called on the FX thread, the caller waits in a nested event loop, so a file that another
 * program holds (the store waits up to its busy timeout) never freezes the window. {@code busy} is true
 * meanwhile, for the view to take input away. Called on any other thread (tests, background work), the
 * work simply runs there.
 */
final class OffFxThread {
    private OffFxThread() {
    }

    private record Outcome(Object value, Throwable failure) {
    }

    static <T> T call(BooleanProperty busy, Callable<T> work) {
        if (!Platform.isFxApplicationThread() || !Platform.canStartNestedEventLoop()) {
            return direct(work);
        }
        Object key = new Object();
        Thread t = new Thread(() -> {
            Outcome o;
            try {
                o = new Outcome(work.call(), null);
            } catch (Throwable e) {
                o = new Outcome(null, e);
            }
            Outcome done = o;
            Platform.runLater(() -> Platform.exitNestedEventLoop(key, done));
        }, "shapetrail-store");
        t.setDaemon(true);
        busy.set(true);
        Outcome o;
        try {
            t.start();
            o = (Outcome) Platform.enterNestedEventLoop(key);
        } finally {
            busy.set(false);
        }
        if (o.failure() instanceof RuntimeException r) {
            throw r;
        }
        if (o.failure() instanceof Error e) {
            throw e;
        }
        if (o.failure() != null) {
            throw new IllegalStateException(o.failure().getMessage(), o.failure());
        }
        @SuppressWarnings("unchecked")
        T value = (T) o.value();
        return value;
    }

    private static <T> T direct(Callable<T> work) {
        try {
            return work.call();
        } catch (RuntimeException e) {
            throw e;
        } catch (Exception e) {
            throw new IllegalStateException(e.getMessage(), e);
        }
    }
}
