package org.shapetrail.somatotype;

/**
 * A position on the somatochart: X = ectomorphy − endomorphy, Y = 2·mesomorphy − (endomorphy + ectomorphy).
 */
public record ChartPoint(double x, double y) {
    public ChartPoint {
        if (!Double.isFinite(x) || !Double.isFinite(y)) {
            throw new IllegalArgumentException("chart coordinates must be finite, not (" + x + ", " + y + ")");
        }
    }
}
