package org.shapetrail.growth;

import org.shapetrail.measure.Sex;

/**
 * Maturity offset equations. Units: age in decimal years, stature, sitting height and leg length in cm,
 * mass in kg; leg length = stature − sitting height; W/H = mass / stature × 100.
 */
public final class MaturityOffset {
    /** Published SEE of Mirwald et al. 2002, years. */
    public static final double MIRWALD_SEE_BOYS = 0.59;
    public static final double MIRWALD_SEE_GIRLS = 0.57;
    /** SEE taken for Moore et al. 2015: about 0.6 years as a round figure (DESIGN.md §5, from memory). */
    public static final double MOORE_SEE = 0.6;

    private MaturityOffset() {
    }

    /**
     * Mirwald et al. 2002. Boys: −9.236 + 0.0002708·LL·SH − 0.001663·age·LL + 0.007216·age·SH + 0.02292·W/H;
     * girls: −9.376 + 0.0001882·LL·SH + 0.0022·age·LL + 0.005841·age·SH − 0.002658·age·mass + 0.07693·W/H.
     */
    public static double mirwald(Sex sex, double age, double statureCm, double sittingHeightCm, double massKg) {
        double ll = statureCm - sittingHeightCm;
        double sh = sittingHeightCm;
        double wh = massKg / statureCm * 100;
        if (sex == Sex.MALE) {
            return -9.236 + 0.0002708 * ll * sh - 0.001663 * age * ll + 0.007216 * age * sh + 0.02292 * wh;
        }
        return -9.376 + 0.0001882 * ll * sh + 0.0022 * age * ll + 0.005841 * age * sh - 0.002658 * age * massKg
                + 0.07693 * wh;
    }

    /** Moore et al. 2015. Boys: −8.128741 + 0.0070346·(age × sitting height); girls: −7.709133 + 0.0042232·(age × stature). */
    public static double moore(Sex sex, double age, double statureCm, double sittingHeightCm) {
        if (sex == Sex.MALE) {
            return -8.128741 + 0.0070346 * (age * sittingHeightCm);
        }
        return -7.709133 + 0.0042232 * (age * statureCm);
    }

    /** The full estimate with status, timing and SEE. */
    public static MaturityEstimate estimate(MaturityMethod method, Sex sex, double age, double statureCm,
                                            double sittingHeightCm, double massKg) {
        double offset = method == MaturityMethod.MIRWALD_2002
                ? mirwald(sex, age, statureCm, sittingHeightCm, massKg)
                : moore(sex, age, statureCm, sittingHeightCm);
        double see = method == MaturityMethod.MOORE_2015 ? MOORE_SEE
                : sex == Sex.MALE ? MIRWALD_SEE_BOYS : MIRWALD_SEE_GIRLS;
        double aphv = age - offset;
        return new MaturityEstimate(method, offset, aphv, see, MaturityStatus.of(offset), MaturityTiming.of(sex, aphv));
    }
}
