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
