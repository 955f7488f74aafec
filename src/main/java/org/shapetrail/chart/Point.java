package org.shapetrail.chart;

/** A point in chart coordinates. */
public record Point(double x, double y) {
    public Point {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("chart points must be finite");
        }
    }
}
