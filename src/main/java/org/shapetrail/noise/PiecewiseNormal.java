package org.shapetrail.noise;

import org.apache.commons.math3.special.Erf;

/**
 * Moments of a piecewise-linear function f of a normal variable Z ~ N(μ, σ²), in closed form from the
 * truncated-normal moments. Used where the Heath-Carter equations have kinks or jumps (the 0.1 floor,
 * the HWR branches), so that error propagation stays right near them: by Stein's lemma
 * Cov(f(Z), Z) = σ²·E[f′(Z)], where E[f′] includes the jumps weighted by the density there.
 */
final class PiecewiseNormal {
    private static final double INV_SQRT_2PI = 1 / Math.sqrt(2 * Math.PI);

    /** f = a + b·z on (lower, upper]; pieces must be contiguous and in order. */
    record Piece(double lower, double upper, double a, double b) {
    }

    /** E[f], Var[f] and E[f′] (jumps included). */
    record Moments(double mean, double variance, double meanSlope) {
    }

    private PiecewiseNormal() {
    }

    static Moments of(Piece[] pieces, double mu, double sigma) {
        if (!(sigma > 1e-12)) {
            for (Piece p : pieces) {
                if (mu > p.lower() && mu <= p.upper()) {
                    return new Moments(p.a() + p.b() * mu, 0, p.b());
                }
            }
            throw new IllegalArgumentException("no piece covers " + mu);
        }
        double ef = 0;
        double ef2 = 0;
        double slope = 0;
        for (int i = 0; i < pieces.length; i++) {
            Piece p = pieces[i];
            double alpha = (p.lower() - mu) / sigma;
            double beta = (p.upper() - mu) / sigma;
            double pa = phi(alpha);
            double pb = phi(beta);
            double prob = cdf(beta) - cdf(alpha);
            double ez = mu * prob + sigma * (pa - pb);
            double ez2 = (mu * mu + sigma * sigma) * prob + 2 * mu * sigma * (pa - pb)
                    + sigma * sigma * (times(alpha, pa) - times(beta, pb));
            ef += p.a() * prob + p.b() * ez;
            ef2 += p.a() * p.a() * prob + 2 * p.a() * p.b() * ez + p.b() * p.b() * ez2;
            slope += p.b() * prob;
            if (i + 1 < pieces.length) {
                Piece q = pieces[i + 1];
                double x = p.upper();
                double jump = (q.a() + q.b() * x) - (p.a() + p.b() * x);
                slope += jump * pb / sigma;
            }
        }
        return new Moments(ef, Math.max(0, ef2 - ef * ef), slope);
    }

    private static double times(double x, double phiX) {
        return Double.isInfinite(x) ? 0 : x * phiX;
    }

    static double phi(double x) {
        return Double.isInfinite(x) ? 0 : INV_SQRT_2PI * Math.exp(-0.5 * x * x);
    }

    static double cdf(double x) {
        if (x == Double.NEGATIVE_INFINITY) {
            return 0;
        }
        if (x == Double.POSITIVE_INFINITY) {
            return 1;
        }
        return 0.5 * Erf.erfc(-x / Math.sqrt(2));
    }
}
