package org.shapetrail.history;

import java.util.Optional;
import org.shapetrail.growth.MaturityEstimate;
import org.shapetrail.growth.ObservedPhv;
import org.shapetrail.growth.Velocity;

/**
 * A junior's growth at their latest visit.
 *
 * @param latestVelocity stature velocity from the latest visit back to the most recent one at least
 *     three months earlier (null with fewer than two such visits)
 * @param maturity maturity offset at the latest visit (null for adults or without the needed sites)
 * @param phvFit the person's own peak, or why there is none, fitted when first asked for ({@link #observedPhv()})
 * @param alertVelocity stature velocity from the latest visit back to the most recent one at least six
 *     months earlier ({@link Velocity#ALERT_MIN_DAYS}), the one the alert reads; null without such a visit
 * @param midParentTargetCm mid-parent target height, or null without both parents' statures
 * @param rapidGrowth true when the alert velocity is above the alert threshold
 * @param predictedAdultCm predicted adult stature entered by the user, or null
 * @param percentOfPredicted latest stature as percent of it, or null
 */
public record GrowthSummary(Velocity latestVelocity, Velocity alertVelocity, MaturityEstimate maturity, PhvFit phvFit,
                            Double midParentTargetCm, Double percentOfTarget, boolean rapidGrowth,
                            Double predictedAdultCm, Double percentOfPredicted,
                            java.util.Map<String, Velocity> otherVelocities) {
    /** Names of {@link #otherVelocities()}: sitting height, leg length (stature − sitting height), mass. */
    public static final java.util.List<String> OTHER = java.util.List.of("sitting height", "leg length", "body mass");

    public GrowthSummary {
        otherVelocities = java.util.Map.copyOf(otherVelocities);
    }

    /**
     * The Preece-Baines fit of a person's statures, made when first asked for: it is the slowest part of
     * a history, and lists of people (and the start of the app) do not need it.
     */
    public static final class PhvFit {
        private final java.util.List<ObservedPhv.Point> points;
        private ObservedPhv.Result result;

        public PhvFit(java.util.List<ObservedPhv.Point> points) {
            this.points = java.util.List.copyOf(points);
        }

        public synchronized ObservedPhv.Result get() {
            if (result == null) {
                result = ObservedPhv.fit(points);
            }
            return result;
        }
    }

    /** The person's own peak, or why there is none. */
    public ObservedPhv.Result observedPhv() {
        return phvFit.get();
    }

    /** The bio-banding band of the percent of predicted adult stature, or null. */
    public org.shapetrail.growth.TargetHeight.Band band() {
        return percentOfPredicted == null ? null : org.shapetrail.growth.TargetHeight.Band.of(percentOfPredicted);
    }

    public Optional<Velocity> velocity() {
        return Optional.ofNullable(latestVelocity);
    }

    /** The velocity over at least six months, when the latest one is over less and the longer one exists. */
    public Optional<Velocity> longerVelocity() {
        return latestVelocity != null && latestVelocity.shortInterval() ? Optional.ofNullable(alertVelocity)
                : Optional.empty();
    }

    /** Years by which an observed spurt and an estimated age at PHV may differ before that is explained. */
    public static final double SPURT_DISAGREEMENT_YEARS = 1.0;

    /**
     * One sentence when the spurt seen in the person's own statures and the age at PHV estimated from body
     * proportions differ by more than a year: why they can, and which to trust.
     */
    public Optional<String> spurtDisagreement() {
        if (maturity == null) {
            return Optional.empty();
        }
        ObservedPhv.Result seen = observedPhv();
        if (seen.status() != ObservedPhv.Status.FOUND
                || Math.abs(seen.ageAtPeak() - maturity.ageAtPhv()) <= SPURT_DISAGREEMENT_YEARS) {
            return Optional.empty();
        }
        java.util.Locale l = org.shapetrail.i18n.Messages.current();
        return Optional.of(org.shapetrail.i18n.Messages.tr("phv.disagree", String.format(l, "%.1f", seen.ageAtPeak()),
                String.format(l, "%.1f", maturity.ageAtPhv()),
                String.format(l, "%.1f", Math.abs(seen.ageAtPeak() - maturity.ageAtPhv()))));
    }

    public Optional<MaturityEstimate> maturityEstimate() {
        return Optional.ofNullable(maturity);
    }
}
