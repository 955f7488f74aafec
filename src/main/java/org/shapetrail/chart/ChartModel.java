package org.shapetrail.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A renderer-neutral chart: a bounding box in chart coordinates, how many display units one X unit takes
 * relative to one Y unit, and the primitives in drawing order.
 *
 * @param xScale display width of one X unit relative to one Y unit (√3 on the somatochart, so the corner
 *     triangle is equilateral and distances read as SDD)
 */
public record ChartModel(String title, double minX, double maxX, double minY, double maxY, double xScale,
                         List<Primitive> primitives) {
    public ChartModel {
        Objects.requireNonNull(title);
        primitives = List.copyOf(primitives);
        if (!(maxX > minX) || !(maxY > minY) || !(xScale > 0)) {
            throw new IllegalArgumentException("a chart needs a non-empty box and a positive x scale");
        }
    }

    /** The markers, in drawing order (for hit tests and checks). */
    public List<Primitive.Marker> markers() {
        List<Primitive.Marker> out = new ArrayList<>();
        for (Primitive p : primitives) {
            if (p instanceof Primitive.Marker m) {
                out.add(m);
            }
        }
        return out;
    }

    public List<Primitive.Text> texts() {
        List<Primitive.Text> out = new ArrayList<>();
        for (Primitive p : primitives) {
            if (p instanceof Primitive.Text t) {
                out.add(t);
            }
        }
        return out;
    }
}
