package org.shapetrail.chart;

import java.util.ArrayList;
import java.util.List;

/** Confidence ellipses of 2×2 covariances, as closed polylines. */
public final class Ellipses {
    /** χ²(2) 95th percentile, 5.991 (statistics table): the 95 % region of a bivariate normal. */
    public static final double CHI2_2_95 = 5.991464547107979;

    private Ellipses() {
    }

    /** Semi-axes (a ≥ b) and the angle of the major axis of the {@code k²}-ellipse of covariance c. */
    public static double[] axes(double[][] c, double kSquared) {
        double sxx = c[0][0];
        double syy = c[1][1];
        double sxy = c[0][1];
        double tr = sxx + syy;
        double det = sxx * syy - sxy * sxy;
        double disc = Math.sqrt(Math.max(0, tr * tr / 4 - det));
        double l1 = tr / 2 + disc;
        double l2 = Math.max(0, tr / 2 - disc);
        double angle = Math.abs(sxy) < 1e-300 ? (sxx >= syy ? 0 : Math.PI / 2) : Math.atan2(l1 - sxx, sxy);
        return new double[] {Math.sqrt(kSquared * l1), Math.sqrt(kSquared * l2), angle};
    }

    /** The ellipse around (cx, cy) as {@code n} points. */
    public static List<Point> polygon(double cx, double cy, double[][] cov, double kSquared, int n) {
        double[] ax = axes(cov, kSquared);
        double ca = Math.cos(ax[2]);
        double sa = Math.sin(ax[2]);
        List<Point> out = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            double t = 2 * Math.PI * i / n;
            double u = ax[0] * Math.cos(t);
            double v = ax[1] * Math.sin(t);
            out.add(new Point(cx + u * ca - v * sa, cy + u * sa + v * ca));
        }
        return out;
    }
}
