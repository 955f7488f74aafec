package org.shapetrail.somatotype;

/**
 * The word for the size of one component, decided on the half-unit rating (Carter & Heath 1990):
 * ½–2½ low, 3–5 moderate, 5½–7 high, 7½ and above very high.
 */
public enum RatingLevel {
    LOW("low"),
    MODERATE("moderate"),
    HIGH("high"),
    VERY_HIGH("very high");

    private final String word;

    RatingLevel(String word) {
        this.word = word;
    }

    public String word() {
        return word;
    }

    /** The level of an unrounded component, after rounding to half units. */
    public static RatingLevel of(double component) {
        double h = HalfUnit.round(component);
        if (h <= 2.5) {
            return LOW;
        }
        if (h <= 5.0) {
            return MODERATE;
        }
        if (h <= 7.0) {
            return HIGH;
        }
        return VERY_HIGH;
    }
}
