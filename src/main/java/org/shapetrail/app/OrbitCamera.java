package org.shapetrail.app;

/**
 * The rotation maths of the 3D view, without JavaFX: yaw about the vertical axis and pitch about the
 * horizontal one, changed by mouse drags (degrees per pixel), pitch kept within ±89°.
 */
public final class OrbitCamera {
    public static final double DEGREES_PER_PIXEL = 0.4;
    private double yaw = -35;
    private double pitch = -20;

    public double yaw() {
        return yaw;
    }

    public double pitch() {
        return pitch;
    }

    /** Applies a drag of (dx, dy) pixels. */
    public void drag(double dx, double dy) {
        yaw = ((yaw + dx * DEGREES_PER_PIXEL) % 360 + 360) % 360;
        pitch = Math.max(-89, Math.min(89, pitch - dy * DEGREES_PER_PIXEL));
    }

    /** Where a point (x, y, z) ends up after the rotation (yaw about y, then pitch about x). */
    public double[] rotate(double x, double y, double z) {
        double a = Math.toRadians(yaw);
        double b = Math.toRadians(pitch);
        double x1 = x * Math.cos(a) + z * Math.sin(a);
        double z1 = -x * Math.sin(a) + z * Math.cos(a);
        double y2 = y * Math.cos(b) - z1 * Math.sin(b);
        double z2 = y * Math.sin(b) + z1 * Math.cos(b);
        return new double[] {x1, y2, z2};
    }
}
