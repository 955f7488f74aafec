package org.shapetrail.chart;

import java.util.ArrayList;
import java.util.List;

/**
 * Places short labels next to points without overlap: for each label, tries eight positions around its
 * point in order and takes the first whose box meets no placed label and no marker; a label with no free
 * position is left out (and counted), never drawn over another.
 */
public final class LabelPlacer {
    /** A box in chart units. */
    public record Box(double minX, double minY, double maxX, double maxY) {
        public boolean overlaps(Box o) {
            return minX < o.maxX && o.minX < maxX && minY < o.maxY && o.minY < maxY;
        }
    }

    /** A label placed: where its text starts and its box. */
    public record Placed(Primitive.Text text, Box box) {
    }

    private final double unitsPerPtX;
    private final double unitsPerPtY;
    private final List<Box> taken = new ArrayList<>();
    private final List<Placed> placed = new ArrayList<>();
    private int dropped;

    /**
     * @param ptPerYUnit display points per Y unit at the size the chart is laid out for
     * @param xScale the chart's x scale
     */
    public LabelPlacer(double ptPerYUnit, double xScale) {
        this.unitsPerPtY = 1 / ptPerYUnit;
        this.unitsPerPtX = 1 / (ptPerYUnit * xScale);
    }

    /** Reserves a marker's area so labels keep off it. */
    public void reserve(Point p, double sizePt) {
        double hx = sizePt / 2 * unitsPerPtX;
        double hy = sizePt / 2 * unitsPerPtY;
        taken.add(new Box(p.x() - hx, p.y() - hy, p.x() + hx, p.y() + hy));
    }

    /** Reserves the area of a text already drawn (the chart's own names), so labels keep off it. */
    public void reserveText(Primitive.Text t) {
        double w = t.text().length() * 0.56 * t.sizePt() * unitsPerPtX;
        double h = 1.2 * t.sizePt() * unitsPerPtY;
        double x0 = switch (t.anchor()) {
            case START -> t.at().x();
            case MIDDLE -> t.at().x() - w / 2;
            case END -> t.at().x() - w;
        };
        taken.add(new Box(x0, t.at().y() - 0.2 * h, x0 + w, t.at().y() + 0.8 * h));
    }

    /** Reserves a line's path (a step of a migration path) so labels keep off it: small boxes every few points. */
    public void reserveLine(Point a, Point b, double widthPt) {
        double dx = (b.x() - a.x()) / unitsPerPtX;
        double dy = (b.y() - a.y()) / unitsPerPtY;
        int n = Math.max(1, (int) Math.ceil(Math.hypot(dx, dy) / 3));
        for (int i = 1; i < n; i++) {
            double t = (double) i / n;
            reserve(new Point(a.x() + t * (b.x() - a.x()), a.y() + t * (b.y() - a.y())), widthPt);
        }
    }

    /** Tries to place {@code text} near {@code p}; returns true when it was placed. */
    public boolean place(Point p, String text, double sizePt, String colour) {
        // text width estimate: 0.56 em per character (sans-serif digits and dashes), height 1.2 em
        double w = text.length() * 0.56 * sizePt * unitsPerPtX;
        double h = 1.2 * sizePt * unitsPerPtY;
        double gx = 4 * unitsPerPtX;
        double gy = 3 * unitsPerPtY;
        double[][] candidates = {
            {p.x() + gx, p.y() + gy}, {p.x() + gx, p.y() - gy - h}, {p.x() - gx - w, p.y() + gy},
            {p.x() - gx - w, p.y() - gy - h}, {p.x() - w / 2, p.y() + 2 * gy}, {p.x() - w / 2, p.y() - 2 * gy - h},
            {p.x() + 2 * gx, p.y() - h / 2}, {p.x() - 2 * gx - w, p.y() - h / 2}};
        for (double[] c : candidates) {
            Box b = new Box(c[0], c[1], c[0] + w, c[1] + h);
            if (taken.stream().noneMatch(b::overlaps)) {
                taken.add(b);
                // the text's anchor point is its baseline start: a fifth of the height above the box bottom
                Primitive.Text t = new Primitive.Text(new Point(c[0], c[1] + 0.2 * h), text, sizePt, Anchor.START,
                        false, colour);
                placed.add(new Placed(t, b));
                return true;
            }
        }
        dropped++;
        return false;
    }

    public List<Placed> placed() {
        return placed;
    }

    public int dropped() {
        return dropped;
    }
}
