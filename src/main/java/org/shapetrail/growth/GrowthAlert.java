package org.shapetrail.growth;

/**
 * The rapid-growth alert: stature velocity above a threshold (default 7 cm per year; common practice)
 * marks a junior whose load the physio may want to review.
 */
public record GrowthAlert(double thresholdCmPerYear) {
    public static final double DEFAULT_CM_PER_YEAR = 7.0;
    /** Shown wherever the alert appears. */
    public static String caution() {
        return org.shapetrail.i18n.Messages.tr("growth.alert.caution");
    }

    public GrowthAlert {
        if (!(thresholdCmPerYear > 0) || thresholdCmPerYear > 30) {
            throw new IllegalArgumentException("the rapid-growth threshold must be between 0 and 30 cm per year");
        }
    }

    public static GrowthAlert standard() {
        return new GrowthAlert(DEFAULT_CM_PER_YEAR);
    }

    /**
     * True when this velocity is above the threshold and rests on at least {@link Velocity#ALERT_MIN_DAYS}
     * days: a velocity from a shorter interval never raises the alert alone.
     */
    public boolean raisedBy(Velocity statureVelocity) {
        return !statureVelocity.shortInterval() && statureVelocity.perYear() > thresholdCmPerYear;
    }
}
