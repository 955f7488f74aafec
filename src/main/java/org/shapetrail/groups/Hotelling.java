package org.shapetrail.groups;

import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.linear.SingularMatrixException;

/**
 * Hotelling's T² tests of mean vectors (Hotelling 1931; as in Johnson &amp; Wichern, Applied Multivariate
 * Statistical Analysis), with the exact F transformation under multivariate normality.
 */
public final class Hotelling {
    private Hotelling() {
    }

    /**
     * A T² result.
     *
     * @param t2 the statistic
     * @param f its F transformation
     * @param df1 numerator degrees of freedom (p)
     * @param df2 denominator degrees of freedom
     * @param pValue P(F(df1, df2) ≥ f)
     */
    public record Result(double t2, double f, int df1, int df2, double pValue) {
    }

    /**
     * One-sample T² = n (x̄ − μ₀)ᵀ S⁻¹ (x̄ − μ₀), with F = (n − p) / (p (n − 1)) · T² on (p, n − p).
     *
     * @param mean sample mean vector
     * @param covariance sample covariance (divisor n − 1)
     * @throws IllegalArgumentException when n ≤ p or S is singular
     */
    public static Result oneSample(double[] mean, double[][] covariance, int n, double[] mu0) {
        int p = mean.length;
        if (n <= p) {
            throw new IllegalArgumentException("a one-sample T² needs more people (" + n + ") than components (" + p + ")");
        }
        RealVector d = new ArrayRealVector(mean).subtract(new ArrayRealVector(mu0));
        double q = quadratic(d, covariance);
        double t2 = n * q;
        double f = (double) (n - p) / (p * (n - 1.0)) * t2;
        return new Result(t2, f, p, n - p, survival(f, p, n - p));
    }

    /** One-sample T² of the rows of {@code data} against μ₀. */
    public static Result oneSample(double[][] data, double[] mu0) {
        return oneSample(Stats.mean(data), Stats.covariance(data), data.length, mu0);
    }

    /**
     * Two-sample T² with the pooled covariance: T² = n₁n₂/(n₁+n₂) · (x̄₁ − x̄₂)ᵀ S_p⁻¹ (x̄₁ − x̄₂), with
     * F = (n₁ + n₂ − p − 1) / (p (n₁ + n₂ − 2)) · T² on (p, n₁ + n₂ − p − 1).
     */
    public static Result twoSample(double[][] a, double[][] b) {
        int p = a[0].length;
        int n1 = a.length;
        int n2 = b.length;
        if (n1 + n2 - p - 1 < 1) {
            throw new IllegalArgumentException("a two-sample T² needs at least " + (p + 2) + " people in all");
        }
        double[][] s1 = Stats.covariance(a);
        double[][] s2 = Stats.covariance(b);
        double[][] sp = new double[p][p];
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                sp[i][j] = ((n1 - 1) * s1[i][j] + (n2 - 1) * s2[i][j]) / (n1 + n2 - 2);
            }
        }
        RealVector d = new ArrayRealVector(Stats.mean(a)).subtract(new ArrayRealVector(Stats.mean(b)));
        double t2 = (double) n1 * n2 / (n1 + n2) * quadratic(d, sp);
        int df2 = n1 + n2 - p - 1;
        double f = (double) df2 / (p * (n1 + n2 - 2.0)) * t2;
        return new Result(t2, f, p, df2, survival(f, p, df2));
    }

    private static double quadratic(RealVector d, double[][] s) {
        RealMatrix m = new Array2DRowRealMatrix(s);
        try {
            RealMatrix inv = new LUDecomposition(m).getSolver().getInverse();
            return d.dotProduct(inv.operate(d));
        } catch (SingularMatrixException e) {
            throw new IllegalArgumentException("the components' covariance is singular (all changes alike, or too few"
                    + " people); a multivariate test cannot be made", e);
        }
    }

    private static double survival(double f, int df1, int df2) {
        return 1 - new FDistribution(df1, df2).cumulativeProbability(f);
    }
}
