package org.shapetrail.chart;

import static org.shapetrail.i18n.Messages.tr;

import java.util.ArrayList;
import java.util.List;
import org.shapetrail.growth.PreeceBaines;

/**
 * The growth chart: stature (cm, left scale) and body mass (kg, drawn on the same box with its own
 * labels) against age, the stature velocity between visits written at each step, the observed growth
 * curve when one was fitted, and the estimated age at PHV marked with its uncertainty.
 */
public final class GrowthChartBuilder {
    /** One visit. */
    public record Visit(double age, Double statureCm, Double massKg) {
    }

    private final String title;
    private final List<Visit> visits = new ArrayList<>();
    private PreeceBaines curve;
    private Double phvAge;
    private double phvSe;
    private String phvLabel;

    public GrowthChartBuilder(String title) {
        this.title = title;
    }

    public GrowthChartBuilder visits(List<Visit> v) {
        visits.addAll(v);
        return this;
    }

    public GrowthChartBuilder curve(PreeceBaines pb) {
        this.curve = pb;
        return this;
    }

    /** Marks an age at PHV (estimated or observed) with ± its error. */
    public GrowthChartBuilder ageAtPhv(double age, double se, String label) {
        this.phvAge = age;
        this.phvSe = se;
        this.phvLabel = label;
        return this;
    }

    public ChartModel build() {
        double a0 = visits.stream().mapToDouble(Visit::age).min().orElse(10) - 0.5;
        double a1 = visits.stream().mapToDouble(Visit::age).max().orElse(18) + 0.5;
        double s0 = visits.stream().filter(v -> v.statureCm() != null).mapToDouble(Visit::statureCm).min().orElse(120) - 5;
        double s1 = visits.stream().filter(v -> v.statureCm() != null).mapToDouble(Visit::statureCm).max().orElse(190) + 5;
        double m0 = visits.stream().filter(v -> v.massKg() != null).mapToDouble(Visit::massKg).min().orElse(20) - 3;
        double m1 = visits.stream().filter(v -> v.massKg() != null).mapToDouble(Visit::massKg).max().orElse(90) + 3;
        // the box is the stature scale; mass is mapped onto it linearly
        java.util.function.DoubleUnaryOperator massY = m -> s0 + (m - m0) / (m1 - m0) * (s1 - s0);
        List<Primitive> all = new ArrayList<>();
        List<Double> xt = Axes.ticks(a0, a1, 8);
        Axes.frame(all, a0, a1, s0, s1, xt, xt.stream().map(Axes::label).toList(), Axes.ticks(s0, s1, 6), tr("chart.growth.x"),
                tr("chart.growth.y"), (a1 - a0) * 0.06, (s1 - s0) * 0.06);
        for (double m : Axes.ticks(m0, m1, 5)) {
            all.add(new Primitive.Text(new Point(a1 + (a1 - a0) * 0.01, massY.applyAsDouble(m)), tr("chart.kg", Axes.label(m)), 8,
                    Anchor.START, false, Palette.series(1)));
        }
        if (phvAge != null) {
            double lo = Math.max(a0, phvAge - phvSe);
            double hi = Math.min(a1, phvAge + phvSe);
            all.add(new Primitive.Path(List.of(new Point(lo, s0), new Point(hi, s0), new Point(hi, s1), new Point(lo, s1)),
                    true, new Style(null, 0, new double[0], Palette.NOISE, 0.25)));
            all.add(new Primitive.Segment(new Point(phvAge, s0), new Point(phvAge, s1), false,
                    Style.dashed(Palette.ACCENT, 1.4, 5, 3)));
            all.add(new Primitive.Text(new Point(phvAge, s1 - (s1 - s0) * 0.04), phvLabel, 8, Anchor.MIDDLE, true,
                    Palette.ACCENT));
        }
        if (curve != null) {
            List<Point> c = new ArrayList<>();
            for (double t = a0; t <= a1; t += (a1 - a0) / 80) {
                c.add(new Point(t, curve.statureCm(t)));
            }
            all.add(new Primitive.Path(c, false, Style.dashed(Palette.FRAME, 1, 2, 2)));
        }
        List<Point> st = new ArrayList<>();
        List<Point> ms = new ArrayList<>();
        for (Visit v : visits) {
            if (v.statureCm() != null) {
                st.add(new Point(v.age(), v.statureCm()));
            }
            if (v.massKg() != null) {
                ms.add(new Point(v.age(), massY.applyAsDouble(v.massKg())));
            }
        }
        if (st.size() >= 2) {
            all.add(new Primitive.Path(st, false, Style.stroke(Palette.series(0), 2)));
            for (int i = 1; i < st.size(); i++) {
                double dt = st.get(i).x() - st.get(i - 1).x();
                if (dt >= 0.24) {
                    double vel = (st.get(i).y() - st.get(i - 1).y()) / dt;
                    all.add(new Primitive.Text(new Point((st.get(i).x() + st.get(i - 1).x()) / 2,
                            (st.get(i).y() + st.get(i - 1).y()) / 2 + (s1 - s0) * 0.025), Axes.label(Math.round(vel * 10)
                            / 10.0), 7, Anchor.MIDDLE, false, Palette.MUTED));
                }
            }
        }
        if (ms.size() >= 2) {
            all.add(new Primitive.Path(ms, false, Style.dashed(Palette.series(1), 1.6, 6, 3)));
        }
        for (Point p : st) {
            all.add(new Primitive.Marker(p, MarkerShape.CIRCLE, 6, Style.filled(Palette.series(0), Palette.INK, 0.6), null,
                    tr("chart.growth.stature", Axes.label(Math.round(p.x() * 10) / 10.0),
                            Axes.label(Math.round(p.y() * 10) / 10.0))));
        }
        for (Point p : ms) {
            all.add(new Primitive.Marker(p, MarkerShape.SQUARE, 6, Style.filled(Palette.PAPER, Palette.series(1), 1.2), null,
                    null));
        }
        double padX = (a1 - a0) * 0.12;
        double padY = (s1 - s0) * 0.14;
        double xScale = (s1 - s0 + 2 * padY) / (a1 - a0 + 2 * padX) * 1.45;
        return new ChartModel(title, a0 - padX, a1 + padX, s0 - padY, s1 + padY * 0.8, xScale, all);
    }
}
