package org.shapetrail.noise;

/**
 * The verdict on a change between two ratings, from the Mahalanobis distance D² of the change against
 * the combined measurement covariance, which under "no true change" follows χ²(3):
 * beyond noise when D² &gt; 7.815 (p &lt; 0.05), borderline when 4.642 &lt; D² ≤ 7.815
 * (0.05 ≤ p &lt; 0.20), within noise otherwise (χ² table, 3 degrees of freedom).
 */
public enum Verdict {
    BEYOND_NOISE("beyond noise"),
    BORDERLINE("borderline"),
    WITHIN_NOISE("within noise");

    /** χ²(3) 95th percentile (statistics table). */
    public static final double BEYOND_D2 = 7.814727903251178;
    /** χ²(3) 80th percentile (statistics table). */
    public static final double BORDERLINE_D2 = 4.641627676087445;

    private final String words;

    Verdict(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }

    public static Verdict of(double d2) {
        if (d2 > BEYOND_D2) {
            return BEYOND_NOISE;
        }
        if (d2 > BORDERLINE_D2) {
            return BORDERLINE;
        }
        return WITHIN_NOISE;
    }
}
