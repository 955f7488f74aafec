package org.shapetrail.noise;

/**
 * The verdict on a change between two ratings, read off its noise multiple m = √(D² / χ²₀.₉₅(3)): the
 * Mahalanobis distance D² of the change against the combined measurement covariance follows χ²(3) under
 * "no true change", so m is the change's length divided by how far the 95 % noise ellipsoid reaches in the
 * change's own direction. Beyond noise when m ≥ 1.00 (D² ≥ 7.815, p ≤ 0.05), borderline when
 * 0.77 ≤ m &lt; 1.00 (D² ≥ 4.63, p below about 0.20; √(χ²₀.₈₀(3) / χ²₀.₉₅(3)) = 0.7707), within noise
 * otherwise.
 *
 * <p>The verdict is taken from the multiple floored to hundredths, the figure every report prints, so
 * the printed figure and the word beside it can never disagree (docs/decisions/0002-noise-model.md).
 */
public enum Verdict {
    BEYOND_NOISE("beyond noise"),
    BORDERLINE("borderline"),
    WITHIN_NOISE("within noise");

    /** χ²(3) 95th percentile (statistics table): the D² of a change at exactly the noise limit. */
    public static final double BEYOND_D2 = 7.814727903251178;
    /** χ²(3) 80th percentile (statistics table). */
    public static final double BORDERLINE_D2 = 4.641627676087445;
    /** Shown noise multiple from which a change is borderline: √(BORDERLINE_D2 / BEYOND_D2) = 0.7707, floored. */
    public static final double BORDERLINE_MULTIPLE = 0.77;

    private final String words;

    Verdict(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }

    /** The verdict in the reader's language ({@link #words} stays English for the CSV formats). */
    public String shown() {
        return org.shapetrail.i18n.Messages.tr("verdict." + name());
    }

    /** The verdict for a Mahalanobis distance² against χ²(3). */
    public static Verdict of(double d2) {
        return ofMultiple(multiple(d2));
    }

    /** The verdict for a noise multiple (read after flooring it to hundredths, as it is shown). */
    public static Verdict ofMultiple(double multiple) {
        double shown = shown(multiple);
        if (shown >= 1.0) {
            return BEYOND_NOISE;
        }
        if (shown >= BORDERLINE_MULTIPLE) {
            return BORDERLINE;
        }
        return WITHIN_NOISE;
    }

    /** √(D² / χ²₀.₉₅(3)); 1 at the noise limit. */
    public static double multiple(double d2) {
        return Math.sqrt(Math.max(0, d2) / BEYOND_D2);
    }

    /**
     * The multiple floored to hundredths: the figure reports print. Flooring (not rounding) keeps 0.996
     * from printing as 1.00 beside "borderline".
     */
    public static double shown(double multiple) {
        return Math.floor(multiple * 100) / 100;
    }
}
