package org.shapetrail.chart;

import java.util.List;

/** Walks a chart model and draws it on a {@link DrawTarget} through a {@link Viewport}. */
public final class ChartPainter {
    /**
     * The model laid out for the height its box will really be drawn at in a {@code width} × {@code height}
     * area (the margin and the chart's proportions make it smaller than the area): labels placed for the
     * area's height would run into each other when drawn smaller.
     */
    public static ChartModel laidOutFor(java.util.function.DoubleFunction<ChartModel> layout, double width,
                                        double height) {
        ChartModel first = layout.apply(height);
        double drawn = Viewport.fit(first, width, height, MARGIN, 1, 0, 0).scale() * (first.maxY() - first.minY());
        return layout.apply(drawn);
    }

    /** The margin round the chart's box, device points. */
    public static final double MARGIN = 24;

    private ChartPainter() {
    }

    /** Draws the whole model at the given size, zoom and pan. */
    public static Viewport paint(ChartModel m, DrawTarget t, double width, double height, double zoom, double panX,
                                 double panY) {
        Viewport v = Viewport.fit(m, width, height, MARGIN, zoom, panX, panY);
        t.begin(width, height, Palette.PAPER);
        for (Primitive p : m.primitives()) {
            if (p instanceof Primitive.Path path) {
                List<Point> pts = path.points();
                double[] xs = new double[pts.size()];
                double[] ys = new double[pts.size()];
                for (int i = 0; i < xs.length; i++) {
                    xs[i] = v.x(pts.get(i).x());
                    ys[i] = v.y(pts.get(i).y());
                }
                t.polyline(xs, ys, path.closed(), path.style(), path.style().fill() != null ? "noise" : "frame", null);
            } else if (p instanceof Primitive.Segment s) {
                double x1 = v.x(s.from().x());
                double y1 = v.y(s.from().y());
                double x2 = v.x(s.to().x());
                double y2 = v.y(s.to().y());
                t.polyline(new double[] {x1, x2}, new double[] {y1, y2}, false, s.style(),
                        s.arrow() ? "step" : "frame", null);
                if (s.arrow()) {
                    arrowHead(t, x1, y1, x2, y2, s.style());
                }
            } else if (p instanceof Primitive.Marker mk) {
                marker(t, v.x(mk.at().x()), v.y(mk.at().y()), mk);
            } else if (p instanceof Primitive.Text tx) {
                t.text(v.x(tx.at().x()), v.y(tx.at().y()), tx.text(), tx.sizePt(), tx.anchor(), tx.bold(), tx.colour());
            }
        }
        t.end();
        return v;
    }

    private static void arrowHead(DrawTarget t, double x1, double y1, double x2, double y2, Style s) {
        double len = Math.hypot(x2 - x1, y2 - y1);
        if (len < 8) {
            return;
        }
        // stop short of the marker at the end so the head stays visible
        double ux = (x2 - x1) / len;
        double uy = (y2 - y1) / len;
        double tipX = x2 - ux * 5;
        double tipY = y2 - uy * 5;
        double size = 4 + s.strokeWidth() * 1.5;
        double bx = tipX - ux * size;
        double by = tipY - uy * size;
        double px = -uy * size * 0.5;
        double py = ux * size * 0.5;
        t.polyline(new double[] {tipX, bx + px, bx - px}, new double[] {tipY, by + py, by - py}, true,
                new Style(s.stroke(), 0.5, new double[0], s.stroke(), s.opacity()), "arrow", null);
    }

    private static void marker(DrawTarget t, double x, double y, Primitive.Marker m) {
        double r = m.sizePt() / 2;
        if (m.shape() == MarkerShape.CIRCLE || m.shape() == MarkerShape.RING) {
            Style s = m.shape() == MarkerShape.RING ? new Style(m.style().stroke(), m.style().strokeWidth() + 0.8,
                    new double[0], null, 1) : m.style();
            t.circle(x, y, r, s, m.id());
            return;
        }
        double[][] shape = switch (m.shape()) {
            case CIRCLE, RING -> regular(x, y, r, 20, 0);
            case SQUARE -> regular(x, y, r * 1.25, 4, Math.PI / 4);
            case DIAMOND -> regular(x, y, r * 1.3, 4, 0);
            case TRIANGLE -> regular(x, y, r * 1.35, 3, -Math.PI / 2);
        };
        Style s = m.shape() == MarkerShape.RING ? new Style(m.style().stroke(), m.style().strokeWidth() + 0.8,
                new double[0], null, 1) : m.style();
        t.polyline(shape[0], shape[1], true, s, "marker", m.id());
    }

    private static double[][] regular(double x, double y, double r, int n, double phase) {
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            double a = phase + 2 * Math.PI * i / n;
            xs[i] = x + r * Math.cos(a);
            ys[i] = y + r * Math.sin(a);
        }
        return new double[][] {xs, ys};
    }
}
