package org.shapetrail.measure;

import java.util.Arrays;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The ISAK repeat rule (ISAK international standards; common practice): two trials per site; a third
 * when the first two differ by more than 5 % (skinfolds) or 1 % (all other measures); the site's value is
 * the mean of two or the median of three.
 *
 * <p>The difference is taken relative to the mean of the two trials, so that the answer does not depend
 * on which trial came first; a difference of exactly the tolerance does not call for a third trial.
 */
public final class RepeatRule {
    /** Absorbs binary rounding so that a difference of exactly 5 % (or 1 %) counts as within tolerance. */
    private static final double EPSILON = 1e-9;

    private RepeatRule() {
    }

    /** The difference between two trials relative to their mean, in percent; NaN if the mean is not positive. */
    public static double differencePercent(double first, double second) {
        double mean = (first + second) / 2;
        if (!(mean > 0)) {
            return Double.NaN;
        }
        return Math.abs(first - second) / mean * 100;
    }

    /** True when the first two trials of this site differ by more than the site's tolerance. */
    public static boolean thirdTrialNeeded(Site site, double first, double second) {
        double mean = (first + second) / 2;
        double allowed = site.kind().repeatTolerancePercent() / 100 * mean;
        return Math.abs(first - second) > allowed + EPSILON * Math.max(1, Math.abs(mean));
    }

    /** Applies the rule to one site's trials (which {@link MeasurementCheck} should have passed). */
    public static RepeatOutcome apply(SiteTrials trials) {
        List<Double> v = trials.values();
        Site site = trials.site();
        if (v.size() == 1) {
            return new RepeatOutcome(site, RepeatOutcome.Status.SINGLE, OptionalDouble.of(v.get(0)), Double.NaN);
        }
        double a = v.get(0);
        double b = v.get(1);
        double diff = differencePercent(a, b);
        if (v.size() == 3) {
            double[] sorted = {a, b, v.get(2)};
            Arrays.sort(sorted);
            return new RepeatOutcome(site, RepeatOutcome.Status.MEDIAN_OF_THREE, OptionalDouble.of(sorted[1]), diff);
        }
        if (thirdTrialNeeded(site, a, b)) {
            return new RepeatOutcome(site, RepeatOutcome.Status.THIRD_TRIAL_NEEDED, OptionalDouble.empty(), diff);
        }
        return new RepeatOutcome(site, RepeatOutcome.Status.MEAN_OF_TWO, OptionalDouble.of((a + b) / 2), diff);
    }
}
