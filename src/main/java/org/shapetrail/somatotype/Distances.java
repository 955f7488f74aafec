package org.shapetrail.somatotype;

/**
 * Distances between somatotypes (Ross &amp; Wilson 1973; Carter, Ross, Duquet &amp; Aubry 1983), in
 * somatotype units (SAD) and chart units (SDD).
 */
public final class Distances {
    private Distances() {
    }

    /** Somatotype attitudinal distance: √(ΔEndo² + ΔMeso² + ΔEcto²). */
    public static double sad(Rating a, Rating b) {
        double d1 = a.endomorphy() - b.endomorphy();
        double d2 = a.mesomorphy() - b.mesomorphy();
        double d3 = a.ectomorphy() - b.ectomorphy();
        return Math.sqrt(d1 * d1 + d2 * d2 + d3 * d3);
    }

    /** Somatotype dispersion distance between two chart points: √(3·ΔX² + ΔY²). */
    public static double sdd(ChartPoint p, ChartPoint q) {
        double dx = p.x() - q.x();
        double dy = p.y() - q.y();
        return Math.sqrt(3 * dx * dx + dy * dy);
    }

    /** SDD between the chart points of two ratings. */
    public static double sdd(Rating a, Rating b) {
        return sdd(a.chartPoint(), b.chartPoint());
    }
}
