package org.shapetrail.noise;

import java.util.Locale;
import java.util.Objects;
import org.shapetrail.somatotype.Rating;

/**
 * A change between two ratings of one person, judged against measurement noise.
 *
 * <p>The headline figure is the {@linkplain #noiseMultiple() noise multiple}: the change as a multiple of
 * the noise limit in its own direction, 1.00 being the limit. The verdict is a plain reading of it, as
 * printed ({@link Verdict}). SAD is the distance moved, in somatotype units; its own 95 % noise level
 * ({@code sadNoise95}) ignores the direction of the change, so it is never printed beside the verdict as if
 * it were the verdict's threshold.
 *
 * @param from the earlier rating
 * @param to the later rating
 * @param sad somatotype attitudinal distance between them
 * @param sadNoise95 the SAD that measurement noise alone exceeds in 5 % of pairs, whatever the direction
 * @param d2 Mahalanobis distance² of the change against the combined covariance
 * @param pValue P(χ²(3) ≥ d2)
 * @param change later − earlier, per component (endo, meso, ecto)
 * @param mdc95 per-component minimal detectable change at 95 %: 1.96·√(var₁ + var₂) (Weir 2005 form,
 *     1.96·√2·SEM, when both visits have the same SEM)
 * @param basis whose repeatability was used, in words
 */
public record ChangeVerdict(Rating from, Rating to, double sad, double sadNoise95, double d2, double pValue,
                            double[] change, double[] mdc95, String basis) {
    public ChangeVerdict {
        Objects.requireNonNull(basis, "basis");
        change = change.clone();
        mdc95 = mdc95.clone();
    }

    /** Beyond noise / borderline / within noise: the reading of the shown noise multiple. */
    public Verdict verdict() {
        return Verdict.of(d2);
    }

    /** √(D² / χ²₀.₉₅(3)): how many times the noise limit in its direction the change is (1.00 = the limit). */
    public double noiseMultiple() {
        return Verdict.multiple(d2);
    }

    /** The noise multiple as every report prints it: floored to hundredths. */
    public double shownMultiple() {
        return Verdict.shown(noiseMultiple());
    }

    /** The shown noise multiple with two decimals in the reader's locale, e.g. "1.43" or "0,81". */
    public String multipleText(Locale locale) {
        return String.format(locale, "%.2f", shownMultiple());
    }

    /** Whether one component alone changed beyond its MDC95 (index 0 endo, 1 meso, 2 ecto). */
    public boolean componentBeyond(int component) {
        return Math.abs(change[component]) > mdc95[component];
    }

    /**
     * Whether the SAD alone would tell another story than the verdict: a short distance called beyond
     * noise (a direction the measurer's error rarely takes) or a long one within it.
     */
    public boolean sadAloneDisagrees() {
        return (verdict() == Verdict.BEYOND_NOISE) != (sad > sadNoise95);
    }
}
