package org.shapetrail.chart;

/**
 * Maps chart coordinates to a device rectangle (y down), keeping the chart's aspect (its x scale), with
 * a zoom factor and a pan offset in device units. Shared by every renderer.
 */
public final class Viewport {
    private final double scale;
    private final double offsetX;
    private final double offsetY;
    private final double xScale;

    private Viewport(double scale, double offsetX, double offsetY, double xScale) {
        this.scale = scale;
        this.offsetX = offsetX;
        this.offsetY = offsetY;
        this.xScale = xScale;
    }

    /** Fits the chart's box into width × height with a margin, centred, then applies zoom and pan. */
    public static Viewport fit(ChartModel m, double width, double height, double margin, double zoom, double panX,
                               double panY) {
        double w = (m.maxX() - m.minX()) * m.xScale();
        double h = m.maxY() - m.minY();
        double s = Math.min((width - 2 * margin) / w, (height - 2 * margin) / h) * zoom;
        double cx = (m.minX() + m.maxX()) / 2 * m.xScale();
        double cy = (m.minY() + m.maxY()) / 2;
        return new Viewport(s, width / 2 - cx * s + panX, height / 2 + cy * s + panY, m.xScale());
    }

    public double x(double chartX) {
        return chartX * xScale * scale + offsetX;
    }

    public double y(double chartY) {
        return -chartY * scale + offsetY;
    }

    /** Device units per Y unit. */
    public double scale() {
        return scale;
    }

    public Point toChart(double deviceX, double deviceY) {
        return new Point((deviceX - offsetX) / (xScale * scale), -(deviceY - offsetY) / scale);
    }
}
