package org.shapetrail.chart;

/** Where a text sits relative to its point. */
public enum Anchor {
    START,
    MIDDLE,
    END
}
