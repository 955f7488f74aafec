package org.shapetrail.chart;

/** Marker shapes, so that series differ by shape as well as colour. */
public enum MarkerShape {
    CIRCLE,
    SQUARE,
    DIAMOND,
    TRIANGLE,
    RING
}
