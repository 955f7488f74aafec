package org.shapetrail.chart;

import static org.shapetrail.i18n.Messages.tr;

import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.shapetrail.noise.ComponentCovariance;
import org.shapetrail.noise.Verdict;
import org.shapetrail.somatotype.ChartPoint;
import org.shapetrail.somatotype.Rating;
import org.shapetrail.somatotype.RatingSummary;

/**
 * Builds the somatochart model: the frame (outline of three arcs, each through two corner ratings — 7-1-1,
 * 1-7-1, 1-1-7 — and the two-component rating between them — 5-5-1, 1-5-5, 5-1-5 — so the sides bulge
 * outwards past the straight sides through 4-4-1 and its kin; three axes from each corner through 4-4-4;
 * a light grid; the component names),
 * then migration paths with noise ellipses and verdict-styled steps, and group means with their
 * dispersion.
 */
public final class SomatochartBuilder {
    public static final double X_SCALE = Math.sqrt(3);

    static final Point ENDO_CORNER = pt(Rating.of(7, 1, 1));
    static final Point MESO_CORNER = pt(Rating.of(1, 7, 1));
    static final Point ECTO_CORNER = pt(Rating.of(1, 1, 7));
    static final Point ENDO_MESO_MID = pt(Rating.of(5, 5, 1));
    static final Point MESO_ECTO_MID = pt(Rating.of(1, 5, 5));
    static final Point ENDO_ECTO_MID = pt(Rating.of(5, 1, 5));

    private final String title;
    private final List<Primitive> frame = new ArrayList<>();
    private final List<Primitive> under = new ArrayList<>();
    private final List<Primitive> over = new ArrayList<>();
    private final List<Object[]> reserved = new ArrayList<>();
    /** Steps and arrows, whose lines labels keep off: {from, to}. */
    private final List<Point[]> lines = new ArrayList<>();
    private final List<Object[]> wanted = new ArrayList<>();
    private final Locale locale;
    private LabelPlacer labels;
    private int series;
    private boolean legend = true;

    /** One visit on a migration path. */
    public record PathPoint(LocalDate date, Rating rating, ComponentCovariance covariance, String id) {
    }

    public SomatochartBuilder(String title) {
        this(title, Locale.getDefault(Locale.Category.FORMAT));
    }

    /** A builder whose date labels use {@code locale}'s month names. */
    public SomatochartBuilder(String title, Locale locale) {
        this.title = title;
        this.locale = locale;
        frame();
    }

    static Point pt(Rating r) {
        ChartPoint c = r.chartPoint();
        return new Point(c.x(), c.y());
    }

    /** The outline: three circular arcs, each through two corners and the two-component rating between them. */
    public static List<Point> outline(int pointsPerArc) {
        List<Point> out = new ArrayList<>();
        out.addAll(arc(ENDO_CORNER, ENDO_MESO_MID, MESO_CORNER, pointsPerArc));
        out.addAll(arc(MESO_CORNER, MESO_ECTO_MID, ECTO_CORNER, pointsPerArc));
        out.addAll(arc(ECTO_CORNER, ENDO_ECTO_MID, ENDO_CORNER, pointsPerArc));
        return out;
    }

