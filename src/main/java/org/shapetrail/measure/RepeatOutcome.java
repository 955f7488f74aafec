package org.shapetrail.measure;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * What the ISAK repeat rule makes of one site's trials.
 *
 * @param site the site
 * @param status whether a value exists and how it was obtained
 * @param value the site's value (mean of two, median of three, or the single value), empty when a third
 *     trial is needed
 * @param differencePercent the difference between the first two trials relative to their mean, in percent
 *     (NaN with a single trial)
 */
public record RepeatOutcome(Site site, Status status, OptionalDouble value, double differencePercent) {
    /** How a site's value was obtained. */
    public enum Status {
        /** One value only (a final value imported or typed without repeats). */
        SINGLE,
        /** Two trials within tolerance: their mean. */
        MEAN_OF_TWO,
        /** Two trials beyond tolerance: no value until a third trial is taken. */
        THIRD_TRIAL_NEEDED,
        /** Three trials: their median. */
        MEDIAN_OF_THREE
    }

    public RepeatOutcome {
        Objects.requireNonNull(site, "site");
        Objects.requireNonNull(status, "status");
        Objects.requireNonNull(value, "value");
        if ((status == Status.THIRD_TRIAL_NEEDED) == value.isPresent()) {
            throw new IllegalArgumentException("a value exists exactly when no third trial is needed");
        }
    }
}
