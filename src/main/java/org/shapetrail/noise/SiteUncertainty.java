package org.shapetrail.noise;

import java.util.EnumMap;
import java.util.Map;
import org.shapetrail.measure.RepeatOutcome;
import org.shapetrail.measure.Site;

/**
 * The standard error of each final site value of a visit: the measurer's single-trial SD reduced by the
 * number of trials the value rests on, never below half the instrument's reading step, plus any
 * biological variation.
 */
public final class SiteUncertainty {
    /**
     * Variance of the median of three independent standard normal draws: 0.4487 (order statistics; from
     * memory, checked by simulation in the tests).
     */
    public static final double MEDIAN_OF_THREE_VARIANCE = 0.4487;

    private SiteUncertainty() {
    }

    /**
     * The usual reading step of the instrument for each kind of site: skinfold calipers 0.2 mm, tape,
     * anthropometer and stadiometer 0.1 cm, scales 0.1 kg (common practice).
     */
    public static double readingStep(org.shapetrail.measure.SiteKind kind) {
        return kind == org.shapetrail.measure.SiteKind.SKINFOLD ? 0.2 : 0.1;
    }

    /** Factor on the single-trial SD for a value made by the repeat rule. */
    public static double trialFactor(RepeatOutcome.Status status) {
        return switch (status) {
            case SINGLE -> 1.0;
            case MEAN_OF_TWO -> Math.sqrt(0.5);
            case MEDIAN_OF_THREE -> Math.sqrt(MEDIAN_OF_THREE_VARIANCE);
            case THIRD_TRIAL_NEEDED -> throw new IllegalArgumentException("a site waiting for a third trial has no value");
        };
    }

    /** Standard error of every site with a value. */
    public static Map<Site, Double> of(Map<Site, RepeatOutcome> outcomes, ErrorProfile profile,
                                       BiologicalVariation biological) {
        Map<Site, Double> out = new EnumMap<>(Site.class);
        for (Map.Entry<Site, RepeatOutcome> e : outcomes.entrySet()) {
            RepeatOutcome o = e.getValue();
            if (o.value().isEmpty()) {
                continue;
            }
            double v = o.value().getAsDouble();
            double measurement = profile.at(e.getKey()).singleTrialSd(v) * trialFactor(o.status());
            // trials read from a scale share their rounding, so averaging cannot take the error of the value
            // below half a reading step (a true 6.35 cm read as 6.3, 6.4, 6.3 gives 6.3)
            measurement = Math.max(measurement, readingStep(e.getKey().kind()) / 2);
            double bio = biological.sd(e.getKey());
            out.put(e.getKey(), Math.sqrt(measurement * measurement + bio * bio));
        }
        return out;
    }
}
