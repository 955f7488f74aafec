package org.shapetrail.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** Plain x/y axes with ticks and labels for the profile and growth charts (chart units, y up). */
final class Axes {
    private Axes() {
    }

    /** Tick values from lo to hi, step chosen for about {@code target} ticks (1, 2 or 5 × a power of ten). */
    static List<Double> ticks(double lo, double hi, int target) {
        double raw = (hi - lo) / Math.max(1, target);
        double mag = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = raw / mag < 1.5 ? mag : raw / mag < 3.5 ? 2 * mag : raw / mag < 7.5 ? 5 * mag : 10 * mag;
        List<Double> out = new ArrayList<>();
        for (double v = Math.ceil(lo / step) * step; v <= hi + 1e-9; v += step) {
            out.add(Math.abs(v) < 1e-12 ? 0 : v);
        }
        return out;
    }

    static void frame(List<Primitive> out, double x0, double x1, double y0, double y1, List<Double> xTicks,
                      List<String> xLabels, List<Double> yTicks, String xTitle, String yTitle, double xPad, double yPad) {
        Style grid = Style.stroke(Palette.GRID, 0.6);
        Style axis = Style.stroke(Palette.FRAME, 1.0);
        for (double y : yTicks) {
            out.add(new Primitive.Segment(new Point(x0, y), new Point(x1, y), false, grid));
            out.add(new Primitive.Text(new Point(x0 - xPad * 0.3, y - yPad * 0.15), label(y), 8, Anchor.END, false,
                    Palette.MUTED));
        }
        for (int i = 0; i < xTicks.size(); i++) {
            double x = xTicks.get(i);
            out.add(new Primitive.Segment(new Point(x, y0), new Point(x, y0 - yPad * 0.2), false, axis));
            out.add(new Primitive.Text(new Point(x, y0 - yPad * 0.8), xLabels.get(i), 8, Anchor.MIDDLE, false,
                    Palette.MUTED));
        }
        out.add(new Primitive.Segment(new Point(x0, y0), new Point(x1, y0), false, axis));
        out.add(new Primitive.Segment(new Point(x0, y0), new Point(x0, y1), false, axis));
        out.add(new Primitive.Text(new Point((x0 + x1) / 2, y0 - yPad * 1.6), xTitle, 9, Anchor.MIDDLE, true, Palette.INK));
        out.add(new Primitive.Text(new Point(x0, y1 + yPad * 0.5), yTitle, 9, Anchor.START, true, Palette.INK));
    }

    static String label(double v) {
        return Math.abs(v - Math.rint(v)) < 1e-9 ? Long.toString(Math.round(v)) : String.format(Locale.ROOT, "%.1f", v);
    }
}
