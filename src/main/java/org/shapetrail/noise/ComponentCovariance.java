package org.shapetrail.noise;

import java.util.Arrays;

/**
 * The 3×3 covariance of (endomorphy, mesomorphy, ectomorphy) of one rating that comes from measurement
 * error, in squared somatotype units; and its 2×2 chart covariance A·Σ·Aᵀ with
 * A = [[−1, 0, 1], [−1, 2, −1]] (X = ecto − endo, Y = 2·meso − endo − ecto).
 */
public record ComponentCovariance(double[][] sigma) {
    public ComponentCovariance {
        if (sigma.length != 3) {
            throw new IllegalArgumentException("a component covariance is 3×3");
        }
        double[][] copy = new double[3][];
        for (int i = 0; i < 3; i++) {
            if (sigma[i].length != 3) {
                throw new IllegalArgumentException("a component covariance is 3×3");
            }
            copy[i] = sigma[i].clone();
            for (double v : copy[i]) {
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException("covariance entries must be finite");
                }
            }
        }
        sigma = copy;
    }

    public static final ComponentCovariance ZERO = new ComponentCovariance(new double[3][3]);

    public double get(int i, int j) {
        return sigma[i][j];
    }

    /** Standard deviation of component {@code i} (0 endo, 1 meso, 2 ecto). */
    public double sd(int i) {
        return Math.sqrt(sigma[i][i]);
    }

    public ComponentCovariance plus(ComponentCovariance o) {
        double[][] s = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                s[i][j] = sigma[i][j] + o.sigma[i][j];
            }
        }
        return new ComponentCovariance(s);
    }

    /** The chart covariance [[var X, cov XY], [cov XY, var Y]]. */
    public double[][] chartCovariance() {
        double[][] a = {{-1, 0, 1}, {-1, 2, -1}};
        double[][] out = new double[2][2];
        for (int r = 0; r < 2; r++) {
            for (int c = 0; c < 2; c++) {
                double s = 0;
                for (int i = 0; i < 3; i++) {
                    for (int j = 0; j < 3; j++) {
                        s += a[r][i] * sigma[i][j] * a[c][j];
                    }
                }
                out[r][c] = s;
            }
        }
        return out;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ComponentCovariance c && Arrays.deepEquals(sigma, c.sigma);
    }

    @Override
    public int hashCode() {
        return Arrays.deepHashCode(sigma);
    }

    @Override
    public String toString() {
        return Arrays.deepToString(sigma);
    }
}
