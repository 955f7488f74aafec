package org.shapetrail.somatotype;

/** Whether the skinfold sum is scaled to a reference stature of 170.18 cm before endomorphy is computed. */
public enum EndomorphyVariant {
    /** X = sum of three skinfolds × 170.18 / stature (the usual form; Carter 2002). */
    HEIGHT_CORRECTED,
    /** X = sum of three skinfolds, as in the original 1967 form. */
    UNCORRECTED
}
