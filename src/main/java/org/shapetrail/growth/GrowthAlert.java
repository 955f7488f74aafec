package org.shapetrail.growth;

/**
 * The rapid-growth alert: stature velocity above a threshold (default 7 cm per year; common practice)
 * marks a junior whose load the physio may want to review.
 */
public record GrowthAlert(double thresholdCmPerYear) {
    public static final double DEFAULT_CM_PER_YEAR = 7.0;
    /** Shown wherever the alert appears. */
    public static final String CAUTION = "Rapid growth is a prompt to look, not a diagnosis: defer to the physio's"
            + " clinical judgement on load and growth-related pain.";

    public GrowthAlert {
        if (!(thresholdCmPerYear > 0) || thresholdCmPerYear > 30) {
            throw new IllegalArgumentException("the rapid-growth threshold must be between 0 and 30 cm per year");
        }
    }

    public static GrowthAlert standard() {
        return new GrowthAlert(DEFAULT_CM_PER_YEAR);
    }

    /** True when this velocity (readable, i.e. over a long enough interval) is above the threshold. */
    public boolean raisedBy(Velocity statureVelocity) {
        return !statureVelocity.tooShortToRead() && statureVelocity.perYear() > thresholdCmPerYear;
    }
}
