package org.shapetrail.noise;

import java.util.Objects;
import org.shapetrail.somatotype.Rating;

/**
 * A change between two ratings of one person, judged against measurement noise.
 *
 * @param from the earlier rating
 * @param to the later rating
 * @param sad somatotype attitudinal distance between them
 * @param sadNoise95 the SAD that measurement noise alone exceeds only 5 % of the time
 * @param d2 Mahalanobis distance² of the change against the combined covariance
 * @param pValue P(χ²(3) ≥ d2)
 * @param change later − earlier, per component (endo, meso, ecto)
 * @param mdc95 per-component minimal detectable change at 95 %: 1.96·√(var₁ + var₂) (Weir 2005 form,
 *     1.96·√2·SEM, when both visits have the same SEM)
 * @param verdict beyond noise / borderline / within noise
 * @param basis whose repeatability was used, in words
 */
public record ChangeVerdict(Rating from, Rating to, double sad, double sadNoise95, double d2, double pValue,
                            double[] change, double[] mdc95, Verdict verdict, String basis) {
    public ChangeVerdict {
        Objects.requireNonNull(verdict, "verdict");
        change = change.clone();
        mdc95 = mdc95.clone();
    }

    /** E.g. "beyond noise (SAD 1.10; noise alone exceeds 0.62 in 5 % of pairs)". */
    public String summary() {
        return String.format(java.util.Locale.ROOT, "%s (SAD %.2f; noise alone exceeds %.2f in 5 %% of pairs)",
                verdict.words(), sad, sadNoise95);
    }
}