    /**
     * Points on the circle through a, m, b from a to b passing m, drawn in display space (x × √3) so the
     * arc is round on screen; the last point (b) is left out so arcs join without repeats.
     */
    static List<Point> arc(Point a, Point m, Point b, int n) {
        double ax = a.x() * X_SCALE;
        double ay = a.y();
        double mx = m.x() * X_SCALE;
        double my = m.y();
        double bx = b.x() * X_SCALE;
        double by = b.y();
        double d = 2 * (ax * (my - by) + mx * (by - ay) + bx * (ay - my));
        double ux = ((ax * ax + ay * ay) * (my - by) + (mx * mx + my * my) * (by - ay) + (bx * bx + by * by) * (ay - my)) / d;
        double uy = ((ax * ax + ay * ay) * (bx - mx) + (mx * mx + my * my) * (ax - bx) + (bx * bx + by * by) * (mx - ax)) / d;
        double r = Math.hypot(ax - ux, ay - uy);
        double t0 = Math.atan2(ay - uy, ax - ux);
        double tm = Math.atan2(my - uy, mx - ux);
        double t1 = Math.atan2(by - uy, bx - ux);
        double sweep = norm(t1 - t0);
        if (norm(tm - t0) > sweep) {
            sweep -= 2 * Math.PI; // go the other way round, through m
        }
        List<Point> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            double t = t0 + sweep * i / n;
            out.add(new Point((ux + r * Math.cos(t)) / X_SCALE, uy + r * Math.sin(t)));
        }
        return out;
    }

    private static double norm(double a) {
        double x = a % (2 * Math.PI);
        return x < 0 ? x + 2 * Math.PI : x;
    }

    private void frame() {
        Style grid = Style.stroke(Palette.GRID, 0.6);
        for (int x = -8; x <= 8; x += 2) {
            frame.add(new Primitive.Segment(new Point(x, -13), new Point(x, 13.5), false, grid));
        }
        for (int y = -12; y <= 12; y += 2) {
            frame.add(new Primitive.Segment(new Point(-8, y), new Point(8, y), false, grid));
        }
        frame.add(new Primitive.Path(outline(60), true, Style.stroke(Palette.FRAME, 1.4)));
        Style axis = Style.dashed(Palette.FRAME, 0.8, 4, 3);
        frame.add(new Primitive.Segment(ENDO_CORNER, MESO_ECTO_MID, false, axis));
        frame.add(new Primitive.Segment(MESO_CORNER, ENDO_ECTO_MID, false, axis));
        frame.add(new Primitive.Segment(ECTO_CORNER, ENDO_MESO_MID, false, axis));
        // the corner names sit below their corners, clear of the outline
        frame.add(new Primitive.Text(new Point(ENDO_CORNER.x() - 0.3, ENDO_CORNER.y() - 2.2), tr("chart.corner.endo"), 10,
                Anchor.MIDDLE, true, Palette.MUTED));
        frame.add(new Primitive.Text(new Point(MESO_CORNER.x(), MESO_CORNER.y() + 0.9), tr("chart.corner.meso"), 10,
                Anchor.MIDDLE, true, Palette.MUTED));
        frame.add(new Primitive.Text(new Point(ECTO_CORNER.x() + 0.3, ECTO_CORNER.y() - 2.2), tr("chart.corner.ecto"), 10,
                Anchor.MIDDLE, true, Palette.MUTED));
        for (int v = -6; v <= 6; v += 6) {
            frame.add(new Primitive.Text(new Point(v, -13.0), Integer.toString(v), 8, Anchor.MIDDLE, false,
                    Palette.MUTED));
        }
        frame.add(new Primitive.Text(new Point(0, 0.35), "4-4-4", 7, Anchor.MIDDLE, false, Palette.MUTED));
    }

    /**
     * Adds the category regions: the chart is divided where the category changes, each region named at its
     * centre. Pairwise differences of the components depend only on the chart point (m − e = (Y + X)/2,
     * m − c = (Y − X)/2, c − e = X), so every category but central is a region of the chart; central is
     * drawn for ratings around 4-4-4 (sum 12), the level the chart's centre stands for.
     */
    public SomatochartBuilder withCategoryRegions() {
        double step = 0.125;
        int nx = (int) Math.round(16 / step);
        int ny = (int) Math.round(26 / step);
        org.shapetrail.somatotype.Category[][] cat = new org.shapetrail.somatotype.Category[nx + 1][ny + 1];
        java.util.Map<org.shapetrail.somatotype.Category, double[]> sums = new java.util.EnumMap<>(
                org.shapetrail.somatotype.Category.class);
        List<Point> outline = outline(60);
        for (int i = 0; i <= nx; i++) {
            for (int j = 0; j <= ny; j++) {
                double x = -8 + i * step;
                double y = -13 + j * step;
                if (!inside(outline, x, y)) {
                    continue;
                }
                Rating r = ratingAt(x, y);
                if (r == null) {
                    continue;
                }
                cat[i][j] = org.shapetrail.somatotype.Categories.classify(r);
                double[] acc = sums.computeIfAbsent(cat[i][j], k -> new double[3]);
                acc[0] += x;
                acc[1] += y;
                acc[2]++;
            }
        }
        Style edge = Style.dashed(Palette.FRAME, 0.6, 1, 2).withOpacity(0.8);
        for (int i = 0; i < nx; i++) {
            for (int j = 0; j < ny; j++) {
                double x = -8 + i * step;
                double y = -13 + j * step;
                if (cat[i][j] != null && cat[i + 1][j] != null && cat[i][j] != cat[i + 1][j]) {
                    frame.add(new Primitive.Segment(new Point(x + step / 2, y - step / 2), new Point(x + step / 2,
                            y + step / 2), false, edge));
                }
                if (cat[i][j] != null && cat[i][j + 1] != null && cat[i][j] != cat[i][j + 1]) {
                    frame.add(new Primitive.Segment(new Point(x - step / 2, y + step / 2), new Point(x + step / 2,
                            y + step / 2), false, edge));
                }
            }
        }
        sums.forEach((c, acc) -> {
            if (acc[2] >= 48) {
                frame.add(new Primitive.Text(new Point(acc[0] / acc[2], acc[1] / acc[2]), c.shown(), 6.5,
                        Anchor.MIDDLE, false, Palette.FRAME));
            }
        });
        return this;
    }

    /** The rating with chart point (x, y) and components summing to 12, or null when one would be below 0.5. */
    static Rating ratingAt(double x, double y) {
        // e + m + c = 12, c − e = x, 2m − e − c = y  ⇒  m = (12 + y)/3, e = (12 − m − x)/2, c = e + x
        double m = (12 + y) / 3;
        double e = (12 - m - x) / 2;
        double c = e + x;
        if (e < 0.5 || m < 0.5 || c < 0.5 || e > 12 || m > 12 || c > 12) {
            return null;
        }
        return Rating.of(e, m, c);
    }

    private static boolean inside(List<Point> poly, double x, double y) {
        boolean in = false;
        for (int i = 0, j = poly.size() - 1; i < poly.size(); j = i++) {
            Point a = poly.get(i);
            Point b = poly.get(j);
            if ((a.y() > y) != (b.y() > y) && x < (b.x() - a.x()) * (y - a.y()) / (b.y() - a.y()) + a.x()) {
                in = !in;
            }
        }
        return in;
    }

    /**
     * Names the three corners in other words than the trade's (letters to families say "skinfold rating",
     * "muscle and bone build", "slenderness").
     */
    public SomatochartBuilder withAxisNames(String endo, String meso, String ecto) {
        List<String> names = List.of(endo, meso, ecto);
        List<String> trade = List.of(tr("chart.corner.endo"), tr("chart.corner.meso"), tr("chart.corner.ecto"));
        for (int i = 0; i < frame.size(); i++) {
            if (frame.get(i) instanceof Primitive.Text t && trade.contains(t.text())) {
                frame.set(i, new Primitive.Text(t.at(), names.get(trade.indexOf(t.text())), t.sizePt(), t.anchor(),
                        t.bold(), t.colour()));
            }
        }
        return this;
    }

    /** The whole chart (every corner and axis name in view), laid out for a chart {@code heightPt} tall. */
    public ChartModel buildWhole(double heightPt) {
        return build(-8.6, 8.6, -14.0, 14.0, heightPt);
    }

    /** Leaves the key out of the model (the screen shows it beside the chart, at a fixed size). */
    public SomatochartBuilder withoutLegend() {
        legend = false;
        return this;
    }

    /** The key to the step styles, in the top left corner of the box (unitsPerPt: Y units per point). */
    private void legend(List<Primitive> all, double minX, double maxY, double unitsPerPt) {
        double x0 = minX + 14 * unitsPerPt / X_SCALE;
        double y = maxY - 16 * unitsPerPt;
        boolean anyEllipse = under.stream().anyMatch(p -> p instanceof Primitive.Path path && path.style().fill() != null);
        for (Verdict v : Verdict.values()) {
            all.add(new Primitive.Segment(new Point(x0, y + 3 * unitsPerPt), new Point(x0 + 26 * unitsPerPt / X_SCALE,
                    y + 3 * unitsPerPt), false, stepStyle(v, Palette.INK)));
            all.add(new Primitive.Text(new Point(x0 + 32 * unitsPerPt / X_SCALE, y), tr("chart.legend.step", v.shown()), 8, Anchor.START, false, Palette.INK));
            y -= 13 * unitsPerPt;
        }
        if (anyEllipse) {
            all.add(new Primitive.Path(Ellipses.polygon(x0 + 13 * unitsPerPt / X_SCALE, y + 3 * unitsPerPt,
                    new double[][] {{Math.pow(11 * unitsPerPt / X_SCALE, 2), 0}, {0, Math.pow(4.5 * unitsPerPt, 2)}}, 1,
                    24), true, new Style(Palette.NOISE, 0.6, new double[0], Palette.NOISE, 0.35)));
            all.add(new Primitive.Text(new Point(x0 + 32 * unitsPerPt / X_SCALE, y), tr("chart.legend.noise"), 8, Anchor.START, false, Palette.INK));
        }
    }

    /** Style of a step between two visits by its verdict: line style and width carry it, not only colour. */
    public static Style stepStyle(Verdict v, String colour) {
        return switch (v) {
            case BEYOND_NOISE -> Style.stroke(colour, 2.4);
            case BORDERLINE -> Style.dashed(colour, 1.7, 6, 3);
            case WITHIN_NOISE -> Style.dashed(colour, 1.2, 1.5, 3);
        };
    }

    /**
     * Adds a person's migration path: visits in date order, a 95 % noise ellipse around the first and the
     * last (around every one the picture gets too busy to read), a step with
     * an arrow from each visit to the next styled by its verdict, and date labels placed without overlap.
     *
     * @param verdicts verdict of each step, one fewer than points, in date order (null: no verdicts known)
     */
    public SomatochartBuilder path(String name, List<PathPoint> points, List<Verdict> verdicts, boolean ellipses) {
        String colour = Palette.series(series);
        MarkerShape shape = MarkerShape.values()[series % MarkerShape.values().length];
        series++;
        List<PathPoint> ordered = new ArrayList<>(points);
        ordered.sort(Comparator.comparing(PathPoint::date));
        if (verdicts != null && verdicts.size() != Math.max(0, ordered.size() - 1)) {
            throw new IllegalArgumentException("one verdict per step is needed");
        }
        DateTimeFormatter f = DateTimeFormatter.ofPattern("MMM yyyy", locale); // not words: a date pattern
        for (int i = 0; i < ordered.size(); i++) {
            PathPoint p = ordered.get(i);
            Point at = pt(p.rating());
            boolean endPoint = i == 0 || i == ordered.size() - 1;
            if (ellipses && endPoint && p.covariance() != null) {
                under.add(new Primitive.Path(Ellipses.polygon(at.x(), at.y(), p.covariance().chartCovariance(),
                        Ellipses.CHI2_2_95, 40), true,
                        new Style(Palette.NOISE, 0.6, new double[0], Palette.NOISE, 0.35)));
            }
            if (i > 0) {
                Point from = pt(ordered.get(i - 1).rating());
                Verdict v = verdicts == null ? Verdict.WITHIN_NOISE : verdicts.get(i - 1);
                under.add(new Primitive.Segment(from, at, true, stepStyle(v, colour)));
                lines.add(new Point[] {from, at});
            }
            String tip = name + "\n" + p.date() + "\n" + p.rating().toDisplayString(locale);
            boolean last = i == ordered.size() - 1;
            over.add(new Primitive.Marker(at, shape, last ? 9 : 7,
                    last ? Style.filled(colour, Palette.INK, 1) : Style.filled(Palette.PAPER, colour, 1.6), p.id(), tip));
            reserved.add(new Object[] {at, 9.0});
            wanted.add(new Object[] {at, p.date().format(f), 8.0, colour});
        }
        return this;
    }

    /** Adds a group's mean rating with a circle of radius SDI (in SDD units) around it. */
    public SomatochartBuilder groupMean(String name, RatingSummary s, String colour) {
        Point at = new Point(s.meanPoint().x(), s.meanPoint().y());
        if (s.sdi() > 0) {
            double[][] cov = {{Math.pow(s.sdi() / X_SCALE, 2), 0}, {0, s.sdi() * s.sdi()}};
            under.add(new Primitive.Path(Ellipses.polygon(at.x(), at.y(), cov, 1, 60), true,
                    Style.dashed(colour, 1.2, 5, 3)));
        }
        over.add(new Primitive.Marker(at, MarkerShape.DIAMOND, 12, Style.filled(colour, Palette.INK, 1.2), null,
                tr("chart.groupMean", name, s.meanRating().toDisplayString(locale), String.format(locale, "%.2f",
                        s.sam()))));
        reserved.add(new Object[] {at, 12.0});
        wanted.add(new Object[] {at, name, 9.0, colour});
        return this;
    }

    /** A plain point (a member's latest rating on a group chart). */
    public SomatochartBuilder point(Rating r, String id, String tooltip, String colour, MarkerShape shape) {
        Point at = pt(r);
        over.add(new Primitive.Marker(at, shape, 7, Style.filled(colour, Palette.INK, 0.8), id, tooltip));
        reserved.add(new Object[] {at, 7.0});
        return this;
    }

    /** An arrow between two ratings (a group's before/after), styled by verdict. */
    public SomatochartBuilder arrow(Rating from, Rating to, Verdict v, String colour) {
        under.add(new Primitive.Segment(pt(from), pt(to), true, stepStyle(v, colour)));
        lines.add(new Point[] {pt(from), pt(to)});
        return this;
    }

    /**
     * A change drawn against its noise limit: around the earlier rating, the shadow on the chart of the
     * ellipsoid where measurement noise alone ends in 95 % of cases (D² = χ²₀.₉₅(3) of the combined
     * covariance of both visits, projected: the shadow of {x: xᵀΣ⁻¹x ≤ k} under A is {y: yᵀ(AΣAᵀ)⁻¹y ≤ k});
     * then the step, styled by its verdict. A step ending outside the shadow is beyond noise; one ending
     * inside can still be beyond, when part of it is an equal rise or fall of all three components, which
     * the flat chart cannot show.
     */
    public SomatochartBuilder changeAgainstNoise(org.shapetrail.noise.ChangeVerdict v,
                                                 ComponentCovariance combined, String fromLabel,
                                                 String toLabel) {
        String colour = Palette.series(series++);
        Point from = pt(v.from());
        Point to = pt(v.to());
        under.add(new Primitive.Path(Ellipses.polygon(from.x(), from.y(), combined.chartCovariance(),
                Verdict.BEYOND_D2, 72), true, new Style(Palette.NOISE, 0.8, new double[0], Palette.NOISE, 0.35)));
        under.add(new Primitive.Segment(from, to, true, stepStyle(v.verdict(), colour)));
        over.add(new Primitive.Marker(from, MarkerShape.CIRCLE, 7, Style.filled(Palette.PAPER, colour, 1.6), null,
                fromLabel));
        over.add(new Primitive.Marker(to, MarkerShape.CIRCLE, 9, Style.filled(colour, Palette.INK, 1), null, toLabel));
        reserved.add(new Object[] {from, 9.0});
        reserved.add(new Object[] {to, 9.0});
        wanted.add(new Object[] {from, fromLabel, 8.0, colour});
        wanted.add(new Object[] {to, toLabel, 8.0, colour});
        return this;
    }

    /** Whether a change's end lies outside the shadow drawn by {@link #changeAgainstNoise}. */
    public static boolean leavesNoiseShadow(org.shapetrail.noise.ChangeVerdict v,
                                            ComponentCovariance combined) {
        double[][] c = combined.chartCovariance();
        double dx = v.to().chartPoint().x() - v.from().chartPoint().x();
        double dy = v.to().chartPoint().y() - v.from().chartPoint().y();
        double det = c[0][0] * c[1][1] - c[0][1] * c[1][0];
        double q = (dx * dx * c[1][1] - 2 * dx * dy * c[0][1] + dy * dy * c[0][0]) / det;
        return q > Verdict.BEYOND_D2;
    }

    /** Number of labels left out for lack of room. */
    public int droppedLabels() {
        return labels == null ? 0 : labels.dropped();
    }

    /** The whole chart. */
    public ChartModel build() {
        return build(-8.6, 8.6, -14.0, 14.0, 520);
    }

    /**
     * The chart cropped to the data (markers and ellipses) with a margin, at least {@code minSpanY} Y units
     * tall, with the chart's proportions; the frame is drawn where it falls inside.
     */
    public ChartModel buildAroundData(double minSpanY) {
        return buildAroundData(minSpanY, 520);
    }

    /** As {@link #buildAroundData(double)}, laid out (labels, key) for a chart {@code heightPt} tall. */
    public ChartModel buildAroundData(double minSpanY, double heightPt) {
        double minX = Double.POSITIVE_INFINITY;
        double maxX = Double.NEGATIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY;
        double maxY = Double.NEGATIVE_INFINITY;
        List<Point> pts = new ArrayList<>();
        for (Primitive p : over) {
            if (p instanceof Primitive.Marker m) {
                pts.add(m.at());
            }
        }
        for (Primitive p : under) {
            if (p instanceof Primitive.Path path) {
                pts.addAll(path.points());
            }
        }
        if (pts.isEmpty()) {
            return build(-8.6, 8.6, -14.0, 14.0, heightPt);
        }
        for (Point p : pts) {
            minX = Math.min(minX, p.x());
            maxX = Math.max(maxX, p.x());
            minY = Math.min(minY, p.y());
            maxY = Math.max(maxY, p.y());
        }
        double cx = (minX + maxX) / 2;
        double cy = (minY + maxY) / 2;
        double spanY = Math.max(minSpanY, Math.max(maxY - minY, (maxX - minX) * X_SCALE) * 1.35);
        double spanX = spanY / X_SCALE;
        return build(cx - spanX / 2, cx + spanX / 2, cy - spanY / 2, cy + spanY / 2, heightPt);
    }

    private ChartModel build(double minX, double maxX, double minY, double maxY, double heightPt) {
        labels = new LabelPlacer(heightPt / (maxY - minY), X_SCALE);
        for (Object[] r : reserved) {
            labels.reserve((Point) r[0], (Double) r[1]);
        }
        for (Point[] l : lines) {
            labels.reserveLine(l[0], l[1], 4);
        }
        for (Primitive p : frame) {
            if (p instanceof Primitive.Text t) {
                labels.reserveText(t);
            }
        }
        for (Object[] w : wanted) {
            labels.place((Point) w[0], (String) w[1], (Double) w[2], (String) w[3]);
        }
        List<Primitive> all = new ArrayList<>(frame);
        all.addAll(under);
        all.addAll(over);
        for (LabelPlacer.Placed p : labels.placed()) {
            all.add(p.text());
        }
        if (legend && under.stream().anyMatch(p -> p instanceof Primitive.Segment seg && seg.arrow())) {
            legend(all, minX, maxY, (maxY - minY) / heightPt);
        }
        return new ChartModel(title, minX, maxX, minY, maxY, X_SCALE, all);
    }

    /** The placed labels with their boxes (for checks), after a build. */
    public List<LabelPlacer.Placed> placedLabels() {
        return labels == null ? List.of() : labels.placed();
    }
}
