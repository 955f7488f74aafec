package org.shapetrail.somatotype;

import java.util.Objects;

/**
 * A computed Heath-Carter somatotype with the intermediate values a practitioner checks by hand.
 *
 * @param rating the three components after the 0.1 floor
 * @param hwr height-weight ratio, stature / ∛mass (cm/kg^⅓)
 * @param skinfoldSumMm triceps + subscapular + supraspinale, mm
 * @param endomorphyX the endomorphy polynomial's argument (height-corrected or not)
 * @param variant the endomorphy variant used
 */
public record Somatotype(Rating rating, double hwr, double skinfoldSumMm, double endomorphyX,
                         EndomorphyVariant variant) {
    public Somatotype {
        Objects.requireNonNull(rating, "rating");
        Objects.requireNonNull(variant, "variant");
    }

    public ChartPoint chartPoint() {
        return rating.chartPoint();
    }

    public Category category() {
        return Categories.classify(rating);
    }
}
