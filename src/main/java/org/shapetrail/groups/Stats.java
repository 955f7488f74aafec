package org.shapetrail.groups;

/** Means and covariances of rows of numbers (sample covariance, divisor n − 1). */
final class Stats {
    private Stats() {
    }

    static double[] mean(double[][] x) {
        int p = x[0].length;
        double[] m = new double[p];
        for (double[] row : x) {
            for (int j = 0; j < p; j++) {
                m[j] += row[j];
            }
        }
        for (int j = 0; j < p; j++) {
            m[j] /= x.length;
        }
        return m;
    }

    static double[][] covariance(double[][] x) {
        int p = x[0].length;
        double[] m = mean(x);
        double[][] s = new double[p][p];
        for (double[] row : x) {
            for (int i = 0; i < p; i++) {
                for (int j = 0; j < p; j++) {
                    s[i][j] += (row[i] - m[i]) * (row[j] - m[j]);
                }
            }
        }
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                s[i][j] /= x.length - 1;
            }
        }
        return s;
    }

    static double[] column(double[][] x, int j) {
        double[] c = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            c[i] = x[i][j];
        }
        return c;
    }
}
