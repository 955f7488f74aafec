package org.shapetrail.chart;

/**
 * What a renderer must be able to do, in device coordinates (y down, points): polylines and texts.
 * {@link ChartPainter} turns a model into these calls, so each renderer is only a translation.
 */
public interface DrawTarget {
    /** Starts a drawing of the given size on a background colour. */
    void begin(double width, double height, String background);

    /**
     * A polyline or polygon.
     *
     * @param role "frame", "step", "noise", "marker", "arrow" … (renderers may tag elements with it)
     * @param id the selectable id of a marker, or null
     */
    void polyline(double[] xs, double[] ys, boolean closed, Style style, String role, String id);

    void text(double x, double y, String text, double sizePt, Anchor anchor, boolean bold, String colour);

    /** A round marker; targets that draw circles natively override this, the rest get a 20-sided polygon. */
    default void circle(double x, double y, double r, Style style, String id) {
        double[] xs = new double[20];
        double[] ys = new double[20];
        for (int i = 0; i < 20; i++) {
            double a = 2 * Math.PI * i / 20;
            xs[i] = x + r * Math.cos(a);
            ys[i] = y + r * Math.sin(a);
        }
        polyline(xs, ys, true, style, "marker", id);
    }

    void end();
}
