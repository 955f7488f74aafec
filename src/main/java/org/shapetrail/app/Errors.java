package org.shapetrail.app;

import org.shapetrail.ShapetrailException;

/** Turns a failure into a sentence for a person: the project's own messages as they are, never a stack trace. */
final class Errors {
    private Errors() {
    }

    static String describe(Throwable t) {
        Throwable c = t;
        while (c != null) {
            if (c instanceof ShapetrailException) {
                return c.getMessage();
            }
            c = c.getCause();
        }
        if (t instanceof InterruptedException) {
            return org.shapetrail.i18n.Messages.tr("error.cancelled");
        }
        return org.shapetrail.i18n.Messages.tr("error.unexpected", t.getClass().getSimpleName()
                + (t.getMessage() == null ? "" : ": " + t.getMessage()));
    }
}
