package org.shapetrail.noise;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.special.Erf;
import org.shapetrail.somatotype.Distances;
import org.shapetrail.somatotype.Rating;

/**
 * Judges the change between two ratings against the measurement noise of both (DESIGN.md §3): under no
 * true change Δ ~ N(0, Σa + Σb), so D² = Δᵀ(Σa + Σb)⁻¹Δ ~ χ²(3).
 *
 * <p>The SAD noise threshold is the 95th percentile of |Δ| under that normal law: |Δ|² is a weighted sum
 * of χ²(1) variables, approximated by Satterthwaite's scaled χ² (Box 1954) with scale trace(S²)/trace(S)
 * and trace(S)²/trace(S²) degrees of freedom; its quantiles come from a table built once with Commons Math.
 */
public final class ChangeAssessment {
    private static final double[] CHI2_95_BY_DOF;
    private static final double DOF_STEP = 0.01;

    static {
        // degrees of freedom of the Satterthwaite approximation lie in [1, 3] for a 3×3 covariance
        int n = (int) Math.round(2 / DOF_STEP) + 1;
        CHI2_95_BY_DOF = new double[n];
        for (int i = 0; i < n; i++) {
            CHI2_95_BY_DOF[i] = new ChiSquaredDistribution(1 + i * DOF_STEP).inverseCumulativeProbability(0.95);
        }
    }

    private ChangeAssessment() {
    }

    /** Assesses the change from {@code a} to {@code b}. */
    public static ChangeVerdict assess(Rating a, ComponentCovariance covA, Rating b, ComponentCovariance covB,
                                       String basis) {
        double[] d = {b.endomorphy() - a.endomorphy(), b.mesomorphy() - a.mesomorphy(),
            b.ectomorphy() - a.ectomorphy()};
        double[][] s = covA.plus(covB).sigma();
        double d2 = mahalanobisSquared(d, s);
        double[] mdc = new double[3];
        for (int i = 0; i < 3; i++) {
            mdc[i] = 1.96 * Math.sqrt(s[i][i]);
        }
        return new ChangeVerdict(a, b, Distances.sad(a, b), sadQuantile95(s), d2, chiSquared3Survival(d2), d, mdc,
                basis);
    }

    /** Δᵀ S⁻¹ Δ for a symmetric 3×3 S; a singular S is regularised by 1e-9 of its trace. */
    static double mahalanobisSquared(double[] d, double[][] s) {
        double trace = s[0][0] + s[1][1] + s[2][2];
        double ridge = 1e-9 * Math.max(trace, 1e-12);
        double a = s[0][0] + ridge;
        double b = s[0][1];
        double c = s[0][2];
        double e = s[1][1] + ridge;
        double f = s[1][2];
        double i = s[2][2] + ridge;
        double ca = e * i - f * f;
        double cb = -(b * i - c * f);
        double cc = b * f - c * e;
        double det = a * ca + b * cb + c * cc;
        double ce = a * i - c * c;
        double cf = -(a * f - b * c);
        double ci = a * e - b * b;
        // adjugate / det: the inverse of a symmetric matrix
        double q = d[0] * (ca * d[0] + cb * d[1] + cc * d[2])
                + d[1] * (cb * d[0] + ce * d[1] + cf * d[2])
                + d[2] * (cc * d[0] + cf * d[1] + ci * d[2]);
        return q / det;
    }

    /** P(χ²(3) ≥ x) = erfc(√(x/2)) + √(2x/π)·e^(−x/2) (closed form for 3 degrees of freedom). */
    public static double chiSquared3Survival(double x) {
        if (x <= 0) {
            return 1;
        }
        return Erf.erfc(Math.sqrt(x / 2)) + Math.sqrt(2 * x / Math.PI) * Math.exp(-x / 2);
    }

    /** 95th percentile of |Δ| for Δ ~ N(0, S), Satterthwaite approximation. */
    static double sadQuantile95(double[][] s) {
        double tr = s[0][0] + s[1][1] + s[2][2];
        if (!(tr > 0)) {
            return 0;
        }
        double tr2 = 0;
        for (int r = 0; r < 3; r++) {
            for (int c = 0; c < 3; c++) {
                tr2 += s[r][c] * s[c][r];
            }
        }
        double scale = tr2 / tr;
        double dof = tr * tr / tr2;
        double pos = (Math.min(3, Math.max(1, dof)) - 1) / DOF_STEP;
        int lo = (int) Math.floor(pos);
        int hi = Math.min(lo + 1, CHI2_95_BY_DOF.length - 1);
        double w = pos - lo;
        double q = CHI2_95_BY_DOF[lo] * (1 - w) + CHI2_95_BY_DOF[hi] * w;
        return Math.sqrt(scale * q);
    }
}
