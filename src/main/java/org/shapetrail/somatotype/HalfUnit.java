package org.shapetrail.somatotype;

/**
 * Rounding of a component to the half-unit scale on which ratings are reported and categories decided.
 * Only for reporting: no rounded value ever feeds back into a computation.
 */
public final class HalfUnit {
    /** The smallest value on the half-unit scale (a component is never reported as zero). */
    public static final double MIN = 0.5;

    private HalfUnit() {
    }

    /**
     * Rounds half up to the nearest half unit, with ½ as the lowest value: 2.25 → 2.5, 2.24 → 2.0,
     * 0.1 → 0.5.
     */
    public static double round(double component) {
        if (!Double.isFinite(component)) {
            throw new IllegalArgumentException("component must be finite, not " + component);
        }
        double r = Math.floor(component * 2 + 0.5) / 2;
        return Math.max(MIN, r);
    }

    /** Half-unit value written the way ratings are written by hand: "2½", "4", "½". */
    public static String format(double halfUnitValue) {
        long twice = Math.round(halfUnitValue * 2);
        long whole = twice / 2;
        boolean half = twice % 2 != 0;
        if (!half) {
            return Long.toString(whole);
        }
        return (whole == 0 ? "" : Long.toString(whole)) + "½";
    }
}
