package org.shapetrail.somatotype;

import java.util.Locale;

/**
 * A somatotype rating: the three components, unrounded. Computed ratings are at least 0.1 (Heath-Carter
 * floor); ratings entered by a rater may be any half-unit from 0.5.
 *
 * @param endomorphy relative fatness component
 * @param mesomorphy relative musculo-skeletal robustness component
 * @param ectomorphy relative linearity component
 */
public record Rating(double endomorphy, double mesomorphy, double ectomorphy) {
    /** Upper bound accepted for any component; no published rating comes near it. */
    public static final double MAX_COMPONENT = 20.0;

    public Rating {
        check("endomorphy", endomorphy);
        check("mesomorphy", mesomorphy);
        check("ectomorphy", ectomorphy);
    }

    private static void check(String name, double v) {
        if (!Double.isFinite(v) || v < 0 || v > MAX_COMPONENT) {
            throw new IllegalArgumentException(name + " must be a finite number from 0 to " + MAX_COMPONENT
                    + ", not " + v);
        }
    }

    public static Rating of(double endomorphy, double mesomorphy, double ectomorphy) {
        return new Rating(endomorphy, mesomorphy, ectomorphy);
    }

    /** The component's value. */
    public double get(Component c) {
        return switch (c) {
            case ENDOMORPHY -> endomorphy;
            case MESOMORPHY -> mesomorphy;
            case ECTOMORPHY -> ectomorphy;
        };
    }

    /** The position of this rating on the somatochart. */
    public ChartPoint chartPoint() {
        return Somatochart.point(this);
    }

    /** The rating rounded to half units (round half up), for categories and display only. */
    public Rating halfUnits() {
        return new Rating(HalfUnit.round(endomorphy), HalfUnit.round(mesomorphy), HalfUnit.round(ectomorphy));
    }

    /** One decimal per component, e.g. "2.5-4.0-3.0" (decimal point). */
    public String toDisplayString() {
        return String.format(Locale.ROOT, "%.1f-%.1f-%.1f", endomorphy, mesomorphy, ectomorphy);
    }

    /** One decimal per component in the reader's locale, e.g. "2,5-4,0-3,0" in Spanish. */
    public String toDisplayString(Locale locale) {
        return String.format(locale, "%.1f-%.1f-%.1f", endomorphy, mesomorphy, ectomorphy);
    }
}
