package org.shapetrail.noise;

import java.util.List;
import java.util.Map;
import org.shapetrail.measure.Site;
import org.shapetrail.somatotype.EndomorphyVariant;
import org.shapetrail.somatotype.HeathCarter;
import org.shapetrail.somatotype.HeathCarterInput;

/**
 * Propagates independent site errors into the covariance of the three components with the analytic
 * Jacobian of the Heath-Carter equations (delta method).
 *
 * <p>Where a component has a kink or a jump near the rating — the 0.1 floor of each component, the HWR
 * branch points 38.25 / 40.75 of ectomorphy — the plain delta method would take the slope of whichever
 * side the point falls on, and jump from zero to full slope across the boundary. Instead each such
 * component is treated as a piecewise-linear function of its (linearised, normal) argument: its
 * cross-covariances use the expected slope (Stein's lemma, exact for a normal argument), and its variance
 * the exact variance of the piecewise function. Away from the kinks this equals the delta method.
 */
public final class ErrorPropagation {
    /** HWR below which the middle ectomorphy equation gives less than 0.1: (0.1 + 17.63) / 0.463. */
    static final double ECTO_FLOOR_HWR = (HeathCarter.FLOOR + 17.63) / 0.463;

    private static final PiecewiseNormal.Piece[] ECTO = {
        new PiecewiseNormal.Piece(Double.NEGATIVE_INFINITY, ECTO_FLOOR_HWR, HeathCarter.FLOOR, 0),
        new PiecewiseNormal.Piece(ECTO_FLOOR_HWR, HeathCarter.HWR_HIGH - 1e-12, -17.63, 0.463),
        new PiecewiseNormal.Piece(HeathCarter.HWR_HIGH - 1e-12, Double.POSITIVE_INFINITY, -28.58, 0.732)
    };
    private static final PiecewiseNormal.Piece[] FLOORED = {
        new PiecewiseNormal.Piece(Double.NEGATIVE_INFINITY, HeathCarter.FLOOR, HeathCarter.FLOOR, 0),
        new PiecewiseNormal.Piece(HeathCarter.FLOOR, Double.POSITIVE_INFINITY, 0, 1)
    };

    private ErrorPropagation() {
    }

    /**
     * The component covariance of one rating.
     *
     * @param in the final values
     * @param standardErrors SE of each of the ten Heath-Carter sites, in the site's unit; a missing site
     *     counts as exact
     */
    public static ComponentCovariance covariance(HeathCarterInput in, Map<Site, Double> standardErrors,
                                                 EndomorphyVariant variant) {
        List<Site> sites = HeathCarterInput.SITES;
        double[] se = new double[sites.size()];
        for (int i = 0; i < se.length; i++) {
            se[i] = standardErrors.getOrDefault(sites.get(i), 0.0);
        }
        return covariance(in, se, variant);
    }

    /** As {@link #covariance(HeathCarterInput, Map, EndomorphyVariant)}, SEs in the order of {@link HeathCarterInput#SITES}. */
    public static ComponentCovariance covariance(HeathCarterInput in, double[] se, EndomorphyVariant variant) {
        double h = in.statureCm();
        double m = in.massKg();
        double sum = in.tricepsMm() + in.subscapularMm() + in.supraspinaleMm();
        double x = HeathCarter.endomorphyX(sum, h, variant);
        double dEdX = 0.1451 - 0.00136 * x + 0.0000042 * x * x;
        boolean corrected = variant == EndomorphyVariant.HEIGHT_CORRECTED;
        double dXdFold = corrected ? HeathCarter.REFERENCE_STATURE_CM / h : 1;
        double dXdH = corrected ? -x / h : 0;

        // gradients of the raw (unfloored) components, order: H, M, tri, sub, sup, mc, hum, fem, arm, calf
        double[] gEndo = {dEdX * dXdH, 0, dEdX * dXdFold, dEdX * dXdFold, dEdX * dXdFold, 0, 0, 0, 0, 0};
        double[] gMeso = {-0.131, 0, -0.0188, 0, 0, -0.0161, 0.858, 0.601, 0.188, 0.161};
        double cbrt = Math.cbrt(m);
        double hwr = h / cbrt;
        double[] gHwr = {1 / cbrt, -hwr / (3 * m), 0, 0, 0, 0, 0, 0, 0, 0};

        double[] var = new double[se.length];
        for (int i = 0; i < se.length; i++) {
            var[i] = se[i] * se[i];
        }
        PiecewiseNormal.Moments endo = PiecewiseNormal.of(FLOORED, HeathCarter.endomorphyRaw(x),
                Math.sqrt(quad(gEndo, var)));
        PiecewiseNormal.Moments meso = PiecewiseNormal.of(FLOORED, HeathCarter.mesomorphyRaw(in),
                Math.sqrt(quad(gMeso, var)));
        PiecewiseNormal.Moments ecto = PiecewiseNormal.of(ECTO, hwr, Math.sqrt(quad(gHwr, var)));

        double[][] g = {scale(gEndo, endo.meanSlope()), scale(gMeso, meso.meanSlope()), scale(gHwr, ecto.meanSlope())};
        double[][] s = new double[3][3];
        for (int a = 0; a < 3; a++) {
            for (int b = a; b < 3; b++) {
                double v = 0;
                for (int i = 0; i < var.length; i++) {
                    v += g[a][i] * var[i] * g[b][i];
                }
                s[a][b] = v;
                s[b][a] = v;
            }
        }
        // exact variances of the piecewise components (never below the linear part: Cauchy-Schwarz)
        s[0][0] = Math.max(s[0][0], endo.variance());
        s[1][1] = Math.max(s[1][1], meso.variance());
        s[2][2] = Math.max(s[2][2], ecto.variance());
        return new ComponentCovariance(s);
    }

    private static double quad(double[] g, double[] var) {
        double v = 0;
        for (int i = 0; i < g.length; i++) {
            v += g[i] * g[i] * var[i];
        }
        return v;
    }

    private static double[] scale(double[] g, double k) {
        double[] out = new double[g.length];
        for (int i = 0; i < g.length; i++) {
            out[i] = g[i] * k;
        }
        return out;
    }
}
