package org.shapetrail.growth;

/**
 * Annualised velocity between two visits, with its uncertainty from the measurement error of both
 * values: SE = √(se₁² + se₂²) / Δt.
 *
 * @param perYear (value₂ − value₁) / Δt, unit per year
 * @param sePerYear standard error of the velocity, unit per year
 * @param intervalYears Δt in years
 * @param tooShortToRead true when the interval is under {@link #MIN_READABLE_DAYS} days: measurement
 *     error then dominates an annualised figure
 */
public record Velocity(double perYear, double sePerYear, double intervalYears, boolean tooShortToRead) {
    /** Intervals shorter than this (about three months; common practice) are flagged. */
    public static final int MIN_READABLE_DAYS = 90;
    /**
     * Intervals from which a velocity may raise the rapid-growth alert: about six months. Growth velocity is
     * usually annualised over six months or more (common practice in growth monitoring, from memory: the
     * growth standards are built on yearly increments), because over a shorter interval the two
     * measurements' errors are multiplied by a large annualising factor and seasonal variation in growth
     * rate weighs more.
     */
    public static final int ALERT_MIN_DAYS = 182;

    /** True when the interval is under {@link #ALERT_MIN_DAYS}: the velocity's error is wide. */
    public boolean shortInterval() {
        return intervalYears * 365.25 < ALERT_MIN_DAYS - 0.5;
    }

    /**
     * The velocity between two values.
     *
     * @param days days between the visits
     * @throws IllegalArgumentException for an interval of zero or fewer days
     */
    public static Velocity between(double fromValue, double seFrom, double toValue, double seTo, long days) {
        if (days <= 0) {
            throw new IllegalArgumentException("The two visits are on the same day (or out of order); a velocity"
                    + " needs time between them.");
        }
        double dt = days / 365.25;
        return new Velocity((toValue - fromValue) / dt, Math.sqrt(seFrom * seFrom + seTo * seTo) / dt, dt,
                days < MIN_READABLE_DAYS);
    }
}
