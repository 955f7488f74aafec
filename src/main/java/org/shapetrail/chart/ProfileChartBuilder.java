package org.shapetrail.chart;

import java.util.ArrayList;
import java.util.List;
import org.shapetrail.somatotype.Component;
import org.shapetrail.somatotype.Rating;

/**
 * The component profile: endomorphy, mesomorphy and ectomorphy along the x axis, the rating on the y axis,
 * one line per person or group; a group's line carries ±1 SD bars.
 */
public final class ProfileChartBuilder {
    private final String title;
    private final List<Primitive> lines = new ArrayList<>();
    private int series;
    private double maxRating = 6;
    /** Heights of the names already placed at the lines' right ends; names keep this far apart (rating units). */
    private final List<Double> nameRows = new ArrayList<>();
    private static final double NAME_GAP = 0.45;

    public ProfileChartBuilder(String title) {
        this.title = title;
    }

    /** A line through the three components; {@code sd} (null for a person) draws ±1 SD bars. */
    public ProfileChartBuilder line(String name, Rating r, double[] sd) {
        String colour = Palette.series(series);
        MarkerShape shape = MarkerShape.values()[series % MarkerShape.values().length];
        Style style = series % 2 == 0 ? Style.stroke(colour, 2) : Style.dashed(colour, 2, 6, 3);
        series++;
        List<Point> pts = new ArrayList<>();
        for (Component c : Component.values()) {
            double x = c.ordinal() + 1;
            double y = r.get(c);
            pts.add(new Point(x, y));
            maxRating = Math.max(maxRating, y + (sd == null ? 0 : sd[c.ordinal()]) + 0.5);
            if (sd != null) {
                double s = sd[c.ordinal()];
                lines.add(new Primitive.Segment(new Point(x, y - s), new Point(x, y + s), false, Style.stroke(colour, 1.2)));
                lines.add(new Primitive.Segment(new Point(x - 0.06, y + s), new Point(x + 0.06, y + s), false,
                        Style.stroke(colour, 1.2)));
                lines.add(new Primitive.Segment(new Point(x - 0.06, y - s), new Point(x + 0.06, y - s), false,
                        Style.stroke(colour, 1.2)));
            }
        }
        lines.add(new Primitive.Path(pts, false, style));
        for (Point p : pts) {
            lines.add(new Primitive.Marker(p, shape, 8, Style.filled(colour, Palette.INK, 0.8), null,
                    name + ": " + Axes.label(Math.round(p.y() * 10) / 10.0)));
        }
        // the line's name at its right end, moved up or down off a name already there (two means may end alike)
        double y = pts.get(2).y();
        for (double taken : nameRows) {
            if (Math.abs(y - taken) < NAME_GAP) {
                y = y >= taken ? taken + NAME_GAP : taken - NAME_GAP;
            }
        }
        nameRows.add(y);
        lines.add(new Primitive.Text(new Point(3.12, y), name, 8.5, Anchor.START, false, colour));
        return this;
    }

    public ChartModel build() {
        List<Primitive> all = new ArrayList<>();
        double top = Math.ceil(maxRating);
        Axes.frame(all, 0.5, 3.5, 0, top, List.of(1.0, 2.0, 3.0), List.of(org.shapetrail.i18n.Messages.tr("chart.profile.endo"),
                org.shapetrail.i18n.Messages.tr("chart.profile.meso"), org.shapetrail.i18n.Messages.tr("chart.profile.ecto")),
                Axes.ticks(0, top, 6), org.shapetrail.i18n.Messages.tr("chart.profile.x"),
                org.shapetrail.i18n.Messages.tr("chart.profile.y"), 0.25, 0.55);
        all.addAll(lines);
        // wide rather than tall, so the three component names sit apart
        return new ChartModel(title, -0.1, 4.4, -1.3, top + 0.6, 3.2, all);
    }
}
