package org.shapetrail.app;

/** The standing cautions the product shows (DESIGN.md §5). */
public final class Cautions {
    public static final String SHAPE_NOT_WORTH = "The somatotype describes present body shape. It is not a judgement"
            + " of health, fitness or worth. Shapetrail supports, and never replaces, the judgement of a qualified"
            + " practitioner; local safeguarding and data-protection rules come first.";

    private Cautions() {
    }
}
