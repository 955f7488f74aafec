package org.shapetrail.growth;

/**
 * Preece-Baines model 1 of stature growth (Preece &amp; Baines 1978, Ann Hum Biol 5:1):
 * h(t) = h1 − 2(h1 − hθ) / (exp(s0(t − θ)) + exp(s1(t − θ))).
 *
 * @param adultStatureCm h1, the final (adult) stature, cm
 * @param statureAtThetaCm hθ, the stature at age θ, cm
 * @param s0 rate constant before the spurt, 1/year
 * @param s1 rate constant of the spurt, 1/year (larger than s0)
 * @param thetaYears θ, the age parameter, years (close to, but not equal to, age at peak velocity)
 */
public record PreeceBaines(double adultStatureCm, double statureAtThetaCm, double s0, double s1, double thetaYears) {
    public PreeceBaines {
        if (!(adultStatureCm > statureAtThetaCm) || !(statureAtThetaCm > 0) || !(s0 > 0) || !(s1 > s0)
                || !Double.isFinite(thetaYears)) {
            throw new IllegalArgumentException("Preece-Baines parameters need h1 > hθ > 0 and s1 > s0 > 0");
        }
    }

    /** Stature at age {@code t} years, cm. */
    public double statureCm(double t) {
        double d = t - thetaYears;
        return adultStatureCm - 2 * (adultStatureCm - statureAtThetaCm) / (Math.exp(s0 * d) + Math.exp(s1 * d));
    }

    /** Velocity dh/dt at age {@code t}, cm/year (analytic derivative). */
    public double velocityCmPerYear(double t) {
        double d = t - thetaYears;
        double e0 = Math.exp(s0 * d);
        double e1 = Math.exp(s1 * d);
        double denom = e0 + e1;
        return 2 * (adultStatureCm - statureAtThetaCm) * (s0 * e0 + s1 * e1) / (denom * denom);
    }

    /**
     * Age of peak velocity in the spurt, years, found numerically (golden-section search on the velocity
     * between θ − 3 and θ + 3 years, to 1e-7 years).
     */
    public double ageAtPeakVelocity() {
        double a = thetaYears - 3;
        double b = thetaYears + 3;
        double g = (Math.sqrt(5) - 1) / 2;
        double c = b - g * (b - a);
        double d = a + g * (b - a);
        while (b - a > 1e-7) {
            if (velocityCmPerYear(c) > velocityCmPerYear(d)) {
                b = d;
            } else {
                a = c;
            }
            c = b - g * (b - a);
            d = a + g * (b - a);
        }
        return (a + b) / 2;
    }
}
