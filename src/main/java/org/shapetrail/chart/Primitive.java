package org.shapetrail.chart;

import java.util.List;
import java.util.Objects;

/** One drawable element of a chart, in chart coordinates. Renderers translate each kind, nothing more. */
public sealed interface Primitive {
    /** A polyline (closed when {@code closed}); with a fill style it is a polygon. */
    record Path(List<Point> points, boolean closed, Style style) implements Primitive {
        public Path {
            points = List.copyOf(points);
            Objects.requireNonNull(style);
            if (points.size() < 2) {
                throw new IllegalArgumentException("a path needs two points");
            }
        }
    }

    /** A straight segment with an arrow head at its end when {@code arrow}. */
    record Segment(Point from, Point to, boolean arrow, Style style) implements Primitive {
    }

    /**
     * A marker of a fixed size in points (it does not grow with zoom).
     *
     * @param id what a click selects (e.g. "visit:42"), or null
     * @param tooltip the hover text, or null
     */
    record Marker(Point at, MarkerShape shape, double sizePt, Style style, String id, String tooltip)
            implements Primitive {
    }

    /** A text of a fixed size in points. */
    record Text(Point at, String text, double sizePt, Anchor anchor, boolean bold, String colour) implements Primitive {
    }
}
