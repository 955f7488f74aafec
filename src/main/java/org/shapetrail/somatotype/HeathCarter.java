package org.shapetrail.somatotype;

/**
 * The Heath-Carter anthropometric somatotype (Carter &amp; Heath 1990; Carter 2002 instruction manual).
 * Units: stature cm, mass kg, skinfolds mm, girths and breadths cm. Any component computed below 0.1 is
 * reported as 0.1.
 */
public final class HeathCarter {
    /** Reference stature of the height correction, cm. */
    public static final double REFERENCE_STATURE_CM = 170.18;
    /** Lowest value a component takes. */
    public static final double FLOOR = 0.1;
    /** HWR at and below which ectomorphy is 0.1. */
    public static final double HWR_LOW = 38.25;
    /** HWR from which the upper ectomorphy equation applies. */
    public static final double HWR_HIGH = 40.75;

    private HeathCarter() {
    }

    /** The full somatotype of one set of final values. */
    public static Somatotype rate(HeathCarterInput in, EndomorphyVariant variant) {
        double sum = in.tricepsMm() + in.subscapularMm() + in.supraspinaleMm();
        double x = endomorphyX(sum, in.statureCm(), variant);
        double hwr = hwr(in.statureCm(), in.massKg());
        Rating r = new Rating(floor(endomorphyRaw(x)), floor(mesomorphyRaw(in)), floor(ectomorphyRaw(hwr)));
        return new Somatotype(r, hwr, sum, x, variant);
    }

    /** The height-corrected somatotype, the usual form. */
    public static Somatotype rate(HeathCarterInput in) {
        return rate(in, EndomorphyVariant.HEIGHT_CORRECTED);
    }

    /** Argument of the endomorphy polynomial: the sum of three skinfolds, scaled to 170.18 cm if asked. */
    public static double endomorphyX(double skinfoldSumMm, double statureCm, EndomorphyVariant variant) {
        return variant == EndomorphyVariant.HEIGHT_CORRECTED
                ? skinfoldSumMm * REFERENCE_STATURE_CM / statureCm
                : skinfoldSumMm;
    }

    /** −0.7182 + 0.1451·X − 0.00068·X² + 0.0000014·X³, before the floor. */
    public static double endomorphyRaw(double x) {
        return -0.7182 + 0.1451 * x - 0.00068 * x * x + 0.0000014 * x * x * x;
    }

    /**
     * 0.858·humerus + 0.601·femur + 0.188·(arm girth − triceps/10) + 0.161·(calf girth − medial calf/10)
     * − 0.131·stature + 4.5, before the floor.
     */
    public static double mesomorphyRaw(HeathCarterInput in) {
        return 0.858 * in.humerusBreadthCm() + 0.601 * in.femurBreadthCm()
                + 0.188 * correctedArmGirthCm(in) + 0.161 * correctedCalfGirthCm(in)
                - 0.131 * in.statureCm() + 4.5;
    }

    /** Arm flexed-and-tensed girth less the triceps skinfold (mm → cm). */
    public static double correctedArmGirthCm(HeathCarterInput in) {
        return in.armFlexedGirthCm() - in.tricepsMm() / 10;
    }

    /** Calf girth less the medial calf skinfold (mm → cm). */
    public static double correctedCalfGirthCm(HeathCarterInput in) {
        return in.calfGirthCm() - in.medialCalfMm() / 10;
    }

    /** Height-weight ratio: stature / ∛mass. */
    public static double hwr(double statureCm, double massKg) {
        return statureCm / Math.cbrt(massKg);
    }

    /**
     * Ectomorphy from HWR before the floor: 0.732·HWR − 28.58 for HWR ≥ 40.75; 0.463·HWR − 17.63 for
     * 38.25 &lt; HWR &lt; 40.75; 0.1 for HWR ≤ 38.25.
     */
    public static double ectomorphyRaw(double hwr) {
        if (hwr >= HWR_HIGH) {
            return 0.732 * hwr - 28.58;
        }
        if (hwr > HWR_LOW) {
            return 0.463 * hwr - 17.63;
        }
        return FLOOR;
    }

    /** Values below 0.1 become 0.1. */
    public static double floor(double component) {
        return Math.max(FLOOR, component);
    }
}
