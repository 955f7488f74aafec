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
 * @param midParentTargetCm mid-parent target height, or null without both parents' statures
 * @param rapidGrowth true when the latest velocity is above the alert threshold
 * @param predictedAdultCm predicted adult stature entered by the user, or null
 * @param percentOfPredicted latest stature as percent of it, or null
 */
public record GrowthSummary(Velocity latestVelocity, MaturityEstimate maturity, PhvFit phvFit,
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

    public Optional<MaturityEstimate> maturityEstimate() {
        return Optional.ofNullable(maturity);
    }
}
