package org.shapetrail.app;

import org.shapetrail.i18n.Messages;

/** The standing cautions the product shows (DESIGN.md §5), in the window's language. */
public final class Cautions {
    private Cautions() {
    }

    /** The somatotype describes present shape, judges no one, and defers to a practitioner and local rules. */
    public static String shapeNotWorth() {
        return Messages.tr("caution.shape");
    }
}
