package org.shapetrail.noise;

import org.apache.commons.math3.random.RandomGenerator;
import org.shapetrail.somatotype.EndomorphyVariant;
import org.shapetrail.somatotype.HeathCarter;
import org.shapetrail.somatotype.HeathCarterInput;
import org.shapetrail.somatotype.Rating;

/**
 * The Monte Carlo path of error propagation, used to validate {@link ErrorPropagation}: draws each site
 * from N(value, SE²), rates every draw with the full Heath-Carter equations (floors and branches
 * included), and returns the sample covariance of the components.
 */
public final class MonteCarloPropagation {
    private MonteCarloPropagation() {
    }

    /** Sample covariance from {@code draws} draws; SEs in the order of {@link HeathCarterInput#SITES}. */
    public static ComponentCovariance covariance(HeathCarterInput in, double[] se, EndomorphyVariant variant,
                                                 int draws, RandomGenerator rng) {
        double[] sum = new double[3];
        double[][] cross = new double[3][3];
        for (int k = 0; k < draws; k++) {
            double[] r = components(HeathCarter.rate(perturb(in, se, rng), variant).rating());
            for (int i = 0; i < 3; i++) {
                sum[i] += r[i];
                for (int j = 0; j < 3; j++) {
                    cross[i][j] += r[i] * r[j];
                }
            }
        }
        double[][] cov = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                cov[i][j] = (cross[i][j] - sum[i] * sum[j] / draws) / (draws - 1);
            }
        }
        return new ComponentCovariance(cov);
    }

    /** One draw of the inputs; values are kept positive. */
    public static HeathCarterInput perturb(HeathCarterInput in, double[] se, RandomGenerator rng) {
        double[] v = new double[10];
        for (int i = 0; i < 10; i++) {
            v[i] = Math.max(1e-6, in.get(HeathCarterInput.SITES.get(i)) + se[i] * rng.nextGaussian());
        }
        return new HeathCarterInput(v[0], v[1], v[2], v[3], v[4], v[5], v[6], v[7], v[8], v[9]);
    }

    static double[] components(Rating r) {
        return new double[] {r.endomorphy(), r.mesomorphy(), r.ectomorphy()};
    }
}
