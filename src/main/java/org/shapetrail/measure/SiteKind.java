package org.shapetrail.measure;

/**
 * The family of a measurement site; it decides the unit, the ISAK repeat tolerance and which unit
 * mistakes are likely.
 */
public enum SiteKind {
    /** Stature, sitting height, arm span: cm. */
    LENGTH(1.0),
    /** Body mass: kg. */
    MASS(1.0),
    /** Skinfolds: mm. */
    SKINFOLD(5.0),
    /** Girths (circumferences): cm. */
    GIRTH(1.0),
    /** Bone breadths: cm. */
    BREADTH(1.0);

    private final double repeatTolerancePercent;

    SiteKind(double repeatTolerancePercent) {
        this.repeatTolerancePercent = repeatTolerancePercent;
    }

    /**
     * The ISAK tolerance between the first two trials, in percent, beyond which a third trial is taken:
     * 5 % for skinfolds, 1 % for every other measure (ISAK standards; common practice).
     */
    public double repeatTolerancePercent() {
        return repeatTolerancePercent;
    }
}
