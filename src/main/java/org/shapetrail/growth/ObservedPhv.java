package org.shapetrail.growth;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * Peak height velocity observed in a person's own series: Preece-Baines model 1 fitted to stature
 * against age by Levenberg-Marquardt (Commons Math), when the visits are enough to carry five parameters
 * and span the spurt. Reports the age at peak, the peak velocity, the residual error and the standard
 * error of the age at peak (from the fit's covariance), or why there is no answer.
 */
public final class ObservedPhv {
    /** Fewest visits accepted for a five-parameter fit. */
    public static final int MIN_VISITS = 8;
    /** Shortest span of ages accepted, years. */
    public static final double MIN_SPAN_YEARS = 2.0;
    /** A peak closer than this to the first or last visit is not reported: the curve is not held there, years. */
    public static final double EDGE_YEARS = 0.5;
    /** Largest standard error of the age at peak for which a peak is reported, years. */
    public static final double MAX_SE_YEARS = 0.5;
    /** The peak must stand this far above the velocity at one end of the series at least, cm/year. */
    public static final double MIN_RISE_CM_PER_YEAR = 1.0;

    private ObservedPhv() {
    }

    /** One measured stature. */
    public record Point(double ageYears, double statureCm) {
    }

    /** Why there is, or is not, an observed peak. */
    public enum Status {
        FOUND,
        NOT_ENOUGH_VISITS,
        PEAK_OUTSIDE_VISITS,
        /** A curve fits, but the visits do not pin a spurt down (no clear rise and fall, or a wide error). */
        UNCERTAIN,
        NO_FIT
    }

    /**
     * The result.
     *
     * @param ageAtPeak years (NaN unless FOUND)
     * @param peakVelocity cm/year (NaN unless FOUND)
     * @param seAgeAtPeak standard error of the age at peak from the fit, years
     * @param rmseCm root mean square residual of the fit, cm
     * @param visits number of statures used
     * @param curve the fitted curve (null unless FOUND or PEAK_OUTSIDE_VISITS)
     */
    public record Result(Status status, double ageAtPeak, double peakVelocity, double seAgeAtPeak, double rmseCm,
                         int visits, PreeceBaines curve) {
        /** Plain words, e.g. "peak 8.1 cm/year at 13.6 years (± 0.2; fit error 0.3 cm, 11 visits)". */
        public String describe() {
            Locale l = org.shapetrail.i18n.Messages.current();
            return switch (status) {
                case FOUND -> org.shapetrail.i18n.Messages.tr("phv.found", String.format(l, "%.1f", peakVelocity),
                        String.format(l, "%.1f", ageAtPeak), String.format(l, "%.1f", seAgeAtPeak),
                        String.format(l, "%.1f", rmseCm), visits);
                case NOT_ENOUGH_VISITS -> org.shapetrail.i18n.Messages.tr("phv.fewVisits", visits, MIN_VISITS,
                        (int) MIN_SPAN_YEARS);
                case PEAK_OUTSIDE_VISITS -> org.shapetrail.i18n.Messages.tr("phv.outside");
                case UNCERTAIN -> org.shapetrail.i18n.Messages.tr("phv.uncertain");
                case NO_FIT -> org.shapetrail.i18n.Messages.tr("phv.noFit");
            };
        }
    }

    /** Fits the series (any order). */
    public static Result fit(List<Point> points) {
        List<Point> p = new ArrayList<>(points);
        p.sort(Comparator.comparingDouble(Point::ageYears));
        int n = p.size();
        if (n < MIN_VISITS || p.get(n - 1).ageYears() - p.get(0).ageYears() < MIN_SPAN_YEARS) {
            return new Result(Status.NOT_ENOUGH_VISITS, Double.NaN, Double.NaN, Double.NaN, Double.NaN, n, null);
        }
        double[] t = new double[n];
        double[] h = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = p.get(i).ageYears();
            h[i] = p.get(i).statureCm();
        }
        double[] start = startingValues(t, h);
        MultivariateJacobianFunction model = params -> value(params, t);
        try {
            LeastSquaresOptimizer.Optimum opt = new LevenbergMarquardtOptimizer().optimize(new LeastSquaresBuilder()
                    .start(start).model(model).target(h).maxEvaluations(5000).maxIterations(5000)
                    .parameterValidator(ObservedPhv::valid).build());
            double[] q = opt.getPoint().toArray();
            PreeceBaines curve = new PreeceBaines(q[0], q[1], q[2], q[3], q[4]);
            double rms = opt.getRMS();
            double age = curve.ageAtPeakVelocity();
            double velocity = curve.velocityCmPerYear(age);
            double se = seOfAgeAtPeak(opt, q, n);
            if (age < t[0] + EDGE_YEARS || age > t[n - 1] - EDGE_YEARS) {
                return new Result(Status.PEAK_OUTSIDE_VISITS, Double.NaN, Double.NaN, Double.NaN, rms, n, curve);
            }
            double rise = velocity - Math.min(curve.velocityCmPerYear(t[0]), curve.velocityCmPerYear(t[n - 1]));
            if (!(se <= MAX_SE_YEARS) || rise < MIN_RISE_CM_PER_YEAR) {
                return new Result(Status.UNCERTAIN, Double.NaN, Double.NaN, se, rms, n, curve);
            }
            return new Result(Status.FOUND, age, velocity, se, rms, n, curve);
        } catch (TooManyEvaluationsException | TooManyIterationsException | ConvergenceException
                 | IllegalArgumentException e) {
            return new Result(Status.NO_FIT, Double.NaN, Double.NaN, Double.NaN, Double.NaN, n, null);
        }
    }

    private static RealVector valid(RealVector v) {
        double[] q = v.toArray();
        q[2] = Math.max(0.01, q[2]);
        q[3] = Math.max(q[2] + 0.05, q[3]);
        q[1] = Math.min(q[1], q[0] - 0.5);
        return new ArrayRealVector(q);
    }

    /** h1 above the tallest visit, θ at the largest observed velocity, s0 0.1, s1 1.2 (typical values). */
    static double[] startingValues(double[] t, double[] h) {
        int n = t.length;
        int best = 1;
        double bestV = -1;
        for (int i = 1; i < n; i++) {
            double v = (h[i] - h[i - 1]) / Math.max(1e-6, t[i] - t[i - 1]);
            if (v > bestV) {
                bestV = v;
                best = i;
            }
        }
        double theta = (t[best] + t[best - 1]) / 2;
        double hTheta = (h[best] + h[best - 1]) / 2;
        double h1 = Math.max(h[n - 1] + 2, hTheta + 8);
        return new double[] {h1, hTheta, 0.1, 1.2, theta};
    }

    private static Pair<RealVector, RealMatrix> value(RealVector params, double[] t) {
        double h1 = params.getEntry(0);
        double ht = params.getEntry(1);
        double s0 = params.getEntry(2);
        double s1 = params.getEntry(3);
        double th = params.getEntry(4);
        double[] f = new double[t.length];
        double[][] j = new double[t.length][5];
        for (int i = 0; i < t.length; i++) {
            double d = t[i] - th;
            double e0 = Math.exp(s0 * d);
            double e1 = Math.exp(s1 * d);
            double den = e0 + e1;
            double k = 2 * (h1 - ht);
            f[i] = h1 - k / den;
            j[i][0] = 1 - 2 / den;
            j[i][1] = 2 / den;
            j[i][2] = k * d * e0 / (den * den);
            j[i][3] = k * d * e1 / (den * den);
            j[i][4] = -k * (s0 * e0 + s1 * e1) / (den * den);
        }
        return new Pair<>(new ArrayRealVector(f), new Array2DRowRealMatrix(j));
    }

    private static double seOfAgeAtPeak(LeastSquaresOptimizer.Optimum opt, double[] q, int n) {
        try {
            double sigma2 = opt.getCost() * opt.getCost() / Math.max(1, n - 5);
            RealMatrix cov = opt.getCovariances(1e-14).scalarMultiply(sigma2);
            double[] g = new double[5];
            double base = new PreeceBaines(q[0], q[1], q[2], q[3], q[4]).ageAtPeakVelocity();
            for (int i = 0; i < 5; i++) {
                double[] r = q.clone();
                double step = 1e-5 * Math.max(1, Math.abs(q[i]));
                r[i] += step;
                g[i] = (new PreeceBaines(r[0], r[1], r[2], r[3], r[4]).ageAtPeakVelocity() - base) / step;
            }
            double v = 0;
            for (int a = 0; a < 5; a++) {
                for (int b = 0; b < 5; b++) {
                    v += g[a] * cov.getEntry(a, b) * g[b];
                }
            }
            return Math.sqrt(Math.max(0, v));
        } catch (IllegalArgumentException e) { // includes SingularMatrixException
            return Double.NaN;
        }
    }
}
