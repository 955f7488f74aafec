package org.shapetrail.growth;

import org.shapetrail.measure.Sex;

/**
 * Early, on-time or late maturer: estimated age at PHV against the source population's mean ± 1 year
 * (common practice). Means of the Mirwald et al. 2002 reference sample: boys about 13.8, girls about
 * 11.8 years (from memory).
 */
public enum MaturityTiming {
    EARLY("early"),
    ON_TIME("on time"),
    LATE("late");

    public static final double MEAN_AGE_AT_PHV_BOYS = 13.8;
    public static final double MEAN_AGE_AT_PHV_GIRLS = 11.8;

    private final String words;

    MaturityTiming(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }

    public static double populationMean(Sex sex) {
        return sex == Sex.MALE ? MEAN_AGE_AT_PHV_BOYS : MEAN_AGE_AT_PHV_GIRLS;
    }

    public static MaturityTiming of(Sex sex, double ageAtPhv) {
        double mean = populationMean(sex);
        if (ageAtPhv < mean - 1) {
            return EARLY;
        }
        if (ageAtPhv > mean + 1) {
            return LATE;
        }
        return ON_TIME;
    }
}
